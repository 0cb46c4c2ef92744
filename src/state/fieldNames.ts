/**
 * A document path ("loads[2].to") as the person sees the field in the workbench ("the end of
 * Festoon cable"), the kind of quantity it holds, and its current value, so a refusal names the
 * field in the workbench's words and its units. The path itself may stay in a details line.
 */
import type { Project } from '../core/index.ts';
import { fromSi, type Quantity, type UnitSystem, unitSymbol } from '../core/units.ts';

interface Step {
  key: string;
  index?: number;
}

function steps(path: string): Step[] {
  const out: Step[] = [];
  for (const part of path.split('.')) {
    const m = /^(\w+)(?:\[(\d+)\])?$/.exec(part);
    if (!m) return [];
    out.push({ key: m[1], index: m[2] === undefined ? undefined : Number(m[2]) });
  }
  return out;
}

const QUANTITY: Record<string, Quantity> = {
  x: 'length',
  z: 'length',
  from: 'length',
  to: 'length',
  height: 'length',
  drop: 'length',
  minClearance: 'length',
  sag: 'length',
  mass: 'mass',
  massPerLength: 'massPerLength',
  force: 'force',
  maxTension: 'force',
  horizontalTension: 'force',
  breakingLoad: 'force',
  axialStiffness: 'force',
  diameter: 'diameter',
  iceThickness: 'diameter',
  temperature: 'temperature',
  windSpeed: 'speed',
  windArea: 'area',
};

/** The quantity a path's value holds (its last key), for wording a bound in display units. */
export function quantityOfPath(path: string): Quantity {
  const last = steps(path).at(-1)?.key ?? '';
  return QUANTITY[last] ?? 'ratio';
}

/** The value at a path in the document, when it is a number. */
export function valueAt(project: Project, path: string): number | undefined {
  let here: unknown = project;
  for (const { key, index } of steps(path)) {
    here = (here as Record<string, unknown> | undefined)?.[key];
    if (index !== undefined) here = (here as unknown[] | undefined)?.[index];
  }
  return typeof here === 'number' ? here : undefined;
}

const SUPPORT_FIELDS: Record<string, string> = {
  x: 'position',
  z: 'height',
  label: 'name',
  attachment: 'hold on the wire',
};
const LOAD_FIELDS: Record<string, (name: string) => string> = {
  x: (n) => `the position of ${n}`,
  from: (n) => `the start of ${n}`,
  to: (n) => `the end of ${n}`,
  mass: (n) => `the mass of ${n}`,
  massPerLength: (n) => `the mass of ${n}`,
  force: (n) => `the weight of ${n}`,
  diameter: (n) => `the diameter of ${n}`,
  windArea: (n) => `the wind area of ${n}`,
  dragCoefficient: (n) => `the drag coefficient of ${n}`,
  drop: (n) => `how far ${n} hangs below the wire`,
  label: (n) => `the name of ${n}`,
};
const CASE_FIELDS: Record<string, string> = {
  name: 'name',
  temperature: 'temperature',
  iceThickness: 'ice thickness',
  windSpeed: 'wind speed',
  withLoads: 'with hung loads',
};
const ZONE_FIELDS: Record<string, string> = {
  from: 'start',
  to: 'end',
  height: 'clearance needed',
  label: 'name',
};
const WIRE_FIELDS: Record<string, string> = {
  catalogId: 'Wire',
  label: 'Wire name',
  diameter: 'Wire diameter',
  massPerLength: 'Wire mass per length',
  axialStiffness: 'Wire axial stiffness',
  thermalExpansion: 'Wire thermal expansion',
  breakingLoad: 'Wire breaking load',
};
const TOP_FIELDS: Record<string, string> = {
  'limits.minClearance': 'Minimum clearance above ground',
  'limits.safetyFactor': 'Safety factor on breaking load',
  'installation.temperature': 'Temperature on the day',
  'installation.withLoads': 'Loads hung when tensioned',
  'installation.target': 'How the wire is set',
  title: 'Project title',
};

/** The field at `path` in the workbench's words, e.g. "the end of Festoon cable". */
export function fieldName(project: Project, path: string): string {
  const s = steps(path);
  const [first, second] = s;
  if (!first) return path;
  if (first.key === 'supports' && first.index !== undefined) {
    const name = project.supports[first.index]?.label?.trim() || `Fixing ${first.index + 1}`;
    return second ? `${name} ${SUPPORT_FIELDS[second.key] ?? second.key}` : name;
  }
  if (first.key === 'ground' && first.index !== undefined) {
    const name = `Ground point ${first.index + 1}`;
    return second ? `${name} ${SUPPORT_FIELDS[second.key] ?? second.key}` : name;
  }
  if (first.key === 'loads' && first.index !== undefined) {
    const name = project.loads[first.index]?.label?.trim() || `Load ${first.index + 1}`;
    const word = second ? LOAD_FIELDS[second.key] : undefined;
    return word ? word(name) : name;
  }
  if (first.key === 'cases' && first.index !== undefined) {
    const name = project.cases[first.index]?.name || `Case ${first.index + 1}`;
    return second ? `${name} ${CASE_FIELDS[second.key] ?? second.key}` : name;
  }
  if (first.key === 'limits' && second?.key === 'zones' && second.index !== undefined) {
    const zone = project.limits.zones?.[second.index];
    const name = zone?.label?.trim() || `Zone ${second.index + 1}`;
    const field = s[2];
    return field ? `${name} ${ZONE_FIELDS[field.key] ?? field.key}` : name;
  }
  if (first.key === 'wire') return (second && WIRE_FIELDS[second.key]) || 'Wire';
  for (const [prefix, words] of Object.entries(TOP_FIELDS))
    if (path === prefix || path.startsWith(`${prefix}.`)) return words;
  return path;
}

const NUMBER = '(-?\\d+(?:\\.\\d+)?(?:e[-+]?\\d+)?)';
const BOUND = new RegExp(`(at least|at most|greater than|less than) ${NUMBER}`);
/** "the range is 0 to 70 m/s": the core's SI range with its SI unit (or none). */
const RANGE = new RegExp(`the range is ${NUMBER} to ${NUMBER}(?: [^\\s;,)]+)?`);

/**
 * Rewrite an SI bound in a rule ("must be at most 0.2") and the range it states
 * ("the range is 0.0005 to 0.1 m") into display units.
 */
export function localiseRule(message: string, quantity: Quantity, units: UnitSystem): string {
  const symbol = unitSymbol(quantity, units);
  const show = (si: string) => Number(fromSi(Number(si), quantity, units).toPrecision(6));
  const unit = symbol ? ` ${symbol}` : '';
  return message
    .replace(BOUND, (_all, words: string, bound: string) => `${words} ${show(bound)}${unit}`)
    .replace(
      RANGE,
      (_all, low: string, high: string) => `the range is ${show(low)} to ${show(high)}${unit}`,
    );
}

/** A refusal's issue as a details line: the field in words and its rule, the path kept last. */
export function issueLine(
  project: Project,
  issue: { path: string; message: string },
  units: UnitSystem,
): string {
  if (!issue.path) return issue.message;
  const name = fieldName(project, issue.path);
  const rule = localiseRule(issue.message, quantityOfPath(issue.path), units);
  return `${name.charAt(0).toUpperCase()}${name.slice(1)}: ${rule} (${issue.path})`;
}
