/**
 * Tension window: the range of installation horizontal tension H₀ (N, at the installation
 * temperature and loads) for which every case passes every check. The worst utilisation u(H₀)
 * and the worst clearance margin m(H₀) both rise with H₀, so the high end is the root of
 * ln u = 0 and the low end the root of m = 0, each found in ln H₀ by a bracketing root find.
 */
import { type ProjectModel, prepareState } from '../projectModel.ts';
import { rootInRange } from './rangeRoot.ts';
import { createWindowResponse, TENSION_CHECK, type WindowResponse } from './windowResponse.ts';

export interface WindowEnd {
  horizontalTension: number;
  case: string;
  /** "tension", "clearance" or a zone's label. */
  check: string;
}

/** Why a window is empty: nothing within the tension limit, clearance never met, or both ends cross. */
export type ShutReason = 'tension' | 'clearance' | 'overlap' | null;

export interface WindowEnds {
  low: WindowEnd | null;
  high: WindowEnd | null;
  empty: boolean;
  reason: ShutReason;
  /** The search range of H₀ (N): sag about a quarter span … twice the breaking load. */
  floorN: number;
  ceilingN: number;
  /** The responses at the ends found (for advice), and the evaluator itself. */
  atLow: WindowResponse | null;
  atHigh: WindowResponse | null;
  atFloor: WindowResponse | null;
  response: (tensionN: number) => WindowResponse;
  evaluations: number;
}

export interface WindowOptions {
  /** Absolute tolerance on ln H₀ (relative on H₀). */
  tolerance?: number;
  /** Stop as soon as the window is known to be empty (the chooser needs no more). */
  stopWhenEmpty?: boolean;
}

/** Slackest tension searched: the parabola's H for a sag of a quarter of each span, H = q l / 2. */
function floorTension(model: ProjectModel): number {
  const wire = prepareState(model, model.installation);
  let floor = 0;
  for (const span of model.spans) {
    const l = span.x1 - span.x0;
    const hung = span.hungVertical.reduce((a, q, e) => a + q * span.elementLength[e], 0) / l;
    const points = span.pointForces.reduce((a, p) => a + p, 0) / l;
    floor = Math.max(floor, ((wire.weightNPerM + hung + 2 * points) * l) / 2);
  }
  return floor;
}

/** The window's two ends for a built model. */
export function findWindowEnds(model: ProjectModel, options: WindowOptions = {}): WindowEnds {
  const tolerance = options.tolerance ?? 1e-12;
  const response = createWindowResponse(model);
  const floorN = floorTension(model);
  const ceilingN = Math.max(2 * model.wire.breakingLoad, 4 * floorN);
  const lo = Math.log(floorN);
  const hi = Math.log(ceilingN);
  let evaluations = 0;
  const at = (x: number) => {
    evaluations++;
    return response(Math.exp(x));
  };
  const tension = (x: number) => {
    const r = at(x);
    return r.solved ? Math.log(r.utilisation) : Number.NaN;
  };
  const start = Math.min(
    hi,
    Math.max(lo, Math.log(model.wire.breakingLoad / model.project.limits.safetyFactor / 2)),
  );
  const high = rootInRange(tension, start, lo, hi, tolerance);
  const ends: WindowEnds = {
    low: null,
    high: null,
    empty: false,
    reason: null,
    floorN,
    ceilingN,
    atLow: null,
    atHigh: null,
    atFloor: null,
    response,
    evaluations: 0,
  };
  if (high.status === 'root') {
    const r = at(high.x);
    ends.atHigh = r;
    ends.high = { horizontalTension: Math.exp(high.x), case: r.tensionCase, check: TENSION_CHECK };
  } else {
    ends.atFloor = at(lo);
    ends.empty = true;
    ends.reason = 'tension';
  }
  if (ends.atHigh && ends.atHigh.clearanceMargin < 0) {
    ends.empty = true;
    ends.reason = 'overlap';
  }
  if (!(ends.empty && options.stopWhenEmpty))
    findLowEnd(ends, at, high.status === 'root' ? high.x : lo, lo, hi, tolerance);
  ends.evaluations = evaluations;
  return ends;
}

function findLowEnd(
  ends: WindowEnds,
  at: (x: number) => WindowResponse,
  start: number,
  lo: number,
  hi: number,
  tolerance: number,
): void {
  const first = at(start);
  const scale = Math.max(first.clearanceSagM, 1e-3);
  const clearance = (x: number) => {
    const r = x === start ? first : at(x);
    return r.solved ? r.clearanceMargin / scale : Number.NaN;
  };
  const low = rootInRange(clearance, start, lo, hi, tolerance);
  if (low.status === 'root') {
    const r = at(low.x);
    ends.atLow = r;
    ends.low = {
      horizontalTension: Math.exp(low.x),
      case: r.clearanceCase,
      check: r.clearanceCheck,
    };
  } else if (low.status === 'negative') {
    // Not even the tightest wire searched clears: no tension opens the window.
    ends.empty = true;
    if (ends.reason !== 'tension') ends.reason = 'clearance';
  }
}
