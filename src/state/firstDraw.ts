/**
 * The page's first sag plot: work that is not needed to show it (the design aids' worker) waits
 * until the plot is drawn or its drawing has failed, so the first screen fetches only what it
 * shows. A page whose plot never draws (no plot on screen) releases the wait after a while.
 */

let release: () => void = () => {};
let released = false;

export const firstDraw: Promise<void> = new Promise<void>((resolve) => {
  release = resolve;
});

/** A moment for the browser to paint the first plot and settle before more is fetched. */
const SETTLE_MS = 300;

/** The first plot is drawn (or could not be): let the waiting work start a moment later. */
export function markFirstDraw(): void {
  if (released) return;
  released = true;
  setTimeout(release, SETTLE_MS);
}

/** The first plot, or `ms` milliseconds, whichever comes first. */
export function afterFirstDraw(ms: number): Promise<void> {
  return Promise.race([firstDraw, new Promise<void>((resolve) => setTimeout(resolve, ms))]);
}
