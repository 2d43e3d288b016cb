/**
 * Full evaluations, run on worker threads, one per document at a time.
 *
 * The rules:
 * - a new evaluation of a document replaces the one still queued or running
 *   for it: the older one is cancelled (its worker terminated) and its promise
 *   settles with `cancelled`, so its results never reach the editor;
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
  take(): WorkerHandle;
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
    this.finish(entry, { status: 'cancelled' }, 'discard');
    return true;
  }

  /** Stops the evaluation of `key` on the user's request; its promise settles with `stopped`. */
  stop(key: string): boolean {
    const entry = this.entries.get(key);
    if (!entry) return false;
    this.finish(entry, this.stoppedOutcome(entry, 'user'), 'discard');
    return true;
  }

  cancelAll(): void {
    for (const key of [...this.entries.keys()]) this.cancel(key);
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
    while (this.running < this.maxConcurrent && this.queue.length > 0) {
      this.start(this.queue.shift()!);
    }
  }

  private start(entry: Entry): void {
    const worker = this.workers.take();
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
    worker.post({ id: requestId, text: entry.job.text, options: entry.job.options });
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

  /** Settles `entry` once, returns or discards its worker, and lets the next queued evaluation start. */
  private finish(entry: Entry, outcome: EvaluationOutcome, worker: 'give back' | 'discard'): void {
    if (this.entries.get(entry.key) !== entry) return;
    this.entries.delete(entry.key);
    if (entry.timer !== undefined) this.clock.clearTimeout(entry.timer);
    if (entry.worker) {
      this.running--;
      if (worker === 'give back') this.workers.giveBack(entry.worker);
      else this.workers.discard(entry.worker);
    } else {
      const at = this.queue.indexOf(entry);
      if (at >= 0) this.queue.splice(at, 1);
    }
    entry.settle(outcome);
    this.pump();
  }
}
