/**
 * Safeguarded scalar root finders. Every loop is bounded; no NaN leaves here.
 * - newtonBracketed: Newton steps kept inside a bracket, geometric bisection otherwise (x > 0).
 * - brent: Brent's method on a given sign-changing bracket.
 */

export interface RootResult {
  x: number;
  evaluations: number;
  converged: boolean;
}

/**
 * Root of a decreasing function f on (0, ∞) with derivative, from a positive guess.
 * The bracket is grown by factors of 4 until the sign changes (at most 60 times each way).
 */
export function newtonBracketed(
  f: (x: number) => { value: number; slope: number },
  guess: number,
  relativeTolerance = 1e-13,
  maxEvaluations = 200,
): RootResult {
  let lo = 0; // f(lo) > 0 (or lo = 0 unknown)
  let hi = Number.POSITIVE_INFINITY; // f(hi) < 0
  let x = guess > 0 && Number.isFinite(guess) ? guess : 1;
  for (let n = 1; n <= maxEvaluations; n++) {
    const { value, slope } = f(x);
    if (value === 0) return { x, evaluations: n, converged: true };
    if (value > 0) lo = x;
    else hi = x;
    let next = slope < 0 && Number.isFinite(slope) ? x - value / slope : Number.NaN;
    const bracketed = lo > 0 && Number.isFinite(hi);
    if (!(next > lo && next < hi)) {
      if (bracketed) next = Math.sqrt(lo * hi);
      else next = value > 0 ? x * 4 : x / 4;
    } else if (!bracketed) {
      next = Math.min(Math.max(next, x / 4), x * 4);
    }
    if (Math.abs(next - x) <= relativeTolerance * x)
      return { x: next, evaluations: n, converged: true };
    if (bracketed && hi - lo <= relativeTolerance * lo)
      return { x: next, evaluations: n, converged: true };
    if (next < 1e-300 || next > 1e300) return { x, evaluations: n, converged: false };
    x = next;
  }
  return { x, evaluations: maxEvaluations, converged: false };
}

/** Brent's method for f(a)·f(b) ≤ 0; returns converged=false if the bracket does not hold. */
export function brent(
  f: (x: number) => number,
  a0: number,
  b0: number,
  absoluteTolerance = 1e-12,
  maxEvaluations = 200,
  known?: { fa: number; fb: number },
): RootResult {
  let a = a0;
  let b = b0;
  let fa = known ? known.fa : f(a);
  let fb = known ? known.fb : f(b);
  let evaluations = known ? 0 : 2;
  if (fa === 0) return { x: a, evaluations, converged: true };
  if (fb === 0) return { x: b, evaluations, converged: true };
  if (!(fa * fb < 0)) return { x: b, evaluations, converged: false };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  while (evaluations < maxEvaluations) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + absoluteTolerance / 2;
    const m = (c - b) / 2;
    if (Math.abs(m) <= tol || fb === 0) return { x: b, evaluations, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations++;
  }
  return { x: b, evaluations, converged: false };
}

/**
 * Root of an increasing function that is nearly linear with the given slope near x0 (such as a
 * log quantity against log tension): secant steps (at most `maxStep`, within ±`range` of x0)
 * until |f| ≤ tolerance or the root is bracketed, then Brent. NaN values count as failure.
 */
export function solveNearlyLinear(
  f: (x: number) => number,
  x0: number,
  slope: number,
  tolerance = 1e-12,
  maxStep = 3,
  range = 25,
): RootResult {
  let evaluations = 0;
  // Evaluate at `to`; where f has no value there (NaN), back off halfway towards `from`.
  const toward = (from: number, to: number): { x: number; value: number } => {
    let x = to;
    for (let k = 0; k < 8; k++, x = from + (x - from) / 2) {
      const value = f(x);
      evaluations++;
      if (Number.isFinite(value)) return { x, value };
    }
    return { x, value: Number.NaN };
  };
  let a = x0;
  let fa = f(a);
  evaluations++;
  if (!Number.isFinite(fa)) return { x: a, evaluations, converged: false };
  if (fa === 0) return { x: a, evaluations, converged: true };
  const clampStep = (x: number, from: number) =>
    from + Math.max(-maxStep, Math.min(maxStep, x - from));
  let { x: b, value: fb } = toward(a, clampStep(a - fa / slope, a));
  while (Number.isFinite(fb) && Math.abs(fb) > tolerance && fa * fb > 0 && evaluations < 60) {
    if (Math.abs(b - x0) > range) break;
    const secant = b - (fb * (b - a)) / (fb - fa);
    const progress = Math.abs(fb) < Math.abs(fa) && Number.isFinite(secant);
    // Secant towards the root while it helps; otherwise step on, downhill, doubling the step.
    let c = progress
      ? clampStep(secant, b)
      : b + (fb > 0 ? -1 : 1) * Math.min(maxStep, 2 * Math.abs(b - a));
    if (Math.abs(c - b) < tolerance) c = b + (fb > 0 ? -tolerance : tolerance) * 10;
    a = b;
    fa = fb;
    ({ x: b, value: fb } = toward(a, c));
  }
  if (Math.abs(fb) <= tolerance) return { x: b, evaluations, converged: true };
  if (!(fa * fb < 0)) return { x: b, evaluations, converged: false };
  const root = brent(f, a, b, tolerance, 200, { fa, fb });
  return { x: root.x, evaluations: evaluations + root.evaluations, converged: root.converged };
}
