/**
 * Text and LaTeX for sparse polynomials, term by term in the monomial order.
 *
 * Over an ordered field (the rationals) negative coefficients are written
 * with a minus sign between terms: `t^2 - 3t + 2`. Over other fields each
 * coefficient is the field's own text (over GF(p) its representative in
 * [0, p)), so `t^2 + 4t + 2` over GF(5). A coefficient 1 is left out, an
 * integer coefficient is written against its monomial (`3t`), a fraction is
 * set apart by a space (`1/2 t`, since `1/2t` could be read as 1/(2t)), and a
 * coefficient whose text has spaces in it is put in parentheses. Variables in
 * one monomial are separated by spaces (`s^2 t`), because names may be longer
 * than one letter.
 */
import type { Field } from '../field.js';
import type { MultivariatePolynomial } from './multivariate-polynomial.js';
import { variableLatex } from './variable-latex.js';

type Style = 'text' | 'latex';

function monomialText(variables: readonly string[], exponents: readonly number[], style: Style): string {
  const factors: string[] = [];
  exponents.forEach((e, v) => {
    if (e === 0) return;
    const name = style === 'latex' ? variableLatex(variables[v]!) : variables[v]!;
    factors.push(e === 1 ? name : style === 'latex' ? `${name}^{${e}}` : `${name}^${e}`);
  });
  return factors.join(' ');
}

/** The coefficient c (already made nonnegative when the field is ordered) in front of a monomial. */
function withMonomial(coefficient: string, monomial: string): string {
  if (monomial === '') return coefficient;
  if (/^\d+$/.test(coefficient)) return `${coefficient}${monomial}`;
  if (/\s/.test(coefficient)) return `(${coefficient}) ${monomial}`;
  return `${coefficient} ${monomial}`;
}

function render<T>(F: Field<T>, variables: readonly string[], p: MultivariatePolynomial<T>, style: Style): string {
  if (p.terms.length === 0) return '0';
  const write = (c: T) => (style === 'latex' ? F.latex(c) : F.format(c));
  let out = '';
  p.terms.forEach((t, i) => {
    const negative = F.sign !== undefined && F.sign(t.coefficient) < 0;
    const magnitude = negative ? F.neg(t.coefficient) : t.coefficient;
    const monomial = monomialText(variables, t.exponents, style);
    const body = F.isOne(magnitude) && monomial !== '' ? monomial : withMonomial(write(magnitude), monomial);
    if (i === 0) out = negative ? `-${body}` : body;
    else out += negative ? ` - ${body}` : ` + ${body}`;
  });
  return out;
}

export function polynomialText<T>(F: Field<T>, variables: readonly string[], p: MultivariatePolynomial<T>): string {
  return render(F, variables, p, 'text');
}

export function polynomialLatex<T>(F: Field<T>, variables: readonly string[], p: MultivariatePolynomial<T>): string {
  return render(F, variables, p, 'latex');
}

/**
 * Whether the text of a polynomial can stand as a factor without parentheses:
 * one term that is a single power of a variable or an unsigned number.
 */
export function isAtomicPolynomial<T>(F: Field<T>, p: MultivariatePolynomial<T>): boolean {
  if (p.terms.length !== 1) return false;
  const t = p.terms[0]!;
  if (F.sign !== undefined && F.sign(t.coefficient) < 0) return false;
  const variablesUsed = t.exponents.filter((e) => e > 0).length;
  if (variablesUsed === 0) return /^\d+$/.test(F.format(t.coefficient));
  return variablesUsed === 1 && F.isOne(t.coefficient);
}
