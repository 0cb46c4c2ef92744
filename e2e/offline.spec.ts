/**
 * Offline use: once the app has been loaded, its service worker serves every built file, so with
 * the network cut it opens again (in the same tab, and in a browser closed and started again),
 * takes an edit, solves it and exports a PDF. The manifest names the app and its icons so it can
 * be installed.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type BrowserContext, chromium, expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };

/** The results' own status line (the design aids have one too). */
const solverStatus = (page: Page) =>
  page.getByRole('region', { name: 'Results', exact: true }).getByRole('status').first();

/** Loads the app and waits until its service worker has stored every file for offline use. */
async function loadForOffline(page: Page) {
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 30_000 });
  await expect(page.getByRole('region', { name: 'Offline use' })).toBeVisible({ timeout: 60_000 });
}

/** Edits the hot case, checks the new number is solved, and exports the PDF report. */
async function editSolveAndExport(page: Page, pdfPath: string) {
  const hotRow = () =>
    page
      .getByRole('table', { name: 'Results by case' })
      .getByRole('row')
      .filter({ hasText: demo.cases[0].name });
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 30_000 });
  const before = await hotRow().getByRole('cell').nth(4).textContent();
  await page.getByLabel(`${demo.cases[0].name} temperature (°C)`).fill('55');
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 30_000 });
  // Hotter wire, longer wire, more sag: the solver ran with the network cut.
  await expect(hotRow().getByRole('cell').nth(4)).not.toHaveText(before ?? '');
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
  );
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name: 'PDF report…', exact: true }).click();
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Create PDF' }).click();
  const download = await downloadPromise;
  await download.saveAs(pdfPath);
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
  expect(text.replace(/\s+/g, ' ')).toContain(demo.title);
}

test('with the network cut, a reload opens the app, solves an edit and exports a PDF', async ({
  page,
  context,
}, info) => {
  test.setTimeout(240_000);
  await loadForOffline(page);
  await context.setOffline(true);
  // The network really is gone: a file the app never built cannot be fetched.
  const missing = await page.evaluate(() =>
    fetch('/not-built.txt').then(
      (response) => response.status,
      () => 'failed',
    ),
  );
  expect(missing).not.toBe(200);
  await page.reload();
  await editSolveAndExport(page, info.outputPath('offline-report.pdf'));
});

test('the app opens offline after the browser was closed', async ({
  baseURL,
  launchOptions,
}, info) => {
  test.setTimeout(240_000);
  const profile = mkdtempSync(join(tmpdir(), 'sagwright-offline-'));
  const start = (offline: boolean): Promise<BrowserContext> =>
    chromium.launchPersistentContext(profile, {
      ...launchOptions,
      baseURL,
      offline,
      acceptDownloads: true,
    });
  try {
    const first = await start(false);
    await loadForOffline(first.pages()[0] ?? (await first.newPage()));
    await first.close();

    const again = await start(true);
    const page = again.pages()[0] ?? (await again.newPage());
    await page.goto('/');
    await editSolveAndExport(page, info.outputPath('reopened-report.pdf'));
    await again.close();
  } finally {
    rmSync(profile, { recursive: true, force: true, maxRetries: 10, retryDelay: 300 });
  }
});

test('the manifest names the app, starts at its page and offers icons to install it', async ({
  request,
}) => {
  const page = await (await request.get('/')).text();
  const href = /<link rel="manifest" href="([^"]+)"/.exec(page)?.[1];
  expect(href).toBeTruthy();
  const manifest = await (await request.get(href ?? '')).json();
  expect(manifest.name).toBe('Sagwright');
  expect(manifest.start_url).toBe('/');
  expect(manifest.display).toBe('standalone');
  const sizes = manifest.icons.map((icon: { sizes: string }) => icon.sizes);
  expect(sizes).toEqual(expect.arrayContaining(['192x192', '512x512']));
  for (const icon of manifest.icons) expect((await request.get(icon.src)).ok()).toBe(true);
});
