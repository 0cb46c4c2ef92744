/**
 * The discretisation error estimate against the real error. Reference: Irvine's elastic
 * catenary (Cable Structures, 1981, §1.3; tests/reference/elasticCatenary.ts, with point loads).
 * On coarse meshes, including two elements per span and a span whose point loads leave one
 * element per segment, the estimate must never be below a third of the actual error in H,
 * T_max and sag; with automatic refinement the reported results must reach 1e-4.
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject } from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';
import { solveElasticCatenary } from './reference/elasticCatenary.ts';

const g = 9.80665;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

interface Scenario {
  name: string;
  span: number;
  rise: number;
  cutLength: number;
  mass: number;
  EA: number;
  points: { x: number; mass: number }[];
}

const scenarios: Scenario[] = [
  { name: 'level, deep sag', span: 100, rise: 0, cutLength: 124, mass: 1, EA: 1e7, points: [] },
  { name: 'inclined', span: 60, rise: 12, cutLength: 62, mass: 0.3, EA: 3e6, points: [] },
  {
    name: 'level, seven lamps (one element per segment)',
    span: 24,
    rise: 0,
    cutLength: 24.05,
    mass: 0.12,
    EA: 1.5e6,
    points: [3, 6, 9, 12, 15, 18, 21].map((x) => ({ x, mass: 2 })),
  },
  {
    name: 'steep, one heavy lamp',
    span: 100,
    rise: 40,
    cutLength: 110,
    mass: 0.5,
    EA: 5e6,
    points: [{ x: 30, mass: 5 }],
  },
];

function project(s: Scenario, elementsPerSpan: number, elementOrder: 1 | 2): Project {
  return singleSpan({
    span: s.span,
    rise: s.rise,
    massPerLength: s.mass,
    axialStiffness: s.EA,
    target: { unstressedLength: s.cutLength },
    elementsPerSpan,
    elementOrder,
    loads: s.points.map((p) => ({ type: 'point' as const, x: p.x, mass: p.mass })),
  });
}

function actualError(s: Scenario, r: ReturnType<typeof solveProject>): number {
  const ref = solveElasticCatenary(
    {
      span: s.span,
      rise: s.rise,
      unstressedLength: s.cutLength,
      weightPerLength: s.mass * g,
      axialStiffness: s.EA,
      pointLoads: s.points.map((p) => ({ x: p.x, force: p.mass * g })),
    },
    s.mass * g * s.span,
  );
  const c = r.cases[0];
  return Math.max(
    rel(c.horizontalTension, ref.H),
    rel(c.maxTension, ref.maxTension),
    rel(c.sag, ref.sag),
  );
}

describe('discretisation error estimate (reference: elastic catenary, Irvine 1981 §1.3)', () => {
  for (const s of scenarios) {
    for (const order of [1, 2] as const) {
      it(`${s.name}, order ${order}: estimate ≥ actual / 3 on 2–64 elements, never a false zero`, () => {
        for (const n of [2, 4, 8, 16, 64]) {
          const r = solveProject(project(s, n, order), { refine: false });
          const actual = actualError(s, r);
          const estimate = r.cases[0].discretisationError;
          expect(estimate, `${n} elements`).toBeGreaterThanOrEqual(actual / 3);
          // And not absurdly pessimistic either: within a factor 3 above.
          expect(estimate, `${n} elements`).toBeLessThanOrEqual(3 * actual);
          expect(r.mesh.refinement).toBe(1);
        }
      });
    }
  }

  it('refines automatically until the estimate is below 1e-4, and the results are that good', () => {
    for (const s of scenarios) {
      const r = solveProject(project(s, 4, 1));
      const c = r.cases[0];
      expect(c.discretisationError, s.name).toBeLessThan(1e-4);
      expect(actualError(s, r), s.name).toBeLessThan(3e-4);
      expect(r.mesh.reached, s.name).toBe(true);
      expect(r.mesh.largestError).toBe(c.discretisationError);
      expect(c.messages.join(' ')).not.toMatch(/Mesh:/);
    }
  });

  it('says so when the refinement limit stops short of 1e-4', () => {
    // 2 elements refined at most 64× = 128 elements: a 100 m span with 300 m of wire needs more.
    const deep = { ...scenarios[0], cutLength: 300 };
    const r = solveProject(project(deep, 2, 1));
    expect(r.mesh.refinement).toBe(64);
    expect(r.mesh.elementsPerSpan).toBe(128);
    expect(r.mesh.reached).toBe(false);
    const c = r.cases[0];
    expect(c.discretisationError).toBeGreaterThanOrEqual(1e-4);
    expect(c.discretisationError).toBeGreaterThanOrEqual(actualError(deep, r) / 3);
    expect(c.messages.join(' ')).toMatch(
      /Mesh: the estimated discretisation error .* is above 1e-4 .*refinement limit reached/,
    );
  });

  it('without refinement a coarse mesh keeps its mesh and says the estimate is above target', () => {
    const r = solveProject(project(scenarios[0], 2, 1), { refine: false });
    expect(r.mesh.elementsPerSpan).toBe(2);
    expect(r.mesh.reached).toBe(false);
    expect(r.cases[0].discretisationError).toBeGreaterThan(1e-2);
    expect(r.cases[0].messages.join(' ')).toMatch(/Mesh:/);
  });
});
