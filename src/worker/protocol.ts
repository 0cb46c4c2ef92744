/**
 * Messages between the main thread and the solver worker: a request carries an id and the
 * document; the reply carries the same id and either the results or the reason for failure.
 */
import type { AsBuiltMeasurement, Project, ProjectResults } from '../core/index.ts';

export interface SolveRequest {
  id: number;
  project: Project;
  /** A site measurement: the reply's results then carry `asBuilt`. */
  asBuilt?: AsBuiltMeasurement;
}

export type SolveReply =
  | { id: number; ok: true; results: ProjectResults }
  | { id: number; ok: false; message: string };

/** The part of a Worker the client uses, so tests can supply a stand-in. */
export interface WorkerLike {
  postMessage(message: SolveRequest): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror?: ((event: MessageEvent) => void) | null;
}
