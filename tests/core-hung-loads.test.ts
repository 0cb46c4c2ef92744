/**
 * Hung items: wind on a point load's projected area, the drop of hung items below the wire in
 * the clearance, and ice and wind on a hung cable per metre of cable along the wire.
 * References: statics of a string under point and uniform loads (moment balance about a
 * support; the parabola z = chord − M(x)/H for loads per horizontal metre), the chord length
 * √(l² + h²) of an inclined span, and Irvine's elastic catenary (Cable Structures, 1981, §1.3;
 * tests/reference/elasticCatenary.ts).
 */
import { describe, expect, it } from 'vitest';
import { type Load, type Project, solveProject, validateProject } from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';
import { solveElasticCatenary } from './reference/elasticCatenary.ts';

const g = 9.80665;
const AIR = 1.225;
const ICE = 900;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function solved(project: Project) {
  const check = validateProject(project);
  if (!check.ok) throw new Error(JSON.stringify(check.issues));
  return solveProject(project);
}

describe('wind on a hung sign (statics of a string, sideways problem)', () => {
  const l = 24;
  const a = 8;
  const V = 25;
  const q = 0.5 * AIR * V * V; // 382.8 Pa
  const d = 0.005;
  const base = (sign: Load, env: Project['environment'] = {}): Project => ({
    ...singleSpan({
      span: l,
      massPerLength: 0.1,
      axialStiffness: 1e7,
      diameter: d,
      target: { horizontalTension: 2000 },
      theory: 'parabolic',
      elementsPerSpan: 48,
      loads: [sign],
      cases: [{ name: 'Gale', temperature: 15, iceThickness: 0, windSpeed: V, withLoads: true }],
    }),
    environment: { gravity: g, ...env },
  });

  it('1 m² at 25 m/s: lateral reactions P (l − a)/l + p l/2 and P a/l + p l/2', () => {
    const r = solved(base({ type: 'point', x: a, mass: 5, windArea: 1 }));
    const gale = r.cases[1];
    const P = q * 1 * 1.0;
    const p = q * 1.0 * d;
    expect(rel(gale.supports[0].lateral, (P * (l - a)) / l + (p * l) / 2)).toBeLessThan(1e-9);
    expect(rel(gale.supports[1].lateral, (P * a) / l + (p * l) / 2)).toBeLessThan(1e-9);
    // The sign alone carries more wind than the whole wire (P = 383 N vs p l = 46 N).
    expect(P).toBeGreaterThan(p * l);
    // Swing at the sign: y(a) = [P a (l − a)/l + p a (l − a)/2] / H.
    const H = gale.horizontalTension;
    const i = gale.profile?.x.findIndex((x) => Math.abs(x - a) < 1e-9) ?? -1;
    expect(i).toBeGreaterThan(0);
    const want = ((P * a * (l - a)) / l + (p * a * (l - a)) / 2) / H;
    expect(rel(gale.profile?.y[i] ?? 0, want)).toBeLessThan(1e-9);
    expect(gale.swing).toBeGreaterThanOrEqual(want * (1 - 1e-12));
    // Still air: no sideways pull at all.
    expect(r.cases[0].supports[0].lateral).toBe(0);
  });

  it('a windy case says which items state no wind area; an explicit 0 or still air says nothing', () => {
    const silent = solved(base({ type: 'point', x: a, mass: 5, label: 'Lantern' }));
    // One short line (it sits in the case's row under the verdict), naming the item.
    expect(silent.cases[1].messages).toContain('No wind area given for Lantern: no wind on it.');
    expect(silent.cases[0].messages.join(' ')).not.toMatch(/No wind area/);
    const zero = solved(base({ type: 'point', x: a, mass: 5, label: 'Lantern', windArea: 0 }));
    expect(zero.cases[1].messages.join(' ')).not.toMatch(/No wind area/);
  });

  it('drag coefficient: the environment default, or the item own value', () => {
    const ownDefault = solved(
      base({ type: 'point', x: a, mass: 5, windArea: 0.5 }, { dragCoefficient: 1.2 }),
    );
    const own = solved(base({ type: 'point', x: a, mass: 5, windArea: 0.5, dragCoefficient: 2 }));
    const p = q * 1.0 * d;
    const sumDefault = ownDefault.cases[1].supports.reduce((s, x) => s + x.lateral, 0);
    const sumOwn = own.cases[1].supports.reduce((s, x) => s + x.lateral, 0);
    expect(rel(sumDefault, q * 1.2 * 0.5 + q * 1.2 * d * l)).toBeLessThan(1e-9);
    expect(rel(sumOwn, q * 2 * 0.5 + p * l)).toBeLessThan(1e-9);
  });
});

describe('drop: clearance to the lowest of the wire and its hung items (parabola z = chord − M/H)', () => {
  const l = 20;
  const zSupport = 5;
  const m = 0.2;
  const w = m * g;
  const project = (loads: Load[], zones: Project['limits']['zones'] = []): Project => ({
    ...singleSpan({
      span: l,
      massPerLength: m,
      axialStiffness: 1e7,
      target: { horizontalTension: 1500 },
      theory: 'parabolic',
      elementsPerSpan: 40,
      loads,
      cases: [{ name: 'Bare', temperature: 15, iceThickness: 0, windSpeed: 0, withLoads: false }],
    }),
    supports: [
      { x: 0, z: zSupport },
      { x: l, z: zSupport },
    ],
    ground: [{ x: 0, z: 0 }],
    limits: { safetyFactor: 5, minClearance: 0, zones },
  });

  it('a lamp hanging 1.2 m below the wire sets the clearance and a zone around it', () => {
    const a = 5;
    const P = 10 * g;
    const r = solved(
      project(
        [{ type: 'point', x: a, mass: 10, drop: 1.2 }],
        [
          { from: 4, to: 6, height: 0, label: 'Path' },
          { from: 12, to: 18, height: 0, label: 'Bed' },
        ],
      ),
    );
    const c = r.cases[0];
    const H = c.horizontalTension;
    const zAt = (x: number) => {
      const M = (w * x * (l - x)) / 2 + (x <= a ? (P * (l - a) * x) / l : (P * a * (l - x)) / l);
      return zSupport - M / H;
    };
    expect(c.clearance).toBeCloseTo(zAt(a) - 1.2, 9);
    expect(c.zoneClearances[0].clearance).toBeCloseTo(zAt(a) - 1.2, 9);
    // Over the bed [12, 18] no item hangs: the wire's own lowest height there (at 12, z rising).
    expect(c.zoneClearances[1].clearance).toBeCloseTo(Math.min(zAt(12), zAt(18)), 9);
    // The lowest point reported is still the wire's own.
    expect(c.lowestPoint.z).toBeGreaterThan(zAt(a) - 1.2 + 0.5);
    // A case without the hung loads has no lamp under the wire: z(l/2) = 5 − w l²/(8H).
    const bare = r.cases[1];
    expect(bare.clearance).toBeCloseTo(zSupport - (w * l * l) / 8 / bare.horizontalTension, 9);
  });

  it('a festoon hanging 0.3 m below the wire over [2, 18] lowers the clearance there', () => {
    const mq = 0.5;
    const qc = mq * g;
    const r = solved(project([{ type: 'uniform', from: 2, to: 18, massPerLength: mq, drop: 0.3 }]));
    const c = r.cases[0];
    // Symmetric: lowest at midspan; M(10) = w·50 + (8 q · 10 − q · 8²/2) = 50 w + 48 q.
    const zMid = zSupport - (50 * w + 48 * qc) / c.horizontalTension;
    expect(c.lowestPoint.z).toBeCloseTo(zMid, 9);
    expect(c.clearance).toBeCloseTo(zMid - 0.3, 9);
  });

  it('refuses a negative drop or wind area with the field path', () => {
    const bad = project([{ type: 'point', x: 5, mass: 1, drop: -1, windArea: -2 }]);
    const check = validateProject(bad);
    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.issues.map((i) => i.path)).toEqual(['loads[0].windArea', 'loads[0].drop']);
  });
});

describe('ice and wind on a hung cable act per metre of cable along the wire', () => {
  const l = 100;
  const h = 40;
  const t = 0.01;
  const dWire = 0.005;
  const dCable = 0.012;
  const iceOn = (d: number) => ICE * g * Math.PI * t * (d + t);
  const cable: Load = { type: 'uniform', from: 0, to: l, massPerLength: 0, diameter: dCable };
  const iced = { name: 'Iced', temperature: 15, iceThickness: t, windSpeed: 0, withLoads: true };
  const windy = { name: 'Windy', temperature: 15, iceThickness: 0, windSpeed: 20, withLoads: true };

  it('parabolic theory: ΣV and ΣL take the cable length √(l² + h²), 7.7 % above l', () => {
    const r = solved(
      singleSpan({
        span: l,
        rise: h,
        massPerLength: 0.2,
        diameter: dWire,
        axialStiffness: 1e7,
        target: { horizontalTension: 3000 },
        theory: 'parabolic',
        loads: [cable],
        cases: [iced, windy],
      }),
    );
    const chord = Math.hypot(l, h); // 107.70 m
    const sumV = r.cases[1].supports.reduce((s, x) => s + x.vertical, 0);
    const wantV = (0.2 * g + iceOn(dWire)) * l + iceOn(dCable) * chord;
    expect(rel(sumV, wantV)).toBeLessThan(1e-9);
    const q = 0.5 * AIR * 20 * 20;
    const sumL = r.cases[2].supports.reduce((s, x) => s + x.lateral, 0);
    expect(rel(sumL, q * dWire * l + q * dCable * chord)).toBeLessThan(1e-9);
  });

  it('exact theory: an iced cable over the whole span is the elastic catenary with w + ice per metre', () => {
    // Inextensible in practice (EA = 1e12 N): ice per metre of cable = per unstressed metre.
    const L0 = 112;
    const r = solved(
      singleSpan({
        span: l,
        rise: h,
        massPerLength: 0.2,
        diameter: dWire,
        axialStiffness: 1e12,
        target: { unstressedLength: L0 },
        loads: [cable],
        cases: [iced],
        elementsPerSpan: 800,
      }),
    );
    const c = r.cases[1];
    const w = 0.2 * g + iceOn(dWire) + iceOn(dCable);
    const ref = solveElasticCatenary(
      { span: l, rise: h, unstressedLength: L0, weightPerLength: w, axialStiffness: 1e12 },
      w * l,
    );
    expect(rel(c.horizontalTension, ref.H)).toBeLessThan(1e-5);
    expect(rel(c.maxTension, ref.maxTension)).toBeLessThan(1e-5);
    expect(rel(c.sag, ref.sag)).toBeLessThan(1e-5);
  });
});
