/**
 * Moving things on the side view in a real Chromium: a fixing dragged by mouse and a point load
 * moved by the arrow keys change the project (the inputs follow, the plot follows while the
 * drag is on) and one Undo puts each back; a refused position leaves the last good one and
 * names the field. The plot's toolbar offers our own PNG and SVG downloads (title and caution
 * in the image) and no button that sends the chart to an online service; hovering the wire
 * reads the wire, not its dashed parabola.
 */
import { readFileSync } from 'node:fs';
import { expect, type Page, test } from '@playwright/test';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };

const FAR = demo.supports[1];
const LANTERN = demo.loads[1] as { x: number; label: string };

async function open(page: Page) {
  await page.goto('/');
  await expect(page.getByRole('figure', { name: 'Sag plot' })).toHaveAttribute(
    'data-plot-state',
    'drawn',
    { timeout: 30_000 },
  );
}

const farHandle = (page: Page) =>
  page.getByRole('button', { name: new RegExp(`^Move ${FAR.label} \\(`) });
const farPosition = (page: Page) => page.getByLabel(`${FAR.label} Position (m)`);
const farHeight = (page: Page) => page.getByLabel(`${FAR.label} Height (m)`);

/** Where the far fixing's marker is drawn (its SVG transform). */
function markerAt(page: Page) {
  return page
    .locator('.scatterlayer .trace')
    .last()
    .locator('path.point')
    .last()
    .getAttribute('transform');
}

test('a fixing dragged by mouse moves in the project, the plot follows, one Undo restores it', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await open(page);
  await expect(farPosition(page)).toHaveValue(String(FAR.x));
  const box = await farHandle(page).boundingBox();
  if (!box) throw new Error('no handle for the far fixing');
  const [x0, y0] = [box.x + box.width / 2, box.y + box.height / 2];
  const drawnBefore = await markerAt(page);
  await page.mouse.move(x0, y0);
  await page.mouse.down();
  // A little left (the cable ends at 21.5 m) and well up, in steps as a hand would.
  for (let i = 1; i <= 10; i++) {
    await page.mouse.move(x0 - i, y0 - 4 * i);
    await page.waitForTimeout(30);
  }
  // While the button is still down, the inputs and the drawn marker have followed.
  await expect(farHeight(page)).not.toHaveValue(String(FAR.z));
  await expect.poll(() => markerAt(page)).not.toBe(drawnBefore);
  await page.mouse.up();
  const x = Number(await farPosition(page).inputValue());
  const z = Number(await farHeight(page).inputValue());
  expect(x).toBeLessThan(FAR.x);
  expect(x).toBeGreaterThanOrEqual(21.5);
  expect(z).toBeGreaterThan(FAR.z + 0.2);
  await expect(farHandle(page)).toHaveAccessibleName(
    `Move ${FAR.label} (${x.toFixed(2)} m along the span, ${z.toFixed(2)} m high)`,
  );
  // The whole drag is one undo step.
  await page.getByRole('button', { name: 'Undo', exact: true }).click();
  await expect(farPosition(page)).toHaveValue(String(FAR.x));
  await expect(farHeight(page)).toHaveValue(String(FAR.z));
  await expect(page.getByRole('button', { name: 'Undo', exact: true })).toBeDisabled();
});

test('a point load moved by the arrow keys moves in the project; one Undo restores it', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await open(page);
  const slider = page.getByRole('slider', { name: `Move ${LANTERN.label} along the wire` });
  await expect(slider).toHaveAttribute('aria-valuenow', String(LANTERN.x));
  await slider.focus();
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('ArrowRight');
  await page.keyboard.press('Shift+ArrowRight');
  const moved = (LANTERN.x + 1.2).toFixed(1);
  await expect(page.getByLabel(`${LANTERN.label} Position (m)`)).toHaveValue(moved);
  await expect(slider).toHaveAttribute('aria-valuenow', moved);
  await expect(slider).toHaveAttribute(
    'aria-valuetext',
    `${Number(moved).toFixed(2)} m along the span`,
  );
  await page.getByRole('button', { name: 'Undo', exact: true }).click();
  await expect(page.getByLabel(`${LANTERN.label} Position (m)`)).toHaveValue(String(LANTERN.x));
  await expect(slider).toHaveAttribute('aria-valuenow', String(LANTERN.x));
});

test('a refused position keeps the last good one and names the field as the inputs do', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await open(page);
  const handle = farHandle(page);
  await handle.focus();
  // The festoon cable runs to 21.5 m: half a metre in is as far as the fixing may come.
  for (let i = 0; i < 5; i++) await page.keyboard.press('ArrowLeft');
  await expect(farPosition(page)).toHaveValue('21.5');
  await page.keyboard.press('ArrowLeft');
  const refusal = page.getByRole('alert').filter({ hasText: 'stays where it was' });
  await expect(refusal).toContainText(`${FAR.label} cannot go to 21.40 m along`);
  await expect(refusal).toContainText(`${demo.loads[0].label} To must be at most 21.4 m`);
  await expect(farPosition(page)).toHaveValue('21.5');
  // A good position clears the refusal.
  await page.keyboard.press('ArrowUp');
  await expect(refusal).toBeHidden();
  await expect(farHeight(page)).toHaveValue((FAR.z + 0.1).toFixed(1));
});

test('the toolbar offers our own downloads and nothing that sends the chart online', async ({
  page,
}) => {
  test.setTimeout(90_000);
  await open(page);
  const plot = page.getByRole('figure', { name: 'Sag plot' });
  await plot.locator('.js-plotly-plot').hover();
  const modebar = plot.locator('.modebar');
  await expect(modebar.getByRole('button').first()).toBeAttached();
  const names = await modebar
    .getByRole('button')
    .evaluateAll((buttons) => buttons.map((b) => b.getAttribute('aria-label') ?? ''));
  expect(names.length).toBeGreaterThan(0);
  for (const name of names) expect(name).not.toMatch(/share|cloud|edit|studio|send|download/i);
  const download = page.waitForEvent('download');
  await plot.getByRole('button', { name: 'Download SVG' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('courtyard-festoon-lights-sag-plot.svg');
  const svg = readFileSync((await file.path()) ?? '', 'utf8');
  expect(svg).toContain(demo.title);
  expect(svg).toContain('Caution: Check against local codes');
  const png = page.waitForEvent('download');
  await plot.getByRole('button', { name: 'Download PNG' }).click();
  const pngFile = await png;
  expect(pngFile.suggestedFilename()).toBe('courtyard-festoon-lights-sag-plot.png');
  const bytes = readFileSync((await pngFile.path()) ?? '');
  expect(bytes.subarray(1, 4).toString('latin1')).toBe('PNG');
});

test('hovering the wire reads the wire, not its dashed parabola', async ({ page }) => {
  test.setTimeout(90_000);
  await open(page);
  const plot = page.getByRole('figure', { name: 'Sag plot' }).locator('.js-plotly-plot');
  // The installed wire at mid-span, in page pixels from the drawn axes.
  const point = await plot.evaluate((element) => {
    type Axis = { _offset: number; l2p: (v: number) => number };
    type Trace = { name: string; x: number[]; y: number[]; hoverinfo?: string };
    const gd = element as HTMLElement & {
      data: Trace[];
      _fullLayout: { xaxis: Axis; yaxis: Axis };
    };
    const wire = gd.data.find((t) => t.name === 'Installation');
    if (!wire) return null;
    const i = Math.floor(wire.x.length / 3);
    const box = element.getBoundingClientRect();
    const { xaxis, yaxis } = gd._fullLayout;
    return {
      x: box.left + xaxis._offset + xaxis.l2p(wire.x[i]),
      y: box.top + yaxis._offset + yaxis.l2p(wire.y[i]),
      skipped: gd.data.filter((t) => t.name.endsWith('parabola')).map((t) => t.hoverinfo),
    };
  });
  if (!point) throw new Error('no installation wire drawn');
  expect(point.skipped.length).toBeGreaterThan(0);
  expect(point.skipped.every((h) => h === 'skip')).toBe(true);
  await page.mouse.move(point.x, point.y);
  const label = plot.locator('.hoverlayer .hovertext').first();
  await expect(label).toContainText('tension');
  await expect(plot.locator('.hoverlayer')).not.toContainText('parabola');
});
