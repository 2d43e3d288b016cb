/**
 * The metric-free complement ⋆ of the engine (`hodgeStar`), against what its
 * doc comment promises and the textbook Hodge star of the standard inner
 * product with orientation e_1 ∧ … ∧ e_n:
 * - ⋆⋆ω = (−1)^{k(n−k)} ω in degree k (the sign stated in HODGE_SIGN_RULE;
 *   the usual sign of the Hodge star in Euclidean signature, common practice);
 * - α ∧ ⋆β = ⟨α, β⟩ · e_1 ∧ … ∧ e_n with ⟨α, β⟩ = Σ_I α_I β_I, the defining
 *   property of the Hodge star (e.g. Warner, Foundations of Differentiable
 *   Manifolds and Lie Groups, §6.1 — from memory);
 * - on the Plücker vector of a subspace W it gives, up to a nonzero factor,
 *   the Plücker vector of the annihilator W^⊥ (common practice, no source),
 *   here with W^⊥ computed by this test's own elimination.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { HODGE_SIGN_RULE, hodgeStar } from '../../server/src/engine/duality.js';
import { fromTerms, neg, wedge } from '../../server/src/engine/multivector.js';
import { pluckerMultivector } from '../../server/src/engine/plucker.js';
import { FIELD_CASES, MAX_DIMENSION, shape, shapedMatrix, termsOf } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { coefficientOf, denseCoefficients, minorsOf, nullSpace, proportional, rankOf, sameMultivector } from './reference-algebra.js';

test('the documented sign of the double complement is (−1)^(k(n−k))', () => {
  // The test below relies on this sentence of the engine's documentation.
  assert.match(HODGE_SIGN_RULE, /⋆⋆ω = \(−1\)\^\(k\(n−k\)\)·ω/);
});

describe('the complement ⋆ is the Hodge star of the standard basis', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;
    const multivector = (minK = 0) => shape(minK).chain(({ n, k }) => termsOf(c, n, k).map((terms) => fromTerms(F, n, k, terms)));

    test(`${c.label}: ⋆⋆ω = (−1)^{k(n−k)} ω`, () => {
      fc.assert(
        fc.property(multivector(), (omega) => {
          const twice = hodgeStar(F, hodgeStar(F, omega));
          const sign = (omega.k * (omega.n - omega.k)) % 2 === 0;
          assert.equal(twice.k, omega.k);
          assert.ok(sameMultivector(F, twice, sign ? omega : neg(F, omega)));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: α ∧ ⋆β = (Σ_I α_I β_I) · e_1 ∧ … ∧ e_n`, () => {
      const pair = shape().chain(({ n, k }) =>
        fc.tuple(termsOf(c, n, k), termsOf(c, n, k)).map(([a, b]) => [fromTerms(F, n, k, a), fromTerms(F, n, k, b)] as const),
      );
      fc.assert(
        fc.property(pair, ([alpha, beta]) => {
          const top = wedge(F, alpha, hodgeStar(F, beta));
          const x = denseCoefficients(F, alpha);
          const y = denseCoefficients(F, beta);
          const inner = x.reduce((sum, v, i) => F.add(sum, F.mul(v, y[i]!)), F.zero);
          assert.equal(top.k, alpha.n);
          const all = Array.from({ length: alpha.n }, (_, i) => i);
          assert.ok(F.eq(coefficientOf(F, top, all), inner));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: ⋆ plucker(W) is the Plücker point of the annihilator of W`, () => {
      fc.assert(
        fc.property(shapedMatrix(c, 0, MAX_DIMENSION), ({ n, k, rows }) => {
          fc.pre(rankOf(F, rows, n) === k);
          const star = denseCoefficients(F, hodgeStar(F, pluckerMultivector(F, rows, n)));
          // W^⊥ = {φ : φ(w) = 0 for w ∈ W} is the null space of the basis matrix, in the dual basis.
          const annihilator = minorsOf(F, nullSpace(F, rows, n), n);
          assert.ok(proportional(F, star, annihilator));
        }),
        propertyParameters(),
      );
    });
  }
});
