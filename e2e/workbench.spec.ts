/**
 * The workbench in a real Chromium, driven the way a person would: by labels and roles.
 * Expected numbers are computed here in Node by the core's solveProject() on the same document
 * the person built on screen, so the page must show the solver's values, not its own.
 */
import AxeBuilder from '@axe-core/playwright';
import { expect, type Locator, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  type Project,
  type ProjectResults,
  solveProject,
  validateProject,
} from '../src/core/index.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

const newtons = new Intl.NumberFormat('en', { maximumFractionDigits: 0, minimumFractionDigits: 0 });
const metres = new Intl.NumberFormat('en', { maximumFractionDigits: 3, minimumFractionDigits: 3 });

function resultsTable(page: Page): Locator {
  return page.getByRole('table', { name: 'Results by case' });
}

function caseRow(page: Page, name: string): Locator {
  return resultsTable(page)
    .getByRole('row')
    .filter({ has: page.getByRole('rowheader', { name }) });
}

/** Cells: 0 horizontal tension, 1 largest tension, 2 utilisation, 3 check, 4 sag, 5 lowest, 6 clearance, 7 swing. */
async function expectRowsMatch(page: Page, results: ProjectResults) {
  for (const result of results.cases) {
    const cells = caseRow(page, result.name).getByRole('cell');
    await expect(cells.nth(0)).toHaveText(newtons.format(result.horizontalTension));
    await expect(cells.nth(1)).toHaveText(newtons.format(result.maxTension));
    await expect(cells.nth(4)).toHaveText(metres.format(result.sag));
  }
}

type PlotTrace = { name: string; x: number[]; y: number[] };

async function plotTrace(page: Page, name: string): Promise<PlotTrace | undefined> {
  return page
    .getByRole('figure', { name: 'Sag plot' })
    .locator('.js-plotly-plot')
    .evaluate((element, traceName) => {
      const data = (element as HTMLElement & { data?: PlotTrace[] }).data ?? [];
      const trace = data.find((t) => t.name === traceName);
      return trace && { name: trace.name, x: Array.from(trace.x), y: Array.from(trace.y) };
    }, name);
}

async function expectPlotMatches(page: Page, results: ProjectResults) {
  for (const result of results.cases) {
    const profile = result.profile;
    if (!profile) throw new Error('core returned no profile');
    await expect
      .poll(async () => {
        const trace = await plotTrace(page, result.name);
        if (!trace || trace.y.length !== profile.z.length) return Number.POSITIVE_INFINITY;
        return Math.max(...trace.y.map((y, i) => Math.abs(y - profile.z[i])));
      })
      .toBeLessThan(1e-12);
  }
}

async function openDemo(page: Page) {
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
  );
}

test('the demo opens with the core results in the table and the plot', async ({ page }) => {
  await openDemo(page);
  const results = solveProject(demoProject());
  await expectRowsMatch(page, results);
  await expectPlotMatches(page, results);
  await expect(page.getByTestId('summary')).toContainText(
    `All ${results.cases.length} cases pass every check.`,
  );
  await expect(page.getByRole('complementary', { name: 'Cautions' })).toContainText('licensed');
});

test('editing span, load and temperature re-solves to the core values; reload keeps edits; undo and redo', async ({
  page,
}) => {
  test.slow(); // edits, a reload, undo and redo: several full solves and redraws in one test
  await openDemo(page);
  const project = demoProject();

  await page.getByLabel('Studio wall bracket Position (m)').fill('24');
  project.supports[1].x = 24;
  await expectRowsMatch(page, solveProject(project));

  await page.getByLabel('Centre lantern Mass (kg)').fill('4.5');
  const lantern = project.loads.findIndex((load) => load.label === 'Centre lantern');
  project.loads[lantern] = { ...project.loads[lantern], mass: 4.5 } as Project['loads'][number];
  await expectRowsMatch(page, solveProject(project));

  await page.getByLabel('Hot summer temperature (°C)').fill('45');
  project.cases[0].temperature = 45;
  const edited = solveProject(project);
  await expectRowsMatch(page, edited);
  await expectPlotMatches(page, edited);
  await expect(page.getByRole('status')).toHaveText('Up to date.');

  await page.reload();
  await expect(page.getByLabel('Studio wall bracket Position (m)')).toHaveValue('24');
  await expect(page.getByLabel('Centre lantern Mass (kg)')).toHaveValue('4.5');
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('45');
  await expectRowsMatch(page, edited);

  // The undo history belongs to the session: it starts afresh at the reload.
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  await page.getByLabel('Hot summer temperature (°C)').fill('30');
  await page.getByLabel('Hot summer temperature (°C)').blur();
  project.cases[0].temperature = 30;
  await expectRowsMatch(page, solveProject(project));
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('45');
  await expectRowsMatch(page, edited);
  await page.getByRole('button', { name: 'Redo' }).click();
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('30');
  await expectRowsMatch(page, solveProject(project));
});

test('an invalid value shows the rule beside the field and keeps the last result, marked out of date', async ({
  page,
}) => {
  await openDemo(page);
  const results = solveProject(demoProject());
  const wind = page.getByLabel('Hot summer wind speed (m/s)');
  await wind.fill('-3');
  await expect(
    page.getByRole('alert').filter({ hasText: 'wind speed must be at least 0 m/s' }),
  ).toBeVisible();
  await expect(wind).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByRole('status')).toContainText('Out of date');
  await expectRowsMatch(page, results);

  const position = page.getByLabel('Studio wall bracket Position (m)');
  await position.fill('12x');
  await expect(
    page.getByRole('alert').filter({ hasText: 'Position must be a number' }),
  ).toBeVisible();
  await position.blur();
  await expect(position).toHaveValue('12x'); // nothing typed is lost
  await expect(wind).toHaveValue('-3');
  await expectPlotMatches(page, results);

  // Refused text follows a unit switch: -3 m/s / 0.44704 (m/s per mph, NIST SP 811) = -6.71081 mph
  await page.getByRole('radio', { name: 'Imperial' }).check();
  const windMph = page.getByLabel('Hot summer wind speed (mph)');
  await expect(windMph).toHaveValue('-6.71081');
  await expect(page.getByRole('alert').filter({ hasText: 'must be at least 0 mph' })).toBeVisible();
  await page.getByRole('radio', { name: 'Metric (SI)' }).check();
  await expect(wind).toHaveValue('-3');

  await position.fill('22');
  await wind.fill('5');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  const project = demoProject();
  project.cases[0].windSpeed = 5;
  await expectRowsMatch(page, solveProject(project));
});

test('switching to imperial shows feet and pound-force, and back to SI restores the numbers', async ({
  page,
}) => {
  await openDemo(page);
  const results = solveProject(demoProject());
  await page.getByRole('radio', { name: 'Imperial' }).check();
  // 22 m / 0.3048 m per ft (exact definition, NIST SP 811) = 72.17847769 ft, shown to 6 digits
  await expect(page.getByLabel('Studio wall bracket Position (ft)')).toHaveValue('72.1785');
  const installation = results.cases[0];
  // 1 lbf = 4.4482216152605 N (NIST SP 811)
  await expect(caseRow(page, 'Installation').getByRole('cell').nth(0)).toHaveText(
    newtons.format(installation.horizontalTension / 4.4482216152605),
  );
  // Lengths in feet and inches to the nearest eighth, as installers read them (1 in = 0.0254 m).
  await expect(resultsTable(page).getByRole('columnheader', { name: 'Sag' })).toBeVisible();
  const eighths = Math.round((installation.sag / 0.0254) * 8);
  const inches = `${Math.floor((eighths % 96) / 8)}${['', '⅛', '¼', '⅜', '½', '⅝', '¾', '⅞'][eighths % 8]}″`;
  await expect(caseRow(page, 'Installation').getByRole('cell').nth(4)).toHaveText(
    eighths >= 96 ? `${Math.floor(eighths / 96)}′\u00a0${inches}` : inches,
  );

  await page.getByLabel('Studio wall bracket Position (ft)').fill('75');
  const project = demoProject();
  project.supports[1].x = 75 * 0.3048;
  const edited = solveProject(project);
  await expect(caseRow(page, 'Installation').getByRole('cell').nth(0)).toHaveText(
    newtons.format(edited.cases[0].horizontalTension / 4.4482216152605),
  );

  await page.getByRole('radio', { name: 'Metric (SI)' }).check();
  await expect(page.getByLabel('Studio wall bracket Position (m)')).toHaveValue('22.86');
  await expectRowsMatch(page, edited);
});

test('the workbench has no serious or critical accessibility violations', async ({ page }) => {
  await openDemo(page);
  const scan = await new AxeBuilder({ page }).analyze();
  const serious = scan.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  const described = serious.map(
    (v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`,
  );
  expect(described).toEqual([]);
});
