/** Where a part-span or moving load lies along the line: its from and to fields. */
import * as edits from '../../state/projectEdits.ts';
import { NumberField } from '../fields/NumberField.tsx';

export function LoadExtentFields(props: {
  index: number;
  name: string;
  from: number;
  to: number;
  fromLabel: string;
}) {
  const path = `loads[${props.index}]`;
  return (
    <>
      <NumberField
        path={`${path}.from`}
        context={props.name}
        label={props.fromLabel}
        quantity="length"
        value={props.from}
        edit={(from) => edits.patchLoad(props.index, { from })}
      />
      <NumberField
        path={`${path}.to`}
        context={props.name}
        label="To"
        quantity="length"
        value={props.to}
        edit={(to) => edits.patchLoad(props.index, { to })}
      />
    </>
  );
}
