/** Results by case: tension, utilisation with pass/fail in words, sag, lowest point, clearance, swing. */
import type { CaseResult, Project, ProjectResults } from '../../core/index.ts';
import { unitSymbol } from '../../core/units.ts';
import { caseMessages } from '../../deliverables/caseMessages.ts';
import {
  formatCell,
  formatLength,
  formatNumber,
  formatPercent,
} from '../../deliverables/displayUnits.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { Hint } from '../fields/Hint.tsx';
import { TableScroll } from './TableScroll.tsx';

function Verdict({ result }: { result: CaseResult }) {
  if (!result.solved) return <span className="verdict fail">Not solved</span>;
  return result.ok ? (
    <span className="verdict pass">✓ Pass</span>
  ) : (
    <span className="verdict fail">✗ Fail</span>
  );
}

function governs(result: CaseResult, results: ProjectResults): string[] {
  const marks: string[] = [];
  if (results.governingIds.tension === result.id) marks.push('governs tension');
  if (results.governingIds.clearance === result.id) marks.push('governs clearance');
  return marks;
}

/** How the utilisation is formed, naming the end fitting that limits it. */
export function utilisationBasis(results: ProjectResults): string {
  const f = results.endFittings;
  if (!f.stated)
    return 'Utilisation = largest tension × safety factor / breaking load. No end fittings stated: terminations taken as strong as the wire.';
  const weaker = f[f.governing];
  return `Utilisation = largest tension × safety factor / (breaking load × ${formatPercent(f.efficiency)}): the weaker end fitting is ${weaker.label.toLowerCase()} at the ${f.governing === 'start' ? 'first' : 'last'} fixing.`;
}

export function ResultsTable({ project, results }: { project: Project; results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  // Lengths as installers read them: metres (unit in the heading), or feet and inches per cell.
  const si = units === 'si';
  const lu = si ? ` (${unitSymbol('length', units)})` : '';
  const length = (m: number) =>
    si ? formatNumber(units, 'length', m) : formatLength(units, m, true);
  const position = (m: number) => (si ? formatCell(units, 'length', m, 2) : formatLength(units, m));
  const fu = unitSymbol('force', units);
  return (
    <TableScroll>
      <p className="case-meta utilisation-basis">{utilisationBasis(results)}</p>
      <table className="results" aria-label="Results by case">
        <thead>
          <tr>
            <th scope="col">Case</th>
            <th scope="col">
              Horizontal tension ({fu}) <Hint term="horizontalTension" />
            </th>
            <th scope="col">
              Largest tension ({fu}) <Hint term="largestTension" />
            </th>
            <th scope="col">
              Utilisation <Hint term="utilisation" />
            </th>
            <th scope="col">Check</th>
            <th scope="col">
              Sag{lu} <Hint term="sag" />
            </th>
            <th scope="col">Lowest point{lu}</th>
            <th scope="col">Clearance{lu}</th>
            <th scope="col">Swing{lu}</th>
          </tr>
        </thead>
        <tbody>
          {results.cases.map((result) => {
            const marks = governs(result, results);
            const messages = caseMessages(project, results, result, units);
            const zones = result.zoneClearances
              .map(
                (z) =>
                  `${z.label}: ${formatLength(units, z.clearance)}${z.ok ? '' : ` — too low, needs ${formatLength(units, z.required)}`}`,
              )
              .join('; ');
            return (
              <tr key={result.id} className={marks.length ? 'governing' : undefined}>
                <th scope="row">
                  {result.name}
                  <span className="case-meta">
                    {formatCell(units, 'temperature', result.temperature)}
                  </span>
                  {marks.length > 0 && <span className="badge">{marks.join(', ')}</span>}
                </th>
                <td>{formatNumber(units, 'force', result.horizontalTension)}</td>
                <td>{formatNumber(units, 'force', result.maxTension)}</td>
                <td>{formatPercent(result.utilisation)}</td>
                <td>
                  <Verdict result={result} />
                  {messages.length > 0 && <span className="case-meta">{messages.join(' ')}</span>}
                </td>
                <td>{length(result.sag)}</td>
                <td>
                  {length(result.lowestPoint.z)}
                  <span className="case-meta">at {position(result.lowestPoint.x)}</span>
                </td>
                <td>
                  {length(result.clearance)}
                  {zones && <span className="case-meta">{zones}</span>}
                </td>
                <td>{length(result.swing)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </TableScroll>
  );
}
