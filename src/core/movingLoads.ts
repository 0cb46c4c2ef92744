/**
 * Moving loads: a point load P (N) that travels along [from, to], solved as a static point load at
 * each position x by a change of state at the fixed cut length. Envelope per case: the largest
 * tension T_max(x) and the lowest clearance c(x) over x. Method: a scan at 24 equal steps, then
 * Brent's bounded local minimiser on the two steps either side of the worst scanned position.
 */

import { clearanceOver, largestStateTension } from './caseChecks.ts';
import { SI_WORDING, type Wording } from './checkMessages.ts';
import { hungDrops, loadStateOfCase } from './loads.ts';
import { localMinimum } from './localMinimum.ts';
import type { CaseResult, MovingLoad, MovingLoadResult, PointLoad, Project } from './project.ts';
import { buildProjectModel, type NamedState, type ProjectModel } from './projectModel.ts';
import { heightAt } from './spanGeometry.ts';
import { type StateSolution, solveChangeOfState } from './states.ts';
import { resolveWire } from './wireCatalog.ts';

const SCAN_STEPS = 24;
const BAND_POINTS_PER_SPAN = 60;

export interface MovingContext {
  project: Project;
  /** Each span's cut length at the installation temperature, m. */
  unstressed: readonly number[];
  state: NamedState;
  tensionGuessN: number;
  /** Mesh refinement of the solve the envelope belongs to (each element split this many times). */
  refinement: number;
  /** End-fitting efficiency: the utilisation's capacity is breaking load × efficiency. */
  endFittingEfficiency: number;
}

export type MovingOptions = Pick<MovingContext, 'refinement' | 'endFittingEfficiency'>;

interface PositionSolve {
  x: number;
  solved: boolean;
  maxTension: number;
  clearance: number;
  zones: number[];
}

/** The project with the moving load parked as a static point load at x (other moving loads off). */
export function parkedProject(project: Project, load: MovingLoad, x: number): Project {
  const point: PointLoad =
    load.mass !== undefined
      ? { type: 'point', x, mass: load.mass, label: load.label }
      : { type: 'point', x, force: load.force, label: load.label };
  const loads = [...project.loads.filter((l) => l.type !== 'moving'), point];
  return { ...project, loads };
}

/** The state of a case with the moving load at x, at the fixed cut lengths. */
export function solveMovingLoadAt(ctx: MovingContext, load: MovingLoad, x: number): StateSolution {
  const model = buildProjectModel(parkedProject(ctx.project, load, x), ctx.refinement);
  const guesses = ctx.unstressed.map(() => ctx.tensionGuessN);
  return solveChangeOfState(model, ctx.state, ctx.unstressed, guesses);
}

function bandGrid(project: Project): number[] {
  const xs: number[] = [];
  const s = project.supports;
  for (let j = 0; j + 1 < s.length; j++) {
    for (let k = j === 0 ? 0 : 1; k <= BAND_POINTS_PER_SPAN; k++)
      xs.push(s[j].x + ((s[j + 1].x - s[j].x) * k) / BAND_POINTS_PER_SPAN);
  }
  return xs;
}

function heightsOn(state: StateSolution, grid: readonly number[]): number[] {
  return grid.map((x) => {
    const s = state.spans.find((p) => x <= p.span.x1) ?? state.spans[state.spans.length - 1];
    return heightAt(s.span, s.tensionN, x);
  });
}

/** Envelope of one moving load in one case. */
export function movingLoadEnvelope(
  ctx: MovingContext,
  load: MovingLoad,
  index: number,
): MovingLoadResult {
  const { project } = ctx;
  const ground = project.ground ?? [];
  // Hung items that hang below the wire count in the clearance, as in the case itself.
  const drops = hungDrops(project.loads, ctx.state.withLoads);
  const zones = project.limits.zones ?? [];
  const grid = bandGrid(project);
  const band = { x: grid, zLow: grid.map(() => Infinity), zHigh: grid.map(() => -Infinity) };
  const solves = new Map<number, PositionSolve>();
  const solveAt = (x: number, inBand: boolean): PositionSolve => {
    const known = solves.get(x);
    if (known) return known;
    const state = solveMovingLoadAt(ctx, load, x);
    const result: PositionSolve = {
      x,
      solved: state.solved,
      maxTension: largestStateTension(state.spans),
      clearance: clearanceOver(state.spans, ground, -Infinity, Infinity, drops).value,
      zones: zones.map((z) => clearanceOver(state.spans, ground, z.from, z.to, drops).value),
    };
    solves.set(x, result);
    if (inBand && state.solved) {
      heightsOn(state, grid).forEach((z, i) => {
        band.zLow[i] = Math.min(band.zLow[i], z);
        band.zHigh[i] = Math.max(band.zHigh[i], z);
      });
    }
    return result;
  };
  const scan: number[] = [];
  for (let k = 0; k <= SCAN_STEPS; k++)
    scan.push(load.from + ((load.to - load.from) * k) / SCAN_STEPS);
  for (const x of scan) solveAt(x, true);
  const tolerance = 1e-6 * (load.to - load.from);
  /** Smallest `badness` over the path: worst scanned position, then the local minimiser. */
  const worst = (badness: (p: PositionSolve) => number): PositionSolve => {
    const bad = (p: PositionSolve) => (p.solved ? badness(p) : Number.NaN);
    let k = 0;
    scan.forEach((x, i) => {
      if (!(bad(solveAt(x, false)) >= bad(solveAt(scan[k], false)))) k = i;
    });
    const lo = scan[Math.max(0, k - 1)];
    const hi = scan[Math.min(scan.length - 1, k + 1)];
    localMinimum((x) => bad(solveAt(x, false)), lo, hi, tolerance);
    let best = solveAt(scan[k], false);
    for (const p of solves.values()) if (bad(p) < bad(best)) best = p;
    return best;
  };
  const tension = worst((p) => -p.maxTension);
  const clearance = worst((p) => p.clearance);
  const zoneClearances = zones.map((z, i) => {
    const p = worst((s) => s.zones[i]);
    const value = p.zones[i];
    return {
      label: z.label ?? `Zone ${i + 1}`,
      clearance: value,
      required: z.height,
      ok: value >= z.height,
      at: p.x,
    };
  });
  const solved = [...solves.values()].every((p) => p.solved);
  const capacityN = breakingLoadOf(ctx) * ctx.endFittingEfficiency;
  const utilisation = (tension.maxTension * project.limits.safetyFactor) / capacityN;
  return {
    label: load.label ?? `Moving load ${index + 1}`,
    maxTension: tension.maxTension,
    maxTensionAt: tension.x,
    clearance: clearance.clearance,
    clearanceAt: clearance.x,
    utilisation,
    zoneClearances,
    ok:
      solved &&
      utilisation <= 1 &&
      clearance.clearance >= project.limits.minClearance &&
      zoneClearances.every((z) => z.ok),
    positions: solves.size,
    band,
  };
}

function breakingLoadOf(ctx: MovingContext): number {
  return resolveWire(ctx.project.wire)?.breakingLoad ?? Number.NaN;
}

/** A moving load's failed checks in words (SI for the core's messages; any units via `w`). */
export function movingLoadFailures(
  m: MovingLoadResult,
  project: Project,
  w: Wording = SI_WORDING,
): string[] {
  const at = (x: number) => `with the load at ${w.length(x)}`;
  const out: string[] = [];
  if (m.utilisation > 1)
    out.push(
      `${m.label}: largest tension ${w.force(m.maxTension)} ${at(m.maxTensionAt)} exceeds the working limit.`,
    );
  if (m.clearance < project.limits.minClearance)
    out.push(
      `${m.label}: clearance ${w.length(m.clearance)} ${at(m.clearanceAt)} is below the required ${w.length(project.limits.minClearance)}.`,
    );
  for (const z of m.zoneClearances)
    if (!z.ok)
      out.push(
        `${m.label}: ${z.label} clearance ${w.length(z.clearance)} ${at(z.at)} is below the required ${w.length(z.required)}.`,
      );
  if (out.length === 0 && !m.ok) out.push(`${m.label}: some positions could not be solved.`);
  return out;
}

/**
 * Each case that carries the hung loads gets the envelope of every moving load (each taken alone,
 * the others off the wire); a failing envelope fails the case. Cases without loads get [].
 */
export function addMovingLoads(
  model: ProjectModel,
  results: CaseResult[],
  unstressed: readonly number[],
  options: MovingOptions,
): void {
  const project = model.project;
  const moving = project.loads.filter((l): l is MovingLoad => l.type === 'moving');
  if (moving.length === 0) return;
  const states: NamedState[] = [
    model.installation,
    ...project.cases.map((c) => ({ ...loadStateOfCase(c), name: c.name })),
  ];
  results.forEach((r, i) => {
    const state = states[i];
    r.movingLoads = [];
    if (!state?.withLoads || !r.solved) return;
    const ctx = { project, unstressed, state, tensionGuessN: r.horizontalTension, ...options };
    r.movingLoads = moving.map((load, k) => movingLoadEnvelope(ctx, load, k));
    for (const m of r.movingLoads) {
      if (m.ok) continue;
      r.ok = false;
      r.messages.push(...movingLoadFailures(m, project));
    }
  });
}
