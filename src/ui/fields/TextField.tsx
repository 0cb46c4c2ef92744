/** A text input for a document string (labels, case names), checked like a number field. */
import { useId, useState } from 'react';
import { useDraftStore } from '../../state/draftStore.ts';
import { type Edit, tryEdit } from './useDocumentEdit.ts';

export interface TextFieldProps {
  path: string;
  label: string;
  value: string;
  edit: (text: string) => Edit;
  compact?: boolean;
  /** Words before the label that only a screen reader hears, e.g. the fixing's name. */
  context?: string;
  placeholder?: string;
}

export function TextField({
  path,
  label,
  value,
  edit,
  compact,
  placeholder,
  context,
}: TextFieldProps) {
  const setInvalid = useDraftStore((s) => s.setInvalid);
  const [draft, setDraft] = useState<string | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const inputId = useId();

  function change(text: string) {
    setDraft(text);
    const reason = text === value ? null : tryEdit(path, edit(text), 'count', 'si');
    setMessage(reason);
    setInvalid(path, reason === null ? null : `${context ? `${context} ` : ''}${label}: ${reason}`);
  }

  return (
    <div className={`field field-text${message ? ' field-invalid' : ''}`}>
      <label htmlFor={inputId} className={compact ? 'visually-hidden' : undefined}>
        {context && <span className="visually-hidden">{context} </span>}
        {label}
      </label>
      <input
        id={inputId}
        type="text"
        value={draft ?? value}
        placeholder={placeholder}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${inputId}-message` : undefined}
        onChange={(event) => change(event.target.value)}
        onBlur={() => message === null && setDraft(null)}
      />
      {message && (
        <span id={`${inputId}-message`} className="field-message" role="alert">
          {context} {label} {message}
        </span>
      )}
    </div>
  );
}
