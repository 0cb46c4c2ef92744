/**
 * The physical range of every number in a project file, SI units. A value outside its range is
 * refused with the range in the message. Each range covers every real wire span this tool is
 * for (a 0.1 m trellis tie to a 2 km valley crossing) with margin, and keeps the solver away from
 * numbers it cannot carry (1e-300 m spans, 1e308 N tensions). Reasons: doc/project-format.md.
 */

export interface FieldRange {
  min: number;
  max: number;
  /** SI unit shown after the range ('' for a plain number). */
  unit: string;
  /** The value must be greater than min, not equal to it. */
  minExclusive?: boolean;
}

const range = (min: number, max: number, unit: string, minExclusive = false): FieldRange => ({
  min,
  max,
  unit,
  minExclusive,
});

export const RANGES = {
  /** Position of a support or ground point along the line, m. */
  position: range(-10_000, 10_000, 'm'),
  /** Height of a support or ground point above the datum, m. */
  height: range(-1000, 1000, 'm'),
  /** Horizontal distance between neighbouring supports, m. */
  span: range(0.1, 2000, 'm'),
  /** Height difference between neighbouring supports per metre of span (79°). */
  chordSlope: range(-5, 5, ''),
  /** Distance between neighbouring ground points, m. */
  groundSpacing: range(0.001, 20_000, 'm'),
  wireDiameter: range(0.0005, 0.1, 'm'),
  wireMassPerLength: range(0.0001, 100, 'kg/m'),
  axialStiffness: range(100, 1e12, 'N'),
  thermalExpansion: range(0, 3e-4, '1/K'),
  breakingLoad: range(10, 1e9, 'N'),
  /** Breaking load / EA: the wire's strain at its breaking load on the straight-line model. */
  strainAtBreak: range(0, 0.4, ''),
  pointMass: range(0, 10_000, 'kg'),
  pointForce: range(0, 100_000, 'N'),
  loadMassPerLength: range(0, 100, 'kg/m'),
  loadDiameter: range(0, 0.5, 'm'),
  /** Projected area of a hung item that catches the wind, m². */
  windArea: range(0, 100, 'm²'),
  /** How far a hung item's lowest part hangs below the wire, m. */
  drop: range(0, 50, 'm'),
  temperature: range(-80, 80, '°C'),
  iceThickness: range(0, 0.1, 'm'),
  windSpeed: range(0, 70, 'm/s'),
  targetTension: range(1, 1e9, 'N'),
  targetSag: range(0.001, 1000, 'm'),
  /** Cut length as a multiple of the total chord length (the straight lines between supports). */
  cutLengthRatio: range(0.5, 2, ''),
  safetyFactor: range(1, 20, ''),
  /** A termination's strength as a fraction of the wire's breaking load. */
  endFittingEfficiency: range(0.1, 1, ''),
  clearance: range(0, 100, 'm'),
  elementsPerSpan: range(2, 20_000, ''),
  gravity: range(1, 30, 'm/s²'),
  airDensity: range(0, 2, 'kg/m³'),
  iceDensity: range(100, 1000, 'kg/m³'),
  dragCoefficient: range(0.1, 3, ''),
} as const satisfies Record<string, FieldRange>;

/** A bound as messages write it: plain below 100 000, else as 1e9. */
export function formatBound(value: number): string {
  return Math.abs(value) >= 1e5 ? value.toExponential().replace('e+', 'e') : String(value);
}

/** "0.1 to 2000 m": the range as the messages and the docs write it. */
export function describeRange(r: FieldRange): string {
  return `${formatBound(r.min)} to ${formatBound(r.max)}${r.unit ? ` ${r.unit}` : ''}`;
}
