/**
 * Recovering a subspace from its Plücker vector gives back the same
 * subspace: a k-subspace W is determined by its Plücker point, and
 * W = {v : v ∧ ω = 0} for ω = plucker(W) (Griffiths–Harris, Principles of
 * Algebraic Geometry, Ch. 1 §5 — from memory). Row spaces are compared by
 * their reduced row echelon forms, computed by this test's own elimination.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { decompose } from '../../server/src/engine/decompose.js';
import { scale, wedgeVectors } from '../../server/src/engine/multivector.js';
import { pluckerMultivector } from '../../server/src/engine/plucker.js';
import { FIELD_CASES, shapedMatrix } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { rankOf, sameMultivector, sameRowSpace } from './reference-algebra.js';

describe('decompose(plucker(W)) recovers W', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;

    test(`${c.label}: the same row space, and the scalar reproduces the Plücker vector`, () => {
      fc.assert(
        fc.property(shapedMatrix(c), c.element, ({ n, k, rows }, s) => {
          const omega = scale(F, s, pluckerMultivector(F, rows, n));
          const d = decompose(F, omega);
          if (F.isZero(s) || rankOf(F, rows, n) < k) {
            // Dependent rows (or a zero factor) have the zero Plücker vector: no subspace to recover.
            assert.equal(d.kind, 'zero');
            return;
          }
          assert.equal(d.kind, 'decomposable');
          if (d.kind !== 'decomposable') return;
          assert.equal(d.basis.length, k);
          assert.ok(sameRowSpace(F, d.basis, rows, n), 'the recovered basis spans another subspace');
          assert.ok(sameMultivector(F, scale(F, d.scalar, wedgeVectors(F, n, d.basis)), omega), 'scalar · wedge(basis) ≠ ω');
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: two bases of one subspace give proportional Plücker vectors and one recovered subspace`, () => {
      // A second basis of the same row space: an invertible change of basis, here row operations
      // r_i ← r_i + a_i·r_{i+1} followed by scaling by nonzero b_i, which never changes the span.
      const changed = shapedMatrix(c, 1).chain(({ n, k, rows }) =>
        fc
          .tuple(fc.array(c.element, { minLength: k, maxLength: k }), fc.array(c.element.filter((x) => !F.isZero(x)), { minLength: k, maxLength: k }))
          .map(([a, b]) => {
            const other = rows.map((r) => r.slice());
            for (let i = 0; i + 1 < k; i++) other[i] = other[i]!.map((x, j) => F.add(x, F.mul(a[i]!, other[i + 1]![j]!)));
            return { n, k, rows, other: other.map((r, i) => r.map((x) => F.mul(b[i]!, x))) };
          }),
      );
      fc.assert(
        fc.property(changed, ({ n, k, rows, other }) => {
          fc.pre(rankOf(F, rows, n) === k);
          const first = decompose(F, pluckerMultivector(F, rows, n));
          const second = decompose(F, pluckerMultivector(F, other, n));
          assert.ok(first.kind === 'decomposable' && second.kind === 'decomposable');
          assert.ok(sameRowSpace(F, first.basis, second.basis, n));
        }),
        propertyParameters(),
      );
    });
  }
});
