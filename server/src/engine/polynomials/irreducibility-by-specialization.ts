/**
 * A proof of irreducibility for polynomials in several variables by fixing
 * all variables but one.
 *
 * Let g be primitive with respect to x (no non-constant polynomial in the
 * other variables divides all its coefficients as a polynomial in x), and let
 * a be values for the other variables at which the leading coefficient of g
 * in x does not vanish. If g(x, a) is irreducible of degree deg_x g, then g is
 * irreducible: in a factorisation g = u·v each factor has positive degree in x
 * (a factor free of x would divide the content), the leading coefficients
 * multiply, so both degrees survive the substitution, and g(x, a) would factor
 * too. (Common practice, no source; the argument holds over every field.) More
 * generally the number of irreducible factors of g is at most that of g(x, a),
 * counted with multiplicity.
 */
import type { Field } from '../field.js';
import { finiteFieldElement } from '../finite-fields.js';
import { QQ } from '../rational.js';
import { finiteFieldSize } from './finite-field-factor.js';
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';
import { coefficientsIn } from './polynomial-gcd.js';
import type { UnivariateFactoriser } from './univariate-factoriser.js';
import { denseCoefficientsIn } from './univariate-view.js';

/** How many points are tried for each choice of the free variable. */
const ATTEMPTS_PER_VARIABLE = 4;

/** Small integers for the rationals, 1, −1, 2, −2, …; random elements for finite fields. */
function sampler<T>(F: Field<T>): ((attempt: number, variable: number) => T) | undefined {
  if ((F as unknown) === QQ) {
    return (attempt, variable) => {
      // Spreads the values over variables and attempts so that no two attempts repeat a point.
      const k = 1 + ((attempt * 7 + variable * 3) % 11);
      const n = Math.ceil(k / 2) * (k % 2 === 1 ? 1 : -1);
      return F.fromBigInt(BigInt(n));
    };
  }
  const q = finiteFieldSize(F);
  if (q === undefined) return undefined;
  return (attempt, variable) => finiteFieldElement(F, BigInt(1 + attempt * 31 + variable * 17) % q);
}

export interface SpecializationResult {
  /** Proven irreducible. */
  irreducible: boolean;
  /** An upper bound on the number of irreducible factors (with multiplicity), when one was found. */
  factorBound?: number;
}

/**
 * Tries to prove g irreducible as described in the module comment. g must
 * be primitive with respect to each of its variables and involve at least two.
 */
export function irreducibleBySpecialization<T>(
  R: PolynomialRing<T>,
  g: MultivariatePolynomial<T>,
  factorise: UnivariateFactoriser<T>,
): SpecializationResult {
  const F = R.field;
  const sample = sampler(F);
  if (sample === undefined) return { irreducible: false };
  const used = R.variablesIn(g);
  let bound: number | undefined;
  for (const x of used) {
    const top = R.degreeIn(g, x);
    const lead = coefficientsIn(R, g, x)[top]!;
    for (let attempt = 0; attempt < ATTEMPTS_PER_VARIABLE; attempt++) {
      const values: Record<string, T> = {};
      for (const v of used) if (v !== x) values[R.variables[v]!] = sample(attempt, v);
      if (F.isZero(R.evaluate(lead, values))) continue;
      const image = denseCoefficientsIn(R, R.substitute(g, values), x);
      const result = factorise(image, 2000);
      if (result === undefined) continue;
      const count = result.factors.reduce((n, f) => n + f.multiplicity, 0);
      if (count === 1) return { irreducible: true };
      bound = bound === undefined ? count : Math.min(bound, count);
    }
  }
  return bound === undefined ? { irreducible: false } : { irreducible: false, factorBound: bound };
}
