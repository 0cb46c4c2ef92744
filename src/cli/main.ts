/**
 * Sagwright command line: `solve FILE... [--table]` prints results (JSON, or a table for people);
 * `--catalog` lists the wire catalogue. Exit 0 every case solved and every check passes, 3 every
 * case solved but a check fails, 2 invalid file, 1 a case not solved.
 */
import { readFileSync } from 'node:fs';
import { solveProject, validateProject, WIRE_CATALOG } from '../core/index.ts';
import { catalogTable, resultsTable } from './table.ts';

const MAX_FILE_BYTES = 5 * 1024 * 1024;
const USAGE =
  'usage: npm run solve -- FILE.json [FILE.json ...] [--table]\n       npm run solve -- --catalog';

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
  const table = args.includes('--table');
  const files = args.filter((a) => !a.startsWith('--'));
  const unknown = args.filter((a) => a.startsWith('--') && a !== '--table');
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
    if (table) process.stdout.write(`${resultsTable(checked.project.title, results)}\n\n`);
    else outputs.push(files.length === 1 ? results : { file, results });
  }
  if (!table)
    process.stdout.write(`${JSON.stringify(files.length === 1 ? outputs[0] : outputs, null, 2)}\n`);
  return status;
}

process.exitCode = main(process.argv.slice(2));
