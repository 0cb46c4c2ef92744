/**
 * Display-unit conversions. Reference factors are the exact definitions in NIST SP 811 (2008),
 * Appendix B: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg,
 * 1 lbf = 4.4482216152605 N, 1 mph = 0.44704 m/s, t/°C = (t/°F − 32)/1.8.
 */
import { describe, expect, it } from 'vitest';
import { fromSi, type Quantity, toSi, type UnitSystem, unitSymbol } from '../src/core/units.ts';

const QUANTITIES: Quantity[] = [
  'length',
  'diameter',
  'mass',
  'massPerLength',
  'force',
  'stiffness',
  'temperature',
  'speed',
  'expansion',
  'ratio',
  'count',
];

/** Seeded linear congruential generator (Numerical Recipes constants) for repeatable samples. */
function seeded(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

function relativeError(actual: number, expected: number, scale = Math.abs(expected)): number {
  return Math.abs(actual - expected) / Math.max(scale, Number.MIN_VALUE);
}

describe('imperial factors match NIST SP 811 exact definitions', () => {
  const cases: [Quantity, number, number][] = [
    ['length', 1, 0.3048],
    ['diameter', 1, 0.0254],
    ['mass', 1, 0.45359237],
    ['massPerLength', 1, 0.45359237 / 0.3048],
    ['force', 1, 4.4482216152605],
    ['stiffness', 1, 4448.2216152605],
    ['speed', 1, 0.44704],
    ['temperature', 212, 100],
    ['temperature', -40, -40],
    ['temperature', 32, 0],
    ['expansion', 1, 1.8e-6],
  ];
  for (const [quantity, shown, si] of cases) {
    it(`${shown} ${unitSymbol(quantity, 'imperial')} = ${si} SI`, () => {
      expect(
        relativeError(toSi(shown, quantity, 'imperial'), si, Math.max(Math.abs(si), 1)),
      ).toBeLessThan(1e-14);
    });
  }
  it('SI display of diameter is millimetres and of EA is kilonewtons', () => {
    expect(toSi(5, 'diameter', 'si')).toBe(0.005);
    expect(toSi(1050, 'stiffness', 'si')).toBe(1.05e6);
  });
});

describe('conversion round trips are exact to 1e-12 relative', () => {
  const random = seeded(20260101);
  const systems: UnitSystem[] = ['si', 'imperial'];
  for (const system of systems) {
    for (const quantity of QUANTITIES) {
      it(`${system} ${quantity}: SI → shown → SI and shown → SI → shown`, () => {
        for (let i = 0; i < 500; i++) {
          const magnitude = 10 ** (random() * 12 - 6);
          const value = (random() < 0.5 ? -1 : 1) * magnitude;
          // An offset scale (°F) makes relative error meaningless near zero; its scale is the
          // offset itself, so temperatures are compared relative to max(|value|, 100).
          const scale =
            quantity === 'temperature' ? Math.max(Math.abs(value), 100) : Math.abs(value);
          const back = toSi(fromSi(value, quantity, system), quantity, system);
          expect(relativeError(back, value, scale)).toBeLessThanOrEqual(1e-12);
          const again = fromSi(toSi(value, quantity, system), quantity, system);
          expect(relativeError(again, value, scale)).toBeLessThanOrEqual(1e-12);
        }
      });
    }
  }
});
