/**
 * The tension window in the workbench: its ends (tension, case and check) in the chosen units,
 * where the current setting sits in words, the plot, and the advice when it is shut.
 */
import {
  adviceWords,
  type Project,
  type TensionWindow,
  type WindowEnd,
  windowPosition,
} from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { adviceWordingFor, formatCell } from '../../deliverables/displayUnits.ts';
import type { DesignAnswers } from '../../worker/designAnswers.ts';
import { WindowPlot } from './WindowPlot.tsx';

function endText(project: Project, end: WindowEnd | null, units: UnitSystem, what: string): string {
  if (!end) return `${what}: none found`;
  const check =
    end.check === 'tension'
      ? 'tension limit'
      : end.check === 'clearance'
        ? 'clearance over the ground'
        : `clearance over ${end.check}`;
  const moving = end.movingLoad
    ? `, ${end.movingLoad.label} at ${formatCell(units, 'length', end.movingLoad.at - project.supports[0].x)} from the first fixing`
    : '';
  return `${what}: ${formatCell(units, 'force', end.horizontalTension)} (${check}, ${end.case}${moving})`;
}

function Ends({
  project,
  window,
  units,
}: {
  project: Project;
  window: TensionWindow;
  units: UnitSystem;
}) {
  return (
    <ul className="window-ends">
      <li data-testid="window-low">{endText(project, window.low, units, 'Lowest')}</li>
      <li data-testid="window-high">{endText(project, window.high, units, 'Highest')}</li>
    </ul>
  );
}

export function WindowView({
  answers,
  project,
  units,
}: {
  answers: DesignAnswers;
  project: Project;
  units: UnitSystem;
}) {
  const { window } = answers;
  // Words in the chosen units from the worker's numbers (the contract's advice is in SI).
  const words = adviceWordingFor(units);
  const position = windowPosition(project, window, answers.currentTension, words);
  const advice = adviceWords(project, answers.adviceFacts, words);
  return (
    <section className="design-block" aria-labelledby="window-heading">
      <h3 id="window-heading">Tension window</h3>
      <p className="setup-note" data-testid="window-quantity">
        The installation horizontal tension
        {answers.tensionWords ? ` (${answers.tensionWords})` : ''}, at{' '}
        {formatCell(units, 'temperature', project.installation.temperature)} with the installation
        loads, for which every case passes every check
        {project.loads.some((l) => l.type === 'moving')
          ? ', every moving load included at its worst position.'
          : '.'}
      </p>
      <p className={window.empty ? 'verdict-fail' : 'verdict-pass'} data-testid="window-verdict">
        {window.empty
          ? '✗ No tension passes every case.'
          : '✓ Every case passes inside the window.'}
      </p>
      <Ends project={project} window={window} units={units} />
      <p data-testid="window-position">
        Current setting, {formatCell(units, 'force', answers.currentTension)}: {position}
      </p>
      <WindowPlot
        curve={answers.curve}
        window={window}
        currentN={answers.currentTension}
        units={units}
      />
      <ul className="window-advice" aria-label="Window advice">
        {advice.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </section>
  );
}
