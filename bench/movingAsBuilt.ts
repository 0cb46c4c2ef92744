/**
 * Benchmark lines for the moving-load envelope and the as-built check on a project file: the
 * whole solveProject with one moving load added (and the positions it solved), and one as-built
 * back-computation with every case re-solved. Timed by the caller's timer (µs per call).
 */
import { readFileSync } from 'node:fs';
import {
  chooseWires,
  type Project,
  solveAsBuilt,
  solveProject,
  tensionWindow,
} from '../src/core/index.ts';

/** One call's time, µs (the chooser with a moving load is too slow to repeat). */
function once(call: () => void): number {
  const start = performance.now();
  call();
  return (performance.now() - start) * 1000;
}

export function movingAsBuiltLines(file: string, time: (call: () => void) => number): string[] {
  const project = JSON.parse(readFileSync(file, 'utf8')) as Project;
  const first = project.supports[0].x;
  const last = project.supports[project.supports.length - 1].x;
  const moving: Project = {
    ...project,
    loads: [...project.loads, { type: 'moving', from: first, to: last, mass: 20, label: 'Basket' }],
  };
  const results = solveProject(moving);
  const positions = results.cases.reduce((n, c) => n + (c.movingLoads?.[0]?.positions ?? 0), 0);
  const plain = solveProject(project);
  const sag = plain.setUpChart.find((r) => r.temperature === project.installation.temperature)?.sag;
  const m = {
    temperature: project.installation.temperature,
    kind: 'sag' as const,
    value: sag ?? 0.4,
  };
  const f1 = (x: number) => x.toFixed(1);
  return [
    `| design aid (${file}) | time (µs) | note |`,
    '|---|---:|---|',
    `| solveProject without a moving load | ${f1(time(() => solveProject(project)))} | |`,
    `| solveProject with one moving load over the whole line | ${f1(time(() => solveProject(moving)))} | ${positions} positions solved over ${results.cases.length} states |`,
    `| as-built check from a sag (cut length + every case) | ${f1(time(() => solveAsBuilt(project, m, plain)))} | |`,
    `| tension window without a moving load | ${f1(time(() => tensionWindow(project, 1)))} | |`,
    `| tension window with the moving load (its envelope in every loaded case) | ${f1(time(() => tensionWindow(moving, 1)))} | |`,
    `| wire chooser with the moving load, one call | ${f1(once(() => chooseWires(moving, undefined, 1)))} | every wire's window with the envelope |`,
  ];
}
