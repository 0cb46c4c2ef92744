/**
 * The window's root finder (src/core/design/rangeRoot.ts) on increasing functions whose roots are
 * known in closed form: it must land within the tolerance, say when there is no root in the
 * range, step around points where the function has no value, and not evaluate again a value the
 * caller already knows.
 */
import { describe, expect, it } from 'vitest';
import { rootInRange } from '../src/core/design/rangeRoot.ts';

function counted(f: (x: number) => number) {
  const calls: number[] = [];
  const g = (x: number) => {
    calls.push(x);
    return f(x);
  };
  return { f: g, calls };
}

describe('rootInRange', () => {
  const cases: [string, (x: number) => number, number][] = [
    ['a straight line, x − 1.7', (x) => x - 1.7, 1.7],
    ['an exponential, eˣ − 5 (root ln 5)', (x) => Math.exp(x) - 5, Math.log(5)],
    ['a cube, (x − 0.3)³ + 0.01 (x − 0.3)', (x) => (x - 0.3) ** 3 + 0.01 * (x - 0.3), 0.3],
    ['a flat-topped step, atan(50 (x − 2))', (x) => Math.atan(50 * (x - 2)), 2],
    ['a log, ln x − 1 (root e)', (x) => Math.log(x) - 1, Math.E],
  ];
  for (const [name, f, root] of cases) {
    for (const x0 of [-3, 0.5, 6]) {
      it(`${name} from ${x0}`, () => {
        const r = rootInRange(
          f,
          Math.max(x0, name.startsWith('a log') ? 0.1 : -10),
          -10,
          10,
          1e-10,
        );
        expect(r.status).toBe('root');
        expect(Math.abs(r.x - root)).toBeLessThan(1e-9);
        expect(r.evaluations).toBeLessThan(60);
      });
    }
  }

  it('reports one sign over the whole range, at the edge it reached', () => {
    expect(rootInRange((x) => x + 20, 0, -10, 10)).toMatchObject({ status: 'positive', x: -10 });
    expect(rootInRange((x) => x - 20, 0, -10, 10)).toMatchObject({ status: 'negative', x: 10 });
  });

  it('steps around a region with no value and still finds the root', () => {
    // No answer beyond x = 1.2 (an unsolvable state); the root 1 lies just below it.
    const f = (x: number) => (x > 1.2 ? Number.NaN : x - 1);
    const r = rootInRange(f, -5, -10, 10, 1e-10, { slope: 0.01 });
    expect(r.status).toBe('root');
    expect(Math.abs(r.x - 1)).toBeLessThan(1e-9);
  });

  it('does not evaluate a value it is given, and starts from a given slope', () => {
    const { f, calls } = counted((x) => 2 * (x - 1));
    const r = rootInRange(f, 0, -10, 10, 1e-12, { value: -2, slope: 2 });
    expect(calls).not.toContain(0);
    // The exact slope of a straight line lands on the root at once.
    expect(Math.abs(r.x - 1)).toBeLessThan(1e-12);
    expect(calls.length).toBeLessThanOrEqual(1);
  });

  it('fails without a NaN when the start has no value', () => {
    const r = rootInRange(() => Number.NaN, 0, -10, 10);
    expect(r.status).toBe('failed');
    expect(Number.isFinite(r.x)).toBe(true);
  });
});
