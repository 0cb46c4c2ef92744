/**
 * When to redraw the plot. A redraw holds the main thread for tens of milliseconds, so figures
 * that arrive in a burst (a result per keystroke) are held back until the burst pauses, and a
 * long burst still shows progress at least every MAX_HOLD_MS. Times in milliseconds.
 */

/** Figures closer together than this belong to one burst. */
export const BURST_GAP_MS = 250;
/** The longest a new figure waits behind a burst. */
export const MAX_HOLD_MS = 1000;

/**
 * How long to hold a new figure back: 0 after a pause (or for the first figure); within a burst
 * BURST_GAP_MS (each later figure restarts the wait), cut short so that no figure waits more
 * than MAX_HOLD_MS after the first one not yet drawn.
 * @param nowMs arrival time of the new figure
 * @param previousArrivalMs arrival time of the figure before it, null for the first
 * @param firstUndrawnMs arrival time of the oldest figure not drawn yet (≤ nowMs)
 */
export function drawDelayMs(
  nowMs: number,
  previousArrivalMs: number | null,
  firstUndrawnMs: number,
): number {
  if (previousArrivalMs === null || nowMs - previousArrivalMs >= BURST_GAP_MS) return 0;
  return Math.max(0, Math.min(BURST_GAP_MS, firstUndrawnMs + MAX_HOLD_MS - nowMs));
}
