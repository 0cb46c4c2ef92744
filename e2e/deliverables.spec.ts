/**
 * Deliverables in a real Chromium: the PDF report (text read back with pdftotext from
 * poppler-utils, page 1 rendered with pdftoppm), the PNG export's pixel size, a refused file
 * that leaves the project unchanged, and a share link that does not overwrite the autosave.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { expect, type Page, test } from '@playwright/test';
import LZString from 'lz-string';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };

async function exportItem(page: Page, name: string) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name, exact: true }).click();
}

test('PDF report carries the title, case names, axis labels, cautions and page numbers', async ({
  page,
}, info) => {
  await page.goto('/');
  await exportItem(page, 'PDF report…');
  await page.getByLabel('Client').fill('Terrace café owner');
  await page.getByLabel('Site').fill('Rear courtyard, north wall');
  await page.getByLabel('A4').check();
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Create PDF' }).click();
  const download = await downloadPromise;
  expect(download.suggestedFilename()).toBe('courtyard-festoon-lights-report.pdf');
  const pdfPath = info.outputPath('report.pdf');
  await download.saveAs(pdfPath);

  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
  const flat = text.replace(/\s+/g, ' ');
  expect(flat).toContain(demo.title);
  expect(flat).toContain('Terrace café owner');
  for (const c of ['Installation', ...demo.cases.map((k) => k.name)]) expect(flat).toContain(c);
  // Axis titles come from the vector plot: they are text in the PDF, not pixels.
  expect(flat).toContain('Distance along the span (m)');
  expect(flat).toContain('Height above ground datum (m)');
  expect(flat).toContain('not for lifting or people');
  expect(flat).toContain('licensed electrician');
  expect(flat).toMatch(/Page 1 of \d/);
  expect(flat).toContain('PASS');

  execFileSync('pdftoppm', ['-r', '110', '-png', pdfPath, info.outputPath('report-page')]);
  const firstPage = readFileSync(info.outputPath('report-page-1.png'));
  expect(firstPage.subarray(1, 4).toString()).toBe('PNG');
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
  await page.goto(`/#project=${packed}`);
  await page.reload();
  const banner = page.getByRole('region', { name: 'Shared project' });
  await expect(banner).toContainText(sharedTitle);
  await expect(page.getByLabel('Project title')).toHaveValue(sharedTitle);
  expect(
    await page.evaluate(() => (window as unknown as { __hit?: number }).__hit),
  ).toBeUndefined();
  expect(await page.evaluate(() => localStorage.getItem('sagwright:autosave'))).toBe(before);
  await banner.getByRole('button', { name: 'Go back to mine' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  expect(page.url()).not.toContain('#project=');
});
