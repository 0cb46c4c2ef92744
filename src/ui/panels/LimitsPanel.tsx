/** Limits (safety factor, minimum clearance) and, tucked away, the model settings. */
import { DEFAULT_MODEL, type Theory } from '../../core/index.ts';
import * as edits from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { SelectField } from '../fields/ChoiceFields.tsx';
import { Hint } from '../fields/Hint.tsx';
import { NumberField } from '../fields/NumberField.tsx';

const THEORIES: { value: Theory; label: string }[] = [
  { value: 'exact', label: 'Elastic catenary (weight per length of wire)' },
  { value: 'parabolic', label: 'Parabolic (weight per horizontal metre)' },
];

const ORDERS = [
  { value: '1', label: 'Linear (2 nodes)' },
  { value: '2', label: 'Quadratic (3 nodes)' },
] as const;

function ModelSettings() {
  const model = { ...DEFAULT_MODEL, ...useProjectStore((s) => s.project.model) };
  return (
    <details className="model-settings">
      <summary>Model settings</summary>
      <p className="muted hint-line">
        Element settings <Hint term="elementSettings" />: the defaults suit ordinary spans; change
        them only to compare.
      </p>
      <div className="field-grid">
        <SelectField
          label="Theory"
          value={model.theory}
          options={THEORIES}
          edit={(theory) => edits.patchModel({ theory })}
        />
        <SelectField
          label="Element order"
          value={String(model.elementOrder) as '1' | '2'}
          options={ORDERS}
          edit={(order) => edits.patchModel({ elementOrder: order === '2' ? 2 : 1 })}
        />
        <NumberField
          path="model.elementsPerSpan"
          label="Elements per span"
          quantity="count"
          value={model.elementsPerSpan}
          edit={(elementsPerSpan) => edits.patchModel({ elementsPerSpan })}
        />
      </div>
    </details>
  );
}

export function LimitsPanel() {
  const limits = useProjectStore((s) => s.project.limits);
  return (
    <section className="panel" aria-labelledby="limits-heading">
      <h2 id="limits-heading">Limits</h2>
      <div className="field-grid">
        <NumberField
          path="limits.safetyFactor"
          label="Safety factor on breaking load"
          quantity="ratio"
          value={limits.safetyFactor}
          edit={(safetyFactor) => edits.patchLimits({ safetyFactor })}
        />
        <NumberField
          path="limits.minClearance"
          label="Minimum clearance above ground"
          quantity="length"
          value={limits.minClearance}
          edit={(minClearance) => edits.patchLimits({ minClearance })}
        />
      </div>
      <ModelSettings />
    </section>
  );
}
