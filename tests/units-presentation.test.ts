/**
 * One presentation module for units and numbers: src/deliverables/displayUnits.ts holds the only
 * table of digits, with the workbench ('table') and report ('report') styles side by side, and
 * every formatter takes (system, quantity, value).
 *
 * Conversions checked by hand with the exact definitions 1 ft = 0.3048 m, 1 in = 0.0254 m and
 * 1 lbf = 4.4482216152605 N (international yard and pound, 1959; NIST SP 811, Appendix B.8).
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  DIGITS,
  digitsFor,
  fieldText,
  formatCell,
  formatForceShort,
  formatNumber,
  formatPercent,
  formatQuantity,
  parseNumber,
} from '../src/deliverables/displayUnits.ts';

const LBF = 4.4482216152605;

describe('the one digits table', () => {
  it('keeps the workbench digits, the same in either system', () => {
    for (const system of ['si', 'imperial'] as const) {
      expect(DIGITS.table[system]).toEqual({
        length: 3,
        diameter: 1,
        force: 0,
        speed: 1,
        temperature: 0,
        mass: 2,
      });
      expect(digitsFor('table', system, 'ratio')).toBe(2);
    }
  });

  it('keeps the report digits per system', () => {
    expect(DIGITS.report.si).toEqual({
      length: 3,
      diameter: 1,
      mass: 2,
      massPerLength: 3,
      force: 0,
      temperature: 0,
      speed: 0,
    });
    expect(DIGITS.report.imperial).toEqual({
      length: 2,
      diameter: 3,
      mass: 2,
      massPerLength: 4,
      force: 0,
      temperature: 0,
      speed: 0,
    });
    expect(digitsFor('report', 'si', 'ratio')).toBe(3);
  });

  it('shows the styles where they differ exactly as before', () => {
    // speed: workbench one decimal, report whole
    expect(formatNumber('si', 'speed', 12.34)).toBe('12.3');
    expect(formatQuantity('si', 'speed', 12.34)).toBe('12 m/s');
    // imperial length: workbench 0.001 ft, report 0.01 ft (22 m = 72.178478 ft)
    expect(formatNumber('imperial', 'length', 22)).toBe('72.178');
    expect(formatQuantity('imperial', 'length', 22)).toBe('72.18 ft');
    // force: workbench groups thousands, report does not (1000 lbf)
    expect(formatNumber('imperial', 'force', 1000 * LBF)).toBe('1,000');
    expect(formatQuantity('imperial', 'force', 1000 * LBF)).toBe('1000 lbf');
  });
});

describe('workbench formatters, (system, quantity, value) like the report ones', () => {
  it('puts the symbol after a no-break space and rounds to the table digits', () => {
    expect(formatCell('si', 'length', 3.75)).toBe('3.750\u00a0m');
    expect(formatCell('si', 'force', 441.6)).toBe('442\u00a0N');
    expect(formatCell('si', 'length', 3.75, 1)).toBe('3.8\u00a0m');
    // 7.5 °C = 45.5 °F: one decimal, never a rounded 46 °F; 15 °C = 59 °F whole
    expect(formatCell('imperial', 'temperature', 7.5)).toBe('45.5\u00a0°F');
    expect(formatCell('imperial', 'temperature', 15)).toBe('59\u00a0°F');
  });

  it('gives input fields enough digits to round-trip', () => {
    expect(fieldText('si', 'length', 22.125)).toBe('22.125');
    expect(fieldText('imperial', 'length', 22)).toBe('72.1785');
    expect(parseNumber(' 1.5e3 ')).toBe(1500);
    expect(parseNumber('1,5')).toBeUndefined();
  });

  it('words percentages and short forces with no-break spaces', () => {
    expect(formatPercent(0.424)).toBe('42\u00a0%');
    expect(formatForceShort('si', 1588.4, '\u00a0')).toBe('1.59\u00a0kN');
    expect(formatForceShort('si', 441.2)).toBe('441 N');
  });
});

describe('the old entry points are gone', () => {
  const root = join(import.meta.dirname, '..');

  function sources(dir: string): string[] {
    return readdirSync(dir).flatMap((name) => {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) return sources(path);
      return /\.tsx?$/.test(name) ? [path] : [];
    });
  }

  it('has no workbench format module', () => {
    expect(existsSync(join(root, 'src/ui/format.ts'))).toBe(false);
  });

  it('has no other digits table or import of the old module in src', () => {
    const offenders = sources(join(root, 'src')).filter((path) => {
      if (path.endsWith(join('deliverables', 'displayUnits.ts'))) return false;
      const text = readFileSync(path, 'utf8');
      return /\bDIGITS\b/.test(text) || /from '[./]*format\.ts'/.test(text);
    });
    expect(offenders).toEqual([]);
  });
});
