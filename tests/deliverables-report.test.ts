/**
 * The PDF report built in Node (the sag plot left out; the browser test draws it) and read back
 * with pdftotext (poppler-utils): every required section, the fixing schedule against the core's
 * reactions, failure reasons on the case table's page, whole captions for the longest case
 * names, two pages for the shipped example, Greek, Polish and Japanese text round-tripping.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  type Project,
  type ProjectResults,
  solveProject,
  validateProject,
} from '../src/core/index.ts';
import { formatQuantity } from '../src/deliverables/displayUnits.ts';
import { NO_APPENDIX } from '../src/deliverables/pdfAppendix.ts';
import { buildPdfReport, type PaperSize } from '../src/deliverables/pdfReport.ts';
import { caseFailures, keyNumbers } from '../src/deliverables/reportContent.ts';
import failingFile from './fixtures/report-failing.json' with { type: 'json' };
import { nodeFontSource } from './helpers/reportFonts.ts';

const dir = mkdtempSync(join(tmpdir(), 'sagwright-report-'));

function open(raw: unknown): Project {
  const checked = validateProject(raw);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

interface Built {
  pages: string[];
  all: string;
  path: string;
  results: ProjectResults;
}

/** Builds the report and returns each page's text (reading order), whitespace made single. */
async function report(
  project: Project,
  options: { paper?: PaperSize; units?: 'si' | 'imperial'; appendix?: boolean } = {},
): Promise<Built> {
  const results = solveProject(project);
  const doc = await buildPdfReport(project, results, {
    paper: options.paper ?? 'a4',
    unitSystem: options.units ?? 'si',
    generatedAt: new Date('2026-12-02T09:00:00Z'),
    plot: null,
    plotAspect: 2.1,
    fonts: nodeFontSource,
    appVersion: '0.1.0',
    appendix: options.appendix
      ? { setUpChart: true, movingLoads: true, wireChoices: false, inputs: true }
      : NO_APPENDIX,
  });
  const path = join(dir, `${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(path, Buffer.from(doc.output('arraybuffer')));
  const count = doc.getNumberOfPages();
  const pages = Array.from({ length: count }, (_, i) =>
    execFileSync('pdftotext', ['-raw', '-f', `${i + 1}`, '-l', `${i + 1}`, path, '-'], {
      encoding: 'utf8',
      // poppler notes jsPDF's CID ordering name on stderr; the ToUnicode map reads fine.
      stdio: ['ignore', 'pipe', 'ignore'],
    })
      .replace(/\u00a0/g, ' ')
      .replace(/\s+/g, ' '),
  );
  return { pages, all: pages.join(' '), path, results };
}

const flat = (text: string) => text.replace(/\u00a0/g, ' ').replace(/\s+/g, ' ');

const SLOW = 120_000;

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('the PDF report of the shipped example', () => {
  const project = open(demo);
  let built: Built;
  beforeAll(async () => {
    built = await report(project);
  }, SLOW);

  it('has two pages without appendices, each with title, revision, page number and caution', () => {
    expect(built.pages).toHaveLength(2);
    built.pages.forEach((page, i) => {
      expect(page).toContain(project.title);
      expect(page).toContain('Draft, no revision recorded');
      expect(page).toContain(`Page ${i + 1} of 2`);
      expect(page).toContain('not for lifting or people');
    });
  });

  it('holds every required section', () => {
    for (const text of [
      'PASS. Every case passes every check.',
      'Set on the day at 15°C',
      'Field check',
      'Results by case',
      'Fixing schedule',
      'Design basis',
      '[V] read in the named source',
      '[D] derived',
      '[M] from memory',
      '[CP] common practice',
      'End fittings',
      'safety factor 5',
      'Walkway',
      'Weather cases',
      'Estimated discretisation error',
      'Standing cautions',
      'local codes',
      'Record',
      'PREPARED BY',
      'CHECKED BY',
      'APPROVED BY',
      'Signature:',
      'Revision Date What changed',
      'Sagwright 0.1.0',
      'File fingerprint',
    ])
      expect(built.all).toContain(text);
  });

  it('prints every fixing’s components in every case as the core computed them', () => {
    const page2 = built.pages[1];
    const n = (value: number) => formatQuantity('si', 'force', value);
    for (const c of built.results.cases)
      for (const r of c.supports) {
        const row = `${c.name} ${n(Math.abs(r.horizontal))} ${n(r.vertical)} ${n(Math.abs(r.lateral))} ${n(r.resultant)} ${r.angle.toFixed(1)}°`;
        expect(page2).toContain(row);
      }
    expect(page2.match(/° governs/g)?.length).toBe(project.supports.length);
  });

  it('prints the key numbers with their whole captions', () => {
    for (const k of keyNumbers(project, built.results, 'si'))
      expect(built.pages[0]).toContain(flat(k.note));
  });
});

describe('the PDF report of a failing design', () => {
  const project = open(failingFile);
  let built: Built;
  beforeAll(async () => {
    built = await report(project);
  }, SLOW);
  const longName = project.cases[1].name;

  it('says FAIL in words with the reasons, and each reason sits on the case table’s page', () => {
    const tablePage = built.pages.find((p) => p.includes('Results by case'));
    expect(tablePage).toBeDefined();
    expect(built.pages[0]).toContain('FAIL.');
    for (const c of built.results.cases)
      for (const reason of caseFailures(project, c, 'si'))
        expect(tablePage).toContain(flat(reason));
    expect(tablePage).toContain('H: horizontal tension.');
  });

  it('names the road zone, not the general minimum, in the clearance key number', () => {
    const clearance = keyNumbers(project, built.results, 'si').find(
      (k) => k.label === 'Least clearance',
    );
    expect(clearance?.note).toContain('Delivery road');
    expect(built.pages[0]).toContain(flat(clearance?.note ?? 'missing'));
  });

  it('prints the longest case names whole in the key numbers (79 characters)', () => {
    expect(longName.length).toBeGreaterThanOrEqual(79);
    const tension = keyNumbers(project, built.results, 'si').find(
      (k) => k.label === 'Largest tension',
    );
    expect(tension?.note).toContain(longName);
    expect(built.pages[0]).toContain(flat(tension?.note ?? 'missing'));
    const worst = Math.max(...built.results.cases.map((c) => c.utilisation));
    expect(worst).toBeGreaterThan(1);
    expect(built.pages[0]).toContain(`${Math.round(worst * 100)} % of the working limit`);
  });
});

describe('names in any language', () => {
  const project = open({
    ...demo,
    title: 'Φωτισμός αυλής — oświetlenie dziedzińca — 中庭の照明',
    supports: [
      { ...demo.supports[0], label: 'Ściana kuchni (żółć, gęś)' },
      { ...demo.supports[1], label: '工房の壁' },
    ],
    cases: demo.cases.map((c, i) => (i === 0 ? { ...c, name: 'Καύσωνας ήλιος' } : c)),
  });
  let built: Built;
  beforeAll(async () => {
    built = await report(project);
  }, SLOW);

  it('prints Greek, Polish and Japanese text that reads back as typed', () => {
    for (const text of [project.title, 'Ściana kuchni (żółć, gęś)', '工房の壁', 'Καύσωνας ήλιος'])
      expect(built.all).toContain(text);
  });

  it('embeds its Noto fonts as subsets with a Unicode map', () => {
    const fonts = execFileSync('pdffonts', [built.path], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    });
    const noto = fonts.split('\n').filter((line) => /Noto/.test(line));
    expect(noto.some((line) => /NotoSansJP/.test(line))).toBe(true);
    expect(noto.length).toBeGreaterThanOrEqual(3);
    // pdffonts columns: name, type, encoding, emb, sub, uni (jsPDF lists its initial Helvetica,
    // which draws nothing: every string goes through the embedded fonts).
    for (const line of noto) expect(line).toMatch(/Identity-H\s+yes\s+(yes|no)\s+yes/);
  });
});

describe('paper, units and appendices', { timeout: SLOW }, () => {
  it('keeps the example to two pages on US Letter with a filled record', async () => {
    const project = open({
      ...demo,
      report: {
        reference: 'CY-014',
        client: 'Terrace café owner',
        preparedBy: { name: 'A. Fitter', date: '2026-11-30' },
        revisions: [
          { revision: 'A', date: '2026-11-20', description: 'First issue' },
          { revision: 'B', date: '2026-11-30', description: 'Walkway zone added' },
        ],
      },
    });
    const built = await report(project, { paper: 'letter' });
    expect(built.pages).toHaveLength(2);
    for (const page of built.pages) expect(page).toContain('Rev. B');
    expect(built.all).toContain('Walkway zone added');
    expect(built.all).toContain('A. Fitter');
  });

  it('prints imperial lengths in feet and inches and forces in pounds-force', async () => {
    const built = await report(open(demo), { units: 'imperial' });
    // Sag target 0.45 m = 17.717 in = 1 ft 5 3/4 in to the nearest eighth (1 in = 0.0254 m exactly).
    expect(built.pages[0]).toContain('sag 1 ft 5 3/4 in');
    expect(built.all).toMatch(/\d+ lbf/);
    expect(built.all).not.toMatch(/\d m\b/);
  });

  it('adds the ticked appendices after the record, each with its heading', async () => {
    const built = await report(open(demo), { appendix: true });
    expect(built.pages.length).toBeGreaterThan(2);
    const rest = built.pages.slice(2).join(' ');
    expect(rest).toContain('Appendix A. Set-up chart');
    expect(rest).toContain('Appendix B. Moving-load envelope');
    expect(rest).toContain('Appendix C. The project’s inputs in full');
    expect(rest).toContain('(installation)');
  });
});

it('reads its fixture as a failing design (guards the test above)', () => {
  const results = solveProject(open(failingFile));
  expect(results.cases.some((c) => c.utilisation > 1)).toBe(true);
  expect(
    readFileSync(new URL('./fixtures/report-failing.json', import.meta.url), 'utf8'),
  ).toContain('Delivery road');
});
