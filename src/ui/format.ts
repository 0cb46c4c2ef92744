/**
 * Number formatting for the workbench: values in the chosen display units with their symbol,
 * and the numbers put into input fields (enough digits to round-trip what a person typed).
 */

import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../core/units.ts';
import { formatForceShort, temperatureDigits } from '../deliverables/displayUnits.ts';

// SI values are shown as typed (8 digits); converted imperial values are rounded to 6 digits so
// a 22 m span reads 72.1785 ft, not 72.178478. The document keeps the exact SI value.
const fieldFormats: Record<UnitSystem, Intl.NumberFormat> = {
  si: new Intl.NumberFormat('en', { maximumSignificantDigits: 8, useGrouping: false }),
  imperial: new Intl.NumberFormat('en', { maximumSignificantDigits: 6, useGrouping: false }),
};

/** The text an input shows for an SI value. */
export function fieldText(si: number, quantity: Quantity, units: UnitSystem): string {
  return fieldFormats[units].format(fromSi(si, quantity, units));
}

/** Parse typed text: a plain number, decimal point, optional exponent. */
export function parseNumber(text: string): number | undefined {
  const trimmed = text.trim();
  if (trimmed === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed)) return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
}

const formats = new Map<number, Intl.NumberFormat>();
function fixed(digits: number): Intl.NumberFormat {
  let format = formats.get(digits);
  if (!format) {
    format = new Intl.NumberFormat('en', {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
    });
    formats.set(digits, format);
  }
  return format;
}

const DIGITS: Partial<Record<Quantity, number>> = {
  length: 3,
  diameter: 1,
  force: 0,
  speed: 1,
  temperature: 0,
  mass: 2,
};

/** An SI value as a number in display units without the unit, e.g. "3.750" (table cells). */
export function num(si: number, quantity: Quantity, units: UnitSystem, digits?: number): string {
  return fixed(digits ?? DIGITS[quantity] ?? 2).format(fromSi(si, quantity, units));
}

/** An SI value shown with its unit, kept on one line, e.g. "3.750 m", "442 N". */
export function show(si: number, quantity: Quantity, units: UnitSystem, digits?: number): string {
  const symbol = unitSymbol(quantity, units);
  const places = digits ?? (quantity === 'temperature' ? temperatureDigits(units, si) : undefined);
  const text = num(si, quantity, units, places);
  return symbol ? `${text}\u00a0${symbol}` : text;
}

/** Forces from 1 kN in kN, for summaries (the rule shared with the client view and report). */
export function showForceShort(newtons: number, units: UnitSystem): string {
  return formatForceShort(units, newtons, '\u00a0');
}

export function percent(fraction: number): string {
  return `${fixed(0).format(fraction * 100)}\u00a0%`;
}
