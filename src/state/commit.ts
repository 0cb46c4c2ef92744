/**
 * The one way an edit reaches the document. An edit is applied to a copy; removals carry their
 * dependants along (dependants.ts); the copy is validated by the core; only a valid copy is
 * committed, as one undo step. Otherwise the document stays as it was and the refusal comes back
 * with the rule. While another tab holds the document, edits here are refused with that reason.
 */
import { type Project, type ValidationIssue, validateProject } from '../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../core/units.ts';
import { carryDependants } from './dependants.ts';
import { issueLine } from './fieldNames.ts';
import { type ProjectStore, useProjectStore } from './projectStore.ts';
import { type SessionStore, useSessionStore } from './sessionStore.ts';
import { useUiStore } from './uiStore.ts';

export type Edit = (project: Project) => Project;

export interface CommitOptions {
  /** Keystrokes with the same key within a short time make one undo step (a field's path). */
  mergeKey?: string;
  /**
   * The edits of one gesture (a drag on the plot) that share `mergeKey` make one undo step
   * however long apart they are.
   */
  gesture?: boolean;
  /** Carry dependants along (a removal); the changes are told in a notice with Undo. */
  carry?: boolean;
  /** Index of a fixing being removed, so a sag target can follow its span. */
  removedSupport?: number;
  /** What the edit does, as the button says it, for the notice ("Remove Garage"). */
  what?: string;
}

export type CommitOutcome =
  | { ok: true; project: Project; changes: string[] }
  | { ok: false; reason: 'otherTab' | 'invalid'; issues: ValidationIssue[] };

export const OTHER_TAB_RULE =
  'this project is being edited in another tab; choose "Edit here instead" to edit it in this one';

export interface Workbench {
  store: ProjectStore;
  session: SessionStore;
  unitSystem: () => UnitSystem;
}

const appWorkbench: Workbench = {
  store: useProjectStore,
  session: useSessionStore,
  unitSystem: () => useUiStore.getState().unitSystem,
};

function lengthIn(units: UnitSystem) {
  return (m: number) =>
    `${Number(fromSi(m, 'length', units).toPrecision(6))} ${unitSymbol('length', units)}`;
}

/** Validate `edit` against the current document and commit it, or refuse and change nothing. */
export function commit(
  edit: Edit,
  options: CommitOptions = {},
  bench: Workbench = appWorkbench,
): CommitOutcome {
  if (bench.session.getState().otherTabEditing)
    return { ok: false, reason: 'otherTab', issues: [{ path: '', message: OTHER_TAB_RULE }] };
  const before = bench.store.getState().project;
  let candidate = edit(before);
  let changes: string[] = [];
  if (options.carry) {
    const carried = carryDependants(before, candidate, {
      removedSupport: options.removedSupport,
      describeLength: lengthIn(bench.unitSystem()),
    });
    candidate = carried.project;
    changes = carried.changes;
  }
  const checked = validateProject(candidate);
  if (!checked.ok) return { ok: false, reason: 'invalid', issues: checked.issues };
  bench.store
    .getState()
    .setProject(
      candidate,
      options.mergeKey,
      options.gesture ? Number.POSITIVE_INFINITY : undefined,
    );
  if (options.carry)
    bench.session.setState({
      editNotice:
        changes.length > 0
          ? {
              kind: 'carried',
              text: `“${options.what ?? 'That change'}” also changed:`,
              details: changes,
              undoable: true,
            }
          : null,
    });
  return { ok: true, project: candidate, changes };
}

/**
 * Commit a button's edit (add, remove, duplicate). A refusal is told in the edit notice, in the
 * words of the rule, naming the field as the workbench shows it, with the field path kept last.
 */
export function commitAction(
  edit: Edit,
  options: CommitOptions = {},
  bench: Workbench = appWorkbench,
): CommitOutcome {
  const outcome = commit(edit, { carry: true, ...options }, bench);
  if (!outcome.ok)
    bench.session.setState({
      editNotice: {
        kind: 'refused',
        text: `“${options.what ?? 'That change'}” was refused; your project is unchanged:`,
        details: outcome.issues.map((i) =>
          issueLine(bench.store.getState().project, i, bench.unitSystem()),
        ),
        undoable: false,
      },
    });
  return outcome;
}

/**
 * Open a whole project (a file, a stored project, a share link, a new or starter project) in one
 * step. Opening is not an edit: the undo history starts afresh with it (there is nothing to undo
 * right after opening, and undo never brings back what was on screen before: the UI asks before
 * opening over edits not kept, see hasUnkeptEdits). The opened document counts as kept.
 * `formatNotes` says what reading an older file format changed (shown until dismissed or
 * another project is opened).
 */
export function commitOpened(
  project: Project,
  bench: Workbench = appWorkbench,
  formatNotes: readonly string[] = [],
): CommitOutcome {
  if (bench.session.getState().otherTabEditing)
    return { ok: false, reason: 'otherTab', issues: [{ path: '', message: OTHER_TAB_RULE }] };
  const checked = validateProject(project);
  if (!checked.ok) return { ok: false, reason: 'invalid', issues: checked.issues };
  bench.session.setState({ kept: project, formatNotes: [...formatNotes], editNotice: null });
  bench.store.getState().resetProject(project);
  return { ok: true, project, changes: [] };
}

/**
 * The document was kept where the person can get it back (saved as a file or in this
 * browser's projects, or exported): opening another project over it need not ask.
 */
export function markKept(project: Project, bench: Workbench = appWorkbench): void {
  bench.session.setState({ kept: project });
}

/**
 * True when the document on screen has edits since it was last opened, saved or exported:
 * opening another project over it asks first. Undoing back to the kept document counts as no
 * edits (the store keeps the very same object).
 */
export function hasUnkeptEdits(bench: Workbench = appWorkbench): boolean {
  return bench.store.getState().project !== bench.session.getState().kept;
}

export function dismissFormatNotes(bench: Workbench = appWorkbench): void {
  bench.session.setState({ formatNotes: [] });
}

export function dismissEditNotice(bench: Workbench = appWorkbench): void {
  bench.session.setState({ editNotice: null });
}

/** Undo and redo are edits too: refused while another tab holds the document. */
export function undoEdit(bench: Workbench = appWorkbench): void {
  if (bench.session.getState().otherTabEditing) return;
  bench.session.setState({ editNotice: null });
  bench.store.undo();
}

export function redoEdit(bench: Workbench = appWorkbench): void {
  if (bench.session.getState().otherTabEditing) return;
  bench.store.redo();
}
