/**
 * Tension window: the range of installation horizontal tension H₀ (N, at the installation
 * temperature and loads) for which every case passes every check. The worst utilisation u(H₀)
 * and the worst clearance margin m(H₀) both rise with H₀, so the high end is the root of
 * ln u = 0 and the low end the root of m = 0, each found in ln H₀ by a bracketing root find.
 * Each root is first found for the case that governs at the start only (two states per step
 * instead of all), then checked with every case; a case that governs there joins and the root
 * is found again from that point, until the governing case is among those solved. With moving
 * loads the focused solves park each load at its last worst positions; the full check at the
 * root takes the whole envelope, and when it finds a worse position the root is found again
 * with the load parked there, until the full check is at the limit too.
 */
import { type ProjectModel, prepareState } from '../projectModel.ts';
import { largestInstallationTension } from '../states.ts';
import { type RangeRoot, rootInRange } from './rangeRoot.ts';
import {
  type CaseSubset,
  createWindowResponse,
  TENSION_CHECK,
  type WindowResponse,
} from './windowResponse.ts';

export interface WindowEnd {
  horizontalTension: number;
  case: string;
  /** "tension", "clearance" or a zone's label. */
  check: string;
  /** When a moving load sets this end: the load and its position then (m along the line). */
  movingLoad?: { label: string; at: number };
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
  response: (tensionN: number, only?: CaseSubset) => WindowResponse;
  evaluations: number;
  /** What this search learned, to start a similar one (the next wire of the chooser). */
  carry: SearchCarry;
}

/**
 * What one window search hands to a similar one (another wire on the same project): where its
 * ends were, the cases that governed each and the slope of each check there. Only a start: the
 * search with every case at each root decides the ends.
 */
export interface SearchCarry {
  /** The low end (N): the slack limit depends mostly on the hung loads, not on the wire. */
  lowN?: number;
  /** The high end over the tension the wire is allowed (breaking load / safety factor). */
  highFraction?: number;
  tension?: { focus: number[]; slope: number };
  clearance?: { focus: number[]; slope: number };
}

export interface WindowOptions {
  /** Absolute tolerance on ln H₀ (relative on H₀). */
  tolerance?: number;
  /** Stop as soon as the window is known to be empty (the chooser needs no more). */
  stopWhenEmpty?: boolean;
  /**
   * A similar search's carry (SearchCarry). Without it the high end is first looked for at half
   * the tension the wire is allowed, the low end from the high end down.
   */
  carry?: SearchCarry;
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

type Kind = 'tension' | 'clearance';

/** How close to its limit the full check must be at a root found with parked moving loads. */
const MOVING_SETTLED = 1e-9;

interface WorstRoot {
  status: RangeRoot['status'];
  x: number;
  /** Every case evaluated at x (null when a state could not be solved). */
  full: WindowResponse | null;
  /**
   * The case that governed at the root (or the cases solved) and the slope of the check there,
   * in its own units per ln H₀ (see SearchCarry).
   */
  focus: number[];
  slope: number;
}

/**
 * Root in ln H₀ of the worst check of one kind over every case: found for the governing cases
 * only, then checked with all of them (see the file header). Given the cases that governed a
 * similar search (`carried`), the search starts with those alone: the check with every case at
 * the root still decides, so a wrong guess costs a round, never a wrong end.
 */
function worstRoot(
  ends: WindowEnds,
  kind: Kind,
  x0: number,
  range: [number, number],
  tolerance: number,
  count: { evaluations: number },
  moving: boolean,
  carried?: { focus: number[]; slope: number },
): WorstRoot {
  const at = (x: number, only?: CaseSubset) => {
    count.evaluations++;
    return ends.response(Math.exp(x), only);
  };
  const focus = new Set<number>(moving ? [] : (carried?.focus ?? []));
  const first = at(x0, focus.size > 0 ? focus : undefined);
  const failed = (x: number): WorstRoot => ({
    status: 'failed',
    x,
    full: null,
    focus: [...focus],
    slope: 1,
  });
  if (!first.solved) return failed(x0);
  const scale = Math.max(first.clearanceSagM, 1e-3);
  const value = (r: WindowResponse) =>
    kind === 'tension' ? Math.log(r.utilisation) : r.clearanceMargin / scale;
  const governing = (r: WindowResponse) => (kind === 'tension' ? r.tensionIndex : r.clearanceIndex);
  // The value at x for the focused cases, when known: the worst over the focused cases equals
  // the worst over all once the governing case is among them (not so with moving loads, whose
  // focused solves park the load).
  let known: number | undefined = moving ? undefined : value(first);
  let full: WindowResponse = first;
  // Slopes are carried in the check's own units (ln u, or metres of margin, per ln H₀): each
  // search scales the clearance by its own sag.
  const unit = kind === 'tension' ? 1 : scale;
  let slope = carried ? carried.slope / unit : undefined;
  let x = x0;
  for (let round = 0; round < 60; round++) {
    const g = governing(full);
    if (g >= 0) focus.add(g);
    const f = (t: number) => {
      const r = at(t, focus);
      return r.solved ? value(r) : Number.NaN;
    };
    const root = rootInRange(f, x, range[0], range[1], tolerance, { value: known, slope });
    slope = root.slope;
    if (root.status === 'failed') return failed(root.x);
    // With moving loads the full check (whole envelopes) must agree with the focused one at the
    // root; they differ only when a load's worst position has moved.
    const focused = moving && root.status === 'root' ? f(root.x) : Number.NaN;
    full = at(root.x);
    if (!full.solved) return failed(root.x);
    const now = governing(full);
    const settled = !moving || !(Math.abs(value(full) - focused) > MOVING_SETTLED);
    // A root the search returned unevaluated (rangeRoot.ts) must hold here: |f| within the
    // tolerance's worth of slope, else the search goes on from here.
    const holds =
      moving || root.status !== 'root' || Math.abs(value(full)) <= tolerance * root.slope;
    if ((now < 0 || focus.has(now)) && settled && holds)
      return {
        status: root.status,
        x: root.x,
        full,
        focus: now >= 0 ? [now] : [...focus],
        slope: slope * unit,
      };
    x = root.x;
    known = moving ? undefined : value(full);
  }
  return failed(x);
}

/** The window's two ends for a built model. */
export function findWindowEnds(model: ProjectModel, options: WindowOptions = {}): WindowEnds {
  const tolerance = options.tolerance ?? 1e-12;
  const floorN = floorTension(model);
  const ceilingN = Math.max(2 * model.wire.breakingLoad, 4 * floorN);
  const range: [number, number] = [Math.log(floorN), Math.log(ceilingN)];
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
    response: createWindowResponse(model),
    evaluations: 0,
    carry: {},
  };
  const carry = options.carry ?? {};
  const count = { evaluations: 0 };
  const moving = model.project.loads.some((l) => l.type === 'moving');
  const allowedN = model.wire.breakingLoad / model.project.limits.safetyFactor;
  const fraction = carry.highFraction;
  const guess =
    allowedN * (fraction !== undefined && fraction > 0 && fraction < 10 ? fraction : 0.5);
  const start = Math.min(range[1], Math.max(range[0], Math.log(guess)));
  const high = worstRoot(ends, 'tension', start, range, tolerance, count, moving, carry.tension);
  ends.carry.tension = { focus: high.focus, slope: high.slope };
  if (high.status === 'root' && high.full) {
    ends.carry.highFraction = Math.exp(high.x) / allowedN;
    ends.atHigh = high.full;
    ends.high = {
      horizontalTension: largestInstallationTension(model, Math.exp(high.x)),
      case: high.full.tensionCase,
      check: TENSION_CHECK,
      ...(high.full.tensionMoving ? { movingLoad: high.full.tensionMoving } : {}),
    };
    if (high.full.clearanceMargin < 0) {
      ends.empty = true;
      ends.reason = 'overlap';
    }
  } else {
    ends.atFloor = high.status === 'positive' ? high.full : null;
    ends.empty = true;
    ends.reason = 'tension';
  }
  if (!(ends.empty && options.stopWhenEmpty)) {
    let from = high.status === 'root' ? high.x : range[0];
    if (carry.lowN !== undefined && carry.lowN > 0) from = Math.min(from, Math.log(carry.lowN));
    const low = worstRoot(
      ends,
      'clearance',
      from,
      range,
      tolerance,
      count,
      moving,
      carry.clearance,
    );
    ends.carry.clearance = { focus: low.focus, slope: low.slope };
    if (low.status === 'root' && low.full) {
      ends.carry.lowN = Math.exp(low.x);
      ends.atLow = low.full;
      ends.low = {
        horizontalTension: largestInstallationTension(model, Math.exp(low.x)),
        case: low.full.clearanceCase,
        check: low.full.clearanceCheck,
        ...(low.full.clearanceMoving ? { movingLoad: low.full.clearanceMoving } : {}),
      };
    } else if (low.status === 'negative' || low.status === 'failed') {
      // Not even the tightest wire searched clears: no tension opens the window.
      ends.empty = true;
      if (ends.reason !== 'tension') ends.reason = 'clearance';
    }
  }
  ends.evaluations = count.evaluations;
  return ends;
}
