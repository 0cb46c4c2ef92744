/**
 * Sagwright command line: `solve FILE... [--table]` prints results (JSON, or a table for people);
 * `--catalog` lists the wire catalogue. Design aids add to the JSON: `--window` (tension window),
 * `--choose` (wires that work), `--at TEMP` (today's setting). Exit 0 every case solved and every
 * check passes, 3 every case solved but a check fails, 2 invalid file or option, 1 a case not solved.
 */
import { readFileSync } from 'node:fs';
import {
  chooseWires,
  type Project,
  settingAt,
  solveProject,
  tensionWindow,
  validateProject,
  WIRE_CATALOG,
} from '../core/index.ts';
import { catalogTable, resultsTable } from './table.ts';

const MAX_FILE_BYTES = 5 * 1024 * 1024;
const USAGE =
  'usage: npm run solve -- FILE.json [FILE.json ...] [--table] [--window] [--choose] [--at TEMP]\n' +
  '       npm run solve -- --catalog';
const FLAGS = ['--table', '--window', '--choose'];

/** Extra JSON the design-aid options add to a file's results. */
type Addition = (project: Project, output: Record<string, unknown>) => void;

/** `--window`: the installation tension window. */
function addWindow(project: Project, output: Record<string, unknown>): void {
  output.window = tensionWindow(project);
}

/** `--choose`: every wire that works, lightest first, with its window and suggested tension. */
function addChoices(project: Project, output: Record<string, unknown>): void {
  output.choices = chooseWires(project).map((c) => ({
    catalogId: c.catalogId,
    label: c.label,
    massPerLength: c.massPerLength,
    low: c.low,
    high: c.high,
    suggestedHorizontalTension: c.suggestedHorizontalTension,
  }));
}

/** `--at TEMP`: today's setting at TEMP °C; a bad value is refused by name. */
function settingOption(args: string[]): { addition?: Addition; error?: string; rest: string[] } {
  const i = args.findIndex((a) => a === '--at' || a.startsWith('--at='));
  if (i < 0) return { rest: args };
  const inline = args[i].startsWith('--at=');
  const text = inline ? args[i].slice(5) : args[i + 1];
  const rest = args.filter((_, k) => k !== i && (inline || k !== i + 1));
  const temperature = Number(text);
  if (text === undefined || text.trim() === '' || !Number.isFinite(temperature))
    return { rest, error: '--at: needs a temperature in °C, e.g. --at 8' };
  if (temperature < -80 || temperature > 80)
    return { rest, error: '--at: the temperature must be between -80 and 80 °C' };
  return {
    rest,
    addition: (project, output) => {
      output.setting = settingAt(project, temperature);
    },
  };
}

function readProject(file: string): { ok: true; value: unknown } | { ok: false; message: string } {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (error) {
    return { ok: false, message: `${file}: cannot read (${(error as Error).message})` };
  }
  if (text.length > MAX_FILE_BYTES)
    return { ok: false, message: `${file}: file is larger than 5 MB` };
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    return { ok: false, message: `${file}: not valid JSON (${(error as Error).message})` };
  }
}

function main(args: string[]): number {
  if (args.includes('--catalog')) {
    process.stdout.write(`${catalogTable(WIRE_CATALOG)}\n`);
    return 0;
  }
  const setting = settingOption(args);
  if (setting.error) {
    process.stderr.write(`${setting.error}\n${USAGE}\n`);
    return 2;
  }
  const rest = setting.rest;
  const table = rest.includes('--table');
  const additions: Addition[] = [];
  if (rest.includes('--window')) additions.push(addWindow);
  if (rest.includes('--choose')) additions.push(addChoices);
  if (setting.addition) additions.push(setting.addition);
  const files = rest.filter((a) => !a.startsWith('--'));
  const unknown = rest.filter((a) => a.startsWith('--') && !FLAGS.includes(a));
  if (files.length === 0 || unknown.length > 0) {
    process.stderr.write(`${unknown.length > 0 ? `unknown option ${unknown[0]}\n` : ''}${USAGE}\n`);
    return 2;
  }
  let status = 0;
  const outputs: unknown[] = [];
  for (const file of files) {
    const read = readProject(file);
    if (!read.ok) {
      process.stderr.write(`${read.message}\n`);
      return 2;
    }
    const checked = validateProject(read.value);
    if (!checked.ok) {
      for (const issue of checked.issues)
        process.stderr.write(`${file}: ${issue.path}: ${issue.message}\n`);
      return 2;
    }
    // An older file is read through the format migration; say what that changes.
    for (const note of checked.notes ?? []) process.stderr.write(`${file}: note: ${note}\n`);
    const results = solveProject(checked.project);
    for (const c of results.cases) {
      if (!c.solved) {
        process.stderr.write(
          `${file}: case "${c.name}" could not be solved: ${c.messages.join(' ')}\n`,
        );
        status = 1;
      } else if (!c.ok && status === 0) status = 3;
    }
    const output: Record<string, unknown> = { ...results };
    for (const add of additions) add(checked.project, output);
    if (table) process.stdout.write(`${resultsTable(checked.project.title, results)}\n\n`);
    else outputs.push(files.length === 1 ? output : { file, results: output });
  }
  if (!table)
    process.stdout.write(`${JSON.stringify(files.length === 1 ? outputs[0] : outputs, null, 2)}\n`);
  return status;
}

process.exitCode = main(process.argv.slice(2));
