/**
 * Identities of the solved states in the results: "installation" for the installation state,
 * "cases[i]" for the project's i-th weather case (0-based, the document's own index). A case's
 * name is only its label: it may repeat another's or the installation's and still be told apart.
 */

export const INSTALLATION_ID = 'installation';

export function caseResultId(caseIndex: number): string {
  return `cases[${caseIndex}]`;
}

/** The weather case index an id names, or null for the installation (or an id not of this form). */
export function caseIndexOfId(id: string): number | null {
  const match = /^cases\[(\d+)\]$/.exec(id);
  return match ? Number(match[1]) : null;
}

/** The weather case a result was solved for, or undefined for the installation state. */
export function weatherCaseOfId<T>(cases: readonly T[], id: string): T | undefined {
  const index = caseIndexOfId(id);
  return index === null ? undefined : cases[index];
}
