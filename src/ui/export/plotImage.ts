/**
 * The sag plot drawn off-screen for exports: the workbench's own figure (buildSagFigure), whose
 * names and labels are already text-only (plotlyText), the project title on top and the
 * caution line at the foot. Returns an SVG or PNG data URL, or a parsed SVG element for the PDF.
 */
import type { Data, Layout } from 'plotly.js';
import { CAUTION_SUMMARY, type Project, type ProjectResults } from '../../core/index.ts';
import type { UnitSystem } from '../../core/units.ts';
import { loadPlotly } from '../plot/loadPlotly.ts';
import { plotlyText } from '../plot/plotlyText.ts';
import { buildSagFigure, type ParabolaComparison } from '../plot/sagFigure.ts';

export interface PlotImageRequest {
  format: 'svg' | 'png';
  width: number;
  height: number;
  scale: number;
  /** Title on top and caution at the foot (images); the PDF page carries its own. */
  captioned: boolean;
}

export { plotlyText };

export function exportFigure(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
  captioned: boolean,
): { data: Data[]; layout: Partial<Layout>; parabola: ParabolaComparison | null } {
  const figure = buildSagFigure(project, results, units);
  const layout: Partial<Layout> = {
    ...figure.layout,
    annotations: [...(figure.layout.annotations ?? [])],
  };
  layout.font = { family: 'Helvetica, Arial, sans-serif', size: 12, color: '#1c2128' };
  if (captioned) {
    layout.title = {
      text: plotlyText(project.title),
      x: 0.01,
      xanchor: 'left',
      font: { size: 16 },
    };
    layout.margin = { l: 84, r: 60, t: 48, b: 150 };
    layout.annotations?.push({
      xref: 'paper',
      yref: 'paper',
      x: 0,
      y: 0,
      xanchor: 'left',
      yanchor: 'top',
      yshift: -128,
      showarrow: false,
      align: 'left',
      text: plotlyText(`Caution: ${CAUTION_SUMMARY}`),
      font: { size: 11, color: '#60686f' },
    });
  } else {
    layout.margin = { l: 84, r: 60, t: 16, b: 96 };
  }
  return { data: figure.data, layout, parabola: figure.parabola };
}

/** Draws the figure in a hidden element, asks Plotly for the image, and cleans up. */
export async function renderPlotImage(
  project: Project,
  results: ProjectResults,
  units: UnitSystem,
  request: PlotImageRequest,
): Promise<string> {
  const Plotly = await loadPlotly();
  const { data, layout } = exportFigure(project, results, units, request.captioned);
  const host = document.createElement('div');
  host.style.cssText = `position:fixed;left:-20000px;top:0;width:${request.width}px;height:${request.height}px;`;
  host.setAttribute('aria-hidden', 'true');
  document.body.append(host);
  try {
    await Plotly.newPlot(
      host,
      data,
      { ...layout, width: request.width, height: request.height },
      {
        staticPlot: true,
        typesetMath: false,
      },
    );
    return await Plotly.toImage(host, {
      format: request.format,
      width: request.width,
      height: request.height,
      scale: request.scale,
    });
  } finally {
    Plotly.purge(host);
    host.remove();
  }
}

/** SVG data URL → markup (Plotly returns it percent-encoded). */
export function svgMarkupFromDataUrl(dataUrl: string): string {
  const comma = dataUrl.indexOf(',');
  const body = dataUrl.slice(comma + 1);
  return dataUrl.slice(0, comma).endsWith(';base64') ? atob(body) : decodeURIComponent(body);
}

export function parseSvg(markup: string): SVGSVGElement | null {
  const parsed = new DOMParser().parseFromString(markup, 'image/svg+xml');
  const root = parsed.documentElement;
  if (root.nodeName !== 'svg') return null;
  restyle(root);
  return root as unknown as SVGSVGElement;
}

/**
 * The page's Content-Security-Policy (style-src 'self') does not apply style attributes that
 * come from parsed markup, so the plot's fills and strokes would be lost (an unstyled fill is
 * black) when the report reads computed styles. Each declaration is set again through the CSSOM,
 * which the policy allows.
 */
function restyle(root: Element): void {
  for (const element of [root, ...Array.from(root.querySelectorAll('[style]'))]) {
    const text = element.getAttribute('style');
    if (!text) continue;
    const style = (element as SVGElement).style;
    if (!style) continue;
    element.removeAttribute('style');
    for (const declaration of text.split(';')) {
      const colon = declaration.indexOf(':');
      if (colon < 0) continue;
      const name = declaration.slice(0, colon).trim();
      const value = declaration.slice(colon + 1).trim();
      const important = /!important$/i.test(value);
      style.setProperty(name, value.replace(/\s*!important$/i, ''), important ? 'important' : '');
    }
  }
}
