/**
 * Tension window. Checked against solveProject itself (the project pulled to each end's
 * tension): at each end exactly one check is at its limit (1e-6 relative), every check passes
 * just inside and at least one fails just outside. The advice for a shut window is checked by
 * doing what it says (raise the fixings, a stronger wire, lighter loads) and solving again.
 */
import { describe, expect, it } from 'vitest';
import {
  type CaseResult,
  type Project,
  solveProject,
  tensionWindow,
  type WindowEnd,
  windowPosition,
} from '../src/core/index.ts';
import { resolveWire } from '../src/core/wireCatalog.ts';
import { atInstallationTension, loadExample, roadSquare } from './helpers/designProjects.ts';

interface Check {
  case: string;
  check: string;
  value: number;
  limit: number;
}

/** Every check of every case as solveProject reports it. */
function checksOf(project: Project, cases: CaseResult[]): Check[] {
  return cases.flatMap((c) => [
    { case: c.name, check: 'tension', value: c.utilisation, limit: 1 },
    { case: c.name, check: 'clearance', value: c.clearance, limit: project.limits.minClearance },
    ...c.zoneClearances.map((z) => ({
      case: c.name,
      check: z.label,
      value: z.clearance,
      limit: z.required,
    })),
  ]);
}

const atLimit = (c: Check) => Math.abs(c.value - c.limit) <= 1e-6 * c.limit;
const passes = (c: Check) => (c.check === 'tension' ? c.value <= c.limit : c.value >= c.limit);

function expectEnd(project: Project, end: WindowEnd, inside: 1 | -1) {
  const H = end.horizontalTension;
  const at = solveProject(atInstallationTension(project, H));
  const checks = checksOf(project, at.cases);
  const limiting = checks.filter(atLimit);
  expect(limiting).toHaveLength(1);
  expect(limiting[0]).toMatchObject({ case: end.case, check: end.check });
  for (const c of checks) if (c !== limiting[0]) expect(passes(c)).toBe(true);
  const inner = solveProject(atInstallationTension(project, H * (1 + inside * 1e-4)));
  expect(inner.cases.every((c) => c.ok)).toBe(true);
  const outer = solveProject(atInstallationTension(project, H * (1 - inside * 1e-4)));
  const failing = checksOf(project, outer.cases).filter((c) => !passes(c));
  expect(failing.length).toBeGreaterThanOrEqual(1);
  expect(failing).toContainEqual(expect.objectContaining({ case: end.case, check: end.check }));
}

/** The demo with rope-grip terminations (80 %) and a lantern hanging 0.6 m below the wire. */
function demoWithFittingsAndDrop(): Project {
  const p = structuredClone(loadExample('examples/courtyard-lights.json'));
  p.limits.endFittings = { start: { kind: 'ropeGrips' }, end: { kind: 'ferruleEye' } };
  p.loads = p.loads.map((l) => (l.type === 'point' ? { ...l, drop: 0.6 } : l));
  return p;
}

describe.each([
  ['examples/courtyard-lights.json', loadExample('examples/courtyard-lights.json')],
  ['examples/workshop-yard-inclined.json', loadExample('examples/workshop-yard-inclined.json')],
  ['the demo with end fittings and a hanging lantern', demoWithFittingsAndDrop()],
])('tension window of %s', (_name, project) => {
  const window = tensionWindow(project);

  it('is open, set low by a clearance check and high by the tension check', () => {
    expect(window.empty).toBe(false);
    expect(window.low?.check).not.toBe('tension');
    expect(window.high?.check).toBe('tension');
    expect(window.low?.horizontalTension).toBeLessThan(window.high?.horizontalTension ?? 0);
  });

  it('low end: one check at its limit, all pass just above, that one fails just below', () => {
    if (!window.low) throw new Error('no low end');
    expectEnd(project, window.low, 1);
  });

  it('high end: one check at its limit, all pass just below, that one fails just above', () => {
    if (!window.high) throw new Error('no high end');
    expectEnd(project, window.high, -1);
  });

  it('says where the current setting sits, in per cent of the ends', () => {
    const H = solveProject(project).cases[0].horizontalTension;
    const text = windowPosition(project, window, H);
    const low = window.low?.horizontalTension ?? 0;
    expect(text).toContain(
      `${Math.abs(100 * (H / low - 1)).toFixed(0)} % above the lowest tension`,
    );
  });
});

describe('a shut window (34 m level span, 4.5 m road)', () => {
  const project = roadSquare();
  const window = tensionWindow(project);
  const number = (pattern: RegExp) => {
    const line = window.advice.find((a) => pattern.test(a));
    const match = line?.match(pattern);
    if (!match) throw new Error(`no advice matching ${pattern}: ${window.advice.join(' | ')}`);
    return Number(match[1]);
  };

  it('is empty, both ends named, the clearance end above the tension end', () => {
    expect(window.empty).toBe(true);
    expect(window.low).toMatchObject({ case: 'Hot summer', check: 'Road' });
    expect(window.high).toMatchObject({ case: 'Cold, iced, windy', check: 'tension' });
    expect(window.low?.horizontalTension).toBeGreaterThan(window.high?.horizontalTension ?? 0);
  });

  it('raising every fixing by the advised height opens it; a little less does not', () => {
    const d = number(/Raising every fixing by at least ([\d.]+) m/);
    const raised = (by: number) => ({
      ...project,
      supports: project.supports.map((s) => ({ ...s, z: s.z + by })),
    });
    expect(tensionWindow(raised(d)).empty).toBe(false);
    expect(tensionWindow(raised(d - 0.02)).empty).toBe(true);
  });

  it('a wire as heavy and stretchy with the advised breaking load opens it', () => {
    const kN = number(/breaking load of at least ([\d.]+) kN/);
    const wire = resolveWire(project.wire);
    if (!wire) throw new Error('wire');
    const stronger = (breakingLoad: number): Project => ({
      ...project,
      wire: {
        label: 'stronger',
        diameter: wire.diameter,
        massPerLength: wire.massPerLength,
        axialStiffness: wire.axialStiffness,
        thermalExpansion: wire.thermalExpansion,
        breakingLoad,
      },
    });
    expect(tensionWindow(stronger(kN * 1000 + 50)).empty).toBe(false);
    expect(tensionWindow(stronger(kN * 1000 - 300)).empty).toBe(true);
  });

  it('hung loads as light as advised open it; 5 % heavier do not', () => {
    const kg = number(/at most ([\d.]+) kg hung in all/);
    const total = 0.11 * 33 + 1.8;
    const scaled = (k: number): Project => ({
      ...project,
      loads: project.loads.map((l) =>
        l.type === 'uniform'
          ? { ...l, massPerLength: l.massPerLength * k }
          : { ...l, mass: (l.type === 'point' ? (l.mass ?? 0) : 0) * k },
      ) as Project['loads'],
    });
    expect(tensionWindow(scaled((kg - 0.05) / total)).empty).toBe(false);
    expect(tensionWindow(scaled((kg * 1.05) / total)).empty).toBe(true);
  });
});
