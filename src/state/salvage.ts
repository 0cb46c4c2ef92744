/**
 * Opening a stored document that does not validate as far as it can: dependants are carried
 * into the span first (dependants.ts); then each remaining issue is settled by removing the list
 * item it sits in, dropping an unknown or optional field, or taking that one field (then its
 * whole section) from a fallback project. Every step is told in words. Nothing is guessed beyond
 * that: what cannot be settled opens the fallback, and the original text is kept for download.
 */
import { type Project, validateProject } from '../core/index.ts';
import { carryDependants } from './dependants.ts';

export interface Salvaged {
  project: Project;
  changes: string[];
  /** True when nothing of the stored document could be used. */
  usedFallback: boolean;
}

type Key = string | number;
type Json = Record<string, unknown> | unknown[];

function parsePath(path: string): Key[] {
  const keys: Key[] = [];
  for (const part of path.match(/[^.[\]]+/g) ?? [])
    keys.push(/^\d+$/.test(part) ? Number(part) : part);
  return keys;
}

function getAt(root: unknown, keys: readonly Key[]): unknown {
  let node = root;
  for (const key of keys) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<Key, unknown>)[key];
  }
  return node;
}

function parentOf(root: unknown, keys: readonly Key[]): Json | undefined {
  const parent = getAt(root, keys.slice(0, -1));
  return typeof parent === 'object' && parent !== null ? (parent as Json) : undefined;
}

const MIN_ENTRIES: Record<string, number> = { supports: 2 };

/** One repair for one issue; returns the words for it, or null if this step cannot apply. */
function settle(
  doc: Record<string, unknown>,
  fallback: Project,
  path: string,
  rule: string,
  tried: Set<string>,
): string | null {
  const keys = parsePath(path);
  const itemAt = keys.findLastIndex((k) => typeof k === 'number');
  if (itemAt > 0) {
    const listKeys = keys.slice(0, itemAt);
    const list = getAt(doc, listKeys);
    const listPath = path.slice(0, path.indexOf(`[${keys[itemAt]}]`));
    if (Array.isArray(list) && list.length > (MIN_ENTRIES[listPath] ?? 0)) {
      list.splice(keys[itemAt] as number, 1);
      return `${listPath}[${keys[itemAt]}] was left out (${path} ${rule}).`;
    }
  }
  const parent = parentOf(doc, keys);
  const leaf = keys[keys.length - 1];
  const leafKey = `leaf:${path}`;
  if (parent && !Array.isArray(parent) && typeof leaf === 'string' && !tried.has(leafKey)) {
    tried.add(leafKey);
    const fromFallback = getAt(fallback, keys);
    if (rule === 'is not a known field' || fromFallback === undefined) {
      delete parent[leaf];
      return `${path} was left out (it ${rule}).`;
    }
    parent[leaf] = structuredClone(fromFallback);
    return `${path} was set to ${JSON.stringify(fromFallback)} (it ${rule}).`;
  }
  const section = keys[0];
  const sectionKey = `section:${String(section)}`;
  if (typeof section === 'string' && section in fallback && !tried.has(sectionKey)) {
    tried.add(sectionKey);
    doc[section] = structuredClone(fallback[section as keyof Project]);
    return `${section} was replaced by the demo project's (${path} ${rule}).`;
  }
  return null;
}

/** Carry loads, zones and the target into the span the stored fixings give. */
function carryIntoSpan(doc: Record<string, unknown>, changes: string[]): void {
  try {
    const project = doc as unknown as Project;
    const unbounded = {
      ...project,
      supports: [
        { x: -Infinity, z: 0 },
        { x: Infinity, z: 0 },
      ],
    };
    const carried = carryDependants(unbounded, project);
    Object.assign(doc, carried.project);
    changes.push(...carried.changes);
  } catch {
    // too broken to carry anything: the issues are settled one by one instead
  }
}

export function salvageProject(raw: unknown, fallback: Project): Salvaged {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw))
    return { project: fallback, changes: [], usedFallback: true };
  const doc = structuredClone(raw) as Record<string, unknown>;
  const changes: string[] = [];
  const tried = new Set<string>();
  carryIntoSpan(doc, changes);
  for (let step = 0; step < 500; step++) {
    const checked = validateProject(doc);
    if (checked.ok) return { project: checked.project, changes, usedFallback: false };
    let settled: string | null = null;
    for (const issue of checked.issues) {
      settled = settle(doc, fallback, issue.path, issue.message, tried);
      if (settled) break;
    }
    if (!settled) break;
    changes.push(settled);
  }
  return { project: fallback, changes: [], usedFallback: true };
}
