/**
 * Version migration for project files. Each step turns a document of version n into version
 * n + 1 (extend the contract, never rename or re-unit a field); the chain runs before the
 * validator. Version 1 is the first released format, so the chain is empty today.
 */
import { PROJECT_VERSION, type ValidationIssue } from '../core/index.ts';

export type ProjectDocument = Record<string, unknown>;
export type Migration = (document: ProjectDocument) => ProjectDocument;

/** Keyed by the version a step reads; it returns the next version's document. */
export const MIGRATIONS: Readonly<Record<number, Migration>> = {};

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
