/**
 * Document → solver → results: every new document is sent to the solver client; the newest
 * reply lands in the results store; a failure keeps the last good results, marked out of date.
 */
import type { SolveOutcome, SolverClient } from '../worker/solverClient.ts';
import type { ProjectStore } from './projectStore.ts';
import type { ResultsStore } from './resultsStore.ts';
import { EDIT_MARK, markRevision, RESULT_MARK } from './revision.ts';

export type SolverPort = Pick<SolverClient, 'solve' | 'dispose'>;

export function applyOutcome(
  outcome: SolveOutcome,
  store: ProjectStore,
  results: ResultsStore,
): void {
  const current = store.getState().project;
  if (outcome.ok) {
    markRevision(RESULT_MARK, outcome.project);
    results.setState({
      results: outcome.results,
      resultsProject: outcome.project,
      stale: outcome.project !== current,
      error: null,
      errorCause: null,
    });
  } else {
    results.setState({ stale: true, error: outcome.message, errorCause: outcome.cause });
  }
}

/** Sends the current document and every later one to `solver`; returns a stop function. */
export function linkSolver(store: ProjectStore, results: ResultsStore, solver: SolverPort) {
  solver.solve(store.getState().project);
  const unsubscribe = store.subscribe((state, previous) => {
    if (state.project === previous.project) return;
    markRevision(EDIT_MARK, state.project);
    results.setState({ stale: true });
    solver.solve(state.project);
  });
  return () => {
    unsubscribe();
    solver.dispose();
  };
}
