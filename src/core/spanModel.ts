/**
 * One span between two supports as a string FE problem in deflection below the chord, v (m, down):
 * −H v'' = q, v = 0 at both supports, so v = v₁ / H with K₁ v₁ = R (K₁ factorised once).
 * Inside an element the load is uniform, so the exact shape there is the parabola through the
 * nodal values: v'(x) = (m_e − q_e L_e ξ / 2) / H, ξ ∈ [−1, 1]. The lateral swing y works alike.
 */
import type { CaseLoads } from './loads.ts';
import type { ElementOrder } from './stringElements.ts';
import { buildStringMesh, type StringMesh, vertexNear } from './stringMesh.ts';
import { addElementLoads, createStringSystem, type StringSystem } from './stringSystem.ts';

/** ±1/√3: two-point Gauss–Legendre abscissae, used for arc length and unstressed length. */
export const GAUSS2 = 1 / Math.sqrt(3);

export interface SpanModel {
  readonly x0: number;
  readonly z0: number;
  readonly x1: number;
  readonly z1: number;
  /** Chord slope (z1 − z0)/(x1 − x0). */
  readonly chordSlope: number;
  readonly mesh: StringMesh;
  readonly system: StringSystem;
  readonly elementLength: Float64Array;
  /** Hung loads' own weight in the current case per element, N per horizontal metre. */
  readonly hungVertical: Float64Array;
  /** Ice and wind on hung cables per element, N per metre of cable along the wire. */
  readonly hungIceAlong: Float64Array;
  readonly hungWindAlong: Float64Array;
  /** Point loads of the current case: node index → downward force N and sideways wind N. */
  pointNodes: number[];
  pointForces: number[];
  pointLateral: number[];
  /** Current element loads (N per horizontal metre) used for the shape. */
  readonly qVertical: Float64Array;
  readonly qLateral: Float64Array;
  /** True when any element carries a sideways load (else y₁ = 0 and its solve is skipped). */
  lateralLoaded: boolean;
  /** Unit-tension nodal solutions v₁, y₁ (N·m). */
  readonly v1: Float64Array;
  readonly y1: Float64Array;
  /** Unit-tension element chord slopes m_e of v₁ and y₁. */
  readonly slopeV1: Float64Array;
  readonly slopeY1: Float64Array;
  /** Unstressed length of each element at the last evaluated state, m, and its d/dH (m/N). */
  readonly unstressedElement: Float64Array;
  readonly unstressedElementSlope: Float64Array;
  /** Arc length of each element at the last evaluated state, m, and its d/dH (m/N). */
  readonly arcElement: Float64Array;
  readonly arcElementSlope: Float64Array;
}

export function createSpanModel(
  x0: number,
  z0: number,
  x1: number,
  z1: number,
  breakpoints: readonly number[],
  elementCount: number,
  order: ElementOrder,
  subdivide = 1,
): SpanModel {
  const mesh = buildStringMesh(x0, x1, breakpoints, elementCount, order, subdivide);
  const ne = mesh.elementCount;
  const elementLength = new Float64Array(ne);
  for (let e = 0; e < ne; e++) elementLength[e] = mesh.vertexX[e + 1] - mesh.vertexX[e];
  const nodes = mesh.nodeX.length;
  return {
    x0,
    z0,
    x1,
    z1,
    chordSlope: (z1 - z0) / (x1 - x0),
    mesh,
    system: createStringSystem(mesh),
    elementLength,
    hungVertical: new Float64Array(ne),
    hungIceAlong: new Float64Array(ne),
    hungWindAlong: new Float64Array(ne),
    pointNodes: [],
    pointForces: [],
    pointLateral: [],
    qVertical: new Float64Array(ne),
    qLateral: new Float64Array(ne),
    lateralLoaded: false,
    v1: new Float64Array(nodes),
    y1: new Float64Array(nodes),
    slopeV1: new Float64Array(ne),
    slopeY1: new Float64Array(ne),
    unstressedElement: new Float64Array(ne),
    unstressedElementSlope: new Float64Array(ne),
    arcElement: new Float64Array(ne),
    arcElementSlope: new Float64Array(ne),
  };
}

/**
 * Put one case's hung loads on the span: own weight per horizontal metre, ice and wind on hung
 * cables per metre of cable (turned into per horizontal metre by the theory's ds/dx), point forces.
 */
export function applyHungLoads(span: SpanModel, loads: CaseLoads): void {
  const { mesh, hungVertical, hungIceAlong, hungWindAlong } = span;
  hungVertical.fill(0);
  hungIceAlong.fill(0);
  hungWindAlong.fill(0);
  for (const u of loads.uniform) {
    for (let e = 0; e < mesh.elementCount; e++) {
      const mid = 0.5 * (mesh.vertexX[e] + mesh.vertexX[e + 1]);
      if (mid > u.from && mid < u.to) {
        hungVertical[e] += u.verticalNPerM;
        hungIceAlong[e] += u.iceNPerM;
        hungWindAlong[e] += u.windNPerM;
      }
    }
  }
  span.pointNodes = [];
  span.pointForces = [];
  span.pointLateral = [];
  const tol = 1e-9 * Math.max(1, span.x1 - span.x0);
  for (const p of loads.points) {
    if (p.x <= span.x0 + tol || p.x >= span.x1 - tol) continue; // carried by the support itself
    span.pointNodes.push(vertexNear(mesh, p.x) * mesh.order);
    span.pointForces.push(p.forceN);
    span.pointLateral.push(p.lateralN);
  }
}

/** Solve the unit-tension shapes v₁ and y₁ for the current element loads (two O(n) solves). */
export function solveUnitShapes(span: SpanModel): void {
  const { mesh, v1, y1 } = span;
  const last = v1.length - 1;
  v1.fill(0);
  addElementLoads(mesh, span.qVertical, v1);
  for (let i = 0; i < span.pointNodes.length; i++) v1[span.pointNodes[i]] += span.pointForces[i];
  y1.fill(0);
  if (span.lateralLoaded) {
    addElementLoads(mesh, span.qLateral, y1);
    for (let i = 0; i < span.pointNodes.length; i++) y1[span.pointNodes[i]] += span.pointLateral[i];
  }
  if (last > 1) {
    span.system.factor.solve(v1.subarray(1, last));
    if (span.lateralLoaded) span.system.factor.solve(y1.subarray(1, last));
  }
  v1[0] = 0;
  v1[last] = 0;
  y1[0] = 0;
  y1[last] = 0;
  const p = mesh.order;
  for (let e = 0; e < mesh.elementCount; e++) {
    const L = span.elementLength[e];
    span.slopeV1[e] = (v1[(e + 1) * p] - v1[e * p]) / L;
    span.slopeY1[e] = (y1[(e + 1) * p] - y1[e * p]) / L;
  }
}
