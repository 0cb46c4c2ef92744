/**
 * The blank span and the starter projects offered by "New project": each is a file in
 * examples/starters/, each validates, and each solves with finite results in every case.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { solveProject, validateProject } from '../src/core/index.ts';
import { findCatalogWire } from '../src/core/wireCatalog.ts';
import { ALL_STARTERS, blankStarter, STARTERS } from '../src/state/starters.ts';

const FOLDER = 'examples/starters';

describe('starter projects', () => {
  it('offers every file in examples/starters, each once, the blank span first', () => {
    const files = readdirSync(FOLDER)
      .filter((name) => name.endsWith('.json'))
      .map((name) => name.replace(/\.json$/, ''))
      .sort();
    expect(ALL_STARTERS.map((s) => s.id).sort()).toEqual(files);
    expect(ALL_STARTERS[0]).toBe(blankStarter);
    expect(new Set(ALL_STARTERS.map((s) => s.name)).size).toBe(ALL_STARTERS.length);
    expect(STARTERS.map((s) => s.name)).toEqual([
      'Garden clothesline',
      'Lights across a courtyard',
      'Trellis line over posts',
      'Sign over a yard',
    ]);
  });

  for (const starter of ALL_STARTERS) {
    it(`${starter.name}: the file validates and every case solves with finite numbers`, () => {
      const checked = validateProject(
        JSON.parse(readFileSync(`${FOLDER}/${starter.id}.json`, 'utf8')),
      );
      if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
      expect(checked.project).toEqual(starter.project);
      if ('catalogId' in starter.project.wire)
        expect(findCatalogWire(starter.project.wire.catalogId)).toBeDefined();
      const results = solveProject(starter.project);
      expect(results.cases).toHaveLength(starter.project.cases.length + 1);
      for (const result of results.cases) {
        expect(result.solved, `${result.name} solved`).toBe(true);
        for (const value of [
          result.horizontalTension,
          result.maxTension,
          result.utilisation,
          result.sag,
          result.clearance,
          result.swing,
          result.lowestPoint.x,
          result.lowestPoint.z,
        ])
          expect(Number.isFinite(value), `${result.name}: ${value}`).toBe(true);
        expect(result.horizontalTension).toBeGreaterThan(0);
        // A starter is a design that works as shipped: every check passes.
        expect(result.ok, `${result.name}: ${result.messages.join(' ')}`).toBe(true);
      }
    });
  }

  it('the blank span hangs as a catenary: sag = (H/w)(cosh(wL/2H) − 1)', () => {
    // Closed-form sag of a level catenary under its own weight w per length at horizontal
    // tension H: H. M. Irvine, Cable Structures, MIT Press 1981, §1.2 (inextensible catenary;
    // the stretch at this tension changes the sag by far less than the tolerance).
    const project = blankStarter.project;
    expect(project.loads).toEqual([]);
    const wire = findCatalogWire((project.wire as { catalogId: string }).catalogId);
    if (!wire) throw new Error('catalogue wire');
    const installation = solveProject(project).cases[0];
    const w = wire.massPerLength * (project.environment?.gravity ?? 9.80665);
    const H = installation.horizontalTension;
    const L = project.supports[1].x - project.supports[0].x;
    const sag = (H / w) * (Math.cosh((w * L) / (2 * H)) - 1);
    expect(installation.sag).toBeCloseTo(sag, 3);
    expect(installation.sag).toBeCloseTo(0.2, 6);
  });
});
