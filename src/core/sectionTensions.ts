/**
 * Horizontal tension of every span of a section from the first span's H₁ (N), through the
 * joints between them: "horizontal" (swing link; clamped supports at installation): H equal;
 * "tension" (pulley): T equal at the support. With the shape fixed, z' = c − A/H and y' = B/H
 * at a span end (A, B the unit-tension end slopes of v and y), so
 *   T² = (1 + c²) H² − 2 c A H + A² + B²,
 * and the next span's H is the larger root for the given T. dHⱼ/dH₁ follows by the chain rule.
 */
import type { SpanModel } from './spanModel.ts';

/** What an intermediate support keeps equal on its two sides while the section moves. */
export type JointKind = 'horizontal' | 'tension';

/** Per-span horizontal tensions (N) and their derivatives with respect to the first span's. */
export interface SpanTensions {
  readonly tensionN: Float64Array;
  readonly slope: Float64Array;
}

export function createSpanTensions(count: number): SpanTensions {
  return { tensionN: new Float64Array(count), slope: new Float64Array(count) };
}

/** Unit-tension slopes at the first (atEnd false) or last end: z' = c − A/H, y' = B/H. */
function endSlopes(span: SpanModel, atEnd: boolean): { A: number; B: number } {
  const e = atEnd ? span.elementLength.length - 1 : 0;
  const half = (atEnd ? -0.5 : 0.5) * span.elementLength[e];
  return {
    A: span.slopeV1[e] + half * span.qVertical[e],
    B: span.slopeY1[e] + half * span.qLateral[e],
  };
}

/** Tension T (N) of the wire at the first or last end of a span at horizontal tension H. */
export function endTension(span: SpanModel, H: number, atEnd: boolean): number {
  const { A, B } = endSlopes(span, atEnd);
  const dz = span.chordSlope - A / H;
  const dy = B / H;
  return H * Math.sqrt(1 + dz * dz + dy * dy);
}

/** T dT/dH = (1 + c²) H − c A at a span end. */
function tensionSlopeTimesT(span: SpanModel, H: number, atEnd: boolean): number {
  const c = span.chordSlope;
  return (1 + c * c) * H - c * endSlopes(span, atEnd).A;
}

/**
 * Span tensions for first-span tension H₁ (N). Returns false when a pulley cannot be balanced
 * (the tension arriving is below the least tension the next span can have at its first end);
 * that span then takes the H of its least end tension, which keeps the section's length
 * mismatch on the slack side so a root finder moves H₁ up.
 */
export function spanTensions(
  spans: readonly SpanModel[],
  joints: readonly JointKind[],
  firstTensionN: number,
  out: SpanTensions,
): boolean {
  let reachable = true;
  out.tensionN[0] = firstTensionN;
  out.slope[0] = 1;
  for (let j = 1; j < spans.length; j++) {
    const Ha = out.tensionN[j - 1];
    if (joints[j - 1] === 'horizontal') {
      out.tensionN[j] = Ha;
      out.slope[j] = out.slope[j - 1];
      continue;
    }
    const before = spans[j - 1];
    const after = spans[j];
    const T = endTension(before, Ha, true);
    const c = after.chordSlope;
    const { A, B } = endSlopes(after, false);
    const k = 1 + c * c;
    const discriminant = k * (T * T - B * B) - A * A;
    const root = Math.sqrt(Math.max(discriminant, 0));
    const Hb = (c * A + root) / k;
    if (!(discriminant > 0) || !(Hb > 0)) {
      reachable = false;
      out.tensionN[j] = Math.max(Hb, 1e-9 * Ha);
      out.slope[j] = 0;
      continue;
    }
    out.tensionN[j] = Hb;
    // dT/dH on each side: (T dT/dH)/T; T cancels in the ratio.
    out.slope[j] = (out.slope[j - 1] * tensionSlopeTimesT(before, Ha, true)) / root;
  }
  return reachable;
}
