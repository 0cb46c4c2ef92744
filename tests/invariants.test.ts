/**
 * Properties that must hold for every valid project, over 100 seeded random projects
 * (tests/fixtures/randomProjects.ts): finite results, T_max ≥ H, equilibrium of the support
 * reactions with the hung loads, symmetry of level spans, monotone response to load and heat,
 * and a case equal to the installation state giving back the installation tension.
 */
import { describe, expect, it } from 'vitest';
import {
  type CaseResult,
  type CustomWire,
  type Project,
  solveProject,
  validateProject,
} from '../src/core/index.ts';
import {
  type CaseState,
  chordLength,
  expectedTotals,
  fixedLengthProject,
  heavier,
  profileLength,
  randomProject,
  stillCase,
  symmetricProject,
} from './fixtures/randomProjects.ts';

const PROJECT_COUNT = 100;
const EQUILIBRIUM_TOLERANCE = 1e-9;

function nonFinitePaths(value: unknown, path = 'results'): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (Array.isArray(value)) return value.flatMap((v, i) => nonFinitePaths(v, `${path}[${i}]`));
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([k, v]) => nonFinitePaths(v, `${path}.${k}`));
  return [];
}

function stateOf(project: Project, c: CaseResult): CaseState {
  if (c.name === 'Installation') {
    const { temperature, withLoads } = project.installation;
    return { temperature, withLoads, iceThickness: 0, windSpeed: 0 };
  }
  const weather = project.cases.find((k) => k.name === c.name);
  if (!weather) throw new Error(`no case ${c.name}`);
  return weather;
}

const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/**
 * Loads a case hangs on the wire, with the tolerance of the comparison: 1e-9 of the total, plus,
 * in the exact theory, 1e-3 of the ice and wind on hung cables, whose cable length is measured
 * on the sampled profile (a polyline through the vertex nodes: short by ~(h κ)²/24 relative).
 */
function loadsOf(project: Project, c: CaseResult, results: { unstressedLength: number }) {
  const exact = (project.model?.theory ?? 'exact') === 'exact';
  const profile = c.profile;
  const cable = (from: number, to: number) =>
    exact && profile ? profileLength(profile, from, to) : chordLength(project, from, to);
  const want = expectedTotals(
    project,
    project.wire as CustomWire,
    stateOf(project, c),
    results.unstressedLength,
    cable,
  );
  const slack = exact ? 1e-3 * want.along : 0;
  return { ...want, slack };
}

const projects = Array.from({ length: PROJECT_COUNT }, (_, i) => randomProject(1000 + i));
const solved = projects.map((project) => ({ project, results: solveProject(project) }));

describe('random valid projects (seeded mulberry32, 100 projects)', () => {
  it('are accepted by the validator', () => {
    for (const project of projects) {
      const check = validateProject(project);
      expect(check.ok ? [] : check.issues, project.title).toEqual([]);
    }
  });

  it('solve every case with no NaN or infinity anywhere in the results', () => {
    for (const { project, results } of solved) {
      expect(nonFinitePaths(results), project.title).toEqual([]);
      for (const c of results.cases) expect(c.solved, `${project.title} / ${c.name}`).toBe(true);
    }
  });

  it('give a largest tension at least the horizontal tension (T = H √(1 + z′² + y′²))', () => {
    for (const { project, results } of solved) {
      for (const c of results.cases) {
        expect(c.maxTension, `${project.title} / ${c.name}`).toBeGreaterThanOrEqual(
          c.horizontalTension,
        );
        for (const s of c.spans) expect(c.maxTension).toBeGreaterThanOrEqual(s.horizontalTension);
      }
    }
  });

  function verticalFailures(theory: 'exact' | 'parabolic'): string[] {
    const failures: string[] = [];
    for (const { project, results } of solved) {
      if (project.model?.theory !== theory) continue;
      for (const c of results.cases) {
        const totals = loadsOf(project, c, results);
        const want = totals.vertical;
        const got = c.supports.reduce((sum, s) => sum + s.vertical, 0);
        const error = relative(got, want);
        if (!(Math.abs(got - want) <= EQUILIBRIUM_TOLERANCE * want + totals.slack))
          failures.push(
            `${project.title} / ${c.name}: ΣV ${got} vs ${want}, rel ${error.toExponential(2)}`,
          );
      }
    }
    return failures;
  }

  it('balance the hung weight with the vertical reactions, exact theory (equilibrium, ΣV = W)', () => {
    expect(verticalFailures('exact')).toEqual([]);
  });

  it('balance the hung weight with the vertical reactions, parabolic theory (ΣV = W)', () => {
    expect(verticalFailures('parabolic')).toEqual([]);
  });

  it('balance the wind load with the lateral reactions (equilibrium, ΣL = wind)', () => {
    const failures: string[] = [];
    for (const { project, results } of solved) {
      for (const c of results.cases) {
        const want = loadsOf(project, c, results);
        const got = c.supports.reduce((sum, s) => sum + s.lateral, 0);
        const ok =
          want.lateral === 0
            ? Math.abs(got) <= 1e-9
            : Math.abs(got - want.lateral) <= EQUILIBRIUM_TOLERANCE * want.lateral + want.slack;
        if (!ok)
          failures.push(
            `${project.title} / ${c.name} (${project.model?.theory}): ΣL ${got} vs ${want.lateral}`,
          );
      }
    }
    expect(failures).toEqual([]);
  });

  it('sum the horizontal reactions to zero (equilibrium along the span, ΣH = 0)', () => {
    for (const { project, results } of solved) {
      for (const c of results.cases) {
        const net = c.supports.reduce((sum, s) => sum + s.horizontal, 0);
        expect(Math.abs(net), `${project.title} / ${c.name}`).toBeLessThanOrEqual(
          1e-9 * c.horizontalTension,
        );
        expect(c.supports[0].horizontal).toBeGreaterThan(0);
        expect(c.supports[c.supports.length - 1].horizontal).toBeLessThan(0);
      }
    }
  });

  // Statics of each support: the wire pulls with its tension along each side's direction, so the
  // downward pull is Σ T sin(angle) plus any load placed at the support, the pull along the line
  // is H after − H before; a pulley has equal tension on both sides, a swing link no pull along
  // the line.
  it('keep every support in equilibrium with the wire on each side (1e-9)', () => {
    const failures: string[] = [];
    for (const { project, results } of solved) {
      for (const c of results.cases) {
        const state = stateOf(project, c);
        const scale = 1e-9 * c.maxTension;
        c.supports.forEach((s, i) => {
          const where = `${project.title} / ${c.name} / support ${i + 1} (${s.attachment})`;
          const side = (t?: number, a?: number) =>
            t === undefined || a === undefined ? 0 : t * Math.sin((a * Math.PI) / 180);
          const placed = state.withLoads
            ? project.loads.reduce(
                (sum, l) =>
                  l.type === 'point' && l.x === project.supports[i].x
                    ? sum + (l.force ?? (l.mass ?? 0) * 9.80665)
                    : sum,
                0,
              )
            : 0;
          const down = side(s.tensionBefore, s.angleBefore) + side(s.tensionAfter, s.angleAfter);
          if (!(Math.abs(s.vertical - down - placed) <= scale))
            failures.push(`${where}: vertical ${s.vertical} vs ${down} + ${placed}`);
          const hBefore = i > 0 ? c.spans[i - 1].horizontalTension : 0;
          const hAfter = i < c.spans.length ? c.spans[i].horizontalTension : 0;
          if (!(Math.abs(s.horizontal - (hAfter - hBefore)) <= scale))
            failures.push(`${where}: along the line ${s.horizontal} vs ${hAfter - hBefore}`);
          const pulleyOff = Math.abs((s.tensionBefore ?? 0) - (s.tensionAfter ?? 0));
          if (s.attachment === 'pulley' && !(pulleyOff <= scale))
            failures.push(`${where}: tensions ${s.tensionBefore} and ${s.tensionAfter}`);
          if (s.attachment === 'swingLink' && !(Math.abs(s.horizontal) <= scale))
            failures.push(`${where}: swing link pulled ${s.horizontal} N along the line`);
        });
      }
    }
    expect(failures).toEqual([]);
    const kinds = new Set(
      solved.flatMap((r) => r.results.cases[0].supports.map((s) => s.attachment)),
    );
    expect([...kinds].sort()).toEqual(['clamped', 'end', 'pulley', 'swingLink']);
  });

  it('give back the installation tension and sag in a case equal to the installation state', () => {
    for (const { project, results } of solved) {
      const installed = results.cases[0];
      const same = results.cases.find((c) => c.name === 'As installed');
      if (!same) throw new Error('generator must add the "As installed" case');
      expect(
        relative(same.horizontalTension, installed.horizontalTension),
        project.title,
      ).toBeLessThan(1e-9);
      expect(relative(same.maxTension, installed.maxTension), project.title).toBeLessThan(1e-9);
      expect(relative(same.sag, installed.sag), project.title).toBeLessThan(1e-9);
    }
  });
});

describe('level spans with loads mirrored about midspan (symmetry)', () => {
  it('give equal end reactions and the lowest point at midspan, every case', () => {
    for (let seed = 0; seed < 40; seed++) {
      const project = symmetricProject(5000 + seed);
      const span = project.supports[1].x;
      for (const c of solveProject(project).cases) {
        const [a, b] = c.supports;
        const label = `${project.title} / ${c.name}`;
        expect(relative(a.vertical, b.vertical), label).toBeLessThan(1e-9);
        expect(Math.abs(a.lateral - b.lateral), label).toBeLessThanOrEqual(
          1e-9 * (a.resultant + 1),
        );
        expect(a.horizontal, label).toBeCloseTo(-b.horizontal, 9);
        expect(Math.abs(c.lowestPoint.x - span / 2), label).toBeLessThan(1e-6 * span);
      }
    }
  });
});

function expectMore(more: CaseResult, less: CaseResult, label: string, tensionUp: boolean): void {
  more.spans.forEach((s, j) => {
    expect(s.sag, `${label} span ${j + 1} sag`).toBeGreaterThan(less.spans[j].sag);
  });
  if (tensionUp) {
    expect(more.horizontalTension, `${label} H`).toBeGreaterThan(less.horizontalTension);
    expect(more.maxTension, `${label} Tmax`).toBeGreaterThan(less.maxTension);
  } else {
    expect(more.horizontalTension, `${label} H`).toBeLessThan(less.horizontalTension);
    expect(more.maxTension, `${label} Tmax`).toBeLessThan(less.maxTension);
  }
}

describe('monotone response at a fixed cut length (change of state)', () => {
  const seeds = Array.from({ length: 40 }, (_, i) => 8000 + i);

  // One section (intermediate supports pulleys or swing links): with clamped supports the
  // installation shares the cut length out among the spans by their stretch, so one span may
  // get less wire when heavier.
  it.each(['pulley', 'swingLink'] as const)(
    'heavier load (all loads × 1.5) gives more sag and more tension in every span (%s)',
    (attachment) => {
      for (const seed of seeds) {
        const cases = [stillCase('Cold', -5), stillCase('Hot', 35)];
        const clamped = fixedLengthProject(seed, cases);
        const last = clamped.supports.length - 1;
        const supports = clamped.supports.map((s, i) =>
          i > 0 && i < last ? { ...s, attachment } : s,
        );
        const light = { ...clamped, supports };
        const a = solveProject(light).cases;
        const b = solveProject(heavier(light, 1.5)).cases;
        a.forEach((c, i) => {
          expectMore(b[i], c, `${light.title} / ${c.name}`, true);
        });
      }
    },
  );

  it('hotter gives more sag and less tension in every span (with ice and wind)', () => {
    for (const seed of seeds) {
      const weather = { iceThickness: 0.005, windSpeed: 15 };
      const project = fixedLengthProject(seed, [
        stillCase('Cold', -10, weather),
        stillCase('Hot', 30, weather),
      ]);
      const [, cold, hot] = solveProject(project).cases;
      expectMore(hot, cold, project.title, false);
    }
  });

  it('ice on the bare wire gives more sag and more tension in every span', () => {
    for (const seed of seeds) {
      const bare = { withLoads: false };
      const project = fixedLengthProject(seed, [
        stillCase('Bare', 0, bare),
        stillCase('Iced', 0, { ...bare, iceThickness: 0.008 }),
      ]);
      const [, clean, iced] = solveProject(project).cases;
      expectMore(iced, clean, project.title, true);
    }
  });
});

describe('minimal inputs for past and present defects', () => {
  // Source: equilibrium. The parabolic theory carries w per horizontal metre, so the end
  // reactions of a bare level span sum to w·l at any temperature (mass does not change).
  // Regression fixture: the parabolic theory once scaled its per-horizontal-metre weight by
  // 1/(1 + α Δt), giving 18.679 N here instead of w·l = 19.613 N.
  it('parabolic wire weight does not change with temperature', () => {
    const project: Project = {
      format: 'sagwright-project',
      version: 2,
      title: 'Bare level span, parabolic, hot',
      supports: [
        { x: 0, z: 5 },
        { x: 20, z: 5 },
      ],
      wire: {
        label: 'Test wire',
        diameter: 0.005,
        massPerLength: 0.1,
        axialStiffness: 1e6,
        thermalExpansion: 1e-3,
        breakingLoad: 1e5,
      },
      loads: [],
      installation: { temperature: 10, withLoads: false, target: { horizontalTension: 500 } },
      cases: [stillCase('Hot', 60, { withLoads: false })],
      limits: { safetyFactor: 5, minClearance: 0 },
      model: { theory: 'parabolic', elementOrder: 1, elementsPerSpan: 20 },
    };
    const hot = solveProject(project).cases[1];
    const weight = 0.1 * 9.80665 * 20;
    expect(relative(hot.supports[0].vertical + hot.supports[1].vertical, weight)).toBeLessThan(
      1e-9,
    );
  });
});
