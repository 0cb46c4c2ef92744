/**
 * The client view and the printed page in a real Chromium. The client view must fill the
 * window, show the title, summary line and key numbers (checked against the core's
 * solveProject() run here in Node) and the plot with large labels, offer nothing to edit, keep
 * the keyboard inside it, and return on Escape or its button. Printing (print media, and a real
 * PDF from Chromium's print path read back with pdftotext from poppler-utils) leaves out the
 * editing panels and keeps the title, results, plot and cautions.
 */
import { execFileSync } from 'node:child_process';
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type ProjectResults, solveProject, validateProject } from '../src/core/index.ts';

test.use({ viewport: { width: 1440, height: 900 } });

function demoResults(): ProjectResults {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return solveProject(checked.project);
}

async function openDemo(page: Page) {
  await page.goto('/');
  await expect(page.getByRole('region', { name: 'Results' }).getByRole('status')).toHaveText(
    'Up to date.',
  );
}

async function openClientView(page: Page) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name: 'Client view', exact: true }).click();
  const view = page.getByRole('dialog', { name: 'Client view' });
  await expect(view.getByRole('img', { name: 'Sag plot for the client' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
  );
  return view;
}

/** Presses Tab and reports whether the focus stayed inside `scope` (or left the page). */
async function tabStaysInside(page: Page, scope: ReturnType<Page['getByRole']>, presses: number) {
  for (let i = 0; i < presses; i++) {
    await page.keyboard.press('Tab');
    const inside = await scope.evaluate((el) => el.contains(document.activeElement));
    const onPage = await page.evaluate(() => document.activeElement !== document.body);
    if (onPage && !inside) return false;
  }
  return true;
}

test('the client view fills the window with the title, summary, key numbers and a large plot, and nothing to edit', async ({
  page,
}) => {
  test.slow(); // ends with an axe scan, slow on a busy 2-core machine
  await openDemo(page);
  const results = demoResults();
  const workbenchAxisPx = await page
    .getByRole('figure', { name: 'Sag plot' })
    .locator('.g-xtitle text')
    .evaluate((t) => Number.parseFloat(getComputedStyle(t).fontSize));
  const view = await openClientView(page);

  expect(await view.boundingBox()).toEqual({ x: 0, y: 0, width: 1440, height: 900 });
  const heading = view.getByRole('heading', { name: demo.title });
  await expect(heading).toBeVisible();
  const headingPx = await heading.evaluate((h) => Number.parseFloat(getComputedStyle(h).fontSize));
  expect(headingPx).toBeGreaterThanOrEqual(32);

  // The summary and key numbers carry the core's governing cases and values (SI display, the
  // workbench's rule: forces from 1 kN in kN to two decimals, lengths to the millimetre).
  const tensionCase = results.cases.find((c) => c.name === results.governing.tension);
  const clearanceCase = results.cases.find((c) => c.name === results.governing.clearance);
  if (!tensionCase || !clearanceCase) throw new Error('core named no governing case');
  expect(tensionCase.maxTension).toBeGreaterThanOrEqual(1000);
  const largestTension = `${(tensionCase.maxTension / 1000).toFixed(2)} kN`;
  const leastClearance = `${clearanceCase.clearance.toFixed(3)} m`;
  const summary = view.getByText(/cases pass/);
  await expect(summary).toContainText(`${largestTension} (${tensionCase.name})`);
  await expect(summary).toContainText(`${leastClearance} (${clearanceCase.name})`);
  const numbers = view.getByRole('definition');
  await expect(numbers.filter({ hasText: `${results.unstressedLength.toFixed(3)} m` })).toHaveCount(
    1,
  );
  await expect(numbers.filter({ hasText: largestTension })).not.toHaveCount(0);
  await expect(numbers.filter({ hasText: leastClearance })).toHaveCount(1);

  // Large labels: axis titles of at least 18 px and larger than on the workbench's plot.
  const axisTitlePx = await view
    .locator('.g-xtitle text')
    .evaluate((t) => Number.parseFloat(getComputedStyle(t).fontSize));
  expect(axisTitlePx).toBeGreaterThanOrEqual(18);
  expect(axisTitlePx).toBeGreaterThan(workbenchAxisPx);
  const plotBox = await view.getByRole('img', { name: 'Sag plot for the client' }).boundingBox();
  expect(plotBox?.height ?? 0).toBeGreaterThanOrEqual(0.4 * 900);
  await expect(view.getByRole('note')).toContainText('not for lifting or people');

  // Nothing to edit: no inputs of any kind, one button, and the workbench behind is inert.
  await expect(view.locator('input, select, textarea, [contenteditable="true"]')).toHaveCount(0);
  await expect(view.getByRole('button')).toHaveCount(1);
  await expect(view.getByRole('button', { name: 'Close client view' })).toBeFocused();
  expect(await tabStaysInside(page, view, 4)).toBe(true);

  const scan = await new AxeBuilder({ page }).include('dialog').analyze();
  const serious = scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(', ')}`)).toEqual([]);
});

test('Escape or the Close button returns to the workbench with the focus on the menu', async ({
  page,
}) => {
  await openDemo(page);
  const menuButton = page.getByRole('button', { name: 'File and export' });
  const view = await openClientView(page);
  await page.keyboard.press('Escape');
  await expect(view).toBeHidden();
  await expect(menuButton).toBeFocused();
  await expect(page.getByRole('region', { name: 'Design inputs' })).toBeVisible();

  await openClientView(page);
  await view.getByRole('button', { name: 'Close client view' }).click();
  await expect(view).toBeHidden();
  await expect(menuButton).toBeFocused();
});

test('the printed page leaves out the editing panels and keeps title, results, plot and cautions', async ({
  page,
}, info) => {
  await openDemo(page);
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
  );
  // includeHidden keeps these found once print CSS hides them, so "hidden" cannot mean "gone".
  const onScreenOnly = [
    page.getByRole('region', { name: 'Design inputs', includeHidden: true }),
    page.getByRole('toolbar', { name: 'Workbench tools', includeHidden: true }),
    page.getByRole('button', { name: 'File and export', includeHidden: true }),
  ];
  for (const part of onScreenOnly) await expect(part).toBeVisible();
  await page.emulateMedia({ media: 'print' });
  for (const part of onScreenOnly) {
    await expect(part).toHaveCount(1);
    await expect(part).toBeHidden();
  }
  await expect(page.getByText(demo.title, { exact: true })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Results by case' })).toBeVisible();
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Cautions' })).toBeVisible();
  await page.emulateMedia({ media: 'screen' });
  for (const part of onScreenOnly) await expect(part).toBeVisible();
  await expect(page.getByText(demo.title, { exact: true })).toBeHidden();

  // Chromium's own print path (print media again): the text of the PDF it makes.
  await page.emulateMedia({ media: null });
  const pdfPath = info.outputPath('printed.pdf');
  await page.pdf({ path: pdfPath, format: 'A4' });
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
  const flat = text.replace(/\s+/g, ' ');
  expect(flat).toContain(demo.title);
  for (const c of ['Installation', ...demo.cases.map((k) => k.name)]) expect(flat).toContain(c);
  expect(flat).toContain('Distance along the span (m)');
  expect(flat).toContain('not for lifting or people');
  // Labels of the editing panels (doc/ui.md groups) are not on paper.
  for (const label of ['Safety factor on breaking load', 'Weather cases', 'Ground line'])
    expect(flat).not.toContain(label);
  expect(flat).not.toContain('File and export');
});

test('printing with the client view open prints the client view alone', async ({ page }) => {
  await openDemo(page);
  const view = await openClientView(page);
  await page.emulateMedia({ media: 'print' });
  await expect(view).toBeVisible();
  await expect(view.getByRole('heading', { name: demo.title })).toBeVisible();
  await expect(view.getByRole('note')).toBeVisible();
  const close = view.getByRole('button', { name: 'Close client view', includeHidden: true });
  await expect(close).toHaveCount(1);
  await expect(close).toBeHidden();
  // The live plot is drawn at the window's pixel width; paper gets an SVG image of it that
  // scales to the page instead.
  const live = view.getByRole('img', { name: 'Sag plot for the client', includeHidden: true });
  await expect(live).toHaveCSS('display', 'none');
  const printed = view.locator('img');
  await expect(printed).toBeVisible();
  expect(await printed.getAttribute('src')).toMatch(/^data:image\/svg\+xml/);
  const [imageBox, viewBox] = [await printed.boundingBox(), await view.boundingBox()];
  expect(imageBox?.width).toBeCloseTo(viewBox?.width ?? 0, 0);
  // includeHidden: the workbench is inert behind the modal, so only CSS decides what prints.
  const results = page.getByRole('region', { name: 'Results', includeHidden: true });
  const cautions = page.getByRole('complementary', { name: 'Cautions', includeHidden: true });
  await expect(results).toHaveCount(1);
  await expect(results).toBeHidden();
  await expect(cautions).toBeHidden();
  await page.emulateMedia({ media: 'screen' });
  await expect(results).toBeVisible();
});
