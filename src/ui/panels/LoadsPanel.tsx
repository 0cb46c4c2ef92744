/**
 * What hangs on the wire: point loads (lamps, signs: weight, wind area, drag, drop) and part-span
 * loads (cables: weight, diameter for ice and wind, drop) and moving loads (a basket or trolley that
 * travels along the wire: its path and weight), add/remove/edit.
 */
import {
  DEFAULT_ENVIRONMENT,
  type Load,
  type PointLoad,
  type UniformLoad,
} from '../../core/index.ts';
import * as edits from '../../state/projectEdits.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { applyEdit } from '../fields/ChoiceFields.tsx';
import { NumberField } from '../fields/NumberField.tsx';
import { TextField } from '../fields/TextField.tsx';
import { LoadExtentFields } from './LoadExtentFields.tsx';
import { LoadWeightField } from './LoadWeightField.tsx';
import { MovingLoadRow } from './MovingLoadRow.tsx';
import { Row } from './Row.tsx';

function PointRow({ load, index }: { load: PointLoad; index: number }) {
  const path = `loads[${index}]`;
  const name = load.label || `Load ${index + 1}`;
  const environmentDrag = useProjectStore(
    (s) => s.project.environment?.dragCoefficient ?? DEFAULT_ENVIRONMENT.dragCoefficient,
  );
  return (
    <>
      <NumberField
        path={`${path}.x`}
        context={name}
        label="Position"
        quantity="length"
        value={load.x}
        edit={(x) => edits.patchLoad(index, { x })}
      />
      <LoadWeightField load={load} index={index} name={name} />
      <NumberField
        path={`${path}.windArea`}
        context={name}
        label="Wind area"
        quantity="area"
        value={load.windArea ?? 0}
        edit={(windArea) => edits.patchLoad(index, { windArea })}
      />
      <NumberField
        path={`${path}.dragCoefficient`}
        context={name}
        label="Drag coefficient"
        quantity="ratio"
        value={load.dragCoefficient ?? environmentDrag}
        edit={(dragCoefficient) => edits.patchLoad(index, { dragCoefficient })}
      />
      <DropField path={path} name={name} index={index} drop={load.drop} />
    </>
  );
}

function DropField(props: { path: string; name: string; index: number; drop?: number }) {
  return (
    <NumberField
      path={`${props.path}.drop`}
      context={props.name}
      label="Hangs below the wire"
      quantity="length"
      value={props.drop ?? 0}
      edit={(drop) => edits.patchLoad(props.index, { drop })}
    />
  );
}

function UniformRow({ load, index }: { load: UniformLoad; index: number }) {
  const path = `loads[${index}]`;
  const name = load.label || `Load ${index + 1}`;
  return (
    <>
      <LoadExtentFields index={index} name={name} from={load.from} to={load.to} fromLabel="From" />
      <NumberField
        path={`${path}.massPerLength`}
        context={name}
        label="Mass"
        quantity="massPerLength"
        value={load.massPerLength}
        edit={(massPerLength) => edits.patchLoad(index, { massPerLength })}
      />
      <NumberField
        path={`${path}.diameter`}
        context={name}
        label="Diameter"
        quantity="diameter"
        value={load.diameter ?? 0}
        edit={(diameter) => edits.patchLoad(index, { diameter })}
      />
      <DropField path={path} name={name} index={index} drop={load.drop} />
    </>
  );
}

const LOAD_KIND_NAMES: Record<Load['type'], string> = {
  point: 'Point load',
  uniform: 'Part-span load',
  moving: 'Moving load',
};

function LoadRow({ load, index }: { load: Load; index: number }) {
  const kind = LOAD_KIND_NAMES[load.type];
  const name = load.label || `Load ${index + 1}`;
  return (
    <Row label={`${kind} ${index + 1}`}>
      <TextField
        path={`loads[${index}].label`}
        context={`${kind} ${index + 1}`}
        label="Name"
        value={load.label ?? ''}
        edit={(label) => edits.patchLoad(index, { label })}
      />
      {load.type === 'point' && <PointRow load={load} index={index} />}
      {load.type === 'uniform' && <UniformRow load={load} index={index} />}
      {load.type === 'moving' && <MovingLoadRow load={load} index={index} />}
      <button type="button" onClick={() => applyEdit(edits.removeLoad(index), `Remove ${name}`)}>
        Remove {name}
      </button>
    </Row>
  );
}

export function LoadsPanel() {
  const loads = useProjectStore((s) => s.project.loads);
  return (
    <section className="panel" aria-labelledby="loads-heading">
      <h2 id="loads-heading">Hung loads</h2>
      {loads.length === 0 && <p className="muted">Nothing hangs on the wire.</p>}
      {loads.map((load, index) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: rows are positions in the list
        <LoadRow key={index} load={load} index={index} />
      ))}
      <div className="actions">
        <button type="button" onClick={() => applyEdit(edits.addLoad('point'), 'Add a point load')}>
          Add a point load
        </button>
        <button
          type="button"
          onClick={() => applyEdit(edits.addLoad('uniform'), 'Add a part-span load')}
        >
          Add a part-span load
        </button>
        <button
          type="button"
          onClick={() => applyEdit(edits.addLoad('moving'), 'Add a moving load')}
        >
          Add a moving load
        </button>
      </div>
    </section>
  );
}
