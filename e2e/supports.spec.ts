/**
 * Intermediate fixings in a real Chromium: a version-1 file whose post was marked free opens as
 * a pulley with a notice that its results changed; the fixing's editor offers the three kinds in
 * plain words; the pull-on-the-fixings table shows the kind, the net pull and the wire on each
 * side, and changes when the kind does.
 */
import { readFileSync } from 'node:fs';
import { expect, type Page, test } from '@playwright/test';

const V1 = readFileSync('tests/fixtures/version1-free-support.json');

async function openFile(page: Page) {
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'terrace.sagwright.json',
    mimeType: 'application/json',
    buffer: V1,
  });
  await expect(page.getByLabel('Project title')).toHaveValue(
    'Terrace line saved by format version 1',
  );
}

/** The post's row in the first case (the installation). */
function postRow(page: Page) {
  return page
    .getByRole('table', { name: 'Pull on the fixings' })
    .getByRole('row')
    .filter({ has: page.getByRole('rowheader', { name: 'Corner post' }) })
    .first();
}

test('a version-1 file with a free post opens as a pulley and says its results changed', async ({
  page,
}) => {
  test.slow(); // opens a file and waits for two solves
  await page.goto('/');
  await openFile(page);
  const notice = page.getByRole('status', { name: 'Older file' });
  await expect(notice).toContainText('Corner post');
  await expect(notice).toContainText('equal tension on both sides');
  const kind = page.getByRole('combobox', { name: 'Corner post Holds the wire' });
  await expect(kind).toHaveValue('pulley');
  await expect(postRow(page)).toContainText('pulley');
  await notice.getByRole('button', { name: 'Dismiss' }).click();
  await expect(notice).toHaveCount(0);
});

test('choosing how the post holds the wire changes its pull along the line', async ({ page }) => {
  test.slow(); // opens a file, changes a fixing and waits for both solves
  await page.goto('/');
  await openFile(page);
  const row = postRow(page);
  // Over a pulley the steep lead span's H is lower than the long span's: a net pull of ~100 N.
  const along = row.getByRole('cell').nth(1);
  await expect(along).not.toHaveText('0');
  const pulleyPull = Number((await along.textContent())?.replace(/[^\d.-]/g, ''));
  expect(pulleyPull).toBeGreaterThan(50);
  await expect(row.getByRole('cell').nth(6)).toContainText('°');
  await expect(row.getByRole('cell').nth(7)).toContainText('°');

  const kind = page.getByRole('combobox', { name: 'Corner post Holds the wire' });
  await kind.selectOption({ label: 'Swing link (same horizontal pull)' });
  await expect(row.getByRole('cell').first()).toHaveText('swing link');
  await expect(along).toHaveText('0');
});
