/** The fields of a moving load: the path it travels (from, to) and its mass or force. */
import type { MovingLoad } from '../../core/index.ts';
import { LoadExtentFields } from './LoadExtentFields.tsx';
import { LoadWeightField } from './LoadWeightField.tsx';

export function MovingLoadRow({ load, index }: { load: MovingLoad; index: number }) {
  const name = load.label || `Load ${index + 1}`;
  return (
    <>
      <LoadExtentFields
        index={index}
        name={name}
        from={load.from}
        to={load.to}
        fromLabel="Travels from"
      />
      <LoadWeightField load={load} index={index} name={name} />
      <p className="muted moving-caution" data-testid="moving-caution">
        The envelope shows the worst position for the wire; never for carrying people.
      </p>
    </>
  );
}
