/**
 * "Set on the day" for page 1 of the report: the tension and sag to set at the installation
 * temperature, which span's sag, where and how to measure it, and the field check. The sag's
 * position is read from the installation case's sampled profile (largest distance below the
 * straight line between the span's fixings), so it is stated as "about".
 */
import type { CaseResult, Project, ProjectResults } from '../core/index.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity as fq,
  type UnitSystem,
} from './displayUnits.ts';
import { fixingName, spanName } from './setUpContent.ts';

/** Where along the span the sag (largest drop below the chord) is, m, from the profile. */
export function sagPosition(
  project: Project,
  install: CaseResult,
  span: number,
): number | undefined {
  const a = project.supports[span];
  const b = project.supports[span + 1];
  const profile = install.profile;
  if (!a || !b || !profile) return undefined;
  let best: number | undefined;
  let bestDrop = -Infinity;
  profile.x.forEach((x, i) => {
    if (x < a.x || x > b.x) return;
    const drop = a.z + ((b.z - a.z) * (x - a.x)) / (b.x - a.x) - profile.z[i];
    if (drop > bestDrop) {
      bestDrop = drop;
      best = x;
    }
  });
  return best;
}

export interface SettingText {
  head: string;
  lines: string[];
}

export function settingText(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
  chartInAppendix: boolean,
): SettingText {
  const install = results.cases[0];
  const at = fq(units, 'temperature', project.installation.temperature);
  if (!install?.solved)
    return {
      head: `Set on the day at ${at}: the installation state could not be solved.`,
      lines: [],
    };
  const spanIndex = results.setUpSpan;
  const sag = install.spans[spanIndex]?.sag ?? install.sag;
  const a = project.supports[spanIndex];
  const b = project.supports[spanIndex + 1];
  const level = Math.abs(b.z - a.z) < 1e-6;
  const x = sagPosition(project, install, spanIndex);
  const nearMid = x !== undefined && Math.abs(x - (a.x + b.x) / 2) <= 0.02 * (b.x - a.x);
  const where =
    x === undefined || nearMid
      ? 'at mid-span'
      : `about ${formatLength(units, x - a.x)} from ${fixingName(project, spanIndex)}`;
  const how = level
    ? `Measure it ${where}, straight down from a line stretched tight between the two fixing points.`
    : `The fixings are at different heights: measure it straight down from the straight line between the fixing points, where it is largest, ${where}; it is not the lowest point.`;
  const low = install.spans[spanIndex]?.lowestPoint ?? install.lowestPoint;
  const row = results.setUpChart.find((r) => r.temperature === project.installation.temperature);
  const pulse = !row?.solved
    ? ''
    : row.returnTime === null
      ? 'Field check: the pulse check does not hold here (the hung loads are on the wire while it is set and the pulse reflects off them); measure the sag.'
      : `Field check: flick the wire near a fixing of that span; the wave returns to it after ${row.returnTime.toFixed(2)} s.`;
  const otherDays = chartInAppendix
    ? 'On a warmer or colder day set the values of that day’s row in the set-up chart (appendix), not these.'
    : 'On a warmer or colder day set the values of that day’s row in the set-up chart (in the workbench, or tick it as an appendix), not these.';
  return {
    head: `Set on the day at ${at}${project.installation.withLoads ? ', hung loads on' : ', before the loads are hung'}: sag ${formatLength(units, sag)} in span ${spanName(project, spanIndex)}, horizontal pull ${formatForceShort(units, install.horizontalTension)} (largest tension ${formatForceShort(units, install.maxTension)}).`,
    lines: [
      `${how} Lowest point: ${formatLength(units, low.z)} above the datum, ${formatLength(units, low.x - project.supports[0].x)} from ${fixingName(project, 0)}.`,
      [pulse, otherDays].filter(Boolean).join(' '),
    ],
  };
}
