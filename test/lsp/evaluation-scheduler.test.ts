/**
 * The scheduling rules of server/src/lsp/evaluation-scheduler.ts, with
 * stand-in workers and a hand-driven clock: one evaluation per document (a
 * newer one cancels the older), a bound on how many run at once, the time
 * limit counted from the worker's start, stopping on request, and crashes.
 * These are the project's own rules (common practice, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { CANCEL_GRACE_MS, EvaluationScheduler, type EvaluationJob, type WorkerSource } from '../../server/src/lsp/evaluation-scheduler.js';
import type { WorkerHandle } from '../../server/src/lsp/worker-pool.js';
import { FakeClock } from './fake-clock.js';
import { analysisOf, FakeWorker } from './fake-workers.js';

class RecordingPool implements WorkerSource {
  readonly taken: FakeWorker[] = [];
  /** The document each `take` asked for. */
  readonly keys: (string | undefined)[] = [];
  readonly givenBack: FakeWorker[] = [];
  readonly discarded: FakeWorker[] = [];

  take(document?: string): WorkerHandle {
    this.keys.push(document);
    const worker = new FakeWorker(this.taken.length + 1);
    this.taken.push(worker);
    return worker;
  }

  giveBack(worker: WorkerHandle): void {
    this.givenBack.push(worker as FakeWorker);
  }

  discard(worker: WorkerHandle): void {
    (worker as FakeWorker).terminate();
    this.discarded.push(worker as FakeWorker);
  }
}

function job(text: string, timeoutMs = 0, events: string[] = []): EvaluationJob {
  return {
    text,
    options: { normalization: 'primitive' },
    timeoutMs,
    onStart: () => events.push('start'),
    onStatement: (span) => events.push(`statement ${span.start}-${span.end}`),
  };
}

function setUp(maxConcurrent = 2) {
  const pool = new RecordingPool();
  const clock = new FakeClock();
  const scheduler = new EvaluationScheduler(pool, maxConcurrent, clock);
  return { pool, clock, scheduler };
}

describe('EvaluationScheduler', () => {
  test('an evaluation runs on a worker, reports its start and statements, and hands the worker back', async () => {
    const { pool, scheduler } = setUp();
    const events: string[] = [];
    const outcome = scheduler.run('a', job('space V dim 2\n', 0, events));
    const [worker] = pool.taken;
    assert.ok(worker);
    assert.equal(worker.requests.length, 1);
    assert.equal(worker.requests[0]!.text, 'space V dim 2\n');
    assert.deepEqual(worker.requests[0]!.options, { normalization: 'primitive' });
    const id = worker.lastId();
    worker.reply({ kind: 'started', id });
    worker.reply({ kind: 'statement', id, span: { start: 0, end: 13 } });
    const analysis = analysisOf('space V dim 2\n');
    worker.reply({ kind: 'finished', id, analysis });
    const settled = await outcome;
    assert.equal(settled.status, 'finished');
    assert.equal(settled.status === 'finished' && settled.analysis, analysis);
    assert.deepEqual(events, ['start', 'statement 0-13']);
    assert.deepEqual(pool.givenBack, [worker]);
    assert.deepEqual(pool.discarded, []);
    assert.equal(scheduler.isBusy('a'), false);
  });

  test('a newer evaluation of the same document cancels the older one; its worker, stopping in time, serves the newer', async () => {
    const { pool, scheduler } = setUp();
    const first = scheduler.run('a', job('old'));
    const [oldWorker] = pool.taken;
    const oldId = oldWorker!.lastId();
    oldWorker!.reply({ kind: 'started', id: oldId });
    const second = scheduler.run('a', job('new'));
    assert.deepEqual(await first, { status: 'cancelled' });
    assert.deepEqual(oldWorker!.stopRequests, [oldId], 'the old worker is asked to stop');
    assert.equal(oldWorker!.terminated, false);
    assert.equal(pool.taken.length, 1, 'the newer evaluation waits for the worker that knows the document');
    assert.equal(scheduler.runningCount(), 1, 'the stopping worker still counts as running');
    oldWorker!.reply({ kind: 'stopped', id: oldId });
    assert.deepEqual(pool.givenBack, [oldWorker], 'it goes back to the pool with its memo');
    const newWorker = pool.taken[1]!;
    assert.deepEqual(pool.keys, ['a', 'a'], 'and the pool is asked for a worker that knows the document');
    assert.equal(newWorker.requests[0]!.text, 'new');
    assert.equal(newWorker.requests[0]!.document, 'a');
    newWorker.reply({ kind: 'started', id: newWorker.lastId() });
    newWorker.reply({ kind: 'finished', id: newWorker.lastId(), analysis: analysisOf('new') });
    const settled = await second;
    assert.equal(settled.status === 'finished' && settled.analysis.text, 'new');
  });

  test('a cancelled evaluation whose worker does not stop within the grace period has its worker terminated', async () => {
    const { pool, clock, scheduler } = setUp();
    const first = scheduler.run('a', job('old'));
    const oldWorker = pool.taken[0]!;
    oldWorker.reply({ kind: 'started', id: oldWorker.lastId() });
    const second = scheduler.run('a', job('new'));
    assert.deepEqual(await first, { status: 'cancelled' });
    clock.advance(CANCEL_GRACE_MS - 1);
    assert.equal(oldWorker.terminated, false);
    clock.advance(1);
    assert.equal(oldWorker.terminated, true, 'still inside a long statement: terminated');
    assert.deepEqual(pool.discarded, [oldWorker]);
    // A late reply of the terminated worker changes nothing.
    oldWorker.reply({ kind: 'stopped', id: oldWorker.lastId() });
    assert.deepEqual(pool.givenBack, []);
    const newWorker = pool.taken[1]!;
    newWorker.reply({ kind: 'finished', id: newWorker.lastId(), analysis: analysisOf('new') });
    assert.equal((await second).status, 'finished');
  });

  test('while one document\'s worker stops, another document\'s evaluation may start', async () => {
    const { pool, scheduler } = setUp(2);
    void scheduler.run('a', job('A1'));
    const workerA = pool.taken[0]!;
    void scheduler.run('a', job('A2'));
    void scheduler.run('b', job('B'));
    assert.equal(pool.taken.length, 2, 'b starts on a second worker; A2 waits for a\'s worker');
    assert.equal(pool.taken[1]!.requests[0]!.text, 'B');
    workerA.reply({ kind: 'stopped', id: workerA.lastId() });
    assert.equal(pool.taken.length, 3, 'once a\'s worker is back, A2 starts');
    assert.equal(pool.taken[2]!.requests[0]!.text, 'A2');
    assert.equal(scheduler.runningCount(), 2);
  });

  test('replies that carry another request id are ignored', async () => {
    const { pool, scheduler } = setUp();
    const outcome = scheduler.run('a', job('text'));
    const worker = pool.taken[0]!;
    const id = worker.lastId();
    worker.reply({ kind: 'finished', id: id + 100, analysis: analysisOf('stale') });
    assert.equal(scheduler.isBusy('a'), true);
    worker.reply({ kind: 'finished', id, analysis: analysisOf('text') });
    const settled = await outcome;
    assert.equal(settled.status === 'finished' && settled.analysis.text, 'text');
  });

  test('evaluations of different documents run side by side up to the bound, then wait in order', async () => {
    const { pool, scheduler } = setUp(1);
    const a = scheduler.run('a', job('A'));
    const b = scheduler.run('b', job('B'));
    assert.equal(pool.taken.length, 1, 'only one worker is busy');
    assert.equal(scheduler.queuedCount(), 1);
    const first = pool.taken[0]!;
    first.reply({ kind: 'finished', id: first.lastId(), analysis: analysisOf('A') });
    assert.equal((await a).status, 'finished');
    assert.equal(pool.taken.length, 2, 'the waiting evaluation started when the first ended');
    const second = pool.taken[1]!;
    assert.equal(second.requests[0]!.text, 'B');
    second.reply({ kind: 'finished', id: second.lastId(), analysis: analysisOf('B') });
    assert.equal((await b).status, 'finished');
  });

  test('cancelling a waiting evaluation takes no worker', async () => {
    const { pool, scheduler } = setUp(1);
    void scheduler.run('a', job('A'));
    const b = scheduler.run('b', job('B'));
    assert.equal(scheduler.cancel('b'), true);
    assert.deepEqual(await b, { status: 'cancelled' });
    assert.equal(pool.taken.length, 1);
    assert.equal(scheduler.queuedCount(), 0);
    assert.equal(scheduler.cancel('nothing'), false);
  });

  test('the time limit counts from the worker start and names the statement being evaluated', async () => {
    const { pool, clock, scheduler } = setUp();
    const outcome = scheduler.run('a', job('text', 1000));
    const worker = pool.taken[0]!;
    const id = worker.lastId();
    // A worker still loading is not charged for it.
    clock.advance(5000);
    assert.equal(scheduler.isBusy('a'), true);
    worker.reply({ kind: 'started', id });
    worker.reply({ kind: 'statement', id, span: { start: 0, end: 4 } });
    clock.advance(400);
    worker.reply({ kind: 'statement', id, span: { start: 5, end: 9 } });
    clock.advance(599);
    assert.equal(scheduler.isBusy('a'), true, 'not stopped before the limit');
    clock.advance(1);
    assert.deepEqual(await outcome, { status: 'stopped', reason: 'timeout', statement: { start: 5, end: 9 }, elapsedMs: 1000 });
    assert.deepEqual(pool.discarded, [worker]);
    assert.equal(worker.terminated, true);
  });

  test('a time limit of 0 never stops an evaluation', () => {
    const { pool, clock, scheduler } = setUp();
    void scheduler.run('a', job('text', 0));
    const worker = pool.taken[0]!;
    worker.reply({ kind: 'started', id: worker.lastId() });
    clock.advance(10 * 60 * 1000);
    assert.equal(scheduler.isBusy('a'), true);
    assert.equal(clock.pendingTimers(), 0);
  });

  test('a finished evaluation clears its timer', async () => {
    const { pool, clock, scheduler } = setUp();
    const outcome = scheduler.run('a', job('text', 1000));
    const worker = pool.taken[0]!;
    worker.reply({ kind: 'started', id: worker.lastId() });
    worker.reply({ kind: 'finished', id: worker.lastId(), analysis: analysisOf('text') });
    assert.equal((await outcome).status, 'finished');
    assert.equal(clock.pendingTimers(), 0);
  });

  test('stop ends an evaluation at the user\'s request, naming where it was', async () => {
    const { pool, clock, scheduler } = setUp();
    const outcome = scheduler.run('a', job('text', 0));
    const worker = pool.taken[0]!;
    worker.reply({ kind: 'started', id: worker.lastId() });
    worker.reply({ kind: 'statement', id: worker.lastId(), span: { start: 2, end: 3 } });
    clock.advance(250);
    assert.equal(scheduler.stop('a'), true);
    assert.deepEqual(await outcome, { status: 'stopped', reason: 'user', statement: { start: 2, end: 3 }, elapsedMs: 250 });
    assert.equal(worker.terminated, true);
  });

  test('a worker that dies fails its evaluation, telling an out-of-memory end apart', async () => {
    const { pool, scheduler } = setUp();
    const crashed = scheduler.run('a', job('text'));
    pool.taken[0]!.crash(new Error('boom'));
    const outcome = await crashed;
    assert.equal(outcome.status, 'failed');
    assert.equal(outcome.status === 'failed' && outcome.message, 'boom');
    assert.equal(outcome.status === 'failed' && outcome.outOfMemory, false);
    assert.deepEqual(pool.discarded, [pool.taken[0]]);

    const oom = scheduler.run('b', job('text'));
    pool.taken[1]!.crash(Object.assign(new Error('out of memory'), { code: 'ERR_WORKER_OUT_OF_MEMORY' }));
    const second = await oom;
    assert.equal(second.status === 'failed' && second.outOfMemory, true);
  });

  test('a result the worker could not send fails the evaluation but keeps the worker', async () => {
    const { pool, scheduler } = setUp();
    const outcome = scheduler.run('a', job('text'));
    const worker = pool.taken[0]!;
    worker.reply({ kind: 'failed', id: worker.lastId(), message: 'could not be cloned' });
    const settled = await outcome;
    assert.equal(settled.status === 'failed' && settled.message, 'could not be cloned');
    assert.deepEqual(pool.givenBack, [worker]);
  });

  test('cancelAll settles every evaluation, running or waiting', async () => {
    const { scheduler } = setUp(1);
    const all = [scheduler.run('a', job('A')), scheduler.run('b', job('B')), scheduler.run('c', job('C'))];
    scheduler.cancelAll();
    assert.deepEqual(await Promise.all(all), [{ status: 'cancelled' }, { status: 'cancelled' }, { status: 'cancelled' }]);
    assert.equal(scheduler.runningCount(), 0);
    assert.equal(scheduler.queuedCount(), 0);
  });
});
