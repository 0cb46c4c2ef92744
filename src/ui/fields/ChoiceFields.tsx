/** A checkbox and a drop-down for document values that cannot be mistyped. */
import { useId } from 'react';
import { useProjectStore } from '../../state/projectStore.ts';
import type { Edit } from './useDocumentEdit.ts';

function commit(edit: Edit): void {
  const { project, setProject } = useProjectStore.getState();
  setProject(edit(project));
}

export function CheckField(props: {
  label: string;
  checked: boolean;
  edit: (on: boolean) => Edit;
  compact?: boolean;
}) {
  const id = useId();
  return (
    <div className="field field-check">
      <input
        id={id}
        type="checkbox"
        checked={props.checked}
        onChange={(event) => commit(props.edit(event.target.checked))}
      />
      <label htmlFor={id} className={props.compact ? 'visually-hidden' : undefined}>
        {props.label}
      </label>
    </div>
  );
}

export function SelectField<T extends string>(props: {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  edit: (value: T) => Edit;
  /** Read out before the label (e.g. the fixing's name) where the label repeats in a list. */
  context?: string;
}) {
  const id = useId();
  return (
    <div className="field">
      <label htmlFor={id}>
        {props.context && <span className="visually-hidden">{props.context} </span>}
        {props.label}
      </label>
      <select
        id={id}
        value={props.value}
        onChange={(event) => commit(props.edit(event.target.value as T))}
      >
        {props.options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </div>
  );
}

/** Apply an edit to the document directly (buttons: add, remove, duplicate). */
export function applyEdit(edit: Edit): void {
  commit(edit);
}
