/**
 * "Check the wire as built" in a real Chromium: a site measurement typed into the panel gives
 * the cut length and every case's check that the core's solveAsBuilt() gives for the same
 * document (run here in Node), in SI and US units; a measurement out of reach is refused in
 * words naming the field, and the last answer stays.
 */
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  type AsBuiltMeasurement,
  type Project,
  solveAsBuilt,
  validateProject,
} from '../src/core/index.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

// Exact unit definitions (NIST SP 811, appendix B): 1 ft = 0.3048 m, °F = °C × 9/5 + 32.
const FOOT_M = 0.3048;
/** The results' own status line (the design aids have a status of their own). */
function solverStatus(page: Page) {
  return page.getByRole('region', { name: 'Results' }).getByRole('status').first();
}

const fixed = (digits: number) =>
  new Intl.NumberFormat('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

async function measure(page: Page, kind: string, value: string, temperature: string, x = '') {
  const form = page.getByRole('form', { name: 'As-built measurement' });
  await form.getByLabel('What was measured').selectOption({ label: kind });
  await form.getByLabel(/Measured value/).fill(value);
  await form.getByLabel(/Temperature/).fill(temperature);
  if (x !== '') await form.getByLabel(/Position from the first fixing/).fill(x);
  await form.getByRole('button', { name: 'Check as built' }).click();
}

function expectedRows(m: AsBuiltMeasurement) {
  const project = demoProject();
  const r = solveAsBuilt(project, m);
  return { r, project };
}

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.', { timeout: 90_000 });
});

test('a sag measured at a point gives the core’s cut length and every case’s check', async ({
  page,
}) => {
  await measure(page, 'Sag below the line between the fixings', '0.55', '8', '9');
  const { r } = expectedRows({ temperature: 8, kind: 'sag', value: 0.55, x: 9 });
  await expect(page.getByTestId('as-built-length')).toHaveText(
    `${fixed(3).format(r.unstressedLength)}\u00a0m`,
  );
  const rows = page.getByTestId('as-built-row');
  await expect(rows).toHaveCount(r.cases.length);
  for (const [i, c] of r.cases.entries()) {
    const row = rows.nth(i);
    await expect(row.getByRole('rowheader')).toHaveText(c.name);
    await expect(row.getByRole('cell').nth(1)).toContainText(c.ok ? 'Pass' : 'Fail');
    await expect(row.getByRole('cell').nth(2)).toHaveText(fixed(0).format(c.maxTension));
    await expect(row.getByRole('cell').nth(4)).toHaveText(fixed(3).format(c.clearance));
  }
  const mm = fixed(1).format(Math.abs(r.lengthDifference) * 1000);
  await expect(page.getByTestId('as-built-outcome')).toContainText(`${mm}\u00a0mm longer`);
});

test('a tight wire read off a gauge fails as built, and says which case', async ({ page }) => {
  await measure(page, 'Horizontal tension (gauge)', '2600', '15');
  const { r } = expectedRows({ temperature: 15, kind: 'horizontalTension', value: 2600 });
  const failing = r.cases.filter((c) => !c.ok).map((c) => c.name);
  expect(failing.length).toBeGreaterThan(0);
  await expect(page.getByTestId('as-built-verdict')).toContainText(failing.join(', '));
});

test('a pulse reading is taken on the bare wire, in US units too', async ({ page }) => {
  await measure(page, 'Pulse return time', '1.1', '8');
  const { r } = expectedRows({ temperature: 8, kind: 'returnTime', value: 1.1 });
  await expect(page.getByTestId('as-built-length')).toHaveText(
    `${fixed(3).format(r.unstressedLength)}\u00a0m`,
  );
  await expect(page.getByTestId('as-built-outcome')).toContainText('bare wire');
  await page.getByLabel('Imperial').check();
  await expect(page.getByTestId('as-built-length')).toHaveText(
    `${fixed(3).format(r.unstressedLength / FOOT_M)}\u00a0ft`,
  );
});

test('a sag out of reach is refused naming the field; the last answer stays', async ({ page }) => {
  await measure(page, 'Sag below the line between the fixings', '0.5', '15');
  const { r } = expectedRows({ temperature: 15, kind: 'sag', value: 0.5 });
  const length = `${fixed(3).format(r.unstressedLength)}\u00a0m`;
  await expect(page.getByTestId('as-built-length')).toHaveText(length);
  await measure(page, 'Sag below the line between the fixings', '11', '15');
  await expect(page.locator('section.as-built').getByRole('alert')).toContainText(
    'Measured value: must be less than half the span (11.000 m)',
  );
  await expect(page.getByTestId('as-built-length')).toHaveText(length);
  await page
    .getByRole('form', { name: 'As-built measurement' })
    .getByLabel(/Position/)
    .fill('30');
  await page.getByRole('button', { name: 'Check as built' }).click();
  await expect(page.locator('section.as-built').getByRole('alert')).toContainText(
    'Position: must be less than 22',
  );
});
