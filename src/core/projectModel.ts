/**
 * The solver's model of a (validated) project: resolved wire, environment and settings, one
 * SpanModel per span (meshed with a node at every load position), the sections whose wire can
 * pass between spans (split at clamped supports) with what each joint keeps equal (pulley:
 * tension; swing link: horizontal tension), the joints at installation, and the load states.
 */

import type { JointKind, WireLoading } from './lengthCompatibility.ts';
import { caseLoads, type LoadState, loadBreakpoints, type PointForce } from './loads.ts';
import {
  type Attachment,
  DEFAULT_ENVIRONMENT,
  DEFAULT_MODEL,
  type Environment,
  type ModelSettings,
  type Project,
} from './project.ts';
import { applyHungLoads, createSpanModel, type SpanModel } from './spanModel.ts';
import { resolveWire, type WireProperties } from './wireCatalog.ts';

export interface NamedState extends LoadState {
  name: string;
}

export interface Section {
  /** Span indices, in order. */
  spans: number[];
  /** Between consecutive spans: what the support keeps equal on its two sides. */
  joints: JointKind[];
}

export interface ProjectModel {
  project: Project;
  wire: WireProperties;
  env: Environment;
  settings: ModelSettings;
  spans: SpanModel[];
  /** Each support's attachment; the two ends are "end". */
  attachments: (Attachment | 'end')[];
  /** Spans grouped by sections (split at clamped intermediate supports). */
  sections: Section[];
  /**
   * Joints of the whole line at installation (and in the set-up chart): a pulley keeps the
   * tension equal, every other support the horizontal tension (see doc/model.md).
   */
  installationJoints: JointKind[];
  /** Point loads placed exactly at each support in the last prepared state, N: downward. */
  supportForcesN: number[];
  /** … and sideways (wind on the item), N. */
  supportLateralN: number[];
  installation: NamedState;
  /** The mesh refinement the model was built with (every element split this many times). */
  refinement: number;
}

export const INSTALLATION_NAME = 'Installation';

/** The model of a project; `refinement` k splits every element of the project's mesh into k. */
export function buildProjectModel(project: Project, refinement = 1): ProjectModel {
  const settings: ModelSettings = { ...DEFAULT_MODEL, ...project.model };
  const env: Environment = { ...DEFAULT_ENVIRONMENT, ...project.environment };
  const wire = resolveWire(project.wire);
  if (!wire) throw new Error('wire: unknown catalogue id');
  const breakpoints = loadBreakpoints(project.loads);
  const spans: SpanModel[] = [];
  const s = project.supports;
  const attachments = s.map((support, i) =>
    i === 0 || i === s.length - 1 ? ('end' as const) : (support.attachment ?? 'clamped'),
  );
  for (let j = 0; j + 1 < s.length; j++) {
    spans.push(
      createSpanModel(
        s[j].x,
        s[j].z,
        s[j + 1].x,
        s[j + 1].z,
        breakpoints,
        settings.elementsPerSpan,
        settings.elementOrder,
        refinement,
      ),
    );
  }
  const inst = project.installation;
  return {
    project,
    refinement,
    wire,
    env,
    settings,
    spans,
    attachments,
    sections: sectionsOf(attachments),
    installationJoints: attachments
      .slice(1, -1)
      .map((a) => (a === 'pulley' ? 'tension' : 'horizontal')),
    supportForcesN: attachments.map(() => 0),
    supportLateralN: attachments.map(() => 0),
    installation: {
      name: INSTALLATION_NAME,
      temperature: inst.temperature,
      iceThicknessM: 0,
      windSpeedMPerS: 0,
      withLoads: inst.withLoads,
    },
  };
}

/** Sections split at clamped supports; a pulley joint keeps T equal, a swing link H. */
function sectionsOf(attachments: readonly (Attachment | 'end')[]): Section[] {
  const sections: Section[] = [{ spans: [0], joints: [] }];
  for (let i = 1; i + 1 < attachments.length; i++) {
    const a = attachments[i];
    const last = sections[sections.length - 1];
    if (a === 'clamped' || a === 'end') sections.push({ spans: [i], joints: [] });
    else {
      last.spans.push(i);
      last.joints.push(a === 'pulley' ? 'tension' : 'horizontal');
    }
  }
  return sections;
}

/**
 * The support a point load at x sits on, or −1 inside a span. It mirrors applyHungLoads: a point
 * within its span's tolerance of a span end is left out of the span and carried by the support.
 */
export function supportIndexAt(spans: readonly SpanModel[], x: number): number {
  for (let j = 0; j < spans.length; j++) {
    const span = spans[j];
    const tol = 1e-9 * Math.max(1, span.x1 - span.x0);
    if (x <= span.x0 + tol) return j;
    if (x < span.x1 - tol) return -1;
    if (x <= span.x1 + tol) return j + 1;
  }
  return -1;
}

/** Sum of the point loads at each support (they go straight into that support), N. */
function forcesAtSupports(model: ProjectModel, points: readonly PointForce[]) {
  model.supportForcesN.fill(0);
  model.supportLateralN.fill(0);
  for (const p of points) {
    const i = supportIndexAt(model.spans, p.x);
    if (i < 0) continue;
    model.supportForcesN[i] += p.forceN;
    model.supportLateralN[i] += p.lateralN;
  }
}

/**
 * Put a state's hung loads on every span and return the wire loading at its temperature.
 * Exact theory: the wire's mass is conserved, so its weight per unstressed metre scales by
 * 1 / (1 + α Δt). Parabolic theory: the weight acts per horizontal metre and does not change.
 */
export function prepareState(model: ProjectModel, state: LoadState): WireLoading {
  const loads = caseLoads(model.wire, model.project.loads, state, model.env);
  for (const span of model.spans) applyHungLoads(span, loads);
  forcesAtSupports(model, loads.points);
  const thermal = model.settings.theory === 'exact' ? thermalFactor(model, state.temperature) : 1;
  const bareWeight = model.wire.massPerLength * model.env.gravity;
  return {
    theory: model.settings.theory,
    axialStiffness: model.wire.axialStiffness,
    weightNPerM: bareWeight / thermal + (loads.wireWeightNPerM - bareWeight),
    windNPerM: loads.wireWindNPerM,
  };
}

export function thermalFactor(model: ProjectModel, temperature: number): number {
  return 1 + model.wire.thermalExpansion * (temperature - model.installation.temperature);
}
