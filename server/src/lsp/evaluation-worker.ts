/**
 * Entry point of an evaluation worker thread (bundled as dist/evaluation-worker.cjs).
 *
 * The server's main thread answers hovers, completions and the quick pass
 * while this thread runs the full evaluation, which can take seconds for a
 * large Grassmannian. The worker evaluates one request at a time and says
 * which statement it is on, so that a worker stopped for taking too long can
 * be blamed on the right line. Stopping is done from outside, by terminating
 * the thread: the evaluator needs no cancellation checks of its own.
 */
import { parentPort } from 'node:worker_threads';
import { analyze } from '../language/index.js';
import type { EvaluationRequest, WorkerReply } from './evaluation-messages.js';

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

  analyze(WARM_UP_PROGRAM, { evaluate: true });
  send({ kind: 'ready' });

  port.on('message', (request: EvaluationRequest) => {
    const { id } = request;
    send({ kind: 'started', id });
    try {
      const analysis = analyze(request.text, {
        ...request.options,
        evaluate: true,
        onStatement: (span) => send({ kind: 'statement', id, span }),
      });
      send({ kind: 'finished', id, analysis });
    } catch (error) {
      // `analyze` catches its own failures; what lands here is a result that cannot be cloned.
      send({ kind: 'failed', id, message: describeError(error) });
    }
  });
}

main();
