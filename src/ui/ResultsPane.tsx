/**
 * The output side: status (solving, out of date, refused input), the summary line, the sag
 * plot, the results table, what to set on the day, the fixing loads and the solver details.
 * The last good results stay on screen when the document changes or cannot be solved, marked
 * out of date.
 */
import { useDraftStore } from '../state/draftStore.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { useResultsStore } from '../state/resultsStore.ts';
import { useUiStore } from '../state/uiStore.ts';
import { DesignPanel } from './design/DesignPanel.tsx';
import { AsBuiltPanel } from './results/AsBuiltPanel.tsx';
import { MovingLoadsTable } from './results/MovingLoadsTable.tsx';
import { ReactionsTable } from './results/ReactionsTable.tsx';
import { ResultsTable } from './results/ResultsTable.tsx';
import { SetUpChart } from './results/SetUpChart.tsx';
import { SolverDetails } from './results/SolverDetails.tsx';
import { Summary } from './results/Summary.tsx';
import { summaryText } from './results/summaryText.ts';
import { SagPlot } from './SagPlot.tsx';
import { errorStatusText, upToDateStatus } from './statusText.ts';

function Status() {
  const stale = useResultsStore((s) => s.stale);
  const error = useResultsStore((s) => s.error);
  const errorCause = useResultsStore((s) => s.errorCause);
  const cases = useResultsStore((s) => s.results?.cases);
  const hasResults = cases !== undefined;
  const invalid = Object.values(useDraftStore((s) => s.invalid));
  if (invalid.length > 0)
    return (
      <p className="status status-stale" role="status">
        Out of date: the results shown are for the last valid input. Fix{' '}
        {invalid.length === 1 ? 'this field' : `these ${invalid.length} fields`}:{' '}
        {invalid.join('; ')}.
      </p>
    );
  if (error)
    return (
      <p className="status status-stale" role="status">
        {errorStatusText(error, errorCause)}
      </p>
    );
  if (stale)
    return (
      <p className="status status-busy" role="status">
        {hasResults ? 'Solving the change…' : 'Solving…'}
      </p>
    );
  if (!cases)
    return (
      <p className="status status-busy" role="status">
        Solving…
      </p>
    );
  const done = upToDateStatus(cases);
  return (
    <p className={`status status-${done.tone}`} role="status">
      {done.text}
    </p>
  );
}

export function ResultsPane() {
  const results = useResultsStore((s) => s.results);
  const resultsProject = useResultsStore((s) => s.resultsProject);
  const stale = useResultsStore((s) => s.stale);
  const anyInvalid = useDraftStore((s) => Object.keys(s.invalid).length > 0);
  const units = useUiStore((s) => s.unitSystem);
  const title = useProjectStore((s) => s.project.title);
  const outOfDate = stale || anyInvalid;
  return (
    <section className="results-pane" aria-label="Results" data-out-of-date={outOfDate}>
      <Status />
      {results && resultsProject ? (
        <div className={outOfDate ? 'out-of-date' : undefined}>
          <Summary summary={summaryText(resultsProject, results, units)} />
          <SagPlot project={resultsProject} results={results} />
          <ResultsTable project={resultsProject} results={results} />
          <MovingLoadsTable results={results} />
          <SetUpChart project={resultsProject} results={results} />
          <AsBuiltPanel project={resultsProject} results={results} />
          <ReactionsTable project={resultsProject} results={results} />
          <SolverDetails results={results} />
        </div>
      ) : (
        <p className="muted">Working out {title}…</p>
      )}
      <DesignPanel />
    </section>
  );
}
