/**
 * Solving the states of a project. Installation: every span pulled to one horizontal tension H
 * at the installation temperature and loads, which fixes each span's unstressed length L₀ᵢ.
 * Any other state is a change of state at those lengths: each section closes
 * Σ L₀ᵢ (1 + α Δt) = its unstressed length at the new temperature and loads.
 */
import type { SolvedSpan } from './caseChecks.ts';
import { solveSectionAtTension, solveSectionForLength } from './lengthCompatibility.ts';
import type { LoadState } from './loads.ts';
import { type ProjectModel, prepareState, thermalFactor } from './projectModel.ts';

export interface StateSolution {
  spans: SolvedSpan[];
  iterations: number;
  solved: boolean;
  messages: string[];
}

/** Installation at horizontal tension H; returns the state and each span's unstressed length. */
export function solveInstallation(
  model: ProjectModel,
  tensionN: number,
): StateSolution & { unstressed: number[] } {
  const wire = prepareState(model, model.installation);
  const result = solveSectionAtTension(model.spans, wire, tensionN);
  const unstressed = model.spans.map((span) => span.unstressedElement.reduce((a, b) => a + b, 0));
  return {
    spans: model.spans.map((span) => ({ span, tensionN })),
    iterations: result.iterations,
    solved: result.converged,
    messages: result.converged ? [] : [`Installation: ${result.reason}.`],
    unstressed,
  };
}

/** A change of state at fixed unstressed span lengths (m, at the installation temperature). */
export function solveChangeOfState(
  model: ProjectModel,
  state: LoadState & { name: string },
  unstressedSpans: readonly number[],
  tensionGuessN: number,
): StateSolution {
  const wire = prepareState(model, state);
  const factor = thermalFactor(model, state.temperature);
  const spans: SolvedSpan[] = [];
  let iterations = 0;
  const messages: string[] = [];
  let solved = true;
  for (const section of model.sections) {
    const members = section.map((j) => model.spans[j]);
    const length = section.reduce((sum, j) => sum + unstressedSpans[j], 0) * factor;
    const result = solveSectionForLength(members, wire, length, tensionGuessN);
    iterations += result.iterations;
    if (!result.converged) {
      solved = false;
      messages.push(
        `${state.name}: spans ${section.map((j) => j + 1).join(', ')}: ${result.reason}.`,
      );
    }
    for (const span of members) spans.push({ span, tensionN: result.tensionN });
  }
  // Sections were solved one after another, but each span's arrays hold its own final state.
  spans.sort((a, b) => a.span.x0 - b.span.x0);
  return { spans, iterations, solved, messages };
}
