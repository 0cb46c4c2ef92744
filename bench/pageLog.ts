/**
 * Runs inside the page before the app (Playwright addInitScript): logs input events and the
 * app's own performance marks (an edit committed, its result arrived) and plot-draw measures,
 * each tagged with the document version, readable as window.benchLog. Times are performance.now() ms.
 */
export interface PageLog {
  inputs: number[];
  edits: { revision: number; at: number }[];
  results: { revision: number; at: number }[];
  draws: { revision: number; start: number; end: number; kind: string }[];
}

export function benchPageScript(): void {
  const inputs: number[] = [];
  document.addEventListener('input', (event) => inputs.push(event.timeStamp), true);
  const revisionOf = (entry: PerformanceEntry) =>
    ((entry as PerformanceMark).detail as { revision?: number } | null)?.revision ?? -1;
  const marks = (name: string) =>
    performance.getEntriesByName(name).map((entry) => ({
      revision: revisionOf(entry),
      at: entry.startTime,
    }));
  const log: PageLog = {
    inputs,
    get edits() {
      return marks('sagwright:edit');
    },
    get results() {
      return marks('sagwright:result');
    },
    get draws() {
      return performance.getEntriesByName('sagwright:plot-draw').map((entry) => ({
        revision: revisionOf(entry),
        start: entry.startTime,
        end: entry.startTime + entry.duration,
        kind: ((entry as PerformanceMeasure).detail as { kind?: string } | null)?.kind ?? '',
      }));
    },
  };
  (window as unknown as { benchLog: PageLog }).benchLog = log;
}
