/**
 * The problems the server reports for an evaluation that stopped early
 * (server/src/lsp/evaluation-problems.ts): the code, where it sits, and that
 * the message names the setting to change. The project's own rules (common
 * practice, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { firstStatementSpan, statementMessage, unfinishedEvaluationProblem } from '../../server/src/lsp/evaluation-problems.js';

const TEXT = '# heavy\n\n  space V dim 20\nsubspace W = rows [1 0 0; 0 1 0]\n';
const W = { start: TEXT.indexOf('subspace'), end: TEXT.length - 1 };

describe('firstStatementSpan', () => {
  test('skips blank and comment lines and trims the line', () => {
    const span = firstStatementSpan(TEXT);
    assert.equal(TEXT.slice(span.start, span.end), 'space V dim 20');
  });

  test('an empty or comment-only text gives the start', () => {
    assert.deepEqual(firstStatementSpan(''), { start: 0, end: 0 });
    assert.deepEqual(firstStatementSpan('# only\n   \n'), { start: 0, end: 0 });
  });
});

describe('unfinishedEvaluationProblem', () => {
  test('a timeout is limit/timeout on the statement it was on, naming the setting and how to lift it', () => {
    const problem = unfinishedEvaluationProblem({ status: 'stopped', reason: 'timeout', statement: W, elapsedMs: 2000 }, TEXT, 2000);
    assert.ok(problem);
    assert.equal(problem.code, 'limit/timeout');
    assert.equal(problem.severity, 'error');
    assert.deepEqual(problem.span, W);
    assert.match(problem.message, /wedgework\.limits\.timeoutMs/);
    assert.match(problem.message, /2000 ms/);
    assert.match(problem.message, /0 for no limit/);
  });

  test('without a statement it sits on the first statement', () => {
    const problem = unfinishedEvaluationProblem({ status: 'stopped', reason: 'timeout', elapsedMs: 10 }, TEXT, 10);
    assert.equal(TEXT.slice(problem!.span.start, problem!.span.end), 'space V dim 20');
  });

  test('a cancellation by the user is information, running out of memory and other failures are errors', () => {
    const cancelled = unfinishedEvaluationProblem({ status: 'stopped', reason: 'user', statement: W, elapsedMs: 1 }, TEXT, 0);
    assert.equal(cancelled?.code, 'limit/cancelled');
    assert.equal(cancelled?.severity, 'information');
    const memory = unfinishedEvaluationProblem({ status: 'failed', message: 'oom', outOfMemory: true, statement: W, elapsedMs: 1 }, TEXT, 0);
    assert.equal(memory?.code, 'limit/memory');
    assert.match(memory!.message, /wedgework\.limits\.maxCoordinates/);
    const failed = unfinishedEvaluationProblem({ status: 'failed', message: 'boom', outOfMemory: false, elapsedMs: 1 }, TEXT, 0);
    assert.equal(failed?.code, 'internal/error');
    assert.match(failed!.message, /boom/);
  });

  test('finished and replaced evaluations have no problem', () => {
    assert.equal(unfinishedEvaluationProblem({ status: 'cancelled' }, TEXT, 0), undefined);
    const analysis = { text: TEXT, problems: [], results: [], references: [], evaluated: true };
    assert.equal(unfinishedEvaluationProblem({ status: 'finished', analysis, elapsedMs: 1 }, TEXT, 0), undefined);
  });
});

describe('statementMessage', () => {
  test('names the line (from 1) and the statement\'s first line, shortened', () => {
    assert.equal(statementMessage(TEXT, W), 'line 4: subspace W = rows [1 0 0; 0 1 0]');
    assert.equal(statementMessage(TEXT, W, 12), 'line 4: subspace W…');
  });
});
