/** The pull of the wire on each fixing, per case: horizontal, vertical, sideways, resultant, angle. */
import type { ProjectResults } from '../../core/index.ts';
import { unitSymbol } from '../../core/units.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { num } from '../format.ts';

export function ReactionsTable({ results }: { results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const supports = useProjectStore((s) => s.project.supports);
  const fu = unitSymbol('force', units);
  const force = (n: number) => num(Math.abs(n), 'force', units);
  return (
    <details className="reactions" open>
      <summary>Pull on the fixings</summary>
      <div className="table-scroll">
        <table className="results" aria-label="Pull on the fixings">
          <thead>
            <tr>
              <th scope="col">Case</th>
              <th scope="col">Fixing</th>
              <th scope="col">Along the span ({fu})</th>
              <th scope="col">Downward ({fu})</th>
              <th scope="col">Sideways ({fu})</th>
              <th scope="col">Resultant ({fu})</th>
              <th scope="col">Angle below horizontal (°)</th>
            </tr>
          </thead>
          <tbody>
            {results.cases.flatMap((result) =>
              result.supports.map((reaction, i) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: one row per fixing, in order
                <tr key={`${result.id}-${i}`}>
                  {i === 0 && (
                    <th scope="rowgroup" rowSpan={result.supports.length}>
                      {result.name}
                    </th>
                  )}
                  <th scope="row">{supports[i]?.label || `Fixing ${i + 1}`}</th>
                  <td>{force(reaction.horizontal)}</td>
                  <td>{force(reaction.vertical)}</td>
                  <td>{force(reaction.lateral)}</td>
                  <td>{force(reaction.resultant)}</td>
                  <td>{reaction.angle.toFixed(1)}</td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      </div>
    </details>
  );
}
