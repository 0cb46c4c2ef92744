/**
 * Sag plot: one line per case (wire height z against distance x along the span, m), with the
 * ground line and clearance zones drawn as shapes. Plotly (core + scatter only) is fetched with
 * a dynamic import so the page and its numbers render before the charting code arrives.
 */
import type { Annotation, Data, Layout, Shape } from 'plotly.js';
import { useEffect, useRef, useState } from 'react';
import type { CaseResult, Project } from '../core/project.ts';

type PlotlyApi = typeof import('plotly.js/lib/core').default;

let plotlyPromise: Promise<PlotlyApi> | undefined;

function loadPlotly(): Promise<PlotlyApi> {
  plotlyPromise ??= Promise.all([
    import('plotly.js/lib/core'),
    import('plotly.js/lib/scatter'),
  ]).then(([core, scatter]) => {
    core.default.register([scatter.default]);
    return core.default;
  });
  return plotlyPromise;
}

function caseTraces(cases: CaseResult[]): Data[] {
  return cases.map((result) => ({
    type: 'scatter',
    mode: 'lines',
    name: result.name,
    x: result.profile?.x ?? [],
    y: result.profile?.z ?? [],
    hovertemplate: 'x %{x:.2f} m<br>z %{y:.3f} m<extra>%{fullData.name}</extra>',
  }));
}

function groundShapes(project: Project): Partial<Shape>[] {
  const first = project.supports[0]?.x ?? 0;
  const last = project.supports[project.supports.length - 1]?.x ?? 0;
  const ground = project.ground ?? [
    { x: first, z: 0 },
    { x: last, z: 0 },
  ];
  const lines: Partial<Shape>[] = ground.slice(1).map((point, index) => ({
    type: 'line',
    x0: ground[index].x,
    y0: ground[index].z,
    x1: point.x,
    y1: point.z,
    line: { color: '#6b5a3c', width: 2 },
  }));
  const zones: Partial<Shape>[] = (project.limits.zones ?? []).map((zone) => ({
    type: 'rect',
    x0: zone.from,
    x1: zone.to,
    y0: 0,
    y1: zone.height,
    fillcolor: 'rgba(200, 120, 40, 0.12)',
    line: { width: 0 },
  }));
  return [...lines, ...zones];
}

function zoneLabels(project: Project): Partial<Annotation>[] {
  return (project.limits.zones ?? []).map((zone) => ({
    x: (zone.from + zone.to) / 2,
    y: zone.height,
    yanchor: 'bottom',
    showarrow: false,
    text: `${zone.label ?? 'Clearance zone'}: ${zone.height} m`,
    font: { size: 11, color: '#8a4b0f' },
  }));
}

function plotLayout(project: Project): Partial<Layout> {
  return {
    margin: { l: 60, r: 20, t: 20, b: 50 },
    xaxis: { title: { text: 'Distance along span x (m)' }, zeroline: false },
    yaxis: { title: { text: 'Height z (m)' }, rangemode: 'tozero' },
    legend: { orientation: 'h', y: -0.2 },
    shapes: groundShapes(project),
    annotations: zoneLabels(project),
  };
}

type PlotState = 'loading' | 'drawn' | 'failed';

export function SagPlot({ project, cases }: { project: Project; cases: CaseResult[] }) {
  const containerRef = useRef<HTMLDivElement>(null);
  const [state, setState] = useState<PlotState>('loading');

  useEffect(() => {
    const container = containerRef.current;
    if (!container) return;
    let cancelled = false;
    loadPlotly()
      .then((Plotly) =>
        Plotly.react(container, caseTraces(cases), plotLayout(project), {
          displaylogo: false,
          responsive: true,
        }),
      )
      .then(() => !cancelled && setState('drawn'))
      .catch(() => !cancelled && setState('failed'));
    return () => {
      cancelled = true;
    };
  }, [project, cases]);

  return (
    <figure className="sag-plot">
      <div
        ref={containerRef}
        role="img"
        aria-label="Sag plot"
        data-plot-state={state}
        className="sag-plot-canvas"
      />
      {state === 'loading' && <p className="muted">Loading the plot…</p>}
      {state === 'failed' && <p role="alert">The plot could not be drawn; the numbers stand.</p>}
      <figcaption className="muted">
        Wire height above the ground datum for each case; ground line and clearance zones shaded.
      </figcaption>
    </figure>
  );
}
