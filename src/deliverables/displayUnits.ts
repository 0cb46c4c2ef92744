/**
 * Display units for exports: SI values (the file's units) shown in SI or US customary units.
 * Exact factors from the 1959 international yard and pound: 1 ft = 0.3048 m, 1 in = 0.0254 m,
 * 1 lb = 0.45359237 kg, 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N, 1 mph = 0.44704 m/s.
 */
export type UnitSystem = 'si' | 'imperial';

export type Quantity =
  | 'length'
  | 'smallLength'
  | 'force'
  | 'temperature'
  | 'mass'
  | 'massPerLength'
  | 'speed';

interface UnitDef {
  symbol: string;
  fromSi: (value: number) => number;
  digits: number;
}

const FOOT_M = 0.3048;
const INCH_M = 0.0254;
const POUND_KG = 0.45359237;
const POUND_FORCE_N = 4.4482216152605;
const MPH_M_PER_S = 0.44704;

const UNITS: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  si: {
    length: { symbol: 'm', fromSi: (v) => v, digits: 3 },
    smallLength: { symbol: 'mm', fromSi: (v) => v * 1000, digits: 1 },
    force: { symbol: 'N', fromSi: (v) => v, digits: 0 },
    temperature: { symbol: '°C', fromSi: (v) => v, digits: 0 },
    mass: { symbol: 'kg', fromSi: (v) => v, digits: 2 },
    massPerLength: { symbol: 'kg/m', fromSi: (v) => v, digits: 3 },
    speed: { symbol: 'm/s', fromSi: (v) => v, digits: 0 },
  },
  imperial: {
    length: { symbol: 'ft', fromSi: (v) => v / FOOT_M, digits: 2 },
    smallLength: { symbol: 'in', fromSi: (v) => v / INCH_M, digits: 3 },
    force: { symbol: 'lbf', fromSi: (v) => v / POUND_FORCE_N, digits: 0 },
    temperature: { symbol: '°F', fromSi: (v) => (v * 9) / 5 + 32, digits: 0 },
    mass: { symbol: 'lb', fromSi: (v) => v / POUND_KG, digits: 2 },
    massPerLength: { symbol: 'lb/ft', fromSi: (v) => (v / POUND_KG) * FOOT_M, digits: 4 },
    speed: { symbol: 'mph', fromSi: (v) => v / MPH_M_PER_S, digits: 0 },
  },
};

export function unitSymbol(system: UnitSystem, quantity: Quantity): string {
  return UNITS[system][quantity].symbol;
}

export function toDisplay(system: UnitSystem, quantity: Quantity, valueSi: number): number {
  return UNITS[system][quantity].fromSi(valueSi);
}

/** "12.345 m": the value in display units with the quantity's usual digits and its symbol. */
export function formatQuantity(
  system: UnitSystem,
  quantity: Quantity,
  valueSi: number,
  digits?: number,
): string {
  const unit = UNITS[system][quantity];
  const shown = unit.fromSi(valueSi).toFixed(digits ?? unit.digits);
  const spacer = unit.symbol.startsWith('°') ? '' : ' ';
  return `${shown.replace(/^-(0(\.0+)?)$/, '$1')}${spacer}${unit.symbol}`;
}
