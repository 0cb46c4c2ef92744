/**
 * Geometry of a solved span at horizontal tension H (N): height z(x) = z₀ + c (x − x₀) − v(x),
 * swing y(x), slopes and tension T = H √(1 + z'² + y'²). Inside element e (x = x_m + ξ L/2):
 * v(x) = [v₁ₐ + m_e (x − xₐ)]/H + q_e (x − xₐ)(x_b − x)/(2H), v'(x) = (m_e − q_e L ξ/2)/H.
 * z is convex under downward load, so minima of z minus a straight line are found in closed form.
 */
import type { SpanModel } from './spanModel.ts';
import { elementAt } from './stringMesh.ts';

export interface ShapePoint {
  x: number;
  value: number;
}

/**
 * The element-wise parabola of a unit-tension solution u₁ (v₁ or y₁) with element chord slopes
 * m and loads q, at x inside element e, divided by H: [u₁ₐ + m (x − xₐ) + q (x − xₐ)(x_b − x)/2]/H.
 */
function parabolaIn(
  span: SpanModel,
  unit: Float64Array,
  slopes: Float64Array,
  loads: Float64Array,
  H: number,
  e: number,
  x: number,
): number {
  const xa = span.mesh.vertexX[e];
  const xb = span.mesh.vertexX[e + 1];
  const linear = unit[e * span.mesh.order] + slopes[e] * (x - xa);
  return (linear + 0.5 * loads[e] * (x - xa) * (xb - x)) / H;
}

/** Deflection below the chord, v (m), inside element e at x. */
function deflectionIn(span: SpanModel, H: number, e: number, x: number): number {
  return parabolaIn(span, span.v1, span.slopeV1, span.qVertical, H, e, x);
}

/** Wire height z (m) at x. */
export function heightAt(span: SpanModel, H: number, x: number): number {
  return heightIn(span, H, elementAt(span.mesh, x), x);
}

/** Wire height z (m) at x inside element e. */
function heightIn(span: SpanModel, H: number, e: number, x: number): number {
  return span.z0 + span.chordSlope * (x - span.x0) - deflectionIn(span, H, e, x);
}

/** Sideways swing y (m) at x inside element e. */
function swingIn(span: SpanModel, H: number, e: number, x: number): number {
  return parabolaIn(span, span.y1, span.slopeY1, span.qLateral, H, e, x);
}

/** Sideways swing y (m) at x. */
export function swingAt(span: SpanModel, H: number, x: number): number {
  return swingIn(span, H, elementAt(span.mesh, x), x);
}

/** Slopes z' and y' inside element e at local ξ ∈ [−1, 1]. */
export function slopesAt(
  span: SpanModel,
  H: number,
  e: number,
  xi: number,
): { dz: number; dy: number } {
  const L = span.elementLength[e];
  const dv = (span.slopeV1[e] - 0.5 * span.qVertical[e] * L * xi) / H;
  const dy = (span.slopeY1[e] - 0.5 * span.qLateral[e] * L * xi) / H;
  return { dz: span.chordSlope - dv, dy };
}

/** Tension T (N) at element e, local ξ (no allocation: used over every element). */
export function tensionAt(span: SpanModel, H: number, e: number, xi: number): number {
  const L = span.elementLength[e];
  const dz = span.chordSlope - (span.slopeV1[e] - 0.5 * span.qVertical[e] * L * xi) / H;
  const dy = (span.slopeY1[e] - 0.5 * span.qLateral[e] * L * xi) / H;
  return H * Math.sqrt(1 + dz * dz + dy * dy);
}

/**
 * Smallest value of z(x) − (lineZ + lineSlope (x − lineX)) for x in [from, to] (clipped to the
 * span), with where it occurs. Exact for the element-wise parabolic shape.
 */
export function minimumAboveLine(
  span: SpanModel,
  H: number,
  from: number,
  to: number,
  lineX: number,
  lineZ: number,
  lineSlope: number,
): ShapePoint {
  const a = Math.max(from, span.x0);
  const b = Math.min(to, span.x1);
  const best: ShapePoint = { x: a, value: Number.POSITIVE_INFINITY };
  if (!(b >= a)) return best;
  const first = elementAt(span.mesh, a);
  const last = elementAt(span.mesh, b);
  // heightIn − line, written out over local arrays: this runs over every element of every state.
  const vertexX = span.mesh.vertexX;
  const order = span.mesh.order;
  const v1 = span.v1;
  const slopes = span.slopeV1;
  const loads = span.qVertical;
  const lengths = span.elementLength;
  const { z0, x0, chordSlope: c } = span;
  const consider = (e: number, x: number) => {
    const xa = vertexX[e];
    const xb = vertexX[e + 1];
    const linear = v1[e * order] + slopes[e] * (x - xa);
    const deflection = (linear + 0.5 * loads[e] * (x - xa) * (xb - x)) / H;
    const value = z0 + c * (x - x0) - deflection - (lineZ + lineSlope * (x - lineX));
    if (value < best.value) {
      best.value = value;
      best.x = x;
    }
  };
  consider(first, a);
  consider(last, b);
  const drop = (c - lineSlope) * H;
  for (let e = first; e <= last; e++) {
    const xa = vertexX[e];
    const L = lengths[e];
    if (e > first) consider(e, xa);
    const q = loads[e];
    if (q <= 0) continue;
    // z' = lineSlope  ⇔  v' = c − lineSlope  ⇔  ξ = 2 (m_e − (c − s) H) / (q L)
    const xi = (2 * (slopes[e] - drop)) / (q * L);
    const x = xa + 0.5 * L * (1 + xi);
    if (xi > -1 && xi < 1 && x > a && x < b) consider(e, x);
  }
  return best;
}

/** Largest sideways swing (m) and where, exact for the element-wise parabolic shape. */
export function largestSwing(span: SpanModel, H: number): ShapePoint {
  const best: ShapePoint = { x: span.x0, value: 0 };
  if (!span.lateralLoaded) return best;
  const consider = (e: number, x: number) => {
    const y = swingIn(span, H, e, x);
    if (Math.abs(y) > Math.abs(best.value)) {
      best.value = y;
      best.x = x;
    }
  };
  for (let e = 0; e < span.elementLength.length; e++) {
    const L = span.elementLength[e];
    const p = span.qLateral[e];
    const xa = span.mesh.vertexX[e];
    consider(e, xa);
    if (p > 0) {
      const xi = (2 * span.slopeY1[e]) / (p * L);
      if (xi > -1 && xi < 1) consider(e, xa + 0.5 * L * (1 + xi));
    }
  }
  return best;
}

/**
 * Largest tension along the span (N): tension is extreme at element ends. T = H √(1 + z'² + y'²)
 * rises with 1 + z'² + y'², so the largest of those is found first and one root taken.
 */
export function largestTension(span: SpanModel, H: number): number {
  const lengths = span.elementLength;
  const mv = span.slopeV1;
  const my = span.slopeY1;
  const qv = span.qVertical;
  const qy = span.qLateral;
  const c = span.chordSlope;
  let largest = 1;
  for (let e = 0; e < lengths.length; e++) {
    const L = lengths[e];
    for (let xi = -1; xi <= 1; xi += 2) {
      const dz = c - (mv[e] - 0.5 * qv[e] * L * xi) / H;
      const dy = (my[e] - 0.5 * qy[e] * L * xi) / H;
      const s = 1 + dz * dz + dy * dy;
      if (s > largest) largest = s;
      else if (Number.isNaN(s)) return Number.NaN;
    }
  }
  return Math.max(H, H * Math.sqrt(largest));
}
