/**
 * Discretisation error estimate: the project is solved again on a nested mesh with every element
 * split in two (always a different mesh) at the same installation tension, each state started
 * from the same state's element lengths on the coarser mesh (its catenary loads), and for each case
 * e ≈ max over f ∈ {H, T_max, sag} of |f_h − f_{h/2}| / |f_{h/2}| · 2²/(2² − 1)
 * (Richardson, order 2: the error of the coarser, reported mesh). Relative, dimensionless.
 */
import { largestSag, largestStateTension } from './caseChecks.ts';
import { loadStateOfCase } from './loads.ts';
import { buildProjectModel, type ProjectModel } from './projectModel.ts';
import type { SpanModel } from './spanModel.ts';
import { type StateSolution, solveChangeOfState, solveInstallation } from './states.ts';

/** The relative error the automatic refinement aims below. */
export const ERROR_TARGET = 1e-4;
/** Convergence order of the string FE quantities (tests confirm 2 for the exact theory). */
const ORDER = 2;
const RICHARDSON = 2 ** ORDER / (2 ** ORDER - 1);

/** One span's element lengths in a solved state (see SpanModel): the nested mesh's warm start. */
export interface SpanLengths {
  tensionN: number;
  unstressed: Float64Array;
  unstressedSlope: Float64Array;
  arc: Float64Array | null;
  arcSlope: Float64Array | null;
}

export interface StateSummary {
  horizontalTension: number;
  /** Each span's horizontal tension, N: the refined mesh's starting values. */
  spanTensions: number[];
  maxTension: number;
  sag: number;
  /** Each span's element lengths in this state, when kept (solveProject keeps them). */
  lengths?: SpanLengths[];
}

/** Each span's element lengths as they are now (copied): a later solve's warm start. */
export function spanLengths(spans: readonly SpanModel[]): SpanLengths[] {
  return spans.map((span) => ({
    tensionN: span.storedTensionN,
    unstressed: span.unstressedElement.slice(),
    unstressedSlope: span.unstressedElementSlope.slice(),
    arc: span.hungAlong ? span.arcElement.slice() : null,
    arcSlope: span.hungAlong ? span.arcElementSlope.slice() : null,
  }));
}

/** A state's summary; with `keepLengths`, also its spans' element lengths (copied). */
export function summarise(state: StateSolution, keepLengths = false): StateSummary {
  return {
    horizontalTension: Math.max(...state.spans.map((s) => s.tensionN)),
    spanTensions: state.spans.map((s) => s.tensionN),
    maxTension: largestStateTension(state.spans),
    sag: largestSag(state.spans),
    ...(keepLengths ? { lengths: spanLengths(state.spans.map((s) => s.span)) } : {}),
  };
}

/**
 * Start the spans of a mesh (every element split in `split`, 1 for the same mesh) from a state's
 * element lengths on the coarser one: each piece takes its share. Only the catenary loads' starting values change, so the
 * state solved afterwards is the same; it is reached in fewer iterations.
 */
export function seedLengths(model: ProjectModel, lengths: readonly SpanLengths[], split: number) {
  model.spans.forEach((span, j) => {
    const coarse = lengths[j];
    if (!coarse || span.elementLength.length !== split * coarse.unstressed.length) return;
    const share = 1 / split;
    for (let e = 0; e < span.elementLength.length; e++) {
      const c = Math.floor(e / split);
      span.unstressedElement[e] = coarse.unstressed[c] * share;
      span.unstressedElementSlope[e] = coarse.unstressedSlope[c] * share;
      if (coarse.arc && coarse.arcSlope) {
        span.arcElement[e] = coarse.arc[c] * share;
        span.arcElementSlope[e] = coarse.arcSlope[c] * share;
      }
    }
    span.storedTensionN = coarse.tensionN;
  });
}

/** Every state of a model at installation tension H, summarised; in case order. */
export function summariseStates(
  model: ProjectModel,
  tensionN: number,
  caseTensionGuesses: readonly (readonly number[])[],
  coarse: readonly StateSummary[] = [],
): StateSummary[] {
  const seed = (i: number) => {
    const lengths = coarse[i]?.lengths;
    if (lengths) seedLengths(model, lengths, 2);
  };
  seed(0);
  const installed = solveInstallation(model, tensionN);
  const installedTensions = installed.spans.map((s) => s.tensionN);
  const out = [summarise(installed)];
  for (const [i, weather] of model.project.cases.entries()) {
    seed(i + 1);
    const state = solveChangeOfState(
      model,
      { ...loadStateOfCase(weather), name: weather.name },
      installed.unstressed,
      caseTensionGuesses[i] ?? installedTensions,
    );
    out.push(summarise(state));
  }
  return out;
}

function relative(coarse: number, fine: number): number {
  const scale = Math.max(Math.abs(fine), 1e-300);
  return Math.abs(coarse - fine) / scale;
}

/** Estimated relative error of `coarse` given the same quantities on the nested finer mesh. */
export function estimatedError(coarse: StateSummary, fine: StateSummary): number {
  const change = Math.max(
    relative(coarse.horizontalTension, fine.horizontalTension),
    relative(coarse.maxTension, fine.maxTension),
    relative(coarse.sag, fine.sag),
  );
  // A change that cannot be measured (an unsolved state) is reported as 100 %, never NaN.
  return Number.isFinite(change) ? RICHARDSON * change : 1;
}

/**
 * Estimates for results solved on the mesh `refinement` of the project at installation tension H:
 * one number per state (installation first), from the nested mesh 2 · refinement.
 */
export function estimateErrors(
  model: ProjectModel,
  refinement: number,
  tensionN: number,
  results: readonly StateSummary[],
): number[] {
  const fine = buildProjectModel(model.project, 2 * refinement);
  const guesses = results.slice(1).map((r) => r.spanTensions);
  const refined = summariseStates(fine, tensionN, guesses, results);
  return results.map((r, i) => estimatedError(r, refined[i]));
}
