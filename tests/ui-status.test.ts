/**
 * The results status names the real cause of an error: a solver that cannot load is reported
 * as the solver's failure (inputs kept, the next change tries again), never as a design that
 * could not be solved; a design the solver refuses is still reported as the design's.
 * Stand-in workers without a browser; solved numbers are not needed here.
 */
import { describe, expect, it } from 'vitest';
import { demoProject } from '../src/state/demoProject.ts';
import { errorStatusText } from '../src/ui/statusText.ts';
import type { SolveOutcome } from '../src/worker/solverClient.ts';
import { standInClient } from './helpers/standInWorker.ts';

const setup = standInClient;

const statusOf = (outcome: SolveOutcome) =>
  outcome.ok ? '' : errorStatusText(outcome.message, outcome.cause);

describe('status after a solver error', () => {
  it('blames the solver, not the design, when the worker cannot load', () => {
    const { client, workers, outcomes } = setup();
    client.solve(demoProject);
    for (let i = 0; i < 4; i++) workers[workers.length - 1].failToLoad();
    expect(outcomes).toHaveLength(1);
    const status = statusOf(outcomes[0]);
    expect(status).toContain('the solver could not run (the solver could not be loaded)');
    expect(status).toContain('inputs are kept and the next change tries again');
    expect(status).not.toContain('design could not be solved');
  });

  it('still says the design could not be solved when the solver refuses it', () => {
    const { client, workers, outcomes } = setup();
    client.solve(demoProject);
    workers[0].refuse('no equilibrium found');
    expect(outcomes).toHaveLength(1);
    expect(statusOf(outcomes[0])).toContain(
      'this design could not be solved (no equilibrium found)',
    );
  });
});
