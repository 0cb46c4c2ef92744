/**
 * The plain-language summary of a solved project, e.g. "Lowest point 3.62 m above the ground in
 * Hot summer; largest tension 1.9 kN = 38 % of the allowed load in Cold, iced, windy."
 */
import type { ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { percent, show, showForceShort } from '../format.ts';

export function summaryText(results: ProjectResults, units: UnitSystem): string {
  const byId = (id: string) => results.cases.find((c) => c.id === id);
  const clearanceCase = byId(results.governingIds.clearance);
  const tensionCase = byId(results.governingIds.tension);
  const parts: string[] = [];
  if (clearanceCase)
    parts.push(
      `Lowest point ${show(clearanceCase.clearance, 'length', units, 2)} above the ground in ${clearanceCase.name}`,
    );
  if (tensionCase)
    parts.push(
      `largest tension ${showForceShort(tensionCase.maxTension, units)} = ${percent(tensionCase.utilisation)} of the allowed load in ${tensionCase.name}`,
    );
  const failing = results.cases.filter((c) => !c.ok).map((c) => c.name);
  const verdict =
    failing.length === 0 ? 'Every case passes.' : `Fails in ${failing.join(', ')} — see the table.`;
  const sentence = parts.join('; ');
  return `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}. ${verdict}`;
}
