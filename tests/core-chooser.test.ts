/**
 * Wire chooser: every wire listed works at its suggested tension (solveProject: every case
 * passes), its window matches tensionWindow for that wire, the list is lightest first and the
 * suggestion is √(low · high); no wire left out passes at any of 30 installation tensions spread
 * from a very slack to a breaking pull (a sampled check of the claim, by the full solver).
 */
import { describe, expect, it } from 'vitest';
import {
  chooseWire,
  chooseWires,
  type Project,
  solveProject,
  tensionWindow,
  WIRE_CATALOG,
  wireFamily,
} from '../src/core/index.ts';
import { atInstallationTension, loadExample, roadSquare } from './helpers/designProjects.ts';

function withWire(project: Project, catalogId: string): Project {
  return { ...project, wire: { catalogId } };
}

describe.each([
  ['demo', loadExample('examples/courtyard-lights.json')],
  ['34 m road square', roadSquare()],
])('wire chooser on the %s', (_name, project) => {
  const choices = chooseWires(project);

  it('lists wires lightest first, each passing every case at its suggested tension', () => {
    expect(choices.length).toBeGreaterThan(0);
    for (let i = 1; i < choices.length; i++)
      expect(choices[i].massPerLength).toBeGreaterThanOrEqual(choices[i - 1].massPerLength);
    for (const c of choices) {
      expect(c.suggestedHorizontalTension).toBeCloseTo(Math.sqrt((c.low ?? 0) * c.high), 6);
      const wired = withWire(project, c.catalogId ?? '');
      const results = solveProject(atInstallationTension(wired, c.suggestedHorizontalTension));
      expect(results.cases.every((r) => r.ok)).toBe(true);
    }
  });

  it("each wire's window is tensionWindow's for that wire", () => {
    for (const c of choices.slice(0, 4)) {
      const w = tensionWindow(withWire(project, c.catalogId ?? ''));
      expect(c.low).toBeCloseTo(w.low?.horizontalTension ?? 0, 4);
      expect(c.high).toBeCloseTo(w.high?.horizontalTension ?? 0, 4);
    }
  });

  it('the start carried from wire to wire moves no window end and drops no wire', () => {
    // Each wire searched on its own, from no start, must give the same list (ends to 1e-8).
    const alone = WIRE_CATALOG.map((wire) =>
      chooseWire(project, { catalogId: wire.id }, wire),
    ).filter((c) => c !== null);
    expect(choices.map((c) => c.catalogId).sort()).toEqual(alone.map((c) => c.catalogId).sort());
    for (const c of choices) {
      const own = alone.find((a) => a.catalogId === c.catalogId);
      expect(Math.abs(c.high / (own?.high ?? 0) - 1)).toBeLessThan(1e-8);
      if (c.low === null) expect(own?.low).toBeNull();
      else expect(Math.abs(c.low / (own?.low ?? 0) - 1)).toBeLessThan(1e-8);
    }
  });

  it('no wire left out passes at any sampled installation tension', () => {
    const listed = new Set(choices.map((c) => c.catalogId));
    const left = WIRE_CATALOG.filter((w) => !listed.has(w.id));
    for (const wire of left) {
      const wired = withWire(project, wire.id);
      for (let i = 0; i < 30; i++) {
        const H = 20 * (wire.breakingLoad / 20) ** (i / 29);
        const results = solveProject(atInstallationTension(wired, H));
        expect(results.cases.every((r) => r.ok)).toBe(false);
      }
    }
  }, 120_000);

  it('filters by family', () => {
    const steel = chooseWires(project, ['stainless']);
    expect(steel.every((c) => c.family === 'stainless')).toBe(true);
    expect(steel.map((c) => c.catalogId)).toEqual(
      choices.filter((c) => c.family === 'stainless').map((c) => c.catalogId),
    );
  });
});

describe('wire chooser and a custom wire', () => {
  it('lists the project own wire as catalogId null when it works', () => {
    const project = loadExample('examples/courtyard-lights.json');
    const own = WIRE_CATALOG.find((w) => w.id === 'galv-7x7-4');
    if (!own) throw new Error('catalogue');
    const custom: Project = {
      ...project,
      wire: {
        label: 'Own 4 mm',
        diameter: own.diameter,
        massPerLength: own.massPerLength * 1.001,
        axialStiffness: own.axialStiffness,
        thermalExpansion: own.thermalExpansion,
        breakingLoad: own.breakingLoad,
      },
    };
    const mine = chooseWires(custom, ['custom']);
    expect(mine).toHaveLength(1);
    expect(mine[0]).toMatchObject({ catalogId: null, label: 'Own 4 mm', family: 'custom' });
    expect(wireFamily('nylon rope')).toBe('fibre');
  });
});
