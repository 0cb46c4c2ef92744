/**
 * The command line as a tool others script, fed hostile and careless input: the size is known
 * before anything is read and reads are capped (a 2 GB sparse file, an endless device), a UTF-8
 * byte-order mark is accepted, nothing from a file reaches the terminal raw (a symlink to a
 * system file, escape sequences in a catalogue id or a key), one bad file among several leaves
 * the others' output intact, and an internal fault (injected) exits with 4 and one line with no
 * absolute path, the stack only with --debug. Exit codes: doc/project-format.md.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { solveProject } from '../src/core/index.ts';

const TIMEOUT_MS = 60_000;
const EXAMPLE = 'examples/courtyard-lights.json';
const exampleText = readFileSync(EXAMPLE, 'utf8');
const dir = mkdtempSync(join(tmpdir(), 'sagwright-cli-'));
const ESC = '\u001b';

function solveCli(args: string[], preload?: string) {
  const node = preload ? ['--import', preload] : [];
  const run = spawnSync('npx', ['tsx', ...node, 'src/cli/main.ts', ...args], {
    encoding: 'utf8',
    timeout: TIMEOUT_MS,
  });
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

const expected = JSON.parse(JSON.stringify(solveProject(JSON.parse(exampleText))));

describe('reading', () => {
  it(
    'accepts a UTF-8 byte-order mark, as the browser does',
    () => {
      const run = solveCli([file('bom.json', `\ufeff${exampleText}`)]);
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      expect(JSON.parse(run.stdout)).toEqual(expected);
    },
    TIMEOUT_MS,
  );

  it(
    'refuses a 2 GB file by its size, without reading it',
    () => {
      const path = file('huge.json', '');
      truncateSync(path, 2 ** 31);
      const run = solveCli([path]);
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/huge\.json: is 2147\.5 MB; a project file must be at most 1 MB/);
    },
    TIMEOUT_MS,
  );

  it(
    'stops reading an endless stream one byte past the limit',
    () => {
      const run = solveCli(['/dev/zero']);
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/\/dev\/zero: is more than 1 MB/);
    },
    TIMEOUT_MS,
  );

  it(
    'says a folder is a folder',
    () => {
      const run = solveCli([dir]);
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/it is a folder, not a file/);
    },
    TIMEOUT_MS,
  );
});

describe('nothing from a file is echoed raw', () => {
  it(
    'a symlink to a system file: refused without printing its contents',
    () => {
      const link = join(dir, 'passwd.json');
      symlinkSync('/etc/passwd', link);
      const run = solveCli([link]);
      expect(run.status).toBe(2);
      expect(run.stderr).toMatch(/passwd\.json: \(file\): is not valid JSON/);
      const firstLine = readFileSync('/etc/passwd', 'utf8').split('\n')[0];
      expect(run.stderr).not.toContain(firstLine.slice(0, 8));
      expect(run.stderr).not.toMatch(/root|\/bin\//);
    },
    TIMEOUT_MS,
  );

  it(
    'escape sequences in a catalogue id and in an unknown key are shown as \\u escapes',
    () => {
      const doc = JSON.parse(exampleText);
      doc.wire = { catalogId: `${ESC}[2J${ESC}]0;pwned\u0007` };
      doc.limits[`${ESC}[31mred`] = 1;
      const run = solveCli([file('escapes.json', JSON.stringify(doc))]);
      expect(run.status).toBe(2);
      expect(run.stderr).not.toContain(ESC);
      expect(run.stderr).not.toContain('\u0007');
      expect(run.stderr).toContain(
        '"\\u001b[2J\\u001b]0;pwned\\u0007" is not in the wire catalogue',
      );
      expect(run.stderr).toContain('limits["\\u001b[31mred"]: is not a known field');
    },
    TIMEOUT_MS,
  );

  it(
    'a file name with control characters is printed escaped',
    () => {
      const run = solveCli([join(dir, `no-such-${ESC}[1m.json`)]);
      expect(run.status).toBe(2);
      expect(run.stderr).not.toContain(ESC);
      expect(run.stderr).toMatch(/no-such-\\u001b\[1m\.json: cannot read \(no such file\)/);
    },
    TIMEOUT_MS,
  );
});

describe('several files', () => {
  it(
    'one bad file does not suppress the others; each outcome is reported; worst exit wins',
    () => {
      const bad = file('bad.json', '{"format": "sagwright-project", "version": 1}');
      const run = solveCli([EXAMPLE, bad, EXAMPLE]);
      expect(run.status).toBe(2);
      const entries = JSON.parse(run.stdout);
      expect(entries).toHaveLength(3);
      expect(entries[0]).toEqual({ file: EXAMPLE, results: expected });
      expect(entries[1]).toMatchObject({ file: bad, exitCode: 2 });
      expect(entries[1].errors.join('\n')).toMatch(/supports: must be a list/);
      expect(entries[2]).toEqual({ file: EXAMPLE, results: expected });
      expect(run.stderr).toMatch(/bad\.json: supports: must be a list/);
    },
    TIMEOUT_MS,
  );

  it(
    'a design that fails a check exits 3, and wins over a passing file',
    () => {
      const doc = JSON.parse(exampleText);
      doc.limits.minClearance = 50;
      const failing = file('too-low.json', JSON.stringify(doc));
      const run = solveCli([EXAMPLE, failing]);
      expect(run.status).toBe(3);
      expect(JSON.parse(run.stdout)[1].results.cases.some((c: { ok: boolean }) => !c.ok)).toBe(
        true,
      );
    },
    TIMEOUT_MS,
  );
});

describe('internal errors (faults injected)', () => {
  it(
    'inside the solver: exit 4, one plain sentence per case, no raw error, no path',
    () => {
      const run = solveCli([EXAMPLE], './tests/fixtures/faults/typed-arrays-fail.mjs');
      expect(run.status).toBe(4);
      expect(run.stderr.trim().split('\n')).toHaveLength(1);
      expect(run.stderr).toMatch(/courtyard-lights\.json: The solver met an internal error/);
      expect(run.stderr).not.toMatch(/\/work\/secret|injected fault|at \S+:\d+/);
    },
    TIMEOUT_MS,
  );

  it(
    'outside the solver: exit 4 and one line; the stack only with --debug',
    () => {
      const plain = solveCli([EXAMPLE], './tests/fixtures/faults/output-fails.mjs');
      expect(plain.status).toBe(4);
      expect(plain.stderr.trim().split('\n')).toHaveLength(1);
      expect(plain.stderr).toMatch(/internal error in Sagwright \(run again with --debug/);
      expect(plain.stderr).not.toMatch(/\/work\/secret|injected fault/);
      const debug = solveCli([EXAMPLE, '--debug'], './tests/fixtures/faults/output-fails.mjs');
      expect(debug.status).toBe(4);
      expect(debug.stderr).toMatch(/injected fault/);
      expect(debug.stderr.trim().split('\n').length).toBeGreaterThan(2);
    },
    TIMEOUT_MS,
  );
});
