/**
 * Regression fixtures for the installation-target search (found by a seeded fuzz of extreme but
 * valid projects). Reference: the target itself — a reached sag target must be met exactly.
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject } from '../src/core/index.ts';

const deepCatenary: Project = {
  format: 'sagwright-project',
  version: 2,
  title: 'Short, very stretchy wire hung deep',
  supports: [
    { x: 0, z: 0 },
    { x: 0.5, z: 0 },
  ],
  wire: {
    label: 'w',
    diameter: 0.2,
    massPerLength: 0.1,
    axialStiffness: 1000,
    thermalExpansion: 1.2e-5,
    breakingLoad: 400,
  },
  loads: [],
  installation: { temperature: -80, withLoads: true, target: { sag: 0.225 } },
  cases: [],
  limits: { safetyFactor: 5, minClearance: 0 },
  ground: [{ x: 0, z: -10 }],
  model: { theory: 'exact', elementOrder: 2, elementsPerSpan: 2 },
};

describe('installation target search', () => {
  it('reaches a sag of 45 % of the span when the parabola estimate is too slack to solve', () => {
    // The start H ≈ w l²/(8 f) is below the catenary's, where the load iteration does not settle.
    const installed = solveProject(deepCatenary).cases[0];
    expect(installed.solved).toBe(true);
    expect(installed.sag).toBeCloseTo(0.225, 9);
  });
});
