import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ } from '../../server/src/engine/rational.js';
import {
  add,
  basisMV,
  coefficient,
  equalsMV,
  fromDense,
  fromTerms,
  fromVector,
  isZeroMV,
  neg,
  scale,
  sortedTerms,
  sub,
  toDense,
  wedge,
  wedgeVectors,
  zeroMV,
  type Multivector,
} from '../../server/src/engine/multivector.js';
import {
  binomial,
  binomialBig,
  complement,
  forEachSubset,
  insertIndex,
  rankLex,
  sortWithSign,
  subsets,
  unrankLex,
  wedgeSign,
} from '../../server/src/engine/subsets.js';
import {
  EXTERIOR_CASES,
  QQ_EXTERIOR,
  bruteSubsets,
  inversionSign,
  matrixOf,
  mathjsDeterminant,
  termList,
  type ExteriorCase,
} from './exterior-arbitraries.js';

const q = (n: number) => QQ.fromBigInt(BigInt(n));

describe('binomial coefficients', () => {
  test('Pascal rule C(n,k) = C(n−1,k−1) + C(n−1,k) and symmetry (common practice, no source)', () => {
    for (let n = 1; n <= 40; n++) {
      for (let k = 0; k <= n; k++) {
        assert.equal(binomial(n, k), binomial(n - 1, k - 1) + binomial(n - 1, k));
        assert.equal(binomial(n, k), binomial(n, n - k));
        assert.equal(BigInt(binomial(n, k)), binomialBig(n, k));
      }
    }
  });

  test('well-known values: C(52,5) = 2598960 poker hands, C(10,3) = 120 (from memory)', () => {
    assert.equal(binomial(52, 5), 2598960);
    assert.equal(binomial(10, 3), 120);
    assert.equal(binomial(5, 7), 0);
    assert.equal(binomial(5, -1), 0);
  });

  test('C(100,50) = 100891344545564193334812497256 exactly as a bigint (from memory; also (n+1)·C(n,k)/(n+1−k) identity)', () => {
    assert.equal(binomialBig(100, 50), 100891344545564193334812497256n);
    assert.equal(binomialBig(101, 50), (binomialBig(100, 50) * 101n) / 51n);
  });

  test('binomial refuses values beyond exact double range instead of rounding (common practice, no source)', () => {
    assert.throws(() => binomial(100, 50), RangeError);
    // Values below 2^53 still come back as exact numbers.
    assert.ok(binomialBig(55, 25) < 2n ** 53n);
    assert.equal(BigInt(binomial(55, 25)), binomialBig(55, 25));
  });
});

describe('lexicographic subsets', () => {
  test('enumeration equals an independent bit-mask listing sorted lexicographically (common practice, no source)', () => {
    for (let n = 0; n <= 9; n++) {
      for (let k = 0; k <= n; k++) {
        const expected = bruteSubsets(n, k);
        assert.deepEqual([...subsets(n, k)], expected);
        const seen: number[][] = [];
        forEachSubset(n, k, (s, r) => {
          assert.equal(r, seen.length);
          seen.push(s.slice());
        });
        assert.deepEqual(seen, expected);
        expected.forEach((s, r) => {
          assert.equal(rankLex(s, n), r);
          assert.deepEqual(unrankLex(r, n, k), s);
        });
        assert.equal(expected.length, binomial(n, k));
      }
    }
  });

  test('forEachSubset stops when the visitor returns false', () => {
    let visits = 0;
    forEachSubset(6, 3, () => ++visits < 4);
    assert.equal(visits, 4);
  });

  test('rankLex and unrankLex are inverse on large spaces (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }).chain((n) => fc.tuple(fc.constant(n), fc.integer({ min: 0, max: Math.min(n, 8) }))),
        fc.double({ min: 0, max: 1, noNaN: true }),
        ([n, k], t) => {
          const total = binomial(n, k);
          const r = Math.min(total - 1, Math.floor(t * total));
          assert.equal(rankLex(unrankLex(r, n, k), n), r);
        },
      ),
    );
  });

  test('rankLex rejects unsorted or out-of-range subsets', () => {
    assert.throws(() => rankLex([1, 0], 3), RangeError);
    assert.throws(() => rankLex([0, 3], 3), RangeError);
    assert.throws(() => unrankLex(3, 3, 2), RangeError);
  });
});

describe('wedge signs', () => {
  test('wedgeSign equals the inversion count of the concatenation (common practice, no source)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 0, max: 12 }), { maxLength: 8 }), fc.integer({ min: 0, max: 8 }), (xs, cut) => {
        const split = Math.min(cut, xs.length);
        const a = xs.slice(0, split).sort((x, y) => x - y);
        const b = xs.slice(split).sort((x, y) => x - y);
        assert.equal(wedgeSign(a, b), inversionSign([...a, ...b]));
      }),
    );
    assert.equal(wedgeSign([0, 2], [2, 3]), 0);
  });

  test('sortWithSign and insertIndex agree with the inversion count (common practice, no source)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 6 }), { maxLength: 7 }), (xs) => {
        const { sorted, sign } = sortWithSign(xs);
        assert.deepEqual(sorted, xs.slice().sort((x, y) => x - y));
        assert.equal(sign, inversionSign(xs));
      }),
    );
    const { sorted, sign } = insertIndex([0, 2, 5], 3);
    assert.deepEqual(sorted, [0, 2, 3, 5]);
    assert.equal(sign, inversionSign([0, 2, 5, 3]));
    assert.deepEqual(complement([1, 3], 5), [0, 2, 4]);
  });
});

/** A random multivector of the given degree. */
function multivector(c: ExteriorCase, n: number, k: number) {
  return termList(c, n, k).map((terms) => fromTerms(c.F, n, k, terms));
}

describe('multivectors', () => {
  test('fromTerms is alternating: p_ji = −p_ij, repeated indices give zero (common practice, no source)', () => {
    const w = fromTerms(QQ, 4, 2, [
      [[1, 0], q(3)],
      [[2, 2], q(5)],
      [[0, 1], q(1)],
      [[3, 2], q(7)],
    ]);
    assert.equal(w.terms.size, 2);
    assert.ok(QQ.eq(coefficient(QQ, w, [0, 1]), q(-2)));
    assert.ok(QQ.eq(coefficient(QQ, w, [1, 0]), q(2)));
    assert.ok(QQ.eq(coefficient(QQ, w, [2, 3]), q(-7)));
    assert.ok(QQ.eq(coefficient(QQ, w, [1, 1]), QQ.zero));
    const cancelled = fromTerms(QQ, 3, 2, [
      [[0, 2], q(4)],
      [[2, 0], q(4)],
    ]);
    assert.ok(isZeroMV(cancelled));
  });

  test('no zero coefficient is ever stored (over every field under test)', () => {
    for (const c of EXTERIOR_CASES) {
      fc.assert(
        fc.property(multivector(c, 5, 2), multivector(c, 5, 2), multivector(c, 5, 1), (a, b, v) => {
          for (const m of [a, b, add(c.F, a, b), sub(c.F, a, a), wedge(c.F, a, v), scale(c.F, c.F.zero, a)]) {
            for (const t of m.terms.values()) assert.ok(!c.F.isZero(t.coeff));
          }
          assert.ok(isZeroMV(sub(c.F, a, a)));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('dense round trip and lexicographic term order (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 6 }).chain((n) => fc.integer({ min: 0, max: n }).chain((k) => multivector(c, n, k))), (m) => {
          const dense = toDense(c.F, m);
          assert.equal(dense.length, binomial(m.n, m.k));
          assert.ok(equalsMV(c.F, fromDense(c.F, m.n, m.k, dense), m));
          const order = bruteSubsets(m.n, m.k).filter((s) => !c.F.isZero(dense[rankLex(s, m.n)]));
          assert.deepEqual(sortedTerms(m).map((t) => t.subset), order);
        }),
        { numRuns: 40 },
      );
    }
  });

  test('vector space laws: a − b + b = a, −a = (−1)·a, c·(a+b) = c·a + c·b', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(multivector(c, 5, 3), multivector(c, 5, 3), c.element, (a, b, s) => {
          assert.ok(equalsMV(F, add(F, sub(F, a, b), b), a));
          assert.ok(equalsMV(F, neg(F, a), scale(F, F.neg(F.one), a)));
          assert.ok(equalsMV(F, scale(F, s, add(F, a, b)), add(F, scale(F, s, a), scale(F, s, b))));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('shapes are checked', () => {
    assert.throws(() => add(QQ, zeroMV(4, 2), zeroMV(4, 1)), RangeError);
    assert.throws(() => fromTerms(QQ, 3, 2, [[[0, 3], q(1)]]), RangeError);
    assert.throws(() => fromDense(QQ, 4, 2, [q(1)]), RangeError);
  });
});

describe('the wedge product', () => {
  test('e_0 ∧ e_1 = −e_1 ∧ e_0 and (e_0∧e_1 + e_2∧e_3)^2 = 2·e_0123 (common practice, no source)', () => {
    const e = (i: number) => basisMV(QQ, 4, [i]);
    assert.ok(equalsMV(QQ, wedge(QQ, e(0), e(1)), neg(QQ, wedge(QQ, e(1), e(0)))));
    assert.ok(isZeroMV(wedge(QQ, e(2), e(2))));
    const w = add(QQ, basisMV(QQ, 4, [0, 1]), basisMV(QQ, 4, [2, 3]));
    assert.ok(equalsMV(QQ, wedge(QQ, w, w), fromTerms(QQ, 4, 4, [[[0, 1, 2, 3], q(2)]])));
  });

  test('anticommutativity a∧b = (−1)^(pq) b∧a (any exterior algebra text; fast-check)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc
            .tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }))
            .chain(([p, r]) => fc.tuple(multivector(c, 6, p), multivector(c, 6, r))),
          ([a, b]) => {
            const ab = wedge(F, a, b);
            const ba = wedge(F, b, a);
            assert.equal(ab.k, a.k + b.k);
            assert.ok(equalsMV(F, ab, (a.k * b.k) % 2 === 0 ? ba : neg(F, ba)));
          },
        ),
        { numRuns: 40 },
      );
    }
  });

  test('associativity (a∧b)∧c = a∧(b∧c) and distributivity (any exterior algebra text; fast-check)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(multivector(c, 6, 1), multivector(c, 6, 2), multivector(c, 6, 2), multivector(c, 6, 2), (a, b, d, e) => {
          assert.ok(equalsMV(F, wedge(F, wedge(F, a, b), d), wedge(F, a, wedge(F, b, d))));
          assert.ok(equalsMV(F, wedge(F, b, add(F, d, e)), add(F, wedge(F, b, d), wedge(F, b, e))));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('v_1 ∧ … ∧ v_n = det(v) · e_{0…n−1}, det by mathjs (exterior power of top degree; independent reference library)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }).chain((n) => matrixOf(QQ_EXTERIOR.element, n, n)), (rows) => {
        const n = rows.length;
        const top = wedgeVectors(QQ, n, rows);
        const all = Array.from({ length: n }, (_, i) => i);
        assert.ok(QQ.eq(coefficient(QQ, top, all), mathjsDeterminant(rows)));
      }),
      { numRuns: 60 },
    );
  });

  test('a vector wedged with itself vanishes, in every characteristic (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      fc.assert(
        fc.property(fc.array(c.element, { minLength: 5, maxLength: 5 }), (v) => {
          const m = fromVector(c.F, v);
          assert.ok(isZeroMV(wedge(c.F, m, m)));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('a degree above n is the zero multivector', () => {
    const F = primeField(5n);
    const m: Multivector<number> = wedge(F, basisMV(F, 2, [0, 1]), basisMV(F, 2, [0]));
    assert.equal(m.k, 3);
    assert.ok(isZeroMV(m));
    assert.deepEqual(toDense(F, m), []);
  });
});
