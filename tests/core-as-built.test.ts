/**
 * As-built check and the wave field checks. Round trip: a measurement read off a solved state
 * (the set-up chart's own state at that temperature) gives back the design cut length to 1e-9 m,
 * for every kind. Wave checks against closed forms: the plucked fundamental of a taut string
 * f = (1/2l)√(H/μ) (Mersenne's laws; any physics text, e.g. Halliday, Resnick & Walker,
 * *Fundamentals of Physics*, waves on a stretched string [M for the chapter]) and its small-sag
 * expansion t = 2 √(μ/H) (l + 4 f²/(3 l)) derived here from 2∫ds/c on the parabola [D].
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { largestSpanSag } from '../src/core/caseChecks.ts';
import { pulseReturnTime, type WaveWire } from '../src/core/fieldChecks.ts';
import {
  type AsBuiltMeasurement,
  type Project,
  solveAsBuilt,
  solveProject,
  validateAsBuilt,
  validateProject,
} from '../src/core/index.ts';
import { solveSectionForLength } from '../src/core/lengthCompatibility.ts';
import { buildProjectModel, prepareState, thermalFactor } from '../src/core/projectModel.ts';
import { heightAt } from '../src/core/spanGeometry.ts';
import { singleSpan } from './helpers/projects.ts';

function load(path: string): Project {
  const checked = validateProject(JSON.parse(readFileSync(path, 'utf8')));
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

/** The wire pulled through at temperature t with the design cut length (set-up chart state). */
function stateAt(project: Project, cutLength: number, temperature: number, withLoads: boolean) {
  const model = buildProjectModel(project);
  const wire = prepareState(model, { ...model.installation, temperature, withLoads });
  const length = cutLength * thermalFactor(model, temperature);
  const r = solveSectionForLength(model.spans, wire, length, 1000);
  expect(r.converged).toBe(true);
  return { model, H: r.tensionN, span: model.spans[0] };
}

describe.each([['examples/courtyard-lights.json'], ['examples/workshop-yard-inclined.json']])(
  'as-built round trip: %s',
  (path) => {
    const project = load(path);
    const design = solveProject(project);
    const T = 8;
    const loaded = stateAt(project, design.unstressedLength, T, project.installation.withLoads);
    const bare = stateAt(project, design.unstressedLength, T, false);
    const wave: WaveWire = {
      massPerLength: bare.model.wire.massPerLength,
      axialStiffness: bare.model.wire.axialStiffness,
      thermalFactor: thermalFactor(bare.model, T),
    };
    const x = 0.37 * (project.supports[1].x - project.supports[0].x) + project.supports[0].x;
    const s = loaded.span;
    const measurements: AsBuiltMeasurement[] = [
      { temperature: T, kind: 'horizontalTension', value: loaded.H },
      { temperature: T, kind: 'sag', value: largestSpanSag({ span: s, tensionN: loaded.H }) },
      {
        temperature: T,
        kind: 'sag',
        value: s.z0 + s.chordSlope * (x - s.x0) - heightAt(s, loaded.H, x),
        x,
      },
      { temperature: T, kind: 'returnTime', value: pulseReturnTime(bare.span, bare.H, wave) },
      { temperature: T, kind: 'frequency', value: 1 / pulseReturnTime(bare.span, bare.H, wave) },
    ];
    for (const m of measurements) {
      it(`${m.kind}${m.x !== undefined ? ' at x' : ''} gives back the cut length to 1e-9 m`, () => {
        expect(validateAsBuilt(project, m)).toEqual([]);
        const r = solveAsBuilt(project, m, design);
        expect(r.solved).toBe(true);
        expect(Math.abs(r.unstressedLength - design.unstressedLength)).toBeLessThan(1e-9);
        expect(Math.abs(r.lengthDifference)).toBeLessThan(1e-9);
        // Every case re-solved at that length is the design's case.
        r.cases.forEach((c, i) => {
          expect(c.name).toBe(design.cases[i].name);
          expect(c.maxTension).toBeCloseTo(design.cases[i].maxTension, 5);
          expect(c.ok).toBe(design.cases[i].ok);
        });
      });
    }
  },
);

describe('as-built on an automatically refined mesh', () => {
  it('a set-up chart reading gives back the refined design’s cut length to 1e-9 m', () => {
    const coarse = load('examples/courtyard-lights.json');
    coarse.model = { ...coarse.model, elementsPerSpan: 2 };
    const design = solveProject(coarse);
    expect(design.mesh.refinement).toBeGreaterThan(1);
    const row = design.setUpChart.find((r) => r.temperature === 0);
    if (!row) throw new Error('no 0 °C row');
    for (const m of [
      { temperature: 0, kind: 'sag' as const, value: row.sag },
      { temperature: 0, kind: 'horizontalTension' as const, value: row.horizontalTension },
    ]) {
      const r = solveAsBuilt(coarse, m, design);
      expect(Math.abs(r.unstressedLength - design.unstressedLength)).toBeLessThan(1e-9);
    }
  });
});

describe('as-built: what the measurement says', () => {
  const project = load('examples/courtyard-lights.json');
  const design = solveProject(project);

  it('more sag than the set-up chart row means a longer wire, more sag in the heat', () => {
    const row = design.setUpChart.find((r) => r.temperature === 15);
    if (!row) throw new Error('no row');
    const r = solveAsBuilt(project, { temperature: 15, kind: 'sag', value: row.sag * 1.2 }, design);
    expect(r.lengthDifference).toBeGreaterThan(0);
    expect(r.cases[1].sag).toBeGreaterThan(design.cases[1].sag);
    expect(r.cases[1].clearance).toBeLessThan(design.cases[1].clearance);
  });

  it('a too-tight wire fails the tension check and says so', () => {
    const r = solveAsBuilt(
      project,
      { temperature: 15, kind: 'horizontalTension', value: 3000 },
      design,
    );
    expect(r.solved).toBe(true);
    expect(r.ok).toBe(false);
    expect(r.cases.some((c) => c.utilisation > 1)).toBe(true);
  });

  it('pulse checks note that they hold for the bare wire', () => {
    const r = solveAsBuilt(project, { temperature: 15, kind: 'returnTime', value: 0.6 }, design);
    expect(r.measurement.withLoads).toBe(false);
    expect(r.messages.join(' ')).toMatch(/bare wire/);
  });

  it('a sag out of reach is reported, not solved silently', () => {
    expect(validateAsBuilt(project, { temperature: 15, kind: 'sag', value: 11 })).toEqual([
      { path: 'asBuilt.value', message: 'must be less than half the span (11.000 m)' },
    ]);
    // 1e-12 m of sag needs a tension beyond the solver's bracket (e^25 times the design's).
    const r = solveAsBuilt(project, { temperature: 15, kind: 'sag', value: 1e-12 }, design);
    expect(r.solved).toBe(false);
    expect(r.cases).toEqual([]);
    expect(r.messages.join(' ')).toMatch(/cannot be reached/);
  });

  it('refuses bad measurements with the field and the rule', () => {
    const issues = (m: unknown) => validateAsBuilt(project, m).map((i) => `${i.path} ${i.message}`);
    expect(issues({ temperature: 8, kind: 'sag', value: -1 })).toEqual([
      'asBuilt.value must be greater than 0',
    ]);
    expect(issues({ temperature: 8, kind: 'weight', value: 1 })[0]).toMatch(
      /^asBuilt.kind must be one of/,
    );
    expect(issues({ temperature: 200, kind: 'sag', value: 1 })).toEqual([
      'asBuilt.temperature must be at most 80',
    ]);
    expect(issues({ temperature: 8, kind: 'frequency', value: 1, x: 3 })).toEqual([
      'asBuilt.x applies to a sag measurement only',
    ]);
    expect(issues({ temperature: 8, kind: 'sag', value: 1, x: 22 })).toEqual([
      'asBuilt.x must be less than 22',
    ]);
  });
});

describe('wave field checks against closed forms', () => {
  it('a taut level string: f = (1/2l)√(H/μ) with the small-sag correction', () => {
    const l = 30;
    const mu = 0.1;
    const H = 20000;
    const project = singleSpan({
      span: l,
      massPerLength: mu,
      axialStiffness: 1e15,
      target: { horizontalTension: H },
      theory: 'parabolic',
      elementsPerSpan: 400,
    });
    const model = buildProjectModel(project);
    const wire = prepareState(model, model.installation);
    solveSectionForLength(model.spans, wire, solveProject(project).unstressedLength, H);
    const span = model.spans[0];
    const f = largestSpanSag({ span, tensionN: H });
    const stiff = { massPerLength: mu, axialStiffness: 1e15, thermalFactor: 1 };
    const t = pulseReturnTime(span, H, stiff);
    const closed = 2 * Math.sqrt(mu / H) * (l + (4 * f * f) / (3 * l));
    expect(Math.abs(t / closed - 1)).toBeLessThan(1e-6);
    const taut = Math.sqrt(H / mu) / (2 * l);
    expect(Math.abs(1 / pulseReturnTime(span, H, stiff) / taut - 1)).toBeLessThan(1e-4);
  });

  it('the stretch slows the wave by 1/√(1 + T/EA) (mass per stretched metre)', () => {
    const project = singleSpan({
      span: 10,
      massPerLength: 0.05,
      axialStiffness: 2e5,
      target: { horizontalTension: 5000 },
      theory: 'parabolic',
    });
    const model = buildProjectModel(project);
    const wire = prepareState(model, model.installation);
    solveSectionForLength(model.spans, wire, solveProject(project).unstressedLength, 5000);
    const span = model.spans[0];
    const H = solveProject(project).cases[0].horizontalTension;
    const stiff = pulseReturnTime(span, H, {
      massPerLength: 0.05,
      axialStiffness: 1e15,
      thermalFactor: 1,
    });
    const soft = pulseReturnTime(span, H, {
      massPerLength: 0.05,
      axialStiffness: 2e5,
      thermalFactor: 1,
    });
    expect(soft / stiff).toBeCloseTo(1 / Math.sqrt(1 + 5000 / 2e5), 5);
  });
});
