/**
 * Scaling a projective point with rational-function coordinates (such as the
 * Plücker vector of a subspace depending on parameters) to polynomial
 * coordinates without common factor: the usual way to show such a point.
 */
import { QQ, gcdBigInt, lcmBigInt, type Rational } from '../rational.js';
import type { MultivariatePolynomial } from './multivariate-polynomial.js';
import { gcdPolynomials, lcmPolynomials } from './polynomial-gcd.js';
import type { RationalFunction, RationalFunctionField } from './rational-function-field.js';

export interface PolynomialPoint<T> {
  /** scale · values, coordinate by coordinate, as polynomials with no common non-constant factor. */
  coordinates: MultivariatePolynomial<T>[];
  /** The nonzero factor applied. */
  scale: RationalFunction<T>;
}

/**
 * The representative of a nonzero vector of rational functions with
 * polynomial coordinates whose gcd is 1, normalized at its first nonzero
 * coordinate: over the rationals the coordinates have integer coefficients
 * without common factor and the first nonzero one has a positive leading
 * coefficient; over other fields that leading coefficient is 1. The zero
 * vector is returned unchanged with scale 1.
 */
export function polynomialRepresentative<T>(K: RationalFunctionField<T>, values: readonly RationalFunction<T>[]): PolynomialPoint<T> {
  const R = K.ring;
  const first = values.findIndex((x) => !K.isZero(x));
  if (first < 0) return { coordinates: values.map((x) => x.num), scale: K.one };
  let denominators = R.one;
  for (const x of values) if (!K.isZero(x)) denominators = lcmPolynomials(R, denominators, x.den);
  const cleared = values.map((x) => (K.isZero(x) ? R.zero : R.mul(x.num, R.divideExact(denominators, x.den))));
  let g = R.zero;
  for (const c of cleared) if (!R.isZero(c)) g = gcdPolynomials(R, g, c);
  let coordinates = cleared.map((c) => (R.isZero(c) ? c : R.divideExact(c, g)));
  let constant = R.field.one;
  if ((R.field as unknown) === QQ) {
    // One rational constant makes the coefficients of all coordinates together integral and coprime.
    constant = integralScale(coordinates as unknown as MultivariatePolynomial<Rational>[]) as unknown as T;
  }
  const lead = R.leadingCoefficient(R.scale(coordinates[first]!, constant));
  const sign = (R.field as unknown) === QQ ? ((lead as unknown as Rational).num < 0n ? R.field.neg(R.field.one) : R.field.one) : R.field.inv(lead);
  constant = R.field.mul(constant, sign);
  coordinates = coordinates.map((c) => R.scale(c, constant));
  return { coordinates, scale: K.mul(K.fromBase(constant), K.quotient(denominators, g)) };
}

/** The positive rational s making every coefficient of the polynomials integral with gcd 1. */
function integralScale(polynomials: readonly MultivariatePolynomial<Rational>[]): Rational {
  let l = 1n;
  let g = 0n;
  for (const p of polynomials) for (const t of p.terms) l = lcmBigInt(l, t.coefficient.den);
  for (const p of polynomials) for (const t of p.terms) g = gcdBigInt(g, (t.coefficient.num * l) / t.coefficient.den);
  return QQ.fromRational(l, g);
}
