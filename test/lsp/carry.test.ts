/**
 * Carrying the last evaluation's spans through later edits (server/src/lsp/carry.ts).
 * The expected spans follow from the rule stated there, worked out by hand
 * (common practice, no source: the usual shift-or-invalidate treatment of
 * markers under text edits).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { applyEdit, carryAnalysis, carrySpan, editBetween, type Edit } from '../../server/src/lsp/carry.js';
import type { Analysis, Span } from '../../server/src/language/index.js';

const TEXT = 'space V dim 4\nvector p = (1, 0, 0, 0)\n';
const p = TEXT.indexOf('p =');
/** The name `p` in its declaration. */
const NAME_P: Span = { start: p, end: p + 1 };
/** The whole vector statement, without its line break. */
const STATEMENT: Span = { start: TEXT.indexOf('vector'), end: TEXT.length - 1 };

function edit(start: number, end: number, inserted: string): { edit: Edit; newText: string; inserted: string } {
  const e = { start, end, insertedLength: inserted.length };
  return { edit: e, newText: applyEdit(TEXT, e, inserted), inserted };
}

function carried(span: Span, change: ReturnType<typeof edit>): string | undefined {
  const moved = carrySpan(span, change.edit, change.newText);
  return moved && change.newText.slice(moved.start, moved.end);
}

describe('carrySpan', () => {
  test('an edit before a span shifts it; the span still covers the same text', () => {
    const change = edit(0, 0, '# a comment line\n');
    const moved = carrySpan(NAME_P, change.edit, change.newText);
    assert.deepEqual(moved, { start: NAME_P.start + 17, end: NAME_P.end + 17 });
    assert.equal(carried(STATEMENT, change), 'vector p = (1, 0, 0, 0)');
  });

  test('an edit after a span leaves it where it was', () => {
    const change = edit(TEXT.length, TEXT.length, 'show p\n');
    assert.deepEqual(carrySpan(NAME_P, change.edit, change.newText), NAME_P);
  });

  test('an edit inside a span drops it', () => {
    const inside = TEXT.indexOf('0, 0)');
    assert.equal(carrySpan(STATEMENT, edit(inside, inside + 1, '7').edit, edit(inside, inside + 1, '7').newText), undefined);
  });

  test('typing a letter against a name drops it (the name would change)', () => {
    assert.equal(carried(NAME_P, edit(NAME_P.start, NAME_P.start, 'x')), undefined, 'xp is another name');
    assert.equal(carried(NAME_P, edit(NAME_P.end, NAME_P.end, '2')), undefined, 'p2 is another name');
  });

  test('whitespace typed against a span keeps it', () => {
    assert.equal(carried(NAME_P, edit(NAME_P.end, NAME_P.end, '  ')), 'p');
    assert.equal(carried(STATEMENT, edit(STATEMENT.end, STATEMENT.end, '\n\n')), 'vector p = (1, 0, 0, 0)');
  });

  test('deleting the whole line above a statement keeps the statement', () => {
    const change = edit(0, STATEMENT.start, '');
    assert.equal(carried(STATEMENT, change), 'vector p = (1, 0, 0, 0)');
  });

  test('deleting the space between two words glues them, so the span goes', () => {
    // 'vector p' → 'vectorp': the statement now starts differently.
    const space = TEXT.indexOf(' p =');
    assert.equal(carried(NAME_P, edit(space, space + 1, '')), undefined);
  });
});

describe('editBetween', () => {
  test('finds the changed middle of two texts', () => {
    assert.deepEqual(editBetween('abc', 'abXc'), { start: 2, end: 2, insertedLength: 1 });
    assert.deepEqual(editBetween('abXc', 'abc'), { start: 2, end: 3, insertedLength: 0 });
    assert.deepEqual(editBetween('abc', 'abc'), { start: 3, end: 3, insertedLength: 0 });
  });

  test('never lets prefix and suffix overlap when characters repeat', () => {
    const e = editBetween('aaa', 'aaaa');
    assert.deepEqual(e, { start: 3, end: 3, insertedLength: 1 });
    assert.equal(applyEdit('aaa', e, 'a'), 'aaaa');
  });
});

describe('carryAnalysis', () => {
  const analysis: Analysis = {
    text: TEXT,
    evaluated: true,
    problems: [
      {
        code: 'claim/example',
        severity: 'error',
        message: 'about p',
        span: STATEMENT,
        related: [{ span: { start: 0, end: 7 }, message: 'the space' }], // 'space V'
      },
    ],
    results: [
      { kind: 'vector', name: 'p', span: STATEMENT, anchor: NAME_P, summary: 's', hover: 'h', latex: 'l', json: {} },
    ],
    references: [{ span: { start: TEXT.indexOf('V'), end: TEXT.indexOf('V') + 1 }, name: 'V', kind: 'space' }],
  };

  test('moves problems, related places, results and name uses into the new text', () => {
    const change = edit(0, 0, '\n');
    const moved = carryAnalysis(analysis, change.edit, change.newText);
    assert.equal(moved.text, change.newText);
    assert.deepEqual(moved.problems[0]!.span, { start: STATEMENT.start + 1, end: STATEMENT.end + 1 });
    assert.deepEqual(moved.problems[0]!.related, [{ span: { start: 1, end: 8 }, message: 'the space' }]);
    assert.deepEqual(moved.results[0]!.anchor, { start: NAME_P.start + 1, end: NAME_P.end + 1 });
    assert.equal(change.newText.slice(moved.references[0]!.span.start, moved.references[0]!.span.end), 'V');
  });

  test('drops what an edit touched and keeps the rest', () => {
    // Rename the space: `V` → `W` inside 'space V dim 4'.
    const v = TEXT.indexOf('V');
    const change = edit(v, v + 1, 'W');
    const moved = carryAnalysis(analysis, change.edit, change.newText);
    assert.equal(moved.references.length, 0, 'the use of V was edited');
    assert.deepEqual(moved.problems[0]!.related, [], 'the related place covered the edit');
    assert.equal(moved.problems.length, 1, 'the problem itself lies on another line');
    assert.equal(moved.results.length, 1);
  });
});
