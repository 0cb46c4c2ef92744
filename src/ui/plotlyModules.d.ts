// Types for the partial Plotly bundles (core + scatter only); the package types only its main entry.
declare module 'plotly.js/lib/core' {
  import Plotly from 'plotly.js';
  export default Plotly;
}

declare module 'plotly.js/lib/scatter' {
  import type { PlotlyModule } from 'plotly.js';

  const scatter: PlotlyModule;
  export default scatter;
}
