/**
 * A stand-in for the solver worker, for tests of the worker protocol without a browser: it
 * records requests and answers, refuses, dies or fails to load only when told, so the order of
 * events is the test's to choose. Answers come from the real core.
 */
import { solveProject } from '../../src/core/index.ts';
import type {
  LockWaiter,
  SolveReply,
  SolveRequest,
  WorkerLike,
  WorkerMessage,
} from '../../src/worker/protocol.ts';
import {
  type SolveOutcome,
  SolverClient,
  type SolverClientOptions,
} from '../../src/worker/solverClient.ts';

export class StandInWorker implements WorkerLike {
  received: SolveRequest[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<WorkerMessage>) => void) | null = null;
  /** The lock this worker holds while it lives, once it has announced it. */
  lock: string | undefined;
  constructor(private readonly locks?: StandInLocks) {}
  /** Take a lock and say so, as the real worker does on start. */
  announce(lock: string): void {
    this.lock = lock;
    this.locks?.hold(lock);
    this.onmessage?.({ data: { alive: true, lock } } as MessageEvent<WorkerMessage>);
  }
  /** End without an error event or a reply: only the released lock tells. */
  endSilently(): void {
    if (this.lock) this.locks?.release(this.lock);
  }
  onerror: ((event: ErrorEvent) => void) | null = null;
  postMessage(message: SolveRequest): void {
    this.received.push(message);
  }
  terminate(): void {
    this.terminated = true;
    this.endSilently();
  }
  answer(request: SolveRequest): void {
    const reply: SolveReply = { id: request.id, ok: true, results: solveProject(request.project) };
    this.onmessage?.({ data: reply } as MessageEvent<WorkerMessage>);
  }
  /** The newest request refused with a message, as the worker does for an unsolvable design. */
  refuse(message: string): void {
    const id = this.received[this.received.length - 1].id;
    this.onmessage?.({ data: { id, ok: false, message } } as MessageEvent<WorkerMessage>);
  }
  die(message: string): void {
    this.onerror?.({ message, preventDefault() {} } as ErrorEvent);
  }
  /** A script that fails to load gives a bare Event with no message. */
  failToLoad(): void {
    this.onerror?.({ preventDefault() {} } as ErrorEvent);
  }
}

/**
 * Web Locks as the browser keeps them, synchronously: a lock held by a worker is granted to a
 * waiter only when the worker releases it (by ending).
 */
export class StandInLocks implements LockWaiter {
  private held = new Set<string>();
  private waiting = new Map<string, (() => void)[]>();
  hold(name: string): void {
    this.held.add(name);
  }
  release(name: string): void {
    if (!this.held.delete(name)) return;
    for (const callback of this.waiting.get(name) ?? []) callback();
    this.waiting.delete(name);
  }
  request(name: string, callback: () => void): Promise<unknown> {
    if (!this.held.has(name)) callback();
    else this.waiting.set(name, [...(this.waiting.get(name) ?? []), callback]);
    return Promise.resolve();
  }
}

/**
 * A SolverClient on stand-in workers, with every worker it made and every outcome it gave;
 * `extra` adds options (the page's own first answer, a later worker start).
 */
export function standInClient(extra: Partial<SolverClientOptions> = {}) {
  const workers: StandInWorker[] = [];
  const outcomes: SolveOutcome[] = [];
  const locks = new StandInLocks();
  const client = new SolverClient({
    locks,
    createWorker: () => {
      const worker = new StandInWorker(locks);
      workers.push(worker);
      return worker;
    },
    onOutcome: (outcome) => outcomes.push(outcome),
    watchdogMs: 60_000,
    ...extra,
  });
  return { client, workers, outcomes, locks };
}
