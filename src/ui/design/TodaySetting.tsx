/**
 * Today's setting: the person types the temperature of the day; the worker answers with the
 * horizontal tension, largest tension and sag to set at exactly that temperature, where and how
 * to measure the sag, the lowest point, and the pulse and pluck checks when they hold.
 */
import { useId, useState } from 'react';
import type { DaySetting, Project } from '../../core/index.ts';
import { toSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { fieldText, formatCell, parseNumber } from '../../deliverables/displayUnits.ts';
import { fixingName, spanName } from '../../deliverables/setUpContent.ts';
import { useDesignStore } from '../../state/designStore.ts';
import { TODAYS_SETTING_ID } from '../sectionIds.ts';

const RANGE_C = [-80, 80] as const;

function TemperatureInput({ units }: { units: UnitSystem }) {
  const temperature = useDesignStore((s) => s.temperatureNow);
  const setTemperature = useDesignStore((s) => s.setTemperatureNow);
  const [draft, setDraft] = useState<string | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const id = useId();
  const symbol = unitSymbol('temperature', units);
  function change(text: string) {
    setDraft(text);
    if (text.trim() === '') {
      setMessage(null);
      setTemperature(null);
      return;
    }
    const shown = parseNumber(text);
    const si = shown === undefined ? undefined : toSi(shown, 'temperature', units);
    if (si === undefined) setMessage('must be a number');
    else if (si < RANGE_C[0] || si > RANGE_C[1])
      setMessage(
        `must be between ${formatCell(units, 'temperature', RANGE_C[0])} and ${formatCell(units, 'temperature', RANGE_C[1])}`,
      );
    else {
      setMessage(null);
      setTemperature(si);
    }
  }
  const text = draft ?? (temperature === null ? '' : fieldText(units, 'temperature', temperature));
  return (
    <div className={`field${message ? ' field-invalid' : ''}`}>
      <label htmlFor={id}>Temperature now ({symbol})</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        value={text}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${id}-message` : undefined}
        onChange={(e) => change(e.target.value)}
      />
      {message && (
        <span id={`${id}-message`} className="field-message" role="alert">
          Temperature now {message}
        </span>
      )}
    </div>
  );
}

function whereToMeasure(project: Project, s: DaySetting, units: UnitSystem): string {
  const a = fixingName(project, s.span);
  const span = spanName(project, s.span);
  const x0 = project.supports[s.span].x;
  const l = project.supports[s.span + 1].x - x0;
  const level = project.supports[s.span].z === project.supports[s.span + 1].z;
  const len = (m: number) => formatCell(units, 'length', m);
  if (level && Math.abs(s.sagAt.distance - l / 2) <= 0.01 * l)
    return `Level span ${span}: measure the sag at mid-span, ${len(l / 2)} from ${a}: ${len(s.midSpanSag)} below a string line between the fixings.`;
  return (
    `${level ? 'Level' : 'Inclined'} span ${span}: measure the sag from a string line between the fixings. ` +
    `It is largest, ${len(s.sag)}, at ${len(s.sagAt.distance)} from ${a} (measured level); at mid-span, ${len(l / 2)} from ${a}, ${len(s.midSpanSag)}.`
  );
}

function fieldChecks(project: Project, s: DaySetting): string {
  if (s.returnTime === null || s.frequency === null)
    return 'Pulse and pluck checks do not hold: the hung loads are on the wire while it is set, and a pulse reflects off them. Check the sag instead.';
  return (
    `Pulse check: flick the wire near ${fixingName(project, s.span)}; the pulse returns after ${s.returnTime.toFixed(2)} s. ` +
    `Plucked sideways it swings at about ${s.frequency.toFixed(2)} Hz. Both hold for the bare wire only.`
  );
}

function SettingView({
  project,
  s,
  units,
}: {
  project: Project;
  s: DaySetting;
  units: UnitSystem;
}) {
  return (
    <dl className="facts" data-testid="today-setting">
      <dt>Horizontal tension</dt>
      <dd>{formatCell(units, 'force', s.horizontalTension)}</dd>
      <dt>Largest tension</dt>
      <dd>{formatCell(units, 'force', s.maxTension)}</dd>
      <dt>Sag</dt>
      <dd>{formatCell(units, 'length', s.sag)}</dd>
      <dt>Where to measure</dt>
      <dd>{whereToMeasure(project, s, units)}</dd>
      <dt>Lowest point</dt>
      <dd>
        {formatCell(units, 'length', s.lowestPoint.z)} above the ground datum,{' '}
        {formatCell(units, 'length', s.lowestPoint.x - project.supports[s.span].x)} from{' '}
        {fixingName(project, s.span)}
      </dd>
      <dt>Field checks</dt>
      <dd>{fieldChecks(project, s)}</dd>
    </dl>
  );
}

export function TodaySetting({
  project,
  setting,
  units,
}: {
  project: Project;
  setting: DaySetting | null;
  units: UnitSystem;
}) {
  return (
    <section className="design-block" id={TODAYS_SETTING_ID} aria-labelledby="today-heading">
      <h3 id="today-heading">Today's setting</h3>
      <p className="setup-note">
        What to set at exactly the temperature of the day (the design's cut length, installation
        loads, still air).
      </p>
      <TemperatureInput units={units} />
      {setting ? (
        <>
          {!setting.solved && <p className="verdict-fail">Not solved at this temperature.</p>}
          <SettingView project={project} s={setting} units={units} />
        </>
      ) : (
        <p className="muted">Type the temperature on site to get the tension and sag to set.</p>
      )}
    </section>
  );
}
