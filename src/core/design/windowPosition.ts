/**
 * Where an installation tension H (N) sits in the tension window, in words: the percentage above
 * the low end, (H − H_low)/H_low, and below the high end, (H_high − H)/H_high; and the curve of
 * worst utilisation and worst clearance margin against H for a plot (sampled evenly in ln H —
 * a picture of the window, not how its ends are found).
 */

import { ADVICE_SI, type Wording } from '../checkMessages.ts';
import type { Project } from '../project.ts';
import { buildProjectModel } from '../projectModel.ts';
import { largestInstallationTension } from '../states.ts';
import type { TensionWindow } from './tensionWindow.ts';
import { checkWords } from './windowAdvice.ts';
import { createWindowResponse } from './windowResponse.ts';

const percent = (x: number) => `${Math.abs(100 * x).toFixed(0)} %`;

export function windowPosition(
  project: Project,
  window: TensionWindow,
  tensionN: number,
  w: Wording = ADVICE_SI,
): string {
  const { low, high } = window;
  if (window.empty) return 'No installation tension passes every case (see the advice).';
  const lowWords = low ? `the lowest tension that clears ${checkWords(project, low.check, w)}` : '';
  const highWords = high ? `the highest the tension limit allows ("${high.case}")` : '';
  if (low && tensionN < low.horizontalTension)
    return `${percent(1 - tensionN / low.horizontalTension)} below ${lowWords}: too slack, "${low.case}" fails.`;
  if (high && tensionN > high.horizontalTension)
    return `${percent(tensionN / high.horizontalTension - 1)} above ${highWords}: too tight, "${high.case}" fails.`;
  const parts: string[] = [];
  if (low)
    parts.push(
      `${percent(tensionN / low.horizontalTension - 1)} above ${lowWords} ("${low.case}")`,
    );
  if (high) parts.push(`${percent(1 - tensionN / high.horizontalTension)} below ${highWords}`);
  return `${parts.join(' and ')}.`;
}

export interface WindowCurve {
  /** Installation horizontal tension, N: the largest span's (what the window's ends, a
   * horizontalTension target and every case's horizontalTension mean; over a pulley the spans'
   * horizontal tensions differ). */
  tension: number[];
  /** Worst utilisation over the cases (passes ≤ 1). */
  utilisation: number[];
  /** Worst clearance margin over the cases and clearance checks, m (passes ≥ 0). */
  clearanceMargin: number[];
}

/** The plot's samples: `count` tensions from half the low end to 1.5 × the high end. */
export function windowCurve(
  project: Project,
  window: TensionWindow,
  currentN: number,
  count = 40,
  refinement = 1,
): WindowCurve {
  const model = buildProjectModel(project, refinement);
  const response = createWindowResponse(model);
  const ends = [window.low?.horizontalTension, window.high?.horizontalTension, currentN].filter(
    (x): x is number => x !== undefined && Number.isFinite(x) && x > 0,
  );
  const from = Math.log(Math.min(...ends) / 2);
  const to = Math.log(Math.max(...ends) * 1.5);
  const curve: WindowCurve = { tension: [], utilisation: [], clearanceMargin: [] };
  // Moving loads: their full envelope at every 8th sample (about 50 solves each), parked at the
  // worst positions found so far in between (a picture of the window, not its ends).
  const everyCase = new Set(project.cases.map((_, i) => i));
  const hasMoving = project.loads.some((l) => l.type === 'moving');
  for (let i = 0; i < count; i++) {
    // The installation is solved from the first span's H₁; over a pulley the largest span's H
    // differs from it, so each sample is placed at the largest, like the ends and the marker.
    const H1 = Math.exp(from + ((to - from) * i) / (count - 1));
    const r = response(H1, hasMoving && i % 8 !== 0 && i !== count - 1 ? everyCase : undefined);
    if (!r.solved) continue;
    curve.tension.push(largestInstallationTension(model, H1));
    curve.utilisation.push(r.utilisation);
    curve.clearanceMargin.push(r.clearanceMargin);
  }
  return curve;
}
