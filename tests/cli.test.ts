/**
 * The command line as a user runs it (README.md, "Command line"): results JSON
 * equal to solveProject on the same file, a table with units, the catalogue, and exit codes
 * 0 solved and every check passes, 3 solved but a check fails, 2 invalid or unreadable file
 * (field path on stderr), 1 a case not solved.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CAUTIONS, type Project, solveProject, WIRE_CATALOG } from '../src/core/index.ts';

const EXAMPLES = [
  'examples/courtyard-lights.json',
  'examples/workshop-yard-inclined.json',
  'examples/terrace-corner-pulley.json',
];
const TIMEOUT_MS = 60_000;

function solveCli(...args: string[]) {
  const run = spawnSync('npx', ['tsx', 'src/cli/main.ts', ...args], {
    encoding: 'utf8',
    timeout: TIMEOUT_MS,
  });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

describe('npm run solve (src/cli/main.ts)', () => {
  it.each(EXAMPLES)(
    '%s: exit 0 and the JSON equals solveProject on the same file',
    (file) => {
      const run = solveCli(file);
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      const printed = JSON.parse(run.stdout);
      const project = JSON.parse(readFileSync(file, 'utf8')) as Project;
      const direct = JSON.parse(JSON.stringify(solveProject(project)));
      expect(printed).toEqual(direct);
      expect(printed.cases[0].name).toBe('Installation');
      expect(printed.cases).toHaveLength(project.cases.length + 1);
    },
    TIMEOUT_MS,
  );

  it(
    '--table prints every case with units in the headers',
    () => {
      const run = solveCli(EXAMPLES[0], '--table');
      expect(run.status).toBe(0);
      for (const header of ['H (N)', 'T max (N)', 'Sag (m)', 'Clearance (m)', 'Swing (m)'])
        expect(run.stdout).toContain(header);
      const project = JSON.parse(readFileSync(EXAMPLES[0], 'utf8')) as Project;
      for (const c of project.cases) expect(run.stdout).toContain(c.name);
      expect(() => JSON.parse(run.stdout)).toThrow();
    },
    TIMEOUT_MS,
  );

  it(
    '--table prints the cautions, the end fittings and the mesh',
    () => {
      const run = solveCli(EXAMPLES[0], '--table');
      expect(run.stdout).toContain('Cautions:');
      for (const caution of CAUTIONS) expect(run.stdout).toContain(caution.text);
      expect(run.stdout).toMatch(/End fittings: /);
      expect(run.stdout).toMatch(/Mesh: \d+ elements per span/);
    },
    TIMEOUT_MS,
  );

  it(
    'every case solved but a check fails: exit 3, results still printed, nothing on stderr',
    () => {
      const file = 'tests/fixtures/clearance-fails.json';
      const run = solveCli(file);
      expect(run.stderr).toBe('');
      expect(run.status).toBe(3);
      const printed = JSON.parse(run.stdout);
      expect(printed.cases.every((c: { solved: boolean }) => c.solved)).toBe(true);
      expect(printed.cases.some((c: { ok: boolean }) => !c.ok)).toBe(true);
    },
    TIMEOUT_MS,
  );

  it(
    'every case solved but a check fails: exit 3 with --table too',
    () => {
      const run = solveCli('tests/fixtures/clearance-fails.json', '--table');
      expect(run.status).toBe(3);
      expect(run.stdout).toContain('FAIL');
    },
    TIMEOUT_MS,
  );

  it(
    '--catalog lists every catalogue id',
    () => {
      const run = solveCli('--catalog');
      expect(run.status).toBe(0);
      expect(WIRE_CATALOG.length).toBeGreaterThan(10);
      const firstColumn = new Set(run.stdout.split('\n').map((line) => line.split(/\s+/)[0]));
      const missing = WIRE_CATALOG.map((w) => w.id).filter((id) => !firstColumn.has(id));
      expect(missing).toEqual([]);
    },
    TIMEOUT_MS,
  );

  it(
    'an invalid file: exit 2, stderr names the field path and the rule, nothing on stdout',
    () => {
      const run = solveCli('tests/fixtures/zero-span.json');
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(
        /supports\[1\]\.x: must be further along the span than the previous support/,
      );
      expect(run.stdout).toBe('');
    },
    TIMEOUT_MS,
  );

  it(
    'a file that is not JSON: exit 2 with a message',
    () => {
      const run = solveCli('tests/fixtures/not-json.txt');
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/not valid JSON/);
    },
    TIMEOUT_MS,
  );

  it(
    'a missing file: exit 2 with a message naming it',
    () => {
      const run = solveCli('tests/fixtures/no-such-project.json');
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/no-such-project\.json: cannot read/);
    },
    TIMEOUT_MS,
  );

  it(
    'a case that cannot be solved: exit 1, stderr names the case and why',
    () => {
      const run = solveCli('tests/fixtures/unreachable-tension.json');
      expect(run.status).toBe(1);
      expect(run.stderr).toMatch(/case "Installation" could not be solved/);
      expect(run.stderr).toMatch(/largest tension target 1 N cannot be reached/);
      expect(JSON.parse(run.stdout).cases[0].solved).toBe(false);
    },
    TIMEOUT_MS,
  );

  it(
    'an unknown option: exit 2 with the usage',
    () => {
      const run = solveCli(EXAMPLES[0], '--pdf');
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/unknown option --pdf/);
      expect(run.stderr).toMatch(/usage/);
    },
    TIMEOUT_MS,
  );
});
