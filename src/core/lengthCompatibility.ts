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
        slope += ((drdH - (f * dTdH) / axialStiffness) / stretch) * 0.5 * L;
      }
      element *= 0.5 * L;
      if (storeElements) span.unstressedElement[e] = element;
      value += element;
    }
  }
  return { value, slope };
}

/**
 * Set element loads from the wire loading. The exact theory scales the wire's load by ds₀/dx of
 * the last solved state (a warm start across states and trial tensions; 1 before any state).
 */
function updateLoads(spans: readonly SpanModel[], wire: WireLoading): number {
  const useGeometry = wire.theory === 'exact';
  let change = 0;
  let scale = 0;
  for (const span of spans) {
    for (let e = 0; e < span.elementLength.length; e++) {
      const unstressed = span.unstressedElement[e];
      const ratio = useGeometry && unstressed > 0 ? unstressed / span.elementLength[e] : 1;
      const q = wire.weightNPerM * ratio + span.hungVertical[e];
      const p = wire.windNPerM * ratio + span.hungLateral[e];
      change = Math.max(change, Math.abs(q - span.qVertical[e]), Math.abs(p - span.qLateral[e]));
      scale = Math.max(scale, Math.abs(q), Math.abs(p));
      span.qVertical[e] = q;
      span.qLateral[e] = p;
    }
  }
  return scale > 0 ? change / scale : 0;
}

function solveShapes(spans: readonly SpanModel[]): void {
  for (const span of spans) solveUnitShapes(span);
}

/** Horizontal tension of a section whose unstressed length at this temperature is L₀ (m). */
export function solveSectionForLength(
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
