/**
 * The bundled evaluation worker (dist/evaluation-worker.cjs) on real threads,
 * through the pool the server uses: it returns exactly what `analyze` returns
 * in this thread, reports every statement, and a stopped worker is replaced
 * by the warm spare. Start-up and restart times are measured and printed,
 * never asserted.
 */
import { after, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { join } from 'node:path';
import { analyze } from '../../server/src/language/index.js';
import type { WorkerReply } from '../../server/src/lsp/evaluation-messages.js';
import { threadWorkerFactory, WorkerPool, type WorkerHandle } from '../../server/src/lsp/worker-pool.js';
import { slimForEditor } from '../../server/src/lsp/slim-analysis.js';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';

const WORKER_FILE = join(ROOT, 'dist/evaluation-worker.cjs');

// The plane of rows (1,0,2,0), (0,1,3,1): its 2×2 minors are 1, 3, 1, -2, 0, 2 in lexicographic order
// (computed by hand; common practice, no source).
const TEXT = 'space V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nclaim plucker(W) = [1 : 3 : 1 : -2 : 0 : 2]\n';

/** A k×n integer matrix from a fixed linear congruential sequence (constants of the C library `rand` example, from memory). */
function rows(k: number, n: number): string {
  let state = 11;
  const next = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return ((state >> 8) % 19) - 9;
  };
  return Array.from({ length: k }, () => Array.from({ length: n }, next).join(' ')).join('; ');
}
// C(20,10) = 184756 maximal minors (OEIS A000984): seconds of work, stopped long before it ends.
const HEAVY = `space U dim 20\nsubspace W = rows [ ${rows(10, 20)} ]\n`;

/** Collects one worker's replies; `next(kind)` resolves with the first of that kind not yet taken. */
function inbox(worker: WorkerHandle) {
  const replies: WorkerReply[] = [];
  const waiting: { kind: WorkerReply['kind']; resolve: (r: WorkerReply) => void }[] = [];
  worker.listen({
    reply: (reply) => {
      const at = waiting.findIndex((w) => w.kind === reply.kind);
      if (at >= 0) waiting.splice(at, 1)[0]!.resolve(reply);
      else replies.push(reply);
    },
    exit: (error) => {
      throw error ?? new Error('the worker ended');
    },
  });
  return {
    next<K extends WorkerReply['kind']>(kind: K): Promise<Extract<WorkerReply, { kind: K }>> {
      const at = replies.findIndex((r) => r.kind === kind);
      if (at >= 0) return Promise.resolve(replies.splice(at, 1)[0] as Extract<WorkerReply, { kind: K }>);
      return new Promise((resolve) => waiting.push({ kind, resolve: resolve as (r: WorkerReply) => void }));
    },
    all: replies,
  };
}

describe('the bundled evaluation worker', { timeout: 60_000 }, () => {
  const pools: WorkerPool[] = [];
  after(() => pools.forEach((p) => p.dispose()));

  test('starts, warms up and says so; measured over five cold starts', async () => {
    assertBundleIsFresh('dist/evaluation-worker.cjs', ['server/src']);
    const create = threadWorkerFactory(WORKER_FILE);
    const times: number[] = [];
    for (let i = 0; i < 5; i++) {
      const started = performance.now();
      const worker = create();
      await inbox(worker).next('ready');
      times.push(performance.now() - started);
      worker.terminate();
    }
    times.sort((a, b) => a - b);
    console.log(`cold worker start to ready (load + warm-up): ${times.map((t) => t.toFixed(0)).join(', ')} ms`);
  });

  test('returns exactly the analysis of this thread (slimmed for the editor), after one statement report per statement', async () => {
    const pool = new WorkerPool(threadWorkerFactory(WORKER_FILE));
    pools.push(pool);
    const worker = pool.take();
    const replies = inbox(worker);
    worker.post({ id: 1, document: 'a', text: TEXT, options: { normalization: 'primitive' } });
    const finished = await replies.next('finished');
    assert.deepStrictEqual(finished.analysis, slimForEditor(analyze(TEXT, { evaluate: true, normalization: 'primitive' })));
    assert.deepEqual(finished.analysis.problems, [], 'the claim holds');
    const statements = replies.all.filter((r) => r.kind === 'statement');
    assert.deepEqual(
      statements.map((r) => (r.kind === 'statement' ? TEXT.slice(r.span.start, r.span.end).split(' ')[0] : '')),
      ['space', 'subspace', 'claim'],
    );
    pool.giveBack(worker);
  });

  test('the next evaluation of the same document evaluates only the edited statement, and agrees with this thread', async () => {
    const pool = new WorkerPool(threadWorkerFactory(WORKER_FILE));
    pools.push(pool);
    const worker = pool.take('doc');
    const replies = inbox(worker);
    worker.post({ id: 1, document: 'doc', text: TEXT, options: {} });
    await replies.next('finished');
    replies.all.splice(0);
    const edited = TEXT.replace('[1 : 3 : 1 : -2 : 0 : 2]', '[1 : 3 : 1 : -2 : 0 : 3]');
    worker.post({ id: 2, document: 'doc', text: edited, options: {} });
    const finished = await replies.next('finished');
    const evaluated = replies.all.filter((r) => r.kind === 'statement').map((r) => (r.kind === 'statement' ? edited.slice(r.span.start, r.span.end).split(' ')[0] : ''));
    assert.deepEqual(evaluated, ['claim'], 'the space and the subspace come from the memo');
    assert.deepStrictEqual(finished.analysis, slimForEditor(analyze(edited, { evaluate: true })));
    assert.equal(finished.analysis.problems[0]?.code, 'claim/plucker', 'the edited claim is false');
    pool.giveBack(worker);
  });

  test('a stop request is read before the next statement, and the worker takes the next job', async () => {
    const pool = new WorkerPool(threadWorkerFactory(WORKER_FILE));
    pools.push(pool);
    const worker = pool.take();
    const replies = inbox(worker);
    await replies.next('ready');
    // Asked before the worker reads the request: it stops before the first statement.
    worker.requestStop(7);
    worker.post({ id: 7, document: 'a', text: TEXT, options: {} });
    assert.equal((await replies.next('stopped')).id, 7);
    worker.post({ id: 8, document: 'a', text: TEXT, options: {} });
    assert.deepEqual((await replies.next('finished')).analysis.problems, []);
    pool.giveBack(worker);
  });

  test('a busy worker is terminated and the next job starts on the warm spare at once', async () => {
    const pool = new WorkerPool(threadWorkerFactory(WORKER_FILE));
    pools.push(pool);
    pool.warm();
    const busy = pool.take();
    const busyReplies = inbox(busy);
    busy.post({ id: 1, document: 'heavy', text: HEAVY, options: {} });
    await busyReplies.next('ready');
    // The busy worker is on the heavy statement (its second) once it reports it.
    await busyReplies.next('statement');
    const heavy = await busyReplies.next('statement');
    assert.equal(heavy.id, 1);
    assert.ok(HEAVY.slice(heavy.span.start, heavy.span.end).startsWith('subspace W'));
    // The spare began loading when the busy worker was taken, so it has had as long to load as the busy
    // one, which is evaluating already. Stop the busy one and hand the next job over, as the server does.
    const restartedAt = performance.now();
    pool.discard(busy);
    const spare = pool.take();
    const spareReplies = inbox(spare);
    spare.post({ id: 2, document: 'a', text: TEXT, options: {} });
    const started = await spareReplies.next('started');
    const startedAfter = performance.now() - restartedAt;
    const finished = await spareReplies.next('finished');
    const finishedAfter = performance.now() - restartedAt;
    assert.equal(started.id, 2);
    assert.deepEqual(finished.analysis.problems, []);
    console.log(
      `restart after a stop: the spare started the next job ${startedAfter.toFixed(1)} ms and finished it ${finishedAfter.toFixed(1)} ms after the busy worker was terminated`,
    );
    pool.giveBack(spare);
  });
});
