/**
 * "Find the design" in a real Chromium: the tension window, the wires that work and today's
 * setting show the core's numbers for the document on screen (expected values from the core run
 * here in Node); "Use" applies a wire and its suggested tension as one undo step.
 */
import { execFileSync } from 'node:child_process';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  chooseWires,
  type Project,
  settingAt,
  solveProject,
  tensionWindow,
  validateProject,
  windowPosition,
} from '../src/core/index.ts';

const SLOW = { timeout: 90_000 };
// The chooser solves every catalogue wire; on a loaded shared machine that takes a while.
test.setTimeout(180_000);
const whole = new Intl.NumberFormat('en', { maximumFractionDigits: 0 });
const metres = new Intl.NumberFormat('en', { minimumFractionDigits: 3, maximumFractionDigits: 3 });

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

async function openDemo(page: Page) {
  await page.goto('/');
  await expect(page.getByTestId('design-status')).toHaveText('Design aids up to date.', SLOW);
}

test('the tension window shows the core ends, the position in words and the plot', async ({
  page,
}) => {
  await openDemo(page);
  const project = demoProject();
  const window = tensionWindow(project);
  const H = solveProject(project).cases[0].horizontalTension;
  const low = window.low;
  const high = window.high;
  if (!low || !high) throw new Error('demo window should be open');
  await expect(page.getByTestId('window-low')).toHaveText(
    `Lowest: ${whole.format(low.horizontalTension)}\u00a0N (clearance over ${low.check}, ${low.case})`,
  );
  await expect(page.getByTestId('window-high')).toHaveText(
    `Highest: ${whole.format(high.horizontalTension)}\u00a0N (tension limit, ${high.case})`,
  );
  await expect(page.getByTestId('window-position')).toContainText(
    windowPosition(project, window, H),
  );
  const plot = page.getByRole('img', { name: /Worst utilisation and worst clearance margin/ });
  await expect(plot).toBeVisible();
  await expect(plot.locator('rect.window-plot-shade')).toHaveCount(1);
  for (const line of window.advice) await expect(page.getByText(line)).toBeVisible();
});

test('the chooser lists the core choices lightest first; Use applies one undo step', async ({
  page,
}) => {
  await openDemo(page);
  const project = demoProject();
  const choices = chooseWires(project);
  await page.getByRole('button', { name: 'Try every wire in the catalogue' }).click();
  const table = page.getByRole('table', { name: 'Wires that work' });
  const rows = table.locator('tbody').getByRole('row');
  await expect(rows).toHaveCount(Math.min(8, choices.length), SLOW);
  for (const [i, c] of choices.slice(0, 8).entries())
    await expect(rows.nth(i).getByRole('rowheader')).toContainText(c.label);
  await page.getByLabel('Wire type').selectOption('stainless');
  const stainless = choices.filter((c) => c.family === 'stainless');
  await expect(rows).toHaveCount(Math.min(8, stainless.length));
  const pick = stainless[0];
  const suggested = `${whole.format(pick.suggestedHorizontalTension)}\u00a0N`;
  await rows
    .first()
    .getByRole('button', { name: `Use ${pick.label} at ${suggested}` })
    .click();
  await expect(page.getByTestId('window-position')).toContainText(
    `Current setting, ${suggested}`,
    SLOW,
  );
  const applied = tensionWindow({
    ...project,
    wire: { catalogId: pick.catalogId ?? '' },
    installation: {
      ...project.installation,
      target: { horizontalTension: pick.suggestedHorizontalTension },
    },
  });
  await expect(page.getByTestId('window-high')).toContainText(
    whole.format(applied.high?.horizontalTension ?? 0),
  );
  await page.locator('body').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('Control+z');
  const before = solveProject(project).cases[0].horizontalTension;
  await expect(page.getByTestId('window-position')).toContainText(
    `Current setting, ${whole.format(before)}\u00a0N`,
    SLOW,
  );
});

test("today's setting at 8 °C shows the core's tension, sag and where to measure", async ({
  page,
}) => {
  await openDemo(page);
  const s = settingAt(demoProject(), 8);
  await page.getByLabel('Temperature now (°C)').fill('8');
  const shown = page.getByTestId('today-setting');
  await expect(shown).toContainText(`${whole.format(s.horizontalTension)}\u00a0N`, SLOW);
  await expect(shown).toContainText(`${whole.format(s.maxTension)}\u00a0N`);
  await expect(shown).toContainText(
    `measure the sag at mid-span, 11.000\u00a0m from Kitchen wall bracket: ${metres.format(s.midSpanSag)}\u00a0m`,
  );
  await expect(shown).toContainText('Pulse and pluck checks do not hold');
  await page.getByLabel('Temperature now (°C)').fill('hot');
  await expect(page.getByRole('alert')).toHaveText('Temperature now must be a number');
  await expect(shown).toContainText(`${whole.format(s.horizontalTension)}\u00a0N`);
});

test("the PDF report carries the window and today's setting at the temperature typed", async ({
  page,
}, info) => {
  await openDemo(page);
  const project = demoProject();
  const window = tensionWindow(project);
  const s = settingAt(project, 8);
  await page.getByLabel('Temperature now (°C)').fill('8');
  await expect(page.getByTestId('today-setting')).toContainText(
    `${whole.format(s.horizontalTension)}\u00a0N`,
    SLOW,
  );
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name: 'PDF report…', exact: true }).click();
  const downloadPromise = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Create PDF' }).click();
  const pdfPath = info.outputPath('report.pdf');
  await (await downloadPromise).saveAs(pdfPath);
  const text = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
  const flat = text.replace(/\s+/g, ' ');
  expect(flat).toContain("Tension window and today's setting");
  expect(flat).toContain(
    `Lowest: ${(window.low?.horizontalTension ?? 0).toFixed(0)} N, set by the clearance over Walkway in "Hot summer".`,
  );
  expect(flat).toContain(
    `At 8°C: set a horizontal tension of ${s.horizontalTension.toFixed(0)} N (largest tension ${s.maxTension.toFixed(0)} N).`,
  );
  expect(flat).toContain('Pulse and pluck checks do not hold');
});
