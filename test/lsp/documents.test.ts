/**
 * Which problems the server shows for a document between two evaluations
 * (the rule documented in server/src/lsp/documents.ts): fresh quick-pass
 * problems, plus carried evaluation problems from the bands the quick pass
 * does not report. The analyses here are hand-made inputs to that rule.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { analysisForQueries, DocumentStore, problemsToShow } from '../../server/src/lsp/documents.js';
import type { Analysis, Problem } from '../../server/src/language/index.js';

const URI = 'file:///rule.wedge';
const TEXT = 'space V dim 4\nclaim dim V = 5\n';
const claimStart = TEXT.indexOf('claim');

const claimProblem: Problem = {
  code: 'claim/example',
  severity: 'error',
  message: 'false',
  span: { start: claimStart, end: TEXT.length - 1 },
};
const oldSyntaxProblem: Problem = { code: 'syntax/example', severity: 'error', message: 'old', span: { start: 0, end: 5 } };

function analysisOf(text: string, problems: Problem[]): Analysis {
  return { text, problems, results: [], references: [], evaluated: true };
}

function positionAt(text: string, offset: number) {
  const lines = text.slice(0, offset).split('\n');
  return { line: lines.length - 1, character: lines[lines.length - 1]!.length };
}

describe('problemsToShow', () => {
  test('right after an evaluation: exactly its problems', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.recordEvaluation(entry, analysisOf(TEXT, [oldSyntaxProblem, claimProblem]));
    assert.deepEqual(problemsToShow(entry), [oldSyntaxProblem, claimProblem]);
  });

  test('after typing elsewhere: fresh quick problems plus the carried claim, not the stale syntax problem', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.recordEvaluation(entry, analysisOf(TEXT, [oldSyntaxProblem, claimProblem]));
    const end = positionAt(TEXT, TEXT.length);
    store.change(URI, 2, [{ range: { start: end, end }, text: 'show (\n' }]);
    const freshSyntax: Problem = { code: 'syntax/example', severity: 'error', message: 'new', span: { start: 30, end: 31 } };
    store.recordQuick(entry, analysisOf(entry.document.getText(), [freshSyntax]));
    assert.deepEqual(problemsToShow(entry), [freshSyntax, claimProblem]);
  });

  test('a quick pass of an older version is not shown', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.recordQuick(entry, analysisOf(TEXT, [oldSyntaxProblem]));
    store.change(URI, 2, [{ text: `${TEXT}\n` }]);
    assert.deepEqual(problemsToShow(entry), []);
  });

  test('editing the claim itself removes its carried problem', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.recordEvaluation(entry, analysisOf(TEXT, [claimProblem]));
    const five = TEXT.indexOf('5');
    // A whole-text change, as clients without incremental sync send it.
    store.change(URI, 2, [{ text: TEXT.slice(0, five) + '4' + TEXT.slice(five + 1) }]);
    assert.equal(entry.document.version, 2);
    assert.deepEqual(problemsToShow(entry), []);
  });

  test('queries keep answering from the carried evaluation while typing', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    const evaluated = analysisOf(TEXT, [claimProblem]);
    store.recordEvaluation(entry, evaluated);
    store.change(URI, 2, [{ range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } }, text: '\n' }]);
    const answering = analysisForQueries(entry);
    assert.ok(answering);
    assert.equal(answering.text, `\n${TEXT}`);
    assert.deepEqual(answering.problems[0]!.span, { start: claimProblem.span.start + 1, end: claimProblem.span.end + 1 });
  });
});
