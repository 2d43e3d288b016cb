/**
 * The evaluation memo (server/src/language/statement-memo.ts) must be invisible: an evaluation that replays
 * remembered statements gives exactly the results and problems of an evaluation from scratch, after any edit,
 * and it evaluates again only the edited statement and what depends on it. (An equivalence of two ways of
 * computing the same thing, and the memo's own promise: common practice, no source.)
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze, EvaluationMemo, EvaluationStopped, type Analysis } from '../../server/src/language/index.js';

const SAMPLES = readdirSync('samples')
  .filter((f) => f.endsWith('.wedge'))
  .map((f) => ({ name: f, text: readFileSync(join('samples', f), 'utf8') }));

function outcome(analysis: Analysis): unknown {
  return { problems: analysis.problems, results: analysis.results, convention: analysis.convention };
}

/** Single-character edits spread over the text: a digit typed, a character deleted, a line broken. */
function scatteredEdits(text: string, count: number): string[] {
  const out: string[] = [];
  for (let i = 1; i <= count; i++) {
    const at = Math.floor((i * text.length) / (count + 1));
    switch (i % 3) {
      case 0:
        out.push(`${text.slice(0, at)}3${text.slice(at)}`);
        break;
      case 1:
        out.push(`${text.slice(0, at)}${text.slice(at + 1)}`);
        break;
      default:
        out.push(`${text.slice(0, at)}\n${text.slice(at)}`);
    }
  }
  return out;
}

describe('the evaluation memo', () => {
  for (const sample of SAMPLES) {
    test(`${sample.name}: evaluations with the memo equal evaluations from scratch after each edit`, () => {
      const memo = new EvaluationMemo();
      assert.deepEqual(outcome(analyze(sample.text, { evaluate: true, memo })), outcome(analyze(sample.text, { evaluate: true })));
      for (const text of scatteredEdits(sample.text, 24)) {
        const remembered = analyze(text, { evaluate: true, memo });
        assert.deepEqual(outcome(remembered), outcome(analyze(text, { evaluate: true })), `after an edit at ${text.length}`);
      }
      // And back to the original text, whose statements the memo may have forgotten meanwhile.
      assert.deepEqual(outcome(analyze(sample.text, { evaluate: true, memo })), outcome(analyze(sample.text, { evaluate: true })));
    });
  }

  const CHAIN = [
    'field QQ',
    'space V dim 4',
    'vector a = (1, 0, 2, 0)',
    'vector b = (0, 1, 0, 3)',
    'vector c = (1, 1, 1, 1)',
    'subspace W = span(a, b)',
    'subspace U = span(c, e4)',
    'show plucker(W)',
    'show plucker(U)',
    'claim dim W = 2',
    '',
  ];

  test('an edit re-evaluates the edited statement and its dependents only', () => {
    const memo = new EvaluationMemo();
    analyze(CHAIN.join('\n'), { evaluate: true, memo });
    assert.equal(memo.evaluated, CHAIN.length - 1);
    // b feeds W, which feeds `show plucker(W)` and the claim; c, U and its show are left alone.
    const edited = CHAIN.map((line) => (line.startsWith('vector b') ? 'vector b = (0, 1, 0, 5)' : line)).join('\n');
    const remembered = analyze(edited, { evaluate: true, memo });
    assert.equal(memo.evaluated, 4, 'b, W, show plucker(W) and the claim');
    assert.equal(memo.replayed, CHAIN.length - 1 - 4);
    assert.deepEqual(outcome(remembered), outcome(analyze(edited, { evaluate: true })));
  });

  test('moving statements by an edit above them replays them at their new place', () => {
    const memo = new EvaluationMemo();
    const text = CHAIN.join('\n');
    analyze(text, { evaluate: true, memo });
    const moved = `# a comment line above everything\n${text}`;
    const remembered = analyze(moved, { evaluate: true, memo });
    assert.equal(memo.evaluated, 0);
    assert.deepEqual(outcome(remembered), outcome(analyze(moved, { evaluate: true })));
  });

  test('a change of field or convention evaluates everything again', () => {
    const memo = new EvaluationMemo();
    analyze(CHAIN.join('\n'), { evaluate: true, memo });
    const overGF = CHAIN.map((line) => (line === 'field QQ' ? 'field GF(7)' : line)).join('\n');
    assert.deepEqual(outcome(analyze(overGF, { evaluate: true, memo })), outcome(analyze(overGF, { evaluate: true })));
    assert.equal(memo.replayed, 0);
    const colex = `${CHAIN.join('\n')}convention order colex\n`;
    assert.deepEqual(outcome(analyze(colex, { evaluate: true, memo })), outcome(analyze(colex, { evaluate: true })));
    assert.equal(memo.replayed, 0);
    analyze(CHAIN.join('\n'), { evaluate: true, memo, limits: { maxCoordinates: 10 } });
    assert.equal(memo.replayed, 0, 'the limits are part of the context too');
  });

  test('declaring a name earlier, deleting a declaration and renaming are followed', () => {
    const memo = new EvaluationMemo();
    const variants = [
      CHAIN.join('\n'),
      // A duplicate declaration of W before the first one: the later one becomes the duplicate.
      CHAIN.map((line) => (line.startsWith('vector c') ? `${line}\nsubspace W = span(c)` : line)).join('\n'),
      // b deleted: W's span has an unknown name.
      CHAIN.filter((line) => !line.startsWith('vector b')).join('\n'),
      // a renamed at its declaration only.
      CHAIN.map((line) => (line.startsWith('vector a') ? 'vector a2 = (1, 0, 2, 0)' : line)).join('\n'),
      CHAIN.join('\n'),
    ];
    for (const text of variants) {
      assert.deepEqual(outcome(analyze(text, { evaluate: true, memo })), outcome(analyze(text, { evaluate: true })), text);
    }
  });

  test('shouldStop stops between statements, and the memo keeps what was evaluated before', () => {
    const memo = new EvaluationMemo();
    let asked = 0;
    assert.throws(
      () => analyze(CHAIN.join('\n'), { evaluate: true, memo, shouldStop: () => ++asked > 5 }),
      (error: unknown) => error instanceof EvaluationStopped,
    );
    const full = analyze(CHAIN.join('\n'), { evaluate: true, memo });
    assert.equal(memo.replayed, 5, 'the five statements evaluated before the stop are replayed');
    assert.deepEqual(outcome(full), outcome(analyze(CHAIN.join('\n'), { evaluate: true })));
  });

  test('a finite field with a named generator: replays agree with evaluations from scratch', () => {
    const memo = new EvaluationMemo();
    const text = ['field GF(8) generator g', 'space V dim 3', 'vector v = (1, g, g^2)', 'subspace L = span(v, e3)', 'show plucker(L)', ''].join('\n');
    analyze(text, { evaluate: true, memo });
    const edited = text.replace('e3', 'e2');
    assert.deepEqual(outcome(analyze(edited, { evaluate: true, memo })), outcome(analyze(edited, { evaluate: true })));
    assert.equal(memo.replayed, 3);
  });
});
