/**
 * The PDF report dialog: the design record (reference, client, site, who prepared, checked and
 * approved it and when, a new revision), the appendices to add and the paper size. The record is
 * saved in the project file's "report" block (one undo step) so the next report and the file
 * carry it; the report itself is built by the deliverables layer.
 */
import { type RefObject, useId, useState } from 'react';
import type { Project, ReportRecord, ReportRevision, ReportSignatory } from '../../core/index.ts';
import { validateProject } from '../../core/index.ts';
import { type AppendixChoice, NO_APPENDIX } from '../../deliverables/pdfAppendix.ts';
import type { PaperSize } from '../../deliverables/pdfReport.ts';
import { useModal } from './useModal.ts';

/** Where earlier versions remembered the client and site in this browser. */
const OLD_DETAILS_KEY = 'sagwright:report-details';
const ROLES = [
  ['preparedBy', 'Prepared by'],
  ['checkedBy', 'Checked by'],
  ['approvedBy', 'Approved by'],
] as const;
const APPENDICES: [keyof AppendixChoice, string][] = [
  ['setUpChart', 'Set-up chart (what to set on other days)'],
  ['movingLoads', 'Moving-load envelope, every check with the load’s worst position'],
  ['wireChoices', 'Wires considered (every wire that works, with its tension window)'],
  ['inputs', 'The project’s inputs in full'],
];

export interface ReportRequest {
  paper: PaperSize;
  appendix: AppendixChoice;
  /** The project with its record as the dialog left it (already checked). */
  project: Project;
}

function startingRecord(project: Project): ReportRecord {
  if (project.report) return project.report;
  try {
    const old = JSON.parse(localStorage.getItem(OLD_DETAILS_KEY) ?? '{}') as Record<
      string,
      unknown
    >;
    const text = (key: string) => (typeof old[key] === 'string' ? old[key].slice(0, 100) : '');
    return {
      client: text('client'),
      site: text('site'),
      reference: text('reference'),
      preparedBy: text('preparedBy') ? { name: text('preparedBy') } : undefined,
    };
  } catch {
    return {};
  }
}

/** The record without empty entries, so an untouched field never reaches the file. */
function cleaned(record: ReportRecord, revision: ReportRevision): ReportRecord {
  const out: ReportRecord = {};
  for (const key of ['reference', 'client', 'site'] as const) {
    const value = record[key]?.trim();
    if (value) out[key] = value;
  }
  for (const [key] of ROLES) {
    const person = record[key];
    const name = person?.name.trim() ?? '';
    if (name || person?.date) out[key] = { name, ...(person?.date ? { date: person.date } : {}) };
  }
  const revisions = [...(record.revisions ?? [])];
  if (revision.revision.trim() || revision.description.trim() || revision.date)
    revisions.push({ ...revision, revision: revision.revision.trim() });
  if (revisions.length) out.revisions = revisions;
  return out;
}

export function ReportDialog({
  project,
  busy,
  onCreate,
  onClose,
  returnFocus,
}: {
  project: Project;
  busy: boolean;
  onCreate: (request: ReportRequest) => void;
  onClose: () => void;
  returnFocus?: RefObject<HTMLElement | null>;
}) {
  const modal = useModal(onClose, returnFocus);
  const [record, setRecord] = useState(() => startingRecord(project));
  const [revision, setRevision] = useState<ReportRevision>({
    revision: '',
    date: '',
    description: '',
  });
  const [appendix, setAppendix] = useState<AppendixChoice>(NO_APPENDIX);
  const [issues, setIssues] = useState<string[]>([]);
  const [paper, setPaper] = useState<PaperSize>(() =>
    navigator.language === 'en-US' ? 'letter' : 'a4',
  );
  const id = useId();
  const person = (key: (typeof ROLES)[number][0]): ReportSignatory => record[key] ?? { name: '' };
  const submit = (event: React.FormEvent) => {
    event.preventDefault();
    const report = cleaned(record, revision);
    const next: Project = { ...project, report };
    if (Object.keys(report).length === 0) delete next.report;
    const checked = validateProject(next);
    if (!checked.ok) {
      setIssues(checked.issues.map((i) => `${i.path}: ${i.message}`));
      return;
    }
    setIssues([]);
    onCreate({ paper, appendix, project: next });
  };
  const text = (key: 'reference' | 'client' | 'site', label: string) => (
    <label>
      {label}
      <input
        value={record[key] ?? ''}
        maxLength={key === 'reference' ? 100 : 200}
        onChange={(event) => setRecord({ ...record, [key]: event.target.value })}
      />
    </label>
  );
  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      className="export-dialog report-dialog"
      aria-labelledby={`${id}-title`}
    >
      <form onSubmit={submit}>
        <h2 id={`${id}-title`}>PDF report</h2>
        <p className="muted">
          Saved in the project file, so the next report and the file carry it.
        </p>
        {text('reference', 'Project reference')}
        {text('client', 'Client')}
        {text('site', 'Site')}
        <fieldset className="report-people">
          <legend>Record</legend>
          {ROLES.map(([key, role]) => (
            <div key={key} className="report-person">
              <label>
                {role}
                <input
                  value={person(key).name}
                  maxLength={100}
                  onChange={(event) =>
                    setRecord({ ...record, [key]: { ...person(key), name: event.target.value } })
                  }
                />
              </label>
              <label>
                {`${role}: date`}
                <input
                  type="date"
                  value={person(key).date ?? ''}
                  onChange={(event) =>
                    setRecord({
                      ...record,
                      [key]: { ...person(key), date: event.target.value || undefined },
                    })
                  }
                />
              </label>
            </div>
          ))}
        </fieldset>
        <fieldset className="report-revision">
          <legend>
            New revision (
            {record.revisions?.length
              ? `last: ${record.revisions[record.revisions.length - 1].revision}`
              : 'none yet'}
            )
          </legend>
          <label>
            Revision
            <input
              value={revision.revision}
              maxLength={20}
              onChange={(event) => setRevision({ ...revision, revision: event.target.value })}
            />
          </label>
          <label>
            Revision date
            <input
              type="date"
              value={revision.date}
              onChange={(event) => setRevision({ ...revision, date: event.target.value })}
            />
          </label>
          <label>
            What changed
            <input
              value={revision.description}
              maxLength={300}
              onChange={(event) => setRevision({ ...revision, description: event.target.value })}
            />
          </label>
        </fieldset>
        <fieldset>
          <legend>Appendices</legend>
          {APPENDICES.filter(
            ([key]) => key !== 'movingLoads' || project.loads.some((l) => l.type === 'moving'),
          ).map(([key, label]) => (
            <label key={key}>
              <input
                type="checkbox"
                checked={appendix[key]}
                onChange={(event) => setAppendix({ ...appendix, [key]: event.target.checked })}
              />
              {label}
            </label>
          ))}
        </fieldset>
        <fieldset>
          <legend>Paper</legend>
          {(['a4', 'letter'] as const).map((size) => (
            <label key={size}>
              <input
                type="radio"
                name={`${id}-paper`}
                checked={paper === size}
                onChange={() => setPaper(size)}
              />
              {size === 'a4' ? 'A4' : 'US Letter'}
            </label>
          ))}
        </fieldset>
        {issues.length > 0 && (
          <ul role="alert" className="report-issues">
            {issues.map((issue) => (
              <li key={issue}>{issue}</li>
            ))}
          </ul>
        )}
        <div className="export-dialog-actions">
          <button type="submit" disabled={busy}>
            {busy ? 'Making the report…' : 'Create PDF'}
          </button>
          <button type="button" onClick={onClose}>
            Cancel
          </button>
        </div>
      </form>
    </dialog>
  );
}
