/**
 * Installation target → the horizontal tension H₁ of the first span at installation (the other
 * spans follow through the installation joints). horizontalTension: the largest span H, so H₁
 * itself when no pulley makes the spans differ. maxTension, sag and the rest: root of the target
 * quantity in ln H₁ (Brent, bracket grown by factors of 2). unstressedLength: length
 * compatibility of all spans as one. With target.case the quantity is measured in that case.
 */

import { solveSectionForLength } from './lengthCompatibility.ts';
import { loadStateOfCase } from './loads.ts';
import type { InstallationTarget } from './project.ts';
import type { ProjectModel } from './projectModel.ts';
import { prepareState } from './projectModel.ts';
import { solveNearlyLinear } from './rootFind.ts';
import { largestTension, minimumAboveLine } from './spanGeometry.ts';
import { type StateSolution, solveChangeOfState, solveInstallation } from './states.ts';

export interface InstallationTension {
  tensionN: number;
  evaluations: number;
  ok: boolean;
  message?: string;
}

/** The span a sag target refers to: target.span, else the longest span. */
export function targetSpanIndex(model: ProjectModel, target: InstallationTarget): number {
  if (target.span !== undefined) return target.span;
  let best = 0;
  model.spans.forEach((s, j) => {
    if (s.x1 - s.x0 > model.spans[best].x1 - model.spans[best].x0) best = j;
  });
  return best;
}

function measure(model: ProjectModel, target: InstallationTarget, state: StateSolution): number {
  if (target.maxTension !== undefined) {
    return Math.max(...state.spans.map((s) => largestTension(s.span, s.tensionN)));
  }
  if (target.sag !== undefined) {
    const { span, tensionN } = state.spans[targetSpanIndex(model, target)];
    return -minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, span.z0, span.chordSlope)
      .value;
  }
  return Math.max(...state.spans.map((s) => s.tensionN));
}

/** The state in which the target is measured, for installation tension H. */
function stateFor(
  model: ProjectModel,
  target: InstallationTarget,
  tensionN: number,
): StateSolution {
  const installed = solveInstallation(model, tensionN);
  if (target.case === undefined) return installed;
  const weather = model.project.cases.find((c) => c.name === target.case);
  if (!weather)
    return {
      ...installed,
      solved: false,
      messages: [`installation.target.case: no case named "${target.case}".`],
    };
  return solveChangeOfState(
    model,
    { ...loadStateOfCase(weather), name: weather.name },
    installed.unstressed,
    installed.spans.map((s) => s.tensionN),
  );
}

/** Parabola estimate of H for the installation state: H ≈ w l² / (8 f), or the target tension. */
function initialGuess(model: ProjectModel, target: InstallationTarget, value: number): number {
  if (target.sag === undefined) return value;
  const span = model.spans[targetSpanIndex(model, target)];
  const l = span.x1 - span.x0;
  const wire = prepareState(model, model.installation);
  const hung = span.hungVertical.reduce((a, q, e) => a + q * span.elementLength[e], 0) / l;
  const points = span.pointForces.reduce((a, p) => a + p, 0) / l;
  return ((wire.weightNPerM + hung + 2 * points) * l * l) / (8 * value);
}

/** Why a slack target may be out of reach over a pulley, appended to the refusal. */
const PULLEY_HINT =
  ' (over a pulley the wire on each side carries the same tension, so a span must be pulled at least hard enough to hold up the weight of the span beyond the pulley)';

export function findInstallationTension(
  model: ProjectModel,
  target: InstallationTarget,
): InstallationTension {
  if (target.unstressedLength !== undefined) {
    const wire = prepareState(model, model.installation);
    const guess = model.wire.massPerLength * model.env.gravity * 100;
    const r = solveSectionForLength(
      model.spans,
      wire,
      target.unstressedLength,
      guess,
      model.installationJoints,
    );
    return { tensionN: r.tensionN, evaluations: r.iterations, ok: r.converged, message: r.reason };
  }
  const value = target.horizontalTension ?? target.maxTension ?? target.sag ?? Number.NaN;
  const equalH = model.installationJoints.every((joint) => joint === 'horizontal');
  if (target.horizontalTension !== undefined && target.case === undefined && equalH) {
    return { tensionN: value, evaluations: 0, ok: true };
  }
  // In logarithms the quantity is nearly linear with slope ±1 (sag ∝ 1/H, tension ∝ H).
  const sign = target.sag === undefined ? 1 : -1;
  const f = (lnH: number) => {
    const state = stateFor(model, target, Math.exp(lnH));
    if (!state.solved) return Number.NaN;
    const q = measure(model, target, state);
    return q > 0 && Number.isFinite(q) ? sign * (Math.log(q) - Math.log(value)) : Number.NaN;
  };
  // A parabola estimate can be too slack for a deep catenary: tighten until the state solves.
  let start = Math.log(initialGuess(model, target, value));
  for (let k = 0; k < 8 && !Number.isFinite(f(start)); k++) start += Math.LN2;
  const root = solveNearlyLinear(f, start, 1);
  if (root.converged)
    return { tensionN: Math.exp(root.x), evaluations: root.evaluations, ok: true };
  const what =
    target.maxTension !== undefined
      ? 'largest tension'
      : target.sag !== undefined
        ? 'sag'
        : 'horizontal tension';
  const unit = target.sag !== undefined ? 'm' : 'N';
  return {
    tensionN: Math.exp(start),
    evaluations: root.evaluations,
    ok: false,
    message: `the ${what} target ${value} ${unit} cannot be reached with this wire and load${target.case ? ` in "${target.case}"` : ''}${equalH ? '' : PULLEY_HINT}`,
  };
}
