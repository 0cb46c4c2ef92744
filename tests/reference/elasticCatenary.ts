/**
 * Irvine's elastic catenary (Cable Structures, 1981, §1.3), solved here independently of the
 * core for test reference values. A at (0, 0), B at (l, h), z up; w weight per unstressed metre,
 * L0 unstressed length, W = w L0, H horizontal tension, V upward reaction at A.
 *   l = H L0/EA + (H/w)[asinh(V/H) − asinh((V − W)/H)]
 *   h = −(L0/EA)(V − W/2) − (H/w)[√(1 + (V/H)²) − √(1 + ((V − W)/H)²)]
 */

export interface CatenaryInput {
  span: number;
  rise: number;
  unstressedLength: number;
  weightPerLength: number;
  axialStiffness: number;
}

export interface CatenarySolution {
  H: number;
  V: number;
  maxTension: number;
  sag: number;
  lowestZ: number;
  x(s: number): number;
  z(s: number): number;
}

function residual(p: CatenaryInput, H: number, V: number): [number, number] {
  const { span: l, rise: h, unstressedLength: L0, weightPerLength: w, axialStiffness: EA } = p;
  const W = w * L0;
  const rl = (H * L0) / EA + (H / w) * (Math.asinh(V / H) - Math.asinh((V - W) / H)) - l;
  const rh =
    -(L0 / EA) * (V - W / 2) -
    (H / w) * (Math.sqrt(1 + (V / H) ** 2) - Math.sqrt(1 + ((V - W) / H) ** 2)) -
    h;
  return [rl, rh];
}

/** Damped Newton with a finite-difference Jacobian on (ln H, V). */
export function solveElasticCatenary(p: CatenaryInput, guessH: number): CatenarySolution {
  let H = guessH;
  let V = (p.weightPerLength * p.unstressedLength) / 2;
  for (let it = 0; it < 200; it++) {
    const [f1, f2] = residual(p, H, V);
    if (Math.hypot(f1, f2) < 1e-13 * p.span) break;
    const dH = 1e-7 * H;
    const dV = 1e-7 * Math.max(Math.abs(V), H);
    const [a1, a2] = residual(p, H + dH, V);
    const [b1, b2] = residual(p, H, V + dV);
    const j11 = (a1 - f1) / dH;
    const j21 = (a2 - f2) / dH;
    const j12 = (b1 - f1) / dV;
    const j22 = (b2 - f2) / dV;
    const det = j11 * j22 - j12 * j21;
    let stepH = (-f1 * j22 + f2 * j12) / det;
    const stepV = (-j11 * f2 + j21 * f1) / det;
    let damp = 1;
    while (H + damp * stepH <= 0) damp /= 2;
    stepH *= damp;
    H += stepH;
    V += damp * stepV;
  }
  const { weightPerLength: w, axialStiffness: EA, unstressedLength: L0 } = p;
  const x = (s: number) =>
    (H * s) / EA + (H / w) * (Math.asinh(V / H) - Math.asinh((V - w * s) / H));
  const z = (s: number) =>
    -(V * s - (w * s * s) / 2) / EA +
    (H / w) * (Math.sqrt(1 + ((V - w * s) / H) ** 2) - Math.sqrt(1 + (V / H) ** 2));
  const sSag = Math.min(Math.max((V + (H * p.rise) / p.span) / w, 0), L0);
  const sLow = Math.min(Math.max(V / w, 0), L0);
  const W = w * L0;
  return {
    H,
    V,
    maxTension: Math.max(Math.hypot(H, V), Math.hypot(H, V - W)),
    sag: (p.rise * x(sSag)) / p.span - z(sSag),
    lowestZ: z(sLow),
    x,
    z,
  };
}
