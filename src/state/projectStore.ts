/**
 * The project document store: one immutable Project replaced on every edit, with undo/redo of
 * document edits (zundo) and autosave to the browser's storage on every change. Keystrokes in
 * the same field within a short time form one undo step.
 */
import { temporal } from 'zundo';
import { create } from 'zustand';
import type { Project } from '../core/index.ts';
import { browserStorage, readAutosave, writeAutosave } from './autosave.ts';
import { demoProject } from './demoProject.ts';

export interface ProjectState {
  project: Project;
  /** Replace the document. Edits sharing `mergeKey` within MERGE_WINDOW_MS make one undo step. */
  setProject(next: Project, mergeKey?: string): void;
}

export const MERGE_WINDOW_MS = 1200;
export const UNDO_LIMIT = 200;

let lastMerge: { key: string; at: number } | undefined;

export const useProjectStore = create<ProjectState>()(
  temporal(
    (set, _get, api) => ({
      project: readAutosave(browserStorage()) ?? demoProject,
      setProject(next, mergeKey) {
        const now = Date.now();
        const merge =
          mergeKey !== undefined &&
          lastMerge?.key === mergeKey &&
          now - lastMerge.at < MERGE_WINDOW_MS;
        lastMerge = mergeKey === undefined ? undefined : { key: mergeKey, at: now };
        if (!merge) {
          set({ project: next });
          return;
        }
        const history = (api as unknown as typeof useProjectStore).temporal.getState();
        history.pause();
        set({ project: next });
        history.resume();
      },
    }),
    {
      partialize: (state) => ({ project: state.project }),
      equality: (past, current) => past.project === current.project,
      limit: UNDO_LIMIT,
    },
  ),
);

useProjectStore.subscribe((state, previous) => {
  if (state.project !== previous.project) writeAutosave(browserStorage(), state.project);
});

export function undo(): void {
  lastMerge = undefined;
  useProjectStore.temporal.getState().undo();
}

export function redo(): void {
  lastMerge = undefined;
  useProjectStore.temporal.getState().redo();
}
