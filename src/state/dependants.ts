/**
 * Items that depend on others and follow them when those are removed: hung loads and clearance
 * zones are kept inside the span (clipped, or removed when nothing of them is left), a sag target
 * follows its span when fixings are removed, a target stated in a deleted case goes back to the
 * installation, and a fixing that becomes an end fixing loses its pulley setting. Each change is
 * described in words so the person is told what happened.
 */
import type { InstallationTarget, Load, Project, SupportPoint } from '../core/index.ts';

export type DescribeLength = (metres: number) => string;

const metres: DescribeLength = (m) => `${Number(m.toPrecision(6))} m`;

export interface Carried {
  project: Project;
  changes: string[];
}

interface Span {
  first: number;
  last: number;
}

function spanOf(supports: readonly SupportPoint[]): Span {
  return { first: supports[0].x, last: supports[supports.length - 1].x };
}

function loadName(load: Load, index: number): string {
  return load.label || `${load.type === 'point' ? 'Point load' : 'Part-span load'} ${index + 1}`;
}

function carryLoads(p: Project, span: Span, len: DescribeLength, changes: string[]): Load[] {
  const kept: Load[] = [];
  p.loads.forEach((load, i) => {
    const name = loadName(load, i);
    if (load.type === 'point') {
      if (load.x >= span.first && load.x <= span.last) kept.push(load);
      else changes.push(`${name} at ${len(load.x)} was removed: it is no longer on the span.`);
      return;
    }
    const from = Math.max(load.from, span.first);
    const to = Math.min(load.to, span.last);
    if (to <= from) {
      changes.push(`${name} was removed: none of it is on the span any more.`);
      return;
    }
    if (from !== load.from || to !== load.to)
      changes.push(
        `${name} now runs from ${len(from)} to ${len(to)} (was ${len(load.from)} to ${len(load.to)}).`,
      );
    kept.push(from === load.from && to === load.to ? load : { ...load, from, to });
  });
  return kept;
}

function carryZones(p: Project, span: Span, len: DescribeLength, changes: string[]) {
  const zones = p.limits.zones;
  if (!zones) return p.limits;
  const kept = zones.flatMap((zone, i) => {
    const name = zone.label || `Clearance zone ${i + 1}`;
    const from = Math.max(zone.from, span.first);
    const to = Math.min(zone.to, span.last);
    if (to <= from) {
      changes.push(`${name} was removed: it is no longer under the span.`);
      return [];
    }
    if (from === zone.from && to === zone.to) return [zone];
    changes.push(`${name} now runs from ${len(from)} to ${len(to)}.`);
    return [{ ...zone, from, to }];
  });
  return { ...p.limits, zones: kept };
}

/** Span index after support `removed` is taken out of a list of `count` supports. */
function spanAfterRemoval(span: number, removed: number, count: number): number {
  if (removed === 0) return Math.max(0, span - 1);
  if (removed === count - 1) return Math.min(span, count - 3);
  return span >= removed ? span - 1 : span;
}

function carryTarget(
  before: Project,
  after: Project,
  removedSupport: number | undefined,
  changes: string[],
): InstallationTarget {
  let target = after.installation.target;
  const spans = after.supports.length - 1;
  if (target.span !== undefined) {
    const moved =
      removedSupport !== undefined
        ? spanAfterRemoval(target.span, removedSupport, before.supports.length)
        : Math.min(target.span, spans - 1);
    if (moved !== target.span) {
      const a = after.supports[moved];
      const b = after.supports[moved + 1];
      const names = `${a.label || `Fixing ${moved + 1}`} to ${b.label || `Fixing ${moved + 2}`}`;
      changes.push(`The sag target now applies to span ${moved + 1} (${names}).`);
      target = { ...target, span: moved };
    }
  }
  if (target.case !== undefined && !after.cases.some((c) => c.name === target.case)) {
    changes.push(`The installation target now holds on the day (it was stated in ${target.case}).`);
    const { case: _gone, ...rest } = target;
    target = rest;
  }
  return target;
}

function carryEnds(p: Project, changes: string[]): SupportPoint[] {
  const last = p.supports.length - 1;
  return p.supports.map((s, i) => {
    if ((i === 0 || i === last) && s.attachment !== undefined && s.attachment !== 'clamped') {
      const kind = s.attachment === 'pulley' ? 'a pulley' : 'a swing link';
      changes.push(
        `${s.label || `Fixing ${i + 1}`} is now an end fixing: it holds the wire fast, no longer ${kind}.`,
      );
      const { attachment: _attachment, ...rest } = s;
      return rest;
    }
    return s;
  });
}

/**
 * Carry the items that depend on the span, the fixings and the cases from `before` into
 * `after`. Loads and zones move only when the span's ends moved. `removedSupport` is the index
 * of a fixing taken out, so a sag target can follow its span.
 */
export function carryDependants(
  before: Project,
  after: Project,
  options: { removedSupport?: number; describeLength?: DescribeLength } = {},
): Carried {
  const len = options.describeLength ?? metres;
  const changes: string[] = [];
  const spanBefore = spanOf(before.supports);
  const span = spanOf(after.supports);
  let project = after;
  if (span.first !== spanBefore.first || span.last !== spanBefore.last) {
    project = {
      ...project,
      loads: carryLoads(project, span, len, changes),
      limits: carryZones(project, span, len, changes),
    };
  }
  const supports = carryEnds(project, changes);
  const target = carryTarget(before, project, options.removedSupport, changes);
  if (target !== project.installation.target)
    project = { ...project, installation: { ...project.installation, target } };
  if (supports.some((s, i) => s !== project.supports[i])) project = { ...project, supports };
  return { project, changes };
}
