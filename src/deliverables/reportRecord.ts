/**
 * The report's record: the project's optional "report" block (reference, client, site, who
 * prepared, checked and approved it, revisions) as the PDF prints it, with the Sagwright
 * version and the project file's fingerprint, so a paper copy can be matched to its file.
 */
import type { Project, ReportRecord, ReportRevision } from '../core/index.ts';
import { projectFingerprint } from './fingerprint.ts';
import type { Table } from './reportContent.ts';

export const SIGNATORY_ROLES = [
  ['preparedBy', 'Prepared by'],
  ['checkedBy', 'Checked by'],
  ['approvedBy', 'Approved by'],
] as const;

export function currentRevision(record: ReportRecord | undefined): ReportRevision | undefined {
  const list = record?.revisions ?? [];
  return list[list.length - 1];
}

/** "Rev. B" from the last revision, "Draft (no revision recorded)" without one. */
export function revisionLabel(record: ReportRecord | undefined): string {
  const current = currentRevision(record);
  return current ? `Rev. ${current.revision}` : 'Draft, no revision recorded';
}

export function revisionTable(record: ReportRecord | undefined): Table {
  const list = record?.revisions ?? [];
  return {
    head: ['Revision', 'Date', 'What changed'],
    rows: list.length
      ? list.map((r) => [r.revision, r.date, r.description])
      : [['-', '-', 'No revision recorded yet: add one in the report dialog before issuing.']],
  };
}

/** Reference, client, site, version and fingerprint as label–value pairs. */
export function recordFacts(
  project: Project,
  appVersion: string,
  generatedAt: Date,
): [string, string][] {
  const r = project.report ?? {};
  const clientSite = [r.client?.trim(), r.site?.trim()].filter(Boolean).join(', ');
  return [
    ['Reference', r.reference?.trim() || 'not given'],
    ['Client, site', clientSite || 'not given'],
    ['Made with', `Sagwright ${appVersion}, ${generatedAt.toISOString().slice(0, 10)}`],
    ['File fingerprint', `${projectFingerprint(project)} (SHA-256 of its canonical JSON)`],
  ];
}
