/**
 * Families: files with `parameter t` compute over rational functions in t. Plücker coordinates of a
 * family are checked against mathjs determinants of its members, the degeneracy locus against the rank
 * of the members at its zeros, claims hold as identities, and a false one names a value of t where it
 * fails, checked again numerically.
 *
 * Facts used (common practice, no source): the Plücker coordinates are the maximal minors; a basis
 * drops rank exactly where all maximal minors vanish; two lines of P^3 meet exactly when the 4×4 matrix
 * of their bases is singular.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import { analyze, type Analysis } from '../../server/src/language/index.js';
import { expectAnalysis, resultNamed } from './analysis-check.js';

const math = create(all, { number: 'Fraction' });

/** The 2×2 minors of a 2×4 matrix in lexicographic order (p12, p13, p14, p23, p24, p34), by mathjs. */
function minors(rows: number[][]): number[] {
  const out: number[] = [];
  for (let i = 0; i < 4; i++) for (let j = i + 1; j < 4; j++) out.push(Number(math.det(math.matrix(rows.map((r) => [r[i]!, r[j]!])))));
  return out;
}

/** A polynomial in t as the hover writes it (`(t - 1) (t^2 + t + 1)`, `-t`), evaluated at a number by mathjs. */
function valueAt(text: string, t: number): number {
  const expression = text.replace(/\)\s*\(/g, ')*(').replace(/(\d)\s*t/g, '$1*t').replace(/\)\s*t/g, ')*t').replace(/t\s*\(/g, 't*(');
  return Number(math.evaluate(expression, { t: math.fraction(t) }));
}

function shows(a: Analysis) {
  return a.results.filter((r) => r.kind === 'show');
}

describe('families depending on a parameter', () => {
  const FAMILY = `
    field QQ
    parameter t
    space V dim 4
    subspace L = rows [ 1 t 0 1
                        0 1 t t^2 ]
    show plucker(L)
    show at(L, t = 2)
    show at(L, t = -3)
    claim plucker(L) decomposable
  `;

  test('the Plücker coordinates are polynomials in t; at t = 2 and t = −3 they are the minors of the member', () => {
    const a = expectAnalysis(FAMILY);
    const raw = (resultNamed(a, 'L').json.plucker as { raw: string[] }).raw;
    assert.equal(raw.length, 6);
    for (const t of [2, -3, 5, 1 / 2]) {
      const member = [
        [1, t, 0, 1],
        [0, 1, t, t * t],
      ];
      assert.deepEqual(raw.map((p) => valueAt(p, t)), minors(member), `at t = ${t}`);
    }
    // The member at t = 2: its minors (mathjs) are its Plücker vector, up to the normalization shown.
    const at2 = shows(a)[1]!.json.plucker as { raw: string[] };
    assert.deepEqual(at2.raw.map(Number), minors([[1, 2, 0, 1], [0, 1, 2, 4]]));
    // t^3 − 1 is shown factored over QQ.
    assert.ok(raw.includes('(t - 1) (t^2 + t + 1)'), raw.join(' | '));
  });

  test('a chart of the family says for which t it applies: where its minor is not zero', () => {
    const a = expectAnalysis(`
      field QQ
      parameter t
      space V dim 4
      subspace L = rows [ 1 t 0 1
                          0 1 t t^2 ]
      show chart(L, 13)
      show chart(L, 12)
    `);
    const [c13, c12] = shows(a);
    const except = /for every t except (-?\d+)/.exec(c13!.hover);
    assert.ok(except, c13!.hover);
    // The minor on columns 1 and 3 vanishes exactly there (mathjs), and not at other values.
    const minor13 = (t: number) => Number(math.det(math.matrix([[1, 0], [0, t]])));
    assert.equal(Math.abs(minor13(Number(except[1]))), 0);
    assert.notEqual(minor13(2), 0);
    assert.match(c12!.hover, /applies for every value of t/);
  });

  test('the quadratic Plücker relation holds identically: the family is decomposable for every t', () => {
    const a = expectAnalysis(FAMILY);
    assert.equal(a.problems.length, 0);
  });

  test('the degeneracy locus: the gcd of the minors, its rational zeros, and the members there', () => {
    const a = expectAnalysis(`
      field QQ
      parameter t
      space V dim 4
      subspace D = rows [ 1 t 0 t^2
                          t 1 0 t ]
      show degeneracy(D)
      show at(D, t = 1)
    `);
    const shown = shows(a)[0]!.json as { gcd: string; roots: { value: string; multiplicity: number }[] };
    const roots = shown.roots.map((r) => Number(r.value)).sort((x, y) => x - y);
    assert.deepEqual(roots, [-1, 1]);
    const member = (t: number) => [
      [1, t, 0, t * t],
      [t, 1, 0, t],
    ];
    // At its zeros every minor vanishes (mathjs); at t = 2 some minor does not.
    for (const t of roots) assert.ok(minors(member(t)).every((m) => m === 0), `rank drops at t = ${t}`);
    assert.ok(minors(member(2)).some((m) => m !== 0));
    // The gcd divides every minor: where it is zero they are; it vanishes at no other tested value.
    for (const t of [0, 2, -2, 3]) assert.notEqual(valueAt(shown.gcd, t), 0);
    assert.match(shows(a)[1]!.hover, /span only a 1-dimensional subspace/);
  });

  test('a family of lines through a point of a fixed line always meets it; a false claim names a value of t', () => {
    const text = [
      'field QQ',
      'parameter t',
      'space V dim 4',
      'subspace M = span(e1, e2)',
      'subspace L = span(e1 + t e2, e3 + t e4)', // through the point e1 + t e2 of M
      'subspace N = span(e1 + e3, t e2 + e4)',
      'claim pairing(L, M) = 0',
      'claim pairing(N, M) = 0',
      '',
    ].join('\n');
    const a = analyze(text, { evaluate: true });
    assert.deepEqual(a.problems.map((p) => p.code), ['claim/equality']);
    const message = a.problems[0]!.message;
    const witness = /differ at t = (-?\d+)/.exec(message);
    assert.ok(witness, message);
    const t = Number(witness[1]);
    // At that value N and M do not meet: the 4×4 matrix of their bases is regular (mathjs).
    assert.notEqual(Number(math.det(math.matrix([[1, 0, 1, 0], [0, t, 0, 1], [1, 0, 0, 0], [0, 1, 0, 0]]))), 0);
    // …and for every t the lines L and M do meet.
    for (const s of [0, 1, -2, 7]) assert.equal(Math.abs(Number(math.det(math.matrix([[1, s, 0, 0], [0, 0, 1, s], [1, 0, 0, 0], [0, 1, 0, 0]])))), 0);
  });

  test('any false claim of a family names a member for which it is false, checked at that member', () => {
    const text = ['field QQ', 'parameter t', 'space V dim 4', 'subspace L = rows [ 1 t 0 1', ' 0 1 t t^2 ]', 'vector v = (1, 0, 0, 0)', 'claim v in L', ''].join('\n');
    const a = analyze(text, { evaluate: true });
    assert.deepEqual(a.problems.map((p) => p.code), ['claim/membership']);
    const at = /false for instance at t = (-?\d+)/.exec(a.problems[0]!.message);
    assert.ok(at, a.problems[0]!.message);
    const t = Number(at[1]);
    // At that t, v with the two rows has rank 3: some 3×3 minor of the 3×4 matrix is not zero (mathjs).
    const rows = [[1, t, 0, 1], [0, 1, t, t * t], [1, 0, 0, 0]];
    const minors3 = [[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]].map((cols) => Number(math.det(math.matrix(rows.map((r) => cols.map((c) => r[c]!))))));
    assert.ok(minors3.some((m) => m !== 0));
  });

  test('wrong uses: at() without a parameter value, an unknown parameter, a value that depends on t', () => {
    expectAnalysis(`
      field QQ
      parameter t
      space V dim 2
      vector v = (1, t)
      show at(v)
      #    ^^^^^ type/arguments
      show at(v, v = 1)
      #          ^ type/operand
      show at(v, t = t)
      #              ^ type/operand
    `);
    expectAnalysis(`
      space V dim 2
      subspace W = span(e1)
      show degeneracy(W)
      #    ^^^^^^^^^^ type/operand
    `);
  });
});
