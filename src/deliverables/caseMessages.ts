/**
 * A case's messages in the chosen units. The core words its check messages in SI
 * (src/core/checkMessages.ts); here the same checks are worded again from the case's numbers in
 * the display units, and the core's SI sentences for them are left out. Every other message
 * (solver notes, theory notes, hung items without a wind area) is passed on as it is.
 */
import {
  type CaseResult,
  clearanceMessage,
  movingLoadFailures,
  type Project,
  type ProjectResults,
  resolveWire,
  SI_WORDING,
  tensionMessage,
  type Wording,
  zoneMessage,
} from '../core/index.ts';
import { type UnitSystem, wordingFor } from './displayUnits.ts';

function checkMessages(
  project: Project,
  results: ProjectResults,
  c: CaseResult,
  w: Wording,
): string[] {
  if (!c.solved) return [];
  const wire = resolveWire(project.wire);
  const tension = wire
    ? tensionMessage(
        {
          maxTension: c.maxTension,
          breakingLoadN: wire.breakingLoad,
          efficiency: results.endFittings.efficiency,
          safetyFactor: project.limits.safetyFactor,
        },
        w,
      )
    : null;
  return [
    tension,
    clearanceMessage(c.clearance, project.limits.minClearance, w),
    ...c.zoneClearances.map((z) => zoneMessage(z, w)),
    ...(c.movingLoads ?? []).flatMap((m) => movingLoadFailures(m, project, w)),
  ].filter((m): m is string => m !== null);
}

/** The case's messages with its checks worded in `units`: checks first, then the rest. */
export function caseMessages(
  project: Project,
  results: ProjectResults,
  c: CaseResult,
  units: UnitSystem,
): string[] {
  const coreWords = new Set(checkMessages(project, results, c, SI_WORDING));
  const others = c.messages.filter((m) => !coreWords.has(m));
  return [...checkMessages(project, results, c, wordingFor(units)), ...others];
}
