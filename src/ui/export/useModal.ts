/**
 * Shows a native <dialog> as a modal while the component is mounted: the page behind is inert
 * (no tabbing into the workbench), Escape asks to close, focus starts on the control marked
 * data-autofocus (else the first one), and on unmount it goes back to where the person started.
 */
import { type RefObject, useEffect, useRef } from 'react';

export function useModal(
  onClose: () => void,
  returnFocus?: RefObject<HTMLElement | null>,
): {
  ref: RefObject<HTMLDialogElement | null>;
  onCancel: (event: React.SyntheticEvent<HTMLDialogElement>) => void;
} {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    const before = document.activeElement;
    if (dialog && !dialog.open) dialog.showModal();
    // showModal focuses the first control; a dialog may name a better start with data-autofocus.
    dialog?.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    return () => {
      if (dialog?.open) dialog.close();
      const target =
        returnFocus?.current ??
        (before instanceof HTMLElement && before.isConnected ? before : null);
      target?.focus();
    };
  }, [returnFocus]);
  // The browser closes a modal on Escape by itself; React owns whether it is shown, so the
  // request is turned into onClose and the element is removed by its owner.
  const onCancel = (event: React.SyntheticEvent<HTMLDialogElement>) => {
    event.preventDefault();
    onClose();
  };
  return { ref, onCancel };
}
