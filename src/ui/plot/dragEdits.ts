/**
 * What can be dragged on the side view, and the edits a drag makes: each fixing (along the span
 * and up or down) and each point load (along the wire). Positions are SI metres; the plot works
 * in display units. A refused position is told in the words the inputs use ("Studio wall
 * bracket Position: …"), with the document path as a detail.
 */
import type { Project, ProjectResults, ValidationIssue } from '../../core/index.ts';
import { fromSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import type { Edit } from '../../state/commit.ts';
import { patchLoad, patchSupport } from '../../state/projectEdits.ts';
import { localiseRule } from '../fields/useDocumentEdit.ts';

export interface DragHandle {
  /** Stable key: "supports[1]" or "loads[2]" (the document path of the item). */
  key: string;
  kind: 'support' | 'load';
  index: number;
  /** The item's name as the inputs show it. */
  name: string;
  /** Position along the span, m. */
  x: number;
  /** Height, m: the fixing's own, or the wire's under a point load. */
  z: number;
}

export function supportName(project: Project, index: number): string {
  return project.supports[index]?.label || `Fixing ${index + 1}`;
}

function loadName(project: Project, index: number): string {
  return project.loads[index]?.label || `Load ${index + 1}`;
}

/** Height of the installed wire at x (linear between profile points), or null. */
export function wireHeightAt(results: ProjectResults | null, x: number): number | null {
  const profile = results?.cases.find((c) => c.solved && c.profile)?.profile;
  if (!profile || profile.x.length === 0) return null;
  const xs = profile.x;
  if (x <= xs[0]) return profile.z[0];
  for (let i = 1; i < xs.length; i++) {
    if (x <= xs[i]) {
      const t = xs[i] === xs[i - 1] ? 0 : (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return profile.z[i - 1] + t * (profile.z[i] - profile.z[i - 1]);
    }
  }
  return profile.z[profile.z.length - 1];
}

/** The handles for the document on screen: every fixing and every point load. */
export function dragHandles(project: Project, results: ProjectResults | null): DragHandle[] {
  const handles: DragHandle[] = project.supports.map((s, index) => ({
    key: `supports[${index}]`,
    kind: 'support',
    index,
    name: supportName(project, index),
    x: s.x,
    z: s.z,
  }));
  project.loads.forEach((load, index) => {
    if (load.type !== 'point') return;
    const z = wireHeightAt(results, load.x);
    if (z === null) return;
    handles.push({
      key: `loads[${index}]`,
      kind: 'load',
      index,
      name: loadName(project, index),
      x: load.x,
      z,
    });
  });
  return handles;
}

/** The edit that puts a handle at (x, z), m; a point load takes x only. */
export function moveEdit(handle: DragHandle, x: number, z: number): Edit {
  return handle.kind === 'support'
    ? patchSupport(handle.index, { x, z })
    : patchLoad(handle.index, { x });
}

/** Round a display-unit value to a hundredth, the inputs' own resolution for lengths. */
export function snap(value: number): number {
  return Math.round(value * 100) / 100;
}

const FIELD_LABEL: Record<string, string> = {
  x: 'Position',
  z: 'Height',
  from: 'From',
  to: 'To',
};

/** A document path in the words the inputs use, e.g. "Festoon cable with lamps To". */
export function fieldWords(project: Project, path: string): string {
  let m = /^supports\[(\d+)\]\.(x|z)$/.exec(path);
  if (m) return `${supportName(project, Number(m[1]))} ${FIELD_LABEL[m[2]]}`;
  m = /^loads\[(\d+)\]\.(x|from|to)$/.exec(path);
  if (m) return `${loadName(project, Number(m[1]))} ${FIELD_LABEL[m[2]]}`;
  m = /^limits\.zones\[(\d+)\]\.(from|to)$/.exec(path);
  if (m) {
    const zone = project.limits.zones?.[Number(m[1])];
    return `${zone?.label || `Zone ${Number(m[1]) + 1}`} ${FIELD_LABEL[m[2]]}`;
  }
  m = /^ground\[(\d+)\]\.(x|z)$/.exec(path);
  if (m) return `Ground point ${Number(m[1]) + 1} ${FIELD_LABEL[m[2]]}`;
  if (path === 'installation.target.sag') return 'Sag target';
  return path;
}

/**
 * Why a position was refused, naming the field as the inputs show it: the dragged field's own
 * rule first, else what the move would break elsewhere. Lengths in display units.
 */
export function refusalText(
  project: Project,
  handle: DragHandle,
  attempted: { x: number; z: number },
  issues: readonly ValidationIssue[],
  units: UnitSystem,
): { text: string; details: string[] } {
  const own = [`${handle.key}.x`, `${handle.key}.z`];
  const first = issues.find((i) => own.includes(i.path)) ?? issues[0];
  const length = (m: number) =>
    `${fromSi(m, 'length', units).toFixed(2)} ${unitSymbol('length', units)}`;
  const where =
    handle.kind === 'support'
      ? `${length(attempted.x)} along, ${length(attempted.z)} high`
      : `${length(attempted.x)} along`;
  const rule = first ? localiseRule(first.message, 'length', units) : 'is not allowed';
  const field = first?.path ? fieldWords(project, first.path) : handle.name;
  const text = own.includes(first?.path ?? '')
    ? `${field}: ${rule}. ${handle.name} stays where it was.`
    : `${handle.name} cannot go to ${where}: ${field} ${rule}. It stays where it was.`;
  return { text, details: issues.map((i) => (i.path ? `${i.path}: ${i.message}` : i.message)) };
}
