/**
 * The report's record and the pieces under it: the project file's fingerprint (SHA-256 checked
 * against Node's own crypto and the FIPS 180-2 appendix B example), canonical JSON (RFC 8785 key
 * order), the optional "report" block of the project file, feet-and-inches lengths, the line
 * breaker and the fixing schedule against the core's reactions.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { solveProject, validateProject } from '../src/core/index.ts';
import { formatLength, formatQuantity } from '../src/deliverables/displayUnits.ts';
import { canonicalJson, projectFingerprint, sha256Hex } from '../src/deliverables/fingerprint.ts';
import { wrapText } from '../src/deliverables/pdfFonts.ts';
import { fixingSchedule } from '../src/deliverables/reportFixings.ts';
import { revisionLabel } from '../src/deliverables/reportRecord.ts';

const utf8 = (text: string) => new TextEncoder().encode(text);

describe('project file fingerprint', () => {
  it('computes SHA-256 as published and as Node computes it', () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc").
    expect(sha256Hex(utf8('abc'))).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
    let seed = 7;
    for (const length of [0, 1, 55, 56, 63, 64, 65, 1000, 100_003]) {
      const bytes = new Uint8Array(length).map(() => {
        seed = (seed * 1103515245 + 12345) % 2 ** 31;
        return seed & 0xff;
      });
      expect(sha256Hex(bytes)).toBe(createHash('sha256').update(bytes).digest('hex'));
    }
  });

  it('ignores key order and whitespace, and changes with any value', () => {
    expect(canonicalJson({ b: 1, a: [true, null, 'x'], c: { z: 2, y: 1 } })).toBe(
      '{"a":[true,null,"x"],"b":1,"c":{"y":1,"z":2}}',
    );
    const reverse = (v: unknown): unknown =>
      Array.isArray(v)
        ? v.map(reverse)
        : v && typeof v === 'object'
          ? Object.fromEntries(
              Object.entries(v)
                .reverse()
                .map(([k, x]) => [k, reverse(x)]),
            )
          : v;
    const reordered = JSON.parse(JSON.stringify(reverse(demo), null, 2));
    expect(projectFingerprint(reordered)).toBe(projectFingerprint(demo));
    expect(projectFingerprint(demo)).toMatch(/^[0-9a-f]{12}$/);
    expect(projectFingerprint(demo)).toBe(
      createHash('sha256').update(canonicalJson(demo)).digest('hex').slice(0, 12),
    );
    expect(projectFingerprint({ ...demo, title: `${demo.title}.` })).not.toBe(
      projectFingerprint(demo),
    );
  });
});

describe('the report block of the project file', () => {
  const record = {
    reference: 'CY-014',
    preparedBy: { name: 'A. Fitter', date: '2026-11-30' },
    checkedBy: { name: 'B. Checker' },
    revisions: [{ revision: 'A', date: '2026-11-30', description: 'First issue' }],
  };

  it('is optional and, when present, read as written', () => {
    expect(validateProject(demo).ok).toBe(true);
    const checked = validateProject({ ...demo, report: record });
    expect(checked.ok).toBe(true);
    if (checked.ok) expect(revisionLabel(checked.project.report)).toBe('Rev. A');
    expect(revisionLabel(undefined)).toBe('Draft, no revision recorded');
  });

  it('refuses bad dates, unknown fields and empty revisions by path', () => {
    const issues = (report: unknown) => {
      const checked = validateProject({ ...demo, report });
      return checked.ok ? [] : checked.issues.map((i) => `${i.path}: ${i.message}`);
    };
    expect(issues({ preparedBy: { name: 'A', date: '2026-02-30' } })).toEqual([
      'report.preparedBy.date: must be a calendar date written YYYY-MM-DD',
    ]);
    expect(issues({ signedBy: 'A' })).toEqual(['report.signedBy: is not a known field']);
    expect(issues({ revisions: [{ revision: ' ', date: '2026-01-01', description: '' }] })).toEqual(
      ['report.revisions[0].revision: must not be empty'],
    );
    expect(issues({ revisions: [{ revision: 'B', description: 'x' }] })).toEqual([
      'report.revisions[0].date: must be text',
    ]);
  });
});

describe('lengths in feet and inches', () => {
  // 1 in = 0.0254 m exactly (1959 international yard and pound agreement).
  it('rounds to the nearest eighth of an inch and reduces the fraction', () => {
    const nb = (text: string) => text.replace(/ /g, '\u00a0');
    expect(formatLength('imperial', 0.45)).toBe(nb('1 ft 5 3/4 in')); // 17.717 in
    expect(formatLength('imperial', 0.3048)).toBe(nb('1 ft 0 in'));
    expect(formatLength('imperial', 0.0254 * 5.375)).toBe(nb('5 3/8 in'));
    expect(formatLength('imperial', 3.7)).toBe(nb('12 ft 1 5/8 in')); // 145.669 in
    expect(formatLength('imperial', 0.45, true)).toBe('1′\u00a05¾″');
    expect(formatLength('imperial', -0.0254 / 2)).toBe(nb('−0 1/2 in'));
    expect(formatLength('si', 3.7)).toBe('3.700 m');
  });
});

describe('line breaking', () => {
  const measure = (piece: string) => piece.length;
  it('never loses a character and keeps every line within the width', () => {
    const text = 'Ice 10 mm at -10 °C with a 30 m/s gale across the yard and the festoon cable on';
    const lines = wrapText(text, 18, measure);
    expect(lines.join(' ')).toBe(text);
    for (const line of lines) expect(line.length).toBeLessThanOrEqual(18);
  });

  it('breaks between Japanese characters and cuts a word longer than the line', () => {
    expect(wrapText('中庭の照明と工房の壁', 4, measure)).toEqual(['中庭の照', '明と工房', 'の壁']);
    expect(wrapText('abcdefghij', 4, measure)).toEqual(['abcd', 'efgh', 'ij']);
    expect(wrapText('1.59\u00a0kN x', 8, measure)).toEqual(['1.59\u00a0kN', 'x']);
  });
});

describe('the fixing schedule', () => {
  it('lists every fixing in every case with the core’s components and marks one governing case', () => {
    const checked = validateProject(demo);
    if (!checked.ok) throw new Error('demo invalid');
    const results = solveProject(checked.project);
    const table = fixingSchedule(checked.project, results, 'si');
    const n = (v: number) => formatQuantity('si', 'force', v);
    expect(table.groupRows).toHaveLength(checked.project.supports.length);
    const body = table.rows.filter((_, i) => !table.groupRows?.includes(i));
    expect(body).toHaveLength(results.cases.length * checked.project.supports.length);
    checked.project.supports.forEach((_, s) => {
      const rows = body.slice(s * results.cases.length, (s + 1) * results.cases.length);
      results.cases.forEach((c, k) => {
        const r = c.supports[s];
        expect(rows[k].slice(0, 6)).toEqual([
          c.name,
          n(Math.abs(r.horizontal)),
          n(r.vertical),
          n(Math.abs(r.lateral)),
          n(r.resultant),
          `${r.angle.toFixed(1)}°`,
        ]);
      });
      const largest = Math.max(...results.cases.map((c) => c.supports[s].resultant));
      const governs = rows.filter((row) => row[6] === 'governs');
      expect(governs).toHaveLength(1);
      expect(governs[0][4]).toBe(n(largest));
    });
  });
});
