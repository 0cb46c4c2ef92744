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
} from '../core/index.ts';
import { attachmentWords } from './attachmentWords.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';
import type { ReportOptions } from './pdfReport.ts';
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

/** A wire the chooser found to work, with its tension window (N) and suggested setting. */
export interface WireChoice {
  label: string;
  massPerLength: number;
  low: { horizontalTension: number } | null;
  high: { horizontalTension: number } | null;
  suggestedHorizontalTension: number;
}

/** The moving-load envelope of one case (results contract: cases[].movingLoads). */
interface MovingEnvelope {
  label: string;
  maxTension: number;
  maxTensionAt: number;
  clearance: number;
  clearanceAt: number;
}

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

function movingAppendix(w: PdfWriter, results: ProjectResults, units: UnitSystem) {
  const rows = results.cases.flatMap((c) =>
    ((c as { movingLoads?: MovingEnvelope[] }).movingLoads ?? []).map((m) => [
      c.name,
      m.label,
      formatForceShort(units, m.maxTension),
      formatLength(units, m.maxTensionAt),
      formatLength(units, m.clearance),
      formatLength(units, m.clearanceAt),
    ]),
  );
  if (rows.length === 0) {
    w.paragraph('This project has no moving load, so there is no envelope to show.', 8);
    return;
  }
  w.table(
    {
      head: [
        'Case',
        'Moving load',
        'Largest tension',
        'with the load at',
        'Least clearance',
        'with the load at',
      ],
      rows,
    },
    cols([1.6, 1.6, 1, 1, 1, 1], [2, 3, 4, 5]),
    { legend: ['Positions along the span from the first fixing. Not for carrying people.'] },
  );
}

function choicesAppendix(w: PdfWriter, options: ReportOptions, units: UnitSystem) {
  const choices = options.wireChoices ?? [];
  if (choices.length === 0) {
    w.paragraph('No list of wires considered was made with this report.', 8);
    return;
  }
  const end = (e: { horizontalTension: number } | null) =>
    e ? formatForceShort(units, e.horizontalTension) : 'none';
  w.table(
    {
      head: ['Wire', 'Mass', 'Lowest H that passes', 'Highest H that passes', 'Suggested H'],
      rows: choices.map((c) => [
        c.label,
        fq(units, 'massPerLength', c.massPerLength),
        end(c.low),
        end(c.high),
        formatForceShort(units, c.suggestedHorizontalTension),
      ]),
    },
    cols([2.4, 1, 1.2, 1.2, 1], [1, 2, 3, 4]),
    {
      legend: [
        'Wires that pass every case, lightest first; H is the horizontal tension set at installation.',
      ],
    },
  );
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
  const sections: [boolean, string, () => void][] = [
    [
      options.appendix.setUpChart,
      'Set-up chart: setting the wire on other days',
      () => setUpAppendix(w, project, results, units),
    ],
    [options.appendix.movingLoads, 'Moving-load envelope', () => movingAppendix(w, results, units)],
    [options.appendix.wireChoices, 'Wires considered', () => choicesAppendix(w, options, units)],
    [
      options.appendix.inputs,
      'The project’s inputs in full',
      () => inputsAppendix(w, project, units),
    ],
  ];
  const chosen = sections.filter(([on]) => on);
  if (chosen.length === 0) return;
  w.newPage();
  chosen.forEach(([, title, draw], i) => {
    w.heading(`Appendix ${String.fromCharCode(65 + i)}. ${title}`);
    draw();
  });
}
