/**
 * The app's one session starts both workers: the solver's, and the design aids' once the
 * solver's results for the document are on screen. A component remount (React's strict mode
 * mounts twice) cannot start a second design worker, because no component starts it.
 */
import { afterEach, describe, expect, it } from 'vitest';
import { appSession, startAppSession } from '../src/state/appSession.ts';
import { useDesignStore } from '../src/state/designStore.ts';
import { useProjectStore } from '../src/state/projectStore.ts';
import { StandInWorker } from './helpers/standInWorker.ts';

afterEach(() => appSession()?.dispose());

describe('app session wiring', () => {
  it('starts the design aids worker with the session, after the first results, and stops it', () => {
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
    expect(solvers).toHaveLength(1);
    expect(solvers[0].received).toHaveLength(1);
    // Nothing for the design aids until the document's results are on screen.
    expect(designs.flatMap((w) => w.received)).toHaveLength(0);
    solvers[0].answer(solvers[0].received[0]);
    expect(designs).toHaveLength(1);
    expect(designs[0].received).toHaveLength(1);
    expect(designs[0].received[0].project).toBe(useProjectStore.getState().project);
    expect(useDesignStore.getState().stale).toBe(true);
    appSession()?.dispose();
    expect(designs[0].terminated).toBe(true);
    expect(solvers[0].terminated).toBe(true);
  });
});
