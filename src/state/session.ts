/**
 * The workbench session: everything that happens to the document besides editing it, wired in
 * one place. It opens the autosave into the store (repairing it as far as it can and saying so),
 * writes every later valid document back, and pauses writing explicitly while a shared project
 * is being viewed. Tabs on the same browser agree through storage and a BroadcastChannel: the
 * tab that opened last edits; the others show its changes as they are saved and offer to take
 * over, and a tab that has lost the document never overwrites it. A refused write is told at
 * once, the document stays in memory, and leaving the page asks first. Solving goes through the
 * solver link; the design aids' worker is started and stopped with the session too.
 */
import { type Project, validateProject } from '../core/index.ts';
import {
  claim,
  type KeyValueStorage,
  openAutosave,
  readKept,
  readOwner,
  type WriteOutcome,
  writeAutosave,
  writeKept,
} from './autosave.ts';
import type { ProjectStore } from './projectStore.ts';
import type { ResultsStore } from './resultsStore.ts';
import type { SessionStore } from './sessionStore.ts';
import { linkSolver, type SolverPort } from './solverLink.ts';

/**
 * Between tabs. A saved document travels with its message: another tab's copy of the storage
 * may not have caught up yet when the message arrives.
 */
export type TabMessage =
  | { type: 'claimed'; tab: string }
  | { type: 'saved'; tab: string; project: Project };

export interface ChannelLike {
  postMessage(message: TabMessage): void;
  onmessage: ((event: MessageEvent<TabMessage>) => void) | null;
  close(): void;
}

/** Where a "leave this page?" guard is registered while edits are not stored. */
export interface UnloadGuardTarget {
  addEventListener(type: 'beforeunload', listener: (event: Event) => void): void;
  removeEventListener(type: 'beforeunload', listener: (event: Event) => void): void;
}

export interface SessionOptions {
  store: ProjectStore;
  session: SessionStore;
  results: ResultsStore;
  storage: KeyValueStorage | undefined;
  /** Opened when nothing usable is stored. */
  fallback: Project;
  channel?: ChannelLike;
  solver?: SolverPort;
  /**
   * Starts the design aids (the second worker that answers the tension window and the chooser)
   * once the document is open; returns its stop function, called on dispose.
   */
  designAids?: () => () => void;
  tabId?: string;
  unloadTarget?: UnloadGuardTarget;
}

export interface StartOptions {
  /** Start with writing paused (a shared project is about to be shown). */
  paused?: boolean;
}

function newTabId(): string {
  return typeof crypto !== 'undefined' && 'randomUUID' in crypto
    ? crypto.randomUUID()
    : `${Date.now()}-${Math.random()}`;
}

function warnBeforeUnload(event: Event): void {
  event.preventDefault();
  (event as BeforeUnloadEvent).returnValue = '';
}

export function createSession(options: SessionOptions) {
  const { store, session, storage, channel } = options;
  const tab = options.tabId ?? newTabId();
  let paused = false;
  let quiet = false; // replacing the document from storage: not an edit to save
  let stops: (() => void)[] = [];
  let guarded = false;
  /** The last document another tab said it saved. */
  let latestElsewhere: Project | undefined;

  function setGuard(on: boolean) {
    if (on === guarded || !options.unloadTarget) return;
    guarded = on;
    if (on) options.unloadTarget.addEventListener('beforeunload', warnBeforeUnload);
    else options.unloadTarget.removeEventListener('beforeunload', warnBeforeUnload);
  }

  /** Store whether the document on screen is the one last kept, beside the autosave. */
  function storeKept() {
    writeKept(storage, store.getState().project === session.getState().kept);
  }

  /** A document shown from storage is kept as far as the stored flag says. */
  function keptFromStorage(project: Project) {
    session.setState({ kept: readKept(storage) ? project : null });
  }

  function record(outcome: WriteOutcome) {
    if (outcome.ok) {
      storeKept();
      session.setState({ save: { kind: 'saved' }, unsavedEdits: false });
      setGuard(false);
      channel?.postMessage({ type: 'saved', tab, project: store.getState().project });
    } else if (outcome.reason === 'otherTab') {
      session.setState({ otherTabEditing: true, unsavedEdits: true });
      setGuard(true);
    } else {
      const reason = outcome.reason === 'full' ? 'full' : 'refused';
      session.setState({
        save: { kind: 'failed', reason, detail: outcome.detail },
        unsavedEdits: true,
      });
      setGuard(true);
    }
  }

  function save(project: Project) {
    if (quiet) return;
    if (paused) {
      session.setState({ save: { kind: 'paused' } });
      return;
    }
    if (session.getState().otherTabEditing) {
      session.setState({ unsavedEdits: true });
      setGuard(true);
      return;
    }
    record(writeAutosave(storage, project, tab));
  }

  /** Show a document without treating it as an edit. */
  function show(project: Project) {
    quiet = true;
    try {
      store.getState().resetProject(project);
      keptFromStorage(project);
    } finally {
      quiet = false;
    }
  }

  /**
   * Show the other tab's latest document (from its last message, else from storage) without
   * treating it as an edit; false if none is usable.
   */
  function showStored(): boolean {
    if (latestElsewhere) {
      show(latestElsewhere);
      latestElsewhere = undefined;
      return true;
    }
    const opened = openAutosave(storage, store.getState().project);
    if (opened.recovery || opened.project === store.getState().project) return false;
    quiet = true;
    try {
      store.getState().resetProject(opened.project);
      keptFromStorage(opened.project);
    } finally {
      quiet = false;
    }
    return true;
  }

  /** Become the tab that edits and store what is on screen. */
  function hold() {
    const claimed = claim(storage, tab);
    if (!claimed.ok) {
      record(claimed);
      return;
    }
    latestElsewhere = undefined;
    session.setState({ otherTabEditing: false });
    channel?.postMessage({ type: 'claimed', tab });
    record(writeAutosave(storage, store.getState().project, tab));
  }

  function receive(message: TabMessage) {
    if (message.tab === tab || paused) return;
    if (message.type === 'claimed') {
      session.setState({ otherTabEditing: true });
      return;
    }
    const checked = validateProject(message.project);
    if (!checked.ok) return;
    latestElsewhere = checked.project;
    if (session.getState().otherTabEditing && !session.getState().unsavedEdits) showStored();
  }

  return {
    tab,
    start(startOptions: StartOptions = {}) {
      const opened = openAutosave(storage, options.fallback);
      quiet = true;
      store.getState().resetProject(opened.project);
      // Nothing stored: the fallback is as good as kept. A repaired document never is.
      if (opened.project === options.fallback) session.setState({ kept: opened.project });
      else if (opened.recovery) session.setState({ kept: null });
      else keptFromStorage(opened.project);
      quiet = false;
      if (opened.recovery) session.setState({ recovery: opened.recovery });
      if (opened.formatNotes) session.setState({ formatNotes: opened.formatNotes });
      stops.push(
        store.subscribe((s, previous) => s.project !== previous.project && save(s.project)),
      );
      // Kept elsewhere (saved, exported, opened): the stored flag follows while this tab writes.
      stops.push(
        session.subscribe((s, previous) => {
          if (s.kept === previous.kept || quiet || paused || s.otherTabEditing) return;
          if (s.save.kind === 'saved') storeKept();
        }),
      );
      if (channel) {
        channel.onmessage = (event) => receive(event.data);
        stops.push(() => channel.close());
      }
      if (startOptions.paused) {
        paused = true;
        session.setState({ save: { kind: 'paused' } });
      } else hold();
      if (options.solver) stops.push(linkSolver(store, options.results, options.solver));
      if (options.designAids) stops.push(options.designAids());
    },
    /** Stop writing the autosave (a shared project is on screen); the stored work stays. */
    pause() {
      paused = true;
      session.setState({ save: { kind: 'paused' } });
    },
    /** Write again: the document on screen becomes this tab's autosave. */
    resume() {
      paused = false;
      hold();
    },
    /** Put back the person's own stored work (after viewing a shared project), then resume. */
    restoreStored(inMemory: Project) {
      if (!showStored()) store.getState().setProject(inMemory);
      paused = false;
      hold();
    },
    /**
     * Edit in this tab. By default the other tab's last saved document is loaded first; with
     * `keepMine` the document on screen here (with edits not yet stored) replaces it.
     */
    takeOver({ keepMine = false } = {}) {
      if (!keepMine) showStored();
      session.setState({ otherTabEditing: false });
      hold();
    },
    /** Try the autosave again (after storage was freed). */
    retrySave() {
      save(store.getState().project);
    },
    /** Another tab may have taken the document while this one was hidden. */
    checkOwner() {
      if (paused || session.getState().otherTabEditing) return;
      const owner = readOwner(storage);
      if (owner && owner.tab !== tab) {
        session.setState({ otherTabEditing: true });
        if (!session.getState().unsavedEdits) showStored();
      }
    },
    dispose() {
      for (const stop of stops) stop();
      stops = [];
      setGuard(false);
    },
  };
}

export type Session = ReturnType<typeof createSession>;
