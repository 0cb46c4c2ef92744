/**
 * The appendices a person ticks in the report dialog: the set-up chart (what to set on other
 * days), the moving-load envelope, the wires considered, and the project's inputs in full.
 * They start on a fresh page after the record, lettered A, B, C … in the order printed.
 */
import {
  DEFAULT_ENVIRONMENT,
  DEFAULT_MODEL,
  type Project,
  type ProjectResults,
  resolveWire,
  SUGGESTION_RULE,
  type WireChoice,
} from '../core/index.ts';
import { attachmentWords } from './attachmentWords.ts';
import { inParentheses, windowSpanWords } from './designContent.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';
import { FAIL, PASS, type ReportOptions } from './pdfReport.ts';
import type { Colour, PdfWriter } from './pdfWriter.ts';
import type { Table } from './reportContent.ts';
import {
  fixingName,
  isInstallationRow,
  pulseCheck,
  sagSpanNote,
  setUpExplanation,
  setUpTable,
  spanName,
  temperatureText,
} from './setUpContent.ts';

export interface AppendixChoice {
  setUpChart: boolean;
  movingLoads: boolean;
  wireChoices: boolean;
  inputs: boolean;
}

export const NO_APPENDIX: AppendixChoice = {
  setUpChart: false,
  movingLoads: false,
  wireChoices: false,
  inputs: false,
};

const INSTALLATION_FILL: Colour = [227, 238, 248];
const cols = (weights: number[], right: number[] = []) =>
  weights.map((weight, i) => ({
    weight,
    align: (right.includes(i) ? 'right' : 'left') as 'left' | 'right',
  }));

function setUpAppendix(w: PdfWriter, project: Project, results: ProjectResults, units: UnitSystem) {
  const span = spanName(project, results.setUpSpan);
  w.paragraph(
    `${setUpExplanation(formatLength(units, results.unstressedLength), temperatureText(units, project.installation.temperature))} ${sagSpanNote(span)}`,
    8,
  );
  w.table(setUpTable(project, results, units), cols([1.5, 1.2, 1.2, 1.2, 1], [1, 2, 3, 4]), {
    rowFill: (row) =>
      isInstallationRow(project, results.setUpChart[row]) ? INSTALLATION_FILL : undefined,
    legend: [
      pulseCheck(
        span,
        results.setUpChart.some((row) => row.returnTime !== null),
      ),
    ],
  });
}

/** Every moving load in every case: each check of its envelope with the load's worst position. */
export function movingEnvelopeTable(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
): Table {
  const x0 = project.supports[0].x;
  const at = (x: number) => formatLength(units, x - x0, true);
  const verdict = (ok: boolean) => (ok ? 'Pass' : 'Fail');
  const rows: string[][] = [];
  for (const c of results.cases) {
    for (const m of c.movingLoads ?? []) {
      rows.push([
        c.name,
        m.label,
        'Tension',
        `${formatForceShort(units, m.maxTension)} (${Math.round(100 * m.utilisation)} % of limit)`,
        at(m.maxTensionAt),
        verdict(m.utilisation <= 1),
      ]);
      rows.push([
        c.name,
        m.label,
        'Clearance over the ground',
        `${formatLength(units, m.clearance, true)} (needs ${formatLength(units, project.limits.minClearance, true)})`,
        at(m.clearanceAt),
        verdict(m.clearance >= project.limits.minClearance),
      ]);
      for (const z of m.zoneClearances)
        rows.push([
          c.name,
          m.label,
          `Clearance over ${z.label}`,
          `${formatLength(units, z.clearance, true)} (needs ${formatLength(units, z.required, true)})`,
          at(z.at),
          verdict(z.ok),
        ]);
    }
  }
  return {
    head: [
      'Case',
      'Moving load',
      'Check',
      'Worst value',
      `Load at (from ${fixingName(project, 0)})`,
      '',
    ],
    rows,
  };
}

function movingAppendix(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
) {
  const table = movingEnvelopeTable(project, results, units);
  if (table.rows.length === 0) {
    w.paragraph('This project has no moving load in any case, so there is no envelope to show.', 8);
    return;
  }
  const positions = results.cases.flatMap((c) => (c.movingLoads ?? []).map((m) => m.positions));
  w.paragraph(
    `Each moving load alone, at the design's cut length, solved at ${Math.min(...positions)} to ${Math.max(...positions)} positions along its path per case (an even scan, then the worst position refined). The tension limit is the breaking load with the end fittings divided by the safety factor.`,
    8,
  );
  w.table(table, cols([1.5, 1.4, 1.6, 1.9, 1.1, 0.6], [3, 4]), {
    cellColour: (row, col) =>
      col === 5 ? (table.rows[row][5] === 'Fail' ? FAIL : PASS) : undefined,
    legend: ['Not for lifting or carrying people.'],
  });
}

/** The wires the chooser found to work, lightest first, the project's own marked. */
export function choicesTable(project: Project, choices: WireChoice[], units: UnitSystem): Table {
  const own = resolveWire(project.wire);
  const end = (n: number | null) =>
    n === null ? 'no clearance limit' : formatForceShort(units, n);
  return {
    head: ['Wire', 'Mass', 'Lowest H that passes', 'Highest H that passes', 'Suggested H'],
    rows: choices.map((c) => [
      own && c.label === own.label ? `${c.label} (this design)` : c.label,
      fq(units, 'massPerLength', c.massPerLength),
      end(c.low),
      formatForceShort(units, c.high),
      formatForceShort(units, c.suggestedHorizontalTension),
    ]),
  };
}

const CHOICE_COLUMNS = cols([2.6, 1, 1.2, 1.2, 1], [1, 2, 3, 4]);

function choicesIntro(choices: WireChoice[]): string {
  return `Every wire of the catalogue (and the project's own custom wire) tried on this project; listed are the ${choices.length} that pass every case at some installation tension, lightest first. ${SUGGESTION_RULE.replace('√(lowest × highest)', 'the square root of lowest × highest')}`;
}

/** Height of the wires appendix's intro and table, to keep them on one page when they fit. */
function choicesHeight(w: PdfWriter, project: Project, options: ReportOptions): number {
  const choices = options.wireChoices ?? [];
  if (choices.length === 0) return 0;
  return (
    w.paragraphHeight(choicesIntro(choices), 8) +
    w.tableHeight(choicesTable(project, choices, options.unitSystem), CHOICE_COLUMNS, {
      legend: ['', ''],
    })
  );
}

function choicesAppendix(
  w: PdfWriter,
  project: Project,
  options: ReportOptions,
  units: UnitSystem,
  windowSpan: string,
) {
  const choices = options.wireChoices ?? [];
  if (choices.length === 0) {
    w.paragraph(
      options.wireChoices
        ? 'No wire of the catalogue passes every case of this project at any installation tension.'
        : 'No list of wires considered was made with this report.',
      8,
    );
    return;
  }
  w.paragraph(choicesIntro(choices), 8);
  w.table(choicesTable(project, choices, units), CHOICE_COLUMNS, {
    legend: [
      `H is the installation horizontal tension${inParentheses(windowSpan)} at ${temperatureText(units, project.installation.temperature)} with the installation loads. Each wire passes every case, moving loads included, anywhere between its lowest and highest H.`,
    ],
  });
}

function inputTables(
  project: Project,
  units: UnitSystem,
): { title: string; table: Table; weights: number[] }[] {
  const len = (m: number) => formatLength(units, m);
  const env = { ...DEFAULT_ENVIRONMENT, ...project.environment };
  const model = { ...DEFAULT_MODEL, ...project.model };
  const wire = project.wire;
  return [
    {
      title: 'Fixings',
      weights: [2.4, 1, 1, 1.6],
      table: {
        head: ['Fixing', 'Along the span', 'Height', 'Attachment'],
        rows: project.supports.map((s, i) => {
          return [fixingName(project, i), len(s.x), len(s.z), attachmentWords(project, i)];
        }),
      },
    },
    {
      title: 'Ground line',
      weights: [1, 1],
      table: {
        head: ['Along the span', 'Height'],
        rows: (project.ground ?? []).map((g) => [len(g.x), len(g.z)]),
      },
    },
    {
      title: 'Wire, loads, installation, limits, model',
      weights: [1.6, 4],
      table: {
        head: ['Input', 'Value'],
        rows: [
          [
            'Wire',
            'catalogId' in wire
              ? `catalogue entry “${wire.catalogId}”`
              : `${wire.label}: diameter ${fq(units, 'diameter', wire.diameter)}, mass ${fq(units, 'massPerLength', wire.massPerLength)}, EA ${fq(units, 'stiffness', wire.axialStiffness, 0)}, expansion ${wire.thermalExpansion} /K, breaking load ${fq(units, 'force', wire.breakingLoad)}`,
          ],
          ...project.loads.map((l, i) => [l.label?.trim() || `Load ${i + 1}`, JSON.stringify(l)]),
          ['Installation', JSON.stringify(project.installation)],
          ...project.cases.map((c) => [
            `Case “${c.name}”`,
            `${fq(units, 'temperature', c.temperature)}, ice ${fq(units, 'diameter', c.iceThickness)}, wind ${fq(units, 'speed', c.windSpeed)}, hung loads ${c.withLoads ? 'on' : 'off'}`,
          ]),
          [
            'Limits',
            `safety factor ${project.limits.safetyFactor}, minimum clearance ${len(project.limits.minClearance)}`,
          ],
          ...(project.limits.zones ?? []).map((z, i) => [
            z.label?.trim() || `Zone ${i + 1}`,
            `${len(z.from)} to ${len(z.to)}, needs ${len(z.height)}`,
          ]),
          [
            'Model',
            `${model.theory}, element order ${model.elementOrder}, ${model.elementsPerSpan} elements per span`,
          ],
          [
            'Environment',
            `gravity ${env.gravity} m/s², air ${env.airDensity} kg/m³, ice ${env.iceDensity} kg/m³, drag coefficient ${env.dragCoefficient}`,
          ],
        ],
      },
    },
  ];
}

function inputsAppendix(w: PdfWriter, project: Project, units: UnitSystem) {
  w.paragraph(
    'Every input of the project file as it was when this report was made (the file itself is in SI units; loads and the installation are shown as stored, in SI).',
    8,
  );
  for (const { title, table, weights } of inputTables(project, units)) {
    if (table.rows.length === 0) continue;
    w.paragraph(title, 8.2, 'bold');
    w.table(table, cols(weights), { bodySize: 7.2 });
  }
}

export function appendixSections(
  w: PdfWriter,
  project: Project,
  results: ProjectResults,
  options: ReportOptions,
): void {
  const units = options.unitSystem;
  const sections: [boolean, string, () => void, (() => number)?][] = [
    [
      options.appendix.setUpChart,
      'Set-up chart: setting the wire on other days',
      () => setUpAppendix(w, project, results, units),
    ],
    [
      options.appendix.movingLoads,
      'Moving-load envelope',
      () => movingAppendix(w, project, results, units),
    ],
    [
      options.appendix.wireChoices,
      'Wires considered',
      () => choicesAppendix(w, project, options, units, windowSpanWords(project, results)),
      () => choicesHeight(w, project, options),
    ],
    [
      options.appendix.inputs,
      'The project’s inputs in full',
      () => inputsAppendix(w, project, units),
    ],
  ];
  const chosen = sections.filter(([on]) => on);
  if (chosen.length === 0) return;
  w.newPage();
  chosen.forEach(([, title, draw, height], i) => {
    // A section that fits a page starts on a fresh one rather than leave its intro behind.
    const need = (height?.() ?? 0) + 14;
    if (need > w.remaining && need <= w.bottom - w.top) w.newPage();
    w.heading(`Appendix ${String.fromCharCode(65 + i)}. ${title}`);
    draw();
  });
}
