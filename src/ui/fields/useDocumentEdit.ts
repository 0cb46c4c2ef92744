/**
 * Checks a proposed edit from a field before it reaches the document, through the one commit
 * function (src/state/commit.ts): only a valid document is committed. A refusal comes back as a
 * message naming the rule (bounds shown in the field's display units).
 */
import type { ValidationIssue } from '../../core/index.ts';
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { commit, type Edit } from '../../state/commit.ts';

export type { Edit };

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
  return issue.path
    ? `this would make ${issue.path} invalid: it ${issue.message}`
    : `not changed: ${issue.message}`;
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
  const outcome = commit(edit, { mergeKey: path });
  if (outcome.ok) return null;
  const own = outcome.issues.find((issue) => issue.path === path);
  if (own) return localiseRule(own.message, quantity, units);
  return describeElsewhere(outcome.issues[0]);
}
