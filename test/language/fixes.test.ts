/**
 * Quick fixes and the other edit actions of the language layer. Each check
 * applies the edit to the text, analyses the new text again and asserts that
 * the problem is gone (or the `show` result is there) and that the new text
 * is exactly the old one with the intended part changed — nothing else.
 *
 * The corrected values come from outside our code: mathjs determinants for
 * Plücker coordinates, Gaussian binomials from OEIS, partitions from the
 * formula λ_j = n − k + j − i_j (Fulton, "Young Tableaux", §9.4, from memory),
 * and hand computation where it is a line of arithmetic.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import { actionsAt, analyze, applyEdits, type Analysis, type AnalyzeOptions, type EditAction, type Problem } from '../../server/src/language/index.js';

const math = create(all, { number: 'Fraction' });

/** The maximal minors of a 2×n matrix (columns i < j, lexicographic), by mathjs determinants. */
function minors2(rows: number[][]): { labels: string[]; values: string[] } {
  const n = rows[0]!.length;
  const labels: string[] = [];
  const values: string[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const d = math.det(math.matrix([[rows[0]![i]!, rows[0]![j]!], [rows[1]![i]!, rows[1]![j]!]].map((r) => r.map((x) => math.fraction(x)))));
      labels.push(`${i + 1}${j + 1}`);
      values.push(math.format(d, { fraction: 'ratio' }).replace(/\/1$/, ''));
    }
  }
  return { labels, values };
}

function evaluated(text: string, options: Partial<AnalyzeOptions> = {}): Analysis {
  return analyze(text, { evaluate: true, ...options });
}

function problemWith(analysis: Analysis, code: string): Problem {
  const p = analysis.problems.find((x) => x.code === code);
  assert.ok(p, `no ${code} among ${analysis.problems.map((x) => `${x.code}: ${x.message}`).join(' | ')}`);
  return p;
}

/**
 * Applies the fix of the problem `code` whose title matches `title` (the
 * first one by default) and checks the result is `expected`, in which the
 * problem is gone.
 */
function applyFix(text: string, code: string, expected: string, options: Partial<AnalyzeOptions> = {}, title?: RegExp): Analysis {
  const before = evaluated(text, options);
  const problem = problemWith(before, code);
  const fixes = problem.fixes ?? [];
  const fix = title ? fixes.find((f) => title.test(f.title)) : fixes[0];
  assert.ok(fix, `the problem ${code} offers a fix${title ? ` titled ${title}` : ''}; it offers ${JSON.stringify(fixes.map((f) => f.title))}`);
  const fixed = applyEdits(text, fix.edits);
  assert.equal(fixed, expected);
  const after = evaluated(fixed, options);
  assert.deepEqual(
    after.problems.map((p) => `${p.code}: ${p.message}`),
    before.problems.filter((p) => p !== problem).map((p) => `${p.code}: ${p.message}`),
    'exactly the fixed problem is gone',
  );
  return after;
}

/** `text` with the one occurrence of `from` replaced by `to` (the occurrence must be unique). */
function replaced(text: string, from: string, to: string): string {
  assert.equal(text.split(from).length, 2, `${JSON.stringify(from)} occurs once`);
  return text.replace(from, to);
}

const PLANE = ['space V dim 4', 'vector p = (1, 0, 0, 0)', 'vector q = (0, 1, 0, 0)', 'subspace L = span(p, q)', ''].join('\n');

describe('fixes of false claims: the computed value replaces the claimed one', () => {
  test('a dimension: two independent vectors span a plane (common practice, no source)', () => {
    const text = `${PLANE}claim dim L = 3\n`;
    applyFix(text, 'claim/dimension', replaced(text, 'dim L = 3', 'dim L = 2'));
  });

  test('a dimension compared with another: no number to replace, no fix', () => {
    const a = evaluated(`${PLANE}claim dim L = dim V\n`);
    assert.equal(problemWith(a, 'claim/dimension').fixes, undefined);
  });

  test('a count over GF(2): [4 choose 2]_2 = 35 two-dimensional subspaces of GF(2)^4 (OEIS A006095)', () => {
    const text = 'field GF(2)\nspace V dim 4\nclaim count(2, V) = 30\n';
    applyFix(text, 'claim/dimension', replaced(text, '= 30', '= 35'));
  });

  test('a Plücker point, lexicographic and primitive: the minors by mathjs', () => {
    const rows = [[1, 0, 2, 0], [0, 1, 3, 1]];
    const { values } = minors2(rows);
    const text = 'space V dim 4\nsubspace W = rows [ 1 0 2 0\n                    0 1 3 1 ]\nclaim plucker(W) = [1 : 3 : 1 : -2 : 0 : 5]\n';
    applyFix(text, 'claim/plucker', replaced(text, '[1 : 3 : 1 : -2 : 0 : 5]', `[${values.join(' : ')}]`));
  });

  test('a Plücker point in colex order: the minors by mathjs, listed 12, 13, 23, 14, 24, 34', () => {
    const { labels, values } = minors2([[1, 0, 2, 0], [0, 1, 3, 1]]);
    const colex = ['12', '13', '23', '14', '24', '34'].map((l) => values[labels.indexOf(l)]!);
    const text = 'convention order colex\nspace V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nclaim plucker(W) = [1 : 3 : 1 : -2 : 0 : 2]\n';
    applyFix(text, 'claim/plucker', replaced(text, '[1 : 3 : 1 : -2 : 0 : 2]', `[${colex.join(' : ')}]`));
  });

  test('a Plücker point under `normalize raw`: the minors of the basis as given, by mathjs', () => {
    const { values } = minors2([[2, 0, 4, 0], [0, 1, 3, 1]]);
    const text = 'normalize raw\nspace V dim 4\nsubspace W = rows [2 0 4 0; 0 1 3 1]\nclaim plucker(W) = [1 : 1 : 1 : 1 : 1 : 1]\n';
    applyFix(text, 'claim/plucker', replaced(text, '[1 : 1 : 1 : 1 : 1 : 1]', `[${values.join(' : ')}]`));
  });

  test('a Plücker point of the wrong length is replaced by the whole computed point', () => {
    const { values } = minors2([[1, 0, 2, 0], [0, 1, 3, 1]]);
    const text = 'space V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nclaim plucker(W) = [1 : 3 : 1]\n';
    applyFix(text, 'type/wrong-length', replaced(text, '[1 : 3 : 1]', `[${values.join(' : ')}]`));
  });

  test('a Schubert partition: span(e2, e4) in G(2,4) has jumps 2, 4 and λ = (4−2+1−2, 4−2+2−4) = (1, 0)', () => {
    const text = 'space V dim 4\nsubspace W = span(e2, e4)\nclaim schubert(W) = (2, 1)\n';
    applyFix(text, 'claim/schubert', replaced(text, '(2, 1)', '1'));
  });

  test('a Schubert partition in a 2×3 box: span(e2, e4) in G(2,5) has λ = (5−2+1−2, 5−2+2−4) = (2, 1)', () => {
    const text = 'space V dim 5\nsubspace W = span(e2, e4)\nclaim schubert(W) = (3)\n';
    applyFix(text, 'claim/schubert', replaced(text, '(3)', '(2, 1)'));
  });

  test('a scalar: 1/2 + 1/3 = 5/6 (common practice, no source)', () => {
    const text = 'claim 1/2 + 1/3 = 1\n';
    applyFix(text, 'claim/equality', replaced(text, '= 1', '= 5/6'));
  });

  test('a scalar over GF(7): 3 · 5 = 15 = 1 mod 7 (common practice, no source)', () => {
    const text = 'field GF(7)\nclaim 3 * 5 = 2\n';
    applyFix(text, 'claim/equality', replaced(text, '= 2', '= 1'));
  });

  test('a vector written as a tuple', () => {
    const text = `${PLANE}vector r = p + 2 q\nclaim r = (1, 1, 0, 0)\n`;
    applyFix(text, 'claim/equality', replaced(text, '(1, 1, 0, 0)', '(1, 2, 0, 0)'));
  });

  test('no fix where there is no value to correct: a false != and a false decomposability claim', () => {
    const a = evaluated(`${PLANE}claim dim L != 2\nmultivector eta = e1^e2 + e3^e4\nclaim eta decomposable\n`);
    assert.equal(problemWith(a, 'claim/inequality').fixes, undefined);
    assert.equal(problemWith(a, 'claim/decomposable').fixes, undefined);
  });

  test('no fix when the computed point has no literal form: coordinates in GF(4) are expressions in the generator', () => {
    const a = evaluated('field GF(4) generator w\nspace V dim 3\nsubspace W = span((1, w, 0), (0, 1, 1))\nclaim plucker(W) = [1 : 0 : 0]\n');
    const p = problemWith(a, 'claim/plucker');
    // p12 = 1, p13 = 1·1 − 0·0 = 1, p23 = w·1 − 0·1 = w (hand computation): w is no rational literal.
    assert.match(p.message, /w/);
    assert.equal(p.fixes, undefined);
  });
});

describe('fixes of a dependent list: the dependent vectors go, the rest of the text stays', () => {
  test('span(p, q, r) with r = p + q becomes span(p, q)', () => {
    const text = `${PLANE}vector r = p + q\nsubspace M = span(p, q, r)\n`;
    applyFix(text, 'math/degenerate-span', replaced(text, 'span(p, q, r)', 'span(p, q)'));
  });

  test('a dependent vector in the middle takes its comma and space with it', () => {
    const text = `${PLANE}vector r = 2 p\nsubspace M = span(p, r, q)\n`;
    applyFix(text, 'math/degenerate-span', replaced(text, 'span(p, r, q)', 'span(p, q)'));
  });

  test('a zero vector in front goes with the separator after it', () => {
    const text = `${PLANE}vector z = (0, 0, 0, 0)\nsubspace M = span(z,  p, q)\n`;
    applyFix(text, 'math/degenerate-span', replaced(text, 'span(z,  p, q)', 'span(p, q)'));
  });

  test('several dependent vectors go at once, leaving a basis: span(p, p, q, p + q) becomes span(p, q)', () => {
    const text = `${PLANE}subspace M = span(p, 2 p, q, p + q)\n`;
    applyFix(text, 'math/degenerate-span', replaced(text, 'span(p, 2 p, q, p + q)', 'span(p, q)'));
  });

  test('arguments on lines of their own', () => {
    const text = `${PLANE}subspace M = span(p,\n                  q,\n                  p - q)\nshow M\n`;
    applyFix(text, 'math/degenerate-span', replaced(text, 'span(p,\n                  q,\n                  p - q)', 'span(p,\n                  q)'));
  });

  test('no fix that would delete a comment', () => {
    const a = evaluated(`${PLANE}subspace M = span(p, q, # the sum comes next\n  p + q)\n`);
    assert.equal(problemWith(a, 'math/degenerate-span').fixes, undefined);
  });

  test('rows [ … ] with row 2 = 2·row 1: drop the row, or write the reduced basis', () => {
    const text = 'space V dim 3\nsubspace M = rows [ 1 2 3\n                    2 4 6\n                    0 1 1 ] in V\n';
    applyFix(text, 'math/degenerate-rows', replaced(text, ' 1 2 3\n                    2 4 6\n', ' 1 2 3\n'), {}, /^Drop row 2/);
    // Reduced row echelon form by hand: row 1 − 2·row 3 = (1, 0, 1), row 3 = (0, 1, 1).
    applyFix(
      text,
      'math/degenerate-rows',
      replaced(text, '[ 1 2 3\n                    2 4 6\n                    0 1 1 ]', '[ 1 0 1\n                    0 1 1 ]'),
      {},
      /reduced basis/,
    );
  });

  test('rows on one line split by semicolons keep that style', () => {
    const text = 'space V dim 3\nsubspace M = rows [1, 2, 3; 2, 4, 6; 0, 1, 1]\n';
    applyFix(text, 'math/degenerate-rows', replaced(text, '[1, 2, 3; 2, 4, 6; 0, 1, 1]', '[1, 2, 3; 0, 1, 1]'), {}, /^Drop row 2/);
    applyFix(text, 'math/degenerate-rows', replaced(text, '[1, 2, 3; 2, 4, 6; 0, 1, 1]', '[1, 0, 1; 0, 1, 1]'), {}, /reduced basis/);
  });

  test('columns [ … ] with column 2 = 2·column 1: its entry goes from every row', () => {
    const text = 'space V dim 3\nsubspace M = columns [ 1 2 0\n                       2 4 1\n                       3 6 1 ]\n';
    applyFix(text, 'math/degenerate-rows', replaced(text, '[ 1 2 0\n                       2 4 1\n                       3 6 1 ]', '[ 1 0\n                       2 1\n                       3 1 ]'), {}, /^Drop column 2/);
  });
});

describe('actions at a place: rewrite a basis, add a show line', () => {
  function action(analysis: Analysis, at: string, title: RegExp, index = 0): EditAction | undefined {
    const offset = analysis.text.indexOf(at) + index;
    return actionsAt(analysis, { start: offset, end: offset }).find((a) => title.test(a.title));
  }

  test('a rows basis that is not reduced: rewritten as its reduced basis, the subspace unchanged', () => {
    // Reduced row echelon form of [1 2 3; 4 5 6] by hand: row 2 − 4·row 1 = (0, −3, −6) → (0, 1, 2);
    // row 1 − 2·(0, 1, 2) = (1, 0, −1).
    const text = 'space V dim 3\nsubspace W = rows [ 1 2 3\n                    4 5 6 ]\nshow plucker(W)\n';
    const before = evaluated(text);
    const rewrite = action(before, 'rows [', /reduced basis/);
    assert.ok(rewrite);
    assert.equal(rewrite.kind, 'rewrite');
    const fixed = applyEdits(text, rewrite.edits);
    assert.equal(fixed, replaced(text, '[ 1 2 3\n                    4 5 6 ]', '[ 1 0 -1\n                    0 1  2 ]'));
    const after = evaluated(fixed);
    assert.deepEqual(after.problems, []);
    const basis = (a: Analysis) => a.results.find((r) => r.name === 'W')!.json.basis;
    assert.deepEqual(basis(after), basis(before));
    assert.equal(action(after, 'rows [', /reduced basis/), undefined, 'a reduced basis is not offered again');
  });

  test('on the name of a subspace: show plucker(L) on the next line, which re-analysis shows', () => {
    const text = `${PLANE}claim dim L = 2\n`;
    const a = evaluated(text);
    const add = action(a, 'subspace L', /show plucker\(L\)/, 'subspace '.length);
    assert.ok(add);
    assert.equal(add.kind, 'insert');
    const fixed = applyEdits(text, add.edits);
    assert.equal(fixed, replaced(text, 'span(p, q)\n', 'span(p, q)\nshow plucker(L)\n'));
    const shows = evaluated(fixed).results.filter((r) => r.kind === 'show');
    assert.equal(shows.length, 1);
    // span(e1, e2): only p12 is nonzero (Harris, "Algebraic Geometry: A First Course", Lecture 6, from memory).
    assert.match(shows[0]!.summary, /\[1 : 0 : 0 : 0 : 0 : 0\]/);
    assert.equal(action(evaluated(fixed), 'subspace L', /show plucker\(L\)/, 'subspace '.length), undefined, 'offered once');
  });

  test('on the name of a vector: show p, indented like its statement, with the file\'s line breaks', () => {
    const text = 'space V dim 2\r\n  vector p = (1, 2)   # a comment\r\nshow dim V\r\n';
    const a = evaluated(text);
    const add = action(a, 'p =', /show p/);
    assert.ok(add);
    const fixed = applyEdits(text, add.edits);
    assert.equal(fixed, replaced(text, '# a comment\r\n', '# a comment\r\n  show p\r\n'));
    assert.equal(evaluated(fixed).results.filter((r) => r.kind === 'show').length, 2);
  });

  test('no show action away from a name, and none for a space', () => {
    const a = evaluated(`${PLANE}`);
    assert.equal(action(a, '= span', /show/), undefined);
    assert.equal(action(a, 'V dim', /show/), undefined);
  });

  test('a problem fix is offered at its span and withheld when the analysis was carried through edits', () => {
    const text = `${PLANE}claim dim L = 3\n`;
    const a = evaluated(text);
    const at = text.indexOf('claim dim');
    assert.ok(actionsAt(a, { start: at, end: at }).some((x) => x.kind === 'fix' && x.problem?.code === 'claim/dimension'));
    assert.ok(!actionsAt(a, { start: at, end: at }, { problemFixes: false }).some((x) => x.kind === 'fix'));
    assert.ok(!actionsAt(a, { start: 0, end: 0 }).some((x) => x.kind === 'fix'), 'not on another line');
  });

  test('applyEdits refuses overlapping edits', () => {
    assert.throws(() => applyEdits('abcdef', [{ span: { start: 1, end: 3 }, newText: 'x' }, { span: { start: 2, end: 4 }, newText: 'y' }]), RangeError);
    assert.equal(applyEdits('abcdef', [{ span: { start: 4, end: 5 }, newText: 'E' }, { span: { start: 0, end: 1 }, newText: 'A' }]), 'AbcdEf');
  });
});
