/**
 * The summary of a solved project, verdict first: "All 4 cases pass every check." or "2 of 4
 * cases fail: Hot summer, clearance at Road 4.080 m, needs 4.500 m (0.420 m short)." Then the
 * numbers that govern: the largest tension against the working limit, and the clearance
 * requirement with the least margin (the one that governs, named: a zone when a zone is what
 * fails, not the general minimum). The failures and the governing clearance are the report's
 * own (src/deliverables/reportContent.ts), so the workbench, client view and PDF agree.
 */
import type { Project, ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { formatForceShort, formatLength, formatPercent } from '../../deliverables/displayUnits.ts';
import { caseFailures, governingClearance } from '../../deliverables/reportContent.ts';

export interface Summary {
  pass: boolean;
  /** The verdict in a few words: all pass, or how many cases fail. */
  verdict: string;
  /** Which case fails which check and by how much, one entry a case. */
  failures: string[];
  /** The governing numbers. */
  detail: string;
}

export function summaryText(project: Project, results: ProjectResults, units: UnitSystem): Summary {
  const total = results.cases.length;
  const failing = results.cases.filter((c) => !c.ok);
  const verdict =
    failing.length === 0
      ? `All ${total} cases pass every check.`
      : `${failing.length} of ${total} ${total === 1 ? 'case fails' : 'cases fail'}:`;
  const failures = failing.map((c) => `${c.name}, ${caseFailures(project, c, units).join('; ')}.`);
  const byId = (id: string) => results.cases.find((c) => c.id === id && c.solved);
  const tensionCase = byId(results.governingIds.tension);
  const parts: string[] = [];
  if (tensionCase)
    parts.push(
      `Largest tension ${formatForceShort(units, tensionCase.maxTension, '\u00a0')} = ${formatPercent(tensionCase.utilisation)} of the working limit in ${tensionCase.name}`,
    );
  const g = governingClearance(project, results);
  if (g) {
    const where =
      g.requirement === 'the whole span' ? 'over the whole span' : `at ${g.requirement}`;
    const spare = g.clearance - g.required;
    parts.push(
      `least clearance ${formatLength(units, g.clearance)} against ${formatLength(units, g.required)} required ${where} in ${g.caseName} (${formatLength(units, Math.abs(spare))} ${spare >= 0 ? 'to spare' : 'short'})`,
    );
  }
  const sentence = parts.join('; ');
  return {
    pass: failing.length === 0,
    verdict,
    failures,
    detail: sentence ? `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}.` : '',
  };
}

/** The summary as one line of text (verdict, then the governing numbers). */
export function summaryLineText(summary: Summary): string {
  return [summary.verdict, ...summary.failures, summary.detail].filter(Boolean).join(' ');
}
