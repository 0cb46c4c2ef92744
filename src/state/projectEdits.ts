/**
 * Immutable edits of the project document, one small function per kind of change. Each returns
 * a function from the old document to the new one, so an edit can be validated on a copy
 * before it is committed (src/state/commit.ts, the only way an edit reaches the document).
 * What depends on a removed item is carried along there (dependants.ts), not here.
 */
import type {
  ClearanceZone,
  EndFitting,
  GroundPoint,
  Installation,
  InstallationTarget,
  Limits,
  Load,
  ModelSettings,
  Project,
  SupportPoint,
  WeatherCase,
  WireSpec,
} from '../core/index.ts';

export type Edit = (project: Project) => Project;

function replaceAt<T>(list: readonly T[], index: number, item: T): T[] {
  return list.map((old, i) => (i === index ? item : old));
}

function removeAt<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index);
}

function insertAt<T>(list: readonly T[], index: number, item: T): T[] {
  return [...list.slice(0, index), item, ...list.slice(index)];
}

export const setTitle =
  (title: string): Edit =>
  (p) => ({ ...p, title });

export const patchSupport =
  (index: number, patch: Partial<SupportPoint>): Edit =>
  (p) => ({ ...p, supports: replaceAt(p.supports, index, { ...p.supports[index], ...patch }) });

export const addSupport = (): Edit => (p) => {
  const last = p.supports[p.supports.length - 1];
  return { ...p, supports: [...p.supports, { x: last.x + 10, z: last.z, label: 'New fixing' }] };
};

export const removeSupport =
  (index: number): Edit =>
  (p) => ({
    ...p,
    supports: removeAt(p.supports, index),
  });

export const patchGround =
  (index: number, patch: Partial<GroundPoint>): Edit =>
  (p) => {
    const ground = p.ground ?? [];
    return { ...p, ground: replaceAt(ground, index, { ...ground[index], ...patch }) };
  };

export const addGroundPoint = (): Edit => (p) => {
  const ground = p.ground ?? [];
  const lastSupport = p.supports[p.supports.length - 1];
  const last = ground[ground.length - 1];
  const x = last ? last.x + 1 : p.supports[0].x;
  return {
    ...p,
    ground: [...ground, { x: last ? Math.max(x, lastSupport.x) : x, z: last?.z ?? 0 }],
  };
};

export const removeGroundPoint =
  (index: number): Edit =>
  (p) => ({
    ...p,
    ground: removeAt(p.ground ?? [], index),
  });

export const patchZone =
  (index: number, patch: Partial<ClearanceZone>): Edit =>
  (p) => {
    const zones = p.limits.zones ?? [];
    return {
      ...p,
      limits: { ...p.limits, zones: replaceAt(zones, index, { ...zones[index], ...patch }) },
    };
  };

export const addZone = (): Edit => (p) => {
  const first = p.supports[0].x;
  const last = p.supports[p.supports.length - 1].x;
  const zone: ClearanceZone = {
    from: first + (last - first) / 3,
    to: first + (2 * (last - first)) / 3,
    height: p.limits.minClearance,
    label: 'Path',
  };
  return { ...p, limits: { ...p.limits, zones: [...(p.limits.zones ?? []), zone] } };
};

export const removeZone =
  (index: number): Edit =>
  (p) => ({
    ...p,
    limits: { ...p.limits, zones: removeAt(p.limits.zones ?? [], index) },
  });

export const setWire =
  (wire: WireSpec): Edit =>
  (p) => ({ ...p, wire });

/**
 * Set one end's fitting. Without fittings in the file the other end takes the same kind (shown
 * at once, to be changed); `undefined` removes the fittings of both ends (no reduction).
 */
export const setEndFitting =
  (end: 'start' | 'end', fitting: EndFitting | undefined): Edit =>
  (p) => {
    const { endFittings: old, ...rest } = p.limits;
    if (!fitting) return { ...p, limits: rest };
    const both = old ?? { start: fitting, end: fitting };
    return { ...p, limits: { ...rest, endFittings: { ...both, [end]: fitting } } };
  };

export const patchLoad =
  (index: number, patch: Partial<Load>): Edit =>
  (p) => ({ ...p, loads: replaceAt(p.loads, index, { ...p.loads[index], ...patch } as Load) });

export const addLoad =
  (kind: Load['type']): Edit =>
  (p) => {
    const first = p.supports[0].x;
    const last = p.supports[p.supports.length - 1].x;
    const load: Load =
      kind === 'point'
        ? { type: 'point', x: (first + last) / 2, mass: 1, label: 'Lamp' }
        : { type: 'uniform', from: first, to: last, massPerLength: 0.1, label: 'Cable' };
    return { ...p, loads: [...p.loads, load] };
  };

export const removeLoad =
  (index: number): Edit =>
  (p) => ({
    ...p,
    loads: removeAt(p.loads, index),
  });

export const patchInstallation =
  (patch: Partial<Installation>): Edit =>
  (p) => ({ ...p, installation: { ...p.installation, ...patch } });

export const setTarget =
  (target: InstallationTarget): Edit =>
  (p) => ({ ...p, installation: { ...p.installation, target } });

export const patchCase =
  (index: number, patch: Partial<WeatherCase>): Edit =>
  (p) => {
    const old = p.cases[index];
    const cases = replaceAt(p.cases, index, { ...old, ...patch });
    // A target stated in a renamed case follows the new name.
    const target = p.installation.target;
    const renamed = patch.name !== undefined && target.case === old.name;
    const installation = renamed
      ? { ...p.installation, target: { ...target, case: patch.name } }
      : p.installation;
    return { ...p, cases, installation };
  };

function freeName(p: Project, base: string): string {
  const names = new Set(p.cases.map((c) => c.name));
  for (let n = 1; ; n++) {
    const name = n === 1 ? base : `${base} (${n})`;
    if (!names.has(name)) return name;
  }
}

export const addCase = (): Edit => (p) => ({
  ...p,
  cases: [
    ...p.cases,
    {
      name: freeName(p, 'New case'),
      temperature: 20,
      iceThickness: 0,
      windSpeed: 0,
      withLoads: true,
    },
  ],
});

export const duplicateCase =
  (index: number): Edit =>
  (p) => {
    const source = p.cases[index];
    const copy = { ...source, name: freeName(p, source.name) };
    return { ...p, cases: insertAt(p.cases, index + 1, copy) };
  };

/** A target stated in the removed case is carried back to the installation by commit(). */
export const removeCase =
  (index: number): Edit =>
  (p) => ({ ...p, cases: removeAt(p.cases, index) });

export const patchLimits =
  (patch: Partial<Limits>): Edit =>
  (p) => ({ ...p, limits: { ...p.limits, ...patch } });

export const patchModel =
  (patch: Partial<ModelSettings>): Edit =>
  (p) => ({ ...p, model: { ...p.model, ...patch } });
