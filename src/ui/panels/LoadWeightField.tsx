/** A hung or moving load's weight: its force in N when the file states one, else its mass. */
import * as edits from '../../state/projectEdits.ts';
import { NumberField } from '../fields/NumberField.tsx';

export function LoadWeightField({
  load,
  index,
  name,
}: {
  load: { mass?: number; force?: number };
  index: number;
  name: string;
}) {
  const path = `loads[${index}]`;
  return load.force !== undefined ? (
    <NumberField
      path={`${path}.force`}
      context={name}
      label="Force"
      quantity="force"
      value={load.force}
      edit={(force) => edits.patchLoad(index, { force })}
    />
  ) : (
    <NumberField
      path={`${path}.mass`}
      context={name}
      label="Mass"
      quantity="mass"
      value={load.mass ?? 0}
      edit={(mass) => edits.patchLoad(index, { mass })}
    />
  );
}
