/**
 * Factored forms of polynomials and their display, such as
 * `(t - 1)^2 (t + 2)` or `-3s (s + t)^2`.
 *
 * Each factor says whether it is proven irreducible. A factor with
 * `irreducible: false` is a part that was not split further; it may or may
 * not be reducible, and the form is then `complete: false`. Factors are
 * normalized, so that a factored form is unique once complete: over the
 * rationals primitive with integer coefficients and a positive leading
 * coefficient (in the monomial order), over other fields monic. The constant
 * in front is the `unit`.
 */
import type { Field } from '../field.js';
import { QQ, gcdBigInt, lcmBigInt, rational, type Rational } from '../rational.js';
import { compareMonomials } from './monomial-order.js';
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';
import { isAtomicPolynomial } from './polynomial-format.js';

export interface PolynomialFactor<T> {
  readonly polynomial: MultivariatePolynomial<T>;
  readonly multiplicity: number;
  /** True only when proven irreducible. */
  readonly irreducible: boolean;
}

export interface FactoredPolynomial<T> {
  /** The constant in front. */
  readonly unit: T;
  /** Distinct normalized factors, in display order (see `compareFactorPolynomials`). */
  readonly factors: readonly PolynomialFactor<T>[];
  /** Whether every factor is proven irreducible. */
  readonly complete: boolean;
}

/** p = scale · polynomial with the polynomial normalized as described in the module comment. */
export function normalizeFactor<T>(R: PolynomialRing<T>, p: MultivariatePolynomial<T>): { polynomial: MultivariatePolynomial<T>; scale: T } {
  const F = R.field;
  if (R.isZero(p)) return { polynomial: p, scale: F.one };
  if ((F as unknown) === QQ) {
    const terms = p.terms as readonly { coefficient: Rational }[];
    let l = 1n;
    for (const t of terms) l = lcmBigInt(l, t.coefficient.den);
    let g = 0n;
    for (const t of terms) g = gcdBigInt(g, (t.coefficient.num * l) / t.coefficient.den);
    if (terms[0]!.coefficient.num < 0n) g = -g;
    // Multiplying by l/g makes the coefficients coprime integers with a positive leading one.
    const s = rational(l, g) as unknown as T;
    return { polynomial: R.scale(p, s), scale: F.inv(s) };
  }
  const lead = R.leadingCoefficient(p);
  return { polynomial: R.monic(p), scale: lead };
}

function compareCoefficients<T>(F: Field<T>, a: T, b: T): number {
  if (F.eq(a, b)) return 0;
  if (F.sign !== undefined) {
    const magnitude = (x: T) => (F.sign!(x) < 0 ? F.neg(x) : x);
    const difference = F.sign(F.sub(magnitude(a), magnitude(b)));
    if (difference !== 0) return difference;
    return F.sign(a) < 0 ? -1 : 1;
  }
  const x = F.format(a);
  const y = F.format(b);
  return x.length !== y.length ? x.length - y.length : x < y ? -1 : 1;
}

/**
 * The display order of factors: by total degree, then by the leading
 * monomial, larger first (s + 1 before t + 1), then term by term in the
 * monomial order, where a missing term (coefficient 0) comes first and
 * otherwise the smaller coefficient in size, negative before positive: so
 * t − 1 before t + 1 before t − 2 before t + 2, and t before t − 1.
 */
export function compareFactorPolynomials<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): number {
  const d = R.totalDegree(a) - R.totalDegree(b);
  if (d !== 0) return d;
  const n = Math.min(a.terms.length, b.terms.length);
  for (let i = 0; i < n; i++) {
    const x = a.terms[i]!;
    const y = b.terms[i]!;
    const order = compareMonomials(x.exponents, y.exponents);
    // The larger leading monomial first (s + 1 before t + 1); further down, the missing term
    // (coefficient 0) first: a has a term where b has none, so b comes first.
    if (order !== 0) return (order > 0) === (i === 0) ? -1 : 1;
    const c = compareCoefficients(R.field, x.coefficient, y.coefficient);
    if (c !== 0) return c;
  }
  return a.terms.length - b.terms.length;
}

/** The polynomial the factored form stands for. */
export function expandFactored<T>(R: PolynomialRing<T>, form: FactoredPolynomial<T>): MultivariatePolynomial<T> {
  let product = R.constant(form.unit);
  for (const { polynomial, multiplicity } of form.factors) product = R.mul(product, R.pow(polynomial, multiplicity));
  return product;
}

type Style = 'text' | 'latex';

/**
 * The factors side by side, without the unit: `(t - 1)^2 (t + 2)`; '' when
 * there are none. A lone factor to the first power needs no parentheses
 * unless a unit stands before it (`alone` is false then).
 */
function factorsText<T>(R: PolynomialRing<T>, factors: readonly PolynomialFactor<T>[], style: Style, alone: boolean): string {
  if (alone && factors.length === 1 && factors[0]!.multiplicity === 1) {
    return style === 'latex' ? R.latex(factors[0]!.polynomial) : R.format(factors[0]!.polynomial);
  }
  return factors
    .map(({ polynomial, multiplicity }) => {
      const text = style === 'latex' ? R.latex(polynomial) : R.format(polynomial);
      const base = isAtomicPolynomial(R.field, polynomial) ? text : `(${text})`;
      if (multiplicity === 1) return base;
      return style === 'latex' ? `${base}^{${multiplicity}}` : `${base}^${multiplicity}`;
    })
    .join(' ');
}

/** A constant in front of a product of factors: `3(t - 1)`, `-(t - 1)`, `1/2 (t - 1)`. */
function withUnit<T>(F: Field<T>, unit: T, product: string, style: Style): string {
  if (product === '') return style === 'latex' ? F.latex(unit) : F.format(unit);
  if (F.isOne(unit)) return product;
  if (F.eq(unit, F.neg(F.one))) return `-${product}`;
  const text = style === 'latex' ? F.latex(unit) : F.format(unit);
  if (/^-?\d+$/.test(text)) return `${text}${product}`;
  return /\s/.test(text) ? `(${text}) ${product}` : `${text} ${product}`;
}

export function formatFactored<T>(R: PolynomialRing<T>, form: FactoredPolynomial<T>): string {
  return withUnit(R.field, form.unit, factorsText(R, form.factors, 'text', R.field.isOne(form.unit)), 'text');
}

export function latexFactored<T>(R: PolynomialRing<T>, form: FactoredPolynomial<T>): string {
  return withUnit(R.field, form.unit, factorsText(R, form.factors, 'latex', R.field.isOne(form.unit)), 'latex');
}

/** A quotient of two factored polynomials, the unit in front of the numerator. */
export interface FactoredQuotient<T> {
  readonly unit: T;
  readonly numerator: readonly PolynomialFactor<T>[];
  readonly denominator: readonly PolynomialFactor<T>[];
  readonly complete: boolean;
}

function renderQuotient<T>(R: PolynomialRing<T>, form: FactoredQuotient<T>, style: Style): string {
  const F = R.field;
  let topUnit = form.unit;
  let bottomUnit = F.one;
  if ((F as unknown) === QQ) {
    // Over the rationals a fractional unit a/b is split: a goes above the line and b below it.
    const u = form.unit as unknown as Rational;
    topUnit = QQ.fromBigInt(u.num) as unknown as T;
    bottomUnit = QQ.fromBigInt(u.den) as unknown as T;
  }
  const top = withUnit(F, topUnit, factorsText(R, form.numerator, style, F.isOne(topUnit) && style === 'latex'), style);
  if (form.denominator.length === 0 && F.isOne(bottomUnit)) return top;
  const bottom = withUnit(F, bottomUnit, factorsText(R, form.denominator, style, F.isOne(bottomUnit) && style === 'latex'), style);
  if (style === 'latex') return `\\frac{${top}}{${bottom}}`;
  const single = (factors: readonly PolynomialFactor<T>[], unit: T) => factors.length + (F.isOne(unit) ? 0 : 1) <= 1;
  // One factor (with its power) or a bare number needs no parentheses around it; a product below the line does.
  const bottomText = single(form.denominator, bottomUnit) && !/^-/.test(bottom) ? bottom : `(${bottom})`;
  // Above the line no parentheses are needed: a·b/c is (a·b)/c and a·(b/c) alike.
  return `${top}/${bottomText}`;
}

export function formatFactoredQuotient<T>(R: PolynomialRing<T>, form: FactoredQuotient<T>): string {
  return renderQuotient(R, form, 'text');
}

export function latexFactoredQuotient<T>(R: PolynomialRing<T>, form: FactoredQuotient<T>): string {
  return renderQuotient(R, form, 'latex');
}
