/**
 * The document store (made by its factory, so each test has its own): undo/redo of edits and
 * keystroke merging; and the session's autosave round trip through a storage stand-in.
 */
import { describe, expect, it, vi } from 'vitest';
import type { Project } from '../src/core/index.ts';
import { AUTOSAVE_KEY, REJECTED_KEY } from '../src/state/autosave.ts';
import { demoProject } from '../src/state/demoProject.ts';
import { createProjectStore, MERGE_WINDOW_MS } from '../src/state/projectStore.ts';
import { createResultsStore } from '../src/state/resultsStore.ts';
import { createSession } from '../src/state/session.ts';
import { createSessionStore } from '../src/state/sessionStore.ts';
import { MemoryStorage } from './helpers/browserStandIns.ts';

function withSpan(project: Project, lengthM: number): Project {
  const supports = project.supports.map((s, i) => (i === 1 ? { ...s, x: lengthM } : s));
  return { ...project, supports };
}

function open(storage: MemoryStorage) {
  const store = createProjectStore(demoProject);
  const session = createSessionStore();
  const running = createSession({
    store,
    session,
    results: createResultsStore(),
    storage,
    fallback: demoProject,
    tabId: `tab-${Math.random()}`,
  });
  running.start();
  return { store, session, running };
}

describe('project store', () => {
  it('opens with the document it is made with', () => {
    expect(createProjectStore(demoProject).getState().project).toBe(demoProject);
  });

  it('undoes and redoes document edits in order', () => {
    const store = createProjectStore(demoProject);
    const start = store.getState().project;
    const first = withSpan(start, 23);
    const second = { ...first, title: 'Terrace lights' };
    store.getState().setProject(first);
    store.getState().setProject(second);
    expect(store.getState().project).toBe(second);
    store.undo();
    expect(store.getState().project).toBe(first);
    store.undo();
    expect(store.getState().project).toBe(start);
    store.undo(); // nothing more to undo: stays put
    expect(store.getState().project).toBe(start);
    store.redo();
    store.redo();
    expect(store.getState().project).toBe(second);
  });

  it('merges keystrokes in one field into one undo step, but not across fields', () => {
    const store = createProjectStore(demoProject);
    const start = store.getState().project;
    const set = store.getState().setProject;
    set(withSpan(start, 2), 'supports[1].x');
    set(withSpan(start, 25), 'supports[1].x');
    set(withSpan(start, 25.5), 'supports[1].x');
    set({ ...withSpan(start, 25.5), title: 'Yard' }, 'title');
    store.undo();
    expect(store.getState().project.supports[1].x).toBe(25.5);
    store.undo();
    expect(store.getState().project).toBe(start);
  });

  it('does not merge the same field after the merge window', () => {
    vi.useFakeTimers();
    try {
      const store = createProjectStore(demoProject);
      const start = store.getState().project;
      store.getState().setProject(withSpan(start, 20), 'supports[1].x');
      vi.advanceTimersByTime(MERGE_WINDOW_MS + 1);
      store.getState().setProject(withSpan(start, 21), 'supports[1].x');
      store.undo();
      expect(store.getState().project.supports[1].x).toBe(20);
    } finally {
      vi.useRealTimers();
    }
  });

  it('forgets the history when the document is reset (opened from storage)', () => {
    const store = createProjectStore(demoProject);
    store.getState().setProject(withSpan(demoProject, 23));
    store.getState().resetProject(withSpan(demoProject, 30));
    store.undo();
    expect(store.getState().project.supports[1].x).toBe(30);
  });
});

describe('autosave through the session', () => {
  it('autosaves every change and restores it on the next load', () => {
    const storage = new MemoryStorage();
    const first = open(storage);
    const edited = withSpan(first.store.getState().project, 24.25);
    first.store.getState().setProject(edited);
    expect(JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? 'null')).toEqual(edited);
    first.running.dispose();
    const second = open(storage);
    expect(second.store.getState().project).toEqual(edited);
    expect(second.session.getState().recovery).toBeNull();
  });

  it('undo also saves: the stored document follows the one on screen', () => {
    const storage = new MemoryStorage();
    const { store } = open(storage);
    store.getState().setProject(withSpan(demoProject, 24.25));
    store.undo();
    expect(JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? 'null')).toEqual(demoProject);
  });

  it('never writes a document that does not validate', () => {
    const storage = new MemoryStorage();
    const { store } = open(storage);
    store.getState().setProject(withSpan(demoProject, 23));
    const stored = storage.getItem(AUTOSAVE_KEY);
    store.getState().setProject({ ...demoProject, supports: [demoProject.supports[0]] });
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(stored);
  });

  it('keeps an autosave that does not validate aside and says so, opening what it can', () => {
    const storage = new MemoryStorage();
    const broken = JSON.stringify({ ...demoProject, title: 'Garden line', cases: 'none' });
    storage.setItem(AUTOSAVE_KEY, broken);
    const { store, session } = open(storage);
    expect(storage.getItem(REJECTED_KEY)).toBe(broken);
    expect(store.getState().project.title).toBe('Garden line');
    const recovery = session.getState().recovery;
    expect(recovery?.original).toBe(broken);
    expect(recovery?.issues.map((i) => i.path)).toEqual(['cases']);
    expect(recovery?.openedDemo).toBe(false);
  });

  it('says so, and keeps the text, when the stored autosave is not readable at all', () => {
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, '{"format": "sagwright-pro');
    const { store, session } = open(storage);
    expect(store.getState().project).toEqual(demoProject);
    expect(session.getState().recovery?.openedDemo).toBe(true);
    expect(session.getState().recovery?.original).toBe('{"format": "sagwright-pro');
  });
});
