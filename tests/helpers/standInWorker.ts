/**
 * A stand-in for the solver worker, for tests of the worker protocol without a browser: it
 * records requests and answers, refuses, dies or fails to load only when told, so the order of
 * events is the test's to choose. Answers come from the real core.
 */
import { solveProject } from '../../src/core/index.ts';
import type { SolveReply, SolveRequest, WorkerLike } from '../../src/worker/protocol.ts';
import { type SolveOutcome, SolverClient } from '../../src/worker/solverClient.ts';

export class StandInWorker implements WorkerLike {
  received: SolveRequest[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: SolveRequest): void {
    this.received.push(message);
  }
  terminate(): void {
    this.terminated = true;
  }
  answer(request: SolveRequest): void {
    const reply: SolveReply = { id: request.id, ok: true, results: solveProject(request.project) };
    this.onmessage?.({ data: reply } as MessageEvent<SolveReply>);
  }
  /** The newest request refused with a message, as the worker does for an unsolvable design. */
  refuse(message: string): void {
    const id = this.received[this.received.length - 1].id;
    this.onmessage?.({ data: { id, ok: false, message } } as MessageEvent<SolveReply>);
  }
  die(message: string): void {
    this.onerror?.({ message, preventDefault() {} } as ErrorEvent);
  }
  /** A script that fails to load gives a bare Event with no message. */
  failToLoad(): void {
    this.onerror?.({ preventDefault() {} } as ErrorEvent);
  }
}

/** A SolverClient on stand-in workers, with every worker it made and every outcome it gave. */
export function standInClient() {
  const workers: StandInWorker[] = [];
  const outcomes: SolveOutcome[] = [];
  const client = new SolverClient({
    createWorker: () => {
      const worker = new StandInWorker();
      workers.push(worker);
      return worker;
    },
    onOutcome: (outcome) => outcomes.push(outcome),
    watchdogMs: 60_000,
  });
  return { client, workers, outcomes };
}
