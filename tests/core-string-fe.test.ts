/**
 * The string FE solution −H u'' = q against closed forms and a published worked example.
 * Sources: the parabolic cable of elementary statics (parabola z = h x/l − q x (l − x)/(2H));
 * published example 1 of doc/sources.md (textbook chapter "Uniform Flexible Suspension Cables",
 * Example 10.1); sine load closed form u = q₀ l²/(H π²) sin(π x/l) (elementary calculus).
 */
import { describe, expect, it } from 'vitest';
import type { ElementOrder } from '../src/core/stringElements.ts';
import { buildStringMesh } from '../src/core/stringMesh.ts';
import {
  addElementLoads,
  addLoadFunction,
  addPointLoad,
  createStringSystem,
  interpolate,
  solveString,
} from '../src/core/stringSystem.ts';

function uniformSolution(
  order: ElementOrder,
  elements: number,
  l: number,
  h: number,
  q: number,
  H: number,
) {
  const mesh = buildStringMesh(0, l, [], elements, order);
  const R = new Float64Array(mesh.nodeX.length);
  // Downward load q: in −H z'' = f the load along +z is f = −q.
  addElementLoads(mesh, new Float64Array(mesh.elementCount).fill(-q), R);
  return { mesh, z: solveString(createStringSystem(mesh), H, R, 0, h) };
}

const parabola = (x: number, l: number, h: number, q: number, H: number) =>
  (h * x) / l - (q * x * (l - x)) / (2 * H);

describe('uniform load: closed-form parabola (elementary statics)', () => {
  const [l, h, q, H] = [24, 0.6, 9.5, 850];

  it('linear elements: nodal values equal the parabola to 1e-12 relative', () => {
    const { mesh, z } = uniformSolution(1, 17, l, h, q, H);
    const scale = (q * l * l) / (8 * H);
    mesh.nodeX.forEach((x, i) => {
      expect(Math.abs(z[i] - parabola(x, l, h, q, H)) / scale).toBeLessThan(1e-12);
    });
  });

  it('quadratic elements: exact everywhere, not only at nodes', () => {
    const { mesh, z } = uniformSolution(2, 5, l, h, q, H);
    const scale = (q * l * l) / (8 * H);
    for (let k = 0; k <= 97; k++) {
      const x = (l * k) / 97;
      const { value, slope } = interpolate(mesh, z, x);
      expect(Math.abs(value - parabola(x, l, h, q, H)) / scale).toBeLessThan(1e-12);
      expect(slope).toBeCloseTo(h / l - (q * (l - 2 * x)) / (2 * H), 10);
    }
  });

  it('midspan sag from the chord is q l²/(8H)', () => {
    const { mesh, z } = uniformSolution(1, 20, l, h, q, H);
    const mid = interpolate(mesh, z, l / 2).value;
    expect(h / 2 - mid).toBeCloseTo((q * l * l) / (8 * H), 12);
  });
});

describe('published example 1: three point loads, unequal supports', () => {
  // A (0, 0), B (8, 2); 400, 600, 400 N at x = 2, 4, 6 m; point at x = 4 hangs 2.25 m below B.
  // Published: H = 1600 N, V_A = 300 N, V_B = 1100 N; point at x = 6 is 1.375 m below B;
  // first segment tension 1627.88 N; largest 1941.65 N at 34.51°.
  const mesh = buildStringMesh(0, 8, [2, 4, 6], 4, 1);
  const R = new Float64Array(mesh.nodeX.length);
  addPointLoad(mesh, 2, -400, R);
  addPointLoad(mesh, 4, -600, R);
  addPointLoad(mesh, 6, -400, R);
  const system = createStringSystem(mesh);
  // The shape below the chord scales as 1/H: find H from the given sag point (x = 4 at z = −0.25).
  const unit = solveString(system, 1, R, 0, 0);
  const H = interpolate(mesh, unit, 4).value / (-0.25 - 1);
  const z = solveString(system, H, R, 0, 2);

  it('horizontal tension H = 1600 N', () => expect(H).toBeCloseTo(1600, 9));
  it('point at x = 6 m is 1.375 m below B', () =>
    expect(2 - interpolate(mesh, z, 6).value).toBeCloseTo(1.375, 12));
  it('support reactions V_A = 300 N, V_B = 1100 N', () => {
    const slopeA = interpolate(mesh, z, 1).slope;
    const slopeB = interpolate(mesh, z, 7).slope;
    expect(-H * slopeA).toBeCloseTo(300, 9);
    expect(H * slopeB).toBeCloseTo(1100, 9);
  });
  it('segment tensions: first 1627.88 N, largest 1941.65 N at 34.51°', () => {
    const tensions = [1, 3, 5, 7].map((x) => H * Math.hypot(1, interpolate(mesh, z, x).slope));
    expect(tensions[0]).toBeCloseTo(1627.88, 2);
    expect(Math.max(...tensions)).toBeCloseTo(1941.65, 2);
    const angle = (Math.atan(interpolate(mesh, z, 7).slope) * 180) / Math.PI;
    expect(angle).toBeCloseTo(34.51, 2);
  });
});

describe('convergence for a non-uniform (sine) load', () => {
  const [l, H, q0] = [10, 500, 40];
  const exact = (x: number) =>
    ((q0 * l * l) / (H * Math.PI * Math.PI)) * Math.sin((Math.PI * x) / l);

  function maxError(order: ElementOrder, elements: number): number {
    const mesh = buildStringMesh(0, l, [], elements, order);
    const R = new Float64Array(mesh.nodeX.length);
    addLoadFunction(mesh, (x) => q0 * Math.sin((Math.PI * x) / l), R);
    const u = solveString(createStringSystem(mesh), H, R);
    let worst = 0;
    for (let k = 0; k <= 2000; k++) {
      const x = (l * k) / 2000;
      worst = Math.max(worst, Math.abs(interpolate(mesh, u, x).value - exact(x)));
    }
    return worst;
  }

  for (const [order, expectedRate] of [
    [1, 2],
    [2, 3],
  ] as const) {
    it(`order ${order} elements converge at rate ≥ ${expectedRate} in the largest deflection error`, () => {
      const sizes = [8, 16, 32, 64]; // asymptotic range
      const errors = sizes.map((n) => maxError(order, n));
      const rates = errors.slice(1).map((e, i) => Math.log2(errors[i] / e));
      console.log(
        `order ${order}: errors ${errors.map((e) => e.toExponential(2)).join(', ')}; rates ${rates.map((r) => r.toFixed(2)).join(', ')}`,
      );
      for (const rate of rates) expect(rate).toBeGreaterThan(expectedRate - 0.05);
    });
  }

  it('nodal values are exact for any load integrated exactly (1D Green function property)', () => {
    const mesh = buildStringMesh(0, l, [], 6, 1);
    const R = new Float64Array(mesh.nodeX.length);
    addLoadFunction(mesh, (x) => q0 * Math.sin((Math.PI * x) / l), R);
    const u = solveString(createStringSystem(mesh), H, R);
    mesh.nodeX.forEach((x, i) => {
      expect(u[i]).toBeCloseTo(exact(x), 6);
    });
  });
});
