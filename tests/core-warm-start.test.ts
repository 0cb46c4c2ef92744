/**
 * The solver's shortcuts must not change its answers. Every state is solved from whatever the
 * span models last held (the element lengths of another state, moved to first order in H), the
 * set-up rows from their neighbours' tensions, the nested mesh of the error estimate from the
 * coarse states, the design aids' states from their own last solve; and the iteration stops on
 * an estimate of the change still to come. Each result here is compared with the same state
 * solved cold on a freshly built model (no stored state, starting from the installation
 * tension), which must agree to 1e-9 relative: a warm start or a stopping rule that leaves the
 * answer short of the solver's tolerance fails it. The analytic dL₀/dH against central
 * differences checks the derivative every Newton step and predictor relies on (calculus:
 * the central difference is exact to O(h²)).
 */
import { describe, expect, it } from 'vitest';
import { largestSpanSag, largestStateTension } from '../src/core/caseChecks.ts';
import {
  estimateErrors,
  type SpanLengths,
  seedLengths,
  spanLengths,
  summarise,
} from '../src/core/discretisation.ts';
import { type Project, solveProject } from '../src/core/index.ts';
import { findInstallationTension } from '../src/core/installation.ts';
import { solveSectionForLength } from '../src/core/lengthCompatibility.ts';
import { loadStateOfCase } from '../src/core/loads.ts';
import { buildProjectModel, prepareState } from '../src/core/projectModel.ts';
import { spanUnstressedLength, updateLoads } from '../src/core/sectionLength.ts';
import { neighbourGuess, type SetUpState, solveSetUpState } from '../src/core/setUpChart.ts';
import { solveChangeOfState, solveInstallation } from '../src/core/states.ts';
import { randomProject, symmetricProject } from './fixtures/randomProjects.ts';

const TOLERANCE = 1e-9;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-9);

const projects: [string, Project][] = [
  ...Array.from(
    { length: 30 },
    (_, i) => [`random ${i + 1}`, randomProject(i + 1)] as [string, Project],
  ),
  ...Array.from(
    { length: 8 },
    (_, i) => [`symmetric ${i + 1}`, symmetricProject(i + 1)] as [string, Project],
  ),
];

/** Installation tension, cut lengths and every case, each on its own fresh model. */
function coldStates(project: Project, refinement: number) {
  const target = findInstallationTension(
    buildProjectModel(project, refinement),
    project.installation.target,
  );
  const installed = solveInstallation(buildProjectModel(project, refinement), target.tensionN);
  const cases = project.cases.map((weather) => {
    const model = buildProjectModel(project, refinement);
    return solveChangeOfState(
      model,
      { ...loadStateOfCase(weather), name: weather.name },
      installed.unstressed,
      installed.spans.map((s) => s.tensionN),
    );
  });
  return { target, installed, cases };
}

describe('warm-started states agree with cold solves', () => {
  it.each(projects)('%s: installation and every case', (_, project) => {
    const results = solveProject(project);
    if (!results.cases.every((c) => c.solved)) return;
    const cold = coldStates(project, results.mesh.refinement);
    results.cases[0].spans.forEach((s, j) => {
      expect(rel(s.horizontalTension, cold.installed.spans[j].tensionN)).toBeLessThan(TOLERANCE);
    });
    cold.cases.forEach((state, i) => {
      const warm = results.cases[i + 1];
      expect(state.solved).toBe(true);
      state.spans.forEach((s, j) => {
        expect(rel(warm.spans[j].horizontalTension, s.tensionN)).toBeLessThan(TOLERANCE);
      });
    });
  });

  it.each(projects)('%s: every set-up row', (_, project) => {
    const results = solveProject(project);
    if (!results.cases.every((c) => c.solved)) return;
    const refinement = results.mesh.refinement;
    const { target, installed } = coldStates(project, refinement);
    for (const row of results.setUpChart) {
      if (!row.solved) continue;
      const model = buildProjectModel(project, refinement);
      const state = solveSetUpState(model, installed.unstressed, row.temperature, target.tensionN);
      expect(rel(row.horizontalTension, state.largestTensionN)).toBeLessThan(TOLERANCE);
      expect(rel(row.maxTension, largestStateTension(state.spans))).toBeLessThan(TOLERANCE);
      expect(rel(row.sag, largestSpanSag(state.spans[results.setUpSpan]))).toBeLessThan(TOLERANCE);
    }
  });
});

describe('the nested mesh started from the coarse states', () => {
  // The estimate is itself a relative difference of two solutions, each converged to about
  // 1e-12 relative: the same estimate means the same to 1e-10, far below its 1e-4 target.
  it('gives the same error estimates as a cold nested mesh (to 1e-10)', () => {
    for (const [, project] of projects.slice(0, 12)) {
      const model = buildProjectModel(project);
      const target = findInstallationTension(model, project.installation.target);
      if (!target.ok) continue;
      const installed = solveInstallation(model, target.tensionN);
      const withLengths = [summarise(installed, true)];
      const without = [summarise(installed)];
      for (const weather of project.cases) {
        const state = solveChangeOfState(
          model,
          { ...loadStateOfCase(weather), name: weather.name },
          installed.unstressed,
          installed.spans.map((s) => s.tensionN),
        );
        withLengths.push(summarise(state, true));
        without.push(summarise(state));
      }
      const seeded = estimateErrors(model, 1, target.tensionN, withLengths);
      const cold = estimateErrors(model, 1, target.tensionN, without);
      seeded.forEach((e, i) => {
        expect(Math.abs(e - cold[i])).toBeLessThan(1e-10);
      });
    }
  });

  it('seeding splits each coarse element length in two and keeps its tension', () => {
    const project = randomProject(3);
    const coarse = buildProjectModel(project);
    solveInstallation(coarse, 500);
    const lengths: SpanLengths[] = spanLengths(coarse.spans);
    const fine = buildProjectModel(project, 2);
    seedLengths(fine, lengths, 2);
    fine.spans.forEach((span, j) => {
      expect(span.storedTensionN).toBe(lengths[j].tensionN);
      const total = span.unstressedElement.reduce((a, b) => a + b, 0);
      const coarseTotal = lengths[j].unstressed.reduce((a, b) => a + b, 0);
      expect(rel(total, coarseTotal)).toBeLessThan(1e-14);
    });
  });
});

describe('the analytic dL₀/dH', () => {
  it.each(projects.slice(0, 20))('%s: matches central differences (shape held)', (_, project) => {
    const model = buildProjectModel(project);
    const windy = { temperature: 0, iceThicknessM: 0.004, windSpeedMPerS: 20, withLoads: true };
    const wire = prepareState(model, windy);
    updateLoads(model.spans, wire);
    for (const span of model.spans) {
      const l = span.x1 - span.x0;
      const H = (wire.weightNPerM * l * l) / (8 * 0.03 * l);
      const h = 1e-4 * H;
      const up = spanUnstressedLength(span, H + h, model.wire.axialStiffness, false).value;
      const down = spanUnstressedLength(span, H - h, model.wire.axialStiffness, false).value;
      const slope = spanUnstressedLength(span, H, model.wire.axialStiffness, false).slope;
      expect(rel(slope, (up - down) / (2 * h))).toBeLessThan(1e-6);
      // Stored element by element, the same derivative.
      const stored = spanUnstressedLength(span, H, model.wire.axialStiffness, true);
      expect(span.unstressedElementSlope.reduce((a, b) => a + b, 0)).toBeCloseTo(stored.slope, 12);
    }
  });

  it('the solution reports dL₀/dH₁ at its last evaluation', () => {
    const project = randomProject(5);
    const model = buildProjectModel(project);
    const installed = solveInstallation(model, 400);
    const length = installed.unstressed.reduce((a, b) => a + b, 0);
    const wire = prepareState(model, model.installation);
    const solution = solveSectionForLength(
      model.spans,
      wire,
      length,
      450,
      model.installationJoints,
    );
    expect(solution.converged).toBe(true);
    expect(solution.lengthSlope).toBeLessThan(0);
  });
});

describe('the set-up predictor', () => {
  const state = (tensionN: number, lengthM: number, lengthSlope = Number.NaN): SetUpState => ({
    spans: [],
    tensionN,
    largestTensionN: tensionN,
    solved: true,
    lengthM,
    lengthSlope,
  });

  it('extrapolates a quadratic H(L₀) exactly from three rows', () => {
    const tension = (L: number) => 500 + 3000 * (L - 30) - 20000 * (L - 30) ** 2;
    const rows = [30, 30.001, 30.002].map((L) => state(tension(L), L));
    expect(neighbourGuess(rows, 30.003, 1)).toBeCloseTo(tension(30.003), 9);
  });

  it('takes one Newton step from a single row and falls back without a slope', () => {
    expect(neighbourGuess([state(500, 30, -0.01)], 30.001, 1)).toBeCloseTo(499.9, 9);
    expect(neighbourGuess([state(500, 30)], 30.001, 1)).toBe(500);
    expect(neighbourGuess([], 30.001, 123)).toBe(123);
  });
});
