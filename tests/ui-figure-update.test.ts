/**
 * The quick redraw of the wire lines (figureUpdate.ts, plain Node): an edit that only moves the
 * wires is sketched; a change to anything else, or wires leaving the axes on screen, needs the
 * full redraw; and the sketched path goes through the new points, mapped by the axes.
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { figureSignature, linePath, sketchTraces } from '../src/ui/plot/figureUpdate.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';

function checked(input: unknown): Project {
  const result = validateProject(input);
  if (!result.ok) throw new Error('example project invalid');
  return structuredClone(result.project);
}

function sketchOf(project: Project) {
  const figure = buildSagFigure(project, solveProject(project), 'si');
  return { figure, signature: figureSignature(figure) };
}

const base = checked(demo);
const drawn = sketchOf(base);
// Axis ranges as Plotly's autorange would give them: the data's extent padded a little.
const range = (axis: 'x' | 'y') => {
  const values = drawn.figure.data.flatMap(
    (t) => ((t as Record<string, unknown>)[axis] ?? []) as number[],
  );
  const [low, high] = [Math.min(...values), Math.max(...values)];
  return [low - 0.05 * (high - low), high + 0.05 * (high - low)];
};
const ranges = { x: range('x'), y: range('y') };

describe('which edits can be sketched', () => {
  it('sketches every plain line (wires, parabolas, clearance line, sag mark) when the installation temperature changes', () => {
    const warmer = checked(demo);
    warmer.installation.temperature += 3;
    const lines = sketchTraces(drawn, sketchOf(warmer), ranges);
    const names = (lines ?? []).map((i) => String(drawn.figure.data[i].name));
    const cases = 1 + demo.cases.length;
    expect(lines).toHaveLength(2 * cases + 2);
    expect(names).toContain('Installation');
    expect(names).toContain('Largest sag, measured here');
    expect(names.filter((n) => n.startsWith('Minimum clearance'))).toHaveLength(1);
    // The filled ground and zones and the fixings' markers are not lines to sketch.
    expect(names).not.toContain('Ground');
    expect(names).not.toContain('Supports');
    expect(names.filter((n) => n.endsWith('— parabola'))).toHaveLength(cases);
  });

  it('needs the full redraw when a fixing moves (the ground and fixings change)', () => {
    const moved = checked(demo);
    moved.supports[1].x -= 1;
    expect(sketchTraces(drawn, sketchOf(moved), ranges)).toBeNull();
  });

  it('needs the full redraw when a case is renamed (a trace is restyled)', () => {
    const renamed = checked(demo);
    renamed.cases[0].name = 'Heatwave';
    expect(sketchTraces(drawn, sketchOf(renamed), ranges)).toBeNull();
  });

  it('needs the full redraw when the wires would leave the axes on screen', () => {
    const warmer = checked(demo);
    warmer.installation.temperature += 3;
    const tight = { x: ranges.x, y: [ranges.y[0] + 1, ranges.y[1]] };
    expect(sketchTraces(drawn, sketchOf(warmer), tight)).toBeNull();
  });

  it('needs the full redraw without axes on screen', () => {
    expect(sketchTraces(drawn, drawn, {})).toBeNull();
  });
});

describe('the sketched path', () => {
  it('goes through each point mapped by the axes and breaks at a missing value', () => {
    const path = linePath(
      [0, 1, null, 3],
      [10, 11, 12, 13],
      (x) => 100 * x,
      (y) => 200 - y,
    );
    expect(path).toBe('M0.00,190.00L100.00,189.00M300.00,187.00');
  });
});
