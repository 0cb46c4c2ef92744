/**
 * The words and table of the set-up chart ("Setting the wire on the day"), shared by the
 * workbench and the PDF report: which span's sag it lists, the one-line explanation, the pulse
 * check, and the report's table. Values are SI in the results, shown in the chosen units.
 */
import type { Project, ProjectResults, SetUpRow } from '../core/index.ts';
import { formatTemperature, formatQuantity as fq, type UnitSystem } from './displayUnits.ts';
import type { Table } from './reportContent.ts';

export const SET_UP_HEADING = 'Setting the wire on the day';

/** A fixing's name as the person gave it, else its number from 1. */
export function fixingName(project: Project, index: number): string {
  return project.supports[index]?.label?.trim() || `Fixing ${index + 1}`;
}

/** The span by its two fixings, e.g. "Kitchen wall bracket – Studio wall bracket". */
export function spanName(project: Project, spanIndex: number): string {
  return `${fixingName(project, spanIndex)} – ${fixingName(project, spanIndex + 1)}`;
}

/** Whole degrees unless the temperature has a fraction in the units shown (59.9°F). */
export function temperatureText(units: UnitSystem, celsius: number): string {
  return formatTemperature(units, celsius);
}

export function isInstallationRow(project: Project, row: SetUpRow): boolean {
  return row.temperature === project.installation.temperature;
}

/** Why the chart exists and how to use it, given the cut length and temperature as shown. */
export function setUpExplanation(cutLength: string, installationTemperature: string): string {
  return (
    `The design fixes the wire's cut length: ${cutLength} unstressed at ` +
    `${installationTemperature}. On a warmer or colder day, tension the wire to the sag or ` +
    "tension on that day's row, not to the design day's values; it then behaves as designed in " +
    'every case. Rows are for the loads hung when tensioning, in still air.'
  );
}

/** Which span's sag the chart lists, as a sentence for the report. */
export function sagSpanNote(span: string): string {
  return `The sag listed is that of the span ${span}.`;
}

/** The field check by pulse return time, for the span the chart lists. */
export function pulseCheck(span: string, holds = true): string {
  if (!holds)
    return (
      'Pulse check: not valid for this set-up, because hung loads are on the wire while it is ' +
      'tensioned and the pulse reflects off them. Measure the sag instead.'
    );
  return (
    `Pulse check: flick the wire near a fixing of ${span} and time the wave's first return to ` +
    "that fixing; it takes the time in the last column (the wave's travel along the bare wire " +
    'and back, from the tension along it).'
  );
}

/** A row's pulse return time in seconds, or a dash when the check does not hold. */
export function returnTimeText(row: SetUpRow): string {
  return row.returnTime === null ? '—' : row.returnTime.toFixed(2);
}

/** The set-up chart as a report table: temperature, H, largest tension, sag, pulse return. */
export function setUpTable(project: Project, results: ProjectResults, units: UnitSystem): Table {
  return {
    head: ['Temperature', 'Horizontal tension', 'Largest tension', 'Sag', 'Pulse return'],
    rows: results.setUpChart.map((row) => {
      const temperature = temperatureText(units, row.temperature);
      const first = isInstallationRow(project, row) ? `${temperature} (installation)` : temperature;
      if (!row.solved) return [first, 'not solved', '-', '-', '-'];
      return [
        first,
        fq(units, 'force', row.horizontalTension),
        fq(units, 'force', row.maxTension),
        fq(units, 'length', row.sag),
        row.returnTime === null ? 'not valid' : `${row.returnTime.toFixed(2)} s`,
      ];
    }),
  };
}
