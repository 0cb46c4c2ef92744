/**
 * The moving-load band for the side view: for each case and moving load, the range of wire
 * heights at each x while the load travels its path (the scanned positions), filled in the case's
 * colour, lower edge dotted. One legend entry for all bands. Pure figure parts, values in the chosen display units.
 */
import type { Data } from 'plotly.js';
import type { ProjectResults } from '../../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { caseColour } from './colours.ts';

function translucent(hex: string, alpha: number): string {
  const n = Number.parseInt(hex.slice(1), 16);
  return `rgba(${(n >> 16) & 255}, ${(n >> 8) & 255}, ${n & 255}, ${alpha})`;
}

/** One legend entry switches every band on or off. */
const MOVING_GROUP = 'moving-load-bands';

/** Two traces per band: its top edge (no line) and its bottom edge filled up to the top. */
export function movingLoadBands(results: ProjectResults, units: UnitSystem): Data[] {
  const len = (m: number) => fromSi(m, 'length', units);
  const lu = unitSymbol('length', units);
  const data: Data[] = [];
  let first = true;
  results.cases.forEach((result, index) => {
    if (!result.solved) return;
    for (const m of result.movingLoads ?? []) {
      const x = m.band.x.map(len);
      const name = `${m.label} travelling — ${result.name}`;
      data.push({
        type: 'scatter',
        mode: 'lines',
        name: `${name} (top)`,
        legendgroup: MOVING_GROUP,
        showlegend: false,
        x,
        y: m.band.zHigh.map(len),
        line: { width: 0, color: caseColour(index) },
        hoverinfo: 'skip',
      });
      data.push({
        type: 'scatter',
        mode: 'lines',
        name: first ? 'Moving load: wire heights as it travels' : name,
        legendgroup: MOVING_GROUP,
        showlegend: first,
        x,
        y: m.band.zLow.map(len),
        fill: 'tonexty',
        fillcolor: translucent(caseColour(index), 0.1),
        line: { width: 1, color: caseColour(index), dash: 'dot' },
        hovertemplate: `lowest with the load anywhere: %{y:.3f} ${lu}<extra>${name}</extra>`,
      });
      first = false;
    }
  });
  return data;
}
