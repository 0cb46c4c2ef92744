/**
 * Every piece of the person's text that reaches Plotly (case names, fixing and zone labels, the
 * title) is drawn as text, never as Plotly's markup: in every string of the side view, the plan
 * view and the export figure, the typed < > & appear only as entities, and no user text sits
 * inside a hover template (where %{…} would be read as a field). Plotly's text subset and its
 * entity decoding: plotly.js src/lib/svg_text_utils.js (convertToTspans).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject } from '../src/core/index.ts';
import { exportFigure } from '../src/ui/export/plotImage.ts';
import { plotlyText } from '../src/ui/plot/plotlyText.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';

const LINK = '<a href="https://example.test/x">open</a>';
const hostile = (what: string) => `${what} ${LINK} <b>bold</b> <br> & %{x} <span style="x">`;

function hostileProject(): Project {
  const p = structuredClone(demo) as Project;
  p.title = hostile('Title');
  p.cases = p.cases.map((c, i) => ({ ...c, name: hostile(`Case ${i}`) }));
  p.supports = p.supports.map((s, i) => ({ ...s, label: hostile(`Fixing ${i}`) }));
  p.limits.zones = (p.limits.zones ?? []).map((z) => ({ ...z, label: hostile('Zone') }));
  p.loads = p.loads.map((l) => ({ ...l, label: hostile('Load') }));
  return p;
}

/** Every string in a figure, with where it is. */
function strings(value: unknown, path: string, out: [string, string][] = []): [string, string][] {
  if (typeof value === 'string') out.push([path, value]);
  else if (Array.isArray(value))
    for (const [i, v] of value.entries()) strings(v, `${path}[${i}]`, out);
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) strings(v, `${path}.${k}`, out);
  return out;
}

function expectTextOnly(figure: { data: unknown; layout: unknown }) {
  const all = [...strings(figure.data, 'data'), ...strings(figure.layout, 'layout')];
  const carrying = all.filter(([, s]) => s.includes('open') && s.includes('example.test'));
  expect(carrying.length).toBeGreaterThan(0);
  for (const [path, s] of carrying) {
    expect(s, path).not.toMatch(/<a|<b>|<br>|<span/);
    expect(s, path).toContain(plotlyText(LINK));
    expect(path, 'user text inside a hover template').not.toMatch(/hovertemplate|texttemplate/);
  }
}

describe('user text in the plot is text only', () => {
  const project = hostileProject();
  const results = solveProject(project);

  it('has every case solved (the names are text, not a reason to fail)', () => {
    expect(results.cases.every((c) => c.solved)).toBe(true);
  });

  it('side view', () => expectTextOnly(buildSagFigure(project, results, 'si')));
  it('plan view', () => expectTextOnly(buildSagFigure(project, results, 'si', { view: 'plan' })));
  it('export figure with its title', () => {
    const figure = exportFigure(project, results, 'si', true);
    expectTextOnly(figure);
    expect(figure.layout.title).toMatchObject({ text: plotlyText(project.title) });
  });

  it('escapes once, not twice (the entities Plotly decodes give back the typed text)', () => {
    const figure = buildSagFigure(project, results, 'si');
    const names = (figure.data as { name?: string }[]).map((t) => t.name ?? '');
    expect(names.some((n) => n.includes('&amp;amp;'))).toBe(false);
    expect(names).toContain(plotlyText(project.cases[0].name));
  });
});
