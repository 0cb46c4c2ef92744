/**
 * Registers the service worker that keeps the app usable with no signal (after the first plot
 * is drawn), and says so once the app is stored for offline use. A new version never replaces the running one by itself: the
 * notice asks, and the update (a reload) waits while any field holds text not yet accepted, so
 * nothing typed is lost. Valid edits are already in the autosave.
 */

import { useRegisterSW } from 'virtual:pwa-register/react';
import { useEffect, useState } from 'react';
import { useDraftStore } from '../state/draftStore.ts';
import { PLOT_DRAW_MEASURE } from './plot/usePlotlyDraw.ts';

/** Registering waits a moment after the first plot (or 10 s), so storing the app never
 * competes with the first screen. */
const AFTER_PLOT_MS = 2_000;
const LATEST_START_MS = 10_000;

function useFirstPlotDrawn(): boolean {
  const [drawn, setDrawn] = useState(false);
  useEffect(() => {
    if (drawn) return;
    const done = () => setDrawn(true);
    const timer = setTimeout(done, LATEST_START_MS);
    const observer = new PerformanceObserver((list) => {
      if (list.getEntriesByName(PLOT_DRAW_MEASURE).length > 0) setTimeout(done, AFTER_PLOT_MS);
    });
    observer.observe({ type: 'measure', buffered: true });
    return () => {
      clearTimeout(timer);
      observer.disconnect();
    };
  }, [drawn]);
  return drawn;
}

export function UpdateNotice() {
  return useFirstPlotDrawn() ? <OfflineNotices /> : null;
}

function OfflineNotices() {
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    offlineReady: [offlineReady, setOfflineReady],
    updateServiceWorker,
  } = useRegisterSW();
  const editing = useDraftStore((s) => Object.keys(s.invalid).length > 0);
  if (needRefresh)
    return (
      <section className="app-notice" aria-label="New version">
        <p>
          A new version of Sagwright is ready. Your project is saved in this browser and opens again
          after the update.
        </p>
        {editing && <p>Finish or undo the field marked in red first, so nothing typed is lost.</p>}
        <div className="actions">
          <button type="button" disabled={editing} onClick={() => updateServiceWorker(true)}>
            Update now
          </button>
          <button type="button" onClick={() => setNeedRefresh(false)}>
            Later
          </button>
        </div>
      </section>
    );
  if (offlineReady)
    return (
      <section className="app-notice" aria-label="Offline use">
        <p>Sagwright is stored in this browser and now opens and works with no signal.</p>
        <div className="actions">
          <button type="button" onClick={() => setOfflineReady(false)}>
            OK
          </button>
        </div>
      </section>
    );
  return null;
}
