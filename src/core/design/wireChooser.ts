/**
 * Wire chooser: the tension window of every catalogue wire (and the project's own custom wire)
 * for this project; the wires whose window is open, lightest first (kg/m), each with a suggested
 * installation horizontal tension H_s = √(H_low · H_high), the middle of the window in ln H: the
 * same factor of margin to the slack end (clearance) and to the tight end (tension limit).
 */
import type { Project, WireSpec } from '../project.ts';
import { buildProjectModel } from '../projectModel.ts';
import { largestInstallationTension } from '../states.ts';
import { resolveWire, WIRE_CATALOG, type WireKind, type WireProperties } from '../wireCatalog.ts';
import { findWindowEnds, type SearchCarry } from './windowEnds.ts';

export type WireFamily = 'galvanised' | 'stainless' | 'fibre' | 'custom';

export const SUGGESTION_RULE =
  'Suggested tension: the middle of the window in log terms, √(lowest × highest): the same ' +
  'factor of margin to the slack end (clearance) and to the tight end (tension limit).';

export interface WireChoice {
  /** Catalogue id, or null for the project's own (custom) wire. */
  catalogId: string | null;
  label: string;
  family: WireFamily;
  /** kg/m. */
  massPerLength: number;
  /** Window ends, installation horizontal tension (N); low null when no clearance limits it. */
  low: number | null;
  high: number;
  suggestedHorizontalTension: number;
}

export function wireFamily(kind: WireKind): WireFamily {
  if (kind === 'stainless steel') return 'stainless';
  if (kind === 'polyester rope' || kind === 'nylon rope') return 'fibre';
  if (kind === 'custom') return 'custom';
  return 'galvanised';
}

/** The candidate wires: the catalogue, plus the project's wire when it is custom. */
function candidates(project: Project): { spec: WireSpec; wire: WireProperties }[] {
  const list = WIRE_CATALOG.map((wire) => ({ spec: { catalogId: wire.id } as WireSpec, wire }));
  const own = resolveWire(project.wire);
  if (own && own.kind === 'custom') list.push({ spec: project.wire, wire: own });
  return list;
}

/**
 * The window of one wire for this project, or null when it is shut. The ends are found to
 * 1e-9 relative; `carry` (updated in place) starts the search where a similar wire's ended.
 */
export function chooseWire(
  project: Project,
  spec: WireSpec,
  wire: WireProperties,
  refinement = 1,
  carry: SearchCarry = {},
): WireChoice | null {
  const model = buildProjectModel({ ...project, wire: spec }, refinement);
  const ends = findWindowEnds(model, { stopWhenEmpty: true, tolerance: 1e-9, carry });
  // What the search learned replaces what it was given (an end not found keeps the old start).
  Object.assign(carry, ends.carry);
  if (ends.empty || !ends.high) return null;
  const high = ends.high.horizontalTension;
  const low = ends.low?.horizontalTension ?? null;
  return {
    catalogId: 'catalogId' in spec ? spec.catalogId : null,
    label: wire.label,
    family: wireFamily(wire.kind),
    massPerLength: wire.massPerLength,
    low,
    high,
    // The floor is a first-span H₁; the ends are the largest span's H (they differ over a pulley).
    suggestedHorizontalTension: Math.sqrt(
      (low ?? largestInstallationTension(model, ends.floorN)) * high,
    ),
  };
}

/**
 * Every wire that works, lightest first; optionally only some families. Every wire is solved on
 * the mesh refinement given (default: the file's mesh; pass the project's results.mesh.refinement).
 */
export function chooseWires(
  project: Project,
  families?: readonly WireFamily[],
  refinement = 1,
): WireChoice[] {
  const choices: WireChoice[] = [];
  const carry: SearchCarry = {};
  for (const { spec, wire } of candidates(project)) {
    if (families && !families.includes(wireFamily(wire.kind))) continue;
    const choice = chooseWire(project, spec, wire, refinement, carry);
    if (choice) choices.push(choice);
  }
  return choices.sort(
    (a, b) => a.massPerLength - b.massPerLength || a.label.localeCompare(b.label),
  );
}
