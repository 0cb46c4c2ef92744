/**
 * The report's site sections and design appendices, built in Node and read back with pdftotext
 * (poppler-utils): the as-built check (what was measured, the cut length it implies, every case
 * again) and the moving-load envelope (per case: largest tension, least clearance and where the
 * load was), each number equal to the core's as the report formats it; the wires considered
 * (the chooser's list) and the detailed moving-load envelope as appendices; a table never cut
 * from its header, and every page with its running head and foot.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import {
  type AsBuiltResult,
  chooseWires,
  type MovingLoad,
  type Project,
  type ProjectResults,
  solveAsBuilt,
  solveProject,
  validateProject,
  type WireChoice,
} from '../src/core/index.ts';
import { designReport, windowParagraphs } from '../src/deliverables/designContent.ts';
import {
  formatForceShort,
  formatLength,
  formatQuantity,
} from '../src/deliverables/displayUnits.ts';
import { type AppendixChoice, NO_APPENDIX } from '../src/deliverables/pdfAppendix.ts';
import { buildPdfReport, type PaperSize } from '../src/deliverables/pdfReport.ts';
import {
  AS_BUILT_HEADING,
  asBuiltParagraphs,
  MOVING_HEADING,
} from '../src/deliverables/pdfSiteSections.ts';
import { keyNumbers } from '../src/deliverables/reportContent.ts';
import { loadExample } from './helpers/designProjects.ts';
import { nodeFontSource } from './helpers/reportFonts.ts';

const dir = mkdtempSync(join(tmpdir(), 'sagwright-site-report-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const SLOW = 180_000;

const flat = (text: string) => text.replace(/\u00a0/g, ' ').replace(/\s+/g, ' ');

interface Built {
  pages: string[];
  all: string;
}

async function report(
  project: Project,
  results: ProjectResults,
  options: {
    paper?: PaperSize;
    appendix?: Partial<AppendixChoice>;
    asBuilt?: AsBuiltResult | null;
    wireChoices?: WireChoice[];
  } = {},
): Promise<Built> {
  const doc = await buildPdfReport(project, results, {
    paper: options.paper ?? 'a4',
    unitSystem: 'si',
    generatedAt: new Date('2026-12-02T09:00:00Z'),
    plot: null,
    plotAspect: 2.1,
    fonts: nodeFontSource,
    appVersion: '0.1.0',
    appendix: { ...NO_APPENDIX, ...options.appendix },
    asBuilt: options.asBuilt,
    wireChoices: options.wireChoices,
  });
  const path = join(dir, `${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(path, Buffer.from(doc.output('arraybuffer')));
  const pages = Array.from({ length: doc.getNumberOfPages() }, (_, i) =>
    flat(
      execFileSync('pdftotext', ['-raw', '-f', `${i + 1}`, '-l', `${i + 1}`, path, '-'], {
        encoding: 'utf8',
        stdio: ['ignore', 'pipe', 'ignore'],
      }),
    ),
  );
  return { pages, all: pages.join(' ') };
}

function expectFramed(project: Project, built: Built) {
  built.pages.forEach((page, i) => {
    expect(page).toContain(project.title);
    expect(page).toContain(`Page ${i + 1} of ${built.pages.length}`);
    expect(page).toContain('not for lifting or people');
  });
}

/** The shipped courtyard with a 25 kg basket hauled along most of the span (invented). */
function courtyardWithBasket(): Project {
  const p = structuredClone(loadExample('examples/courtyard-lights.json'));
  const basket: MovingLoad = { type: 'moving', from: 2, to: 20, mass: 25, label: 'Pulley basket' };
  p.loads.push(basket);
  const checked = validateProject(p);
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.project;
}

describe('as-built check in the report', () => {
  const project = loadExample('examples/courtyard-lights.json');
  const results = solveProject(project);
  // A sag 8 % deeper than designed, read at 20 °C at the set-up point: a longer cut.
  const sag = results.cases[0].sag * 1.08;
  const asBuilt = solveAsBuilt(project, { temperature: 20, kind: 'sag', value: sag }, results);

  it(
    'prints what was measured, the tension and cut length it implies and each case',
    async () => {
      expect(asBuilt.solved).toBe(true);
      const built = await report(project, results, { asBuilt });
      expect(built.all).toContain(AS_BUILT_HEADING);
      const page = built.pages.find((p) => p.includes(AS_BUILT_HEADING)) ?? '';
      expect(page).toContain(`sag of ${flat(formatLength('si', sag))}`);
      expect(page).toContain('at 20°C');
      expect(page).toContain(
        flat(formatQuantity('si', 'force', asBuilt.measurement.horizontalTension)),
      );
      expect(page).toContain(
        `cut length as built of ${flat(formatLength('si', asBuilt.unstressedLength))}`,
      );
      const mm = Math.abs(asBuilt.lengthDifference * 1000).toFixed(1);
      expect(page).toContain(`${mm} mm ${asBuilt.lengthDifference > 0 ? 'longer' : 'shorter'}`);
      for (const text of asBuiltParagraphs(project, asBuilt, 'si'))
        expect(built.all).toContain(flat(text));
      // Every case's row: its name, largest tension and verdict as built, on the section's page.
      for (const c of asBuilt.cases) {
        const row = `${c.name}`;
        expect(page).toContain(row);
        expect(page).toContain(flat(formatForceShort('si', c.maxTension)));
      }
      expect(page).toContain(
        asBuilt.ok
          ? 'every case passes with the wire as measured'
          : 'fail with the wire as measured',
      );
      expectFramed(project, built);
    },
    SLOW,
  );

  it(
    'is left out when nothing was measured; the demo stays two pages',
    async () => {
      const built = await report(project, results);
      expect(built.all).not.toContain(AS_BUILT_HEADING);
      expect(built.pages).toHaveLength(2);
    },
    SLOW,
  );

  it(
    'a measurement the wire cannot reach prints why, and no case table',
    async () => {
      const impossible = solveAsBuilt(
        project,
        { temperature: 20, kind: 'horizontalTension', value: 1 },
        results,
      );
      const built = await report(project, results, { asBuilt: impossible });
      const text = asBuiltParagraphs(project, impossible, 'si');
      for (const t of text) expect(built.all).toContain(flat(t));
    },
    SLOW,
  );
});

describe('moving loads in the report', () => {
  const project = courtyardWithBasket();
  const results = solveProject(project);
  const x0 = project.supports[0].x;

  it(
    'the envelope table holds every case’s numbers as the core gives them',
    async () => {
      const built = await report(project, results);
      const page = built.pages.find((p) => p.includes(MOVING_HEADING)) ?? '';
      expect(page).not.toBe('');
      let rows = 0;
      for (const c of results.cases) {
        for (const m of c.movingLoads ?? []) {
          rows++;
          const cells = [
            c.name,
            m.label,
            formatForceShort('si', m.maxTension),
            formatLength('si', m.maxTensionAt - x0, true),
            formatLength('si', m.clearance, true),
            formatLength('si', m.clearanceAt - x0, true),
            m.ok ? 'Pass' : 'Fail',
          ].map(flat);
          expect(page).toContain(cells.join(' '));
        }
      }
      expect(rows).toBeGreaterThanOrEqual(3);
      expect(page).toContain('not for lifting or carrying people');
      expectFramed(project, built);
    },
    SLOW,
  );

  it(
    'a case failed by its moving-load envelope says why beside its row and in the verdict',
    async () => {
      const failed = results.cases.filter((c) => (c.movingLoads ?? []).some((m) => !m.ok));
      expect(failed.length).toBeGreaterThan(0);
      const built = await report(project, results);
      const table = built.pages.find((p) => p.includes('Results by case')) ?? '';
      let checked = 0;
      for (const c of failed) {
        for (const m of c.movingLoads ?? []) {
          if (m.utilisation <= 1) continue;
          checked++;
          const words = flat(
            `with ${m.label} at ${formatLength('si', m.maxTensionAt - x0)} from Kitchen wall bracket: tension ${formatForceShort('si', m.maxTension)} is ${Math.round(100 * m.utilisation)} % of the working limit`,
          );
          expect(table).toContain(words);
          expect(built.pages[0]).toContain(`${c.name} fails: ${words}`);
        }
      }
      expect(checked).toBeGreaterThan(0);
    },
    SLOW,
  );

  it(
    'the appendix lists each check of each envelope with the load’s worst position',
    async () => {
      const built = await report(project, results, { appendix: { movingLoads: true } });
      const start = built.pages.findIndex((p) => p.includes('Appendix A. Moving-load envelope'));
      expect(start).toBeGreaterThan(0);
      const rest = built.pages.slice(start).join(' ');
      for (const c of results.cases) {
        for (const m of c.movingLoads ?? []) {
          expect(rest).toContain(
            flat(
              `${formatForceShort('si', m.maxTension)} (${Math.round(100 * m.utilisation)} % of limit) ${formatLength('si', m.maxTensionAt - x0, true)}`,
            ),
          );
          for (const z of m.zoneClearances)
            expect(rest).toContain(
              flat(
                `Clearance over ${z.label} ${formatLength('si', z.clearance, true)} (needs ${formatLength('si', z.required, true)}) ${formatLength('si', z.at - x0, true)}`,
              ),
            );
        }
      }
      expectFramed(project, built);
    },
    SLOW,
  );
});

describe('key numbers with a moving load', () => {
  it('the largest tension and least clearance are the envelope’s when it is worse', () => {
    const project = courtyardWithBasket();
    const results = solveProject(project);
    const moving = results.cases.flatMap((c) => c.movingLoads ?? []);
    const staticMax = Math.max(...results.cases.map((c) => c.maxTension));
    const movingMax = Math.max(...moving.map((m) => m.maxTension));
    expect(movingMax).toBeGreaterThan(staticMax);
    const numbers = keyNumbers(project, results, 'si');
    const tension = numbers.find((n) => n.label === 'Largest tension');
    expect(tension?.value).toBe(formatForceShort('si', movingMax));
    expect(tension?.note).toContain('Pulley basket at');
    const margins = moving.flatMap((m) =>
      m.zoneClearances.map((z) => ({ margin: z.clearance - z.required, value: z.clearance })),
    );
    const least = margins.reduce((a, b) => (b.margin < a.margin ? b : a));
    const clearance = numbers.find((n) => n.label === 'Least clearance');
    expect(clearance?.value).toBe(formatLength('si', least.value));
  });
});

describe('wires considered appendix', () => {
  const project = loadExample('examples/courtyard-lights.json');
  const results = solveProject(project);
  const choices = chooseWires(project, undefined, results.mesh.refinement);

  for (const paper of ['a4', 'letter'] as const) {
    it(
      `lists every wire that works with its window and suggested tension (${paper})`,
      async () => {
        const built = await report(project, results, {
          paper,
          appendix: { wireChoices: true },
          wireChoices: choices,
        });
        expect(choices.length).toBeGreaterThan(10);
        const start = built.pages.findIndex((p) => p.includes('Appendix A. Wires considered'));
        expect(start).toBe(2);
        const rest = built.pages.slice(start).join(' ');
        for (const c of choices) {
          expect(rest).toContain(flat(c.label));
          expect(rest).toContain(
            flat(
              `${c.low === null ? 'no clearance limit' : formatForceShort('si', c.low)} ${formatForceShort('si', c.high)} ${formatForceShort('si', c.suggestedHorizontalTension)}`,
            ),
          );
        }
        expect(rest).toContain('H is the installation horizontal tension at 15°C');
        expect(rest).toContain('the square root of lowest × highest');
        // A continued table repeats its header on each page it reaches.
        for (const page of built.pages.slice(start))
          if (choices.some((c) => page.includes(c.label)))
            expect(page).toContain('Lowest H that passes');
        expectFramed(project, built);
      },
      SLOW,
    );
  }
});

describe('the window in the report over a pulley names whose tension it is', () => {
  it(
    'the largest span’s, named; the plain single span names none',
    () => {
      const terrace = loadExample('examples/terrace-corner-pulley.json');
      const results = solveProject(terrace);
      const d = designReport(terrace, results, null);
      const text = windowParagraphs(terrace, results, d, 'si').join(' ');
      const spans = results.cases[0].spans.map((s) => s.horizontalTension);
      const largest = Math.max(...spans);
      spans.forEach((H, j) => {
        const name = `${terrace.supports[j].label} – ${terrace.supports[j + 1].label}`;
        if (H >= largest * (1 - 1e-9)) expect(text).toContain(name);
        else expect(text).not.toContain(name);
      });
      expect(text).toContain('the largest');
      const demo = loadExample('examples/courtyard-lights.json');
      const demoResults = solveProject(demo);
      const plain = windowParagraphs(
        demo,
        demoResults,
        designReport(demo, demoResults, null),
        'si',
      );
      expect(plain[0]).toMatch(/^Installation horizontal tension at 15°C/);
    },
    SLOW,
  );
});
