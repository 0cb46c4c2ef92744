/**
 * Number formatting for the workbench: values in the chosen display units with their symbol,
 * and the numbers put into input fields (enough digits to round-trip what a person typed).
 */
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../core/units.ts';

const fieldFormat = new Intl.NumberFormat('en', {
  maximumSignificantDigits: 8,
  useGrouping: false,
});

/** The text an input shows for an SI value. */
export function fieldText(si: number, quantity: Quantity, units: UnitSystem): string {
  return fieldFormat.format(fromSi(si, quantity, units));
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

/** An SI value shown with its unit, e.g. "3.750 m", "442 N". */
export function show(si: number, quantity: Quantity, units: UnitSystem, digits?: number): string {
  const value = fromSi(si, quantity, units);
  const symbol = unitSymbol(quantity, units);
  const text = fixed(digits ?? DIGITS[quantity] ?? 2).format(value);
  return symbol ? `${text} ${symbol}` : text;
}

/** Forces above 1 kN (or 1 000 lbf) in kN or kip, for summaries. */
export function showForceShort(newtons: number, units: UnitSystem): string {
  if (units === 'si')
    return newtons >= 1000
      ? `${fixed(2).format(newtons / 1000)} kN`
      : `${fixed(0).format(newtons)} N`;
  return show(newtons, 'force', units, 0);
}

export function percent(fraction: number): string {
  return `${fixed(0).format(fraction * 100)} %`;
}
