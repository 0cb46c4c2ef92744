/**
 * The report's second part, drawn with PdfWriter: the fixing schedule, the design basis and
 * the record block (prepared, checked and approved by with dates and signature lines, the
 * revision table, reference, version and the project file's fingerprint).
 */
import { CAUTIONS, type Project, type ProjectResults } from '../core/index.ts';
import type { UnitSystem } from './displayUnits.ts';
import type { ReportOptions } from './pdfReport.ts';
import { INK, MUTED, type PdfWriter, RULE } from './pdfWriter.ts';
import {
  clearanceText,
  installationText,
  limitText,
  loadsText,
  methodText,
  sourceTagLegend,
  weatherText,
  wireTable,
} from './reportBasis.ts';
import { fixingLegend, fixingSchedule } from './reportFixings.ts';
import { recordFacts, revisionTable, SIGNATORY_ROLES } from './reportRecord.ts';

const columns = (weights: number[], rightFrom: number, rightTo: number) =>
  weights.map((weight, i) => ({
    weight,
    align: (i >= rightFrom && i <= rightTo ? 'right' : 'left') as 'left' | 'right',
  }));

export function fixingSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  w.heading('Fixing schedule: the pull of the wire on each fixing');
  w.table(
    fixingSchedule(project, results, units),
    columns([2.4, 1.3, 1.1, 1.1, 1.1, 1.2, 0.9], 1, 5),
    { legend: [fixingLegend(project)], bodySize: 7.2 },
  );
}

export function basisSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
): void {
  const units = options.unitSystem;
  w.heading('Design basis');
  w.table(wireTable(project, units), columns([1.3, 2.2, 3.6], -1, -1), {
    legend: [sourceTagLegend()],
    bodySize: 7.0,
  });
  w.paragraph(limitText(project, units), 7.3);
  w.paragraph(clearanceText(project, units), 7.3);
  w.paragraph(weatherText(project, results), 7.3);
  w.paragraph(`${loadsText(project, units)} ${installationText(project, units)}`, 7.3);
  w.paragraph(methodText(project, results, units, options.parabola), 7.3);
  const cautions = `Standing cautions. ${CAUTIONS.map((c) => `${c.title}: ${c.text}`).join(' ')}`;
  w.ensure(w.paragraphHeight(cautions, 6.9));
  w.paragraph(cautions, 6.9);
}

function signatureBoxes(w: PdfWriter, project: Project): void {
  const record = project.report ?? {};
  const boxWidth = w.width / 3;
  const height = 17;
  w.ensure(height + 2);
  SIGNATORY_ROLES.forEach(([key, role], i) => {
    const person = record[key];
    const x = w.left + i * boxWidth;
    w.doc.setDrawColor(...RULE);
    w.doc.setLineWidth(0.2);
    w.doc.rect(x, w.y, boxWidth, height);
    const name = w.lines(person?.name?.trim() || '', boxWidth - 26, 8)[0] ?? '';
    w.text(role.toUpperCase(), x + 2, w.y + 3.4, 6.3, 'bold', MUTED);
    w.text(name, x + 24, w.y + 3.6, 8, 'bold', INK);
    w.text(`Date: ${person?.date ?? ''}`, x + 2, w.y + 9, 7.5, 'normal', INK);
    w.doc.setDrawColor(...INK);
    if (!person?.date) w.doc.line(x + 10, w.y + 9.4, x + boxWidth - 3, w.y + 9.4);
    w.text('Signature:', x + 2, w.y + 14.8, 7.5, 'normal', INK);
    w.doc.line(x + 16, w.y + 15.2, x + boxWidth - 3, w.y + 15.2);
  });
  w.y += height + 3;
}

export function recordSection(w: PdfWriter, project: Project, options: ReportOptions): void {
  const facts = recordFacts(project, options.appVersion, options.generatedAt);
  const half = w.width / 2;
  const factRows = Math.ceil(facts.length / 2);
  const revisions = revisionTable(project.report);
  const revisionColumns = columns([0.8, 1, 5], -1, -1);
  w.heading('Record', factRows * 3.6 + 22 + w.tableHeight(revisions, revisionColumns));
  facts.forEach(([label, value], i) => {
    const x = w.left + (i < factRows ? 0 : half);
    const y = w.y + (i % factRows) * 3.6 + 2.6;
    w.text(`${label}:`, x, y, 7.4, 'bold', INK);
    const shown = w.lines(value, half - 31, 7.4);
    w.text(shown.length > 1 ? `${shown[0]} …` : (shown[0] ?? ''), x + 29, y, 7.4, 'normal', INK);
  });
  w.y += factRows * 3.6 + 2;
  signatureBoxes(w, project);
  w.table(revisions, revisionColumns, { bodySize: 7.4 });
}
