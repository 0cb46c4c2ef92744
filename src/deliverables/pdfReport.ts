/**
 * The client report as a PDF: page 1 carries the title, date, client and site block, the
 * summary line, key numbers, the sag plot (vector, selectable text) and the case table; then
 * what to set on the day at other temperatures, the inputs, fixing loads, method and cautions. jsPDF and svg2pdf.js load only when a report
 * is asked for.
 */
import type { jsPDF } from 'jspdf';
import { CAUTION_SUMMARY, CAUTIONS, type Project, type ProjectResults } from '../core/index.ts';
import {
  DESIGN_HEADING,
  type DesignReport,
  settingParagraphs,
  windowParagraphs,
} from './designContent.ts';
import { formatQuantity as fq, type UnitSystem } from './displayUnits.ts';
import { ACCENT, MUTED, PdfWriter, pdfText, RULE } from './pdfWriter.ts';
import {
  caseMessages,
  caseTable,
  installationLines,
  keyNumbers,
  loadTable,
  methodParagraphs,
  summaryLine,
  supportTable,
  wireLines,
} from './reportContent.ts';
import {
  isInstallationRow,
  pulseCheck,
  SET_UP_HEADING,
  sagSpanNote,
  setUpExplanation,
  setUpTable,
  spanName,
  temperatureText,
} from './setUpContent.ts';

export type PaperSize = 'a4' | 'letter';

export interface ReportDetails {
  client: string;
  site: string;
  preparedBy: string;
  reference: string;
}

export interface ReportOptions {
  paper: PaperSize;
  unitSystem: UnitSystem;
  details: ReportDetails;
  generatedAt: Date;
  /** The sag plot as an SVG element (vector); null leaves a note instead. */
  plot: SVGSVGElement | null;
  /** Plot width : height. */
  plotAspect: number;
  parabola?: { caseName: string; differenceM: number } | null;
  /** The tension window and today's setting; left out when not given. */
  design?: DesignReport | null;
}

const PASS = [26, 122, 62] as const;
const FAIL = [178, 34, 34] as const;
const INSTALLATION_FILL = [227, 238, 248] as const;

function header(w: PdfWriter, project: Project, options: ReportOptions): void {
  const { doc } = w;
  w.font(7.5, 'bold', ACCENT);
  doc.text('SAGWRIGHT  |  WIRE SPAN REPORT', w.left, w.y);
  w.font(7.5, 'normal', MUTED);
  const date = options.generatedAt.toISOString().slice(0, 10);
  doc.text(`Date ${date}`, w.left + w.width, w.y, { align: 'right' });
  w.y += 8;
  w.font(18, 'bold');
  for (const line of w.lines(project.title, w.width)) {
    doc.text(line, w.left, w.y);
    w.y += 7.2;
  }
  w.y += 1;
}

function detailsBlock(w: PdfWriter, details: ReportDetails): void {
  const { doc } = w;
  const cells: [string, string][] = [
    ['Client', details.client],
    ['Site', details.site],
    ['Prepared by', details.preparedBy],
    ['Reference', details.reference],
  ];
  const cellWidth = w.width / 2;
  cells.forEach(([label, value], i) => {
    const x = w.left + (i % 2) * cellWidth;
    const y = w.y + Math.floor(i / 2) * 10;
    w.font(6.5, 'bold', MUTED);
    doc.text(label.toUpperCase(), x + 1.5, y + 3.2);
    w.font(9.5, 'normal');
    doc.text(w.lines(value || ' ', cellWidth - 4)[0] ?? '', x + 1.5, y + 7.6);
    doc.setDrawColor(RULE[0], RULE[1], RULE[2]);
    doc.setLineWidth(0.2);
    doc.rect(x, y, cellWidth, 10);
  });
  w.y += 24;
}

function summaryBox(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
): void {
  const { doc } = w;
  const allPass = results.cases.every((c) => c.ok);
  w.font(9.5, 'bold');
  const lines = w.lines(summaryLine(project, results, options.unitSystem), w.width - 8);
  const height = lines.length * 4.4 + 5;
  const tint = allPass ? [234, 245, 237] : [251, 234, 234];
  const bar = allPass ? PASS : FAIL;
  doc.setFillColor(tint[0], tint[1], tint[2]);
  doc.rect(w.left, w.y, w.width, height, 'F');
  doc.setFillColor(bar[0], bar[1], bar[2]);
  doc.rect(w.left, w.y, 1.4, height, 'F');
  w.font(9.5, 'bold');
  lines.forEach((line, i) => {
    doc.text(line, w.left + 4.5, w.y + 5.6 + i * 4.4);
  });
  w.y += height + 5;
}

function keyNumberRow(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  const { doc } = w;
  const numbers = keyNumbers(project, results, units);
  const boxWidth = w.width / numbers.length;
  numbers.forEach((n, i) => {
    const x = w.left + i * boxWidth;
    if (i > 0) {
      doc.setDrawColor(RULE[0], RULE[1], RULE[2]);
      doc.line(x, w.y, x, w.y + 15);
    }
    w.font(6.5, 'bold', MUTED);
    doc.text(pdfText(n.label.toUpperCase()), x + 2, w.y + 3);
    w.font(12.5, 'bold');
    doc.text(pdfText(n.value), x + 2, w.y + 9);
    w.font(6.5, 'normal', MUTED);
    doc.text(w.lines(n.note, boxWidth - 4)[0] ?? '', x + 2, w.y + 13.5);
  });
  w.y += 20;
}

async function plotBlock(w: PdfWriter, options: ReportOptions): Promise<void> {
  const height = w.width / options.plotAspect;
  w.ensure(height + 8);
  if (options.plot) {
    const { svg2pdf } = await import('svg2pdf.js');
    await svg2pdf(options.plot, w.doc, { x: w.left, y: w.y, width: w.width, height });
  } else {
    w.paragraph('The sag plot could not be drawn for this report; the numbers below stand.');
  }
  w.y += height + 2;
  w.font(7.5, 'normal', MUTED);
  w.doc.text(
    pdfText(
      'Wire height for each case (solid) with the closed-form parabola (dashed); ground and clearance zones shaded.',
    ),
    w.left,
    w.y,
  );
  w.y += 6;
}

function resultsSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  w.heading('Results by case');
  const table = caseTable(project, results, units);
  const verdictColumn = table.head.length - 1;
  w.table(
    table,
    [2.6, 1, 1, 1, 1.1, 1.3, 0.8, 1.1, 1.3, 1.1, 1.2].map((weight, i) => ({
      weight,
      align: i === 0 ? 'left' : 'right',
    })),
    {
      cellColour: (row, col) =>
        col === verdictColumn ? (results.cases[row].ok ? PASS : FAIL) : undefined,
    },
  );
  for (const message of caseMessages(results)) w.paragraph(message, 8);
  w.paragraph(
    'H: horizontal tension. Largest T: largest wire tension. Use: largest tension as a share of the working limit (minimum breaking load divided by the safety factor). Clearance: least height of the wire above the ground line. Swing: sideways movement in wind.',
    7.5,
  );
}

function setUpSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  w.heading(SET_UP_HEADING);
  const span = spanName(project, results.setUpSpan);
  const explanation = setUpExplanation(
    fq(units, 'length', results.unstressedLength),
    temperatureText(units, project.installation.temperature),
  );
  w.paragraph(`${explanation} ${sagSpanNote(span)}`, 8.5);
  w.table(
    setUpTable(project, results, units),
    [1.5, 1.2, 1.2, 1.2, 1].map((weight, i) => ({ weight, align: i === 0 ? 'left' : 'right' })),
    {
      rowFill: (row) =>
        isInstallationRow(project, results.setUpChart[row]) ? INSTALLATION_FILL : undefined,
    },
  );
  w.paragraph(
    pulseCheck(
      span,
      results.setUpChart.some((row) => row.returnTime !== null),
    ),
    7.5,
  );
}

function designSection(w: PdfWriter, project: Project, options: ReportOptions): void {
  if (!options.design) return;
  w.heading(DESIGN_HEADING);
  for (const text of windowParagraphs(project, options.design, options.unitSystem))
    w.paragraph(text, 8.5);
  for (const text of settingParagraphs(project, options.design, options.unitSystem))
    w.paragraph(text, 8.5);
}

function inputsSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  w.heading('Span and fixing loads');
  w.table(
    supportTable(project, results, units),
    [2.6, 1, 1, 1.3, 1.4, 0.8, 1.8].map((weight, i) => ({
      weight,
      align: i === 0 || i === 3 || i === 6 ? 'left' : 'right',
    })),
  );
  w.heading('Wire and its data source');
  w.table({ head: ['Property', 'Value', 'Source'], rows: wireLines(project, units) }, [
    { weight: 1.3 },
    { weight: 1.5 },
    { weight: 3.4 },
  ]);
  if (project.loads.length > 0) {
    w.heading('Hung loads');
    w.table(loadTable(project, units), [
      { weight: 2.4 },
      { weight: 0.9 },
      { weight: 2 },
      { weight: 1.2, align: 'right' },
    ]);
  }
  w.heading('Installation and limits');
  for (const line of installationLines(project, units)) w.paragraph(line);
}

function closingSections(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
): void {
  w.heading('Method');
  for (const text of methodParagraphs(project, results, options.parabola, options.unitSystem))
    w.paragraph(text);
  w.heading('Cautions');
  for (const caution of CAUTIONS) w.paragraph(`${caution.title}. ${caution.text}`);
}

export async function buildPdfReport(
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
): Promise<jsPDF> {
  const { jsPDF } = await import('jspdf');
  const doc = new jsPDF({
    unit: 'mm',
    format: options.paper,
    orientation: 'portrait',
    compress: true,
  });
  doc.setProperties({
    title: pdfText(project.title),
    subject: 'Wire span report',
    creator: 'Sagwright',
  });
  const w = new PdfWriter(doc);
  header(w, project, options);
  detailsBlock(w, options.details);
  summaryBox(w, project, results, options);
  keyNumberRow(w, project, results, options.unitSystem);
  await plotBlock(w, options);
  resultsSection(w, project, results, options.unitSystem);
  doc.addPage();
  w.y = w.margin;
  setUpSection(w, project, results, options.unitSystem);
  designSection(w, project, options);
  inputsSection(w, project, results, options.unitSystem);
  closingSections(w, project, results, options);
  w.footers(`Sagwright report - ${project.title}`, `Caution: ${CAUTION_SUMMARY}`);
  return doc;
}
