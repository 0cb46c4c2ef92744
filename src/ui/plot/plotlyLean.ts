/**
 * Plotly core for the sag plot: the plot API, the scatter trace and only the components the
 * plot uses (notes, shapes, selections, legend, hover, mode bar, colour scales). Plotly's own
 * core (plotly.js/src/core.js) also registers sliders, menus, range sliders and selectors, images,
 * grids, error bars, colour bars and 3-D notes, and pulls in the map style sheet; leaving them out
 * makes the first load lighter. Components not registered are skipped by Plotly's registry.
 */

import 'plotly.js/dist/plotly.css'; // its rules as a file: no injected <style> (index.html)
import annotations from 'plotly.js/src/components/annotations';
import colorscale from 'plotly.js/src/components/colorscale';
import fx from 'plotly.js/src/components/fx';
import legend from 'plotly.js/src/components/legend';
import modebar from 'plotly.js/src/components/modebar';
import selections from 'plotly.js/src/components/selections';
import shapes from 'plotly.js/src/components/shapes';
import localeEn from 'plotly.js/src/locale-en';
import localeEnUs from 'plotly.js/src/locale-en-us';
import plotApi from 'plotly.js/src/plot_api';
import Registry from 'plotly.js/src/registry';
import scatter from 'plotly.js/src/traces/scatter';
import 'plotly.js/build/plotcss';

type PlotlyApi = typeof import('plotly.js/lib/core').default;

const api = plotApi as Record<string, unknown>;
const methods: Record<string, unknown> = {};
for (const name of Object.keys(api)) {
  if (name.charAt(0) !== '_') methods[name] = api[name];
  Registry.register({ moduleType: 'apiMethod', name, fn: api[name] });
}
Registry.register(scatter);
// Order as in Plotly's core: legend after shapes, hover after legend.
Registry.register([annotations, selections, shapes, colorscale, legend, fx, modebar]);
Registry.register([localeEn, localeEnUs]);

const Plotly = methods as unknown as PlotlyApi;
export default Plotly;
