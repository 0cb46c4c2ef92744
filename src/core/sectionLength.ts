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

/**
 * Unstressed length of one span at H (m) and dL₀/dH (m/N); optionally stored per element with
 * d/dH of the element's unstressed and arc lengths (the shape held fixed). Per Gauss point, with
 * a = v₁' and b = y₁' at unit tension: z' = c − a/H, y' = b/H, r = √(1 + z'² + y'²),
 * r' = (z' a − y' b)/(H² r), T = H r, f = r/(1 + T/EA), f' = (r' − f T'/EA)/(1 + T/EA).
 */
export function spanUnstressedLength(
  span: SpanModel,
  tensionN: number,
  axialStiffness: number,
  storeElements: boolean,
): { value: number; slope: number } {
  const H = tensionN;
  const invH = 1 / H;
  const invH2 = invH * invH;
  const invEA = 1 / axialStiffness;
  const c = span.chordSlope;
  const lengths = span.elementLength;
  const qv = span.qVertical;
  const qy = span.qLateral;
  const mv = span.slopeV1;
  const my = span.slopeY1;
  const s0 = span.unstressedElement;
  const s1 = span.unstressedElementSlope;
  const a0 = span.arcElement;
  const a1 = span.arcElementSlope;
  const arcs = storeElements && span.hungAlong;
  let value = 0;
  let slope = 0;
  for (let e = 0; e < lengths.length; e++) {
    const L = lengths[e];
    const curvV = 0.5 * qv[e] * L * GAUSS2;
    const curvY = 0.5 * qy[e] * L * GAUSS2;
    let element = 0;
    let elementSlope = 0;
    let arc = 0;
    let arcSlope = 0;
    for (let g = -1; g <= 1; g += 2) {
      const av = mv[e] - g * curvV;
      const ay = my[e] - g * curvY;
      const sz = c - av * invH;
      const sy = ay * invH;
      const r = Math.sqrt(1 + sz * sz + sy * sy);
      const invS = 1 / (1 + H * r * invEA);
      const f = r * invS;
      const dr = ((sz * av - sy * ay) * invH2) / r;
      element += f;
      elementSlope += (dr - f * (r + H * dr) * invEA) * invS;
      arc += r;
      arcSlope += dr;
    }
    const half = 0.5 * L;
    element *= half;
    elementSlope *= half;
    if (storeElements) {
      s0[e] = element;
      s1[e] = elementSlope;
      if (arcs) {
        a0[e] = arc * half;
        a1[e] = arcSlope * half;
      }
    }
    value += element;
    slope += elementSlope;
  }
  if (storeElements) span.storedTensionN = H;
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
 * the last solved state moved to first order in H to the span tensions given (a warm start
 * across states and trial tensions; before any state ds₀/dx = 1 and ds/dx = √(1 + c²)).
 * The parabolic theory keeps the wire's load per horizontal metre and turns the hung cables' ice
 * and wind into per horizontal metre with the chord's ds/dx = √(1 + c²).
 */
export function updateLoads(
  spans: readonly SpanModel[],
  wire: WireLoading,
  tensionsN?: ArrayLike<number>,
  assemble = false,
): number {
  const useGeometry = wire.theory === 'exact';
  let change = 0;
  let scale = 0;
  for (let j = 0; j < spans.length; j++) {
    const span = spans[j];
    const stored = span.storedTensionN;
    const d = tensionsN && Number.isFinite(stored) ? tensionsN[j] - stored : 0;
    let lateral = false;
    for (const force of span.pointLateral) if (force !== 0) lateral = true;
    const chordArcRatio = Math.sqrt(1 + span.chordSlope * span.chordSlope);
    const lengths = span.elementLength;
    const s0 = span.unstressedElement;
    const s1 = span.unstressedElementSlope;
    const a0 = span.arcElement;
    const a1 = span.arcElementSlope;
    const hungV = span.hungVertical;
    const iceA = span.hungIceAlong;
    const windA = span.hungWindAlong;
    const qv = span.qVertical;
    const qy = span.qLateral;
    const w = wire.weightNPerM;
    const wind = wire.windNPerM;
    // With `assemble`, the consistent nodal loads go into loadV and loadY (see
    // addElementLoads): linear elements qL/2 to each end, quadratic qL/6 · (1, 4, 1).
    const v = span.loadV;
    const y = span.loadY;
    const order = span.mesh.order;
    if (assemble) {
      v.fill(0);
      y.fill(0);
    }
    const inverse = span.inverseLength;
    const arcs = span.hungAlong;
    for (let e = 0; e < lengths.length; e++) {
      const invL = inverse[e];
      let ratio = 1;
      let arcRatio = chordArcRatio;
      if (useGeometry) {
        const unstressed = s0[e] + s1[e] * d;
        if (unstressed > 0) ratio = unstressed * invL;
        if (arcs) {
          const arc = a0[e] + a1[e] * d;
          if (arc > 0) arcRatio = arc * invL;
        }
      }
      const q = w * ratio + hungV[e] + iceA[e] * arcRatio;
      const p = wind * ratio + windA[e] * arcRatio;
      const dq = Math.abs(q - qv[e]);
      const dp = Math.abs(p - qy[e]);
      if (dq > change) change = dq;
      if (dp > change) change = dp;
      const aq = Math.abs(q);
      const ap = Math.abs(p);
      if (aq > scale) scale = aq;
      if (ap > scale) scale = ap;
      qv[e] = q;
      qy[e] = p;
      if (p !== 0) lateral = true;
      if (!assemble) continue;
      if (order === 1) {
        const h = 0.5 * lengths[e];
        v[e] += q * h;
        v[e + 1] += q * h;
        y[e] += p * h;
        y[e + 1] += p * h;
      } else {
        const h = lengths[e] / 6;
        v[2 * e] += q * h;
        v[2 * e + 1] += 4 * q * h;
        v[2 * e + 2] += q * h;
        y[2 * e] += p * h;
        y[2 * e + 1] += 4 * p * h;
        y[2 * e + 2] += p * h;
      }
    }
    span.lateralLoaded = lateral;
  }
  return scale > 0 ? change / scale : 0;
}

/** Solve every span's unit shapes; `assembled` when updateLoads assembled their loads. */
export function solveShapes(spans: readonly SpanModel[], assembled = false): void {
  for (const span of spans) solveUnitShapes(span, assembled);
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
