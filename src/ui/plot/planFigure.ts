/**
 * The plan view of the sag plot as a pure Plotly figure spec: the wire seen from above, its
 * sideways swing y against x for each case (y positive downwind). A case without wind lies on
 * y = 0. Same colours, names and legend groups as the side view; display units throughout.
 */
import type { Annotation, Data, Layout } from 'plotly.js';
import type { CaseResult, Project, ProjectResults } from '../../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { caseColour } from './colours.ts';
import { supportTrace } from './figureParts.ts';
import { plotlyText } from './plotlyText.ts';

function swingTrace(result: CaseResult, index: number, units: UnitSystem): Data | null {
  const profile = result.profile;
  if (!profile || !result.solved) return null;
  const len = (m: number) => fromSi(m, 'length', units);
  const lu = unitSymbol('length', units);
  const fu = unitSymbol('force', units);
  return {
    type: 'scatter',
    mode: 'lines',
    name: plotlyText(result.name),
    legendgroup: result.id,
    x: profile.x.map(len),
    y: profile.y.map(len),
    customdata: profile.tension.map((t) => fromSi(t, 'force', units)),
    line: { color: caseColour(index), width: 2.5, dash: index >= 7 ? 'dot' : 'solid' },
    hovertemplate:
      `x %{x:.2f} ${lu}<br>swing %{y:.3f} ${lu}<br>tension %{customdata:.0f} ${fu}` +
      '<extra>%{fullData.name}</extra>',
  };
}

/** Where the largest swing of all cases is, as a note on the plot (or why there is none). */
function swingNote(results: ProjectResults, units: UnitSystem): Partial<Annotation> {
  const len = (m: number) => fromSi(m, 'length', units);
  const lu = unitSymbol('length', units);
  let best: { result: CaseResult; i: number } | null = null;
  for (const result of results.cases) {
    const y = result.solved ? result.profile?.y : undefined;
    if (!y) continue;
    for (let i = 0; i < y.length; i++) {
      const bestY = best?.result.profile?.y[best.i] ?? 0;
      if (Math.abs(y[i]) > Math.abs(bestY)) best = { result, i };
    }
  }
  const box = { bgcolor: 'rgba(255,255,255,0.85)' };
  const profile = best?.result.profile;
  if (!best || !profile)
    return {
      ...box,
      xref: 'paper',
      yref: 'paper',
      x: 0.5,
      y: 0.8,
      showarrow: false,
      text: 'No case has wind: the wire stays in its vertical plane.',
    };
  const y = profile.y[best.i];
  return {
    ...box,
    x: len(profile.x[best.i]),
    y: len(y),
    text: `Largest swing ${Math.abs(len(y)).toFixed(3)} ${lu} (${plotlyText(best.result.name)})`,
    showarrow: true,
    arrowhead: 2,
    // Tail toward the line of the fixings, where the plot is empty.
    ax: 0,
    ay: y > 0 ? 90 : -90,
  };
}

export function planTraces(project: Project, results: ProjectResults, units: UnitSystem): Data[] {
  const data: Data[] = [];
  results.cases.forEach((result, index) => {
    const trace = swingTrace(result, index, units);
    if (trace) data.push(trace);
  });
  data.push(supportTrace(project, units, 'plan'));
  return data;
}

export function planLayout(
  results: ProjectResults,
  units: UnitSystem,
  equalAspect: boolean,
): Partial<Layout> {
  const lu = unitSymbol('length', units);
  return {
    margin: { l: 64, r: 16, t: 16, b: 48 },
    xaxis: { title: { text: `Distance along the span (${lu})` }, zeroline: false },
    yaxis: {
      title: { text: `Sideways swing, downwind (${lu})` },
      zeroline: true,
      zerolinecolor: '#8c959f',
      ...(equalAspect ? { scaleanchor: 'x', scaleratio: 1 } : {}),
    },
    legend: { orientation: 'h', y: -0.18, x: 0 },
    hovermode: 'closest',
    annotations: [swingNote(results, units)],
    paper_bgcolor: '#ffffff',
    plot_bgcolor: '#ffffff',
  };
}
