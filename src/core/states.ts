/**
 * Solving the states of a project. Installation: the line pulled to the installation tension at
 * the installation temperature and loads, pulleys keeping the tension equal on both sides and
 * every other support the horizontal tension; that fixes each span's unstressed length L₀ᵢ.
 * Any other state is a change of state at those lengths: each section (spans joined by pulleys
 * or swing links) closes Σ L₀ᵢ (1 + α Δt) with its joints' conditions.
 */
import type { SolvedSpan } from './caseChecks.ts';
import { solveSectionAtTension, solveSectionForLength } from './lengthCompatibility.ts';
import type { LoadState } from './loads.ts';
import { type ProjectModel, prepareState, thermalFactor } from './projectModel.ts';

export interface StateSolution {
  spans: SolvedSpan[];
  /** Point loads placed exactly at each support, N, downward and sideways: they load the
   * support alone. */
  supportForcesN: number[];
  supportLateralN: number[];
  iterations: number;
  solved: boolean;
  messages: string[];
}

/**
 * Installation with the first span at horizontal tension H₁ (the other spans follow through the
 * installation joints); returns the state and each span's unstressed length.
 */
export function solveInstallation(
  model: ProjectModel,
  tensionN: number,
): StateSolution & { unstressed: number[] } {
  const wire = prepareState(model, model.installation);
  const result = solveSectionAtTension(model.spans, wire, tensionN, model.installationJoints);
  const unstressed = model.spans.map((span) => span.unstressedElement.reduce((a, b) => a + b, 0));
  return {
    spans: model.spans.map((span, j) => ({ span, tensionN: result.spanTensionsN[j] })),
    supportForcesN: [...model.supportForcesN],
    supportLateralN: [...model.supportLateralN],
    iterations: result.iterations,
    solved: result.converged,
    messages: result.converged ? [] : [`Installation: ${result.reason}.`],
    unstressed,
  };
}

/**
 * The largest span horizontal tension at installation (N) — what a horizontalTension target and
 * every case's horizontalTension mean — for the first span's H₁. Equal to H₁ unless a pulley
 * makes the spans' H differ.
 */
export function largestInstallationTension(model: ProjectModel, tensionN: number): number {
  if (model.installationJoints.every((joint) => joint === 'horizontal')) return tensionN;
  return Math.max(...solveInstallation(model, tensionN).spans.map((s) => s.tensionN));
}

/**
 * A change of state at fixed unstressed span lengths (m, at the installation temperature);
 * tensionGuessesN holds a starting horizontal tension for every span (N).
 */
export function solveChangeOfState(
  model: ProjectModel,
  state: LoadState & { name: string },
  unstressedSpans: readonly number[],
  tensionGuessesN: readonly number[],
): StateSolution {
  const wire = prepareState(model, state);
  const factor = thermalFactor(model, state.temperature);
  const tensions: number[] = model.spans.map(() => 0);
  let iterations = 0;
  const messages: string[] = [];
  let solved = true;
  for (const section of model.sections) {
    const members = section.spans.map((j) => model.spans[j]);
    const length = section.spans.reduce((sum, j) => sum + unstressedSpans[j], 0) * factor;
    const first = section.spans[0];
    const result = solveSectionForLength(
      members,
      wire,
      length,
      tensionGuessesN[first],
      section.joints,
    );
    iterations += result.iterations;
    if (!result.converged) {
      solved = false;
      messages.push(
        `${state.name}: spans ${section.spans.map((j) => j + 1).join(', ')}: ${result.reason}.`,
      );
    }
    section.spans.forEach((j, k) => {
      tensions[j] = result.spanTensionsN[k];
    });
  }
  // Sections were solved one after another, but each span's arrays hold its own final state.
  return {
    spans: model.spans.map((span, j) => ({ span, tensionN: tensions[j] })),
    supportForcesN: [...model.supportForcesN],
    supportLateralN: [...model.supportLateralN],
    iterations,
    solved,
    messages,
  };
}
