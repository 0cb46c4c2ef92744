/**
 * Field checks of a set wire: a transverse pulse runs from one fixing to the next and back in
 * t_r = 2 ∫ ds / c with c = √(T / μ) (m/s), T the local tension (N) and μ the wire's own mass per
 * stretched metre (kg/m), μ = m / ((1 + α Δt)(1 + T/EA)). The plucked fundamental (sideways
 * swing) is f ≈ 1 / t_r (Hz). Both hold for the bare wire only: hung items reflect the pulse.
 */
import type { Project } from './project.ts';
import { GAUSS2, type SpanModel } from './spanModel.ts';

export interface WaveWire {
  /** The wire's own mass per unstressed metre at the installation temperature, kg/m. */
  massPerLength: number;
  /** EA, N. */
  axialStiffness: number;
  /** 1 + α (t − t₀): unstressed length at this temperature over that at installation. */
  thermalFactor: number;
}

/**
 * One-way travel time ∫ ds / c (s) along a solved span at horizontal tension H (N), integrated
 * with two-point Gauss per element on the element-wise parabolic shape: ds = r dx,
 * T = H r, r = √(1 + z'² + y'²), so ∫ ds / c = ∫ r √(μ / T) dx.
 */
export function travelTime(span: SpanModel, tensionN: number, wire: WaveWire): number {
  const H = tensionN;
  const c = span.chordSlope;
  const massPerUnstressed = wire.massPerLength / wire.thermalFactor;
  let time = 0;
  for (let e = 0; e < span.elementLength.length; e++) {
    const L = span.elementLength[e];
    const curvV = 0.5 * span.qVertical[e] * L * GAUSS2;
    const curvY = 0.5 * span.qLateral[e] * L * GAUSS2;
    let element = 0;
    for (let g = -1; g <= 1; g += 2) {
      const dz = c - (span.slopeV1[e] - g * curvV) / H;
      const dy = (span.slopeY1[e] - g * curvY) / H;
      const r = Math.sqrt(1 + dz * dz + dy * dy);
      const tension = H * r;
      const mu = massPerUnstressed / (1 + tension / wire.axialStiffness);
      element += r * Math.sqrt(mu / tension);
    }
    time += 0.5 * L * element;
  }
  return time;
}

/** Pulse return time t_r = 2 ∫ ds / c (s), one trip to the far fixing and back. */
export function pulseReturnTime(span: SpanModel, tensionN: number, wire: WaveWire): number {
  return 2 * travelTime(span, tensionN, wire);
}

/**
 * Whether the pulse and pluck checks hold for the wire as it is set: only when nothing hangs on
 * it while it is tensioned (installation without loads, or a project with no hung loads).
 */
export function fieldChecksHold(project: Project): boolean {
  return !project.installation.withLoads || project.loads.length === 0;
}
