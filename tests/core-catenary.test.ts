/**
 * The exact theory against Irvine's elastic catenary (Cable Structures, 1981, §1.3), solved
 * independently in tests/reference/elasticCatenary.ts (extended there to point loads).
 * Required agreement: ≤ 1e-4 relative in sag and tensions for mesh-converged runs.
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';
import { solveElasticCatenary } from './reference/elasticCatenary.ts';

const g = 9.80665;
const TOLERANCE = 1e-4;

function solved(project: Project) {
  const check = validateProject(project);
  if (!check.ok) throw new Error(JSON.stringify(check.issues));
  return solveProject(project);
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

interface Scenario {
  name: string;
  span: number;
  rise: number;
  cutLength: number;
  mass: number;
  EA: number;
  points?: { x: number; mass: number }[];
  elementOrder?: 1 | 2;
}

const scenarios: Scenario[] = [
  { name: 'level, small sag (~2 %)', span: 30, rise: 0, cutLength: 30.03, mass: 0.1, EA: 2e6 },
  { name: 'level, large sag (~30 %)', span: 100, rise: 0, cutLength: 124, mass: 1.0, EA: 1e7 },
  { name: 'inclined, moderate sag', span: 60, rise: 12, cutLength: 62, mass: 0.3, EA: 3e6 },
  {
    name: 'inclined, large sag, quadratic elements',
    span: 100,
    rise: 30,
    cutLength: 125,
    mass: 1.0,
    EA: 1e7,
    elementOrder: 2,
  },
  {
    name: 'stiff and taut (stretch dominates)',
    span: 40,
    rise: -3,
    cutLength: 40.08,
    mass: 0.2,
    EA: 5e5,
  },
  {
    name: 'level, with point loads',
    span: 24,
    rise: 0,
    cutLength: 24.05,
    mass: 0.12,
    EA: 1.5e6,
    points: [
      { x: 6, mass: 3 },
      { x: 15, mass: 5 },
    ],
  },
  {
    name: 'inclined, with a point load',
    span: 20,
    rise: 4,
    cutLength: 20.6,
    mass: 0.2,
    EA: 2e6,
    points: [{ x: 13, mass: 10 }],
  },
];

describe('exact theory reproduces the elastic catenary (Irvine 1981)', () => {
  for (const s of scenarios) {
    it(s.name, () => {
      const project = singleSpan({
        span: s.span,
        rise: s.rise,
        massPerLength: s.mass,
        axialStiffness: s.EA,
        target: { unstressedLength: s.cutLength },
        loads: (s.points ?? []).map((p) => ({ type: 'point' as const, x: p.x, mass: p.mass })),
        elementsPerSpan: 800,
        elementOrder: s.elementOrder,
      });
      const result = solved(project).cases[0];
      const ref = solveElasticCatenary(
        {
          span: s.span,
          rise: s.rise,
          unstressedLength: s.cutLength,
          weightPerLength: s.mass * g,
          axialStiffness: s.EA,
          pointLoads: (s.points ?? []).map((p) => ({ x: p.x, force: p.mass * g })),
        },
        result.horizontalTension,
      );
      const errors = {
        H: rel(result.horizontalTension, ref.H),
        maxTension: rel(result.maxTension, ref.maxTension),
        sag: rel(result.sag, ref.sag),
        lowest: Math.abs(result.lowestPoint.z - ref.lowestZ) / ref.sag,
        vertical: rel(result.supports[0].vertical, ref.V),
      };
      console.log(
        `${s.name}: H ${ref.H.toFixed(3)} N, sag ${ref.sag.toFixed(4)} m; relative errors ${Object.entries(
          errors,
        )
          .map(([k, v]) => `${k} ${v.toExponential(1)}`)
          .join(', ')}`,
      );
      for (const value of Object.values(errors)) expect(value).toBeLessThan(TOLERANCE);
    });
  }

  it('temperature: a hot case lengthens the wire by α Δt with its weight conserved', () => {
    const alpha = 1.2e-5;
    const project = singleSpan({
      span: 50,
      rise: 5,
      massPerLength: 0.25,
      axialStiffness: 2e6,
      thermalExpansion: alpha,
      target: { unstressedLength: 50.12 },
      installationTemperature: 10,
      cases: [{ name: 'Hot', temperature: 60, iceThickness: 0, windSpeed: 0, withLoads: true }],
      elementsPerSpan: 800,
    });
    const hot = solved(project).cases[1];
    const L0t = 50.12 * (1 + alpha * 50);
    const ref = solveElasticCatenary(
      {
        span: 50,
        rise: 5,
        unstressedLength: L0t,
        weightPerLength: (0.25 * g * 50.12) / L0t,
        axialStiffness: 2e6,
      },
      hot.horizontalTension,
    );
    expect(rel(hot.horizontalTension, ref.H)).toBeLessThan(TOLERANCE);
    expect(rel(hot.maxTension, ref.maxTension)).toBeLessThan(TOLERANCE);
    expect(rel(hot.sag, ref.sag)).toBeLessThan(TOLERANCE);
  });
});
