/**
 * The browser workbench's one session over the app's stores, started once by the entry point
 * with the browser's storage, a BroadcastChannel between tabs, the solver worker and the design
 * aids' worker (started here, not by a component, so a remount never starts a second one).
 */

import { connectDesign } from '../worker/connectDesign.ts';
import type { WorkerLike } from '../worker/protocol.ts';
import { solveFirstHere } from '../worker/solveRequest.ts';
import { SolverClient } from '../worker/solverClient.ts';
import { browserStorage } from './autosave.ts';
import { demoProject } from './demoProject.ts';
import { afterFirstDraw } from './firstDraw.ts';
import { useProjectStore } from './projectStore.ts';
import { useResultsStore } from './resultsStore.ts';
import { type ChannelLike, createSession, type Session } from './session.ts';
import { useSessionStore } from './sessionStore.ts';
import { applyOutcome } from './solverLink.ts';

export const TAB_CHANNEL = 'sagwright:tabs';

let current: Session | undefined;

function tabChannel(): ChannelLike | undefined {
  try {
    return typeof BroadcastChannel === 'undefined'
      ? undefined
      : (new BroadcastChannel(TAB_CHANNEL) as unknown as ChannelLike);
  } catch {
    return undefined;
  }
}

export function startAppSession(
  createWorker: () => WorkerLike,
  paused: boolean,
  createDesignWorker?: () => WorkerLike,
): Session {
  current?.dispose();
  // A small first document is solved on the page (no worker script before the first plot);
  // the worker starts once the plot is drawn, ready for the first edit.
  const solver = new SolverClient({
    createWorker,
    onOutcome: (outcome) => applyOutcome(outcome, useProjectStore, useResultsStore),
    firstHere: solveFirstHere,
    startWorkerAfter: afterFirstDraw(4000),
  });
  current = createSession({
    store: useProjectStore,
    session: useSessionStore,
    results: useResultsStore,
    storage: browserStorage(),
    fallback: demoProject,
    channel: tabChannel(),
    solver,
    // The design aids' worker starts once the first plot is drawn (or after 4 s without one).
    designAids: createDesignWorker
      ? () => connectDesign(createDesignWorker, afterFirstDraw(4000))
      : undefined,
    unloadTarget: typeof window === 'undefined' ? undefined : window,
  });
  current.start({ paused });
  return current;
}

/** The running session, if the entry point has started one (tests of components may not). */
export function appSession(): Session | undefined {
  return current;
}
