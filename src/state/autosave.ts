/**
 * The autosave in the browser's storage. The document is stored as JSON under AUTOSAVE_KEY;
 * OWNER_KEY records which tab wrote it last and a version that grows with every write, so a tab
 * that has lost the document to another never overwrites it. Only a valid document is written.
 * Reading never throws: a stored document that does not validate is opened as far as it can be
 * (salvage.ts) and its text is kept aside under REJECTED_KEY, never deleted.
 */
import { type Project, type ValidationIssue, validateProject } from '../core/index.ts';
import { salvageProject } from './salvage.ts';

export const AUTOSAVE_KEY = 'sagwright:autosave';
export const OWNER_KEY = 'sagwright:autosave-owner';
export const REJECTED_KEY = 'sagwright:autosave-rejected';
/**
 * Whether the stored document is the one last kept (opened, saved as a file or in the browser's
 * projects, or exported): "kept", or "edited" when it has edits since. Absent in stores written
 * before it existed: read as edited, so nothing unkept is replaced without asking.
 */
export const KEPT_KEY = 'sagwright:autosave-kept';

export function readKept(storage: KeyValueStorage | undefined): boolean {
  try {
    return storage?.getItem(KEPT_KEY) === 'kept';
  } catch {
    return false;
  }
}

export function writeKept(storage: KeyValueStorage | undefined, kept: boolean): void {
  try {
    storage?.setItem(KEPT_KEY, kept ? 'kept' : 'edited');
  } catch {
    // storage full or blocked: the autosave's own write reports that
  }
}

export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export function browserStorage(): KeyValueStorage | undefined {
  try {
    return typeof localStorage === 'undefined' ? undefined : localStorage;
  } catch {
    return undefined; // storage blocked by the browser's privacy settings
  }
}

export interface Owner {
  tab: string;
  version: number;
}

export function readOwner(storage: KeyValueStorage | undefined): Owner | null {
  try {
    const parsed = JSON.parse(storage?.getItem(OWNER_KEY) ?? 'null') as Partial<Owner> | null;
    if (typeof parsed?.tab === 'string' && typeof parsed.version === 'number')
      return { tab: parsed.tab, version: parsed.version };
  } catch {
    // unreadable record: as if no tab had written
  }
  return null;
}

export type WriteOutcome =
  | { ok: true; version: number }
  | { ok: false; reason: 'otherTab'; owner: Owner }
  | { ok: false; reason: 'full' | 'refused' | 'invalid'; detail: string };

function refusal(error: unknown): WriteOutcome {
  const name = error instanceof DOMException || error instanceof Error ? error.name : '';
  const detail = error instanceof Error ? error.message : String(error);
  const full = name === 'QuotaExceededError' || (error as { code?: number })?.code === 22;
  return { ok: false, reason: full ? 'full' : 'refused', detail };
}

/** Mark this tab as the one editing; returns the new version or the browser's refusal. */
export function claim(storage: KeyValueStorage | undefined, tab: string): WriteOutcome {
  if (!storage) return { ok: false, reason: 'refused', detail: 'storage is not available' };
  try {
    const version = (readOwner(storage)?.version ?? 0) + 1;
    storage.setItem(OWNER_KEY, JSON.stringify({ tab, version }));
    return { ok: true, version };
  } catch (error) {
    return refusal(error);
  }
}

/** Write the document if it is valid and this tab still holds it. */
export function writeAutosave(
  storage: KeyValueStorage | undefined,
  project: Project,
  tab?: string,
): WriteOutcome {
  if (!storage) return { ok: false, reason: 'refused', detail: 'storage is not available' };
  const checked = validateProject(project);
  if (!checked.ok)
    return { ok: false, reason: 'invalid', detail: checked.issues.map((i) => i.path).join(', ') };
  try {
    const owner = readOwner(storage);
    if (tab !== undefined && owner && owner.tab !== tab)
      return { ok: false, reason: 'otherTab', owner };
    const version = (owner?.version ?? 0) + 1;
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(project));
    if (tab !== undefined) storage.setItem(OWNER_KEY, JSON.stringify({ tab, version }));
    return { ok: true, version };
  } catch (error) {
    return refusal(error);
  }
}

export interface Opened {
  project: Project;
  /** What reading an older file format changed, in words (none for a current document). */
  formatNotes?: string[];
  /** Present when the stored document could not be opened as it was. */
  recovery?: {
    issues: ValidationIssue[];
    changes: string[];
    original: string;
    openedDemo: boolean;
  };
}

/** The stored document, opened as far as it can be; the fallback when nothing is stored. */
export function openAutosave(storage: KeyValueStorage | undefined, fallback: Project): Opened {
  let text: string | null = null;
  try {
    text = storage?.getItem(AUTOSAVE_KEY) ?? null;
  } catch {
    return { project: fallback };
  }
  if (!text) return { project: fallback };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    raw = undefined;
  }
  const checked = raw === undefined ? null : validateProject(raw);
  if (checked?.ok)
    return checked.notes?.length
      ? { project: checked.project, formatNotes: checked.notes }
      : { project: checked.project };
  try {
    storage?.setItem(REJECTED_KEY, text);
  } catch {
    // storage full: the text is still offered for download from memory
  }
  const issues = checked?.issues ?? [{ path: '(document)', message: 'is not readable JSON' }];
  const salvaged = salvageProject(raw, fallback);
  return {
    project: salvaged.project,
    recovery: {
      issues,
      changes: salvaged.changes,
      original: text,
      openedDemo: salvaged.usedFallback,
    },
  };
}
