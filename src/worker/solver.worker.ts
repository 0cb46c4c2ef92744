/**
 * The solver worker: validates and solves each document it is sent and replies with the
 * request's id, so the main thread can drop replies to requests it no longer wants.
 */
import { INTERNAL_ERROR_MESSAGE, solveProject, validateProject } from '../core/index.ts';
import type { SolveReply, SolveRequest } from './protocol.ts';

function solve(request: SolveRequest): SolveReply {
  const checked = validateProject(request.project);
  if (!checked.ok) {
    const reasons = checked.issues.map((issue) => `${issue.path} ${issue.message}`).join('; ');
    return { id: request.id, ok: false, message: reasons };
  }
  try {
    return { id: request.id, ok: true, results: solveProject(checked.project) };
  } catch {
    // The core does not throw; should it ever, the person gets a sentence, not the raw error.
    return { id: request.id, ok: false, message: INTERNAL_ERROR_MESSAGE };
  }
}

const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(reply: SolveReply): void;
};

scope.onmessage = (event) => scope.postMessage(solve(event.data));
