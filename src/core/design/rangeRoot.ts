/**
 * Root of an increasing function f(x) on [lo, hi] from a start x₀: steps (secant-guided,
 * growing) towards the root until its sign changes, then Brent's method on that bracket.
 * Reports when f keeps one sign over the whole range instead. Bounded; no NaN leaves here.
 * A caller that already knows f(x₀), or the slope of a similar function, passes them in `start`:
 * the known value is not computed again, and the slope aims the first step.
 */
import { brent } from '../rootFind.ts';

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
  let a = clamp(x0);
  const known = a === x0 && start.value !== undefined && Number.isFinite(start.value);
  let fa = known ? (start.value as number) : f(a);
  let evaluations = known ? 0 : 1;
  let slope =
    start.slope !== undefined && start.slope > 0 && Number.isFinite(start.slope) ? start.slope : 1;
  if (!Number.isFinite(fa)) return { status: 'failed', x: a, evaluations, slope };
  if (fa === 0) return { status: 'root', x: a, evaluations, slope };
  const direction = fa < 0 ? 1 : -1;
  let step = 0.5;
  while (evaluations < MAX_EVALUATIONS) {
    const edge = direction > 0 ? hi : lo;
    if (a === edge) return { status: fa < 0 ? 'negative' : 'positive', x: a, evaluations, slope };
    // Aim a little past the linear estimate of the root, so one step usually brackets it.
    const estimate = Math.abs(fa / slope) * 1.25;
    const distance = Number.isFinite(estimate)
      ? Math.min(4 * step, Math.max(estimate, 1e-4))
      : step;
    const b = clamp(a + direction * distance);
    const fb = f(b);
    evaluations++;
    if (!Number.isFinite(fb)) {
      step = distance / 4;
      if (step < 1e-9) return { status: 'failed', x: a, evaluations, slope };
      continue;
    }
    if (fb === 0 || fa * fb < 0) {
      // The bracket's secant slope: a start for the next similar search.
      const secant = (fb - fa) / (b - a);
      if (secant > 0 && Number.isFinite(secant)) slope = secant;
      const root = brent(f, a, b, tolerance, MAX_EVALUATIONS, { fa, fb });
      evaluations += root.evaluations;
      return root.converged
        ? { status: 'root', x: root.x, evaluations, slope }
        : { status: 'failed', x: root.x, evaluations, slope };
    }
    slope = (fb - fa) / (b - a) || slope;
    if (!(slope > 0)) slope = Math.abs(slope) || 1;
    step = distance;
    a = b;
    fa = fb;
  }
  return { status: 'failed', x: a, evaluations, slope };
}
