/**
 * The words of the results status when the shown results are out of date because of an error:
 * a design the solver refused is the design's doing; a solver that could not load or run is
 * not, and the person is told their inputs are kept and the next change tries again.
 */
export function errorStatusText(error: string, cause: 'design' | 'solver' | null): string {
  if (cause === 'solver')
    return (
      `Out of date: the solver could not run (${error}). Your inputs are kept and the next ` +
      'change tries again; the results shown are for the last design solved.'
    );
  return (
    `Out of date: this design could not be solved (${error}). The results shown are for the ` +
    'last design that could.'
  );
}

/**
 * The status when the results shown are for the current design: plain "Up to date." when every
 * case passes; over a failing design it says so, so a calm all-clear never sits over a failure.
 */
export function upToDateStatus(cases: readonly { ok: boolean }[]): {
  text: string;
  tone: 'ok' | 'fail';
} {
  const failing = cases.filter((c) => !c.ok).length;
  if (failing === 0) return { text: 'Up to date.', tone: 'ok' };
  return {
    text: `Up to date: this design fails (${failing} of ${cases.length} ${cases.length === 1 ? 'case' : 'cases'}, see the summary).`,
    tone: 'fail',
  };
}
