/**
 * The header's file and export menu: save and open project files, share link, projects in this
 * browser, PDF report, plot images, CSV and the client view; plus the shared-project banner.
 * Refused files list the field paths and leave the open project as it was.
 */
import { useRef, useState } from 'react';
import './export.css';
import type { ValidationIssue } from '../../core/index.ts';
import {
  describeIssues,
  type OpenResult,
  PROJECT_FILE_EXTENSION,
} from '../../deliverables/projectFile.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { ClientView } from './ClientView.tsx';
import * as actions from './exportActions.ts';
import { LibraryDialog } from './LibraryDialog.tsx';
import { ReportDialog } from './ReportDialog.tsx';
import { useSharedProject } from './useSharedProject.ts';

type Dialog = 'none' | 'report' | 'library' | 'client';
type Notice =
  | { kind: 'status'; text: string }
  | { kind: 'refused'; title: string; issues: ValidationIssue[] }
  | null;

export function ExportMenu() {
  const project = useProjectStore((s) => s.project);
  const setProject = useProjectStore((s) => s.setProject);
  const units = useUiStore((s) => s.unitSystem);
  const [open, setOpen] = useState(false);
  const [dialog, setDialog] = useState<Dialog>('none');
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const shared = useSharedProject();

  const run = (label: string, work: () => unknown) => async () => {
    setOpen(false);
    setBusy(true);
    try {
      await work();
      setNotice({ kind: 'status', text: `${label}: done.` });
    } catch (error) {
      setNotice({
        kind: 'refused',
        title: `${label} failed`,
        issues: [{ path: '', message: error instanceof Error ? error.message : String(error) }],
      });
    } finally {
      setBusy(false);
    }
  };
  const applyOpened = (result: OpenResult, source: string) => {
    if (!result.ok) {
      setNotice({
        kind: 'refused',
        title: `${source} was not opened; your project is unchanged`,
        issues: result.issues,
      });
      return;
    }
    setProject(result.project);
    setDialog('none');
    setNotice({ kind: 'status', text: `Opened “${result.project.title}”.` });
  };
  const onFile = async (event: React.ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (file) applyOpened(await actions.openProjectFile(file), `“${file.name}”`);
  };

  const items: [string, () => void][] = [
    ['Save file', run('Save file', () => actions.saveProjectFile(project))],
    [
      'Open file…',
      () => {
        setOpen(false);
        fileInput.current?.click();
      },
    ],
    ['Copy share link', run('Share link copied', () => actions.copyShareLink(project))],
    [
      'Projects in this browser…',
      () => {
        setOpen(false);
        setDialog('library');
      },
    ],
    [
      'PDF report…',
      () => {
        setOpen(false);
        setDialog('report');
      },
    ],
    ['Plot as PNG', run('PNG', () => actions.savePlotImage(project, units, 'png', 1))],
    [
      'Plot as PNG, 2× for slides',
      run('PNG 2×', () => actions.savePlotImage(project, units, 'png', 2)),
    ],
    ['Plot as SVG', run('SVG', () => actions.savePlotImage(project, units, 'svg', 1))],
    ['Wire profiles as CSV', run('CSV', () => actions.saveCsv(project, units))],
    [
      'Client view',
      () => {
        setOpen(false);
        setDialog('client');
      },
    ],
  ];

  return (
    <div className="export-menu">
      <button
        type="button"
        aria-expanded={open}
        aria-controls="export-menu-items"
        onClick={() => setOpen(!open)}
      >
        File and export
      </button>
      <input
        ref={fileInput}
        type="file"
        hidden
        aria-label="Project file to open"
        accept={`${PROJECT_FILE_EXTENSION},.json,application/json`}
        onChange={onFile}
      />
      {open && (
        <ul id="export-menu-items" className="export-menu-items">
          {items.map(([label, onClick]) => (
            <li key={label}>
              <button type="button" onClick={onClick} disabled={busy}>
                {label}
              </button>
            </li>
          ))}
        </ul>
      )}
      {busy && <p role="status">Working…</p>}
      {notice?.kind === 'status' && (
        <p role="status" className="export-notice">
          {notice.text}
        </p>
      )}
      {notice?.kind === 'refused' && (
        <div role="alert" className="export-notice export-refused">
          <p>{notice.title}:</p>
          <ul>
            {describeIssues(notice.issues).map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          <button type="button" onClick={() => setNotice(null)}>
            Dismiss
          </button>
        </div>
      )}
      {shared.state.kind === 'viewing' && (
        <section aria-label="Shared project" className="share-banner">
          Viewing a shared project, “{shared.state.title}”. Your own work is kept until you choose.
          <button type="button" onClick={shared.keep}>
            Keep it
          </button>
          <button type="button" onClick={shared.goBack}>
            Go back to mine
          </button>
        </section>
      )}
      {shared.state.kind === 'refused' && (
        <div role="alert" className="export-notice export-refused">
          <p>The shared link was not opened; your project is unchanged:</p>
          <ul>
            {describeIssues(shared.state.issues).map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          <button type="button" onClick={shared.dismiss}>
            Dismiss
          </button>
        </div>
      )}
      {dialog === 'report' && (
        <ReportDialog
          busy={busy}
          onClose={() => setDialog('none')}
          onCreate={(paper, details) => {
            run('PDF report', () => actions.saveReport(project, units, paper, details))().then(() =>
              setDialog('none'),
            );
          }}
        />
      )}
      {dialog === 'library' && (
        <LibraryDialog
          project={project}
          onOpened={(r) => applyOpened(r, 'The saved project')}
          onClose={() => setDialog('none')}
        />
      )}
      {dialog === 'client' && (
        <ClientView
          project={project}
          results={actions.solved(project)}
          units={units}
          onClose={() => setDialog('none')}
        />
      )}
    </div>
  );
}
