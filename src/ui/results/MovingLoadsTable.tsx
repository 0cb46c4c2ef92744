/**
 * Moving loads: for each case and moving load, the largest tension and the lowest clearance met
 * anywhere on its path, with the load's position for each, and the check in words.
 */
import type { ProjectResults } from '../../core/index.ts';
import { unitSymbol } from '../../core/units.ts';
import { useUiStore } from '../../state/uiStore.ts';
import './asBuilt.css';
import { formatCell, formatNumber, formatPercent } from '../../deliverables/displayUnits.ts';

export function MovingLoadsTable({ results }: { results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const rows = results.cases.flatMap((c) => (c.movingLoads ?? []).map((m) => ({ c, m })));
  if (!results.cases.some((c) => c.movingLoads !== undefined)) return null;
  const lu = unitSymbol('length', units);
  const fu = unitSymbol('force', units);
  return (
    <section className="moving-loads" aria-labelledby="moving-loads-heading">
      <h2 id="moving-loads-heading">Moving loads</h2>
      <p className="muted">
        Each moving load is solved at positions along its path (a scan, then a bounded search around
        the worst position) at the wire's cut length, the other moving loads off the wire. Goods
        only: the wire is never for carrying people.
      </p>
      {rows.length === 0 ? (
        <p className="muted">No case carries the hung loads, so no moving load is on the wire.</p>
      ) : (
        <div className="table-scroll">
          <table className="results" aria-label="Moving loads by case">
            <thead>
              <tr>
                <th scope="col">Case</th>
                <th scope="col">Load</th>
                <th scope="col">Largest tension ({fu})</th>
                <th scope="col">Utilisation</th>
                <th scope="col">Lowest clearance ({lu})</th>
                <th scope="col">Check</th>
              </tr>
            </thead>
            <tbody>
              {rows.map(({ c, m }) => (
                <tr key={`${c.name}/${m.label}`} data-testid="moving-load-row">
                  <th scope="row">{c.name}</th>
                  <td>{m.label}</td>
                  <td>
                    {formatNumber(units, 'force', m.maxTension)}
                    <span className="case-meta">
                      load at {formatCell(units, 'length', m.maxTensionAt, 2)}
                    </span>
                  </td>
                  <td>{formatPercent(m.utilisation)}</td>
                  <td>
                    {formatNumber(units, 'length', m.clearance)}
                    <span className="case-meta">
                      load at {formatCell(units, 'length', m.clearanceAt, 2)}
                    </span>
                    {m.zoneClearances.map((z) => (
                      <span className="case-meta" key={z.label}>
                        {z.label}: {formatCell(units, 'length', z.clearance, 2)}
                        {z.ok
                          ? ''
                          : ` — too low, needs ${formatCell(units, 'length', z.required, 2)}`}
                      </span>
                    ))}
                  </td>
                  <td>
                    {m.ok ? (
                      <span className="verdict pass">✓ Pass</span>
                    ) : (
                      <span className="verdict fail">✗ Fail</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
