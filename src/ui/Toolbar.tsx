/** Header tools: undo/redo of document edits and the unit system. */
import { useEffect } from 'react';
import { useStore } from 'zustand';
import { redoEdit as redo, undoEdit as undo } from '../state/commit.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { useSessionStore } from '../state/sessionStore.ts';
import { useUiStore } from '../state/uiStore.ts';

function isTextEntry(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLElement &&
    (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.isContentEditable)
  );
}

/** Ctrl/Cmd+Z and Ctrl/Cmd+Shift+Z (or Ctrl+Y) outside text fields, where the browser's own undo applies. */
function useUndoKeys() {
  useEffect(() => {
    function onKey(event: KeyboardEvent) {
      if (!(event.ctrlKey || event.metaKey) || isTextEntry(event.target)) return;
      const key = event.key.toLowerCase();
      if (key === 'z' && !event.shiftKey) undo();
      else if ((key === 'z' && event.shiftKey) || key === 'y') redo();
      else return;
      event.preventDefault();
    }
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}

export function Toolbar() {
  useUndoKeys();
  const locked = useSessionStore((s) => s.otherTabEditing);
  const canUndo = useStore(useProjectStore.temporal, (s) => s.pastStates.length > 0) && !locked;
  const canRedo = useStore(useProjectStore.temporal, (s) => s.futureStates.length > 0) && !locked;
  const units = useUiStore((s) => s.unitSystem);
  const setUnits = useUiStore((s) => s.setUnitSystem);
  return (
    <div className="toolbar" role="toolbar" aria-label="Workbench tools">
      <button type="button" onClick={() => undo()} disabled={!canUndo}>
        Undo
      </button>
      <button type="button" onClick={() => redo()} disabled={!canRedo}>
        Redo
      </button>
      <fieldset className="units">
        <legend className="visually-hidden">Units</legend>
        <label>
          <input
            type="radio"
            name="units"
            checked={units === 'si'}
            onChange={() => setUnits('si')}
          />
          Metric (SI)
        </label>
        <label>
          <input
            type="radio"
            name="units"
            checked={units === 'imperial'}
            onChange={() => setUnits('imperial')}
          />
          Imperial
        </label>
      </fieldset>
    </div>
  );
}
