/**
 * The pull of the wire on each fixing, per case: how the fixing holds the wire, the net pull
 * along the line, down and sideways (signed), resultant and angle, the wire's tension and angle
 * on each side — what sizes a post, its stay and the fittings either side — and at the two end
 * fixings the end fitting the wire is terminated with.
 */
import type { Project, ProjectResults, SupportReaction } from '../../core/index.ts';
import { unitSymbol } from '../../core/units.ts';
import { ATTACHMENT_NAME } from '../../deliverables/attachmentWords.ts';
import { formatNumber } from '../../deliverables/displayUnits.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { TableScroll } from './TableScroll.tsx';

/** "408 N at 42.3°" for one side of a fixing, or a dash where the line ends. */
function wireSide(
  tension: number | undefined,
  angle: number | undefined,
  force: (n: number) => string,
  fu: string,
): string {
  if (tension === undefined || angle === undefined) return '–';
  return `${force(tension)} ${fu} at ${angle.toFixed(1)}°`;
}

function ReactionCells({
  reaction,
  force,
  fu,
}: {
  reaction: SupportReaction;
  force: (n: number) => string;
  fu: string;
}) {
  return (
    <>
      <td>{ATTACHMENT_NAME[reaction.attachment]}</td>
      <td>{force(reaction.horizontal)}</td>
      <td>{force(reaction.vertical)}</td>
      <td>{force(reaction.lateral)}</td>
      <td>{force(reaction.resultant)}</td>
      <td>{reaction.angle.toFixed(1)}</td>
      <td>{wireSide(reaction.tensionBefore, reaction.angleBefore, force, fu)}</td>
      <td>{wireSide(reaction.tensionAfter, reaction.angleAfter, force, fu)}</td>
    </>
  );
}

function fittingAt(results: ProjectResults, index: number, count: number): string {
  const end =
    index === 0 ? results.endFittings.start : index === count - 1 ? results.endFittings.end : null;
  if (!end) return '—';
  if (end.kind === 'notStated') return 'not stated';
  return `${end.label}, ${Math.round(end.efficiency * 1000) / 10} %`;
}

/**
 * `project` is the document the results were solved for: while a newer one is being solved the
 * rows keep that document's fixing names, never the new names beside the old numbers.
 */
export function ReactionsTable({
  project,
  results,
}: {
  project: Project;
  results: ProjectResults;
}) {
  const units = useUiStore((s) => s.unitSystem);
  const supports = project.supports;
  const fu = unitSymbol('force', units);
  // Signed; a pull that rounds to nothing reads 0, not −0.
  const force = (n: number) => formatNumber(units, 'force', n).replace(/^-(0(\.0*)?)$/, '$1');
  return (
    <details className="reactions" open>
      <summary>Pull on the fixings</summary>
      <TableScroll>
        <table className="results" aria-label="Pull on the fixings">
          <thead>
            <tr>
              <th scope="col">Case</th>
              <th scope="col">Fixing</th>
              <th scope="col">Holds the wire</th>
              <th scope="col">Along the line ({fu})</th>
              <th scope="col">Downward ({fu})</th>
              <th scope="col">Sideways ({fu})</th>
              <th scope="col">Resultant ({fu})</th>
              <th scope="col">Angle below horizontal (°)</th>
              <th scope="col">Wire toward the previous fixing</th>
              <th scope="col">Wire toward the next fixing</th>
              <th scope="col">End fitting</th>
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
                  <ReactionCells reaction={reaction} force={force} fu={fu} />
                  <td>{fittingAt(results, i, result.supports.length)}</td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      </TableScroll>
      <p className="muted">
        The wire's pull on each fixing. Along the line: positive toward the last fixing; at an
        intermediate fixing it is the net of both sides, what its post and stay must hold. Downward:
        negative is an upward pull. A load hung at a fixing is in that fixing's pull. Each side: the
        wire's tension there and its angle below the horizontal.
      </p>
    </details>
  );
}
