/**
 * The built app in headless Chromium (measured, never asserted):
 * (a) page weight: the JS and CSS the page fetches until the first sag plot is drawn, gzip
 *     sizes of those files in dist/ (level 9, as the build reports them);
 * (b) edit to plot: the installation temperature is edited once after each drawing settles;
 *     from the input event to the end of the plot draw for that edit, split into waiting for
 *     the result (solve, messages) and drawing (React, frame wait, Plotly);
 * (c) a continuous edit, one new value every 33 ms (a drag on a touch screen): drawings per
 *     second and that the drawings follow the edits in order and end on the last one;
 * (d) dragging the far fixing on the side view: pointer moves at every animation frame for
 *     DRAG_FIXING_MS, through the app's own handle (commit, worker solve, figure, sketch):
 *     plot drawings per second, how many were full Plotly redraws, and from each committed
 *     position to the plot drawn for it (p50/p95); then that the last position is drawn.
 * Needs `npm run build` first. The page is served by `vite preview` on BENCH_PORT (default 4399).
 */
import { existsSync, readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { chromium, type Page } from '@playwright/test';
import { preview } from 'vite';
import { benchPageScript, type PageLog } from './pageLog.ts';

const EDITS = 40;
const DRAG_STEPS = 60;
const DRAG_STEP_MS = 33;
const FIELD = 'Temperature on the day (°C)';
/** Edits after page load that also pay for the engine compiling the edit path (shown apart). */
const WARM_EDITS = 3;

const DRAG_FIXING_MS = 3000;
const FIXING = 'Studio wall bracket';

export interface FixingDrag {
  seconds: number;
  moves: number;
  edits: number;
  draws: number;
  fullDraws: number;
  /** Committed position → plot drawn for it, ms, for the positions drawn. */
  editToDrawMs: number[];
  /** Positions committed but replaced by a newer one before being drawn. */
  skipped: number;
  lastShown: boolean;
}

export interface BrowserFigures {
  weight: { file: string; gzipBytes: number }[];
  edits: { totalMs: number; waitMs: number; drawMs: number; plotlyMs: number }[];
  drag: { edits: number; draws: number; seconds: number; inOrder: boolean; lastShown: boolean };
  fixingDrag: FixingDrag;
}

function gzipSize(path: string): number {
  return gzipSync(readFileSync(path), { level: 9 }).length;
}

async function pageWeight(page: Page, port: number): Promise<BrowserFigures['weight']> {
  const fetched = new Set<string>();
  // The page reports its first drawn plot the moment the figure says so (not when a poll
  // from here notices it): requests after that report are not counted. Requests and the
  // report reach this process in the order the browser sent them.
  let drawn = false;
  await page.exposeFunction('benchFirstPlotDrawn', () => {
    drawn = true;
  });
  await page.addInitScript(() => {
    const observer = new MutationObserver(() => {
      if (!document.querySelector('figure[data-plot-state="drawn"]')) return;
      observer.disconnect();
      (window as unknown as { benchFirstPlotDrawn: () => void }).benchFirstPlotDrawn();
    });
    observer.observe(document, { subtree: true, attributes: true, childList: true });
  });
  page.on('request', (request) => {
    const url = new URL(request.url());
    if (drawn) return;
    if (url.port === String(port) && /\.(js|css)$/.test(url.pathname)) fetched.add(url.pathname);
  });
  await page.goto(`http://localhost:${port}/`);
  await page.locator('figure[data-plot-state="drawn"]').first().waitFor({ timeout: 60_000 });
  return [...fetched].sort().map((file) => ({ file, gzipBytes: gzipSize(`dist${file}`) }));
}

const log = (page: Page) =>
  page.evaluate(() => ({ ...(window as unknown as { benchLog: PageLog }).benchLog }));

async function editOnce(page: Page, value: string): Promise<BrowserFigures['edits'][number]> {
  const before = (await log(page)).edits.length;
  await page.getByLabel(FIELD, { exact: true }).fill(value);
  await page.waitForFunction(
    (count) => {
      const l = (window as unknown as { benchLog: PageLog }).benchLog;
      const edit = l.edits[count];
      return edit !== undefined && l.draws.some((d) => d.revision === edit.revision);
    },
    before,
    { timeout: 30_000 },
  );
  const l = await log(page);
  const edit = l.edits[before];
  const input = l.inputs.filter((t) => t <= edit.at).at(-1) ?? edit.at;
  const result = l.results.find((r) => r.revision === edit.revision);
  const draw = l.draws.find((d) => d.revision === edit.revision);
  if (!result || !draw) throw new Error('an edit was not drawn');
  return {
    totalMs: draw.end - input,
    waitMs: result.at - input,
    drawMs: draw.end - result.at,
    plotlyMs: draw.end - draw.start,
  };
}

/** One new value every DRAG_STEP_MS, set inside the page so the timing is the page's own. */
async function continuousEdit(page: Page): Promise<BrowserFigures['drag']> {
  const start = (await log(page)).edits.length;
  const startDraws = (await log(page)).draws.length;
  await page.evaluate(
    ({ label, steps, stepMs }) =>
      new Promise<void>((resolve) => {
        const input = [...document.querySelectorAll('input')].find(
          (el) => el.labels?.[0]?.textContent?.includes(label) ?? false,
        );
        if (!input) throw new Error(`no field ${label}`);
        const setter = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')?.set;
        let step = 0;
        const timer = setInterval(() => {
          setter?.call(input, (5 + step * 0.25).toFixed(2));
          input.dispatchEvent(new Event('input', { bubbles: true }));
          step += 1;
          if (step === steps) {
            clearInterval(timer);
            resolve();
          }
        }, stepMs);
      }),
    { label: FIELD, steps: DRAG_STEPS, stepMs: DRAG_STEP_MS },
  );
  await page.waitForTimeout(1500);
  const l = await log(page);
  const edits = l.edits.slice(start);
  const draws = l.draws.slice(startDraws);
  const seconds = (DRAG_STEPS * DRAG_STEP_MS) / 1000;
  const revisions = draws.map((d) => d.revision);
  return {
    edits: edits.length,
    draws: draws.filter((d) => d.end <= edits[edits.length - 1].at + 100).length,
    seconds,
    // A sketch and the full redraw that follows it draw the same version twice.
    inOrder: revisions.every((r, i) => i === 0 || r >= revisions[i - 1]),
    lastShown: revisions.at(-1) === edits.at(-1)?.revision,
  };
}

/**
 * Drags the far fixing's handle with pointer events sent at every animation frame from inside
 * the page (so the rate is the page's own): a little along the span and up and down.
 */
async function dragFixing(page: Page): Promise<FixingDrag> {
  const name = new RegExp(`^Move ${FIXING} \\(`);
  const handle = page.getByRole('button', { name });
  await handle.waitFor();
  const startLog = await log(page);
  // tsx names the page function's inner functions with a __name helper: give the page one.
  await page.evaluate('globalThis.__name ??= (f) => f');
  const span = await handle.evaluate(
    (element, durationMs) =>
      new Promise<{ from: number; to: number; moves: number }>((resolve) => {
        const box = element.getBoundingClientRect();
        const [x0, y0] = [box.left + box.width / 2, box.top + box.height / 2];
        const send = (type: string, x: number, y: number) =>
          element.dispatchEvent(
            new PointerEvent(type, {
              bubbles: true,
              cancelable: true,
              pointerId: 7,
              pointerType: 'mouse',
              button: 0,
              buttons: type === 'pointerup' ? 0 : 1,
              clientX: x,
              clientY: y,
            }),
          );
        send('pointerdown', x0, y0);
        const from = performance.now();
        let moves = 0;
        const step = (now: number) => {
          const t = (now - from) / durationMs;
          if (t >= 1) {
            send('pointerup', x0, y0 - 20);
            resolve({ from, to: now, moves });
            return;
          }
          // Up to 10 px along (the cable ends half a metre in) and ±30 px up and down.
          send('pointermove', x0 - 10 * Math.sin(Math.PI * t), y0 - 30 * Math.sin(6 * Math.PI * t));
          moves += 1;
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      }),
    DRAG_FIXING_MS,
  );
  await page.waitForTimeout(1500);
  const l = await log(page);
  const edits = l.edits.slice(startLog.edits.length).filter((e) => e.at <= span.to);
  const during = l.draws.filter((d) => d.end >= span.from && d.end <= span.to);
  const editToDrawMs: number[] = [];
  let skipped = 0;
  for (const edit of edits) {
    const draw = l.draws.find((d) => d.revision === edit.revision && d.end >= edit.at);
    if (draw) editToDrawMs.push(draw.end - edit.at);
    else skipped += 1;
  }
  const lastEdit = l.edits.at(-1);
  return {
    seconds: (span.to - span.from) / 1000,
    moves: span.moves,
    edits: edits.length,
    draws: during.length,
    fullDraws: during.filter((d) => d.kind === 'full').length,
    editToDrawMs,
    skipped,
    lastShown: l.draws.at(-1)?.revision === lastEdit?.revision,
  };
}

const quantile = (values: number[], q: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
};

export async function measureBrowser(port: number): Promise<BrowserFigures> {
  const server = await preview({
    logLevel: 'silent',
    preview: { port, strictPort: true, host: 'localhost' },
  });
  const browser = await chromium.launch({
    executablePath: existsSync('/usr/bin/chromium') ? '/usr/bin/chromium' : undefined,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
    ],
  });
  try {
    const context = await browser.newContext({ viewport: { width: 1366, height: 768 } });
    // tsx keeps function names with a __name helper that the page does not have.
    await context.addInitScript({ content: `var __name = (f) => f; (${benchPageScript})();` });
    const page = await context.newPage();
    const weight = await pageWeight(page, port);
    // The edits are timed on the app as it runs once installed: after the service worker has
    // stored every file (the first visit's one-off download of about 8 MB, fonts included).
    await page.evaluate(() =>
      Promise.race([
        navigator.serviceWorker?.ready,
        new Promise((resolve) => setTimeout(resolve, 30_000)),
      ]),
    );
    await page.waitForTimeout(1000);
    const edits: BrowserFigures['edits'] = [];
    for (let i = 0; i < EDITS; i++) {
      edits.push(await editOnce(page, (12 + (i % 16) * 0.5).toFixed(1)));
      await page.waitForTimeout(150);
    }
    const drag = await continuousEdit(page);
    await page.waitForTimeout(500);
    const fixingDrag = await dragFixing(page);
    return { weight, edits, drag, fixingDrag };
  } finally {
    await browser.close();
    await new Promise<void>((resolve) => server.httpServer.close(() => resolve()));
  }
}

/** The figures as Markdown lines. */
export function browserLines(figures: BrowserFigures): string[] {
  const kb = (bytes: number) => (bytes / 1024).toFixed(1);
  const total = figures.weight.reduce((sum, f) => sum + f.gzipBytes, 0);
  const e = figures.edits;
  const row = (name: string, pick: (x: (typeof e)[number]) => number) =>
    `| ${name} | ${quantile(e.map(pick), 0.5).toFixed(1)} | ${quantile(e.map(pick), 0.95).toFixed(1)} |`;
  const d = figures.drag;
  return [
    `| JS + CSS fetched until the first plot (gzip) | KB |`,
    '|---|---:|',
    ...figures.weight.map((f) => `| ${f.file} | ${kb(f.gzipBytes)} |`),
    `| **total** (goal ≤ 450) | **${kb(total)}** |`,
    '',
    `| edit to plot, ${e.length} edits of "${FIELD}" at 1366×768 (ms) | p50 | p95 |`,
    '|---|---:|---:|',
    row('**input event → plot drawn** (goal p95 ≤ 50)', (x) => x.totalMs),
    row('waiting for the result (store, worker solve, reply)', (x) => x.waitMs),
    row('drawing (React, next frame, Plotly)', (x) => x.drawMs),
    row('of which the Plotly call', (x) => x.plotlyMs),
    `| input event → plot drawn, edits ${WARM_EDITS + 1}–${e.length} only (the first ${WARM_EDITS} also compile the edit path) | ${quantile(
      e.slice(WARM_EDITS).map((x) => x.totalMs),
      0.5,
    ).toFixed(1)} | ${quantile(
      e.slice(WARM_EDITS).map((x) => x.totalMs),
      0.95,
    ).toFixed(1)} |`,
    `| the first ${WARM_EDITS} edits, each (ms) | ${e
      .slice(0, WARM_EDITS)
      .map((x) => x.totalMs.toFixed(0))
      .join(', ')} | |`,
    '',
    `Continuous edit, one value every ${DRAG_STEP_MS} ms for ${d.seconds.toFixed(1)} s: ${d.edits} edits, ` +
      `${d.draws} plot drawings (${(d.draws / d.seconds).toFixed(1)} per second, goal ≥ 30); ` +
      `drawings in edit order: ${d.inOrder ? 'yes' : 'NO'}; last edit shown: ${d.lastShown ? 'yes' : 'NO'}.`,
    '',
    ...fixingDragLines(figures.fixingDrag),
  ];
}

function fixingDragLines(f: FixingDrag): string[] {
  const ms = (q: number) =>
    f.editToDrawMs.length ? quantile(f.editToDrawMs, q).toFixed(1) : 'n/a';
  return [
    `| dragging "${FIXING}" on the side view for ${f.seconds.toFixed(1)} s (pointer moves every frame) | figure |`,
    '|---|---:|',
    `| pointer moves per second | ${(f.moves / f.seconds).toFixed(1)} |`,
    `| positions committed per second | ${(f.edits / f.seconds).toFixed(1)} |`,
    `| **plot drawings per second** (goal ≥ 30) | **${(f.draws / f.seconds).toFixed(1)}** |`,
    `| of which full Plotly redraws (goal: none after the first) | ${f.fullDraws} |`,
    `| committed position → plot drawn, p50 / p95 (ms) | ${ms(0.5)} / ${ms(0.95)} |`,
    `| positions replaced by a newer one before drawing | ${f.skipped} of ${f.edits} |`,
    `| last position drawn after release | ${f.lastShown ? 'yes' : 'NO'} |`,
  ];
}
