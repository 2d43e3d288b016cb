/**
 * Greatest common divisors of sparse polynomials over any field, with the
 * rationals handled on integer polynomials.
 *
 * The result is normalized to leading coefficient 1 in the monomial order
 * (grevlex, see monomial-order.ts), so it is unique; gcd(0, 0) = 0. Common
 * monomial factors are split off first, since a variable is prime and the
 * remaining parts are divisible by no variable. What is left goes to the
 * modular algorithm of modular-gcd.ts or the recursive primitive remainder
 * sequence of gcd-domain.ts (see `gcdOfParts`). Over the rationals
 * the inputs are scaled to integer coefficients first: the gcd over Q is the
 * gcd over Z up to a constant (Gauss's lemma), and integers avoid the growth
 * of fractions that Euclid's algorithm over Q suffers.
 */
import type { Field } from '../field.js';
import { smallPrimeModulus } from '../prime-field.js';
import { QQ, lcmBigInt, type Rational } from '../rational.js';
import { INTEGERS, fieldDomain, polynomialsOver, type GcdDomain } from './gcd-domain.js';
import { brownGcd, modularIntegerGcd } from './modular-gcd.js';
import { monomialGcd, totalDegreeOf } from './monomial-order.js';
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';
import { fromRecursive, toRecursive, type LooseTerm } from './recursive-form.js';

/** The smallest exponent of each variable over the terms of a nonzero polynomial. */
export function monomialContent<T>(a: MultivariatePolynomial<T>): number[] {
  let m = a.terms[0]!.exponents.slice();
  for (const t of a.terms) m = monomialGcd(m, t.exponents);
  return m;
}

/** a divided by the monomial x^m, which must divide every term. */
function withoutMonomial<T>(a: MultivariatePolynomial<T>, m: readonly number[]): MultivariatePolynomial<T> {
  if (totalDegreeOf(m) === 0) return a;
  return { terms: a.terms.map((t) => ({ exponents: t.exponents.map((e, i) => e - m[i]!), coefficient: t.coefficient })) };
}

/** The domains for a recursive form with `levels` variables over `base`, outermost first. */
function nestedDomain<C>(base: GcdDomain<C>, levels: number): GcdDomain<unknown> {
  let D: GcdDomain<any> = base;
  for (let i = 0; i < levels; i++) D = polynomialsOver(D);
  return D;
}

/** Integer coefficients with the same ratios: every coefficient times the lcm of the denominators. */
function integerTerms(a: MultivariatePolynomial<Rational>): LooseTerm<bigint>[] {
  let l = 1n;
  for (const t of a.terms) if (t.coefficient.den !== 1n) l = lcmBigInt(l, t.coefficient.den);
  return a.terms.map((t) => ({ exponents: t.exponents, coefficient: (t.coefficient.num * l) / t.coefficient.den }));
}

/** The variables for the recursion: those in either input, the ones shared by both first, lower degree first. */
function recursionOrder<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): number[] {
  const inA = new Set(R.variablesIn(a));
  const inB = new Set(R.variablesIn(b));
  const used = [...new Set([...inA, ...inB])];
  const weight = (v: number) => (inA.has(v) && inB.has(v) ? 0 : 1000) + Math.max(R.degreeIn(a, v), R.degreeIn(b, v));
  return used.sort((x, y) => weight(x) - weight(y) || x - y);
}

/**
 * The gcd of two polynomials, neither divisible by a variable nor constant,
 * up to a constant factor. In several variables over the rationals and over
 * GF(p) with p < 2^31 the modular algorithm of modular-gcd.ts runs; the
 * primitive remainder sequence is used in one variable (where it is fast),
 * over other fields, and for GF(p) too small to interpolate in.
 */
function gcdOfParts<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
  const order = recursionOrder(R, a, b);
  const n = R.variables.length;
  if ((R.field as unknown) === QQ) {
    const A = toRecursive(integerTerms(a as unknown as MultivariatePolynomial<Rational>), order, 0n);
    const B = toRecursive(integerTerms(b as unknown as MultivariatePolynomial<Rational>), order, 0n);
    const g = (order.length >= 2 ? modularIntegerGcd(A, B, order.length) : undefined) ?? nestedDomain(INTEGERS, order.length).gcd(A, B);
    const terms = fromRecursive<bigint>(g, order, n, (c) => c === 0n);
    return R.fromTerms(terms.map((t) => ({ exponents: t.exponents, coefficient: QQ.fromBigInt(t.coefficient) as unknown as T })));
  }
  const F: Field<T> = R.field;
  const A = toRecursive(a.terms, order, F.zero);
  const B = toRecursive(b.terms, order, F.zero);
  const modular =
    order.length >= 2 && smallPrimeModulus(F) !== undefined ? brownGcd(F as unknown as Field<number>, A, B, order.length) : undefined;
  const g = modular ?? nestedDomain(fieldDomain(F), order.length).gcd(A, B);
  return R.fromTerms(fromRecursive<T>(g, order, n, (c) => F.isZero(c)));
}

/** The gcd of a and b, with leading coefficient 1 (see the module comment); gcd(0, 0) = 0. */
export function gcdPolynomials<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
  if (R.isZero(a)) return R.monic(b);
  if (R.isZero(b)) return R.monic(a);
  if (R.isConstant(a) || R.isConstant(b)) return R.one;
  const ma = monomialContent(a);
  const mb = monomialContent(b);
  const common = R.monomial(monomialGcd(ma, mb));
  const a1 = withoutMonomial(a, ma);
  const b1 = withoutMonomial(b, mb);
  if (R.isConstant(a1) || R.isConstant(b1)) return common;
  if (R.eq(R.monic(a1), R.monic(b1))) return R.mul(common, R.monic(a1));
  return R.mul(common, R.monic(gcdOfParts(R, a1, b1)));
}

/** The least common multiple, with leading coefficient 1; 0 when either is 0. */
export function lcmPolynomials<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
  if (R.isZero(a) || R.isZero(b)) return R.zero;
  return R.monic(R.mul(R.divideExact(a, gcdPolynomials(R, a, b)), b));
}

/**
 * The coefficients of a as a polynomial in one variable, lowest power first:
 * polynomials of the same ring in which that variable does not occur.
 */
export function coefficientsIn<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, which: string | number): MultivariatePolynomial<T>[] {
  const v = typeof which === 'number' ? which : R.variableIndex(which);
  const top = R.degreeIn(a, v);
  const buckets: { exponents: number[]; coefficient: T }[][] = Array.from({ length: top + 1 }, () => []);
  for (const t of a.terms) {
    const exponents = t.exponents.slice();
    exponents[v] = 0;
    buckets[t.exponents[v]!]!.push({ exponents, coefficient: t.coefficient });
  }
  return buckets.map((b) => R.fromTerms(b));
}

/**
 * The content of a with respect to one variable: the gcd of its coefficients
 * as a polynomial in that variable, with leading coefficient 1. It does not
 * involve the variable; a divided by it is the primitive part.
 */
export function contentIn<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, which: string | number): MultivariatePolynomial<T> {
  let g = R.zero;
  for (const c of coefficientsIn(R, a, which)) {
    if (R.isZero(c)) continue;
    g = gcdPolynomials(R, g, c);
    if (R.isOne(g)) break;
  }
  return g;
}
