/**
 * The verdict first, and true: the summary leads with pass or which case fails which check;
 * the status never reads a plain "Up to date." over a failing design; the clearance named is the
 * requirement that governs (a zone when the zone fails, not the general minimum); check messages
 * are worded in the chosen units (pounds force, feet and inches) with the core's SI sentences
 * left out. Numbers are the core's own; unit factors are the exact definitions
 * (1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N, NIST SP 811).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  adviceWords,
  type Project,
  solveProject,
  tensionWindowWithFacts,
  validateProject,
  windowPosition,
} from '../src/core/index.ts';
import { caseMessages } from '../src/deliverables/caseMessages.ts';
import {
  adviceWordingFor,
  formatCell,
  formatLength,
  formatTemperature,
} from '../src/deliverables/displayUnits.ts';
import { keyNumbers, summaryLine } from '../src/deliverables/reportContent.ts';
import { summaryLineText, summaryText } from '../src/ui/results/summaryText.ts';
import { upToDateStatus } from '../src/ui/statusText.ts';
import { roadSquare } from './helpers/designProjects.ts';

function open(raw: unknown): Project {
  const checked = validateProject(raw);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

const passing = open(demo);
const passingResults = solveProject(passing);
/** The walkway raised to a road's 4.5 m: the zone is what fails, the 2.4 m minimum still clears. */
const road = open({
  ...demo,
  limits: { ...demo.limits, zones: [{ from: 7, to: 15, height: 4.5, label: 'Road' }] },
});
const roadResults = solveProject(road);
/** A safety factor of 12 puts the largest tension over the working limit. */
const tight = open({ ...demo, limits: { ...demo.limits, safetyFactor: 12 } });
const tightResults = solveProject(tight);

describe('the verdict first', () => {
  it('says every case passes on the demo, and the status is plainly up to date', () => {
    expect(passingResults.cases.every((c) => c.ok)).toBe(true);
    const s = summaryText(passing, passingResults, 'si');
    expect(s.pass).toBe(true);
    expect(s.verdict).toBe(`All ${passingResults.cases.length} cases pass every check.`);
    expect(upToDateStatus(passingResults.cases)).toEqual({ text: 'Up to date.', tone: 'ok' });
  });

  it('names the failing case, the check and the shortfall when the road zone fails', () => {
    const failing = roadResults.cases.filter((c) => !c.ok);
    expect(failing.length).toBeGreaterThan(0);
    // The premise: the general minimum clears everywhere, only the zone fails.
    expect(roadResults.cases.every((c) => c.clearance >= road.limits.minClearance)).toBe(true);
    const s = summaryText(road, roadResults, 'si');
    expect(s.pass).toBe(false);
    expect(
      s.verdict.startsWith(`${failing.length} of ${roadResults.cases.length} cases fail`),
    ).toBe(true);
    expect(s.failures).toHaveLength(failing.length);
    for (const [i, c] of failing.entries()) {
      const z = c.zoneClearances[0];
      expect(s.failures[i]).toBe(
        `${c.name}, clearance at Road ${z.clearance.toFixed(3)} m, needs 4.500 m (${(4.5 - z.clearance).toFixed(3)} m short).`,
      );
    }
    const status = upToDateStatus(roadResults.cases);
    expect(status.tone).toBe('fail');
    expect(status.text).not.toBe('Up to date.');
    expect(status.text).toContain('fails');
  });

  it('names the zone that governs, not the general minimum, in the workbench, client view and report', () => {
    const worst = roadResults.cases.reduce((a, b) =>
      b.zoneClearances[0].clearance < a.zoneClearances[0].clearance ? b : a,
    );
    const least = `least clearance ${worst.zoneClearances[0].clearance.toFixed(3)} m`;
    const detail = summaryText(road, roadResults, 'si').detail;
    expect(detail).toContain(`${least} against 4.500 m required at Road in ${worst.name}`);
    expect(detail).not.toContain('2.400 m');
    expect(summaryLine(road, roadResults, 'si')).toContain('4.500 m required at Road');
    const key = keyNumbers(road, roadResults, 'si').find((n) => n.label === 'Least clearance');
    expect(key?.note).toContain('4.500 m required at Road');
  });

  it('words a tension failure with the working limit in the summary', () => {
    const s = summaryText(tight, tightResults, 'si');
    expect(s.pass).toBe(false);
    expect(s.failures.join(' ')).toMatch(
      /, tension [\d.]+ k?N is \d+ % of the working limit [\d.]+ k?N/,
    );
  });
});

describe('check messages in the chosen units', () => {
  const hot = (results: typeof roadResults) => results.cases.find((c) => !c.ok);

  it('gives the core’s own sentences in SI', () => {
    const c = hot(roadResults);
    if (!c) throw new Error('no failing case');
    const zone = c.zoneClearances[0];
    expect(c.messages).toContain(
      `Road: clearance ${zone.clearance.toFixed(2)} m is below the required 4.50 m.`,
    );
    const si = caseMessages(road, roadResults, c, 'si');
    expect(si).toContain(
      `Road: clearance ${zone.clearance.toFixed(3)} m is below the required 4.500 m.`,
    );
    expect(si).toHaveLength(c.messages.length);
  });

  it('words clearance in feet and inches and leaves out the SI sentence', () => {
    const c = hot(roadResults);
    if (!c) throw new Error('no failing case');
    const imperial = caseMessages(road, roadResults, c, 'imperial');
    // 4.5 m / 0.0254 = 177.165 in = 14 ft 9 1/8 in to the nearest eighth.
    expect(imperial.join(' ')).toContain(
      'is below the required 14\u00a0ft\u00a09\u00a01/8\u00a0in.',
    );
    expect(imperial.join(' ')).not.toMatch(/\d m\b/);
    expect(imperial).toHaveLength(c.messages.length);
  });

  it('words tension in pound-force and leaves out the newtons', () => {
    const c = tightResults.cases.find((r) => r.utilisation > 1);
    if (!c) throw new Error('no case over the working limit');
    expect(c.messages.join(' ')).toMatch(/Largest tension \d+ N exceeds the working limit \d+ N/);
    const imperial = caseMessages(tight, tightResults, c, 'imperial').join(' ');
    const lbf = Math.round(c.maxTension / 4.4482216152605);
    expect(imperial).toContain(`Largest tension ${lbf} lbf exceeds the working limit`);
    expect(imperial).not.toMatch(/\d N\b/);
  });

  it('keeps the summary free of SI numbers in imperial', () => {
    const text = summaryLineText(summaryText(road, roadResults, 'imperial'));
    expect(text).toContain('ft');
    expect(text).not.toMatch(/\d m\b|\d N\b|kN/);
  });
});

describe('the tension window in the chosen units', () => {
  const shut = roadSquare();
  const { window, adviceFacts } = tensionWindowWithFacts(shut);
  const imperial = adviceWords(shut, adviceFacts, adviceWordingFor('imperial'));

  it('words the same advice as the contract in SI', () => {
    expect(adviceWords(shut, adviceFacts, adviceWordingFor('si'))).toEqual(window.advice);
  });

  it('words the advice for a shut window in pounds force, feet and inches and pounds', () => {
    expect(window.empty).toBe(true);
    expect(imperial).toHaveLength(window.advice.length);
    const text = imperial.join(' ');
    expect(text).toMatch(/\d lbf/);
    expect(text).toMatch(/\d+\u00a0ft\u00a0\d+/);
    expect(text).not.toMatch(/\d m\b|\d N\b|kN|\d kg\b/);
    // The fixing rise in feet and inches: the SI advice's metres / 0.0254, to the nearest eighth.
    const metres = Number(window.advice.join(' ').match(/by at least ([\d.]+) m/)?.[1]);
    const raise = imperial.find((line) => line.startsWith('Raising every fixing'));
    expect(raise).toContain(`by at least ${formatLength('imperial', metres)}`);
  });

  it('says where the demo setting sits in feet and inches, with the temperature in °F', () => {
    const open = tensionWindowWithFacts(passing);
    const H = passingResults.cases[0].horizontalTension;
    const words = adviceWordingFor('imperial');
    // 3 m / 0.3048 = 9.8425 ft = 9 ft 10 1/8 in to the nearest eighth of an inch.
    expect(windowPosition(passing, open.window, H, words)).toContain(
      'clears 9\u00a0ft\u00a010\u00a01/8\u00a0in over Walkway',
    );
    // 15 °C × 9/5 + 32 = 59 °F exactly.
    expect(adviceWords(passing, open.adviceFacts, words)[0]).toContain('at 59°F');
  });

  it('shows temperatures without rounding drift', () => {
    // 7.5 °C = 45.5 °F exactly; 15 °C = 59 °F.
    expect(formatTemperature('imperial', 7.5)).toBe('45.5°F');
    expect(formatTemperature('imperial', 15)).toBe('59°F');
    expect(formatCell('imperial', 'temperature', 7.5)).toBe('45.5\u00a0°F');
    expect(formatCell('si', 'temperature', -10)).toBe('-10\u00a0°C');
  });
});

describe('moving-load findings in the chosen units', () => {
  // A 60 kg basket hauled across the demo span pulls the wire below the walkway's 3 m.
  const hauled = open({
    ...demo,
    loads: [...demo.loads, { type: 'moving', from: 2, to: 20, mass: 60, label: 'Basket' }],
  });
  const results = solveProject(hauled);
  const c = results.cases.find((r) => r.messages.some((m) => m.startsWith('Basket:')));

  it('words the moving load’s clearance and position in feet and inches', () => {
    if (!c) throw new Error('the basket fails no check');
    expect(c.messages.join(' ')).toMatch(/Basket: .* with the load at [\d.]+ m/);
    const imperial = caseMessages(hauled, results, c, 'imperial');
    const basket = imperial.filter((m) => m.startsWith('Basket:'));
    expect(basket.length).toBe(c.messages.filter((m) => m.startsWith('Basket:')).length);
    for (const line of basket) {
      expect(line).toMatch(/with the load at \d+\u00a0ft/);
      expect(line).not.toMatch(/\d m\b|\d N\b/);
    }
  });
});
