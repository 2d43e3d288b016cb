/**
 * The fields the algebraic properties run over, with generators of their
 * elements, vectors, matrices and homogeneous multivectors.
 *
 * Zero is drawn often on purpose, so that ranks drop, minors vanish and
 * multivectors come out sparse or zero: the edge cases are where sign and
 * pivot mistakes hide.
 */
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational } from '../../server/src/engine/rational.js';

export interface FieldCase {
  label: string;
  F: Field<any>;
  element: fc.Arbitrary<any>;
}

function primeCase(p: bigint): FieldCase {
  const F = primeField(p);
  return {
    label: `GF(${p})`,
    F,
    element: fc.oneof(
      { arbitrary: fc.constant(F.zero), weight: 1 },
      { arbitrary: fc.bigInt({ min: 0n, max: p - 1n }).map((x) => F.fromBigInt(x)), weight: 3 },
    ),
  };
}

const QQ_CASE: FieldCase = {
  label: 'QQ',
  F: QQ,
  element: fc.oneof(
    { arbitrary: fc.constant(QQ.zero), weight: 1 },
    {
      arbitrary: fc.tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 5 })).map(([a, b]) => rational(BigInt(a), BigInt(b))),
      weight: 3,
    },
  ),
};

/**
 * The rationals; characteristic 2 and 3 (where signs and the ω ∧ ω test
 * behave differently); a middle prime; the prime 2^31 − 1 at the edge of the
 * engine's 32-bit fast path; and 2^61 − 1, whose elements are bigints.
 */
export const FIELD_CASES: readonly FieldCase[] = [
  QQ_CASE,
  primeCase(2n),
  primeCase(3n),
  primeCase(101n),
  primeCase(2n ** 31n - 1n),
  primeCase(2n ** 61n - 1n),
];

/** Largest ambient dimension the properties use (the brief: small sizes, n ≤ 7). */
export const MAX_DIMENSION = 7;

export function vectorOf(c: FieldCase, n: number): fc.Arbitrary<any[]> {
  return fc.array(c.element, { minLength: n, maxLength: n });
}

export function matrixOf(c: FieldCase, rows: number, columns: number): fc.Arbitrary<any[][]> {
  return fc.array(vectorOf(c, columns), { minLength: rows, maxLength: rows });
}

/** An ambient dimension n ≥ 1 and a degree 0 ≤ k ≤ n. */
export function shape(minK = 0, maxN = MAX_DIMENSION): fc.Arbitrary<{ n: number; k: number }> {
  return fc
    .integer({ min: Math.max(1, minK), max: maxN })
    .chain((n) => fc.integer({ min: minK, max: n }).map((k) => ({ n, k })));
}

/** A k×n matrix with its shape (its rows may be dependent). */
export function shapedMatrix(c: FieldCase, minK = 0, maxN = MAX_DIMENSION) {
  return shape(minK, maxN).chain(({ n, k }) => matrixOf(c, k, n).map((rows) => ({ n, k, rows })));
}

/**
 * The terms of a homogeneous multivector of degree k in dimension n: up to
 * `maxTerms` pairs of a strictly increasing k-subset and a coefficient.
 */
export function termsOf(c: FieldCase, n: number, k: number, maxTerms = 8): fc.Arbitrary<[number[], any][]> {
  const subset = fc
    .uniqueArray(fc.integer({ min: 0, max: n - 1 }), { minLength: k, maxLength: k })
    .map((s) => s.slice().sort((a, b) => a - b));
  return fc.array(fc.tuple(subset, c.element), { maxLength: k <= n ? maxTerms : 0 });
}
