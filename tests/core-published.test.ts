/**
 * Published worked examples through solveProject (doc/sources.md, "Published worked examples")
 * and the level-span change-of-state equation of overhead-line practice (Kiessling et al., Overhead Power Lines, 2003 [M]).
 */
import { describe, expect, it } from 'vitest';
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';

function solved(project: Project) {
  const check = validateProject(project);
  if (!check.ok) throw new Error(JSON.stringify(check.issues));
  return solveProject(project);
}

describe('Beer & Johnston, Vector Mechanics: Statics, Problem 7.107 (0.6 kg/m, 60 m, sag 1.5 m)', () => {
  // Reference values [D] (derived from the statement) with g = 9.80665: parabola H = 1765.2 N;
  // exact catenary H = 1766.7 N, T_max = 1775.5 N. Inextensible wire: EA very large.
  const base = {
    span: 60,
    massPerLength: 0.6,
    axialStiffness: 1e12,
    target: { sag: 1.5 },
  } as const;

  it('exact theory: H = 1766.7 N, T_max = 1775.5 N', () => {
    const r = solved(singleSpan({ ...base, theory: 'exact' })).cases[0];
    expect(r.horizontalTension).toBeCloseTo(1766.7, 1);
    expect(r.maxTension).toBeCloseTo(1775.5, 1);
    expect(r.sag).toBeCloseTo(1.5, 9);
  });

  it('parabolic theory: H = 1765.2 N; T_max = H √(1 + (4f/l)²) (parabola closed form)', () => {
    const r = solved(singleSpan({ ...base, theory: 'parabolic' })).cases[0];
    expect(r.horizontalTension).toBeCloseTo(1765.2, 1);
    expect(r.maxTension).toBeCloseTo(r.horizontalTension * Math.hypot(1, (4 * 1.5) / 60), 6);
  });

  it('cut length ≈ 60.100 m (statement asks for the length; [D] from the statement)', () => {
    const result = solved(singleSpan({ ...base, theory: 'exact' }));
    expect(result.unstressedLength).toBeCloseTo(60.1, 3);
  });
});

describe('Published example 3: change of state with ice and wind (textbook problem 15.3)', () => {
  // Span 300 m; A = 240 mm²; d = 20 mm; 1.0 kg/m; E = 9320 kgf/mm²; worst state −5 °C, 10 mm
  // radial ice at 910 kg/m³, wind 40 kgf/m² on the iced diameter, H₁ = 4000 kgf (breaking
  // 8000 kgf / 2). Asked: 65 °C, still air. Published 20.76 m and 541.9 kgf, reproduced only
  // with alpha as printed, 18.44e-5 /°C (very likely a misprint for 18.44e-6, which gives
  // 1532.6 kgf and 7.34 m [D]). We test with the printed value, as the source does.
  const g = 9.80665;
  const windPressurePa = 40 * g;
  const airDensity = 1.25;
  const project = (alpha: number, theory: 'exact' | 'parabolic'): Project => ({
    ...singleSpan({
      span: 300,
      massPerLength: 1.0,
      axialStiffness: 9320 * g * 240,
      thermalExpansion: alpha,
      diameter: 0.02,
      breakingLoad: 8000 * g,
      theory,
      elementsPerSpan: 400,
      installationTemperature: -5,
      target: { horizontalTension: 4000 * g, case: 'Worst' },
      cases: [
        {
          name: 'Worst',
          temperature: -5,
          iceThickness: 0.01,
          windSpeed: Math.sqrt((2 * windPressurePa) / airDensity),
          withLoads: true,
        },
        { name: 'Hot', temperature: 65, iceThickness: 0, windSpeed: 0, withLoads: true },
      ],
    }),
    environment: { gravity: g, airDensity, iceDensity: 910, dragCoefficient: 1 },
  });

  it('the change-of-state equation, as the source uses it, gives the published 541.9 kgf', () => {
    // Confirms the reading of the problem: w₁ is the resultant of wire, ice and wind per metre.
    const w1 = Math.hypot(1.0 + 910 * Math.PI * 0.01 * 0.03, 40 * 0.04); // kgf/m
    const H2 = changeOfState(4000, w1, 1.0, 300, 9320 * 240, 18.44e-5, 70);
    expect(H2).toBeCloseTo(541.9, 0);
    expect((1.0 * 300 * 300) / (8 * H2)).toBeCloseTo(20.76, 1);
  });

  // At 65 °C the sag is 7 % of the span and the printed alpha strains the wire 1.3 %: beyond the
  // range where the equation's truncated length series holds (it is checked to 0.5 % at ≤ 5 %
  // below). Sagwright keeps the full length, so it lands within 2 % of the published tension.
  for (const theory of ['parabolic', 'exact'] as const) {
    it(`${theory}: printed alpha gives 541.9 kgf and 20.76 m at 65 °C within 2 % (equation truncation)`, () => {
      const r = solved(project(18.44e-5, theory));
      const worst = r.cases[1];
      const hot = r.cases[2];
      expect(worst.horizontalTension / g).toBeCloseTo(4000, 6);
      const tensionKgf = hot.horizontalTension / g;
      console.log(
        `${theory}, alpha 18.44e-5: H = ${tensionKgf.toFixed(1)} kgf, sag ${hot.sag.toFixed(3)} m (published 541.9 kgf, 20.76 m)`,
      );
      expect(Math.abs(tensionKgf - 541.9) / 541.9).toBeLessThan(0.02);
      expect(Math.abs(hot.sag - 20.76) / 20.76).toBeLessThan(0.01);
    });
  }

  it('corrected alpha 18.44e-6 gives ≈1532.6 kgf and 7.34 m [D]', () => {
    const hot = solved(project(18.44e-6, 'parabolic')).cases[2];
    console.log(
      `parabolic, alpha 18.44e-6: H = ${(hot.horizontalTension / g).toFixed(1)} kgf, sag ${hot.sag.toFixed(3)} m`,
    );
    expect(Math.abs(hot.horizontalTension / g - 1532.6) / 1532.6).toBeLessThan(0.005);
    expect(Math.abs(hot.sag - 7.34) / 7.34).toBeLessThan(0.005);
  });
});

/** H₂ from H₂² [H₂ − H₁ + EA w₁² S²/(24 H₁²) + EA α Δt] = EA w₂² S²/24, by bisection. */
function changeOfState(
  H1: number,
  w1: number,
  w2: number,
  S: number,
  EA: number,
  alpha: number,
  dt: number,
): number {
  const f = (H2: number) =>
    H2 * H2 * (H2 - H1 + (EA * w1 * w1 * S * S) / (24 * H1 * H1) + EA * alpha * dt) -
    (EA * w2 * w2 * S * S) / 24;
  let lo = 1e-6;
  let hi = 1e9;
  for (let k = 0; k < 200; k++) {
    const mid = Math.sqrt(lo * hi);
    if (f(mid) > 0) hi = mid;
    else lo = mid;
  }
  return Math.sqrt(lo * hi);
}

describe('level-span change-of-state equation (overhead-line practice): parabolic theory within 0.5 % at sag/span ≤ 5 %', () => {
  const cases = [
    { name: 'heat', span: 30, mass: 0.1, EA: 1.2e6, alpha: 1.2e-5, H1: 600, dt: 35, extra: 0 },
    {
      name: 'cold with ice',
      span: 25,
      mass: 0.08,
      EA: 1e6,
      alpha: 1.2e-5,
      H1: 400,
      dt: -25,
      extra: 0.5,
    },
    {
      name: 'stiff short span',
      span: 12,
      mass: 0.3,
      EA: 3e6,
      alpha: 1.6e-5,
      H1: 1500,
      dt: 20,
      extra: 0.2,
    },
  ];
  for (const c of cases) {
    it(c.name, () => {
      const g = 9.80665;
      const ice = 0.004;
      const iceWeight = c.extra > 0 ? 900 * g * Math.PI * ice * (0.005 + ice) : 0;
      const project = singleSpan({
        span: c.span,
        massPerLength: c.mass,
        axialStiffness: c.EA,
        thermalExpansion: c.alpha,
        theory: 'parabolic',
        target: { horizontalTension: c.H1 },
        cases: [
          {
            name: 'State 2',
            temperature: 15 + c.dt,
            iceThickness: c.extra > 0 ? ice : 0,
            windSpeed: 0,
            withLoads: true,
          },
        ],
      });
      const r = solved(project);
      const w1 = c.mass * g;
      const w2 = w1 + iceWeight;
      const expected = changeOfState(c.H1, w1, w2, c.span, c.EA, c.alpha, c.dt);
      const got = r.cases[1].horizontalTension;
      const sagRatio = Math.max(r.cases[0].sag, r.cases[1].sag) / c.span;
      console.log(
        `${c.name}: H2 ${got.toFixed(2)} N vs equation ${expected.toFixed(2)} N (${((got / expected - 1) * 100).toFixed(3)} %), sag/span ${(sagRatio * 100).toFixed(2)} %`,
      );
      expect(sagRatio).toBeLessThanOrEqual(0.05);
      expect(Math.abs(got - expected) / expected).toBeLessThan(0.005);
    });
  }
});
