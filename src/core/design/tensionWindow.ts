/**
 * The tension window of a project (contract: `window {low, high, empty, advice}`): the range of
 * installation horizontal tension (N) in which every case passes every check, each end with the
 * case and check that set it, and advice in words (windowAdvice.ts).
 */
import type { Project } from '../project.ts';
import { buildProjectModel } from '../projectModel.ts';
import { solveProject } from '../solveProject.ts';
import { type AdviceFact, adviceWords, windowAdviceFacts } from './windowAdvice.ts';
import { findWindowEnds, type WindowEnd } from './windowEnds.ts';

export type { WindowEnd } from './windowEnds.ts';

export interface TensionWindow {
  low: WindowEnd | null;
  high: WindowEnd | null;
  empty: boolean;
  advice: string[];
}

/**
 * The mesh refinement solveProject settles on for this project (it refines until the estimated
 * discretisation error is below its target), so the design aids solve on the same mesh.
 */
export function meshRefinement(project: Project): number {
  return solveProject(project).mesh.refinement;
}

/** The tension window on the mesh of `refinement` (default: the one solveProject uses). */
export function tensionWindow(
  project: Project,
  refinement = meshRefinement(project),
): TensionWindow {
  return tensionWindowWithFacts(project, refinement).window;
}

/**
 * The window and its advice as numbers (windowAdvice.ts), so a reader can word the advice in
 * its own units; `window.advice` is the same advice in SI words.
 */
export function tensionWindowWithFacts(
  project: Project,
  refinement = meshRefinement(project),
): { window: TensionWindow; adviceFacts: AdviceFact[] } {
  const model = buildProjectModel(project, refinement);
  const ends = findWindowEnds(model);
  const adviceFacts = windowAdviceFacts(model, ends, refinement);
  return {
    window: {
      low: ends.low,
      high: ends.high,
      empty: ends.empty,
      advice: adviceWords(project, adviceFacts),
    },
    adviceFacts,
  };
}
