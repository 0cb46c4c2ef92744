/**
 * The wire's end fittings, one per end: a kind from the table of termination efficiencies (each
 * with its source), "my own value", or not stated (no reduction: terminations as strong as the
 * wire). The weaker end sets the working limit.
 */
import {
  END_FITTING_TYPES,
  type EndFitting,
  type EndFittingKind,
  type EndFittings,
  resolveEndFittings,
} from '../../core/index.ts';
import { setEndFitting } from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { SelectField } from '../fields/ChoiceFields.tsx';
import { NumberField } from '../fields/NumberField.tsx';

type Choice = EndFittingKind | 'notStated';

const CHOICES: { value: Choice; label: string }[] = [
  { value: 'notStated', label: 'Not stated (no reduction)' },
  ...END_FITTING_TYPES.map((t) => ({
    value: t.kind as Choice,
    label: `${t.label} (${Math.round(t.efficiency * 100)} %)`,
  })),
  { value: 'custom', label: 'My own value' },
];

const percent = (fraction: number) => `${Math.round(fraction * 1000) / 10} %`;

function EndChoice(props: { end: 'start' | 'end'; label: string; fittings?: EndFittings }) {
  const resolved = resolveEndFittings(props.fittings)[props.end];
  const fitting = props.fittings?.[props.end];
  const choose = (kind: Choice) => {
    if (kind === 'notStated') return setEndFitting(props.end, undefined);
    const next: EndFitting =
      kind === 'custom' ? { kind, efficiency: resolved.efficiency } : { kind };
    return setEndFitting(props.end, next);
  };
  return (
    <div className="end-fitting">
      <SelectField
        label={props.label}
        value={(fitting?.kind ?? 'notStated') as Choice}
        options={CHOICES}
        edit={choose}
      />
      {fitting?.kind === 'custom' && (
        <NumberField
          path={`limits.endFittings.${props.end}.efficiency`}
          context={props.label}
          label="Efficiency (fraction of the breaking load)"
          quantity="ratio"
          value={fitting.efficiency ?? 1}
          edit={(efficiency) => setEndFitting(props.end, { kind: 'custom', efficiency })}
        />
      )}
      <p className="muted">
        Holds {percent(resolved.efficiency)} of the breaking load — {resolved.source}
      </p>
    </div>
  );
}

export function EndFittingsFields() {
  const fittings = useProjectStore((s) => s.project.limits.endFittings);
  const both = resolveEndFittings(fittings);
  return (
    <fieldset className="end-fittings">
      <legend>End fittings</legend>
      <EndChoice end="start" label="At the first fixing" fittings={fittings} />
      <EndChoice end="end" label="At the last fixing" fittings={fittings} />
      <p>
        {both.stated
          ? `Working limit uses ${percent(both.efficiency)} of the breaking load (the weaker end).`
          : 'No end fittings stated: the working limit assumes terminations as strong as the wire.'}
      </p>
    </fieldset>
  );
}
