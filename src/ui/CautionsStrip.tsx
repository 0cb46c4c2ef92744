/** The always-visible cautions line with a dialog holding the full text. */
import { useRef } from 'react';
import { CAUTION_SUMMARY, cautionsFor, MOVING_LOAD_CAUTION } from '../core/index.ts';
import { useProjectStore } from '../state/projectStore.ts';

export function CautionsStrip() {
  const dialog = useRef<HTMLDialogElement>(null);
  const cautions = cautionsFor(useProjectStore((s) => s.project));
  const moving = cautions.includes(MOVING_LOAD_CAUTION);
  return (
    <aside className="cautions" aria-label="Cautions">
      <strong>Caution:</strong> {CAUTION_SUMMARY}{' '}
      {moving && (
        <strong data-testid="moving-load-caution">Moving loads: goods only, never people. </strong>
      )}
      <button type="button" className="link" onClick={() => dialog.current?.showModal()}>
        Read all cautions
      </button>
      <dialog ref={dialog} aria-labelledby="cautions-title" className="cautions-dialog">
        <h2 id="cautions-title">Cautions</h2>
        <dl>
          {cautions.map((caution) => (
            <div key={caution.title}>
              <dt>{caution.title}</dt>
              <dd>{caution.text}</dd>
            </div>
          ))}
        </dl>
        <form method="dialog">
          <button type="submit">Close</button>
        </form>
      </dialog>
    </aside>
  );
}
