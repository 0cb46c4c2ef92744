/** The tension-window plot as SVG: worst utilisation and worst clearance margin against tension. */
import type { TensionWindow, WindowCurve } from '../../core/index.ts';
import { type UnitSystem, unitSymbol } from '../../core/units.ts';
import { formatCell, formatNumber } from '../../deliverables/displayUnits.ts';
import { type PanelGeometry, PLOT, windowPlotGeometry } from './windowPlot.ts';

interface Props {
  curve: WindowCurve;
  window: TensionWindow;
  currentN: number | null;
  units: UnitSystem;
}

function Panel({ g, title, stroke }: { g: PanelGeometry; title: string; stroke: string }) {
  return (
    <g>
      <text x={PLOT.left} y={g.top + 10} className="window-plot-title">
        {title}
      </text>
      <line
        x1={PLOT.left}
        x2={PLOT.width - PLOT.right}
        y1={g.limitY}
        y2={g.limitY}
        className="window-plot-limit"
      />
      {g.ticks.map((t) => (
        <text
          key={t.label}
          x={PLOT.left - 4}
          y={t.y + 4}
          textAnchor="end"
          className="window-plot-tick"
        >
          {t.label}
        </text>
      ))}
      <path d={g.path} fill="none" stroke={stroke} strokeWidth={2} />
    </g>
  );
}

export function WindowPlot({ curve, window, currentN, units }: Props) {
  if (curve.tension.length < 2) return null;
  const g = windowPlotGeometry(curve, window, currentN, (m) => formatCell(units, 'length', m, 2));
  const bottom = PLOT.height - PLOT.bottom;
  return (
    <svg
      className="window-plot"
      viewBox={`0 0 ${PLOT.width} ${PLOT.height}`}
      role="img"
      aria-label="Worst utilisation and worst clearance margin against installation tension, the window shaded, the current setting marked"
    >
      {g.shade && (
        <rect
          x={g.shade.x0}
          y={PLOT.top}
          width={Math.max(0, g.shade.x1 - g.shade.x0)}
          height={bottom - PLOT.top}
          className="window-plot-shade"
        />
      )}
      <Panel g={g.utilisation} title="Worst utilisation (passes up to 100 %)" stroke="#0072B2" />
      <Panel g={g.margin} title="Worst clearance margin (passes from 0)" stroke="#D55E00" />
      {g.xTicks.map((t) => (
        <text
          key={t.tensionN}
          x={t.x}
          y={bottom + 14}
          textAnchor="middle"
          className="window-plot-tick"
        >
          {formatNumber(units, 'force', t.tensionN)}
        </text>
      ))}
      <text
        x={(PLOT.left + PLOT.width) / 2}
        y={PLOT.height - 2}
        textAnchor="middle"
        className="window-plot-tick"
      >
        Installation horizontal tension ({unitSymbol('force', units)}, log scale)
      </text>
      {g.currentX !== null && (
        <g>
          <line
            x1={g.currentX}
            x2={g.currentX}
            y1={PLOT.top}
            y2={bottom}
            className="window-plot-current"
          />
          <text x={g.currentX + 3} y={PLOT.top + 22} className="window-plot-tick">
            now
          </text>
        </g>
      )}
    </svg>
  );
}
