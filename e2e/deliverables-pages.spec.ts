/**
 * The report's pages as a person gets them from the browser, rendered with pdftoppm (poppler-
 * utils) to be looked at: the demo and a failing design on A4 and US Letter, and a design with a
 * moving load, an as-built measurement and every appendix. Each page carries the title, the
 * revision, "Page i of n" and the caution line; the demo stays two pages; the moving-load table,
 * the as-built section and the wires-considered appendix are there with their headers. With
 * REPORT_PAGES_DIR set, the PNGs are written there (doc/report-pages/ holds the committed ones).
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import failing from '../tests/fixtures/report-failing.json' with { type: 'json' };

const OUT = process.env.REPORT_PAGES_DIR;

function pdfPages(path: string): string[] {
  const info = execFileSync('pdfinfo', [path], { encoding: 'utf8' });
  const count = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
  return Array.from({ length: count }, (_, i) =>
    execFileSync('pdftotext', ['-raw', '-f', `${i + 1}`, '-l', `${i + 1}`, path, '-'], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'ignore'],
    })
      .replace(/\u00a0/g, ' ')
      .replace(/\s+/g, ' '),
  );
}

async function openFile(page: Page, project: unknown) {
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'project.sagwright.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(project)),
  });
}

async function makeReport(
  page: Page,
  paper: 'A4' | 'US Letter',
  appendices: string[] = [],
): Promise<string> {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name: 'PDF report…', exact: true }).click();
  await page.getByLabel('Project reference').fill('YD-2026-031');
  await page.getByLabel('Prepared by', { exact: true }).fill('A. Fitter');
  await page.getByLabel('Prepared by: date').fill('2026-11-30');
  await page.getByLabel('Checked by', { exact: true }).fill('B. Checker');
  await page.getByLabel('Revision', { exact: true }).fill('A');
  await page.getByLabel('Revision date').fill('2026-11-30');
  await page.getByLabel('What changed').fill('First issue');
  for (const name of appendices) await page.getByLabel(name).check();
  await page.getByLabel(paper).check();
  const downloadPromise = page.waitForEvent('download', { timeout: 120_000 });
  await page.getByRole('button', { name: 'Create PDF' }).click();
  const download = await downloadPromise;
  const path = test.info().outputPath(`${Math.random().toString(36).slice(2)}.pdf`);
  await download.saveAs(path);
  return path;
}

function render(path: string, stem: string) {
  const dir = OUT ?? test.info().outputPath('pages');
  mkdirSync(dir, { recursive: true });
  execFileSync('pdftoppm', ['-r', '80', '-png', path, join(dir, stem)]);
}

function expectFramed(pages: string[], title: string) {
  pages.forEach((text, i) => {
    expect(text).toContain(title);
    expect(text).toContain('Rev. A');
    expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
    expect(text).toContain('not for lifting or people');
  });
}

for (const paper of ['A4', 'US Letter'] as const) {
  const tag = paper === 'A4' ? 'a4' : 'letter';

  test(`demo report on ${paper}: two pages, each framed`, async ({ page }) => {
    test.slow();
    await page.goto('/');
    const path = await makeReport(page, paper);
    const pages = pdfPages(path);
    expect(pages).toHaveLength(2);
    expectFramed(pages, demo.title);
    render(path, `demo-${tag}`);
  });

  test(`failing design's report on ${paper}: reasons on the case table's page, each framed`, async ({
    page,
  }) => {
    test.slow();
    await page.goto('/');
    await openFile(page, failing);
    await expect(page.getByLabel('Project title')).toHaveValue(failing.title);
    const path = await makeReport(page, paper);
    const pages = pdfPages(path);
    expectFramed(pages, failing.title);
    const table = pages.find((p) => p.includes('Results by case')) ?? '';
    expect(table.match(/Fails: /g)?.length).toBe(4);
    render(path, `failing-${tag}`);
  });
}

test('a design with a moving load, an as-built measurement and every appendix', async ({
  page,
}) => {
  test.setTimeout(240_000);
  const project = structuredClone(demo) as typeof demo & { loads: unknown[] };
  project.loads.push({ type: 'moving', from: 2, to: 20, mass: 25, label: 'Pulley basket' });
  await page.goto('/');
  await openFile(page, project);
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  const form = page.getByRole('form', { name: 'As-built measurement' });
  await form.getByLabel('What was measured').selectOption({ label: 'Plucked frequency' });
  await form.getByLabel(/Measured value/).fill('1.6');
  await form.getByLabel(/Temperature/).fill('12');
  await form.getByRole('button', { name: 'Check as built' }).click();
  await expect(page.getByTestId('as-built-outcome')).toBeVisible({ timeout: 60_000 });
  const path = await makeReport(page, 'A4', [
    'Set-up chart (what to set on other days)',
    'Moving-load envelope, every check with the load’s worst position',
    'Wires considered (every wire that works, with its tension window)',
    'The project’s inputs in full',
  ]);
  const pages = pdfPages(path);
  expectFramed(pages, demo.title);
  const all = pages.join(' ');
  for (const text of [
    'Moving loads: the envelope of each case',
    'As built: the wire as measured on site',
    'a plucked frequency of 1.600 Hz',
    'Appendix A. Set-up chart',
    'Appendix B. Moving-load envelope',
    'Appendix C. Wires considered',
    'Appendix D. The project’s inputs in full',
    'every moving load included at its worst position',
  ])
    expect(all).toContain(text);
  // A continued table repeats its header: every page with wires listed names the columns.
  for (const text of pages)
    if (text.includes('Galvanised 7x19 6 mm')) expect(text).toContain('Lowest H that passes');
  render(path, 'moving-as-built-a4');
});
