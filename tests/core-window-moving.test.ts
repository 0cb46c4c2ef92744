/**
 * The tension window with a moving load, and the window's tension over a pulley. Checked against
 * solveProject itself (the project pulled to each end's installation horizontal tension): at
 * each end exactly one check, counting every moving load's envelope as solveProject reports it,
 * is at its limit (1e-6 relative); every case passes just inside and that check fails just
 * outside. Over a pulley the spans' horizontal tensions differ: the window's ends, its plot's
 * samples and a horizontalTension target all mean the largest span's, so each plot sample pulled
 * as a target gives back the sample's worst utilisation and clearance margin.
 */
import { describe, expect, it } from 'vitest';
import {
  type CaseResult,
  chooseWires,
  type MovingLoad,
  type Project,
  solveProject,
  tensionWindow,
  validateProject,
  type WindowEnd,
  windowCurve,
  windowTensionSpans,
  windowTensionWords,
} from '../src/core/index.ts';
import { atInstallationTension, loadExample } from './helpers/designProjects.ts';

interface Check {
  case: string;
  check: string;
  value: number;
  limit: number;
  moving?: string;
}

/** Every check of every case as solveProject reports it, moving-load envelopes included. */
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
    ...(c.movingLoads ?? []).flatMap((m) => [
      { case: c.name, check: 'tension', value: m.utilisation, limit: 1, moving: m.label },
      {
        case: c.name,
        check: 'clearance',
        value: m.clearance,
        limit: project.limits.minClearance,
        moving: m.label,
      },
      ...m.zoneClearances.map((z) => ({
        case: c.name,
        check: z.label,
        value: z.clearance,
        limit: z.required,
        moving: m.label,
      })),
    ]),
  ]);
}

const atLimit = (c: Check) => Math.abs(c.value - c.limit) <= 1e-6 * c.limit;
const passes = (c: Check) => (c.check === 'tension' ? c.value <= c.limit : c.value >= c.limit);

function expectEnd(project: Project, end: WindowEnd, inside: 1 | -1) {
  const H = end.horizontalTension;
  const checks = checksOf(project, solveProject(atInstallationTension(project, H)).cases);
  const limiting = checks.filter(atLimit);
  expect(limiting).toHaveLength(1);
  expect(limiting[0]).toMatchObject({
    case: end.case,
    check: end.check,
    moving: end.movingLoad?.label,
  });
  for (const c of checks) if (c !== limiting[0]) expect(passes(c)).toBe(true);
  const inner = solveProject(atInstallationTension(project, H * (1 + inside * 1e-4)));
  expect(inner.cases.every((c) => c.ok)).toBe(true);
  const outer = checksOf(
    project,
    solveProject(atInstallationTension(project, H * (1 - inside * 1e-4))).cases,
  );
  expect(outer.filter((c) => !passes(c))).toContainEqual(
    expect.objectContaining({ case: end.case, check: end.check, moving: end.movingLoad?.label }),
  );
}

/** The shipped courtyard with a 25 kg basket hauled along most of the span (invented). */
function courtyardWithBasket(): Project {
  const p = structuredClone(loadExample('examples/courtyard-lights.json'));
  const basket: MovingLoad = {
    type: 'moving',
    from: 2,
    to: 20,
    mass: 25,
    label: 'Pulley basket',
  };
  p.loads.push(basket);
  const checked = validateProject(p);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

describe('tension window with a moving load (courtyard with a 25 kg basket)', {
  timeout: 60_000,
}, () => {
  const project = courtyardWithBasket();
  const refinement = solveProject(project).mesh.refinement;
  const window = tensionWindow(project, refinement);
  const withoutLoad = tensionWindow(loadExample('examples/courtyard-lights.json'), refinement);

  it('is open and narrower than the window without the basket: both ends set by the basket', () => {
    expect(window.empty).toBe(false);
    const [low, high] = [window.low, window.high];
    if (!low || !high || !withoutLoad.low || !withoutLoad.high) throw new Error('ends missing');
    expect(low.horizontalTension).toBeGreaterThan(withoutLoad.low.horizontalTension);
    expect(high.horizontalTension).toBeLessThan(withoutLoad.high.horizontalTension);
    expect(low.movingLoad?.label).toBe('Pulley basket');
    expect(high.movingLoad?.label).toBe('Pulley basket');
    expect(low.movingLoad?.at).toBeGreaterThanOrEqual(2);
    expect(low.movingLoad?.at).toBeLessThanOrEqual(20);
  });

  it('low end: one check (the basket’s envelope) at its limit, all pass just above', () => {
    if (!window.low) throw new Error('no low end');
    expectEnd(project, window.low, 1);
  });

  it('high end: one check (the basket’s envelope) at its limit, all pass just below', () => {
    if (!window.high) throw new Error('no high end');
    expectEnd(project, window.high, -1);
  });

  it('the plot’s curve crosses its limits at the window’s ends', () => {
    const current = solveProject(project).cases[0].horizontalTension;
    const curve = windowCurve(project, window, current, 40, refinement);
    const low = window.low?.horizontalTension ?? 0;
    const high = window.high?.horizontalTension ?? 0;
    curve.tension.forEach((H, i) => {
      // Tension 1e-3 inside the ends: the picture agrees with the ends on which side passes.
      if (H < low * 0.999) expect(curve.clearanceMargin[i]).toBeLessThan(0);
      if (H > high * 1.001) expect(curve.utilisation[i]).toBeGreaterThan(1);
      if (H > low * 1.001 && H < high * 0.999) {
        expect(curve.clearanceMargin[i]).toBeGreaterThan(0);
        expect(curve.utilisation[i]).toBeLessThan(1);
      }
    });
  });
});

describe('wire chooser with a moving load', () => {
  it('every wire listed passes every case, the basket included, at its suggested tension', () => {
    const project = courtyardWithBasket();
    const choices = chooseWires(project, ['stainless']);
    expect(choices.length).toBeGreaterThan(0);
    for (const c of choices.slice(0, 3)) {
      const wire = { catalogId: c.catalogId ?? '' };
      const r = solveProject(
        atInstallationTension({ ...project, wire }, c.suggestedHorizontalTension),
      );
      expect(r.cases.every((k) => k.ok)).toBe(true);
      expect(r.cases.some((k) => (k.movingLoads ?? []).length > 0)).toBe(true);
    }
  }, 120_000);
});

describe('window over a pulley (terrace corner): the largest span’s horizontal tension', () => {
  const project = loadExample('examples/terrace-corner-pulley.json');
  const design = solveProject(project);
  const window = tensionWindow(project, design.mesh.refinement);

  it('the spans differ at installation, so the quantity must be stated', () => {
    const spans = design.cases[0].spans.map((s) => s.horizontalTension);
    expect(Math.min(...spans)).toBeLessThan(0.9 * Math.max(...spans));
    expect(design.cases[0].horizontalTension).toBeCloseTo(Math.max(...spans), 9);
  });

  it('each plot sample, pulled as a horizontalTension target, gives back its checks', () => {
    const curve = windowCurve(
      project,
      window,
      design.cases[0].horizontalTension,
      8,
      design.mesh.refinement,
    );
    expect(curve.tension.length).toBe(8);
    curve.tension.forEach((H, i) => {
      const r = solveProject(atInstallationTension(project, H));
      const checks = checksOf(project, r.cases);
      const utilisation = Math.max(
        ...checks.filter((c) => c.check === 'tension').map((c) => c.value),
      );
      const margin = Math.min(
        ...checks.filter((c) => c.check !== 'tension').map((c) => c.value - c.limit),
      );
      expect(r.cases[0].horizontalTension).toBeCloseTo(H, 6);
      expect(Math.abs(utilisation / curve.utilisation[i] - 1)).toBeLessThan(1e-6);
      expect(Math.abs(margin - curve.clearanceMargin[i])).toBeLessThan(1e-6);
    });
  });

  it('names the spans whose tension it states: those with the largest, at installation', () => {
    const spans = design.cases[0].spans.map((s) => s.horizontalTension);
    const named = windowTensionSpans(spans) ?? [];
    expect(named.length).toBeGreaterThan(0);
    for (const j of named) expect(spans[j]).toBeCloseTo(design.cases[0].horizontalTension, 6);
    for (const j of spans.keys())
      if (!named.includes(j)) expect(spans[j]).toBeLessThan(design.cases[0].horizontalTension);
    const words = windowTensionWords(project, spans);
    for (const j of named)
      expect(words).toContain(`${project.supports[j].label} – ${project.supports[j + 1].label}`);
    expect(words).not.toContain(`${project.supports[0].label} – ${project.supports[1].label}`);
    expect(window.advice.join(' ')).toContain(words);
    // Without a pulley every span has the same: no span is singled out.
    const plain = loadExample('examples/workshop-yard-inclined.json');
    const plainSpans = solveProject(plain).cases[0].spans.map((s) => s.horizontalTension);
    expect(windowTensionSpans(plainSpans)).toBeNull();
  });

  it('the high end, pulled as a target, puts the tension check at its limit', () => {
    if (!window.high) throw new Error('no high end');
    const r = solveProject(atInstallationTension(project, window.high.horizontalTension));
    const worst = Math.max(...r.cases.map((c) => c.utilisation));
    expect(Math.abs(worst - 1)).toBeLessThan(1e-6);
  });
});
