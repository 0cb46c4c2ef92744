/**
 * Moving loads. A load parked at x is a static point load at x at the same cut length (the same
 * change of state, solved through the ordinary project path); the envelope over the path is at
 * least as bad as every static solve at 41 positions along it (the scan and the bounded local
 * refinement must find the worst); a light load on a taut wire agrees with the closed form of
 * the inextensible parabola, largest sag increase P l / (4 H) at mid-span (elementary statics).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { clearanceOver, largestStateTension } from '../src/core/caseChecks.ts';
import { type MovingLoad, type Project, solveProject, validateProject } from '../src/core/index.ts';
import { loadStateOfCase } from '../src/core/loads.ts';
import { parkedProject, solveMovingLoadAt } from '../src/core/movingLoads.ts';
import { buildProjectModel } from '../src/core/projectModel.ts';

function example(path: string, moving: MovingLoad): Project {
  const doc = JSON.parse(readFileSync(path, 'utf8'));
  doc.loads.push(moving);
  const checked = validateProject(doc);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

/** The static project with the load parked at x and the design's cut length fixed. */
function parkedAt(project: Project, load: MovingLoad, x: number, cutLength: number): Project {
  const parked = parkedProject(project, load, x);
  return {
    ...parked,
    installation: { ...parked.installation, target: { unstressedLength: cutLength } },
  };
}

const BASKET: MovingLoad = { type: 'moving', from: 2, to: 26, mass: 25, label: 'Pulley basket' };
const inclined = example('examples/workshop-yard-inclined.json', BASKET);
const results = solveProject(inclined);

describe('moving load parked at one position', () => {
  it('equals a static point load there, in every loaded case (1e-9)', () => {
    const model = buildProjectModel(inclined);
    const states = [
      model.installation,
      ...inclined.cases.map((c) => ({ ...loadStateOfCase(c), name: c.name })),
    ];
    for (const x of [2, 9.7, 14.25, 26]) {
      const staticResults = solveProject(parkedAt(inclined, BASKET, x, results.unstressedLength));
      states.forEach((state, i) => {
        const ctx = {
          project: inclined,
          unstressed: [results.unstressedLength],
          state,
          tensionGuessN: results.cases[i].horizontalTension,
          refinement: results.mesh.refinement,
          endFittingEfficiency: results.endFittings.efficiency,
        };
        const parked = solveMovingLoadAt(ctx, BASKET, x);
        const expected = staticResults.cases[i];
        expect(parked.solved).toBe(true);
        expect(Math.abs(parked.spans[0].tensionN / expected.horizontalTension - 1)).toBeLessThan(
          1e-9,
        );
        expect(Math.abs(largestStateTension(parked.spans) / expected.maxTension - 1)).toBeLessThan(
          1e-9,
        );
        const clearance = clearanceOver(parked.spans, inclined.ground ?? [], -Infinity, Infinity);
        expect(clearance.value).toBeCloseTo(expected.clearance, 9);
      });
    }
  });
});

describe('moving-load envelope against static solves', () => {
  const positions = Array.from(
    { length: 41 },
    (_, k) => BASKET.from + (k * (BASKET.to - BASKET.from)) / 40,
  );
  const statics = positions.map((x) =>
    solveProject(parkedAt(inclined, BASKET, x, results.unstressedLength)),
  );

  it('every loaded case reports one envelope; cases without loads report none', () => {
    results.cases.forEach((c, i) => {
      const withLoads = i === 0 ? inclined.installation.withLoads : inclined.cases[i - 1].withLoads;
      expect(c.movingLoads?.length).toBe(withLoads ? 1 : 0);
    });
  });

  it('the largest tension is at least every static largest tension, the clearance at most', () => {
    results.cases.forEach((c, i) => {
      const m = c.movingLoads?.[0];
      if (!m) return;
      for (const s of statics) {
        expect(m.maxTension).toBeGreaterThanOrEqual(s.cases[i].maxTension * (1 - 1e-9));
        expect(m.clearance).toBeLessThanOrEqual(s.cases[i].clearance + 1e-9);
        expect(m.zoneClearances[0].clearance).toBeLessThanOrEqual(
          s.cases[i].zoneClearances[0].clearance + 1e-9,
        );
      }
    });
  });

  it('the reported worst positions reproduce the reported values as static solves', () => {
    const hot = results.cases[1];
    const m = hot.movingLoads?.[0];
    expect(m).toBeDefined();
    if (!m) return;
    const atTension = solveProject(
      parkedAt(inclined, BASKET, m.maxTensionAt, results.unstressedLength),
    );
    const atClearance = solveProject(
      parkedAt(inclined, BASKET, m.clearanceAt, results.unstressedLength),
    );
    expect(atTension.cases[1].maxTension).toBeCloseTo(m.maxTension, 6);
    expect(atClearance.cases[1].clearance).toBeCloseTo(m.clearance, 9);
    expect(m.clearanceAt).toBeGreaterThanOrEqual(BASKET.from);
    expect(m.clearanceAt).toBeLessThanOrEqual(BASKET.to);
  });

  it('the band holds the static wire with the load anywhere on its path', () => {
    const m = results.cases[0].movingLoads?.[0];
    if (!m) throw new Error('no envelope');
    const staticCase = results.cases[0];
    // The unloaded-by-the-basket wire is above the band's lowest line everywhere.
    const profile = staticCase.profile;
    if (!profile) throw new Error('no profile');
    m.band.x.forEach((x, k) => {
      expect(m.band.zLow[k]).toBeLessThanOrEqual(m.band.zHigh[k]);
      const j = profile.x.findIndex((px) => px >= x);
      if (j > 0 && Math.abs(profile.x[j] - x) < 1e-9)
        expect(m.band.zLow[k]).toBeLessThan(profile.z[j] + 1e-9);
    });
  });

  it('a failing envelope fails its case and says where', () => {
    const heavy = example('examples/courtyard-lights.json', {
      type: 'moving',
      from: 1,
      to: 21,
      mass: 400,
      label: 'Hauled sign',
    });
    const r = solveProject(heavy);
    const installed = r.cases[0];
    expect(installed.movingLoads?.[0].ok).toBe(false);
    expect(installed.ok).toBe(false);
    expect(installed.messages.join(' ')).toMatch(/Hauled sign: .* with the load at \d+\.\d\d m/);
  });
});

describe('moving load on a taut level wire: closed form', () => {
  it('the lowest point with the load at a: w a (l − a)/(2H) + P a (l − a)/(H l) below the chord', () => {
    // Parabolic theory, very stiff wire, load 50 N on 20 m at H ≈ 5 kN: the closed form of the
    // parabolic string with a point load P at a (elementary statics); near mid-span the lowest
    // point is under the load, and the worst position is mid-span (a flat minimum).
    const project: Project = {
      format: 'sagwright-project',
      version: 1,
      title: 'closed form',
      supports: [
        { x: 0, z: 10 },
        { x: 20, z: 10 },
      ],
      wire: {
        label: 'stiff',
        diameter: 0.004,
        massPerLength: 0.1,
        axialStiffness: 1e12,
        thermalExpansion: 0,
        breakingLoad: 1e9,
      },
      loads: [{ type: 'moving', from: 4, to: 16, force: 50, label: 'Trolley' }],
      installation: { temperature: 15, withLoads: true, target: { horizontalTension: 5000 } },
      cases: [],
      limits: { safetyFactor: 5, minClearance: 0 },
      model: { theory: 'parabolic', elementOrder: 1, elementsPerSpan: 200 },
    };
    const r = solveProject(project);
    const m = r.cases[0].movingLoads?.[0];
    if (!m) throw new Error('no envelope');
    const a = m.clearanceAt;
    expect(a).toBeCloseTo(10, 2);
    const H = solveProject(parkedAt(project, project.loads[0] as MovingLoad, a, r.unstressedLength))
      .cases[0].horizontalTension;
    const w = 0.1 * 9.80665;
    const drop = (w * a * (20 - a)) / (2 * H) + (50 * a * (20 - a)) / (H * 20);
    expect(10 - m.clearance).toBeCloseTo(drop, 9);
    // and the worst clearance is the centre's to second order: within 1e-7 m of it
    const Hc = solveProject(
      parkedAt(project, project.loads[0] as MovingLoad, 10, r.unstressedLength),
    ).cases[0].horizontalTension;
    expect(Math.abs(10 - m.clearance - ((w * 400) / (8 * Hc) + (50 * 20) / (4 * Hc)))).toBeLessThan(
      1e-7,
    );
  });
});
