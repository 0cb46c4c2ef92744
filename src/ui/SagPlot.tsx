/**
 * The sag plot on screen: draws buildSagFigure() with Plotly once Plotly has loaded (lazily),
 * in side view (height) or plan view (sideways swing in wind), and states the largest parabola
 * difference. In side view the fixings and point loads can be dragged (DragHandles.tsx). Redraws wait for the next frame and skip results that a newer one replaces.
 */
import { type RefObject, useEffect, useId, useMemo, useRef, useState } from 'react';
import type { Project, ProjectResults } from '../core/index.ts';
import { type UnitSystem, unitSymbol } from '../core/units.ts';
import { formatCell } from '../deliverables/displayUnits.ts';
import { useResultsStore } from '../state/resultsStore.ts';
import { documentRevision } from '../state/revision.ts';
import { useUiStore } from '../state/uiStore.ts';
import { COMPACT_WIDTH_PX, compactFigure, compactTitles } from './plot/compactFigure.ts';
import { DragHandles } from './plot/DragHandles.tsx';
import { PlotKey } from './plot/PlotKey.tsx';
import { downloadPlot } from './plot/plotDownload.ts';
import { usePlotViewStore } from './plot/plotViewStore.ts';
import { buildSagFigure, type PlotView, type SagFigure } from './plot/sagFigure.ts';
import { usePlotlyDraw } from './plot/usePlotlyDraw.ts';
import './plot/plot.css';

function DownloadButtons({ project, results }: { project: Project; results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const [problem, setProblem] = useState<string | null>(null);
  const save = (format: 'png' | 'svg') => {
    setProblem(null);
    downloadPlot(project, results, units, format).catch(() =>
      setProblem(`The ${format.toUpperCase()} could not be made; the plot on screen stands.`),
    );
  };
  return (
    <div className="plot-downloads">
      <button type="button" onClick={() => save('png')}>
        Download PNG
      </button>
      <button type="button" onClick={() => save('svg')}>
        Download SVG
      </button>
      {problem && <span role="alert">{problem}</span>}
    </div>
  );
}

function PlotTools({ project, results }: { project: Project; results: ProjectResults }) {
  const equalAspect = useUiStore((s) => s.equalAspect);
  const setEqualAspect = useUiStore((s) => s.setEqualAspect);
  const view = usePlotViewStore((s) => s.view);
  const setView = usePlotViewStore((s) => s.setView);
  const name = useId();
  const choices: [PlotView, string][] = [
    ['side', 'Side view (height)'],
    ['plan', 'Plan view (sideways swing)'],
  ];
  return (
    <div className="plot-tools">
      <fieldset className="plot-view">
        <legend className="visually-hidden">Plot view</legend>
        {choices.map(([value, label]) => (
          <label key={value}>
            <input
              type="radio"
              name={name}
              value={value}
              checked={view === value}
              onChange={() => setView(value)}
            />
            {label}
          </label>
        ))}
      </fieldset>
      <label>
        <input
          type="checkbox"
          checked={equalAspect}
          onChange={(event) => setEqualAspect(event.target.checked)}
        />
        True proportions (equal scales)
      </label>
      {view === 'side' && <DownloadButtons project={project} results={results} />}
    </div>
  );
}

function Caption({ id, figure, view, units }: CaptionProps) {
  if (view === 'plan')
    return (
      <figcaption id={id} className="muted">
        Seen from above: the sideways swing of the wire for each case, positive downwind. Cases
        without wind stay on the line of the fixings (0).
      </figcaption>
    );
  return (
    <figcaption id={id} className="muted">
      Solid: the wire by finite elements for each case. Dashed: the closed-form parabola at the same
      horizontal tension
      {figure.parabola
        ? ` — largest difference ${formatCell(units, 'length', figure.parabola.differenceM, 4)} (${figure.parabola.caseName}).`
        : '.'}{' '}
      Shaded: ground and clearance zones at their required heights. Sag is measured straight down
      from the straight line between the fixings (drawn dash-dotted), at the point where that drop
      is largest; on an inclined span that is not the lowest point.
      {figure.movingBands
        ? ' Lightly shaded with a dotted lower edge: the heights each case’s wire takes while a moving load travels its path.'
        : ''}
    </figcaption>
  );
}

interface CaptionProps {
  id: string;
  figure: SagFigure;
  view: PlotView;
  units: UnitSystem;
}

/** True while the plot is narrower than COMPACT_WIDTH_PX (a phone). */
function useNarrow(ref: RefObject<HTMLDivElement | null>): boolean {
  const [narrow, setNarrow] = useState(false);
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) =>
      setNarrow(entry.contentRect.width > 0 && entry.contentRect.width < COMPACT_WIDTH_PX),
    );
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return narrow;
}

/**
 * On screen the legend sits above the plot (Plotly makes room for it), clear of the distance
 * axis title that a legend below runs into on a tablet's shorter plot. Exported images keep
 * theirs below (src/ui/export/plotImage.ts).
 */
function legendOnTop(figure: SagFigure): SagFigure {
  return {
    ...figure,
    layout: {
      ...figure.layout,
      legend: { ...figure.layout.legend, orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom' },
      margin: { ...figure.layout.margin, b: 44 },
    },
  };
}

interface HeldAxes {
  x: [number, number];
  y: [number, number];
}

function axesOnScreen(container: HTMLDivElement | null): HeldAxes | null {
  const layout = (container as { _fullLayout?: Record<string, { range?: unknown[] }> } | null)
    ?._fullLayout;
  const [x, y] = [layout?.xaxis?.range, layout?.yaxis?.range];
  const pair = (r?: unknown[]) =>
    r?.length === 2 && typeof r[0] === 'number' && typeof r[1] === 'number'
      ? ([r[0], r[1]] as [number, number])
      : null;
  const [px, py] = [pair(x), pair(y)];
  return px && py ? { x: px, y: py } : null;
}

function holdAxes(layout: SagFigure['layout'], held: HeldAxes): SagFigure['layout'] {
  return {
    ...layout,
    xaxis: { ...layout.xaxis, range: held.x, autorange: false },
    yaxis: { ...layout.yaxis, range: held.y, autorange: false },
  };
}

export function SagPlot({ project, results }: { project: Project; results: ProjectResults }) {
  const containerRef = useRef<HTMLDivElement>(null);
  const captionId = useId();
  const units = useUiStore((s) => s.unitSystem);
  const equalAspect = useUiStore((s) => s.equalAspect);
  const view = usePlotViewStore((s) => s.view);
  // A newer result is on its way: drawing this one would be wasted main-thread time.
  const newerPending = useResultsStore((s) => s.stale && s.error === null);
  // While a handle is dragged the axes hold still (at the ranges on screen when it was
  // grabbed), so the point under the pointer keeps its meaning and every result is sketched.
  const [heldAxes, setHeldAxes] = useState<HeldAxes | null>(null);
  const compact = useNarrow(containerRef);
  const figure = useMemo(() => {
    const wide = buildSagFigure(project, results, units, { equalAspect, view });
    const built = compact
      ? compactFigure(wide, compactTitles(view, unitSymbol('length', units)))
      : legendOnTop(wide);
    return {
      ...built,
      layout: heldAxes ? holdAxes(built.layout, heldAxes) : built.layout,
      revision: documentRevision(project),
    };
  }, [project, results, units, equalAspect, view, heldAxes, compact]);
  const state = usePlotlyDraw(containerRef, figure, newerPending);
  const setDragging = (dragging: boolean) =>
    setHeldAxes(dragging ? axesOnScreen(containerRef.current) : null);
  const dragging = heldAxes !== null;

  return (
    <figure
      className={`sag-plot${dragging ? ' plot-dragging' : ''}`}
      aria-label="Sag plot"
      aria-describedby={captionId}
      data-plot-state={state}
      data-plot-view={view}
    >
      <PlotTools project={project} results={results} />
      <div className="sag-plot-stage">
        <div ref={containerRef} className="sag-plot-canvas" />
        {view === 'side' && (
          <DragHandles
            containerRef={containerRef}
            drawn={state === 'drawn'}
            onDragging={setDragging}
          />
        )}
      </div>
      {compact && <PlotKey data={figure.data} />}
      {state === 'loading' && <p className="muted">Loading the plot…</p>}
      {state === 'failed' && <p role="alert">The plot could not be drawn; the numbers stand.</p>}
      <Caption id={captionId} figure={figure} view={view} units={units} />
    </figure>
  );
}
