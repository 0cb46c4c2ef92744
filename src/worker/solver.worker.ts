/**
 * The solver worker: validates and solves each document it is sent and replies with the
 * request's id, so the main thread can drop replies to requests it no longer wants.
 */
import { INTERNAL_ERROR_MESSAGE, solveProject, validateProject } from '../core/index.ts';
import { answerDesign } from './designAnswers.ts';
import type { SolveReply, SolveRequest, WorkerMessage } from './protocol.ts';

function solve(request: SolveRequest): SolveReply {
  const checked = validateProject(request.project);
  if (!checked.ok) {
    const reasons = checked.issues.map((issue) => `${issue.path} ${issue.message}`).join('; ');
    return { id: request.id, ok: false, message: reasons };
  }
  try {
    const results = solveProject(checked.project);
    if (!request.design) return { id: request.id, ok: true, results };
    const design = answerDesign(checked.project, results, request.design);
    return { id: request.id, ok: true, results, design };
  } catch {
    // The core does not throw; should it ever, the person gets a sentence, not the raw error.
    return { id: request.id, ok: false, message: INTERNAL_ERROR_MESSAGE };
  }
}

const scope = globalThis as unknown as {
  onmessage: ((event: MessageEvent<SolveRequest>) => void) | null;
  postMessage(message: WorkerMessage): void;
  navigator?: { locks?: { request(name: string, callback: () => Promise<void>): unknown } };
};

scope.onmessage = (event) => scope.postMessage(solve(event.data));

// Held until this worker ends: its release is the main thread's signal that the worker is gone.
const locks = scope.navigator?.locks;
if (locks) {
  const lock = `sagwright-solver-${Date.now()}-${Math.random().toString(36).slice(2)}`;
  locks.request(lock, () => {
    scope.postMessage({ alive: true, lock });
    return new Promise<void>(() => {});
  });
}
