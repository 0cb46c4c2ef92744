/**
 * Moving loads in the project file: a new optional load kind; files without one stay valid and
 * solve as before; every bad field is refused with its path and the rule (doc/project-format.md).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveProject, validateProject } from '../src/core/index.ts';

// biome-ignore lint/suspicious/noExplicitAny: test edits reach into untyped JSON documents
type Doc = Record<string, any>;

const EXAMPLE = JSON.parse(readFileSync('examples/courtyard-lights.json', 'utf8')) as Doc;

function withMoving(load: Doc): Doc {
  const doc = structuredClone(EXAMPLE);
  doc.loads.push(load);
  return doc;
}

function issuesOf(doc: unknown) {
  const result = validateProject(doc);
  return result.ok ? [] : result.issues;
}

const GOOD = { type: 'moving', from: 2, to: 20, mass: 15, label: 'Basket' };

describe('moving load validation', () => {
  it('accepts a moving load with mass or force, label optional', () => {
    expect(issuesOf(withMoving(GOOD))).toEqual([]);
    expect(issuesOf(withMoving({ type: 'moving', from: 0, to: 22, force: 100 }))).toEqual([]);
  });

  it('older files without a moving load stay valid and report no envelopes', () => {
    expect(issuesOf(EXAMPLE)).toEqual([]);
    const r = solveProject(EXAMPLE as never);
    for (const c of r.cases) expect(c.movingLoads).toBeUndefined();
  });

  const bad: [string, Doc, string, RegExp][] = [
    ['no mass or force', { type: 'moving', from: 2, to: 20 }, 'loads[2]', /exactly one of mass/],
    ['both', { ...GOOD, force: 10 }, 'loads[2]', /exactly one of mass/],
    ['to before from', { ...GOOD, from: 10, to: 5 }, 'loads[2].to', /greater than from/],
    ['to equal to from', { ...GOOD, from: 10, to: 10 }, 'loads[2].to', /greater than from/],
    ['from before the first support', { ...GOOD, from: -1 }, 'loads[2].from', /at least 0/],
    ['to past the last support', { ...GOOD, to: 23 }, 'loads[2].to', /at most 22/],
    ['negative mass', { ...GOOD, mass: -2 }, 'loads[2].mass', /at least 0/],
    ['mass not a number', { ...GOOD, mass: '5' }, 'loads[2].mass', /finite number/],
    [
      'force too large',
      { type: 'moving', from: 1, to: 2, force: 2e6 },
      'loads[2].force',
      /at most/,
    ],
    ['missing from', { type: 'moving', to: 20, mass: 1 }, 'loads[2].from', /is required/],
    ['unknown field', { ...GOOD, x: 3 }, 'loads[2].x', /not a known field/],
    ['label not text', { ...GOOD, label: 4 }, 'loads[2].label', /must be text/],
    ['NaN from', { ...GOOD, from: Number.NaN }, 'loads[2].from', /finite number/],
  ];
  for (const [what, load, path, rule] of bad) {
    it(`refuses ${what} (${path})`, () => {
      const issues = issuesOf(withMoving(load));
      expect(issues.some((i) => i.path === path && rule.test(i.message))).toBe(true);
    });
  }

  it('names the new kind when the type is unknown', () => {
    const issues = issuesOf(withMoving({ ...GOOD, type: 'rolling' }));
    expect(issues).toContainEqual({
      path: 'loads[2].type',
      message: 'must be "point", "uniform" or "moving"',
    });
  });
});
