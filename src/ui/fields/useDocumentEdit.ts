/**
 * Checks a proposed edit against the project rules before it reaches the document: the edit
 * is applied to a copy, the copy is validated, and only a valid copy is committed. A refusal
 * comes back as a message naming the rule (bounds shown in the field's display units).
 */
import { type Project, type ValidationIssue, validateProject } from '../../core/index.ts';
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { useProjectStore } from '../../state/projectStore.ts';

export type Edit = (project: Project) => Project;

const BOUND = /(at least|at most|greater than|less than) (-?\d+(?:\.\d+)?(?:e[-+]?\d+)?)/;

/** Rewrite an SI bound in a rule ("must be at most 0.2") into display units. */
export function localiseRule(message: string, quantity: Quantity, units: UnitSystem): string {
  const symbol = unitSymbol(quantity, units);
  return message.replace(BOUND, (_all, words: string, bound: string) => {
    const shown = Number(fromSi(Number(bound), quantity, units).toPrecision(6));
    return `${words} ${shown}${symbol ? ` ${symbol}` : ''}`;
  });
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
