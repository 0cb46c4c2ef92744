/**
 * The moving-load band in the side view (buildSagFigure, plain Node) and the as-built form's
 * text → measurement (display units converted exactly: NIST SP 811 appendix B, 1 ft = 0.3048 m,
 * 1 lbf = 0.45359237 × 9.80665 N, °F = °C × 9/5 + 32).
 */
import { describe, expect, it } from 'vitest';
import demo from '../examples/courtyard-lights.json' with { type: 'json' };
import { type Project, solveProject, validateProject } from '../src/core/index.ts';
import { buildSagFigure } from '../src/ui/plot/sagFigure.ts';
import { measurementFromForm } from '../src/ui/results/asBuiltForm.ts';

type Trace = { name?: string; x?: number[]; y?: number[]; fill?: string; showlegend?: boolean };

function project(withMoving: boolean): Project {
  const doc = structuredClone(demo) as { loads: unknown[] };
  if (withMoving) doc.loads.push({ type: 'moving', from: 2, to: 20, mass: 30, label: 'Basket' });
  const checked = validateProject(doc);
  if (!checked.ok) throw new Error('invalid');
  return checked.project;
}

describe('moving-load band in the sag plot', () => {
  it('draws no band without a moving load', () => {
    const p = project(false);
    const figure = buildSagFigure(p, solveProject(p), 'si');
    expect(figure.movingBands).toBe(false);
    expect((figure.data as Trace[]).some((t) => t.fill === 'tonexty')).toBe(false);
  });

  it('one filled band per case, its edges the core’s band, one legend entry', () => {
    const p = project(true);
    const results = solveProject(p);
    const figure = buildSagFigure(p, results, 'imperial');
    const data = figure.data as Trace[];
    const filled = data.filter((t) => t.fill === 'tonexty');
    expect(filled).toHaveLength(results.cases.length);
    expect(filled.filter((t) => t.showlegend !== false)).toHaveLength(1);
    results.cases.forEach((c, i) => {
      const band = c.movingLoads?.[0].band;
      if (!band) throw new Error('no band');
      const low = filled[i];
      const top = data[data.indexOf(low) - 1];
      expect(low.y).toEqual(band.zLow.map((z) => z / 0.3048));
      expect(top.y).toEqual(band.zHigh.map((z) => z / 0.3048));
      // The band reaches below the wire's lowest point with the load parked at the worst place.
      expect(Math.min(...band.zLow)).toBeLessThan(c.lowestPoint.z);
    });
  });
});

describe('as-built form', () => {
  const p = project(false);
  it('converts US units to SI and keeps the position for a sag only', () => {
    const r = measurementFromForm(
      { kind: 'sag', value: '2', temperature: '50', x: '30' },
      p,
      'imperial',
    );
    expect(r.issues).toEqual([]);
    expect(r.measurement?.value).toBeCloseTo(0.6096, 12);
    expect(r.measurement?.temperature).toBeCloseTo(10, 12);
    expect(r.measurement?.x).toBeCloseTo(9.144, 12);
    const t = measurementFromForm(
      { kind: 'returnTime', value: '1.2', temperature: '15', x: '30' },
      p,
      'si',
    );
    expect(t.measurement).toEqual({ kind: 'returnTime', value: 1.2, temperature: 15 });
  });

  it('refuses text and out-of-range values in the form’s words', () => {
    expect(
      measurementFromForm({ kind: 'sag', value: 'abc', temperature: '8', x: '' }, p, 'si').issues,
    ).toEqual(['Measured value: must be a number']);
    expect(
      measurementFromForm({ kind: 'frequency', value: '0', temperature: '8', x: '' }, p, 'si')
        .issues,
    ).toEqual(['Measured value: must be greater than 0']);
  });
});
