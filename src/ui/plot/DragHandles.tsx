/**
 * Handles over the side view for dragging the fixings (along the span and up or down) and the
 * point loads (along the wire), by pointer or by keyboard (a focused handle moves with the arrow
 * keys, Shift for bigger steps). The handles are HTML over the Plotly drawing, placed from its
 * axes, so they follow the pointer at once. Every position goes through the one validated
 * commit (src/state/commit.ts) at most once a frame, so the plot and the tables follow while
 * dragging; a whole drag is one undo step. A refused position leaves the document at the last
 * good one and says why, naming the field as the inputs do.
 */
import {
  type PointerEvent as ReactPointerEvent,
  type RefObject,
  useEffect,
  useId,
  useRef,
  useState,
} from 'react';
import { fromSi, toSi, unitSymbol } from '../../core/units.ts';
import { commit } from '../../state/commit.ts';
import { useProjectStore } from '../../state/projectStore.ts';
import { useResultsStore } from '../../state/resultsStore.ts';
import { useUiStore } from '../../state/uiStore.ts';
import {
  type DragHandle,
  dragHandles,
  moveEdit,
  refusalText,
  snap,
  wireHeightAt,
} from './dragEdits.ts';

interface PlotAxis {
  _offset?: number;
  _length?: number;
  l2p?: (value: number) => number;
  p2l?: (pixel: number) => number;
}

type PlotDiv = HTMLDivElement & {
  _fullLayout?: { xaxis?: PlotAxis; yaxis?: PlotAxis };
  on?: (event: string, listener: () => void) => void;
  removeListener?: (event: string, listener: () => void) => void;
};

/** Keyboard steps in display units: an arrow press, and with Shift. */
const STEP = 0.1;
const BIG_STEP = 1;
/** The longest a dragged position waits for the result of the one before it, ms. */
const MAX_WAIT_MS = 300;

interface Drag {
  handle: DragHandle;
  pointerId: number;
  /** Pointer minus handle centre at the grab, px, so the handle does not jump. */
  grab: { dx: number; dy: number };
  /** One undo step for the whole drag. */
  mergeKey: string;
}

interface Position {
  key: string;
  x: number;
  z: number;
}

let dragCount = 0;

const clamp = (v: number, low: number, high: number) => Math.min(high, Math.max(low, v));

export function DragHandles({
  containerRef,
  drawn,
  onDragging,
}: {
  containerRef: RefObject<HTMLDivElement | null>;
  /** True once Plotly has drawn the plot (its axes exist). */
  drawn: boolean;
  onDragging: (dragging: boolean) => void;
}) {
  const project = useProjectStore((s) => s.project);
  const results = useResultsStore((s) => s.results);
  const units = useUiStore((s) => s.unitSystem);
  const [, setAxesVersion] = useState(0);
  /** Where the handle being dragged is shown (follows the pointer), m. */
  const [live, setLive] = useState<Position | null>(null);
  const [refused, setRefused] = useState<{ key: string; text: string; details: string[] } | null>(
    null,
  );
  const [spoken, setSpoken] = useState('');
  const drag = useRef<Drag | null>(null);
  const pending = useRef<Position | null>(null);
  const frame = useRef(0);
  const committedAt = useRef(0);
  /** Counts the times a handle takes the focus: each visit's arrow presses are one undo step. */
  const focusVisit = useRef(0);
  const hintId = useId();

  // Re-place the handles after every Plotly drawing (new axes, zoom, resize).
  useEffect(() => {
    const plot = containerRef.current as PlotDiv | null;
    if (!drawn || !plot?.on) return;
    const bump = () => setAxesVersion((v) => v + 1);
    plot.on('plotly_afterplot', bump);
    bump();
    return () => plot.removeListener?.('plotly_afterplot', bump);
  }, [containerRef, drawn]);

  useEffect(() => () => cancelAnimationFrame(frame.current), []);

  const plot = containerRef.current as PlotDiv | null;
  const xa = plot?._fullLayout?.xaxis;
  const ya = plot?._fullLayout?.yaxis;
  if (!drawn || !xa?.l2p || !xa.p2l || !ya?.l2p || !ya.p2l) return null;
  const axes = {
    toPx: (x: number, z: number) => ({
      left: (xa._offset ?? 0) + (xa.l2p?.(fromSi(x, 'length', units)) ?? 0),
      top: (ya._offset ?? 0) + (ya.l2p?.(fromSi(z, 'length', units)) ?? 0),
    }),
    fromPx: (left: number, top: number) => ({
      x: toSi(snap(xa.p2l?.(left - (xa._offset ?? 0)) ?? 0), 'length', units),
      z: toSi(snap(ya.p2l?.(top - (ya._offset ?? 0)) ?? 0), 'length', units),
    }),
  };
  const inside = (left: number, top: number) =>
    left >= (xa._offset ?? 0) - 1 &&
    left <= (xa._offset ?? 0) + (xa._length ?? 0) + 1 &&
    top >= (ya._offset ?? 0) - 1 &&
    top <= (ya._offset ?? 0) + (ya._length ?? 0) + 1;

  const length = (m: number) =>
    `${fromSi(m, 'length', units).toFixed(2)} ${unitSymbol('length', units)}`;
  const where = (handle: DragHandle, x: number, z: number) =>
    handle.kind === 'support'
      ? `${handle.name}: ${length(x)} along the span, ${length(z)} high`
      : `${handle.name}: ${length(x)} along the span`;

  /** Commit a position; true when the document took it. */
  function place(handle: DragHandle, x: number, z: number, mergeKey: string, gesture: boolean) {
    const current = useProjectStore.getState().project;
    const before =
      handle.kind === 'support' ? current.supports[handle.index] : current.loads[handle.index];
    if (!before) return false;
    const unchanged =
      'type' in before
        ? before.type === 'point' && before.x === x
        : before.x === x && before.z === z;
    if (unchanged) {
      setRefused(null);
      return true;
    }
    const outcome = commit(moveEdit(handle, x, z), { mergeKey, gesture });
    if (outcome.ok) {
      setRefused(null);
      return true;
    }
    const words = refusalText(current, handle, { x, z }, outcome.issues, units);
    setRefused({ key: handle.key, ...words });
    return false;
  }

  function flush() {
    cancelAnimationFrame(frame.current);
    frame.current = 0;
    const next = pending.current;
    const active = drag.current;
    pending.current = null;
    if (next && active) place(active.handle, next.x, next.z, active.mergeKey, true);
  }

  function onPointerDown(event: ReactPointerEvent<HTMLElement>, handle: DragHandle) {
    if (event.button !== 0) return;
    event.preventDefault();
    event.currentTarget.focus();
    try {
      event.currentTarget.setPointerCapture(event.pointerId);
    } catch {
      // A synthetic pointer cannot be captured; the drag still follows its events.
    }
    const box = containerRef.current?.getBoundingClientRect();
    const at = axes.toPx(handle.x, handle.z);
    drag.current = {
      handle,
      pointerId: event.pointerId,
      grab: {
        dx: event.clientX - (box?.left ?? 0) - at.left,
        dy: event.clientY - (box?.top ?? 0) - at.top,
      },
      mergeKey: `${handle.key}:drag:${++dragCount}`,
    };
    setLive({ key: handle.key, x: handle.x, z: handle.z });
    onDragging(true);
  }

  function onPointerMove(event: ReactPointerEvent<HTMLElement>) {
    const active = drag.current;
    if (!active || event.pointerId !== active.pointerId) return;
    const box = containerRef.current?.getBoundingClientRect();
    const left = event.clientX - (box?.left ?? 0) - active.grab.dx;
    const top = event.clientY - (box?.top ?? 0) - active.grab.dy;
    const to = axes.fromPx(left, top);
    const z = active.handle.kind === 'support' ? to.z : active.handle.z;
    setLive({ key: active.handle.key, x: to.x, z });
    pending.current = { key: active.handle.key, x: to.x, z };
    if (!frame.current) frame.current = requestAnimationFrame(commitPending);
  }

  /**
   * Commits the newest position at a frame. One position is with the solver at a time: while
   * the last one's result is on its way the newest waits (the handle follows the pointer
   * meanwhile), so positions never queue up behind a slow solve or a busy page.
   */
  function commitPending() {
    frame.current = 0;
    const next = pending.current;
    const active = drag.current;
    if (!next || !active) return;
    const results = useResultsStore.getState();
    const waited = performance.now() - committedAt.current;
    if (results.stale && results.error === null && waited < MAX_WAIT_MS) {
      frame.current = requestAnimationFrame(commitPending);
      return;
    }
    pending.current = null;
    committedAt.current = performance.now();
    place(active.handle, next.x, next.z, active.mergeKey, true);
  }

  function onPointerEnd(event: ReactPointerEvent<HTMLElement>) {
    const active = drag.current;
    if (!active || event.pointerId !== active.pointerId) return;
    flush();
    drag.current = null;
    setLive(null);
    onDragging(false);
    const placed = useProjectStore.getState().project;
    const item =
      active.handle.kind === 'support'
        ? placed.supports[active.handle.index]
        : placed.loads[active.handle.index];
    if (item && 'x' in item)
      setSpoken(where(active.handle, item.x, 'z' in item ? item.z : active.handle.z));
  }

  function onKeyDown(event: React.KeyboardEvent<HTMLElement>, handle: DragHandle) {
    const step = toSi(event.shiftKey ? BIG_STEP : STEP, 'length', units);
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-step, 0],
      ArrowRight: [step, 0],
      ArrowUp: handle.kind === 'support' ? [0, step] : [step, 0],
      ArrowDown: handle.kind === 'support' ? [0, -step] : [-step, 0],
    };
    const move = moves[event.key];
    if (!move) return;
    const [dx, dz] = move;
    event.preventDefault();
    const shown = (m: number) => toSi(snap(fromSi(m, 'length', units)), 'length', units);
    const x = shown(handle.x + dx);
    const z = handle.kind === 'support' ? shown(handle.z + dz) : handle.z;
    // The arrow presses while a handle keeps the focus make one undo step, as one drag does.
    if (place(handle, x, z, `${handle.key}:keys:${focusVisit.current}`, true))
      setSpoken(where(handle, x, z));
  }

  const handles = dragHandles(project, results);
  return (
    <>
      <div className="plot-handles">
        <p id={hintId} className="visually-hidden">
          Drag, or use the arrow keys: a fixing moves left and right along the span and up and down
          in height, a point load along the wire. Hold Shift for bigger steps.
        </p>
        {handles.map((handle) => {
          const shown = live?.key === handle.key ? live : handle;
          const z =
            handle.kind === 'load' && live?.key === handle.key
              ? (wireHeightAt(results, shown.x) ?? handle.z)
              : shown.z;
          const at = axes.toPx(shown.x, z);
          // A handle off the axes is not shown, except the one being dragged (kept at the edge,
          // so it keeps the pointer).
          if (!inside(at.left, at.top)) {
            if (live?.key !== handle.key) return null;
            at.left = clamp(at.left, xa._offset ?? 0, (xa._offset ?? 0) + (xa._length ?? 0));
            at.top = clamp(at.top, ya._offset ?? 0, (ya._offset ?? 0) + (ya._length ?? 0));
          }
          const className = `plot-handle plot-handle-${handle.kind}${
            refused?.key === handle.key ? ' plot-handle-refused' : ''
          }`;
          const common = {
            className,
            style: { left: `${at.left}px`, top: `${at.top}px` },
            'aria-describedby': hintId,
            'data-handle': handle.key,
            onPointerDown: (event: ReactPointerEvent<HTMLElement>) => onPointerDown(event, handle),
            onPointerMove,
            onPointerUp: onPointerEnd,
            onPointerCancel: onPointerEnd,
            onLostPointerCapture: onPointerEnd,
            onKeyDown: (event: React.KeyboardEvent<HTMLElement>) => onKeyDown(event, handle),
            onFocus: () => {
              focusVisit.current += 1;
            },
          };
          if (handle.kind === 'support')
            return (
              <button
                key={handle.key}
                type="button"
                aria-label={`Move ${handle.name} (${length(handle.x)} along the span, ${length(handle.z)} high)`}
                {...common}
              />
            );
          const first = project.supports[0].x;
          const last = project.supports[project.supports.length - 1].x;
          return (
            <div
              key={handle.key}
              role="slider"
              tabIndex={0}
              aria-label={`Move ${handle.name} along the wire`}
              aria-orientation="horizontal"
              aria-valuemin={Number(fromSi(first, 'length', units).toFixed(2))}
              aria-valuemax={Number(fromSi(last, 'length', units).toFixed(2))}
              aria-valuenow={Number(fromSi(handle.x, 'length', units).toFixed(2))}
              aria-valuetext={`${length(handle.x)} along the span`}
              {...common}
            />
          );
        })}
        <p className="visually-hidden" aria-live="polite">
          {spoken}
        </p>
      </div>
      {refused && (
        <div className="plot-drag-refused" role="alert">
          <p>{refused.text}</p>
          <p className="muted">{refused.details.join('; ')}</p>
        </div>
      )}
    </>
  );
}
