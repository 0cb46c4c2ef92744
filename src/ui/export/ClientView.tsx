/**
 * The client view: the sag plot full-window with large labels, the project title, the summary
 * line and the key numbers, and the cautions. No editing controls; Escape or Close returns.
 */
import { useEffect, useRef } from 'react';
import { CAUTION_SUMMARY, type Project, type ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { keyNumbers, summaryLine } from '../../deliverables/reportContent.ts';
import { loadPlotly } from '../plot/loadPlotly.ts';
import { exportFigure } from './plotImage.ts';

export function ClientView({
  project,
  results,
  units,
  onClose,
}: {
  project: Project;
  results: ProjectResults;
  units: UnitSystem;
  onClose: () => void;
}) {
  const plotRef = useRef<HTMLDivElement>(null);
  const closeRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    closeRef.current?.focus();
    const onKey = (event: KeyboardEvent) => event.key === 'Escape' && onClose();
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  useEffect(() => {
    const host = plotRef.current;
    if (!host) return;
    const { data, layout } = exportFigure(project, results, units, false);
    layout.font = { ...layout.font, size: 18 };
    layout.margin = { l: 80, r: 24, t: 16, b: 110 };
    let drawn = false;
    loadPlotly()
      .then((Plotly) =>
        Plotly.newPlot(host, data, layout, { displayModeBar: false, responsive: true }),
      )
      .then(() => {
        drawn = true;
        host.dataset.plotState = 'drawn';
      })
      .catch(() => {
        host.dataset.plotState = 'failed';
      });
    return () => {
      if (drawn) loadPlotly().then((Plotly) => Plotly.purge(host));
    };
  }, [project, results, units]);

  return (
    <div className="presenter" role="dialog" aria-modal="true" aria-label="Client view">
      <header className="presenter-head">
        <h2>{project.title}</h2>
        <button ref={closeRef} type="button" className="presenter-close" onClick={onClose}>
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
      <p className="presenter-caution" role="note">
        <strong>Caution:</strong> {CAUTION_SUMMARY}
      </p>
    </div>
  );
}
