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

// Plotly's source modules, imported one by one for a lean core (src/ui/plot/plotlyLean.ts).
declare module 'plotly.js/src/*' {
  // biome-ignore lint/suspicious/noExplicitAny: untyped CommonJS modules of Plotly's source
  const module: any;
  export default module;
}

declare module 'plotly.js/build/plotcss';
