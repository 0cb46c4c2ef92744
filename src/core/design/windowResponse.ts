/**
 * The checks of every case as functions of the installation horizontal tension H₀ (N): the
 * installation at H₀ fixes the cut lengths, each case is a change of state at those lengths.
 * Tension check: utilisation u = T_max · SF / (breaking load · end-fitting efficiency) (passes at
 * u ≤ 1). Clearance checks:
 * margin = clearance − required (m) over the whole span and each zone (passes at ≥ 0).
 */
import { clearanceOver, largestSag, largestStateTension, type SolvedSpan } from '../caseChecks.ts';
import { type SpanLengths, seedLengths, spanLengths } from '../discretisation.ts';
import { resolveEndFittings } from '../endFittings.ts';
import { hungDrops, loadStateOfCase } from '../loads.ts';
import type { ProjectModel } from '../projectModel.ts';
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

/** Weather cases to solve, by index; the installation (index −1) is always solved. */
export type CaseSubset = ReadonlySet<number> | undefined;

/**
 * An evaluator of every check at installation tension H₀ (of the installation and the weather
 * cases in `only`, default all), warm-starting each case from its last solved tension. Calls
 * `visit` with each solved state's index (−1 the installation), name, spans and checks.
 */
export function createCheckEvaluator(model: ProjectModel) {
  // Each case's span tensions from its last solve (a warm start), none before the first; and
  // each state's element lengths (its catenary loads), so every state starts from its own.
  const guesses: (number[] | undefined)[] = model.project.cases.map(() => undefined);
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
    warm(-1);
    const installed = solveInstallation(model, tensionN);
    if (!installed.solved) return false;
    keep(-1);
    visit(
      -1,
      model.installation.name,
      installed.spans,
      stateChecks(model, model.installation.name, installed.spans, model.installation.withLoads),
    );
    for (const [i, weather] of model.project.cases.entries()) {
      if (only && !only.has(i)) continue;
      const guess = guesses[i] ?? installed.spans.map((s) => s.tensionN);
      warm(i);
      const state = solveChangeOfState(
        model,
        { ...loadStateOfCase(weather), name: weather.name },
        installed.unstressed,
        guess,
      );
      if (!state.solved) return false;
      keep(i);
      guesses[i] = state.spans.map((s) => s.tensionN);
      visit(
        i,
        weather.name,
        state.spans,
        stateChecks(model, weather.name, state.spans, weather.withLoads),
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
          }
        } else if (c.value - c.limit < r.clearanceMargin) {
          r.clearanceMargin = c.value - c.limit;
          r.clearanceCase = name;
          r.clearanceIndex = index;
          r.clearanceCheck = c.check;
          r.clearanceSagM = largestSag(spans);
        }
      }
    };
    r.solved = evaluate(tensionN, visit, only);
    return r;
  };
}
