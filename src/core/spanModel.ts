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
  /** 1 / elementLength. */
  readonly inverseLength: Float64Array;
  /** Hung loads' own weight in the current case per element, N per horizontal metre. */
  readonly hungVertical: Float64Array;
  /** Ice and wind on hung cables per element, N per metre of cable along the wire. */
  readonly hungIceAlong: Float64Array;
  readonly hungWindAlong: Float64Array;
  /** True when a hung cable carries ice or wind here (then its load follows the arc length). */
  hungAlong: boolean;
  /** The uniform hung loads last spread over the elements (applyHungLoads skips a repeat). */
  spreadLoads: string;
  /** Point loads of the current case: node index → downward force N and sideways wind N. */
  pointNodes: number[];
  pointForces: number[];
  pointLateral: number[];
  /** Current element loads (N per horizontal metre) used for the shape. */
  readonly qVertical: Float64Array;
  readonly qLateral: Float64Array;
  /** True when any element carries a sideways load (else y₁ = 0 and its solve is skipped). */
  lateralLoaded: boolean;
  /** Consistent nodal loads of the element loads, assembled by updateLoads (N). */
  readonly loadV: Float64Array;
  readonly loadY: Float64Array;
  /** Unit-tension nodal solutions v₁, y₁ (N·m). */
  readonly v1: Float64Array;
  readonly y1: Float64Array;
  /** Unit-tension element chord slopes m_e of v₁ and y₁. */
  readonly slopeV1: Float64Array;
  readonly slopeY1: Float64Array;
  /** Unstressed length of each element at the last evaluated state, m, and its d/dH (m/N). */
  readonly unstressedElement: Float64Array;
  readonly unstressedElementSlope: Float64Array;
  /** Arc length of each element at the last evaluated state, m, and its d/dH (m/N); kept only
   * while a hung cable carries ice or wind (hungAlong). */
  readonly arcElement: Float64Array;
  readonly arcElementSlope: Float64Array;
  /** The horizontal tension (N) at which the element lengths above were stored; NaN before. */
  storedTensionN: number;
}

function inverseOf(values: Float64Array): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = 1 / values[i];
  return out;
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
    inverseLength: inverseOf(elementLength),
    hungVertical: new Float64Array(ne),
    hungIceAlong: new Float64Array(ne),
    hungWindAlong: new Float64Array(ne),
    hungAlong: false,
    spreadLoads: '',
    pointNodes: [],
    pointForces: [],
    pointLateral: [],
    qVertical: new Float64Array(ne),
    qLateral: new Float64Array(ne),
    lateralLoaded: false,
    loadV: new Float64Array(nodes),
    loadY: new Float64Array(nodes),
    v1: new Float64Array(nodes),
    y1: new Float64Array(nodes),
    slopeV1: new Float64Array(ne),
    slopeY1: new Float64Array(ne),
    unstressedElement: new Float64Array(ne),
    unstressedElementSlope: new Float64Array(ne),
    arcElement: new Float64Array(ne),
    arcElementSlope: new Float64Array(ne),
    storedTensionN: Number.NaN,
  };
}

/**
 * Put one case's hung loads on the span: own weight per horizontal metre, ice and wind on hung
 * cables per metre of cable (turned into per horizontal metre by the theory's ds/dx), point forces.
 */
export function applyHungLoads(span: SpanModel, loads: CaseLoads): void {
  const { mesh, hungVertical, hungIceAlong, hungWindAlong } = span;
  // The same uniform loads as last time (every set-up row, most cases): nothing to spread.
  const key = JSON.stringify(loads.uniform);
  if (key !== span.spreadLoads) {
    span.spreadLoads = key;
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
    span.hungAlong = hungIceAlong.some((q) => q !== 0) || hungWindAlong.some((q) => q !== 0);
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

/**
 * Solve the unit-tension shapes v₁ and y₁ for the current element loads (two O(n) solves).
 * With `assembled` the element loads' consistent nodal loads are already in loadV and loadY
 * (updateLoads puts them there in the same pass as it sets the loads).
 */
export function solveUnitShapes(span: SpanModel, assembled = false): void {
  const { mesh, v1, y1 } = span;
  const last = v1.length - 1;
  const R = span.loadV;
  const Ry = span.loadY;
  if (!assembled) {
    R.fill(0);
    addElementLoads(mesh, span.qVertical, R);
    Ry.fill(0);
    if (span.lateralLoaded) addElementLoads(mesh, span.qLateral, Ry);
  }
  for (let i = 0; i < span.pointNodes.length; i++) R[span.pointNodes[i]] += span.pointForces[i];
  if (span.lateralLoaded)
    for (let i = 0; i < span.pointNodes.length; i++) Ry[span.pointNodes[i]] += span.pointLateral[i];
  if (last > 1) {
    span.system.factor.solve(v1.subarray(1, last), R.subarray(1, last));
    if (span.lateralLoaded) span.system.factor.solve(y1.subarray(1, last), Ry.subarray(1, last));
    else y1.fill(0);
  }
  v1[0] = 0;
  v1[last] = 0;
  y1[0] = 0;
  y1[last] = 0;
  const p = mesh.order;
  const lengths = span.elementLength;
  const mv = span.slopeV1;
  const my = span.slopeY1;
  if (!span.lateralLoaded) {
    // y₁ = 0 (its solve was skipped): only its slopes need clearing.
    const inverse = span.inverseLength;
    for (let e = 0; e < mesh.elementCount; e++) mv[e] = (v1[(e + 1) * p] - v1[e * p]) * inverse[e];
    my.fill(0);
    return;
  }
  for (let e = 0; e < mesh.elementCount; e++) {
    const L = lengths[e];
    mv[e] = (v1[(e + 1) * p] - v1[e * p]) / L;
    my[e] = (y1[(e + 1) * p] - y1[e * p]) / L;
  }
}
