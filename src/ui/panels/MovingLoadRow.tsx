/** The fields of a moving load: the path it travels (from, to) and its mass or force. */
import type { MovingLoad } from '../../core/index.ts';
import * as edits from '../../state/projectEdits.ts';
import { NumberField } from '../fields/NumberField.tsx';
import { LoadWeightField } from './LoadWeightField.tsx';

export function MovingLoadRow({ load, index }: { load: MovingLoad; index: number }) {
  const path = `loads[${index}]`;
  const name = load.label || `Load ${index + 1}`;
  return (
    <>
      <NumberField
        path={`${path}.from`}
        context={name}
        label="Travels from"
        quantity="length"
        value={load.from}
        edit={(from) => edits.patchLoad(index, { from })}
      />
      <NumberField
        path={`${path}.to`}
        context={name}
        label="To"
        quantity="length"
        value={load.to}
        edit={(to) => edits.patchLoad(index, { to })}
      />
      <LoadWeightField load={load} index={index} name={name} />
      <p className="muted moving-caution" data-testid="moving-caution">
        The envelope shows the worst position for the wire; never for carrying people.
      </p>
    </>
  );
}
