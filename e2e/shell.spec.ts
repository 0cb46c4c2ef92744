/**
 * The app in a real Chromium: it loads, names the product and the demo project, lists one
 * results row per case, draws one wire and one dashed parabola per case with a legend entry for
 * each case, shows the cautions, and logs no errors.
 */
import { expect, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };

// The first case is always the installation state, then the project's own cases (doc/project-format.md).
const expectedCaseCount = 1 + demo.cases.length;

test('shell loads, shows results, the sag plot and the cautions without console errors', async ({
  page,
}) => {
  const problems: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console: ${message.text()}`);
  });
  page.on('pageerror', (error) => problems.push(`page: ${error.message}`));

  await page.goto('/');

  await expect(page).toHaveTitle('Sagwright');
  await expect(page.getByRole('heading', { level: 1, name: 'Sagwright' })).toBeVisible();
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  const cautions = page.getByRole('complementary', { name: 'Cautions' });
  await expect(cautions).toBeVisible();
  await expect(cautions).toContainText('licensed person');

  const table = page.getByRole('table', { name: 'Results by case' });
  await expect(table.getByRole('row')).toHaveCount(1 + expectedCaseCount);
  for (const weatherCase of demo.cases) {
    await expect(table.getByRole('rowheader', { name: weatherCase.name })).toBeVisible();
  }
  // The demo installs to a stated sag, so the installation row must read it back (to the mm).
  const installationRow = table.getByRole('row').filter({ hasText: 'Installation' });
  // cells: horizontal tension, largest tension, utilisation, check, sag, …
  await expect(installationRow.getByRole('cell').nth(4)).toHaveText(
    demo.installation.target.sag.toFixed(3),
  );

  const plot = page.getByRole('figure', { name: 'Sag plot' });
  await expect(plot).toHaveAttribute('data-plot-state', 'drawn');
  await expect(plot.locator('.main-svg').first()).toBeVisible();
  // Per case a solid wire and a dashed parabola; plus ground, minimum-clearance line, one shape
  // per clearance zone, the supports, the straight line between the fixings and the mark where
  // the largest sag is measured.
  const staticTraces = 5 + demo.limits.zones.length;
  await expect(plot.locator('.scatterlayer .trace')).toHaveCount(
    2 * expectedCaseCount + staticTraces,
  );
  for (const name of ['Installation', ...demo.cases.map((c) => c.name)]) {
    await expect(plot.locator('.legend .traces').filter({ hasText: name })).toHaveCount(1);
  }

  expect(problems).toEqual([]);
});
