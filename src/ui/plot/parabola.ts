/**
 * The closed-form parabola for a solved case: on each span z(x) = chord(x) − M(x)/H, with M the
 * simply-supported moment of the case's vertical loads (wire weight per horizontal metre, hung
 * loads, point loads) and H the span's horizontal tension from the FE solution.
 */

import {
  type CaseResult,
  DEFAULT_ENVIRONMENT,
  type Project,
  resolveWire,
  type WeatherCase,
  weatherCaseOfId,
} from '../../core/index.ts';
import { type CaseLoads, caseLoads, loadStateOfCase } from '../../core/loads.ts';

interface SpanEnds {
  a: number;
  b: number;
  za: number;
  zb: number;
}

/** ∫ from a to x of q (x − s) ds for a constant q on [from, to]. */
function uniformMomentPart(x: number, a: number, from: number, to: number, q: number): number {
  const lo = Math.max(from, a);
  const hi = Math.min(to, x);
  if (hi <= lo) return 0;
  return (q * ((x - lo) ** 2 - (x - hi) ** 2)) / 2;
}

function spanMoment(loads: CaseLoads, span: SpanEnds, x: number): number {
  const { a, b } = span;
  const length = b - a;
  const w = loads.wireWeightNPerM;
  let reactionMoment = (w * length * length) / 2; // Σ load × lever arm to b, times R_a L
  let loadMoment = (w * (x - a) ** 2) / 2;
  // Ice on a hung cable acts per metre of cable: per horizontal metre × the chord's ds/dx.
  const chordArcRatio = Math.hypot(1, (span.zb - span.za) / length);
  for (const u of loads.uniform) {
    const q = u.verticalNPerM + u.iceNPerM * chordArcRatio;
    reactionMoment += uniformMomentPart(b, a, u.from, u.to, q);
    loadMoment += uniformMomentPart(x, a, u.from, u.to, q);
  }
  for (const p of loads.points) {
    if (p.x <= a || p.x >= b) continue;
    reactionMoment += p.forceN * (b - p.x);
    if (p.x < x) loadMoment += p.forceN * (x - p.x);
  }
  return (reactionMoment / length) * (x - a) - loadMoment;
}

function weatherOf(project: Project, result: CaseResult): WeatherCase {
  // By identity, never by name: a case may be named like the installation state.
  const found = weatherCaseOfId(project.cases, result.id);
  if (found) return found;
  const inst = project.installation;
  return {
    name: result.name,
    temperature: inst.temperature,
    iceThickness: 0,
    windSpeed: 0,
    withLoads: inst.withLoads,
  };
}

/** Heights of the parabola at the case's profile x values, or undefined if it cannot be drawn. */
export function parabolaHeights(project: Project, result: CaseResult): number[] | undefined {
  const profile = result.profile;
  const wire = resolveWire(project.wire);
  if (!profile || !wire || !result.solved) return undefined;
  const env = { ...DEFAULT_ENVIRONMENT, ...project.environment };
  const loads = caseLoads(wire, project.loads, loadStateOfCase(weatherOf(project, result)), env);
  const supports = project.supports;
  return profile.x.map((x) => {
    let i = 0;
    while (i < supports.length - 2 && x > supports[i + 1].x) i++;
    const span = {
      a: supports[i].x,
      b: supports[i + 1].x,
      za: supports[i].z,
      zb: supports[i + 1].z,
    };
    const tension = result.spans[i]?.horizontalTension ?? result.horizontalTension;
    const chord = span.za + ((span.zb - span.za) * (x - span.a)) / (span.b - span.a);
    return chord - spanMoment(loads, span, x) / tension;
  });
}

export function largestDifference(a: readonly number[], b: readonly number[]): number {
  let largest = 0;
  for (let i = 0; i < a.length; i++) largest = Math.max(largest, Math.abs(a[i] - b[i]));
  return largest;
}
