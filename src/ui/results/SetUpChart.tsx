/**
 * "Setting the wire on the day": for a range of temperatures, the horizontal tension, largest
 * tension, sag of the listed span and pulse return time that give the design's cut length. The
 * installation temperature's row is marked in words and tinted.
 */
import { useId } from 'react';
import type { Project, ProjectResults, SetUpRow } from '../../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { formatCell, formatNumber } from '../../deliverables/displayUnits.ts';
import {
  isInstallationRow,
  pulseCheck,
  returnTimeText,
  SET_UP_HEADING,
  setUpExplanation,
  spanName,
} from '../../deliverables/setUpContent.ts';
import { useUiStore } from '../../state/uiStore.ts';
import './setUpChart.css';
import { TableScroll } from './TableScroll.tsx';

/** Whole degrees unless the temperature has a fraction in the units shown (59.9 °F). */
function temperatureText(celsius: number, units: UnitSystem): string {
  const shown = fromSi(celsius, 'temperature', units);
  const whole = Math.abs(shown - Math.round(shown)) < 1e-9;
  return formatCell(units, 'temperature', celsius, whole ? 0 : 1);
}

function Row({ row, installation, units }: RowProps) {
  const temperature = (
    <th scope="row">
      {temperatureText(row.temperature, units)}
      {installation && <span className="badge">installation temperature</span>}
    </th>
  );
  if (!row.solved)
    return (
      <tr>
        {temperature}
        <td colSpan={4}>Not solved at this temperature.</td>
      </tr>
    );
  return (
    <tr className={installation ? 'setup-installation' : undefined}>
      {temperature}
      <td>{formatNumber(units, 'force', row.horizontalTension)}</td>
      <td>{formatNumber(units, 'force', row.maxTension)}</td>
      <td>{formatNumber(units, 'length', row.sag)}</td>
      <td>{returnTimeText(row)}</td>
    </tr>
  );
}

interface RowProps {
  row: SetUpRow;
  installation: boolean;
  units: UnitSystem;
}

export function SetUpChart({ project, results }: { project: Project; results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const headingId = useId();
  const lu = unitSymbol('length', units);
  const fu = unitSymbol('force', units);
  const span = spanName(project, results.setUpSpan);
  return (
    <section className="setup-chart" aria-labelledby={headingId}>
      <h2 id={headingId}>{SET_UP_HEADING}</h2>
      <p className="setup-note">
        {setUpExplanation(
          formatCell(units, 'length', results.unstressedLength),
          temperatureText(project.installation.temperature, units),
        )}
      </p>
      <TableScroll>
        <table className="results setup-table" aria-labelledby={headingId}>
          <thead>
            <tr>
              <th scope="col">Temperature</th>
              <th scope="col">Horizontal tension ({fu})</th>
              <th scope="col">Largest tension ({fu})</th>
              <th scope="col">
                Sag ({lu})<span className="case-meta">{span}</span>
              </th>
              <th scope="col">Pulse return (s)</th>
            </tr>
          </thead>
          <tbody>
            {results.setUpChart.map((row) => (
              <Row
                key={row.temperature}
                row={row}
                installation={isInstallationRow(project, row)}
                units={units}
              />
            ))}
          </tbody>
        </table>
      </TableScroll>
      <p className="setup-note muted">
        {pulseCheck(
          span,
          results.setUpChart.some((row) => row.returnTime !== null),
        )}
      </p>
    </section>
  );
}
