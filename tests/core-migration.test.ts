/**
 * Reading format version 1: a support marked "free": true was labelled as running over a
 * pulley but solved with equal horizontal tension; version 2 reads it as "attachment":
 * "pulley" (equal tension, what the label promised) and says that its results changed. Every
 * reader — the validator, the solver, the file and share-link opener and the CLI — migrates.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { openProjectText } from '../src/deliverables/projectFile.ts';

const FILE = 'tests/fixtures/version1-free-support.json';
const TEXT = readFileSync(FILE, 'utf8');
const V1 = JSON.parse(TEXT);

describe('a version-1 file with a free support', () => {
  const checked = validateProject(V1);

  it('validates as version 2 with the free support a pulley and the others clamped', () => {
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    expect(checked.migratedFrom).toBe(1);
    expect(checked.project.version).toBe(2);
    expect(checked.project.supports[1]).toEqual({
      x: 5,
      z: 7.5,
      label: 'Corner post',
      attachment: 'pulley',
    });
    expect(checked.project.supports[2]).toEqual({ x: 30, z: 7, label: 'Far post' });
    expect(JSON.stringify(checked.project)).not.toContain('"free"');
    expect(checked.notes).toHaveLength(1);
    expect(checked.notes?.[0]).toMatch(/Corner post.*pulley.*equal tension.*differ/);
  });

  it('leaves the document it read unchanged', () => {
    expect(JSON.parse(TEXT)).toEqual(V1);
    expect(V1.supports[1].free).toBe(true);
  });

  it('solves the same as the migrated document, with the post as a pulley', () => {
    if (!checked.ok) throw new Error('not valid');
    const direct = solveProject(V1 as Project);
    expect(direct).toEqual(solveProject(checked.project));
    const post = direct.cases[0].supports[1];
    expect(post.attachment).toBe('pulley');
    expect(Math.abs((post.tensionBefore ?? 0) - (post.tensionAfter ?? 0))).toBeLessThan(
      1e-9 * (post.tensionAfter ?? 1),
    );
    expect(post.horizontal).toBeGreaterThan(50);
  });

  it('opens from a file or share link with the note', () => {
    const opened = openProjectText(TEXT);
    expect(opened.ok).toBe(true);
    if (!opened.ok) return;
    expect(opened.migratedFrom).toBe(1);
    expect(opened.notes?.[0]).toMatch(/Corner post/);
    expect(opened.project.supports[1].attachment).toBe('pulley');
  });

  it('says nothing changed when no support was free', () => {
    const plain = structuredClone(V1);
    plain.supports[1].free = false;
    const result = validateProject(plain);
    expect(result.ok && result.migratedFrom).toBe(1);
    expect(result.ok && result.notes).toEqual([]);
    expect(result.ok && result.project.supports[1].attachment).toBeUndefined();
  });

  it('refuses a free end support by the field it became, naming the rule', () => {
    const bad = structuredClone(V1);
    bad.supports[0].free = true;
    const result = validateProject(bad);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues[0].path).toBe('supports[0].attachment');
    expect(result.issues[0].message).toMatch(/end support/);
  });

  it('the CLI reads it, prints the note on stderr and the migrated results on stdout', () => {
    const run = spawnSync('npx', ['tsx', 'src/cli/main.ts', FILE], {
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(run.status).toBe(0);
    expect(run.stderr).toMatch(/version1-free-support\.json: note: .*Corner post/);
    if (!checked.ok) throw new Error('not valid');
    const printed = JSON.parse(run.stdout);
    expect(printed).toEqual(JSON.parse(JSON.stringify(solveProject(checked.project))));
    expect(printed.cases[0].supports[1].attachment).toBe('pulley');
  }, 60_000);
});
