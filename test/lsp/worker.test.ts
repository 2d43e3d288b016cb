/**
 * Evaluation off the server's main thread, through the bundled server over
 * stdio: while a heavy statement evaluates, hovers answer at once (before the
 * evaluation's diagnostics); a newer version cancels the evaluation of the
 * older one; a long evaluation shows work-done progress; the time limit turns
 * into `limit/timeout` on the statement being evaluated. Every wait is on a
 * message; latencies are measured and printed, never asserted.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import {
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  HoverRequest,
  LogMessageNotification,
  MarkupContent,
  PublishDiagnosticsNotification,
  type Position,
  type PublishDiagnosticsParams,
} from 'vscode-languageserver-protocol/node';
import { RESULTS_CAPABILITY, RESULTS_NOTIFICATION, type ResultsParams } from '../../server/src/lsp/results-protocol.js';
import { assertBundleIsFresh } from '../support/bundles.js';
import { startServerSession, type LoggedNotification, type ServerSession } from './server-process.js';

/**
 * A k×n matrix of integers of 18 decimal digits from a fixed linear congruential sequence (the
 * constants of the classic C library `rand` example, from memory). Such a matrix has full rank for all
 * but a vanishing share of choices (common practice, no source), and its C(n,k) maximal minors are all
 * computed for its Plücker vector: C(20,10) = 184756 of them (OEIS A000984, central binomial
 * coefficients), each a 10×10 determinant. Entries this long make every minor a large number, so that
 * takes a second or more here: the tests below need the statement to outlast the progress delay and
 * the time limit they set. (With one-digit entries the minors take a tenth of a second.)
 */
function heavyRows(k: number, n: number, seed: number): string {
  let state = seed;
  const next = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return ((state >> 8) % 19) - 9;
  };
  const entry = () => {
    // A leading digit that is never 0, and a sign.
    let digits = String(next() || 1);
    for (let d = 1; d < 18; d++) digits += String(Math.abs(next()) % 10);
    return digits;
  };
  return Array.from({ length: k }, () => Array.from({ length: n }, entry).join(' ')).join('; ');
}

// Two coordinate vectors of a 4-dimensional space span a plane, so dim L = 3 is false (common
// practice, no source). It evaluates in milliseconds.
const LIGHT = ['space V dim 4', 'vector p = (1, 0, 0, 0)', 'vector q = (0, 1, 0, 0)', 'subspace L = span(p, q)', 'claim dim L = 3', ''].join('\n');
const HEAVY_LINES = [`space U dim 20`, `subspace W = rows [ ${heavyRows(10, 20, 7)} ]`, 'claim dim W = 10', ''];
const HEAVY = HEAVY_LINES.join('\n');

function positionAt(text: string, offset: number): Position {
  const before = text.slice(0, offset).split('\n');
  return { line: before.length - 1, character: before[before.length - 1]!.length };
}

function lineOf(text: string, needle: string): number {
  const at = text.indexOf(needle);
  assert.ok(at >= 0, `text contains ${JSON.stringify(needle)}`);
  return positionAt(text, at).line;
}

let counter = 0;
function freshUri(label: string): string {
  counter++;
  return `file:///wedgework-tests/worker-${label}-${counter}.wedge`;
}

const isResults = (uri: string, evaluatedVersion?: number) => (n: LoggedNotification) =>
  n.method === RESULTS_NOTIFICATION &&
  (n.params as ResultsParams).uri === uri &&
  (evaluatedVersion === undefined || (n.params as ResultsParams).evaluatedVersion === evaluatedVersion);

const isDiagnostics = (uri: string, predicate: (p: PublishDiagnosticsParams) => boolean = () => true) => (n: LoggedNotification) =>
  n.method === PublishDiagnosticsNotification.method && (n.params as PublishDiagnosticsParams).uri === uri && predicate(n.params);

const isProgress = (kind: 'begin' | 'end', titleIncludes?: string) => (n: LoggedNotification) =>
  n.method === '$/progress' &&
  n.params.value?.kind === kind &&
  (titleIncludes === undefined || String(n.params.value.title ?? '').includes(titleIncludes));

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

describe('evaluation on worker threads, over stdio', { timeout: 120_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    assertBundleIsFresh('dist/evaluation-worker.cjs', ['server/src']);
    session = await startServerSession(
      { evaluateOn: 'save' },
      { capabilities: { window: { workDoneProgress: true }, experimental: { [RESULTS_CAPABILITY]: true } } },
    );
  });

  after(() => {
    session?.kill();
  });

  async function open(uri: string, text: string): Promise<void> {
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text },
    });
  }

  test('while a heavy statement evaluates, hovers answer from the last results before its diagnostics arrive', async () => {
    const uri = freshUri('hover');
    await open(uri, LIGHT);
    await session.notifications.waitFor(isResults(uri, 1));

    // Append the heavy statements and save: the evaluation of version 2 starts on a worker.
    const end = positionAt(LIGHT, LIGHT.length);
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: end, end }, text: HEAVY }],
    });
    await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
    // The progress shows only for an evaluation still running after its delay: proof that it is under way.
    const begun = await session.notifications.waitFor(isProgress('begin', 'worker-hover'));
    const token = begun.params.token;

    let evaluated: LoggedNotification | undefined;
    const finished = session.notifications.waitFor(isResults(uri, 2)).then((n) => (evaluated = n));
    const hoverAt = { line: lineOf(LIGHT, 'subspace L'), character: 'subspace '.length };
    const latencies: number[] = [];
    const answeredAt: number[] = [];
    // Hover until the evaluation ends (at least 50 times), one after the other.
    while (latencies.length < 50 || evaluated === undefined) {
      const sent = performance.now();
      const hover = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: hoverAt });
      latencies.push(performance.now() - sent);
      answeredAt.push(session.notifications.count);
      assert.ok(hover && MarkupContent.is(hover.contents), 'the hover answers from the carried evaluation');
      assert.match(hover.contents.value, /Plücker/);
      if (latencies.length > 100_000) assert.fail('the evaluation never ended');
    }
    await finished;
    // The evaluation's diagnostics go out just before its results (a long evaluation also publishes the
    // quick pass's problems early, when its progress appears; those are not the evaluation's).
    const diagnostics = session.notifications.entries
      .filter((n) => n.seq < evaluated!.seq && isDiagnostics(uri, (p) => p.version === 2)(n))
      .at(-1);
    assert.ok(diagnostics, 'the evaluation published diagnostics for version 2');
    const firstFifty = answeredAt.slice(0, 50);
    assert.ok(
      firstFifty.every((seq) => seq <= Math.min(evaluated!.seq, diagnostics.seq)),
      'the first 50 hovers were answered before the evaluation\'s results and diagnostics arrived',
    );
    const duringEvaluation = latencies.filter((_, i) => answeredAt[i]! <= evaluated!.seq).sort((a, b) => a - b);
    console.log(
      `hover latency while evaluating (${duringEvaluation.length} hovers): p50 ${percentile(duringEvaluation, 50).toFixed(2)} ms, ` +
        `p95 ${percentile(duringEvaluation, 95).toFixed(2)} ms, max ${duringEvaluation.at(-1)!.toFixed(2)} ms; ` +
        `the hover answered just after the results arrived (it waited while they were received): ${latencies.at(-1)!.toFixed(2)} ms`,
    );

    // The evaluation's own outcome: the claim about W holds, the false claim about L is still reported.
    const codes = (diagnostics.params as PublishDiagnosticsParams).diagnostics.map((d) => String(d.code));
    assert.deepEqual(codes, ['claim/dimension']);
    const results = (evaluated.params as ResultsParams).results;
    assert.ok(results.some((r) => r.name === 'W' && r.kind === 'subspace' && /G\(10,20\)/.test(r.summary)), JSON.stringify(results.map((r) => r.name)));
    await session.notifications.waitFor((n) => n.method === '$/progress' && n.params.token === token && n.params.value?.kind === 'end');
  });

  test('a newer version cancels the running evaluation of the older one: only the newer results arrive', async () => {
    const uri = freshUri('cancel');
    const name = uri.slice(uri.lastIndexOf('/') + 1);
    const from = session.notifications.count;
    await open(uri, HEAVY);
    const begun = await session.notifications.waitFor(isProgress('begin', name), from);

    const replacedAt = performance.now();
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ text: LIGHT }],
    });
    await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
    const evaluated = await session.notifications.waitFor(isResults(uri, 2), from);
    console.log(`cancelling a running evaluation and evaluating the new version took ${(performance.now() - replacedAt).toFixed(1)} ms`);

    const cancelled = await session.notifications.waitFor(
      (n) => n.method === LogMessageNotification.method && String(n.params.message).includes(`${name} (version 1) cancelled`),
      from,
    );
    assert.ok(cancelled.seq < evaluated.seq);
    await session.notifications.waitFor((n) => n.method === '$/progress' && n.params.token === begun.params.token && n.params.value?.kind === 'end', from);
    const diagnostics = session.notifications.entries
      .filter((n) => n.seq < evaluated.seq && isDiagnostics(uri, (p) => p.version === 2)(n))
      .at(-1);
    assert.ok(diagnostics, 'the evaluation published diagnostics for version 2');
    assert.deepEqual((diagnostics.params as PublishDiagnosticsParams).diagnostics.map((d) => String(d.code)), ['claim/dimension']);

    // Nothing of version 1's evaluation ever arrived: no results, no diagnostics for version 1 after the
    // quick pass's early ones (which the evaluation's long run published; they carry no claim).
    const later = session.notifications.entries.slice(from);
    assert.ok(!later.some(isResults(uri, 1)), 'no results of version 1');
    assert.ok(
      !later.some(isDiagnostics(uri, (p) => p.diagnostics.some((d) => String(d.code).startsWith('claim/') || String(d.code).startsWith('limit/')) && p.version === 1)),
      'no evaluated diagnostics of version 1',
    );
  });

  test('evaluating while typing: a change cancels the running evaluation at once', async () => {
    session.settings = { evaluateOn: 'type' };
    try {
      const uri = freshUri('typing');
      const name = uri.slice(uri.lastIndexOf('/') + 1);
      const from = session.notifications.count;
      await open(uri, HEAVY);
      await session.notifications.waitFor(isProgress('begin', name), from);
      await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
        textDocument: { uri, version: 2 },
        contentChanges: [{ text: LIGHT }],
      });
      await session.notifications.waitFor(
        (n) => n.method === LogMessageNotification.method && String(n.params.message).includes(`${name} (version 1) cancelled`),
        from,
      );
      const evaluated = await session.notifications.waitFor(isResults(uri, 2), from);
      assert.ok(!session.notifications.entries.slice(from).some(isResults(uri, 1)));
      assert.ok((evaluated.params as ResultsParams).results.some((r) => r.name === 'L'));
    } finally {
      session.settings = { evaluateOn: 'save' };
    }
  });

  test('an evaluation past wedgework.limits.timeoutMs is stopped with limit/timeout on the statement it was on', async () => {
    session.settings = { evaluateOn: 'save', limits: { timeoutMs: 300 } };
    try {
      const uri = freshUri('timeout');
      const from = session.notifications.count;
      await open(uri, HEAVY);
      const published = await session.notifications.waitFor(
        isDiagnostics(uri, (p) => p.diagnostics.some((d) => d.code === 'limit/timeout')),
        from,
      );
      const params = published.params as PublishDiagnosticsParams;
      assert.equal(params.version, 1);
      const timeout = params.diagnostics.find((d) => d.code === 'limit/timeout')!;
      assert.equal(timeout.range.start.line, lineOf(HEAVY, 'subspace W'), 'on the heavy statement, not the first one');
      assert.match(String(timeout.message), /wedgework\.limits\.timeoutMs/);
      assert.match(String(timeout.message), /300 ms/);
      // Only the timeout: the claim below it was never reached, so nothing is said about it.
      assert.deepEqual(params.diagnostics.map((d) => d.code), ['limit/timeout']);
    } finally {
      session.settings = { evaluateOn: 'save' };
    }
    // The server goes on: the next document is evaluated on a fresh worker.
    const next = freshUri('after-timeout');
    await open(next, LIGHT);
    const results = await session.notifications.waitFor(isResults(next, 1));
    assert.ok((results.params as ResultsParams).results.some((r) => r.name === 'L'));
  });

  test('closing a document sends it an empty list of results', async () => {
    const uri = freshUri('close');
    await open(uri, LIGHT);
    const evaluated = await session.notifications.waitFor(isResults(uri, 1));
    await session.connection.sendNotification('textDocument/didClose', { textDocument: { uri } });
    const cleared = await session.notifications.waitFor((n) => isResults(uri)(n) && (n.params as ResultsParams).results.length === 0, evaluated.seq + 1);
    assert.equal((cleared.params as ResultsParams).evaluatedVersion, undefined);
  });

  test('shutdown then exit ends the server with status 0, workers and all', async () => {
    assert.equal(await session.shutdown(), 0, `server stderr: ${session.stderr()}`);
  });
});

describe('a client that does not ask for results', { timeout: 60_000 }, () => {
  test('never receives wedgework/results', async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    const session = await startServerSession({ evaluateOn: 'save' });
    try {
      const uri = freshUri('plain');
      await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
        textDocument: { uri, languageId: 'wedge', version: 1, text: LIGHT },
      });
      await session.diagnostics.next(uri);
      assert.equal(await session.shutdown(), 0);
      assert.ok(!session.notifications.entries.some((n) => n.method === RESULTS_NOTIFICATION));
    } finally {
      session.kill();
    }
  });
});
