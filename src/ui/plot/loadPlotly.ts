/**
 * Plotly, fetched on first use: core + scatter only (a partial bundle), registered once.
 * The page and its numbers render before the charting code arrives.
 */
export type Plotly = typeof import('plotly.js/lib/core').default;

let plotlyPromise: Promise<Plotly> | undefined;

export function loadPlotly(): Promise<Plotly> {
  plotlyPromise ??= Promise.all([import('plotly.js/lib/core'), import('plotly.js/lib/scatter')])
    .then(([core, scatter]) => {
      core.default.register([scatter.default]);
      return core.default;
    })
    .catch((error: unknown) => {
      plotlyPromise = undefined; // let a later draw try again
      throw error;
    });
  return plotlyPromise;
}
