/**
 * The checks of every case as functions of the installation horizontal tension H₀ (N): the
 * installation at H₀ fixes the cut lengths, each case is a change of state at those lengths.
 * Tension check: utilisation u = T_max · SF / (breaking load · end-fitting efficiency) (passes at
 * u ≤ 1). Clearance checks:
 * margin = clearance − required (m) over the whole span and each zone (passes at ≥ 0).
 * Moving loads: in each state that carries the hung loads, every moving load's envelope over its
 * path (movingLoads.ts) adds the same checks, as solveProject fails a case on it. The full
 * envelope (a scan and a local refinement, about 50 solves) is taken when every case is
 * evaluated; when only some cases are (the root finds of windowEnds.ts), the load is parked at
 * the worst positions of the last full envelope (a few solves), and the root is then checked
 * with the full envelope again.
 */
import { clearanceOver, largestSag, largestStateTension, type SolvedSpan } from '../caseChecks.ts';
import { type SpanLengths, seedLengths, spanLengths } from '../discretisation.ts';
import { resolveEndFittings } from '../endFittings.ts';
import { hungDrops, loadStateOfCase } from '../loads.ts';
import { type MovingContext, movingLoadEnvelope, solveMovingLoadAt } from '../movingLoads.ts';
import type { MovingLoad } from '../project.ts';
import type { NamedState, ProjectModel } from '../projectModel.ts';
import { solveChangeOfState, solveInstallation } from '../states.ts';

/** The contract's name of the whole-span clearance check and of the tension check. */
export const CLEARANCE_CHECK = 'clearance';
export const TENSION_CHECK = 'tension';

export interface CheckValue {
  case: string;
  /** "tension", "clearance" or a zone's label. */
  check: string;
  /** Tension: utilisation (limit 1). Clearance: clearance in m (limit `limit`). */
  value: number;
  limit: number;
  /** A moving-load check: the load's label and its position (m along the line). */
  moving?: { label: string; at: number };
}

export interface WindowResponse {
  solved: boolean;
  /** Largest utilisation over the cases, and the case. */
  utilisation: number;
  tensionCase: string;
  /** Smallest clearance margin over the cases and clearance checks (m), where, and that sag. */
  clearanceMargin: number;
  clearanceCase: string;
  clearanceCheck: string;
  clearanceSagM: number;
  /** The governing cases by index (−1 the installation). */
  tensionIndex: number;
  clearanceIndex: number;
  /** When a moving load governs a check: the load and where it is. */
  tensionMoving?: { label: string; at: number };
  clearanceMoving?: { label: string; at: number };
}

/**
 * Every check of one solved state, in the contract's words, as checkCase computes them:
 * utilisation on the breaking load times the end fittings' efficiency, clearance to the lowest
 * of the wire and the items hung on it (their drops) when the state carries the hung loads.
 */
function stateChecks(
  model: ProjectModel,
  name: string,
  spans: SolvedSpan[],
  withLoads: boolean,
): CheckValue[] {
  const p = model.project;
  const ground = p.ground ?? [];
  const drops = hungDrops(p.loads, withLoads);
  const capacityN = model.wire.breakingLoad * resolveEndFittings(p.limits.endFittings).efficiency;
  const utilisation = (largestStateTension(spans) * p.limits.safetyFactor) / capacityN;
  const checks: CheckValue[] = [
    { case: name, check: TENSION_CHECK, value: utilisation, limit: 1 },
    {
      case: name,
      check: CLEARANCE_CHECK,
      value: clearanceOver(spans, ground, -Infinity, Infinity, drops).value,
      limit: p.limits.minClearance,
    },
  ];
  (p.limits.zones ?? []).forEach((zone, i) => {
    checks.push({
      case: name,
      check: zone.label ?? `Zone ${i + 1}`,
      value: clearanceOver(spans, ground, zone.from, zone.to, drops).value,
      limit: zone.height,
    });
  });
  return checks;
}

/** Worst positions remembered per moving load and state. */
const PARKED_PER_LOAD = 12;

/** Weather cases to solve, by index; the installation (index −1) is always solved. */
export type CaseSubset = ReadonlySet<number> | undefined;

/**
 * The moving-load checks of one solved state: the full envelope of each moving load (and the
 * worst positions it found are remembered in `parked`), or, with `full` false and positions
 * known, the load parked at those positions only.
 */
function movingChecks(
  model: ProjectModel,
  state: NamedState,
  unstressed: readonly number[],
  spans: SolvedSpan[],
  parked: number[][] | undefined,
  full: boolean,
): { checks: CheckValue[]; worst: number[][] } {
  const p = model.project;
  const moving = p.loads.filter((l): l is MovingLoad => l.type === 'moving');
  const efficiency = resolveEndFittings(p.limits.endFittings).efficiency;
  const ctx: MovingContext = {
    project: p,
    unstressed,
    state,
    tensionGuessN: Math.max(...spans.map((s) => s.tensionN)),
    refinement: model.refinement,
    endFittingEfficiency: efficiency,
  };
  const checks: CheckValue[] = [];
  const worst: number[][] = [];
  moving.forEach((load, k) => {
    const label = load.label ?? `Moving load ${k + 1}`;
    if (full || !parked?.[k]) {
      const m = movingLoadEnvelope(ctx, load, k);
      checks.push(
        {
          case: state.name,
          check: TENSION_CHECK,
          value: m.utilisation,
          limit: 1,
          moving: { label, at: m.maxTensionAt },
        },
        {
          case: state.name,
          check: CLEARANCE_CHECK,
          value: m.clearance,
          limit: p.limits.minClearance,
          moving: { label, at: m.clearanceAt },
        },
        ...m.zoneClearances.map((z) => ({
          case: state.name,
          check: z.label,
          value: z.clearance,
          limit: z.required,
          moving: { label, at: z.at },
        })),
      );
      worst.push([
        ...new Set([m.maxTensionAt, m.clearanceAt, ...m.zoneClearances.map((z) => z.at)]),
      ]);
      return;
    }
    for (const x of parked[k]) {
      const at = solveMovingLoadAt(ctx, load, x);
      if (!at.solved) continue;
      for (const c of stateChecks(model, state.name, at.spans, state.withLoads))
        checks.push({ ...c, moving: { label, at: x } });
    }
    worst.push(parked[k]);
  });
  return { checks, worst };
}

/**
 * An evaluator of every check at installation tension H₀ (of the installation and the weather
 * cases in `only`, default all), warm-starting each case from its last solved tension. Calls
 * `visit` with each solved state's index (−1 the installation), name, spans and checks. With
 * every case (`only` undefined) moving loads take their full envelope; with a subset they are
 * parked at the worst positions of the last full envelope.
 */
export function createCheckEvaluator(model: ProjectModel) {
  // Each case's span tensions from its last two solves, with the installation tension of each:
  // the next solve starts from H = H_last (H₀ / H₀,last)^k, k the secant exponent of the two
  // (within [0.2, 1.2] far from them; 1, a constant ratio to H₀, after one solve); and each
  // state's element lengths (its catenary loads), so every state starts from its own.
  const solvedAt: { lnH0: number; tensions: number[] }[][] = model.project.cases.map(() => []);
  const guess = (i: number, tensionN: number, fallback: number[]): number[] => {
    const [last, before] = solvedAt[i];
    if (!last) return fallback;
    const dx = Math.log(tensionN) - last.lnH0;
    return last.tensions.map((h, j) => {
      let k = 1;
      if (before && before.lnH0 !== last.lnH0) {
        k = Math.log(h / before.tensions[j]) / (last.lnH0 - before.lnH0);
        if (!Number.isFinite(k)) k = 1;
        // Far from the two points the secant is no guide to the power: keep it plausible.
        if (Math.abs(dx) > 4 * Math.abs(last.lnH0 - before.lnH0))
          k = Math.min(1.2, Math.max(0.2, k));
      }
      return h * Math.exp(k * dx);
    });
  };
  const hasMoving = model.project.loads.some((l) => l.type === 'moving');
  // Worst positions of each moving load in each state (index + 1; 0 the installation).
  const parked = new Map<number, number[][]>();
  const withMoving = (
    index: number,
    state: NamedState,
    unstressed: readonly number[],
    spans: SolvedSpan[],
    checks: CheckValue[],
    full: boolean,
  ): CheckValue[] => {
    if (!hasMoving || !state.withLoads) return checks;
    const known = parked.get(index + 1);
    const m = movingChecks(model, state, unstressed, spans, known, full);
    // Every worst position found so far is kept (the newest first, a few per load), so the
    // parked checks are exact wherever one of them is the worst.
    parked.set(
      index + 1,
      m.worst.map((xs, k) =>
        [...new Set([...xs, ...(known?.[k] ?? [])])].slice(0, PARKED_PER_LOAD),
      ),
    );
    return [...checks, ...m.checks];
  };
  const lengths = new Map<number, SpanLengths[]>();
  const warm = (index: number) => {
    const last = lengths.get(index);
    if (last) seedLengths(model, last, 1);
  };
  const keep = (index: number) => lengths.set(index, spanLengths(model.spans));
  return (
    tensionN: number,
    visit: (index: number, name: string, spans: SolvedSpan[], checks: CheckValue[]) => void,
    only?: CaseSubset,
  ): boolean => {
    const full = only === undefined;
    warm(-1);
    const installed = solveInstallation(model, tensionN);
    if (!installed.solved) return false;
    keep(-1);
    const base = model.installation;
    visit(
      -1,
      base.name,
      installed.spans,
      withMoving(
        -1,
        base,
        installed.unstressed,
        installed.spans,
        stateChecks(model, base.name, installed.spans, base.withLoads),
        full,
      ),
    );
    for (const [i, weather] of model.project.cases.entries()) {
      if (only && !only.has(i)) continue;
      const start = guess(
        i,
        tensionN,
        installed.spans.map((s) => s.tensionN),
      );
      const named = { ...loadStateOfCase(weather), name: weather.name };
      warm(i);
      const state = solveChangeOfState(model, named, installed.unstressed, start);
      if (!state.solved) return false;
      keep(i);
      solvedAt[i] = [
        { lnH0: Math.log(tensionN), tensions: state.spans.map((s) => s.tensionN) },
        ...solvedAt[i].slice(0, 1),
      ];
      visit(
        i,
        weather.name,
        state.spans,
        withMoving(
          i,
          named,
          installed.unstressed,
          state.spans,
          stateChecks(model, weather.name, state.spans, weather.withLoads),
          full,
        ),
      );
    }
    return true;
  };
}

/** Worst utilisation and worst clearance margin at installation tension H₀ (cases in `only`). */
export function createWindowResponse(
  model: ProjectModel,
): (tensionN: number, only?: CaseSubset) => WindowResponse {
  const evaluate = createCheckEvaluator(model);
  return (tensionN, only) => {
    const r: WindowResponse = {
      solved: true,
      utilisation: -Infinity,
      tensionCase: '',
      clearanceMargin: Infinity,
      clearanceCase: '',
      clearanceCheck: '',
      clearanceSagM: 0,
      tensionIndex: -1,
      clearanceIndex: -1,
    };
    const visit = (index: number, name: string, spans: SolvedSpan[], checks: CheckValue[]) => {
      for (const c of checks) {
        if (c.check === TENSION_CHECK) {
          if (c.value > r.utilisation) {
            r.utilisation = c.value;
            r.tensionCase = name;
            r.tensionIndex = index;
            r.tensionMoving = c.moving;
          }
        } else if (c.value - c.limit < r.clearanceMargin) {
          r.clearanceMargin = c.value - c.limit;
          r.clearanceCase = name;
          r.clearanceIndex = index;
          r.clearanceCheck = c.check;
          r.clearanceSagM = largestSag(spans);
          r.clearanceMoving = c.moving;
        }
      }
    };
    r.solved = evaluate(tensionN, visit, only);
    return r;
  };
}
