/**
 * The engine's decomposability verdict agrees with the rank criterion: for
 * ω ≠ 0 of degree k in an n-space, the kernel of v ↦ v ∧ ω is the space of
 * vectors dividing ω, of dimension at most k, and ω is decomposable exactly
 * when that dimension is k, i.e. when the map has rank n − k
 * (Griffiths–Harris, Principles of Algebraic Geometry, Ch. 1 §5 — from
 * memory). The matrix of the map is built here from the terms of ω; its rank
 * comes from this test's own elimination.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { decompose } from '../../server/src/engine/decompose.js';
import { add, fromTerms, isZeroMV, scale, wedgeVectors, type Multivector } from '../../server/src/engine/multivector.js';
import { FIELD_CASES, matrixOf, shape, termsOf, type FieldCase } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { rankOf, subsetsOf, wedgeMapMatrix } from './reference-algebra.js';

/**
 * Multivectors of every kind: random sums of terms (mostly not decomposable
 * once n ≥ 4 and 2 ≤ k ≤ n − 2), scalar multiples of wedges of random vectors
 * (decomposable or zero), and sums of two such wedges (either).
 */
function anyMultivector(c: FieldCase): fc.Arbitrary<Multivector<any>> {
  const { F } = c;
  return shape().chain(({ n, k }) =>
    fc.oneof(
      termsOf(c, n, k).map((terms) => fromTerms(F, n, k, terms)),
      fc.tuple(matrixOf(c, k, n), c.element).map(([rows, s]) => scale(F, s, wedgeVectors(F, n, rows))),
      fc.tuple(matrixOf(c, k, n), matrixOf(c, k, n)).map(([a, b]) => add(F, wedgeVectors(F, n, a), wedgeVectors(F, n, b))),
    ),
  );
}

describe('decomposable exactly when v ↦ v ∧ ω has rank n − k', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;

    test(`${c.label}: the verdict, and the dimension of the divisor space, match the rank of the map`, () => {
      fc.assert(
        fc.property(anyMultivector(c), (omega) => {
          const d = decompose(F, omega);
          if (isZeroMV(omega)) {
            assert.equal(d.kind, 'zero');
            return;
          }
          const { n, k } = omega;
          const columns = subsetsOf(n, k + 1).length;
          const rank = rankOf(F, wedgeMapMatrix(F, omega), columns);
          assert.ok(n - rank <= k, 'at most k independent vectors divide a nonzero k-vector');
          assert.equal(d.kind, rank === n - k ? 'decomposable' : 'not-decomposable');
          if (d.kind === 'not-decomposable') assert.equal(d.divisorDimension, n - rank);
        }),
        propertyParameters(),
      );
    });
  }

  test('the random multivectors reach both verdicts (the property above is not vacuous)', () => {
    const c = FIELD_CASES[0]!;
    const kinds = new Set(fc.sample(anyMultivector(c), { numRuns: 300, seed: 7 }).map((omega) => decompose(c.F, omega).kind));
    assert.deepEqual([...kinds].sort(), ['decomposable', 'not-decomposable', 'zero']);
  });
});
