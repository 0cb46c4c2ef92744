/**
 * validateProject: checks an untrusted JSON value against the project contract (project.ts).
 * Anything missing, unknown, of the wrong type, non-finite or out of physical range is refused
 * with the field path and the rule; nothing is repaired. A newer version is refused by name; an
 * older one is read through the migration chain (migrateProject.ts) and says what changed.
 */

import { END_FITTING_KINDS } from './endFittings.ts';
import { describeRange, RANGES } from './fieldRanges.ts';
import { migrateProjectDocument } from './migrateProject.ts';
import { ATTACHMENTS, PROJECT_FORMAT, PROJECT_VERSION, type Project } from './project.ts';
import { FieldChecker, type Json, quoted, type ValidationIssue } from './validateFields.ts';
import { checkInstallation, type SupportXZ } from './validateInstallation.ts';
import { checkReportRecord } from './validateReport.ts';
import { findCatalogWire } from './wireCatalog.ts';

export type { ValidationIssue } from './validateFields.ts';
export type ValidationResult =
  | { ok: true; project: Project; migratedFrom?: number; notes?: string[] }
  | { ok: false; issues: ValidationIssue[] };

const TOP_FIELDS = [
  'format',
  'version',
  'title',
  'supports',
  'ground',
  'wire',
  'loads',
  'installation',
  'cases',
  'limits',
  'model',
  'environment',
  'report',
];
const CUSTOM_WIRE = [
  'label',
  'diameter',
  'massPerLength',
  'axialStiffness',
  'thermalExpansion',
  'breakingLoad',
];

function checkSupports(c: FieldChecker, raw: unknown): SupportXZ[] {
  const list = c.array(raw, 'supports', 2, 50) ?? [];
  const xs: SupportXZ[] = [];
  list.forEach((item, i) => {
    const path = `supports[${i}]`;
    if ((item as Json | null)?.free !== undefined)
      c.fail(
        `${path}.free`,
        'is a version 1 field; version 2 says "attachment": "clamped", "pulley" or "swingLink"',
      );
    const s = c.object(item, path, ['x', 'z', 'label', 'attachment', 'free']);
    if (!s) return;
    const x = c.inRange(s.x, `${path}.x`, RANGES.position);
    const z = c.inRange(s.z, `${path}.z`, RANGES.height);
    c.label(s.label, `${path}.label`, 100, false);
    if (s.attachment !== undefined) {
      const end = i === 0 || i === list.length - 1;
      if (
        c.oneOf(s.attachment, `${path}.attachment`, ATTACHMENTS) &&
        end &&
        s.attachment !== 'clamped'
      )
        c.fail(`${path}.attachment`, 'an end support holds the wire fast; only "clamped" applies');
    }
    if (x === undefined) return;
    const previous = xs[xs.length - 1];
    if (previous && x <= previous.x)
      c.fail(
        `${path}.x`,
        'must be further along the span than the previous support (x increasing)',
      );
    else if (previous) checkSpan(c, path, previous, { x, z });
    xs.push({ x, z });
  });
  return xs;
}

/** A span's length and steepness, from the previous support to this one. */
function checkSpan(
  c: FieldChecker,
  path: string,
  previous: { x: number; z?: number },
  here: { x: number; z?: number },
): void {
  const lengthM = here.x - previous.x;
  const { span, chordSlope } = RANGES;
  if (lengthM < span.min || lengthM > span.max) {
    c.fail(
      `${path}.x`,
      `makes a span of ${lengthM.toPrecision(4)} m; a span must be ${describeRange(span)}`,
    );
    return;
  }
  if (here.z === undefined || previous.z === undefined) return;
  const slope = (here.z - previous.z) / lengthM;
  if (Math.abs(slope) > chordSlope.max)
    c.fail(
      `${path}.z`,
      `rises ${Math.abs(here.z - previous.z).toPrecision(4)} m over a ${lengthM.toPrecision(4)} m span; the height difference must be at most ${chordSlope.max} times the span (a steeper wire is a hanger, not a span)`,
    );
}

function checkGround(c: FieldChecker, raw: unknown): void {
  if (raw === undefined) return;
  const list = c.array(raw, 'ground', 1, 1000) ?? [];
  let previous = -Infinity;
  const spacing = RANGES.groundSpacing.min;
  list.forEach((item, i) => {
    const g = c.object(item, `ground[${i}]`, ['x', 'z']);
    if (!g) return;
    const x = c.inRange(g.x, `ground[${i}].x`, RANGES.position);
    c.inRange(g.z, `ground[${i}].z`, RANGES.height);
    if (x !== undefined && x <= previous)
      c.fail(
        `ground[${i}].x`,
        'must be further along the span than the previous ground point (x increasing)',
      );
    else if (x !== undefined && x - previous < spacing)
      c.fail(`ground[${i}].x`, `must be at least ${spacing} m after the previous ground point`);
    if (x !== undefined) previous = x;
  });
}

function checkWire(c: FieldChecker, raw: unknown): void {
  if (typeof raw === 'object' && raw !== null && 'catalogId' in raw) {
    const w = c.object(raw, 'wire', ['catalogId']);
    if (w && typeof w.catalogId === 'string' && !findCatalogWire(w.catalogId))
      c.fail('wire.catalogId', `${quoted(w.catalogId)} is not in the wire catalogue`);
    else if (w && typeof w.catalogId !== 'string') c.fail('wire.catalogId', 'must be text');
    return;
  }
  const w = c.object(raw, 'wire', CUSTOM_WIRE);
  if (!w) return;
  c.label(w.label, 'wire.label', 100);
  c.inRange(w.diameter, 'wire.diameter', RANGES.wireDiameter);
  c.inRange(w.massPerLength, 'wire.massPerLength', RANGES.wireMassPerLength);
  const stiffness = c.inRange(w.axialStiffness, 'wire.axialStiffness', RANGES.axialStiffness);
  c.inRange(w.thermalExpansion, 'wire.thermalExpansion', RANGES.thermalExpansion);
  const breaking = c.inRange(w.breakingLoad, 'wire.breakingLoad', RANGES.breakingLoad);
  const most = RANGES.strainAtBreak.max;
  if (stiffness !== undefined && breaking !== undefined && breaking > most * stiffness)
    c.fail(
      'wire.axialStiffness',
      `must be at least ${1 / most} times the breaking load (${(breaking / most).toPrecision(4)} N): with ${stiffness} N the wire would stretch ${((100 * breaking) / stiffness).toPrecision(3)} % before breaking, and no wire stretches more than ${100 * most} %`,
    );
}

function checkLoads(c: FieldChecker, raw: unknown, first: number, last: number): void {
  const list = c.array(raw, 'loads', 0, 500) ?? [];
  list.forEach((item, i) => {
    const path = `loads[${i}]`;
    const kind = (item as Json | null)?.type;
    if (kind === 'point') {
      const p = c.object(item, path, [
        'type',
        'x',
        'mass',
        'force',
        'windArea',
        'dragCoefficient',
        'drop',
        'label',
      ]);
      if (!p) return;
      c.number(p.x, `${path}.x`, first, last);
      c.label(p.label, `${path}.label`, 100, false);
      if ((p.mass === undefined) === (p.force === undefined))
        c.fail(path, 'needs exactly one of mass (kg) or force (N)');
      else if (p.mass !== undefined) c.inRange(p.mass, `${path}.mass`, RANGES.pointMass);
      else c.inRange(p.force, `${path}.force`, RANGES.pointForce);
      if (p.windArea !== undefined) c.inRange(p.windArea, `${path}.windArea`, RANGES.windArea);
      if (p.dragCoefficient !== undefined)
        c.inRange(p.dragCoefficient, `${path}.dragCoefficient`, RANGES.dragCoefficient);
      if (p.drop !== undefined) c.inRange(p.drop, `${path}.drop`, RANGES.drop);
    } else if (kind === 'uniform') {
      const u = c.object(item, path, [
        'type',
        'from',
        'to',
        'massPerLength',
        'diameter',
        'drop',
        'label',
      ]);
      if (!u) return;
      if (u.drop !== undefined) c.inRange(u.drop, `${path}.drop`, RANGES.drop);
      const from = c.number(u.from, `${path}.from`, first, last);
      const to = c.number(u.to, `${path}.to`, first, last);
      if (from !== undefined && to !== undefined && to <= from)
        c.fail(`${path}.to`, 'must be greater than from');
      c.inRange(u.massPerLength, `${path}.massPerLength`, RANGES.loadMassPerLength);
      if (u.diameter !== undefined) c.inRange(u.diameter, `${path}.diameter`, RANGES.loadDiameter);
      c.label(u.label, `${path}.label`, 100, false);
    } else if (kind === 'moving') {
      checkMovingLoad(c, item, path, first, last);
    } else {
      c.fail(`${path}.type`, 'must be "point", "uniform" or "moving"');
    }
  });
}

function checkMovingLoad(
  c: FieldChecker,
  item: unknown,
  path: string,
  first: number,
  last: number,
) {
  const m = c.object(item, path, ['type', 'from', 'to', 'mass', 'force', 'label']);
  if (!m) return;
  const from = c.number(m.from, `${path}.from`, first, last);
  const to = c.number(m.to, `${path}.to`, first, last);
  if (from !== undefined && to !== undefined && to <= from)
    c.fail(`${path}.to`, 'must be greater than from');
  c.label(m.label, `${path}.label`, 100, false);
  if ((m.mass === undefined) === (m.force === undefined))
    c.fail(path, 'needs exactly one of mass (kg) or force (N)');
  else if (m.mass !== undefined) c.inRange(m.mass, `${path}.mass`, RANGES.pointMass);
  else c.inRange(m.force, `${path}.force`, RANGES.pointForce);
}

function checkCases(c: FieldChecker, raw: unknown): string[] {
  const list = c.array(raw, 'cases', 0, 50) ?? [];
  const names: string[] = [];
  list.forEach((item, i) => {
    const path = `cases[${i}]`;
    const k = c.object(item, path, [
      'name',
      'temperature',
      'iceThickness',
      'windSpeed',
      'withLoads',
    ]);
    if (!k) return;
    const name = c.label(k.name, `${path}.name`, 80);
    if (name !== undefined && name.trim() === '') c.fail(`${path}.name`, 'must not be empty');
    else if (name !== undefined && names.includes(name))
      c.fail(`${path}.name`, `"${name}" is used by another case`);
    if (name !== undefined) names.push(name);
    c.inRange(k.temperature, `${path}.temperature`, RANGES.temperature);
    c.inRange(k.iceThickness, `${path}.iceThickness`, RANGES.iceThickness);
    c.inRange(k.windSpeed, `${path}.windSpeed`, RANGES.windSpeed);
    c.boolean(k.withLoads, `${path}.withLoads`);
  });
  return names;
}

function checkEndFitting(c: FieldChecker, raw: unknown, path: string): void {
  const f = c.object(raw, path, ['kind', 'efficiency']);
  if (!f) return;
  const kind = c.oneOf(f.kind, `${path}.kind`, END_FITTING_KINDS);
  if (kind === 'custom') c.inRange(f.efficiency, `${path}.efficiency`, RANGES.endFittingEfficiency);
  else if (kind !== undefined && f.efficiency !== undefined)
    c.fail(
      `${path}.efficiency`,
      'applies only to kind "custom" (the table value is used for the other kinds)',
    );
}

function checkLimits(c: FieldChecker, raw: unknown, first: number, last: number): void {
  const l = c.object(raw, 'limits', ['safetyFactor', 'minClearance', 'zones', 'endFittings']);
  if (!l) return;
  c.inRange(l.safetyFactor, 'limits.safetyFactor', RANGES.safetyFactor);
  c.inRange(l.minClearance, 'limits.minClearance', RANGES.clearance);
  if (l.endFittings !== undefined) {
    const ends = c.object(l.endFittings, 'limits.endFittings', ['start', 'end']);
    if (ends) {
      checkEndFitting(c, ends.start, 'limits.endFittings.start');
      checkEndFitting(c, ends.end, 'limits.endFittings.end');
    }
  }
  if (l.zones === undefined) return;
  (c.array(l.zones, 'limits.zones', 0, 50) ?? []).forEach((item, i) => {
    const path = `limits.zones[${i}]`;
    const z = c.object(item, path, ['from', 'to', 'height', 'label']);
    if (!z) return;
    // A zone is checked against the wire, so it must lie under the wire.
    const from = c.number(z.from, `${path}.from`, first, last);
    const to = c.number(z.to, `${path}.to`, first, last);
    if (from !== undefined && to !== undefined && to <= from)
      c.fail(`${path}.to`, 'must be greater than from');
    c.inRange(z.height, `${path}.height`, RANGES.clearance);
    c.label(z.label, `${path}.label`, 100, false);
  });
}

function checkSettings(c: FieldChecker, model: unknown, env: unknown): void {
  if (model !== undefined) {
    const m = c.object(model, 'model', ['theory', 'elementOrder', 'elementsPerSpan']);
    if (m?.theory !== undefined) c.oneOf(m.theory, 'model.theory', ['exact', 'parabolic']);
    if (m?.elementOrder !== undefined) c.oneOf(m.elementOrder, 'model.elementOrder', [1, 2]);
    if (m?.elementsPerSpan !== undefined)
      c.integer(
        m.elementsPerSpan,
        'model.elementsPerSpan',
        RANGES.elementsPerSpan.min,
        RANGES.elementsPerSpan.max,
      );
  }
  if (env !== undefined) {
    const e = c.object(env, 'environment', [
      'gravity',
      'airDensity',
      'iceDensity',
      'dragCoefficient',
    ]);
    if (e?.gravity !== undefined) c.inRange(e.gravity, 'environment.gravity', RANGES.gravity);
    if (e?.airDensity !== undefined)
      c.inRange(e.airDensity, 'environment.airDensity', RANGES.airDensity);
    if (e?.iceDensity !== undefined)
      c.inRange(e.iceDensity, 'environment.iceDensity', RANGES.iceDensity);
    if (e?.dragCoefficient !== undefined)
      c.inRange(e.dragCoefficient, 'environment.dragCoefficient', RANGES.dragCoefficient);
  }
}

export function validateProject(raw: unknown): ValidationResult {
  let older: ReturnType<typeof migrateProjectDocument>;
  try {
    older =
      typeof raw === 'object' && raw !== null && !Array.isArray(raw)
        ? migrateProjectDocument(raw as Json)
        : undefined;
  } catch {
    older = undefined; // not a plain JSON document: the checks below say what is wrong
  }
  if (!older) return validateCurrent(raw);
  const checked = validateCurrent(older.document);
  return checked.ok ? { ...checked, migratedFrom: older.from, notes: older.notes } : checked;
}

function validateCurrent(raw: unknown): ValidationResult {
  const c = new FieldChecker();
  const doc = c.object(raw, '', TOP_FIELDS);
  if (!doc) return { ok: false, issues: c.issues };
  if (doc.format !== PROJECT_FORMAT) c.fail('format', `must be "${PROJECT_FORMAT}"`);
  const version = c.integer(doc.version, 'version', 1, Number.MAX_SAFE_INTEGER);
  if (version !== undefined && version > PROJECT_VERSION)
    c.fail(
      'version',
      `${version} is newer than this Sagwright reads (${PROJECT_VERSION}); update Sagwright`,
    );
  c.label(doc.title, 'title', 200);
  const supports = checkSupports(c, doc.supports);
  const first = supports[0]?.x ?? -Infinity;
  const last = supports[supports.length - 1]?.x ?? Infinity;
  checkGround(c, doc.ground);
  checkWire(c, doc.wire);
  checkLoads(c, doc.loads, first, last);
  const caseNames = checkCases(c, doc.cases);
  checkInstallation(c, doc.installation, supports, caseNames);
  checkLimits(c, doc.limits, first, last);
  checkSettings(c, doc.model, doc.environment);
  checkReportRecord(c, doc.report);
  return c.issues.length === 0
    ? { ok: true, project: raw as Project }
    : { ok: false, issues: c.issues };
}
