/**
 * The app's one session starts both workers: the solver's, and the design aids' once the
 * solver's results for the document are on screen and the first plot is drawn. A small first
 * document is answered on the page, so the solver's worker starts only after the first plot,
 * ready for the first edit. A component remount (React's strict mode mounts twice) cannot start
 * a second design worker, because no component starts it.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { solveProject } from '../src/core/index.ts';
import { appSession, startAppSession } from '../src/state/appSession.ts';
import { useDesignStore } from '../src/state/designStore.ts';
import { markFirstDraw } from '../src/state/firstDraw.ts';
import { useProjectStore } from '../src/state/projectStore.ts';
import { useResultsStore } from '../src/state/resultsStore.ts';
import { StandInWorker } from './helpers/standInWorker.ts';

afterEach(() => appSession()?.dispose());

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

describe('app session wiring', () => {
  it('answers the demo on the page, starts both workers after the first plot, and stops them', async () => {
    const solvers: StandInWorker[] = [];
    const designs: StandInWorker[] = [];
    startAppSession(
      () => {
        const worker = new StandInWorker();
        solvers.push(worker);
        return worker;
      },
      false,
      () => {
        const worker = new StandInWorker();
        designs.push(worker);
        return worker;
      },
    );
    await tick();
    const project = useProjectStore.getState().project;
    // The page's own answer: the core's numbers, with no worker fetched yet.
    expect(useResultsStore.getState().results).toEqual(solveProject(project));
    expect(useResultsStore.getState().resultsProject).toBe(project);
    expect(solvers).toHaveLength(0);
    expect(designs).toHaveLength(0);
    // The first plot is drawn: the solver's worker starts (idle) and the design aids are asked.
    markFirstDraw();
    await new Promise((resolve) => setTimeout(resolve, 350)); // the moment to paint and settle
    expect(solvers).toHaveLength(1);
    // It is given the document once to warm up (id 0, no request's): its reply changes nothing.
    expect(solvers[0].received.map((r) => [r.id, r.project])).toEqual([[0, project]]);
    const shown = useResultsStore.getState().results;
    solvers[0].answer(solvers[0].received[0]);
    expect(useResultsStore.getState().results).toBe(shown);
    expect(designs).toHaveLength(1);
    expect(designs[0].received).toHaveLength(1);
    expect(designs[0].received[0].project).toBe(project);
    expect(useDesignStore.getState().stale).toBe(true);
    appSession()?.dispose();
    expect(designs[0].terminated).toBe(true);
    expect(solvers[0].terminated).toBe(true);
  });
});

describe('design aids while results keep coming', () => {
  it('asks once the results pause, for the newest document only', async () => {
    const { connectDesign, DESIGN_SETTLE_MS } = await import('../src/worker/connectDesign.ts');
    vi.useFakeTimers();
    try {
      const base = useProjectStore.getState().project;
      const show = (title: string) => {
        const project = { ...base, title };
        useProjectStore.setState({ project });
        useResultsStore.setState({
          results: solveProject(project),
          resultsProject: project,
          stale: false,
        });
        return project;
      };
      show('first');
      const workers: StandInWorker[] = [];
      const stop = connectDesign(() => {
        const worker = new StandInWorker();
        workers.push(worker);
        return worker;
      });
      expect(workers[0].received).toHaveLength(1); // the document on screen, at once
      workers[0].answer(workers[0].received[0]);
      let last = base;
      for (let i = 0; i < 5; i++) {
        last = show(`edit ${i}`);
        vi.advanceTimersByTime(DESIGN_SETTLE_MS / 3);
      }
      expect(workers[0].received).toHaveLength(1); // nothing while they keep coming
      vi.advanceTimersByTime(DESIGN_SETTLE_MS);
      expect(workers[0].received.map((r) => r.project)).toEqual([
        workers[0].received[0].project,
        last,
      ]);
      stop();
    } finally {
      vi.useRealTimers();
    }
  });
});
