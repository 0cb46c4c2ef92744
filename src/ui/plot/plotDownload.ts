/**
 * The plot toolbar's own downloads: the side view as PNG or SVG, drawn off-screen from the
 * results already on screen (no new solve), with the project title on top and the caution line
 * at the foot (src/ui/export/plotImage.ts). Nothing leaves the device.
 */
import type { Project, ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { projectFileName } from '../../deliverables/projectFile.ts';

export const PLOT_DOWNLOAD_SIZE = { width: 1200, height: 700 } as const;

export async function downloadPlot(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
  format: 'png' | 'svg',
): Promise<void> {
  const [{ renderPlotImage }, { downloadUrl, fileStem }] = await Promise.all([
    import('../export/plotImage.ts'),
    import('../export/download.ts'),
  ]);
  const url = await renderPlotImage(project, results, units, {
    format,
    scale: format === 'png' ? 2 : 1,
    captioned: true,
    ...PLOT_DOWNLOAD_SIZE,
  });
  downloadUrl(url, `${fileStem(projectFileName(project.title))}-sag-plot.${format}`);
}
