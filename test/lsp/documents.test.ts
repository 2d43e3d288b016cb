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

describe('evaluations that end after the user typed on', () => {
  const atStart = { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } };
  const timeout: Problem = { code: 'limit/timeout', severity: 'error', message: 'stopped', span: { start: claimStart, end: TEXT.length - 1 } };

  test('a late analysis is carried through the edits made while it ran', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    const ticket = store.beginEvaluation(entry);
    store.change(URI, 2, [{ range: atStart, text: '# a\n' }]);
    store.change(URI, 3, [{ range: atStart, text: '\n' }]);
    store.recordEvaluation(entry, analysisOf(TEXT, [claimProblem]), ticket);
    assert.equal(entry.evaluation?.version, 1, 'it describes the version that was evaluated');
    assert.equal(entry.evaluation?.analysis.text, entry.document.getText(), 'its spans index the current text');
    const shifted = { start: claimProblem.span.start + 5, end: claimProblem.span.end + 5 };
    assert.deepEqual(problemsToShow(entry).map((p) => p.span), [shifted]);
    assert.equal(entry.document.getText().slice(shifted.start, shifted.end), 'claim dim V = 5');
    assert.deepEqual(entry.editLog, [], 'nothing is in flight any more, so no edits are kept');
  });

  test('edits are logged only while an evaluation is in flight', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.change(URI, 2, [{ range: atStart, text: '\n' }]);
    assert.deepEqual(entry.editLog, []);
    const ticket = store.beginEvaluation(entry);
    store.change(URI, 3, [{ range: atStart, text: '\n' }]);
    assert.equal(entry.editLog.length, 1);
    store.abandonEvaluation(entry, ticket);
    assert.deepEqual(entry.editLog, []);
  });

  test('an analysis older than the one recorded is ignored', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    const older = store.beginEvaluation(entry);
    store.change(URI, 2, [{ range: atStart, text: '\n' }]);
    const newer = store.beginEvaluation(entry);
    const current = entry.document.getText();
    store.recordEvaluation(entry, analysisOf(current, []), newer);
    store.recordEvaluation(entry, analysisOf(TEXT, [claimProblem]), older);
    assert.equal(entry.evaluation?.version, 2);
    assert.deepEqual(problemsToShow(entry), []);
  });

  test('a stopped evaluation shows its problem beside the quick pass, until the next evaluation ends', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    const ticket = store.beginEvaluation(entry);
    store.change(URI, 2, [{ range: atStart, text: '\n' }]);
    store.recordStopped(entry, TEXT, timeout, ticket);
    const freshSyntax: Problem = { code: 'syntax/example', severity: 'error', message: 'new', span: { start: 0, end: 1 } };
    store.recordQuick(entry, analysisOf(entry.document.getText(), [freshSyntax]));
    const shown = problemsToShow(entry);
    assert.deepEqual(shown.map((p) => p.code), ['syntax/example', 'limit/timeout']);
    assert.deepEqual(shown[1]!.span, { start: timeout.span.start + 1, end: timeout.span.end + 1 }, 'carried through the edit');

    const next = store.beginEvaluation(entry);
    store.recordEvaluation(entry, analysisOf(entry.document.getText(), []), next);
    assert.deepEqual(problemsToShow(entry), []);
    assert.equal(entry.stopped, undefined);
  });

  test('a stopped evaluation keeps the last results for hovers and lenses', () => {
    const store = new DocumentStore();
    const entry = store.open(URI, 'wedge', 1, TEXT);
    store.recordEvaluation(entry, analysisOf(TEXT, [claimProblem]));
    const ticket = store.beginEvaluation(entry);
    store.recordStopped(entry, TEXT, timeout, ticket);
    assert.equal(analysisForQueries(entry)?.problems[0], claimProblem);
    // The same version was evaluated again and stopped: the stop is the news, beside the carried claim.
    assert.deepEqual(problemsToShow(entry).map((p) => p.code), ['claim/example', 'limit/timeout']);
  });
});
