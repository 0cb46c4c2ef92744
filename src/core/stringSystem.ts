/**
 * Assembled string problem −H u'' = q on one mesh with prescribed end values.
 * The stiffness is H times a fixed matrix K₁, so K₁ (interior rows) is factorised once and every
 * load case and tension reuses it: u = u_ends + K₁⁻¹ R / H. Loads R are consistent nodal loads (N).
 */
import { type BandFactor, factorPentadiagonal, factorTridiagonal } from './bandedSolver.ts';
import {
  elementStiffness,
  GAUSS5_POINTS,
  GAUSS5_WEIGHTS,
  shapeDerivatives,
  shapeFunctions,
} from './stringElements.ts';
import { elementAt, type StringMesh, vertexNear } from './stringMesh.ts';

export interface StringSystem {
  readonly mesh: StringMesh;
  /** Factor of K₁ (unit tension) restricted to the interior nodes. */
  readonly factor: BandFactor;
}

/** Assemble and factorise K₁ for the interior nodes of `mesh`. */
export function createStringSystem(mesh: StringMesh): StringSystem {
  const p = mesh.order;
  const n = mesh.nodeX.length - 2; // interior unknowns
  const diag = new Float64Array(n);
  const off1 = new Float64Array(Math.max(n, 1));
  const off2 = new Float64Array(Math.max(n, 1));
  for (let e = 0; e < mesh.elementCount; e++) {
    const first = e * p;
    const k = elementStiffness(p, mesh.vertexX[e + 1] - mesh.vertexX[e], 1);
    for (let a = 0; a <= p; a++) {
      const row = first + a - 1;
      if (row < 0 || row >= n) continue;
      diag[row] += k[a][a];
      for (let b = a + 1; b <= p; b++) {
        const col = first + b - 1;
        if (col >= n) continue;
        if (b - a === 1) off1[row] += k[a][b];
        else off2[row] += k[a][b];
      }
    }
  }
  const factor = p === 1 ? factorTridiagonal(diag, off1) : factorPentadiagonal(diag, off1, off2);
  return { mesh, factor };
}

/** Add the consistent loads of element-wise uniform loads qElement (N/m) into R (per node). */
export function addElementLoads(
  mesh: StringMesh,
  qElement: ArrayLike<number>,
  R: Float64Array,
): void {
  // Closed forms of elementUniformLoad, written out: this runs in the solver's inner loop.
  const v = mesh.vertexX;
  if (mesh.order === 1) {
    for (let e = 0; e < mesh.elementCount; e++) {
      const r = 0.5 * qElement[e] * (v[e + 1] - v[e]);
      R[e] += r;
      R[e + 1] += r;
    }
    return;
  }
  for (let e = 0; e < mesh.elementCount; e++) {
    const r = (qElement[e] * (v[e + 1] - v[e])) / 6;
    R[2 * e] += r;
    R[2 * e + 1] += 4 * r;
    R[2 * e + 2] += r;
  }
}

/** Add consistent loads of a load function q(x) (N/m), 5-point Gauss per element. */
export function addLoadFunction(mesh: StringMesh, q: (x: number) => number, R: Float64Array): void {
  const p = mesh.order;
  for (let e = 0; e < mesh.elementCount; e++) {
    const xa = mesh.vertexX[e];
    const half = (mesh.vertexX[e + 1] - xa) / 2;
    for (let g = 0; g < GAUSS5_POINTS.length; g++) {
      const xi = GAUSS5_POINTS[g];
      const value = q(xa + half * (1 + xi)) * GAUSS5_WEIGHTS[g] * half;
      const N = shapeFunctions(p, xi);
      for (let a = 0; a <= p; a++) R[e * p + a] += N[a] * value;
    }
  }
}

/** Add a point load P (N) at x; x must be a vertex node of the mesh (see buildStringMesh). */
export function addPointLoad(mesh: StringMesh, x: number, forceN: number, R: Float64Array): void {
  R[vertexNear(mesh, x) * mesh.order] += forceN;
}

/**
 * Solve −H u'' = q with u(start) = uStart, u(end) = uEnd, given nodal loads R (N).
 * Returns nodal u for every node. The end values enter through the K₁ coupling only.
 */
export function solveString(
  system: StringSystem,
  tensionN: number,
  R: Float64Array,
  uStart = 0,
  uEnd = 0,
): Float64Array {
  const { mesh, factor } = system;
  const count = mesh.nodeX.length;
  const rhs = new Float64Array(count - 2);
  for (let i = 0; i < rhs.length; i++) rhs[i] = R[i + 1] / tensionN;
  // Move the prescribed end values to the right-hand side: rhs −= K₁[interior, end] · u_end.
  const p = mesh.order;
  const kFirst = elementStiffness(p, mesh.vertexX[1] - mesh.vertexX[0], 1);
  const lastE = mesh.elementCount - 1;
  const kLast = elementStiffness(p, mesh.vertexX[lastE + 1] - mesh.vertexX[lastE], 1);
  for (let a = 1; a <= p; a++) if (a - 1 < rhs.length) rhs[a - 1] -= kFirst[a][0] * uStart;
  for (let a = 0; a < p; a++) {
    const row = lastE * p + a - 1;
    if (row >= 0) rhs[row] -= kLast[a][p] * uEnd;
  }
  factor.solve(rhs);
  const u = new Float64Array(count);
  u[0] = uStart;
  u[count - 1] = uEnd;
  u.set(rhs, 1);
  return u;
}

/** Finite element interpolation of nodal values u at x: value and slope du/dx. */
export function interpolate(
  mesh: StringMesh,
  u: ArrayLike<number>,
  x: number,
): { value: number; slope: number } {
  const e = elementAt(mesh, x);
  const xa = mesh.vertexX[e];
  const length = mesh.vertexX[e + 1] - xa;
  const xi = (2 * (x - xa)) / length - 1;
  const N = shapeFunctions(mesh.order, xi);
  const dN = shapeDerivatives(mesh.order, xi);
  let value = 0;
  let slope = 0;
  for (let a = 0; a <= mesh.order; a++) {
    value += N[a] * u[e * mesh.order + a];
    slope += (dN[a] * 2 * u[e * mesh.order + a]) / length;
  }
  return { value, slope };
}
