/**
 * The fixing schedule: for every fixing and intermediate support, the wire's pull in every case
 * (along the line, downward, sideways, resultant, angle below the horizontal) with the case that
 * governs it (largest resultant); for an intermediate support the net pull on the post and its
 * direction. The table a fixing or post supplier needs. Values are the core's reactions (SI),
 * shown in the chosen units.
 */
import type { CaseResult, Project, ProjectResults, SupportReaction } from '../core/index.ts';
import { formatLength, formatQuantity as fq, type UnitSystem } from './displayUnits.ts';
import type { Table } from './reportContent.ts';
import { fixingName } from './setUpContent.ts';

export const FIXING_HEAD = [
  'Case',
  'Along the line',
  'Downward',
  'Sideways',
  'Resultant',
  'Angle below horizontal',
  'Governs',
];

/** A force component as the schedule prints it (whole newtons or lbf). */
export const forceCell = (units: UnitSystem, n: number) => fq(units, 'force', n);
export const angleCell = (degrees: number) => `${degrees.toFixed(1)}°`;

function isEnd(project: Project, index: number): boolean {
  return index === 0 || index === project.supports.length - 1;
}

/** The along-line cell: the pull's size at an end fixing, the signed net pull at a support. */
function alongCell(project: Project, index: number, r: SupportReaction, units: UnitSystem) {
  if (isEnd(project, index)) return forceCell(units, Math.abs(r.horizontal));
  const shown = forceCell(units, Math.abs(r.horizontal));
  return Math.abs(r.horizontal) < 0.5 ? shown : `${r.horizontal > 0 ? '+' : '−'}${shown}`;
}

function attachmentText(project: Project, index: number): string {
  if (isEnd(project, index)) return 'end fixing';
  const s = project.supports[index] as { free?: boolean; attachment?: string };
  const kind = s.attachment ?? (s.free ? 'pulley' : 'clamped');
  const words: Record<string, string> = {
    clamped: 'intermediate support, wire clamped',
    pulley: 'intermediate support, wire over a pulley or saddle',
    swingLink: 'intermediate support, wire on a swing link',
  };
  return words[kind] ?? `intermediate support (${kind})`;
}

/** The case with the largest resultant on this fixing. */
export function governingCase(results: ProjectResults, index: number): CaseResult | undefined {
  const solved = results.cases.filter((c) => c.solved && c.supports[index]);
  if (solved.length === 0) return undefined;
  return solved.reduce((a, b) =>
    b.supports[index].resultant > a.supports[index].resultant ? b : a,
  );
}

function groupText(project: Project, results: ProjectResults, index: number, units: UnitSystem) {
  const s = project.supports[index];
  const where = `${fixingName(project, index)} (${attachmentText(project, index)}, ${formatLength(units, s.x)} along, ${formatLength(units, s.z)} high).`;
  const g = governingCase(results, index);
  if (!g) return `${where} No case solved.`;
  const r = g.supports[index];
  const governs = ` Governed by ${g.name}: ${fq(units, 'force', r.resultant)} at ${angleCell(r.angle)}.`;
  if (isEnd(project, index)) return where + governs;
  const toward =
    r.horizontal >= 0 ? fixingName(project, project.supports.length - 1) : fixingName(project, 0);
  const net =
    Math.abs(r.horizontal) < 0.5
      ? ' Net pull on the post along the line: none.'
      : ` Net pull on the post along the line ${forceCell(units, Math.abs(r.horizontal))} toward ${toward}.`;
  return where + governs + net;
}

export function fixingSchedule(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): Table {
  const rows: string[][] = [];
  const groupRows: number[] = [];
  const strongRows: number[] = [];
  project.supports.forEach((_, index) => {
    groupRows.push(rows.length);
    rows.push([groupText(project, results, index, units), '', '', '', '', '', '']);
    const governing = governingCase(results, index);
    for (const c of results.cases) {
      const r = c.supports[index];
      if (!c.solved || !r) {
        rows.push([c.name, '-', '-', '-', '-', '-', 'not solved']);
        continue;
      }
      if (c === governing) strongRows.push(rows.length);
      rows.push([
        c.name,
        alongCell(project, index, r, units),
        forceCell(units, r.vertical),
        forceCell(units, Math.abs(r.lateral)),
        forceCell(units, r.resultant),
        angleCell(r.angle),
        c === governing ? 'governs' : '',
      ]);
    }
  });
  return { head: FIXING_HEAD, rows, groupRows, strongRows };
}

/** What the columns mean, with the sign rule for intermediate supports. */
export function fixingLegend(project: Project): string {
  const intermediate =
    project.supports.length > 2
      ? ` At an intermediate support the along-line value is the net pull on the post: + toward ${fixingName(project, project.supports.length - 1)}, − toward ${fixingName(project, 0)}.`
      : '';
  return (
    'Along the line: horizontal, in the line of the span. Downward: vertical. Sideways: across the span, from wind. ' +
    'Resultant: the whole pull; rate the fixing, its eye and the structure behind it for it at the angle shown.' +
    intermediate
  );
}
