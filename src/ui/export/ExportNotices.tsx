/**
 * What the export menu tells the person afterwards: a short status, a refusal listing the field
 * paths, a share link to copy by hand when the clipboard is not allowed, and the banner shown
 * while a shared project is on screen.
 */
import { useEffect, useState } from 'react';
import { createPortal } from 'react-dom';
import type { ValidationIssue } from '../../core/index.ts';
import { describeIssues } from '../../deliverables/projectFile.ts';
import type { SharedState } from './useSharedProject.ts';

export type Notice =
  | { kind: 'status'; text: string }
  | { kind: 'refused'; title: string; issues: ValidationIssue[] }
  | { kind: 'link'; url: string }
  | null;

function Refusal({
  title,
  issues,
  onDismiss,
}: {
  title: string;
  issues: readonly ValidationIssue[];
  onDismiss: () => void;
}) {
  return (
    <div role="alert" className="export-notice export-refused">
      <p>{title}:</p>
      <ul>
        {describeIssues(issues).map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      <button type="button" onClick={onDismiss}>
        Dismiss
      </button>
    </div>
  );
}

export function ExportNotice({ notice, onDismiss }: { notice: Notice; onDismiss: () => void }) {
  if (notice?.kind === 'status')
    return (
      <p role="status" className="export-notice">
        {notice.text}
      </p>
    );
  if (notice?.kind === 'refused')
    return <Refusal title={notice.title} issues={notice.issues} onDismiss={onDismiss} />;
  if (notice?.kind === 'link')
    return (
      <div className="export-notice export-link" role="status">
        <label>
          This browser did not allow copying. Share link (select it and copy):
          <input
            readOnly
            value={notice.url}
            onFocus={(event) => event.currentTarget.select()}
            // biome-ignore lint/a11y/noAutofocus: the link is what the person asked for
            autoFocus
          />
        </label>
        <button type="button" onClick={onDismiss}>
          Done
        </button>
      </div>
    );
  return null;
}

/**
 * The banner sits in the page flow above the whole app (a slot first in <body>), so it pushes
 * the header down instead of covering its buttons.
 */
function useTopSlot(active: boolean): HTMLElement | null {
  const [slot, setSlot] = useState<HTMLElement | null>(null);
  useEffect(() => {
    if (!active) return;
    const element = document.createElement('div');
    element.className = 'share-banner-slot';
    document.body.prepend(element);
    setSlot(element);
    return () => {
      element.remove();
      setSlot(null);
    };
  }, [active]);
  return slot;
}

export function SharedBanner({
  state,
  onKeep,
  onGoBack,
  onDismiss,
}: {
  state: SharedState;
  onKeep: () => void;
  onGoBack: () => void;
  onDismiss: () => void;
}) {
  const slot = useTopSlot(state.kind === 'viewing');
  if (state.kind === 'viewing' && slot)
    return createPortal(
      <section aria-label="Shared project" className="share-banner">
        Viewing a shared project, “{state.title}”. Your own work is kept until you choose.
        <button type="button" onClick={onKeep}>
          Keep it
        </button>
        <button type="button" onClick={onGoBack}>
          Go back to mine
        </button>
      </section>,
      slot,
    );
  if (state.kind === 'refused')
    return (
      <Refusal
        title="The shared link was not opened; your project is unchanged"
        issues={state.issues}
        onDismiss={onDismiss}
      />
    );
  return null;
}
