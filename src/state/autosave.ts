/**
 * Autosave of the project document in the browser's storage: written on every change, read on
 * load. A stored document that no longer validates is kept aside (never deleted) and the demo
 * opens instead, so nothing a person made is thrown away.
 */
import { type Project, validateProject } from '../core/index.ts';

export const AUTOSAVE_KEY = 'sagwright:autosave';
export const REJECTED_KEY = 'sagwright:autosave-rejected';

export type KeyValueStorage = Pick<Storage, 'getItem' | 'setItem' | 'removeItem'>;

export function browserStorage(): KeyValueStorage | undefined {
  try {
    return typeof localStorage === 'undefined' ? undefined : localStorage;
  } catch {
    return undefined; // storage blocked by the browser's privacy settings
  }
}

export function readAutosave(storage: KeyValueStorage | undefined): Project | undefined {
  const text = storage?.getItem(AUTOSAVE_KEY);
  if (!text) return undefined;
  try {
    const checked = validateProject(JSON.parse(text));
    if (checked.ok) return checked.project;
  } catch {
    // not JSON: fall through and keep the text aside
  }
  storage?.setItem(REJECTED_KEY, text);
  return undefined;
}

export function writeAutosave(storage: KeyValueStorage | undefined, project: Project): void {
  try {
    storage?.setItem(AUTOSAVE_KEY, JSON.stringify(project));
  } catch {
    // quota or privacy mode: the document stays in memory; nothing else to do
  }
}
