/**
 * Plotly, fetched on first use: the plot API, the scatter trace and the few components the sag
 * plot uses (plotlyLean.ts), registered once.
 * The page and its numbers render before the charting code arrives.
 */
export type Plotly = typeof import('plotly.js/lib/core').default;

let plotlyPromise: Promise<Plotly> | undefined;

export function loadPlotly(): Promise<Plotly> {
  plotlyPromise ??= import('./plotlyLean.ts')
    .then((lean) => lean.default)
    .catch((error: unknown) => {
      plotlyPromise = undefined; // let a later draw try again
      throw error;
    });
  return plotlyPromise;
}
