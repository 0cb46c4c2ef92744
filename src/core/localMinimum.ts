/**
 * Brent's local minimiser without derivatives (R. P. Brent, Algorithms for Minimization without
 * Derivatives, 1973, ch. 5, procedure localmin): golden-section steps with parabolic
 * interpolation on [a, b], to |x − x*| ≲ 2·tolerance. Bounded: at most maxEvaluations calls.
 */

export interface MinimumResult {
  x: number;
  value: number;
  evaluations: number;
}

const GOLDEN = (3 - Math.sqrt(5)) / 2;
const EPS = Math.sqrt(Number.EPSILON);

/** Smallest value of f on [a, b] near its local minimum; NaN values count as +∞. */
export function localMinimum(
  f: (x: number) => number,
  a0: number,
  b0: number,
  tolerance: number,
  maxEvaluations = 60,
): MinimumResult {
  const g = (x: number) => {
    const y = f(x);
    return Number.isNaN(y) ? Number.POSITIVE_INFINITY : y;
  };
  let a = a0;
  let b = b0;
  let x = a + GOLDEN * (b - a);
  let w = x;
  let v = x;
  let fx = g(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  let evaluations = 1;
  while (evaluations < maxEvaluations) {
    const m = 0.5 * (a + b);
    const tol1 = EPS * Math.abs(x) + tolerance;
    const t2 = 2 * tol1;
    if (Math.abs(x - m) <= t2 - 0.5 * (b - a)) break;
    let p = 0;
    let q = 0;
    if (Math.abs(e) > tol1) {
      const r = (x - w) * (fx - fv);
      q = (x - v) * (fx - fw);
      p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
    }
    const previous = e;
    if (Math.abs(p) < Math.abs(0.5 * q * previous) && p > q * (a - x) && p < q * (b - x)) {
      e = d;
      d = p / q;
      const u = x + d;
      if (u - a < t2 || b - u < t2) d = x < m ? tol1 : -tol1;
    } else {
      e = (x < m ? b : a) - x;
      d = GOLDEN * e;
    }
    const u = x + (Math.abs(d) >= tol1 ? d : d > 0 ? tol1 : -tol1);
    const fu = g(u);
    evaluations++;
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, value: fx, evaluations };
}
