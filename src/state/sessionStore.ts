/**
 * What the person must know about their work beyond the document itself: whether it is being
 * saved in this browser, whether another tab is editing it, whether the stored copy had to be
 * repaired on opening, and the outcome of the last edit that changed more than its own field.
 * Written by the session (session.ts) and the commit function (commit.ts); read by the UI.
 */
import { create } from 'zustand';
import type { Project, ValidationIssue } from '../core/index.ts';

export type SaveState =
  /** The document on screen is the one stored. */
  | { kind: 'saved' }
  /** Not written on purpose (viewing a shared project); the person's own work stays stored. */
  | { kind: 'paused' }
  /** The browser refused the write: storage full, or storage switched off or blocked. */
  | { kind: 'failed'; reason: 'full' | 'refused'; detail: string };

/** The stored autosave could not be opened as it was; what was done about it. */
export interface Recovery {
  issues: ValidationIssue[];
  changes: string[];
  /** The stored text exactly as found, for download. */
  original: string;
  /** True when nothing could be kept and the demo opened instead. */
  openedDemo: boolean;
}

/** The outcome of an edit that carried other items along, or was refused, in words. */
export interface EditNotice {
  kind: 'carried' | 'refused';
  text: string;
  details: string[];
  /** Undo the carried edit in one step. */
  undoable: boolean;
}

export interface SessionState {
  save: SaveState;
  /** Another tab holds the document for editing; this one shows it and may take over. */
  otherTabEditing: boolean;
  /** Edits made here that are not in storage (storage failed, or another tab took over). */
  unsavedEdits: boolean;
  recovery: Recovery | null;
  editNotice: EditNotice | null;
  /** The project on screen was read from an older file format: what that changed, in words. */
  formatNotes: string[];
  /**
   * The document as it was last kept somewhere the person can get it back from: opened (a file,
   * a stored project, a share link, a new or starter project), saved as a file or in this
   * browser's projects, or exported (PDF, CSV, plot image). The document on screen differs from
   * it when there are edits a new opening would lose (see hasUnkeptEdits in commit.ts).
   */
  kept: Project | null;
}

export const initialSessionState: SessionState = {
  save: { kind: 'saved' },
  otherTabEditing: false,
  unsavedEdits: false,
  recovery: null,
  editNotice: null,
  formatNotes: [],
  kept: null,
};

export function createSessionStore() {
  return create<SessionState>()(() => ({ ...initialSessionState }));
}

export type SessionStore = ReturnType<typeof createSessionStore>;

export const useSessionStore: SessionStore = createSessionStore();
