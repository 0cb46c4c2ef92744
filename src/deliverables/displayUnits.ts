/**
 * The one presentation module for units and numbers, over the app's display units
 * (src/core/units.ts): the workbench (table cells, labels, input fields) and the exports (report,
 * client view, CSV, CLI text) take their digits and unit words from here.
 *
 * Two styles of digits are kept side by side in one table because people already read both:
 * 'table' is the workbench (the same digits in either system, thousands grouped, e.g. "3.750",
 * "1,234"); 'report' is the printed and exported text (digits per system, e.g. imperial lengths
 * to 0.01 ft).
 */
import { ADVICE_SI, type Wording } from '../core/checkMessages.ts';
import { fromSi, type Quantity, unitSymbol as symbolOf, type UnitSystem } from '../core/units.ts';

export type { Quantity, UnitSystem };

/** Where a number is shown: the workbench ('table') or a report or export ('report'). */
export type DigitStyle = 'table' | 'report';

const TABLE_DIGITS: Partial<Record<Quantity, number>> = {
  length: 3,
  diameter: 1,
  force: 0,
  speed: 1,
  temperature: 0,
  mass: 2,
};

/** Decimal places per style, system and quantity: the single table of digits. */
export const DIGITS: Readonly<
  Record<DigitStyle, Readonly<Record<UnitSystem, Readonly<Partial<Record<Quantity, number>>>>>>
> = {
  table: { si: TABLE_DIGITS, imperial: TABLE_DIGITS },
  report: {
    si: { length: 3, diameter: 1, mass: 2, massPerLength: 3, force: 0, temperature: 0, speed: 0 },
    imperial: {
      length: 2,
      diameter: 3,
      mass: 2,
      massPerLength: 4,
      force: 0,
      temperature: 0,
      speed: 0,
    },
  },
};

/** Digits for a quantity not in the table. */
const FALLBACK_DIGITS: Record<DigitStyle, number> = { table: 2, report: 3 };

/** The decimal places a style shows for a quantity in a unit system. */
export function digitsFor(style: DigitStyle, system: UnitSystem, quantity: Quantity): number {
  return DIGITS[style][system][quantity] ?? FALLBACK_DIGITS[style];
}

export function unitSymbol(system: UnitSystem, quantity: Quantity): string {
  return symbolOf(quantity, system);
}

export function toDisplay(system: UnitSystem, quantity: Quantity, valueSi: number): number {
  return fromSi(valueSi, quantity, system);
}

/** "12.345 m": the value in display units with the quantity's usual digits and its symbol. */
export function formatQuantity(
  system: UnitSystem,
  quantity: Quantity,
  valueSi: number,
  digits?: number,
): string {
  const symbol = symbolOf(quantity, system);
  const shown = fromSi(valueSi, quantity, system)
    .toFixed(digits ?? digitsFor('report', system, quantity))
    .replace(/^-(0(\.0+)?)$/, '$1');
  if (!symbol) return shown;
  return `${shown}${symbol.startsWith('°') ? '' : ' '}${symbol}`;
}

const fixedFormats = new Map<number, Intl.NumberFormat>();
/** A grouped number format with exactly `digits` decimals ("1,234.50"). */
function fixed(digits: number): Intl.NumberFormat {
  let format = fixedFormats.get(digits);
  if (!format) {
    format = new Intl.NumberFormat('en', {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    });
    fixedFormats.set(digits, format);
  }
  return format;
}

/**
 * A force for summaries and key numbers, the one rule the workbench, the client view and the
 * report share: from 1 000 N in kN with two decimals ("1.59 kN"), below in whole newtons
 * ("441 N"); imperial in whole lbf ("1,234 lbf").
 */
export function formatForceShort(system: UnitSystem, newtons: number, space = ' '): string {
  if (system === 'si')
    return newtons >= 999.5
      ? `${fixed(2).format(newtons / 1000)}${space}kN`
      : `${fixed(0).format(newtons)}${space}N`;
  return `${fixed(0).format(fromSi(newtons, 'force', system))}${space}${symbolOf('force', system)}`;
}

const EIGHTHS = ['', '⅛', '¼', '⅜', '½', '⅝', '¾', '⅞'];

/**
 * A length as installers read it: metres with millimetres in SI; in imperial units feet and
 * inches to the nearest eighth of an inch, "12 ft 3 1/4 in" in prose or, compact for table
 * cells, "12′ 3¼″". Parts are joined by no-break spaces so a length never parts at a line end.
 */
export function formatLength(system: UnitSystem, metres: number, compact = false): string {
  if (system === 'si') return formatQuantity('si', 'length', metres);
  const eighths = Math.round(Math.abs(metres / 0.0254) * 8);
  const sign = metres < 0 && eighths > 0 ? '−' : '';
  const feet = Math.floor(eighths / 96);
  const inches = Math.floor((eighths % 96) / 8);
  const rest = eighths % 8;
  if (compact) {
    const inchText = `${inches}${EIGHTHS[rest]}″`;
    return feet === 0 ? `${sign}${inchText}` : `${sign}${feet}′\u00a0${inchText}`;
  }
  const divisor = rest === 0 ? 1 : rest % 4 === 0 ? 4 : rest % 2 === 0 ? 2 : 1;
  const fraction = rest ? `\u00a0${rest / divisor}/${8 / divisor}` : '';
  const inchText = `${inches}${fraction}\u00a0in`;
  return feet === 0 ? `${sign}${inchText}` : `${sign}${feet}\u00a0ft\u00a0${inchText}`;
}

/**
 * How a message words numbers in the chosen units: whole newtons or pounds force; lengths as the
 * report gives them (metres to the millimetre, or feet and inches); masses to 0.1 kg or lb;
 * temperatures without drift (formatTemperature).
 */
export function wordingFor(system: UnitSystem): Wording {
  return {
    force: (newtons) => formatQuantity(system, 'force', newtons),
    length: (metres) => formatLength(system, metres),
    mass: (kg) => formatQuantity(system, 'mass', kg, 1),
    temperature: (celsius) => formatTemperature(system, celsius),
  };
}

/**
 * The tension window's advice and position words: in SI the core's own advice wording (so the
 * workbench, report and CLI say the same), in imperial pounds force and feet and inches.
 */
export function adviceWordingFor(system: UnitSystem): Wording {
  if (system === 'si') return ADVICE_SI;
  return { ...wordingFor(system), force: (newtons) => formatForceShort(system, newtons) };
}

/**
 * Digits for a temperature in the chosen units without drift: a whole number shown whole, else
 * one decimal (15 °C → 59 °F, 7.5 °C → 45.5 °F, never a rounded 46 °F).
 */
export function temperatureDigits(system: UnitSystem, celsius: number): number {
  const shown = fromSi(celsius, 'temperature', system);
  return Math.abs(shown - Math.round(shown)) < 1e-9 ? 0 : 1;
}

/** A temperature in the chosen units without drift ("59°F", "45.5°F"). */
export function formatTemperature(system: UnitSystem, celsius: number): string {
  return formatQuantity(system, 'temperature', celsius, temperatureDigits(system, celsius));
}

// Workbench ('table' style): numbers in cells, labels and input fields.

// SI values are shown as typed (8 digits); converted imperial values are rounded to 6 digits so
// a 22 m span reads 72.1785 ft, not 72.178478. The document keeps the exact SI value.
const fieldFormats: Record<UnitSystem, Intl.NumberFormat> = {
  si: new Intl.NumberFormat('en', { maximumSignificantDigits: 8, useGrouping: false }),
  imperial: new Intl.NumberFormat('en', { maximumSignificantDigits: 6, useGrouping: false }),
};

/** The text an input shows for an SI value (enough digits to round-trip what a person typed). */
export function fieldText(system: UnitSystem, quantity: Quantity, valueSi: number): string {
  return fieldFormats[system].format(fromSi(valueSi, quantity, system));
}

/** Parse typed text: a plain number, decimal point, optional exponent. */
export function parseNumber(text: string): number | undefined {
  const trimmed = text.trim();
  if (trimmed === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed)) return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
}

/** An SI value as a workbench number in display units without the unit, e.g. "3.750". */
export function formatNumber(
  system: UnitSystem,
  quantity: Quantity,
  valueSi: number,
  digits?: number,
): string {
  return fixed(digits ?? digitsFor('table', system, quantity)).format(
    fromSi(valueSi, quantity, system),
  );
}

/** An SI value on the workbench with its unit, kept on one line, e.g. "3.750 m", "442 N". */
export function formatCell(
  system: UnitSystem,
  quantity: Quantity,
  valueSi: number,
  digits?: number,
): string {
  const symbol = symbolOf(quantity, system);
  const places =
    digits ?? (quantity === 'temperature' ? temperatureDigits(system, valueSi) : undefined);
  const text = formatNumber(system, quantity, valueSi, places);
  return symbol ? `${text}\u00a0${symbol}` : text;
}

/** A fraction as a whole percentage, e.g. "42 %". */
export function formatPercent(fraction: number): string {
  return `${fixed(0).format(fraction * 100)}\u00a0%`;
}
