/**
 * Main-thread side of the solver worker. At most one request is in flight; a newer document
 * waits as the single pending request (the newest replaces any older one), replies to
 * superseded requests are dropped, and a worker that dies or stops answering is replaced and
 * the latest request sent again. Nothing here blocks: every call returns at once.
 */
import type { AsBuiltMeasurement, Project, ProjectResults } from '../core/index.ts';
import type { DesignAnswers, DesignQuestion } from './designAnswers.ts';
import type {
  LockWaiter,
  SolveReply,
  SolveRequest,
  WorkerLike,
  WorkerMessage,
} from './protocol.ts';

export type SolveOutcome =
  | { ok: true; results: ProjectResults; project: Project; design?: DesignAnswers }
  | {
      ok: false;
      message: string;
      project: Project;
      /** 'design': the solver answered that this document cannot be solved; 'solver': the
       * solver itself could not load or run (the document may be fine). */
      cause: 'design' | 'solver';
    };

export interface SolverClientOptions {
  createWorker: () => WorkerLike;
  onOutcome: (outcome: SolveOutcome) => void;
  /** A request unanswered this long is taken as a hung worker (ms). */
  watchdogMs?: number;
  /** Restarts in a row without a reply before giving up on the request. */
  maxRestarts?: number;
  /** Web Locks, to learn the moment a worker ends (default: the browser's navigator.locks). */
  locks?: LockWaiter;
  /**
   * The page's own answer to the first request (null: the worker answers), delivered a moment
   * later as a reply would be: the first result then waits for no worker script.
   */
  firstHere?: (request: SolveRequest) => SolveReply | null;
  /** Start the worker once this settles (it is started sooner if a request needs it). */
  startWorkerAfter?: Promise<void>;
}

function browserLocks(): LockWaiter | undefined {
  const nav = (globalThis as { navigator?: { locks?: LockWaiter } }).navigator;
  return nav?.locks;
}

export class SolverClient {
  private worker: WorkerLike | undefined;
  private nextId = 1;
  private inFlight: SolveRequest | undefined;
  private pending: SolveRequest | undefined;
  private latestId = 0;
  private restarts = 0;
  private watchdog: ReturnType<typeof setTimeout> | undefined;
  /** Replies dropped because a newer request had been made (for tests and diagnostics). */
  dropped = 0;

  private answeredHere = false;
  private lastProject: Project | undefined;
  private disposed = false;

  constructor(private readonly options: SolverClientOptions) {
    options.startWorkerAfter?.then(() => {
      if (this.disposed || this.worker) return;
      // Started idle, it is given the document on screen to solve once (id 0: no request has
      // it, so the reply is dropped): the engine compiles the solver now, not at the first edit.
      const worker = this.ensureWorker();
      if (this.lastProject && !this.inFlight)
        worker.postMessage({ id: 0, project: this.lastProject });
    });
  }

  solve(project: Project, design?: DesignQuestion, asBuilt?: AsBuiltMeasurement): void {
    const request: SolveRequest = { id: this.nextId++, project };
    this.lastProject = project;
    if (design) request.design = design;
    if (asBuilt) request.asBuilt = asBuilt;
    this.latestId = request.id;
    if (this.inFlight) this.pending = request;
    else this.send(request);
  }

  dispose(): void {
    this.disposed = true;
    clearTimeout(this.watchdog);
    const worker = this.worker;
    this.worker = undefined; // first, so its released lock is not taken for a death
    worker?.terminate();
    this.inFlight = undefined;
    this.pending = undefined;
  }

  private ensureWorker(): WorkerLike {
    if (this.worker) return this.worker;
    const worker = this.options.createWorker();
    worker.onmessage = (event) => this.receiveMessage(worker, event.data);
    worker.onerror = (event) => {
      event.preventDefault?.();
      // A script that fails to load or start gives a bare Event; an uncaught error in the
      // worker gives an ErrorEvent with its message.
      this.restart(
        event.message ? `the solver stopped: ${event.message}` : 'the solver could not be loaded',
      );
    };
    worker.onmessageerror = () => this.restart('the solver sent an unreadable reply');
    this.worker = worker;
    return worker;
  }

  private send(request: SolveRequest): void {
    this.inFlight = request;
    this.pending = undefined;
    if (!this.answeredHere && !this.worker && this.options.firstHere) {
      this.answeredHere = true;
      const reply = this.options.firstHere(request);
      if (reply) {
        // As a worker's reply would: after this call has returned, and only if still wanted.
        setTimeout(() => {
          if (!this.disposed) this.receive(reply);
        }, 0);
        return;
      }
    }
    this.ensureWorker().postMessage(request);
    clearTimeout(this.watchdog);
    const ms = this.options.watchdogMs ?? 20_000;
    this.watchdog = setTimeout(() => this.restart(`no answer within ${ms / 1000} s`), ms);
  }

  private receiveMessage(worker: WorkerLike, message: WorkerMessage): void {
    if ('alive' in message) this.watchExit(worker, message.lock);
    else this.receive(message);
  }

  /** The worker's lock is granted to us only once the worker has ended: replace it then. */
  private watchExit(worker: WorkerLike, lock: string): void {
    const locks = this.options.locks ?? browserLocks();
    locks
      ?.request(lock, () => {
        if (this.worker === worker) this.restart('the solver stopped without a word');
      })
      .catch(() => {
        // locks unavailable here: the watchdog still notices a worker that never answers
      });
  }

  private receive(reply: SolveReply): void {
    const request = this.inFlight;
    if (!request || reply.id !== request.id) return;
    clearTimeout(this.watchdog);
    this.inFlight = undefined;
    this.restarts = 0;
    if (reply.id === this.latestId) {
      this.options.onOutcome(
        reply.ok
          ? { ok: true, results: reply.results, project: request.project, design: reply.design }
          : { ok: false, message: reply.message, project: request.project, cause: 'design' },
      );
    } else {
      this.dropped += 1;
    }
    if (this.pending) this.send(this.pending);
  }

  private restart(reason: string): void {
    clearTimeout(this.watchdog);
    const worker = this.worker;
    this.worker = undefined; // first, so its released lock is not taken for a death
    worker?.terminate();
    const latest = this.pending ?? this.inFlight;
    this.inFlight = undefined;
    this.pending = undefined;
    if (!latest) return;
    this.restarts += 1;
    if (this.restarts > (this.options.maxRestarts ?? 3)) {
      this.restarts = 0;
      this.options.onOutcome({
        ok: false,
        message: reason,
        project: latest.project,
        cause: 'solver',
      });
      return;
    }
    this.send(latest);
  }
}
