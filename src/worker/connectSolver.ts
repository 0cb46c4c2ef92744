/**
 * Wires the document store to the solver worker and the results store: every new document is
 * sent; the newest reply lands in the results store; a failure keeps the last good results.
 */
import { useProjectStore } from '../state/projectStore.ts';
import { useResultsStore } from '../state/resultsStore.ts';
import { EDIT_MARK, markRevision, RESULT_MARK } from '../state/revision.ts';
import type { WorkerLike } from './protocol.ts';
import { type SolveOutcome, SolverClient } from './solverClient.ts';

function createSolverWorker(): WorkerLike {
  return new Worker(new URL('./solver.worker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as WorkerLike;
}

function applyOutcome(outcome: SolveOutcome): void {
  const current = useProjectStore.getState().project;
  if (outcome.ok) {
    markRevision(RESULT_MARK, outcome.project);
    useResultsStore.setState({
      results: outcome.results,
      resultsProject: outcome.project,
      stale: outcome.project !== current,
      error: null,
      errorCause: null,
    });
  } else {
    useResultsStore.setState({ stale: true, error: outcome.message, errorCause: outcome.cause });
  }
}

/** Starts solving the current document and every later one; returns a stop function. */
export function connectSolver(createWorker: () => WorkerLike = createSolverWorker): () => void {
  const client = new SolverClient({ createWorker, onOutcome: applyOutcome });
  client.solve(useProjectStore.getState().project);
  const unsubscribe = useProjectStore.subscribe((state, previous) => {
    if (state.project === previous.project) return;
    markRevision(EDIT_MARK, state.project);
    useResultsStore.setState({ stale: true });
    client.solve(state.project);
  });
  return () => {
    unsubscribe();
    client.dispose();
  };
}
