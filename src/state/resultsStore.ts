/**
 * Results derived from the document by the solver worker. The last good results stay while
 * a newer document is being solved or cannot be solved; `stale` says they no longer match it.
 */
import { create } from 'zustand';
import type { Project, ProjectResults } from '../core/index.ts';

export interface ResultsState {
  results: ProjectResults | null;
  /** The document the results were solved from. */
  resultsProject: Project | null;
  /** True while the shown results are not those of the current document. */
  stale: boolean;
  /** Why the current document could not be solved, or null. */
  error: string | null;
  /** Whose the error is: the design's (cannot be solved) or the solver's (could not run). */
  errorCause: 'design' | 'solver' | null;
}

export function createResultsStore() {
  return create<ResultsState>()(() => ({
    results: null,
    resultsProject: null,
    stale: true,
    error: null,
    errorCause: null,
  }));
}

export type ResultsStore = ReturnType<typeof createResultsStore>;

export const useResultsStore: ResultsStore = createResultsStore();
