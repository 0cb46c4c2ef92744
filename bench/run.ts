/**
 * `npm run bench`: speed of the core, measured, never asserted. Figures are per call, in µs:
 * the best (fastest) of several runs of many repetitions each, after a warm-up: the machines
 * here are shared, and the fastest run is the one least disturbed by other work.
 * (a) one bare factored tri-diagonal solve of a span's size, (b) one nonlinear change-of-state
 * span solve (exact and parabolic) of the same size and its ratio to (a), (c) the demo project
 * and (d) the inclined example through solveProject (all cases, with the error estimate on the
 * nested mesh of twice the elements).
 * (e) the built app in headless Chromium (bench/browser.ts): page weight until the first plot,
 * edit to plot p50/p95, continuous edits and dragging a fixing on the side view; skipped with
 * `--no-browser` or without dist/.
 * `npm run bench -- --write` also writes the figures to doc/benchmarks.md.
 */
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { factorTridiagonal } from '../src/core/bandedSolver.ts';
import { estimateErrors, summariseStates } from '../src/core/discretisation.ts';
import { type Project, solveProject } from '../src/core/index.ts';
import { findInstallationTension } from '../src/core/installation.ts';
import { solveSectionForLength } from '../src/core/lengthCompatibility.ts';
import { loadStateOfCase } from '../src/core/loads.ts';
import { buildProjectModel, prepareState } from '../src/core/projectModel.ts';
import { setUpChart } from '../src/core/setUpChart.ts';
import type { SpanModel } from '../src/core/spanModel.ts';
import { solveChangeOfState, solveInstallation } from '../src/core/states.ts';
import { browserLines, measureBrowser } from './browser.ts';
import { designRows } from './designBench.ts';
import { movingAsBuiltLines } from './movingAsBuilt.ts';

const RUNS = 7;
/** doc/benchmarks.md keeps everything from this heading on when rewritten. */
const PROFILE_HEADING = '## Profile of an edit in the browser';

/** Best per-call time (µs) of `call` over RUNS runs, each repeated to last about `runMs`. */
function timeCall(call: () => void, runMs = 150): number {
  const warmStart = performance.now();
  let reps = 0;
  while (performance.now() - warmStart < runMs) {
    call();
    reps++;
  }
  const perRun = Math.max(1, reps);
  const samples: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    const start = performance.now();
    for (let i = 0; i < perRun; i++) call();
    samples.push(((performance.now() - start) * 1000) / perRun);
  }
  return Math.min(...samples);
}

/**
 * Ratio of `call`'s time to `reference`'s, each timed right after the other, the median over
 * `rounds` pairs: on a shared machine both of a pair see about the same load, so the ratio
 * holds steadier than either time.
 */
function pairedRatio(call: () => void, reference: () => void, rounds = 15, runMs = 20): number {
  const ratios: number[] = [];
  for (let r = 0; r < rounds; r++) ratios.push(timeCall(call, runMs) / timeCall(reference, runMs));
  ratios.sort((a, b) => a - b);
  return ratios[Math.floor(rounds / 2)];
}

/** One bare factored tri-diagonal solve of n linear elements (with its right-hand side copy). */
function bareSolveCall(elements: number): () => void {
  const n = elements - 1;
  const h = 1 / elements;
  const factor = factorTridiagonal(
    new Float64Array(n).fill(2 / h),
    new Float64Array(n).fill(-1 / h),
  );
  const load = new Float64Array(n).fill(h);
  const rhs = new Float64Array(n);
  return () => {
    rhs.set(load);
    factor.solve(rhs);
  };
}

/** (a) Factor K₁ of n linear elements once, then time one solve (with its right-hand side copy). */
function bareSolve(elements: number): number {
  const n = elements - 1;
  const h = 1 / elements;
  const diag = new Float64Array(n).fill(2 / h);
  const off = new Float64Array(n).fill(-1 / h);
  const factor = factorTridiagonal(diag, off);
  const load = new Float64Array(n).fill(h);
  const rhs = new Float64Array(n);
  return timeCall(() => {
    rhs.set(load);
    factor.solve(rhs);
  });
}

function spanProject(elements: number, theory: 'exact' | 'parabolic'): Project {
  return {
    format: 'sagwright-project',
    version: 1,
    title: 'Bench span',
    supports: [
      { x: 0, z: 5 },
      { x: 30, z: 6 },
    ],
    wire: { catalogId: 'galv-7x7-4' },
    loads: [{ type: 'uniform', from: 2, to: 28, massPerLength: 0.1, diameter: 0.008 }],
    installation: { temperature: 15, withLoads: true, target: { horizontalTension: 800 } },
    cases: [{ name: 'Hot', temperature: 40, iceThickness: 0, windSpeed: 0, withLoads: true }],
    limits: { safetyFactor: 5, minClearance: 0 },
    model: { theory, elementOrder: 1, elementsPerSpan: elements },
  };
}

/** (b) One change of state (15 °C → 40 °C) at the installed cut length, from a cold guess. */
function spanSolve(elements: number, theory: 'exact' | 'parabolic') {
  const model = buildProjectModel(spanProject(elements, theory));
  const installed = solveInstallation(model, 800);
  const hot = { temperature: 40, iceThicknessM: 0, windSpeedMPerS: 0, withLoads: true };
  const wire = prepareState(model, hot);
  const length = installed.unstressed[0] * (1 + model.wire.thermalExpansion * 25);
  // Start every repetition from the installed state (the exact theory warm-starts its loads
  // from the span's last element lengths and their tension), as solveProject does for a case.
  const installedElements = model.spans.map(snapshot);
  let iterations = 0;
  let tensionN = 0;
  const call = () => {
    model.spans.forEach((span, j) => {
      restore(span, installedElements[j]);
    });
    const r = solveSectionForLength(model.spans, wire, length, 800);
    iterations = r.iterations;
    tensionN = r.tensionN;
  };
  const micros = timeCall(call);
  const ratio = pairedRatio(call, bareSolveCall(elements));
  return { micros, iterations, tensionN, ratio };
}

/** A span's stored element lengths (the solver's warm start), to restore between repetitions. */
function snapshot(span: SpanModel) {
  return {
    tensionN: span.storedTensionN,
    arrays: [
      span.unstressedElement,
      span.unstressedElementSlope,
      span.arcElement,
      span.arcElementSlope,
    ].map((a) => a.slice()),
  };
}

function restore(span: SpanModel, saved: ReturnType<typeof snapshot>) {
  span.storedTensionN = saved.tensionN;
  [
    span.unstressedElement,
    span.unstressedElementSlope,
    span.arcElement,
    span.arcElementSlope,
  ].forEach((a, i) => {
    a.set(saved.arrays[i]);
  });
}

/** (f) A 20 000-element one-case span through solveProject, in bare solves of its size. */
function largeProject(theory: 'exact' | 'parabolic') {
  const project = spanProject(20000, theory);
  const results = solveProject(project);
  const elements = results.mesh.elementsPerSpan;
  const bare = bareSolve(elements);
  const call = () => solveProject(project);
  const micros = timeCall(call, 1500);
  const ratio = pairedRatio(call, bareSolveCall(elements), 9, 1);
  return { elements, bare, micros, ratio, rows: results.setUpChart.length };
}

function projectSolve(file: string) {
  const project = JSON.parse(readFileSync(file, 'utf8')) as Project;
  const results = solveProject(project);
  const iterations = results.cases.map((c) => c.iterations);
  return { micros: timeCall(() => solveProject(project), 400), iterations };
}

/** (e) Where the demo's time goes: each stage of solveProject timed on its own. */
function demoBreakdown(file: string): [string, number][] {
  const project = JSON.parse(readFileSync(file, 'utf8')) as Project;
  const model = buildProjectModel(project);
  const target = findInstallationTension(model, project.installation.target);
  const installed = solveInstallation(model, target.tensionN);
  const summaries = summariseStates(model, target.tensionN, []);
  const cases = () => {
    for (const c of project.cases) {
      solveChangeOfState(
        model,
        { ...loadStateOfCase(c), name: c.name },
        installed.unstressed,
        installed.spans.map((s) => s.tensionN),
      );
    }
  };
  return [
    ['build the model (meshes, factorisations)', timeCall(() => buildProjectModel(project))],
    [
      'installation target search',
      timeCall(() => findInstallationTension(model, project.installation.target)),
    ],
    ['installation state', timeCall(() => solveInstallation(model, target.tensionN))],
    [`${project.cases.length} weather cases (change of state)`, timeCall(cases)],
    [
      'set-up chart (all rows)',
      timeCall(() => setUpChart(model, installed.unstressed, 0, target.tensionN)),
    ],
    [
      'error estimate (every state again on the nested mesh, twice the elements)',
      timeCall(() => estimateErrors(model, 1, target.tensionN, summaries)),
    ],
    [
      'whole solveProject (adds checks, profiles and the error estimate)',
      timeCall(() => solveProject(project), 400),
    ],
  ];
}

const f1 = (x: number) => x.toFixed(1);
const lines: string[] = [];
const say = (line: string) => {
  lines.push(line);
  console.log(line);
};

say(
  `Date: ${new Date().toISOString().slice(0, 10)}; Node ${process.version}; ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}); load average ${loadavg()[0].toFixed(1)} at start`,
);
say('');
say(
  '| elements | bare solve (µs) | span solve exact (µs) | ratio | iterations | span solve parabolic (µs) | ratio | iterations |',
);
say('|---:|---:|---:|---:|---:|---:|---:|---:|');
const goals = { exact: Number.NaN, parabolic: Number.NaN, demoMs: Number.NaN };
for (const elements of [200, 2000]) {
  const bare = bareSolve(elements);
  const exact = spanSolve(elements, 'exact');
  const parabolic = spanSolve(elements, 'parabolic');
  if (elements === 2000) {
    goals.exact = exact.ratio;
    goals.parabolic = parabolic.ratio;
  }
  say(
    `| ${elements} | ${bare.toFixed(2)} | ${f1(exact.micros)} | ${f1(exact.ratio)} | ${exact.iterations} | ${f1(parabolic.micros)} | ${f1(parabolic.ratio)} | ${parabolic.iterations} |`,
  );
}
say('');
say('| project (solveProject, all cases + error estimate) | time (µs) | iterations per case |');
say('|---|---:|---|');
for (const file of [
  'examples/courtyard-lights.json',
  'examples/workshop-yard-inclined.json',
  'examples/terrace-corner-pulley.json',
]) {
  const r = projectSolve(file);
  if (file === 'examples/courtyard-lights.json') goals.demoMs = r.micros / 1000;
  say(`| ${file} | ${f1(r.micros)} | ${r.iterations.join(', ')} |`);
}

say('');
say(
  '| 20 000-element one-case span through solveProject (installation, case, set-up chart, estimate) | elements | bare solve (µs) | time (µs) | bare solves |',
);
say('|---|---:|---:|---:|---:|');
const large: Record<string, ReturnType<typeof largeProject>> = {};
for (const theory of ['exact', 'parabolic'] as const) {
  const r = largeProject(theory);
  large[theory] = r;
  say(
    `| ${theory} theory, ${r.rows} set-up rows | ${r.elements} | ${f1(r.bare)} | ${f1(r.micros)} | ${f1(r.ratio)} |`,
  );
}

say('');
say('| demo project stage (examples/courtyard-lights.json) | time (µs) |');
say('|---|---:|');
for (const [stage, micros] of demoBreakdown('examples/courtyard-lights.json'))
  say(`| ${stage} | ${f1(micros)} |`);

say('');
for (const line of movingAsBuiltLines('examples/courtyard-lights.json', (call) =>
  timeCall(call, 400),
))
  say(line);

say('');
const design = designRows(timeCall, [
  'examples/courtyard-lights.json',
  'examples/workshop-yard-inclined.json',
]);
for (const row of design.rows) say(row);

say('');
say('### Figures against their goals');
say('');
say('| figure | measured | goal | measured / goal |');
say('|---|---:|---:|---:|');
const goalRow = (name: string, value: number, goal: number, unit: string, digits = 1) =>
  say(
    `| ${name} | ${value.toFixed(digits)} ${unit} | ${goal} ${unit} | ${(value / goal).toFixed(2)} |`,
  );
goalRow('one change of state, 2000 elements, exact theory', goals.exact, 10, 'bare solves');
goalRow('one change of state, 2000 elements, parabolic theory', goals.parabolic, 10, 'bare solves');
goalRow(
  '20 000-element one-case project through solveProject (exact)',
  large.exact.ratio,
  150,
  'bare solves',
);
goalRow(
  '20 000-element one-case project through solveProject (parabolic)',
  large.parabolic.ratio,
  150,
  'bare solves',
);
goalRow('demo project (courtyard-lights) solveProject', goals.demoMs, 0.5, 'ms', 2);
goalRow(
  `wire chooser, whole catalogue, demo project`,
  design.chooserMs['examples/courtyard-lights.json'],
  100,
  'ms',
);
say('');
say(`Load average at the end: ${loadavg()[0].toFixed(1)}.`);
if (process.argv.includes('--no-browser')) say('(browser figures skipped: --no-browser)');
else if (!existsSync('dist/index.html'))
  say('(browser figures skipped: run `npm run build` first)');
else {
  say('## In the browser (built app, headless Chromium)');
  say('');
  const port = Number(process.env.BENCH_PORT ?? 4399);
  for (const line of browserLines(await measureBrowser(port))) say(line);
}

if (process.argv.includes('--write')) {
  const header = [
    '# Benchmarks',
    '',
    'Measured with `npm run bench` (bench/run.ts): the best (fastest) of 7 runs of many',
    'repetitions each, after a warm-up (the machine is shared: the fastest run is the one least',
    'disturbed by other work; the load average is printed at the start and the end); times per',
    'call in µs. "Bare solve" is one solve of the factored tri-diagonal unit-tension system of',
    'the span size (right-hand side copy included). "Span solve" is one nonlinear change of',
    'state (15 → 40 °C at the installed cut length) of a 30 m inclined span with a part-span',
    'cable, started from the installed state (H guess 800 N, the installed element lengths).',
    'Parabolic theory: the shape is solved once, then each iteration is one length integral over',
    'the Gauss points and a Newton step. Exact theory: each iteration is a length integral and',
    'the catenary loads moved to the new tension, assembled and solved for the new shape.',
    'Iterations are length evaluations; a case in solveProject also counts its target search.',
    'The 20 000-element project is the same span with one case through solveProject',
    '(installation, case, set-up chart, error estimate on 40 000 elements, checks), in bare',
    'solves of its own size. Ratios to the bare solve are the median over pairs timed one right',
    'after the other (steadier than either time on a loaded machine). The last table sets each',
    'figure beside its goal; the solver profile below says where the time goes.',
    '',
  ];
  // Hand-written notes after the measured figures (from PROFILE_HEADING on) are kept.
  const previous = existsSync('doc/benchmarks.md') ? readFileSync('doc/benchmarks.md', 'utf8') : '';
  const notesAt = previous.indexOf(PROFILE_HEADING);
  const notes = notesAt >= 0 ? `\n${previous.slice(notesAt)}` : '';
  writeFileSync('doc/benchmarks.md', `${[...header, ...lines].join('\n')}\n${notes}`);
  console.log('\nwrote doc/benchmarks.md');
}
