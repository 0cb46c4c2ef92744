/**
 * The solver worker protocol without a browser: a stand-in worker that answers when told,
 * so the order of replies can be controlled. Solved numbers come from the real core.
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject } from '../src/core/index.ts';
import { demoProject } from '../src/state/demoProject.ts';
import { standInClient } from './helpers/standInWorker.ts';

const setup = standInClient;

const spanOf = (lengthM: number): Project => ({
  ...demoProject,
  supports: demoProject.supports.map((s, i) => (i === 1 ? { ...s, x: lengthM } : s)),
});

describe('solver client', () => {
  it('delivers the newest result only and drops the reply to a superseded request', () => {
    const { client, workers, outcomes } = setup();
    const a = spanOf(22);
    const b = spanOf(23);
    const c = spanOf(24);
    client.solve(a);
    client.solve(b);
    client.solve(c); // b never goes out: c replaced it while a was in flight
    const worker = workers[0];
    expect(worker.received.map((r) => r.project)).toEqual([a]);
    worker.answer(worker.received[0]);
    expect(outcomes).toHaveLength(0);
    expect(client.dropped).toBe(1);
    expect(worker.received.map((r) => r.project)).toEqual([a, c]);
    worker.answer(worker.received[1]);
    expect(outcomes).toHaveLength(1);
    const outcome = outcomes[0];
    expect(outcome.ok && outcome.project).toBe(c);
    // independent check: the delivered numbers are the core's for document c, not a
    expect(outcome.ok && outcome.results.cases[0].horizontalTension).toBe(
      solveProject(c).cases[0].horizontalTension,
    );
  });

  it('ignores a reply whose id it never sent or already settled', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    const worker = workers[0];
    const request = worker.received[0];
    worker.answer({ ...request, id: 99 });
    expect(outcomes).toHaveLength(0);
    worker.answer(request);
    worker.answer(request);
    expect(outcomes).toHaveLength(1);
  });

  it('restarts a dead worker and sends the latest request again', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    client.solve(spanOf(25));
    workers[0].die('out of memory');
    expect(workers[0].terminated).toBe(true);
    expect(workers).toHaveLength(2);
    expect(workers[1].received.map((r) => r.project.supports[1].x)).toEqual([25]);
    workers[1].answer(workers[1].received[0]);
    expect(outcomes).toHaveLength(1);
    expect(outcomes[0].project.supports[1].x).toBe(25);
  });

  it('reports a failure after repeated deaths instead of looping', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    for (let i = 0; i < 4; i++) workers[workers.length - 1].die('crash');
    expect(outcomes).toHaveLength(1);
    expect(outcomes[0].ok).toBe(false);
    expect(!outcomes[0].ok && outcomes[0].message).toContain('crash');
  });

  it('replaces a worker the moment it ends without a word, and sends the latest request again', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    workers[0].announce('solver-a');
    client.solve(spanOf(26));
    workers[0].endSilently(); // no error event, no reply: only its lock is released
    expect(workers).toHaveLength(2);
    expect(workers[1].received.map((r) => r.project.supports[1].x)).toEqual([26]);
    workers[1].answer(workers[1].received[0]);
    expect(outcomes).toHaveLength(1);
    expect(outcomes[0].ok && outcomes[0].project.supports[1].x).toBe(26);
  });

  it('leaves a busy worker alone: holding its lock, it is not restarted while it solves', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    workers[0].announce('solver-b');
    client.solve(spanOf(23));
    client.solve(spanOf(24));
    expect(workers).toHaveLength(1);
    expect(workers[0].terminated).toBe(false);
    workers[0].answer(workers[0].received[0]);
    workers[0].answer(workers[0].received[1]);
    expect(outcomes).toHaveLength(1);
    expect(outcomes[0].ok && outcomes[0].project.supports[1].x).toBe(24);
  });

  it('does not take a worker it ended itself for a silent death', () => {
    const { client, workers } = setup();
    client.solve(spanOf(22));
    workers[0].announce('solver-c');
    workers[0].die('crash'); // the client terminates it (releasing its lock) and starts another
    expect(workers).toHaveLength(2);
    expect(workers[1].received).toHaveLength(1);
  });

  it('notices an idle worker that ended and starts a fresh one for the next change', () => {
    const { client, workers, outcomes } = setup();
    client.solve(spanOf(22));
    workers[0].announce('solver-d');
    workers[0].answer(workers[0].received[0]);
    workers[0].endSilently();
    expect(workers).toHaveLength(1); // nothing to send: no new worker yet
    client.solve(spanOf(25));
    expect(workers).toHaveLength(2);
    workers[1].answer(workers[1].received[0]);
    expect(outcomes.at(-1)?.ok && outcomes.at(-1)?.project.supports[1].x).toBe(25);
  });
});
