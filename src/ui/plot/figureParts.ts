/**
 * Static parts of the sag plot: the filled ground, clearance zones at their required heights
 * above the ground, the minimum-clearance line, and the supports. Display units throughout.
 */
import type { Data } from 'plotly.js';
import type { GroundPoint, Project } from '../../core/index.ts';
import { fromSi, type UnitSystem } from '../../core/units.ts';
import { formatLength } from '../../deliverables/displayUnits.ts';
import { GROUND_FILL, GROUND_LINE, ZONE_FILL, ZONE_LINE } from './colours.ts';
import { plotlyText } from './plotlyText.ts';

/**
 * The ground as drawn: the project's points, extended level (as the solver reads it beyond the
 * first and last points) so the line covers every support.
 */
export function groundLine(project: Project): GroundPoint[] {
  const first = project.supports[0].x;
  const last = project.supports[project.supports.length - 1].x;
  const ground = project.ground?.length ? [...project.ground] : [{ x: first, z: 0 }];
  if (ground[0].x > first) ground.unshift({ x: first, z: ground[0].z });
  const end = ground[ground.length - 1];
  if (end.x < last) ground.push({ x: last, z: end.z });
  return ground;
}

/** Ground height at x, m: linear between points, level beyond the ends. */
export function groundHeightAt(project: Project, x: number): number {
  const g = groundLine(project);
  if (x <= g[0].x) return g[0].z;
  for (let i = 1; i < g.length; i++) {
    if (x <= g[i].x)
      return g[i - 1].z + ((g[i].z - g[i - 1].z) * (x - g[i - 1].x)) / (g[i].x - g[i - 1].x);
  }
  return g[g.length - 1].z;
}

export function groundTraces(project: Project, units: UnitSystem): Data[] {
  const len = (m: number) => fromSi(m, 'length', units);
  const g = groundLine(project);
  const bottom = Math.min(...g.map((p) => p.z)) - 0.4;
  const ground: Data = {
    type: 'scatter',
    mode: 'lines',
    name: 'Ground',
    x: [...g.map((p) => len(p.x)), len(g[g.length - 1].x), len(g[0].x)],
    y: [...g.map((p) => len(p.z)), len(bottom), len(bottom)],
    fill: 'toself',
    fillcolor: GROUND_FILL,
    line: { color: GROUND_LINE, width: 2 },
    hoverinfo: 'skip',
  };
  const minClearance = project.limits.minClearance;
  const clearanceLine: Data = {
    type: 'scatter',
    mode: 'lines',
    name: `Minimum clearance ${formatLength(units, minClearance)}`,
    x: g.map((p) => len(p.x)),
    y: g.map((p) => len(p.z + minClearance)),
    line: { color: GROUND_LINE, width: 1, dash: 'dot' },
    hoverinfo: 'skip',
  };
  return [ground, clearanceLine];
}

export function zoneTraces(project: Project, units: UnitSystem): Data[] {
  const len = (m: number) => fromSi(m, 'length', units);
  return (project.limits.zones ?? []).map((zone, i) => {
    const inside = groundLine(project)
      .map((p) => p.x)
      .filter((x) => x > zone.from && x < zone.to);
    const xs = [zone.from, ...inside, zone.to];
    const base = xs.map((x) => groundHeightAt(project, x));
    const label = plotlyText(zone.label || `Zone ${i + 1}`);
    return {
      type: 'scatter',
      mode: 'lines',
      name: `${label}: needs ${formatLength(units, zone.height)}`,
      x: [...xs, ...[...xs].reverse()].map(len),
      y: [...base.map((z) => z + zone.height), ...[...base].reverse()].map(len),
      fill: 'toself',
      fillcolor: ZONE_FILL,
      line: { color: ZONE_LINE, width: 1, dash: 'dash' },
      hoverinfo: 'name',
    } satisfies Data;
  });
}

/**
 * The fixings: at their heights in the side view, or on the line of the fixings (y = 0) seen
 * from above in the plan view.
 */
export function supportTrace(
  project: Project,
  units: UnitSystem,
  view: 'side' | 'plan' = 'side',
): Data {
  const len = (m: number) => fromSi(m, 'length', units);
  const plan = view === 'plan';
  return {
    type: 'scatter',
    mode: 'text+markers',
    name: 'Supports',
    x: project.supports.map((s) => len(s.x)),
    y: project.supports.map((s) => (plan ? 0 : len(s.z))),
    text: project.supports.map((s, i) => plotlyText(s.label || `Support ${i + 1}`)),
    textposition: project.supports.map((_, i) =>
      i === 0 ? 'top right' : i === project.supports.length - 1 ? 'top left' : 'top center',
    ),
    marker: plan
      ? { symbol: 'square', size: 10, color: '#333333' }
      : { symbol: 'triangle-down', size: 12, color: '#333333' },
    hovertemplate: '%{text}<extra></extra>',
  };
}
