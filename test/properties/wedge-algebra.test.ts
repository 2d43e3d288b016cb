/**
 * The wedge product of the engine obeys the defining identities of the
 * exterior algebra, over the rationals and over prime fields:
 * anticommutativity of vectors (u ∧ v = −v ∧ u, u ∧ u = 0), graded
 * commutativity a ∧ b = (−1)^{pq} b ∧ a for a of degree p and b of degree q,
 * associativity and bilinearity. These are the axioms and first consequences
 * of the exterior algebra (e.g. Bourbaki, Algebra I, Ch. III §7; Lang,
 * Algebra, Ch. XIX §1 — from memory).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { add, fromTerms, fromVector, neg, scale, wedge } from '../../server/src/engine/multivector.js';
import { FIELD_CASES, MAX_DIMENSION, shape, termsOf, vectorOf } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { permutationSign, sameMultivector, coefficientOf } from './reference-algebra.js';

describe('the wedge product satisfies the identities of the exterior algebra', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;

    test(`${c.label}: vectors anticommute, u ∧ v = −(v ∧ u) and u ∧ u = 0`, () => {
      const pair = fc.integer({ min: 1, max: MAX_DIMENSION }).chain((n) => fc.tuple(vectorOf(c, n), vectorOf(c, n)));
      fc.assert(
        fc.property(pair, ([u, v]) => {
          const U = fromVector(F, u);
          const V = fromVector(F, v);
          assert.ok(sameMultivector(F, wedge(F, U, V), neg(F, wedge(F, V, U))));
          assert.equal(wedge(F, U, U).terms.size, 0);
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: e_i ∧ e_j has coefficient sign(i, j) on e_{sorted} (the definition on basis vectors)`, () => {
      const indices = fc.integer({ min: 2, max: MAX_DIMENSION }).chain((n) =>
        fc.tuple(fc.constant(n), fc.array(fc.integer({ min: 0, max: n - 1 }), { minLength: 1, maxLength: n })),
      );
      fc.assert(
        fc.property(indices, ([n, list]) => {
          let product = fromTerms(F, n, 0, [[[], F.one]]);
          for (const i of list) product = wedge(F, product, fromTerms(F, n, 1, [[[i], F.one]]));
          const sign = permutationSign(list);
          const sorted = list.slice().sort((a, b) => a - b);
          if (sign === 0) assert.equal(product.terms.size, 0);
          else assert.ok(F.eq(coefficientOf(F, product, sorted), sign === 1 ? F.one : F.neg(F.one)));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: graded commutativity a ∧ b = (−1)^{pq} b ∧ a`, () => {
      const operands = fc
        .integer({ min: 1, max: MAX_DIMENSION })
        .chain((n) => fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })))
        .chain(([n, p, q]) => fc.tuple(fc.constant(n), fc.constant(p), fc.constant(q), termsOf(c, n, p), termsOf(c, n, q)));
      fc.assert(
        fc.property(operands, ([n, p, q, aTerms, bTerms]) => {
          const a = fromTerms(F, n, p, aTerms);
          const b = fromTerms(F, n, q, bTerms);
          const ba = wedge(F, b, a);
          const expected = (p * q) % 2 === 0 ? ba : neg(F, ba);
          assert.ok(sameMultivector(F, wedge(F, a, b), expected));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: associativity (a ∧ b) ∧ c = a ∧ (b ∧ c)`, () => {
      const operands = shape(0)
        .chain(({ n }) => fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })))
        .chain(([n, p, q, r]) =>
          fc.tuple(fc.constant(n), fc.constant([p, q, r]), termsOf(c, n, p, 5), termsOf(c, n, q, 5), termsOf(c, n, r, 5)),
        );
      fc.assert(
        fc.property(operands, ([n, [p, q, r], aTerms, bTerms, cTerms]) => {
          const a = fromTerms(F, n, p!, aTerms);
          const b = fromTerms(F, n, q!, bTerms);
          const d = fromTerms(F, n, r!, cTerms);
          assert.ok(sameMultivector(F, wedge(F, wedge(F, a, b), d), wedge(F, a, wedge(F, b, d))));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: bilinearity (s·a + a') ∧ b = s·(a ∧ b) + a' ∧ b`, () => {
      const operands = fc
        .integer({ min: 1, max: MAX_DIMENSION })
        .chain((n) => fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })))
        .chain(([n, p, q]) =>
          fc.tuple(fc.constant(n), fc.constant(p), fc.constant(q), c.element, termsOf(c, n, p), termsOf(c, n, p), termsOf(c, n, q)),
        );
      fc.assert(
        fc.property(operands, ([n, p, q, s, aTerms, a2Terms, bTerms]) => {
          const a = fromTerms(F, n, p, aTerms);
          const a2 = fromTerms(F, n, p, a2Terms);
          const b = fromTerms(F, n, q, bTerms);
          const left = wedge(F, add(F, scale(F, s, a), a2), b);
          const right = add(F, scale(F, s, wedge(F, a, b)), wedge(F, a2, b));
          assert.ok(sameMultivector(F, left, right));
        }),
        propertyParameters(),
      );
    });
  }
});
