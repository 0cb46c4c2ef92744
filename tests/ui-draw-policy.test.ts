/**
 * When the plot redraws (src/ui/plot/drawPolicy.ts): at once after a pause, held back within a
 * burst of figures, and never longer than the longest hold after the first undrawn figure.
 * Pure arithmetic on given times; no clocks are read.
 */
import { describe, expect, it } from 'vitest';
import { BURST_GAP_MS, drawDelayMs, MAX_HOLD_MS } from '../src/ui/plot/drawPolicy.ts';

describe('plot redraw policy', () => {
  it('draws the first figure and a figure after a pause at once', () => {
    expect(drawDelayMs(1000, null, 1000)).toBe(0);
    expect(drawDelayMs(5000, 5000 - BURST_GAP_MS, 5000)).toBe(0);
    expect(drawDelayMs(5000, 1000, 5000)).toBe(0);
  });

  it('holds a figure that follows another closely until the burst pauses', () => {
    expect(drawDelayMs(1070, 1000, 1000)).toBe(BURST_GAP_MS);
    expect(drawDelayMs(1140, 1070, 1000)).toBe(BURST_GAP_MS);
  });

  it('cuts the hold so no figure waits more than the longest hold', () => {
    const first = 1000;
    // 70 ms apart, like typing: the hold shrinks to end at first + MAX_HOLD_MS, then draws at once.
    const late = first + MAX_HOLD_MS - 100;
    expect(drawDelayMs(late, late - 70, first)).toBe(100);
    expect(late + drawDelayMs(late, late - 70, first)).toBe(first + MAX_HOLD_MS);
    expect(drawDelayMs(first + MAX_HOLD_MS + 30, first + MAX_HOLD_MS - 40, first)).toBe(0);
  });
});
