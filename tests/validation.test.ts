/**
 * Bad input to validateProject and solveProject. The contract (doc/project-format.md):
 * anything missing, unknown, of the wrong type, non-finite or out of physical range is refused
 * with a message naming the field path and the rule, never repaired. Physical trouble that a
 * valid file can describe (loads past the breaking load, an unreachable target) is solved and
 * flagged, never thrown, never NaN.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { type Project, solveProject, validateProject } from '../src/core/index.ts';

// biome-ignore lint/suspicious/noExplicitAny: test edits reach into untyped JSON documents
type Doc = Record<string, any>;

const EXAMPLE = JSON.parse(readFileSync('examples/courtyard-lights.json', 'utf8')) as Doc;
const CUSTOM_WIRE = {
  label: 'Test wire 4 mm',
  diameter: 0.004,
  massPerLength: 0.06,
  axialStiffness: 7e5,
  thermalExpansion: 1.2e-5,
  breakingLoad: 11000,
};

function edited(change: (doc: Doc) => void, start: Doc = EXAMPLE): Doc {
  const doc = structuredClone(start);
  change(doc);
  return doc;
}

function issuesOf(doc: unknown) {
  const result = validateProject(doc);
  return result.ok ? [] : result.issues;
}

function nonFinite(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinite(v, `${path}[${i}]`));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => nonFinite(v, `${path}.${k}`));
  return [];
}

const withCustomWire = (doc: Doc) => {
  doc.wire = { ...CUSTOM_WIRE };
};

/** Edit that sets the field at `path` ("a.b[1].c"); undefined deletes it. */
function set(path: string, value: unknown, custom = false): (doc: Doc) => void {
  return (doc) => {
    if (custom) withCustomWire(doc);
    const keys = path.replace(/\[(\d+)\]/g, '.$1').split('.');
    const last = keys.pop() as string;
    const parent = keys.reduce((node, key) => node[key], doc);
    if (value === undefined) delete parent[last];
    else parent[last] = value;
  };
}

/** [what, edit, exact field path, a key word of the rule]. */
const BAD_FILES: [string, (doc: Doc) => void, string, RegExp][] = [
  [
    'zero span',
    set('supports[1].x', 0),
    'supports[1].x',
    /further along the span than the previous support/,
  ],
  [
    'negative span',
    set('supports[1].x', -5),
    'supports[1].x',
    /further along the span than the previous support/,
  ],
  ['one support', (d) => d.supports.pop(), 'supports', /at least 2/],
  ['zero EA', set('wire.axialStiffness', 0, true), 'wire.axialStiffness', /at least 100/],
  ['negative EA', set('wire.axialStiffness', -1e6, true), 'wire.axialStiffness', /at least 100/],
  ['zero mass', set('wire.massPerLength', 0, true), 'wire.massPerLength', /at least 0.0001/],
  ['negative mass', set('wire.massPerLength', -0.1, true), 'wire.massPerLength', /at least 0.0001/],
  ['negative point mass', set('loads[1].mass', -2), 'loads[1].mass', /at least 0/],
  ['NaN', set('supports[1].z', Number.NaN), 'supports[1].z', /finite number/],
  ['Infinity', set('installation.temperature', Infinity), 'installation.temperature', /finite/],
  ['-Infinity', set('limits.safetyFactor', -Infinity), 'limits.safetyFactor', /finite number/],
  ['the string "NaN"', set('loads[0].massPerLength', 'NaN'), 'loads[0].massPerLength', /finite/],
  ['a number as text', set('cases[0].windSpeed', '12'), 'cases[0].windSpeed', /finite number/],
  [
    'missing temperature',
    set('installation.temperature', undefined),
    'installation.temperature',
    /required/,
  ],
  ['missing limits', set('limits', undefined), 'limits', /must be an object/],
  ['missing case name', set('cases[1].name', undefined), 'cases[1].name', /text/],
  ['unknown wire field', set('wire.colour', 'red'), 'wire.colour', /not a known field/],
  ['unknown case field', set('cases[0].snow', 0.1), 'cases[0].snow', /not a known field/],
  ['withLoads as text', set('cases[2].withLoads', 'yes'), 'cases[2].withLoads', /true or false/],
  ['title as a number', set('title', 5), 'title', /text/],
  ['supports as an object', set('supports', { x: 0 }), 'supports', /list/],
  ['unknown theory', set('model.theory', 'cubic'), 'model.theory', /one of/],
  ['element order 3', set('model.elementOrder', 3), 'model.elementOrder', /one of/],
  [
    'fractional element count',
    set('model.elementsPerSpan', 10.5),
    'model.elementsPerSpan',
    /whole number/,
  ],
  [
    'sag longer than possible',
    set('installation.target', { sag: 11 }),
    'installation.target.sag',
    /longer than possible/,
  ],
  [
    'two targets at once',
    set('installation.target', { sag: 0.4, horizontalTension: 900 }),
    'installation.target',
    /exactly one/,
  ],
  ['no target', set('installation.target', {}), 'installation.target', /exactly one/],
  [
    'zero target tension',
    set('installation.target', { maxTension: 0 }),
    'installation.target.maxTension',
    /at least 1; the range is 1 to 1e9 N/,
  ],
  [
    'unknown catalogue id',
    set('wire', { catalogId: 'galv-9x9-99' }),
    'wire.catalogId',
    /not in the wire catalogue/,
  ],
  [
    'unknown case in target.case',
    set('installation.target', { maxTension: 2000, case: 'Monsoon' }),
    'installation.target.case',
    /name one of the cases/,
  ],
  ['duplicate case name', set('cases[1].name', 'Hot summer'), 'cases[1].name', /another case/],
  ['newer version', set('version', 3), 'version', /newer/],
  ['wrong format', set('format', 'other'), 'format', /sagwright-project/],
  [
    'pulley at an end support',
    set('supports[0].attachment', 'pulley'),
    'supports[0].attachment',
    /end support/,
  ],
  [
    'unknown attachment',
    set('supports[1].attachment', 'hook'),
    'supports[1].attachment',
    /one of "clamped", "pulley", "swingLink"/,
  ],
  [
    'version 1 field in a version 2 file',
    set('supports[0].free', false),
    'supports[0].free',
    /version 1 field.*attachment/,
  ],
  ['uniform load reversed', set('loads[0].to', 0.2), 'loads[0].to', /greater than from/],
  ['point load beyond the span', set('loads[1].x', 30), 'loads[1].x', /at most 22/],
  ['unknown load type', set('loads[0].type', 'line'), 'loads[0].type', /"moving"/],
  ['point load with mass and force', set('loads[1].force', 20), 'loads[1]', /exactly one of mass/],
];

describe('validateProject refuses bad files, naming the field path and the rule', () => {
  it('accepts both examples as they are (the edits below are the only fault)', () => {
    expect(issuesOf(EXAMPLE)).toEqual([]);
    const inclined = JSON.parse(readFileSync('examples/workshop-yard-inclined.json', 'utf8'));
    expect(issuesOf(inclined)).toEqual([]);
    expect(issuesOf(edited(withCustomWire))).toEqual([]);
  });

  it.each(BAD_FILES)('%s', (_what, change, path, rule) => {
    const issues = issuesOf(edited(change));
    const hit = issues.find((issue) => issue.path === path);
    expect(hit, `issues were ${JSON.stringify(issues)}`).toBeDefined();
    expect(hit?.message).toMatch(rule);
  });

  it('refuses a non-object document and an unknown top-level field', () => {
    expect(issuesOf(null)).toEqual([{ path: '(document)', message: 'must be an object' }]);
    expect(issuesOf([])).toEqual([{ path: '(document)', message: 'must be an object' }]);
    const issues = issuesOf(edited(set('colour', 'red')));
    expect(issues).toHaveLength(1);
    expect(issues[0].path).toBe('colour');
    expect(issues[0].message).toMatch(/not a known field/);
  });

  it('names every fault of a file with several, not only the first', () => {
    const issues = issuesOf(
      edited((d) => {
        d.supports[1].x = 0;
        d.cases[0].temperature = Number.NaN;
        d.version = 9;
      }),
    );
    const paths = issues.map((i) => i.path);
    for (const path of ['cases[0].temperature', 'supports[1].x', 'version'])
      expect(paths, JSON.stringify(issues)).toContain(path);
  });

  it('does not repair or change the document it checks', () => {
    const doc = edited(set('supports[1].x', -5));
    const before = JSON.stringify(doc);
    validateProject(doc);
    expect(JSON.stringify(doc)).toBe(before);
  });
});

describe('solveProject on valid files with physical trouble', () => {
  it('solves and flags loads past the breaking load (no throw, no NaN)', () => {
    // 500 kg at midspan of a 22 m span sagging ~0.45 m: T ≈ P l / (4 f) ≈ 60 kN (statics),
    // far above the 11 kN breaking load of the 4 mm 7x7 wire.
    const project = edited((d) => d.loads.push({ type: 'point', x: 11, mass: 500 })) as Project;
    const results = solveProject(project);
    expect(nonFinite(results)).toEqual([]);
    for (const c of results.cases) {
      expect(c.solved, c.name).toBe(true);
      expect(c.ok, c.name).toBe(false);
      expect(c.utilisation, c.name).toBeGreaterThan(1);
      expect(c.messages.join(' '), c.name).toMatch(/breaking load/);
    }
    expect(results.governing.tension).not.toBe('');
  });

  it('flags a largest tension past the working limit but under the breaking load', () => {
    const project = edited((d) => d.loads.push({ type: 'point', x: 11, mass: 25 })) as Project;
    const installed = solveProject(project).cases[0];
    expect(installed.maxTension).toBeLessThan(10988); // galv-7x7-4 breaking load, catalogue
    expect(installed.utilisation).toBeGreaterThan(1);
    expect(installed.messages.join(' ')).toMatch(/working limit/);
  });

  it.each(['exact', 'parabolic'] as const)(
    'reports an unreachable largest-tension target clearly, with no NaN (%s)',
    (theory) => {
      // Statics: each end of a level span carries at least half the wire's own weight
      // (22 m × 0.06 kg/m × g ≈ 13 N), so a largest tension of 1 N cannot be reached.
      const project = edited((d) => {
        d.installation.target = { maxTension: 1 };
        d.model.theory = theory;
      }) as Project;
      const results = solveProject(project);
      expect(nonFinite(results)).toEqual([]);
      const installed = results.cases[0];
      expect(installed.ok).toBe(false);
      expect(installed.solved).toBe(false);
      expect(installed.messages[0]).toMatch(/largest tension target 1 N cannot be reached/);
      for (const c of results.cases) expect(c.ok, c.name).toBe(false);
    },
  );

  it('names the wire on every case for an unknown catalogue id that skipped validation', () => {
    const project = edited(set('wire', { catalogId: 'no-such-wire' })) as Project;
    const results = solveProject(project);
    expect(results.cases.every((c) => !c.solved && /wire\.catalogId/.test(c.messages[0]))).toBe(
      true,
    );
    expect(results.internalError).toBeUndefined();
  });
});
