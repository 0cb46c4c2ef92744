/**
 * Set-up chart: what to set on the day. The wire is cut to the design length L₀ (at the
 * installation temperature t₀); tensioned at another temperature t with the installation loads
 * (no ice, no wind), pulled through as at installation (pulleys: equal tension; other supports:
 * equal horizontal tension), it shows the largest H, the sag and the largest tension of
 * L₀(1 + α(t − t₀)). Field check [CP, textbook string physics]: a pulse sent along
 * the wire returns after t_r = √(32 f / g) seconds for sag f (sag ≈ g t_r² / 32, one return).
 */

import { largestSpanSag, largestStateTension } from './caseChecks.ts';
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

export function setUpChart(
  model: ProjectModel,
  unstressedSpans: readonly number[],
  sagSpanIndex: number,
  installationTensionN: number,
): SetUpRow[] {
  const total = unstressedSpans.reduce((a, b) => a + b, 0);
  let guess = installationTensionN;
  return setUpTemperatures(model).map((temperature) => {
    const wire = prepareState(model, { ...model.installation, temperature });
    const solution = solveSectionForLength(
      model.spans,
      wire,
      total * thermalFactor(model, temperature),
      guess,
      model.installationJoints,
    );
    const spans = model.spans.map((span, j) => ({ span, tensionN: solution.spanTensionsN[j] }));
    guess = solution.tensionN;
    const sag = largestSpanSag(spans[sagSpanIndex]);
    return {
      temperature,
      solved: solution.converged,
      horizontalTension: Math.max(...solution.spanTensionsN),
      maxTension: largestStateTension(spans),
      sag,
      returnTime: Math.sqrt((32 * sag) / model.env.gravity),
    };
  });
}
