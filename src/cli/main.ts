/**
 * Sagwright command line: `solve FILE... [--table] [--debug]` prints results (JSON, or a table
 * for people); `--catalog` lists the wire catalogue. Design aids add to the JSON: `--window`,
 * `--choose`, `--at TEMP` (designOptions.ts), `--as-built TEMP:KIND=VALUE[@X]` (asBuiltFlag.ts). Every file is read, checked and solved on
 * its own, and each one's outcome is reported. Exit status, the worst over the files: 0 every
 * check passes, 3 solved but a check fails, 1 a case not solved, 2 an invalid or unreadable
 * file, 4 an internal error (one line; the stack only with --debug).
 */
import { INTERNAL_ERROR_MESSAGE, type ProjectResults, WIRE_CATALOG } from '../core/index.ts';
import { solveProject } from '../core/solveProject.ts';
import { describeIssues, openProjectText } from '../deliverables/projectFile.ts';
import { addAsBuilt, asBuiltLines, takeAsBuiltFlag } from './asBuiltFlag.ts';
import { type Addition, additionsFor, DESIGN_FLAGS, settingOption } from './designOptions.ts';
import { printable } from './printable.ts';
import { readProjectFile } from './readInput.ts';
import { catalogTable, resultsTable } from './table.ts';

const EXIT = { ok: 0, notSolved: 1, invalid: 2, checkFails: 3, internal: 4 } as const;
type ExitCode = (typeof EXIT)[keyof typeof EXIT];
/** Which outcome wins when several files end differently. */
const SEVERITY: readonly ExitCode[] = [0, 3, 1, 2, 4];

const OPTIONS = ['--table', '--debug', '--catalog', ...DESIGN_FLAGS];
const USAGE =
  'usage: npm run solve -- FILE.json [FILE.json ...] [--table] [--window] [--choose] [--at TEMP] [--debug]\n' +
  '       [--as-built TEMP:KIND=VALUE[@X]]\n' +
  '       npm run solve -- --catalog';

interface FileOutcome {
  file: string;
  code: ExitCode;
  /** Lines for stderr, already printable. */
  errors: string[];
  results?: ProjectResults;
  /** The results with what the design-aid options add (what the JSON prints). */
  output?: Record<string, unknown>;
  title?: string;
}

function outcomeOf(file: string, results: ProjectResults, title: string): FileOutcome {
  const shown = printable(file);
  if (results.internalError)
    return { file, code: EXIT.internal, errors: [`${shown}: ${INTERNAL_ERROR_MESSAGE}`] };
  const errors = results.cases
    .filter((c) => !c.solved)
    .map(
      (c) =>
        `${shown}: case "${printable(c.name)}" could not be solved: ${printable(c.messages.join(' '))}`,
    );
  const code =
    errors.length > 0
      ? EXIT.notSolved
      : results.cases.every((c) => c.ok)
        ? EXIT.ok
        : EXIT.checkFails;
  return { file, code, errors, results, title };
}

function solveFile(
  file: string,
  additions: readonly Addition[],
  asBuiltSpec: string | undefined,
): FileOutcome {
  const shown = printable(file);
  const read = readProjectFile(file);
  if (!read.ok) return { file, code: EXIT.invalid, errors: [`${shown}: ${read.message}`] };
  const opened = openProjectText(read.text);
  if (!opened.ok)
    return {
      file,
      code: EXIT.invalid,
      errors: describeIssues(opened.issues, 50).map((line) => `${shown}: ${printable(line)}`),
    };
  const outcome = outcomeOf(file, solveProject(opened.project), opened.project.title);
  // An older file is read through the format migration; say on stderr what that changes.
  outcome.errors.unshift(
    ...(opened.notes ?? []).map((note) => `${shown}: note: ${printable(note)}`),
  );
  if (outcome.results && asBuiltSpec !== undefined) {
    const status = addAsBuilt(shown, opened.project, outcome.results, asBuiltSpec);
    // An invalid measurement prints no results, as an invalid file does (addAsBuilt said why).
    if (status === 2) return { file, code: EXIT.invalid, errors: [] };
    const asBuilt = outcome.results.asBuilt;
    const code: ExitCode =
      status === 2
        ? EXIT.invalid
        : status === 1
          ? EXIT.notSolved
          : asBuilt && !asBuilt.ok
            ? EXIT.checkFails
            : EXIT.ok;
    outcome.code = worst([outcome.code, code]);
  }
  if (outcome.results) {
    const output: Record<string, unknown> = { ...outcome.results };
    for (const add of additions) add(opened.project, outcome.results, output);
    outcome.output = output;
  }
  return outcome;
}

/** The error's stack, line by line, each made printable (only ever shown with --debug). */
function stackLines(error: unknown): string[] {
  const text = error instanceof Error ? (error.stack ?? error.message) : String(error);
  return text.split('\n').map(printable);
}

function solveGuarded(
  file: string,
  additions: readonly Addition[],
  asBuiltSpec: string | undefined,
  debug: boolean,
): FileOutcome {
  try {
    return solveFile(file, additions, asBuiltSpec);
  } catch (error) {
    const line = `${printable(file)}: internal error in Sagwright; nothing was solved (run again with --debug for details)`;
    const stack = debug ? stackLines(error) : [];
    return { file, code: EXIT.internal, errors: [line, ...stack] };
  }
}

function worst(codes: ExitCode[]): ExitCode {
  return codes.reduce((a, b) => (SEVERITY.indexOf(b) > SEVERITY.indexOf(a) ? b : a), EXIT.ok);
}

function report(outcomes: FileOutcome[], table: boolean): void {
  for (const o of outcomes) for (const line of o.errors) process.stderr.write(`${line}\n`);
  if (table) {
    for (const o of outcomes)
      if (o.results)
        process.stdout.write(
          `${resultsTable(printable(o.title ?? ''), o.results)}${o.results.asBuilt ? asBuiltLines(o.results.asBuilt).join('\n') : ''}\n\n`,
        );
    return;
  }
  if (outcomes.length === 1) {
    if (outcomes[0].output)
      process.stdout.write(`${JSON.stringify(outcomes[0].output, null, 2)}\n`);
    return;
  }
  // Several files: one entry per file, in order, whether it solved or not.
  const entries = outcomes.map((o) =>
    o.output
      ? { file: o.file, results: o.output }
      : { file: o.file, exitCode: o.code, errors: o.errors },
  );
  process.stdout.write(`${JSON.stringify(entries, null, 2)}\n`);
}

function main(args: string[]): ExitCode {
  if (args.includes('--catalog')) {
    process.stdout.write(`${catalogTable(WIRE_CATALOG)}\n`);
    return EXIT.ok;
  }
  const setting = settingOption(args);
  if (setting.error) {
    process.stderr.write(`${setting.error}\n${USAGE}\n`);
    return EXIT.invalid;
  }
  const asBuilt = takeAsBuiltFlag(setting.rest);
  if (asBuilt.error) {
    process.stderr.write(`${asBuilt.error}\n${USAGE}\n`);
    return EXIT.invalid;
  }
  const rest = asBuilt.rest;
  const files = rest.filter((a) => !a.startsWith('--'));
  const unknown = rest.filter((a) => a.startsWith('--') && !OPTIONS.includes(a));
  if (files.length === 0 || unknown.length > 0) {
    const what = unknown.length > 0 ? `unknown option ${printable(unknown[0])}\n` : '';
    process.stderr.write(`${what}${USAGE}\n`);
    return EXIT.invalid;
  }
  const debug = args.includes('--debug');
  const additions = additionsFor(rest, setting.addition);
  const outcomes = files.map((file) => solveGuarded(file, additions, asBuilt.spec, debug));
  report(outcomes, rest.includes('--table'));
  return worst(outcomes.map((o) => o.code));
}

// A reader that stops early (`| head`) is not an error of ours.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
});

try {
  process.exitCode = main(process.argv.slice(2));
} catch (error) {
  process.stderr.write('internal error in Sagwright (run again with --debug for details)\n');
  if (process.argv.includes('--debug')) process.stderr.write(`${stackLines(error).join('\n')}\n`);
  process.exitCode = EXIT.internal;
}
