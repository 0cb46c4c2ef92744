/**
 * Design aids in `npm run bench`: the tension window (with its advice), the wire chooser over the
 * whole catalogue and today's setting, for the example projects; each also as a multiple of one
 * solveProject of the same file, which holds steadier than wall-clock time on a shared machine.
 */
import { readFileSync } from 'node:fs';
import {
  chooseWires,
  type Project,
  settingAt,
  solveProject,
  tensionWindow,
  WIRE_CATALOG,
} from '../src/core/index.ts';

type Timer = (call: () => void, runMs?: number) => number;

export function designRows(
  timeCall: Timer,
  files: readonly string[],
): { rows: string[]; chooserMs: Record<string, number> } {
  const chooserMs: Record<string, number> = {};
  const rows = [
    '| design aid (µs per call) | project | time (µs) | × solveProject |',
    '|---|---|---:|---:|',
  ];
  for (const file of files) {
    const project = JSON.parse(readFileSync(file, 'utf8')) as Project;
    const solve = timeCall(() => solveProject(project), 400);
    const row = (name: string, micros: number) =>
      rows.push(`| ${name} | ${file} | ${micros.toFixed(0)} | ${(micros / solve).toFixed(1)} |`);
    row(
      'tension window (both ends + advice)',
      timeCall(() => tensionWindow(project), 400),
    );
    const chooser = timeCall(() => chooseWires(project), 1500);
    chooserMs[file] = chooser / 1000;
    row(`wire chooser (${WIRE_CATALOG.length} catalogue wires)`, chooser);
    row(
      "today's setting at 8 °C",
      timeCall(() => settingAt(project, 8), 400),
    );
  }
  return { rows, chooserMs };
}
