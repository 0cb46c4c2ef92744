/**
 * Projects kept in this browser: save the open project, and open, rename, duplicate or delete
 * the saved ones (delete offers Undo). Opening goes through the same checks as a file.
 */
import { type RefObject, useCallback, useEffect, useId, useMemo, useState } from 'react';
import type { Project } from '../../core/index.ts';
import type { OpenResult } from '../../deliverables/projectFile.ts';
import {
  browserLibraryStorage,
  type LibraryEntry,
  type LibraryRecord,
  ProjectLibrary,
  TITLE_MAX_CHARS,
} from '../../deliverables/projectLibrary.ts';
import { markKept } from '../../state/commit.ts';
import { useModal } from './useModal.ts';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function RenameForm({
  entry,
  onRename,
  onCancel,
}: {
  entry: LibraryEntry;
  onRename: (title: string) => void;
  onCancel: () => void;
}) {
  const [title, setTitle] = useState(entry.title);
  return (
    <form
      className="library-rename"
      onSubmit={(event) => {
        event.preventDefault();
        onRename(title);
      }}
    >
      <label>
        New title for “{entry.title}”
        <input
          // biome-ignore lint/a11y/noAutofocus: the person just asked to rename this entry
          autoFocus
          value={title}
          maxLength={TITLE_MAX_CHARS}
          onChange={(event) => setTitle(event.target.value)}
          onKeyDown={(event) => {
            if (event.key !== 'Escape') return;
            // Escape leaves the renaming, not the whole dialog.
            event.preventDefault();
            event.stopPropagation();
            onCancel();
          }}
        />
      </label>
      <div className="library-actions">
        <button type="submit">Save title</button>
        <button type="button" onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}

export function LibraryDialog({
  project,
  onOpened,
  onClose,
  returnFocus,
}: {
  project: Project;
  onOpened: (result: OpenResult) => void;
  onClose: () => void;
  returnFocus?: RefObject<HTMLElement | null>;
}) {
  const library = useMemo(() => new ProjectLibrary(browserLibraryStorage()), []);
  const [entries, setEntries] = useState<LibraryEntry[] | null>(null);
  const [deleted, setDeleted] = useState<LibraryRecord | null>(null);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [refocus, setRefocus] = useState<string | null>(null);
  const id = useId();
  const modal = useModal(onClose, returnFocus);
  const refresh = useCallback(() => library.list().then(setEntries), [library]);
  useEffect(() => {
    refresh().catch(() => setProblem('This browser does not allow saving projects here.'));
  }, [refresh]);
  // After renaming ends, the keyboard focus goes back to that entry's Rename button.
  useEffect(() => {
    if (!refocus || renaming) return;
    const button = modal.ref.current?.querySelector<HTMLElement>(`[data-rename="${refocus}"]`);
    if (button) {
      button.focus();
      setRefocus(null);
    }
  });
  const endRename = (entryId: string) => {
    setRenaming(null);
    setRefocus(entryId);
  };

  const act = (work: () => Promise<unknown>) => () => {
    setProblem(null);
    work()
      .then(refresh)
      .catch((error: unknown) =>
        setProblem(error instanceof Error ? error.message : String(error)),
      );
  };

  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      className="export-dialog library-dialog"
      aria-labelledby={`${id}-title`}
    >
      <div className="library-head">
        <h2 id={`${id}-title`}>Projects in this browser</h2>
        <button type="button" onClick={onClose}>
          Close
        </button>
      </div>
      <p className="muted">
        Kept in this browser on this computer only. Save a file to move a project elsewhere.
      </p>
      <button
        type="button"
        className="library-save"
        data-autofocus
        onClick={act(async () => {
          setDeleted(null);
          setDone(`Saved “${(await library.save(project)).title}”.`);
          markKept(project);
        })}
      >
        Save the open project here
      </button>
      {problem && <p role="alert">{problem}</p>}
      <p role="status" className="library-status">
        {deleted ? (
          <>
            Deleted “{deleted.title}”.{' '}
            <button
              type="button"
              // biome-ignore lint/a11y/noAutofocus: the Delete button just went away; Undo takes its place
              autoFocus
              onClick={act(async () => {
                await library.restore(deleted);
                setDeleted(null);
              })}
            >
              Undo
            </button>
          </>
        ) : (
          done
        )}
      </p>
      {entries?.length === 0 && <p className="muted">No projects saved in this browser yet.</p>}
      {entries && entries.length > 0 && (
        <ul aria-label="Saved projects" className="library-list">
          {entries.map((entry) => (
            <li key={entry.id}>
              {renaming === entry.id ? (
                <RenameForm
                  entry={entry}
                  onCancel={() => endRename(entry.id)}
                  onRename={(title) =>
                    act(async () => {
                      const renamed = await library.rename(entry.id, title);
                      setDeleted(null);
                      setDone(`Renamed to “${renamed.title}”.`);
                      endRename(entry.id);
                    })()
                  }
                />
              ) : (
                <>
                  <div className="library-entry">
                    <span className="library-title">{entry.title}</span>
                    <span className="muted">
                      Saved{' '}
                      <time dateTime={entry.savedAt}>{when.format(new Date(entry.savedAt))}</time>
                    </span>
                  </div>
                  <div className="library-actions">
                    <button
                      type="button"
                      aria-label={`Open ${entry.title}`}
                      onClick={() => library.open(entry.id).then(onOpened)}
                    >
                      Open
                    </button>
                    <button
                      type="button"
                      aria-label={`Rename ${entry.title}`}
                      data-rename={entry.id}
                      onClick={() => setRenaming(entry.id)}
                    >
                      Rename
                    </button>
                    <button
                      type="button"
                      aria-label={`Duplicate ${entry.title}`}
                      onClick={act(async () => {
                        setDeleted(null);
                        setDone(`Made “${(await library.duplicate(entry.id)).title}”.`);
                      })}
                    >
                      Duplicate
                    </button>
                    <button
                      type="button"
                      aria-label={`Delete ${entry.title}`}
                      onClick={act(async () => {
                        setDone(null);
                        setDeleted(await library.remove(entry.id));
                      })}
                    >
                      Delete
                    </button>
                  </div>
                </>
              )}
            </li>
          ))}
        </ul>
      )}
    </dialog>
  );
}
