/**
 * Wire catalogue: the factor method against published tables, and every entry's data sourced.
 * Sources: API Spec 9A Table C.1 (6x7 fibre core, grade 1770) [V]; ASTM A586-98 Table 1,
 * 1/2-in strand 96.8 mm², 0.774 kg/m [V] (doc/sources.md).
 */
import { describe, expect, it } from 'vitest';
import { ropeByFactors, WIRE_CATALOG } from '../src/core/wireCatalog.ts';

describe('factor method (EN 12385-4, Feyrer Table 1.9)', () => {
  const api9A = [
    { d: 8, kgPer100m: 22.1, kN: 37.6 },
    { d: 10, kgPer100m: 34.5, kN: 58.8 },
    { d: 12, kgPer100m: 49.7, kN: 84.6 },
  ];
  for (const row of api9A) {
    it(`6x7 fibre core ${row.d} mm matches API Spec 9A: ${row.kgPer100m} kg/100 m, ${row.kN} kN`, () => {
      const rope = ropeByFactors('6x7 FC', row.d, 1770);
      expect(rope.massPerLength * 100).toBeCloseTo(row.kgPer100m, 1);
      expect(rope.breakingLoad / 1000).toBeCloseTo(row.kN, 1);
    });
  }

  it('1x19 strand 1/2 in matches ASTM A586 area and mass within 1 %', () => {
    const rope = ropeByFactors('1x19', 12.7, 1770);
    expect(Math.abs(rope.areaMm2 / 96.8 - 1)).toBeLessThan(0.01);
    expect(Math.abs(rope.massPerLength / 0.774 - 1)).toBeLessThan(0.01);
  });
});

describe('catalogue entries', () => {
  it('ids are unique', () => {
    expect(new Set(WIRE_CATALOG.map((w) => w.id)).size).toBe(WIRE_CATALOG.length);
  });

  for (const wire of WIRE_CATALOG) {
    it(`${wire.id}: physical values and a tagged source for each`, () => {
      for (const key of ['diameter', 'massPerLength', 'axialStiffness', 'breakingLoad'] as const) {
        expect(wire[key]).toBeGreaterThan(0);
      }
      expect(wire.thermalExpansion).toBeGreaterThanOrEqual(0);
      for (const source of Object.values(wire.sources)) expect(source).toMatch(/\[(V|D|M|CP)\]/);
    });
  }
});

describe('fibre rope stiffness at working load, not a secant to break', () => {
  // Elongation of new 3-strand rope at 20 % of its breaking load (the working load at safety
  // factor 5): nylon ≈ 12 %, polyester ≈ 5 % [M]; at break 25–35 % and 15–25 % [V].
  const fibre = WIRE_CATALOG.filter((w) => w.kind === 'nylon rope' || w.kind === 'polyester rope');

  it('every fibre rope: working load / EA gives the working elongation, and the source says so', () => {
    expect(fibre.length).toBe(8);
    for (const rope of fibre) {
      const strain = rope.kind === 'nylon rope' ? 0.12 : 0.05;
      expect((0.2 * rope.breakingLoad) / rope.axialStiffness).toBeCloseTo(strain, 12);
      expect(rope.sources.axialStiffness).toMatch(/working load.*\[M\]/);
    }
  });

  it('is softer than the secant to break (EA = F / strain at break) it replaces', () => {
    for (const rope of fibre) {
      const strainAtBreak = rope.kind === 'nylon rope' ? 0.3 : 0.2;
      expect(rope.axialStiffness).toBeLessThan(rope.breakingLoad / strainAtBreak);
    }
  });
});
