/**
 * Checks a proposed edit from a field before it reaches the document, through the one commit
 * function (src/state/commit.ts): only a valid document is committed. A refusal comes back as a
 * message naming the rule (bounds shown in the field's display units).
 */
import type { ValidationIssue } from '../../core/index.ts';
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { commit, type Edit } from '../../state/commit.ts';

export type { Edit };

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
