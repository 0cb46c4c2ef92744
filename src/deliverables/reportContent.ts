/**
 * The words and numbers of the client report, independent of the page: summary line, key
 * numbers, the case table with pass/fail, the inputs and the method in plain words. Values are
 * SI in the project and results, shown in the chosen display units.
 */
import type { CaseResult, Project, ProjectResults } from '../core/index.ts';
import { DEFAULT_MODEL, resolveEndFittings, resolveWire, weatherCaseOfId } from '../core/index.ts';
import { attachmentWords } from './attachmentWords.ts';
import { formatForceShort, formatQuantity as fq, type UnitSystem } from './displayUnits.ts';

export interface KeyNumber {
  label: string;
  value: string;
  note: string;
}

export type TableRow = string[];

export interface Table {
  head: string[];
  rows: TableRow[];
}

const percent = (ratio: number) => `${Math.round(ratio * 100)} %`;

function solvedCases(results: ProjectResults): CaseResult[] {
  return results.cases.filter((c) => c.solved);
}

function extreme(cases: CaseResult[], pick: (c: CaseResult) => number, largest: boolean) {
  return cases.reduce((a, b) => ((largest ? pick(b) > pick(a) : pick(b) < pick(a)) ? b : a));
}

/** One sentence a client can read: pass or fail, the governing tension and clearance. */
export function summaryLine(project: Project, results: ProjectResults, units: UnitSystem): string {
  const solved = solvedCases(results);
  const failing = results.cases.filter((c) => !c.ok).map((c) => c.name);
  const verdict =
    failing.length === 0
      ? `All ${results.cases.length} cases pass`
      : `${failing.length} of ${results.cases.length} cases fail (${failing.join(', ')})`;
  if (solved.length === 0) return `${verdict}; no case could be solved.`;
  const tension = extreme(solved, (c) => c.maxTension, true);
  const clearance = extreme(solved, (c) => c.clearance, false);
  return (
    `${verdict}: largest tension ${formatForceShort(units, tension.maxTension)} (${tension.name}) is ` +
    `${percent(tension.utilisation)} of the working limit; least clearance ` +
    `${fq(units, 'length', clearance.clearance)} (${clearance.name}) against ` +
    `${fq(units, 'length', project.limits.minClearance)} required.`
  );
}

function targetText(project: Project, units: UnitSystem): string {
  const t = project.installation.target;
  const where = t.case ? ` in case "${t.case}"` : ' at installation';
  if (t.horizontalTension !== undefined)
    return `horizontal tension ${fq(units, 'force', t.horizontalTension)}${where}`;
  if (t.maxTension !== undefined)
    return `largest tension ${fq(units, 'force', t.maxTension)}${where}`;
  if (t.sag !== undefined)
    return `sag ${fq(units, 'length', t.sag)}${where}${t.span !== undefined ? `, span ${t.span + 1}` : ''}`;
  return `cut length ${fq(units, 'length', t.unstressedLength ?? 0)}`;
}

export function keyNumbers(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): KeyNumber[] {
  const install = results.cases[0];
  const solved = solvedCases(results);
  const numbers: KeyNumber[] = [
    {
      label: 'Cut length',
      value: fq(units, 'length', results.unstressedLength),
      note: `unstressed, at ${fq(units, 'temperature', project.installation.temperature)}`,
    },
  ];
  if (install?.solved)
    numbers.push({
      label: 'Set on the day',
      value: `sag ${fq(units, 'length', install.sag)}`,
      note: `horizontal pull ${formatForceShort(units, install.horizontalTension)} at ${fq(units, 'temperature', project.installation.temperature)}`,
    });
  if (solved.length > 0) {
    const t = extreme(solved, (c) => c.maxTension, true);
    const c = extreme(solved, (r) => r.clearance, false);
    const pulls = solved.flatMap((r) => r.supports.map((s) => ({ r, s })));
    const pull = pulls.reduce((a, b) => (b.s.resultant > a.s.resultant ? b : a), pulls[0]);
    numbers.push(
      {
        label: 'Largest tension',
        value: formatForceShort(units, t.maxTension),
        note: `${percent(t.utilisation)} of limit, ${t.name}`,
      },
      { label: 'Least clearance', value: fq(units, 'length', c.clearance), note: c.name },
    );
    if (pull)
      numbers.push({
        label: 'Largest fixing load',
        value: formatForceShort(units, pull.s.resultant),
        note: `${pull.s.angle.toFixed(0)}° down, ${pull.r.name}`,
      });
  }
  return numbers;
}

function caseVerdict(c: CaseResult): string {
  if (!c.solved) return 'NOT SOLVED';
  return c.ok ? 'PASS' : 'FAIL';
}

export function caseTable(project: Project, results: ProjectResults, units: UnitSystem): Table {
  return {
    head: [
      'Case',
      'Temp.',
      'Ice',
      'Wind',
      'H',
      'Largest T',
      'Use',
      'Sag',
      'Clearance',
      'Swing',
      'Result',
    ],
    rows: results.cases.map((c) => {
      const w = weatherCaseOfId(project.cases, c.id);
      const blank = (text: string) => (c.solved ? text : '-');
      return [
        c.name,
        fq(units, 'temperature', c.temperature),
        w ? fq(units, 'diameter', w.iceThickness) : '-',
        w ? fq(units, 'speed', w.windSpeed) : '-',
        blank(fq(units, 'force', c.horizontalTension)),
        blank(fq(units, 'force', c.maxTension)),
        blank(percent(c.utilisation)),
        blank(fq(units, 'length', c.sag)),
        blank(fq(units, 'length', c.clearance)),
        blank(fq(units, 'length', c.swing)),
        caseVerdict(c),
      ];
    }),
  };
}

/** Messages the solver attached to failing or unsolved cases, prefixed by the case name. */
export function caseMessages(results: ProjectResults): string[] {
  return results.cases.flatMap((c) => c.messages.map((m) => `${c.name}: ${m}`));
}

export function supportTable(project: Project, results: ProjectResults, units: UnitSystem): Table {
  const solved = solvedCases(results);
  return {
    head: ['Support', 'x', 'Height', 'Fixing', 'Largest pull', 'Angle', 'Case'],
    rows: project.supports.map((s, i) => {
      const worst = solved.length
        ? extreme(solved, (c) => c.supports[i]?.resultant ?? 0, true)
        : undefined;
      const reaction = worst?.supports[i];
      return [
        s.label ?? `Support ${i + 1}`,
        fq(units, 'length', s.x),
        fq(units, 'length', s.z),
        attachmentWords(project, i),
        reaction ? fq(units, 'force', reaction.resultant) : '-',
        reaction ? `${reaction.angle.toFixed(0)}°` : '-',
        worst?.name ?? '-',
      ];
    }),
  };
}

export function wireLines(project: Project, units: UnitSystem): [string, string, string][] {
  const wire = resolveWire(project.wire);
  if (!wire) return [['Wire', 'not in the catalogue', '']];
  return [
    ['Wire', `${wire.label} (${wire.construction})`, wire.kind],
    ['Diameter', fq(units, 'diameter', wire.diameter), wire.sources.diameter],
    ['Mass', fq(units, 'massPerLength', wire.massPerLength), wire.sources.massPerLength],
    [
      'Axial stiffness EA',
      `${(wire.axialStiffness / 1000).toFixed(0)} kN`,
      wire.sources.axialStiffness,
    ],
    [
      'Thermal expansion',
      `${(wire.thermalExpansion * 1e6).toFixed(1)} x 10^-6 /K`,
      wire.sources.thermalExpansion,
    ],
    ['Minimum breaking load', fq(units, 'force', wire.breakingLoad), wire.sources.breakingLoad],
  ];
}

export function loadTable(project: Project, units: UnitSystem): Table {
  return {
    head: ['Load', 'Kind', 'Where', 'Amount'],
    rows: project.loads.map((load, i) => {
      const label = load.label ?? `Load ${i + 1}`;
      if (load.type === 'point')
        return [
          label,
          'point',
          `x = ${fq(units, 'length', load.x)}`,
          (load.mass !== undefined
            ? fq(units, 'mass', load.mass)
            : fq(units, 'force', load.force ?? 0)) + hungExtras(load, units),
        ];
      return [
        label,
        'uniform',
        `${fq(units, 'length', load.from)} to ${fq(units, 'length', load.to)}`,
        fq(units, 'massPerLength', load.massPerLength) + hungExtras(load, units),
      ];
    }),
  };
}

/** The end fittings and the working limit they set (one line for the design basis). */
export function endFittingsLine(project: Project): string {
  const f = resolveEndFittings(project.limits.endFittings);
  const pct = (e: number) => `${Math.round(e * 1000) / 10} %`;
  if (!f.stated)
    return `End fittings: not stated; the working limit assumes terminations as strong as the wire (breaking load / ${project.limits.safetyFactor}).`;
  return `End fittings: first fixing ${f.start.label} (${pct(f.start.efficiency)}; ${f.start.source}), last fixing ${f.end.label} (${pct(f.end.efficiency)}; ${f.end.source}). Working limit = breaking load x ${pct(f.efficiency)} / ${project.limits.safetyFactor}.`;
}

/** Wind area and drop of a hung item, when stated. */
function hungExtras(load: Project['loads'][number], units: UnitSystem): string {
  const parts: string[] = [];
  if (load.type === 'point' && load.windArea)
    parts.push(
      `wind area ${load.windArea} m2${load.dragCoefficient !== undefined ? `, Cd ${load.dragCoefficient}` : ''}`,
    );
  if (load.drop) parts.push(`hangs ${fq(units, 'length', load.drop)} below the wire`);
  return parts.length ? `; ${parts.join(', ')}` : '';
}

export function installationLines(project: Project, units: UnitSystem): string[] {
  const inst = project.installation;
  const limits = project.limits;
  const zones = (limits.zones ?? []).map(
    (z) =>
      `${z.label ?? 'zone'} from ${fq(units, 'length', z.from)} to ${fq(units, 'length', z.to)} needs ${fq(units, 'length', z.height)}`,
  );
  return [
    `Installed at ${fq(units, 'temperature', inst.temperature)} ${inst.withLoads ? 'with' : 'without'} the hung loads, to a ${targetText(project, units)}.`,
    `Safety factor on the minimum breaking load: ${limits.safetyFactor}. Minimum clearance over the ground: ${fq(units, 'length', limits.minClearance)}.`,
    endFittingsLine(project),
    ...(zones.length ? [`Clearance zones: ${zones.join('; ')}.`] : []),
  ];
}

export function methodParagraphs(
  project: Project,
  results: ProjectResults,
  parabola?: { caseName: string; differenceM: number } | null,
  units: UnitSystem = 'si',
): string[] {
  const model = { ...DEFAULT_MODEL, ...project.model };
  const order = model.elementOrder === 2 ? 'three-node (quadratic)' : 'two-node (linear)';
  const worstMesh = Math.max(0, ...results.cases.map((c) => c.discretisationError));
  return [
    `The wire is treated as a taut string and divided into ${results.mesh.elementsPerSpan} ${order} string finite elements per span${results.mesh.refinement > 1 ? ` (refined automatically from ${model.elementsPerSpan} until the error estimate fell below ${results.mesh.errorTarget.toExponential(0)})` : ''}, with a node at every support and every point load. Each case is solved for the horizontal tension that makes the stretched wire exactly as long as the wire cut at installation, after thermal expansion and elastic stretch (EA).`,
    model.theory === 'exact'
      ? 'Theory: exact. The wire weight acts per metre of wire, so the shape is the elastic catenary.'
      : 'Theory: parabolic. The wire weight acts per horizontal metre, the classic approximation for shallow spans.',
    'Ice adds a ring of the stated thickness around the wire and any cable (on a hung cable per metre of cable along the wire); wind acts across the span on the iced diameter and on the stated area of signs and lamps, and swings the wire sideways. Clearance is measured to the lowest of the wire and anything hanging below it. Tension, sag, clearance and the pull on each fixing follow for every case.',
    `Check against closed forms: the dashed lines on the plot are the closed-form parabola for the same span and loads${parabola ? `; the largest difference is ${fq(units, 'diameter', parabola.differenceM)} (${parabola.caseName})` : ''}. The mesh error estimate is ${worstMesh < 1e-5 ? 'below 0.001 %' : `at most ${(worstMesh * 100).toFixed(3)} %`}.`,
  ];
}
