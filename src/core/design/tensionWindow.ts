/**
 * The tension window of a project (contract: `window {low, high, empty, advice}`): the range of
 * installation horizontal tension (N) in which every case passes every check, each end with the
 * case and check that set it, and advice in words (windowAdvice.ts).
 */
import type { Project } from '../project.ts';
import { buildProjectModel } from '../projectModel.ts';
import { windowAdvice } from './windowAdvice.ts';
import { findWindowEnds, type WindowEnd } from './windowEnds.ts';

export type { WindowEnd } from './windowEnds.ts';

export interface TensionWindow {
  low: WindowEnd | null;
  high: WindowEnd | null;
  empty: boolean;
  advice: string[];
}

export function tensionWindow(project: Project): TensionWindow {
  const model = buildProjectModel(project);
  const ends = findWindowEnds(model);
  return { low: ends.low, high: ends.high, empty: ends.empty, advice: windowAdvice(model, ends) };
}
