/**
 * Full evaluations, run on worker threads, one per document at a time.
 *
 * The rules:
 * - a new evaluation of a document replaces the one still queued or running
 *   for it: the older one is cancelled and its promise settles with
 *   `cancelled` at once, so its results never reach the editor. Its worker
 *   is asked to stop before its next statement and, when it does so within
 *   `CANCEL_GRACE_MS`, goes back to the pool with its memo of the document
 *   (the newer evaluation waits for it, so as to evaluate only what changed);
 *   a worker still busy after that, inside a long statement, is terminated;
 * - at most `maxConcurrent` evaluations run at once; the others wait in the
 *   order they were asked for (a configuration change re-evaluates every open
 *   document, which must not start a thread for each);
 * - an evaluation running longer than its `timeoutMs` (counted from the
 *   moment the worker starts on it, so a worker still loading is not charged
 *   for that) is stopped, and the outcome names the statement it was on;
 * - `stop` ends an evaluation on the user's request in the same way.
 *
 * Workers come from a pool (./worker-pool.ts): a worker that finished goes
 * back to it, one that was stopped or crashed is discarded.
 */
import type { Analysis, Span } from '../language/index.js';
import { SYSTEM_CLOCK, type Clock } from './clock.js';
import type { EvaluationOptions, WorkerReply } from './evaluation-messages.js';
import type { WorkerHandle } from './worker-pool.js';

/**
 * How long a cancelled evaluation's worker may take to stop between two statements before it is
 * terminated. Statements are mostly far quicker; one that is not would keep the newer evaluation waiting.
 */
export const CANCEL_GRACE_MS = 60;

export interface EvaluationJob {
  text: string;
  options: EvaluationOptions;
  /** Milliseconds the evaluation may run; 0 means no limit. */
  timeoutMs: number;
  /** The worker has begun the evaluation. */
  onStart?: () => void;
  /** The worker is about to evaluate the statement at `span` (of `text`). */
  onStatement?: (span: Span) => void;
}

export type EvaluationOutcome =
  | { status: 'finished'; analysis: Analysis; elapsedMs: number }
  /** Replaced by a newer evaluation of the same document, or cancelled by the server (document closed). */
  | { status: 'cancelled' }
  /** Stopped before the end: it ran out of time, or the user asked. `statement` is where it was. */
  | { status: 'stopped'; reason: 'timeout' | 'user'; statement?: Span; elapsedMs: number }
  /** The worker failed; `outOfMemory` when it hit its memory limit. */
  | { status: 'failed'; message: string; outOfMemory: boolean; statement?: Span; elapsedMs: number };

/** The part of ./worker-pool.ts the scheduler needs. */
export interface WorkerSource {
  /** A worker, preferably one that has evaluated `document` before. */
  take(document?: string): WorkerHandle;
  giveBack(worker: WorkerHandle): void;
  discard(worker: WorkerHandle): void;
}

interface Entry {
  key: string;
  job: EvaluationJob;
  settle: (outcome: EvaluationOutcome) => void;
  worker?: WorkerHandle;
  requestId?: number;
  startedAt?: number;
  statement?: Span;
  timer?: unknown;
}

export class EvaluationScheduler {
  private readonly entries = new Map<string, Entry>();
  private readonly queue: Entry[] = [];
  /** Workers of cancelled evaluations that have been asked to stop, by document. They still count as running. */
  private readonly draining = new Map<string, WorkerHandle>();
  private running = 0;
  private nextRequestId = 1;

  constructor(
    private readonly workers: WorkerSource,
    private readonly maxConcurrent: number,
    private readonly clock: Clock = SYSTEM_CLOCK,
  ) {}

  /** Evaluates `job` for the document `key`, replacing any evaluation of it queued or running. */
  run(key: string, job: EvaluationJob): Promise<EvaluationOutcome> {
    this.cancel(key);
    return new Promise((resolve) => {
      const entry: Entry = { key, job, settle: resolve };
      this.entries.set(key, entry);
      this.queue.push(entry);
      this.pump();
    });
  }

  /** Cancels the evaluation of `key`, if any; its promise settles with `cancelled`. */
  cancel(key: string): boolean {
    const entry = this.entries.get(key);
    if (!entry) return false;
    this.finish(entry, { status: 'cancelled' }, 'drain');
    return true;
  }

  /** Stops the evaluation of `key` on the user's request; its promise settles with `stopped`. */
  stop(key: string): boolean {
    const entry = this.entries.get(key);
    if (!entry) return false;
    this.finish(entry, this.stoppedOutcome(entry, 'user'), 'discard');
    return true;
  }

  /** Cancels every evaluation and terminates every worker at once (the server is shutting down). */
  cancelAll(): void {
    for (const entry of [...this.entries.values()]) this.finish(entry, { status: 'cancelled' }, 'discard');
    for (const worker of this.draining.values()) worker.terminate();
  }

  isBusy(key: string): boolean {
    return this.entries.has(key);
  }

  runningCount(): number {
    return this.running;
  }

  queuedCount(): number {
    return this.queue.length;
  }

  private pump(): void {
    while (this.running < this.maxConcurrent) {
      // An evaluation whose document's previous worker is still stopping waits for that worker.
      const next = this.queue.findIndex((e) => !this.draining.has(e.key));
      if (next < 0) return;
      this.start(this.queue.splice(next, 1)[0]!);
    }
  }

  private start(entry: Entry): void {
    const worker = this.workers.take(entry.key);
    const requestId = this.nextRequestId++;
    entry.worker = worker;
    entry.requestId = requestId;
    this.running++;
    worker.listen({
      reply: (reply) => this.onReply(entry, requestId, reply),
      exit: (error) => {
        const outOfMemory = (error as { code?: string } | undefined)?.code === 'ERR_WORKER_OUT_OF_MEMORY';
        this.finish(
          entry,
          {
            status: 'failed',
            message: error?.message ?? 'the evaluation worker ended unexpectedly',
            outOfMemory,
            ...(entry.statement ? { statement: entry.statement } : {}),
            elapsedMs: this.elapsed(entry),
          },
          'discard',
        );
      },
    });
    worker.post({ id: requestId, document: entry.key, text: entry.job.text, options: entry.job.options });
  }

  private onReply(entry: Entry, requestId: number, reply: WorkerReply): void {
    if (reply.kind === 'ready' || reply.id !== requestId || this.entries.get(entry.key) !== entry) return;
    switch (reply.kind) {
      case 'started':
        entry.startedAt = this.clock.now();
        if (entry.job.timeoutMs > 0) {
          entry.timer = this.clock.setTimeout(
            () => this.finish(entry, this.stoppedOutcome(entry, 'timeout'), 'discard'),
            entry.job.timeoutMs,
          );
        }
        entry.job.onStart?.();
        return;
      case 'statement':
        entry.statement = reply.span;
        entry.job.onStatement?.(reply.span);
        return;
      case 'finished':
        this.finish(entry, { status: 'finished', analysis: reply.analysis, elapsedMs: this.elapsed(entry) }, 'give back');
        return;
      case 'failed':
        // The worker itself is fine (the result could not be sent); it may take the next job.
        this.finish(
          entry,
          {
            status: 'failed',
            message: reply.message,
            outOfMemory: false,
            ...(entry.statement ? { statement: entry.statement } : {}),
            elapsedMs: this.elapsed(entry),
          },
          'give back',
        );
        return;
    }
  }

  private stoppedOutcome(entry: Entry, reason: 'timeout' | 'user'): EvaluationOutcome {
    return {
      status: 'stopped',
      reason,
      ...(entry.statement ? { statement: entry.statement } : {}),
      elapsedMs: this.elapsed(entry),
    };
  }

  private elapsed(entry: Entry): number {
    return entry.startedAt === undefined ? 0 : this.clock.now() - entry.startedAt;
  }

  /**
   * Asks the worker of a cancelled evaluation to stop, and gives it back when it says it did (or finished
   * anyway), or discards it when it neither does so within `CANCEL_GRACE_MS` nor lives.
   */
  private drain(key: string, worker: WorkerHandle, requestId: number): void {
    let over = false;
    const done = (how: 'give back' | 'discard') => {
      if (over) return;
      over = true;
      this.clock.clearTimeout(timer);
      this.draining.delete(key);
      this.running--;
      if (how === 'give back') this.workers.giveBack(worker);
      else this.workers.discard(worker);
      this.pump();
    };
    const timer = this.clock.setTimeout(() => done('discard'), CANCEL_GRACE_MS);
    this.draining.set(key, worker);
    worker.listen({
      reply: (reply) => {
        if (reply.kind === 'ready' || reply.id !== requestId) return;
        if (reply.kind === 'stopped' || reply.kind === 'finished' || reply.kind === 'failed') done('give back');
      },
      exit: () => done('discard'),
    });
    worker.requestStop(requestId);
  }

  /**
   * Settles `entry` once, then gives back, discards or drains (see `drain`) its worker, and lets the next
   * queued evaluation start.
   */
  private finish(entry: Entry, outcome: EvaluationOutcome, worker: 'give back' | 'discard' | 'drain'): void {
    if (this.entries.get(entry.key) !== entry) return;
    this.entries.delete(entry.key);
    if (entry.timer !== undefined) this.clock.clearTimeout(entry.timer);
    if (entry.worker) {
      if (worker === 'drain') {
        // Still running until it has stopped; `drain` counts it down.
        this.drain(entry.key, entry.worker, entry.requestId!);
      } else {
        this.running--;
        if (worker === 'give back') this.workers.giveBack(entry.worker);
        else this.workers.discard(entry.worker);
      }
    } else {
      const at = this.queue.indexOf(entry);
      if (at >= 0) this.queue.splice(at, 1);
    }
    entry.settle(outcome);
    this.pump();
  }
}
