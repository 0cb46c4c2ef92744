/**
 * Results carry an identity per state ("installation", "cases[i]") and everything that pairs a
 * result with its weather case or marks the governing case uses it, never the name: a weather
 * case may be named like the installation state. The reference for the parabola comparison is
 * the same document with the case under its original name (a name is a label and must not change
 * a number); the closed form itself is the simply-supported moment over H (Irvine, Cable
 * Structures, 1981, §2.2, the parabolic approximation).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { profilesCsv } from '../src/deliverables/csv.ts';
import { caseTable } from '../src/deliverables/reportContent.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';
import { summaryLineText, summaryText } from '../src/ui/results/summaryText.ts';

function checked(input: unknown): Project {
  const result = validateProject(input);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return structuredClone(result.project);
}

const original = checked(demo);
/** The iced, windy case renamed "Installation": valid, since names only need to differ among cases. */
const renamed = checked({
  ...demo,
  cases: demo.cases.map((c, i) => (i === 1 ? { ...c, name: 'Installation' } : c)),
});

describe('case identities in the results', () => {
  const results = solveProject(renamed);

  it('gives the installation and each weather case its own id, whatever their names', () => {
    expect(results.cases.map((c) => c.id)).toEqual([
      'installation',
      'cases[0]',
      'cases[1]',
      'cases[2]',
    ]);
    expect(results.cases.map((c) => c.name)).toEqual([
      'Installation',
      'Hot summer',
      'Installation',
      'Winter storm',
    ]);
  });

  it('names the governing cases by id as well as by name, and the two agree', () => {
    for (const check of ['tension', 'clearance'] as const) {
      const byId = results.cases.find((c) => c.id === results.governingIds[check]);
      expect(byId?.name).toBe(results.governing[check]);
    }
    // The iced, windy case governs tension in the demo; its id says which "Installation" it is.
    expect(results.governingIds.tension).toBe('cases[1]');
  });

  it('pairs each result with its own weather case for the parabola comparison', () => {
    const reference = buildSagFigure(original, solveProject(original), 'si').parabola;
    const figure = buildSagFigure(renamed, results, 'si').parabola;
    expect(reference).not.toBeNull();
    expect(figure?.differenceM).toBeCloseTo(reference?.differenceM ?? Number.NaN, 9);
    expect(figure?.caseId).toBe(reference?.caseId);
    // Paired by name, the installation state took the iced case's loads: a 0.64 m "difference".
    expect(figure?.differenceM).toBeLessThan(1e-3);
  });

  it('gives each legend group its own id so two cases of one name are not merged', () => {
    const groups = buildSagFigure(renamed, results, 'si')
      .data.map((t) => (t as { legendgroup?: string }).legendgroup)
      .filter((g): g is string => g !== undefined);
    // The straight line between the fixings has a group of its own; it is not a case.
    expect(new Set(groups)).toEqual(
      new Set(['chord', 'installation', 'cases[0]', 'cases[1]', 'cases[2]']),
    );
  });

  it('reports the weather of each case by id in the report table', () => {
    const rows = caseTable(renamed, results, 'si').rows;
    // The installation row has no weather of its own; the renamed iced case keeps its ice.
    expect(rows[0][1]).not.toContain('ice');
    expect(rows[2][1]).toContain('ice 6.5 mm');
  });

  it('names the governing case in the summary by identity', () => {
    const text = summaryLineText(summaryText(renamed, results, 'si'));
    const tension = results.cases.find((c) => c.id === results.governingIds.tension);
    expect(text).toContain(`${Math.round((tension?.utilisation ?? 0) * 100)}`);
  });

  it('writes the case id beside the name in the profiles CSV', () => {
    const lines = profilesCsv(renamed, results, 'si').split('\r\n');
    const ids = new Set(
      lines.filter((l) => l.startsWith('"Installation",')).map((l) => l.split(',').at(-1)),
    );
    expect(ids).toEqual(new Set(['installation', 'cases[1]']));
  });
});
