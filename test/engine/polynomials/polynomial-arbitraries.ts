// Random polynomials and rational functions for the property tests of the polynomial algebra.
import fc from 'fast-check';
import type { Field } from '../../../server/src/engine/field.js';
import { polynomialRing, type MultivariatePolynomial, type PolynomialRing } from '../../../server/src/engine/polynomials/multivariate-polynomial.js';
import { QQ, rational, type Rational } from '../../../server/src/engine/rational.js';

/** Small rationals, integers twice as often as fractions. */
export const smallRational: fc.Arbitrary<Rational> = fc.oneof(
  { arbitrary: fc.integer({ min: -5, max: 5 }).map((n) => rational(BigInt(n))), weight: 2 },
  { arbitrary: fc.tuple(fc.integer({ min: -5, max: 5 }), fc.integer({ min: 1, max: 4 })).map(([n, d]) => rational(BigInt(n), BigInt(d))), weight: 1 },
);

/** Random elements of a prime field with number elements. */
export function primeFieldElement(F: Field<number>): fc.Arbitrary<number> {
  return fc.integer({ min: 0, max: Number(F.characteristic) - 1 }).map((n) => F.fromBigInt(BigInt(n)));
}

/** A polynomial with up to `maxTerms` terms, each exponent at most `maxExponent`. */
export function randomPolynomial<T>(
  R: PolynomialRing<T>,
  coefficient: fc.Arbitrary<T>,
  maxTerms = 4,
  maxExponent = 2,
): fc.Arbitrary<MultivariatePolynomial<T>> {
  const term = fc.record({
    exponents: fc.array(fc.integer({ min: 0, max: maxExponent }), { minLength: R.variables.length, maxLength: R.variables.length }),
    coefficient,
  });
  return fc.array(term, { maxLength: maxTerms }).map((terms) => R.fromTerms(terms));
}

export function nonzeroPolynomial<T>(R: PolynomialRing<T>, coefficient: fc.Arbitrary<T>, maxTerms = 4, maxExponent = 2) {
  return randomPolynomial(R, coefficient, maxTerms, maxExponent).filter((p) => !R.isZero(p));
}

export const QQ_T = polynomialRing(QQ, ['t']);
export const QQ_ST = polynomialRing(QQ, ['s', 't']);
export const QQ_STU = polynomialRing(QQ, ['s', 't', 'u']);

/** The integer polynomial with the given coefficients (constant term first) as rationals. */
export function rationals(coefficients: readonly (number | bigint)[]): Rational[] {
  return coefficients.map((c) => rational(BigInt(c)));
}

/** Product of integer polynomials, constant term first, written out independently of the engine. */
export function multiplyIntegerLists(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  const out = new Array<bigint>(a.length + b.length - 1).fill(0n);
  a.forEach((x, i) => b.forEach((y, j) => (out[i + j]! += x * y)));
  return out;
}
