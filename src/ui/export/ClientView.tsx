/**
 * The client view: the sag plot full-window with large labels, the project title, the summary
 * line and the key numbers, and the cautions. No editing controls; Escape or Close returns.
 */
import { type RefObject, useEffect, useRef, useState } from 'react';
import { CAUTION_SUMMARY, type Project, type ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { keyNumbers, summaryLine } from '../../deliverables/reportContent.ts';
import { loadPlotly } from '../plot/loadPlotly.ts';
import { exportFigure } from './plotImage.ts';
import { useModal } from './useModal.ts';

/** The printed plot's drawing size in CSS px; the image then scales to the page width. */
const PRINT_PLOT = { width: 1100, height: 560 } as const;

export function ClientView({
  project,
  results,
  units,
  onClose,
  returnFocus,
}: {
  project: Project;
  results: ProjectResults;
  units: UnitSystem;
  onClose: () => void;
  returnFocus?: RefObject<HTMLElement | null>;
}) {
  const plotRef = useRef<HTMLDivElement>(null);
  const [printImage, setPrintImage] = useState<string | null>(null);
  const modal = useModal(onClose, returnFocus);
  useEffect(() => {
    const host = plotRef.current;
    if (!host) return;
    const { data, layout } = exportFigure(project, results, units, false);
    layout.font = { ...layout.font, size: 18 };
    layout.margin = { l: 80, r: 24, t: 16, b: 110 };
    let drawn = false;
    loadPlotly()
      .then((Plotly) =>
        Plotly.newPlot(host, data, layout, {
          displayModeBar: false,
          responsive: true,
          typesetMath: false,
        }),
      )
      .then(
        async () => {
          drawn = true;
          host.dataset.plotState = 'drawn';
          // Paper is narrower than the window and Plotly draws at fixed pixels, so the printed
          // page gets the same figure as an SVG image that scales to the page width (without
          // it, the live plot prints as it is).
          const Plotly = await loadPlotly();
          setPrintImage(await Plotly.toImage(host, { format: 'svg', ...PRINT_PLOT }));
        },
        () => {
          host.dataset.plotState = 'failed';
        },
      )
      .catch(() => setPrintImage(null));
    return () => {
      if (drawn) loadPlotly().then((Plotly) => Plotly.purge(host));
    };
  }, [project, results, units]);

  return (
    <dialog
      ref={modal.ref}
      onCancel={modal.onCancel}
      className="presenter"
      aria-label="Client view"
    >
      <header className="presenter-head">
        <h2>{project.title}</h2>
        <button type="button" className="presenter-close" onClick={onClose}>
          Close client view
        </button>
      </header>
      <p className="presenter-summary">{summaryLine(project, results, units)}</p>
      <dl className="presenter-numbers">
        {keyNumbers(project, results, units).map((n) => (
          <div key={n.label}>
            <dt>{n.label}</dt>
            <dd>{n.value}</dd>
            <dd className="muted">{n.note}</dd>
          </div>
        ))}
      </dl>
      <div
        ref={plotRef}
        className="presenter-plot"
        role="img"
        aria-label="Sag plot for the client"
      />
      {printImage && <img className="presenter-print-plot" src={printImage} alt="" />}
      <p className="presenter-caution" role="note">
        <strong>Caution:</strong> {CAUTION_SUMMARY}
      </p>
    </dialog>
  );
}
