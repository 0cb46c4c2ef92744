/**
 * Wires the document and the temperature of the day to a second solver worker that works out
 * the design aids, so the window and chooser never hold up the results of an edit.
 */
import { useDesignStore } from '../state/designStore.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { createSolverWorker } from './createSolverWorker.ts';
import type { WorkerLike } from './protocol.ts';
import { type SolveOutcome, SolverClient } from './solverClient.ts';

function applyOutcome(outcome: SolveOutcome): void {
  const { project } = useProjectStore.getState();
  if (outcome.ok && outcome.design) {
    useDesignStore.setState({
      answers: outcome.design,
      answersProject: outcome.project,
      answersTemperature: outcome.design.setting?.temperature ?? null,
      stale: outcome.project !== project,
      error: null,
    });
  } else if (!outcome.ok) {
    useDesignStore.setState({ stale: true, error: outcome.message });
  }
}

/** Starts answering for the current document and every later one; returns a stop function. */
export function connectDesign(createWorker: () => WorkerLike = createSolverWorker): () => void {
  const client = new SolverClient({ createWorker, onOutcome: applyOutcome, watchdogMs: 60_000 });
  const ask = () => {
    useDesignStore.setState({ stale: true });
    client.solve(useProjectStore.getState().project, {
      temperatureNow: useDesignStore.getState().temperatureNow,
    });
  };
  ask();
  const stopProject = useProjectStore.subscribe((state, previous) => {
    if (state.project !== previous.project) ask();
  });
  const stopTemperature = useDesignStore.subscribe((state, previous) => {
    if (state.temperatureNow !== previous.temperatureNow) ask();
  });
  return () => {
    stopProject();
    stopTemperature();
    client.dispose();
  };
}
