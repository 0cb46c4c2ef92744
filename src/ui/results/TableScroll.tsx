/**
 * A wide table's box that scrolls sideways on a narrow screen instead of widening the page. It
 * takes keyboard focus, so a keyboard user can scroll it too; the table inside carries the name.
 */
import type { ReactNode } from 'react';

export function TableScroll({ children }: { children: ReactNode }) {
  return (
    // biome-ignore lint/a11y/noNoninteractiveTabindex: a scrolling box must be reachable by keyboard
    <div className="table-scroll" tabIndex={0}>
      {children}
    </div>
  );
}
