/**
 * solveProject: a validated project document → the contract's results (SI). The installation
 * target fixes the installation tension and so each span's cut length; every weather case is a
 * change of state at those lengths. The discretisation error is estimated by solving again on
 * half the elements: e ≈ |f_h − f_2h| / (2² − 1) for sag and largest tension.
 */

import { checkCase, largestSag, largestStateTension } from './caseChecks.ts';
import { findInstallationTension, targetSpanIndex } from './installation.ts';
import { loadStateOfCase } from './loads.ts';
import { migrateProjectDocument } from './migrateProject.ts';
import type { CaseResult, Project, ProjectResults } from './project.ts';
import { buildProjectModel, type ProjectModel } from './projectModel.ts';
import { setUpChart } from './setUpChart.ts';
import { type StateSolution, solveChangeOfState, solveInstallation } from './states.ts';

interface StateSummary {
  sag: number;
  maxTension: number;
}

function checkState(
  model: ProjectModel,
  name: string,
  temperature: number,
  state: StateSolution,
): CaseResult {
  const p = model.project;
  return checkCase({
    name,
    temperature,
    spans: state.spans,
    attachments: model.attachments,
    supportForcesN: state.supportForcesN,
    ground: p.ground ?? [],
    zones: p.limits.zones ?? [],
    safetyFactor: p.limits.safetyFactor,
    minClearance: p.limits.minClearance,
    breakingLoadN: model.wire.breakingLoad,
    iterations: state.iterations,
    messages: state.messages,
    solved: state.solved,
  });
}

/** Solve every state of the model at installation tension H and finish each; in case order. */
function solveStates<T>(
  model: ProjectModel,
  tensionN: number,
  finish: (name: string, temperature: number, state: StateSolution) => T,
  caseTensionGuesses?: readonly (readonly number[])[],
): { results: T[]; unstressed: number[] } {
  const installed = solveInstallation(model, tensionN);
  const results = [finish(model.installation.name, model.installation.temperature, installed)];
  const installedTensions = installed.spans.map((s) => s.tensionN);
  for (const [i, weather] of model.project.cases.entries()) {
    const state = solveChangeOfState(
      model,
      { ...loadStateOfCase(weather), name: weather.name },
      installed.unstressed,
      caseTensionGuesses?.[i] ?? installedTensions,
    );
    results.push(finish(weather.name, weather.temperature, state));
  }
  return { results, unstressed: installed.unstressed };
}

/** Sag and largest tension only: what the discretisation estimate compares. */
function summarise(_name: string, _temperature: number, state: StateSolution): StateSummary {
  return { sag: largestSag(state.spans), maxTension: largestStateTension(state.spans) };
}

function relativeChange(fine: StateSummary, coarse: StateSummary): number {
  const dt = Math.abs(fine.maxTension - coarse.maxTension) / Math.max(fine.maxTension, 1e-300);
  const ds = Math.abs(fine.sag - coarse.sag) / Math.max(fine.sag, 1e-300);
  return Math.max(dt, ds) / 3;
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
  return { tension: tension.name, clearance: clearance.name };
}

/**
 * Solve a project that has passed validateProject (an older version is read through the same
 * migration as validateProject). Never throws for physical failures.
 */
export function solveProject(document: Project): ProjectResults {
  const older = migrateProjectDocument(document as unknown as Record<string, unknown>);
  const project = older ? (older.document as unknown as Project) : document;
  const model = buildProjectModel(project);
  const target = findInstallationTension(model, project.installation.target);
  const finish = (name: string, temperature: number, state: StateSolution) =>
    checkState(model, name, temperature, state);
  const { results, unstressed } = solveStates(model, target.tensionN, finish);
  results[0].iterations += target.evaluations;
  if (!target.ok) {
    // Without its installation tension no state is meaningful: every case says so.
    for (const r of results) {
      r.solved = false;
      r.ok = false;
      r.messages.unshift(`Installation target: ${target.message ?? 'did not converge'}.`);
    }
  }
  const coarseCount = Math.max(2, Math.round(model.settings.elementsPerSpan / 2));
  const coarseModel = buildProjectModel(project, coarseCount);
  const fineTensions = results.slice(1).map((r) => r.spans.map((s) => s.horizontalTension));
  const coarse = solveStates(coarseModel, target.tensionN, summarise, fineTensions).results;
  results.forEach((r, i) => {
    r.discretisationError = relativeChange(r, coarse[i]);
  });
  const setUpSpan = targetSpanIndex(model, project.installation.target);
  return {
    unstressedLength: unstressed.reduce((a, b) => a + b, 0),
    cases: results,
    governing: governing(project, results),
    setUpChart: setUpChart(model, unstressed, setUpSpan, target.tensionN),
    setUpSpan,
  };
}
