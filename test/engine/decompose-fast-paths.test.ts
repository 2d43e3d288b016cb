import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { decompose, divisorSpace, evaluateRelation } from '../../server/src/engine/decompose.js';
import { add, fromTerms, sortedTerms, wedge, fromVector, type Multivector } from '../../server/src/engine/multivector.js';
import { pluckerMultivector } from '../../server/src/engine/plucker.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { matrixOf } from './exterior-arbitraries.js';

// Over QQ, decompose takes shortcuts: the chart test on integers, and a rank test modulo 2^31 − 1 that
// settles D(ω) = 0 without fractions. A copy of QQ is not recognised and takes the generic route through
// the Field interface; both must give the same answer, the same divisor space and the same witness.

const generic: Field<Rational> = { ...QQ };
const P = 2n ** 31n - 1n;

function sameDecomposition(mv: Multivector<Rational>): void {
  const fast = decompose(QQ, mv);
  const slow = decompose(generic, mv);
  assert.deepEqual(fast, slow);
  assert.deepEqual(divisorSpace(QQ, mv), divisorSpace(generic, mv));
}

const entry = fc.oneof(
  { arbitrary: fc.constant(QQ.zero), weight: 1 },
  { arbitrary: fc.tuple(fc.integer({ min: -9, max: 9 }), fc.integer({ min: 1, max: 4 })).map(([a, b]) => rational(BigInt(a), BigInt(b))), weight: 3 },
);

describe('decompose over QQ: the shortcuts agree with the generic route', () => {
  test('Plücker vectors of random planes and sums of two of them, k = 1..5, n ≤ 9 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 9 }).chain((n) =>
          fc.integer({ min: 1, max: Math.min(5, n - 1) }).chain((k) => fc.tuple(fc.constant(n), matrixOf(entry, k, n), matrixOf(entry, k, n), fc.boolean())),
        ),
        ([n, a, b, both]) => {
          const omega = pluckerMultivector(QQ, a, n);
          sameDecomposition(both ? add(QQ, omega, pluckerMultivector(QQ, b, n)) : omega);
        },
      ),
      { numRuns: 150 },
    );
  });

  test('sparse random multivectors from a few terms (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 8 }).chain((n) =>
          fc.integer({ min: 2, max: 4 }).chain((k) =>
            fc.tuple(fc.constant(n), fc.constant(k), fc.array(fc.tuple(fc.uniqueArray(fc.integer({ min: 0, max: n - 1 }), { minLength: k, maxLength: k }), entry), { maxLength: 6 })),
          ),
        ),
        ([n, k, terms]) => sameDecomposition(fromTerms(QQ, n, k, terms)),
      ),
      { numRuns: 150 },
    );
  });

  test('e0∧e1 + p·e2∧e3 with p = 2^31 − 1: full rank over QQ though not modulo p, so the exact route decides (common practice, no source)', () => {
    const omega = fromTerms(QQ, 5, 2, [
      [[0, 1], QQ.one],
      [[2, 3], rational(P)],
    ]);
    const d = decompose(QQ, omega);
    assert.equal(d.kind, 'not-decomposable');
    if (d.kind === 'not-decomposable') assert.equal(d.divisorDimension, 0);
    sameDecomposition(omega);
  });

  test('a coefficient 1/p with p = 2^31 − 1 makes the modular test inconclusive, and the exact route decides', () => {
    const omega = fromTerms(QQ, 6, 3, [
      [[0, 1, 2], QQ.one],
      [[3, 4, 5], rational(1n, P)],
    ]);
    assert.equal(decompose(QQ, omega).kind, 'not-decomposable');
    sameDecomposition(omega);
  });

  test('(e0∧e1 + e2∧e3)∧e4 has D(ω) = span(e4): the modular test fails and the exact route finds it (common practice, no source)', () => {
    const omega = wedge(QQ, fromTerms(QQ, 6, 2, [[[0, 1], QQ.one], [[2, 3], QQ.one]]), fromVector(QQ, [0, 0, 0, 0, 1, 0].map((x) => rational(BigInt(x)))));
    const d = decompose(QQ, omega);
    assert.equal(d.kind, 'not-decomposable');
    if (d.kind === 'not-decomposable') assert.equal(d.divisorDimension, 1);
    sameDecomposition(omega);
  });

  test('the witness J is the first term of u_I ∧ ω, in a large sparse case (wedge route) and a dense one (scan route)', () => {
    const sparseOmega = fromTerms(QQ, 40, 2, [
      [[0, 1], QQ.one],
      [[2, 3], QQ.one],
    ]);
    const denseRows = Array.from({ length: 3 }, (_, i) => Array.from({ length: 7 }, (_, j) => rational(BigInt(((i + 2) * (j + 5) * 7) % 11) - 5n)));
    const otherRows = Array.from({ length: 3 }, (_, i) => Array.from({ length: 7 }, (_, j) => rational(BigInt(((i + 3) * (j + 1) * 5) % 13) - 6n)));
    const denseOmega = add(QQ, pluckerMultivector(QQ, denseRows, 7), pluckerMultivector(QQ, otherRows, 7));
    for (const omega of [sparseOmega, denseOmega]) {
      const d = decompose(QQ, omega);
      assert.equal(d.kind, 'not-decomposable');
      if (d.kind !== 'not-decomposable') continue;
      const { left, right, value } = d.relation;
      assert.ok(!QQ.isZero(value));
      // u_I: the contraction of ω by e*_I, written out from the terms (p(I, j) = sign of sorting (I, j) · p_{I∪j}).
      const u = new Array<Rational>(omega.n).fill(QQ.zero);
      for (const { subset, coeff } of omega.terms.values()) {
        subset.forEach((j, r) => {
          const rest = subset.filter((_, s) => s !== r);
          if (rest.join() === left.join()) u[j] = (subset.length - 1 - r) % 2 === 0 ? coeff : QQ.neg(coeff);
        });
      }
      assert.deepEqual(sortedTerms(wedge(QQ, fromVector(QQ, u), omega))[0]!.subset, right);
      assert.ok(QQ.eq(evaluateRelation(QQ, omega, left, right).value, value));
    }
  });
});
