/**
 * The side view (buildSagFigure, plain Node, no DOM): the ground and the minimum-clearance line
 * cover every support when the ground points stop short (the ground is read as level beyond its
 * first and last points, doc/model.md "Clearance"), and the "Largest sag" and "Lowest point"
 * labels sit on opposite sides of their points so their arrows cannot cross.
 */
import type { Annotation } from 'plotly.js';
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import inclined from '../examples/workshop-yard-inclined.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';

type Trace = { name?: string; x?: number[]; y?: number[] };

function checked(input: unknown): Project {
  const result = validateProject(input);
  if (!result.ok) throw new Error('example project invalid');
  return structuredClone(result.project);
}

const traceNamed = (data: unknown[], start: string) =>
  (data as Trace[]).find((t) => t.name?.startsWith(start));

describe('ground and minimum clearance over the whole span', () => {
  const project = checked(demo);
  project.supports[1].x = 26; // the ground points still end at 22 m
  const figure = buildSagFigure(project, solveProject(project), 'si');

  it('draws the ground from the first to the last support, level beyond its last point', () => {
    const ground = traceNamed(figure.data, 'Ground');
    const xs = ground?.x ?? [];
    expect(Math.min(...xs)).toBeLessThanOrEqual(0);
    expect(Math.max(...xs)).toBeGreaterThanOrEqual(26);
    const at26 = xs.indexOf(26);
    expect(ground?.y?.[at26]).toBe(0); // last ground point's height, 0 m in the example
  });

  it('draws the minimum-clearance line from the first to the last support', () => {
    const line = traceNamed(figure.data, 'Minimum clearance');
    expect(line?.x?.[0]).toBe(0);
    expect(line?.x?.at(-1)).toBe(26);
    expect(line?.y?.at(-1)).toBeCloseTo(project.limits.minClearance, 12);
  });

  it('extends the ground at the start too when it begins after the first support', () => {
    const shifted = checked(demo);
    shifted.ground = [
      { x: 3, z: 0.5 },
      { x: 22, z: 0 },
    ];
    const line = traceNamed(buildSagFigure(shifted, solveProject(shifted), 'si').data, 'Minimum');
    expect(line?.x?.[0]).toBe(0);
    expect(line?.y?.[0]).toBeCloseTo(0.5 + shifted.limits.minClearance, 12);
  });
});

function labels(project: Project) {
  const notes = (buildSagFigure(project, solveProject(project), 'si').layout.annotations ??
    []) as Partial<Annotation>[];
  const find = (start: string) => notes.find((n) => String(n.text).startsWith(start));
  return { lowest: find('Lowest point'), sag: find('Largest sag') };
}

describe('sag and lowest-point labels do not cross', () => {
  for (const [name, input] of [
    ['courtyard example', demo],
    ['inclined workshop example', inclined],
  ] as const) {
    it(`keeps the sag label above its point and the lowest-point label below-right (${name})`, () => {
      const { lowest, sag } = labels(checked(input));
      expect(lowest).toBeDefined();
      // Lowest point: label anchored at its top-left corner, placed down and to the right, so
      // arrow and label lie below and right of the point (screen y grows downwards).
      expect(lowest?.xanchor).toBe('left');
      expect(lowest?.yanchor).toBe('top');
      expect(lowest?.ax).toBeGreaterThanOrEqual(0);
      expect(lowest?.ay).toBeGreaterThan(0);
      if (!sag) return;
      // Largest sag: label anchored at its bottom edge straight above, arrow pointing down.
      expect(sag.yanchor).toBe('bottom');
      expect(sag.ax).toBe(0);
      expect(sag.ay).toBeLessThan(0);
      // The sag point is never below the lowest point, so the two arrows lie on either side of
      // the height of the lowest point and cannot cross.
      expect(Number(sag.y)).toBeGreaterThanOrEqual(Number(lowest?.y));
    });
  }
});

describe('the sag mark sits where sag is measured', () => {
  // An inclined span under its own weight and a uniform cable only: for the parabola
  // z = chord(x) − w x (L − x) / (2H) the drop below the chord is largest at mid-span whatever
  // the incline (parabolic cable theory, Irvine, Cable Structures, 1981, §1.2), while the lowest
  // point moves toward the lower fixing. The catenary differs from the parabola by far less than
  // a profile step at this sag-to-span ratio.
  const project = checked(inclined);
  project.loads = [project.loads[0]];
  const results = solveProject(project);
  const figure = buildSagFigure(project, results, 'si');
  const [a, b] = project.supports;
  const notes = (figure.layout.annotations ?? []) as Partial<Annotation>[];
  const sag = notes.find((n) => String(n.text).startsWith('Largest sag'));
  const sagging = results.cases.reduce((p, q) => (q.sag > p.sag ? q : p));

  it('puts the mark at mid-span on the inclined span, metres from the lowest point', () => {
    const mid = (a.x + b.x) / 2;
    const step = (b.x - a.x) / 100;
    expect(Math.abs(Number(sag?.x) - mid)).toBeLessThanOrEqual(step);
    expect(Math.abs(Number(sag?.x) - sagging.lowestPoint.x)).toBeGreaterThan(1);
    expect(String(sag?.text)).toContain('below the line between fixings');
  });

  it('draws the straight line between the fixings and the sag from it down to the wire', () => {
    const chord = traceNamed(figure.data, 'Straight line between fixings');
    expect(chord?.x).toEqual([a.x, b.x]);
    expect(chord?.y).toEqual([a.z, b.z]);
    const mark = traceNamed(figure.data, 'Largest sag, measured here');
    const x = Number(sag?.x);
    expect(mark?.x).toEqual([x, x]);
    const top = a.z + ((b.z - a.z) * (x - a.x)) / (b.x - a.x);
    expect(mark?.y?.[0]).toBeCloseTo(top, 12);
    // The drawn drop is the core's largest sag to within the profile's spacing.
    expect((mark?.y?.[0] ?? 0) - (mark?.y?.[1] ?? 0)).toBeCloseTo(sagging.sag, 3);
  });

  it('draws the chord on a level span too, so tilting a fixing changes only numbers', () => {
    const level = checked(demo);
    const drawn = buildSagFigure(level, solveProject(level), 'si');
    const chord = traceNamed(drawn.data, 'Straight line between fixings');
    const [a, b] = level.supports;
    expect(chord?.x).toEqual([a.x, b.x]);
    expect(chord?.y).toEqual([a.z, b.z]);
    const tilted = checked(demo);
    tilted.supports[1].z += 0.3;
    const after = buildSagFigure(tilted, solveProject(tilted), 'si');
    expect(after.data.map((t) => t.name)).toEqual(drawn.data.map((t) => t.name));
  });

  it('writes the sag and the lowest point in feet and inches for imperial', () => {
    const imperial = buildSagFigure(project, results, 'imperial').layout.annotations ?? [];
    const texts = (imperial as Partial<Annotation>[]).map((n) => String(n.text));
    expect(texts.find((t) => t.startsWith('Largest sag'))).toMatch(/\d+\u00a0in/);
    expect(texts.find((t) => t.startsWith('Lowest point'))).toMatch(/\d+\u00a0ft\u00a0\d+/);
    // Legend: 3.5 m / 0.0254 = 137.795 in = 11 ft 5 3/4 in; 3.7 m = 145.669 in = 12 ft 1 5/8 in.
    const names = buildSagFigure(project, results, 'imperial').data.map((t) => String(t.name));
    expect(names).toContain('Minimum clearance 11\u00a0ft\u00a05\u00a03/4\u00a0in');
    expect(names).toContain('Driveway: needs 12\u00a0ft\u00a01\u00a05/8\u00a0in');
  });
});
