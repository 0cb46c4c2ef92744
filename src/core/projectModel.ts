/**
 * The solver's model of a (validated) project: resolved wire, environment and settings, one
 * SpanModel per span (meshed with a node at every load position), the sections that keep one
 * horizontal tension after installation (spans joined by free supports), and the load states.
 */

import type { WireLoading } from './lengthCompatibility.ts';
import { caseLoads, type LoadState, loadBreakpoints } from './loads.ts';
import {
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

export interface ProjectModel {
  project: Project;
  wire: WireProperties;
  env: Environment;
  settings: ModelSettings;
  spans: SpanModel[];
  /** Span indices grouped by sections (split at clamped intermediate supports). */
  sections: number[][];
  installation: NamedState;
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
  const sections: number[][] = [[]];
  const s = project.supports;
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
    sections[sections.length - 1].push(j);
    if (j + 2 < s.length && !s[j + 1].free) sections.push([]);
  }
  const inst = project.installation;
  return {
    project,
    wire,
    env,
    settings,
    spans,
    sections,
    installation: {
      name: INSTALLATION_NAME,
      temperature: inst.temperature,
      iceThicknessM: 0,
      windSpeedMPerS: 0,
      withLoads: inst.withLoads,
    },
  };
}

/**
 * Put a state's hung loads on every span and return the wire loading at its temperature.
 * Exact theory: the wire's mass is conserved, so its weight per unstressed metre scales by
 * 1 / (1 + α Δt). Parabolic theory: the weight acts per horizontal metre and does not change.
 */
export function prepareState(model: ProjectModel, state: LoadState): WireLoading {
  const loads = caseLoads(model.wire, model.project.loads, state, model.env);
  for (const span of model.spans) applyHungLoads(span, loads);
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
