/**
 * The field of rational functions K(x_1, …, x_m) over a base field K: the
 * field that entries depending on declared parameters live in. It is a
 * `Field`, so row reduction, determinants, Plücker coordinates and
 * decomposability run over it unchanged.
 *
 * Canonical form. A rational function is num/den with num and den coprime
 * polynomials and den of leading coefficient 1 in the monomial order
 * (grevlex, monomial-order.ts); zero is 0/1. Both are unique for each
 * function, so `eq` compares them term by term. Over the rationals the
 * coefficients of both may be fractions (the denominator is monic, not
 * integral); the display scales them to integers, see
 * rational-function-format.ts. Sums and products cancel common factors the
 * way fractions of integers do (cross-cancelling in products, the gcd of the
 * denominators in sums), so gcds are taken of the smallest polynomials that
 * can carry a common factor.
 *
 * The field is not ordered, so it has no `sign`; its characteristic is that
 * of the base field. Being a different object from the rationals and from
 * the prime fields, it never takes their fast paths (those dispatch on the
 * identity of the field object).
 */
import { DivisionByZeroError, type Field } from '../field.js';
import { polynomialRing, type MultivariatePolynomial, type PolynomialRing, type VariableAssignment } from './multivariate-polynomial.js';
import { gcdPolynomials } from './polynomial-gcd.js';
import { rationalFunctionLatex, rationalFunctionText } from './rational-function-format.js';

export interface RationalFunction<T> {
  /** Coprime to `den`. */
  readonly num: MultivariatePolynomial<T>;
  /** Nonzero, with leading coefficient 1. */
  readonly den: MultivariatePolynomial<T>;
}

export interface RationalFunctionField<T> extends Field<RationalFunction<T>> {
  readonly base: Field<T>;
  readonly variables: readonly string[];
  /** The polynomials in the same variables over the base field. */
  readonly ring: PolynomialRing<T>;
  /** A variable as a rational function. */
  variable(name: string): RationalFunction<T>;
  /** A base-field element as a constant function. */
  fromBase(c: T): RationalFunction<T>;
  fromPolynomial(p: MultivariatePolynomial<T>): RationalFunction<T>;
  /** num/den in canonical form; throws `DivisionByZeroError` when den is zero. */
  quotient(num: MultivariatePolynomial<T>, den: MultivariatePolynomial<T>): RationalFunction<T>;
  /** Whether the denominator is 1. */
  isPolynomial(a: RationalFunction<T>): boolean;
  /** The value of a constant function, or undefined when it depends on a variable. */
  constantValue(a: RationalFunction<T>): T | undefined;
  /**
   * The value at a point (a value for every variable that occurs); throws
   * `DivisionByZeroError` when the denominator vanishes there.
   */
  evaluate(a: RationalFunction<T>, values: readonly T[] | VariableAssignment<T>): T;
  /**
   * The function with some variables given values: the member of the family
   * at those parameter values, still in this field. Throws
   * `DivisionByZeroError` when the denominator vanishes identically there.
   */
  substitute(a: RationalFunction<T>, values: VariableAssignment<T>): RationalFunction<T>;
}

function build<T>(base: Field<T>, variables: readonly string[]): RationalFunctionField<T> {
  const R = polynomialRing(base, variables);
  const zero: RationalFunction<T> = Object.freeze({ num: R.zero, den: R.one });
  const one: RationalFunction<T> = Object.freeze({ num: R.one, den: R.one });
  const name = `${base.name}(${variables.join(', ')})`;

  /** num/den with den monic; common factors must already be gone. */
  const monicDenominator = (num: MultivariatePolynomial<T>, den: MultivariatePolynomial<T>): RationalFunction<T> => {
    const lead = R.leadingCoefficient(den);
    if (base.isOne(lead)) return { num, den };
    const s = base.inv(lead);
    return { num: R.scale(num, s), den: R.scale(den, s) };
  };

  const quotient = (num: MultivariatePolynomial<T>, den: MultivariatePolynomial<T>): RationalFunction<T> => {
    if (R.isZero(den)) throw new DivisionByZeroError(`division by zero in ${name}`);
    if (R.isZero(num)) return zero;
    if (R.isConstant(den)) return monicDenominator(num, den);
    const g = gcdPolynomials(R, num, den);
    if (R.isOne(g)) return monicDenominator(num, den);
    return monicDenominator(R.divideExact(num, g), R.divideExact(den, g));
  };

  /** a/d after dividing both by their gcd, where that gcd can only come from `g` (Henrici's sum rule). */
  const cancelAgainst = (num: MultivariatePolynomial<T>, den: MultivariatePolynomial<T>, g: MultivariatePolynomial<T>): RationalFunction<T> => {
    if (R.isZero(num)) return zero;
    const h = gcdPolynomials(R, num, g);
    if (R.isOne(h)) return monicDenominator(num, den);
    return monicDenominator(R.divideExact(num, h), R.divideExact(den, h));
  };

  const add = (a: RationalFunction<T>, b: RationalFunction<T>): RationalFunction<T> => {
    if (R.isZero(a.num)) return b;
    if (R.isZero(b.num)) return a;
    if (R.isOne(a.den) && R.isOne(b.den)) return { num: R.add(a.num, b.num), den: R.one };
    if (R.eq(a.den, b.den)) return cancelAgainst(R.add(a.num, b.num), a.den, a.den);
    const g = gcdPolynomials(R, a.den, b.den);
    if (R.isOne(g)) {
      // With coprime denominators and each quotient reduced, the sum is already reduced.
      return monicDenominator(R.add(R.mul(a.num, b.den), R.mul(b.num, a.den)), R.mul(a.den, b.den));
    }
    const da = R.divideExact(a.den, g);
    const db = R.divideExact(b.den, g);
    const num = R.add(R.mul(a.num, db), R.mul(b.num, da));
    // Any common factor of num and da·db·g divides g, since num is coprime to da and to db.
    return cancelAgainst(num, R.mul(R.mul(da, db), g), g);
  };

  const neg = (a: RationalFunction<T>): RationalFunction<T> => (R.isZero(a.num) ? zero : { num: R.neg(a.num), den: a.den });

  const mul = (a: RationalFunction<T>, b: RationalFunction<T>): RationalFunction<T> => {
    if (R.isZero(a.num) || R.isZero(b.num)) return zero;
    if (R.isOne(a.den) && R.isOne(b.den)) return { num: R.mul(a.num, b.num), den: R.one };
    // Cross-cancelling: a.num is coprime to a.den and b.num to b.den, so only these gcds can be nontrivial.
    const g1 = gcdPolynomials(R, a.num, b.den);
    const g2 = gcdPolynomials(R, b.num, a.den);
    const an = R.isOne(g1) ? a.num : R.divideExact(a.num, g1);
    const bd = R.isOne(g1) ? b.den : R.divideExact(b.den, g1);
    const bn = R.isOne(g2) ? b.num : R.divideExact(b.num, g2);
    const ad = R.isOne(g2) ? a.den : R.divideExact(a.den, g2);
    return monicDenominator(R.mul(an, bn), R.mul(ad, bd));
  };

  const inv = (a: RationalFunction<T>): RationalFunction<T> => {
    if (R.isZero(a.num)) throw new DivisionByZeroError(`division by zero in ${name}: the inverse of 0`);
    return monicDenominator(a.den, a.num);
  };

  const fromBase = (c: T): RationalFunction<T> => (base.isZero(c) ? zero : { num: R.constant(c), den: R.one });

  const evaluate = (a: RationalFunction<T>, values: readonly T[] | VariableAssignment<T>): T => {
    const d = R.evaluate(a.den, values);
    if (base.isZero(d)) throw new DivisionByZeroError(`${rationalFunctionText(base, variables, a.num, a.den)} has a pole at this point`);
    return base.div(R.evaluate(a.num, values), d);
  };

  const field: RationalFunctionField<T> = {
    name,
    characteristic: base.characteristic,
    zero,
    one,
    base,
    variables: R.variables,
    ring: R,
    add,
    sub: (a, b) => add(a, neg(b)),
    mul,
    neg,
    inv,
    div: (a, b) => {
      if (R.isZero(b.num)) throw new DivisionByZeroError(`division by zero in ${name}`);
      return mul(a, inv(b));
    },
    eq: (a, b) => R.eq(a.num, b.num) && R.eq(a.den, b.den),
    isZero: (a) => R.isZero(a.num),
    isOne: (a) => R.isOne(a.num) && R.isOne(a.den),
    fromBigInt: (n) => fromBase(base.fromBigInt(n)),
    fromRational: (num, den) => fromBase(base.fromRational(num, den)),
    format: (a) => rationalFunctionText(base, variables, a.num, a.den),
    latex: (a) => rationalFunctionLatex(base, variables, a.num, a.den),
    variable: (v) => ({ num: R.variable(v), den: R.one }),
    fromBase,
    fromPolynomial: (p) => ({ num: p, den: R.one }),
    quotient,
    isPolynomial: (a) => R.isOne(a.den),
    constantValue: (a) => (R.isOne(a.den) ? R.constantValue(a.num) : undefined),
    evaluate,
    substitute: (a, values) => quotient(R.substitute(a.num, values), R.substitute(a.den, values)),
  };
  return Object.freeze(field);
}

// One field per base field and list of variables, so that fields compare by identity like the others.
const cache = new WeakMap<object, Map<string, RationalFunctionField<any>>>();

/**
 * The field of rational functions in `variables` (distinct identifiers, at
 * least one) over `base`, named like `QQ(t)` or `GF(7)(s, t)`.
 */
export function rationalFunctionField<T>(base: Field<T>, variables: readonly string[]): RationalFunctionField<T> {
  if (variables.length === 0) throw new Error('a field of rational functions needs at least one variable');
  let byVariables = cache.get(base);
  if (byVariables === undefined) cache.set(base, (byVariables = new Map()));
  const key = variables.join('\u0000');
  let field = byVariables.get(key);
  if (field === undefined) byVariables.set(key, (field = build(base, variables)));
  return field as RationalFunctionField<T>;
}
