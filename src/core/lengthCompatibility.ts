/**
 * Tension from length compatibility. For a trial horizontal tension H the spans of a section
 * (spans sharing one H: one span, or several over free saddles) have slopes z', y', tension
 * T = H √(1 + z'² + y'²) and unstressed length Σ ∫ √(1 + z'² + y'²) / (1 + T/EA) dx.
 * The root of (that length − L₀(1 + α Δt)) in H is found by bracketed Newton. The exact theory
 * also iterates the load q = w ds₀/dx (weight per unstressed metre of wire) to a fixed point.
 */

import type { Theory } from './project.ts';
import { newtonBracketed } from './rootFind.ts';
import { GAUSS2, type SpanModel, solveUnitShapes } from './spanModel.ts';

export interface WireLoading {
  theory: Theory;
  /** EA, N. */
  axialStiffness: number;
  /** Wire weight (with ice), N per unstressed metre at this state's temperature. */
  weightNPerM: number;
  /** Wind on the wire, N per unstressed metre. */
  windNPerM: number;
}

export interface SectionSolution {
  tensionN: number;
  iterations: number;
  converged: boolean;
  reason?: string;
}

const LOAD_TOLERANCE = 1e-12;
/** Newton is quadratic: a relative step below 1e-7 leaves an error of order 1e-14. */
const NEWTON_SETTLED = 1e-7;
const JOINT_ITERATIONS = 40;
const MAX_LOAD_ITERATIONS = 100;

/** Unstressed length of the section at H and its derivative dL₀/dH; optionally per element. */
export function unstressedLengthAt(
  spans: readonly SpanModel[],
  tensionN: number,
  axialStiffness: number,
  storeElements: boolean,
): { value: number; slope: number } {
  const H = tensionN;
  const invH2 = 1 / (H * H);
  let value = 0;
  let slope = 0;
  for (const span of spans) {
    const c = span.chordSlope;
    for (let e = 0; e < span.elementLength.length; e++) {
      const L = span.elementLength[e];
      const curvV = 0.5 * span.qVertical[e] * L * GAUSS2;
      const curvY = 0.5 * span.qLateral[e] * L * GAUSS2;
      let element = 0;
      let elementSlope = 0;
      let arc = 0;
      let arcSlope = 0;
      for (let g = -1; g <= 1; g += 2) {
        const av = span.slopeV1[e] - g * curvV;
        const ay = span.slopeY1[e] - g * curvY;
        const sz = c - av / H;
        const sy = ay / H;
        const r = Math.sqrt(1 + sz * sz + sy * sy);
        const stretch = 1 + (H * r) / axialStiffness;
        const f = r / stretch;
        const drdH = ((sz * av - sy * ay) * invH2) / r;
        const dTdH = r + H * drdH;
        element += f;
        elementSlope += (drdH - (f * dTdH) / axialStiffness) / stretch;
        arc += r;
        arcSlope += drdH;
      }
      element *= 0.5 * L;
      elementSlope *= 0.5 * L;
      if (storeElements) {
        span.unstressedElement[e] = element;
        span.unstressedElementSlope[e] = elementSlope;
        span.arcElement[e] = arc * 0.5 * L;
        span.arcElementSlope[e] = arcSlope * 0.5 * L;
      }
      value += element;
      slope += elementSlope;
    }
  }
  return { value, slope };
}

/**
 * Set element loads from the wire loading. The exact theory scales the wire's load by ds₀/dx and
 * the ice and wind on hung cables by ds/dx, both of the last solved state (a warm start across
 * states and trial tensions; before any state ds₀/dx = 1 and ds/dx = √(1 + c²)). The parabolic
 * theory keeps the wire's load per horizontal metre and turns the hung cables' ice and wind
 * into per horizontal metre with the chord's ds/dx = √(1 + c²).
 */
function updateLoads(spans: readonly SpanModel[], wire: WireLoading, tensionShiftN = 0): number {
  const useGeometry = wire.theory === 'exact';
  let change = 0;
  let scale = 0;
  for (const span of spans) {
    let lateral = false;
    for (const force of span.pointLateral) if (force !== 0) lateral = true;
    const chordArcRatio = Math.sqrt(1 + span.chordSlope * span.chordSlope);
    for (let e = 0; e < span.elementLength.length; e++) {
      const L = span.elementLength[e];
      const unstressed = span.unstressedElement[e] + span.unstressedElementSlope[e] * tensionShiftN;
      const ratio = useGeometry && unstressed > 0 ? unstressed / L : 1;
      const arc = span.arcElement[e] + span.arcElementSlope[e] * tensionShiftN;
      const arcRatio = useGeometry && arc > 0 ? arc / L : chordArcRatio;
      const q = wire.weightNPerM * ratio + span.hungVertical[e] + span.hungIceAlong[e] * arcRatio;
      const p = wire.windNPerM * ratio + span.hungWindAlong[e] * arcRatio;
      change = Math.max(change, Math.abs(q - span.qVertical[e]), Math.abs(p - span.qLateral[e]));
      scale = Math.max(scale, Math.abs(q), Math.abs(p));
      span.qVertical[e] = q;
      span.qLateral[e] = p;
      if (p !== 0) lateral = true;
    }
    span.lateralLoaded = lateral;
  }
  return scale > 0 ? change / scale : 0;
}

/**
 * A first step from the small-slope model of the section (the classic change-of-state form):
 * L₀(H) ≈ Σ l√(1 + c²) + P/H² − Q H with P = Σ ∫v₁'²/(2(1 + c²)^{3/2}) + ∫y₁'²/(2√(1 + c²)) and
 * Q = Σ l (1 + c²)/EA, shifted to match the exact mismatch at H; its root (Newton on a scalar
 * cubic) is a far better start than a tangent step when the state changed a lot.
 */
function slackModelStep(
  spans: readonly SpanModel[],
  axialStiffness: number,
  H: number,
  mismatch: number,
): number {
  let P = 0;
  let Q = 0;
  for (const span of spans) {
    const c2 = 1 + span.chordSlope * span.chordSlope;
    let dz = 0;
    let dy = 0;
    for (let e = 0; e < span.elementLength.length; e++) {
      const L = span.elementLength[e];
      const qL = span.qVertical[e] * L;
      const pL = span.qLateral[e] * L;
      dz += L * (span.slopeV1[e] * span.slopeV1[e] + (qL * qL) / 12);
      dy += L * (span.slopeY1[e] * span.slopeY1[e] + (pL * pL) / 12);
    }
    P += dz / (2 * c2 * Math.sqrt(c2)) + dy / (2 * Math.sqrt(c2));
    Q += ((span.x1 - span.x0) * c2) / axialStiffness;
  }
  // Model: F(h) = P/h² − Q h + K, with K chosen so that F(H) equals the exact mismatch.
  const K = mismatch - P / (H * H) + Q * H;
  let h = H;
  for (let i = 0; i < 60; i++) {
    const f = P / (h * h) - Q * h + K;
    const df = (-2 * P) / (h * h * h) - Q;
    let next = h - f / df;
    if (!(next > 0)) next = h / 2;
    if (Math.abs(next - h) <= 1e-15 * h) return next;
    h = next;
  }
  return h;
}

function solveShapes(spans: readonly SpanModel[]): void {
  for (const span of spans) solveUnitShapes(span);
}

/**
 * Horizontal tension of a section whose unstressed length at this temperature is L₀ (m).
 * Fast path: one Newton step on H per shape solve, the catenary loads updated in the same pass
 * (parabolic theory: the shape is solved once). Steps are kept within a factor 4 of H. If that
 * joint iteration has not settled, the nested, bracketed method below takes over.
 */
export function solveSectionForLength(
  spans: readonly SpanModel[],
  wire: WireLoading,
  unstressedLengthM: number,
  tensionGuessN: number,
): SectionSolution {
  const exact = wire.theory === 'exact';
  updateLoads(spans, wire);
  solveShapes(spans);
  let H = tensionGuessN > 0 && Number.isFinite(tensionGuessN) ? tensionGuessN : 1;
  for (let k = 1; k <= JOINT_ITERATIONS; k++) {
    const r = unstressedLengthAt(spans, H, wire.axialStiffness, exact);
    const mismatch = r.value - unstressedLengthM;
    let next = k === 1 ? slackModelStep(spans, wire.axialStiffness, H, mismatch) : Number.NaN;
    if (!(next > 0)) next = H - mismatch / r.slope;
    if (!(next > H / 4)) next = H / 4;
    if (next > 4 * H) next = 4 * H;
    const step = Math.abs(next - H) / H;
    // Loads for the new tension: the stored element lengths moved to H_next to first order.
    const loadChange = exact ? updateLoads(spans, wire, next - H) : 0;
    H = next;
    if (exact) solveShapes(spans);
    if (step < NEWTON_SETTLED && loadChange < LOAD_TOLERANCE) {
      return { tensionN: H, iterations: k, converged: true };
    }
  }
  const nested = solveSectionNested(spans, wire, unstressedLengthM, H);
  return { ...nested, iterations: nested.iterations + JOINT_ITERATIONS };
}

/** The robust method: a full bracketed root in H for each catenary load update. */
function solveSectionNested(
  spans: readonly SpanModel[],
  wire: WireLoading,
  unstressedLengthM: number,
  tensionGuessN: number,
): SectionSolution {
  updateLoads(spans, wire);
  let H = tensionGuessN;
  let iterations = 0;
  for (let outer = 0; outer < MAX_LOAD_ITERATIONS; outer++) {
    solveShapes(spans);
    const root = newtonBracketed((h) => {
      const r = unstressedLengthAt(spans, h, wire.axialStiffness, false);
      return { value: r.value - unstressedLengthM, slope: r.slope };
    }, H);
    iterations += root.evaluations;
    H = root.x;
    if (!root.converged)
      return { tensionN: H, iterations, converged: false, reason: 'tension did not converge' };
    unstressedLengthAt(spans, H, wire.axialStiffness, true);
    if (wire.theory === 'parabolic') return { tensionN: H, iterations, converged: true };
    if (updateLoads(spans, wire) < LOAD_TOLERANCE) {
      solveShapes(spans);
      return { tensionN: H, iterations, converged: true };
    }
  }
  return {
    tensionN: H,
    iterations,
    converged: false,
    reason: 'catenary load iteration did not converge',
  };
}

/** Shape of the spans at a given horizontal tension (installation pulled to H). */
export function solveSectionAtTension(
  spans: readonly SpanModel[],
  wire: WireLoading,
  tensionN: number,
): SectionSolution {
  updateLoads(spans, wire);
  let iterations = 0;
  for (let outer = 0; outer < MAX_LOAD_ITERATIONS; outer++) {
    solveShapes(spans);
    iterations++;
    unstressedLengthAt(spans, tensionN, wire.axialStiffness, true);
    if (wire.theory === 'parabolic' || updateLoads(spans, wire) < LOAD_TOLERANCE) {
      if (wire.theory !== 'parabolic') solveShapes(spans);
      return { tensionN, iterations, converged: true };
    }
  }
  return {
    tensionN,
    iterations,
    converged: false,
    reason: 'catenary load iteration did not converge',
  };
}
