/**
 * The solver's work budget. The cost of a project grows with elements × states (each state is a
 * few tri-diagonal solves per root-finding step), so the mesh is coarsened, never the physics:
 * at most ELEMENT_BUDGET elements over all spans, and at most STATE_ELEMENT_BUDGET element-states
 * (elements over all spans × (weather cases + installation)). A coarsened mesh is reported in
 * words and its discretisation error is estimated as for any mesh.
 */
import { DEFAULT_MODEL, type Project } from './project.ts';
import type { ProjectModel } from './projectModel.ts';

export const ELEMENT_BUDGET = 20_000;
export const STATE_ELEMENT_BUDGET = 50_000;

export interface MeshPlan {
  elementsPerSpan: number;
  /** Set when the requested mesh was coarsened, saying from what to what and why. */
  notice?: string;
}

export function planMesh(project: Project): MeshPlan {
  const requested = project.model?.elementsPerSpan ?? DEFAULT_MODEL.elementsPerSpan;
  const spans = Math.max(1, project.supports.length - 1);
  const states = project.cases.length + 1;
  const allowed = Math.max(
    2,
    Math.floor(Math.min(ELEMENT_BUDGET / spans, STATE_ELEMENT_BUDGET / (spans * states))),
  );
  if (requested <= allowed) return { elementsPerSpan: requested };
  return {
    elementsPerSpan: allowed,
    notice: `Mesh coarsened from ${requested} to ${allowed} elements per span to keep the work within the solver's budget (${spans} span${spans === 1 ? '' : 's'} × ${states} states, at most ${STATE_ELEMENT_BUDGET.toLocaleString('en')} element-states); the discretisation error estimate covers the coarser mesh.`,
  };
}

/** True when the model's mesh, refined by `factor`, stays within the element-state budget. */
export function withinBudget(model: ProjectModel, factor: number): boolean {
  const elements = model.spans.reduce((sum, span) => sum + span.mesh.elementCount, 0);
  const states = model.project.cases.length + 1;
  return factor * elements <= ELEMENT_BUDGET && factor * elements * states <= STATE_ELEMENT_BUDGET;
}
