/**
 * Text and LaTeX for quotients of polynomials.
 *
 * A quotient with constant denominator is shown as the polynomial it is
 * (`1/2 t^2 + 1`). Otherwise it is `num/den` with parentheses around either
 * side unless it is a single power of a variable or an unsigned number:
 * `(t - 1)/(t + 2)`, `1/t^2`, `(s t)/(t + 1)`; in LaTeX `\frac{t - 1}{t + 2}`.
 * Over the rationals the canonical form keeps the denominator monic, which
 * can leave fractions on both sides, so for display numerator and
 * denominator are scaled by one common rational to integer coefficients with
 * no common integer factor and a positive leading coefficient below:
 * (1/2)/(t + 1/2) is shown as `1/(2t + 1)`.
 */
import type { Field } from '../field.js';
import { QQ, gcdBigInt, lcmBigInt, type Rational } from '../rational.js';
import type { MultivariatePolynomial } from './multivariate-polynomial.js';
import { isAtomicPolynomial, polynomialLatex, polynomialText } from './polynomial-format.js';

/** Over the rationals, num and den scaled to coprime-content integer coefficients (see the module comment). */
function displayScaled(
  num: MultivariatePolynomial<Rational>,
  den: MultivariatePolynomial<Rational>,
): [MultivariatePolynomial<Rational>, MultivariatePolynomial<Rational>] {
  let l = 1n;
  for (const t of [...num.terms, ...den.terms]) l = lcmBigInt(l, t.coefficient.den);
  let g = 0n;
  for (const t of [...num.terms, ...den.terms]) g = gcdBigInt(g, (t.coefficient.num * l) / t.coefficient.den);
  const scale = (p: MultivariatePolynomial<Rational>): MultivariatePolynomial<Rational> => ({
    terms: p.terms.map((t) => ({ exponents: t.exponents, coefficient: QQ.fromBigInt((t.coefficient.num * l) / t.coefficient.den / g) })),
  });
  return [scale(num), scale(den)];
}

function render<T>(
  F: Field<T>,
  variables: readonly string[],
  num: MultivariatePolynomial<T>,
  den: MultivariatePolynomial<T>,
  style: 'text' | 'latex',
): string {
  const write = style === 'latex' ? polynomialLatex : polynomialText;
  const denominatorIsOne = den.terms.length === 1 && den.terms[0]!.exponents.every((e) => e === 0) && F.isOne(den.terms[0]!.coefficient);
  if (denominatorIsOne) return write(F, variables, num);
  let [n, d] = [num, den];
  if ((F as unknown) === QQ) {
    [n, d] = displayScaled(num as unknown as MultivariatePolynomial<Rational>, den as unknown as MultivariatePolynomial<Rational>) as unknown as [
      MultivariatePolynomial<T>,
      MultivariatePolynomial<T>,
    ];
  }
  const top = write(F, variables, n);
  const bottom = write(F, variables, d);
  if (style === 'latex') return `\\frac{${top}}{${bottom}}`;
  const wrap = (p: MultivariatePolynomial<T>, text: string) => (isAtomicPolynomial(F, p) ? text : `(${text})`);
  // A numerator that is one term without spaces (such as -t or 3t) reads unambiguously before a slash.
  const numerator = n.terms.length === 1 && !/\s/.test(top) ? top : wrap(n, top);
  return `${numerator}/${wrap(d, bottom)}`;
}

export function rationalFunctionText<T>(
  F: Field<T>,
  variables: readonly string[],
  num: MultivariatePolynomial<T>,
  den: MultivariatePolynomial<T>,
): string {
  return render(F, variables, num, den, 'text');
}

export function rationalFunctionLatex<T>(
  F: Field<T>,
  variables: readonly string[],
  num: MultivariatePolynomial<T>,
  den: MultivariatePolynomial<T>,
): string {
  return render(F, variables, num, den, 'latex');
}
