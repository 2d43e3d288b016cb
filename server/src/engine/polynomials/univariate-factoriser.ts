/**
 * The complete factorisation in one variable that each kind of coefficient
 * field has, behind one interface: over the rationals Zassenhaus's method
 * (rational-univariate-factor.ts), over finite fields Cantor–Zassenhaus
 * (finite-field-factor.ts). Other fields have none.
 *
 * Factors come normalized: over the rationals primitive with integer
 * coefficients and a positive leading coefficient, elsewhere monic.
 */
import type { Field } from '../field.js';
import { QQ, rational, type Rational } from '../rational.js';
import { factorOverFiniteField, finiteFieldSize } from './finite-field-factor.js';
import { factorRationalUnivariateWithin } from './rational-univariate-factor.js';

export interface UnivariateFactorisation<T> {
  unit: T;
  factors: { factor: T[]; multiplicity: number }[];
}

/**
 * Complete factorisation of a nonzero coefficient list (constant term first),
 * or undefined when a search limit was reached (only the rationals have one:
 * `budget` bounds the combinations tried in Zassenhaus's recombination).
 */
export type UnivariateFactoriser<T> = (coefficients: readonly T[], budget?: number) => UnivariateFactorisation<T> | undefined;

export function univariateFactoriserFor<T>(F: Field<T>): UnivariateFactoriser<T> | undefined {
  if ((F as unknown) === QQ) {
    const factorise: UnivariateFactoriser<Rational> = (coefficients, budget = Infinity) => {
      const result = factorRationalUnivariateWithin(coefficients, budget);
      if (result === undefined) return undefined;
      return {
        unit: result.unit,
        factors: result.factors.map(({ factor, multiplicity }) => ({ factor: factor.map((c) => rational(c)), multiplicity })),
      };
    };
    return factorise as unknown as UnivariateFactoriser<T>;
  }
  const q = finiteFieldSize(F);
  if (q === undefined) return undefined;
  return (coefficients) => factorOverFiniteField(F, q, coefficients);
}
