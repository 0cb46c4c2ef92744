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

/** The part of a Worker the client uses, so tests can supply a stand-in. */
export interface WorkerLike {
  postMessage(message: SolveRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror?: ((event: MessageEvent) => void) | null;
}
