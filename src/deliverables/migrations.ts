/**
 * Version migration for project files. Each step turns a document of version n into version
 * n + 1 (extend the contract, never rename or re-unit a field); the chain runs before the
 * validator. The steps themselves live in the core (migrateProject.ts), so the CLI, the worker
 * and every way of opening a project read older files the same way.
 */
import {
  type Migration,
  PROJECT_MIGRATIONS,
  PROJECT_VERSION,
  type ProjectDocument,
  type ValidationIssue,
} from '../core/index.ts';

export type { Migration, ProjectDocument };

/** Keyed by the version a step reads; it returns the next version's document. */
export const MIGRATIONS: Readonly<Record<number, Migration>> = PROJECT_MIGRATIONS;

export type MigrationResult =
  | { ok: true; document: ProjectDocument; from?: number }
  | { ok: false; issues: ValidationIssue[] };

export function migrateDocument(
  document: ProjectDocument,
  migrations: Readonly<Record<number, Migration>>,
  targetVersion = PROJECT_VERSION,
): MigrationResult {
  const from = document.version as number;
  if (from === targetVersion) return { ok: true, document };
  let current = structuredClone(document);
  for (let version = from; version < targetVersion; version++) {
    const step = migrations[version];
    if (!step)
      return {
        ok: false,
        issues: [{ path: 'version', message: `${version} has no migration to ${version + 1}` }],
      };
    current = { ...step(current), version: version + 1 };
  }
  return { ok: true, document: current, from };
}
