/**
 * A point load placed exactly at a support goes into that support's reaction. References:
 * statics — a load carried by the support itself does not change the wire, so it adds exactly
 * its weight to that support's downward pull; and overall equilibrium, Σ vertical reactions =
 * wire weight + hung loads, for loads anywhere, ends included (the wire's weight per the theory:
 * exact w L₀, parabolic w × horizontal length).
 */
import { describe, expect, it } from 'vitest';
import { type CustomWire, type Load, type Project, solveProject } from '../src/core/index.ts';
import { chordLength, expectedTotals } from './fixtures/randomProjects.ts';
import { singleSpan } from './helpers/projects.ts';

const g = 9.80665;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

function line(loads: Load[], theory: 'exact' | 'parabolic' = 'exact'): Project {
  const base = singleSpan({
    span: 1,
    massPerLength: 0.1,
    axialStiffness: 1.2e6,
    thermalExpansion: 1.2e-5,
    target: { sag: 0.4, span: 1 },
    loads,
    theory,
    cases: [
      { name: 'Cold, iced', temperature: -10, iceThickness: 0.01, windSpeed: 15, withLoads: true },
    ],
  });
  return {
    ...base,
    supports: [
      { x: 0, z: 6 },
      { x: 8, z: 6.5, attachment: 'pulley' },
      { x: 26, z: 6 },
    ],
  };
}

describe('a load placed at a fixing is carried by that fixing', () => {
  // Regression fixture: a 20 kg lamp on the post's bracket (196.1 N) was left out of the post's
  // reaction although the wire was solved correctly without it.
  const lamp = 20;
  const without = solveProject(line([{ type: 'uniform', from: 8, to: 26, massPerLength: 0.2 }]));
  for (const [where, x, index] of [
    ['the intermediate post', 8, 1],
    ['the first fixing', 0, 0],
    ['the last fixing', 26, 2],
  ] as const) {
    it(`a lamp at ${where} adds its weight to that fixing alone, every case`, () => {
      const withLamp = solveProject(
        line([
          { type: 'uniform', from: 8, to: 26, massPerLength: 0.2 },
          { type: 'point', x, mass: lamp, label: 'Lamp on a bracket' },
        ]),
      );
      withLamp.cases.forEach((c, k) => {
        const before = without.cases[k];
        c.supports.forEach((s, i) => {
          const added = s.vertical - before.supports[i].vertical;
          if (i === index)
            expect(rel(added, lamp * g), `${c.name} support ${i + 1}`).toBeLessThan(1e-9);
          else expect(Math.abs(added), `${c.name} support ${i + 1}`).toBeLessThan(1e-9 * lamp * g);
        });
        expect(rel(c.horizontalTension, before.horizontalTension)).toBeLessThan(1e-12);
      });
    });
  }
});

describe('Σ reactions = total weight and wind, loads anywhere, ends included (1e-9)', () => {
  const placements: Load[][] = [
    [{ type: 'point', x: 0, mass: 5 }],
    [{ type: 'point', x: 26, force: 80 }],
    [
      { type: 'point', x: 8, mass: 12, windArea: 0.5 },
      { type: 'point', x: 8, force: 30 },
    ],
    [{ type: 'point', x: 26, mass: 4, windArea: 1, dragCoefficient: 1.2 }],
    [
      { type: 'point', x: 0, mass: 2 },
      { type: 'point', x: 3.5, mass: 4 },
      { type: 'point', x: 8, mass: 6 },
      { type: 'point', x: 17, force: 50 },
      { type: 'point', x: 26, mass: 3 },
      { type: 'uniform', from: 0, to: 26, massPerLength: 0.15 },
    ],
  ];
  for (const theory of ['exact', 'parabolic'] as const) {
    it.each(placements.map((loads, i) => [i + 1, loads] as const))(
      `${theory} theory, placement %i`,
      (_i, loads) => {
        const project = line(loads, theory);
        const results = solveProject(project);
        for (const c of results.cases) {
          const state =
            c.name === 'Installation'
              ? { temperature: 15, withLoads: true, iceThickness: 0, windSpeed: 0 }
              : project.cases[0];
          const want = expectedTotals(
            project,
            project.wire as CustomWire,
            state,
            results.unstressedLength,
            (from, to) => chordLength(project, from, to),
          );
          const got = c.supports.reduce((sum, s) => sum + s.vertical, 0);
          expect(rel(got, want.vertical), `${c.name}: ΣV ${got} vs ${want.vertical}`).toBeLessThan(
            1e-9,
          );
          const sideways = c.supports.reduce((sum, s) => sum + s.lateral, 0);
          const windOk =
            want.lateral === 0 ? Math.abs(sideways) < 1e-9 : rel(sideways, want.lateral) < 1e-9;
          expect(windOk, `${c.name}: ΣL ${sideways} vs ${want.lateral}`).toBe(true);
        }
      },
    );
  }
});
