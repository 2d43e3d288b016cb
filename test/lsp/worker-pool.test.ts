/**
 * The warm-spare rule of server/src/lsp/worker-pool.ts, with stand-in
 * workers: a worker is always loading or idle before it is needed, finished
 * workers are reused, stopped ones are replaced, and idle ones do not pile up.
 * The project's own rules (common practice, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { MAX_IDLE_WORKERS, WorkerPool } from '../../server/src/lsp/worker-pool.js';
import { fakeWorkerFactory } from './fake-workers.js';

describe('WorkerPool', () => {
  test('warm starts one idle worker, and only one', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    pool.warm();
    pool.warm();
    assert.equal(made.length, 1);
    assert.equal(pool.idleCount(), 1);
  });

  test('taking the last idle worker starts the next one at once', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    pool.warm();
    const taken = pool.take();
    assert.equal(taken, made[0]);
    assert.equal(made.length, 2, 'a spare is loading');
    assert.equal(pool.idleCount(), 1);
  });

  test('a stopped worker is terminated, and the next job starts on the spare without waiting for a new thread', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    pool.warm();
    const running = pool.take();
    pool.discard(running);
    assert.equal(made[0]!.terminated, true);
    const next = pool.take();
    assert.equal(next, made[1], 'the spare made while the first job ran');
  });

  test('a finished worker is reused, and at most MAX_IDLE_WORKERS wait', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    const [w1, w2, w3] = [pool.take(), pool.take(), pool.take()];
    // Each take left a spare behind; the last of them is idle now.
    assert.equal(pool.idleCount(), 1);
    pool.giveBack(w1!);
    assert.equal(pool.idleCount(), MAX_IDLE_WORKERS);
    pool.giveBack(w2!);
    pool.giveBack(w3!);
    assert.equal(pool.idleCount(), MAX_IDLE_WORKERS);
    assert.deepEqual(
      made.map((w) => w.terminated),
      made.map((w) => w === w2 || w === w3),
      'the workers given back to a full pool were terminated',
    );
    assert.equal(pool.take(), w1, 'the finished worker takes the next job');
  });

  test('an idle worker that dies is forgotten', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    pool.warm();
    made[0]!.crash(new Error('gone'));
    assert.equal(pool.idleCount(), 0);
    const taken = pool.take();
    assert.notEqual(taken, made[0]);
  });

  test('dispose terminates the idle workers and starts no more', () => {
    const { create, made } = fakeWorkerFactory();
    const pool = new WorkerPool(create);
    pool.warm();
    const busy = pool.take();
    pool.dispose();
    assert.ok(made.filter((w) => w !== busy).every((w) => w.terminated));
    pool.warm();
    pool.giveBack(busy);
    assert.equal((busy as (typeof made)[number]).terminated, true);
    assert.equal(pool.idleCount(), 0);
  });
});
