/**
 * The design basis in words: the wire and where each of its values comes from (every source tag
 * explained), end fittings, the safety factor and working limit, the clearance requirements and
 * where each applies, the weather cases and what they stand for, the hung loads, the
 * installation, theory and mesh with the estimated discretisation error, and the standing
 * cautions. Values are SI in the project and results, shown in the chosen units.
 */
import type { Project, ProjectResults, WeatherCase } from '../core/index.ts';
import { caseResultId, DEFAULT_MODEL, resolveEndFittings, resolveWire } from '../core/index.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';
import type { Table } from './reportContent.ts';

/** What each value-source tag means; every tag is explained whether or not it is used. */
export const SOURCE_TAGS: readonly [string, string][] = [
  ['[V]', 'read in the named source (standard, handbook or maker’s table)'],
  ['[D]', 'derived from [V] values by the method stated'],
  ['[M]', 'from memory, not yet checked against a source: confirm before relying on it'],
  ['[CP]', 'common practice of the trade, no single source'],
];

export function sourceTagLegend(): string {
  return `Source tags: ${SOURCE_TAGS.map(([tag, text]) => `${tag} ${text}`).join('; ')}. “Entered by user”: a value typed into the project, the user’s to confirm.`;
}

export function wireTable(project: Project, units: UnitSystem): Table {
  const wire = resolveWire(project.wire);
  if (!wire)
    return { head: ['Property', 'Value', 'Source'], rows: [['Wire', 'not in the catalogue', '']] };
  const expansion =
    units === 'si' ? wire.thermalExpansion * 1e6 : (wire.thermalExpansion * 1e6) / 1.8;
  return {
    head: ['Property', 'Value', 'Source'],
    rows: [
      ['Wire', `${wire.label} (${wire.construction}, ${wire.kind})`, wire.notes ?? ''],
      ['Diameter', fq(units, 'diameter', wire.diameter), wire.sources.diameter],
      ['Mass', fq(units, 'massPerLength', wire.massPerLength), wire.sources.massPerLength],
      [
        'Axial stiffness EA',
        fq(units, 'stiffness', wire.axialStiffness, 0),
        wire.sources.axialStiffness,
      ],
      [
        'Thermal expansion',
        `${expansion.toFixed(1)} × 10⁻⁶ per ${units === 'si' ? 'K' : '°F'}`,
        wire.sources.thermalExpansion,
      ],
      [
        'Minimum breaking load',
        formatForceShort(units, wire.breakingLoad),
        wire.sources.breakingLoad,
      ],
    ],
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

/** The installation, limits and end fittings as lines (the design basis in short). */
export function installationLines(project: Project, units: UnitSystem): string[] {
  return [
    installationText(project, units),
    `Safety factor on the minimum breaking load: ${project.limits.safetyFactor}.`,
    endFittingsLine(project),
    clearanceText(project, units),
  ];
}

/** Safety factor, working limit and end fittings in one paragraph. */
export function limitText(project: Project, units: UnitSystem): string {
  const wire = resolveWire(project.wire);
  const sf = project.limits.safetyFactor;
  const fittings = resolveEndFittings(project.limits.endFittings);
  const limit = wire
    ? ` = ${formatForceShort(units, (wire.breakingLoad * fittings.efficiency) / sf)}`
    : '';
  if (fittings.stated)
    return `Working limit = minimum breaking load × end-fitting efficiency ${Math.round(fittings.efficiency * 1000) / 10} % ÷ safety factor ${sf}${limit}. ${endFittingsLine(project).replace(/ Working limit = .*$/, '')}`;
  return (
    `Working limit = minimum breaking load ÷ safety factor ${sf}${limit}. ` +
    'End fittings: none stated, so the check takes the terminations to be as strong as the wire; grips, ferrules and spliced eyes often hold 80–90 % of it [CP]: ' +
    'use terminations rated for the full breaking load, or raise the safety factor to cover them.'
  );
}

/** The clearance requirements and where each applies, in one sentence. */
export function clearanceText(project: Project, units: UnitSystem): string {
  const first = project.supports[0].x;
  const last = project.supports[project.supports.length - 1].x;
  const zones = (project.limits.zones ?? []).map(
    (z, i) =>
      `${z.label?.trim() || `Zone ${i + 1}`}, ${formatLength(units, z.from)} to ${formatLength(units, z.to)} along the span: ${formatLength(units, z.height)}`,
  );
  return (
    'Clearance required, least height of the wire and anything hung from it above the ground line: ' +
    [
      `whole span, ${formatLength(units, first)} to ${formatLength(units, last)}: ${formatLength(units, project.limits.minClearance)}`,
      ...zones,
    ].join('; ') +
    '. The heights are the project’s; local codes set the real ones.'
  );
}

/** What a weather case stands for, in words, from its weather relative to the installation. */
export function casePurpose(project: Project, w: WeatherCase, results: ProjectResults): string {
  const parts: string[] = [];
  const dt = w.temperature - project.installation.temperature;
  if (dt > 0) parts.push('heat: longer wire, more sag');
  if (dt < 0) parts.push('cold: shorter wire, more tension');
  if (w.iceThickness > 0) parts.push('ice: more weight');
  if (w.windSpeed > 0) parts.push('wind: swing, more tension');
  const id = caseResultId(project.cases.indexOf(w));
  const governs: string[] = [];
  if (results.governingIds.tension === id) governs.push('tension');
  if (results.governingIds.clearance === id) governs.push('clearance');
  const text = parts.length ? parts.join('; ') : 'the installation weather again';
  return governs.length ? `${text}; governs ${governs.join(' and ')}.` : `${text}.`;
}

/** The weather cases and what each stands for, in one paragraph (their weather is in the case table). */
export function weatherText(project: Project, results: ProjectResults): string {
  if (project.cases.length === 0)
    return 'Weather cases: none; only the installation state is checked.';
  const items = project.cases.map((w) => `${w.name} — ${casePurpose(project, w, results)}`);
  return `Weather cases and what each stands for (their weather is in the case table). ${items.join(' ')}`;
}

export function loadsText(project: Project, units: UnitSystem): string {
  if (project.loads.length === 0) return 'Hung loads: none; the wire carries its own weight only.';
  const items = project.loads.map((load, i) => {
    const label = load.label?.trim() || `Load ${i + 1}`;
    if (load.type === 'point') {
      const amount =
        load.mass !== undefined
          ? fq(units, 'mass', load.mass)
          : fq(units, 'force', load.force ?? 0);
      return `${label}, ${amount} at ${formatLength(units, load.x)}`;
    }
    if (load.type === 'uniform')
      return `${label}, ${fq(units, 'massPerLength', load.massPerLength)} from ${formatLength(units, load.from)} to ${formatLength(units, load.to)}`;
    return label;
  });
  return `Hung loads: ${items.join('; ')}.`;
}

function targetText(project: Project, units: UnitSystem): string {
  const t = project.installation.target;
  const where = t.case ? ` in case “${t.case}”` : ' at installation';
  if (t.horizontalTension !== undefined)
    return `horizontal tension ${formatForceShort(units, t.horizontalTension)}${where}`;
  if (t.maxTension !== undefined)
    return `largest tension ${formatForceShort(units, t.maxTension)}${where}`;
  if (t.sag !== undefined) return `sag ${formatLength(units, t.sag)}${where}`;
  return `cut length ${formatLength(units, t.unstressedLength ?? 0)}`;
}

export function installationText(project: Project, units: UnitSystem): string {
  const inst = project.installation;
  return `Installed at ${fq(units, 'temperature', inst.temperature)} ${inst.withLoads ? 'with' : 'without'} the hung loads, to a ${targetText(project, units)}; every weather case is the same cut length of wire in that weather.`;
}

/** Theory, mesh and the estimated discretisation error, with the closed-form comparison. */
export function methodText(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
  parabola?: { caseName: string; differenceM: number } | null,
): string {
  const model = { ...DEFAULT_MODEL, ...project.model };
  const order = model.elementOrder === 2 ? 'three-node (quadratic)' : 'two-node (linear)';
  const worst = Math.max(0, ...results.cases.map((c) => c.discretisationError));
  const theory =
    model.theory === 'exact'
      ? 'Theory: exact (the wire’s weight acts per metre of wire: the elastic catenary).'
      : 'Theory: parabolic (the wire’s weight acts per horizontal metre, the classic approximation for shallow spans).';
  const error = worst < 1e-5 ? 'below 0.001 %' : `at most ${(worst * 100).toFixed(3)} %`;
  const notices = (results.notices ?? []).map((n) => ` ${n}`).join('');
  const compare = parabola
    ? ` The closed-form parabola drawn dashed on the plot differs from it by at most ${fq(units, 'diameter', parabola.differenceM, units === 'si' ? 2 : 3)} (${parabola.caseName}).`
    : '';
  return (
    `${theory} Mesh: ${results.mesh.elementsPerSpan} ${order} string finite elements per span${results.mesh.refinement > 1 ? ` (refined automatically from ${model.elementsPerSpan})` : ''}, a node at every fixing and point load; ` +
    'each case is the wire cut at installation, stretched and warmed or cooled to fit. ' +
    `Estimated discretisation error (against the mesh refined, Richardson): ${error} in tension and sag${results.mesh.reached ? '' : `, above the target ${(results.mesh.errorTarget * 100).toFixed(3)} %: treat the last digits as estimates`}.${compare}${notices}`
  );
}
