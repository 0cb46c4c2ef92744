/**
 * The command line's as-built check and moving loads (README.md, "Command line"):
 * `--as-built TEMP:KIND=VALUE[@X]` adds `asBuilt {measurement, unstressedLength, cases}` equal to
 * the core's solveAsBuilt; a bad measurement is exit 2 naming the field; a moving load in the file
 * adds `movingLoads` to each loaded case.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { type Project, solveAsBuilt, solveProject } from '../src/core/index.ts';

const FILE = 'examples/courtyard-lights.json';
const TIMEOUT_MS = 60_000;

function solveCli(...args: string[]) {
  const run = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], {
    encoding: 'utf8',
    timeout: TIMEOUT_MS,
  });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

describe('npm run solve -- --as-built', () => {
  const project = JSON.parse(readFileSync(FILE, 'utf8')) as Project;

  it(
    'adds asBuilt equal to the core, and a sag measured off the set-up chart gives back the cut length',
    () => {
      const design = solveProject(project);
      const row = design.setUpChart.find((r) => r.temperature === 5);
      if (!row) throw new Error('no 5 °C row');
      const run = solveCli(FILE, '--as-built', `5:sag=${row.sag}`);
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      const printed = JSON.parse(run.stdout);
      const direct = solveAsBuilt(project, { temperature: 5, kind: 'sag', value: row.sag }, design);
      expect(printed.asBuilt).toEqual(JSON.parse(JSON.stringify(direct)));
      expect(Object.keys(printed.asBuilt)).toEqual(
        expect.arrayContaining(['measurement', 'unstressedLength', 'cases']),
      );
      // JSON prints numbers to 17 significant digits: the cut length comes back to 1e-9 m.
      expect(Math.abs(printed.asBuilt.unstressedLength - printed.unstressedLength)).toBeLessThan(
        1e-9,
      );
      expect(printed.asBuilt.cases).toHaveLength(printed.cases.length);
    },
    TIMEOUT_MS,
  );

  it(
    'takes a sag position after @',
    () => {
      const run = solveCli(FILE, '--as-built', '8:sag=0.5@9');
      expect(run.status).toBe(0);
      expect(JSON.parse(run.stdout).asBuilt.measurement).toMatchObject({
        temperature: 8,
        kind: 'sag',
        value: 0.5,
        x: 9,
      });
    },
    TIMEOUT_MS,
  );

  it.each(['8:returnTime=0.9', '8:frequency=1.1', '8:horizontalTension=450'])(
    'takes %s',
    (spec) => {
      const r = solveCli(FILE, `--as-built=${spec}`);
      expect(r.status).toBe(0);
      expect(JSON.parse(r.stdout).asBuilt.unstressedLength).toBeGreaterThan(22);
    },
    TIMEOUT_MS,
  );

  it.each([
    ['8:sag', /is not TEMP:KIND=VALUE/],
    ['8:weight=3', /asBuilt.kind: must be one of/],
    ['8:sag=-1', /asBuilt.value: must be greater than 0/],
    ['8:frequency=2@5', /asBuilt.x: applies to a sag measurement only/],
    ['hot:sag=0.4', /asBuilt.temperature: must be a finite number/],
  ])(
    'a bad measurement %s: exit 2, stderr names the field and the rule',
    (spec, message) => {
      const run = solveCli(FILE, '--as-built', spec);
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(message);
      expect(run.stdout).toBe('');
    },
    TIMEOUT_MS,
  );
});

describe('npm run solve with a moving load', () => {
  it(
    'adds movingLoads to each loaded case, equal to solveProject',
    () => {
      const doc = JSON.parse(readFileSync(FILE, 'utf8'));
      doc.loads.push({ type: 'moving', from: 3, to: 19, mass: 12, label: 'Basket' });
      const dir = mkdtempSync(join(tmpdir(), 'sagwright-'));
      const path = join(dir, 'moving.json');
      writeFileSync(path, JSON.stringify(doc));
      const run = solveCli(path);
      expect(run.status).toBe(0);
      const printed = JSON.parse(run.stdout);
      const direct = JSON.parse(JSON.stringify(solveProject(doc)));
      expect(printed).toEqual(direct);
      for (const c of printed.cases) {
        expect(c.movingLoads).toHaveLength(1);
        const m = c.movingLoads[0];
        for (const key of ['label', 'maxTension', 'maxTensionAt', 'clearance', 'clearanceAt'])
          expect(m).toHaveProperty(key);
        expect(m.label).toBe('Basket');
      }
    },
    TIMEOUT_MS,
  );
});
