/**
 * Checks a proposed edit from a field before it reaches the document, through the one commit
 * function (src/state/commit.ts): only a valid document is committed. A refusal comes back as a
 * message naming the rule (bounds shown in the field's display units).
 */
import type { Project, ValidationIssue } from '../../core/index.ts';
import { type Quantity, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { fieldText, formatLength } from '../../deliverables/displayUnits.ts';
import { commit, type Edit } from '../../state/commit.ts';
import { fieldName, localiseRule, quantityOfPath, valueAt } from '../../state/fieldNames.ts';
import { useProjectStore } from '../../state/projectStore.ts';

export type { Edit };
export { localiseRule };

function lengthText(metres: number, units: UnitSystem): string {
  return units === 'si'
    ? `${fieldText(units, 'length', metres)} ${unitSymbol('length', units)}`
    : formatLength(units, metres);
}

/**
 * The refusal when an edit breaks another field, in the workbench's words: a fixing moved
 * inside a load or zone "must be beyond the end of Festoon cable at 21.5 m"; otherwise the other
 * field is named and its rule given in display units.
 */
export function describeElsewhere(
  project: Project,
  ownPath: string,
  issue: ValidationIssue,
  units: UnitSystem,
): string {
  if (!issue.path) return `not changed: ${issue.message}`;
  const other = fieldName(project, issue.path);
  const quantity = quantityOfPath(issue.path);
  const value = valueAt(project, issue.path);
  const bound = /^must be (at most|at least) [-\d.e+]+$/.exec(issue.message);
  if (/^supports\[\d+\]\.x$/.test(ownPath) && bound && quantity === 'length' && value !== undefined)
    return `must be ${bound[1] === 'at most' ? 'beyond' : 'before'} ${other} at ${lengthText(value, units)}`;
  return `would leave ${other} invalid: it ${localiseRule(issue.message, quantity, units)}`;
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
  const before = useProjectStore.getState().project;
  const outcome = commit(edit, { mergeKey: path });
  if (outcome.ok) return null;
  const own = outcome.issues.find((issue) => issue.path === path);
  if (own) return localiseRule(own.message, quantity, units);
  return describeElsewhere(before, path, outcome.issues[0], units);
}
