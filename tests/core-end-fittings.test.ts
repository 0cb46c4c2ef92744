/**
 * End fittings: the working limit is breaking load × termination efficiency / safety factor
 * (EN 13414-1 and ASME B30.9 define the working load limit this way), so
 * utilisation = T_max · SF / (breaking load · efficiency of the weaker end).
 * Table values: EN 13411-5 grips ≥ 80 % [M], EN 13411-3 ferrule-secured eye ~90 % [M],
 * EN 13411-4 sockets 100 % [M], EN 13411-6/-7 wedge sockets ~80 % [M], hand splice 0.8
 * (EN 13414-1) [M], swaged terminal on 1x19 strand 100 % [CP].
 */
import { describe, expect, it } from 'vitest';
import { END_FITTING_TYPES } from '../src/core/endFittings.ts';
import {
  type EndFittings,
  type Project,
  solveProject,
  validateProject,
} from '../src/core/index.ts';
import { singleSpan } from './helpers/projects.ts';

const base = (endFittings?: EndFittings): Project => {
  const p = singleSpan({
    span: 20,
    massPerLength: 0.1,
    axialStiffness: 2e6,
    breakingLoad: 10000,
    target: { horizontalTension: 1500 },
    elementsPerSpan: 40,
  });
  return { ...p, limits: { ...p.limits, safetyFactor: 5, endFittings } };
};

function solved(project: Project) {
  const check = validateProject(project);
  if (!check.ok) throw new Error(JSON.stringify(check.issues));
  return solveProject(project);
}

describe('end fittings in the utilisation', () => {
  it('the table holds each value with its source and tag', () => {
    const byKind = Object.fromEntries(END_FITTING_TYPES.map((t) => [t.kind, t]));
    expect(byKind.ropeGrips.efficiency).toBe(0.8);
    expect(byKind.ropeGrips.source).toMatch(/EN 13411-5.*\[M\]/);
    expect(byKind.ferruleEye.efficiency).toBe(0.9);
    expect(byKind.ferruleEye.source).toMatch(/EN 13411-3.*\[M\]/);
    expect(byKind.socket.efficiency).toBe(1);
    expect(byKind.socket.source).toMatch(/EN 13411-4.*\[M\]/);
    expect(byKind.wedgeSocket.efficiency).toBe(0.8);
    expect(byKind.wedgeSocket.source).toMatch(/EN 13411-6.*EN 13411-7.*\[M\]/);
    expect(byKind.handSplice.efficiency).toBe(0.8);
    expect(byKind.handSplice.source).toMatch(/EN 13414-1.*\[M\]/);
    expect(byKind.swagedTerminal.efficiency).toBe(1);
    expect(byKind.swagedTerminal.source).toMatch(/\[CP\]/);
  });

  it('without endFittings nothing is reduced, and the results say none was stated', () => {
    const r = solved(base());
    const c = r.cases[0];
    expect(c.utilisation).toBeCloseTo((c.maxTension * 5) / 10000, 12);
    expect(r.endFittings.stated).toBe(false);
    expect(r.endFittings.efficiency).toBe(1);
    expect(r.endFittings.start.kind).toBe('notStated');
  });

  it('the weaker end governs: ferrule eye (0.9) and wire rope grips (0.8) → 0.8', () => {
    const plain = solved(base()).cases[0];
    const r = solved(base({ start: { kind: 'ferruleEye' }, end: { kind: 'ropeGrips' } }));
    const c = r.cases[0];
    expect(c.utilisation).toBeCloseTo((c.maxTension * 5) / (10000 * 0.8), 12);
    expect(c.utilisation / plain.utilisation).toBeCloseTo(1 / 0.8, 12);
    expect(r.endFittings.governing).toBe('end');
    expect(r.endFittings.start.efficiency).toBe(0.9);
    expect(r.endFittings.end.label).toBe('Wire rope grips');
  });

  it('my own value is used as given, and a fitting can turn a pass into a fail', () => {
    // T_max ≈ 1500 N; working limit without reduction 2000 N (pass), with 0.7 → 1400 N (fail).
    const own = solved(
      base({ start: { kind: 'custom', efficiency: 0.7 }, end: { kind: 'socket' } }),
    );
    const c = own.cases[0];
    expect(own.endFittings.efficiency).toBe(0.7);
    expect(own.endFittings.start.source).toBe('entered by user');
    expect(c.utilisation).toBeGreaterThan(1);
    expect(c.ok).toBe(false);
    expect(c.messages.join(' ')).toMatch(/working limit 1400 N \(breaking load × end fitting 70 %/);
    expect(solved(base()).cases[0].ok).toBe(true);
  });

  it('refuses an unknown kind, a custom fitting without a value, and a value on a table kind', () => {
    const issues = (f: unknown) => {
      const p = base() as unknown as { limits: Record<string, unknown> };
      p.limits.endFittings = f;
      const check = validateProject(p);
      return check.ok ? [] : check.issues.map((i) => `${i.path}: ${i.message}`);
    };
    expect(issues({ start: { kind: 'knot' }, end: { kind: 'socket' } })[0]).toMatch(
      /^limits\.endFittings\.start\.kind: must be one of/,
    );
    expect(issues({ start: { kind: 'custom' }, end: { kind: 'socket' } })).toEqual([
      'limits.endFittings.start.efficiency: is required (a number; the range is 0.1 to 1)',
    ]);
    expect(issues({ start: { kind: 'custom', efficiency: 1.2 }, end: { kind: 'socket' } })).toEqual(
      ['limits.endFittings.start.efficiency: must be at most 1; the range is 0.1 to 1'],
    );
    expect(
      issues({ start: { kind: 'socket' }, end: { kind: 'ropeGrips', efficiency: 0.95 } })[0],
    ).toMatch(/^limits\.endFittings\.end\.efficiency: applies only to kind "custom"/);
    expect(issues({ start: { kind: 'socket' } })).toEqual([
      'limits.endFittings.end: must be an object',
    ]);
  });
});
