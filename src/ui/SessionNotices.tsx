/**
 * What the person must know about their work, shown under the header until settled: a stored
 * project that had to be repaired on opening (with the stored text to download), an autosave
 * the browser refuses (with the project to download), another tab editing the project (with
 * "Edit here instead"), and what an edit carried along or why it was refused (with Undo).
 */
import type { Project } from '../core/index.ts';
import { projectFileName, serializeProject } from '../deliverables/projectFile.ts';
import { appSession } from '../state/appSession.ts';
import { dismissEditNotice, dismissFormatNotes, undoEdit } from '../state/commit.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { type Recovery, type SaveState, useSessionStore } from '../state/sessionStore.ts';
import { downloadBlob, fileStem } from './export/download.ts';
import './sessionNotices.css';

export function downloadProject(project: Project, suffix = ''): void {
  const name = projectFileName(project.title);
  downloadBlob(
    new Blob([serializeProject(project)], { type: 'application/json' }),
    suffix ? `${fileStem(name)}${suffix}.sagwright.json` : name,
  );
}

function DownloadProject({ label }: { label: string }) {
  return (
    <button type="button" onClick={() => downloadProject(useProjectStore.getState().project)}>
      {label}
    </button>
  );
}

function RecoveryNotice({ recovery }: { recovery: Recovery }) {
  const close = () => useSessionStore.setState({ recovery: null });
  const downloadOriginal = () =>
    downloadBlob(
      new Blob([recovery.original], { type: 'application/json' }),
      'autosave-as-stored.sagwright.json',
    );
  return (
    <section className="session-notice notice-warning" role="alert" aria-label="Stored project">
      <p>
        Your autosaved project could not be opened as it was stored:{' '}
        {recovery.issues
          .slice(0, 4)
          .map((i) => `${i.path} ${i.message}`)
          .join('; ')}
        {recovery.issues.length > 4 ? ` (and ${recovery.issues.length - 4} more)` : ''}.{' '}
        {recovery.openedDemo
          ? 'Nothing of it could be used, so the demo project is open.'
          : 'It is open with these changes:'}
      </p>
      {!recovery.openedDemo && (
        <ul>
          {recovery.changes.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      )}
      <p>The stored copy is kept as it was; download it to keep it safe or to send it to us.</p>
      <div className="actions">
        <button type="button" onClick={downloadOriginal}>
          Download the stored copy
        </button>
        <button type="button" onClick={close}>
          Dismiss
        </button>
      </div>
    </section>
  );
}

function SaveFailure({ save }: { save: Extract<SaveState, { kind: 'failed' }> }) {
  const why =
    save.reason === 'full'
      ? "this browser's storage for Sagwright is full"
      : 'this browser refuses to store it (storage switched off or blocked)';
  return (
    <section className="session-notice notice-error" role="alert" aria-label="Autosave">
      <p>
        Your changes are not being saved: {why}. They stay in this tab while it is open; download
        the project to keep them.
      </p>
      <div className="actions">
        <DownloadProject label="Download the project" />
        <button type="button" onClick={() => appSession()?.retrySave()}>
          Try saving again
        </button>
      </div>
    </section>
  );
}

function OtherTab({ unsaved }: { unsaved: boolean }) {
  return (
    <section className="session-notice notice-info" role="alert" aria-label="Another tab">
      {unsaved ? (
        <p>
          This project was taken over by another tab before your latest change here could be saved.
          Nothing is lost yet: keep this tab's version, download it, or load the other tab's.
        </p>
      ) : (
        <p>
          This project is being edited in another tab. Changes saved there appear here; to edit in
          this tab instead, take it over.
        </p>
      )}
      <div className="actions">
        {unsaved ? (
          <>
            <button type="button" onClick={() => appSession()?.takeOver({ keepMine: true })}>
              Edit here with this tab's version
            </button>
            <DownloadProject label="Download this tab's version" />
            <button type="button" onClick={() => appSession()?.takeOver()}>
              Edit here with the other tab's version
            </button>
          </>
        ) : (
          <button type="button" onClick={() => appSession()?.takeOver()}>
            Edit here instead
          </button>
        )}
      </div>
    </section>
  );
}

function EditNoticeView() {
  const notice = useSessionStore((s) => s.editNotice);
  if (!notice) return null;
  return (
    <section
      className={`session-notice ${notice.kind === 'refused' ? 'notice-warning' : 'notice-info'}`}
      role="status"
      aria-label="Last change"
    >
      <p>{notice.text}</p>
      <ul>
        {notice.details.map((d) => (
          <li key={d}>{d}</li>
        ))}
      </ul>
      <div className="actions">
        {notice.undoable && (
          <button type="button" onClick={() => undoEdit()}>
            Undo
          </button>
        )}
        <button type="button" onClick={() => dismissEditNotice()}>
          Dismiss
        </button>
      </div>
    </section>
  );
}

/** An older file was read: what its results now differ in, until dismissed. */
function FormatNotice() {
  const notes = useSessionStore((s) => s.formatNotes);
  if (notes.length === 0) return null;
  return (
    <section className="session-notice notice-info" role="status" aria-label="Older file">
      {notes.map((note) => (
        <p key={note}>{note}</p>
      ))}
      <div className="actions">
        <button type="button" onClick={() => dismissFormatNotes()}>
          Dismiss
        </button>
      </div>
    </section>
  );
}

export function SessionNotices() {
  const recovery = useSessionStore((s) => s.recovery);
  const save = useSessionStore((s) => s.save);
  const otherTab = useSessionStore((s) => s.otherTabEditing);
  const unsaved = useSessionStore((s) => s.unsavedEdits);
  return (
    <div className="session-notices">
      {recovery && <RecoveryNotice recovery={recovery} />}
      {save.kind === 'failed' && !otherTab && <SaveFailure save={save} />}
      {otherTab && <OtherTab unsaved={unsaved} />}
      <FormatNotice />
      <EditNoticeView />
    </div>
  );
}
