/**
 * The side view for a narrow plot (a phone): the same figure made to fit about 340 px. The
 * legend, a dozen rows there, gives way to the key under the plot (PlotKey.tsx); the fixings'
 * names, which run into each other, are left to that key and to the drag handles; axis titles
 * are shortened; the notes drop the case name (the summary line names it), use a smaller type
 * and point inwards, so none runs past the plot's right edge.
 */
import type { Annotation, Data, Layout } from 'plotly.js';

/** Below this plot width (px) the compact figure is drawn. */
export const COMPACT_WIDTH_PX = 560;

export interface FigureParts {
  data: Data[];
  layout: Partial<Layout>;
}

function shortTitle(axis: unknown, text: string): unknown {
  return axis && typeof axis === 'object' ? { ...axis, title: { text } } : axis;
}

/** "Largest sag 0.504 m (Hot summer)" → "Largest sag 0.504 m". */
function withoutCase(text: string | undefined): string | undefined {
  return text?.replace(/\s*\([^()]*\)\s*$/, '');
}

function numbers(data: Data[], axis: 'x' | 'y'): number[] {
  return data.flatMap((trace) => {
    const values = (trace as Record<string, unknown>)[axis];
    return Array.isArray(values) ? values.filter((v): v is number => typeof v === 'number') : [];
  });
}

/** Shortened axis titles for each view. */
export function compactTitles(view: 'side' | 'plan', lengthSymbol: string) {
  return {
    x: `Along the span (${lengthSymbol})`,
    y: view === 'side' ? `Height (${lengthSymbol})` : `Swing (${lengthSymbol})`,
  };
}

export function compactFigure<F extends FigureParts>(
  figure: F,
  titles: { x: string; y: string },
): F {
  const xs = numbers(figure.data, 'x');
  const [low, high] = [Math.min(...xs), Math.max(...xs)];
  const middle = (low + high) / 2;
  const annotations = (figure.layout.annotations ?? []).map((note): Partial<Annotation> => {
    const x = typeof note.x === 'number' ? note.x : middle;
    // Point inwards: a note right of the middle hangs to the left of its point.
    const right = x > middle;
    const ax = typeof note.ax === 'number' ? Math.abs(note.ax) : 0;
    return {
      ...note,
      text: withoutCase(note.text),
      font: { ...note.font, size: 10 },
      ax: note.ax === 0 ? 0 : right ? -ax : ax,
      xanchor: note.xanchor === 'center' ? 'center' : right ? 'right' : 'left',
    };
  });
  const data = figure.data.map((trace) => {
    const t = trace as { mode?: string; name?: string };
    return t.mode === 'text+markers' || t.mode === 'markers+text'
      ? ({ ...trace, mode: 'markers' } as Data)
      : trace;
  });
  const layout: Partial<Layout> = {
    ...figure.layout,
    showlegend: false,
    margin: { l: 44, r: 8, t: 12, b: 36 },
    font: { ...figure.layout.font, size: 11 },
    xaxis: shortTitle(figure.layout.xaxis, titles.x) as Layout['xaxis'],
    yaxis: shortTitle(figure.layout.yaxis, titles.y) as Layout['yaxis'],
    annotations,
  };
  return { ...figure, data, layout };
}
