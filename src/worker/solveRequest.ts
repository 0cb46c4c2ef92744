/**
 * One solve request answered: the document validated and solved (with the as-built check when a
 * measurement is set, and the design aids when asked and an answerer is given). The solver
 * worker answers every request this way; the page answers a small first document itself.
 */
import {
  INTERNAL_ERROR_MESSAGE,
  type Project,
  solveAsBuilt,
  solveProject,
  validateAsBuilt,
  validateProject,
} from '../core/index.ts';
import type { DesignAnswers, DesignQuestion } from './designAnswers.ts';
import type { SolveReply, SolveRequest } from './protocol.ts';

export type DesignAnswerer = (
  project: Project,
  results: ReturnType<typeof solveProject>,
  question: DesignQuestion,
) => DesignAnswers;

export function solveRequest(request: SolveRequest, answerDesign?: DesignAnswerer): SolveReply {
  const checked = validateProject(request.project);
  if (!checked.ok) {
    const reasons = checked.issues.map((issue) => `${issue.path} ${issue.message}`).join('; ');
    return { id: request.id, ok: false, message: reasons };
  }
  try {
    const results = solveProject(checked.project);
    const m = request.asBuilt;
    if (m && validateAsBuilt(checked.project, m).length === 0)
      results.asBuilt = solveAsBuilt(checked.project, m, results);
    if (!request.design || !answerDesign) return { id: request.id, ok: true, results };
    const design = answerDesign(checked.project, results, request.design);
    return { id: request.id, ok: true, results, design };
  } catch {
    // The core does not throw; should it ever, the person gets a sentence, not the raw error.
    return { id: request.id, ok: false, message: INTERNAL_ERROR_MESSAGE };
  }
}

/** Elements over all spans the page solves itself at the start (about 2 ms for the demo). */
export const FIRST_SOLVE_HERE_ELEMENTS = 2000;

/**
 * The page's own answer to its first request, when the document is small and asks no design
 * aids: the first result then needs no worker, so the page shows it before the worker's script
 * is fetched. Null for anything else (the worker answers).
 */
export function solveFirstHere(request: SolveRequest): SolveReply | null {
  if (request.design) return null;
  const p = request.project as Partial<Project> | undefined;
  const spans = Array.isArray(p?.supports) ? p.supports.length - 1 : Number.NaN;
  const perSpan = p?.model?.elementsPerSpan;
  const order = p?.model?.elementOrder === 2 ? 2 : 1;
  const cases = Array.isArray(p?.cases) ? p.cases.length : Number.NaN;
  if (typeof perSpan !== 'number' || !(spans >= 1)) return null;
  if (!(spans * perSpan * order <= FIRST_SOLVE_HERE_ELEMENTS) || !(cases <= 12)) return null;
  return solveRequest(request);
}
