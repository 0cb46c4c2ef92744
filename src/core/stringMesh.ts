/**
 * Mesh of one span [x0, x1] (m) for the string elements: a node at every breakpoint (support,
 * point load, load boundary), elements spread over the segments in proportion to their length.
 * Quadratic elements add a midside node. Element e uses nodes e·p … e·p + p (p = order).
 */
import type { ElementOrder } from './stringElements.ts';

export interface StringMesh {
  readonly order: ElementOrder;
  /** Node positions, increasing, m. */
  readonly nodeX: Float64Array;
  /** Element end positions (the vertex nodes), m: elementCount + 1 values. */
  readonly vertexX: Float64Array;
  readonly elementCount: number;
}

const MERGE_TOLERANCE_M = 1e-9;

/** Sorted, de-duplicated breakpoints strictly inside (x0, x1), plus the ends. */
function breakpointsOf(x0: number, x1: number, interior: readonly number[]): number[] {
  const tol = MERGE_TOLERANCE_M * Math.max(1, Math.abs(x1 - x0));
  const points = [x0, x1, ...interior.filter((x) => x > x0 + tol && x < x1 - tol)];
  points.sort((a, b) => a - b);
  const unique: number[] = [points[0]];
  for (let i = 1; i < points.length; i++) {
    if (points[i] - unique[unique.length - 1] > tol) unique.push(points[i]);
  }
  return unique;
}

/**
 * Build a mesh with about `elementCount` elements (at least one per segment between
 * breakpoints), so that every breakpoint is a vertex node. `subdivide` k splits every element of
 * that mesh into k equal ones: the refined mesh nests the first and always differs from it.
 */
export function buildStringMesh(
  x0: number,
  x1: number,
  interiorBreakpoints: readonly number[],
  elementCount: number,
  order: ElementOrder,
  subdivide = 1,
): StringMesh {
  const points = breakpointsOf(x0, x1, interiorBreakpoints);
  const total = x1 - x0;
  const perSegment: number[] = [];
  for (let s = 0; s + 1 < points.length; s++) {
    const share = ((points[s + 1] - points[s]) / total) * elementCount;
    perSegment.push(Math.max(1, Math.round(share)) * subdivide);
  }
  const count = perSegment.reduce((a, b) => a + b, 0);
  const vertexX = new Float64Array(count + 1);
  let k = 0;
  for (let s = 0; s < perSegment.length; s++) {
    const a = points[s];
    const b = points[s + 1];
    for (let j = 0; j < perSegment[s]; j++) vertexX[k++] = a + ((b - a) * j) / perSegment[s];
  }
  vertexX[count] = x1;
  const nodeX = order === 1 ? vertexX : new Float64Array(2 * count + 1);
  if (order === 2) {
    for (let e = 0; e < count; e++) {
      nodeX[2 * e] = vertexX[e];
      nodeX[2 * e + 1] = 0.5 * (vertexX[e] + vertexX[e + 1]);
    }
    nodeX[2 * count] = x1;
  }
  return { order, nodeX, vertexX, elementCount: count };
}

/** Index of the element holding x (clamped to the mesh), by bisection on the vertices. */
export function elementAt(mesh: StringMesh, x: number): number {
  const v = mesh.vertexX;
  let lo = 0;
  let hi = mesh.elementCount - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (v[mid] <= x) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Index of the vertex node nearest to x (used to put point loads on their node). */
export function vertexNear(mesh: StringMesh, x: number): number {
  const e = elementAt(mesh, x);
  const v = mesh.vertexX;
  return Math.abs(v[e + 1] - x) < Math.abs(v[e] - x) ? e + 1 : e;
}
