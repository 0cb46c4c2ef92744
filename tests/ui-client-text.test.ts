/**
 * Forces in the client view and report summary follow the workbench's rule (from 1 000 N in kN
 * with two decimals, below in whole newtons), and the key numbers speak in words, not symbols.
 * Expected values: the core's own tensions on the courtyard example, rounded by hand
 * (1 kN = 1 000 N, SI definition).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { solveProject, validateProject } from '../src/core/index.ts';
import { formatForceShort } from '../src/deliverables/displayUnits.ts';
import { keyNumbers, summaryLine } from '../src/deliverables/reportContent.ts';
import { summaryText } from '../src/ui/results/summaryText.ts';

const checked = validateProject(demo);
if (!checked.ok) throw new Error('example project invalid');
const project = checked.project;
const results = solveProject(project);
const largest = results.cases.reduce((a, b) => (b.maxTension > a.maxTension ? b : a));

describe('one rule for forces', () => {
  it('rounds by hand: 1588 N is 1.59 kN, 441 N stays in newtons, imperial in whole lbf', () => {
    expect(formatForceShort('si', 1588.4)).toBe('1.59 kN');
    expect(formatForceShort('si', 999.4)).toBe('999 N');
    expect(formatForceShort('si', 999.6)).toBe('1.00 kN'); // never "1,000 N"
    expect(formatForceShort('si', 441.2)).toBe('441 N');
    // 4448.2216152605 N = 1 000 lbf (lbf = 0.45359237 kg × 9.80665 m/s², exact definitions)
    expect(formatForceShort('imperial', 4448.2216152605)).toBe('1,000 lbf');
  });

  it('shows the largest tension the same way in the workbench summary and the client summary', () => {
    expect(largest.maxTension).toBeGreaterThan(1000);
    const expected = `${(largest.maxTension / 1000).toFixed(2)} kN`;
    expect(summaryLine(project, results, 'si')).toContain(`largest tension ${expected}`);
    expect(summaryText(project, results, 'si').detail).toContain(
      formatForceShort('si', largest.maxTension, '\u00a0'),
    );
    expect(formatForceShort('si', largest.maxTension, '\u00a0').replace('\u00a0', ' ')).toBe(
      expected,
    );
    const numbers = keyNumbers(project, results, 'si');
    expect(numbers.find((n) => n.label === 'Largest tension')?.value).toBe(expected);
    expect(numbers.find((n) => n.label === 'Largest fixing load')?.value).toMatch(/^\d\.\d\d kN$/);
  });

  it('describes the installation pull in words, not as "H"', () => {
    const setOnDay = keyNumbers(project, results, 'si').find((n) => n.label === 'Set on the day');
    const h = Math.round(results.cases[0].horizontalTension);
    expect(setOnDay?.note).toBe(`horizontal pull ${h} N at 15°C`);
    for (const n of keyNumbers(project, results, 'imperial'))
      expect(`${n.value} ${n.note}`).not.toMatch(/\bH\b/);
  });
});
