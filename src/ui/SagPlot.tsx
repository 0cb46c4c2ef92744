/**
 * The sag plot on screen: draws buildSagFigure() with Plotly once Plotly has loaded (lazily),
 * in side view (height) or plan view (sideways swing in wind), and states the largest parabola
 * difference. Redraws wait for the next frame and skip results that a newer one replaces.
 */
import { useId, useMemo, useRef } from 'react';
import type { Project, ProjectResults } from '../core/index.ts';
import type { UnitSystem } from '../core/units.ts';
import { useResultsStore } from '../state/resultsStore.ts';
import { documentRevision } from '../state/revision.ts';
import { useUiStore } from '../state/uiStore.ts';
import { show } from './format.ts';
import { usePlotViewStore } from './plot/plotViewStore.ts';
import { buildSagFigure, type PlotView, type SagFigure } from './plot/sagFigure.ts';
import { usePlotlyDraw } from './plot/usePlotlyDraw.ts';
import './plot/plot.css';

function PlotTools() {
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
        ? ` — largest difference ${show(figure.parabola.differenceM, 'length', units, 4)} (${figure.parabola.caseName}).`
        : '.'}{' '}
      Shaded: ground and clearance zones at their required heights. Sag is measured straight down
      from the straight line between the fixings (drawn dash-dotted where they are at different
      heights), at the point where that drop is largest; on an inclined span that is not the lowest
      point.
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

export function SagPlot({ project, results }: { project: Project; results: ProjectResults }) {
  const containerRef = useRef<HTMLDivElement>(null);
  const captionId = useId();
  const units = useUiStore((s) => s.unitSystem);
  const equalAspect = useUiStore((s) => s.equalAspect);
  const view = usePlotViewStore((s) => s.view);
  // A newer result is on its way: drawing this one would be wasted main-thread time.
  const newerPending = useResultsStore((s) => s.stale && s.error === null);
  const figure = useMemo(
    () => ({
      ...buildSagFigure(project, results, units, { equalAspect, view }),
      revision: documentRevision(project),
    }),
    [project, results, units, equalAspect, view],
  );
  const state = usePlotlyDraw(containerRef, figure, newerPending);

  return (
    <figure
      className="sag-plot"
      aria-label="Sag plot"
      aria-describedby={captionId}
      data-plot-state={state}
      data-plot-view={view}
    >
      <PlotTools />
      <div ref={containerRef} className="sag-plot-canvas" />
      {state === 'loading' && <p className="muted">Loading the plot…</p>}
      {state === 'failed' && <p role="alert">The plot could not be drawn; the numbers stand.</p>}
      <Caption id={captionId} figure={figure} view={view} units={units} />
    </figure>
  );
}
