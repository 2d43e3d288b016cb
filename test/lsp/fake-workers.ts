/**
 * Stand-ins for evaluation worker threads (server/src/lsp/worker-pool.ts):
 * they record what they are sent, and the test makes them reply, crash or
 * not, as it pleases.
 */
import type { Analysis } from '../../server/src/language/index.js';
import type { EvaluationRequest, WorkerReply } from '../../server/src/lsp/evaluation-messages.js';
import type { WorkerHandle, WorkerListener } from '../../server/src/lsp/worker-pool.js';

export class FakeWorker implements WorkerHandle {
  readonly requests: EvaluationRequest[] = [];
  listener: WorkerListener | undefined;
  terminated = false;
  /** The request ids the scheduler asked this worker to stop. */
  readonly stopRequests: number[] = [];

  constructor(readonly serial: number) {}

  requestStop(id: number): void {
    this.stopRequests.push(id);
  }

  post(request: EvaluationRequest): void {
    if (this.terminated) throw new Error(`worker ${this.serial} is terminated`);
    this.requests.push(request);
  }

  listen(listener: WorkerListener | undefined): void {
    this.listener = listener;
  }

  terminate(): void {
    this.terminated = true;
    this.listener = undefined;
  }

  /** The id of the last request this worker received. */
  lastId(): number {
    const last = this.requests[this.requests.length - 1];
    if (!last) throw new Error(`worker ${this.serial} received no request`);
    return last.id;
  }

  reply(reply: WorkerReply): void {
    this.listener?.reply(reply);
  }

  /** The thread ends by itself, as after an uncaught error. */
  crash(error?: Error): void {
    const listener = this.listener;
    this.terminated = true;
    listener?.exit(error);
  }
}

/** A worker factory that keeps every worker it made. */
export function fakeWorkerFactory(): { create: () => FakeWorker; made: FakeWorker[] } {
  const made: FakeWorker[] = [];
  return {
    made,
    create: () => {
      const worker = new FakeWorker(made.length + 1);
      made.push(worker);
      return worker;
    },
  };
}

/** A hand-made analysis (the scheduler passes it through untouched). */
export function analysisOf(text: string): Analysis {
  return { text, problems: [], results: [], references: [], evaluated: true };
}
