/**
 * The session between the document and the browser: two tabs on one storage never overwrite
 * each other's edits; a storage that is full or refuses is reported at once and the document
 * stays in memory; a stored document that does not validate opens as far as it can, with the
 * original kept. Browser parts are stand-ins (tests/helpers/browserStandIns.ts).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Project } from '../src/core/index.ts';
import { openProjectText } from '../src/deliverables/projectFile.ts';
import { AUTOSAVE_KEY, REJECTED_KEY } from '../src/state/autosave.ts';
import {
  commit,
  commitOpened,
  hasUnkeptEdits,
  markKept,
  type Workbench,
} from '../src/state/commit.ts';
import { demoProject } from '../src/state/demoProject.ts';
import * as edits from '../src/state/projectEdits.ts';
import { createProjectStore } from '../src/state/projectStore.ts';
import { createResultsStore } from '../src/state/resultsStore.ts';
import { createSession, type UnloadGuardTarget } from '../src/state/session.ts';
import { createSessionStore } from '../src/state/sessionStore.ts';
import { ChannelHub, MemoryStorage } from './helpers/browserStandIns.ts';

class GuardTarget implements UnloadGuardTarget {
  listeners = new Set<(event: Event) => void>();
  addEventListener(_type: 'beforeunload', listener: (event: Event) => void) {
    this.listeners.add(listener);
  }
  removeEventListener(_type: 'beforeunload', listener: (event: Event) => void) {
    this.listeners.delete(listener);
  }
}

function openTab(storage: MemoryStorage, hub?: ChannelHub, tabId = `tab-${Math.random()}`) {
  const store = createProjectStore(demoProject);
  const session = createSessionStore();
  const guard = new GuardTarget();
  const running = createSession({
    store,
    session,
    results: createResultsStore(),
    storage,
    fallback: demoProject,
    channel: hub?.open(),
    tabId,
    unloadTarget: guard,
  });
  running.start();
  const bench: Workbench = { store, session, unitSystem: () => 'si' };
  const edit = (e: (p: Project) => Project) => commit(e, {}, bench);
  return { store, session, running, guard, edit };
}

const stored = (storage: MemoryStorage) =>
  JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? 'null') as Project;

describe('two tabs on one project', () => {
  it('lets the tab opened last edit; the first says so, follows its saves and may take over', () => {
    const storage = new MemoryStorage();
    const hub = new ChannelHub();
    const a = openTab(storage, hub);
    expect(a.edit(edits.setTitle('Title from A')).ok).toBe(true);
    const b = openTab(storage, hub);
    expect(b.store.getState().project.title).toBe('Title from A');
    expect(a.session.getState().otherTabEditing).toBe(true);
    expect(b.session.getState().otherTabEditing).toBe(false);

    // B changes the safety factor; A cannot edit meanwhile, and shows B's change.
    expect(b.edit(edits.patchLimits({ safetyFactor: 6 })).ok).toBe(true);
    expect(a.edit(edits.setTitle('Lost?')).ok).toBe(false);
    expect(a.store.getState().project.limits.safetyFactor).toBe(6);

    // A takes over with B's latest; B goes quiet; A's next edit keeps B's.
    a.running.takeOver();
    expect(b.session.getState().otherTabEditing).toBe(true);
    expect(a.edit(edits.setTitle('Title from A again')).ok).toBe(true);
    const saved = stored(storage);
    expect(saved.title).toBe('Title from A again');
    expect(saved.limits.safetyFactor).toBe(6);
    expect(b.store.getState().project.title).toBe('Title from A again');
  });

  it('without a channel, a tab that lost the project never overwrites it and keeps its edit', () => {
    const storage = new MemoryStorage();
    const a = openTab(storage);
    const b = openTab(storage);
    expect(b.edit(edits.patchLimits({ safetyFactor: 7 })).ok).toBe(true);
    // A has not heard of B: its edit is kept on screen, not written over B's.
    expect(a.edit(edits.setTitle('Title from A')).ok).toBe(true);
    expect(stored(storage).limits.safetyFactor).toBe(7);
    expect(stored(storage).title).toBe(demoProject.title);
    expect(a.session.getState()).toMatchObject({ otherTabEditing: true, unsavedEdits: true });
    expect(a.guard.listeners.size).toBe(1); // leaving the page asks first
    // A keeps its version: it becomes the stored one, and B learns it on its next check.
    a.running.takeOver({ keepMine: true });
    expect(stored(storage).title).toBe('Title from A');
    expect(a.guard.listeners.size).toBe(0);
    b.running.checkOwner();
    expect(b.session.getState().otherTabEditing).toBe(true);
    expect(b.store.getState().project.title).toBe('Title from A');
  });
});

describe('storage that fills up or refuses', () => {
  it('reports a full storage at once, keeps the document and the edit, and recovers', () => {
    const storage = new MemoryStorage();
    const tab = openTab(storage);
    storage.quota = 100; // far less than a project
    expect(tab.edit(edits.setTitle('Yard after the storm')).ok).toBe(true);
    expect(tab.store.getState().project.title).toBe('Yard after the storm');
    expect(tab.session.getState().save).toMatchObject({ kind: 'failed', reason: 'full' });
    expect(tab.session.getState().unsavedEdits).toBe(true);
    expect(tab.guard.listeners.size).toBe(1);
    storage.quota = Number.POSITIVE_INFINITY;
    tab.running.retrySave();
    expect(tab.session.getState().save).toEqual({ kind: 'saved' });
    expect(stored(storage).title).toBe('Yard after the storm');
    expect(tab.guard.listeners.size).toBe(0);
  });

  it('reports a refusing storage from the start', () => {
    const storage = new MemoryStorage();
    storage.refuse = true;
    const tab = openTab(storage);
    expect(tab.session.getState().save).toMatchObject({ kind: 'failed', reason: 'refused' });
    expect(tab.edit(edits.setTitle('Still here')).ok).toBe(true);
    expect(tab.store.getState().project.title).toBe('Still here');
  });

  it('reports no storage at all as refused', () => {
    const store = createProjectStore(demoProject);
    const session = createSessionStore();
    createSession({
      store,
      session,
      results: createResultsStore(),
      storage: undefined,
      fallback: demoProject,
    }).start();
    expect(session.getState().save).toMatchObject({ kind: 'failed', reason: 'refused' });
  });
});

describe('a stored document that does not validate', () => {
  it('opens with the load clipped into the span, and keeps the original aside', () => {
    // What an older build autosaved after removing a fixing a load reached to.
    const broken = {
      ...demoProject,
      title: 'Garage run',
      loads: [
        ...demoProject.loads,
        { type: 'uniform', from: 20, to: 30, massPerLength: 0.1, label: 'Garage cable' },
      ],
    };
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(broken));
    const tab = openTab(storage);
    const project = tab.store.getState().project;
    expect(project.title).toBe('Garage run');
    expect(project.loads[2]).toMatchObject({ from: 20, to: 22, label: 'Garage cable' });
    const recovery = tab.session.getState().recovery;
    expect(recovery?.issues).toEqual([{ path: 'loads[2].to', message: 'must be at most 22' }]);
    expect(recovery?.changes).toEqual([
      'Garage cable now runs from 20 m to 22 m (was 20 m to 30 m).',
    ]);
    expect(storage.getItem(REJECTED_KEY)).toBe(JSON.stringify(broken));
  });

  it('leaves out what cannot be repaired and names it', () => {
    const broken = {
      ...demoProject,
      cases: [...demoProject.cases, { name: 'Hot summer', temperature: 500 }],
      limits: { ...demoProject.limits, safetyFactor: -2 },
      colour: 'red',
    };
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(broken));
    const tab = openTab(storage);
    const project = tab.store.getState().project;
    expect(project.cases).toEqual(demoProject.cases);
    expect(project.limits.safetyFactor).toBe(demoProject.limits.safetyFactor);
    expect('colour' in project).toBe(false);
    expect(tab.session.getState().recovery?.changes).toHaveLength(3);
  });
});

describe('a stored document in format version 1', () => {
  const v1 = JSON.parse(readFileSync('tests/fixtures/version1-free-support.json', 'utf8'));

  it('opens migrated, says what changed, and is stored as version 2 from the next save', () => {
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(v1));
    const tab = openTab(storage);
    const project = tab.store.getState().project;
    expect(project.version).toBe(2);
    expect(project.supports[1].attachment).toBe('pulley');
    expect(tab.session.getState().recovery).toBeNull();
    expect(tab.session.getState().formatNotes[0]).toMatch(/Corner post.*equal tension/);
    expect(tab.edit(edits.setTitle('Terrace line')).ok).toBe(true);
    expect(stored(storage).version).toBe(2);
    expect(JSON.stringify(stored(storage))).not.toContain('"free"');
  });

  it('opening another project replaces the notes; a current one clears them', () => {
    const storage = new MemoryStorage();
    const tab = openTab(storage);
    const bench: Workbench = { store: tab.store, session: tab.session, unitSystem: () => 'si' };
    const opened = openProjectText(JSON.stringify(v1));
    if (!opened.ok) throw new Error('fixture must open');
    expect(commitOpened(opened.project, bench, opened.notes).ok).toBe(true);
    expect(tab.session.getState().formatNotes).toHaveLength(1);
    expect(commitOpened(demoProject, bench).ok).toBe(true);
    expect(tab.session.getState().formatNotes).toEqual([]);
  });
});

describe('opening a project and edits not kept', () => {
  const benchOf = (tab: ReturnType<typeof openTab>): Workbench => ({
    store: tab.store,
    session: tab.session,
    unitSystem: () => 'si',
  });
  const other: Project = { ...demoProject, title: 'Opened from a file' };

  it('opening starts a fresh undo history: nothing to undo right after opening', () => {
    const tab = openTab(new MemoryStorage());
    const bench = benchOf(tab);
    expect(tab.store.temporal.getState().pastStates).toHaveLength(0);
    expect(commitOpened(other, bench).ok).toBe(true);
    expect(tab.store.getState().project).toBe(other);
    expect(tab.store.temporal.getState().pastStates).toHaveLength(0);
    // Also after edits: opening replaces the history with the opened project's own.
    expect(tab.edit(edits.setTitle('Edited')).ok).toBe(true);
    expect(tab.store.temporal.getState().pastStates).toHaveLength(1);
    expect(commitOpened(demoProject, bench).ok).toBe(true);
    expect(tab.store.temporal.getState().pastStates).toHaveLength(0);
    expect(tab.store.temporal.getState().futureStates).toHaveLength(0);
  });

  it('a shared project viewed with writing paused leaves nothing to undo and the autosave alone', () => {
    const storage = new MemoryStorage();
    const tab = openTab(storage);
    expect(tab.edit(edits.setTitle('My own work')).ok).toBe(true);
    const mine = tab.store.getState().project;
    tab.running.pause();
    expect(commitOpened(other, benchOf(tab)).ok).toBe(true);
    expect(tab.store.temporal.getState().pastStates).toHaveLength(0);
    expect(stored(storage).title).toBe('My own work');
    tab.running.restoreStored(mine);
    expect(tab.store.getState().project.title).toBe('My own work');
    // The person's own work was never kept anywhere but the autosave: still not kept.
    expect(hasUnkeptEdits(benchOf(tab))).toBe(true);
  });

  it('edits since the last open, save or export are not kept; undo back to it is', () => {
    const tab = openTab(new MemoryStorage());
    const bench = benchOf(tab);
    // A first visit shows the demo: nothing of the person's to lose.
    expect(hasUnkeptEdits(bench)).toBe(false);
    expect(tab.edit(edits.setTitle('Edited')).ok).toBe(true);
    expect(hasUnkeptEdits(bench)).toBe(true);
    tab.store.undo();
    expect(hasUnkeptEdits(bench)).toBe(false);
    tab.store.redo();
    expect(hasUnkeptEdits(bench)).toBe(true);
    markKept(tab.store.getState().project, bench);
    expect(hasUnkeptEdits(bench)).toBe(false);
    expect(tab.edit(edits.setTitle('Edited again')).ok).toBe(true);
    expect(hasUnkeptEdits(bench)).toBe(true);
    expect(commitOpened(other, bench).ok).toBe(true);
    expect(hasUnkeptEdits(bench)).toBe(false);
  });

  it('whether the stored work was kept survives a reload', () => {
    const storage = new MemoryStorage();
    const first = openTab(storage);
    expect(first.edit(edits.setTitle('Edited, not saved')).ok).toBe(true);
    first.running.dispose();
    const second = openTab(storage);
    expect(second.store.getState().project.title).toBe('Edited, not saved');
    expect(hasUnkeptEdits(benchOf(second))).toBe(true);
    markKept(second.store.getState().project, benchOf(second));
    second.running.dispose();
    const third = openTab(storage);
    expect(hasUnkeptEdits(benchOf(third))).toBe(false);
    expect(third.edit(edits.setTitle('Edited once more')).ok).toBe(true);
    third.running.dispose();
    expect(hasUnkeptEdits(benchOf(openTab(storage)))).toBe(true);
  });

  it('an autosave stored without the flag is taken as not kept', () => {
    const storage = new MemoryStorage();
    storage.setItem(AUTOSAVE_KEY, JSON.stringify({ ...demoProject, title: 'Older autosave' }));
    const tab = openTab(storage);
    expect(tab.store.getState().project.title).toBe('Older autosave');
    expect(hasUnkeptEdits(benchOf(tab))).toBe(true);
  });
});
