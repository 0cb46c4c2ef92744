/**
 * Set-up chart: what to set on the day. The wire is cut to the design length L₀ (at the
 * installation temperature t₀); tensioned at another temperature t with the installation loads
 * (no ice, no wind), pulled through as at installation (pulleys: equal tension; other supports:
 * equal horizontal tension), it shows the largest span H, the sag and the largest tension of
 * L₀(1 + α(t − t₀)). Field check: the pulse return time 2 ∫ ds / c of the reference
 * span, c = √(T / μ) (fieldChecks.ts); null when hung loads are on the wire while it is set.
 */

import { largestSpanSag, largestStateTension, type SolvedSpan } from './caseChecks.ts';
import { fieldChecksHold, pulseReturnTime } from './fieldChecks.ts';
import { solveSectionForLength } from './lengthCompatibility.ts';
import type { SetUpRow } from './project.ts';
import { type ProjectModel, prepareState, thermalFactor } from './projectModel.ts';

const STEP_C = 5;
const MAX_ROWS = 15;

/** Whole multiples of 5 °C covering the cases and −10…40 °C, plus the installation temperature. */
export function setUpTemperatures(model: ProjectModel): number[] {
  const all = [model.installation.temperature, ...model.project.cases.map((c) => c.temperature)];
  const low = Math.floor(Math.min(-10, ...all) / STEP_C) * STEP_C;
  const high = Math.ceil(Math.max(40, ...all) / STEP_C) * STEP_C;
  const step = Math.max(STEP_C, Math.ceil((high - low) / (MAX_ROWS - 1) / STEP_C) * STEP_C);
  const temperatures: number[] = [];
  for (let t = low; t <= high; t += step) temperatures.push(t);
  if (!temperatures.includes(model.installation.temperature))
    temperatures.push(model.installation.temperature);
  return temperatures.sort((a, b) => a - b);
}

export interface SetUpState {
  spans: SolvedSpan[];
  /** Horizontal tension of the first span, N (the next row's starting value). */
  tensionN: number;
  /** The largest span horizontal tension, N (every span's when no pulley makes them differ). */
  largestTensionN: number;
  solved: boolean;
}

/**
 * The wire of cut lengths `unstressedSpans` (m, at t₀) pulled through as at installation at
 * `temperature` (°C), installation loads, no ice or wind: pulleys keep the tension equal, every
 * other support the horizontal tension. Leaves the span models in that state.
 */
export function solveSetUpState(
  model: ProjectModel,
  unstressedSpans: readonly number[],
  temperature: number,
  tensionGuessN: number,
): SetUpState {
  const total = unstressedSpans.reduce((a, b) => a + b, 0);
  const wire = prepareState(model, { ...model.installation, temperature });
  const solution = solveSectionForLength(
    model.spans,
    wire,
    total * thermalFactor(model, temperature),
    tensionGuessN,
    model.installationJoints,
  );
  const spans = model.spans.map((span, j) => ({ span, tensionN: solution.spanTensionsN[j] }));
  return {
    spans,
    tensionN: solution.tensionN,
    largestTensionN: Math.max(...solution.spanTensionsN),
    solved: solution.converged,
  };
}

/** Pulse return time (s) of span `index` in a set-up state, or null when the check fails. */
export function setUpReturnTime(
  model: ProjectModel,
  state: SetUpState,
  index: number,
  temperature: number,
): number | null {
  if (!fieldChecksHold(model.project)) return null;
  const { span, tensionN } = state.spans[index];
  return pulseReturnTime(span, tensionN, {
    massPerLength: model.wire.massPerLength,
    axialStiffness: model.wire.axialStiffness,
    thermalFactor: thermalFactor(model, temperature),
  });
}

export function setUpChart(
  model: ProjectModel,
  unstressedSpans: readonly number[],
  sagSpanIndex: number,
  installationTensionN: number,
): SetUpRow[] {
  let guess = installationTensionN;
  return setUpTemperatures(model).map((temperature) => {
    const state = solveSetUpState(model, unstressedSpans, temperature, guess);
    guess = state.tensionN;
    return {
      temperature,
      solved: state.solved,
      horizontalTension: state.largestTensionN,
      maxTension: largestStateTension(state.spans),
      sag: largestSpanSag(state.spans[sagSpanIndex]),
      returnTime: setUpReturnTime(model, state, sagSpanIndex, temperature),
    };
  });
}
