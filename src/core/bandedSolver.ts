/**
 * Direct solvers for the symmetric banded systems of the string finite elements.
 * Tridiagonal (linear elements) and pentadiagonal, half-bandwidth 2 (quadratic elements).
 * Factor once (LDLᵀ, no pivoting: the string stiffness is symmetric positive definite once
 * the supports are prescribed), then solve many right-hand sides in O(n) each.
 */

/** A factorised symmetric band matrix; solve() overwrites and returns its argument. */
export interface BandFactor {
  readonly size: number;
  /** Overwrites `rhs` with the solution; with `source`, the right-hand side is read from there. */
  solve(rhs: Float64Array, source?: Float64Array): Float64Array;
}

/**
 * LDLᵀ of a symmetric tridiagonal matrix with diagonal `diag` and off-diagonal `off`
 * (off[i] couples i and i+1). Throws when a pivot is not positive (matrix not SPD).
 */
export function factorTridiagonal(diag: Float64Array, off: Float64Array): BandFactor {
  const n = diag.length;
  const d = new Float64Array(n);
  const l = new Float64Array(Math.max(n - 1, 0));
  for (let i = 0; i < n; i++) {
    let pivot = diag[i];
    if (i > 0) pivot -= l[i - 1] * l[i - 1] * d[i - 1];
    if (!(pivot > 0)) throw new Error(`tridiagonal matrix is not positive definite at row ${i}`);
    d[i] = pivot;
    if (i < n - 1) l[i] = off[i] / pivot;
  }
  return {
    size: n,
    solve(rhs: Float64Array, source?: Float64Array): Float64Array {
      if (source) {
        if (n > 0) rhs[0] = source[0];
        for (let i = 1; i < n; i++) rhs[i] = source[i] - l[i - 1] * rhs[i - 1];
      } else for (let i = 1; i < n; i++) rhs[i] -= l[i - 1] * rhs[i - 1];
      for (let i = 0; i < n; i++) rhs[i] /= d[i];
      for (let i = n - 2; i >= 0; i--) rhs[i] -= l[i] * rhs[i + 1];
      return rhs;
    },
  };
}

/**
 * LDLᵀ of a symmetric pentadiagonal matrix: diagonal `diag`, first off-diagonal `off1`
 * (i, i+1) and second off-diagonal `off2` (i, i+2).
 */
export function factorPentadiagonal(
  diag: Float64Array,
  off1: Float64Array,
  off2: Float64Array,
): BandFactor {
  const n = diag.length;
  const d = new Float64Array(n);
  const l1 = new Float64Array(n); // L[i+1][i]
  const l2 = new Float64Array(n); // L[i+2][i]
  for (let i = 0; i < n; i++) {
    let pivot = diag[i];
    if (i >= 1) pivot -= l1[i - 1] * l1[i - 1] * d[i - 1];
    if (i >= 2) pivot -= l2[i - 2] * l2[i - 2] * d[i - 2];
    if (!(pivot > 0)) throw new Error(`band matrix is not positive definite at row ${i}`);
    d[i] = pivot;
    if (i + 1 < n) {
      let a = off1[i];
      if (i >= 1) a -= l2[i - 1] * l1[i - 1] * d[i - 1];
      l1[i] = a / pivot;
    }
    if (i + 2 < n) l2[i] = off2[i] / pivot;
  }
  return {
    size: n,
    solve(rhs: Float64Array, source?: Float64Array): Float64Array {
      if (source) rhs.set(source.subarray(0, n));
      for (let i = 1; i < n; i++) {
        rhs[i] -= l1[i - 1] * rhs[i - 1];
        if (i >= 2) rhs[i] -= l2[i - 2] * rhs[i - 2];
      }
      for (let i = 0; i < n; i++) rhs[i] /= d[i];
      for (let i = n - 2; i >= 0; i--) {
        rhs[i] -= l1[i] * rhs[i + 1];
        if (i + 2 < n) rhs[i] -= l2[i] * rhs[i + 2];
      }
      return rhs;
    },
  };
}
