/**
 * Checks a proposed edit against the project rules before it reaches the document: the edit
 * is applied to a copy, the copy is validated, and only a valid copy is committed. A refusal
 * comes back as a message naming the rule (bounds shown in the field's display units).
 */
import { type Project, type ValidationIssue, validateProject } from '../../core/index.ts';
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { useProjectStore } from '../../state/projectStore.ts';

export type Edit = (project: Project) => Project;

const NUMBER = '(-?\\d+(?:\\.\\d+)?(?:e[-+]?\\d+)?)';
const BOUND = new RegExp(`(at least|at most|greater than|less than) ${NUMBER}`);
/** "the range is 0 to 70 m/s": the core's SI range with its SI unit (or none). */
const RANGE = new RegExp(`the range is ${NUMBER} to ${NUMBER}(?: [^\\s;,)]+)?`);

/**
 * Rewrite an SI bound in a rule ("must be at most 0.2") and the range it states
 * ("the range is 0.0005 to 0.1 m") into display units.
 */
export function localiseRule(message: string, quantity: Quantity, units: UnitSystem): string {
  const symbol = unitSymbol(quantity, units);
  const show = (si: string) => Number(fromSi(Number(si), quantity, units).toPrecision(6));
  const unit = symbol ? ` ${symbol}` : '';
  return message
    .replace(BOUND, (_all, words: string, bound: string) => `${words} ${show(bound)}${unit}`)
    .replace(
      RANGE,
      (_all, low: string, high: string) => `the range is ${show(low)} to ${show(high)}${unit}`,
    );
}

function describeElsewhere(issue: ValidationIssue): string {
  return `this would make ${issue.path} invalid: it ${issue.message}`;
}

/**
 * Try an edit. Returns null when committed, or the reason it was refused: first an issue at
 * the field's own path, else the first issue the edit causes elsewhere.
 */
export function tryEdit(
  path: string,
  edit: Edit,
  quantity: Quantity,
  units: UnitSystem,
): string | null {
  const { project, setProject } = useProjectStore.getState();
  const candidate = edit(project);
  const checked = validateProject(candidate);
  if (checked.ok) {
    setProject(candidate, path);
    return null;
  }
  const own = checked.issues.find((issue) => issue.path === path);
  if (own) return localiseRule(own.message, quantity, units);
  return describeElsewhere(checked.issues[0]);
}
