/**
 * The last line of defence between the solver and the person: a case marked solved never
 * carries a non-finite number, and an internal error becomes a plain sentence on every case
 * (never the raw error text). Unsolved cases carry NaN, which JSON writes as null.
 */

import { caseResultId, INSTALLATION_ID } from './caseIds.ts';
import { ERROR_TARGET } from './discretisation.ts';
import { resolveEndFittings } from './endFittings.ts';
import type { CaseResult, EndFittingsResult, Project, ProjectResults } from './project.ts';
import { INSTALLATION_NAME } from './projectModel.ts';

export const INTERNAL_ERROR_MESSAGE =
  'The solver met an internal error and gave no numbers for this case. Nothing you entered is lost; please report it with the project file.';

const NOT_FINITE_MESSAGE =
  'The solver produced a number it cannot stand behind (not finite); no result is shown for this case.';

/** Paths of the non-finite numbers inside a value ('' when there are none). */
export function firstNonFinite(value: unknown, path = ''): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : path || '(value)';
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = firstNonFinite(value[i], `${path}[${i}]`);
      if (hit) return hit;
    }
    return undefined;
  }
  if (value && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      const hit = firstNonFinite(v, path ? `${path}.${key}` : key);
      if (hit) return hit;
    }
  }
  return undefined;
}

function unsolvedCase(id: string, name: string, temperature: number, message: string): CaseResult {
  return {
    id,
    name,
    solved: false,
    horizontalTension: Number.NaN,
    maxTension: Number.NaN,
    utilisation: Number.NaN,
    sag: Number.NaN,
    lowestPoint: { x: Number.NaN, z: Number.NaN },
    clearance: Number.NaN,
    zoneClearances: [],
    swing: Number.NaN,
    strain: Number.NaN,
    spans: [],
    supports: [],
    ok: false,
    messages: [message],
    discretisationError: Number.NaN,
    iterations: 0,
    temperature,
  };
}

function fittingsOrNone(project: Project): EndFittingsResult {
  try {
    return resolveEndFittings(project.limits?.endFittings);
  } catch {
    return resolveEndFittings(undefined);
  }
}

/**
 * Results with no case solved, each saying why: by default that the solver failed inside
 * (internalError true); with a message, a reason that is not an internal fault.
 */
export function unsolvedResults(project: Project, message?: string): ProjectResults {
  const why = message ?? INTERNAL_ERROR_MESSAGE;
  const cases = [
    unsolvedCase(INSTALLATION_ID, INSTALLATION_NAME, project.installation.temperature, why),
    ...project.cases.map((c, i) => unsolvedCase(caseResultId(i), c.name, c.temperature, why)),
  ];
  const none = { tension: INSTALLATION_NAME, clearance: INSTALLATION_NAME };
  return {
    unstressedLength: Number.NaN,
    cases,
    governing: none,
    governingIds: { tension: INSTALLATION_ID, clearance: INSTALLATION_ID },
    setUpChart: [],
    setUpSpan: 0,
    endFittings: fittingsOrNone(project),
    ...(message === undefined ? { internalError: true } : {}),
    notices: [],
    mesh: {
      refinement: 0,
      elementsPerSpan: 0,
      errorTarget: ERROR_TARGET,
      largestError: Number.NaN,
      reached: false,
    },
  };
}

/** Marks unsolved (in words) any solved case or chart row that holds a non-finite number. */
export function guardFinite(results: ProjectResults): ProjectResults {
  results.cases = results.cases.map((c) => {
    if (!c.solved || firstNonFinite(c) === undefined) return c;
    const unsolved = unsolvedCase(c.id, c.name, c.temperature, NOT_FINITE_MESSAGE);
    return { ...unsolved, iterations: c.iterations };
  });
  for (const row of results.setUpChart)
    if (row.solved && firstNonFinite(row) !== undefined) row.solved = false;
  if (!Number.isFinite(results.unstressedLength))
    for (const c of results.cases)
      if (c.solved) {
        c.solved = false;
        c.ok = false;
        c.messages.push(NOT_FINITE_MESSAGE);
      }
  return results;
}
