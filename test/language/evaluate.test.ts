/**
 * The evaluator end to end: values of declarations, problems with their codes
 * and spans written inline, claims, and the words of the witnesses. Expected
 * values come from hand computation cross-checked with mathjs (an independent
 * library) or from classical facts named beside each check.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import { analyze } from '../../server/src/language/index.js';
import { expectAnalysis, resultNamed } from './analysis-check.js';

const math = create(all, { number: 'Fraction' });

/** All maximal minors of a 2×n matrix in lexicographic order, by mathjs determinants. */
function referenceMinors(rows: number[][]): string[] {
  const n = rows[0]!.length;
  const out: string[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const d = math.det(math.matrix([[rows[0]![i]!, rows[0]![j]!], [rows[1]![i]!, rows[1]![j]!]].map((r) => r.map((x) => math.fraction(x)))));
      out.push(math.format(d, { fraction: 'ratio' }).replace(/\/1$/, ''));
    }
  }
  return out;
}

describe('Plücker coordinates of declared subspaces', () => {
  test('rows of a 2×4 matrix: raw minors equal mathjs determinants and satisfy the G(2,4) relation', () => {
    const a = expectAnalysis(`
      space V dim 4
      subspace M = rows [ 1 0 2 0
                          0 1 3 1 ]
    `);
    const plucker = resultNamed(a, 'M').json.plucker as { labels: string[]; raw: string[]; normalized: string[] };
    assert.deepEqual(plucker.labels, ['12', '13', '14', '23', '24', '34']);
    // mathjs determinants as the independent reference.
    assert.deepEqual(plucker.raw, referenceMinors([[1, 0, 2, 0], [0, 1, 3, 1]]));
    assert.deepEqual(plucker.raw, ['1', '3', '1', '-2', '0', '2']);
    // The single quadratic relation of G(2,4): p12·p34 − p13·p24 + p14·p23 = 0
    // (classical; e.g. Harris, Algebraic Geometry: A First Course, Lecture 6 — from memory).
    const p = plucker.raw.map(Number);
    assert.equal(p[0]! * p[5]! - p[1]! * p[4]! + p[2]! * p[3]!, 0);
  });

  test('a span keeps the given vectors: raw minors are theirs, the point is normalized', () => {
    const a = expectAnalysis(`
      normalize primitive
      space V dim 4
      vector p = (1, 0, 2, -1)
      vector q = 3 e1 - e2 + 1/2 e4
      subspace L = span(p, q)
    `);
    const plucker = resultNamed(a, 'L').json.plucker as { raw: string[]; normalized: string[]; normalization: string };
    assert.deepEqual(plucker.raw, referenceMinors([[1, 0, 2, -1], [3, -1, 0, 0.5]]));
    // Primitive: integers with gcd 1, first nonzero positive (common practice, no source): raw × (−2).
    assert.deepEqual(plucker.normalized, plucker.raw.map((x) => String(math.format(math.multiply(math.fraction(x), -2), { fraction: 'ratio' })).replace(/\/1$/, '')));
    assert.equal(plucker.normalization, 'primitive');
  });

  test('decimals are exact: 0.125 is 1/8', () => {
    const a = expectAnalysis(`
      space V dim 2
      vector v = (0.125, -2.5)
    `);
    assert.deepEqual(resultNamed(a, 'v').json.coordinates, ['1/8', '-5/2']);
  });

  test('over GF(7), 1/2 is 4 and normalization falls back to first-one, saying so', () => {
    const a = expectAnalysis(`
      field GF(7)
      normalize primitive
      space V dim 3
      vector v = (1/2, 3, 6)
      subspace L = span(v, e1)
    `);
    // 2·4 = 8 ≡ 1 (mod 7) (common practice, no source).
    assert.deepEqual(resultNamed(a, 'v').json.coordinates, ['4', '3', '6']);
    const L = resultNamed(a, 'L');
    assert.equal((L.json.plucker as { normalization: string }).normalization, 'first-one');
    assert.match(L.hover, /first nonzero coordinate 1 \(asked for primitive, which needs the rationals\)/);
  });
});

describe('problems, written under the offending text', () => {
  test('a degenerate span names the dependent vector with its coefficients', () => {
    const a = expectAnalysis(`
      space V dim 3
      vector a = (1, 2, 3)
      vector b = (4, 5, 6)
      vector c = (7, 8, 9)
      subspace S = span(a, b, c)
      #                       ^ math/degenerate-span
    `);
    // (7, 8, 9) = −(1, 2, 3) + 2·(4, 5, 6) (hand computation; common practice, no source).
    const p = a.problems[0]!;
    assert.match(p.message, /c = -a \+ 2 b/);
    assert.ok(p.related?.some((r) => r.message.includes('c is declared here')));
    assert.equal(resultNamed(a, 'S').json.dim, 2, 'the subspace is still the span');
  });

  test('a false dimension claim is an error on the claim; a true one is quiet', () => {
    expectAnalysis(`
      space V dim 4
      subspace L = span(e1, e2)
      claim dim L = 2
      claim dim L = 3
      ^^^^^^^^^^^^^^^ claim/dimension
    `);
  });

  test('names: unknown, duplicate, ambiguous basis names, and qualified names resolve', () => {
    expectAnalysis(`
      space V dim 2
      space W dim 2
      vector a = V.e1 + V.e2
      vector a = W.e1
      #      ^ name/duplicate
      vector b = e1 + zz
      #          ^^ name/ambiguous
      #               ^^ name/unknown
    `);
  });

  test('shapes: wrong length, mixed degree, ragged matrix, which space', () => {
    expectAnalysis(`
      space V dim 3
      vector v = (1, 2) in V
      #          ^^^^^^ type/wrong-length
      multivector m = e1 + e1^e2
      #                  ^ type/mixed-degree
      subspace R = rows [ 1 0 0
                          0 1 ]
      #                   ^^^ type/ragged-matrix
    `);
    expectAnalysis(`
      space V dim 3
      space W dim 3
      vector v = (1, 2, 3)
      #          ^^^^^^^^^ type/which-space
    `);
  });

  test('fields: a non-prime modulus, and a second field', () => {
    expectAnalysis(`
      field GF(6)
      #        ^ math/not-prime
    `);
    expectAnalysis(`
      field QQ
      field GF(5)
      ^^^^^^^^^^^ type/mixed-fields
    `);
  });

  test('division by zero in GF(5): 1/5 has no value there', () => {
    expectAnalysis(`
      field GF(5)
      space V dim 2
      vector v = (1/5, 1)
      #             ^ math/division-by-zero
    `);
  });

  test('a chart on a vanishing coordinate is an error naming it', () => {
    const a = expectAnalysis(`
      space V dim 4
      subspace L = span(e1, e2)
      show chart(L, 34)
      #             ^^ math/chart-zero-minor
    `);
    assert.match(a.problems[0]!.message, /p34 = 0/);
  });

  test('a declaration with a syntax error does not make its later uses unknown names', () => {
    expectAnalysis(`
      space V dim 3
      vector v = (1, 2, 3
      #                 ^ syntax/missing-token
      subspace L = span(v, e1)
      claim dim L = 2
    `);
  });

  test('a statement that failed does not cascade into the lines using it', () => {
    expectAnalysis(`
      space V dim 3
      vector v = (1, 2) in V
      #          ^^^^^^ type/wrong-length
      subspace L = span(v, e1)
      claim dim L = 2
    `);
  });
});

describe('decomposability', () => {
  test('e1∧e2 + e3∧e4 is not decomposable: the G(2,4) relation gives 1', () => {
    const a = expectAnalysis(`
      space V dim 4
      multivector eta = e1^e2 + e3^e4
      claim eta decomposable
      ^^^^^^^^^^^^^^^^^^^^^^ claim/decomposable
    `);
    // p12·p34 − p13·p24 + p14·p23 = 1·1 − 0 + 0 = 1 (the Klein quadric relation; classical, from memory).
    assert.match(a.problems[0]!.message, /p12·p34 - p13·p24 \+ p14·p23 = 0 fails: 1·1 - 0·0 \+ 0·0 = 1 ≠ 0/);
    assert.match(a.problems[0]!.message, /dimension 0, not 2/);
    const json = resultNamed(a, 'eta').json;
    assert.equal(json.decomposable, false);
    assert.equal(json.divisorDimension, 0);
  });

  test('(e1∧e2 + e3∧e4)∧e5 is not decomposable although ω∧ω = 0 in odd degree', () => {
    // Odd degree: ω∧ω = 0 always, so it decides nothing (common practice, no source).
    const a = expectAnalysis(`
      space V dim 5
      multivector w = (e1^e2 + e3^e4) ^ e5
      claim w ^ w = 0
      claim w not decomposable
    `);
    assert.equal(resultNamed(a, 'w').json.decomposable, false);
  });

  test('over GF(2), e1∧e2 + e3∧e4 squares to zero yet is not decomposable', () => {
    // ω∧ω = 2·e1∧e2∧e3∧e4 = 0 in characteristic 2 (common practice, no source).
    expectAnalysis(`
      field GF(2)
      space V dim 4
      multivector w = e1^e2 + e3^e4
      claim w ^ w = 0
      claim w not decomposable
    `);
  });

  test('recover gives back the subspace and the scalar relating the wedge', () => {
    const a = expectAnalysis(`
      space V dim 4
      vector u = (1, 1, 0, 0)
      vector v = (0, 2, 1, 0)
      multivector w = 3 u ^ v
      subspace R = recover(w)
      claim R = span(u, v)
      claim w decomposable
    `);
    const json = resultNamed(a, 'w').json;
    assert.equal(json.decomposable, true);
    // w = 3·u∧v and the reduced basis of span(u, v) is (1, 0, -1/2, 0), (0, 1, 1/2, 0):
    // u∧v = 2·(b1∧b2) by the 2×2 minor on columns 1, 2 (hand computation), so the scalar is 6.
    assert.equal(json.scalar, '6');
  });

  test('recover of a non-decomposable multivector is an error with the witness', () => {
    const a = expectAnalysis(`
      space V dim 4
      multivector eta = e1^e2 + e3^e4
      subspace R = recover(eta)
      #                    ^^^ math/not-decomposable
    `);
    assert.match(a.problems[0]!.message, /p12·p34/);
  });

  test('index sets: p21 is −p12, and a repeated label is an error', () => {
    const a = expectAnalysis(`
      space V dim 3
      multivector m = {21: 1, 13: 2}
      multivector bad = {11: 1}
      #                  ^^ type/repeated-label
    `);
    assert.deepEqual(resultNamed(a, 'm').json.terms, [
      { indices: '12', coefficient: '-1' },
      { indices: '13', coefficient: '2' },
    ]);
  });
});

describe('claims', () => {
  test('projective equality of a Plücker vector with a point, true and false', () => {
    const a = expectAnalysis(`
      space V dim 4
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
      claim plucker(M) = [2 : 6 : 2 : -4 : 0 : 4]
      claim plucker(M) = [1 : 3 : 1 : -2 : 0 : -2]
      ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ claim/plucker
    `);
    assert.match(a.problems[0]!.message, /coordinate p34 breaks the proportion/);
  });

  test('membership and equality of subspaces', () => {
    expectAnalysis(`
      space V dim 3
      subspace L = span(e1 + e2, e3)
      claim e1 + e2 + e3 in L
      claim e1 not in L
      claim L = span(e3, 2 e1 + 2 e2)
      claim e1 in L
      ^^^^^^^^^^^^^ claim/membership
      claim L != solutions [ 1 -1 0 ]
      ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ claim/inequality
    `);
  });

  test('a count is compared with the number as written, also over GF(2)', () => {
    expectAnalysis(`
      field GF(2)
      space V dim 4
      subspace L = span(e1, e2, e3)
      claim dim L = 3
    `);
  });

  test('intersection and sum obey Grassmann\'s formula dim(U∩W) + dim(U+W) = dim U + dim W', () => {
    // Grassmann's dimension formula (any linear algebra text; common practice, no source).
    expectAnalysis(`
      space V dim 5
      subspace U = span(e1, e2, e3)
      subspace W = span(e3, e4, e1 + e5)
      claim dim (U & W) = 1
      claim dim (U + W) = 5
    `);
  });
});

describe('charts', () => {
  test('chart(L, 34): Y = A_I⁻¹·A_rest, checked with mathjs', () => {
    const a = expectAnalysis(`
      space V dim 4
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
      show chart(M, 34)
    `);
    const shown = a.results.find((r) => r.kind === 'show')!;
    // The chart basis is A_I^{-1}·A, with A_I the columns 3, 4 (common practice, no source).
    const A = [[1, 0, 2, 0], [0, 1, 3, 1]].map((r) => r.map((x) => math.fraction(x)));
    const AI = math.matrix([[A[0]![2]!, A[0]![3]!], [A[1]![2]!, A[1]![3]!]]);
    const rest = math.matrix([[A[0]![0]!, A[0]![1]!], [A[1]![0]!, A[1]![1]!]]);
    const Y = math.multiply(math.inv(AI), rest) as unknown as { toArray(): unknown[][] };
    const expected = Y.toArray().map((r) => r.map((x) => math.format(x as never, { fraction: 'ratio' }).replace(/\/1$/, '')));
    assert.deepEqual(shown.json.block, expected);
    assert.deepEqual(shown.json.columns, [3, 4]);
  });
});

describe('hovers and lenses state the convention', () => {
  test('a subspace hover has the Grassmannian, labelled coordinates and the convention', () => {
    const a = analyze('space V dim 4\nsubspace L = span(e1 + e2, e3 - e4)\n', { evaluate: true });
    const L = resultNamed(a, 'L');
    assert.match(L.hover, /G\(2,4\)/);
    assert.match(L.hover, /p12 = /);
    assert.match(L.hover, /Convention: field QQ; index sets in lexicographic order, labels from 1; basis vectors as rows/);
    assert.match(L.summary, /QQ, lex from 1, primitive/);
  });

  test('the quick pass reports syntax and names without evaluating', () => {
    const a = analyze('space V dim 4\nvector v = (1, 2, 3)\nclaim dim span(v) = 7\nvector w = zz\n', { evaluate: false });
    assert.equal(a.evaluated, false);
    assert.deepEqual(a.problems.map((p) => p.code), ['name/unknown']);
    assert.equal(a.results.length, 0);
  });
});
