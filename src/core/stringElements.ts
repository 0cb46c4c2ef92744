/**
 * Taut-string finite elements for −H u'' = q (u along the load q, H the horizontal tension, N;
 * q in N per horizontal metre). Derived from the potential Π = ∫ ½ H u'² − q u dx (doc/model.md):
 *   linear    K = (H/L)[1 −1; −1 1],                     R = (qL/2)[1 1]
 *   quadratic K = (H/3L)[7 −8 1; −8 16 −8; 1 −8 7],        R = (qL/6)[1 4 1]
 */

export type ElementOrder = 1 | 2;

/** Element stiffness matrix (row-major, (order+1)²) for length L (m) and tension H (N). */
export function elementStiffness(
  order: ElementOrder,
  lengthM: number,
  tensionN: number,
): number[][] {
  if (order === 1) {
    const k = tensionN / lengthM;
    return [
      [k, -k],
      [-k, k],
    ];
  }
  const k = tensionN / (3 * lengthM);
  return [
    [7 * k, -8 * k, k],
    [-8 * k, 16 * k, -8 * k],
    [k, -8 * k, 7 * k],
  ];
}

/** Consistent nodal loads of a uniform load q (N/m) on an element of length L (m). */
export function elementUniformLoad(
  order: ElementOrder,
  lengthM: number,
  loadNPerM: number,
): number[] {
  if (order === 1) {
    const r = (loadNPerM * lengthM) / 2;
    return [r, r];
  }
  const r = (loadNPerM * lengthM) / 6;
  return [r, 4 * r, r];
}

/** Shape functions at local coordinate ξ ∈ [−1, 1] (node order: start, [middle,] end). */
export function shapeFunctions(order: ElementOrder, xi: number): number[] {
  if (order === 1) return [(1 - xi) / 2, (1 + xi) / 2];
  return [(xi * (xi - 1)) / 2, 1 - xi * xi, (xi * (xi + 1)) / 2];
}

/** dN/dξ at ξ; multiply by 2/L for d/dx. */
export function shapeDerivatives(order: ElementOrder, xi: number): number[] {
  if (order === 1) return [-0.5, 0.5];
  return [xi - 0.5, -2 * xi, xi + 0.5];
}

/** Gauss–Legendre points and weights on [−1, 1], 5 points (exact to degree 9). */
export const GAUSS5_POINTS = [
  0, -0.5384693101056831, 0.5384693101056831, -0.906179845938664, 0.906179845938664,
];
export const GAUSS5_WEIGHTS = [
  0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850561891,
  0.2369268850561891,
];
