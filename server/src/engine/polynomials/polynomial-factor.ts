/**
 * Factoring sparse polynomials for display ("shown factored over QQ").
 *
 * What is guaranteed, for a nonzero f over any field:
 * - the constant (`unit`), the monomial factor (each variable with its
 *   exponent) and the splitting by contents: whenever the coefficients of the
 *   polynomial, read as a polynomial in one variable, have a common
 *   non-constant factor, that factor is split off; so every remaining part
 *   involves each of its variables in every one of its factors;
 * - repeated factors are split off exactly: a part g with g and ∂g/∂x
 *   sharing a factor is split by their gcd; a part all of whose partial
 *   derivatives vanish (characteristic p) is a p-th power over a finite field,
 *   and its p-th root is factored instead;
 * - a part in a single variable is factored completely over the rationals
 *   and over finite fields;
 * - a homogeneous part is factored through its value at one variable = 1,
 *   which has one variable fewer, so forms in two variables are factored
 *   completely over the rationals and finite fields;
 * - a part linear in some variable, or shown irreducible by fixing all
 *   variables but one (irreducibility-by-specialization.ts), is marked
 *   irreducible; otherwise, over the rationals and finite fields, Kronecker's
 *   substitution (kronecker-factor.ts) factors it completely within its
 *   limits.
 * Whatever is left is reported as a factor with `irreducible: false`: never
 * claimed irreducible without proof. Over other fields only the first two
 * steps and the linear test apply. The result is checked by multiplying it
 * back out.
 */
import { fieldPower } from '../field-square-roots.js';
import type { Field } from '../field.js';
import { QQ, type Rational } from '../rational.js';
import { finiteFieldSize } from './finite-field-factor.js';
import {
  compareFactorPolynomials,
  expandFactored,
  normalizeFactor,
  type FactoredPolynomial,
  type FactoredQuotient,
  type PolynomialFactor,
} from './factored-form.js';
import { irreducibleBySpecialization } from './irreducibility-by-specialization.js';
import { DEFAULT_KRONECKER_LIMITS, kroneckerFactor, type KroneckerLimits } from './kronecker-factor.js';
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';
import { contentIn, gcdPolynomials, monomialContent } from './polynomial-gcd.js';
import type { RationalFunction, RationalFunctionField } from './rational-function-field.js';
import { rationalRootsOf, type RationalRoot } from './rational-univariate-factor.js';
import { univariateFactoriserFor, type UnivariateFactoriser } from './univariate-factoriser.js';
import { denseCoefficientsIn, fromDenseIn, univariateCoefficients } from './univariate-view.js';

interface Part<T> {
  polynomial: MultivariatePolynomial<T>;
  multiplicity: number;
  irreducible: boolean;
}

/** Parts of f (non-constant) whose product is f up to a constant, each primitive with respect to each of its variables. */
function splitByContents<T>(R: PolynomialRing<T>, f: MultivariatePolynomial<T>): MultivariatePolynomial<T>[] {
  if (R.isConstant(f)) return [];
  const used = R.variablesIn(f);
  if (used.length <= 1) return [f];
  for (const v of used) {
    const c = contentIn(R, f, v);
    if (!R.isConstant(c)) return [...splitByContents(R, c), ...splitByContents(R, R.divideExact(f, c))];
  }
  return [f];
}

/** The p-th root of a polynomial over GF(q) all of whose exponents are multiples of p (Frobenius is onto on GF(q)). */
function pthRoot<T>(R: PolynomialRing<T>, g: MultivariatePolynomial<T>, q: bigint): MultivariatePolynomial<T> {
  const p = Number(R.field.characteristic);
  const e = q / R.field.characteristic;
  return R.fromTerms(
    g.terms.map((t) => ({ exponents: t.exponents.map((x) => x / p), coefficient: e === 1n ? t.coefficient : fieldPower(R.field, t.coefficient, e) })),
  );
}

/** Square-free parts of g (each involving all variables of g) whose product with multiplicities is g up to a constant. */
function splitRepeated<T>(R: PolynomialRing<T>, g: MultivariatePolynomial<T>, multiplicity: number): Part<T>[] {
  if (R.isConstant(g)) return [];
  for (const v of R.variablesIn(g)) {
    const derivative = R.derivative(g, v);
    if (R.isZero(derivative)) continue;
    const h = gcdPolynomials(R, g, derivative);
    // An irreducible factor u with u^2 | g divides ∂g/∂v whenever u involves v, as every factor here does.
    if (R.isConstant(h)) return [{ polynomial: g, multiplicity, irreducible: false }];
    return [...splitRepeated(R, h, multiplicity), ...splitRepeated(R, R.divideExact(g, h), multiplicity)];
  }
  const q = finiteFieldSize(R.field);
  if (q !== undefined) return splitRepeated(R, pthRoot(R, g, q), multiplicity * Number(R.field.characteristic));
  return [{ polynomial: g, multiplicity, irreducible: false }];
}

function isHomogeneous<T>(R: PolynomialRing<T>, g: MultivariatePolynomial<T>): boolean {
  const d = R.totalDegree(g);
  return g.terms.every((t) => t.exponents.reduce((a, b) => a + b, 0) === d);
}

/** x^(deg u)·u(…/x): the homogeneous polynomial of the same total degree that gives u at x = 1. */
function homogenize<T>(R: PolynomialRing<T>, u: MultivariatePolynomial<T>, x: number): MultivariatePolynomial<T> {
  const d = R.totalDegree(u);
  return R.fromTerms(
    u.terms.map((t) => {
      const exponents = t.exponents.slice();
      exponents[x] = d - t.exponents.reduce((a, b) => a + b, 0);
      return { exponents, coefficient: t.coefficient };
    }),
  );
}

/**
 * A homogeneous part g not divisible by x, factored through g at x = 1, which
 * has one variable fewer. Setting x = 1 is multiplicative and, on homogeneous
 * polynomials not divisible by x, undone by homogenizing; every factor of a
 * homogeneous polynomial is homogeneous, so the factorisations correspond
 * one to one, irreducible factors to irreducible factors. (Common practice,
 * no source.)
 */
function splitHomogeneous<T>(R: PolynomialRing<T>, g: MultivariatePolynomial<T>, x: number, limits: KroneckerLimits): Part<T>[] {
  const affine = R.substitute(g, { [R.variables[x]!]: R.field.one });
  return factorPolynomial(R, affine, { kronecker: limits }).factors.map(({ polynomial, multiplicity, irreducible }) => ({
    polynomial: homogenize(R, polynomial, x),
    multiplicity,
    irreducible,
  }));
}

/** The factors of a part found by the univariate factoriser, the linear test, specialization or Kronecker's method. */
function splitPart<T>(
  R: PolynomialRing<T>,
  g: MultivariatePolynomial<T>,
  factorise: UnivariateFactoriser<T> | undefined,
  limits: KroneckerLimits,
): Part<T>[] {
  const used = R.variablesIn(g);
  const unknown: Part<T>[] = [{ polynomial: g, multiplicity: 1, irreducible: false }];
  if (R.totalDegree(g) === 1) return [{ polynomial: g, multiplicity: 1, irreducible: true }];
  if (used.length === 1) {
    if (factorise === undefined) return unknown;
    const result = factorise(denseCoefficientsIn(R, g, used[0]!));
    if (result === undefined) return unknown;
    return result.factors.map(({ factor, multiplicity }) => ({ polynomial: fromDenseIn(R, factor, used[0]!), multiplicity, irreducible: true }));
  }
  // Linear in a variable and primitive with respect to it: a factorisation would need a factor free of that variable.
  if (used.some((v) => R.degreeIn(g, v) === 1)) return [{ polynomial: g, multiplicity: 1, irreducible: true }];
  if (isHomogeneous(R, g)) return splitHomogeneous(R, g, used[used.length - 1]!, limits);
  if (factorise === undefined) return unknown;
  if (irreducibleBySpecialization(R, g, factorise).irreducible) return [{ polynomial: g, multiplicity: 1, irreducible: true }];
  const factors = kroneckerFactor(R, g, factorise, limits);
  if (factors === undefined) return unknown;
  return factors.map((polynomial) => ({ polynomial, multiplicity: 1, irreducible: true }));
}

export interface FactorOptions {
  /** Limits of Kronecker's method for parts in several variables. */
  kronecker?: KroneckerLimits;
}

/** The factored form of a nonzero polynomial; see the module comment for what is guaranteed. */
export function factorPolynomial<T>(R: PolynomialRing<T>, f: MultivariatePolynomial<T>, options: FactorOptions = {}): FactoredPolynomial<T> {
  if (R.isZero(f)) throw new RangeError('the zero polynomial has no factorisation');
  const F = R.field;
  const factorise = univariateFactoriserFor(F);
  const limits = options.kronecker ?? DEFAULT_KRONECKER_LIMITS;
  const parts: Part<T>[] = [];
  const m = monomialContent(f);
  m.forEach((e, v) => {
    if (e > 0) parts.push({ polynomial: R.variable(v), multiplicity: e, irreducible: true });
  });
  const rest = R.tryDivide(f, R.monomial(m))!;
  for (const piece of splitByContents(R, rest)) {
    const squareFree = R.variablesIn(piece).length === 1 ? [{ polynomial: piece, multiplicity: 1, irreducible: false }] : splitRepeated(R, piece, 1);
    for (const { polynomial, multiplicity } of squareFree) {
      for (const part of splitPart(R, polynomial, factorise, limits)) {
        parts.push({ ...part, multiplicity: part.multiplicity * multiplicity });
      }
    }
  }
  const factors = mergeParts(R, parts);
  let unit = R.leadingCoefficient(f);
  for (const { polynomial, multiplicity } of factors) {
    for (let i = 0; i < multiplicity; i++) unit = F.div(unit, R.leadingCoefficient(polynomial));
  }
  const form: FactoredPolynomial<T> = { unit, factors, complete: factors.every((x) => x.irreducible) };
  if (!R.eq(expandFactored(R, form), f)) throw new Error('factorPolynomial: the factors do not multiply back to the polynomial');
  return form;
}

/**
 * Normalizes the parts, adds up the multiplicities of equal ones, divides the
 * parts not known to be irreducible by the irreducible ones as often as they
 * go, and sorts them for display.
 */
function mergeParts<T>(R: PolynomialRing<T>, parts: readonly Part<T>[]): PolynomialFactor<T>[] {
  const merged: Part<T>[] = [];
  const addPart = (part: Part<T>) => {
    if (R.isConstant(part.polynomial)) return;
    const polynomial = normalizeFactor(R, part.polynomial).polynomial;
    const known = merged.find((x) => R.eq(x.polynomial, polynomial));
    if (known === undefined) merged.push({ ...part, polynomial });
    else {
      known.multiplicity += part.multiplicity;
      known.irreducible ||= part.irreducible;
    }
  };
  parts.forEach(addPart);
  const open = merged.filter((x) => !x.irreducible);
  const proven = merged.filter((x) => x.irreducible);
  for (const part of open) {
    for (const p of proven) {
      for (;;) {
        if (R.isConstant(part.polynomial)) break;
        const q = R.tryDivide(part.polynomial, p.polynomial);
        if (q === undefined) break;
        part.polynomial = q;
        p.multiplicity += part.multiplicity;
      }
    }
  }
  const result: Part<T>[] = [];
  for (const part of [...proven, ...open]) {
    if (R.isConstant(part.polynomial)) continue;
    const polynomial = normalizeFactor(R, part.polynomial).polynomial;
    const known = result.find((x) => R.eq(x.polynomial, polynomial));
    if (known === undefined) result.push({ ...part, polynomial });
    else known.multiplicity += part.multiplicity;
  }
  result.sort((a, b) => compareFactorPolynomials(R, a.polynomial, b.polynomial));
  return result;
}

/** Numerator and denominator of a rational function factored (see `factorPolynomial`), the unit in front. */
export function factorRationalFunction<T>(K: RationalFunctionField<T>, a: RationalFunction<T>, options: FactorOptions = {}): FactoredQuotient<T> {
  if (K.isZero(a)) throw new RangeError('zero has no factorisation');
  const top = factorPolynomial(K.ring, a.num, options);
  const bottom = factorPolynomial(K.ring, a.den, options);
  return {
    unit: K.base.div(top.unit, bottom.unit),
    numerator: top.factors,
    denominator: bottom.factors,
    complete: top.complete && bottom.complete,
  };
}

/** The rational roots of a nonzero polynomial over QQ in one variable, ascending, with multiplicities. */
export function rationalRoots(R: PolynomialRing<Rational>, f: MultivariatePolynomial<Rational>): RationalRoot[] {
  if ((R.field as unknown) !== QQ) throw new RangeError(`rationalRoots: needs a polynomial over QQ, not over ${R.field.name}`);
  return rationalRootsOf(univariateCoefficients(R, f));
}
