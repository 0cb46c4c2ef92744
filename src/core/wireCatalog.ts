/**
 * Built-in wire catalogue. Steel rope and strand by the factor method of EN 12385-4 / ISO 2408:
 * metallic area A = C d², mass m = W d²/100 (kg/m), breaking force F = K R d²/1000 (kN), d in mm,
 * factors from Feyrer, Wire Ropes, 2nd ed., Table 1.9 [V] (1x19 row derived [D]).
 * Every value carries a source tag: [V] read in a source, [D] derived, [M] from memory, [CP] practice.
 */
import type { CustomWire, WireSpec } from './project.ts';

export type WireKind =
  | 'custom'
  | 'galvanised steel'
  | 'stainless steel'
  | 'polyester rope'
  | 'nylon rope'
  | 'coated clothesline';

export interface WireProperties extends CustomWire {
  id: string;
  kind: WireKind;
  construction: string;
  /** Where each value comes from, field by field. */
  sources: Record<
    'diameter' | 'massPerLength' | 'axialStiffness' | 'thermalExpansion' | 'breakingLoad',
    string
  >;
  notes?: string;
}

interface RopeFactors {
  W: number;
  C: number;
  K: number;
  source: string;
}

const FEYRER = 'Feyrer, Wire Ropes, 2nd ed., Table 1.9 [V]';
const FACTORS: Record<string, RopeFactors> = {
  '6x7 FC': { W: 0.345, C: 0.369, K: 0.332, source: FEYRER },
  '1x19': {
    W: 0.478,
    C: 0.597,
    K: 0.537,
    source:
      '1x19 factors from 19 equal wires, fill 0.76, lay 1.02, spinning loss 0.9 (checked against ASTM A586 [V])',
  },
  '7x7': { W: 0.384, C: 0.432, K: 0.388, source: FEYRER },
  '7x19': { W: 0.381, C: 0.418, K: 0.362, source: FEYRER },
};

/** Factor method of EN 12385-4: metallic area mm², mass kg/m and breaking force N for d mm. */
export function ropeByFactors(construction: string, dMm: number, gradeNPerMm2: number) {
  const f = FACTORS[construction];
  return {
    areaMm2: f.C * dMm * dMm,
    massPerLength: (f.W * dMm * dMm) / 100,
    breakingLoad: f.K * gradeNPerMm2 * dMm * dMm,
  };
}

/** Effective modulus on the metallic area, Pa [M]. */
const MODULUS_PA: Record<string, number> = { '1x19': 150e9, '7x7': 100e9, '7x19': 100e9 };
const STEEL_ALPHA = 12e-6; // EN 1993-1-1 §3.2.6 [M]
const STAINLESS_ALPHA = 16e-6; // AISI 316 [V]

function steelWire(
  construction: string,
  dMm: number,
  stainless: boolean,
  id: string,
  label: string,
): WireProperties {
  const grade = stainless ? 1570 : 1770; // N/mm² [M] stainless, [CP] galvanised
  const f = FACTORS[construction];
  const rope = ropeByFactors(construction, dMm, grade);
  const massFactor = stainless ? 1.02 : 1; // stainless ~2 % heavier [M]
  const modulus = MODULUS_PA[construction] * (stainless ? 0.93 : 1); // stainless 5–10 % lower [M]
  return {
    id,
    label,
    kind: stainless ? 'stainless steel' : 'galvanised steel',
    construction,
    diameter: dMm / 1000,
    massPerLength: rope.massPerLength * massFactor,
    axialStiffness: modulus * rope.areaMm2 * 1e-6,
    thermalExpansion: stainless ? STAINLESS_ALPHA : STEEL_ALPHA,
    breakingLoad: rope.breakingLoad,
    sources: {
      diameter: 'nominal [V]',
      massPerLength: `m = W d²/100, ${f.source}${stainless ? '; +2 % stainless [M]' : ''} [D]`,
      axialStiffness: `E ${(modulus / 1e9).toFixed(0)} GPa on A = C d² [M]`,
      thermalExpansion: stainless ? 'AISI 316, 16e-6/K [V]' : 'steel 12e-6/K, EN 1993-1-1 [M]',
      breakingLoad: `F = K R d², R = ${grade} N/mm², ${f.source} [D]`,
    },
  };
}

function metricSteel(
  construction: string,
  diametersMm: number[],
  stainless: boolean,
): WireProperties[] {
  const prefix = stainless ? 'ss' : 'galv';
  const name = stainless ? 'Stainless 316' : 'Galvanised';
  return diametersMm.map((d) =>
    steelWire(
      construction,
      d,
      stainless,
      `${prefix}-${construction}-${d}`,
      `${name} ${construction} ${d} mm`,
    ),
  );
}

/** Inch-size 7x19 cable: ~35 % stronger than the factor formula (1/8 in ≈ 8.9 kN) [M]. */
function inchCable(sixteenths: number, label: string): WireProperties {
  const dMm = (sixteenths / 16) * 25.4;
  const wire = steelWire(
    '7x19',
    dMm,
    false,
    `galv-7x19-${sixteenths}-16in`,
    `Galvanised 7x19 ${label} in`,
  );
  wire.breakingLoad *= 1.35;
  wire.sources.breakingLoad = 'factor formula × 1.35 for inch aircraft cable [M]';
  return wire;
}

interface FibreRow {
  dMm: number;
  breakingKN: number;
  massKgPerM: number;
}
const POLYESTER: FibreRow[] = [
  { dMm: 6, breakingKN: 5.85, massKgPerM: 0.029 },
  { dMm: 8, breakingKN: 9.1, massKgPerM: 0.045 },
  { dMm: 10, breakingKN: 12.9, massKgPerM: 0.065 },
  { dMm: 12, breakingKN: 22.6, massKgPerM: 0.115 },
];
const NYLON: FibreRow[] = [
  { dMm: 6, breakingKN: 6.61, massKgPerM: 0.023 },
  { dMm: 8, breakingKN: 10.2, massKgPerM: 0.036 },
  { dMm: 10, breakingKN: 14.4, massKgPerM: 0.053 },
  { dMm: 12, breakingKN: 25.2, massKgPerM: 0.094 },
];

const FIBRE_NOTE =
  'Fibre ropes creep and stretch: re-tension after loading; thermal expansion taken as 0.';

/**
 * Fibre rope stretches far more at low load than its secant to break suggests: the load–
 * elongation curve stiffens toward break. EA is taken at the working load, 20 % of the breaking
 * load (safety factor 5 [CP]), as that load over the elongation of new 3-strand rope there:
 * nylon ≈ 12 %, polyester ≈ 5 % [M] (manufacturers' load–elongation curves, from memory).
 */
export const FIBRE_WORKING_FRACTION = 0.2;
export const FIBRE_WORKING_STRAIN = { nylon: 0.12, polyester: 0.05 } as const;

function fibreRopes(rows: FibreRow[], nylon: boolean): WireProperties[] {
  const strain = FIBRE_WORKING_STRAIN[nylon ? 'nylon' : 'polyester'];
  return rows.map((row) => ({
    id: `${nylon ? 'nylon' : 'polyester'}-${row.dMm}`,
    label: `${nylon ? 'Nylon' : 'Polyester'} rope ${row.dMm} mm`,
    kind: nylon ? 'nylon rope' : 'polyester rope',
    construction: '3-strand',
    diameter: row.dMm / 1000,
    massPerLength: row.massKgPerM,
    axialStiffness: (FIBRE_WORKING_FRACTION * row.breakingKN * 1000) / strain,
    thermalExpansion: 0,
    breakingLoad: row.breakingKN * 1000,
    sources: {
      diameter: 'nominal [V]',
      massPerLength: 'fibre rope table [V]',
      axialStiffness: `EA at working load: 0.2 F / ${strain * 100} % elongation at 20 % of break [M]`,
      thermalExpansion: 'taken as 0 for fibre rope [M]',
      breakingLoad: 'fibre rope table [V]',
    },
    notes: nylon ? `${FIBRE_NOTE} Nylon loses 5–25 % strength wet.` : FIBRE_NOTE,
  }));
}

/** Plastic-coated clothesline: 7x7 galvanised 2 mm core in PVC to 3.5 mm [D from V/M]. */
function clothesline(): WireProperties {
  const core = steelWire(
    '7x7',
    2,
    false,
    'coated-7x7-2-3.5',
    'Coated clothesline 3.5 mm (7x7 2 mm core)',
  );
  const pvcKgPerM = (Math.PI / 4) * (3.5 ** 2 - 2 ** 2) * 1e-6 * 1400; // PVC ~1400 kg/m³ [M]
  return {
    ...core,
    kind: 'coated clothesline',
    diameter: 0.0035,
    massPerLength: core.massPerLength + pvcKgPerM,
    sources: {
      ...core.sources,
      massPerLength: `${core.sources.massPerLength} + PVC 1400 kg/m³ [M]`,
    },
    notes: 'The coating carries no load; breaking load of the steel core only.',
  };
}

export const WIRE_CATALOG: readonly WireProperties[] = [
  ...metricSteel('1x19', [3, 4, 5, 6, 8], false),
  ...metricSteel('7x7', [2, 3, 4, 5, 6], false),
  ...metricSteel('7x19', [3, 4, 5, 6, 8, 10], false),
  ...metricSteel('1x19', [3, 4, 5, 6], true),
  ...metricSteel('7x7', [3, 4, 5], true),
  ...metricSteel('7x19', [4, 5, 6], true),
  inchCable(2, '1/8'),
  inchCable(3, '3/16'),
  inchCable(4, '1/4'),
  ...fibreRopes(POLYESTER, false),
  ...fibreRopes(NYLON, true),
  clothesline(),
];

export function findCatalogWire(id: string): WireProperties | undefined {
  return WIRE_CATALOG.find((w) => w.id === id);
}

/** The wire's properties: a catalogue entry or the custom values (sources 'entered by user'). */
export function resolveWire(spec: WireSpec): WireProperties | undefined {
  if ('catalogId' in spec) return findCatalogWire(spec.catalogId);
  const user = 'entered by user';
  return {
    ...spec,
    id: 'custom',
    kind: 'custom',
    construction: 'custom',
    sources: {
      diameter: user,
      massPerLength: user,
      axialStiffness: user,
      thermalExpansion: user,
      breakingLoad: user,
    },
  };
}
