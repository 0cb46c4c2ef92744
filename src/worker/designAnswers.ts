/**
 * The design aids the workbench asks the worker for, from one document: the tension window (with
 * the plot's curve and the current setting's position in words), every wire that works, and the
 * setting at the temperature of the day. The window and chooser are kept for an unchanged
 * document, so a new temperature only costs the setting.
 */
import {
  type AdviceFact,
  chooseWires,
  type DaySetting,
  type Project,
  type ProjectResults,
  settingAt,
  type TensionWindow,
  tensionWindowWithFacts,
  type WindowCurve,
  type WireChoice,
  windowCurve,
  windowPosition,
  windowTensionWords,
} from '../core/index.ts';

export interface DesignQuestion {
  /** Temperature of the day, °C, or null when none is entered. */
  temperatureNow: number | null;
  /** Try every catalogue wire (the costly part; only when asked). */
  choose?: boolean;
}

export interface DesignAnswers {
  window: TensionWindow;
  /** The window's advice as numbers, for wording in the chosen units (adviceWords). */
  adviceFacts: AdviceFact[];
  curve: WindowCurve;
  /** The installation horizontal tension of the current design (N) and where it sits. */
  currentTension: number;
  position: string;
  /** Which span's horizontal tension the window states ("the same in every span", …). */
  tensionWords: string;
  /** Null until the chooser is asked for. */
  choices: WireChoice[] | null;
  setting: DaySetting | null;
  /** Time the window and the chooser took, ms (for the record). */
  windowMs: number;
  chooserMs: number;
}

type Kept = Omit<DesignAnswers, 'setting'>;
let cache: { key: string; answers: Kept } | undefined;

function withChoices(project: Project, results: ProjectResults, answers: Kept): Kept {
  if (answers.choices) return answers;
  const start = performance.now();
  const choices = chooseWires(project, undefined, results.mesh.refinement);
  return { ...answers, choices, chooserMs: performance.now() - start };
}

function windowAndChoices(project: Project, results: ProjectResults, choose: boolean): Kept {
  const key = JSON.stringify(project);
  if (cache?.key === key) {
    if (choose) cache.answers = withChoices(project, results, cache.answers);
    return cache.answers;
  }
  const currentTension = results.cases[0]?.horizontalTension ?? Number.NaN;
  const start = performance.now();
  const refinement = results.mesh.refinement;
  const { window, adviceFacts } = tensionWindowWithFacts(project, refinement);
  const curve = windowCurve(project, window, currentTension, 40, refinement);
  const windowMs = performance.now() - start;
  let answers: Kept = {
    window,
    adviceFacts,
    curve,
    currentTension,
    position: windowPosition(project, window, currentTension),
    tensionWords: windowTensionWords(
      project,
      (results.cases[0]?.spans ?? []).map((s) => s.horizontalTension),
    ),
    choices: null,
    windowMs,
    chooserMs: 0,
  };
  if (choose) answers = withChoices(project, results, answers);
  cache = { key, answers };
  return answers;
}

export function answerDesign(
  project: Project,
  results: ProjectResults,
  question: DesignQuestion,
): DesignAnswers {
  const t = question.temperatureNow;
  const setting =
    t !== null && Number.isFinite(t) ? settingAt(project, t, results.mesh.refinement) : null;
  return { ...windowAndChoices(project, results, question.choose === true), setting };
}
