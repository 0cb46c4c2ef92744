/**
 * Field checks of a solved span from the wave's travel. A transverse wave runs at c = √(T/μ)
 * (T local tension N, μ the wire's own mass per stretched metre kg/m); a pulse returns after
 * t_r = 2 ∫ ds / c (s), and the plucked fundamental is f ≈ 1 / t_r (Hz). With ds = r dx,
 * T = H r and μ = μ₀ / (1 + T/EA): ds/c = √(μ₀ r / (H (1 + H r / EA))) dx, Gauss–Legendre per element.
 */
import { GAUSS2, type SpanModel } from './spanModel.ts';

/**
 * One-way travel time ∫ ds / c (s) of a transverse wave along the span at horizontal tension H.
 * `massPerUnstressedM` is μ₀ (kg per unstressed metre at the state's temperature); EA in N.
 */
export function waveTravelTime(
  span: SpanModel,
  tensionN: number,
  massPerUnstressedM: number,
  axialStiffness: number,
): number {
  const H = tensionN;
  const c = span.chordSlope;
  let time = 0;
  for (let e = 0; e < span.elementLength.length; e++) {
    const L = span.elementLength[e];
    const curvV = 0.5 * span.qVertical[e] * L * GAUSS2;
    const curvY = 0.5 * span.qLateral[e] * L * GAUSS2;
    let element = 0;
    for (let g = -1; g <= 1; g += 2) {
      const sz = c - (span.slopeV1[e] - g * curvV) / H;
      const sy = (span.slopeY1[e] - g * curvY) / H;
      const r = Math.sqrt(1 + sz * sz + sy * sy);
      element += Math.sqrt((massPerUnstressedM * r) / (H * (1 + (H * r) / axialStiffness)));
    }
    time += 0.5 * L * element;
  }
  return time;
}

/** Pulse return time t_r = 2 ∫ ds / c (s): the pulse runs to the far fixing and back once. */
export function pulseReturnTime(
  span: SpanModel,
  tensionN: number,
  massPerUnstressedM: number,
  axialStiffness: number,
): number {
  return 2 * waveTravelTime(span, tensionN, massPerUnstressedM, axialStiffness);
}

/** Plucked fundamental f ≈ 1 / (2 ∫ ds / c) (Hz). */
export function pluckFrequency(
  span: SpanModel,
  tensionN: number,
  massPerUnstressedM: number,
  axialStiffness: number,
): number {
  return 1 / pulseReturnTime(span, tensionN, massPerUnstressedM, axialStiffness);
}
