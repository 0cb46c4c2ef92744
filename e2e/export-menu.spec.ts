/**
 * The file and export menu in a real Chromium, used as a person would (menu, dialog, file
 * chooser, clipboard, downloads): projects kept in this browser (IndexedDB), the share link in
 * a second page, the file round trip, the SVG plot and the CSV of wire profiles. Expected
 * numbers come from the core's solveProject() run here in Node on the same document, and unit
 * factors from their exact definitions (NIST SP 811).
 */
import { readFileSync } from 'node:fs';
import AxeBuilder from '@axe-core/playwright';
import { expect, type Page, test } from '@playwright/test';
import LZString from 'lz-string';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

/** The solver's status line in the results, not the export menu's notices. */
function solverStatus(page: Page) {
  return page.getByRole('region', { name: 'Results' }).getByRole('status');
}

async function openDemo(page: Page, path = '/') {
  await page.goto(path);
  await expect(solverStatus(page)).toHaveText('Up to date.');
}

async function menuItem(page: Page, name: string) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name, exact: true }).click();
}

/** Runs a menu item that downloads a file and returns the file's name and text. */
async function download(page: Page, item: string): Promise<{ name: string; text: string }> {
  const downloadPromise = page.waitForEvent('download');
  await menuItem(page, item);
  const file = await downloadPromise;
  const path = await file.path();
  return { name: file.suggestedFilename(), text: readFileSync(path, 'utf8') };
}

function autosave(page: Page): Promise<string | null> {
  return page.evaluate(() => localStorage.getItem('sagwright:autosave'));
}

test('Save file then Open file through the file chooser gives back the same document', async ({
  page,
}) => {
  await openDemo(page);
  const expected = demoProject();
  await page.getByLabel('Project title').fill('Round trip yard');
  await page.getByLabel('Hot summer temperature (°C)').fill('45');
  expected.title = 'Round trip yard';
  expected.cases[0].temperature = 45;
  await expect(solverStatus(page)).toHaveText('Up to date.');

  const saved = await download(page, 'Save file');
  expect(saved.name).toBe('round-trip-yard.sagwright.json');
  expect(JSON.parse(saved.text)).toEqual(expected);
  await expect(
    page.getByRole('status').filter({ hasText: 'project file was saved' }),
  ).toBeVisible();

  await page.getByLabel('Project title').fill('Something else');
  await page.getByLabel('Hot summer temperature (°C)').fill('30');
  const chooserPromise = page.waitForEvent('filechooser');
  await menuItem(page, 'Open file…');
  const chooser = await chooserPromise;
  await chooser.setFiles({
    name: saved.name,
    mimeType: 'application/json',
    buffer: Buffer.from(saved.text),
  });
  // The edits since saving are not kept anywhere: opening asks first.
  await page
    .getByRole('alertdialog', { name: 'Replace the project on screen?' })
    .getByRole('button', { name: 'Open “Round trip yard”' })
    .click();
  await expect(
    page.getByRole('status').filter({ hasText: 'Opened “Round trip yard”.' }),
  ).toBeVisible();
  await expect(page.getByLabel('Project title')).toHaveValue('Round trip yard');
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('45');
  // Saving the opened document again gives the same bytes.
  expect((await download(page, 'Save file')).text).toBe(saved.text);
});

test('Copy share link opens the same document in a new page; my autosave is untouched until Keep it', async ({
  page,
  context,
}) => {
  test.slow(); // two pages, two downloads and a dozen steps: tight in 30 s on a busy 2-core machine
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  await openDemo(page);
  await page.getByLabel('Project title').fill('Shared terrace span');
  await page.getByLabel('Hot summer temperature (°C)').fill('44');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  const sharedFile = await download(page, 'Save file');

  await menuItem(page, 'Copy share link');
  await expect(
    page.getByRole('status').filter({ hasText: 'Share link copied to the clipboard.' }),
  ).toBeVisible();
  const link = await page.evaluate(() => navigator.clipboard.readText());
  expect(link).toMatch(/^http:\/\/localhost:\d+\/#project=[\w+\-$]+$/);

  // The person carries on with their own work; that is what the autosave holds.
  await page.getByLabel('Project title').fill('My own work');
  await expect
    .poll(async () => JSON.parse((await autosave(page)) ?? '{}').title)
    .toBe('My own work');
  const own = await autosave(page);

  const viewer = await context.newPage();
  await openDemo(viewer, link);
  const banner = viewer.getByRole('region', { name: 'Shared project' });
  await expect(banner).toContainText('Shared terrace span');
  await expect(viewer.getByLabel('Project title')).toHaveValue('Shared terrace span');
  await expect(viewer.getByLabel('Hot summer temperature (°C)')).toHaveValue('44');
  // The same document, byte for byte, as the file saved where the link was made.
  expect((await download(viewer, 'Save file')).text).toBe(sharedFile.text);
  expect(await autosave(viewer)).toBe(own);

  // Editing the shared project still leaves the person's own work in storage.
  await viewer.getByLabel('Hot summer temperature (°C)').fill('46');
  await expect(solverStatus(viewer)).toHaveText('Up to date.');
  expect(await autosave(viewer)).toBe(own);

  await banner.getByRole('button', { name: 'Keep it' }).click();
  await expect(banner).toBeHidden();
  const kept = JSON.parse((await autosave(viewer)) ?? '{}') as Project;
  expect(kept.title).toBe('Shared terrace span');
  expect(kept.cases[0].temperature).toBe(46);
  expect(viewer.url()).not.toContain('#project=');
});

test('a share link pasted into a tab already showing the app opens there too', async ({ page }) => {
  await openDemo(page);
  const own = await autosave(page);
  const shared = { ...demoProject(), title: 'Pasted link yard' };
  const packed = LZString.compressToEncodedURIComponent(JSON.stringify(shared));
  // Only the fragment changes, so the browser does not reload the page.
  await page.goto(`/#project=${packed}`);
  const banner = page.getByRole('region', { name: 'Shared project' });
  await expect(banner).toContainText('Pasted link yard');
  await expect(page.getByLabel('Project title')).toHaveValue('Pasted link yard');
  expect(await autosave(page)).toBe(own);
  await banner.getByRole('button', { name: 'Go back to mine' }).click();
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  expect(page.url()).not.toContain('#project=');
});

test('without clipboard access the share link is shown to copy by hand', async ({ page }) => {
  // A page served over plain http from another machine is not a secure context, and such a
  // page has no navigator.clipboard at all (W3C Clipboard API, [SecureContext]).
  await page.addInitScript(() => {
    Object.defineProperty(Navigator.prototype, 'clipboard', { get: () => undefined });
  });
  await openDemo(page);
  await menuItem(page, 'Copy share link');
  const field = page.getByRole('textbox', { name: /Share link/ });
  await expect(field).toBeFocused();
  const link = await field.inputValue();
  const packed = link.slice(link.indexOf('#project=') + '#project='.length);
  expect(JSON.parse(LZString.decompressFromEncodedURIComponent(packed))).toEqual(demoProject());
  await page.getByRole('button', { name: 'Done' }).click();
  await expect(field).toBeHidden();
});

test('the SVG plot carries the title as text, markup and all, and no script', async ({ page }) => {
  await openDemo(page);
  // Plotly reads <b>, <a href> and friends in text; <img> and <script> are not in its subset.
  const title =
    '<b>Yard</b> & "shed" <a href="https://example.com/">site</a> <img src=x onerror="window.__hit=1"> <script>alert(1)</script>';
  await page.getByLabel('Project title').fill(title);
  await expect(solverStatus(page)).toHaveText('Up to date.');
  const svg = await download(page, 'Plot as SVG');
  // The file name keeps letters, digits and dashes only.
  expect(svg.name).toMatch(/^byardb-shed-[a-z0-9-]+-plot\.svg$/);
  const read = await page.evaluate((markup) => {
    const doc = new DOMParser().parseFromString(markup, 'image/svg+xml');
    const all = [...doc.querySelectorAll('*')];
    return {
      root: doc.documentElement.nodeName,
      parseErrors: doc.getElementsByTagName('parsererror').length,
      texts: [...doc.querySelectorAll('text')].map((t) => t.textContent ?? ''),
      elements: [...new Set(all.map((el) => el.localName))],
      risky: all.flatMap((el) =>
        [...el.attributes]
          .filter((a) => /^on/i.test(a.name) || /javascript:/i.test(a.value))
          .map((a) => `${el.localName} ${a.name}`),
      ),
    };
  }, svg.text);
  expect(read.root).toBe('svg');
  expect(read.parseErrors).toBe(0);
  expect(read.texts).toContain(title);
  for (const name of ['Installation', ...demo.cases.map((c) => c.name)])
    expect(read.texts).toContain(name);
  expect(read.texts).toContain('Distance along the span (m)');
  expect(read.texts.join(' ')).toContain('not for lifting or people');
  for (const tag of ['script', 'foreignObject', 'img', 'iframe'])
    expect(read.elements).not.toContain(tag);
  expect(read.risky).toEqual([]);
  expect(await page.evaluate(() => (window as { __hit?: number }).__hit)).toBeUndefined();
});

/** RFC 4180 fields of one line: commas split, double quotes group and "" is a quote. */
function csvFields(line: string): string[] {
  const fields: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted && c === '"' && line[i + 1] === '"') {
      field += '"';
      i++;
    } else if (c === '"') quoted = !quoted;
    else if (c === ',' && !quoted) {
      fields.push(field);
      field = '';
    } else field += c;
  }
  fields.push(field);
  return fields;
}

/** Height of a piecewise-linear ground line at x (the test's own interpolation). */
function groundAt(ground: { x: number; z: number }[], x: number): number {
  for (let i = 1; i < ground.length; i++) {
    const a = ground[i - 1];
    const b = ground[i];
    if (x <= b.x) return a.z + ((b.z - a.z) * (x - a.x)) / (b.x - a.x);
  }
  return ground[ground.length - 1].z;
}

/**
 * Every data row matches the core's profile, length / lengthFactor and force / forceFactor, to
 * the file's rounding (4 decimals of length in SI, 3 in US units, 1 of force). Returns the header.
 */
function expectCsvMatchesCore(
  text: string,
  project: Project,
  lengthFactor: number,
  forceFactor: number,
): string {
  const lines = text.split('\r\n').filter((l) => l !== '' && !l.startsWith('#'));
  const rows = lines.slice(1).map(csvFields);
  const expected: string[][] = [];
  const worst = { length: 0, force: 0 };
  for (const result of solveProject(project).cases) {
    const p = result.profile;
    if (!p) throw new Error('core returned no profile');
    for (let i = 0; i < p.x.length; i++) {
      const row = rows[expected.length] ?? [];
      expected.push([result.name]);
      const clearance = p.z[i] - groundAt(project.ground ?? [], p.x[i]);
      for (const [column, value] of [
        [1, p.x[i]],
        [2, p.z[i]],
        [3, clearance],
      ])
        worst.length = Math.max(worst.length, Math.abs(Number(row[column]) - value / lengthFactor));
      worst.force = Math.max(worst.force, Math.abs(Number(row[4]) - p.tension[i] / forceFactor));
    }
  }
  expect(rows.map((row) => [row[0]])).toEqual(expected);
  expect(worst.length).toBeLessThanOrEqual((lengthFactor === 1 ? 0.5e-4 : 0.5e-3) + 1e-9);
  expect(worst.force).toBeLessThanOrEqual(0.05 + 1e-9);
  return lines[0];
}

test('the CSV of wire profiles has units in its headers and the core profile in SI and US units', async ({
  page,
}) => {
  await openDemo(page);
  // A sloping ground line, so clearance differs from height.
  const project = demoProject();
  project.title = 'Sloping yard';
  project.ground = [
    { x: 0, z: 0 },
    { x: 10, z: 0.4 },
    { x: 22, z: 0.9 },
  ];
  await page.getByLabel('Project file to open').setInputFiles({
    name: 'sloping.sagwright.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(project)),
  });
  await expect(page.getByLabel('Project title')).toHaveValue('Sloping yard');

  const si = await download(page, 'Wire profiles as CSV');
  expect(si.name).toBe('sloping-yard-profiles.csv');
  // The title sits in its own quoted cell so that it can never start a formula.
  expect(si.text).toMatch(/^# Sagwright wire profiles,"Sloping yard"\r\n/);
  expect(si.text).toContain('# Caution');
  expect(expectCsvMatchesCore(si.text, project, 1, 1)).toBe(
    'case,x (m),height z (m),clearance above ground (m),tension (N),case id',
  );

  await page.getByRole('radio', { name: 'Imperial' }).check();
  const us = await download(page, 'Wire profiles as CSV');
  // ft = 0.3048 m and lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (NIST SP 811).
  expect(expectCsvMatchesCore(us.text, project, 0.3048, 4.4482216152605)).toBe(
    'case,x (ft),height z (ft),clearance above ground (ft),tension (lbf),case id',
  );
});

test.describe('projects in this browser', () => {
  test.use({ locale: 'en-GB', timezoneId: 'UTC' });

  test('save, list with title and date, rename, duplicate, delete with undo, open; kept after reload', async ({
    page,
  }) => {
    test.slow(); // one person's whole session with the list, a reload included
    await page.clock.setFixedTime(new Date('2025-03-12T14:05:00Z'));
    await openDemo(page);
    await page.getByLabel('Hot summer temperature (°C)').fill('45');
    await expect(solverStatus(page)).toHaveText('Up to date.');
    const menuButton = page.getByRole('button', { name: 'File and export' });

    await menuItem(page, 'Projects in this browser…');
    const dialog = page.getByRole('dialog', { name: 'Projects in this browser' });
    await expect(dialog.getByText('No projects saved in this browser yet.')).toBeVisible();
    const save = dialog.getByRole('button', { name: 'Save the open project here' });
    await expect(save).toBeFocused();
    await save.click();
    await expect(dialog.getByRole('status')).toHaveText('Saved “Courtyard festoon lights”.');
    const items = dialog.getByRole('list', { name: 'Saved projects' }).getByRole('listitem');
    await expect(items).toHaveCount(1);
    // en-GB, medium date and short time, at the page clock's time (UTC).
    await expect(items.first()).toContainText('Courtyard festoon lights');
    await expect(items.first()).toContainText('Saved 12 Mar 2025, 14:05');

    // Newest first: the copy made later is listed on top.
    await page.clock.setFixedTime(new Date('2025-03-12T14:30:00Z'));
    await dialog.getByRole('button', { name: 'Duplicate Courtyard festoon lights' }).click();
    await expect(items).toHaveCount(2);
    await expect(dialog.getByRole('status')).toHaveText('Made “Courtyard festoon lights (copy)”.');
    await expect(items.nth(0)).toContainText('Courtyard festoon lights (copy)');
    await expect(items.nth(0)).toContainText('14:30');
    await expect(items.nth(1)).toContainText('14:05');

    await dialog.getByRole('button', { name: 'Rename Courtyard festoon lights (copy)' }).click();
    const newTitle = dialog.getByRole('textbox', { name: /New title for/ });
    await expect(newTitle).toBeFocused();
    await newTitle.fill('  ');
    await newTitle.press('Enter');
    await expect(dialog.getByRole('alert')).toHaveText('title: must not be empty');
    await newTitle.fill('Terrace span, option B');
    await newTitle.press('Enter');
    const renamed = dialog.getByRole('button', { name: 'Rename Terrace span, option B' });
    await expect(renamed).toBeFocused();
    await expect(dialog.getByRole('status')).toHaveText('Renamed to “Terrace span, option B”.');
    await expect(dialog.getByRole('alert')).toBeHidden();
    // Escape inside the title box leaves the renaming, not the dialog.
    await renamed.click();
    await newTitle.press('Escape');
    await expect(newTitle).toBeHidden();
    await expect(dialog).toBeVisible();

    await dialog
      .getByRole('button', { name: 'Delete Courtyard festoon lights', exact: true })
      .click();
    await expect(items).toHaveCount(1);
    await expect(dialog.getByRole('status')).toContainText('Deleted “Courtyard festoon lights”.');
    const undo = dialog.getByRole('button', { name: 'Undo' });
    await expect(undo).toBeFocused();
    await undo.click();
    await expect(items).toHaveCount(2);
    await expect(items.nth(1)).toContainText('Courtyard festoon lights');

    // Escape closes the dialog and the focus returns to the menu button.
    await page.keyboard.press('Escape');
    await expect(dialog).toBeHidden();
    await expect(menuButton).toBeFocused();

    // IndexedDB keeps the list over a reload; opening brings back the stored document.
    await page.reload();
    await page.getByLabel('Hot summer temperature (°C)').fill('30');
    await expect(solverStatus(page)).toHaveText('Up to date.');
    await menuItem(page, 'Projects in this browser…');
    await expect(items).toHaveCount(2);
    await dialog.getByRole('button', { name: 'Open Terrace span, option B' }).click();
    // The edit since the reload is not kept anywhere: opening asks first.
    await page
      .getByRole('alertdialog', { name: 'Replace the project on screen?' })
      .getByRole('button', { name: 'Open “Terrace span, option B”' })
      .click();
    await expect(dialog).toBeHidden();
    await expect(menuButton).toBeFocused();
    await expect(page.getByLabel('Project title')).toHaveValue('Terrace span, option B');
    await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('45');
    const expected = demoProject();
    expected.title = 'Terrace span, option B';
    expected.cases[0].temperature = 45;
    await expect.poll(async () => JSON.parse((await autosave(page)) ?? '{}')).toEqual(expected);
  });

  test('the dialog is modal, Tab stays inside it, and axe finds nothing serious', async ({
    page,
  }) => {
    await openDemo(page);
    await menuItem(page, 'Projects in this browser…');
    const dialog = page.getByRole('dialog', { name: 'Projects in this browser' });
    await dialog.getByRole('button', { name: 'Save the open project here' }).click();
    await expect(dialog.getByRole('listitem')).toHaveCount(1);
    const scan = await new AxeBuilder({ page }).include('dialog').analyze();
    const serious = scan.violations.filter(
      (v) => v.impact === 'serious' || v.impact === 'critical',
    );
    expect(serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target).join(', ')}`)).toEqual([]);
    for (let i = 0; i < 6; i++) {
      await page.keyboard.press('Tab');
      const inside = await dialog.evaluate((d) => d.contains(document.activeElement));
      const onPage = await page.evaluate(() => document.activeElement !== document.body);
      expect(!onPage || inside).toBe(true);
    }
  });
});
