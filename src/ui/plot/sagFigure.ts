/**
 * The sag plot as a pure Plotly figure spec (no DOM), so the workbench and exports draw the
 * same thing: each case's wire (solid) with its closed-form parabola (dashed), the ground
 * filled, clearance zones shaded at their required heights, supports, the lowest point and the
 * largest sag annotated (sag drawn where it is measured: down from the straight line between the
 * fixings, dash-dotted on inclined spans, at the point where that drop is largest), and the band a moving load sweeps (movingBand.ts). Values are
 * converted to the chosen display units. The plan view (options.view 'plan', planFigure.ts)
 * shows the sideways swing in wind instead.
 */
import type { Annotation, Data, Layout } from 'plotly.js';
import type { CaseResult, Project, ProjectResults } from '../../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { formatLength } from '../../deliverables/displayUnits.ts';
import { sagPosition } from '../../deliverables/reportSetting.ts';
import { caseColour } from './colours.ts';
import { groundHeightAt, groundTraces, supportTrace, zoneTraces } from './figureParts.ts';
import { movingLoadBands } from './movingBand.ts';
import { largestDifference, parabolaHeights } from './parabola.ts';
import { planLayout, planTraces } from './planFigure.ts';
import { plotlyText } from './plotlyText.ts';

/** Side view: height against distance. Plan view: sideways swing against distance. */
export type PlotView = 'side' | 'plan';

export interface SagFigureOptions {
  equalAspect?: boolean;
  /** Draw the dashed closed-form parabola beside each case (default true). */
  showParabola?: boolean;
  /** Which view to draw (default 'side'). */
  view?: PlotView;
}

export interface ParabolaComparison {
  /** The compared state's identity (CaseResult.id); caseName is its label. */
  caseId: string;
  caseName: string;
  /** Largest vertical distance between the FE wire and the parabola, m. */
  differenceM: number;
}

export interface SagFigure {
  data: Data[];
  layout: Partial<Layout>;
  parabola: ParabolaComparison | null;
  /** True when the figure draws a moving-load band. */
  movingBands?: boolean;
}

function caseTraces(
  project: Project,
  result: CaseResult,
  index: number,
  units: UnitSystem,
): { traces: Data[]; differenceM: number } {
  const profile = result.profile;
  if (!profile || !result.solved) return { traces: [], differenceM: 0 };
  const len = (m: number) => fromSi(m, 'length', units);
  const colour = caseColour(index);
  const lu = unitSymbol('length', units);
  const fu = unitSymbol('force', units);
  const customdata = profile.x.map((x, i) => [
    len(profile.z[i] - groundHeightAt(project, x)),
    fromSi(profile.tension[i], 'force', units),
  ]);
  const name = plotlyText(result.name);
  const wire: Data = {
    type: 'scatter',
    mode: 'lines',
    name,
    legendgroup: result.id,
    x: profile.x.map(len),
    y: profile.z.map(len),
    customdata,
    line: { color: colour, width: 2.5, dash: index >= 7 ? 'dot' : 'solid' },
    hovertemplate:
      `x %{x:.2f} ${lu}<br>height %{y:.3f} ${lu}<br>clearance %{customdata[0]:.3f} ${lu}` +
      `<br>tension %{customdata[1]:.0f} ${fu}<extra>%{fullData.name}</extra>`,
  };
  const parabola = parabolaHeights(project, result);
  if (!parabola) return { traces: [wire], differenceM: 0 };
  const closedForm: Data = {
    type: 'scatter',
    mode: 'lines',
    name: `${name} — parabola`,
    legendgroup: result.id,
    showlegend: false,
    x: profile.x.map(len),
    y: parabola.map(len),
    line: { color: colour, width: 1.2, dash: 'dash' },
    // Hover reads the wire: the parabola lies within millimetres of it and would take the label.
    hoverinfo: 'skip',
  };
  return { traces: [wire, closedForm], differenceM: largestDifference(profile.z, parabola) };
}

/** Where the largest sag is measured: the case, its span, the point and the chord above it. */
interface SagPoint {
  result: CaseResult;
  span: number;
  x: number;
  chordZ: number;
  wireZ: number;
}

/**
 * The largest sag over the solved cases, at the point where it is measured: below the straight
 * line between the span's fixings (the chord), where the drop from it is largest — on an
 * inclined span that is not the lowest point.
 */
export function largestSagPoint(project: Project, results: ProjectResults): SagPoint | null {
  const solved = results.cases.filter((c) => c.solved && c.spans.length > 0 && c.profile);
  if (solved.length === 0) return null;
  const result = solved.reduce((a, b) => (b.sag > a.sag ? b : a));
  const span = result.spans.reduce((best, s, j) => (s.sag > result.spans[best].sag ? j : best), 0);
  const x = sagPosition(project, result, span);
  const profile = result.profile;
  if (x === undefined || !profile) return null;
  const a = project.supports[span];
  const b = project.supports[span + 1];
  const i = profile.x.indexOf(x);
  return {
    result,
    span,
    x,
    chordZ: a.z + ((b.z - a.z) * (x - a.x)) / (b.x - a.x),
    wireZ: profile.z[i],
  };
}

const CHORD_NAME = 'Straight line between fixings (sag is measured down from it)';

/**
 * The chord of each span (dash-dotted), and the largest sag drawn as a short line from the
 * chord straight down to the wire where it is measured.
 */
function sagTraces(project: Project, point: SagPoint | null, units: UnitSystem): Data[] {
  const len = (m: number) => fromSi(m, 'length', units);
  const traces: Data[] = [];
  // Every span's, level ones too: sag is measured from this line on any span, and a fixing
  // dragged up or down then changes only numbers, so the plot can follow the drag quickly
  // (figureUpdate.ts) instead of waiting for a full redraw when a level span tilts.
  project.supports.slice(1).forEach((b, j) => {
    const a = project.supports[j];
    traces.push({
      type: 'scatter',
      mode: 'lines',
      name: CHORD_NAME,
      legendgroup: 'chord',
      showlegend: traces.length === 0,
      x: [len(a.x), len(b.x)],
      y: [len(a.z), len(b.z)],
      line: { color: '#1f2328', width: 1.2, dash: 'dashdot' },
      hoverinfo: 'skip',
    });
  });
  if (point)
    traces.push({
      type: 'scatter',
      mode: 'lines',
      name: 'Largest sag, measured here',
      showlegend: false,
      x: [len(point.x), len(point.x)],
      y: [len(point.chordZ), len(point.wireZ)],
      line: { color: '#1f2328', width: 2 },
      // No numbers in the hover text: only x and y change with an edit, so the quick redraw
      // (figureUpdate.ts) can move this line with the wires.
      hovertemplate:
        'Largest sag: measured straight down from the line between fixings<extra></extra>',
    });
  return traces;
}

function annotations(
  results: ProjectResults,
  point: SagPoint | null,
  units: UnitSystem,
): Partial<Annotation>[] {
  const solved = results.cases.filter((c) => c.solved);
  if (solved.length === 0) return [];
  const len = (m: number) => fromSi(m, 'length', units);
  const lowest = solved.reduce((a, b) => (b.lowestPoint.z < a.lowestPoint.z ? b : a));
  const notes: Partial<Annotation>[] = [
    {
      x: len(lowest.lowestPoint.x),
      y: len(lowest.lowestPoint.z),
      text: `Lowest point ${formatLength(units, lowest.lowestPoint.z)} (${plotlyText(lowest.name)})`,
      showarrow: true,
      arrowhead: 2,
      // Label and arrow wholly below-right of the point (anchored at the label's top-left corner).
      ax: 24,
      ay: 28,
      xanchor: 'left',
      yanchor: 'top',
      bgcolor: 'rgba(255,255,255,0.85)',
    },
  ];
  if (point)
    notes.push({
      x: len(point.x),
      y: len(point.wireZ),
      text: `Largest sag ${formatLength(units, point.result.sag)} below the line between fixings (${plotlyText(point.result.name)})`,
      showarrow: true,
      arrowhead: 2,
      // Label straight above the point, arrow pointing down: it stays above every wire point
      // of the lowest-point arrow, so the two never cross, and clear of the fixings' labels.
      ax: 0,
      ay: -30,
      xanchor: 'center',
      yanchor: 'bottom',
      bgcolor: 'rgba(255,255,255,0.85)',
    });
  return notes;
}

export function buildSagFigure(
  project: Project,
  results: ProjectResults,
  unitSystem: UnitSystem,
  options: SagFigureOptions = {},
): SagFigure {
  if (options.view === 'plan')
    return {
      data: planTraces(project, results, unitSystem),
      layout: planLayout(results, unitSystem, options.equalAspect === true),
      parabola: null,
    };
  const lu = unitSymbol('length', unitSystem);
  const bands = movingLoadBands(results, unitSystem);
  const data: Data[] = [
    ...groundTraces(project, unitSystem),
    ...zoneTraces(project, unitSystem),
    ...bands,
  ];
  let parabola: ParabolaComparison | null = null;
  results.cases.forEach((result, index) => {
    const drawn = caseTraces(project, result, index, unitSystem);
    const traces = options.showParabola === false ? drawn.traces.slice(0, 1) : drawn.traces;
    data.push(...traces);
    if (drawn.traces.length > 1 && (!parabola || drawn.differenceM > parabola.differenceM))
      parabola = { caseId: result.id, caseName: result.name, differenceM: drawn.differenceM };
  });
  const sagPoint = largestSagPoint(project, results);
  data.push(...sagTraces(project, sagPoint, unitSystem));
  data.push(supportTrace(project, unitSystem));
  const layout: Partial<Layout> = {
    margin: { l: 64, r: 16, t: 16, b: 48 },
    xaxis: { title: { text: `Distance along the span (${lu})` }, zeroline: false },
    yaxis: {
      title: { text: `Height above ground datum (${lu})` },
      zeroline: false,
      ...(options.equalAspect ? { scaleanchor: 'x', scaleratio: 1 } : {}),
    },
    legend: { orientation: 'h', y: -0.18, x: 0 },
    hovermode: 'closest',
    annotations: annotations(results, sagPoint, unitSystem),
    paper_bgcolor: '#ffffff',
    plot_bgcolor: '#ffffff',
  };
  return { data, layout, parabola, movingBands: bands.length > 0 };
}
