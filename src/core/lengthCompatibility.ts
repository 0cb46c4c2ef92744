/**
 * Tension from length compatibility. A section is one or more spans whose wire can pass from one
 * to the next (over pulleys or swing links); its span tensions Hⱼ follow from the first span's
 * H₁ through the joints (sectionTensions.ts), and H₁ is the root of
 *   L₀(H₁) − L₀,section (1 + α Δt) = 0,  L₀(H₁) = Σ ∫ √(1 + z'² + y'²) / (1 + T/EA) dx,
 * found by Newton (bounded steps, then a bracketed fallback). The exact theory also iterates the
 * load q = w ds₀/dx (weight per unstressed metre of wire) to a fixed point.
 */

import { newtonBracketed } from './rootFind.ts';
import {
  sectionUnstressedLength,
  slackModelStep,
  solveShapes,
  updateLoads,
  type WireLoading,
} from './sectionLength.ts';
import {
  createSpanTensions,
  type JointKind,
  type SpanTensions,
  spanTensions,
} from './sectionTensions.ts';
import type { SpanModel } from './spanModel.ts';

export type { WireLoading } from './sectionLength.ts';
export type { JointKind } from './sectionTensions.ts';

export interface SectionSolution {
  /** Horizontal tension of the section's first span, N. */
  tensionN: number;
  /** Horizontal tension of each span of the section, N. */
  spanTensionsN: number[];
  iterations: number;
  converged: boolean;
  reason?: string;
  /** dL₀/dH₁ (m/N) at the last length evaluation, shape held fixed (fast path only). */
  lengthSlope?: number;
}

const LOAD_TOLERANCE = 1e-12;
/** Below this last change the remaining change is estimated from the contraction … */
const LOAD_ESTIMATE_BELOW = 1e-6;
/** … and must be below this (a hundredth of LOAD_TOLERANCE). */
const LOAD_REMAINING = 1e-14;
/** A settled load change below this leaves the shape as it is (relative change of the loads). */
const SHAPE_UNCHANGED = 1e-13;
/** Newton is quadratic: a relative step below 1e-7 leaves an error of order 1e-14. */
const NEWTON_SETTLED = 1e-7;
/** A first Newton step shorter than this (relative) is taken as it is, not the model's. */
const SLACK_MODEL_BELOW = 1e-3;
const JOINT_ITERATIONS = 40;
const MAX_LOAD_ITERATIONS = 100;

/** Every joint keeps H equal (one span, clamped at installation, swing links). */
export function equalHorizontalJoints(spanCount: number): JointKind[] {
  return Array.from({ length: Math.max(0, spanCount - 1) }, () => 'horizontal' as const);
}

function solution(
  spans: readonly SpanModel[],
  joints: readonly JointKind[],
  tensionN: number,
  iterations: number,
  converged: boolean,
  reason?: string,
): SectionSolution {
  const t = createSpanTensions(spans.length);
  const balanced = spanTensions(spans, joints, tensionN, t);
  const ok = converged && balanced;
  return {
    tensionN,
    spanTensionsN: Array.from(t.tensionN),
    iterations,
    converged: ok,
    ...(ok
      ? {}
      : {
          reason: balanced
            ? (reason ?? 'tension did not converge')
            : 'a pulley cannot be balanced at this tension',
        }),
  };
}

/**
 * The catenary load iteration has settled when its last change is below LOAD_TOLERANCE, or when
 * the change still to come is: the iteration contracts linearly, so after a change Δₖ (ratio
 * ρ = Δₖ/Δₖ₋₁ to the one before) about ρ Δₖ / (1 − ρ) remains.
 */
function loadsSettled(change: number, previous: number): boolean {
  if (change < LOAD_TOLERANCE) return true;
  if (!(change < LOAD_ESTIMATE_BELOW) || !(previous > 0 && previous < Number.POSITIVE_INFINITY))
    return false;
  const ratio = change / previous;
  return ratio < 0.1 && (ratio * change) / (1 - ratio) < LOAD_REMAINING;
}

/**
 * Each span's horizontal tension for a first-span tension H₁ (N) before the joints are known:
 * the ratios of the last stored state kept (all H₁ when there is none). The loads' warm start.
 */
export function predictedTensions(spans: readonly SpanModel[], firstTensionN: number): number[] {
  const first = spans[0]?.storedTensionN;
  return spans.map((span) =>
    Number.isFinite(first) && Number.isFinite(span.storedTensionN) && first > 0
      ? (span.storedTensionN * firstTensionN) / first
      : firstTensionN,
  );
}

/**
 * The exact theory's next loads at the span tensions given (moved there from the element lengths
 * last stored), and the shapes they give, unless the loads have settled with a change too small
 * to move the shape (then the shape of the loads before stays: it differs by less than that).
 */
function nextLoads(
  spans: readonly SpanModel[],
  wire: WireLoading,
  tensionsN: ArrayLike<number>,
  previousChange: number,
  tensionSettled: boolean,
): { change: number; settled: boolean } {
  const change = updateLoads(spans, wire, tensionsN, true);
  const settled = loadsSettled(change, previousChange);
  if (!(tensionSettled && settled && change < SHAPE_UNCHANGED)) solveShapes(spans, true);
  return { change, settled };
}

/**
 * Tensions of a section whose unstressed length at this temperature is L₀ (m).
 * Fast path: one Newton step on H₁ per shape solve, the catenary loads updated in the same pass
 * to the new tensions (to first order in H, from the element lengths just evaluated; parabolic
 * theory: the shape is solved once). Steps are kept within a factor 4 of H₁. If that joint
 * iteration has not settled, the nested, bracketed method below takes over. The solution's
 * lengthSlope is dL₀/dH₁ at the last evaluation (a neighbouring state's Newton predictor).
 */
export function solveSectionForLength(
  spans: readonly SpanModel[],
  wire: WireLoading,
  unstressedLengthM: number,
  tensionGuessN: number,
  joints: readonly JointKind[] = equalHorizontalJoints(spans.length),
  keepShape = false,
): SectionSolution {
  const exact = wire.theory === 'exact';
  const now = createSpanTensions(spans.length);
  const next = createSpanTensions(spans.length);
  let H = tensionGuessN > 0 && Number.isFinite(tensionGuessN) ? tensionGuessN : 1;
  // `keepShape`: the spans hold a neighbouring state with the same loads but the temperature
  // (a set-up row): its shape and loads are the first step's, the first update corrects them.
  if (!(keepShape && exact)) {
    updateLoads(spans, wire, exact ? predictedTensions(spans, H) : undefined, true);
    solveShapes(spans, true);
  }
  let previousLoadChange = Number.POSITIVE_INFINITY;
  let lengthSlope = Number.NaN;
  for (let k = 1; k <= JOINT_ITERATIONS; k++) {
    if (!spanTensions(spans, joints, H, now)) {
      // Below the tension every pulley needs: the wire is slack there, so pull harder.
      H *= 4;
      continue;
    }
    const r = sectionUnstressedLength(spans, now, wire.axialStiffness, exact);
    lengthSlope = r.slope;
    const mismatch = r.value - unstressedLengthM;
    // A long first step comes from the small-slope model (far better than a tangent when the
    // state changed a lot); otherwise, and always after it, Newton. Only a Newton step can
    // show convergence: its error is of the order of its square.
    let step = H - mismatch / r.slope;
    let newton = true;
    if (k === 1 && !(Math.abs(step - H) < SLACK_MODEL_BELOW * H)) {
      const model = slackModelStep(spans, now, wire.axialStiffness, mismatch);
      if (model > 0) {
        step = model;
        newton = false;
      }
    }
    if (!(step > H / 4)) step = H / 4;
    if (step > 4 * H) step = 4 * H;
    const change = newton ? Math.abs(step - H) / H : Number.POSITIVE_INFINITY;
    let settled = true;
    if (exact) {
      // Loads for the new tensions: the element lengths just stored, moved to Hⱼ,next.
      const balanced = spanTensions(spans, joints, step, next);
      const tensions = balanced ? next.tensionN : now.tensionN;
      const loads = nextLoads(spans, wire, tensions, previousLoadChange, change < NEWTON_SETTLED);
      settled = loads.settled;
      previousLoadChange = loads.change;
    }
    H = step;
    if (change < NEWTON_SETTLED && settled) {
      return { ...solution(spans, joints, H, k, true), lengthSlope };
    }
  }
  const nested = solveSectionNested(spans, joints, wire, unstressedLengthM, H);
  return { ...nested, iterations: nested.iterations + JOINT_ITERATIONS };
}

/** The robust method: a full bracketed root in H₁ for each catenary load update. */
function solveSectionNested(
  spans: readonly SpanModel[],
  joints: readonly JointKind[],
  wire: WireLoading,
  unstressedLengthM: number,
  tensionGuessN: number,
): SectionSolution {
  const tensions = createSpanTensions(spans.length);
  // Below the tension every pulley needs, the section is slack: a positive mismatch (+L₀).
  const lengthAt = (h: number, store: boolean) =>
    spanTensions(spans, joints, h, tensions)
      ? sectionUnstressedLength(spans, tensions, wire.axialStiffness, store)
      : { value: 2 * unstressedLengthM, slope: Number.NaN };
  updateLoads(spans, wire);
  let H = tensionGuessN;
  let iterations = 0;
  for (let outer = 0; outer < MAX_LOAD_ITERATIONS; outer++) {
    solveShapes(spans);
    const root = newtonBracketed((h) => {
      const r = lengthAt(h, false);
      return { value: r.value - unstressedLengthM, slope: r.slope };
    }, H);
    iterations += root.evaluations;
    H = root.x;
    if (!root.converged)
      return solution(spans, joints, H, iterations, false, 'tension did not converge');
    lengthAt(H, true);
    if (wire.theory === 'parabolic') return solution(spans, joints, H, iterations, true);
    if (updateLoads(spans, wire) < LOAD_TOLERANCE) {
      solveShapes(spans);
      return solution(spans, joints, H, iterations, true);
    }
  }
  return solution(spans, joints, H, iterations, false, 'catenary load iteration did not converge');
}

/** Shape of the spans with the first span pulled to H₁ (installation, set-up). */
export function solveSectionAtTension(
  spans: readonly SpanModel[],
  wire: WireLoading,
  tensionN: number,
  joints: readonly JointKind[] = equalHorizontalJoints(spans.length),
): SectionSolution {
  const exact = wire.theory === 'exact';
  const tensions: SpanTensions = createSpanTensions(spans.length);
  updateLoads(spans, wire, exact ? predictedTensions(spans, tensionN) : undefined, true);
  solveShapes(spans, true);
  let iterations = 0;
  let previous = Number.POSITIVE_INFINITY;
  for (let outer = 0; outer < MAX_LOAD_ITERATIONS; outer++) {
    iterations++;
    if (!spanTensions(spans, joints, tensionN, tensions)) break;
    sectionUnstressedLength(spans, tensions, wire.axialStiffness, true);
    if (!exact) return solution(spans, joints, tensionN, iterations, true);
    const loads = nextLoads(spans, wire, tensions.tensionN, previous, true);
    if (loads.settled) return solution(spans, joints, tensionN, iterations, true);
    previous = loads.change;
  }
  return solution(
    spans,
    joints,
    tensionN,
    iterations,
    false,
    'catenary load iteration did not converge',
  );
}
