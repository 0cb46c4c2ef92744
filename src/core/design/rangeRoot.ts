/**
 * Root of an increasing function f(x) on [lo, hi] from a start x₀, by secant steps: the first
 * from a given slope (a similar function's) or 1, then the slope through the last two points.
 * Until the sign changes a step is at most twice the longest so far (from 2 at first, clamped to
 * the range); once it has changed, steps stay strictly inside the bracket (bisection when the
 * secant leaves it, or when the bracket has not halved in three steps), so the root is always
 * found. Done when a step is shorter than the tolerance, or, once the steps shrink
 * superlinearly, when the step after it is predicted (step² / step before) to be: the point it
 * leads to is returned unevaluated, for the caller's own check there. Done too when the bracket
 * is narrower than the tolerance. Reports when f keeps one sign over the whole range
 * instead. Bounded; no NaN leaves here.
 * A caller that already knows f(x₀) passes it in `start`, and it is not computed again.
 */

export type RangeRoot =
  | { status: 'root'; x: number; evaluations: number; slope: number }
  | { status: 'positive' | 'negative' | 'failed'; x: number; evaluations: number; slope: number };

export interface RangeStart {
  /** f(x₀), already computed. */
  value?: number;
  /** An estimate of f′ (> 0), e.g. a similar function's at its root. */
  slope?: number;
}

const MAX_EVALUATIONS = 80;

export function rootInRange(
  f: (x: number) => number,
  x0: number,
  lo: number,
  hi: number,
  tolerance = 1e-12,
  start: RangeStart = {},
): RangeRoot {
  const clamp = (x: number) => Math.min(hi, Math.max(lo, x));
  let x = clamp(x0);
  const known = x === x0 && start.value !== undefined && Number.isFinite(start.value);
  let fx = known ? (start.value as number) : f(x);
  let evaluations = known ? 0 : 1;
  let slope =
    start.slope !== undefined && start.slope > 0 && Number.isFinite(start.slope) ? start.slope : 1;
  if (!Number.isFinite(fx)) return { status: 'failed', x, evaluations, slope };
  if (fx === 0) return { status: 'root', x, evaluations, slope };
  // The bracket: the nearest points known below (f < 0) and above (f > 0) the root.
  let below = fx < 0 ? x : Number.NaN;
  let above = fx > 0 ? x : Number.NaN;
  let reach = 2;
  let width = Number.POSITIVE_INFINITY;
  let slowSteps = 0;
  let lastStep = Number.NaN;
  while (evaluations < MAX_EVALUATIONS) {
    const bracketed = Number.isFinite(below) && Number.isFinite(above);
    let next = x - fx / slope;
    if (bracketed) {
      const a = Math.min(below, above);
      const b = Math.max(below, above);
      if (b - a <= tolerance)
        return { status: 'root', x: fx < 0 ? below : above, evaluations, slope };
      if (!(next > a && next < b) || slowSteps >= 3) {
        next = 0.5 * (a + b);
        slowSteps = 0;
        lastStep = Number.NaN; // a bisection says nothing of the secant's convergence
      }
    } else {
      const edge = fx < 0 ? hi : lo;
      if (x === edge) return { status: fx < 0 ? 'negative' : 'positive', x, evaluations, slope };
      // Towards the root (f increases), at most `reach` at a time.
      const direction = fx < 0 ? 1 : -1;
      const distance = Number.isFinite(next) ? Math.abs(next - x) : reach;
      next = clamp(x + direction * Math.min(distance, reach));
    }
    const step = Math.abs(next - x);
    if (step <= tolerance || (step < 1e-3 && (step * step) / lastStep < 0.1 * tolerance))
      return { status: 'root', x: next, evaluations, slope };
    lastStep = step;
    const fn = f(next);
    evaluations++;
    if (!Number.isFinite(fn)) {
      // No answer there: approach it in shorter steps.
      reach = Math.abs(next - x) / 4;
      if (reach < tolerance) return { status: 'failed', x, evaluations, slope };
      if (bracketed) {
        if (fx < 0) above = next;
        else below = next;
      }
      continue;
    }
    if (fn === 0) return { status: 'root', x: next, evaluations, slope };
    const secant = (fn - fx) / (next - x);
    if (secant > 0 && Number.isFinite(secant)) slope = secant;
    if (!bracketed) reach = Math.max(reach, 2 * Math.abs(next - x));
    if (fn < 0) below = next;
    else above = next;
    if (Number.isFinite(below) && Number.isFinite(above)) {
      const now = Math.abs(above - below);
      slowSteps = now > 0.5 * width ? slowSteps + 1 : 0;
      width = Math.min(width, now);
    }
    x = next;
    fx = fn;
  }
  return { status: 'failed', x, evaluations, slope };
}
