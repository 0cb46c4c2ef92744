/**
 * A long session as a person might have it: fixings, hung loads and weather cases added and
 * removed in a seeded random order, loads stretched to the far fixing before it is removed, the
 * target stated in a case that is then deleted, reloads in between. After every step the stored
 * autosave is a valid project; after every reload the page shows exactly what was stored and
 * never the demo in its place.
 */
import { expect, type Page, test } from '@playwright/test';
import { type Project, validateProject } from '../src/core/index.ts';

/** Mulberry32: a small seeded generator, so a failing order can be replayed. */
function random(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const TITLE = 'Scripted yard';

async function stored(page: Page): Promise<Project> {
  const text = await page.evaluate(() => localStorage.getItem('sagwright:autosave'));
  const checked = validateProject(JSON.parse(text ?? 'null'));
  expect(checked.ok ? [] : checked.issues).toEqual([]);
  return (checked as { project: Project }).project;
}

const region = (page: Page, name: string) => page.getByRole('region', { name });

async function clickNth(scope: ReturnType<Page['getByRole']>, pick: number) {
  const buttons = scope.getByRole('button', { name: /^(Remove|Delete) / });
  const count = await buttons.count();
  if (count === 0) return false;
  await buttons.nth(Math.floor(pick * count)).click();
  return true;
}

type Step = (page: Page, pick: number) => Promise<unknown>;

const steps: Record<string, Step> = {
  'add a fixing': (page) =>
    page.getByRole('button', { name: 'Add a fixing at the far end' }).click(),
  'remove a fixing': (page, pick) =>
    clickNth(page.getByRole('group', { name: 'Fixings', exact: true }), pick),
  'add a point load': (page) => page.getByRole('button', { name: 'Add a point load' }).click(),
  'add a part-span load reaching the far fixing': async (page) => {
    await page.getByRole('button', { name: 'Add a part-span load' }).click();
    const project = await stored(page);
    const farX = project.supports[project.supports.length - 1].x;
    const to = page.getByLabel('To (m)').last();
    await to.fill(String(farX));
  },
  'remove a load': (page, pick) => clickNth(region(page, 'Hung loads'), pick),
  'add a weather case': (page) => page.getByRole('button', { name: 'Add a weather case' }).click(),
  'delete a weather case': (page, pick) => clickNth(region(page, 'Weather cases'), pick),
  'state the target in a case': async (page, pick) => {
    const select = page.getByLabel('Target holds in');
    if ((await select.count()) === 0) return;
    const options = await select.locator('option').allTextContents();
    await select.selectOption({ index: Math.floor(pick * options.length) });
  },
};

async function settle(page: Page) {
  await expect(page.getByRole('alert', { name: 'Stored project' })).toHaveCount(0);
  await expect(page.getByLabel('Project title')).toHaveValue(TITLE);
}

/** Every kind of step once per round, in a seeded random order. */
function shuffled(names: readonly string[], next: () => number): string[] {
  const deck = [...names];
  for (let i = deck.length - 1; i > 0; i--) {
    const j = Math.floor(next() * (i + 1));
    [deck[i], deck[j]] = [deck[j], deck[i]];
  }
  return deck;
}

async function reloadAndCompare(page: Page, log: string[]) {
  const before = await stored(page);
  log.push('reload');
  await page.reload();
  await settle(page);
  expect(await stored(page), log.join(' → ')).toEqual(before);
  // What is shown is what was stored: one fixing row per stored fixing, one row per case.
  await expect(page.getByRole('group', { name: /^Fixing \d+$/ })).toHaveCount(
    before.supports.length,
  );
  await expect(region(page, 'Weather cases').getByRole('row')).toHaveCount(before.cases.length + 1);
}

test('a long session of adds, removals and reloads never loses the project', async ({ page }) => {
  test.setTimeout(600_000);
  const next = random(20261202);
  const names = Object.keys(steps);
  await page.goto('/');
  await page.getByLabel('Project title').fill(TITLE);
  const log: string[] = [];
  const order = [...shuffled(names, next), ...shuffled(names, next)];
  for (const [i, name] of order.entries()) {
    log.push(name);
    await steps[name](page, next());
    await settle(page);
    expect((await stored(page)).title, log.join(' → ')).toBe(TITLE);
    if (i % 4 === 3) await reloadAndCompare(page, log);
  }
});
