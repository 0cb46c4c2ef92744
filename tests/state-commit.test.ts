/**
 * The one commit function: removals carry their dependants along in one undo step and say
 * what changed, or are refused with the rule and change nothing; no edit can leave the document
 * invalid. The reproduction: add a fixing, add a part-span load reaching past the old end,
 * remove that fixing.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { type Project, validateProject } from '../src/core/index.ts';
import { commit, commitAction, type Workbench } from '../src/state/commit.ts';
import { demoProject } from '../src/state/demoProject.ts';
import * as edits from '../src/state/projectEdits.ts';
import { createProjectStore, MERGE_WINDOW_MS } from '../src/state/projectStore.ts';
import { createSessionStore } from '../src/state/sessionStore.ts';

function bench(project: Project = demoProject): Workbench {
  return {
    store: createProjectStore(project),
    session: createSessionStore(),
    unitSystem: () => 'si',
  };
}

/** Demo + a third fixing at 32 m + a cable from 20 m to 30 m. */
function withThirdFixingAndLoad(b: Workbench) {
  expect(commitAction(edits.addSupport(), {}, b).ok).toBe(true);
  expect(commitAction(edits.addLoad('uniform'), {}, b).ok).toBe(true);
  const index = b.store.getState().project.loads.length - 1;
  const set = commit(edits.patchLoad(index, { from: 20, to: 30, label: 'Garage cable' }), {}, b);
  expect(set.ok).toBe(true);
  return index;
}

describe('removing a fixing that loads depend on', () => {
  it('clips the load to the new span, says so, and keeps the document valid', () => {
    const b = bench();
    const index = withThirdFixingAndLoad(b);
    const outcome = commitAction(
      edits.removeSupport(2),
      { what: 'Remove New fixing', removedSupport: 2 },
      b,
    );
    expect(outcome.ok).toBe(true);
    const project = b.store.getState().project;
    expect(validateProject(project).ok).toBe(true);
    const load = project.loads[index];
    expect(load.type === 'uniform' && [load.from, load.to]).toEqual([20, 22]);
    const notice = b.session.getState().editNotice;
    expect(notice?.kind).toBe('carried');
    expect(notice?.text).toContain('Remove New fixing');
    expect(notice?.details).toEqual([
      'Garage cable now runs from 20 m to 22 m (was 20 m to 30 m).',
    ]);
  });

  it('undoes the removal and what it carried in one step', () => {
    const b = bench();
    withThirdFixingAndLoad(b);
    const before = b.store.getState().project;
    commitAction(edits.removeSupport(2), { removedSupport: 2 }, b);
    b.store.undo();
    expect(b.store.getState().project).toBe(before);
  });

  it('removes point loads and loads left wholly off the span, and clips zones', () => {
    const b = bench();
    withThirdFixingAndLoad(b);
    commit(edits.addLoad('point'), {}, b);
    const p = b.store.getState().project;
    commit(edits.patchLoad(p.loads.length - 1, { x: 27, label: 'Garage lamp' }), {}, b);
    commit(edits.patchZone(0, { from: 18, to: 28 }), {}, b);
    commitAction(edits.removeSupport(2), { removedSupport: 2 }, b);
    const after = b.store.getState().project;
    expect(after.loads.some((l) => l.label === 'Garage lamp')).toBe(false);
    expect(after.limits.zones?.[0]).toMatchObject({ from: 18, to: 22 });
    expect(b.session.getState().editNotice?.details).toContain(
      'Garage lamp at 27 m was removed: it is no longer on the span.',
    );
  });

  it('moves a sag target with its span when a fixing before it is removed', () => {
    const b = bench();
    commitAction(edits.addSupport(), {}, b);
    commitAction(edits.addSupport(), {}, b); // fixings at 0, 22, 32, 42
    expect(commit(edits.setTarget({ sag: 0.2, span: 2 }), {}, b).ok).toBe(true);
    commitAction(edits.removeSupport(1), { removedSupport: 1 }, b);
    const target = b.store.getState().project.installation.target;
    expect(target).toEqual({ sag: 0.2, span: 1 });
    expect(b.session.getState().editNotice?.details[0]).toMatch(/now applies to span 2/);
  });

  it('moves a sag target off a span that is removed at the far end', () => {
    const b = bench();
    commitAction(edits.addSupport(), {}, b); // 0, 22, 32
    expect(commit(edits.setTarget({ sag: 0.2, span: 1 }), {}, b).ok).toBe(true);
    expect(commitAction(edits.removeSupport(2), { removedSupport: 2 }, b).ok).toBe(true);
    expect(b.store.getState().project.installation.target).toEqual({ sag: 0.2, span: 0 });
  });

  it('refuses, and changes nothing, when what depends on it cannot follow', () => {
    const b = bench();
    commitAction(edits.addSupport(), {}, b); // fixings at 0, 22, 32
    // A 6 m sag in the longest span (22 m) is valid; on the 10 m span left without the first
    // fixing it would be more than half the span.
    expect(commit(edits.setTarget({ sag: 6 }), {}, b).ok).toBe(true);
    const before = b.store.getState().project;
    const outcome = commitAction(
      edits.removeSupport(0),
      { what: 'Remove Kitchen wall bracket', removedSupport: 0 },
      b,
    );
    expect(outcome.ok).toBe(false);
    expect(b.store.getState().project).toBe(before);
    const notice = b.session.getState().editNotice;
    expect(notice?.kind).toBe('refused');
    expect(notice?.text).toContain('Remove Kitchen wall bracket');
    expect(notice?.details.join(' ')).toContain('installation.target.sag');
  });

  it('takes a target stated in a deleted case back to the installation, and says so', () => {
    const b = bench();
    commit(edits.setTarget({ maxTension: 1000, case: 'Winter storm' }), {}, b);
    commitAction(edits.removeCase(2), { what: 'Delete Winter storm' }, b);
    expect(b.store.getState().project.installation.target).toEqual({ maxTension: 1000 });
    expect(b.session.getState().editNotice?.details).toEqual([
      'The installation target now holds on the day (it was stated in Winter storm).',
    ]);
  });

  it('refuses every edit while another tab holds the document', () => {
    const b = bench();
    b.session.setState({ otherTabEditing: true });
    const outcome = commit(edits.setTitle('Mine'), {}, b);
    expect(outcome.ok).toBe(false);
    expect(!outcome.ok && outcome.reason).toBe('otherTab');
    expect(b.store.getState().project).toBe(demoProject);
  });
});

describe('a gesture (a drag on the plot) is one undo step however slow', () => {
  afterEach(() => vi.useRealTimers());

  function dragFarFixing(b: Workbench, gesture: boolean) {
    vi.useFakeTimers();
    for (const [i, x] of [21.9, 21.8, 21.7].entries()) {
      vi.setSystemTime(new Date(2026, 0, 1, 12, 0, 0, i * 3 * MERGE_WINDOW_MS));
      const outcome = commit(
        edits.patchSupport(1, { x, z: 4.2 + i * 0.1 }),
        {
          mergeKey: 'supports[1]:drag:1',
          gesture,
        },
        b,
      );
      expect(outcome.ok).toBe(true);
    }
  }

  it('merges the moves of one drag with pauses longer than the typing window', () => {
    const b = bench();
    dragFarFixing(b, true);
    expect(b.store.getState().project.supports[1]).toMatchObject({ x: 21.7 });
    b.store.undo();
    expect(b.store.getState().project).toBe(demoProject);
  });

  it('without the gesture, the same pauses make separate steps (typing)', () => {
    const b = bench();
    dragFarFixing(b, false);
    b.store.undo();
    expect(b.store.getState().project.supports[1]).toMatchObject({ x: 21.8 });
  });

  it('a refused move changes nothing and the drag goes on from the last good position', () => {
    const b = bench();
    const refused = commit(edits.patchSupport(1, { x: 20 }), { mergeKey: 'd', gesture: true }, b);
    expect(refused.ok).toBe(false);
    expect(!refused.ok && refused.issues.map((i) => i.path)).toEqual(['loads[0].to']);
    expect(b.store.getState().project).toBe(demoProject);
    expect(commit(edits.patchSupport(1, { x: 21.6 }), { mergeKey: 'd', gesture: true }, b).ok).toBe(
      true,
    );
    b.store.undo();
    expect(b.store.getState().project).toBe(demoProject);
  });
});
