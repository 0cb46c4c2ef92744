/**
 * The person's work survives what browsers do to it: removing a fixing that a load depends on
 * (the load follows, the page says so, a reload keeps it), a stored project that does not
 * validate (opened as far as it can be, the stored copy offered for download), two tabs on one
 * project, storage that is full or refused, and a drawing error. Each path ends with a reload
 * or a download that shows the work is still there.
 */
import { readFileSync } from 'node:fs';
import { type Browser, expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, validateProject } from '../src/core/index.ts';

test.slow(); // reloads and two pages on a shared 2-core machine

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

function solverStatus(page: Page) {
  return page.getByRole('region', { name: 'Results' }).getByRole('status');
}

async function open(page: Page) {
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.');
}

function stored(page: Page): Promise<Project | null> {
  return page.evaluate(() => JSON.parse(localStorage.getItem('sagwright:autosave') ?? 'null'));
}

async function downloadFrom(page: Page, button: string): Promise<string> {
  const pending = page.waitForEvent('download');
  await page.getByRole('button', { name: button }).click();
  return readFileSync(await (await pending).path(), 'utf8');
}

test('removing a fixing a load reaches to clips the load, says so, and survives a reload', async ({
  page,
}) => {
  await open(page);
  await page.getByLabel('Project title').fill('Garage run');
  await page.getByRole('button', { name: 'Add a fixing at the far end' }).click();
  await page.getByRole('button', { name: 'Add a part-span load' }).click();
  await page.getByLabel('Cable From (m)').fill('20');
  await page.getByLabel('Cable To (m)').fill('30');
  await expect(page.getByLabel('Cable To (m)')).not.toHaveAttribute('aria-invalid');
  await page.getByRole('button', { name: 'Remove New fixing' }).click();
  const notice = page.getByRole('status', { name: 'Last change' });
  await expect(notice).toContainText('“Remove New fixing” also changed:');
  await expect(notice).toContainText('Cable now runs from 20 m to 22 m (was 20 m to 30 m).');
  await expect(page.getByLabel('Cable To (m)')).toHaveValue('22');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  expect(validateProject(await stored(page)).ok).toBe(true);

  // Undo brings the fixing back and the load's old end with it, in one step; redo removes both.
  await notice.getByRole('button', { name: 'Undo' }).click();
  await expect(notice).toBeHidden();
  await expect(page.getByLabel('Cable To (m)')).toHaveValue('30');
  await expect(page.getByRole('button', { name: 'Remove New fixing' })).toBeVisible();
  await page.getByRole('toolbar').getByRole('button', { name: 'Redo' }).click();
  await expect(page.getByLabel('Cable To (m)')).toHaveValue('22');
  await expect(solverStatus(page)).toHaveText('Up to date.');

  await page.reload();
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await expect(page.getByLabel('Project title')).toHaveValue('Garage run');
  await expect(page.getByLabel('Cable To (m)')).toHaveValue('22');
  await expect(page.getByRole('alert', { name: 'Stored project' })).toHaveCount(0);
});

test('a stored project that does not validate opens as far as it can, and the stored copy downloads', async ({
  page,
}) => {
  const broken = demoProject() as unknown as Record<string, unknown>;
  broken.title = 'Garage run';
  broken.loads = [
    ...demoProject().loads,
    { type: 'uniform', from: 20, to: 30, massPerLength: 0.1, label: 'Garage cable' },
  ];
  const text = JSON.stringify(broken);
  await page.goto('/');
  await page.evaluate((t) => localStorage.setItem('sagwright:autosave', t), text);
  await page.reload();
  const alert = page.getByRole('alert', { name: 'Stored project' });
  await expect(alert).toContainText(
    'could not be opened as it was stored: loads[2].to must be at most 22',
  );
  await expect(alert).toContainText('Garage cable now runs from 20 m to 22 m (was 20 m to 30 m).');
  await expect(page.getByLabel('Project title')).toHaveValue('Garage run');
  await expect(page.getByLabel('Garage cable To (m)')).toHaveValue('22');
  expect(await downloadFrom(page, 'Download the stored copy')).toBe(text);
  expect(await page.evaluate(() => localStorage.getItem('sagwright:autosave-rejected'))).toBe(text);

  // What opened is now the autosave; a reload opens it without a word.
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue('Garage run');
  await expect(page.getByRole('alert', { name: 'Stored project' })).toHaveCount(0);
});

test('a stored autosave that is not readable at all opens the demo and says so', async ({
  page,
}) => {
  await page.goto('/');
  await page.evaluate(() => localStorage.setItem('sagwright:autosave', '{"format": "sagw'));
  await page.reload();
  const alert = page.getByRole('alert', { name: 'Stored project' });
  await expect(alert).toContainText('is not readable JSON');
  await expect(alert).toContainText('the demo project is open');
  expect(await downloadFrom(page, 'Download the stored copy')).toBe('{"format": "sagw');
});

async function twoTabs(browser: Browser) {
  const context = await browser.newContext();
  const a = await context.newPage();
  await open(a);
  return { context, a };
}

test('two tabs: the one opened last edits, the other follows and can take over; no edit is lost', async ({
  browser,
}) => {
  const { context, a } = await twoTabs(browser);
  await a.getByLabel('Project title').fill('Title from A');
  await expect.poll(async () => (await stored(a))?.title).toBe('Title from A');

  const b = await context.newPage();
  await open(b);
  await expect(b.getByLabel('Project title')).toHaveValue('Title from A');
  const banner = a.getByRole('alert', { name: 'Another tab' });
  await expect(banner).toContainText('being edited in another tab');
  // A cannot type over B's work meanwhile.
  await expect(a.getByRole('region', { name: 'Design inputs' })).toHaveAttribute('inert', '');

  await b.getByLabel('Safety factor on breaking load').fill('6');
  await expect(a.getByLabel('Safety factor on breaking load')).toHaveValue('6');

  await banner.getByRole('button', { name: 'Edit here instead' }).click();
  await expect(b.getByRole('alert', { name: 'Another tab' })).toBeVisible();
  await a.getByLabel('Project title').fill('Title from A, then B, then A');
  await expect(b.getByLabel('Project title')).toHaveValue('Title from A, then B, then A');

  for (const page of [a, b]) {
    await page.reload();
    await expect(page.getByLabel('Project title')).toHaveValue('Title from A, then B, then A');
    await expect(page.getByLabel('Safety factor on breaking load')).toHaveValue('6');
  }
  await context.close();
});

test('storage filled to its quota: told at once, the edit kept and downloadable, saved once there is room', async ({
  page,
}) => {
  await open(page);
  // Fill the origin's storage to the last character: large pieces, then ever smaller ones.
  const filled = await page.evaluate(() => {
    let count = 0;
    for (const size of [1 << 20, 1 << 16, 1 << 12, 256, 16, 1]) {
      const piece = 'x'.repeat(size);
      try {
        for (;;) localStorage.setItem(`filler-${count++}`, piece);
      } catch {
        // full at this size: go on with a smaller piece
      }
    }
    return count;
  });
  expect(filled).toBeGreaterThan(0);
  // Longer than the title it replaces, so the document needs more room than it had.
  const title = 'Yard after the storm, with the new lamp posts along the east wall';
  await page.getByLabel('Project title').fill(title);
  const alert = page.getByRole('alert', { name: 'Autosave' });
  await expect(alert).toContainText('Your changes are not being saved');
  await expect(alert).toContainText('full');
  await expect(page.getByLabel('Project title')).toHaveValue(title);
  const file = JSON.parse(await downloadFrom(page, 'Download the project')) as Project;
  expect(file.title).toBe(title);

  await page.evaluate(() => {
    for (const key of Object.keys(localStorage))
      if (key.startsWith('filler-')) localStorage.removeItem(key);
  });
  await alert.getByRole('button', { name: 'Try saving again' }).click();
  await expect(alert).toBeHidden();
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue(title);
});

test('storage the browser refuses: told on opening, edits kept in the tab and downloadable', async ({
  page,
}) => {
  await page.addInitScript(() => {
    Storage.prototype.setItem = () => {
      throw new DOMException('The operation is insecure.', 'SecurityError');
    };
  });
  await open(page);
  const alert = page.getByRole('alert', { name: 'Autosave' });
  await expect(alert).toContainText('refuses to store it');
  await page.getByLabel('Project title').fill('Workshop line');
  const file = JSON.parse(await downloadFrom(page, 'Download the project')) as Project;
  expect(file.title).toBe('Workshop line');
  expect(file.cases).toEqual(demoProject().cases);
});

test('a drawing error keeps the project, offers it for download, and the workbench comes back', async ({
  page,
}) => {
  // The summary line capitalises its first letter while it is drawn; make that throw on demand.
  await page.addInitScript(() => {
    const upper = String.prototype.toUpperCase;
    String.prototype.toUpperCase = function (this: string) {
      if ((window as unknown as { breakDrawing?: boolean }).breakDrawing)
        throw new Error('drawing broken on purpose');
      return upper.call(this);
    };
  });
  await open(page);
  await page.getByLabel('Project title').fill('Terrace line');
  // Everything the title edit sets off has been drawn (the design aids answer once results
  // pause), so the next drawing is the one for the edit below.
  await expect(page.getByTestId('design-status')).toHaveText('Design aids up to date.', {
    timeout: 30_000,
  });
  await page.evaluate(() => {
    (window as unknown as { breakDrawing?: boolean }).breakDrawing = true;
  });
  await page.getByLabel('Hot summer temperature (°C)').fill('43');
  const fault = page.getByRole('alert').filter({ hasText: 'Something went wrong' });
  await expect(fault).toContainText('drawing broken on purpose');
  await expect(fault).toContainText('“Terrace line” is safe');
  const file = JSON.parse(await downloadFrom(page, 'Download the project')) as Project;
  expect(file.title).toBe('Terrace line');
  expect(file.cases[0].temperature).toBe(43);

  await page.evaluate(() => {
    (window as unknown as { breakDrawing?: boolean }).breakDrawing = false;
  });
  await page.getByRole('button', { name: 'Try again' }).click();
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('43');
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue('Terrace line');
});
