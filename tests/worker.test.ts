/**
 * The solver worker protocol without a browser: a stand-in worker that answers when told,
 * so the order of replies can be controlled. Solved numbers come from the real core.
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject } from '../src/core/index.ts';
import { demoProject } from '../src/state/demoProject.ts';
import { FIRST_SOLVE_HERE_ELEMENTS, solveFirstHere } from '../src/worker/solveRequest.ts';
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

describe('the page answering its first, small document itself', () => {
  const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

  it('answers the small demo without a worker, after the call returns, with the core numbers', async () => {
    const { client, workers, outcomes } = setup({ firstHere: solveFirstHere });
    client.solve(demoProject);
    expect(outcomes).toHaveLength(0); // nothing delivered inside solve()
    await tick();
    expect(workers).toHaveLength(0);
    expect(outcomes).toHaveLength(1);
    const outcome = outcomes[0];
    expect(outcome.ok && outcome.results).toEqual(solveProject(demoProject));
  });

  it('sends the next document to a worker, and one typed before the answer replaces it', async () => {
    const { client, workers, outcomes } = setup({ firstHere: solveFirstHere });
    client.solve(demoProject);
    const edited = spanOf(24);
    client.solve(edited); // while the page's answer is still on its way
    await tick();
    expect(outcomes).toHaveLength(0); // the page's answer is for a superseded document
    expect(client.dropped).toBe(1);
    expect(workers).toHaveLength(1);
    expect(workers[0].received.map((r) => r.project)).toEqual([edited]);
    workers[0].answer(workers[0].received[0]);
    expect(outcomes).toHaveLength(1);
    expect(outcomes[0].ok && outcomes[0].project).toBe(edited);
  });

  it('leaves a large document, or one that asks for the design aids, to the worker', async () => {
    const large: Project = {
      ...demoProject,
      model: { ...demoProject.model, elementsPerSpan: FIRST_SOLVE_HERE_ELEMENTS + 1 },
    };
    expect(solveFirstHere({ id: 1, project: large })).toBeNull();
    expect(
      solveFirstHere({ id: 1, project: demoProject, design: { temperatureNow: null } }),
    ).toBeNull();
    const { client, workers, outcomes } = setup({ firstHere: solveFirstHere });
    client.solve(large);
    await tick();
    expect(outcomes).toHaveLength(0);
    expect(workers[0].received.map((r) => r.project)).toEqual([large]);
  });

  it('refuses an invalid first document with the field named, as the worker would', () => {
    const bad = { ...demoProject, limits: { ...demoProject.limits, safetyFactor: -1 } };
    const reply = solveFirstHere({ id: 7, project: bad });
    expect(reply?.ok).toBe(false);
    expect(reply && !reply.ok && reply.message).toContain('limits.safetyFactor');
  });

  it('starts the worker when told, ready for the first edit', async () => {
    let go: () => void = () => {};
    const startWorkerAfter = new Promise<void>((resolve) => {
      go = resolve;
    });
    const { workers } = setup({ firstHere: solveFirstHere, startWorkerAfter });
    await tick();
    expect(workers).toHaveLength(0);
    go();
    await tick();
    expect(workers).toHaveLength(1);
  });
});
