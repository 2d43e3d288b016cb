/**
 * Moving between a sparse polynomial that involves at most one variable and
 * its dense coefficient list, as the univariate algorithms want it.
 */
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';

/** The coefficients of a in the variable v, constant term first; a must involve no other variable. */
export function denseCoefficientsIn<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>, v: number): T[] {
  const top = R.degreeIn(a, v);
  const out = new Array<T>(top + 1).fill(R.field.zero);
  for (const t of a.terms) {
    if (t.exponents.some((e, i) => i !== v && e > 0)) {
      throw new RangeError(`${R.format(a)} involves variables other than ${R.variables[v]}`);
    }
    out[t.exponents[v]!] = t.coefficient;
  }
  return out;
}

/** The polynomial Σ c_i v^i of the ring. */
export function fromDenseIn<T>(R: PolynomialRing<T>, coefficients: readonly T[], v: number): MultivariatePolynomial<T> {
  return R.fromCoefficients(coefficients, v);
}

/**
 * The coefficients of a polynomial in one variable, constant term first, for
 * the univariate functions (real roots, factorisation). A polynomial that
 * involves two or more variables is refused with a RangeError.
 */
export function univariateCoefficients<T>(R: PolynomialRing<T>, a: MultivariatePolynomial<T>): T[] {
  const used = R.variablesIn(a);
  if (used.length > 1) throw new RangeError(`${R.format(a)} involves more than one variable`);
  return used.length === 0 ? [R.constantValue(a)!] : denseCoefficientsIn(R, a, used[0]!);
}
