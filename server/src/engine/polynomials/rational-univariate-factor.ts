/**
 * Complete factorisation of polynomials in one variable over the rationals.
 *
 * A polynomial over Q is a rational constant times a primitive integer
 * polynomial, and by Gauss's lemma its factorisation over Q is that of the
 * primitive part over Z. The primitive part is split into square-free parts
 * by Yun's algorithm, and each square-free part is factored by the method of
 * Zassenhaus (von zur Gathen and Gerhard, Modern Computer Algebra, §15.6,
 * from memory): factor it modulo a small prime p that keeps it square-free,
 * lift the factors to p^k past twice Mignotte's bound on the coefficients of
 * any factor, and combine lifted factors in subsets of increasing size,
 * keeping a combination exactly when it divides over Z. Because every true
 * factor reduces to a product of a subset of the modular factors, a part
 * that no subset of at most half of the remaining factors divides is
 * irreducible; so every factor returned is proven irreducible.
 */
import { subsets } from '../subsets.js';
import type { Field } from '../field.js';
import { primeField } from '../prime-field.js';
import { QQ, lcmBigInt, rational, type Rational } from '../rational.js';
import { denseDerivative, denseGcd, denseMonic } from './dense-polynomial.js';
import { factorOverFiniteField } from './finite-field-factor.js';
import { henselLift } from './hensel-lifting.js';
import {
  ceilSqrt,
  integerContent,
  integerDerivative,
  integerDivide,
  integerGcd,
  integerMul,
  integerPrimitive,
  integerSub,
  symmetricMod,
  trimInteger,
  type IntegerPolynomial,
} from './integer-polynomial.js';

export interface IntegerFactor {
  /** Primitive, with a positive leading coefficient, irreducible over Q. */
  factor: IntegerPolynomial;
  multiplicity: number;
}

/** The factorisation f = unit · Π factor^multiplicity of a nonzero polynomial over Q. */
export interface RationalUnivariateFactorisation {
  unit: Rational;
  /** Sorted by degree, then by coefficients from the highest power down; each irreducible once. */
  factors: IntegerFactor[];
}

/** How many usable primes are tried before the one with the fewest modular factors is taken. */
const PRIMES_TO_COMPARE = 5;

const SMALL_PRIMES: readonly bigint[] = (() => {
  const out: bigint[] = [];
  for (let n = 3; out.length < 200; n += 2) if (out.every((p) => BigInt(n) % p !== 0n)) out.push(BigInt(n));
  return out;
})();

/** The monic factors modulo p of f, when p keeps the degree and the square-freeness of f; otherwise undefined. */
function modularFactors(f: IntegerPolynomial, p: bigint): bigint[][] | undefined {
  if (f[f.length - 1]! % p === 0n) return undefined;
  const Fp = primeField(p) as Field<any>;
  const image = f.map((c) => Fp.fromBigInt(c));
  const g = denseGcd(Fp, image, denseDerivative(Fp, image));
  if (g.length !== 1) return undefined;
  const { factors } = factorOverFiniteField(Fp, p, denseMonic(Fp, image));
  return factors.map(({ factor }) => factor.map((c: unknown) => BigInt(Fp.format(c))));
}

/**
 * The irreducible factors of a primitive square-free f ∈ Z[x] of positive
 * degree with positive leading coefficient. With a `budget`, at most that
 * many combinations are tried, and undefined is returned when they do not
 * suffice (the factorisation is then unknown, not wrong).
 */
export function factorSquareFreeInteger(f: IntegerPolynomial, budget = Infinity): IntegerPolynomial[] | undefined {
  const n = f.length - 1;
  if (n <= 1) return [f.slice()];
  let best: { p: bigint; factors: bigint[][] } | undefined;
  let usable = 0;
  for (const p of SMALL_PRIMES) {
    const factors = modularFactors(f, p);
    if (factors === undefined) continue;
    // Irreducible modulo one prime (with the degree kept) means irreducible over Q.
    if (factors.length === 1) return [f.slice()];
    if (best === undefined || factors.length < best.factors.length) best = { p, factors };
    if (++usable >= PRIMES_TO_COMPARE) break;
  }
  if (best === undefined) throw new Error('no prime keeps this polynomial square-free, which cannot happen for a square-free one');
  const { p, factors } = best;
  // Mignotte: a factor of f has coefficients at most 2^n·‖f‖₂ in size; times |lc f| for the scaled candidates, times 2 for signs.
  const norm = ceilSqrt(f.reduce((acc, c) => acc + c * c, 0n));
  const lead = f[n]!;
  const bound = 2n * (lead < 0n ? -lead : lead) * (1n << BigInt(n)) * norm;
  let k = 1;
  let M = p;
  while (M <= bound) {
    M *= p;
    k++;
  }
  return recombine(f, henselLift(f, factors, p, k), M, budget);
}

/** Zassenhaus's recombination of the lifted monic factors modulo M (see the module comment). */
function recombine(f: IntegerPolynomial, lifted: bigint[][], M: bigint, budget: number): IntegerPolynomial[] | undefined {
  const found: IntegerPolynomial[] = [];
  let tried = 0;
  let rest = f.slice();
  let remaining = lifted.slice();
  for (let size = 1; 2 * size <= remaining.length; ) {
    let hit = false;
    for (const subset of subsets(remaining.length, size)) {
      if (++tried > budget) return undefined;
      const lead = rest[rest.length - 1]!;
      // lc(rest)·Π u_i is, in symmetric representation, lc(rest)/lc(g)·g for the factor g the subset stands for.
      let candidate: bigint[] = [lead];
      for (const i of subset) candidate = integerMul(candidate, remaining[i]!).map((c) => symmetricMod(c, M));
      candidate = trimInteger(candidate);
      // A quick necessary condition: the constant term of a factor divides lc·(constant term of rest).
      const c0 = candidate[0]!;
      if (rest[0] !== 0n && (c0 === 0n || (lead * rest[0]!) % c0 !== 0n)) continue;
      const factor = integerPrimitive(candidate);
      const quotient = integerDivide(rest, factor);
      if (quotient === undefined) continue;
      found.push(factor);
      rest = quotient;
      const chosen = new Set(subset);
      remaining = remaining.filter((_, i) => !chosen.has(i));
      hit = true;
      break;
    }
    if (!hit) size++;
  }
  if (rest.length > 1) found.push(integerPrimitive(rest));
  return found;
}

/**
 * Yun's square-free decomposition of a primitive f ∈ Z[x] of positive degree
 * with positive leading coefficient: pairwise coprime square-free primitive
 * a_i with f = Π a_i^i (parts equal to 1 are left out).
 */
export function squareFreeInteger(f: IntegerPolynomial): { part: IntegerPolynomial; multiplicity: number }[] {
  const out: { part: IntegerPolynomial; multiplicity: number }[] = [];
  const derivative = integerDerivative(f);
  const a0 = integerPrimitive(integerGcd(f, derivative));
  let b = integerDivide(f, a0)!;
  let c = integerDivide(derivative, a0)!;
  let d = integerSub(c, integerDerivative(b));
  for (let i = 1; b.length > 1; i++) {
    const a = integerPrimitive(integerGcd(b, d));
    b = integerDivide(b, a)!;
    c = integerDivide(d, a)!;
    d = integerSub(c, integerDerivative(b));
    if (a.length > 1) out.push({ part: a, multiplicity: i });
  }
  return out;
}

/**
 * The display order of factors: by degree, then coefficient by coefficient
 * from the highest power down, smaller magnitude first and negative before
 * positive, so that x − 1 comes before x + 1 and x − 2, and x^2 + 1 before
 * x^2 − x + 1.
 */
export function compareIntegerPolynomials(a: IntegerPolynomial, b: IntegerPolynomial): number {
  if (a.length !== b.length) return a.length - b.length;
  for (let i = a.length - 1; i >= 0; i--) {
    const x = a[i]!;
    const y = b[i]!;
    if (x === y) continue;
    const mx = x < 0n ? -x : x;
    const my = y < 0n ? -y : y;
    if (mx !== my) return mx < my ? -1 : 1;
    return x < y ? -1 : 1;
  }
  return 0;
}

/** The integer polynomial c·f and the rational c with c·f primitive with positive leading coefficient. */
export function primitiveOfRational(f: readonly Rational[]): { primitive: IntegerPolynomial; scale: Rational } {
  let l = 1n;
  for (const c of f) if (c.num !== 0n) l = lcmBigInt(l, c.den);
  const integral = trimInteger(f.map((c) => (c.num * l) / c.den));
  const g = integerContent(integral) * (integral[integral.length - 1]! < 0n ? -1n : 1n);
  return { primitive: integral.map((c) => c / g), scale: rational(l, g) };
}

/**
 * The complete factorisation over Q of a nonzero polynomial given by its
 * coefficients, constant term first: unit · Π factor^multiplicity with
 * primitive integer factors of positive leading coefficient, each proven
 * irreducible.
 */
export function factorRationalUnivariate(coefficients: readonly Rational[]): RationalUnivariateFactorisation {
  return factorRationalUnivariateWithin(coefficients, Infinity)!;
}

/**
 * `factorRationalUnivariate` trying at most `budget` combinations per
 * square-free part; undefined when that is not enough.
 */
export function factorRationalUnivariateWithin(coefficients: readonly Rational[], budget: number): RationalUnivariateFactorisation | undefined {
  const f = coefficients.slice();
  while (f.length > 0 && f[f.length - 1]!.num === 0n) f.pop();
  if (f.length === 0) throw new RangeError('the zero polynomial has no factorisation');
  const { primitive, scale } = primitiveOfRational(f);
  const unit = QQ.inv(scale);
  const factors: IntegerFactor[] = [];
  // x divides f as often as there are zero coefficients at the bottom.
  let low = 0;
  while (primitive[low] === 0n) low++;
  if (low > 0) factors.push({ factor: [0n, 1n], multiplicity: low });
  const rest = primitive.slice(low);
  if (rest.length > 1) {
    for (const { part, multiplicity } of squareFreeInteger(rest)) {
      const irreducibles = factorSquareFreeInteger(part, budget);
      if (irreducibles === undefined) return undefined;
      for (const factor of irreducibles) factors.push({ factor, multiplicity });
    }
  }
  factors.sort((a, b) => compareIntegerPolynomials(a.factor, b.factor));
  // The factors are primitive with positive leading coefficients, so their product is the primitive part itself.
  let product: bigint[] = [1n];
  for (const { factor, multiplicity } of factors) for (let i = 0; i < multiplicity; i++) product = integerMul(product, factor);
  if (compareIntegerPolynomials(product, primitive) !== 0) throw new Error('factorRationalUnivariate: the factors do not multiply back to the polynomial');
  return { unit, factors };
}

/** A rational root r of f with its multiplicity. */
export interface RationalRoot {
  root: Rational;
  multiplicity: number;
}

/** The rational roots of a nonzero polynomial over Q with their multiplicities, ascending: the linear factors. */
export function rationalRootsOf(coefficients: readonly Rational[]): RationalRoot[] {
  const { factors } = factorRationalUnivariate(coefficients);
  return factors
    .filter(({ factor }) => factor.length === 2)
    .map(({ factor, multiplicity }) => ({ root: rational(-factor[0]!, factor[1]!), multiplicity }))
    .sort((a, b) => (a.root.num * b.root.den < b.root.num * a.root.den ? -1 : 1));
}
