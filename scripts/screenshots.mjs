#!/usr/bin/env node
/**
 * Screenshots of the workbench for doc/screenshots/: the demo and each way to start (the blank
 * span and the starters), plus the New project list and the question asked before replacing
 * edits, at 1366×768 and 1920×1080. Needs the built app served, e.g.
 *   npx vite build && npx vite preview --port 4413 --bypass-lock &
 *   BASE=http://localhost:4413 node scripts/screenshots.mjs
 * OUT sets the folder (default doc/screenshots). Look at every picture before committing it.
 */
import { mkdirSync } from 'node:fs';
import { chromium } from '@playwright/test';

const base = process.env.BASE ?? 'http://localhost:4413';
const out = process.env.OUT ?? 'doc/screenshots';
const sizes = [
  [1366, 768],
  [1920, 1080],
];
const starts = [
  ['demo', null],
  ['blank-span', 'Blank span'],
  ['garden-clothesline', 'Garden clothesline'],
  ['courtyard-string-lights', 'Lights across a courtyard'],
  ['trellis-over-posts', 'Trellis line over posts'],
  ['yard-sign', 'Sign over a yard'],
];

mkdirSync(out, { recursive: true });
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-background-networking',
    '--disable-component-update',
  ],
});

async function newProject(page, name) {
  await page.getByRole('button', { name: 'File and export' }).click();
  await page.getByRole('button', { name: 'New project…' }).click();
  const list = page.getByRole('dialog', { name: 'New project' });
  await list.waitFor();
  return name ? list.getByRole('button', { name, exact: true }).click() : list;
}

for (const [id, name] of starts)
  for (const [width, height] of sizes) {
    const page = await browser.newPage({ viewport: { width, height } });
    const file = (what) => `${out}/workbench-${what}-${width}x${height}.png`;
    await page.goto(base);
    const status = page
      .getByRole('region', { name: 'Results', exact: true })
      .getByRole('status')
      .first();
    await status.filter({ hasText: 'Up to date.' }).waitFor({ timeout: 60_000 });
    if (id === 'blank-span') {
      await newProject(page, null);
      await page.screenshot({ path: file('dialog-new') });
      await page.keyboard.press('Escape');
    }
    if (name) {
      await newProject(page, name);
      await page.waitForTimeout(300);
      await status.filter({ hasText: 'Up to date.' }).waitFor({ timeout: 60_000 });
    }
    await page.locator('[data-plot-state=drawn]').first().waitFor({ timeout: 60_000 });
    // The one-time "works offline" note is not part of the workbench's picture.
    await page
      .getByRole('button', { name: 'OK' })
      .click({ timeout: 2000 })
      .catch(() => {});
    await page.mouse.move(0, 0);
    await page.waitForTimeout(1500);
    await page.screenshot({ path: file(id) });
    if (id === 'demo') {
      await page.getByLabel('Project title').fill('My yard');
      await newProject(page, 'Sign over a yard');
      await page.getByRole('alertdialog').waitFor();
      await page.screenshot({ path: file('dialog-confirm') });
    }
    await page.close();
  }
await browser.close();
