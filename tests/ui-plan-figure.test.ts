/**
 * The plot's plan view (buildSagFigure with view 'plan'): the sideways swing of each case is the
 * core's profile.y in display units, calm cases lie on 0, colours and names match the side view,
 * and the figure is built without a DOM (this file runs in plain Node).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';

type Trace = { name?: string; x?: number[]; y?: number[]; line?: { color?: string } };

function demoProject(): Project {
  const checked = validateProject(demo);
  if (!checked.ok) throw new Error('demo project invalid');
  return structuredClone(checked.project);
}

const project = demoProject();
const results = solveProject(project);
const plan = buildSagFigure(project, results, 'si', { view: 'plan' });
const side = buildSagFigure(project, results, 'si');
const trace = (figure: typeof plan, name: string) =>
  (figure.data as Trace[]).find((t) => t.name === name);

describe('plan view of the swing', () => {
  it('draws each windy case at the core swing, and its largest value is the case swing', () => {
    const windy = results.cases.filter((c) => c.swing > 0);
    expect(windy.map((c) => c.name)).toEqual(['Cold, iced, windy', 'Winter storm']);
    for (const result of windy) {
      const drawn = trace(plan, result.name);
      expect(drawn?.y).toEqual(result.profile?.y);
      expect(drawn?.x).toEqual(result.profile?.x);
      const largest = Math.max(...(drawn?.y ?? []).map(Math.abs));
      expect(largest).toBeCloseTo(result.swing, 12);
    }
  });

  it('puts a calm case on 0 and keeps the side view colours', () => {
    const calm = trace(plan, 'Hot summer');
    expect(calm?.y?.every((y) => y === 0)).toBe(true);
    for (const result of results.cases)
      expect(trace(plan, result.name)?.line?.color).toBe(trace(side, result.name)?.line?.color);
  });

  it('titles the axes with their units and names the largest swing', () => {
    const yTitle = plan.layout.yaxis?.title;
    expect(typeof yTitle === 'object' ? yTitle.text : yTitle).toBe('Sideways swing, downwind (m)');
    const note = plan.layout.annotations?.[0]?.text ?? '';
    const largest = Math.max(...results.cases.map((c) => c.swing));
    expect(note).toBe(`Largest swing ${largest.toFixed(3)} m (Cold, iced, windy)`);
    expect(plan.parabola).toBeNull();
  });

  it('converts to feet with the exact foot (0.3048 m, NIST SP 811)', () => {
    const feet = buildSagFigure(project, results, 'imperial', { view: 'plan' });
    const windy = results.cases[2];
    const drawn = trace(feet, windy.name)?.y ?? [];
    windy.profile?.y.forEach((y, i) => {
      expect(drawn[i]).toBeCloseTo(y / 0.3048, 12);
    });
  });

  it('says so when no case has wind', () => {
    const calmProject = structuredClone(project);
    for (const c of calmProject.cases) c.windSpeed = 0;
    const figure = buildSagFigure(calmProject, solveProject(calmProject), 'si', { view: 'plan' });
    expect(figure.layout.annotations?.[0]?.text).toMatch(/No case has wind/);
  });
});
