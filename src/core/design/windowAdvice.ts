/**
 * The tension window in words: which case and check set each end, and when the window is shut,
 * what would open it, with numbers. Raising every fixing by d raises the whole wire by d (the
 * shape below the chords does not change), so d = −m(H_high), m the worst clearance margin at the
 * highest tension allowed. A wire of the same weight and stretch opens it with a breaking load of
 * u(H_low) × B. Lighter hung loads (all scaled by k): the root in k of m(H_high(k)) = 0.
 * The numbers are found once (windowAdviceFacts) and worded in any units (adviceWords): the CLI
 * and the contract's `advice` in SI, the workbench in the chosen display units.
 */
import { ADVICE_SI, type Wording } from '../checkMessages.ts';
import type { Load, Project } from '../project.ts';
import { buildProjectModel, type ProjectModel } from '../projectModel.ts';
import { brent } from '../rootFind.ts';
import { solveInstallation } from '../states.ts';
import { findWindowEnds, type SearchCarry, type WindowEnds } from './windowEnds.ts';
import { CLEARANCE_CHECK, type WindowResponse } from './windowResponse.ts';

/** "4.50 m over Road", "2.40 m over the ground", "the tension limit": a check in words. */
export function checkWords(project: Project, check: string, w: Wording = ADVICE_SI): string {
  if (check === CLEARANCE_CHECK) return `${w.length(project.limits.minClearance)} over the ground`;
  if (check === 'tension') return 'the tension limit';
  const zone = (project.limits.zones ?? []).find((z, i) => (z.label ?? `Zone ${i + 1}`) === check);
  return zone ? `${w.length(zone.height)} over ${check}` : check;
}

/**
 * The spans whose horizontal tension the window states (indices): the largest at installation.
 * Null when every span has the same (no pulley at installation): then it is every span's.
 */
export function windowTensionSpans(spanTensionsN: readonly number[]): number[] | null {
  const largest = Math.max(...spanTensionsN);
  const spans = spanTensionsN.flatMap((H, j) => (H >= largest * (1 - 1e-9) ? [j] : []));
  return spans.length === spanTensionsN.length ? null : spans;
}

/** "the same in every span", "of the span X – Y, the largest: …", or "" for a single span. */
export function windowTensionWords(project: Project, spanTensionsN: readonly number[]): string {
  const spans = windowTensionSpans(spanTensionsN);
  if (!spans) return spanTensionsN.length > 1 ? 'the same in every span' : '';
  const name = (j: number) => {
    const label = (i: number) => project.supports[i]?.label?.trim() || `Fixing ${i + 1}`;
    return `${label(j)} – ${label(j + 1)}`;
  };
  return (
    `of ${spans.length === 1 ? 'the span' : 'the spans'} ${spans.map(name).join(' and ')}, the largest: ` +
    'over a pulley the spans’ horizontal tensions differ, and a horizontalTension target means the largest'
  );
}

/** Every hung load scaled by k (point masses and forces, uniform masses per metre). */
export function scaleHungLoads(project: Project, k: number): Project {
  const loads = project.loads.map((load): Load => {
    if (load.type === 'uniform') return { ...load, massPerLength: load.massPerLength * k };
    if (load.type === 'point')
      return load.mass !== undefined
        ? { ...load, mass: load.mass * k }
        : { ...load, force: (load.force ?? 0) * k };
    return load;
  });
  return { ...project, loads };
}

/** Total hung mass, kg (a force counts as force / g). */
export function hungMass(project: Project, gravity: number): number {
  let total = 0;
  for (const load of project.loads) {
    if (load.type === 'uniform') total += load.massPerLength * (load.to - load.from);
    else if (load.type === 'point') total += load.mass ?? (load.force ?? 0) / gravity;
  }
  return total;
}

/**
 * Worst clearance margin at the highest allowed tension for hung loads scaled by k (m). `carry`
 * (updated) starts each search where the last one, with other loads, ended.
 */
function marginWithLoadsScaled(
  project: Project,
  k: number,
  refinement: number,
  carry: SearchCarry,
): number {
  const ends = findWindowEnds(buildProjectModel(scaleHungLoads(project, k), refinement), {
    tolerance: 1e-9,
    stopWhenEmpty: true,
    carry,
  });
  Object.assign(carry, ends.carry);
  if (!ends.atHigh) return -1e3;
  return ends.atHigh.clearanceMargin;
}

/** One piece of advice as numbers, worded by adviceWords. */
export type AdviceFact =
  | { kind: 'range'; fromN: number | null; toN: number | null; temperature: number; loads: string }
  | { kind: 'lowEnd'; case: string; check: string }
  | { kind: 'noLowEnd' }
  | { kind: 'tensionSpans'; words: string }
  | { kind: 'movingLoadsIncluded' }
  | { kind: 'highEnd'; case: string; safetyFactor: number }
  | { kind: 'tooStrongAtFloor'; case: string; utilisation: number }
  | { kind: 'needsBreaking'; neededN: number }
  | {
      kind: 'overlap';
      lowCheck: string;
      lowCase: string;
      lowN: number;
      highCase: string;
      highN: number;
    }
  | { kind: 'neverClears' }
  | {
      kind: 'raiseFixings';
      raiseM: number;
      shortM: number;
      highN: number;
      case: string;
      check: string;
    }
  | { kind: 'strongerWire'; neededN: number; breakingN: number }
  | { kind: 'lighterLoadsCannot' }
  | { kind: 'lighterLoads'; mostKg: number; nowKg: number; lighterPercent: number };

function lighterLoadsFact(model: ProjectModel, refinement: number): AdviceFact | null {
  const project = model.project;
  const mass = hungMass(project, model.env.gravity);
  if (!(mass > 0)) return null;
  const carry: SearchCarry = {};
  const margin = (k: number) => marginWithLoadsScaled(project, k, refinement, carry);
  const bare = margin(0);
  if (bare < 0) return { kind: 'lighterLoadsCannot' };
  const root = brent(margin, 0, 1, 1e-4, 40, { fa: bare, fb: margin(1) });
  if (!root.converged) return null;
  const k = Math.floor(root.x * 1000) / 1000;
  return { kind: 'lighterLoads', mostKg: k * mass, nowKg: mass, lighterPercent: 100 * (1 - k) };
}

function raiseFixingsFact(atHigh: WindowResponse, highN: number): AdviceFact {
  const d = -atHigh.clearanceMargin;
  return {
    kind: 'raiseFixings',
    raiseM: Math.ceil(d * 100) / 100,
    shortM: d,
    highN,
    case: atHigh.clearanceCase,
    check: atHigh.clearanceCheck,
  };
}

function shutFacts(model: ProjectModel, ends: WindowEnds, refinement: number): AdviceFact[] {
  const facts: AdviceFact[] = [];
  if (ends.reason === 'tension' && ends.atFloor) {
    facts.push({
      kind: 'tooStrongAtFloor',
      case: ends.atFloor.tensionCase,
      utilisation: ends.atFloor.utilisation,
    });
    facts.push({
      kind: 'needsBreaking',
      neededN: Math.ceil(ends.atFloor.utilisation * model.wire.breakingLoad),
    });
  } else if (ends.low && ends.high) {
    facts.push({
      kind: 'overlap',
      lowCheck: ends.low.check,
      lowCase: ends.low.case,
      lowN: ends.low.horizontalTension,
      highCase: ends.high.case,
      highN: ends.high.horizontalTension,
    });
  } else if (ends.high) {
    facts.push({ kind: 'neverClears' });
  }
  if (ends.high && ends.atHigh)
    facts.push(raiseFixingsFact(ends.atHigh, ends.high.horizontalTension));
  if (ends.reason === 'overlap' && ends.atLow)
    facts.push({
      kind: 'strongerWire',
      neededN: Math.ceil(ends.atLow.utilisation * model.wire.breakingLoad),
      breakingN: model.wire.breakingLoad,
    });
  const lighter = lighterLoadsFact(model, refinement);
  if (lighter) facts.push(lighter);
  return facts;
}

/** The advice for a window as numbers: where its ends come from, or what would open it. */
export function windowAdviceFacts(
  model: ProjectModel,
  ends: WindowEnds,
  refinement = 1,
): AdviceFact[] {
  if (ends.empty) return shutFacts(model, ends, refinement);
  const p = model.project;
  const facts: AdviceFact[] = [
    {
      kind: 'range',
      fromN: ends.low?.horizontalTension ?? null,
      toN: ends.high?.horizontalTension ?? null,
      temperature: p.installation.temperature,
      loads:
        p.installation.withLoads && p.loads.length > 0 ? 'with the hung loads on' : 'bare wire',
    },
  ];
  if (model.installationJoints.some((joint) => joint === 'tension')) {
    const spans = solveInstallation(model, ends.floorN).spans.map((s) => s.tensionN);
    facts.push({ kind: 'tensionSpans', words: windowTensionWords(p, spans) });
  }
  if (p.loads.some((l) => l.type === 'moving')) facts.push({ kind: 'movingLoadsIncluded' });
  facts.push(
    ends.low
      ? { kind: 'lowEnd', case: ends.low.case, check: ends.low.check }
      : { kind: 'noLowEnd' },
  );
  if (ends.high)
    facts.push({ kind: 'highEnd', case: ends.high.case, safetyFactor: p.limits.safetyFactor });
  return facts;
}

function factWords(project: Project, f: AdviceFact, w: Wording): string {
  switch (f.kind) {
    case 'range':
      return `Every case passes for an installation horizontal tension from ${f.fromN === null ? 'any tension' : w.force(f.fromN)} to ${f.toN === null ? '' : w.force(f.toN)} at ${w.temperature(f.temperature)} (${f.loads}).`;
    case 'lowEnd':
      return `The low end is where "${f.case}" just clears ${checkWords(project, f.check, w)}.`;
    case 'noLowEnd':
      return 'No clearance check limits the slack side down to a sag of a quarter of the span.';
    case 'tensionSpans':
      return `The tensions are the horizontal tension ${f.words}.`;
    case 'movingLoadsIncluded':
      return 'Moving loads are in the window: each case that carries the hung loads is checked with every moving load at its worst position along its path.';
    case 'highEnd':
      return `The high end is where "${f.case}" reaches the tension limit (breaking load / ${f.safetyFactor}).`;
    case 'tooStrongAtFloor':
      return `No installation tension works: even pulled as slack as a sag of a quarter of the span, "${f.case}" loads the wire to ${(100 * f.utilisation).toFixed(0)} % of its working limit.`;
    case 'needsBreaking':
      return `A wire of the same weight and stretch would need a breaking load of at least ${w.force(f.neededN)}.`;
    case 'overlap':
      return `No installation tension works: clearing ${checkWords(project, f.lowCheck, w)} in "${f.lowCase}" needs at least ${w.force(f.lowN)}, but the tension limit in "${f.highCase}" allows at most ${w.force(f.highN)}.`;
    case 'neverClears':
      return "No installation tension works: even at twice the wire's breaking load some case does not clear; a stronger wire alone cannot help.";
    case 'raiseFixings':
      return `Raising every fixing by at least ${w.length(f.raiseM)} would open it: at the highest tension the limit allows (${w.force(f.highN)}), "${f.case}" misses ${checkWords(project, f.check, w)} by ${w.length(f.shortM)}.`;
    case 'strongerWire':
      return `A wire of the same weight and stretch with a breaking load of at least ${w.force(f.neededN)} (this one: ${w.force(f.breakingN)}) would open it at the lowest tension that clears.`;
    case 'lighterLoadsCannot':
      return 'Lighter hung loads alone do not open it: even with nothing hung on the wire some case fails.';
    case 'lighterLoads':
      return `Lighter hung loads would open it: at most ${w.mass(f.mostKg)} hung in all instead of ${w.mass(f.nowKg)} (every hung load ${f.lighterPercent.toFixed(0)} % lighter).`;
  }
}

/** The advice in words, in the units of `w` (default: the contract's SI wording). */
export function adviceWords(
  project: Project,
  facts: readonly AdviceFact[],
  w: Wording = ADVICE_SI,
): string[] {
  return facts.map((f) => factWords(project, f, w));
}

/** Advice for a window: where its ends come from, or what would open it (SI words). */
export function windowAdvice(model: ProjectModel, ends: WindowEnds, refinement = 1): string[] {
  return adviceWords(model.project, windowAdviceFacts(model, ends, refinement));
}
