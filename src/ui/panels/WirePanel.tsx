/** The wire: pick from the catalogue (search by type, construction or diameter) or enter values. */
import { useId, useMemo, useState } from 'react';
import {
  type CustomWire,
  type Project,
  resolveWire,
  WIRE_CATALOG,
  type WireProperties,
} from '../../core/index.ts';
import type { Quantity } from '../../core/units.ts';
import { formatCell } from '../../deliverables/displayUnits.ts';
import { setWire } from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { applyEdit } from '../fields/ChoiceFields.tsx';
import { Hint } from '../fields/Hint.tsx';
import { NumberField } from '../fields/NumberField.tsx';
import { TextField } from '../fields/TextField.tsx';
import { EndFittingsFields } from './EndFittingsFields.tsx';

function matches(wire: WireProperties, query: string): boolean {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const text = `${wire.label} ${wire.kind} ${wire.construction} ${wire.diameter * 1000} mm`;
  return words.every((word) => text.toLowerCase().includes(word));
}

function toCustom(wire: WireProperties): CustomWire {
  const { label, diameter, massPerLength, axialStiffness, thermalExpansion, breakingLoad } = wire;
  return {
    label: `${label} (edited)`,
    diameter,
    massPerLength,
    axialStiffness,
    thermalExpansion,
    breakingLoad,
  };
}

function CataloguePicker({ selectedId }: { selectedId: string }) {
  const [query, setQuery] = useState('');
  const searchId = useId();
  const listId = useId();
  const found = useMemo(() => WIRE_CATALOG.filter((w) => matches(w, query)), [query]);
  return (
    <div className="wire-picker">
      <label htmlFor={searchId}>Search the catalogue (type, construction, diameter)</label>
      <input
        id={searchId}
        type="search"
        value={query}
        placeholder="e.g. stainless 4 mm"
        onChange={(event) => setQuery(event.target.value)}
      />
      <label htmlFor={listId}>
        Catalogue wire ({found.length} of {WIRE_CATALOG.length} shown)
      </label>
      <select
        id={listId}
        size={6}
        value={selectedId}
        onChange={(event) => applyEdit(setWire({ catalogId: event.target.value }), 'Choose a wire')}
      >
        {found.map((wire) => (
          <option key={wire.id} value={wire.id}>
            {wire.label}
          </option>
        ))}
      </select>
    </div>
  );
}

type WireNumber = keyof Omit<CustomWire, 'label'>;

/** The wire's numbers, in the order shown, with their quantity and the digits for display. */
const WIRE_NUMBERS: { key: WireNumber; label: string; quantity: Quantity; digits?: number }[] = [
  { key: 'diameter', label: 'Diameter', quantity: 'diameter' },
  { key: 'massPerLength', label: 'Mass', quantity: 'massPerLength', digits: 3 },
  { key: 'breakingLoad', label: 'Minimum breaking load', quantity: 'force' },
  { key: 'axialStiffness', label: 'Axial stiffness EA', quantity: 'stiffness', digits: 0 },
  { key: 'thermalExpansion', label: 'Thermal expansion', quantity: 'expansion' },
];

function CustomValues({ wire }: { wire: CustomWire }) {
  return (
    <div className="field-grid">
      <TextField
        path="wire.label"
        label="Wire name"
        value={wire.label}
        edit={(label) => setWire({ ...wire, label })}
      />
      {WIRE_NUMBERS.map(({ key, label, quantity }) => (
        <NumberField
          key={key}
          path={`wire.${key}`}
          label={label}
          quantity={quantity}
          value={wire[key]}
          edit={(value) => setWire({ ...wire, [key]: value })}
          hint={key === 'axialStiffness' ? <Hint term="axialStiffness" /> : undefined}
        />
      ))}
    </div>
  );
}

/** A catalogue wire's data (thermal expansion is in the catalogue listing and the report). */
function WireFacts({ wire }: { wire: WireProperties }) {
  const units = useUiStore((s) => s.unitSystem);
  const shown = WIRE_NUMBERS.filter((n) => n.key !== 'thermalExpansion');
  return (
    <dl className="facts">
      {shown.map(({ key, label, quantity, digits }) => (
        <div key={key} className="fact">
          <dt>
            {label}
            {key === 'axialStiffness' && (
              <>
                {' '}
                <Hint term="axialStiffness" />
              </>
            )}
          </dt>
          <dd>{formatCell(units, quantity, wire[key], digits)}</dd>
        </div>
      ))}
    </dl>
  );
}

export function WirePanel() {
  const wireSpec = useProjectStore((s: { project: Project }) => s.project.wire);
  const resolved = resolveWire(wireSpec);
  const isCatalogue = 'catalogId' in wireSpec;
  const firstWire = WIRE_CATALOG[0];
  return (
    <section className="panel" aria-labelledby="wire-heading">
      <h2 id="wire-heading">Wire</h2>
      <fieldset className="inline-choice">
        <legend className="visually-hidden">Wire source</legend>
        <label>
          <input
            type="radio"
            name="wire-source"
            checked={isCatalogue}
            onChange={() => applyEdit(setWire({ catalogId: firstWire.id }), 'Use a catalogue wire')}
          />
          From the catalogue
        </label>
        <label>
          <input
            type="radio"
            name="wire-source"
            checked={!isCatalogue}
            onChange={() =>
              resolved && applyEdit(setWire(toCustom(resolved)), 'Use my own wire values')
            }
          />
          My own values
        </label>
      </fieldset>
      {isCatalogue ? (
        <>
          <CataloguePicker selectedId={wireSpec.catalogId} />
          {resolved && <WireFacts wire={resolved} />}
        </>
      ) : (
        <CustomValues wire={wireSpec} />
      )}
      <EndFittingsFields />
    </section>
  );
}
