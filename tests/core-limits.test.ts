/**
 * What validation accepts, the solver handles: every number has a physical range stated in its
 * message, zones lie under the wire, ground points are at least 1 mm apart, a wire cannot be
 * stretchier than any real one, results beyond the wire's linear-elastic range are marked not
 * valid in words, the solver never throws or returns a non-finite number in a solved case, and
 * the work of one solve is bounded. Each fixture is the reproduction of a fault found by probing
 * the app and the CLI with hostile projects.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { describeRange } from '../src/core/fieldRanges.ts';
import {
  type CustomWire,
  findCatalogWire,
  INTERNAL_ERROR_MESSAGE,
  type Project,
  RANGES,
  solveProject,
  validateProject,
} from '../src/core/index.ts';
import { guardFinite } from '../src/core/resultGuard.ts';
import { STEEL_ELASTIC_STRAIN } from '../src/core/strainLimit.ts';
import { planMesh, STATE_ELEMENT_BUDGET } from '../src/core/workBudget.ts';

const EXAMPLE = JSON.parse(readFileSync('examples/courtyard-lights.json', 'utf8')) as Project;

function edited(change: (p: Project) => void): Project {
  const copy = structuredClone(EXAMPLE);
  change(copy);
  return copy;
}

function issueAt(project: Project, path: string): string | undefined {
  const checked = validateProject(project);
  return checked.ok ? undefined : checked.issues.find((i) => i.path === path)?.message;
}

function nonFiniteInSolvedCases(project: Project): string[] {
  const results = solveProject(project);
  const bad: string[] = [];
  const walk = (value: unknown, path: string) => {
    if (typeof value === 'number' && !Number.isFinite(value)) bad.push(path);
    else if (Array.isArray(value)) for (const [i, v] of value.entries()) walk(v, `${path}[${i}]`);
    else if (value && typeof value === 'object')
      for (const [k, v] of Object.entries(value)) walk(v, `${path}.${k}`);
  };
  for (const c of results.cases) if (c.solved) walk(c, c.name);
  return bad;
}

describe('every number is refused outside its physical range, with the range in the message', () => {
  it.each([
    ['span of 1e-9 m', (p: Project) => (p.supports[1].x = 1e-9), 'supports[1].x', /0.1 to 2000 m/],
    [
      'span of 1e308 m',
      (p: Project) => (p.supports[1].x = 1e308),
      'supports[1].x',
      /-10000 to 10000 m/,
    ],
    [
      'span of 1e155 m',
      (p: Project) => (p.supports[1].x = 1e155),
      'supports[1].x',
      /-10000 to 10000/,
    ],
    [
      'horizontal tension target of 5e-324 N',
      (p: Project) => (p.installation.target = { horizontalTension: 5e-324 }),
      'installation.target.horizontalTension',
      /the range is 1 to 1e9 N/,
    ],
    [
      'sag target of 5e-324 m',
      (p: Project) => (p.installation.target = { sag: 5e-324 }),
      'installation.target.sag',
      /the range is 0.001 to 1000 m/,
    ],
    [
      'gravity of 5e-324 m/s²',
      (p: Project) => (p.environment = { gravity: 5e-324 }),
      'environment.gravity',
      /the range is 1 to 30 m\/s²/,
    ],
    [
      'wind of 300 m/s',
      (p: Project) => (p.cases[0].windSpeed = 300),
      'cases[0].windSpeed',
      /at most 70; the range is 0 to 70 m\/s/,
    ],
    [
      'ice 0.5 m thick',
      (p: Project) => (p.cases[0].iceThickness = 0.5),
      'cases[0].iceThickness',
      /0 to 0.1 m/,
    ],
    [
      'safety factor 1000',
      (p: Project) => (p.limits.safetyFactor = 1000),
      'limits.safetyFactor',
      /1 to 20/,
    ],
    [
      'a zone wholly beyond the last support',
      (p: Project) => (p.limits.zones = [{ from: 100, to: 200, height: 3 }]),
      'limits.zones[0].from',
      /at most 22/,
    ],
    [
      'ground points 1e-320 m apart',
      (p: Project) =>
        (p.ground = [
          { x: 0, z: 0 },
          { x: 1e-320, z: 5 },
          { x: 22, z: 0 },
        ]),
      'ground[1].x',
      /at least 0.001 m after the previous ground point/,
    ],
    [
      'a cut length three times the span',
      (p: Project) => (p.installation.target = { unstressedLength: 66 }),
      'installation.target.unstressedLength',
      /0.5 to 2 times the straight-line length/,
    ],
    [
      'a support 200 m above its neighbour 22 m away',
      (p: Project) => (p.supports[1].z = 204.2),
      'supports[1].z',
      /at most 5 times the span/,
    ],
    [
      'a case name with a line break',
      (p: Project) => (p.cases[0].name = 'Hot\nsummer'),
      'cases[0].name',
      /control characters/,
    ],
    [
      'a title with a terminal escape sequence',
      (p: Project) => (p.title = 'Yard \u001b[31mred'),
      'title',
      /control characters/,
    ],
  ])('%s', (_what, change, path, rule) => {
    const message = issueAt(edited(change), path);
    expect(message, 'the validator accepted it').toBeDefined();
    expect(message).toMatch(rule);
  });

  it('the ranges table in doc/project-format.md is the one the validator uses', () => {
    const doc = readFileSync('doc/project-format.md', 'utf8');
    for (const [name, range] of Object.entries(RANGES))
      expect(doc, `${name}: ${describeRange(range)}`).toContain(describeRange(range));
  });
});

describe('a wire stretchier than any real one, and strain beyond the linear-elastic range', () => {
  const customWire = (axialStiffness: number, breakingLoad: number): CustomWire => ({
    label: 'Test wire',
    diameter: 0.004,
    massPerLength: 0.06,
    axialStiffness,
    thermalExpansion: 1.2e-5,
    breakingLoad,
  });

  it('refuses EA = 100 N with a 16 kN breaking load (it would stretch 16 000 % before breaking)', () => {
    const project = edited((p) => {
      p.wire = customWire(100, 16_000);
    });
    expect(issueAt(project, 'wire.axialStiffness')).toMatch(/no wire stretches more than 40 %/);
  });

  it('marks a custom wire pulled past half its breaking load not valid, in words', () => {
    // EA = 2.5 × breaking load: the stretchiest wire accepted (40 % at break); linear-elastic to
    // 20 %. Pulled to 0.8 × the breaking load it stretches 32 %.
    const project = edited((p) => {
      p.wire = customWire(40_000, 16_000);
      p.limits.safetyFactor = 1;
      p.installation.target = { horizontalTension: 0.8 * 16_000 };
      p.cases = [];
    });
    expect(validateProject(project).ok).toBe(true);
    const installed = solveProject(project).cases[0];
    expect(installed.solved).toBe(true);
    expect(installed.strain).toBeCloseTo(installed.maxTension / 40_000, 12);
    expect(installed.strain).toBeGreaterThan(0.2);
    expect(installed.ok).toBe(false);
    expect(installed.messages.join(' ')).toMatch(/Not valid: the wire stretches 3\d\.\d\d %/);
  });

  it('marks a steel catalogue wire stretched past 0.75 % not valid, and one below it valid', () => {
    const wire = findCatalogWire('galv-7x7-4');
    if (!wire) throw new Error('catalogue wire missing');
    const at = (tensionN: number) =>
      solveProject(
        edited((p) => {
          p.limits.safetyFactor = 1;
          p.installation.target = { horizontalTension: tensionN };
          p.cases = [];
        }),
      ).cases[0];
    const elasticLimitN = STEEL_ELASTIC_STRAIN * wire.axialStiffness;
    const beyond = at(1.05 * elasticLimitN);
    expect(beyond.strain).toBeGreaterThan(STEEL_ELASTIC_STRAIN);
    expect(beyond.ok).toBe(false);
    expect(beyond.messages.join(' ')).toMatch(
      /linear-elastic range \(0.75 % for steel wire rope\)/,
    );
    const within = at(0.9 * elasticLimitN);
    expect(within.strain).toBeLessThan(STEEL_ELASTIC_STRAIN);
    expect(within.messages.join(' ')).not.toMatch(/Not valid/);
  });
});

describe('the solver never throws and never shows a non-finite number in a solved case', () => {
  // These skipped validation on purpose: the solver must still answer in words.
  it.each([
    ['span 1e-9 m', (p: Project) => (p.supports[1].x = 1e-9)],
    ['span 1e308 m', (p: Project) => (p.supports[1].x = 1e308)],
    ['span 1e155 m', (p: Project) => (p.supports[1].x = 1e155)],
    ['target 5e-324 N', (p: Project) => (p.installation.target = { horizontalTension: 5e-324 })],
    ['gravity 5e-324', (p: Project) => (p.environment = { gravity: 5e-324 })],
    [
      'ground 1e-320 m apart',
      (p: Project) =>
        (p.ground = [
          { x: 0, z: 0 },
          { x: 1e-320, z: 5 },
        ]),
    ],
  ])('%s (unvalidated)', (_what, change) => {
    const project = edited(change);
    expect(() => solveProject(project)).not.toThrow();
    expect(nonFiniteInSolvedCases(project)).toEqual([]);
  });

  it('an internal failure is one plain sentence on every case, never the raw error', () => {
    const results = solveProject(edited((p) => (p.supports[1].x = 1e-9)));
    expect(results.internalError).toBe(true);
    for (const c of results.cases) {
      expect(c.solved).toBe(false);
      expect(c.messages).toEqual([INTERNAL_ERROR_MESSAGE]);
    }
    expect(JSON.stringify(results)).not.toMatch(/typed array|positive definite|at \w+ \(/);
  });

  it('a solved case holding NaN is turned into an unsolved one that says why', () => {
    const results = solveProject(EXAMPLE);
    results.cases[1].sag = Number.NaN;
    const guarded = guardFinite(results);
    expect(guarded.cases[1].solved).toBe(false);
    expect(guarded.cases[1].messages.join(' ')).toMatch(/not finite/);
    expect(guarded.cases[0].solved).toBe(true);
  });
});

describe('the work of one solve is bounded', () => {
  function largest(): Project {
    const spans = 49;
    return {
      ...structuredClone(EXAMPLE),
      supports: Array.from({ length: spans + 1 }, (_, i) => ({ x: 20 * i, z: 5 })),
      ground: [{ x: 0, z: 0 }],
      loads: Array.from({ length: 500 }, (_, i) => ({
        type: 'point' as const,
        x: 0.01 + (i * (20 * spans - 0.02)) / 500,
        mass: 0.5,
      })),
      installation: { temperature: 15, withLoads: true, target: { sag: 0.4, case: 'c3' } },
      cases: Array.from({ length: 50 }, (_, i) => ({
        name: `c${i}`,
        temperature: -20 + i,
        iceThickness: 0.005,
        windSpeed: 20,
        withLoads: true,
      })),
      limits: { safetyFactor: 5, minClearance: 0 },
      model: { theory: 'exact', elementOrder: 2, elementsPerSpan: 20_000 },
    };
  }

  it('coarsens the largest project the schema allows, says so, and solves every case', () => {
    const project = largest();
    expect(validateProject(project).ok).toBe(true);
    const plan = planMesh(project);
    expect(plan.elementsPerSpan * 49 * 51).toBeLessThanOrEqual(STATE_ELEMENT_BUDGET);
    const results = solveProject(project);
    // The most finely meshed span has the planned elements plus a node at each load in it.
    expect(results.mesh.refinement).toBe(1);
    expect(results.mesh.elementsPerSpan).toBeGreaterThanOrEqual(plan.elementsPerSpan);
    expect(results.mesh.elementsPerSpan).toBeLessThan(plan.elementsPerSpan + 15);
    expect(results.notices[0]).toMatch(/Mesh coarsened from 20000 to \d+ elements per span/);
    expect(results.cases[0].messages.join(' ')).toMatch(/Mesh coarsened/);
    expect(results.cases.every((c) => c.solved)).toBe(true);
    for (const c of results.cases) expect(c.profile?.x.length ?? 0).toBeLessThanOrEqual(2100);
  }, 120_000); // an allowance for a loaded machine, not a speed check (npm run bench measures)

  it('leaves an ordinary project untouched', () => {
    expect(planMesh(EXAMPLE)).toEqual({ elementsPerSpan: 200 });
    expect(solveProject(EXAMPLE).notices).toEqual([]);
  });
});
