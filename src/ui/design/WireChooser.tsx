/**
 * The wire chooser: every wire that works for this project, lightest first, filterable by type,
 * each with its window and suggested tension; "Use" applies the wire and that tension to the
 * document as one undo step.
 */
import { useId, useState } from 'react';
import {
  type Project,
  SUGGESTION_RULE,
  validateProject,
  type WireChoice,
  type WireFamily,
} from '../../core/index.ts';
import { type UnitSystem, unitSymbol } from '../../core/units.ts';
import { formatCell, formatNumber } from '../../deliverables/displayUnits.ts';
import { useDesignStore } from '../../state/designStore.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { TableScroll } from '../results/TableScroll.tsx';

const FAMILIES: { value: WireFamily | 'all'; label: string }[] = [
  { value: 'all', label: 'All types' },
  { value: 'galvanised', label: 'Galvanised steel' },
  { value: 'stainless', label: 'Stainless steel' },
  { value: 'fibre', label: 'Fibre rope' },
  { value: 'custom', label: 'Own wire' },
];
const SHORT_LIST = 8;

/** The document with this wire, set up at its suggested horizontal tension. */
export function applyChoice(project: Project, choice: WireChoice): Project {
  return {
    ...project,
    wire: choice.catalogId === null ? project.wire : { catalogId: choice.catalogId },
    installation: {
      ...project.installation,
      target: { horizontalTension: choice.suggestedHorizontalTension },
    },
  };
}

function use(choice: WireChoice): void {
  const { project, setProject } = useProjectStore.getState();
  const checked = validateProject(applyChoice(project, choice));
  if (checked.ok) setProject(checked.project);
}

function Row({
  choice,
  units,
  current,
}: {
  choice: WireChoice;
  units: UnitSystem;
  current: boolean;
}) {
  const suggested = formatCell(units, 'force', choice.suggestedHorizontalTension);
  return (
    <tr className={current ? 'setup-installation' : undefined}>
      <th scope="row">
        {choice.label}
        {current && <span className="badge">current wire</span>}
      </th>
      <td>{formatNumber(units, 'massPerLength', choice.massPerLength, 3)}</td>
      <td>{choice.low === null ? '—' : formatNumber(units, 'force', choice.low)}</td>
      <td>{formatNumber(units, 'force', choice.high)}</td>
      <td>{formatNumber(units, 'force', choice.suggestedHorizontalTension)}</td>
      <td>
        <button
          type="button"
          onClick={() => use(choice)}
          aria-label={`Use ${choice.label} at ${suggested}`}
        >
          Use
        </button>
      </td>
    </tr>
  );
}

/** Asks the worker to try every wire (it costs tens of solves, so it waits to be asked). */
function TryEveryWire() {
  const on = useDesignStore((s) => s.chooserOn);
  const setOn = useDesignStore((s) => s.setChooserOn);
  if (on) return <p className="muted">Trying every wire in the catalogue…</p>;
  return (
    <button type="button" onClick={() => setOn(true)}>
      Try every wire in the catalogue
    </button>
  );
}

export function WireChooser({
  choices,
  project,
  units,
}: {
  choices: WireChoice[] | null;
  project: Project;
  units: UnitSystem;
}) {
  if (!choices)
    return (
      <section className="design-block" aria-labelledby="chooser-heading">
        <h3 id="chooser-heading">Wires that work</h3>
        <p className="setup-note">
          Tries every catalogue wire (and your own) on this project and lists the ones with an open
          window, lightest first, each with a suggested tension.
        </p>
        <TryEveryWire />
      </section>
    );
  return <ChooserList choices={choices} project={project} units={units} />;
}

function ChooserList({
  choices,
  project,
  units,
}: {
  choices: WireChoice[];
  project: Project;
  units: UnitSystem;
}) {
  const [family, setFamily] = useState<WireFamily | 'all'>('all');
  const [all, setAll] = useState(false);
  const selectId = useId();
  const shown = choices.filter((c) => family === 'all' || c.family === family);
  const listed = all ? shown : shown.slice(0, SHORT_LIST);
  const currentId = 'catalogId' in project.wire ? project.wire.catalogId : null;
  const fu = unitSymbol('force', units);
  return (
    <section className="design-block" aria-labelledby="chooser-heading">
      <h3 id="chooser-heading">Wires that work</h3>
      <p className="setup-note">
        Every catalogue wire (and your own) tried on this project; the ones with an open window,
        lightest first. {SUGGESTION_RULE}
      </p>
      <div className="field">
        <label htmlFor={selectId}>Wire type</label>
        <select
          id={selectId}
          value={family}
          onChange={(e) => setFamily(e.target.value as WireFamily | 'all')}
        >
          {FAMILIES.map((f) => (
            <option key={f.value} value={f.value}>
              {f.label}
            </option>
          ))}
        </select>
      </div>
      {shown.length === 0 ? (
        <p>No wire of this type works for this project.</p>
      ) : (
        <TableScroll>
          <table className="results" aria-labelledby="chooser-heading">
            <thead>
              <tr>
                <th scope="col">Wire</th>
                <th scope="col">Mass ({unitSymbol('massPerLength', units)})</th>
                <th scope="col">Lowest ({fu})</th>
                <th scope="col">Highest ({fu})</th>
                <th scope="col">Suggested ({fu})</th>
                <th scope="col">
                  <span className="visually-hidden">Apply</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {listed.map((c) => (
                <Row
                  key={c.catalogId ?? 'custom'}
                  choice={c}
                  units={units}
                  current={c.catalogId === currentId}
                />
              ))}
            </tbody>
          </table>
        </TableScroll>
      )}
      {shown.length > SHORT_LIST && (
        <button type="button" onClick={() => setAll(!all)}>
          {all ? 'Show the lightest only' : `Show all ${shown.length} wires`}
        </button>
      )}
    </section>
  );
}
