/**
 * The report's site sections: the as-built check (what was measured on site, the cut length it
 * implies, every case again with that length) when a measurement was entered, and the moving-load
 * envelope (per case: largest tension and least clearance, each with where the load was) when
 * the project has moving loads. The words and tables are pure, so they are tested without a PDF.
 */
import type {
  AsBuiltResult,
  CaseResult,
  MovingLoadResult,
  Project,
  ProjectResults,
} from '../core/index.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';
import { CASE_COLUMNS, FAIL, PASS } from './pdfReport.ts';
import { MUTED, type PdfWriter } from './pdfWriter.ts';
import { caseLegend, caseTable, type Table } from './reportContent.ts';
import { fixingName, spanName, temperatureText } from './setUpContent.ts';

export const AS_BUILT_HEADING = 'As built: the wire as measured on site';
export const MOVING_HEADING = 'Moving loads: the envelope of each case';
export const MOVING_CAUTION =
  'A moving load here is equipment hauled along the wire; the wire is not for lifting or carrying people.';

/** The moving loads of the project's file (kind "moving"). */
export function hasMovingLoads(project: Project): boolean {
  return project.loads.some((l) => l.type === 'moving');
}

/** "the sag 0.412 m at 12.000 m from West post": what was measured, in words. */
export function measurementWords(project: Project, a: AsBuiltResult, units: UnitSystem): string {
  const m = a.measurement;
  const at = temperatureText(units, m.temperature);
  const span = spanName(project, m.span);
  switch (m.kind) {
    case 'sag': {
      const where =
        m.x === undefined
          ? `where it is largest in ${span}`
          : `at ${formatLength(units, m.x - project.supports[m.span].x)} from ${fixingName(project, m.span)} in ${span}`;
      return `a sag of ${formatLength(units, m.value)} below the straight line between the fixings, ${where}, at ${at}`;
    }
    case 'returnTime':
      return `a pulse return time of ${m.value.toFixed(3)} s on ${span}, at ${at}`;
    case 'frequency':
      return `a plucked frequency of ${m.value.toFixed(3)} Hz on ${span}, at ${at}`;
    default:
      return `a horizontal tension of ${fq(units, 'force', m.value)} (gauge) on ${span}, at ${at}`;
  }
}

/** The as-built paragraphs: the measurement, the tension and cut length it implies, the verdict. */
export function asBuiltParagraphs(project: Project, a: AsBuiltResult, units: UnitSystem): string[] {
  const lines = [`Measured on site: ${measurementWords(project, a, units)}.`];
  if (!a.solved || !Number.isFinite(a.unstressedLength)) return [...lines, ...a.messages];
  const diff = a.lengthDifference;
  const change =
    Math.abs(diff) < 5e-5
      ? 'the same as the design'
      : `${fq(units, 'diameter', Math.abs(diff))} ${diff > 0 ? 'longer' : 'shorter'} than the design's ${formatLength(units, a.designUnstressedLength)}`;
  lines.push(
    `It means a horizontal tension of ${fq(units, 'force', a.measurement.horizontalTension)} at ` +
      `${temperatureText(units, a.measurement.temperature)} (${a.measurement.withLoads ? 'with the hung loads on' : 'bare wire'}) ` +
      `and a cut length as built of ${formatLength(units, a.unstressedLength)} at the installation temperature, ${change}.`,
  );
  const failing = a.cases.filter((c) => !c.ok).map((c) => `"${c.name}"`);
  lines.push(
    failing.length === 0
      ? 'Verdict as built: every case passes with the wire as measured.'
      : `Verdict as built: ${failing.length === 1 ? 'one case fails' : `${failing.length} cases fail`} with the wire as measured: ${failing.join(', ')} (reasons in the table).`,
  );
  return [...lines, ...a.messages];
}

/** The results with the as-built cases, so the case table and its legend read the same way. */
function asBuiltResults(results: ProjectResults, a: AsBuiltResult): ProjectResults {
  return { ...results, cases: a.cases, unstressedLength: a.unstressedLength };
}

export function asBuiltSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  a: AsBuiltResult,
  units: UnitSystem,
): void {
  w.heading(AS_BUILT_HEADING, 30);
  for (const text of asBuiltParagraphs(project, a, units)) w.paragraph(text, 7.6);
  if (!a.solved || a.cases.length === 0) return;
  const built = asBuiltResults(results, a);
  w.table(caseTable(project, built, units), CASE_COLUMNS, {
    cellColour: (row: number, col: number) =>
      col === 8 || (col === 9 && !a.cases[row].ok) ? (a.cases[row].ok ? PASS : FAIL) : undefined,
    legend: [
      `Every case solved again with the cut length as built. ${caseLegend(project, built, units)}`,
    ],
  });
}

interface MovingRow {
  caseResult: CaseResult;
  load: MovingLoadResult;
}

function movingRows(results: ProjectResults): MovingRow[] {
  return results.cases.flatMap((c) =>
    (c.movingLoads ?? []).map((load) => ({ caseResult: c, load })),
  );
}

/** Per case and moving load: largest tension and where, least clearance and where, verdict. */
export function movingTable(project: Project, results: ProjectResults, units: UnitSystem): Table {
  const from = fixingName(project, 0);
  return {
    head: [
      'Case',
      'Moving load',
      'Largest tension',
      `with the load at (from ${from})`,
      'Least clearance',
      `with the load at (from ${from})`,
      'Check',
    ],
    rows: movingRows(results).map(({ caseResult, load }) => [
      caseResult.name,
      load.label,
      formatForceShort(units, load.maxTension),
      formatLength(units, load.maxTensionAt - project.supports[0].x, true),
      formatLength(units, load.clearance, true),
      formatLength(units, load.clearanceAt - project.supports[0].x, true),
      load.ok ? 'Pass' : 'Fail',
    ]),
  };
}

/** Cases that carry no hung loads carry no moving load either; say which, so no row is missed. */
export function movingNotes(results: ProjectResults): string[] {
  const without = results.cases.filter((c) => c.solved && (c.movingLoads ?? []).length === 0);
  const notes = [
    'Each moving load is solved alone at positions along its path at the cut length of the design; the worst position is then refined.',
  ];
  if (without.length > 0)
    notes.push(
      `Not applied in ${without.map((c) => `"${c.name}"`).join(', ')} (the hung loads are off the wire in ${without.length === 1 ? 'that case' : 'those cases'}).`,
    );
  notes.push(MOVING_CAUTION);
  return notes;
}

export const MOVING_COLUMNS = [1.5, 1.5, 1, 1.2, 1, 1.2, 0.6].map((weight, i) => ({
  weight,
  align: (i >= 2 && i <= 5 ? 'right' : 'left') as 'left' | 'right',
}));

export function movingSection(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): void {
  const rows = movingRows(results);
  w.heading(MOVING_HEADING, 24);
  if (rows.length === 0) {
    w.paragraph(
      'No case carries the moving loads (each case here has its hung loads off the wire).',
      7.6,
    );
    w.paragraph(MOVING_CAUTION, 7, 'normal', MUTED);
    return;
  }
  w.table(movingTable(project, results, units), MOVING_COLUMNS, {
    cellColour: (row: number, col: number) =>
      col === 6 ? (rows[row].load.ok ? PASS : FAIL) : undefined,
    legend: movingNotes(results),
  });
}
