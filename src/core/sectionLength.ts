/**
 * Unstressed length a section's geometry needs, with each span j at its own horizontal tension
 * Hⱼ (N): L₀ = Σⱼ Σₑ ∫ √(1 + z'² + y'²) / (1 + T/EA) dx, T = Hⱼ √(1 + z'² + y'²) (two-point
 * Gauss per element), and dL₀/dH₁ = Σⱼ (∂L₀ⱼ/∂Hⱼ)(dHⱼ/dH₁). Also the element loads of the exact
 * theory, q = w ds₀/dx, and a first step from the small-slope (change-of-state) model.
 */
import type { Theory } from './project.ts';
import type { SpanTensions } from './sectionTensions.ts';
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

/** Unstressed length of one span at H (m) and dL₀/dH (m/N); optionally stored per element. */
export function spanUnstressedLength(
  span: SpanModel,
  tensionN: number,
  axialStiffness: number,
  storeElements: boolean,
): { value: number; slope: number } {
  const H = tensionN;
  const invH2 = 1 / (H * H);
  const c = span.chordSlope;
  let value = 0;
  let slope = 0;
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
  return { value, slope };
}

/** Unstressed length of a section at its span tensions and the derivative d/dH₁. */
export function sectionUnstressedLength(
  spans: readonly SpanModel[],
  tensions: SpanTensions,
  axialStiffness: number,
  storeElements: boolean,
): { value: number; slope: number } {
  let value = 0;
  let slope = 0;
  spans.forEach((span, j) => {
    const r = spanUnstressedLength(span, tensions.tensionN[j], axialStiffness, storeElements);
    value += r.value;
    slope += r.slope * tensions.slope[j];
  });
  return { value, slope };
}

/**
 * Set element loads from the wire loading and return the largest relative change. The exact
 * theory scales the wire's load by ds₀/dx and the ice and wind on hung cables by ds/dx, both of
 * the last solved state moved to first order by the span's tension shift (N) when given (a warm
 * start across states and trial tensions; before any state ds₀/dx = 1 and ds/dx = √(1 + c²)).
 * The parabolic theory keeps the wire's load per horizontal metre and turns the hung cables' ice
 * and wind into per horizontal metre with the chord's ds/dx = √(1 + c²).
 */
export function updateLoads(
  spans: readonly SpanModel[],
  wire: WireLoading,
  tensionShiftN?: Float64Array,
): number {
  const useGeometry = wire.theory === 'exact';
  let change = 0;
  let scale = 0;
  spans.forEach((span, j) => {
    const shift = tensionShiftN ? tensionShiftN[j] : 0;
    let lateral = false;
    for (const force of span.pointLateral) if (force !== 0) lateral = true;
    const chordArcRatio = Math.sqrt(1 + span.chordSlope * span.chordSlope);
    for (let e = 0; e < span.elementLength.length; e++) {
      const L = span.elementLength[e];
      const unstressed = span.unstressedElement[e] + span.unstressedElementSlope[e] * shift;
      const ratio = useGeometry && unstressed > 0 ? unstressed / L : 1;
      const arc = span.arcElement[e] + span.arcElementSlope[e] * shift;
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
  });
  return scale > 0 ? change / scale : 0;
}

export function solveShapes(spans: readonly SpanModel[]): void {
  for (const span of spans) solveUnitShapes(span);
}

/**
 * A first step from the small-slope model of the section (the classic change-of-state form):
 * L₀ ≈ Σ lⱼ√(1 + cⱼ²) + Pⱼ/Hⱼ² − Qⱼ Hⱼ with Pⱼ = ∫v₁'²/(2(1 + c²)^{3/2}) + ∫y₁'²/(2√(1 + c²))
 * and Qⱼ = lⱼ (1 + cⱼ²)/EA. With Hⱼ = rⱼ h (rⱼ the present ratio to the first span's) it is
 * P/h² − Q h + K, K matched to the exact mismatch at h = H₁; its root (Newton on a scalar cubic)
 * is a far better start than a tangent step when the state changed a lot.
 */
export function slackModelStep(
  spans: readonly SpanModel[],
  tensions: SpanTensions,
  axialStiffness: number,
  mismatch: number,
): number {
  const H = tensions.tensionN[0];
  let P = 0;
  let Q = 0;
  spans.forEach((span, j) => {
    const ratio = tensions.tensionN[j] / H;
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
    P += (dz / (2 * c2 * Math.sqrt(c2)) + dy / (2 * Math.sqrt(c2))) / (ratio * ratio);
    Q += ((span.x1 - span.x0) * c2 * ratio) / axialStiffness;
  });
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
