/**
 * Installation: the day's temperature, whether the loads are hung, and what is set on the day
 * (horizontal tension, largest tension, sag or cut length), optionally stated in another case.
 */
import {
  caseResultId,
  INSTALLATION_ID,
  type InstallationTarget,
  type Project,
  type ProjectResults,
} from '../../core/index.ts';
import type { Quantity } from '../../core/units.ts';
import * as edits from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useResultsStore } from '../../state/resultsStore.ts';
import { CheckField, SelectField } from '../fields/ChoiceFields.tsx';
import { Hint } from '../fields/Hint.tsx';
import { NumberField } from '../fields/NumberField.tsx';

type TargetKind = 'horizontalTension' | 'maxTension' | 'sag' | 'unstressedLength';

const KINDS: { value: TargetKind; label: string; quantity: Quantity }[] = [
  { value: 'sag', label: 'Sag', quantity: 'length' },
  { value: 'horizontalTension', label: 'Horizontal tension', quantity: 'force' },
  { value: 'maxTension', label: 'Largest tension', quantity: 'force' },
  { value: 'unstressedLength', label: 'Cut length (unstressed)', quantity: 'length' },
];

function kindOf(target: InstallationTarget): TargetKind {
  return KINDS.find((k) => target[k.value] !== undefined)?.value ?? 'sag';
}

/** A new target of another kind starts at what the current design gives, so nothing jumps. */
function startingValue(kind: TargetKind, project: Project, results: ProjectResults | null): number {
  const stated = project.installation.target.case;
  const index = stated === undefined ? -1 : project.cases.findIndex((c) => c.name === stated);
  const state = results?.cases.find(
    (c) => c.id === (index < 0 ? INSTALLATION_ID : caseResultId(index)),
  );
  const span = project.supports[project.supports.length - 1].x - project.supports[0].x;
  if (kind === 'unstressedLength') return results?.unstressedLength ?? span;
  if (kind === 'sag') return state?.sag ?? span / 40;
  if (kind === 'maxTension') return state?.maxTension ?? 500;
  return state?.horizontalTension ?? 500;
}

function changeKind(kind: TargetKind) {
  const project = useProjectStore.getState().project;
  const results = useResultsStore.getState().results;
  const old = project.installation.target;
  const target: InstallationTarget = { [kind]: startingValue(kind, project, results) };
  if (old.case !== undefined && kind !== 'unstressedLength') target.case = old.case;
  return edits.setTarget(target);
}

export function InstallationPanel() {
  const project = useProjectStore((s) => s.project);
  const { installation, cases } = project;
  const target = installation.target;
  const kind = kindOf(target);
  const quantity = KINDS.find((k) => k.value === kind)?.quantity ?? 'length';
  const caseOptions = [
    { value: '', label: 'On the day (installation)' },
    ...cases.map((c) => ({ value: c.name, label: c.name })),
  ];
  return (
    <section className="panel" aria-labelledby="installation-heading">
      <h2 id="installation-heading">Installation</h2>
      <div className="field-grid">
        <NumberField
          path="installation.temperature"
          label="Temperature on the day"
          quantity="temperature"
          value={installation.temperature}
          edit={(temperature) => edits.patchInstallation({ temperature })}
        />
        <CheckField
          label="Loads hung when tensioned"
          checked={installation.withLoads}
          edit={(withLoads) => edits.patchInstallation({ withLoads })}
        />
        <SelectField label="Set the wire by" value={kind} options={KINDS} edit={changeKind} />
        <NumberField
          path={`installation.target.${kind}`}
          label={KINDS.find((k) => k.value === kind)?.label ?? 'Target'}
          quantity={quantity}
          value={target[kind] ?? 0}
          edit={(value) => edits.setTarget({ ...target, [kind]: value })}
          hint={
            kind === 'unstressedLength' ? (
              <Hint term="cutLength" />
            ) : kind === 'horizontalTension' ? (
              <Hint term="horizontalTension" />
            ) : kind === 'maxTension' ? (
              <Hint term="largestTension" />
            ) : (
              <Hint term="sag" />
            )
          }
        />
        {kind !== 'unstressedLength' && (
          <SelectField
            label="Target holds in"
            value={target.case ?? ''}
            options={caseOptions}
            edit={(name) => {
              const { case: _old, ...rest } = target;
              return edits.setTarget(name ? { ...rest, case: name } : rest);
            }}
          />
        )}
      </div>
    </section>
  );
}
