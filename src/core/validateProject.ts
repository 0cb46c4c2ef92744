/**
 * validateProject: checks an untrusted JSON value against the project contract (project.ts).
 * Anything missing, unknown, of the wrong type, non-finite or out of physical range is refused
 * with the field path and the rule; nothing is repaired. A newer version is refused by name; an
 * older one is read through the migration chain (migrateProject.ts) and says what changed.
 */

import { END_FITTING_KINDS } from './endFittings.ts';
import { migrateProjectDocument } from './migrateProject.ts';
import { ATTACHMENTS, PROJECT_FORMAT, PROJECT_VERSION, type Project } from './project.ts';
import { FieldChecker, type Json, type ValidationIssue } from './validateFields.ts';
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
];
const CUSTOM_WIRE = [
  'label',
  'diameter',
  'massPerLength',
  'axialStiffness',
  'thermalExpansion',
  'breakingLoad',
];
const TARGET_KINDS = ['horizontalTension', 'maxTension', 'sag', 'unstressedLength'] as const;
const TEMPERATURE_RANGE = [-80, 80] as const;

function checkSupports(c: FieldChecker, raw: unknown): { x: number }[] {
  const list = c.array(raw, 'supports', 2, 50) ?? [];
  const xs: { x: number }[] = [];
  list.forEach((item, i) => {
    const path = `supports[${i}]`;
    if ((item as Json | null)?.free !== undefined)
      c.fail(
        `${path}.free`,
        'is a version 1 field; version 2 says "attachment": "clamped", "pulley" or "swingLink"',
      );
    const s = c.object(item, path, ['x', 'z', 'label', 'attachment', 'free']);
    if (!s) return;
    const x = c.number(s.x, `${path}.x`);
    c.number(s.z, `${path}.z`, -1000, 10000);
    c.string(s.label, `${path}.label`, 100, false);
    if (s.attachment !== undefined) {
      const end = i === 0 || i === list.length - 1;
      if (
        c.oneOf(s.attachment, `${path}.attachment`, ATTACHMENTS) &&
        end &&
        s.attachment !== 'clamped'
      )
        c.fail(`${path}.attachment`, 'an end support holds the wire fast; only "clamped" applies');
    }
    if (x !== undefined) {
      if (xs.length > 0 && x <= xs[xs.length - 1].x)
        c.fail(
          `${path}.x`,
          'must be further along the span than the previous support (x increasing)',
        );
      xs.push({ x });
    }
  });
  return xs;
}

function checkGround(c: FieldChecker, raw: unknown): void {
  if (raw === undefined) return;
  const list = c.array(raw, 'ground', 1, 1000) ?? [];
  let previous = -Infinity;
  list.forEach((item, i) => {
    const g = c.object(item, `ground[${i}]`, ['x', 'z']);
    if (!g) return;
    const x = c.number(g.x, `ground[${i}].x`);
    c.number(g.z, `ground[${i}].z`, -1000, 10000);
    if (x !== undefined && x <= previous)
      c.fail(
        `ground[${i}].x`,
        'must be further along the span than the previous ground point (x increasing)',
      );
    if (x !== undefined) previous = x;
  });
}

function checkWire(c: FieldChecker, raw: unknown): void {
  if (typeof raw === 'object' && raw !== null && 'catalogId' in raw) {
    const w = c.object(raw, 'wire', ['catalogId']);
    if (w && typeof w.catalogId === 'string' && !findCatalogWire(w.catalogId))
      c.fail('wire.catalogId', `"${w.catalogId.slice(0, 60)}" is not in the wire catalogue`);
    else if (w && typeof w.catalogId !== 'string') c.fail('wire.catalogId', 'must be text');
    return;
  }
  const w = c.object(raw, 'wire', CUSTOM_WIRE);
  if (!w) return;
  c.string(w.label, 'wire.label', 100);
  c.positive(w.diameter, 'wire.diameter', 0.2);
  c.positive(w.massPerLength, 'wire.massPerLength', 100);
  c.positive(w.axialStiffness, 'wire.axialStiffness');
  c.number(w.thermalExpansion, 'wire.thermalExpansion', 0, 1e-3);
  c.positive(w.breakingLoad, 'wire.breakingLoad');
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
      c.string(p.label, `${path}.label`, 100, false);
      if ((p.mass === undefined) === (p.force === undefined))
        c.fail(path, 'needs exactly one of mass (kg) or force (N)');
      else if (p.mass !== undefined) c.number(p.mass, `${path}.mass`, 0, 1e5);
      else c.number(p.force, `${path}.force`, 0, 1e6);
      if (p.windArea !== undefined) c.number(p.windArea, `${path}.windArea`, 0, 100);
      if (p.dragCoefficient !== undefined)
        c.number(p.dragCoefficient, `${path}.dragCoefficient`, 0, 5);
      if (p.drop !== undefined) c.number(p.drop, `${path}.drop`, 0, 100);
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
      if (u.drop !== undefined) c.number(u.drop, `${path}.drop`, 0, 100);
      const from = c.number(u.from, `${path}.from`, first, last);
      const to = c.number(u.to, `${path}.to`, first, last);
      if (from !== undefined && to !== undefined && to <= from)
        c.fail(`${path}.to`, 'must be greater than from');
      c.number(u.massPerLength, `${path}.massPerLength`, 0, 1000);
      if (u.diameter !== undefined) c.number(u.diameter, `${path}.diameter`, 0, 1);
      c.string(u.label, `${path}.label`, 100, false);
    } else {
      c.fail(`${path}.type`, 'must be "point" or "uniform"');
    }
  });
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
    const name = c.string(k.name, `${path}.name`, 80);
    if (name !== undefined && name.trim() === '') c.fail(`${path}.name`, 'must not be empty');
    else if (name !== undefined && names.includes(name))
      c.fail(`${path}.name`, `"${name}" is used by another case`);
    if (name !== undefined) names.push(name);
    c.number(k.temperature, `${path}.temperature`, ...TEMPERATURE_RANGE);
    c.number(k.iceThickness, `${path}.iceThickness`, 0, 0.2);
    c.number(k.windSpeed, `${path}.windSpeed`, 0, 100);
    c.boolean(k.withLoads, `${path}.withLoads`);
  });
  return names;
}

function checkInstallation(
  c: FieldChecker,
  raw: unknown,
  spanLengths: number[],
  caseNames: string[],
): void {
  const inst = c.object(raw, 'installation', ['temperature', 'withLoads', 'target']);
  if (!inst) return;
  c.number(inst.temperature, 'installation.temperature', ...TEMPERATURE_RANGE);
  c.boolean(inst.withLoads, 'installation.withLoads');
  const t = c.object(inst.target, 'installation.target', [...TARGET_KINDS, 'span', 'case']);
  if (!t) return;
  const kinds = TARGET_KINDS.filter((k) => t[k] !== undefined);
  if (kinds.length !== 1) {
    c.fail('installation.target', `must hold exactly one of ${TARGET_KINDS.join(', ')}`);
    return;
  }
  const kind = kinds[0];
  const value = c.positive(t[kind], `installation.target.${kind}`);
  if (t.span !== undefined) {
    if (kind !== 'sag') c.fail('installation.target.span', 'applies to a sag target only');
    else c.integer(t.span, 'installation.target.span', 0, Math.max(0, spanLengths.length - 1));
  }
  if (t.case !== undefined) {
    if (kind === 'unstressedLength')
      c.fail(
        'installation.target.case',
        'does not apply to a cut length (it is the same in every case)',
      );
    else if (typeof t.case !== 'string' || !caseNames.includes(t.case))
      c.fail('installation.target.case', 'must name one of the cases');
  }
  if (kind === 'sag' && value !== undefined && spanLengths.length > 0) {
    const j =
      typeof t.span === 'number' && spanLengths[t.span] !== undefined
        ? t.span
        : spanLengths.indexOf(Math.max(...spanLengths));
    if (value >= spanLengths[j] / 2)
      c.fail(
        'installation.target.sag',
        `is longer than possible: must be less than half the span (${(spanLengths[j] / 2).toFixed(3)} m)`,
      );
  }
}

function checkEndFitting(c: FieldChecker, raw: unknown, path: string): void {
  const f = c.object(raw, path, ['kind', 'efficiency']);
  if (!f) return;
  const kind = c.oneOf(f.kind, `${path}.kind`, END_FITTING_KINDS);
  if (kind === 'custom') c.positive(f.efficiency, `${path}.efficiency`, 1);
  else if (kind !== undefined && f.efficiency !== undefined)
    c.fail(
      `${path}.efficiency`,
      'applies only to kind "custom" (the table value is used for the other kinds)',
    );
}

function checkLimits(c: FieldChecker, raw: unknown): void {
  const l = c.object(raw, 'limits', ['safetyFactor', 'minClearance', 'zones', 'endFittings']);
  if (!l) return;
  c.number(l.safetyFactor, 'limits.safetyFactor', 1, 100);
  c.number(l.minClearance, 'limits.minClearance', 0, 1000);
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
    const from = c.number(z.from, `${path}.from`);
    const to = c.number(z.to, `${path}.to`);
    if (from !== undefined && to !== undefined && to <= from)
      c.fail(`${path}.to`, 'must be greater than from');
    c.number(z.height, `${path}.height`, 0, 1000);
    c.string(z.label, `${path}.label`, 100, false);
  });
}

function checkSettings(c: FieldChecker, model: unknown, env: unknown): void {
  if (model !== undefined) {
    const m = c.object(model, 'model', ['theory', 'elementOrder', 'elementsPerSpan']);
    if (m?.theory !== undefined) c.oneOf(m.theory, 'model.theory', ['exact', 'parabolic']);
    if (m?.elementOrder !== undefined) c.oneOf(m.elementOrder, 'model.elementOrder', [1, 2]);
    if (m?.elementsPerSpan !== undefined)
      c.integer(m.elementsPerSpan, 'model.elementsPerSpan', 2, 20000);
  }
  if (env !== undefined) {
    const e = c.object(env, 'environment', [
      'gravity',
      'airDensity',
      'iceDensity',
      'dragCoefficient',
    ]);
    if (e?.gravity !== undefined) c.positive(e.gravity, 'environment.gravity', 50);
    if (e?.airDensity !== undefined) c.number(e.airDensity, 'environment.airDensity', 0, 10);
    if (e?.iceDensity !== undefined) c.positive(e.iceDensity, 'environment.iceDensity', 2000);
    if (e?.dragCoefficient !== undefined)
      c.number(e.dragCoefficient, 'environment.dragCoefficient', 0, 5);
  }
}

export function validateProject(raw: unknown): ValidationResult {
  const older =
    typeof raw === 'object' && raw !== null && !Array.isArray(raw)
      ? migrateProjectDocument(raw as Json)
      : undefined;
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
  c.string(doc.title, 'title', 200);
  const supports = checkSupports(c, doc.supports);
  const first = supports[0]?.x ?? -Infinity;
  const last = supports[supports.length - 1]?.x ?? Infinity;
  const spanLengths = supports.slice(1).map((s, j) => s.x - supports[j].x);
  checkGround(c, doc.ground);
  checkWire(c, doc.wire);
  checkLoads(c, doc.loads, first, last);
  const caseNames = checkCases(c, doc.cases);
  checkInstallation(c, doc.installation, spanLengths, caseNames);
  checkLimits(c, doc.limits);
  checkSettings(c, doc.model, doc.environment);
  return c.issues.length === 0
    ? { ok: true, project: raw as Project }
    : { ok: false, issues: c.issues };
}
