/**
 * The verdict first, and true, in a real Chromium: the summary leads with pass or fail in words
 * and colour; the status does not read a calm "Up to date." over a failing design; the failing
 * requirement is the one named; check messages follow the chosen units; the sag mark sits below
 * the straight line between the fixings on an inclined span; trade terms have a help mark
 * reachable by keyboard; a refused edit names the field as the workbench shows it.
 * Expected numbers come from the core's solveProject() on the same document, in Node.
 */
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  adviceWords,
  type Project,
  solveProject,
  tensionWindowWithFacts,
  validateProject,
  windowPosition,
} from '../src/core/index.ts';
import { adviceWordingFor } from '../src/deliverables/displayUnits.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

const status = (page: Page) => page.getByRole('region', { name: 'Results' }).getByRole('status');
const summary = (page: Page) => page.getByTestId('summary');

async function openDemo(page: Page) {
  await page.goto('/');
  await expect(status(page)).toHaveText('Up to date.');
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
  );
}

/** The walkway raised to a road's 4.5 m: the zone fails while the 2.4 m minimum still clears. */
async function raiseWalkway(page: Page) {
  await page.getByLabel('Walkway Clearance needed (m)').fill('4.5');
  await expect(status(page)).not.toHaveText(/Solving/);
}

test('the demo passes: the verdict leads the summary, and the status is up to date', async ({
  page,
}) => {
  await openDemo(page);
  const results = solveProject(demoProject());
  await expect(summary(page)).toHaveAttribute('data-verdict', 'pass');
  await expect(summary(page)).toContainText(`All ${results.cases.length} cases pass every check.`);
  await expect(status(page)).toHaveClass(/status-ok/);
});

test('a failing design: the status says it fails and the summary names the failing zone', async ({
  page,
}) => {
  await openDemo(page);
  await raiseWalkway(page);
  const project = demoProject();
  (project.limits.zones ?? [])[0].height = 4.5;
  const results = solveProject(project);
  const failing = results.cases.filter((c) => !c.ok);
  expect(failing.length).toBeGreaterThan(0);
  await expect(status(page)).toHaveText(
    `Up to date: this design fails (${failing.length} of ${results.cases.length} cases, see the summary).`,
  );
  await expect(status(page)).not.toHaveClass(/status-ok/);
  await expect(summary(page)).toHaveAttribute('data-verdict', 'fail');
  const worst = failing.reduce((a, b) =>
    b.zoneClearances[0].clearance < a.zoneClearances[0].clearance ? b : a,
  );
  await expect(summary(page).locator('.summary-verdict')).toHaveText(
    `✗ ${failing.length} of ${results.cases.length} cases fail:`,
  );
  const lines = summary(page).getByRole('listitem');
  await expect(lines).toHaveCount(failing.length);
  for (const [i, c] of failing.entries())
    await expect(lines.nth(i)).toHaveText(
      `${c.name}, clearance at Walkway ${c.zoneClearances[0].clearance.toFixed(3)} m, needs 4.500 m (${(4.5 - c.zoneClearances[0].clearance).toFixed(3)} m short).`,
    );
  await expect(summary(page)).toContainText(
    `least clearance ${worst.zoneClearances[0].clearance.toFixed(3)} m against 4.500 m required at Walkway in ${worst.name}`,
  );
  await expect(summary(page)).not.toContainText('2.400 m required');
  // The verdict is red, not the calm green of a pass.
  const colour = await summary(page)
    .locator('.summary-verdict')
    .evaluate((el) => getComputedStyle(el).color);
  expect(colour).toBe('rgb(138, 28, 18)');
});

test('imperial: the failing checks and the summary are in feet and inches, not metres', async ({
  page,
}) => {
  await openDemo(page);
  await raiseWalkway(page);
  await page.getByRole('radio', { name: 'Imperial' }).check();
  const check = page
    .getByRole('table', { name: 'Results by case' })
    .getByRole('row')
    .filter({ has: page.getByRole('rowheader', { name: /Hot summer/ }) })
    .getByRole('cell')
    .nth(3);
  // 4.5 m / 0.0254 = 177.165 in = 14 ft 9 1/8 in to the nearest eighth (1 in = 0.0254 m exactly).
  await expect(check).toContainText('Walkway: clearance');
  await expect(check).toContainText('is below the required 14\u00a0ft\u00a09\u00a01/8\u00a0in.');
  await expect(check).not.toContainText(/\d m\b/);
  await expect(summary(page)).toContainText('needs 14\u00a0ft\u00a09\u00a01/8\u00a0in');
  await expect(summary(page)).not.toContainText(/\d m\b|\d N\b|kN/);
});

test('imperial: the tension window says where the setting sits in feet and inches and pounds force', async ({
  page,
}) => {
  test.slow(); // the design aids solve the window in the worker
  await openDemo(page);
  await page.getByRole('radio', { name: 'Imperial' }).check();
  await expect(page.getByTestId('design-status')).toHaveText('Design aids up to date.', {
    timeout: 90_000,
  });
  const project = demoProject();
  const { window, adviceFacts } = tensionWindowWithFacts(project);
  const H = solveProject(project).cases[0].horizontalTension;
  const words = adviceWordingFor('imperial');
  const position = windowPosition(project, window, H, words);
  // 3 m / 0.3048 = 9.8425 ft = 9 ft 10 1/8 in to the nearest eighth (1 ft = 0.3048 m exactly).
  expect(position).toContain('9\u00a0ft\u00a010\u00a01/8\u00a0in over Walkway');
  await expect(page.getByTestId('window-position')).toContainText(position);
  await expect(page.getByTestId('window-position')).not.toContainText(/\d m\b/);
  const advice = page.getByRole('list', { name: 'Window advice' }).getByRole('listitem');
  await expect(advice).toHaveText(adviceWords(project, adviceFacts, words));
  await expect(advice.first()).toContainText('lbf');
});

test('an inclined span: the straight line between the fixings is drawn and the sag is marked below it', async ({
  page,
}) => {
  await openDemo(page);
  await page.getByLabel('Studio wall bracket Height (m)').fill('6.5');
  const plot = page.getByRole('figure', { name: 'Sag plot' });
  await expect(plot).toContainText(
    'Sag is measured straight down from the straight line between the fixings',
  );
  const drawn = plot.locator('.js-plotly-plot');
  await expect
    .poll(() =>
      drawn.evaluate((el) => {
        const data = (el as HTMLElement & { data?: { name?: string }[] }).data ?? [];
        return data.some((t) => t.name?.startsWith('Straight line between fixings'));
      }),
    )
    .toBe(true);
  await expect(plot.locator('.annotation-text', { hasText: 'Largest sag' })).toContainText(
    'below the line between fixings',
  );
});

test('trade terms have a help mark reachable by keyboard, and the page passes axe', async ({
  page,
}) => {
  test.slow(); // a full axe scan of the workbench
  await openDemo(page);
  const mark = page.getByRole('button', { name: 'What is utilisation?' });
  await mark.focus();
  await expect(
    page.getByRole('tooltip').filter({ hasText: 'breaking load ÷ safety factor' }),
  ).toBeVisible();
  await expect(mark).toHaveAccessibleDescription(/share of what the wire may carry/);
  await page.keyboard.press('Escape');
  for (const name of ['horizontal tension', 'largest tension', 'sag'])
    await expect(page.getByRole('button', { name: `What is ${name}?` }).first()).toBeVisible();
  const scan = await new AxeBuilder({ page }).analyze();
  const serious = scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(
    serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`),
  ).toEqual([]);
});

test('a refused edit names the field as the workbench shows it', async ({ page }) => {
  await openDemo(page);
  await page.getByLabel('Studio wall bracket Position (m)').fill('10');
  const alert = page.getByRole('alert').filter({ hasText: 'Studio wall bracket Position' });
  await expect(alert).toHaveText(
    'Studio wall bracket Position must be beyond the end of Festoon cable with lamps at 21.5 m',
  );
  await expect(alert).not.toContainText('loads[');
});
