/**
 * Complete factorisation of a polynomial in several variables by Kronecker's
 * substitution: with d larger than every degree of g in a single variable,
 * x_i ↦ y^(d^i) maps g injectively to a polynomial K(g) in one variable, and
 * every factor u of g (whose degrees are below d too) maps to a product of
 * irreducible factors of K(g). So g is factored by factoring K(g) and trying
 * the products of subsets of its factors, mapped back, as divisors of g,
 * smallest subsets first. A divisor found this way is irreducible, since any
 * proper factor of it would have been found at a smaller size, and what is
 * left when no subset of at most half of the remaining factors divides is
 * irreducible too. (Kronecker's method; e.g. van der Waerden, Algebra I,
 * §5.4, from memory.)
 *
 * Equal factors of K(g) are counted rather than listed, so the combinations
 * tried are the sub-multisets. The search is still exponential in the number
 * of factors, so it is limited: past the limits the result is undefined
 * (unknown), never guessed.
 */
import { denseMul } from './dense-polynomial.js';
import type { MultivariatePolynomial, PolynomialRing } from './multivariate-polynomial.js';
import type { UnivariateFactoriser } from './univariate-factoriser.js';

export interface KroneckerLimits {
  /** The largest degree of K(g) that is factored. */
  maxDegree: number;
  /** The largest number of sub-multisets of the factors of K(g) (Π (multiplicity + 1)) that may be searched. */
  maxCombinations: number;
  /** The most combinations Zassenhaus's method may try on K(g) over the rationals. */
  budget: number;
}

export const DEFAULT_KRONECKER_LIMITS: KroneckerLimits = Object.freeze({ maxDegree: 160, maxCombinations: 1 << 14, budget: 20000 });

/**
 * Every way of choosing c_i ≤ counts[i] copies of item i with Σ c_i = size,
 * as the vector (c_i): the sub-multisets of that size, each once.
 */
function* subMultisets(counts: readonly number[], size: number): Generator<number[]> {
  const choice = new Array<number>(counts.length).fill(0);
  function* fill(i: number, left: number): Generator<number[]> {
    if (i === counts.length) {
      if (left === 0) yield choice.slice();
      return;
    }
    for (let c = Math.min(counts[i]!, left); c >= 0; c--) {
      choice[i] = c;
      yield* fill(i + 1, left - c);
    }
    choice[i] = 0;
  }
  yield* fill(0, size);
}

/** The irreducible factors of g (each once per occurrence), or undefined when the limits are exceeded. */
export function kroneckerFactor<T>(
  R: PolynomialRing<T>,
  g: MultivariatePolynomial<T>,
  factorise: UnivariateFactoriser<T>,
  limits: KroneckerLimits = DEFAULT_KRONECKER_LIMITS,
): MultivariatePolynomial<T>[] | undefined {
  const F = R.field;
  const used = R.variablesIn(g);
  const d = 1 + Math.max(...used.map((v) => R.degreeIn(g, v)));
  let degree = 0;
  used.forEach((v, i) => (degree += R.degreeIn(g, v) * d ** i));
  if (degree > limits.maxDegree) return undefined;
  const image = new Array<T>(degree + 1).fill(F.zero);
  for (const t of g.terms) {
    let e = 0;
    used.forEach((v, i) => (e += t.exponents[v]! * d ** i));
    image[e] = t.coefficient;
  }
  const factored = factorise(image, limits.budget);
  if (factored === undefined) return undefined;
  // Equal factors of K(g) (typically powers of y) are one item with a count, so no combination is tried twice.
  const items = factored.factors.map(({ factor }) => factor);
  const counts = factored.factors.map(({ multiplicity }) => multiplicity);
  if (counts.reduce((n, c) => n * (c + 1), 1) > limits.maxCombinations) return undefined;
  /**
   * The polynomial of R whose Kronecker image is p: the exponent e is read in
   * base d, one digit per variable. Products of factors of K(g) have degree
   * below d^(number of variables), so no digit is left over.
   */
  const back = (p: readonly T[]): MultivariatePolynomial<T> =>
    R.fromTerms(
      p.map((coefficient, e) => {
        const exponents = new Array<number>(R.variables.length).fill(0);
        let rest = e;
        for (const v of used) {
          exponents[v] = rest % d;
          rest = Math.floor(rest / d);
        }
        return { exponents, coefficient };
      }),
    );
  const found: MultivariatePolynomial<T>[] = [];
  let rest = g;
  let total = counts.reduce((n, c) => n + c, 0);
  for (let size = 1; 2 * size <= total; ) {
    let hit = false;
    for (const choice of subMultisets(counts, size)) {
      let product: T[] = [F.one];
      choice.forEach((c, i) => {
        for (let j = 0; j < c; j++) product = denseMul(F, product, items[i]!);
      });
      const candidate = back(product);
      if (R.isConstant(candidate)) continue;
      const quotient = R.tryDivide(rest, candidate);
      if (quotient === undefined) continue;
      found.push(candidate);
      rest = quotient;
      choice.forEach((c, i) => (counts[i]! -= c));
      total -= size;
      hit = true;
      break;
    }
    if (!hit) size++;
  }
  if (!R.isConstant(rest)) found.push(rest);
  return found;
}
