/**
 * Reading older project files: each step turns a document of version n into version n + 1
 * (the contract is extended, never renamed or re-united) and says in words what changed for the
 * results. 1 → 2: a support's "free": true becomes "attachment": "pulley" (equal tension on both
 * sides, what the label promised; version 1 solved it with equal horizontal tension).
 */
import { PROJECT_VERSION } from './project.ts';

export type ProjectDocument = Record<string, unknown>;
export type Migration = (document: ProjectDocument) => ProjectDocument;

/** Supports "free": true → "attachment": "pulley"; "free": false is dropped (clamped). */
function freeSupportsToPulleys(document: ProjectDocument): ProjectDocument {
  if (!Array.isArray(document.supports)) return document;
  const supports = document.supports.map((support: unknown) => {
    if (typeof support !== 'object' || support === null || Array.isArray(support)) return support;
    const { free, ...rest } = support as Record<string, unknown>;
    if (free === true) return { ...rest, attachment: 'pulley' };
    if (free === false) return rest;
    return support; // anything else is left for the validator to refuse by name
  });
  return { ...document, supports };
}

/** Keyed by the version a step reads; it returns the next version's document. */
export const PROJECT_MIGRATIONS: Readonly<Record<number, Migration>> = {
  1: freeSupportsToPulleys,
};

/** What reading an older document changes in its results, in words a person can act on. */
export function migrationNotes(document: ProjectDocument): string[] {
  const version = document.version;
  if (typeof version !== 'number' || version >= 2 || !Array.isArray(document.supports)) return [];
  const names = document.supports.flatMap((support: unknown, i) => {
    const s = support as { free?: unknown; label?: unknown } | null;
    if (s?.free !== true) return [];
    return [typeof s.label === 'string' && s.label !== '' ? s.label : `Fixing ${i + 1}`];
  });
  if (names.length === 0) return [];
  return [
    `This file was saved in format version 1. ${names.join(', ')} ${names.length === 1 ? 'was' : 'were'} marked as running over a pulley and ${names.length === 1 ? 'is' : 'are'} now solved as a pulley: equal tension on both sides. Version 1 solved ${names.length === 1 ? 'it' : 'them'} with equal horizontal tension, so on inclined spans the tensions, sags and the pull on ${names.length === 1 ? 'that fixing' : 'those fixings'} differ from what earlier versions showed.`,
  ];
}

/**
 * A document of an older version brought to PROJECT_VERSION (a copy; the input is unchanged),
 * or undefined when it is not an older document this chain can read.
 */
export function migrateProjectDocument(
  document: ProjectDocument,
): { document: ProjectDocument; from: number; notes: string[] } | undefined {
  const from = document.version;
  if (typeof from !== 'number' || !Number.isInteger(from) || from < 1 || from >= PROJECT_VERSION)
    return undefined;
  let current = structuredClone(document);
  for (let version = from; version < PROJECT_VERSION; version++) {
    const step = PROJECT_MIGRATIONS[version];
    if (!step) return undefined;
    current = { ...step(current), version: version + 1 };
  }
  return { document: current, from, notes: migrationNotes(document) };
}
