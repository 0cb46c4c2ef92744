/**
 * The tension window in words: which case and check set each end, and when the window is shut,
 * what would open it, with numbers. Raising every fixing by d raises the whole wire by d (the
 * shape below the chords does not change), so d = −m(H_high), m the worst clearance margin at the
 * highest tension allowed. A wire of the same weight and stretch opens it with a breaking load of
 * u(H_low) × B. Lighter hung loads (all scaled by k): the root in k of m(H_high(k)) = 0.
 */
import type { Load, Project } from '../project.ts';
import { buildProjectModel, type ProjectModel } from '../projectModel.ts';
import { brent } from '../rootFind.ts';
import { solveInstallation } from '../states.ts';
import { findWindowEnds, type WindowEnds } from './windowEnds.ts';
import { CLEARANCE_CHECK, type WindowResponse } from './windowResponse.ts';

const newtons = (n: number) => (n >= 10_000 ? `${(n / 1000).toFixed(1)} kN` : `${n.toFixed(0)} N`);
const metres = (m: number) => `${m.toFixed(2)} m`;

/** "4.50 m over Road", "2.40 m over the ground", "the tension limit": a check in words. */
export function checkWords(project: Project, check: string): string {
  if (check === CLEARANCE_CHECK) return `${metres(project.limits.minClearance)} over the ground`;
  if (check === 'tension') return 'the tension limit';
  const zone = (project.limits.zones ?? []).find((z, i) => (z.label ?? `Zone ${i + 1}`) === check);
  return zone ? `${metres(zone.height)} over ${check}` : check;
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

/** Worst clearance margin at the highest allowed tension for hung loads scaled by k (m). */
function marginWithLoadsScaled(project: Project, k: number, refinement: number): number {
  const ends = findWindowEnds(buildProjectModel(scaleHungLoads(project, k), refinement), {
    tolerance: 1e-9,
    stopWhenEmpty: true,
  });
  if (!ends.atHigh) return -1e3;
  return ends.atHigh.clearanceMargin;
}

function lighterLoadsAdvice(model: ProjectModel, refinement: number): string | null {
  const project = model.project;
  const mass = hungMass(project, model.env.gravity);
  if (!(mass > 0)) return null;
  const bare = marginWithLoadsScaled(project, 0, refinement);
  if (bare < 0)
    return 'Lighter hung loads alone do not open it: even with nothing hung on the wire some case fails.';
  const root = brent((k) => marginWithLoadsScaled(project, k, refinement), 0, 1, 1e-4, 40, {
    fa: bare,
    fb: marginWithLoadsScaled(project, 1, refinement),
  });
  if (!root.converged) return null;
  const k = Math.floor(root.x * 1000) / 1000;
  return (
    `Lighter hung loads would open it: at most ${(k * mass).toFixed(1)} kg hung in all instead of ` +
    `${mass.toFixed(1)} kg (every hung load ${(100 * (1 - k)).toFixed(0)} % lighter).`
  );
}

function raiseFixingsAdvice(project: Project, atHigh: WindowResponse, highN: number): string {
  const d = -atHigh.clearanceMargin;
  return (
    `Raising every fixing by at least ${metres(Math.ceil(d * 100) / 100)} would open it: at the highest ` +
    `tension the limit allows (${newtons(highN)}), "${atHigh.clearanceCase}" misses ` +
    `${checkWords(project, atHigh.clearanceCheck)} by ${metres(d)}.`
  );
}

function strongerWireAdvice(model: ProjectModel, atLow: WindowResponse): string {
  const needed = atLow.utilisation * model.wire.breakingLoad;
  return (
    `A wire of the same weight and stretch with a breaking load of at least ${newtons(Math.ceil(needed))} ` +
    `(this one: ${newtons(model.wire.breakingLoad)}) would open it at the lowest tension that clears.`
  );
}

function shutAdvice(model: ProjectModel, ends: WindowEnds, refinement: number): string[] {
  const p = model.project;
  const advice: string[] = [];
  if (ends.reason === 'tension' && ends.atFloor) {
    advice.push(
      `No installation tension works: even pulled as slack as a sag of a quarter of the span, ` +
        `"${ends.atFloor.tensionCase}" loads the wire to ${(100 * ends.atFloor.utilisation).toFixed(0)} % of its working limit.`,
    );
    advice.push(
      `A wire of the same weight and stretch would need a breaking load of at least ${newtons(Math.ceil(ends.atFloor.utilisation * model.wire.breakingLoad))}.`,
    );
  } else if (ends.low && ends.high) {
    advice.push(
      `No installation tension works: clearing ${checkWords(p, ends.low.check)} in "${ends.low.case}" needs at least ` +
        `${newtons(ends.low.horizontalTension)}, but the tension limit in "${ends.high.case}" allows at most ${newtons(ends.high.horizontalTension)}.`,
    );
  } else if (ends.high) {
    advice.push(
      `No installation tension works: even at twice the wire's breaking load some case does not clear; a stronger wire alone cannot help.`,
    );
  }
  if (ends.high && ends.atHigh)
    advice.push(raiseFixingsAdvice(p, ends.atHigh, ends.high.horizontalTension));
  if (ends.reason === 'overlap' && ends.atLow) advice.push(strongerWireAdvice(model, ends.atLow));
  const lighter = lighterLoadsAdvice(model, refinement);
  if (lighter) advice.push(lighter);
  return advice;
}

/** Advice for a window: where its ends come from, or what would open it. */
export function windowAdvice(model: ProjectModel, ends: WindowEnds, refinement = 1): string[] {
  if (ends.empty) return shutAdvice(model, ends, refinement);
  const p = model.project;
  const advice: string[] = [];
  const loads =
    p.installation.withLoads && p.loads.length > 0 ? 'with the hung loads on' : 'bare wire';
  const from = ends.low ? newtons(ends.low.horizontalTension) : 'any tension';
  const to = ends.high ? newtons(ends.high.horizontalTension) : '';
  advice.push(
    `Every case passes for an installation horizontal tension from ${from} to ${to} at ${p.installation.temperature} °C (${loads}).`,
  );
  if (model.installationJoints.some((joint) => joint === 'tension')) {
    const spans = solveInstallation(model, ends.floorN).spans.map((s) => s.tensionN);
    advice.push(`The tensions are the horizontal tension ${windowTensionWords(p, spans)}.`);
  }
  if (p.loads.some((l) => l.type === 'moving'))
    advice.push(
      'Moving loads are in the window: each case that carries the hung loads is checked with every moving load at its worst position along its path.',
    );
  if (ends.low)
    advice.push(
      `The low end is where "${ends.low.case}" just clears ${checkWords(p, ends.low.check)}.`,
    );
  else
    advice.push('No clearance check limits the slack side down to a sag of a quarter of the span.');
  if (ends.high)
    advice.push(
      `The high end is where "${ends.high.case}" reaches the tension limit (breaking load / ${p.limits.safetyFactor}).`,
    );
  return advice;
}
