/**
 * A help mark beside a trade term: a "?" button reachable by keyboard that shows a one-line
 * plain explanation on hover, focus or press (Escape hides it). The explanation is the button's
 * description (aria-describedby), so a screen reader reads it with the button.
 */
import { useId, useState } from 'react';
import { TERMS, type Term } from '../terms.ts';

export function Hint({ term }: { term: Term }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const { name, text } = TERMS[term];
  return (
    <span className="hint">
      <button
        type="button"
        className="hint-mark"
        aria-label={`What is ${name}?`}
        aria-describedby={id}
        aria-expanded={open}
        onClick={() => setOpen((o) => !o)}
        onBlur={() => setOpen(false)}
        onKeyDown={(event) => {
          if (event.key === 'Escape') setOpen(false);
        }}
      >
        ?
      </button>
      <span id={id} role="tooltip" className={open ? 'hint-text hint-open' : 'hint-text'}>
        {text}
      </span>
    </span>
  );
}
