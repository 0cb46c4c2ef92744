/**
 * "Check the wire as built": the installer enters one site measurement (sag at a point, pulse
 * return time, plucked frequency or a gauge's horizontal tension) and the temperature; the
 * solver worker back-computes the cut length and re-runs every case. Shows the cut length
 * against the design's and each case's check as designed and as built.
 */
import { type FormEvent, useId, useState } from 'react';
import {
  AS_BUILT_KINDS,
  type AsBuiltKind,
  type AsBuiltResult,
  type Project,
  type ProjectResults,
} from '../../core/index.ts';
import { unitSymbol } from '../../core/units.ts';
import { useAsBuiltStore } from '../../state/asBuiltStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { Hint } from '../fields/Hint.tsx';
import './asBuilt.css';
import {
  fieldText,
  formatCell,
  formatNumber,
  formatPercent,
} from '../../deliverables/displayUnits.ts';
import {
  type AsBuiltForm,
  KIND_LABELS,
  measurementFromForm,
  sameMeasurement,
  valueUnit,
} from './asBuiltForm.ts';

function Verdict({ ok }: { ok: boolean }) {
  return ok ? (
    <span className="verdict pass">✓ Pass</span>
  ) : (
    <span className="verdict fail">✗ Fail</span>
  );
}

function lengthChangeText(
  a: AsBuiltResult,
  units: ReturnType<typeof useUiStore.getState>['unitSystem'],
) {
  const mm = a.lengthDifference * 1000;
  // Millimetres (or inches): the differences a site tape measures.
  const size = formatCell(units, 'diameter', Math.abs(a.lengthDifference), 1);
  if (Math.abs(mm) < 0.05) return 'the same as the design';
  return `${size} ${mm > 0 ? 'longer' : 'shorter'} than the design's ${formatCell(units, 'length', a.designUnstressedLength, 3)}`;
}

function Outcome({ asBuilt, design }: { asBuilt: AsBuiltResult; design: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const fu = unitSymbol('force', units);
  const lu = unitSymbol('length', units);
  if (!asBuilt.solved)
    return (
      <p className="status status-stale" role="status">
        {asBuilt.messages.join(' ')}
      </p>
    );
  const failing = asBuilt.cases.filter((c) => !c.ok).map((c) => c.name);
  return (
    <div data-testid="as-built-outcome">
      <p>
        Cut length <Hint term="cutLength" /> as built:{' '}
        <strong data-testid="as-built-length">
          {formatCell(units, 'length', asBuilt.unstressedLength, 3)}
        </strong>
        , {lengthChangeText(asBuilt, units)}. The measurement means a horizontal tension of{' '}
        {formatCell(units, 'force', asBuilt.measurement.horizontalTension)} at{' '}
        {formatCell(units, 'temperature', asBuilt.measurement.temperature)}.
      </p>
      <p data-testid="as-built-verdict">
        {failing.length === 0
          ? 'As built, every case still passes.'
          : `As built, ${failing.length === 1 ? 'one case fails' : `${failing.length} cases fail`}: ${failing.join(', ')}.`}
      </p>
      {asBuilt.messages.map((m) => (
        <p className="muted" key={m}>
          {m}
        </p>
      ))}
      <div className="table-scroll">
        <table className="results" aria-label="Cases as designed and as built">
          <thead>
            <tr>
              <th scope="col">Case</th>
              <th scope="col">As designed</th>
              <th scope="col">As built</th>
              <th scope="col">Largest tension as built ({fu})</th>
              <th scope="col">Utilisation as built</th>
              <th scope="col">Clearance as built ({lu})</th>
            </tr>
          </thead>
          <tbody>
            {asBuilt.cases.map((c, i) => (
              <tr key={c.name} data-testid="as-built-row">
                <th scope="row">{c.name}</th>
                <td>{design.cases[i] ? <Verdict ok={design.cases[i].ok} /> : '—'}</td>
                <td>
                  <Verdict ok={c.ok} />
                  {!c.ok && <span className="case-meta">{c.messages.join(' ')}</span>}
                </td>
                <td>{formatNumber(units, 'force', c.maxTension)}</td>
                <td>{formatPercent(c.utilisation)}</td>
                <td>{formatNumber(units, 'length', c.clearance)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

export function AsBuiltPanel({ project, results }: { project: Project; results: ProjectResults }) {
  const units = useUiStore((s) => s.unitSystem);
  const measurement = useAsBuiltStore((s) => s.measurement);
  const setMeasurement = useAsBuiltStore((s) => s.setMeasurement);
  const [form, setForm] = useState<AsBuiltForm>(() => ({
    kind: 'sag',
    value: '',
    temperature: fieldText(units, 'temperature', project.installation.temperature),
    x: '',
  }));
  const [issues, setIssues] = useState<string[]>([]);
  const id = useId();
  const update = (patch: Partial<AsBuiltForm>) => setForm((f) => ({ ...f, ...patch }));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = measurementFromForm(form, project, units);
    setIssues(parsed.issues);
    if (parsed.measurement) setMeasurement(parsed.measurement);
  };
  const answer = results.asBuilt;
  const current = answer && sameMeasurement(answer.measurement, measurement) ? answer : null;
  const lu = unitSymbol('length', units);
  return (
    <section className="as-built" aria-labelledby={`${id}-heading`}>
      <h2 id={`${id}-heading`}>Check the wire as built</h2>
      <p className="muted">
        Measure one thing on site and say at what temperature: Sagwright works out the length the
        wire was actually cut to and checks every case again. Sag and tension are taken with the
        installation loads on the wire; pulse and pluck readings on the bare wire, before anything
        is hung.
      </p>
      <form className="as-built-form" onSubmit={submit} aria-label="As-built measurement">
        <label>
          What was measured
          <select
            value={form.kind}
            onChange={(e) => update({ kind: e.target.value as AsBuiltKind })}
          >
            {AS_BUILT_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
        <label>
          Measured value ({valueUnit(form.kind, units)})
          <input
            type="text"
            inputMode="decimal"
            value={form.value}
            onChange={(e) => update({ value: e.target.value })}
          />
        </label>
        <label>
          Temperature ({unitSymbol('temperature', units)})
          <input
            type="text"
            inputMode="decimal"
            value={form.temperature}
            onChange={(e) => update({ temperature: e.target.value })}
          />
        </label>
        {form.kind === 'sag' && (
          <label>
            Position from the first fixing ({lu}, empty: the set-up point)
            <input
              type="text"
              inputMode="decimal"
              value={form.x}
              onChange={(e) => update({ x: e.target.value })}
            />
          </label>
        )}
        <div className="actions">
          <button type="submit">Check as built</button>
          {measurement && (
            <button type="button" onClick={() => setMeasurement(null)}>
              Clear
            </button>
          )}
        </div>
      </form>
      {issues.length > 0 && (
        <p className="field-message" role="alert">
          {issues.join('; ')}
        </p>
      )}
      {measurement && !current && <p className="muted">Checking the measurement…</p>}
      {current && <Outcome asBuilt={current} design={results} />}
    </section>
  );
}
