/**
 * The messages between the server's main thread and an evaluation worker
 * (./evaluation-worker.ts). They cross the thread boundary by structured
 * clone, so they hold plain data only: the language facade's `Analysis` is
 * plain data (strings, numbers, arrays and plain objects), which
 * test/lsp/evaluation-messages.test.ts checks on every sample.
 */
import type { Analysis, AnalyzeOptions, Span } from '../language/index.js';

/** What the worker passes to `analyze` besides `evaluate: true` (the hook is the worker's own). */
export type EvaluationOptions = Omit<AnalyzeOptions, 'evaluate' | 'onStatement'>;

/**
 * Main thread → worker: evaluate this text. `id` ties the replies to the request; `document` names the
 * document, whose memo of statement outcomes the worker keeps (so that the next evaluation of the same
 * document on the same worker evaluates only what changed).
 */
export interface EvaluationRequest {
  id: number;
  document: string;
  text: string;
  options: EvaluationOptions;
}

/**
 * Given to each worker when it starts: one 32-bit cell shared with the main thread, into which the main
 * thread writes the id of a request it wants stopped. The worker reads it before each statement, so that
 * an evaluation made useless by a newer version of the document ends within one statement, and the
 * thread, with what it remembers, stays alive.
 */
export interface WorkerStartData {
  stopCell: SharedArrayBuffer;
}

/** Worker → main thread. */
export type WorkerReply =
  /** Sent once, after the worker has loaded and warmed up the language layer. */
  | { kind: 'ready' }
  /** The request was received and its evaluation begins now. */
  | { kind: 'started'; id: number }
  /** The statement at `span` is about to be evaluated. */
  | { kind: 'statement'; id: number; span: Span }
  | { kind: 'finished'; id: number; analysis: Analysis }
  /** The evaluation stopped between two statements, as the main thread asked through the stop cell. */
  | { kind: 'stopped'; id: number }
  /** The evaluation ended without an analysis (a defect: `analyze` itself never throws on user input). */
  | { kind: 'failed'; id: number; message: string };
