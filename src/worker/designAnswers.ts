/**
 * The design aids the workbench asks the worker for, from one document: the tension window (with
 * the plot's curve and the current setting's position in words), every wire that works, and the
 * setting at the temperature of the day. The window and chooser are kept for an unchanged
 * document, so a new temperature only costs the setting.
 */
import {
  chooseWires,
  type DaySetting,
  type Project,
  type ProjectResults,
  settingAt,
  type TensionWindow,
  tensionWindow,
  type WindowCurve,
  type WireChoice,
  windowCurve,
  windowPosition,
} from '../core/index.ts';

export interface DesignQuestion {
  /** Temperature of the day, °C, or null when none is entered. */
  temperatureNow: number | null;
}

export interface DesignAnswers {
  window: TensionWindow;
  curve: WindowCurve;
  /** The installation horizontal tension of the current design (N) and where it sits. */
  currentTension: number;
  position: string;
  choices: WireChoice[];
  setting: DaySetting | null;
  /** Time the window and the chooser took, ms (for the record). */
  windowMs: number;
  chooserMs: number;
}

let cache: { key: string; answers: Omit<DesignAnswers, 'setting'> } | undefined;

function windowAndChoices(project: Project, results: ProjectResults) {
  const key = JSON.stringify(project);
  if (cache?.key === key) return cache.answers;
  const currentTension = results.cases[0]?.horizontalTension ?? Number.NaN;
  const start = performance.now();
  const window = tensionWindow(project);
  const curve = windowCurve(project, window, currentTension);
  const windowMs = performance.now() - start;
  const choices = chooseWires(project);
  const answers = {
    window,
    curve,
    currentTension,
    position: windowPosition(project, window, currentTension),
    choices,
    windowMs,
    chooserMs: performance.now() - start - windowMs,
  };
  cache = { key, answers };
  return answers;
}

export function answerDesign(
  project: Project,
  results: ProjectResults,
  question: DesignQuestion,
): DesignAnswers {
  const t = question.temperatureNow;
  const setting = t !== null && Number.isFinite(t) ? settingAt(project, t) : null;
  return { ...windowAndChoices(project, results), setting };
}
