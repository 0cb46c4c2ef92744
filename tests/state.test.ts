// @vitest-environment jsdom
/**
 * The document store: undo/redo of edits, keystroke merging, and the autosave round trip
 * through the browser's storage (jsdom's localStorage).
 */
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { Project } from '../src/core/index.ts';
import { AUTOSAVE_KEY, REJECTED_KEY } from '../src/state/autosave.ts';
import { demoProject } from '../src/state/demoProject.ts';

async function freshStore() {
  vi.resetModules();
  return import('../src/state/projectStore.ts');
}

function withSpan(project: Project, lengthM: number): Project {
  const supports = project.supports.map((s, i) => (i === 1 ? { ...s, x: lengthM } : s));
  return { ...project, supports };
}

beforeEach(() => {
  localStorage.clear();
  vi.useRealTimers();
});

describe('project store', () => {
  it('opens the demo project on a first visit', async () => {
    const { useProjectStore } = await freshStore();
    expect(useProjectStore.getState().project).toEqual(demoProject);
  });

  it('undoes and redoes document edits in order', async () => {
    const { useProjectStore, undo, redo } = await freshStore();
    const start = useProjectStore.getState().project;
    const first = withSpan(start, 23);
    const second = { ...first, title: 'Terrace lights' };
    useProjectStore.getState().setProject(first);
    useProjectStore.getState().setProject(second);
    expect(useProjectStore.getState().project).toBe(second);
    undo();
    expect(useProjectStore.getState().project).toBe(first);
    undo();
    expect(useProjectStore.getState().project).toBe(start);
    undo(); // nothing more to undo: stays put
    expect(useProjectStore.getState().project).toBe(start);
    redo();
    redo();
    expect(useProjectStore.getState().project).toBe(second);
  });

  it('merges keystrokes in one field into one undo step, but not across fields', async () => {
    const { useProjectStore, undo } = await freshStore();
    const start = useProjectStore.getState().project;
    const set = useProjectStore.getState().setProject;
    set(withSpan(start, 2), 'supports[1].x');
    set(withSpan(start, 25), 'supports[1].x');
    set(withSpan(start, 25.5), 'supports[1].x');
    const titled = { ...withSpan(start, 25.5), title: 'Yard' };
    set(titled, 'title');
    undo();
    expect(useProjectStore.getState().project.supports[1].x).toBe(25.5);
    undo();
    expect(useProjectStore.getState().project).toBe(start);
  });

  it('does not merge the same field after the merge window', async () => {
    vi.useFakeTimers();
    const { useProjectStore, undo, MERGE_WINDOW_MS } = await freshStore();
    const start = useProjectStore.getState().project;
    useProjectStore.getState().setProject(withSpan(start, 20), 'supports[1].x');
    vi.advanceTimersByTime(MERGE_WINDOW_MS + 1);
    useProjectStore.getState().setProject(withSpan(start, 21), 'supports[1].x');
    undo();
    expect(useProjectStore.getState().project.supports[1].x).toBe(20);
  });

  it('autosaves every change and restores it on the next load', async () => {
    const first = await freshStore();
    const edited = withSpan(first.useProjectStore.getState().project, 24.25);
    first.useProjectStore.getState().setProject(edited);
    expect(JSON.parse(localStorage.getItem(AUTOSAVE_KEY) ?? 'null')).toEqual(edited);
    const second = await freshStore();
    expect(second.useProjectStore).not.toBe(first.useProjectStore);
    expect(second.useProjectStore.getState().project).toEqual(edited);
    // undo also saves: the stored document follows the one on screen
    first.undo();
    expect(JSON.parse(localStorage.getItem(AUTOSAVE_KEY) ?? 'null')).toEqual(demoProject);
  });

  it('keeps an autosave that no longer validates aside and opens the demo', async () => {
    const broken = JSON.stringify({ ...demoProject, supports: [{ x: 0, z: 1 }] });
    localStorage.setItem(AUTOSAVE_KEY, broken);
    const { useProjectStore } = await freshStore();
    expect(useProjectStore.getState().project).toEqual(demoProject);
    expect(localStorage.getItem(REJECTED_KEY)).toBe(broken);
  });
});
