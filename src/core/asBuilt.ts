/**
 * As-built check: one site measurement at temperature t (sag at a point, pulse-return time,
 * plucked frequency or horizontal tension) → the installed cut length L₀, then every case again.
 * Measured state: the wire pulled through all spans to one H at t, no ice or wind, with the
 * installation loads (wave checks: the bare wire). H solves ln q(H) = ln q_measured (secant, then
 * Brent, in ln H); L₀ = (unstressed length at t) / (1 + α (t − t₀)), m.
 */
import { largestSpanSag } from './caseChecks.ts';
import { pulseReturnTime } from './fieldChecks.ts';
import { targetSpanIndex } from './installation.ts';
import { solveSectionAtTension } from './lengthCompatibility.ts';
import type { CaseResult, Project, ProjectResults } from './project.ts';
import {
  buildProjectModel,
  type ProjectModel,
  prepareState,
  thermalFactor,
} from './projectModel.ts';
import { solveNearlyLinear } from './rootFind.ts';
import { solveProject } from './solveProject.ts';
import { heightAt } from './spanGeometry.ts';
import { FieldChecker, type ValidationIssue } from './validateFields.ts';

export const AS_BUILT_KINDS = ['sag', 'returnTime', 'frequency', 'horizontalTension'] as const;
export type AsBuiltKind = (typeof AS_BUILT_KINDS)[number];

export interface AsBuiltMeasurement {
  /** °C at the time of the measurement. */
  temperature: number;
  kind: AsBuiltKind;
  /** m (sag), s (returnTime), Hz (frequency) or N (horizontalTension). */
  value: number;
  /** Sag only: m along the line where it was measured; default the set-up point. */
  x?: number;
}

export interface AsBuiltResult {
  measurement: AsBuiltMeasurement & {
    /** The span measured (0-based). */
    span: number;
    /** Whether the hung loads were on the wire in the measured state. */
    withLoads: boolean;
    /** Horizontal tension the measurement implies at its temperature, N. */
    horizontalTension: number;
  };
  unstressedLength: number;
  designUnstressedLength: number;
  /** As built minus design cut length, m (positive: longer wire, more sag). */
  lengthDifference: number;
  solved: boolean;
  ok: boolean;
  messages: string[];
  cases: CaseResult[];
}

const UNITS: Record<AsBuiltKind, string> = {
  sag: 'm',
  returnTime: 's',
  frequency: 'Hz',
  horizontalTension: 'N',
};

/** Refuse a measurement that is missing, non-finite or out of range; paths start "asBuilt.". */
export function validateAsBuilt(project: Project, raw: unknown): ValidationIssue[] {
  const c = new FieldChecker();
  const m = c.object(raw, 'asBuilt', ['temperature', 'kind', 'value', 'x']);
  if (!m) return c.issues;
  c.number(m.temperature, 'asBuilt.temperature', -80, 80);
  const kind = c.oneOf(m.kind, 'asBuilt.kind', AS_BUILT_KINDS);
  const value = c.positive(m.value, 'asBuilt.value');
  const xs = project.supports.map((s) => s.x);
  let x: number | undefined;
  if (m.x !== undefined) {
    if (kind !== 'sag') c.fail('asBuilt.x', 'applies to a sag measurement only');
    const at = c.number(m.x, 'asBuilt.x', xs[0], xs[xs.length - 1], {
      minExclusive: true,
      maxExclusive: true,
    });
    if (at !== undefined && xs.some((s) => Math.abs(s - at) < 1e-6))
      c.fail('asBuilt.x', 'must be inside a span, not at a support');
    x = at;
  }
  if (kind === 'sag' && value !== undefined) {
    const lengths = xs.slice(1).map((s, j) => s - xs[j]);
    const target = project.installation.target;
    const j =
      x !== undefined
        ? Math.max(0, xs.findIndex((s) => s > x) - 1)
        : (target.span ?? lengths.indexOf(Math.max(...lengths)));
    if (value >= lengths[j] / 2)
      c.fail('asBuilt.value', `must be less than half the span (${(lengths[j] / 2).toFixed(3)} m)`);
  }
  return c.issues;
}

function spanIndexAt(model: ProjectModel, x: number): number {
  const j = model.spans.findIndex((s) => x <= s.x1);
  return j < 0 ? model.spans.length - 1 : j;
}

/** The measured quantity of the pulled-through wire at horizontal tension H (state prepared). */
function measureAt(model: ProjectModel, m: AsBuiltMeasurement, spanIndex: number, H: number) {
  const span = model.spans[spanIndex];
  if (m.kind === 'horizontalTension') return H;
  if (m.kind === 'sag') {
    if (m.x === undefined) return largestSpanSag({ span, tensionN: H });
    return span.z0 + span.chordSlope * (m.x - span.x0) - heightAt(span, H, m.x);
  }
  const time = pulseReturnTime(span, H, {
    massPerLength: model.wire.massPerLength,
    axialStiffness: model.wire.axialStiffness,
    thermalFactor: thermalFactor(model, m.temperature),
  });
  return m.kind === 'returnTime' ? time : 1 / time;
}

/** Horizontal tension at the measurement and the cut length it implies (m, at t₀). */
function backCompute(
  model: ProjectModel,
  m: AsBuiltMeasurement,
  withLoads: boolean,
  guessN: number,
) {
  const state = { ...model.installation, temperature: m.temperature, withLoads };
  const wire = prepareState(model, state);
  const spanIndex =
    m.kind === 'sag' && m.x !== undefined
      ? spanIndexAt(model, m.x)
      : targetSpanIndex(model, model.project.installation.target);
  const at = (H: number) => {
    const r = solveSectionAtTension(model.spans, wire, H);
    return r.converged ? measureAt(model, m, spanIndex, H) : Number.NaN;
  };
  let H = m.value;
  let converged = true;
  if (m.kind !== 'horizontalTension') {
    // In logarithms q is nearly linear in ln H: slope −1 for sag, ∓½ for the wave checks.
    const sign = m.kind === 'frequency' ? 1 : -1;
    const slope = m.kind === 'sag' ? 1 : 0.5;
    const f = (lnH: number) => {
      const q = at(Math.exp(lnH));
      return q > 0 && Number.isFinite(q) ? sign * (Math.log(q) - Math.log(m.value)) : Number.NaN;
    };
    const root = solveNearlyLinear(f, Math.log(guessN), slope, 1e-13);
    H = Math.exp(root.x);
    converged = root.converged;
  }
  const r = solveSectionAtTension(model.spans, wire, H);
  const atT = model.spans.reduce(
    (sum, s) => sum + s.unstressedElement.reduce((a, b) => a + b, 0),
    0,
  );
  return {
    H,
    spanIndex,
    converged: converged && r.converged,
    unstressedLength: atT / thermalFactor(model, m.temperature),
  };
}

/**
 * Back-compute the cut length from a measurement (validated with validateAsBuilt) and solve every
 * case with it. `design` (the project's own results) saves solving the design again.
 */
export function solveAsBuilt(
  project: Project,
  m: AsBuiltMeasurement,
  design: ProjectResults = solveProject(project),
): AsBuiltResult {
  // The design's own mesh (after its automatic refinement), so a reading of the design gives
  // back the design's cut length exactly.
  const model = buildProjectModel(project, design.mesh?.refinement ?? 1);
  const wave = m.kind === 'returnTime' || m.kind === 'frequency';
  const withLoads = wave ? false : project.installation.withLoads;
  const guess = design.cases[0]?.horizontalTension;
  const found = backCompute(model, m, withLoads, guess > 0 ? guess : m.value);
  const messages: string[] = [];
  if (wave && project.loads.length > 0)
    messages.push(
      'Pulse and pluck checks hold for the bare wire: the measurement is taken as made before anything was hung (a hung load reflects the pulse).',
    );
  const designLength = design.unstressedLength;
  const base = {
    measurement: { ...m, span: found.spanIndex, withLoads, horizontalTension: found.H },
    designUnstressedLength: designLength,
  };
  if (!found.converged) {
    const text = `the measured ${m.kind} ${m.value} ${UNITS[m.kind]} at ${m.temperature} °C cannot be reached with this wire and these loads`;
    return {
      ...base,
      unstressedLength: Number.NaN,
      lengthDifference: Number.NaN,
      solved: false,
      ok: false,
      messages: [...messages, `As built: ${text}.`],
      cases: [],
    };
  }
  const asBuiltProject: Project = {
    ...project,
    installation: { ...project.installation, target: { unstressedLength: found.unstressedLength } },
  };
  const cases = solveProject(asBuiltProject).cases;
  return {
    ...base,
    unstressedLength: found.unstressedLength,
    lengthDifference: found.unstressedLength - designLength,
    solved: cases.every((c) => c.solved),
    ok: cases.every((c) => c.ok),
    messages,
    cases,
  };
}
