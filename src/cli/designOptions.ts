/**
 * The command line's design-aid options, each adding to a file's JSON: `--window` (the
 * installation tension window), `--choose` (wires that work, lightest first) and `--at TEMP`
 * (today's setting at TEMP °C).
 */
import {
  chooseWires,
  type Project,
  type ProjectResults,
  settingAt,
  tensionWindow,
} from '../core/index.ts';

export const DESIGN_FLAGS = ['--window', '--choose'];

/** Extra JSON the design-aid options add to a file's results (on the results' mesh). */
export type Addition = (
  project: Project,
  results: ProjectResults,
  output: Record<string, unknown>,
) => void;

/** `--window`: the installation tension window. */
function addWindow(
  project: Project,
  results: ProjectResults,
  output: Record<string, unknown>,
): void {
  output.window = tensionWindow(project, results.mesh.refinement);
}

/** `--choose`: every wire that works, lightest first, with its window and suggested tension. */
function addChoices(
  project: Project,
  results: ProjectResults,
  output: Record<string, unknown>,
): void {
  output.choices = chooseWires(project, undefined, results.mesh.refinement).map((c) => ({
    catalogId: c.catalogId,
    label: c.label,
    massPerLength: c.massPerLength,
    low: c.low,
    high: c.high,
    suggestedHorizontalTension: c.suggestedHorizontalTension,
  }));
}

/** `--at TEMP`: today's setting at TEMP °C; a bad value is refused by name. */
export function settingOption(args: string[]): {
  addition?: Addition;
  error?: string;
  rest: string[];
} {
  const i = args.findIndex((a) => a === '--at' || a.startsWith('--at='));
  if (i < 0) return { rest: args };
  const inline = args[i].startsWith('--at=');
  const text = inline ? args[i].slice(5) : args[i + 1];
  const rest = args.filter((_, k) => k !== i && (inline || k !== i + 1));
  const temperature = Number(text);
  if (text === undefined || text.trim() === '' || !Number.isFinite(temperature))
    return { rest, error: '--at: needs a temperature in °C, e.g. --at 8' };
  if (temperature < -80 || temperature > 80)
    return { rest, error: '--at: the temperature must be between -80 and 80 °C' };
  return {
    rest,
    addition: (project, results, output) => {
      output.setting = settingAt(project, temperature, results.mesh.refinement);
    },
  };
}

/** The additions the flags ask for, in a fixed order. */
export function additionsFor(args: readonly string[], setting?: Addition): Addition[] {
  const additions: Addition[] = [];
  if (args.includes('--window')) additions.push(addWindow);
  if (args.includes('--choose')) additions.push(addChoices);
  if (setting) additions.push(setting);
  return additions;
}
