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
}

const LOAD_TOLERANCE = 1e-12;
/** Newton is quadratic: a relative step below 1e-7 leaves an error of order 1e-14. */
const NEWTON_SETTLED = 1e-7;
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
 * Tensions of a section whose unstressed length at this temperature is L₀ (m).
 * Fast path: one Newton step on H₁ per shape solve, the catenary loads updated in the same pass
 * (parabolic theory: the shape is solved once). Steps are kept within a factor 4 of H₁. If that
 * joint iteration has not settled, the nested, bracketed method below takes over.
 */
export function solveSectionForLength(
  spans: readonly SpanModel[],
  wire: WireLoading,
  unstressedLengthM: number,
  tensionGuessN: number,
  joints: readonly JointKind[] = equalHorizontalJoints(spans.length),
): SectionSolution {
  const exact = wire.theory === 'exact';
  const now = createSpanTensions(spans.length);
  const next = createSpanTensions(spans.length);
  const shift = new Float64Array(spans.length);
  updateLoads(spans, wire);
  solveShapes(spans);
  let H = tensionGuessN > 0 && Number.isFinite(tensionGuessN) ? tensionGuessN : 1;
  for (let k = 1; k <= JOINT_ITERATIONS; k++) {
    if (!spanTensions(spans, joints, H, now)) {
      // Below the tension every pulley needs: the wire is slack there, so pull harder.
      H *= 4;
      continue;
    }
    const r = sectionUnstressedLength(spans, now, wire.axialStiffness, exact);
    const mismatch = r.value - unstressedLengthM;
    let step = k === 1 ? slackModelStep(spans, now, wire.axialStiffness, mismatch) : Number.NaN;
    if (!(step > 0)) step = H - mismatch / r.slope;
    if (!(step > H / 4)) step = H / 4;
    if (step > 4 * H) step = 4 * H;
    const change = Math.abs(step - H) / H;
    let loadChange = 0;
    if (exact) {
      // Loads for the new tensions: the stored element lengths moved to Hⱼ,next to first order.
      const balanced = spanTensions(spans, joints, step, next);
      for (let j = 0; j < spans.length; j++)
        shift[j] = balanced ? next.tensionN[j] - now.tensionN[j] : 0;
      loadChange = updateLoads(spans, wire, shift);
    }
    H = step;
    if (exact) solveShapes(spans);
    if (change < NEWTON_SETTLED && loadChange < LOAD_TOLERANCE) {
      return solution(spans, joints, H, k, true);
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
  const tensions: SpanTensions = createSpanTensions(spans.length);
  updateLoads(spans, wire);
  let iterations = 0;
  for (let outer = 0; outer < MAX_LOAD_ITERATIONS; outer++) {
    solveShapes(spans);
    iterations++;
    if (!spanTensions(spans, joints, tensionN, tensions)) break;
    sectionUnstressedLength(spans, tensions, wire.axialStiffness, true);
    if (wire.theory === 'parabolic' || updateLoads(spans, wire) < LOAD_TOLERANCE) {
      if (wire.theory !== 'parabolic') solveShapes(spans);
      return solution(spans, joints, tensionN, iterations, true);
    }
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
