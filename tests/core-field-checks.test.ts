/**
 * Today's setting and the field checks. Pulse return time t_r = 2 ∫ ds / c, c = √(T/μ), μ the
 * wire's own mass per stretched metre: checked (1) against the same integral done here by
 * composite Simpson quadrature on the closed-form parabola of a level, uniformly loaded span
 * (parabolic theory: z = q x (l − x)/(2H) below the chord, T = H √(1 + z'²)), and (2) against the
 * small-sag closed form of a taut string, t_r = 2 l / √(H/m), f = (1/2l) √(H/m) (e.g. Irvine,
 * Cable Structures, 1981, ch. 3, out-of-plane modes [M]), whose error is ≈ (4/3)(sag/l)².
 */
import { describe, expect, it } from 'vitest';
import { type Project, settingAt, solveProject } from '../src/core/index.ts';
import { loadExample } from './helpers/designProjects.ts';
import { singleSpan } from './helpers/projects.ts';

const m = 0.12;
const EA = 2.0e6;
const l = 25;

function bare(sag: number, theory: 'exact' | 'parabolic', rise = 0): Project {
  return singleSpan({
    span: l,
    rise,
    massPerLength: m,
    axialStiffness: EA,
    thermalExpansion: 1.2e-5,
    target: { sag },
    theory,
    elementsPerSpan: 400,
  });
}

/** 2 ∫ ds √(μ/T) over the parabola z' = q (l − 2x)/(2H), by composite Simpson with n panels. */
function simpsonReturnTime(H: number, q: number, n = 20000): number {
  const f = (x: number) => {
    const slope = (q * (l - 2 * x)) / (2 * H);
    const r = Math.sqrt(1 + slope * slope);
    const T = H * r;
    const mu = m / (1 + T / EA);
    return r * Math.sqrt(mu / T);
  };
  const h = l / n;
  let sum = f(0) + f(l);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(i * h);
  return (2 * sum * h) / 3;
}

describe('pulse return time and pluck frequency', () => {
  it('equal the wave-speed integral by quadrature (level span, parabolic theory)', () => {
    for (const sag of [0.25, 1.0, 3.0]) {
      const project = bare(sag, 'parabolic');
      const s = settingAt(project, project.installation.temperature);
      const expected = simpsonReturnTime(s.horizontalTension, m * 9.80665);
      expect(Math.abs((s.returnTime ?? Number.NaN) / expected - 1)).toBeLessThan(1e-9);
      expect(s.frequency).toBeCloseTo(1 / expected, 9);
    }
  });

  it('approach the small-sag closed form 2l/√(H/m) within (4/3)(sag/l)² + stretch', () => {
    for (const theory of ['parabolic', 'exact'] as const) {
      for (const sag of [0.125, 0.25]) {
        const project = bare(sag, theory);
        const s = settingAt(project, 25);
        const t = (2 * l) / Math.sqrt(s.horizontalTension / m);
        const bound = (4 / 3) * (sag / l) ** 2 * 1.5 + s.horizontalTension / EA;
        expect(Math.abs((s.returnTime ?? Number.NaN) / t - 1)).toBeLessThan(bound);
        expect(
          Math.abs((s.frequency ?? Number.NaN) * 2 * l * Math.sqrt(m / s.horizontalTension) - 1),
        ).toBeLessThan(bound);
      }
    }
  });

  it('are not given when loads hang on the wire while it is set, and the notes say to use the sag', () => {
    const demo = loadExample('examples/courtyard-lights.json');
    const s = settingAt(demo, 8);
    expect(s.returnTime).toBeNull();
    expect(s.frequency).toBeNull();
    expect(s.notes.join(' ')).toMatch(/do not hold.*Check the sag instead/);
  });

  it('are given for the bare wire when the wire is set before the loads are hung', () => {
    const demo = loadExample('examples/courtyard-lights.json');
    const s = settingAt({ ...demo, installation: { ...demo.installation, withLoads: false } }, 8);
    expect(s.returnTime).toBeGreaterThan(0);
    const t = (2 * 22) / Math.sqrt(s.horizontalTension / 0.0614);
    expect(Math.abs((s.returnTime ?? 0) / t - 1)).toBeLessThan(0.01);
    expect(s.notes.join(' ')).toContain('before the loads are hung');
  });
});

describe("today's setting", () => {
  const demo = loadExample('examples/courtyard-lights.json');

  it('at the installation temperature is the installation state', () => {
    const s = settingAt(demo, 15);
    const installed = solveProject(demo).cases[0];
    expect(s.horizontalTension).toBeCloseTo(installed.horizontalTension, 6);
    expect(s.sag).toBeCloseTo(installed.sag, 9);
    expect(s.maxTension).toBeCloseTo(installed.maxTension, 6);
  });

  it('at a chart temperature equals that row of the set-up chart', () => {
    const row = solveProject(demo).setUpChart.find((r) => r.temperature === 5);
    const s = settingAt(demo, 5);
    expect(s.horizontalTension).toBeCloseTo(row?.horizontalTension ?? 0, 6);
    expect(s.sag).toBeCloseTo(row?.sag ?? 0, 9);
  });

  it('between rows lies between them (8 °C between 5 and 10 °C)', () => {
    const chart = solveProject(demo).setUpChart;
    const s = settingAt(demo, 8);
    const at = (t: number) => chart.find((r) => r.temperature === t)?.horizontalTension ?? 0;
    expect(s.horizontalTension).toBeLessThan(at(5));
    expect(s.horizontalTension).toBeGreaterThan(at(10));
  });

  it('level span: measure at mid-span; the sag is q l²/(8H) for a uniform load (parabola)', () => {
    const project = bare(0.5, 'parabolic');
    const s = settingAt(project, 15);
    expect(s.sagAt.distance).toBeCloseTo(l / 2, 9);
    expect(s.midSpanSag).toBeCloseTo((m * 9.80665 * l * l) / (8 * s.horizontalTension), 9);
    expect(s.notes.join(' ')).toContain('Level span: measure the sag at mid-span');
    expect(s.lowestPoint.x).toBeCloseTo(l / 2, 9);
  });

  it('inclined span: the sag is largest where the wire is parallel to the chord (parabola: mid-span)', () => {
    const project = bare(0.5, 'exact', 4);
    const s = settingAt(project, 15);
    // Exact catenary on an incline: the largest sag from the chord sits just off mid-span.
    expect(Math.abs(s.sagAt.distance - l / 2)).toBeLessThan(0.5);
    expect(s.sag).toBeGreaterThanOrEqual(s.midSpanSag);
    expect(s.notes.join(' ')).toMatch(
      /Inclined span: .* from Fixing 1 \(measured level\); at mid-span/,
    );
  });
});
