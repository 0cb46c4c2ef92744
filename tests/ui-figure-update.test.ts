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
const rangeOf = (figure: typeof drawn.figure, axis: 'x' | 'y') => {
  const values = figure.data.flatMap(
    (t) => ((t as Record<string, unknown>)[axis] ?? []) as number[],
  );
  const [low, high] = [Math.min(...values), Math.max(...values)];
  return [low - 0.05 * (high - low), high + 0.05 * (high - low)];
};
const range = (axis: 'x' | 'y') => rangeOf(drawn.figure, axis);
const ranges = { x: range('x'), y: range('y') };
// The drags below start on a span that is already inclined: the near fixing 0.3 m lower.
const inclinedBase = checked(demo);
inclinedBase.supports[0].z -= 0.3;
const drawnInclined = sketchOf(inclinedBase);
const rangesInclined = {
  x: rangeOf(drawnInclined.figure, 'x'),
  y: rangeOf(drawnInclined.figure, 'y'),
};

describe('which edits can be sketched', () => {
  it('sketches every line (wires, parabolas, clearance line, sag mark), outline and marker when the installation temperature changes', () => {
    const warmer = checked(demo);
    warmer.installation.temperature += 3;
    const lines = sketchTraces(drawn, sketchOf(warmer), ranges);
    const names = (lines ?? []).map((t) => String(drawn.figure.data[t.index].name));
    const kind = (name: string) =>
      lines?.find((t) => drawn.figure.data[t.index].name === name)?.kind;
    const cases = 1 + demo.cases.length;
    // Every case's wire and parabola, the clearance line, the chord, the sag mark, the ground,
    // the zone and the fixings.
    expect(lines).toHaveLength(2 * cases + 3 + 1 + demo.limits.zones.length + 1);
    expect(kind('Installation')).toBe('line');
    expect(names).toContain('Largest sag, measured here');
    expect(names.filter((n) => n.startsWith('Minimum clearance'))).toHaveLength(1);
    expect(kind('Ground')).toBe('fill');
    expect(kind('Supports')).toBe('markers');
    expect(names.filter((n) => n.endsWith('— parabola'))).toHaveLength(cases);
  });

  it('sketches a fixing dragged along and up (its marker moves with the wires)', () => {
    const moved = structuredClone(inclinedBase);
    moved.supports[1].x -= 0.4;
    moved.supports[1].z += 0.1;
    const next = sketchOf(moved);
    const lines = sketchTraces(drawnInclined, next, rangesInclined);
    const supports = lines?.find((t) => t.kind === 'markers');
    expect(supports && (next.figure.data[supports.index] as { x: number[] }).x).toEqual([0, 21.6]);
    expect(supports && (next.figure.data[supports.index] as { y: number[] }).y[1]).toBeCloseTo(
      4.3,
      12,
    );
  });

  it('needs the full redraw when a fixing is dragged above the axes on screen', () => {
    const raised = checked(demo);
    raised.supports[1].z += 0.5;
    expect(sketchTraces(drawn, sketchOf(raised), ranges)).toBeNull();
  });

  it('sketches a fixing dragged past the axes while the drag holds them at the range on screen', () => {
    const raised = structuredClone(inclinedBase);
    raised.supports[1].z += 0.5;
    const next = sketchOf(raised);
    const held = (r: number[]) => ({ range: r as [number, number], autorange: false });
    const layout = {
      ...next.figure.layout,
      xaxis: { ...next.figure.layout.xaxis, ...held(rangesInclined.x) },
      yaxis: { ...next.figure.layout.yaxis, ...held(rangesInclined.y) },
    };
    const holding = {
      figure: { ...next.figure, layout },
      signature: figureSignature({ ...next.figure, layout }),
    };
    expect(sketchTraces(drawnInclined, holding, rangesInclined)).not.toBeNull();
    // Held at another range than the one on screen: only a full redraw shows it.
    const shifted = { x: rangesInclined.x, y: [rangesInclined.y[0] - 1, rangesInclined.y[1]] };
    expect(sketchTraces(drawnInclined, holding, shifted)).toBeNull();
  });

  it('sketches a level span becoming inclined (the straight line between the fixings is always drawn)', () => {
    const tilted = checked(demo);
    tilted.supports[1].z -= 0.05;
    expect(sketchTraces(drawn, sketchOf(tilted), ranges)).not.toBeNull();
  });

  it('needs the full redraw when a fixing is added (a marker more than drawn)', () => {
    const more = checked(demo);
    more.supports.push({ x: 30, z: 4.2, label: 'Post' });
    const wide = { x: [-2, 32], y: ranges.y };
    expect(sketchTraces(drawn, sketchOf(more), wide)).toBeNull();
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
