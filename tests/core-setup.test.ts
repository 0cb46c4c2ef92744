/**
 * Set-up chart (what to set on the day). Checks: the row at the installation temperature is the
 * installation state; a row at a case's temperature with the same loads is that case (the same
 * change of state); hotter → less tension, more sag; the pulse return time agrees with the
 * travel time 2l/c of a wave at c = √(H/m) on a bare level wire (small-sag closed form of a taut
 * string, e.g. Irvine, Cable Structures, 1981, ch. 3 [M]); with hung loads it is not given.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';

function load(path: string): Project {
  const checked = validateProject(JSON.parse(readFileSync(path, 'utf8')));
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

describe('set-up chart', () => {
  const project = load('examples/courtyard-lights.json');
  const results = solveProject(project);
  const chart = results.setUpChart;

  it('covers −10…40 °C and the installation temperature, every row solved', () => {
    const temperatures = chart.map((r) => r.temperature);
    expect(temperatures[0]).toBeLessThanOrEqual(-10);
    expect(temperatures[temperatures.length - 1]).toBeGreaterThanOrEqual(40);
    expect(temperatures).toContain(project.installation.temperature);
    for (const row of chart) expect(row.solved).toBe(true);
  });

  it('the installation-temperature row is the installation state', () => {
    const row = chart.find((r) => r.temperature === project.installation.temperature);
    const installed = results.cases[0];
    expect(row?.horizontalTension).toBeCloseTo(installed.horizontalTension, 6);
    expect(row?.sag).toBeCloseTo(installed.sag, 9);
  });

  it('a row at a still-air case temperature with the same loads equals that case', () => {
    const hot = results.cases.find((c) => c.name === 'Hot summer');
    const row = chart.find((r) => r.temperature === 40);
    expect(hot && row).toBeTruthy();
    expect(row?.horizontalTension).toBeCloseTo(hot?.horizontalTension ?? 0, 6);
    expect(row?.sag).toBeCloseTo(hot?.sag ?? 0, 9);
  });

  it('hotter rows have less tension and more sag', () => {
    for (let i = 1; i < chart.length; i++) {
      expect(chart[i].horizontalTension).toBeLessThan(chart[i - 1].horizontalTension);
      expect(chart[i].sag).toBeGreaterThan(chart[i - 1].sag);
    }
  });

  it('gives no pulse return time when loads hang on the wire while it is set', () => {
    for (const row of chart) expect(row.returnTime).toBeNull();
  });

  it('pulse return time matches 2l/√(H/m) on a bare level wire within 1 %', () => {
    const m = 0.12;
    const bare = solveProject(
      singleSpan({
        span: 25,
        massPerLength: m,
        axialStiffness: 1.5e6,
        target: { sag: 0.5 },
        theory: 'parabolic',
      }),
    );
    for (const row of bare.setUpChart) {
      const travel = 2 * 25 * Math.sqrt(m / row.horizontalTension);
      expect(Math.abs((row.returnTime ?? Number.NaN) / travel - 1)).toBeLessThan(0.01);
    }
  });
});
