/**
 * The design aids judge a tension with the same checks as solveProject: the utilisation with the
 * weaker end fitting (working limit = breaking load × efficiency / safety factor, EN 13414-1) and
 * the clearance to the lowest of the wire and the hung items that hang below it.
 */
import { describe, expect, it } from 'vitest';
import { createWindowResponse } from '../src/core/design/windowResponse.ts';
import { type Project, solveProject } from '../src/core/index.ts';
import { buildProjectModel } from '../src/core/projectModel.ts';
import { singleSpan } from './helpers/projects.ts';

describe('window checks agree with solveProject (end fittings, drops)', () => {
  const H0 = 1200;
  const base = singleSpan({
    span: 20,
    massPerLength: 0.1,
    axialStiffness: 2e6,
    breakingLoad: 9000,
    target: { horizontalTension: H0 },
    elementsPerSpan: 40,
    loads: [{ type: 'point', x: 7, mass: 6, drop: 0.9, label: 'Sign' }],
    cases: [{ name: 'Cold', temperature: -10, iceThickness: 0.005, windSpeed: 0, withLoads: true }],
  });
  const project: Project = {
    ...base,
    supports: [
      { x: 0, z: 5 },
      { x: 20, z: 5 },
    ],
    ground: [{ x: 0, z: 0 }],
    limits: {
      safetyFactor: 5,
      minClearance: 3,
      zones: [{ from: 5, to: 9, height: 3.5, label: 'Path' }],
      endFittings: { start: { kind: 'handSplice' }, end: { kind: 'socket' } },
    },
  };

  it('worst utilisation and clearance margin at H₀ equal those of solveProject', () => {
    const results = solveProject(project);
    const r = createWindowResponse(buildProjectModel(project))(H0);
    const worstU = Math.max(...results.cases.map((c) => c.utilisation));
    const margins = results.cases.flatMap((c) => [
      c.clearance - project.limits.minClearance,
      ...c.zoneClearances.map((z) => z.clearance - z.required),
    ]);
    expect(r.utilisation).toBeCloseTo(worstU, 9);
    expect(r.clearanceMargin).toBeCloseTo(Math.min(...margins), 9);
    // The hand splice (0.8) and the sign's drop matter: without them both numbers differ.
    const plain = createWindowResponse(
      buildProjectModel({
        ...project,
        loads: [{ type: 'point', x: 7, mass: 6 }],
        limits: { ...project.limits, endFittings: undefined },
      }),
    )(H0);
    expect(r.utilisation / plain.utilisation).toBeCloseTo(1 / 0.8, 9);
    expect(plain.clearanceMargin - r.clearanceMargin).toBeGreaterThan(0.8);
  });
});
