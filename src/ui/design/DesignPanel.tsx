/**
 * "Find the design": the tension window, the wires that work and today's setting, worked out by
 * a solver worker from the document on screen. The last answers stay, marked, while newer ones
 * are worked out.
 */
import { useDesignStore } from '../../state/designStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { TodaySetting } from './TodaySetting.tsx';
import { WindowView } from './WindowView.tsx';
import { WireChooser } from './WireChooser.tsx';
import './design.css';

export function DesignPanel() {
  const answers = useDesignStore((s) => s.answers);
  const project = useDesignStore((s) => s.answersProject);
  const stale = useDesignStore((s) => s.stale);
  const error = useDesignStore((s) => s.error);
  const units = useUiStore((s) => s.unitSystem);
  return (
    <section className="design-panel" aria-labelledby="design-heading" data-out-of-date={stale}>
      <h2 id="design-heading">Find the design</h2>
      <p className="status" aria-live="polite" data-testid="design-status">
        {error
          ? `The design aids could not be worked out: ${error}`
          : stale
            ? 'Working out the window and the wires…'
            : 'Design aids up to date.'}
      </p>
      {answers && project && (
        <div className={stale ? 'out-of-date' : undefined}>
          <WindowView answers={answers} project={project} units={units} />
          <WireChooser choices={answers.choices} project={project} units={units} />
          <TodaySetting project={project} setting={answers.setting} units={units} />
        </div>
      )}
    </section>
  );
}
