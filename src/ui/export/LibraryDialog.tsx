/**
 * Projects kept in this browser: save the open project, and open, rename, duplicate or delete
 * the saved ones (delete offers Undo). Opening goes through the same checks as a file.
 */
import { useCallback, useEffect, useId, useMemo, useState } from 'react';
import type { Project } from '../../core/index.ts';
import type { OpenResult } from '../../deliverables/projectFile.ts';
import {
  browserLibraryStorage,
  type LibraryEntry,
  type LibraryRecord,
  ProjectLibrary,
} from '../../deliverables/projectLibrary.ts';

const when = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

export function LibraryDialog({
  project,
  onOpened,
  onClose,
}: {
  project: Project;
  onOpened: (result: OpenResult) => void;
  onClose: () => void;
}) {
  const library = useMemo(() => new ProjectLibrary(browserLibraryStorage()), []);
  const [entries, setEntries] = useState<LibraryEntry[]>([]);
  const [deleted, setDeleted] = useState<LibraryRecord | null>(null);
  const [renaming, setRenaming] = useState<{ id: string; title: string } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const id = useId();
  const refresh = useCallback(() => library.list().then(setEntries), [library]);
  useEffect(() => {
    refresh().catch(() => setProblem('This browser does not allow saving projects here.'));
  }, [refresh]);

  const act = (work: () => Promise<unknown>) => () =>
    work()
      .then(refresh)
      .catch((error: unknown) =>
        setProblem(error instanceof Error ? error.message : String(error)),
      );

  return (
    <div className="export-dialog" role="dialog" aria-modal="true" aria-labelledby={`${id}-title`}>
      <h2 id={`${id}-title`}>Projects in this browser</h2>
      <button type="button" onClick={act(() => library.save(project))}>
        Save the open project here
      </button>
      {problem && <p role="alert">{problem}</p>}
      {deleted && (
        <p role="status">
          Deleted “{deleted.title}”.{' '}
          <button
            type="button"
            onClick={act(async () => {
              await library.restore(deleted);
              setDeleted(null);
            })}
          >
            Undo
          </button>
        </p>
      )}
      {entries.length === 0 ? (
        <p className="muted">No projects saved in this browser yet.</p>
      ) : (
        <ul aria-label="Saved projects" className="library-list">
          {entries.map((entry) => (
            <li key={entry.id}>
              {renaming?.id === entry.id ? (
                <form
                  onSubmit={(event) => {
                    event.preventDefault();
                    act(() =>
                      library.rename(entry.id, renaming.title).then(() => setRenaming(null)),
                    )();
                  }}
                >
                  <label>
                    New title
                    <input
                      value={renaming.title}
                      maxLength={200}
                      onChange={(e) => setRenaming({ id: entry.id, title: e.target.value })}
                    />
                  </label>
                  <button type="submit">Rename</button>
                </form>
              ) : (
                <span className="library-title">{entry.title}</span>
              )}
              <span className="muted"> {when.format(new Date(entry.savedAt))} </span>
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
                onClick={() => setRenaming({ id: entry.id, title: entry.title })}
              >
                Rename
              </button>
              <button
                type="button"
                aria-label={`Duplicate ${entry.title}`}
                onClick={act(() => library.duplicate(entry.id))}
              >
                Duplicate
              </button>
              <button
                type="button"
                aria-label={`Delete ${entry.title}`}
                onClick={act(async () => setDeleted(await library.remove(entry.id)))}
              >
                Delete
              </button>
            </li>
          ))}
        </ul>
      )}
      <button type="button" onClick={onClose}>
        Close
      </button>
    </div>
  );
}
