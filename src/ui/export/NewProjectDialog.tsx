/**
 * "New project": a blank span or one of our starter projects (src/state/starters.ts), each with
 * a line saying what it is. Choosing one opens it like a file (asking first over edits not kept).
 */
import { type RefObject, useId } from 'react';
import { ALL_STARTERS, type Starter } from '../../state/starters.ts';
import { useModal } from './useModal.ts';

export function NewProjectDialog({
  onChoose,
  onClose,
  returnFocus,
}: {
  onChoose: (starter: Starter) => void;
  onClose: () => void;
  returnFocus?: RefObject<HTMLElement | null>;
}) {
  const id = useId();
  const modal = useModal(onClose, returnFocus);
  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      className="export-dialog new-project-dialog"
      aria-labelledby={`${id}-title`}
    >
      <div className="library-head">
        <h2 id={`${id}-title`}>New project</h2>
        <button type="button" onClick={onClose}>
          Close
        </button>
      </div>
      <p className="muted">
        Start from a blank span or from a starter, then change it to your own site. Starters are
        examples to learn from, not designs to build without checking.
      </p>
      <ul className="starter-list" aria-label="Ways to start">
        {ALL_STARTERS.map((starter, i) => (
          <li key={starter.id}>
            <button
              type="button"
              data-autofocus={i === 0 ? true : undefined}
              aria-describedby={`${id}-${starter.id}`}
              onClick={() => onChoose(starter)}
            >
              {starter.name}
            </button>
            <span id={`${id}-${starter.id}`} className="muted">
              {starter.description}
            </span>
          </li>
        ))}
      </ul>
    </dialog>
  );
}
