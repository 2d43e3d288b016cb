/**
 * Entry point of an evaluation worker thread (bundled as dist/evaluation-worker.cjs).
 *
 * The server's main thread answers hovers, completions and the quick pass
 * while this thread runs the full evaluation, which can take seconds for a
 * large Grassmannian. The worker evaluates one request at a time and says
 * which statement it is on, so that a worker stopped for taking too long can
 * be blamed on the right line.
 *
 * It keeps a memo of statement outcomes per document (./memo-shelf.ts), so an
 * edit re-evaluates only what it affects. An evaluation made useless by a
 * newer version is asked to stop through the shared stop cell, which the
 * evaluator reads between statements; one stuck in a long statement is
 * stopped from outside, by terminating the thread.
 *
 * What it sends back is the analysis slimmed to what the editor side reads
 * (./slim-analysis.ts): a Plücker vector's exact JSON can run to megabytes,
 * and copying it into the main thread would hold up every hover meanwhile.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { analyze, EvaluationMemo, EvaluationStopped } from '../language/index.js';
import type { EvaluationRequest, WorkerReply, WorkerStartData } from './evaluation-messages.js';
import { MemoShelf } from './memo-shelf.js';
import { slimForEditor } from './slim-analysis.js';

// A small program that touches the parser, name resolution, the evaluator and the presentation, so that
// a spare worker has all of them loaded and compiled before its first real request.
const WARM_UP_PROGRAM = 'space V dim 3\nvector p = (1, 2, 3)\nsubspace L = span(p, e1)\nshow plucker(L)\nclaim dim L = 2\n';

function describeError(error: unknown): string {
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}

function main(): void {
  const port = parentPort;
  if (!port) throw new Error('evaluation-worker must run as a worker thread');
  const send = (reply: WorkerReply) => port.postMessage(reply);

  const stopCell = new Int32Array((workerData as WorkerStartData | undefined)?.stopCell ?? new SharedArrayBuffer(4));
  const memos = new MemoShelf(() => new EvaluationMemo());

  analyze(WARM_UP_PROGRAM, { evaluate: true });
  send({ kind: 'ready' });

  port.on('message', (request: EvaluationRequest) => {
    const { id } = request;
    send({ kind: 'started', id });
    try {
      const analysis = analyze(request.text, {
        ...request.options,
        evaluate: true,
        memo: memos.for(request.document),
        onStatement: (span) => send({ kind: 'statement', id, span }),
        shouldStop: () => Atomics.load(stopCell, 0) === id,
      });
      send({ kind: 'finished', id, analysis: slimForEditor(analysis) });
    } catch (error) {
      if (error instanceof EvaluationStopped) send({ kind: 'stopped', id });
      // `analyze` catches its own failures; what lands here is a result that cannot be cloned.
      else send({ kind: 'failed', id, message: describeError(error) });
    }
  });
}

main();
