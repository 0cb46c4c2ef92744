/**
 * Draws a Plotly figure into a container without holding up typing or dragging.
 * - When only lines, filled outlines and markers moved (an edit, a drag of a fixing; see
 *   figureUpdate.ts), they are sketched at the next animation frame, every time (well under a
 *   millisecond), with the notes and hover labels hidden; the full redraw follows once results
 *   pause for BURST_GAP_MS, so a drag never waits for a full Plotly redraw.
 * - Any other change needs a full Plotly.react (tens of ms): a figure after a pause is drawn at
 *   the next frame; figures arriving in a burst wait until the burst pauses (drawPolicy.ts); a
 *   figure that a newer result is about to replace is not fully redrawn at all.
 * The last drawing stays meanwhile. Each draw, sketch or full, is recorded as the performance
 * measure "sagwright:plot-draw" (its main-thread time) with the document version drawn and the
 * kind of draw (sketch or full), for measurement, never for assertions.
 */

import type { Config, Data, Layout } from 'plotly.js';
import { type RefObject, useEffect, useRef, useState } from 'react';
import { markFirstDraw } from '../../state/firstDraw.ts';
import { BURST_GAP_MS, drawDelayMs } from './drawPolicy.ts';
import {
  type FigureSignature,
  figureSignature,
  linePath,
  type SketchTrace,
  sketchTraces,
} from './figureUpdate.ts';
import { loadPlotly, type Plotly } from './loadPlotly.ts';

export type PlotState = 'loading' | 'drawn' | 'failed';

export interface DrawableFigure {
  data: Data[];
  layout: Partial<Layout>;
  /** The document version drawn, recorded with the draw measure. */
  revision?: number;
}

export const PLOT_DRAW_MEASURE = 'sagwright:plot-draw';
/** On the plot container while the wires are sketched ahead of the full redraw. */
export const SKETCH_CLASS = 'plot-sketch';

/**
 * The mode bar keeps zoom, pan and reset only. Plotly's own image button is replaced by the
 * plot's download buttons (title and caution in the image, plotDownload.ts), and nothing offers
 * to send the chart to an online service: the work stays on this device.
 */
export const PLOT_CONFIG: Partial<Config> = {
  displaylogo: false,
  responsive: true,
  // Text is the person's own: never typeset as TeX (a label between $ signs stays text).
  typesetMath: false,
  showSendToCloud: false,
  plotlyServerURL: '',
  modeBarButtonsToRemove: ['select2d', 'lasso2d', 'toImage', 'sendChartToCloud'],
};

interface Sketch {
  figure: DrawableFigure;
  signature: FigureSignature;
}

interface Arrival extends Sketch {
  /** performance.now() before which it is not fully drawn. */
  holdUntil: number;
  /** The traces to sketch at once, or null when it must wait for a full redraw. */
  lines: SketchTrace[] | null;
}

interface PlotAxis {
  range?: unknown[];
  l2p?: (value: number) => number;
}
type PlotDiv = HTMLDivElement & { _fullLayout?: { xaxis?: PlotAxis; yaxis?: PlotAxis } };

/**
 * Lets the printed page scale the drawing to the paper. Plotly draws at the size on screen and a
 * browser's print does not redraw it, so without this a plot wider than the printed column is cut
 * off at its right and bottom. Each of Plotly's stacked SVG layers gets a viewBox equal to its
 * drawn size (no change on screen), and the container its aspect ratio; the print style sheet
 * (export.css) then sizes them to the column's width. Run after every Plotly drawing.
 */
export function fitForPrint(container: HTMLElement): void {
  let width = 0;
  let height = 0;
  for (const svg of container.querySelectorAll('svg.main-svg')) {
    const w = Number(svg.getAttribute('width'));
    const h = Number(svg.getAttribute('height'));
    if (!(w > 0 && h > 0)) continue;
    svg.setAttribute('viewBox', `0 0 ${w} ${h}`);
    [width, height] = [w, h];
  }
  if (width > 0) container.style.setProperty('--plot-aspect', `${width} / ${height}`);
}

function axes(container: PlotDiv) {
  return { x: container._fullLayout?.xaxis, y: container._fullLayout?.yaxis };
}

/** Moves each marker (and its text label, if any) of a trace to its new point. */
function moveMarkers(group: Element, xs: unknown[], ys: unknown[], toX: Axis, toY: Axis): boolean {
  const points = group.querySelectorAll('g.points path.point');
  const texts = group.querySelectorAll('g.text g.textpoint text');
  if (points.length !== xs.length || (texts.length > 0 && texts.length !== xs.length)) return false;
  points.forEach((point, i) => {
    const [x, y] = [xs[i], ys[i]];
    if (typeof x !== 'number' || typeof y !== 'number') return;
    const [px, py] = [toX(x).toFixed(2), toY(y).toFixed(2)];
    point.setAttribute('transform', `translate(${px},${py})`);
    texts[i]?.setAttribute('x', px);
    texts[i]?.setAttribute('y', py);
  });
  return true;
}

type Axis = (value: number) => number;

/** Redraws the given traces from the figure's numbers; false when the drawing is not as expected. */
function sketch(container: PlotDiv, figure: DrawableFigure, traces: SketchTrace[]): boolean {
  const { x, y } = axes(container);
  const groups = container.querySelectorAll('.scatterlayer .trace');
  if (!x?.l2p || !y?.l2p || groups.length !== figure.data.length) return false;
  const [toX, toY] = [x.l2p.bind(x), y.l2p.bind(y)];
  for (const { index, kind } of traces) {
    const trace = figure.data[index] as { x?: unknown[]; y?: unknown[] };
    const [xs, ys] = [trace.x ?? [], trace.y ?? []];
    const group = groups[index];
    if (kind === 'markers') {
      if (!moveMarkers(group, xs, ys, toX, toY)) return false;
      continue;
    }
    const line = group.querySelector('path.js-line');
    const fill = kind === 'fill' ? group.querySelector('path.js-fill') : null;
    if (!line || (kind === 'fill' && !fill)) return false;
    const path = linePath(xs, ys, toX, toY);
    line.setAttribute('d', path);
    fill?.setAttribute('d', `${path}Z`);
  }
  container.classList.add(SKETCH_CLASS);
  return true;
}

function measure(start: number, figure: DrawableFigure, kind: 'sketch' | 'full') {
  const detail = { revision: figure.revision, kind };
  performance.measure(PLOT_DRAW_MEASURE, { start, end: performance.now(), detail });
}

/**
 * @param deferred true while a newer result is pending: keep the last full drawing (a sketch
 *   is still drawn).
 */
export function usePlotlyDraw(
  containerRef: RefObject<HTMLDivElement | null>,
  figure: DrawableFigure,
  deferred: boolean,
): PlotState {
  const [state, setState] = useState<PlotState>('loading');
  const full = useRef<Sketch | null>(null);
  const sketched = useRef<DrawableFigure | null>(null);
  const arrival = useRef<Arrival | null>(null);
  const previousArrivalAt = useRef<number | null>(null);
  const firstUndrawnAt = useRef<number | null>(null);
  const sketchFrame = useRef<{ figure: DrawableFigure; id: number } | null>(null);

  useEffect(
    () => () => {
      if (sketchFrame.current) cancelAnimationFrame(sketchFrame.current.id);
    },
    [],
  );

  useEffect(() => {
    const container = containerRef.current as PlotDiv | null;
    if (!container || figure === full.current?.figure) return;
    const now = performance.now();
    if (arrival.current?.figure !== figure) {
      const next = { figure, signature: figureSignature(figure) };
      const { x, y } = axes(container);
      const lines = full.current && sketchTraces(full.current, next, { x: x?.range, y: y?.range });
      firstUndrawnAt.current ??= now;
      const delay = lines
        ? BURST_GAP_MS
        : drawDelayMs(now, previousArrivalAt.current, firstUndrawnAt.current);
      arrival.current = { ...next, holdUntil: now + delay, lines };
      previousArrivalAt.current = now;
    }
    const next = arrival.current;
    let cancelled = false;
    let frame = 0;
    // The sketch frame outlives this effect: a change of `deferred` (a newer result on its way,
    // as at every step of a drag) must not cancel the sketch of the figure on hand; only a
    // newer figure replaces it.
    if (next.lines && sketched.current !== figure && sketchFrame.current?.figure !== figure) {
      const lines = next.lines;
      if (sketchFrame.current) cancelAnimationFrame(sketchFrame.current.id);
      const id = requestAnimationFrame(() => {
        sketchFrame.current = null;
        if (full.current?.figure === figure) return;
        const start = performance.now();
        if (sketch(container, figure, lines)) {
          sketched.current = figure;
          measure(start, figure, 'sketch');
        }
      });
      sketchFrame.current = { figure, id };
    }
    const drawFully = (plotly: Plotly) => {
      if (cancelled) return;
      const start = performance.now();
      let done: Promise<unknown>;
      try {
        done = plotly.react(container, figure.data, figure.layout, PLOT_CONFIG);
      } catch {
        setState('failed');
        markFirstDraw();
        return;
      }
      container.classList.remove(SKETCH_CLASS);
      measure(start, figure, 'full');
      full.current = next;
      firstUndrawnAt.current = null;
      const events = container as PlotDiv & {
        on?: (event: string, handler: () => void) => void;
        dataset: DOMStringMap;
      };
      if (events.on && events.dataset.printFit === undefined) {
        // Every later drawing (a resize included) keeps the print scaling in step.
        events.on('plotly_afterplot', () => fitForPrint(container));
        events.dataset.printFit = 'on';
      }
      done.then(
        () => {
          fitForPrint(container);
          setState('drawn');
          markFirstDraw();
        },
        () => {
          setState('failed');
          markFirstDraw();
        },
      );
    };
    if (deferred && full.current) return;
    const timer = setTimeout(
      () => {
        loadPlotly()
          .then((plotly) => {
            if (!cancelled) frame = requestAnimationFrame(() => drawFully(plotly));
          })
          .catch(() => {
            markFirstDraw();
            if (!cancelled) setState('failed');
          });
      },
      Math.max(0, next.holdUntil - now),
    );
    return () => {
      cancelled = true;
      clearTimeout(timer);
      cancelAnimationFrame(frame);
    };
  }, [containerRef, figure, deferred]);

  return state;
}
