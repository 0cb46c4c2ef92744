/**
 * Validation of the project's optional "report" block: the design record the PDF prints
 * (reference, client, site, who prepared, checked and approved it and when, revisions).
 * Text only, bounded lengths; dates are calendar dates written YYYY-MM-DD (ISO 8601).
 */

import type { FieldChecker } from './validateFields.ts';

const REPORT_FIELDS = [
  'reference',
  'client',
  'site',
  'preparedBy',
  'checkedBy',
  'approvedBy',
  'revisions',
];
const SIGNATORIES = ['preparedBy', 'checkedBy', 'approvedBy'] as const;

/** True for a real calendar date written YYYY-MM-DD. */
export function isIsoDate(text: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!match) return false;
  const [year, month, day] = match.slice(1).map(Number);
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day
  );
}

function checkDate(c: FieldChecker, value: unknown, path: string, required: boolean): void {
  const text = c.string(value, path, 10, required);
  if (text !== undefined && !isIsoDate(text))
    c.fail(path, 'must be a calendar date written YYYY-MM-DD');
}

export function checkReportRecord(c: FieldChecker, raw: unknown): void {
  if (raw === undefined) return;
  const r = c.object(raw, 'report', REPORT_FIELDS);
  if (!r) return;
  c.string(r.reference, 'report.reference', 100, false);
  c.string(r.client, 'report.client', 200, false);
  c.string(r.site, 'report.site', 200, false);
  for (const key of SIGNATORIES) {
    if (r[key] === undefined) continue;
    const s = c.object(r[key], `report.${key}`, ['name', 'date']);
    if (!s) continue;
    c.string(s.name, `report.${key}.name`, 100);
    checkDate(c, s.date, `report.${key}.date`, false);
  }
  if (r.revisions === undefined) return;
  (c.array(r.revisions, 'report.revisions', 0, 50) ?? []).forEach((item, i) => {
    const path = `report.revisions[${i}]`;
    const v = c.object(item, path, ['revision', 'date', 'description']);
    if (!v) return;
    const label = c.string(v.revision, `${path}.revision`, 20);
    if (label !== undefined && label.trim() === '') c.fail(`${path}.revision`, 'must not be empty');
    checkDate(c, v.date, `${path}.date`, true);
    c.string(v.description, `${path}.description`, 300);
  });
}
