/**
 * What each export menu item does, outside React: it takes the open project, solves it on the
 * spot (so an export always matches the document, never a stale result) and hands a file to the
 * browser. Opening a file goes through the deliverables' guards and changes nothing on refusal.
 */

import { version as appVersion } from '../../../package.json';
import {
  type AsBuiltMeasurement,
  chooseWires,
  type Project,
  type ProjectResults,
  solveAsBuilt,
  solveProject,
  validateAsBuilt,
  type WireChoice,
} from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { profilesCsv } from '../../deliverables/csv.ts';
import { type DesignReport, designReport } from '../../deliverables/designContent.ts';
import {
  openProjectFile,
  projectFileName,
  serializeProject,
} from '../../deliverables/projectFile.ts';
import { shareUrl } from '../../deliverables/shareLink.ts';
import { useAsBuiltStore } from '../../state/asBuiltStore.ts';
import { useDesignStore } from '../../state/designStore.ts';
import { downloadBlob, downloadUrl, fileStem } from './download.ts';
import { parseSvg, renderPlotImage, svgMarkupFromDataUrl } from './plotImage.ts';
import type { ReportRequest } from './ReportDialog.tsx';

export const PLOT_IMAGE_SIZE = { width: 1200, height: 700 } as const;
const PDF_PLOT = { width: 1000, height: 470 } as const;

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

/** What the report adds besides the design: the chooser's list and the site measurement. */
export interface ReportExtras {
  /** The wires that work, when the workbench already has them for this document. */
  wireChoices?: WireChoice[];
  /** The as-built measurement entered in the workbench, if any. */
  measurement?: AsBuiltMeasurement | null;
}

export async function buildReportBlob(
  request: ReportRequest,
  units: UnitSystem,
  temperatureNow: number | null = null,
  design?: DesignReport,
  extras: ReportExtras = {},
): Promise<Blob> {
  const { project } = request;
  const results = solved(project);
  // The wires considered: the workbench's list when it has one, else worked out now.
  const wireChoices = request.appendix.wireChoices
    ? (extras.wireChoices ?? chooseWires(project, undefined, results.mesh.refinement))
    : undefined;
  const m = extras.measurement;
  const asBuilt =
    m && validateAsBuilt(project, m).length === 0 ? solveAsBuilt(project, m, results) : null;
  const [{ buildPdfReport }, { exportFigure }, { browserFontSource }] = await Promise.all([
    import('../../deliverables/pdfReport.ts'),
    import('./plotImage.ts'),
    import('./reportFonts.ts'),
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
      paper: request.paper,
      unitSystem: units,
      generatedAt: new Date(),
      plot: svg,
      plotAspect: PDF_PLOT.width / PDF_PLOT.height,
      parabola: exportFigure(project, results, units, false).parabola,
      fonts: browserFontSource,
      appVersion,
      appendix: request.appendix,
      design: design ?? designReport(project, results, temperatureNow),
      wireChoices,
      asBuilt,
    });
    return doc.output('blob');
  } finally {
    host.remove();
  }
}

export async function saveReport(request: ReportRequest, units: UnitSystem): Promise<void> {
  const { project } = request;
  const aids = useDesignStore.getState();
  // The worker's answers for this very document, when up to date, spare the main thread.
  const ready =
    aids.answers && aids.answersProject === project && !aids.stale
      ? {
          window: aids.answers.window,
          adviceFacts: aids.answers.adviceFacts,
          currentTension: aids.answers.currentTension,
          setting: aids.answers.setting,
        }
      : undefined;
  const fresh = aids.answersProject === project && !aids.stale;
  const blob = await buildReportBlob(request, units, aids.temperatureNow, ready, {
    wireChoices: fresh ? (aids.answers?.choices ?? undefined) : undefined,
    measurement: useAsBuiltStore.getState().measurement,
  });
  downloadBlob(blob, `${fileStem(projectFileName(project.title))}-report.pdf`);
}
