/**
 * The project document store, made by a factory so each test (and each workbench) has its own:
 * one immutable Project replaced on every edit, with undo/redo of document edits (zundo).
 * Keystrokes in the same field within a short time form one undo step. The store knows nothing
 * of storage or the solver: src/state/session.ts wires those to it. Edits reach it only through
 * commit() (src/state/commit.ts), which validates them first.
 */
import { temporal } from 'zundo';
import { create } from 'zustand';
import type { Project } from '../core/index.ts';
import { demoProject } from './demoProject.ts';

export interface ProjectState {
  project: Project;
  /**
   * Replace the document. Edits sharing `mergeKey` within `mergeWindowMs` (default
   * MERGE_WINDOW_MS) make one undo step; a drag on the plot passes Infinity, so one drag is one
   * step however long it pauses.
   */
  setProject(next: Project, mergeKey?: string, mergeWindowMs?: number): void;
  /** Replace the document and forget the undo history (opening the autosave, another tab's copy). */
  resetProject(next: Project): void;
}

export const MERGE_WINDOW_MS = 1200;
export const UNDO_LIMIT = 200;

export function createProjectStore(initial: Project) {
  let lastMerge: { key: string; at: number } | undefined;
  const store = create<ProjectState>()(
    temporal(
      (set) => ({
        project: initial,
        setProject(next, mergeKey, mergeWindowMs = MERGE_WINDOW_MS) {
          const now = Date.now();
          const merge =
            mergeKey !== undefined &&
            lastMerge?.key === mergeKey &&
            now - lastMerge.at < mergeWindowMs;
          lastMerge = mergeKey === undefined ? undefined : { key: mergeKey, at: now };
          if (!merge) {
            set({ project: next });
            return;
          }
          const history = store.temporal.getState();
          history.pause();
          set({ project: next });
          history.resume();
        },
        resetProject(next) {
          lastMerge = undefined;
          const history = store.temporal.getState();
          history.pause();
          set({ project: next });
          history.resume();
          history.clear();
        },
      }),
      {
        partialize: (state) => ({ project: state.project }),
        equality: (past, current) => past.project === current.project,
        limit: UNDO_LIMIT,
      },
    ),
  );
  const history = () => {
    lastMerge = undefined;
    return store.temporal.getState();
  };
  return Object.assign(store, {
    undo: () => history().undo(),
    redo: () => history().redo(),
  });
}

export type ProjectStore = ReturnType<typeof createProjectStore>;

/** The workbench's document. It starts as the demo; the session opens the autosave into it. */
export const useProjectStore: ProjectStore = createProjectStore(demoProject);

export function undo(): void {
  useProjectStore.undo();
}

export function redo(): void {
  useProjectStore.redo();
}
