/** Starts the solver worker script (bundled by Vite as a module worker). */
import type { WorkerLike } from './protocol.ts';

export function createSolverWorker(): WorkerLike {
  return new Worker(new URL('./solver.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as WorkerLike;
}

/** Starts the design-aids worker (the same code under its own script name). */
export function createDesignWorker(): WorkerLike {
  return new Worker(new URL('./design.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as WorkerLike;
}
