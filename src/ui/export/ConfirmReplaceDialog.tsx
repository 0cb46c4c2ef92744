/**
 * Asks before a project is opened over edits that are not kept anywhere (not saved as a file or
 * in this browser's projects, not exported since the last change). A modal <dialog> of our own,
 * not window.confirm: it names what would be replaced, is read out as an alert dialog, starts on
 * the safe choice, and Escape keeps the project on screen.
 */
import { useId } from 'react';
import { useModal } from './useModal.ts';

export interface ReplaceQuestion {
  /** What would be opened, as the person knows it: “Garden clothesline”, “yard.sagwright”. */
  what: string;
  /** Open it anyway. */
  proceed: () => void;
}

export function ConfirmReplaceDialog({
  question,
  current,
  onClose,
}: {
  question: ReplaceQuestion;
  /** Title of the project on screen. */
  current: string;
  onClose: () => void;
}) {
  const id = useId();
  const modal = useModal(onClose);
  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      role="alertdialog"
      className="export-dialog confirm-replace"
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-text`}
    >
      <h2 id={`${id}-title`}>Replace the project on screen?</h2>
      <p id={`${id}-text`}>
        “{current}” has changes that are not saved in a file, in this browser's projects or in an
        export. Opening {question.what} replaces it, and Undo will not bring it back.
      </p>
      <div className="export-dialog-actions">
        <button type="button" data-autofocus onClick={onClose}>
          Keep my project
        </button>
        <button
          type="button"
          onClick={() => {
            onClose();
            question.proceed();
          }}
        >
          Open {question.what}
        </button>
      </div>
    </dialog>
  );
}
