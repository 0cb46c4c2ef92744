/**
 * The sag plot on screen: draws buildSagFigure() with Plotly once Plotly has loaded (lazily),
 * redraws on every new result or unit change, and states the largest parabola difference.
 */
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import type { Project, ProjectResults } from '../core/index.ts';
import { useUiStore } from '../state/uiStore.ts';
import { show } from './format.ts';
import { loadPlotly } from './plot/loadPlotly.ts';
import { buildSagFigure } from './plot/sagFigure.ts';

type PlotState = 'loading' | 'drawn' | 'failed';

export function SagPlot({ project, results }: { project: Project; results: ProjectResults }) {
  const containerRef = useRef<HTMLDivElement>(null);
  const [state, setState] = useState<PlotState>('loading');
  const captionId = useId();
  const units = useUiStore((s) => s.unitSystem);
  const equalAspect = useUiStore((s) => s.equalAspect);
  const setEqualAspect = useUiStore((s) => s.setEqualAspect);
  const figure = useMemo(
    () => buildSagFigure(project, results, units, { equalAspect }),
    [project, results, units, equalAspect],
  );

  useEffect(() => {
    const container = containerRef.current;
    if (!container) return;
    let cancelled = false;
    loadPlotly()
      .then((Plotly) =>
        Plotly.react(container, figure.data, figure.layout, {
          displaylogo: false,
          responsive: true,
          modeBarButtonsToRemove: ['select2d', 'lasso2d'],
        }),
      )
      .then(() => !cancelled && setState('drawn'))
      .catch(() => !cancelled && setState('failed'));
    return () => {
      cancelled = true;
    };
  }, [figure]);

  return (
    <figure
      className="sag-plot"
      aria-label="Sag plot"
      aria-describedby={captionId}
      data-plot-state={state}
    >
      <div className="plot-tools">
        <label>
          <input
            type="checkbox"
            checked={equalAspect}
            onChange={(event) => setEqualAspect(event.target.checked)}
          />
          True proportions (equal scales)
        </label>
      </div>
      <div ref={containerRef} className="sag-plot-canvas" />
      {state === 'loading' && <p className="muted">Loading the plot…</p>}
      {state === 'failed' && <p role="alert">The plot could not be drawn; the numbers stand.</p>}
      <figcaption id={captionId} className="muted">
        Solid: the wire by finite elements for each case. Dashed: the closed-form parabola at the
        same horizontal tension
        {figure.parabola
          ? ` — largest difference ${show(figure.parabola.differenceM, 'length', units, 4)} (${figure.parabola.caseName}).`
          : '.'}{' '}
        Shaded: ground and clearance zones at their required heights.
      </figcaption>
    </figure>
  );
}
