/**
 * Evaluation workers kept ready for use.
 *
 * Stopping an evaluation means terminating its thread, and a fresh thread
 * needs a moment to load the language layer. So the pool keeps an idle,
 * warmed-up worker at hand: after every `take`, if no idle worker is left, a
 * new one starts loading in the background, and the next evaluation (for
 * instance the one that replaces a stopped evaluation) starts on a warm
 * thread. A worker that finished its job goes back to the pool; at most
 * `MAX_IDLE_WORKERS` wait there, so a busy session does not pile up threads.
 */
import { Worker } from 'node:worker_threads';
import type { EvaluationRequest, WorkerReply, WorkerStartData } from './evaluation-messages.js';
import { MEMOS_PER_WORKER } from './memo-shelf.js';

/** Idle workers kept beyond this many are terminated when they come back. */
export const MAX_IDLE_WORKERS = 2;

export interface WorkerListener {
  reply(reply: WorkerReply): void;
  /** The thread ended by itself (a crash, or running out of memory); `error` says why when known. */
  exit(error: Error | undefined): void;
}

/** One worker thread, as the pool and the scheduler see it. */
export interface WorkerHandle {
  post(request: EvaluationRequest): void;
  /** Replaces the listener; `undefined` ignores the worker's messages from now on. */
  listen(listener: WorkerListener | undefined): void;
  /** Ends the thread at once, whatever it is doing. No `exit` is reported to the listener. */
  terminate(): void;
  /**
   * Asks the worker to stop the request `id` before its next statement (it then replies `stopped`); the
   * worker does so only between statements, so a caller in a hurry waits a little and then terminates it.
   */
  requestStop(id: number): void;
}

export type WorkerFactory = () => WorkerHandle;

export class WorkerPool {
  private readonly idle: WorkerHandle[] = [];
  private disposed = false;

  constructor(private readonly create: WorkerFactory) {}

  /** Makes sure one worker is idle (starting it if needed), so the first evaluation finds it loaded. */
  warm(): void {
    if (!this.disposed && this.idle.length === 0) this.addIdle(this.create());
  }

  /** The documents each worker has evaluated (and so keeps a memo of), most recent last. */
  private readonly documentsOf = new WeakMap<WorkerHandle, string[]>();

  /**
   * A worker for one job: an idle one if any (one that has evaluated `document` before, if there is one:
   * it evaluates only what changed), else a new one. The caller listens to it.
   */
  take(document?: string): WorkerHandle {
    const familiar = document === undefined ? -1 : this.idle.findIndex((w) => this.documentsOf.get(w)?.includes(document));
    const worker = (familiar >= 0 ? this.idle.splice(familiar, 1)[0] : this.idle.pop()) ?? this.create();
    worker.listen(undefined);
    if (document !== undefined) this.remember(worker, document);
    this.warm();
    return worker;
  }

  private remember(worker: WorkerHandle, document: string): void {
    const documents = (this.documentsOf.get(worker) ?? []).filter((d) => d !== document);
    documents.push(document);
    // The worker keeps this many memos (./memo-shelf.ts); older documents are forgotten there too.
    this.documentsOf.set(worker, documents.slice(-MEMOS_PER_WORKER));
  }

  /** A worker whose job is over and which is still healthy. */
  giveBack(worker: WorkerHandle): void {
    if (this.disposed || this.idle.length >= MAX_IDLE_WORKERS) {
      worker.listen(undefined);
      worker.terminate();
      return;
    }
    this.addIdle(worker);
  }

  /** A worker that must not run on: its job was stopped, or it failed. */
  discard(worker: WorkerHandle): void {
    worker.listen(undefined);
    worker.terminate();
    this.warm();
  }

  idleCount(): number {
    return this.idle.length;
  }

  dispose(): void {
    this.disposed = true;
    for (const worker of this.idle.splice(0)) {
      worker.listen(undefined);
      worker.terminate();
    }
  }

  private addIdle(worker: WorkerHandle): void {
    // An idle worker that dies is simply forgotten; the next `take` starts another.
    worker.listen({
      reply: () => {},
      exit: () => {
        const at = this.idle.indexOf(worker);
        if (at >= 0) this.idle.splice(at, 1);
      },
    });
    this.idle.push(worker);
  }
}

/** Workers as real threads running the bundled `file` (dist/evaluation-worker.cjs). */
export function threadWorkerFactory(file: string): WorkerFactory {
  return () => {
    // The worker's standard output would otherwise share the server's, which may carry the protocol.
    const stopCell = new Int32Array(new SharedArrayBuffer(4));
    const workerData: WorkerStartData = { stopCell: stopCell.buffer as SharedArrayBuffer };
    const worker = new Worker(file, { stdout: true, workerData });
    worker.stdout.on('data', (chunk: Buffer) => process.stderr.write(chunk));
    // An idle worker must not keep the server process alive once the connection is gone.
    worker.unref();
    let listener: WorkerListener | undefined;
    let failure: Error | undefined;
    let terminated = false;
    worker.on('message', (reply: WorkerReply) => listener?.reply(reply));
    worker.on('error', (error) => (failure = error));
    worker.on('exit', () => {
      if (!terminated) listener?.exit(failure);
    });
    return {
      post: (request) => worker.postMessage(request),
      listen: (next) => (listener = next),
      terminate: () => {
        terminated = true;
        listener = undefined;
        void worker.terminate();
      },
      requestStop: (id) => Atomics.store(stopCell, 0, id),
    };
  };
}
