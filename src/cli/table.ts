/** Plain-text tables for people: the results of a project and the wire catalogue. */
import {
  CAUTIONS,
  MOVING_LOAD_CAUTION,
  type MovingLoadResult,
  type ProjectResults,
  type SupportReaction,
  type WireProperties,
} from '../core/index.ts';

/** Columns padded to a common width: the first `leftColumns` left-aligned; a free-text last column. */
function pad(cells: string[][], leftColumns = 1, freeLast = false): string {
  const widths = cells[0].map((_, k) => Math.max(...cells.map((row) => row[k].length)));
  const last = cells[0].length - 1;
  const cellText = (cell: string, k: number) => {
    if (freeLast && k === last) return cell;
    return k < leftColumns ? cell.padEnd(widths[k]) : cell.padStart(widths[k]);
  };
  return cells.map((row) => row.map(cellText).join('  ')).join('\n');
}

const n = (value: number, digits: number) => value.toFixed(digits);

/** The general cautions, and the moving-load one when the results carry a moving load. */
function tableCautions(results: ProjectResults) {
  const moving = results.cases.some((c) => c.movingLoads !== undefined);
  return moving ? [...CAUTIONS, MOVING_LOAD_CAUTION] : CAUTIONS;
}

function movingLoadLine(m: MovingLoadResult): string {
  return `  ${m.label} (moving): largest tension ${n(m.maxTension, 0)} N with the load at ${n(m.maxTensionAt, 2)} m; lowest clearance ${n(m.clearance, 3)} m with the load at ${n(m.clearanceAt, 2)} m — ${m.ok ? 'pass' : 'FAIL'}`;
}

export function resultsTable(title: string, results: ProjectResults): string {
  const header = [
    'Case',
    'H (N)',
    'T max (N)',
    'Util. (%)',
    'Sag (m)',
    'Lowest z (m)',
    'Clearance (m)',
    'Swing (m)',
    'Iter.',
    'Check',
  ];
  const rows = results.cases.map((c) => [
    c.name,
    n(c.horizontalTension, 0),
    n(c.maxTension, 0),
    n(c.utilisation * 100, 1),
    n(c.sag, 3),
    n(c.lowestPoint.z, 3),
    n(c.clearance, 3),
    n(c.swing, 3),
    String(c.iterations),
    c.ok ? 'pass' : 'FAIL',
  ]);
  const fittings = results.endFittings;
  const fittingLine = fittings.stated
    ? `End fittings: start ${fittings.start.label} (${n(fittings.start.efficiency * 100, 0)} %), end ${fittings.end.label} (${n(fittings.end.efficiency * 100, 0)} %); utilisation uses ${n(fittings.efficiency * 100, 0)} % of the breaking load.`
    : 'End fittings: not stated; utilisation assumes terminations as strong as the wire.';
  const lines = [
    title,
    `Cut (unstressed) length at installation: ${n(results.unstressedLength, 4)} m`,
    fittingLine,
    '',
    pad([header, ...rows]),
    '',
  ];
  for (const c of results.cases) {
    lines.push(`${c.name} — support reactions (wire's pull on the support):`);
    const support = c.supports.map((s, i) => [
      `  support ${i + 1} (${s.attachment === 'swingLink' ? 'swing link' : s.attachment})`,
      `horizontal ${n(s.horizontal, 0)} N`,
      `vertical ${n(s.vertical, 0)} N`,
      `lateral ${n(s.lateral, 0)} N`,
      `resultant ${n(s.resultant, 0)} N`,
      `at ${n(s.angle, 1)}° below horizontal`,
      wireSides(s),
    ]);
    lines.push(pad(support, 1, true));
    for (const z of c.zoneClearances) {
      lines.push(
        `  ${z.label}: clearance ${n(z.clearance, 3)} m, required ${n(z.required, 3)} m — ${z.ok ? 'pass' : 'FAIL'}`,
      );
    }
    for (const m of c.movingLoads ?? []) lines.push(movingLoadLine(m));
    for (const m of c.messages) lines.push(`  ! ${m}`);
    lines.push(`  estimated discretisation error ${c.discretisationError.toExponential(1)}`);
  }
  lines.push(
    '',
    `Set-up chart — tension and sag to set on the day (span ${results.setUpSpan + 1}, installation loads, still air):`,
  );
  const setUp = results.setUpChart.map((r) => [
    `${n(r.temperature, 0)} °C`,
    n(r.horizontalTension, 0),
    n(r.maxTension, 0),
    n(r.sag, 3),
    r.returnTime === null ? 'n/a (loads hung)' : n(r.returnTime, 2),
  ]);
  lines.push(pad([['Temperature', 'H (N)', 'T max (N)', 'Sag (m)', 'Pulse return (s)'], ...setUp]));
  const mesh = results.mesh;
  lines.push(
    '',
    `Governing: tension in "${results.governing.tension}", clearance in "${results.governing.clearance}".`,
    `Mesh: ${mesh.elementsPerSpan} elements per span${mesh.refinement > 1 ? ` (refined ×${mesh.refinement} automatically)` : ''}; largest estimated discretisation error ${mesh.largestError.toExponential(1)}${mesh.reached ? '' : ` — above the ${mesh.errorTarget.toExponential(0)} target`}.`,
    '',
    'Cautions:',
    ...tableCautions(results).map((c) => `  - ${c.title}: ${c.text}`),
  );
  return lines.join('\n');
}

/** The wire on each side of a support: tension and angle below the horizontal. */
function wireSides(s: SupportReaction): string {
  const side = (where: string, tension?: number, angle?: number) =>
    tension === undefined || angle === undefined
      ? []
      : [`${where} ${n(tension, 0)} N at ${n(angle, 1)}°`];
  return [
    ...side('wire before', s.tensionBefore, s.angleBefore),
    ...side('wire after', s.tensionAfter, s.angleAfter),
  ].join(', ');
}

export function catalogTable(wires: readonly WireProperties[]): string {
  const header = [
    'Id',
    'Wire',
    'd (mm)',
    'Mass (kg/m)',
    'EA (kN)',
    'Alpha (1e-6/K)',
    'Breaking (kN)',
    'Sources',
  ];
  const rows = wires.map((w) => [
    w.id,
    w.label,
    n(w.diameter * 1000, 2),
    n(w.massPerLength, 4),
    n(w.axialStiffness / 1000, 0),
    n(w.thermalExpansion * 1e6, 1),
    n(w.breakingLoad / 1000, 2),
    `mass: ${w.sources.massPerLength}; breaking: ${w.sources.breakingLoad}; EA: ${w.sources.axialStiffness}`,
  ]);
  return pad([header, ...rows], 2, true);
}
