/**
 * The practitioner's geometry end to end through the language: conventions,
 * duality, maps, flags and Schubert cells, matroids and positivity, lines of
 * projective 3-space, and finite fields for subspace codes. Each expected
 * value names its source; mathjs serves as the independent reference where a
 * computation can be redone there.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import { analyze, type Analysis } from '../../server/src/language/index.js';
import { expectAnalysis, resultNamed } from './analysis-check.js';

const math = create(all, { number: 'Fraction' });

function shown(a: Analysis, index = 0) {
  const r = a.results.filter((x) => x.kind === 'show')[index];
  assert.ok(r, `no show result #${index}`);
  return r;
}

describe('conventions per file', () => {
  test('colex order lists 12, 13, 23, 14, 24, 34 and claims read points in that order', () => {
    // Colexicographic order of 2-subsets of {1..4} (the conventions notes; common practice, no source).
    const a = expectAnalysis(`
      convention order colex
      space V dim 4
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
      claim plucker(M) = [1 : 3 : -2 : 1 : 0 : 2]
    `);
    const p = resultNamed(a, 'M').json.plucker as { labels: string[]; raw: string[] };
    assert.deepEqual(p.labels, ['12', '13', '23', '14', '24', '34']);
    assert.deepEqual(p.raw, ['1', '3', '-2', '1', '0', '2']);
    assert.match(resultNamed(a, 'M').hover, /colexicographic/);
  });

  test('labels from 0: basis e0 … e3, coordinates p01 …, index keys and charts read the same way', () => {
    const a = expectAnalysis(`
      convention labels 0
      space P dim 4
      subspace L = span(e0 + e1, e2)
      multivector w = {01: 1, 23: 1}
      show chart(L, 02)
    `);
    assert.deepEqual((resultNamed(a, 'L').json.plucker as { labels: string[] }).labels, ['01', '02', '03', '12', '13', '23']);
    assert.deepEqual(resultNamed(a, 'w').json.terms, [
      { indices: '01', coefficient: '1' },
      { indices: '23', coefficient: '1' },
    ]);
    assert.deepEqual(shown(a).json.columns, [0, 2]);
  });

  test('columns [ … ] reads basis vectors as columns; layout columns prints them so', () => {
    const a = expectAnalysis(`
      convention layout columns
      space V dim 3
      subspace A = columns [ 1 0
                             0 1
                             2 3 ]
      subspace B = rows [ 1 0 2 ; 0 1 3 ]
      claim A = B
    `);
    assert.match(resultNamed(a, 'A').hover, /as columns/);
    assert.match(resultNamed(a, 'A').summary, /columns/);
  });

  test('positive normalization gives the nonnegative representative, or says why not', () => {
    // A Vandermonde matrix with increasing positive nodes is totally positive
    // (Gantmacher–Krein, Oscillation Matrices; from memory): its 2×2 minors are t_j − t_i > 0.
    const a = expectAnalysis(`
      normalize positive
      space V dim 4
      subspace T = rows [ -1 -1 -1 -1 ; 1 2 3 4 ]
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
    `);
    const t = resultNamed(a, 'T').json.plucker as { normalized: string[]; normalization: string };
    assert.equal(t.normalization, 'positive');
    assert.deepEqual(t.normalized, ['1', '2', '3', '1', '2', '1']);
    assert.equal((resultNamed(a, 'M').json.plucker as { normalization: string }).normalization, 'primitive');
    assert.match(resultNamed(a, 'M').hover, /asked for positive, but the coordinates have both signs/);
  });

  test('an unknown or contradictory convention is an error on its words', () => {
    expectAnalysis(`
      convention order revlex
      #                ^^^^^^ type/unknown-convention
      convention labels 1
      convention labels 0
      #          ^^^^^^^^ type/duplicate-convention
    `);
  });
});

describe('annihilators, complements and quotients', () => {
  test('the annihilator of a line in P^3 has the dual Plücker vector (p34, −p24, p23, p14, −p13, p12)', () => {
    // The duality of line coordinates in P^3 (classical; e.g. Hodge–Pedoe, Methods of Algebraic
    // Geometry I, VII §3 — from memory): up to a common factor, q12…q34 = p34, −p24, p23, p14, −p13, p12.
    const a = expectAnalysis(`
      space V dim 4
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
      subspace A = annihilator(M)
      claim dim A = 2
      claim plucker(A) = [2 : 0 : -2 : 1 : -3 : 1]
    `);
    // p(M) = (1, 3, 1, −2, 0, 2): the rule gives (2, −0, −2, 1, −3, 1).
    assert.match(resultNamed(a, 'A').hover, /e_I ∧ e_J = s\(I\)·e_1 ∧ … ∧ e_n/);
  });

  test('dim W + dim annihilator(W) = dim V, and the complement of e1∧e2 in a 4-space is e3∧e4', () => {
    // Rank–nullity (any linear algebra text; common practice, no source); ⋆(e1∧e2) = e3∧e4 since e12∧e34 = e1234.
    const a = expectAnalysis(`
      space V dim 5
      subspace W = span(e1 + e2, e3 - e5, e4)
      claim dim annihilator(W) = 2
      space U dim 4
      multivector s = complement(U.e1 ^ U.e2)
      claim s = U.e3 ^ U.e4
      show quotient(V, W)
    `);
    assert.equal(shown(a).json.dim, 2);
  });
});

describe('linear maps', () => {
  test('the image of a Plücker vector under the compound matrix is the Plücker vector of the image (Cauchy–Binet)', () => {
    // Cauchy–Binet: p(W·A) = p(W)·C_k(A) (e.g. Horn–Johnson, Matrix Analysis, §0.8.7 — from memory).
    const a = expectAnalysis(`
      space V dim 4
      space U dim 3 basis u1 u2 u3
      map f : V -> U = [ 1 0 2
                         0 1 1
                         1 1 0
                         3 0 1 ]
      subspace W = rows [ 1 0 2 0 ; 0 1 3 1 ]
      claim f(plucker(W)) = plucker(f(W))
      claim dim kernel(f) = 1
      claim dim image(f) = 3
      show compound(f, 2)
    `);
    // Every compound entry is a 2×2 minor of the matrix: checked with mathjs determinants.
    const A = [[1, 0, 2], [0, 1, 1], [1, 1, 0], [3, 0, 1]];
    const C = shown(a).json.matrix as string[][];
    const pairs = (n: number) => Array.from({ length: n }, (_, i) => Array.from({ length: n - i - 1 }, (_, d) => [i, i + d + 1] as const)).flat();
    pairs(4).forEach(([r1, r2], i) => {
      pairs(3).forEach(([c1, c2], j) => {
        const d = math.det(math.matrix([[A[r1]![c1]!, A[r1]![c2]!], [A[r2]![c1]!, A[r2]![c2]!]]));
        assert.equal(C[i]![j], String(d), `entry (${i}, ${j})`);
      });
    });
  });

  test('a map matrix of the wrong shape is an error that says which shape', () => {
    expectAnalysis(`
      space V dim 2
      space U dim 3 basis a b c
      map g : V -> U = [ 1 0 ; 0 1 ]
      #                ^^^^^^^^^^^^^ type/wrong-shape
    `);
  });
});

describe('flags and Schubert cells', () => {
  test('cells of G(2,4) relative to the standard flag: the generic cell, a point cell and the Schubert conditions', () => {
    // The Schubert cell decomposition of G(2,4): partitions in the 2×2 box, cell dimension 4 − |λ|
    // (Fulton, Young Tableaux, §9.4 — from memory).
    const a = expectAnalysis(`
      space V dim 4
      subspace generic = rows [ 1 0 2 0 ; 0 1 3 1 ]
      subspace first = span(e1, e2)
      subspace middle = span(e1, e3)
      claim schubert(generic) = (0, 0)
      claim schubert(first) = (2, 2)
      claim schubert(middle) = (2, 1)
      show schubert(middle)
    `);
    const cell = shown(a).json as { cellDimension: number; conditions: number[]; codimension: number };
    assert.equal(cell.codimension, 3);
    assert.equal(cell.cellDimension, 1);
    // dim(span(e1, e3) ∩ F_i) for i = 1…4 is 1, 1, 2, 2 (hand computation).
    assert.deepEqual(cell.conditions, [1, 1, 2, 2]);
  });

  test('a flag given by vectors must be complete and independent', () => {
    expectAnalysis(`
      space V dim 3
      flag F = (e1, e1 + e2, e3)
      flag G = (e1, e2)
      #        ^^^^^^^^ math/bad-flag
    `);
  });
});

describe('matroids and positivity', () => {
  test('the Fano configuration: the same matrix has different bases over GF(2) and over QQ', () => {
    // The Fano matroid F7: over GF(2) its 7 lines are the non-bases (28 bases); over QQ the columns
    // 110, 101, 011 have determinant −2 ≠ 0 and form a basis too (Oxley, Matroid Theory, §6.4 — from memory).
    const fano = (field: string) =>
      analyze(`field ${field}\nspace V dim 7\nsubspace W = rows [ 1 0 0 1 1 0 1 ; 0 1 0 1 0 1 1 ; 0 0 1 0 1 1 1 ]\nshow matroid(W)\n`, { evaluate: true });
    const overGF2 = shown(fano('GF(2)')).json as { bases: string[] };
    const overQQ = shown(fano('QQ')).json as { bases: string[] };
    assert.equal(overGF2.bases.length, 28);
    assert.equal(overQQ.bases.length, 29);
    assert.ok(!overGF2.bases.includes('456') && overQQ.bases.includes('456'));
    assert.equal(math.det([[1, 1, 0], [1, 0, 1], [0, 1, 1]]), -2);
  });

  test('a generic 2×4 matrix gives the uniform matroid U(2,4); a zero column is a loop', () => {
    // The uniform matroid U_{2,4} has all C(4,2) = 6 pairs as bases (Oxley §1.2 — from memory).
    const a = expectAnalysis(`
      space V dim 4
      subspace G = rows [ 1 1 1 1 ; 1 2 3 4 ]
      subspace Z = rows [ 1 0 1 0 ; 0 1 1 0 ]
      claim G is uniform
      claim Z is not uniform
      show matroid(Z)
      show rank(Z, 34)
    `);
    assert.deepEqual((shown(a, 0).json as { loops: number[] }).loops, [4]);
    assert.equal(shown(a, 1).json.value, 1);
  });

  test('total positivity: a Vandermonde matrix is totally positive; a mixed-sign point is not, with the reason', () => {
    const a = expectAnalysis(`
      space V dim 4
      subspace T = rows [ 1 1 1 1 ; 1 2 3 4 ]
      subspace M = rows [ 1 0 2 0 ; 0 1 3 1 ]
      claim T is totally positive
      claim shift(T) is totally positive
      claim M is totally nonnegative
      ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ claim/totally-nonnegative
    `);
    assert.match(a.problems[0]!.message, /p12 = 1 and p23 = -2 have opposite signs/);
  });

  test('positivity needs an ordered field', () => {
    expectAnalysis(`
      field GF(5)
      space V dim 3
      subspace W = span(e1, e2)
      show positivity(W)
      #    ^^^^^^^^^^^^^ type/unordered-field
    `);
  });
});

describe('lines in projective 3-space', () => {
  test('lines in a common plane meet; skew lines do not; the pairing is the determinant of the four points', () => {
    // Two lines meet iff their Klein pairing vanishes; for lines a∧b and c∧d it is det[a; b; c; d]
    // (classical; e.g. Pottmann–Wallner, Computational Line Geometry, §2.1 — from memory), checked with mathjs.
    const a = expectAnalysis(`
      space P dim 4
      subspace L1 = span((1, 0, 0, 0), (0, 1, 0, 0))
      subspace L2 = span((1, 0, 0, 0), (0, 0, 1, 0))
      subspace L3 = span((0, 0, 1, 1), (1, 2, 0, 1))
      show meet(L1, L2)
      show meet(L1, L3)
      claim pairing(L1, L2) = 0
    `);
    const m1 = shown(a, 0).json as { kind: string; commonPoint: string[] };
    assert.equal(m1.kind, 'intersecting');
    assert.deepEqual(m1.commonPoint, ['1', '0', '0', '0']);
    const m2 = shown(a, 1).json as { kind: string; pairing: string };
    assert.equal(m2.kind, 'skew');
    assert.equal(m2.pairing, String(math.det([[1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 1], [1, 2, 0, 1]])));
  });

  test('with a plane at infinity declared, parallel lines are told apart from intersecting ones', () => {
    const a = expectAnalysis(`
      convention homogeneous first
      space P dim 4
      subspace A = span((1, 0, 0, 0), (0, 1, 0, 0))
      subspace B = span((1, 0, 1, 0), (0, 1, 0, 0))
      show meet(A, B)
    `);
    // Both lines have direction (1, 0, 0): they meet at the point at infinity (0 : 1 : 0 : 0).
    assert.equal((shown(a).json as { kind: string }).kind, 'parallel');
  });

  test('direction and moment: d = B − A and m = A × d, checked with the mathjs cross product', () => {
    // With x1 homogeneous (labels from 1) and A = (1, 2, 3), B = (4, 6, 8): d = (3, 4, 5), m = A × d
    // (the Plücker line coordinates of engineering practice; common practice, no source).
    const a = expectAnalysis(`
      space P dim 4
      show direction_moment(span((1, 1, 2, 3), (1, 4, 6, 8)))
    `);
    const dm = shown(a).json as { direction: string[]; moment: string[] };
    assert.deepEqual(dm.direction, ['3', '4', '5']);
    assert.deepEqual(dm.moment, (math.cross([1, 2, 3], [3, 4, 5]) as number[]).map(String));
    assert.match(shown(a).hover, /no tolerance/);
  });
});

describe('more line geometry', () => {
  test('the line where two planes meet, a line from direction and moment, and the Klein quadric', () => {
    // The planes x4 = 0 and x3 = 0 meet in the line span(e1, e2) (hand computation). The direction–moment
    // pair (3, 4, 5; −2, 4, −2) is the line through A = (1, 2, 3) and B = (4, 6, 8): d = B − A, m = A × d
    // (common practice, no source). The Klein quadric p12·p34 − p13·p24 + p14·p23 = 0 holds exactly on lines
    // (classical; Plücker's relation for G(2,4) — from memory).
    expectAnalysis(`
      space P dim 4
      subspace L = line_of_planes((0, 0, 0, 1), (0, 0, 1, 0))
      claim L = span(e1, e2)
      subspace M = line_from_direction_moment(3, 4, 5, -2, 4, -2)
      claim M = span((1, 1, 2, 3), (1, 4, 6, 8))
      claim plucker(M) is on klein quadric
      claim {12: 1, 34: 1} is not on klein quadric
      subspace N = line_from_direction_moment(1, 0, 0, 1, 0, 0)
      #            ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ math/not-a-line
    `);
  });
});

describe('finite fields for subspace codes', () => {
  test('GF(4) with generator w: w² = w + 1, w³ = 1, and the defining polynomial is stated', () => {
    // GF(4) = GF(2)[x]/(x² + x + 1), the only irreducible quadratic over GF(2) (common practice, no source).
    const a = expectAnalysis(`
      field GF(4) generator w
      space V dim 2
      vector v = (w, w^2)
      claim w^2 = w + 1
      claim w^3 = 1
    `);
    assert.match(resultNamed(a, 'v').hover, /GF\(4\) = GF\(2\)\[w\]\/\(w\^2 \+ w \+ 1\)/);
    assert.deepEqual(resultNamed(a, 'v').json.coordinates, ['w', 'w + 1']);
  });

  test('the generator inside a bracket: entries w, 2w, w^2 and (w + 1) are the field elements they name', () => {
    // In GF(4), w² = w + 1 and 2 = 0 (characteristic 2; common practice, no source): the bracket's rows
    // are (1, w, w + 1) and (0, 1, w + 1), the same plane as the tuples below.
    const a = expectAnalysis(`
      field GF(4) generator w
      space V dim 3
      subspace W = rows [ 1 w w^2
                          2w 1 (w + 1) ]
      subspace U = span((1, w, w + 1), (0, 1, w + 1))
      claim W = U
      claim dim W = 2
    `);
    assert.equal(a.problems.length, 0);
  });

  test('the number of k-subspaces is the Gaussian binomial, and the listing agrees', () => {
    // [4 choose 2]_q = (q⁴−1)(q³−1)/((q²−1)(q−1)): 35 for q = 2 and 357 for q = 4 (OEIS A022166 and
    // A022168 — from memory); points of P³(GF(4)): (4⁴−1)/(4−1) = 85.
    const a = expectAnalysis(`
      field GF(4) generator w
      space V dim 4
      claim count(2, V) = 357
      show subspaces(1, V)
    `);
    assert.equal(shown(a).json.count, 85);
    const b = expectAnalysis(`
      field GF(2)
      space V dim 4
      claim count(2, V) = 35
    `);
    assert.equal(b.problems.length, 0);
  });

  test('subspace distance dim U + dim W − 2 dim(U ∩ W) and the minimum distance of a code', () => {
    // The subspace distance of Koetter and Kschischang (2008) — from memory; hand computation below.
    const a = expectAnalysis(`
      field GF(2)
      space V dim 4
      subspace A = span(e1, e2)
      subspace B = span(e3, e4)
      subspace C = span(e1, e3)
      claim distance(A, B) = 4
      claim distance(A, C) = 2
      claim min_distance(A, B, C) = 2
    `);
    assert.equal(a.problems.length, 0);
  });

  test('GF(6) is no field, and a generator needs a prime power that is not prime', () => {
    expectAnalysis(`
      field GF(6)
      #        ^ math/not-prime
    `);
  });
});
