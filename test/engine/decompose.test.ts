import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { decompose, divisorSpace, evaluateRelation, findFailedRelation, supportSpace, type FailedRelation } from '../../server/src/engine/decompose.js';
import { matrixEquals, rank, rowSpaceEquals } from '../../server/src/engine/matrix.js';
import {
  add,
  basisMV,
  coefficient,
  equalsMV,
  fromTerms,
  isZeroMV,
  scale,
  wedge,
  wedgeVectors,
  zeroMV,
  type Multivector,
} from '../../server/src/engine/multivector.js';
import { pluckerMultivector } from '../../server/src/engine/plucker.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ } from '../../server/src/engine/rational.js';
import { bruteSubsets, EXTERIOR_CASES, inversionSign, matrixOf, termList, type ExteriorCase } from './exterior-arbitraries.js';

const q = (n: number) => QQ.fromBigInt(BigInt(n));

/** The relation's value recomputed from its terms, and each term's sign against the textbook rule. */
function checkRelationWitness<T>(F: Field<T>, mv: Multivector<T>, rel: FailedRelation<T>): void {
  assert.equal(rel.left.length, mv.k - 1);
  assert.equal(rel.right.length, mv.k + 1);
  assert.ok(!F.isZero(rel.value), 'the witness relation must fail');
  let sum = F.zero;
  for (const term of rel.terms) {
    // Textbook sign: (−1)^t for j_t at position t of J, times the sign sorting (I, j_t).
    const t = rel.right.findIndex((j) => !rel.left.includes(j) && [...rel.left, j].sort((a, b) => a - b).join() === term.first.join());
    const j = rel.right[t]!;
    assert.equal(term.sign, (t % 2 === 0 ? 1 : -1) * inversionSign([...rel.left, j]));
    assert.deepEqual(term.second, rel.right.filter((x) => x !== j));
    assert.ok(F.eq(term.firstValue, coefficient(F, mv, term.first)));
    assert.ok(F.eq(term.secondValue, coefficient(F, mv, term.second)));
    const prod = F.mul(term.firstValue, term.secondValue);
    sum = term.sign === 1 ? F.add(sum, prod) : F.sub(sum, prod);
  }
  assert.ok(F.eq(sum, rel.value));
}

/** A random k-subspace basis of an n-space (rows may be dependent; then the wedge is zero). */
function basisOf(c: ExteriorCase, k: number, n: number) {
  return matrixOf(c.element, k, n);
}

describe('decomposable multivectors are recognised and recovered', () => {
  test('decompose(c · plucker(W)) gives W back and reproduces the input exactly (common practice, no source; fast-check)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc.integer({ min: 1, max: 6 }).chain((n) => fc.integer({ min: 1, max: n }).chain((k) => fc.tuple(basisOf(c, k, n), c.element, fc.constant(n)))),
          ([rows, s, n]) => {
            const omega = scale(F, s, pluckerMultivector(F, rows, n));
            const d = decompose(F, omega);
            if (isZeroMV(omega)) {
              assert.equal(d.kind, 'zero');
              return;
            }
            assert.equal(d.kind, 'decomposable');
            if (d.kind !== 'decomposable') return;
            assert.equal(d.basis.length, rows.length);
            assert.ok(rowSpaceEquals(F, d.basis, rows, n));
            // The basis is the RREF of the divisor space D(ω), computed by the kernel route.
            assert.ok(matrixEquals(F, d.basis, divisorSpace(F, omega)));
            assert.ok(equalsMV(F, scale(F, d.scalar, wedgeVectors(F, n, d.basis)), omega));
            assert.equal(findFailedRelation(F, omega), undefined);
          },
        ),
        { numRuns: 40 },
      );
    }
  });

  test('degree 1, degree n and degree 0 are decomposable when nonzero (common practice, no source)', () => {
    const v = fromTerms(QQ, 4, 1, [
      [[1], q(2)],
      [[3], q(-6)],
    ]);
    const d1 = decompose(QQ, v);
    assert.equal(d1.kind, 'decomposable');
    const top = fromTerms(QQ, 4, 4, [[[3, 1, 0, 2], q(5)]]);
    const dn = decompose(QQ, top);
    assert.ok(dn.kind === 'decomposable' && dn.basis.length === 4);
    assert.ok(dn.kind === 'decomposable' && equalsMV(QQ, scale(QQ, dn.scalar, wedgeVectors(QQ, 4, dn.basis)), top));
    const scalar = fromTerms(QQ, 3, 0, [[[], q(7)]]);
    const d0 = decompose(QQ, scalar);
    assert.ok(d0.kind === 'decomposable' && d0.basis.length === 0 && QQ.eq(d0.scalar, q(7)));
    assert.equal(decompose(QQ, zeroMV(4, 2)).kind, 'zero');
  });
});

describe('non-decomposable multivectors', () => {
  test('ω = e1∧e2 + e3∧e4 is not decomposable: p12·p34 = 1 breaks the G(2,4) relation, divisor dimension 0 (classical; Harris, Lecture 6 — from memory)', () => {
    const omega = add(QQ, basisMV(QQ, 4, [0, 1]), basisMV(QQ, 4, [2, 3]));
    const d = decompose(QQ, omega);
    assert.equal(d.kind, 'not-decomposable');
    if (d.kind !== 'not-decomposable') return;
    assert.equal(d.divisorDimension, 0);
    assert.deepEqual(d.divisorBasis, []);
    checkRelationWitness(QQ, omega, d.relation);
    // With 0-based indices the only relation of G(2,4) is p01·p23 − p02·p13 + p03·p12, of value ±1 here.
    assert.ok(QQ.eq(d.relation.value, q(1)) || QQ.eq(d.relation.value, q(-1)));
    const direct = evaluateRelation(QQ, omega, [0], [1, 2, 3]);
    assert.ok(QQ.eq(direct.value, q(1)));
    assert.equal(direct.terms.length, 3);
  });

  test('(e1∧e2 + e3∧e4)∧e5 in degree 3 is not decomposable although ω∧ω = 0 trivially in odd degree (common practice, no source)', () => {
    const omega = wedge(QQ, add(QQ, basisMV(QQ, 5, [0, 1]), basisMV(QQ, 5, [2, 3])), basisMV(QQ, 5, [4]));
    assert.ok(isZeroMV(wedge(QQ, omega, omega)));
    const d = decompose(QQ, omega);
    assert.equal(d.kind, 'not-decomposable');
    if (d.kind !== 'not-decomposable') return;
    // Only e5 divides ω.
    assert.equal(d.divisorDimension, 1);
    assert.ok(rowSpaceEquals(QQ, d.divisorBasis, [[0, 0, 0, 0, 1].map(q)], 5));
    checkRelationWitness(QQ, omega, d.relation);
  });

  test('over GF(2), ω = e12 + e34 has ω∧ω = 2·e1234 = 0 yet is not decomposable (characteristic 2; common practice, no source)', () => {
    const F = primeField(2n);
    const omega = add(F, basisMV(F, 4, [0, 1]), basisMV(F, 4, [2, 3]));
    assert.ok(isZeroMV(wedge(F, omega, omega)));
    const d = decompose(F, omega);
    assert.equal(d.kind, 'not-decomposable');
    if (d.kind !== 'not-decomposable') return;
    assert.equal(d.divisorDimension, 0);
    checkRelationWitness(F, omega, d.relation);
  });

  test('e012 + e345 in degree 3 of a 6-space: divisor dimension 0 and a failing relation (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const omega = add(F, basisMV(F, 6, [0, 1, 2]), basisMV(F, 6, [3, 4, 5]));
      const d = decompose(F, omega);
      assert.ok(d.kind === 'not-decomposable' && d.divisorDimension === 0);
      if (d.kind === 'not-decomposable') checkRelationWitness(F, omega, d.relation);
      assert.equal(supportSpace(F, omega).length, 6);
    }
  });
});

describe('agreement with independent criteria', () => {
  test('degree 2: decomposable iff the skew matrix (p_ij) has rank ≤ 2 (rank of an alternating form; classical, from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc.integer({ min: 2, max: 6 }).chain((n) => fc.tuple(fc.constant(n), termList(c, n, 2, 5))),
          ([n, terms]) => {
            const omega = fromTerms(F, n, 2, terms);
            const skew = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => coefficient(F, omega, [i, j])));
            const r = rank(F, skew, n);
            const d = decompose(F, omega);
            if (r === 0) assert.equal(d.kind, 'zero');
            else if (r === 2) assert.equal(d.kind, 'decomposable');
            else {
              assert.equal(d.kind, 'not-decomposable');
              if (d.kind === 'not-decomposable') checkRelationWitness(F, omega, d.relation);
            }
          },
        ),
        { numRuns: 80 },
      );
    }
  });

  test('any degree: decomposable iff every quadratic Plücker relation vanishes (the Grassmannian is cut out by them; Griffiths–Harris Ch. 1 §5 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc
            .integer({ min: 3, max: 6 })
            .chain((n) =>
              fc
                .integer({ min: 2, max: n - 1 })
                .chain((k) => fc.tuple(fc.constant(n), fc.constant(k), basisOf(c, k, n), basisOf(c, k, n), termList(c, n, k, 4), fc.integer({ min: 0, max: 2 }))),
            ),
          ([n, k, a, b, terms, choice]) => {
            // One decomposable; a sum of two (sometimes decomposable, often not); or a few random terms.
            const omega =
              choice === 0
                ? pluckerMultivector(F, a, n)
                : choice === 1
                  ? add(F, pluckerMultivector(F, a, n), pluckerMultivector(F, b, n))
                  : fromTerms(F, n, k, terms);
            let allVanish = true;
            for (const I of bruteSubsets(n, k - 1)) {
              for (const J of bruteSubsets(n, k + 1)) {
                if (!F.isZero(evaluateRelation(F, omega, I, J).value)) allVanish = false;
              }
            }
            const d = decompose(F, omega);
            if (isZeroMV(omega)) assert.equal(d.kind, 'zero');
            else assert.equal(d.kind === 'decomposable', allVanish);
            if (d.kind === 'not-decomposable') {
              assert.ok(d.divisorDimension < k);
              checkRelationWitness(F, omega, d.relation);
            }
          },
        ),
        { numRuns: 40 },
      );
    }
  });

  test('divisor space: every basis vector v satisfies v ∧ ω = 0, it lies in the support space W(ω), and equals it exactly when ω is decomposable (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc.integer({ min: 2, max: 6 }).chain((n) => fc.integer({ min: 1, max: n }).chain((k) => fc.tuple(fc.constant(n), fc.constant(k), termList(c, n, k)))),
          ([n, k, terms]) => {
            const omega = fromTerms(F, n, k, terms);
            const D = divisorSpace(F, omega);
            for (const v of D) {
              assert.ok(isZeroMV(wedge(F, fromTerms(F, n, 1, v.map((x, i) => [[i], x] as const)), omega)));
            }
            if (isZeroMV(omega)) {
              assert.equal(D.length, n);
              return;
            }
            assert.ok(D.length <= k);
            const support = supportSpace(F, omega);
            // D(ω) ⊆ W(ω): stacking them does not raise the rank of W; they are equal exactly when ω is decomposable.
            assert.equal(rank(F, [...support, ...D], n), support.length);
            assert.ok(support.length >= k);
            assert.equal(D.length === k, rowSpaceEquals(F, D, support, n));
          },
        ),
        { numRuns: 40 },
      );
    }
  });
});

describe('evaluateRelation checks its arguments', () => {
  test('wrong sizes and unsorted sets are refused', () => {
    const omega = basisMV(QQ, 4, [0, 1]);
    assert.throws(() => evaluateRelation(QQ, omega, [0, 1], [1, 2, 3]), RangeError);
    assert.throws(() => evaluateRelation(QQ, omega, [0], [3, 2, 1]), RangeError);
    assert.throws(() => evaluateRelation(QQ, omega, [0], [1, 2, 4]), RangeError);
  });
});
