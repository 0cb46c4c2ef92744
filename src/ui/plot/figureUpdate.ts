/**
 * A quick redraw of what moved. A typical edit moves only the wires (each case's FE line and its
 * parabola); dragging a fixing also moves its marker and label, and perhaps the filled ground;
 * axes, zones and legend stay. A full Plotly redraw re-derives and redraws all of it (tens of
 * ms); here the paths of the line traces, the outlines of filled ones and the positions of
 * markers are rewritten from the new numbers with the axes on screen (well under a millisecond).
 * Until the full redraw that follows once edits pause, the notes (annotations) and hover labels,
 * which would still show the old numbers, are hidden (class `plot-sketch`). Anything else that
 * changed (a trace added or restyled, the layout, data leaving the axis ranges) needs the full
 * redraw.
 */
import type { Data, Layout } from 'plotly.js';

export interface FigureLike {
  data: Data[];
  layout: Partial<Layout>;
}

/** The numbers of a trace that an edit changes; everything else must stay equal. */
const DATA_KEYS = ['x', 'y', 'customdata'] as const;

/** Taken when a figure arrives, before Plotly draws it (Plotly writes into what it draws). */
export interface FigureSignature {
  /** The layout without its notes and axis ranges (checked against the screen instead). */
  layout: string;
  /** Each trace without its numbers. */
  traces: string[];
  /** How a sketch can redraw each trace, or null when it cannot. */
  kinds: (SketchKind | null)[];
}

/**
 * line: a plain line (its path). fill: a closed filled outline (mode lines, fill toself).
 * markers: markers with or without text labels (no line).
 */
export type SketchKind = 'line' | 'fill' | 'markers';

export interface SketchTrace {
  index: number;
  kind: SketchKind;
}

function withoutData(trace: Data): string {
  const rest: Record<string, unknown> = { ...trace };
  for (const key of DATA_KEYS) delete rest[key];
  return JSON.stringify(rest);
}

function sketchKind(trace: Data): SketchKind | null {
  const t = trace as { type?: string; mode?: string; fill?: string };
  if ((t.type ?? 'scatter') !== 'scatter') return null;
  if (t.mode === 'lines') return !t.fill ? 'line' : t.fill === 'toself' ? 'fill' : null;
  if (t.mode === 'markers' || t.mode === 'text+markers' || t.mode === 'markers+text')
    return t.fill ? null : 'markers';
  return null;
}

/** An axis without its range: holding the range on screen still (a drag) is no change. */
function withoutRange(axis: unknown): unknown {
  if (!axis || typeof axis !== 'object') return axis;
  const { range: _range, autorange: _auto, ...rest } = axis as Record<string, unknown>;
  return rest;
}

export function figureSignature(figure: FigureLike): FigureSignature {
  const { annotations: _notes, xaxis, yaxis, ...rest } = figure.layout;
  return {
    layout: JSON.stringify({ ...rest, xaxis: withoutRange(xaxis), yaxis: withoutRange(yaxis) }),
    traces: figure.data.map(withoutData),
    kinds: figure.data.map(sketchKind),
  };
}

function sameNumbers(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (!Array.isArray(a) || !Array.isArray(b) || a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) {
    if (a[i] === b[i]) continue;
    if (!Array.isArray(a[i]) || !sameNumbers(a[i], b[i])) return false;
  }
  return true;
}

/** Smallest and largest finite value of the x or y numbers of all traces. */
function extent(data: Data[], axis: 'x' | 'y'): [number, number] {
  let low = Number.POSITIVE_INFINITY;
  let high = Number.NEGATIVE_INFINITY;
  for (const trace of data) {
    const values = (trace as Record<string, unknown>)[axis];
    if (!Array.isArray(values)) continue;
    for (const v of values) {
      if (typeof v !== 'number' || !Number.isFinite(v)) continue;
      if (v < low) low = v;
      if (v > high) high = v;
    }
  }
  return [low, high];
}

export interface Sketched {
  figure: FigureLike;
  signature: FigureSignature;
}

/**
 * The traces to redraw for a sketch of `next` over the full drawing of `drawn` (every line,
 * filled outline and set of markers: a few hundred points in all), or null when only a full
 * redraw will do.
 * @param ranges the axis ranges on screen; the new data must stay inside them and fill at least
 *   `fill` of each, so the picture never clips or shrinks away (unless the layout holds the
 *   axes at a fixed range, as during a drag: then the range on screen must be that one).
 */
export function sketchTraces(
  drawn: Sketched,
  next: Sketched,
  ranges: { x?: readonly unknown[]; y?: readonly unknown[] },
  fill = 0.6,
): SketchTrace[] | null {
  const [was, now] = [drawn.signature, next.signature];
  if (was.traces.length !== now.traces.length || was.layout !== now.layout) return null;
  const lines: SketchTrace[] = [];
  for (let i = 0; i < now.traces.length; i++) {
    if (was.traces[i] !== now.traces[i]) return null;
    const kind = now.kinds[i];
    const a = drawn.figure.data[i] as Record<string, unknown>;
    const b = next.figure.data[i] as Record<string, unknown>;
    // Markers keep their count (one DOM node each); a changed count needs the full redraw.
    const count = (t: Record<string, unknown>) => (Array.isArray(t.x) ? t.x.length : -1);
    if (kind === 'line' || kind === 'fill' || (kind === 'markers' && count(a) === count(b)))
      lines.push({ index: i, kind });
    else if (!DATA_KEYS.every((key) => sameNumbers(a[key], b[key]))) return null;
  }
  for (const axis of ['x', 'y'] as const) {
    const range = ranges[axis];
    if (range?.length !== 2 || typeof range[0] !== 'number') return null;
    const [r0, r1] = range as [number, number];
    // Axes held at a fixed range (while a drag is on): what leaves them is clipped, as a full
    // redraw would clip it, so the drawing on screen must simply have that range.
    const held = (next.figure.layout[`${axis}axis`] as { range?: unknown[] } | undefined)?.range;
    if (held) {
      if (held[0] !== r0 || held[1] !== r1) return null;
      continue;
    }
    const [low, high] = extent(next.figure.data, axis);
    const [from, to] = [Math.min(r0, r1), Math.max(r0, r1)];
    if (!(low >= from && high <= to) || high - low < fill * (to - from)) return null;
  }
  return lines;
}

/** An SVG path through the points, with gaps where a value is missing. */
export function linePath(
  xs: readonly unknown[],
  ys: readonly unknown[],
  toPixelX: (x: number) => number,
  toPixelY: (y: number) => number,
): string {
  let path = '';
  let pen = 'M';
  for (let i = 0; i < xs.length; i++) {
    const x = xs[i];
    const y = ys[i];
    if (typeof x !== 'number' || typeof y !== 'number' || !Number.isFinite(x + y)) {
      pen = 'M';
      continue;
    }
    path += `${pen}${toPixelX(x).toFixed(2)},${toPixelY(y).toFixed(2)}`;
    pen = 'L';
  }
  return path;
}
