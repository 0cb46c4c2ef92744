/**
 * Messages between the main thread and the solver worker: a request carries an id and the
 * document; the reply carries the same id and either the results or the reason for failure.
 * A request that asks for `design` also gets the design aids (tension window, wire chooser,
 * today's setting) computed from the same document.
 */
import type { Project, ProjectResults } from '../core/index.ts';
import type { DesignAnswers, DesignQuestion } from './designAnswers.ts';

export interface SolveRequest {
  id: number;
  project: Project;
  design?: DesignQuestion;
}

export type SolveReply =
  | { id: number; ok: true; results: ProjectResults; design?: DesignAnswers }
  | { id: number; ok: false; message: string };

/**
 * Sent once by a worker that holds a Web Lock named `lock` for as long as it lives: the browser
 * releases the lock the moment the worker ends, however it ends, so the main thread learns of a
 * silent death at once while a worker busy with a long solve keeps its lock.
 */
export interface AliveNotice {
  alive: true;
  lock: string;
}

export type WorkerMessage = SolveReply | AliveNotice;

/** The part of navigator.locks the client needs: called back once the lock is free. */
export interface LockWaiter {
  request(name: string, callback: () => void): Promise<unknown>;
}

/** The part of a Worker the client uses, so tests can supply a stand-in. */
export interface WorkerLike {
  postMessage(message: SolveRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<WorkerMessage>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror?: ((event: MessageEvent) => void) | null;
}
