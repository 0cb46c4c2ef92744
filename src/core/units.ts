/**
 * Display units: converts between the document's SI values and the numbers a person types in
 * SI or US customary (imperial) units. value_SI = value_shown × factor (+ offset for °F).
 * Exact factors: 1 ft = 0.3048 m, 1 in = 0.0254 m, 1 lb = 0.45359237 kg (1959 agreement),
 * 1 lbf = 0.45359237 kg × 9.80665 m/s², 1 mph = 0.44704 m/s, °F = °C × 9/5 + 32.
 */

export type UnitSystem = 'si' | 'imperial';

export type Quantity =
  | 'length'
  | 'diameter'
  | 'mass'
  | 'massPerLength'
  | 'force'
  | 'stiffness'
  | 'temperature'
  | 'speed'
  | 'expansion'
  | 'ratio'
  | 'area'
  | 'count';

export interface DisplayUnit {
  /** Unit symbol shown beside a field, e.g. "m", "ft". Empty for pure numbers. */
  symbol: string;
  /** SI value per displayed unit. */
  factor: number;
  /** Added after scaling (°F only): SI = (shown − offset) × factor. */
  offset: number;
}

export const FOOT_M = 0.3048;
export const INCH_M = 0.0254;
export const POUND_KG = 0.45359237;
export const STANDARD_GRAVITY = 9.80665;
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY;
export const MILE_PER_HOUR_M_PER_S = 0.44704;

const unit = (symbol: string, factor: number, offset = 0): DisplayUnit => ({
  symbol,
  factor,
  offset,
});

export const DISPLAY_UNITS: Record<UnitSystem, Record<Quantity, DisplayUnit>> = {
  si: {
    length: unit('m', 1),
    diameter: unit('mm', 1e-3),
    mass: unit('kg', 1),
    massPerLength: unit('kg/m', 1),
    force: unit('N', 1),
    stiffness: unit('kN', 1e3),
    temperature: unit('°C', 1),
    speed: unit('m/s', 1),
    expansion: unit('×10⁻⁶ /K', 1e-6),
    ratio: unit('', 1),
    area: unit('m²', 1),
    count: unit('', 1),
  },
  imperial: {
    length: unit('ft', FOOT_M),
    diameter: unit('in', INCH_M),
    mass: unit('lb', POUND_KG),
    massPerLength: unit('lb/ft', POUND_KG / FOOT_M),
    force: unit('lbf', POUND_FORCE_N),
    stiffness: unit('kip', 1000 * POUND_FORCE_N),
    temperature: unit('°F', 5 / 9, 32),
    speed: unit('mph', MILE_PER_HOUR_M_PER_S),
    expansion: unit('×10⁻⁶ /°F', 1e-6 * 1.8),
    ratio: unit('', 1),
    area: unit('ft²', FOOT_M * FOOT_M),
    count: unit('', 1),
  },
};

export function displayUnit(quantity: Quantity, system: UnitSystem): DisplayUnit {
  return DISPLAY_UNITS[system][quantity];
}

/** A number as typed in the given system → SI. */
export function toSi(shown: number, quantity: Quantity, system: UnitSystem): number {
  const u = DISPLAY_UNITS[system][quantity];
  return u.offset === 0 ? shown * u.factor : (shown - u.offset) * u.factor;
}

/** An SI value → the number shown in the given system. */
export function fromSi(si: number, quantity: Quantity, system: UnitSystem): number {
  const u = DISPLAY_UNITS[system][quantity];
  return u.offset === 0 ? si / u.factor : si / u.factor + u.offset;
}

/** Symbol of the unit, or '' for pure numbers. */
export function unitSymbol(quantity: Quantity, system: UnitSystem): string {
  return DISPLAY_UNITS[system][quantity].symbol;
}
