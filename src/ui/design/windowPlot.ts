/**
 * The tension-window plot's geometry, pure (no DOM): worst utilisation (top) and worst clearance
 * margin (bottom) against installation tension on a log axis, the window shaded, the pass lines
 * (utilisation 1, margin 0) and the current setting marked. Coordinates are SVG user units.
 */
import type { TensionWindow, WindowCurve } from '../../core/index.ts';

export const PLOT = { width: 520, height: 250, left: 56, right: 12, top: 10, gap: 26, bottom: 34 };

export interface PanelGeometry {
  top: number;
  height: number;
  path: string;
  /** y of the pass line (utilisation 1 or margin 0). */
  limitY: number;
  ticks: { y: number; label: string }[];
}

export interface WindowPlotGeometry {
  x: (tensionN: number) => number;
  xTicks: { x: number; tensionN: number }[];
  shade: { x0: number; x1: number } | null;
  currentX: number | null;
  utilisation: PanelGeometry;
  margin: PanelGeometry;
}

function panel(
  values: number[],
  xs: number[],
  top: number,
  height: number,
  limit: number,
  format: (v: number) => string,
): PanelGeometry {
  const finite = values.filter(Number.isFinite);
  let lo = Math.min(limit, ...finite);
  let hi = Math.max(limit, ...finite);
  if (!(hi > lo)) hi = lo + 1;
  const pad = 0.05 * (hi - lo);
  lo -= pad;
  hi += pad;
  const y = (v: number) => top + height - ((v - lo) / (hi - lo)) * height;
  const path = values
    .map((v, i) => `${i === 0 ? 'M' : 'L'}${xs[i].toFixed(1)},${y(v).toFixed(1)}`)
    .join(' ');
  const ticks = [lo + pad, limit, hi - pad]
    .filter((v, i, all) => all.indexOf(v) === i)
    .map((v) => ({ y: y(v), label: format(v) }));
  return { top, height, path, limitY: y(limit), ticks };
}

export function windowPlotGeometry(
  curve: WindowCurve,
  window: TensionWindow,
  currentN: number | null,
  marginLabel: (m: number) => string,
): WindowPlotGeometry {
  const { width, height, left, right, top, gap, bottom } = PLOT;
  const lnMin = Math.log(curve.tension[0]);
  const lnMax = Math.log(curve.tension[curve.tension.length - 1]);
  const x = (t: number) =>
    left + ((Math.log(t) - lnMin) / (lnMax - lnMin || 1)) * (width - left - right);
  const xs = curve.tension.map(x);
  const panelHeight = (height - top - gap - bottom) / 2;
  const clampX = (v: number) => Math.min(width - right, Math.max(left, v));
  const shade =
    !window.empty && window.high
      ? {
          x0: clampX(window.low ? x(window.low.horizontalTension) : left),
          x1: clampX(x(window.high.horizontalTension)),
        }
      : null;
  const ticks: { x: number; tensionN: number }[] = [];
  for (let decade = Math.floor(lnMin / Math.LN10); decade <= lnMax / Math.LN10; decade++)
    for (const m of [1, 2, 5]) {
      const t = m * 10 ** decade;
      if (Math.log(t) >= lnMin && Math.log(t) <= lnMax) ticks.push({ x: x(t), tensionN: t });
    }
  return {
    x,
    xTicks: ticks,
    shade,
    currentX: currentN !== null && Number.isFinite(currentN) ? clampX(x(currentN)) : null,
    utilisation: panel(
      curve.utilisation,
      xs,
      top,
      panelHeight,
      1,
      (v) => `${(100 * v).toFixed(0)} %`,
    ),
    margin: panel(curve.clearanceMargin, xs, top + panelHeight + gap, panelHeight, 0, marginLabel),
  };
}
