/**
 * Draws a Plotly figure into a container without holding up typing. A figure after a pause is
 * drawn at the next animation frame; figures arriving in a burst (typing) wait until the burst
 * pauses (drawPolicy.ts); a figure that a newer result is about to replace is not drawn at all.
 * The last drawing stays meanwhile. Each draw is recorded as the performance measure
 * "sagwright:plot-draw" (its main-thread time) with the document version drawn, for
 * measurement, never for assertions.
 */

import type { Config, Data, Layout } from 'plotly.js';
import { type RefObject, useEffect, useRef, useState } from 'react';
import { drawDelayMs } from './drawPolicy.ts';
import { loadPlotly, type Plotly } from './loadPlotly.ts';

export type PlotState = 'loading' | 'drawn' | 'failed';

export interface DrawableFigure {
  data: Data[];
  layout: Partial<Layout>;
  /** The document version drawn, recorded with the draw measure. */
  revision?: number;
}

export const PLOT_DRAW_MEASURE = 'sagwright:plot-draw';

const CONFIG: Partial<Config> = {
  displaylogo: false,
  responsive: true,
  modeBarButtonsToRemove: ['select2d', 'lasso2d'],
};

interface Arrival {
  figure: DrawableFigure;
  /** performance.now() before which it is not drawn. */
  holdUntil: number;
}

/**
 * @param deferred true while a newer result is pending: keep the last drawing, draw later.
 */
export function usePlotlyDraw(
  containerRef: RefObject<HTMLDivElement | null>,
  figure: DrawableFigure,
  deferred: boolean,
): PlotState {
  const [state, setState] = useState<PlotState>('loading');
  const drawn = useRef<DrawableFigure | null>(null);
  const arrival = useRef<Arrival | null>(null);
  const previousArrivalAt = useRef<number | null>(null);
  const firstUndrawnAt = useRef<number | null>(null);

  useEffect(() => {
    const container = containerRef.current;
    if (!container || figure === drawn.current) return;
    const now = performance.now();
    if (arrival.current?.figure !== figure) {
      firstUndrawnAt.current ??= now;
      const delay = drawDelayMs(now, previousArrivalAt.current, firstUndrawnAt.current);
      arrival.current = { figure, holdUntil: now + delay };
      previousArrivalAt.current = now;
    }
    if (deferred && drawn.current) return;
    let cancelled = false;
    let frame = 0;
    const draw = (plotly: Plotly) => {
      if (cancelled) return;
      const start = performance.now();
      let done: Promise<unknown>;
      try {
        done = plotly.react(container, figure.data, figure.layout, CONFIG);
      } catch {
        setState('failed');
        return;
      }
      performance.measure(PLOT_DRAW_MEASURE, {
        start,
        end: performance.now(),
        detail: { revision: figure.revision },
      });
      drawn.current = figure;
      firstUndrawnAt.current = null;
      done.then(
        () => setState('drawn'),
        () => setState('failed'),
      );
    };
    const wait = Math.max(0, (arrival.current?.holdUntil ?? now) - now);
    const timer = setTimeout(() => {
      loadPlotly()
        .then((plotly) => {
          if (!cancelled) frame = requestAnimationFrame(() => draw(plotly));
        })
        .catch(() => !cancelled && setState('failed'));
    }, wait);
    return () => {
      cancelled = true;
      clearTimeout(timer);
      cancelAnimationFrame(frame);
    };
  }, [containerRef, figure, deferred]);

  return state;
}
