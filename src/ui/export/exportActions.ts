/**
 * What each export menu item does, outside React: it takes the open project, solves it on the
 * spot (so an export always matches the document, never a stale result) and hands a file to the
 * browser. Opening a file goes through the deliverables' guards and changes nothing on refusal.
 */
import { type Project, type ProjectResults, solveProject } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { profilesCsv } from '../../deliverables/csv.ts';
import { designReport } from '../../deliverables/designContent.ts';
import type { PaperSize, ReportDetails } from '../../deliverables/pdfReport.ts';
import {
  openProjectFile,
  projectFileName,
  serializeProject,
} from '../../deliverables/projectFile.ts';
import { shareUrl } from '../../deliverables/shareLink.ts';
import { useDesignStore } from '../../state/designStore.ts';
import { downloadBlob, downloadUrl, fileStem } from './download.ts';
import { parseSvg, renderPlotImage, svgMarkupFromDataUrl } from './plotImage.ts';

export const PLOT_IMAGE_SIZE = { width: 1200, height: 700 } as const;
const PDF_PLOT = { width: 900, height: 500 } as const;

export function solved(project: Project): ProjectResults {
  return solveProject(project);
}

export function saveProjectFile(project: Project): void {
  const blob = new Blob([serializeProject(project)], { type: 'application/json' });
  downloadBlob(blob, projectFileName(project.title));
}

export { openProjectFile };

/** The share link for this page; any fragment of the current address is replaced. */
export function shareLinkFor(project: Project): string {
  return shareUrl(project, window.location.href);
}

/** Puts text on the clipboard; false when the browser does not allow it (the caller shows it). */
export async function copyText(text: string): Promise<boolean> {
  try {
    if (!navigator.clipboard) return false;
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

export function saveCsv(project: Project, units: UnitSystem): void {
  const csv = profilesCsv(project, solved(project), units);
  downloadBlob(
    new Blob([csv], { type: 'text/csv' }),
    `${fileStem(projectFileName(project.title))}-profiles.csv`,
  );
}

export async function savePlotImage(
  project: Project,
  units: UnitSystem,
  format: 'svg' | 'png',
  scale: number,
): Promise<void> {
  const url = await renderPlotImage(project, solved(project), units, {
    format,
    scale,
    captioned: true,
    ...PLOT_IMAGE_SIZE,
  });
  const suffix = format === 'png' ? `-plot-${scale}x.png` : '-plot.svg';
  downloadUrl(url, `${fileStem(projectFileName(project.title))}${suffix}`);
}

export async function buildReportBlob(
  project: Project,
  units: UnitSystem,
  paper: PaperSize,
  details: ReportDetails,
  temperatureNow: number | null = null,
): Promise<Blob> {
  const results = solved(project);
  const [{ buildPdfReport }, { exportFigure }] = await Promise.all([
    import('../../deliverables/pdfReport.ts'),
    import('./plotImage.ts'),
  ]);
  const url = await renderPlotImage(project, results, units, {
    format: 'svg',
    scale: 1,
    captioned: false,
    ...PDF_PLOT,
  });
  const svg = parseSvg(svgMarkupFromDataUrl(url));
  // svg2pdf reads computed styles, so the element lives in the page while it is converted.
  const host = document.createElement('div');
  host.style.cssText = 'position:fixed;left:-20000px;top:0;';
  if (svg) host.append(svg);
  document.body.append(host);
  try {
    const doc = await buildPdfReport(project, results, {
      paper,
      unitSystem: units,
      details,
      generatedAt: new Date(),
      plot: svg,
      plotAspect: PDF_PLOT.width / PDF_PLOT.height,
      parabola: exportFigure(project, results, units, false).parabola,
      design: designReport(project, results.cases[0].horizontalTension, temperatureNow),
    });
    return doc.output('blob');
  } finally {
    host.remove();
  }
}

export async function saveReport(
  project: Project,
  units: UnitSystem,
  paper: PaperSize,
  details: ReportDetails,
): Promise<void> {
  const blob = await buildReportBlob(
    project,
    units,
    paper,
    details,
    useDesignStore.getState().temperatureNow,
  );
  downloadBlob(blob, `${fileStem(projectFileName(project.title))}-report.pdf`);
}
