/**
 * The as-built form's text → a measurement in SI (display units converted), or the reasons it
 * is refused in the words of the form's own labels. Pure, so it is tested without a browser.
 */
import {
  type AsBuiltKind,
  type AsBuiltMeasurement,
  type Project,
  validateAsBuilt,
} from '../../core/index.ts';
import { type Quantity, toSi, type UnitSystem, unitSymbol } from '../../core/units.ts';
import { parseNumber } from '../../deliverables/displayUnits.ts';

export interface AsBuiltForm {
  kind: AsBuiltKind;
  value: string;
  temperature: string;
  /** Sag only; empty for the set-up point. */
  x: string;
}

export const KIND_LABELS: Record<AsBuiltKind, string> = {
  sag: 'Sag below the line between the fixings',
  returnTime: 'Pulse return time',
  frequency: 'Plucked frequency',
  horizontalTension: 'Horizontal tension (gauge)',
};

const KIND_QUANTITY: Partial<Record<AsBuiltKind, Quantity>> = {
  sag: 'length',
  horizontalTension: 'force',
};

/** The unit the measured value is typed in. */
export function valueUnit(kind: AsBuiltKind, units: UnitSystem): string {
  const q = KIND_QUANTITY[kind];
  if (q) return unitSymbol(q, units);
  return kind === 'returnTime' ? 's' : 'Hz';
}

const FIELD_LABELS: Record<string, string> = {
  'asBuilt.temperature': 'Temperature',
  'asBuilt.value': 'Measured value',
  'asBuilt.x': 'Position',
  'asBuilt.kind': 'What was measured',
};

export function measurementFromForm(
  form: AsBuiltForm,
  project: Project,
  units: UnitSystem,
): { measurement?: AsBuiltMeasurement; issues: string[] } {
  const issues: string[] = [];
  const read = (text: string, label: string, quantity?: Quantity) => {
    const shown = parseNumber(text);
    if (shown === undefined) {
      issues.push(`${label}: must be a number`);
      return undefined;
    }
    return quantity ? toSi(shown, quantity, units) : shown;
  };
  const temperature = read(form.temperature, 'Temperature', 'temperature');
  const value = read(form.value, 'Measured value', KIND_QUANTITY[form.kind]);
  const wantsX = form.kind === 'sag' && form.x.trim() !== '';
  const x = wantsX ? read(form.x, 'Position', 'length') : undefined;
  if (temperature === undefined || value === undefined || (wantsX && x === undefined))
    return { issues };
  const measurement: AsBuiltMeasurement = {
    temperature,
    kind: form.kind,
    value,
    ...(x !== undefined ? { x } : {}),
  };
  const refused = validateAsBuilt(project, measurement);
  if (refused.length > 0)
    return { issues: refused.map((i) => `${FIELD_LABELS[i.path] ?? i.path}: ${i.message}`) };
  return { measurement, issues: [] };
}

/** Whether two measurements are the same reading (the results answer the one on screen). */
export function sameMeasurement(a: AsBuiltMeasurement | null, b: AsBuiltMeasurement | null) {
  if (!a || !b) return false;
  return a.kind === b.kind && a.value === b.value && a.temperature === b.temperature && a.x === b.x;
}
