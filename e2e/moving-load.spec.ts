/**
 * Moving loads in a real Chromium: adding one in the loads panel shows, per case, the largest
 * tension and the lowest clearance with the load's position, equal to solveProject() on the same
 * document run here in Node; the cautions strip says goods only, never people; the sag plot
 * draws the band; an edit of the load's path is followed.
 */
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type MovingLoad, type Project, solveProject, validateProject } from '../src/core/index.ts';

function withMoving(load: MovingLoad): Project {
  const checked = validateProject({ ...demo, loads: [...demo.loads, load] });
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return structuredClone(checked.project);
}

/** The results' own status line (the design aids have a status of their own). */
function solverStatus(page: Page) {
  return page.getByRole('region', { name: 'Results' }).getByRole('status').first();
}

const fixed = (digits: number) =>
  new Intl.NumberFormat('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

async function expectTable(page: Page, load: MovingLoad) {
  const results = solveProject(withMoving(load));
  const rows = page.getByTestId('moving-load-row');
  await expect(rows).toHaveCount(results.cases.length);
  for (const [i, c] of results.cases.entries()) {
    const m = c.movingLoads?.[0];
    if (!m) throw new Error('no envelope');
    const cells = rows.nth(i).getByRole('cell');
    await expect(rows.nth(i).getByRole('rowheader')).toHaveText(c.name);
    await expect(cells.nth(1)).toContainText(fixed(0).format(m.maxTension));
    await expect(cells.nth(1)).toContainText(`load at ${fixed(2).format(m.maxTensionAt)}\u00a0m`);
    await expect(cells.nth(3)).toContainText(fixed(3).format(m.clearance));
    await expect(cells.nth(3)).toContainText(`load at ${fixed(2).format(m.clearanceAt)}\u00a0m`);
    await expect(cells.nth(4)).toContainText(m.ok ? 'Pass' : 'Fail');
  }
}

test('a moving load added in the loads panel: envelope, caution and band', async ({ page }) => {
  test.slow(); // two edits, each solved with every moving-load position
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 90_000 });
  await expect(page.getByTestId('moving-load-caution')).toHaveCount(0);
  await page.getByRole('button', { name: 'Add a moving load' }).click();
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 90_000 });
  const trolley: MovingLoad = { type: 'moving', from: 0, to: 22, mass: 10, label: 'Trolley' };
  await expectTable(page, trolley);
  await expect(page.getByTestId('moving-load-caution')).toContainText('never people');
  await expect(page.locator('.sag-plot')).toContainText('while a moving load travels its path');
  await expect(page.locator('.sag-plot .legendtext', { hasText: 'Moving load' })).toHaveCount(1);

  await page.getByLabel('Trolley Travels from').fill('4');
  await page.getByLabel('Trolley Mass').fill('60');
  // 60 kg hauled across pulls the wire below the walkway: the status says the design fails.
  const hauled = solveProject(withMoving({ ...trolley, from: 4, mass: 60 }));
  const failing = hauled.cases.filter((c) => !c.ok).length;
  expect(failing).toBeGreaterThan(0);
  await expect(solverStatus(page)).toHaveText(
    `Up to date: this design fails (${failing} of ${hauled.cases.length} cases, see the summary).`,
    { timeout: 90_000 },
  );
  await expectTable(page, { ...trolley, from: 4, mass: 60 });
});

test('a moving load path ending before it starts is refused naming the field', async ({ page }) => {
  await page.goto('/');
  await page.getByRole('button', { name: 'Add a moving load' }).click();
  await page.getByLabel('Trolley Travels from').fill('30');
  await expect(page.getByRole('alert').first()).toContainText(/at most 22/);
});
