/**
 * The problems the server itself reports about an evaluation that did not
 * finish: it ran past `wedgework.limits.timeoutMs` (`limit/timeout`), it ran
 * out of memory (`limit/memory`), the user cancelled it (`limit/cancelled`),
 * or the worker failed (`internal/error`). Each sits on the statement the
 * evaluation was on, or on the first statement when that is not known, and
 * says what to do next.
 */
import type { Problem, Span } from '../language/index.js';
import type { EvaluationOutcome } from './evaluation-scheduler.js';

/** The first line that is neither blank nor a comment (the file's first statement, roughly), else the start. */
export function firstStatementSpan(text: string): Span {
  const line = /^[ \t]*([^\s#][^\n]*?)[ \t\r]*$/m.exec(text);
  if (!line) return { start: 0, end: 0 };
  const start = line.index + line[0].indexOf(line[1]!);
  return { start, end: start + line[1]!.length };
}

function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(ms < 10_000 ? 1 : 0)} s`;
}

/** The problem for an evaluation that ended without results, or `undefined` for one that finished or was replaced. */
export function unfinishedEvaluationProblem(outcome: EvaluationOutcome, text: string, timeoutMs: number): Problem | undefined {
  if (outcome.status === 'finished' || outcome.status === 'cancelled') return undefined;
  const span = outcome.statement ?? firstStatementSpan(text);
  if (outcome.status === 'stopped' && outcome.reason === 'timeout') {
    return {
      code: 'limit/timeout',
      severity: 'error',
      message:
        `evaluation stopped here after ${seconds(outcome.elapsedMs)}: it reached the time limit of ${timeoutMs} ms ` +
        `(setting wedgework.limits.timeoutMs). Raise that setting, or set it to 0 for no limit, to let this file finish; ` +
        `results below this statement are not computed.`,
      span,
    };
  }
  if (outcome.status === 'stopped') {
    return {
      code: 'limit/cancelled',
      severity: 'information',
      message: `evaluation cancelled here after ${seconds(outcome.elapsedMs)}; save the file to evaluate it again.`,
      span,
    };
  }
  if (outcome.outOfMemory) {
    return {
      code: 'limit/memory',
      severity: 'error',
      message:
        'evaluation stopped here: it ran out of memory. Make the computation smaller, or lower ' +
        'wedgework.limits.maxCoordinates so that oversized ones are refused before they start.',
      span,
    };
  }
  return {
    code: 'internal/error',
    severity: 'error',
    message: `internal error while evaluating this statement (please report it): ${outcome.message}`,
    span,
  };
}

/** A one-line description of the statement at `span`, for the progress indicator: `line 12: subspace W = …`. */
export function statementMessage(text: string, span: Span, maxLength = 48): string {
  const line = text.slice(0, span.start).split('\n').length;
  const firstLine = text.slice(span.start, span.end).split('\n')[0]!.trim();
  const shown = firstLine.length > maxLength ? `${firstLine.slice(0, maxLength - 1).trimEnd()}…` : firstLine;
  return `line ${line}: ${shown}`;
}
