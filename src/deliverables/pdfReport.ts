/**
 * The report as a PDF. Page 1 is the decision: verdict in words, what to set on the day, key
 * numbers, the sag plot (vector, selectable text) and the case table with each case's findings.
 * Then the fixing schedule, the design basis and the record block (people, dates, signatures,
 * revisions, version, fingerprint), then the appendices the person ticked. jsPDF, svg2pdf.js
 * and the fonts load only when a report is asked for.
 */
import type { jsPDF } from 'jspdf';
import {
  type AsBuiltResult,
  CAUTION_SUMMARY,
  type Project,
  type ProjectResults,
  type WireChoice,
} from '../core/index.ts';
import {
  DESIGN_HEADING,
  type DesignReport,
  settingParagraphs,
  windowParagraphs,
} from './designContent.ts';
import type { UnitSystem } from './displayUnits.ts';
import { type AppendixChoice, appendixSections } from './pdfAppendix.ts';
import { type FontSource, ReportFonts } from './pdfFonts.ts';
import { basisSection, fixingSection, recordSection } from './pdfSections.ts';
import { asBuiltSection, hasMovingLoads, movingSection } from './pdfSiteSections.ts';
import {
  ACCENT,
  type Colour,
  type ColumnSpec,
  INK,
  lineHeight,
  MUTED,
  PdfWriter,
  RULE,
} from './pdfWriter.ts';
import { caseLegend, caseTable, keyNumbers, verdict } from './reportContent.ts';
import { revisionLabel } from './reportRecord.ts';
import { settingText } from './reportSetting.ts';

export type PaperSize = 'a4' | 'letter';

export interface ReportOptions {
  paper: PaperSize;
  unitSystem: UnitSystem;
  generatedAt: Date;
  /** The sag plot as an SVG element (vector); null leaves a note instead. */
  plot: SVGSVGElement | null;
  /** Plot width : height. */
  plotAspect: number;
  parabola?: { caseName: string; differenceM: number } | null;
  /** The Noto font files (fetched in the browser, read from disk in tests). */
  fonts: FontSource;
  /** Sagwright's version, printed in the record. */
  appVersion: string;
  appendix: AppendixChoice;
  /** Paragraphs placed under the setting for the day, if any. */
  decisionNotes?: string[];
  /** The tension window and today's setting; left out when not given. */
  design?: DesignReport | null;
  /** Wires the chooser found to work, for the appendix, if known. */
  wireChoices?: WireChoice[];
  /** The as-built check of a site measurement, when one was entered. */
  asBuilt?: AsBuiltResult | null;
}

export const PASS: Colour = [26, 122, 62];
export const FAIL: Colour = [178, 34, 34];

/** Every piece of user text the report may print, to decide which fonts it needs. */
function userTexts(project: Project): string[] {
  return [JSON.stringify(project)];
}

function titleBlock(w: PdfWriter, project: Project, options: ReportOptions): void {
  for (const line of w.lines(project.title, w.width, 16, 'bold')) {
    w.text(line, w.left, w.y + 5.2, 16, 'bold');
    w.y += 6.6;
  }
  const r = project.report ?? {};
  const facts = [
    r.client?.trim() && `Client: ${r.client.trim()}`,
    r.site?.trim() && `Site: ${r.site.trim()}`,
    r.reference?.trim() && `Reference: ${r.reference.trim()}`,
    revisionLabel(r),
    `Date ${options.generatedAt.toISOString().slice(0, 10)}`,
  ].filter(Boolean) as string[];
  w.y += 0.6;
  w.paragraph(facts.join('   ·   '), 8, 'normal', MUTED);
}

function box(
  w: PdfWriter,
  paragraphs: { text: string; size: number; bold?: boolean }[],
  bar: Colour,
  tint: Colour,
) {
  const inner = w.width - 7;
  const laid = paragraphs.map((p) => ({
    ...p,
    lines: w.lines(p.text, inner, p.size, p.bold ? 'bold' : 'normal'),
  }));
  const height = laid.reduce((sum, p) => sum + p.lines.length * lineHeight(p.size) + 1, 3);
  w.ensure(height + 3);
  w.doc.setFillColor(...tint);
  w.doc.rect(w.left, w.y, w.width, height, 'F');
  w.doc.setFillColor(...bar);
  w.doc.rect(w.left, w.y, 1.4, height, 'F');
  let y = w.y + 2;
  for (const p of laid) {
    for (const line of p.lines) {
      w.text(line, w.left + 4.5, y + p.size * 0.33, p.size, p.bold ? 'bold' : 'normal', INK);
      y += lineHeight(p.size);
    }
    y += 1;
  }
  w.y += height + 2.5;
}

function decisionBlocks(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
) {
  const v = verdict(project, results, options.unitSystem);
  box(
    w,
    [{ text: v.text, size: 9.5, bold: true }],
    v.pass ? PASS : FAIL,
    v.pass ? [234, 245, 237] : [251, 234, 234],
  );
  const setting = settingText(project, results, options.unitSystem, options.appendix.setUpChart);
  box(
    w,
    [
      { text: setting.head, size: 8.8, bold: true },
      ...setting.lines.map((text) => ({ text, size: 7.8 })),
      ...(options.decisionNotes ?? []).map((text) => ({ text, size: 7.8 })),
      ...designLines(project, results, options),
    ],
    ACCENT,
    [236, 242, 248],
  );
}

/** The tension window and, when a temperature of the day was given, the setting for it. */
function designLines(project: Project, results: ProjectResults, options: ReportOptions) {
  const d = options.design;
  if (!d) return [];
  const units = options.unitSystem;
  return [
    { text: `${DESIGN_HEADING}.`, size: 8.4, bold: true },
    ...windowParagraphs(project, results, d, units).map((text) => ({ text, size: 7.8 })),
    ...settingParagraphs(project, d, units).map((text) => ({ text, size: 7.8 })),
  ];
}

function keyNumberRow(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  const numbers = keyNumbers(project, results, units);
  const boxWidth = w.width / numbers.length;
  const notes = numbers.map((n) => w.lines(n.note, boxWidth - 4, 6.6));
  const labels = numbers.map((n) => w.lines(n.label.toUpperCase(), boxWidth - 4, 6.3, 'bold'));
  const values = numbers.map((n) => w.lines(n.value, boxWidth - 4, 11.5, 'bold'));
  const labelH = Math.max(...labels.map((l) => l.length)) * lineHeight(6.3);
  const valueH = Math.max(...values.map((l) => l.length)) * lineHeight(11.5);
  const height = labelH + valueH + Math.max(...notes.map((l) => l.length)) * lineHeight(6.6) + 2;
  w.ensure(height + 3);
  numbers.forEach((_, i) => {
    const x = w.left + i * boxWidth;
    if (i > 0) {
      w.doc.setDrawColor(...RULE);
      w.doc.setLineWidth(0.2);
      w.doc.line(x, w.y, x, w.y + height);
    }
    const y0 = w.y;
    labels[i].forEach((line, k) => {
      w.text(line, x + 2, y0 + 2.2 + k * lineHeight(6.3), 6.3, 'bold', MUTED);
    });
    values[i].forEach((line, k) => {
      w.text(line, x + 2, y0 + labelH + 4 + k * lineHeight(11.5), 11.5, 'bold');
    });
    notes[i].forEach((line, k) => {
      w.text(line, x + 2, y0 + labelH + valueH + 2.4 + k * lineHeight(6.6), 6.6, 'normal', MUTED);
    });
  });
  w.y += height + 3;
}

export const CASE_COLUMNS: ColumnSpec[] = [1.6, 1.9, 0.9, 1, 0.7, 0.9, 1.15, 0.9, 0.8, 3.2].map(
  (weight, i) => ({ weight, align: i >= 2 && i <= 7 ? 'right' : 'left' }),
);

function caseTableStyle(project: Project, results: ProjectResults, units: UnitSystem) {
  return {
    cellColour: (row: number, col: number) =>
      col === 8 || (col === 9 && !results.cases[row].ok)
        ? results.cases[row].ok
          ? PASS
          : FAIL
        : undefined,
    legend: [caseLegend(project, results, units)],
  };
}

/** Points the plot's text at an embedded font (svg2pdf looks fonts up by family name). */
function applyFontFamily(svg: SVGSVGElement, fonts: ReportFonts): void {
  for (const element of Array.from(
    svg.querySelectorAll<SVGElement>('[style*="font-family"], text, tspan'),
  )) {
    const family = fonts.familyFor(element.textContent ?? '');
    if (element.style) element.style.fontFamily = `${family}, sans-serif`;
    if (element.hasAttribute('font-family')) element.setAttribute('font-family', family);
  }
}

async function plotAndCases(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
) {
  const units = options.unitSystem;
  const table = caseTable(project, results, units);
  const style = caseTableStyle(project, results, units);
  const tableHeight = w.tableHeight(table, CASE_COLUMNS, style) + 12;
  const full = w.width / options.plotAspect;
  // The plot shrinks (to 55 mm at least) to keep the case table on page 1; when the table cannot
  // stay even then, it starts the next page whole and the plot keeps its full size here.
  const withTable = w.remaining - tableHeight - 6;
  const height =
    withTable >= 55 ? Math.min(full, withTable) : Math.max(55, Math.min(full, w.remaining - 12));
  w.ensure(height + 6);
  if (options.plot) {
    applyFontFamily(options.plot, w.fonts);
    const { svg2pdf } = await import('svg2pdf.js');
    await svg2pdf(options.plot, w.doc, { x: w.left, y: w.y, width: w.width, height });
  } else {
    w.paragraph('The sag plot could not be drawn for this report; the numbers stand.');
  }
  w.y += height + 1;
  w.paragraph(
    'Wire height for each case (solid) with the closed-form parabola (dashed); ground and clearance zones shaded.',
    7,
    'normal',
    MUTED,
  );
  w.heading('Results by case', tableHeight - 10);
  w.table(table, CASE_COLUMNS, style);
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
    title: project.title,
    subject: 'Wire span report',
    creator: `Sagwright ${options.appVersion}`,
  });
  const fonts = await ReportFonts.load(doc, options.fonts, userTexts(project));
  const w = new PdfWriter(doc, fonts);
  titleBlock(w, project, options);
  decisionBlocks(w, project, results, options);
  keyNumberRow(w, project, results, options.unitSystem);
  await plotAndCases(w, project, results, options);
  // The fixing schedule starts page 2, or follows the case table when that went to page 2.
  if (doc.getNumberOfPages() === 1) w.newPage();
  else w.y += 4;
  fixingSection(w, project, results, options.unitSystem);
  if (hasMovingLoads(project)) movingSection(w, project, results, options.unitSystem);
  if (options.asBuilt) asBuiltSection(w, project, results, options.asBuilt, options.unitSystem);
  basisSection(w, project, results, options);
  recordSection(w, project, options);
  appendixSections(w, project, results, options);
  w.frame(
    {
      title: project.title,
      revision: revisionLabel(project.report),
      date: options.generatedAt.toISOString().slice(0, 10),
    },
    `Caution: ${CAUTION_SUMMARY}`,
  );
  return doc;
}
