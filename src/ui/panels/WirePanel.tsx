/** The wire: pick from the catalogue (search by type, construction or diameter) or enter values. */
import { useId, useMemo, useState } from 'react';
import {
  type CustomWire,
  type Project,
  resolveWire,
  WIRE_CATALOG,
  type WireProperties,
} from '../../core/index.ts';
import { setWire } from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { applyEdit } from '../fields/ChoiceFields.tsx';
import { NumberField } from '../fields/NumberField.tsx';
import { TextField } from '../fields/TextField.tsx';
import { show } from '../format.ts';

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
        onChange={(event) => applyEdit(setWire({ catalogId: event.target.value }))}
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

function CustomValues({ wire }: { wire: CustomWire }) {
  const field = (key: keyof Omit<CustomWire, 'label'>) => (value: number) =>
    setWire({ ...wire, [key]: value });
  return (
    <div className="field-grid">
      <TextField
        path="wire.label"
        label="Wire name"
        value={wire.label}
        edit={(label) => setWire({ ...wire, label })}
      />
      <NumberField
        path="wire.diameter"
        label="Diameter"
        quantity="diameter"
        value={wire.diameter}
        edit={field('diameter')}
      />
      <NumberField
        path="wire.massPerLength"
        label="Mass"
        quantity="massPerLength"
        value={wire.massPerLength}
        edit={field('massPerLength')}
      />
      <NumberField
        path="wire.breakingLoad"
        label="Minimum breaking load"
        quantity="force"
        value={wire.breakingLoad}
        edit={field('breakingLoad')}
      />
      <NumberField
        path="wire.axialStiffness"
        label="Axial stiffness EA"
        quantity="stiffness"
        value={wire.axialStiffness}
        edit={field('axialStiffness')}
      />
      <NumberField
        path="wire.thermalExpansion"
        label="Thermal expansion"
        quantity="expansion"
        value={wire.thermalExpansion}
        edit={field('thermalExpansion')}
      />
    </div>
  );
}

function WireFacts({ wire }: { wire: WireProperties }) {
  const units = useUiStore((s) => s.unitSystem);
  return (
    <dl className="facts">
      <dt>Diameter</dt>
      <dd>{show(wire.diameter, 'diameter', units)}</dd>
      <dt>Mass</dt>
      <dd>{show(wire.massPerLength, 'massPerLength', units, 3)}</dd>
      <dt>Minimum breaking load</dt>
      <dd>{show(wire.breakingLoad, 'force', units)}</dd>
      <dt>Axial stiffness EA</dt>
      <dd>{show(wire.axialStiffness, 'stiffness', units, 0)}</dd>
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
            onChange={() => applyEdit(setWire({ catalogId: firstWire.id }))}
          />
          From the catalogue
        </label>
        <label>
          <input
            type="radio"
            name="wire-source"
            checked={!isCatalogue}
            onChange={() => resolved && applyEdit(setWire(toCustom(resolved)))}
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
    </section>
  );
}
