/**
 * Validation of the installation: its temperature and loads, and the one target that fixes the
 * installation tension (horizontal tension, largest tension, sag or cut length), each inside its
 * physical range; a sag under half its span, a cut length 0.5–2 × the straight-line length.
 */
import { type FieldRange, RANGES } from './fieldRanges.ts';
import type { FieldChecker } from './validateFields.ts';

export interface SupportXZ {
  x: number;
  z?: number;
}

const TARGET_KINDS = ['horizontalTension', 'maxTension', 'sag', 'unstressedLength'] as const;

function targetRange(kind: (typeof TARGET_KINDS)[number]): FieldRange {
  if (kind === 'sag') return RANGES.targetSag;
  if (kind === 'unstressedLength') return { min: 0.1, max: 40_000, unit: 'm' };
  return RANGES.targetTension;
}

/** Total chord length: the straight lines between neighbouring supports, m. */
function chordLength(supports: readonly SupportXZ[]): number {
  let total = 0;
  for (let j = 1; j < supports.length; j++)
    total += Math.hypot(
      supports[j].x - supports[j - 1].x,
      (supports[j].z ?? 0) - (supports[j - 1].z ?? 0),
    );
  return total;
}

function checkCutLength(c: FieldChecker, lengthM: number, chordM: number): void {
  const { min, max } = RANGES.cutLengthRatio;
  if (chordM > 0 && (lengthM < min * chordM || lengthM > max * chordM))
    c.fail(
      'installation.target.unstressedLength',
      `must be ${min} to ${max} times the straight-line length between the supports (${(min * chordM).toPrecision(4)} to ${(max * chordM).toPrecision(4)} m)`,
    );
}

export function checkInstallation(
  c: FieldChecker,
  raw: unknown,
  supports: readonly SupportXZ[],
  caseNames: string[],
): void {
  const spanLengths = supports.slice(1).map((s, j) => s.x - supports[j].x);
  const chords = chordLength(supports);
  const inst = c.object(raw, 'installation', ['temperature', 'withLoads', 'target']);
  if (!inst) return;
  c.inRange(inst.temperature, 'installation.temperature', RANGES.temperature);
  c.boolean(inst.withLoads, 'installation.withLoads');
  const t = c.object(inst.target, 'installation.target', [...TARGET_KINDS, 'span', 'case']);
  if (!t) return;
  const kinds = TARGET_KINDS.filter((k) => t[k] !== undefined);
  if (kinds.length !== 1) {
    c.fail('installation.target', `must hold exactly one of ${TARGET_KINDS.join(', ')}`);
    return;
  }
  const kind = kinds[0];
  const value = c.inRange(t[kind], `installation.target.${kind}`, targetRange(kind));
  if (kind === 'unstressedLength' && value !== undefined) checkCutLength(c, value, chords);
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
