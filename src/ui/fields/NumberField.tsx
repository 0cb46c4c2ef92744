/**
 * A number input for one document value, in the chosen display units, labelled with its unit.
 * Typed text stays in the field until it is valid; a refusal shows beside the field naming the
 * rule, and the results on screen are marked out of date meanwhile.
 */
import { type ReactNode, useEffect, useId, useRef, useState } from 'react';
import type { Quantity } from '../../core/units.ts';
import { toSi, unitSymbol } from '../../core/units.ts';
import { fieldText, parseNumber } from '../../deliverables/displayUnits.ts';
import { useDraftStore } from '../../state/draftStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import { type Edit, tryEdit } from './useDocumentEdit.ts';

export interface NumberFieldProps {
  /** Document path of the value, e.g. "supports[1].x"; also the undo-merge key. */
  path: string;
  label: string;
  quantity: Quantity;
  /** Current SI value. */
  value: number;
  /** Builds the new document from the SI value typed. */
  edit: (si: number) => Edit;
  /** Hide the visible label (a table column header names it); the input keeps it. */
  compact?: boolean;
  /** Words before the label that only a screen reader hears, e.g. the fixing's name. */
  context?: string;
  /** A help mark after the label explaining a trade term (fields/Hint.tsx). */
  hint?: ReactNode;
}

export function NumberField({
  path,
  label,
  quantity,
  value,
  edit,
  compact,
  context,
  hint,
}: NumberFieldProps) {
  const units = useUiStore((s) => s.unitSystem);
  const setInvalid = useDraftStore((s) => s.setInvalid);
  const [draft, setDraft] = useState<string | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const committed = useRef<number | null>(null);
  const inputId = useId();
  const messageId = `${inputId}-message`;
  const symbol = unitSymbol(quantity, units);

  // A change from outside (undo, redo, another panel) replaces a draft that was accepted.
  useEffect(() => {
    if (committed.current !== null && committed.current !== value) {
      committed.current = null;
      setDraft((current) => (message === null ? null : current));
    }
  }, [value, message]);
  useEffect(() => () => setInvalid(path, null), [path, setInvalid]);

  // Switching units converts refused text too, so it keeps meaning what the person typed.
  const shownUnits = useRef(units);
  const refusedSi = useRef<number | undefined>(undefined);
  useEffect(() => {
    const before = shownUnits.current;
    shownUnits.current = units;
    const typedSi = refusedSi.current;
    if (before === units || draft === null || message === null || typedSi === undefined) return;
    change(fieldText(units, quantity, typedSi));
    refusedSi.current = typedSi; // the value as first typed, not its rounded display
  });

  function change(text: string) {
    setDraft(text);
    const shown = parseNumber(text);
    const si = shown === undefined ? undefined : toSi(shown, quantity, units);
    refusedSi.current = si;
    let reason: string | null;
    if (si === undefined) reason = 'must be a number';
    else if (si === value) reason = null;
    else {
      committed.current = si;
      reason = tryEdit(path, edit(si), quantity, units);
      if (reason !== null) committed.current = null;
    }
    setMessage(reason);
    setInvalid(path, reason === null ? null : `${context ? `${context} ` : ''}${label}: ${reason}`);
  }

  const text = draft ?? fieldText(units, quantity, value);
  const fullLabel = symbol ? `${label} (${symbol})` : label;
  return (
    <div className={`field${message ? ' field-invalid' : ''}`}>
      <label htmlFor={inputId} className={compact ? 'visually-hidden' : undefined}>
        {context && <span className="visually-hidden">{context} </span>}
        {fullLabel}
      </label>
      {hint}
      <input
        id={inputId}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        value={text}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? messageId : undefined}
        onChange={(event) => change(event.target.value)}
        onBlur={() => message === null && setDraft(null)}
      />
      {message && (
        <span id={messageId} className="field-message" role="alert">
          {context} {label} {message}
        </span>
      )}
    </div>
  );
}
