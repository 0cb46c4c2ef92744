/**
 * The words and numbers of the report's decision, independent of the page: the verdict in
 * words, the key numbers with whole captions, and the case table with each case's findings
 * beside it. Values are SI in the project and results, shown in the chosen display units
 * (lengths in feet and inches for imperial).
 */
import type { CaseResult, Project, ProjectResults } from '../core/index.ts';
import { weatherCaseOfId } from '../core/index.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';

export interface KeyNumber {
  label: string;
  value: string;
  note: string;
}

export type TableRow = string[];

export interface Table {
  head: string[];
  rows: TableRow[];
  /** Rows that are a group heading spanning the table (their first cell is the text). */
  groupRows?: number[];
  /** Rows drawn bold (e.g. the governing case). */
  strongRows?: number[];
}

const percent = (ratio: number) => `${Math.round(ratio * 100)} %`;

function solvedCases(results: ProjectResults): CaseResult[] {
  return results.cases.filter((c) => c.solved);
}

function extreme(cases: CaseResult[], pick: (c: CaseResult) => number, largest: boolean) {
  return cases.reduce((a, b) => ((largest ? pick(b) > pick(a) : pick(b) < pick(a)) ? b : a));
}

/** The working limit the case's utilisation was taken against, N. */
export function workingLimitN(c: CaseResult): number {
  return c.utilisation > 0 ? c.maxTension / c.utilisation : 0;
}

/** One clearance requirement in one case: the ground check or a zone. */
export interface ClearanceMargin {
  caseName: string;
  /** "the ground" for the whole-span minimum, else the zone's label. */
  requirement: string;
  clearance: number;
  required: number;
}

function margins(project: Project, c: CaseResult): ClearanceMargin[] {
  return [
    {
      caseName: c.name,
      requirement: 'the whole span',
      clearance: c.clearance,
      required: project.limits.minClearance,
    },
    ...c.zoneClearances.map((z) => ({
      caseName: c.name,
      requirement: z.label || 'clearance zone',
      clearance: z.clearance,
      required: z.required,
    })),
  ];
}

/** The clearance requirement with the least margin over all solved cases (it governs). */
export function governingClearance(
  project: Project,
  results: ProjectResults,
): ClearanceMargin | undefined {
  const all = solvedCases(results).flatMap((c) => margins(project, c));
  if (all.length === 0) return undefined;
  return all.reduce((a, b) => (b.clearance - b.required < a.clearance - a.required ? b : a));
}

/** The moving-load envelope with the largest tension, or the least clearance margin. */
function worstMoving(project: Project, cases: CaseResult[], kind: 'tension' | 'clearance') {
  let best:
    | {
        c: CaseResult;
        m: NonNullable<CaseResult['movingLoads']>[number];
        margin: number;
        clearance: number;
        required: number;
        at: number;
        where: string;
      }
    | undefined;
  for (const c of cases)
    for (const m of c.movingLoads ?? []) {
      const options = [
        {
          margin: kind === 'tension' ? -m.maxTension : m.clearance - project.limits.minClearance,
          clearance: m.clearance,
          required: project.limits.minClearance,
          at: m.clearanceAt,
          where: 'over the whole span',
        },
        ...(kind === 'clearance'
          ? m.zoneClearances.map((z) => ({
              margin: z.clearance - z.required,
              clearance: z.clearance,
              required: z.required,
              at: z.at,
              where: `at ${z.label}`,
            }))
          : []),
      ];
      for (const o of options) if (!best || o.margin < best.margin) best = { c, m, ...o };
    }
  return best;
}

/** Every check a case fails, in words and the chosen units. */
export function caseFailures(project: Project, c: CaseResult, units: UnitSystem): string[] {
  if (!c.solved) return [c.messages.join(' ') || 'could not be solved'];
  const failures: string[] = [];
  if (c.utilisation > 1)
    failures.push(
      `tension ${formatForceShort(units, c.maxTension)} is ${percent(c.utilisation)} of the working limit ${formatForceShort(units, workingLimitN(c))}`,
    );
  for (const m of margins(project, c)) {
    if (m.clearance >= m.required) continue;
    const where =
      m.requirement === 'the whole span' ? 'over the whole span' : `at ${m.requirement}`;
    failures.push(
      `clearance ${where} ${formatLength(units, m.clearance)}, needs ${formatLength(units, m.required)} (${formatLength(units, m.required - m.clearance)} short)`,
    );
  }
  failures.push(...movingFailures(project, c, units));
  // A case failed by a check not worded above (the wire's elastic range, a case not solved):
  // its own messages, which carry no length or force to convert.
  if (failures.length === 0 && !c.ok) failures.push(...c.messages);
  return failures;
}

/** The checks a case's moving-load envelopes fail, each with where the load was. */
function movingFailures(project: Project, c: CaseResult, units: UnitSystem): string[] {
  const out: string[] = [];
  const x0 = project.supports[0]?.x ?? 0;
  const first = project.supports[0]?.label?.trim() || 'Fixing 1';
  for (const m of c.movingLoads ?? []) {
    const at = (x: number) => `with ${m.label} at ${formatLength(units, x - x0)} from ${first}`;
    if (m.utilisation > 1)
      out.push(
        `${at(m.maxTensionAt)}: tension ${formatForceShort(units, m.maxTension)} is ${percent(m.utilisation)} of the working limit ${formatForceShort(units, workingLimitN(c))}`,
      );
    if (m.clearance < project.limits.minClearance)
      out.push(
        `${at(m.clearanceAt)}: clearance over the whole span ${formatLength(units, m.clearance)}, needs ${formatLength(units, project.limits.minClearance)}`,
      );
    for (const z of m.zoneClearances)
      if (!z.ok)
        out.push(
          `${at(z.at)}: clearance at ${z.label} ${formatLength(units, z.clearance)}, needs ${formatLength(units, z.required)}`,
        );
    if (!m.ok && out.length === 0) out.push(`${m.label}: some positions could not be solved`);
  }
  return out;
}

/** The findings beside a case's row: what fails, or that it passes and what it governs. */
export function caseFindings(
  project: Project,
  results: ProjectResults,
  c: CaseResult,
  units: UnitSystem,
): string {
  const failures = caseFailures(project, c, units);
  if (!c.solved) return `Not solved: ${failures[0]}`;
  if (failures.length > 0) return `Fails: ${failures.join('; ')}.`;
  const governs: string[] = [];
  if (results.governingIds.tension === c.id) governs.push('governs tension');
  if (results.governingIds.clearance === c.id) governs.push('governs clearance');
  return governs.length ? `Passes; ${governs.join(', ')}.` : 'Passes.';
}

/** The verdict in words: pass, or which case fails which check and by how much. */
export function verdict(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): { pass: boolean; text: string } {
  const failing = results.cases.filter((c) => !c.ok);
  if (failing.length === 0) {
    const solved = solvedCases(results);
    const t = extreme(solved, (c) => c.utilisation, true);
    const g = governingClearance(project, results);
    const clearance = g
      ? ` The least clearance margin is ${formatLength(units, g.clearance - g.required)}: ${formatLength(units, g.clearance)} against ${formatLength(units, g.required)} required ${g.requirement === 'the whole span' ? 'over the whole span' : `at ${g.requirement}`} (${g.caseName}).`
      : '';
    return {
      pass: true,
      text: `PASS. Every case passes every check. The largest tension, ${formatForceShort(units, t.maxTension)} (${t.name}), is ${percent(t.utilisation)} of the working limit.${clearance}`,
    };
  }
  const reasons = failing.map((c) => {
    const failures = caseFailures(project, c, units);
    return c.solved
      ? `${c.name} fails: ${failures.join('; ')}`
      : `${c.name} could not be solved: ${failures[0]}`;
  });
  return {
    pass: false,
    text: `FAIL. ${failing.length} of ${results.cases.length} cases fail. ${reasons.join('. ')}. Do not install this design as it stands.`,
  };
}

/** One sentence a client can read: pass or fail, the governing tension and clearance. */
export function summaryLine(project: Project, results: ProjectResults, units: UnitSystem): string {
  const solved = solvedCases(results);
  const failing = results.cases.filter((c) => !c.ok).map((c) => c.name);
  const head =
    failing.length === 0
      ? `All ${results.cases.length} cases pass`
      : `${failing.length} of ${results.cases.length} cases fail (${failing.join(', ')})`;
  if (solved.length === 0) return `${head}; no case could be solved.`;
  const tension = extreme(solved, (c) => c.maxTension, true);
  const g = governingClearance(project, results);
  const clearance = g
    ? `least clearance ${formatLength(units, g.clearance)} (${g.caseName}) against ${formatLength(units, g.required)} required ${g.requirement === 'the whole span' ? 'over the whole span' : `at ${g.requirement}`}`
    : 'no clearance result';
  return `${head}: largest tension ${formatForceShort(units, tension.maxTension)} (${tension.name}) is ${percent(tension.utilisation)} of the working limit; ${clearance}.`;
}

export function keyNumbers(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): KeyNumber[] {
  const install = results.cases[0];
  const solved = solvedCases(results);
  const at = fq(units, 'temperature', project.installation.temperature);
  const numbers: KeyNumber[] = [
    {
      label: 'Cut length',
      value: formatLength(units, results.unstressedLength),
      note: `unstressed, at ${at}`,
    },
  ];
  if (install?.solved)
    numbers.push({
      label: 'Set on the day',
      value: `sag ${formatLength(units, install.sag)}`,
      note: `horizontal pull ${formatForceShort(units, install.horizontalTension)} at ${at}`,
    });
  if (solved.length === 0) return numbers;
  const t = extreme(solved, (c) => c.maxTension, true);
  const movingT = worstMoving(project, solved, 'tension');
  numbers.push(
    movingT && movingT.m.maxTension > t.maxTension
      ? {
          label: 'Largest tension',
          value: formatForceShort(units, movingT.m.maxTension),
          note: `${percent(movingT.m.utilisation)} of the working limit ${formatForceShort(units, workingLimitN(movingT.c))}, ${movingT.c.name}, ${movingT.m.label} at ${formatLength(units, movingT.m.maxTensionAt - (project.supports[0]?.x ?? 0))}`,
        }
      : {
          label: 'Largest tension',
          value: formatForceShort(units, t.maxTension),
          note: `${percent(t.utilisation)} of the working limit ${formatForceShort(units, workingLimitN(t))}, ${t.name}`,
        },
  );
  const g = governingClearance(project, results);
  const movingC = worstMoving(project, solved, 'clearance');
  if (g && movingC && movingC.margin < g.clearance - g.required) {
    const spare = movingC.margin;
    numbers.push({
      label: 'Least clearance',
      value: formatLength(units, movingC.clearance),
      note: `${formatLength(units, movingC.required)} required ${movingC.where}: ${formatLength(units, Math.abs(spare))} ${spare >= 0 ? 'to spare' : 'short'}, ${movingC.c.name}, ${movingC.m.label} at ${formatLength(units, movingC.at - (project.supports[0]?.x ?? 0))}`,
    });
  } else if (g) {
    const spare = g.clearance - g.required;
    const where =
      g.requirement === 'the whole span' ? 'over the whole span' : `at ${g.requirement}`;
    numbers.push({
      label: 'Least clearance',
      value: formatLength(units, g.clearance),
      note: `${formatLength(units, g.required)} required ${where}: ${formatLength(units, Math.abs(spare))} ${spare >= 0 ? 'to spare' : 'short'}, ${g.caseName}`,
    });
  }
  const pulls = solved.flatMap((r) => r.supports.map((s, i) => ({ r, s, i })));
  const pull = pulls.reduce((a, b) => (b.s.resultant > a.s.resultant ? b : a), pulls[0]);
  if (pull)
    numbers.push({
      label: 'Largest fixing load',
      value: formatForceShort(units, pull.s.resultant),
      note: `${pull.s.angle.toFixed(0)}° below horizontal on ${project.supports[pull.i]?.label?.trim() || `Fixing ${pull.i + 1}`}, ${pull.r.name}`,
    });
  return numbers;
}

function caseVerdict(c: CaseResult): string {
  if (!c.solved) return 'NOT SOLVED';
  return c.ok ? 'PASS' : 'FAIL';
}

/** The weather of a case in a few words ("−10 °C, ice 6.5 mm, wind 25 m/s"). */
export function weatherText(project: Project, c: CaseResult, units: UnitSystem): string {
  const w = weatherCaseOfId(project.cases, c.id);
  const parts = [fq(units, 'temperature', c.temperature)];
  if (w && w.iceThickness > 0) parts.push(`ice ${fq(units, 'diameter', w.iceThickness)}`);
  if (w && w.windSpeed > 0) parts.push(`wind ${fq(units, 'speed', w.windSpeed)}`);
  if (w && !w.withLoads) parts.push('no hung loads');
  if (!w) parts.push(project.installation.withLoads ? 'still air' : 'still air, no hung loads');
  return parts.join(', ');
}

export const CASE_HEAD = [
  'Case',
  'Weather',
  'H',
  'Largest T',
  'Use',
  'Sag',
  'Clearance',
  'Swing',
  'Result',
  'Findings',
];

export function caseTable(project: Project, results: ProjectResults, units: UnitSystem): Table {
  return {
    head: CASE_HEAD,
    rows: results.cases.map((c) => {
      const blank = (text: string) => (c.solved ? text : '-');
      return [
        c.name,
        weatherText(project, c, units),
        blank(formatForceShort(units, c.horizontalTension)),
        blank(formatForceShort(units, c.maxTension)),
        blank(percent(c.utilisation)),
        blank(formatLength(units, c.sag, true)),
        blank(formatLength(units, c.clearance, true)),
        blank(formatLength(units, c.swing, true)),
        caseVerdict(c),
        caseFindings(project, results, c, units),
      ];
    }),
  };
}

/** The case table's column legend, with the working limit in numbers. */
export function caseLegend(project: Project, results: ProjectResults, units: UnitSystem): string {
  const solved = solvedCases(results).find((c) => c.utilisation > 0);
  const limit = solved ? ` = ${formatForceShort(units, workingLimitN(solved))}` : '';
  return (
    'H: horizontal tension. Largest T: largest wire tension, at a fixing. Use: largest tension as a share of the working limit ' +
    `(minimum breaking load ÷ safety factor ${project.limits.safetyFactor}${limit}). Sag: largest drop below the straight line between fixings. ` +
    'Clearance: least height of the wire above the ground line over the whole span. Swing: sideways movement in wind.'
  );
}

export { endFittingsLine, installationLines } from './reportBasis.ts';
