/**
 * String elements and band solvers against closed forms and an independent dense solver.
 * Sources: element matrices as derived in doc/model.md (minimum potential energy;
 * Reddy, An Introduction to the Finite Element Method, 3rd ed., ch. 3 [M]);
 * dense reference: ml-matrix LU decomposition (npm).
 */
import { solve as denseSolve, EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { factorPentadiagonal, factorTridiagonal } from '../src/core/bandedSolver.ts';
import {
  elementStiffness,
  elementUniformLoad,
  shapeFunctions,
} from '../src/core/stringElements.ts';

describe('element matrices (closed forms by minimum potential energy)', () => {
  it('linear element K = (H/L)[1 −1; −1 1], R = qL/2 [1 1]', () => {
    const K = elementStiffness(1, 2.5, 1000);
    expect(K).toEqual([
      [400, -400],
      [-400, 400],
    ]);
    expect(elementUniformLoad(1, 2.5, 8)).toEqual([10, 10]);
  });

  it('quadratic element K = (H/3L)[7 −8 1; −8 16 −8; 1 −8 7], R = qL/6 [1 4 1]', () => {
    const K = elementStiffness(2, 2, 600);
    expect(K).toEqual([
      [700, -800, 100],
      [-800, 1600, -800],
      [100, -800, 700],
    ]);
    expect(elementUniformLoad(2, 3, 4)).toEqual([2, 8, 2]);
  });

  for (const order of [1, 2] as const) {
    it(`order ${order}: K symmetric, rows sum to zero, singular before supports`, () => {
      const K = elementStiffness(order, 1.7, 321);
      for (let i = 0; i < K.length; i++) {
        expect(K[i].reduce((a, b) => a + b, 0)).toBeCloseTo(0, 12);
        for (let j = 0; j < K.length; j++) expect(K[i][j]).toBe(K[j][i]);
      }
      // A rigid shift costs no energy: K·1 = 0, so K is singular until a support is prescribed.
      const values = new EigenvalueDecomposition(new Matrix(K)).realEigenvalues.map(Math.abs);
      values.sort((a, b) => a - b);
      expect(values[0]).toBeLessThan(1e-9 * values[values.length - 1]);
      expect(values[1]).toBeGreaterThan(1e-3 * values[values.length - 1]);
    });

    it(`order ${order}: shape functions form a partition of unity`, () => {
      for (const xi of [-1, -0.3, 0, 0.71, 1]) {
        expect(shapeFunctions(order, xi).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
      }
    });
  }
});

/** Deterministic pseudo-random numbers (mulberry32). */
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('band solvers agree with a dense LU solve (ml-matrix)', () => {
  it('tridiagonal, SPD, n = 40, several right-hand sides on one factor', () => {
    const rnd = random(7);
    const n = 40;
    const diag = Float64Array.from({ length: n }, () => 4 + rnd());
    const off = Float64Array.from({ length: n - 1 }, () => -1 + 0.5 * rnd());
    const dense = Matrix.zeros(n, n);
    for (let i = 0; i < n; i++) {
      dense.set(i, i, diag[i]);
      if (i + 1 < n) {
        dense.set(i, i + 1, off[i]);
        dense.set(i + 1, i, off[i]);
      }
    }
    const factor = factorTridiagonal(diag, off);
    for (let k = 0; k < 3; k++) {
      const b = Float64Array.from({ length: n }, () => rnd() - 0.5);
      const expected = denseSolve(dense, Matrix.columnVector(Array.from(b))).to1DArray();
      const got = factor.solve(Float64Array.from(b));
      for (let i = 0; i < n; i++) expect(got[i]).toBeCloseTo(expected[i], 12);
    }
  });

  it('pentadiagonal, SPD, n = 41', () => {
    const rnd = random(11);
    const n = 41;
    const diag = Float64Array.from({ length: n }, () => 6 + rnd());
    const off1 = Float64Array.from({ length: n }, () => -1 + 0.3 * rnd());
    const off2 = Float64Array.from({ length: n }, () => 0.5 * rnd());
    const dense = Matrix.zeros(n, n);
    for (let i = 0; i < n; i++) {
      dense.set(i, i, diag[i]);
      if (i + 1 < n) dense.set(i, i + 1, off1[i]).set(i + 1, i, off1[i]);
      if (i + 2 < n) dense.set(i, i + 2, off2[i]).set(i + 2, i, off2[i]);
    }
    const b = Float64Array.from({ length: n }, () => rnd() - 0.5);
    const expected = denseSolve(dense, Matrix.columnVector(Array.from(b))).to1DArray();
    const got = factorPentadiagonal(diag, off1, off2).solve(Float64Array.from(b));
    for (let i = 0; i < n; i++) expect(got[i]).toBeCloseTo(expected[i], 12);
  });

  it('refuses a matrix that is not positive definite', () => {
    expect(() => factorTridiagonal(Float64Array.of(1, 1), Float64Array.of(2))).toThrow(
      /positive definite/,
    );
  });
});
