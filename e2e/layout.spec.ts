/**
 * The workbench on a phone (360×800), a tablet (820×1180) and a laptop (1366×768): nothing wider
 * than the screen, no accessibility violations found by axe (WCAG 2 A and AA rules), and below
 * about 1000 px the results first, the inputs one section at a time, controls at least 44 px
 * tall and the weather cases as cards. SCREENSHOTS=doc saves each view to doc/ for the docs.
 */
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };

/** The results' own status line (the design aids have one too). */
const solverStatus = (page: Page) =>
  page.getByRole('region', { name: 'Results', exact: true }).getByRole('status').first();

const VIEWS = [
  { name: 'phone', width: 360, height: 800 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'laptop', width: 1366, height: 768 },
] as const;

async function open(page: Page) {
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 30_000 });
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
    { timeout: 30_000 },
  );
}

async function pageWidth(page: Page) {
  return page.evaluate(() => document.documentElement.scrollWidth);
}

/**
 * Elements whose right edge passes the screen's, except inside a box that scrolls sideways on
 * purpose (wide tables) and text kept for screen readers only. A clipped plot note counts.
 */
async function stickingOut(page: Page) {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const scrolls = (el: Element) => {
      for (let e: Element | null = el.parentElement; e; e = e.parentElement) {
        const style = getComputedStyle(e);
        if (style.overflowX === 'auto' || style.overflowX === 'scroll') return true;
        if (e.classList.contains('visually-hidden')) return true;
      }
      return false;
    };
    return [...document.querySelectorAll('body *')]
      .filter((el) => {
        const box = el.getBoundingClientRect();
        return box.width > 0 && box.right > width + 1 && !scrolls(el);
      })
      .map((el) => `${el.tagName.toLowerCase()}.${el.getAttribute('class') ?? ''}`);
  });
}

async function top(page: Page, selector: string) {
  return (await page.locator(selector).first().boundingBox())?.y ?? Number.NaN;
}

for (const view of VIEWS) {
  test.describe(`${view.name} ${view.width}×${view.height}`, () => {
    test.use({ viewport: { width: view.width, height: view.height } });

    test('fits the screen and passes an axe scan', async ({ page }, info) => {
      test.setTimeout(180_000);
      await open(page);
      expect(await pageWidth(page)).toBeLessThanOrEqual(view.width);
      expect(await stickingOut(page)).toEqual([]);
      const scan = await new AxeBuilder({ page })
        .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
        .analyze();
      expect(scan.violations.map((v) => `${v.id}: ${v.nodes.length} × ${v.help}`)).toEqual([]);
      const path = info.outputPath(`workbench-${view.name}.png`);
      await page.screenshot({ path });
      if (process.env.SCREENSHOTS === 'doc')
        await page.screenshot({ path: `doc/workbench-${view.width}x${view.height}.png` });
    });
  });
}

test('on a phone the plot fits: its notes inside it, no legend rows, a folded key below', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 360, height: 800 });
  await open(page);
  const plot = page.getByRole('figure', { name: 'Sag plot' });
  const canvas = await plot.locator('.js-plotly-plot').boundingBox();
  if (!canvas) throw new Error('no plot drawn');
  const notes = await plot.locator('.infolayer .annotation').all();
  expect(notes.length).toBeGreaterThan(0);
  for (const note of notes) {
    const box = await note.boundingBox();
    expect(box?.x ?? -1).toBeGreaterThanOrEqual(canvas.x);
    expect((box?.x ?? 0) + (box?.width ?? Number.POSITIVE_INFINITY)).toBeLessThanOrEqual(
      canvas.x + canvas.width,
    );
  }
  // The legend's dozen rows would take the plot's height: the key below replaces it.
  await expect(plot.locator('.legend')).toHaveCount(0);
  const key = plot.getByText('Key to the plot');
  await key.click();
  for (const name of ['Installation', demo.cases[0].name, 'Ground', 'Supports'])
    await expect(plot.getByRole('listitem').filter({ hasText: name })).toBeVisible();
  expect(await pageWidth(page)).toBeLessThanOrEqual(360);
  expect(await stickingOut(page)).toEqual([]);
});

test.describe('phone and tablet', () => {
  for (const view of VIEWS.slice(0, 2)) {
    test(`${view.name}: results first, inputs by section with thumb-sized controls, cases as cards`, async ({
      page,
    }) => {
      test.setTimeout(180_000);
      await page.setViewportSize({ width: view.width, height: view.height });
      await open(page);
      // The verdict, plot and key numbers are above the inputs, the plot on the first screen.
      const plotTop = await top(page, 'figure.sag-plot');
      expect(plotTop).toBeLessThan(view.height);
      expect(await top(page, '[aria-label="Results"]')).toBeLessThan(
        await top(page, '[aria-label="Design inputs"]'),
      );
      // One section at a time: Span shows first; Weather shows its cases as cards.
      const sections = page.getByRole('navigation', { name: 'Input sections' });
      await expect(
        page.getByRole('heading', { name: 'Span', level: 2, exact: true }),
      ).toBeVisible();
      await expect(page.getByRole('heading', { name: 'Weather cases' })).toBeHidden();
      await sections.getByRole('button', { name: 'Weather' }).click();
      await expect(sections.getByRole('button', { name: 'Weather' })).toHaveAttribute(
        'aria-pressed',
        'true',
      );
      await expect(page.getByRole('heading', { name: 'Span', level: 2, exact: true })).toBeHidden();
      const hot = page.getByLabel(`${demo.cases[0].name} temperature (°C)`);
      await expect(hot).toBeVisible();
      // The field's label is shown on its card, and the card is no wider than the screen.
      await expect(page.getByText(`${demo.cases[0].name} temperature (°C)`)).toBeVisible();
      const box = await hot.boundingBox();
      expect(box?.height ?? 0).toBeGreaterThanOrEqual(44);
      expect((box?.x ?? 0) + (box?.width ?? 0)).toBeLessThanOrEqual(view.width);
      for (const button of await sections.getByRole('button').all())
        expect((await button.boundingBox())?.height ?? 0).toBeGreaterThanOrEqual(44);
      // An edit made on a card reaches the results.
      await hot.fill('44');
      await expect(solverStatus(page)).toHaveText('Up to date.');
      await expect(hot).toHaveValue('44');
      expect(await pageWidth(page)).toBeLessThanOrEqual(view.width);
      // Today's setting is one tap away.
      await sections.getByRole('link', { name: "Today's setting" }).click();
      await expect(page.getByRole('heading', { name: "Today's setting" })).toBeInViewport();
    });
  }
});

test('on a wide screen every input section shows and the section buttons do not', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1366, height: 768 });
  await open(page);
  await expect(page.getByRole('navigation', { name: 'Input sections' })).toBeHidden();
  for (const heading of ['Span', 'Wire', 'Hung loads', 'Installation', 'Weather cases', 'Limits'])
    await expect(
      page.getByRole('heading', { name: heading, level: 2, exact: true }),
    ).toBeAttached();
  await expect(page.getByRole('heading', { name: 'Weather cases' })).toBeVisible();
});

test.describe('laptop 1366×768: tables fit, the header stays put', () => {
  test.use({ viewport: { width: 1366, height: 768 } });

  /** How far a box's content reaches past its own width (0 when nothing is hidden sideways). */
  const overflow = (page: Page, selector: string) =>
    page
      .locator(selector)
      .evaluate((element) => element.scrollWidth - element.clientWidth)
      .then((px) => Math.max(0, px));

  test('the weather-case table fits its panel: Copy and Delete need no sideways scroll', async ({
    page,
  }) => {
    test.setTimeout(120_000);
    await open(page);
    const panel = page.locator('section.panel', {
      has: page.getByRole('heading', { name: 'Weather cases' }),
    });
    const table = panel.getByRole('table');
    expect(await table.evaluate((t) => t.scrollWidth)).toBeLessThanOrEqual(
      await panel.evaluate((p) => p.clientWidth),
    );
    const panelBox = await panel.boundingBox();
    for (const name of ['Duplicate Hot summer', 'Delete Hot summer']) {
      const box = await panel.getByRole('button', { name }).boundingBox();
      expect(box && panelBox && box.x + box.width).toBeLessThanOrEqual(
        (panelBox?.x ?? 0) + (panelBox?.width ?? 0),
      );
    }
    expect(await overflow(page, 'section.inputs')).toBe(0);
  });

  test("the fixing table's last column shows without a sideways scroll", async ({ page }) => {
    test.setTimeout(120_000);
    await open(page);
    for (const units of ['Metric (SI)', 'Imperial']) {
      await page.getByRole('radio', { name: units }).check();
      const table = page.getByRole('table', { name: 'Pull on the fixings' });
      await expect(table.getByRole('columnheader', { name: 'End fitting' })).toBeAttached();
      const scroll = page.locator('.table-scroll', { has: table });
      expect(
        await scroll.evaluate((s) => s.scrollWidth - s.clientWidth),
        units,
      ).toBeLessThanOrEqual(0);
    }
  });

  test('a status message from the file menu does not move the header or what is below it', async ({
    page,
  }) => {
    test.setTimeout(120_000);
    await open(page);
    const header = page.locator('header.app-header');
    const before = await header.boundingBox();
    const cautionsTop = await top(page, '[aria-label="Cautions"]');
    const downloaded = page.waitForEvent('download');
    await page.getByRole('button', { name: 'File and export' }).click();
    await page.getByRole('button', { name: 'Save file', exact: true }).click();
    await downloaded;
    const saved = page.getByRole('status').filter({ hasText: 'The project file was saved.' });
    await expect(saved).toBeVisible();
    expect(await header.boundingBox()).toEqual(before);
    expect(await top(page, '[aria-label="Cautions"]')).toBe(cautionsTop);
    // Shown in full, under the menu button, inside the window.
    const box = await saved.boundingBox();
    expect(box && box.x >= 0 && box.x + box.width <= 1366).toBe(true);
  });
});
