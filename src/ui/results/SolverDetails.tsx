/** Solver details on request: theory, elements, iterations and estimated discretisation error. */
import { DEFAULT_MODEL, type ProjectResults } from '../../core/index.ts';
import { formatCell } from '../../deliverables/displayUnits.ts';
import { useResultsStore } from '../../state/resultsStore.ts';
import { useUiStore } from '../../state/uiStore.ts';

export function SolverDetails({ results }: { results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const project = useResultsStore((s) => s.resultsProject);
  const model = { ...DEFAULT_MODEL, ...project?.model };
  return (
    <details className="solver-details">
      <summary>Solver details</summary>
      <p>
        {model.theory === 'exact'
          ? 'Elastic catenary: self weight per length of wire, iterated to convergence.'
          : 'Parabolic: self weight per horizontal metre.'}{' '}
        {results.mesh.elementsPerSpan} {model.elementOrder === 2 ? 'quadratic' : 'linear'} string
        elements in the most finely meshed span
        {results.mesh.refinement > 1
          ? ` (the ${model.elementsPerSpan} set were refined ×${results.mesh.refinement} automatically to bring the error estimate below ${results.mesh.errorTarget.toExponential(0)})`
          : ''}
        ; cut length (unstressed, installation temperature){' '}
        {formatCell(units, 'length', results.unstressedLength, 4)}.
      </p>
      {!results.mesh.reached && (
        <p className="warning">
          The estimated discretisation error {results.mesh.largestError.toExponential(1)} is above{' '}
          {results.mesh.errorTarget.toExponential(0)}: treat the last digits as uncertain, or raise
          the elements per span.
        </p>
      )}
      <table className="results" aria-label="Solver details by case">
        <thead>
          <tr>
            <th scope="col">Case</th>
            <th scope="col">Iterations</th>
            <th scope="col">Estimated discretisation error (relative)</th>
          </tr>
        </thead>
        <tbody>
          {results.cases.map((result) => (
            <tr key={result.id}>
              <th scope="row">{result.name}</th>
              <td>{result.iterations}</td>
              <td>{result.discretisationError.toExponential(1)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </details>
  );
}
