/**
 * Factoring polynomials in one variable over a finite field GF(q) into monic
 * irreducibles, in three classical stages (e.g. von zur Gathen and Gerhard,
 * Modern Computer Algebra, ch. 14, from memory):
 * 1. square-free factorisation, which in characteristic p also has to undo
 *    p-th powers (a polynomial with zero derivative is a p-th power);
 * 2. distinct-degree factorisation: gcd(f, x^(q^i) − x) collects the
 *    irreducible factors of degree i, because x^(q^i) − x is the product of
 *    all monic irreducibles of degree dividing i;
 * 3. equal-degree factorisation (Cantor–Zassenhaus): for a random a,
 *    gcd(f, a^((q^d − 1)/2) − 1) splits a product of irreducibles of degree d
 *    with probability about 1/2 when q is odd; for q = 2^k the trace
 *    a + a^2 + … + a^(2^(kd−1)) plays that role.
 * The random choices only affect the running time, never the result: every
 * factor is certified by the structure of the algorithm, so the output is a
 * proven factorisation into irreducibles.
 */
import { fieldPower } from '../field-square-roots.js';
import type { Field } from '../field.js';
import { finiteFieldElement } from '../finite-fields.js';
import { primeField } from '../prime-field.js';
import {
  denseAdd,
  denseDegree,
  denseDerivative,
  denseDivMod,
  denseGcd,
  denseMonic,
  denseMul,
  densePowMod,
  denseRem,
  denseSub,
  isDenseOne,
  trimDense,
} from './dense-polynomial.js';

/** A factor with its multiplicity. */
export interface DenseFactor<T> {
  factor: T[];
  multiplicity: number;
}

/**
 * q when F is a finite field made by the engine: a prime field GF(p) from
 * `primeField`, or an extension field (which carries its `order`).
 * Undefined otherwise, in particular for fields of rational functions over
 * GF(p), which have characteristic p but infinitely many elements.
 */
export function finiteFieldSize<T>(F: Field<T>): bigint | undefined {
  const order = (F as { order?: unknown }).order;
  if (typeof order === 'bigint') return order;
  if (F.characteristic <= 0n) return undefined;
  try {
    return primeField(F.characteristic) === (F as unknown) ? F.characteristic : undefined;
  } catch {
    return undefined;
  }
}

/** The p-th root of a polynomial whose exponents are all multiples of p: Σ a_(ip) x^(ip) ↦ Σ a_(ip)^(1/p) x^i. */
function pthRoot<T>(F: Field<T>, q: bigint, a: readonly T[]): T[] {
  const p = Number(F.characteristic);
  // On GF(q) the Frobenius a ↦ a^p is invertible with inverse a ↦ a^(q/p), since a^q = a.
  const rootExponent = q / F.characteristic;
  const out: T[] = [];
  for (let i = 0; i * p < a.length; i++) out.push(rootExponent === 1n ? a[i * p]! : fieldPower(F, a[i * p]!, rootExponent));
  return trimDense(F, out);
}

/** The square-free factorisation of a monic f of positive degree: pairwise coprime square-free factors. */
export function squareFreeOverFiniteField<T>(F: Field<T>, q: bigint, f: readonly T[]): DenseFactor<T>[] {
  const out: DenseFactor<T>[] = [];
  const p = Number(F.characteristic);
  const derivative = denseDerivative(F, f);
  let c: T[];
  if (derivative.length === 0) {
    c = f.slice();
  } else {
    c = denseGcd(F, f, derivative);
    let w = denseDivMod(F, f, c).quotient;
    // w is the product of the irreducible factors whose multiplicity p does not divide.
    for (let i = 1; !isDenseOne(F, w); i++) {
      const y = denseGcd(F, w, c);
      const fac = denseDivMod(F, w, y).quotient;
      if (denseDegree(fac) > 0) out.push({ factor: fac, multiplicity: i });
      w = y;
      c = denseDivMod(F, c, y).quotient;
    }
  }
  // What is left of c is a p-th power: the factors whose multiplicity p divides.
  if (!isDenseOne(F, c)) {
    for (const { factor, multiplicity } of squareFreeOverFiniteField(F, q, pthRoot(F, q, c))) {
      out.push({ factor, multiplicity: multiplicity * p });
    }
  }
  return out;
}

/** The distinct-degree factorisation of a monic square-free f: (product of the irreducible factors of degree d, d). */
export function distinctDegreeFactors<T>(F: Field<T>, q: bigint, f: readonly T[]): { product: T[]; degree: number }[] {
  const out: { product: T[]; degree: number }[] = [];
  const x = trimDense(F, [F.zero, F.one]);
  let rest = f.slice();
  let h = denseRem(F, x, rest);
  for (let i = 1; 2 * i <= denseDegree(rest); i++) {
    h = densePowMod(F, h, q, rest);
    const g = denseGcd(F, rest, denseSub(F, h, x));
    if (!isDenseOne(F, g)) {
      out.push({ product: g, degree: i });
      rest = denseDivMod(F, rest, g).quotient;
      h = denseRem(F, h, rest);
    }
  }
  if (denseDegree(rest) > 0) out.push({ product: rest, degree: denseDegree(rest) });
  return out;
}

/** A small deterministic generator, so that runs are reproducible. */
function randomIndices(seed: number): () => number {
  let state = seed >>> 0 || 1;
  return () => {
    // xorshift32 (Marsaglia, "Xorshift RNGs", 2003, from memory).
    state ^= state << 13;
    state >>>= 0;
    state ^= state >>> 17;
    state ^= state << 5;
    state >>>= 0;
    return state;
  };
}

function randomElement<T>(F: Field<T>, q: bigint, next: () => number): T {
  const index = ((BigInt(next()) << 32n) | BigInt(next())) % q;
  return finiteFieldElement(F, index);
}

/** The irreducible factors of a monic f that is a product of distinct irreducibles of degree d. */
export function equalDegreeFactors<T>(F: Field<T>, q: bigint, f: readonly T[], d: number, seed = 1): T[][] {
  const n = denseDegree(f);
  if (n === d) return [f.slice()];
  const next = randomIndices(seed + n * 7919 + d);
  const odd = q % 2n === 1n;
  const exponent = odd ? (q ** BigInt(d) - 1n) / 2n : 0n;
  // For q = 2^k the trace to GF(2) of GF(q^d) is the sum of the 2^j-th powers, j < kd.
  const traceTerms = odd ? 0 : d * (q.toString(2).length - 1);
  for (;;) {
    const a: T[] = [];
    for (let i = 0; i < n; i++) a.push(randomElement(F, q, next));
    const candidate = trimDense(F, a);
    if (denseDegree(candidate) < 1) continue;
    let b: T[];
    if (odd) {
      b = denseSub(F, densePowMod(F, candidate, exponent, f), [F.one]);
    } else {
      b = denseRem(F, candidate, f);
      let square = b;
      for (let j = 1; j < traceTerms; j++) {
        square = denseRem(F, denseMul(F, square, square), f);
        b = denseAdd(F, b, square);
      }
    }
    const g = denseGcd(F, f, b);
    const dg = denseDegree(g);
    if (dg > 0 && dg < n) {
      const other = denseDivMod(F, f, g).quotient;
      return [...equalDegreeFactors(F, q, g, d, seed + 1), ...equalDegreeFactors(F, q, denseMonic(F, other), d, seed + 2)];
    }
  }
}

/**
 * The factorisation of a nonzero f over GF(q) (q the size of F, see
 * `finiteFieldSize`): f = unit · Π factor^multiplicity with monic irreducible
 * factors, each listed once.
 */
export function factorOverFiniteField<T>(F: Field<T>, q: bigint, f: readonly T[]): { unit: T; factors: DenseFactor<T>[] } {
  const g = trimDense(F, f.slice());
  if (g.length === 0) throw new RangeError('the zero polynomial has no factorisation');
  const unit = g[g.length - 1]!;
  const factors: DenseFactor<T>[] = [];
  if (g.length === 1) return { unit, factors };
  for (const { factor, multiplicity } of squareFreeOverFiniteField(F, q, denseMonic(F, g))) {
    for (const { product, degree } of distinctDegreeFactors(F, q, factor)) {
      for (const irreducible of equalDegreeFactors(F, q, product, degree)) factors.push({ factor: irreducible, multiplicity });
    }
  }
  return { unit, factors };
}
