/**
 * Irvine's elastic catenary (Cable Structures, 1981, §1.3), extended to concentrated loads
 * hung at horizontal positions, solved here independently of the core for reference values.
 * A at (0, 0), B at (l, h), z up; w weight per unstressed metre; V upward reaction at A;
 * between loads the vertical force is V(s) = Vₐ − w (s − sₐ) and each piece is an elastic
 * catenary:  Δx = H Δs/EA + (H/w)[asinh(Vₐ/H) − asinh(V_b/H)],
 *            Δz = −(Vₐ Δs − w Δs²/2)/EA + (H/w)[√(1 + (V_b/H)²) − √(1 + (Vₐ/H)²)].
 * Unknowns H, V and the material points sₖ of the loads; Newton with an ml-matrix linear solve.
 */
import { Matrix, solve } from 'ml-matrix';

export interface CatenaryInput {
  span: number;
  rise: number;
  unstressedLength: number;
  weightPerLength: number;
  axialStiffness: number;
  /** Concentrated loads: horizontal position (m) and force (N). */
  pointLoads?: { x: number; force: number }[];
}

export interface CatenarySolution {
  H: number;
  V: number;
  maxTension: number;
  sag: number;
  lowestZ: number;
}

interface Piece {
  sStart: number;
  sEnd: number;
  vStart: number;
}

function pieces(p: CatenaryInput, V: number, sLoads: number[]): Piece[] {
  const loads = p.pointLoads ?? [];
  const result: Piece[] = [];
  let s = 0;
  let v = V;
  for (let k = 0; k <= loads.length; k++) {
    const end = k < loads.length ? sLoads[k] : p.unstressedLength;
    result.push({ sStart: s, sEnd: end, vStart: v });
    v -= p.weightPerLength * (end - s) + (k < loads.length ? loads[k].force : 0);
    s = end;
  }
  return result;
}

/** Position (x, z) at material distance ds into a piece. */
function along(p: CatenaryInput, H: number, piece: Piece, ds: number): { x: number; z: number } {
  const w = p.weightPerLength;
  const EA = p.axialStiffness;
  const va = piece.vStart;
  const vb = va - w * ds;
  return {
    x: (H * ds) / EA + (H / w) * (Math.asinh(va / H) - Math.asinh(vb / H)),
    z:
      -(va * ds - (w * ds * ds) / 2) / EA +
      (H / w) * (Math.hypot(1, vb / H) - Math.hypot(1, va / H)),
  };
}

function residual(p: CatenaryInput, u: number[]): number[] {
  const [lnH, V, ...sLoads] = u;
  const H = Math.exp(lnH);
  const ps = pieces(p, V, sLoads);
  const loads = p.pointLoads ?? [];
  const out: number[] = [];
  let x = 0;
  let z = 0;
  ps.forEach((piece, k) => {
    const d = along(p, H, piece, piece.sEnd - piece.sStart);
    x += d.x;
    z += d.z;
    if (k < loads.length) out.push(x - loads[k].x);
  });
  out.push(x - p.span, z - p.rise);
  return out;
}

export function solveElasticCatenary(p: CatenaryInput, guessH: number): CatenarySolution {
  const loads = p.pointLoads ?? [];
  const total = p.weightPerLength * p.unstressedLength + loads.reduce((a, l) => a + l.force, 0);
  let u = [Math.log(guessH), total / 2, ...loads.map((l) => (l.x / p.span) * p.unstressedLength)];
  for (let it = 0; it < 100; it++) {
    const f = residual(p, u);
    if (Math.max(...f.map(Math.abs)) < 1e-12 * p.span) break;
    const J = new Matrix(f.length, u.length);
    u.forEach((value, j) => {
      const step = 1e-7 * Math.max(1, Math.abs(value));
      const shifted = [...u];
      shifted[j] += step;
      residual(p, shifted).forEach((g, i) => {
        J.set(i, j, (g - f[i]) / step);
      });
    });
    const delta = solve(J, Matrix.columnVector(f.map((v) => -v))).to1DArray();
    const damp = Math.min(1, 0.5 / Math.max(1e-300, Math.abs(delta[0]))); // keep ln H steps ≤ 0.5
    u = u.map((v, j) => v + damp * delta[j]);
  }
  const [lnH, V, ...sLoads] = u;
  const H = Math.exp(lnH);
  const w = p.weightPerLength;
  let maxTension = 0;
  let sag = 0;
  let lowestZ = 0;
  let x0 = 0;
  let z0 = 0;
  for (const piece of pieces(p, V, sLoads)) {
    const length = piece.sEnd - piece.sStart;
    const candidates = [0, length, (piece.vStart + (H * p.rise) / p.span) / w, piece.vStart / w];
    for (const ds of candidates.filter((d) => d >= 0 && d <= length)) {
      const at = along(p, H, piece, ds);
      sag = Math.max(sag, (p.rise * (x0 + at.x)) / p.span - (z0 + at.z));
      lowestZ = Math.min(lowestZ, z0 + at.z);
    }
    const vEnd = piece.vStart - w * length;
    maxTension = Math.max(maxTension, Math.hypot(H, piece.vStart), Math.hypot(H, vEnd));
    const end = along(p, H, piece, length);
    x0 += end.x;
    z0 += end.z;
  }
  return { H, V, maxTension, sag, lowestZ };
}
