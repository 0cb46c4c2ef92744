/**
 * The solver worker failing in a real Chromium, and the page recovering. The app has no
 * test-only hook, so the failures are made at the network: page.route serves the worker script
 * (a failed load, or a stand-in that crashes or goes silent on a chosen request and otherwise
 * imports the real built worker). Expected numbers come from the core's solveProject() in Node
 * on the same document, so "recovered" means the page shows the solver's values for the newest
 * document, not just that a status line changed. The page answers its first, small document
 * itself and starts the worker once the first plot is drawn, giving it the document on screen
 * once to compile the solver: the first edit is the worker's second message.
 */
import { expect, type Page, type Route, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import {
  type Project,
  type ProjectResults,
  solveProject,
  validateProject,
} from '../src/core/index.ts';

const WORKER_SCRIPT = /\/solver\.worker-[\w-]+\.js(\?.*)?$/;
const newtons = new Intl.NumberFormat('en', { maximumFractionDigits: 0, minimumFractionDigits: 0 });

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

/** Every case's row names the case and shows the core's horizontal and largest tension. */
async function expectResultsOf(page: Page, results: ProjectResults) {
  const table = page.getByRole('table', { name: 'Results by case' });
  for (const result of results.cases) {
    const row = table
      .getByRole('row')
      .filter({ has: page.getByRole('rowheader', { name: result.name }) });
    await expect(row).toContainText(newtons.format(result.horizontalTension));
    await expect(row).toContainText(newtons.format(result.maxTension));
  }
}

/**
 * A worker script that behaves like the real one (it imports it) until request number
 * `failOn`, where it throws out of the message handler (crash), closes itself without a word
 * (silent: only the release of its lock tells), spins forever while alive (hang: only the
 * watchdog can tell), or is busy for 3 s before answering (busy: must be left alone).
 */
function standInWorker(
  realUrl: string,
  failOn: number,
  how: 'crash' | 'silent' | 'hang' | 'busy',
): string {
  const fail = {
    crash: "throw new Error('solver stand-in crashed on purpose');",
    silent: 'self.close(); return;',
    hang: 'for (;;) {}',
    busy: 'const until = performance.now() + 3000; while (performance.now() < until) {}',
  }[how];
  return `import ${JSON.stringify(`${realUrl}?real`)};
const real = self.onmessage;
let count = 0;
self.onmessage = (event) => {
  count += 1;
  if (count === ${failOn}) { ${fail} }
  real(event);
};`;
}

/** Routes the worker script: the first load is `first`, every later load the real file. */
async function routeWorker(page: Page, first: (route: Route) => Promise<void>) {
  const loads: string[] = [];
  await page.route(WORKER_SCRIPT, async (route) => {
    const url = route.request().url();
    loads.push(url);
    if (url.endsWith('?real') || loads.filter((u) => !u.endsWith('?real')).length > 1)
      return route.continue();
    return first(route);
  });
  return () => loads.filter((u) => !u.endsWith('?real')).length;
}

function collectErrors(page: Page): string[] {
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(error.message));
  return problems;
}

test('a worker script that fails to load is started again and the edit is solved', async ({
  page,
}) => {
  const problems = collectErrors(page);
  const starts = await routeWorker(page, (route) => route.abort('failed'));
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(demoProject()));
  // The worker started after the first plot failed to load; the edit starts it again.
  await expect.poll(starts).toBe(1);
  const project = demoProject();
  await page.getByLabel('Hot summer temperature (°C)').fill('39');
  project.cases[0].temperature = 39;
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
  expect(starts()).toBe(2);
  expect(problems).toEqual([]);
});

test('a worker that crashes while solving an edit is replaced and the edit is solved', async ({
  page,
}) => {
  const problems = collectErrors(page);
  const starts = await routeWorker(page, async (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: standInWorker(route.request().url(), 2, 'crash'),
    }),
  );
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  const project = demoProject();
  await expectResultsOf(page, solveProject(project));
  await expect.poll(starts).toBe(1);

  // The worker's second message (this edit, after the warm-up) crashes it; the client starts a
  // new one and sends the newest document again.
  await page.getByLabel('Studio wall bracket Position (m)').fill('24');
  project.supports[1].x = 24;
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
  expect(starts()).toBe(2);
  expect(problems).toEqual([]);
});

test('a worker that ends without a word is noticed at once and the edit is solved', async ({
  page,
}) => {
  await page.clock.install();
  const starts = await routeWorker(page, async (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: standInWorker(route.request().url(), 2, 'silent'),
    }),
  );
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect.poll(starts).toBe(1); // started after the first plot
  // The page's timers stand still from here: no watchdog can fire, so only the worker's
  // released lock (doc/ui.md) can tell the page that the worker is gone.
  await page.clock.pauseAt((await page.evaluate(() => Date.now())) + 1000);
  const project = demoProject();
  await page.getByLabel('Hot summer temperature (°C)').fill('45');
  project.cases[0].temperature = 45;
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
  expect(starts()).toBe(2);
});

test('a worker busy with a long solve is left alone and its answer is used', async ({ page }) => {
  const starts = await routeWorker(page, async (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: standInWorker(route.request().url(), 2, 'busy'),
    }),
  );
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect.poll(starts).toBe(1); // started after the first plot
  const project = demoProject();
  await page.getByLabel('Hot summer temperature (°C)').fill('38');
  project.cases[0].temperature = 38;
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
  expect(starts()).toBe(1);
});

test('a worker that hangs while alive is replaced after the watchdog time and the edit is solved', async ({
  page,
}) => {
  await page.clock.install();
  const starts = await routeWorker(page, async (route) =>
    route.fulfill({
      contentType: 'text/javascript',
      body: standInWorker(route.request().url(), 2, 'hang'),
    }),
  );
  await page.goto('/');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect.poll(starts).toBe(1); // started after the first plot
  await page.clock.pauseAt((await page.evaluate(() => Date.now())) + 1000);
  const project = demoProject();
  await page.getByLabel('Hot summer temperature (°C)').fill('45');
  project.cases[0].temperature = 45;
  // A hung worker still holds its lock: only the watchdog (20 s, doc/ui.md) gives up on it.
  await expect(page.getByRole('status')).toHaveText('Solving the change…');
  await page.clock.runFor('00:19');
  await expect(page.getByRole('status')).toHaveText('Solving the change…');
  expect(starts()).toBe(1);
  await page.clock.runFor('00:02');
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
  expect(starts()).toBe(2);
});

test('a worker that cannot start at all is reported, the page stays usable and recovers', async ({
  page,
}) => {
  let blocked = true;
  let attempts = 0;
  await page.route(WORKER_SCRIPT, (route) => {
    attempts += 1;
    return blocked ? route.abort('failed') : route.continue();
  });
  await page.goto('/');
  // The demo is answered on the page; the start after the first plot fails quietly.
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expect.poll(() => attempts).toBe(1);
  const project = demoProject();
  await page.getByLabel('Hot summer temperature (°C)').fill('44');
  project.cases[0].temperature = 44;
  // For the edit: one start and three restarts (doc/ui.md), then the failure is reported.
  await expect(page.getByRole('status')).toContainText('the solver could not be loaded');
  // The status blames the solver, not the design, and says nothing typed is lost.
  await expect(page.getByRole('status')).toContainText('Your inputs are kept');
  await expect(page.getByRole('status')).not.toContainText('design could not be solved');
  expect(attempts).toBe(5);
  await expect(page.getByLabel('Project title')).toHaveValue(demo.title);
  await expect(page.getByLabel('Hot summer temperature (°C)')).toHaveValue('44');

  blocked = false;
  await page.getByLabel('Hot summer temperature (°C)').fill('41');
  project.cases[0].temperature = 41;
  await expect(page.getByRole('status')).toHaveText('Up to date.');
  await expectResultsOf(page, solveProject(project));
});
