/**
 * The solver worker: validates and solves each document it is sent and replies with the
 * request's id, so the main thread can drop replies to requests it no longer wants.
 */
import { answerDesign } from './designAnswers.ts';
import type { SolveRequest, WorkerMessage } from './protocol.ts';
import { solveRequest } from './solveRequest.ts';

const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(message: WorkerMessage): void;
  navigator?: { locks?: { request(name: string, callback: () => Promise<void>): unknown } };
};

scope.onmessage = (event) => scope.postMessage(solveRequest(event.data, answerDesign));

// Held until this worker ends: its release is the main thread's signal that the worker is gone.
const locks = scope.navigator?.locks;
if (locks) {
  const lock = `sagwright-solver-${Date.now()}-${Math.random().toString(36).slice(2)}`;
  locks.request(lock, () => {
    scope.postMessage({ alive: true, lock });
    return new Promise<void>(() => {});
  });
}
