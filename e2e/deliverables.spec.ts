/**
 * Deliverables in a real Chromium: the PDF report (text read back with pdftotext from
 * poppler-utils, pages rendered with pdftoppm) of the demo, a failing design and names in Greek,
 * Polish and Japanese, the PNG export's pixel size, a refused file
 * that leaves the project unchanged, and a share link that does not overwrite the autosave.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { expect, type Page, test } from '@playwright/test';
import LZString from 'lz-string';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { solveProject, validateProject } from '../src/core/index.ts';
import failing from '../tests/fixtures/report-failing.json' with { type: 'json' };

async function exportItem(page: Page, name: string) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name, exact: true }).click();
}

/** Each page's text in reading order, whitespace made single (pdftotext -raw). */
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

async function createReport(page: Page, path: string) {
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Create PDF' }).click();
  const download = await downloadPromise;
  await download.saveAs(path);
  return download.suggestedFilename();
}

async function openFile(page: Page, project: unknown, name: string) {
  await page.getByLabel('Project file to open').setInputFiles({
    name,
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(project)),
  });
}

test("the demo report: two pages, the decision first, the core's fixing loads, the record kept in the file", async ({
  page,
}, info) => {
  test.slow();
  await page.goto('/');
  await exportItem(page, 'PDF report…');
  await page.getByLabel('Project reference').fill('CY-2026-014');
  await page.getByLabel('Client').fill('Terrace café owner');
  await page.getByLabel('Site').fill('Rear courtyard, north wall');
  await page.getByLabel('Prepared by', { exact: true }).fill('A. Fitter');
  await page.getByLabel('Prepared by: date').fill('2026-11-30');
  await page.getByLabel('Revision', { exact: true }).fill('A');
  await page.getByLabel('Revision date').fill('2026-11-30');
  await page.getByLabel('What changed').fill('First issue');
  await page.getByLabel('A4').check();
  const pdfPath = info.outputPath('report.pdf');
  expect(await createReport(page, pdfPath)).toBe('courtyard-festoon-lights-report.pdf');

  const pages = pdfPages(pdfPath);
  expect(pages).toHaveLength(2);
  for (const [i, text] of pages.entries()) {
    expect(text).toContain(demo.title);
    expect(text).toContain('Rev. A');
    expect(text).toContain(`Page ${i + 1} of 2`);
    expect(text).toContain('not for lifting or people');
  }
  const [first, second] = pages;
  expect(first).toContain('PASS. Every case passes every check.');
  expect(first).toContain('Set on the day at 15°C');
  expect(first).toContain('Terrace café owner');
  // Axis titles come from the vector plot: text in the PDF, not pixels.
  expect(first).toContain('Distance along the span (m)');
  expect(first).toContain('Height above ground datum (m)');
  expect(first).toContain('Results by case');
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo invalid');
  const results = solveProject(checked.project);
  const n = (value: number) => `${value.toFixed(0)} N`;
  for (const c of results.cases)
    for (const r of c.supports)
      expect(second).toContain(
        `${c.name} ${n(Math.abs(r.horizontal))} ${n(r.vertical)} ${n(Math.abs(r.lateral))} ${n(r.resultant)} ${r.angle.toFixed(1)}°`,
      );
  for (const text of [
    'Design basis',
    '[M] from memory',
    'A. Fitter',
    'First issue',
    'File fingerprint',
  ])
    expect(second).toContain(text);
  expect(second).toContain('licensed electrician');

  // The record went into the project file: the next report starts from it.
  await exportItem(page, 'PDF report…');
  await expect(page.getByLabel('Project reference')).toHaveValue('CY-2026-014');
  await expect(page.getByText('last: A')).toBeVisible();

  execFileSync('pdftoppm', ['-r', '110', '-png', pdfPath, info.outputPath('report-page')]);
  expect(readFileSync(info.outputPath('report-page-1.png')).subarray(1, 4).toString()).toBe('PNG');
});

test("a failing design's report gives the reasons beside the case table, on US Letter in feet and pounds", async ({
  page,
}, info) => {
  test.slow();
  await page.goto('/');
  await openFile(page, failing, 'failing.sagwright.json');
  await expect(page.getByLabel('Project title')).toHaveValue(failing.title);
  await page.getByLabel('Imperial').check();
  await exportItem(page, 'PDF report…');
  await page.getByLabel('US Letter').check();
  const pdfPath = info.outputPath('failing-report.pdf');
  await createReport(page, pdfPath);
  const pages = pdfPages(pdfPath);
  expect(pages[0]).toContain('FAIL.');
  expect(pages[0]).toContain('Delivery road');
  expect(pages[0]).toContain(failing.cases[1].name);
  // The case table's page (page 1, or page 2 when the decision fills page 1) holds every reason.
  const first = pages.find((p) => p.includes('Results by case')) ?? '';
  expect(first).toMatch(/\d+ ft \d+( \d\/\d)? in/);
  expect(first).toMatch(/\d lbf/);
  expect(first).toContain('H: horizontal tension.');
  // Every failing row's findings on the case table's page.
  const fails = first.match(/Fails: /g) ?? [];
  expect(fails.length).toBe(4);
  execFileSync('pdftoppm', ['-r', '110', '-png', pdfPath, info.outputPath('failing-page')]);
});

test('Greek, Polish and Japanese names print and read back from the PDF', async ({
  page,
}, info) => {
  test.slow();
  await page.goto('/');
  const title = 'Φωτισμός αυλής — oświetlenie dziedzińca — 中庭の照明';
  await openFile(
    page,
    {
      ...demo,
      title,
      supports: [
        { ...demo.supports[0], label: 'Ściana kuchni' },
        { ...demo.supports[1], label: '工房の壁' },
      ],
    },
    'languages.sagwright.json',
  );
  await expect(page.getByLabel('Project title')).toHaveValue(title);
  await exportItem(page, 'PDF report…');
  const pdfPath = info.outputPath('languages.pdf');
  await createReport(page, pdfPath);
  const all = pdfPages(pdfPath).join(' ');
  for (const text of [title, 'Ściana kuchni', '工房の壁']) expect(all).toContain(text);
});

test('PNG export at 2× has the requested pixel size', async ({ page }, info) => {
  await page.goto('/');
  const downloadPromise = page.waitForEvent('download');
  await exportItem(page, 'Plot as PNG, 2× for slides');
  const download = await downloadPromise;
  const path = info.outputPath('plot.png');
  await download.saveAs(path);
  const png = readFileSync(path);
  // PNG IHDR: width and height as big-endian 32-bit integers at bytes 16 and 20 (PNG spec §11.2.2).
  expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([2400, 1400]);
});

test('a newer-version file is refused with its field path and changes nothing', async ({
  page,
}) => {
  await page.goto('/');
  const title = page.getByLabel('Project title');
  await expect(title).toHaveValue(demo.title);
  const hostile = JSON.stringify({ ...demo, version: 3, title: 'Should not open' });
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'newer.sagwright.json',
    mimeType: 'application/json',
    buffer: Buffer.from(hostile),
  });
  const alert = page.getByRole('alert').filter({ hasText: 'was not opened' });
  await expect(alert).toContainText('version: 3 is newer than this Sagwright reads (2)');
  await expect(title).toHaveValue(demo.title);
});

test('a share link shows the shared project as text and "Go back to mine" restores the autosave', async ({
  page,
}) => {
  await page.goto('/');
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  const before = await page.evaluate(() => localStorage.getItem('sagwright:autosave'));
  const sharedTitle = '<img src=x onerror="window.__hit=1"> Shared yard';
  const packed = LZString.compressToEncodedURIComponent(
    JSON.stringify({ ...demo, title: sharedTitle }),
  );
  // Opened by a fresh load (the link is cleared from the address as soon as it is read).
  await page.goto('about:blank');
  await page.goto(`/#project=${packed}`);
  const banner = page.getByRole('region', { name: 'Shared project' });
  await expect(banner).toContainText(sharedTitle);
  await expect(page.getByLabel('Project title')).toHaveValue(sharedTitle);
  // The link left the address bar as soon as it was read.
  expect(page.url()).not.toContain('#project=');
  expect(
    await page.evaluate(() => (window as unknown as { __hit?: number }).__hit),
  ).toBeUndefined();
  expect(await page.evaluate(() => localStorage.getItem('sagwright:autosave'))).toBe(before);
  await banner.getByRole('button', { name: 'Go back to mine' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  // Opened fresh from the link, a reload then shows the person's own work, not the link again.
  await page.goto(`/#project=${packed}`);
  await expect(page.getByLabel('Project title')).toHaveValue(sharedTitle);
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  await expect(banner).toBeHidden();
});
