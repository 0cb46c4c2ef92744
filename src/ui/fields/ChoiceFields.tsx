/** A checkbox and a drop-down for document values that cannot be mistyped. */
import { useId } from 'react';
import { type CommitOptions, commit, commitAction, type Edit } from '../../state/commit.ts';

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

/**
 * A button's edit (add, remove, duplicate): validated like any other; what it carries along or
 * why it was refused is told in the edit notice. `what` is the button's own words.
 */
export function applyEdit(edit: Edit, what: string, options: CommitOptions = {}): void {
  commitAction(edit, { what, ...options });
}
