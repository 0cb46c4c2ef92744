/**
 * The plot's side and plan views in a real Chromium: the plan view draws each case's sideways
 * swing exactly as the core's profile.y (solveProject() run here in Node on the same document),
 * a case without wind lies on 0, the axis names the quantity and unit, and the choice survives
 * a reload. Traces are read from the drawn Plotly element.
 */
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

// Exact definition (NIST SP 811, appendix B): 1 ft = 0.3048 m.
const FOOT_M = 0.3048;

type PlotTrace = { name: string; x: number[]; y: number[]; color: string };

function plot(page: Page) {
  return page.getByRole('figure', { name: 'Sag plot' });
}

async function plotTrace(page: Page, name: string): Promise<PlotTrace | undefined> {
  return plot(page)
    .locator('.js-plotly-plot')
    .evaluate((element, traceName) => {
      type Trace = { name: string; x: number[]; y: number[]; line?: { color?: string } };
      const data = (element as HTMLElement & { data?: Trace[] }).data ?? [];
      const trace = data.find((t) => t.name === traceName);
      return (
        trace && {
          name: trace.name,
          x: Array.from(trace.x),
          y: Array.from(trace.y),
          color: trace.line?.color ?? '',
        }
      );
    }, name);
}

/** Largest |drawn − expected|, or infinity while the trace is missing or of another length. */
async function traceError(page: Page, name: string, x: number[], y: number[]): Promise<number> {
  const trace = await plotTrace(page, name);
  if (!trace || trace.y.length !== y.length || trace.x.length !== x.length)
    return Number.POSITIVE_INFINITY;
  return Math.max(
    ...trace.x.map((v, i) => Math.abs(v - x[i])),
    ...trace.y.map((v, i) => Math.abs(v - y[i])),
  );
}

function profileOf(name: string) {
  const result = solveProject(demoProject()).cases.find((c) => c.name === name);
  if (!result?.profile) throw new Error(`core returned no profile for ${name}`);
  return result.profile;
}

async function openDemo(page: Page) {
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect(plot(page)).toHaveAttribute('data-plot-state', 'drawn');
}

test('plan view draws the sideways swing of each case as the core computes it', async ({
  page,
}) => {
  await openDemo(page);
  const windy = profileOf('Cold, iced, windy');
  const calm = profileOf('Hot summer');
  expect(Math.max(...windy.y)).toBeGreaterThan(0.1);
  const sideColour = (await plotTrace(page, 'Cold, iced, windy'))?.color;

  await page.getByLabel('Plan view (sideways swing)').check();
  await expect(plot(page)).toHaveAttribute('data-plot-view', 'plan');
  await expect
    .poll(() => traceError(page, 'Cold, iced, windy', windy.x, windy.y))
    .toBeLessThan(1e-12);
  const zeros = calm.x.map(() => 0);
  await expect.poll(() => traceError(page, 'Hot summer', calm.x, zeros)).toBe(0);
  expect((await plotTrace(page, 'Cold, iced, windy'))?.color).toBe(sideColour);
  await expect(plot(page).locator('.ytitle')).toHaveText('Sideways swing, downwind (m)');
  await expect(plot(page).locator('.xtitle')).toHaveText('Distance along the span (m)');
  await expect(plot(page).locator('.legend')).toContainText('Winter storm');
  await expect(plot(page)).toContainText(/Largest swing 0\.\d{3} m \(Cold, iced, windy\)/);

  await page.getByLabel('Imperial').check();
  await expect(plot(page).locator('.ytitle')).toHaveText('Sideways swing, downwind (ft)');
  await expect
    .poll(() =>
      traceError(
        page,
        'Cold, iced, windy',
        windy.x.map((x) => x / FOOT_M),
        windy.y.map((y) => y / FOOT_M),
      ),
    )
    .toBeLessThan(1e-12);
});

test('the view choice survives a reload and side view draws heights again', async ({ page }) => {
  await openDemo(page);
  await page.getByLabel('Plan view (sideways swing)').check();
  await expect(plot(page).locator('.ytitle')).toHaveText('Sideways swing, downwind (m)');
  await page.reload();
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect(plot(page)).toHaveAttribute('data-plot-view', 'plan');
  await expect(page.getByLabel('Plan view (sideways swing)')).toBeChecked();
  await expect(plot(page).locator('.ytitle')).toHaveText('Sideways swing, downwind (m)');

  await page.getByLabel('Side view (height)').check();
  const windy = profileOf('Cold, iced, windy');
  await expect
    .poll(() => traceError(page, 'Cold, iced, windy', windy.x, windy.z))
    .toBeLessThan(1e-12);
  await expect(plot(page).locator('.ytitle')).toHaveText('Height above ground datum (m)');
});
