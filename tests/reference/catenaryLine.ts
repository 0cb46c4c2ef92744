/**
 * A line of elastic catenaries (Irvine, Cable Structures, 1981, §1.3; one span each, solved by
 * tests/reference/elasticCatenary.ts) joined at intermediate supports, written independently of
 * the core. A section's unknowns are the unstressed lengths of its spans, their sum fixed; at
 * each joint a pulley makes the tension equal on both sides,
 *   T_end,a = √(H_a² + (V_a − W_a)²) = T_start,b = √(H_b² + V_b²)   (W_a the span's whole load),
 * and a swing link the horizontal tension, H_a = H_b. Newton on the lengths with a
 * finite-difference Jacobian and an ml-matrix linear solve.
 */
import { Matrix, solve } from 'ml-matrix';
import { type CatenarySolution, solveElasticCatenary } from './elasticCatenary.ts';

export interface LineSpan {
  x0: number;
  z0: number;
  x1: number;
  z1: number;
  /** Point loads on the span: horizontal position (m, absolute) and force (N). */
  pointLoads?: { x: number; force: number }[];
}

export type Joint = 'tension' | 'horizontal';

export interface SpanState extends CatenarySolution {
  unstressedLength: number;
  /** Tension at the first and the last end of the span, N. */
  startTension: number;
  endTension: number;
}

export interface LineInput {
  spans: LineSpan[];
  joints: Joint[];
  /** Weight per unstressed metre, N/m, and EA, N. */
  weightPerLength: number;
  axialStiffness: number;
}

/** Bisection to the last representable step of a sign change of f on [lo, hi] (f(lo) > 0). */
function bisect(f: (x: number) => number, lo0: number, hi0: number): number {
  let lo = lo0;
  let hi = hi0;
  for (let k = 0; k < 400; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (f(mid) > 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * A span with no hung loads by Irvine's two equations (Cable Structures, 1981, §1.3, eqs for
 * l and h), without Newton: for a trial H the h-equation is strictly decreasing in V, so V(H)
 * is bisected; then l(H) is bisected in ln H. Slow and sure, for steep, taut spans.
 */
function bareSpan(
  input: LineInput,
  l: number,
  h: number,
  L0: number,
): { H: number; V: number; sag: number } {
  const w = input.weightPerLength;
  const EA = input.axialStiffness;
  const W = w * L0;
  const hOf = (H: number, V: number) =>
    -(L0 / EA) * (V - W / 2) - (H / w) * (Math.hypot(1, V / H) - Math.hypot(1, (V - W) / H));
  const vOf = (H: number) => {
    const big = 1e3 * (W + H);
    return bisect((V) => hOf(H, V) - h, -big, big);
  };
  const lOf = (H: number) => {
    const V = vOf(H);
    return (H * L0) / EA + (H / w) * (Math.asinh(V / H) - Math.asinh((V - W) / H));
  };
  const lnH = bisect((x) => l - lOf(Math.exp(x)), Math.log(1e-6 * W), Math.log(1e6 * (W + EA)));
  const H = Math.exp(lnH);
  const V = vOf(H);
  // Sag from the chord: where the wire's slope −(V − w s)/H equals the chord's, h / l.
  const s = Math.min(L0, Math.max(0, (V + (H * h) / l) / w));
  const x = (H * s) / EA + (H / w) * (Math.asinh(V / H) - Math.asinh((V - w * s) / H));
  const z =
    -(V * s - (w * s * s) / 2) / EA +
    (H / w) * (Math.hypot(1, (V - w * s) / H) - Math.hypot(1, V / H));
  return { H, V, sag: (h * x) / l - z };
}

export function solveSpan(
  input: LineInput,
  span: LineSpan,
  unstressedLength: number,
  guessH: number,
): SpanState {
  const loads = (span.pointLoads ?? []).map((p) => ({ x: p.x - span.x0, force: p.force }));
  if (loads.length === 0) {
    const bare = bareSpan(input, span.x1 - span.x0, span.z1 - span.z0, unstressedLength);
    const W = input.weightPerLength * unstressedLength;
    return {
      ...bare,
      maxTension: Math.max(Math.hypot(bare.H, bare.V), Math.hypot(bare.H, bare.V - W)),
      lowestZ: Number.NaN,
      unstressedLength,
      startTension: Math.hypot(bare.H, bare.V),
      endTension: Math.hypot(bare.H, bare.V - W),
    };
  }
  const solution = solveElasticCatenary(
    {
      span: span.x1 - span.x0,
      rise: span.z1 - span.z0,
      unstressedLength,
      weightPerLength: input.weightPerLength,
      axialStiffness: input.axialStiffness,
      pointLoads: loads,
    },
    guessH,
  );
  const whole = input.weightPerLength * unstressedLength + loads.reduce((a, p) => a + p.force, 0);
  return {
    ...solution,
    unstressedLength,
    startTension: Math.hypot(solution.H, solution.V),
    endTension: Math.hypot(solution.H, solution.V - whole),
  };
}

function states(input: LineInput, lengths: number[], guessH: number): SpanState[] {
  return input.spans.map((span, j) => solveSpan(input, span, lengths[j], guessH));
}

function residuals(input: LineInput, spans: SpanState[]): number[] {
  return input.joints.map((joint, k) =>
    joint === 'tension'
      ? spans[k].endTension - spans[k + 1].startTension
      : spans[k].H - spans[k + 1].H,
  );
}

/** The section with total unstressed length `total` (m), starting from `lengths` (m). */
export function solveSection(
  input: LineInput,
  total: number,
  lengths: number[],
  guessH: number,
): SpanState[] {
  const n = input.spans.length;
  const withLast = (free: number[]) => [...free, total - free.reduce((a, b) => a + b, 0)];
  let free = lengths.slice(0, n - 1);
  let current = states(input, withLast(free), guessH);
  for (let it = 0; it < 60 && n > 1; it++) {
    const f = residuals(input, current);
    const scale = Math.max(...current.map((s) => s.H));
    if (Math.max(...f.map(Math.abs)) < 1e-11 * scale) break;
    const J = new Matrix(n - 1, n - 1);
    free.forEach((value, j) => {
      const step = 1e-7 * value;
      const shifted = [...free];
      shifted[j] += step;
      const g = residuals(input, states(input, withLast(shifted), current[0].H));
      g.forEach((gi, i) => {
        J.set(i, j, (gi - f[i]) / step);
      });
    });
    const delta = solve(J, Matrix.columnVector(f.map((v) => -v))).to1DArray();
    // Keep each step within 20 % of the span's slack so the catenaries stay solvable.
    const limit = Math.min(...free.map((v) => 0.2 * v));
    const largest = Math.max(...delta.map(Math.abs));
    const damp = largest > limit ? limit / largest : 1;
    free = free.map((v, j) => v + damp * delta[j]);
    current = states(input, withLast(free), current[0].H);
  }
  return current;
}
