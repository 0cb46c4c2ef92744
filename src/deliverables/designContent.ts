/**
 * The report's "Tension window and today's setting": the window's ends (tension, case, check),
 * where the design sits in it, the advice, and the tension and sag to set at the temperature of
 * the day with where to measure the sag and whether the pulse and pluck checks hold.
 */
import {
  type AdviceFact,
  adviceWords,
  type DaySetting,
  type Project,
  type ProjectResults,
  settingAt,
  type TensionWindow,
  tensionWindowWithFacts,
  type WindowEnd,
  windowPosition,
  windowTensionWords,
} from '../core/index.ts';
import { adviceWordingFor, formatQuantity as fq, type UnitSystem } from './displayUnits.ts';
import { fixingName, spanName, temperatureText } from './setUpContent.ts';

export const DESIGN_HEADING = "Tension window and today's setting";

export interface DesignReport {
  window: TensionWindow;
  /** The window's advice as numbers, worded in the report's units. */
  adviceFacts: AdviceFact[];
  /** Installation horizontal tension of the design, N. */
  currentTension: number;
  setting: DaySetting | null;
}

/** Work out the report's design aids for a project (pure core; fast enough at export time). */
export function designReport(
  project: Project,
  results: ProjectResults,
  temperatureNow: number | null,
): DesignReport {
  const refinement = results.mesh.refinement;
  const { window, adviceFacts } = tensionWindowWithFacts(project, refinement);
  return {
    window,
    adviceFacts,
    currentTension: results.cases[0].horizontalTension,
    setting: temperatureNow === null ? null : settingAt(project, temperatureNow, refinement),
  };
}

/** " (words)", or nothing for empty words. */
export const inParentheses = (words: string) => (words ? ` (${words})` : '');

/** Which span's horizontal tension the window is stated in (the design's installation). */
export function windowSpanWords(project: Project, results: ProjectResults): string {
  return windowTensionWords(
    project,
    (results.cases[0]?.spans ?? []).map((s) => s.horizontalTension),
  );
}

/** ", with Pulley basket at 11.000 m from West post", when a moving load sets the end. */
function movingWords(project: Project, end: WindowEnd, units: UnitSystem): string {
  if (!end.movingLoad) return '';
  const from = project.supports[0];
  return `, with ${end.movingLoad.label} at ${fq(units, 'length', end.movingLoad.at - from.x)} from ${fixingName(project, 0)}`;
}

function endLine(project: Project, end: WindowEnd | null, what: string, units: UnitSystem): string {
  if (!end) return `${what}: none within the range searched.`;
  const check =
    end.check === 'tension'
      ? 'the tension limit'
      : end.check === 'clearance'
        ? 'the clearance over the ground'
        : `the clearance over ${end.check}`;
  return `${what}: ${fq(units, 'force', end.horizontalTension)}, set by ${check} in "${end.case}"${movingWords(project, end, units)}.`;
}

/** The window as report paragraphs. */
export function windowParagraphs(
  project: Project,
  results: ProjectResults,
  d: DesignReport,
  units: UnitSystem,
): string[] {
  const { window } = d;
  const moving = project.loads.some((l) => l.type === 'moving')
    ? ' (every moving load included at its worst position)'
    : '';
  const lines = [
    `Installation horizontal tension${inParentheses(windowSpanWords(project, results))} at ${temperatureText(units, project.installation.temperature)} ` +
      `with the installation loads for which every case passes every check${moving}` +
      (window.empty ? ': none. ' : '. ') +
      `${endLine(project, window.low, 'Lowest', units)} ${endLine(project, window.high, 'Highest', units)}`,
    `This design, ${fq(units, 'force', d.currentTension)}: ${windowPosition(project, window, d.currentTension, adviceWordingFor(units))}`,
  ];
  if (window.empty) lines.push(...adviceWords(project, d.adviceFacts, adviceWordingFor(units)));
  return lines;
}

/** Today's setting as report paragraphs (empty when no temperature of the day was given). */
export function settingParagraphs(project: Project, d: DesignReport, units: UnitSystem): string[] {
  const s = d.setting;
  if (!s) return [];
  const a = fixingName(project, s.span);
  const x0 = project.supports[s.span].x;
  const l = project.supports[s.span + 1].x - x0;
  const len = (m: number) => fq(units, 'length', m);
  const field =
    s.returnTime === null || s.frequency === null
      ? 'Pulse and pluck checks do not hold: the hung loads are on the wire while it is set and a pulse reflects off them; check the sag.'
      : `Pulse check: a pulse flicked near ${a} returns after ${s.returnTime.toFixed(2)} s; plucked sideways the wire swings at about ${s.frequency.toFixed(2)} Hz (bare wire only).`;
  return [
    `At ${temperatureText(units, s.temperature)}: set a horizontal tension of ${fq(units, 'force', s.horizontalTension)} ` +
      `(largest tension ${fq(units, 'force', s.maxTension)}). Sag of ${spanName(project, s.span)} from a string line ` +
      `between the fixings: ${len(s.sag)} largest, at ${len(s.sagAt.distance)} from ${a} (measured level); ` +
      `at mid-span (${len(l / 2)} from ${a}) ${len(s.midSpanSag)}. Lowest point ${len(s.lowestPoint.z)} above the ` +
      `ground datum, ${len(s.lowestPoint.x - x0)} from ${a}.`,
    field,
  ];
}
