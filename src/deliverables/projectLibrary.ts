/**
 * Projects kept in this browser (IndexedDB through idb-keyval): save, list with title and date,
 * open (validated like a file), rename, duplicate, delete with undo (remove returns the record,
 * restore puts it back). The storage is injected so the logic runs in plain Node too.
 */
import { createStore, del, entries, get, set } from 'idb-keyval';
import type { Project } from '../core/index.ts';
import { type OpenResult, openProjectText } from './projectFile.ts';

export interface LibraryStorage {
  get(key: string): Promise<unknown>;
  set(key: string, value: unknown): Promise<void>;
  del(key: string): Promise<void>;
  entries(): Promise<[IDBValidKey, unknown][]>;
}

export interface LibraryRecord {
  id: string;
  title: string;
  /** ISO 8601, UTC. */
  savedAt: string;
  project: Project;
}

export type LibraryEntry = Omit<LibraryRecord, 'project'>;

export const TITLE_MAX_CHARS = 200;

/** IndexedDB database "sagwright-library", object store "projects". */
export function browserLibraryStorage(): LibraryStorage {
  const store = createStore('sagwright-library', 'projects');
  return {
    get: (key) => get(key, store),
    set: (key, value) => set(key, value, store),
    del: (key) => del(key, store),
    entries: () => entries(store),
  };
}

function randomId(): string {
  const random = globalThis.crypto?.randomUUID?.();
  return random ?? `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;
}

function isRecord(value: unknown): value is LibraryRecord {
  const r = value as LibraryRecord | null;
  return (
    typeof r === 'object' &&
    r !== null &&
    typeof r.id === 'string' &&
    typeof r.title === 'string' &&
    typeof r.savedAt === 'string' &&
    typeof r.project === 'object'
  );
}

function cleanTitle(title: string): string {
  const trimmed = title.trim().slice(0, TITLE_MAX_CHARS);
  if (!trimmed) throw new Error('title: must not be empty');
  return trimmed;
}

export class ProjectLibrary {
  constructor(
    private readonly storage: LibraryStorage,
    private readonly now: () => Date = () => new Date(),
    private readonly newId: () => string = randomId,
  ) {}

  /** Newest first. Records that are not library records are skipped, never deleted. */
  async list(): Promise<LibraryEntry[]> {
    const all = await this.storage.entries();
    return all
      .map(([, value]) => value)
      .filter(isRecord)
      .map(({ id, title, savedAt }) => ({ id, title, savedAt }))
      .sort((a, b) => b.savedAt.localeCompare(a.savedAt));
  }

  /** Saves a project (under id when given, replacing that record) and returns its entry. */
  async save(project: Project, id?: string): Promise<LibraryEntry> {
    const record: LibraryRecord = {
      id: id ?? this.newId(),
      title: cleanTitle(project.title),
      savedAt: this.now().toISOString(),
      project: structuredClone(project),
    };
    await this.storage.set(record.id, record);
    return { id: record.id, title: record.title, savedAt: record.savedAt };
  }

  /** The stored project, checked like a file (a stored record may predate this version). */
  async open(id: string): Promise<OpenResult> {
    const record = await this.storage.get(id);
    if (!isRecord(record))
      return { ok: false, issues: [{ path: '(library)', message: `has no project "${id}"` }] };
    return openProjectText(JSON.stringify(record.project));
  }

  async rename(id: string, title: string): Promise<LibraryEntry> {
    const record = await this.requireRecord(id);
    const next = cleanTitle(title);
    return this.save({ ...record.project, title: next }, id);
  }

  async duplicate(id: string): Promise<LibraryEntry> {
    const record = await this.requireRecord(id);
    const title = `${record.title} (copy)`.slice(0, TITLE_MAX_CHARS);
    return this.save({ ...record.project, title });
  }

  /** Deletes and returns the record, so the caller can offer Undo with restore(). */
  async remove(id: string): Promise<LibraryRecord> {
    const record = await this.requireRecord(id);
    await this.storage.del(id);
    return record;
  }

  async restore(record: LibraryRecord): Promise<void> {
    await this.storage.set(record.id, record);
  }

  private async requireRecord(id: string): Promise<LibraryRecord> {
    const record = await this.storage.get(id);
    if (!isRecord(record)) throw new Error(`(library): has no project "${id}"`);
    return record;
  }
}
