/**
 * Number formatting for exports over the app's display units (src/core/units.ts): the value in
 * the chosen system with the digits a person expects for that quantity, and its symbol.
 */
import { ADVICE_SI, type Wording } from '../core/checkMessages.ts';
import { fromSi, type Quantity, unitSymbol as symbolOf, type UnitSystem } from '../core/units.ts';

export type { Quantity, UnitSystem };

const DIGITS: Record<UnitSystem, Partial<Record<Quantity, number>>> = {
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
};

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
    .toFixed(digits ?? DIGITS[system][quantity] ?? 3)
    .replace(/^-(0(\.0+)?)$/, '$1');
  if (!symbol) return shown;
  return `${shown}${symbol.startsWith('°') ? '' : ' '}${symbol}`;
}

const wholeOrHundredths = [0, 2].map(
  (digits) =>
    new Intl.NumberFormat('en', { minimumFractionDigits: digits, maximumFractionDigits: digits }),
);

/**
 * A force for summaries and key numbers, the one rule the workbench, the client view and the
 * report share: from 1 000 N in kN with two decimals ("1.59 kN"), below in whole newtons
 * ("441 N"); imperial in whole lbf ("1,234 lbf").
 */
export function formatForceShort(system: UnitSystem, newtons: number, space = ' '): string {
  if (system === 'si')
    return newtons >= 999.5
      ? `${wholeOrHundredths[1].format(newtons / 1000)}${space}kN`
      : `${wholeOrHundredths[0].format(newtons)}${space}N`;
  return `${wholeOrHundredths[0].format(fromSi(newtons, 'force', system))}${space}${symbolOf('force', system)}`;
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
