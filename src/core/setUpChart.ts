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
  /** The wire's unstressed length in this state (m) and dL₀/dH₁ there (m/N; NaN if unknown). */
  lengthM: number;
  lengthSlope: number;
}

/**
 * The wire of cut lengths `unstressedSpans` (m, at t₀) pulled through as at installation at
 * `temperature` (°C), installation loads, no ice or wind: pulleys keep the tension equal, every
 * other support the horizontal tension. Leaves the span models in that state. `afterRow`: the
 * span models hold another set-up row (same loads), whose shape is the first iteration's.
 */
export function solveSetUpState(
  model: ProjectModel,
  unstressedSpans: readonly number[],
  temperature: number,
  tensionGuessN: number,
  afterRow = false,
): SetUpState {
  const total = unstressedSpans.reduce((a, b) => a + b, 0);
  const wire = prepareState(model, { ...model.installation, temperature });
  const lengthM = total * thermalFactor(model, temperature);
  const solution = solveSectionForLength(
    model.spans,
    wire,
    lengthM,
    tensionGuessN,
    model.installationJoints,
    afterRow,
  );
  const spans = model.spans.map((span, j) => ({ span, tensionN: solution.spanTensionsN[j] }));
  return {
    spans,
    tensionN: solution.tensionN,
    largestTensionN: Math.max(...solution.spanTensionsN),
    solved: solution.converged,
    lengthM,
    lengthSlope: solution.lengthSlope ?? Number.NaN,
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

/**
 * A row's starting tension from the rows solved before it, nearest last: through the last three
 * (L₀, H₁) pairs the quadratic in L₀, through the last two the line; after one row, one Newton
 * step on its length L₀(H₁) with its slope: H₁ + (L₀,row − L₀) / (dL₀/dH₁). Kept within a
 * factor 2 of the nearest row's H₁; its H₁ when the step is not defined, the fallback before any.
 */
export function neighbourGuess(
  solved: readonly SetUpState[],
  lengthM: number,
  fallbackN: number,
): number {
  const n = solved.length;
  if (n === 0) return fallbackN;
  const a = solved[n - 1];
  const H = a.tensionN;
  let guess = Number.NaN;
  if (n >= 3) {
    const b = solved[n - 2];
    const c = solved[n - 3];
    // Newton's divided differences of H₁ over L₀.
    const ab = (a.tensionN - b.tensionN) / (a.lengthM - b.lengthM);
    const bc = (b.tensionN - c.tensionN) / (b.lengthM - c.lengthM);
    const abc = (ab - bc) / (a.lengthM - c.lengthM);
    guess = H + (lengthM - a.lengthM) * (ab + abc * (lengthM - b.lengthM));
  } else if (n === 2) {
    const b = solved[0];
    guess = H + ((lengthM - a.lengthM) * (a.tensionN - b.tensionN)) / (a.lengthM - b.lengthM);
  } else {
    guess = H + (lengthM - a.lengthM) / a.lengthSlope;
  }
  return guess > H / 2 && guess < 2 * H ? guess : H;
}

/**
 * The set-up rows, solved outwards from the installation temperature (its row starts from the
 * installation tension), each row started from the rows solved just before it on its side.
 */
export function setUpChart(
  model: ProjectModel,
  unstressedSpans: readonly number[],
  sagSpanIndex: number,
  installationTensionN: number,
): SetUpRow[] {
  const total = unstressedSpans.reduce((a, b) => a + b, 0);
  const temperatures = setUpTemperatures(model);
  const start = Math.max(0, temperatures.indexOf(model.installation.temperature));
  const rows: SetUpRow[] = new Array(temperatures.length);
  // Each row is read off as soon as it is solved: the span models hold one state at a time.
  const solveRow = (i: number, solved: SetUpState[]) => {
    const temperature = temperatures[i];
    const lengthM = total * thermalFactor(model, temperature);
    const guess = neighbourGuess(
      solved.filter((s) => s.solved),
      lengthM,
      solved[solved.length - 1]?.tensionN ?? installationTensionN,
    );
    // After the first row the spans hold another row: the same loads, another temperature.
    const state = solveSetUpState(model, unstressedSpans, temperature, guess, i !== start);
    solved.push(state);
    rows[i] = {
      temperature,
      solved: state.solved,
      horizontalTension: state.largestTensionN,
      maxTension: largestStateTension(state.spans),
      sag: largestSpanSag(state.spans[sagSpanIndex]),
      returnTime: setUpReturnTime(model, state, sagSpanIndex, temperature),
    };
  };
  const up: SetUpState[] = [];
  for (let i = start; i < temperatures.length; i++) solveRow(i, up);
  const down = up.slice(0, 1);
  for (let i = start - 1; i >= 0; i--) solveRow(i, down);
  return rows;
}
