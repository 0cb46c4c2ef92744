/**
 * Starting and opening projects as a person would: "New project" offers a blank span and our
 * starter projects, each opens and solves; opening anything (a starter, a file, a stored
 * project) over edits not kept anywhere asks first in a dialog of our own, usable from the
 * keyboard; right after opening a project or a share link there is nothing to undo. Expected
 * numbers come from the core's solveProject() run here in Node on the same document.
 */
import { expect, type Page, test } from '@playwright/test';
import LZString from 'lz-string';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { solveProject } from '../src/core/index.ts';
import { ALL_STARTERS, STARTERS } from '../src/state/starters.ts';

test.slow(); // several opens and solves each on a shared 2-core machine

function solverStatus(page: Page) {
  return page.getByRole('region', { name: 'Results' }).getByRole('status');
}

async function openApp(page: Page, path = '/') {
  await page.goto(path);
  await expect(solverStatus(page)).toHaveText('Up to date.');
}

async function menuItem(page: Page, name: string) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name, exact: true }).click();
}

const question = (page: Page) =>
  page.getByRole('alertdialog', { name: 'Replace the project on screen?' });

async function chooseStarter(page: Page, name: string) {
  await menuItem(page, 'New project…');
  const dialog = page.getByRole('dialog', { name: 'New project' });
  await dialog.getByRole('button', { name, exact: true }).click();
}

/** Rows of the results table: one per state (installation first), as the core solves them. */
async function expectSolvedAs(page: Page, project: (typeof ALL_STARTERS)[number]['project']) {
  await expect(page.getByLabel('Project title')).toHaveValue(project.title);
  await expect(solverStatus(page)).toHaveText('Up to date.');
  const expected = solveProject(project);
  const rows = page.getByRole('table', { name: 'Results by case' }).locator('tbody tr');
  await expect(rows).toHaveCount(expected.cases.length);
  for (const [i, result] of expected.cases.entries())
    await expect(rows.nth(i).getByRole('rowheader')).toContainText(result.name);
}

test('New project offers the blank span and each starter; each opens, solves, with nothing to undo', async ({
  page,
}) => {
  await openApp(page);
  for (const starter of ALL_STARTERS) {
    await chooseStarter(page, starter.name);
    // Only opened documents since the demo: nothing to lose, so nothing is asked.
    await expect(question(page)).toHaveCount(0);
    await expect(page.getByRole('dialog', { name: 'New project' })).toBeHidden();
    await expectSolvedAs(page, starter.project);
    await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  }
});

test('opening a starter over edits asks first; Escape and "Keep my project" keep them', async ({
  page,
}) => {
  await openApp(page);
  await page.getByLabel('Project title').fill('My yard, edited');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  const starter = STARTERS[0];

  await chooseStarter(page, starter.name);
  const ask = question(page);
  const chooser = page.getByRole('dialog', { name: 'New project' });
  await expect(ask).toBeVisible();
  await expect(ask).toContainText('“My yard, edited” has changes that are not saved');
  // The safe choice has the focus; Escape is the same as keeping. The list stays open.
  await expect(ask.getByRole('button', { name: 'Keep my project' })).toBeFocused();
  await page.keyboard.press('Escape');
  await expect(ask).toBeHidden();
  await expect(chooser).toBeVisible();
  await expect(page.getByLabel('Project title')).toHaveValue('My yard, edited');

  await chooser.getByRole('button', { name: starter.name, exact: true }).click();
  await ask.getByRole('button', { name: 'Keep my project' }).click();
  await expect(ask).toBeHidden();
  await expect(page.getByLabel('Project title')).toHaveValue('My yard, edited');

  // From the keyboard: Enter on the starter, Tab to the other choice and Enter.
  await chooser.getByRole('button', { name: starter.name, exact: true }).focus();
  await page.keyboard.press('Enter');
  await expect(ask.getByRole('button', { name: 'Keep my project' })).toBeFocused();
  await page.keyboard.press('Tab');
  await expect(ask.getByRole('button', { name: `Open “${starter.project.title}”` })).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(ask).toBeHidden();
  await expect(chooser).toBeHidden();
  await expectSolvedAs(page, starter.project);
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
});

test('edits kept in a file need no question; edits since, and over a reload, do', async ({
  page,
}) => {
  await openApp(page);
  await page.getByLabel('Project title').fill('Saved yard');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  const downloaded = page.waitForEvent('download');
  await menuItem(page, 'Save file');
  await downloaded;
  await expect(
    page.getByRole('status').filter({ hasText: 'project file was saved' }),
  ).toBeVisible();
  // Kept in a file: a new project opens at once.
  await chooseStarter(page, 'Blank span');
  await expect(page.getByLabel('Project title')).toHaveValue('New span');

  // An edit, then a reload: the edit is still not kept anywhere but the autosave.
  await page.getByLabel('Project title').fill('Edited before a reload');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue('Edited before a reload');
  const other = { ...demo, title: 'Opened from a file' };
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'other.sagwright.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(other)),
  });
  const ask = question(page);
  await expect(ask).toBeVisible();
  await ask.getByRole('button', { name: 'Keep my project' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue('Edited before a reload');
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'other.sagwright.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(other)),
  });
  await ask.getByRole('button', { name: 'Open “Opened from a file”' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue('Opened from a file');
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  // Undoing back to what was opened leaves nothing unkept.
  await page.getByLabel('Project title').fill('Changed');
  await page.getByLabel('Project title').blur();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue('Opened from a file');
  await chooseStarter(page, 'Blank span');
  await expect(question(page)).toHaveCount(0);
  await expect(page.getByLabel('Project title')).toHaveValue('New span');
});

test('opening a stored project over edits asks first, on top of the list', async ({ page }) => {
  await openApp(page);
  await menuItem(page, 'Projects in this browser…');
  const list = page.getByRole('dialog', { name: 'Projects in this browser' });
  await list.getByRole('button', { name: 'Save the open project here' }).click();
  await expect(list.getByRole('status')).toHaveText(`Saved “${demo.title}”.`);
  await list.getByRole('button', { name: 'Close' }).click();
  await page.getByLabel('Hot summer temperature (°C)').fill('44');
  await expect(solverStatus(page)).toHaveText('Up to date.');

  await menuItem(page, 'Projects in this browser…');
  await list.getByRole('button', { name: `Open ${demo.title}` }).click();
  const ask = question(page);
  await expect(ask).toBeVisible();
  await ask.getByRole('button', { name: 'Keep my project' }).click();
  await expect(ask).toBeHidden();
  await expect(list).toBeVisible();
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('44');
  await list.getByRole('button', { name: `Open ${demo.title}` }).click();
  await ask.getByRole('button', { name: `Open “${demo.title}”` }).click();
  await expect(list).toBeHidden();
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('40');
});

test('right after opening a share link there is nothing to undo', async ({ page }) => {
  const link = (title: string) =>
    `/#project=${LZString.compressToEncodedURIComponent(JSON.stringify({ ...demo, title }))}`;
  // A link opened in a new tab.
  await openApp(page, link('Shared courtyard'));
  await expect(page.getByLabel('Project title')).toHaveValue('Shared courtyard');
  await expect(page.getByRole('region', { name: 'Shared project' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  // An edit to the shared project is undoable as usual, back to the link's own document.
  await page.getByLabel('Project title').fill('Shared courtyard, changed');
  await page.getByLabel('Project title').blur();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue('Shared courtyard');
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
  // A link pasted into the tab (only the fragment changes, no reload).
  await page.getByRole('button', { name: 'Keep it' }).click();
  await page.goto(link('Pasted courtyard'));
  await expect(page.getByLabel('Project title')).toHaveValue('Pasted courtyard');
  await expect(page.getByRole('button', { name: 'Undo' })).toBeDisabled();
});
