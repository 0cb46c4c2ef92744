/**
 * The header's file and export menu: a new project (blank or a starter), save and open project
 * files, share link, projects in this browser, PDF report, plot images, CSV and the client view;
 * plus the shared-project banner. Refused files list the field paths and leave the open project
 * as it was. Opening anything over edits not kept (hasUnkeptEdits) asks first.
 */
import { lazy, Suspense, useEffect, useMemo, useRef, useState } from 'react';
import './export.css';
import type { Project, ProjectResults } from '../../core/index.ts';
import { type OpenResult, PROJECT_FILE_EXTENSION } from '../../deliverables/projectFile.ts';
import { commit, commitOpened, hasUnkeptEdits, markKept } from '../../state/commit.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import type { Starter } from '../../state/starters.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { ConfirmReplaceDialog, type ReplaceQuestion } from './ConfirmReplaceDialog.tsx';
import { ExportNotice, type Notice, SharedBanner } from './ExportNotices.tsx';
import { useSharedProject } from './useSharedProject.ts';

// The dialogs load when first opened, so the first screen does not wait for their code.
const ClientView = lazy(() => import('./ClientView.tsx').then((m) => ({ default: m.ClientView })));
/** What the menu items do: loaded on first use (and when the menu opens). */
const loadActions = () => import('./exportActions.ts');
const LibraryDialog = lazy(() =>
  import('./LibraryDialog.tsx').then((m) => ({ default: m.LibraryDialog })),
);
const ReportDialog = lazy(() =>
  import('./ReportDialog.tsx').then((m) => ({ default: m.ReportDialog })),
);
const NewProjectDialog = lazy(() =>
  import('./NewProjectDialog.tsx').then((m) => ({ default: m.NewProjectDialog })),
);

/** How long a plain status from the menu stays on screen. */
const STATUS_MS = 12_000;

type Dialog = 'none' | 'new' | 'report' | 'library' | 'client';

/** The report dialog's record goes into the document (one undo step) before the report is made. */
function saveRecord(withRecord: Project) {
  const current = useProjectStore.getState().project;
  if (JSON.stringify(current.report) === JSON.stringify(withRecord.report))
    return { ok: true as const, project: current };
  return commit(
    (current) => {
      const next: Project = { ...current, report: withRecord.report };
      if (!withRecord.report) delete next.report;
      return next;
    },
    { what: 'Report record' },
  );
}

/** Escape or a click elsewhere closes the open menu; Escape also puts focus back on its button. */
function useMenuDismiss(
  open: boolean,
  close: () => void,
  root: React.RefObject<HTMLElement | null>,
  button: React.RefObject<HTMLElement | null>,
) {
  useEffect(() => {
    if (!open) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      close();
      button.current?.focus();
    };
    const onPointer = (event: PointerEvent) => {
      if (!root.current?.contains(event.target as Node)) close();
    };
    document.addEventListener('keydown', onKey);
    document.addEventListener('pointerdown', onPointer);
    return () => {
      document.removeEventListener('keydown', onKey);
      document.removeEventListener('pointerdown', onPointer);
    };
  }, [open, close, root, button]);
}

/** The client view's results, solved on the spot for the open document while it is shown. */
function useClientResults(shown: boolean, project: Project): ProjectResults | null {
  const [solved, setSolved] = useState<{ project: Project; results: ProjectResults } | null>(null);
  useEffect(() => {
    if (!shown) return;
    let current = true;
    loadActions().then((actions) => {
      if (current) setSolved({ project, results: actions.solved(project) });
    });
    return () => {
      current = false;
    };
  }, [shown, project]);
  return shown && solved?.project === project ? solved.results : null;
}

export function ExportMenu() {
  const project = useProjectStore((s) => s.project);
  const units = useUiStore((s) => s.unitSystem);
  const [open, setOpen] = useState(false);
  const [dialog, setDialog] = useState<Dialog>('none');
  const [busy, setBusy] = useState(false);
  const [notice, setNotice] = useState<Notice>(null);
  const [question, setQuestion] = useState<ReplaceQuestion | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const menuButton = useRef<HTMLButtonElement>(null);
  const root = useRef<HTMLDivElement>(null);
  const shared = useSharedProject();
  const closeMenu = useMemo(() => () => setOpen(false), []);
  const closeDialog = useMemo(() => () => setDialog('none'), []);
  useMenuDismiss(open, closeMenu, root, menuButton);
  const clientResults = useClientResults(dialog === 'client', project);
  useEffect(() => {
    if (open) void loadActions();
  }, [open]);
  // A plain status ("The plot PNG was saved.") floats over the page's edge: it goes by itself
  // after a while. Refusals and a link to copy stay until dismissed.
  useEffect(() => {
    if (notice?.kind !== 'status') return;
    const timer = setTimeout(() => setNotice((now) => (now === notice ? null : now)), STATUS_MS);
    return () => clearTimeout(timer);
  }, [notice]);

  /**
   * `what` names the file made, e.g. "The plot SVG"; once it is made, `exported` (the document
   * written into it) counts as kept.
   */
  const run =
    (what: string, work: () => unknown, exported: Project = project) =>
    async () => {
      setOpen(false);
      menuButton.current?.focus();
      setNotice(null); // "Working…" takes the notice's place under the button
      setBusy(true);
      try {
        await work();
        markKept(exported);
        setNotice({ kind: 'status', text: `${what} was saved.` });
      } catch (error) {
        setNotice({
          kind: 'refused',
          title: `${what} could not be made`,
          issues: [{ path: '', message: error instanceof Error ? error.message : String(error) }],
        });
      } finally {
        setBusy(false);
      }
    };
  const show = (next: Dialog) => () => {
    setOpen(false);
    setDialog(next);
  };
  const copyLink = async () => {
    setOpen(false);
    menuButton.current?.focus();
    const actions = await loadActions();
    const url = actions.shareLinkFor(project);
    const copied = await actions.copyText(url);
    setNotice(
      copied
        ? { kind: 'status', text: 'Share link copied to the clipboard.' }
        : { kind: 'link', url },
    );
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
    const opened = result.project;
    whenReplaceable(`“${opened.title}”`, () => {
      const committed = commitOpened(opened, undefined, result.notes);
      if (!committed.ok) {
        setNotice({
          kind: 'refused',
          title: `${source} was not opened; your project is unchanged`,
          issues: committed.issues,
        });
        return;
      }
      setDialog('none');
      setNotice({ kind: 'status', text: `Opened “${opened.title}”.` });
    });
  };
  /** Open now, or ask first when the project on screen has edits not kept anywhere. */
  const whenReplaceable = (what: string, open: () => void) => {
    if (hasUnkeptEdits()) setQuestion({ what, proceed: open });
    else open();
  };
  const startFrom = (starter: Starter) =>
    applyOpened({ ok: true, project: starter.project, notes: [] }, `“${starter.name}”`);
  const onFile = async (event: React.ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (file) applyOpened(await (await loadActions()).openProjectFile(file), `“${file.name}”`);
  };

  const items: [string, () => void][] = [
    ['New project…', show('new')],
    [
      'Save file',
      run('The project file', async () => (await loadActions()).saveProjectFile(project)),
    ],
    [
      'Open file…',
      () => {
        setOpen(false);
        fileInput.current?.click();
      },
    ],
    ['Copy share link', copyLink],
    ['Projects in this browser…', show('library')],
    ['PDF report…', show('report')],
    [
      'Plot as PNG',
      run('The plot PNG', async () =>
        (await loadActions()).savePlotImage(project, units, 'png', 1),
      ),
    ],
    [
      'Plot as PNG, 2× for slides',
      run('The 2× plot PNG', async () =>
        (await loadActions()).savePlotImage(project, units, 'png', 2),
      ),
    ],
    [
      'Plot as SVG',
      run('The plot SVG', async () =>
        (await loadActions()).savePlotImage(project, units, 'svg', 1),
      ),
    ],
    [
      'Wire profiles as CSV',
      run('The wire profiles CSV', async () => (await loadActions()).saveCsv(project, units)),
    ],
    ['Client view', show('client')],
  ];

  return (
    <div className="export-menu" ref={root}>
      <p className="print-title">{project.title}</p>
      <button
        ref={menuButton}
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
      {busy && (
        <p role="status" className="export-notice">
          Working…
        </p>
      )}
      <ExportNotice notice={notice} onDismiss={() => setNotice(null)} />
      <SharedBanner
        state={shared.state}
        onKeep={shared.keep}
        onGoBack={shared.goBack}
        onDismiss={shared.dismiss}
      />
      <Suspense fallback={null}>
        {dialog === 'report' && (
          <ReportDialog
            project={project}
            busy={busy}
            returnFocus={menuButton}
            onClose={closeDialog}
            onCreate={(request) => {
              const saved = saveRecord(request.project);
              if (!saved.ok) {
                setNotice({
                  kind: 'refused',
                  title: 'The report record was not saved',
                  issues: saved.issues,
                });
                return;
              }
              run(
                'The PDF report',
                async () =>
                  (await loadActions()).saveReport({ ...request, project: saved.project }, units),
                saved.project,
              )().then(closeDialog);
            }}
          />
        )}
        {dialog === 'library' && (
          <LibraryDialog
            project={project}
            returnFocus={menuButton}
            onOpened={(r) => applyOpened(r, 'The saved project')}
            onClose={closeDialog}
          />
        )}
        {dialog === 'new' && (
          <NewProjectDialog returnFocus={menuButton} onChoose={startFrom} onClose={closeDialog} />
        )}
        {dialog === 'client' && clientResults && (
          <ClientView
            project={project}
            results={clientResults}
            units={units}
            returnFocus={menuButton}
            onClose={closeDialog}
          />
        )}
      </Suspense>
      {question && (
        <ConfirmReplaceDialog
          question={question}
          current={project.title}
          onClose={() => setQuestion(null)}
        />
      )}
    </div>
  );
}
