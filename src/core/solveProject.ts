/**
 * solveProject: a validated project document → the contract's results (SI). The installation
 * target fixes the installation tension and so each span's cut length; every weather case is a
 * change of state at those lengths. Each case's discretisation error is estimated against a mesh
 * with every element split in two (discretisation.ts); while the largest estimate is above
 * 1e-4 the whole project is solved again on that finer mesh (at most six times, and never past
 * 20 000 elements in a span, nor past the work budget, workBudget.ts). It never throws: an
 * internal failure comes back as results whose every case says so (resultGuard.ts).
 */

import { checkCase } from './caseChecks.ts';
import { caseResultId, INSTALLATION_ID } from './caseIds.ts';
import { ERROR_TARGET, estimateErrors, type StateSummary, summarise } from './discretisation.ts';
import { resolveEndFittings } from './endFittings.ts';
import {
  findInstallationTension,
  type InstallationTension,
  targetSpanIndex,
} from './installation.ts';
import { hungDrops, loadStateOfCase } from './loads.ts';
import { migrateProjectDocument } from './migrateProject.ts';
import { addMovingLoads } from './movingLoads.ts';
import type {
  CaseResult,
  EndFittingsResult,
  Project,
  ProjectResults,
  WeatherCase,
} from './project.ts';
import { buildProjectModel, type ProjectModel } from './projectModel.ts';
import { guardFinite, unsolvedResults } from './resultGuard.ts';
import { setUpChart } from './setUpChart.ts';
import { type StateSolution, solveChangeOfState, solveInstallation } from './states.ts';
import { elasticStrainLimit } from './strainLimit.ts';
import { resolveWire } from './wireCatalog.ts';
import { planMesh, withinBudget } from './workBudget.ts';

/** Largest refinement of the project's mesh (each element split into this many at most). */
const MAX_REFINEMENT = 64;
/** No refinement beyond this many elements in one span (the comparison mesh has twice that). */
const MAX_REFINED_ELEMENTS = 20000;

export interface SolveOptions {
  /** Refine the mesh automatically until the error estimate is below 1e-4 (default true). */
  refine?: boolean;
}

interface MeshRun {
  model: ProjectModel;
  refinement: number;
  target: InstallationTension;
  results: CaseResult[];
  summaries: StateSummary[];
  unstressed: number[];
}

function checkState(
  model: ProjectModel,
  fittings: EndFittingsResult,
  id: string,
  name: string,
  temperature: number,
  withLoads: boolean,
  state: StateSolution,
): CaseResult {
  const p = model.project;
  return checkCase({
    id,
    name,
    temperature,
    spans: state.spans,
    attachments: model.attachments,
    supportForcesN: state.supportForcesN,
    supportLateralN: state.supportLateralN,
    ground: p.ground ?? [],
    drops: hungDrops(p.loads, withLoads),
    zones: p.limits.zones ?? [],
    safetyFactor: p.limits.safetyFactor,
    minClearance: p.limits.minClearance,
    breakingLoadN: model.wire.breakingLoad,
    axialStiffnessN: model.wire.axialStiffness,
    strainLimit: elasticStrainLimit(model.wire),
    theory: model.settings.theory,
    endFittingEfficiency: fittings.efficiency,
    iterations: state.iterations,
    messages: state.messages,
    solved: state.solved,
  });
}

/** In a windy case with the hung loads: point loads that state no wind area catch no wind. */
function windlessItemNotes(project: Project, weather: WeatherCase): string[] {
  if (!(weather.windSpeed > 0) || !weather.withLoads) return [];
  const names = project.loads.flatMap((load, i) =>
    load.type === 'point' && load.windArea === undefined ? [load.label || `load ${i + 1}`] : [],
  );
  if (names.length === 0) return [];
  // Short: it sits under the verdict in every windy case's row.
  return [
    `No wind area given for ${names.join(', ')}: no wind on ${names.length === 1 ? 'it' : 'them'}.`,
  ];
}

/** Installation target, installation and every case on one mesh, checked; in case order. */
function solveOnMesh(project: Project, refinement: number, fittings: EndFittingsResult): MeshRun {
  const model = buildProjectModel(project, refinement);
  const target = findInstallationTension(model, project.installation.target);
  const installed = solveInstallation(model, target.tensionN);
  const inst = model.installation;
  const finish = (
    id: string,
    name: string,
    temperature: number,
    withLoads: boolean,
    s: StateSolution,
  ) => checkState(model, fittings, id, name, temperature, withLoads, s);
  const results = [finish(INSTALLATION_ID, inst.name, inst.temperature, inst.withLoads, installed)];
  const summaries = [summarise(installed, true)];
  for (const [i, weather] of project.cases.entries()) {
    const state = solveChangeOfState(
      model,
      { ...loadStateOfCase(weather), name: weather.name },
      installed.unstressed,
      installed.spans.map((s) => s.tensionN),
    );
    const result = finish(
      caseResultId(i),
      weather.name,
      weather.temperature,
      weather.withLoads,
      state,
    );
    result.messages.push(...windlessItemNotes(project, weather));
    results.push(result);
    summaries.push(summarise(state, true));
  }
  results[0].iterations += target.evaluations;
  if (!target.ok) {
    // Without its installation tension no state is meaningful: every case says so.
    for (const r of results) {
      r.solved = false;
      r.ok = false;
      r.messages.unshift(`Installation target: ${target.message ?? 'did not converge'}.`);
    }
  }
  return { model, refinement, target, results, summaries, unstressed: installed.unstressed };
}

function largestElementCount(model: ProjectModel): number {
  return Math.max(...model.spans.map((s) => s.mesh.elementCount));
}

function governing(project: Project, results: CaseResult[]) {
  let tension = results[0];
  let clearance = results[0];
  const margin = (r: CaseResult) =>
    Math.min(
      r.clearance - project.limits.minClearance,
      ...r.zoneClearances.map((z) => z.clearance - z.required),
    );
  for (const r of results) {
    if (r.utilisation > tension.utilisation) tension = r;
    if (margin(r) < margin(clearance)) clearance = r;
  }
  return {
    governing: { tension: tension.name, clearance: clearance.name },
    governingIds: { tension: tension.id, clearance: clearance.id },
  };
}

/**
 * Solve a project that has passed validateProject (an older version is read through the same
 * migration as validateProject). Never throws: an internal failure comes back as results whose
 * every case says so in words, and no case marked solved holds NaN or infinity.
 */
export function solveProject(document: Project, options: SolveOptions = {}): ProjectResults {
  let project = document;
  try {
    const older = migrateProjectDocument(document as unknown as Record<string, unknown>);
    if (older) project = older.document as unknown as Project;
  } catch {
    return unsolvedResults(document);
  }
  if (!resolveWire(project.wire))
    return unsolvedResults(project, 'wire.catalogId: this wire is not in the catalogue.');
  try {
    return guardFinite(solveWithinBudget(project, options));
  } catch {
    return unsolvedResults(project);
  }
}

function solveWithinBudget(whole: Project, options: SolveOptions): ProjectResults {
  const plan = planMesh(whole);
  const project: Project = plan.notice
    ? { ...whole, model: { ...whole.model, elementsPerSpan: plan.elementsPerSpan } }
    : whole;
  const fittings = resolveEndFittings(project.limits.endFittings);
  let run = solveOnMesh(project, 1, fittings);
  let errors = estimateErrors(run.model, 1, run.target.tensionN, run.summaries);
  const worst = () => Math.max(0, ...errors.filter((_, i) => run.results[i].solved).map((e) => e));
  // A refinement that does not at least halve the estimate (order 2 gives a quarter) is not
  // converging: the mesh is not what is wrong, so refining further only costs time.
  let previous = Number.POSITIVE_INFINITY;
  while (
    options.refine !== false &&
    worst() >= ERROR_TARGET &&
    worst() <= previous / 2 &&
    run.refinement < MAX_REFINEMENT &&
    2 * largestElementCount(run.model) <= MAX_REFINED_ELEMENTS &&
    withinBudget(run.model, 2)
  ) {
    previous = worst();
    run = solveOnMesh(project, 2 * run.refinement, fittings);
    errors = estimateErrors(run.model, run.refinement, run.target.tensionN, run.summaries);
  }
  const elements = largestElementCount(run.model);
  run.results.forEach((r, i) => {
    r.discretisationError = errors[i];
    if (r.solved && errors[i] >= ERROR_TARGET)
      r.messages.push(
        `Mesh: the estimated discretisation error ${errors[i].toExponential(1)} is above ${ERROR_TARGET.toExponential(0)} with ${elements} elements per span${options.refine === false ? '' : ' (refinement limit reached)'}; treat the last digits as uncertain.`,
      );
  });
  const { model, results, unstressed } = run;
  if (run.target.ok)
    addMovingLoads(model, results, unstressed, {
      refinement: run.refinement,
      endFittingEfficiency: fittings.efficiency,
    });
  if (plan.notice) results[0].messages.push(plan.notice);
  const setUpSpan = targetSpanIndex(model, project.installation.target);
  const largestError = worst();
  return {
    unstressedLength: unstressed.reduce((a, b) => a + b, 0),
    cases: results,
    ...governing(project, results),
    setUpChart: setUpChart(model, unstressed, setUpSpan, run.target.tensionN),
    setUpSpan,
    endFittings: fittings,
    notices: plan.notice ? [plan.notice] : [],
    mesh: {
      refinement: run.refinement,
      elementsPerSpan: elements,
      errorTarget: ERROR_TARGET,
      largestError,
      reached: largestError < ERROR_TARGET,
    },
  };
}
