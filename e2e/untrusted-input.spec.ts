/**
 * A stranger's link in a real Chromium: a share link crafted to unpack to about 200 million
 * characters is refused at once and gone from the address bar (so a reload cannot hit it
 * again); names carrying Plotly markup (<a href>, <b>) are drawn as the characters typed, so
 * clicking where the link would be opens nothing; and the page obeys its Content-Security-Policy
 * with no violation while it loads, solves and draws.
 */
import { expect, type Page, test } from '@playwright/test';
import LZString from 'lz-string';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, validateProject } from '../src/core/index.ts';
import { lzBomb, unpackedLength } from '../tests/helpers/lzBomb.ts';

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

/** The solver's status line (the results also hold the design aids' own status). */
function solverStatus(page: Page) {
  return page
    .getByRole('region', { name: 'Results' })
    .getByRole('status')
    .and(page.locator(':not([aria-label="Design aids status"])'));
}

const plot = (page: Page) => page.getByRole('figure', { name: 'Sag plot' });

test('a share link that would unpack to 200 million characters is refused and cleared at once', async ({
  page,
}) => {
  test.slow(); // two page loads and a reload on a shared machine
  const codes = 20_000;
  expect(unpackedLength(codes)).toBeGreaterThan(2e8);
  await page.goto('/');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await page.goto(`/#project=${lzBomb(codes)}`);
  const alert = page.getByRole('alert').filter({ hasText: 'was not opened' });
  await expect(alert).toContainText('unpacks to more than 1 million characters');
  expect(page.url()).not.toContain('#project=');
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  // The tab still answers, and a reload opens the person's own project, not the link again.
  await page.getByLabel('Project title').fill('Still mine');
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await page.reload();
  await expect(page.getByLabel('Project title')).toHaveValue('Still mine');
  await expect(alert).toBeHidden();
});

test('names carrying <a href> and <b> are drawn as text; clicking where the link would be opens nothing', async ({
  page,
  context,
}) => {
  const shared = demoProject();
  const caseLink = '<a href="https://example.test/case">Hot summer</a>';
  const fixingLink = '<b>Kitchen</b> <a href="https://example.test/fixing">wall</a>';
  shared.cases[0].name = caseLink;
  shared.supports[0].label = fixingLink;
  (shared.limits.zones ?? [])[0].label = '<a href="https://example.test/zone">Walkway</a>';
  const requests: string[] = [];
  page.on('request', (request) => requests.push(request.url()));
  await page.goto(`/#project=${LZString.compressToEncodedURIComponent(JSON.stringify(shared))}`);
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await expect(plot(page)).toHaveAttribute('data-plot-state', 'drawn');
  const canvas = plot(page).locator('.js-plotly-plot');
  // No link element anywhere in the drawn plot; the markup is there as characters.
  await expect(canvas.locator('a')).toHaveCount(0);
  const legendEntry = canvas.locator('.legendtext', { hasText: caseLink });
  await expect(legendEntry).toHaveCount(1);
  const fixingText = canvas.locator('.textpoint', { hasText: fixingLink });
  await expect(fixingText).toHaveCount(1);
  const pageUrl = page.url();
  const pagesBefore = context.pages().length;
  for (const target of [legendEntry, fixingText]) {
    await target.click({ force: true });
  }
  await page.waitForTimeout(300);
  expect(context.pages().length).toBe(pagesBefore);
  expect(page.url()).toBe(pageUrl);
  expect(requests.filter((url) => url.includes('example.test'))).toEqual([]);
});

test('the page runs under its Content-Security-Policy with no violation and no foreign request', async ({
  page,
}) => {
  test.slow(); // loads Plotly and draws three exports on a shared machine
  await page.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { __violations: string[] }).__violations = seen;
    document.addEventListener('securitypolicyviolation', (event) =>
      seen.push(`${event.violatedDirective} ${event.blockedURI} ${event.sourceFile}`),
    );
  });
  const requests: string[] = [];
  page.on('request', (request) => requests.push(request.url()));
  const response = await page.goto('/');
  const header = response?.headers()['content-security-policy'] ?? '';
  expect(header).toContain("script-src 'self'");
  expect(header).not.toMatch(/unsafe-inline|unsafe-eval/);
  const meta = page.locator('meta[http-equiv="Content-Security-Policy"]');
  await expect(meta).toHaveAttribute(
    'content',
    /default-src 'self'; script-src 'self'; style-src 'self'/,
  );
  await expect(solverStatus(page)).toHaveText('Up to date.');
  await expect(plot(page)).toHaveAttribute('data-plot-state', 'drawn');
  for (const item of ['Plot as SVG', 'Plot as PNG', 'Wire profiles as CSV']) {
    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'File and export' }).click();
    await page.getByRole('button', { name: item, exact: true }).click();
    await download;
  }
  await page.mouse.move(500, 400); // hover labels
  expect(
    await page.evaluate(() => (window as unknown as { __violations: string[] }).__violations),
  ).toEqual([]);
  const origin = new URL(page.url()).origin;
  expect(requests.filter((url) => !url.startsWith(origin) && !/^(data|blob):/.test(url))).toEqual(
    [],
  );
  // No source maps shipped: the scripts the page loaded point to none.
  const scripts = requests.filter((url) => url.endsWith('.js'));
  expect(scripts.length).toBeGreaterThan(0);
  for (const url of scripts) {
    const body = await (await page.request.get(url)).text();
    expect(body, url).not.toContain('sourceMappingURL');
  }
});
