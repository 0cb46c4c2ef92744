/**
 * The browser project list over an in-memory stand-in for IndexedDB (same get/set/del/entries
 * calls idb-keyval makes): save, list newest first, open (validated), rename, duplicate,
 * delete with undo. The idb-keyval adapter itself is exercised in the browser tests.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Project } from '../src/core/index.ts';
import { type LibraryStorage, ProjectLibrary } from '../src/deliverables/projectLibrary.ts';

const demo = JSON.parse(
  readFileSync(new URL('../examples/courtyard-lights.json', import.meta.url), 'utf8'),
) as Project;

function memoryStorage(): LibraryStorage & { map: Map<string, unknown> } {
  const map = new Map<string, unknown>();
  return {
    map,
    get: async (key) => structuredClone(map.get(key)),
    set: async (key, value) => void map.set(key, structuredClone(value)),
    del: async (key) => void map.delete(key),
    entries: async () => [...map.entries()],
  };
}

function library() {
  const storage = memoryStorage();
  let clock = Date.UTC(2030, 0, 1);
  let ids = 0;
  const lib = new ProjectLibrary(
    storage,
    () => {
      clock += 60_000;
      return new Date(clock);
    },
    () => `p${++ids}`,
  );
  return { lib, storage };
}

describe('project library', () => {
  it('saves and lists projects with title and date, newest first', async () => {
    const { lib } = library();
    await lib.save(demo);
    await lib.save({ ...demo, title: 'Second' });
    expect(await lib.list()).toEqual([
      { id: 'p2', title: 'Second', savedAt: '2030-01-01T00:02:00.000Z' },
      { id: 'p1', title: demo.title, savedAt: '2030-01-01T00:01:00.000Z' },
    ]);
  });

  it('opens a saved project identical to what was saved', async () => {
    const { lib } = library();
    const { id } = await lib.save(demo);
    expect(await lib.open(id)).toEqual({ ok: true, project: demo });
  });

  it('refuses a stored record that no longer validates, naming the field', async () => {
    const { lib, storage } = library();
    const { id } = await lib.save(demo);
    const record = storage.map.get(id) as { project: Record<string, unknown> };
    record.project.cases = 'none';
    const result = await lib.open(id);
    expect(result.ok === false && result.issues[0]).toEqual({
      path: 'cases',
      message: 'must be a list',
    });
  });

  it('renames both the entry and the project title', async () => {
    const { lib } = library();
    const { id } = await lib.save(demo);
    await lib.rename(id, '  Terrace lights  ');
    expect((await lib.list())[0].title).toBe('Terrace lights');
    const opened = await lib.open(id);
    expect(opened.ok && opened.project.title).toBe('Terrace lights');
    await expect(lib.rename(id, '   ')).rejects.toThrow('title: must not be empty');
  });

  it('duplicates under a new id with "(copy)" and leaves the original', async () => {
    const { lib } = library();
    const { id } = await lib.save(demo);
    const copy = await lib.duplicate(id);
    expect(copy.id).not.toBe(id);
    expect(copy.title).toBe(`${demo.title} (copy)`);
    expect((await lib.list()).map((e) => e.id).sort()).toEqual([id, copy.id].sort());
  });

  it('deletes and undoes the delete', async () => {
    const { lib } = library();
    const { id } = await lib.save(demo);
    const removed = await lib.remove(id);
    expect(await lib.list()).toEqual([]);
    await lib.restore(removed);
    expect(await lib.open(id)).toEqual({ ok: true, project: demo });
  });

  it('skips foreign values in the store instead of failing the list', async () => {
    const { lib, storage } = library();
    storage.map.set('stray', 42);
    await lib.save(demo);
    expect((await lib.list()).map((e) => e.id)).toEqual(['p1']);
  });
});
