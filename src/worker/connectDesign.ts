/**
 * Wires the document and the temperature of the day to a second solver worker that works out
 * the design aids, so the window and chooser never hold up the results of an edit: a document
 * is sent only once the main solver's results for it are on screen (fast typing sends nothing
 * until it pauses), and a new temperature is sent at once for the document last solved.
 */
import { useDesignStore } from '../state/designStore.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { useResultsStore } from '../state/resultsStore.ts';
import { createDesignWorker } from './createSolverWorker.ts';
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

/**
 * Results that keep coming (typing, a drag) are answered once they pause this long (ms): the
 * design aids take several solves of every case, and on a small machine they would otherwise
 * take the processor from the drawing of each new result.
 */
export const DESIGN_SETTLE_MS = 300;

/**
 * Starts answering for the current document and every later one; returns a stop function.
 * Nothing is asked (and no worker started) before `ready` settles: the page's first plot.
 */
export function connectDesign(
  createWorker: () => WorkerLike = createDesignWorker,
  ready?: Promise<void>,
  settleMs = DESIGN_SETTLE_MS,
): () => void {
  const client = new SolverClient({ createWorker, onOutcome: applyOutcome, watchdogMs: 60_000 });
  let asked: unknown = null;
  let waiting = ready !== undefined;
  let stopped = false;
  let settle: ReturnType<typeof setTimeout> | undefined;
  const ask = (force: boolean) => {
    clearTimeout(settle);
    if (waiting || stopped) return;
    const { results, resultsProject, stale } = useResultsStore.getState();
    const project = useProjectStore.getState().project;
    if (!results || stale || resultsProject !== project) return;
    if (!force && asked === project) return;
    asked = project;
    useDesignStore.setState({ stale: true });
    const { temperatureNow, chooserOn } = useDesignStore.getState();
    client.solve(project, { temperatureNow, choose: chooserOn });
  };
  if (ready)
    ready.then(() => {
      waiting = false;
      ask(false);
    });
  else ask(false);
  const stopResults = useResultsStore.subscribe(() => {
    clearTimeout(settle);
    settle = setTimeout(() => ask(false), settleMs);
  });
  const stopProject = useProjectStore.subscribe((state, previous) => {
    if (state.project !== previous.project) useDesignStore.setState({ stale: true });
  });
  const stopTemperature = useDesignStore.subscribe((state, previous) => {
    if (state.temperatureNow !== previous.temperatureNow || state.chooserOn !== previous.chooserOn)
      ask(true);
  });
  return () => {
    stopped = true;
    clearTimeout(settle);
    stopResults();
    stopProject();
    stopTemperature();
    client.dispose();
  };
}
