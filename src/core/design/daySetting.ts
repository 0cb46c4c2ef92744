/**
 * Today's setting: what to set at exactly the temperature of the day t (°C). The design's cut
 * length L₀ is pulled through every span with one H at t, installation loads, still air (as a
 * set-up chart row). Sag is measured from the chord (the straight line between the span's
 * fixings): largest, where, and at mid-span; the lowest point; the pulse return time 2 ∫ ds / c
 * and the plucked frequency 1 / (2 ∫ ds / c) when nothing hangs on the wire while it is set.
 */
import { largestStateTension } from '../caseChecks.ts';
import { fieldChecksHold } from '../fieldChecks.ts';
import { findInstallationTension, targetSpanIndex } from '../installation.ts';
import type { Point2, Project } from '../project.ts';
import { buildProjectModel } from '../projectModel.ts';
import { setUpReturnTime, solveSetUpState } from '../setUpChart.ts';
import { heightAt, minimumAboveLine } from '../spanGeometry.ts';
import { solveInstallation } from '../states.ts';

export interface SagPosition {
  /** Position along the span from the first support, m. */
  x: number;
  /** The fixing the distance is measured from (its label, or "Fixing N"). */
  fixing: string;
  /** Horizontal distance from that fixing, m. */
  distance: number;
}

export interface DaySetting {
  temperature: number;
  solved: boolean;
  /** The span the sag refers to (0-based): the sag target's span, else the longest. */
  span: number;
  horizontalTension: number;
  maxTension: number;
  /** Largest sag below the chord in that span, m, and where. */
  sag: number;
  sagAt: SagPosition;
  /** Sag below the chord at mid-span, m. */
  midSpanSag: number;
  lowestPoint: Point2;
  returnTime: number | null;
  frequency: number | null;
  notes: string[];
}

const m = (x: number) => `${x.toFixed(3)} m`;

function fixingLabel(project: Project, index: number): string {
  return project.supports[index]?.label?.trim() || `Fixing ${index + 1}`;
}

function measuringNotes(project: Project, s: DaySetting, x0: number, x1: number, level: boolean) {
  const a = fixingLabel(project, s.span);
  const b = fixingLabel(project, s.span + 1);
  const mid = 0.5 * (x1 - x0);
  const notes: string[] = [];
  const line = `the straight line between ${a} and ${b} (a taut string line or a sight line)`;
  if (level && Math.abs(s.sagAt.distance - mid) <= 0.01 * (x1 - x0))
    notes.push(
      `Level span: measure the sag at mid-span, ${m(mid)} from ${a}: ${m(s.midSpanSag)} below ${line}.`,
    );
  else
    notes.push(
      `${level ? 'Level' : 'Inclined'} span: measure the sag from ${line}. It is largest, ${m(s.sag)}, ` +
        `at ${m(s.sagAt.distance)} from ${a} (measured level); at mid-span, ${m(mid)} from ${a}, it is ${m(s.midSpanSag)}.`,
    );
  const atEnd = s.lowestPoint.x <= x0 || s.lowestPoint.x >= x1;
  const end = s.lowestPoint.x <= x0 ? a : b;
  notes.push(
    atEnd
      ? `The wire has no low point between the fixings: it is lowest at ${end}, ${m(s.lowestPoint.z)} above the ground datum.`
      : `The lowest point of the wire is ${m(s.lowestPoint.z)} above the ground datum, ${m(s.lowestPoint.x - x0)} from ${a}.`,
  );
  return notes;
}

function fieldCheckNote(project: Project, s: DaySetting): string {
  const a = fixingLabel(project, s.span);
  if (s.returnTime === null || s.frequency === null)
    return (
      'Pulse and pluck checks do not hold here: the hung loads are on the wire while it is set and ' +
      'a pulse reflects off them. Check the sag instead.'
    );
  return (
    `Pulse check: flick the wire near ${a}; the pulse returns to it after ${s.returnTime.toFixed(2)} s. ` +
    `Pluck check: plucked sideways it swings at about ${s.frequency.toFixed(2)} Hz. Both hold for the bare wire only.`
  );
}

/**
 * The setting at exactly `temperature` °C for a validated project, on the mesh of `refinement`
 * (pass results.mesh.refinement to match the set-up chart exactly).
 */
export function settingAt(project: Project, temperature: number, refinement = 1): DaySetting {
  const model = buildProjectModel(project, refinement);
  const target = findInstallationTension(model, project.installation.target);
  const installed = solveInstallation(model, target.tensionN);
  const state = solveSetUpState(model, installed.unstressed, temperature, target.tensionN);
  const index = targetSpanIndex(model, project.installation.target);
  const { span, tensionN } = state.spans[index];
  const chord = (x: number) => span.z0 + span.chordSlope * (x - span.x0);
  const sag = minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, span.z0, span.chordSlope);
  const low = minimumAboveLine(span, tensionN, span.x0, span.x1, span.x0, 0, 0);
  const xm = 0.5 * (span.x0 + span.x1);
  const returnTime = setUpReturnTime(model, state, index, temperature);
  const setting: DaySetting = {
    temperature,
    solved: state.solved && target.ok,
    span: index,
    horizontalTension: tensionN,
    maxTension: largestStateTension(state.spans),
    sag: -sag.value,
    sagAt: { x: sag.x, fixing: fixingLabel(project, index), distance: sag.x - span.x0 },
    midSpanSag: chord(xm) - heightAt(span, tensionN, xm),
    lowestPoint: { x: low.x, z: low.value },
    returnTime,
    frequency: returnTime === null ? null : 1 / returnTime,
    notes: [],
  };
  const loads =
    fieldChecksHold(project) && project.loads.length > 0
      ? 'before the loads are hung'
      : project.loads.length > 0
        ? 'with the hung loads on'
        : 'bare wire';
  setting.notes.push(
    `At ${temperature} °C (${loads}, still air) set a horizontal tension of ${tensionN.toFixed(0)} N ` +
      `(largest tension ${setting.maxTension.toFixed(0)} N), or set the sag below.`,
    ...measuringNotes(project, setting, span.x0, span.x1, Math.abs(span.chordSlope) < 1e-9),
    fieldCheckNote(project, setting),
  );
  if (!setting.solved)
    setting.notes.unshift(
      `The wire could not be solved at ${temperature} °C; these numbers are not reliable.`,
    );
  return setting;
}
