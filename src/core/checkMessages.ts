/**
 * The words of a case's failed checks, built from numbers alone so every reader can word them
 * in its own units: the core and the CLI in SI (SI_WORDING), the workbench and the report in
 * the chosen display units (a Wording from src/deliverables/displayUnits.ts). The same numbers
 * with SI_WORDING give exactly the messages the core puts in a case's `messages`.
 */

/** How a force (N), a length (m), a mass (kg) and a temperature (°C) are written. */
export interface Wording {
  force(newtons: number): string;
  length(metres: number): string;
  mass(kg: number): string;
  temperature(celsius: number): string;
}

/** The core's own wording: whole newtons, metres to the centimetre, kilograms to 0.1 kg. */
export const SI_WORDING: Wording = {
  force: (n) => `${n.toFixed(0)} N`,
  length: (m) => `${m.toFixed(2)} m`,
  mass: (kg) => `${kg.toFixed(1)} kg`,
  temperature: (c) => `${c} °C`,
};

/** The tension window's SI wording: from 10 kN in kilonewtons to 0.1 kN, else whole newtons. */
export const ADVICE_SI: Wording = {
  ...SI_WORDING,
  force: (n) => (n >= 10_000 ? `${(n / 1000).toFixed(1)} kN` : `${n.toFixed(0)} N`),
};

/** The numbers behind a case's tension check. */
export interface TensionFacts {
  maxTension: number;
  breakingLoadN: number;
  /** Efficiency of the weaker end fitting, 0–1. */
  efficiency: number;
  safetyFactor: number;
}

/** The tension check's message, or null when the largest tension is within the working limit. */
export function tensionMessage(f: TensionFacts, w: Wording = SI_WORDING): string | null {
  const capacityN = f.breakingLoadN * f.efficiency;
  const utilisation = (f.maxTension * f.safetyFactor) / capacityN;
  const percent = `${(f.efficiency * 100).toFixed(0)} %`;
  if (f.maxTension > f.breakingLoadN)
    return `Largest tension ${w.force(f.maxTension)} exceeds the breaking load ${w.force(f.breakingLoadN)}: the wire would fail.`;
  if (f.maxTension > capacityN)
    return `Largest tension ${w.force(f.maxTension)} exceeds what the weaker end fitting holds, ${w.force(capacityN)} (${percent} of the breaking load): the termination would fail.`;
  if (utilisation > 1) {
    const basis =
      f.efficiency < 1
        ? `breaking load × end fitting ${percent} / safety factor ${f.safetyFactor}`
        : `breaking load / safety factor ${f.safetyFactor}`;
    return `Largest tension ${w.force(f.maxTension)} exceeds the working limit ${w.force(capacityN / f.safetyFactor)} (${basis}).`;
  }
  return null;
}

/** The whole-span clearance check's message, or null when it clears. */
export function clearanceMessage(
  clearance: number,
  required: number,
  w: Wording = SI_WORDING,
): string | null {
  return clearance < required
    ? `Clearance ${w.length(clearance)} is below the required ${w.length(required)}.`
    : null;
}

/** A clearance zone's message, or null when it clears. */
export function zoneMessage(
  zone: { label: string; clearance: number; required: number },
  w: Wording = SI_WORDING,
): string | null {
  return zone.clearance < zone.required
    ? `${zone.label}: clearance ${w.length(zone.clearance)} is below the required ${w.length(zone.required)}.`
    : null;
}
