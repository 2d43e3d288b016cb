/**
 * Plücker coordinates over the rationals by elimination modulo several primes
 * and Chinese remaindering (multimodular; common practice, no source).
 *
 * The rows are cleared of denominators, so the minors wanted are integers m
 * divided by one known scale. Every maximal minor of the integer matrix A is
 * bounded by Hadamard's inequality, |m| ≤ H = ∏_i ‖a_i‖ (the product of the
 * Euclidean lengths of the rows, since the rows of a square submatrix are no
 * longer than the rows of A; Hadamard 1893, a textbook fact). The minors are
 * computed modulo primes p_1 > p_2 > … below 2^31 by the fast walk of
 * plucker-modular.ts until P = p_1⋯p_r > 2H; then m is the unique integer with
 * |m| < P/2 in its residue class modulo P, found from the residues by Garner's
 * mixed-radix method (Knuth, TAOCP vol. 2, §4.3.2 — from memory). The answer
 * is exact: nothing is guessed, and the bound is proven, not estimated.
 *
 * Exactness does not depend on a pivot being nonzero modulo p: the walk modulo
 * p computes every minor modulo p correctly whatever vanishes there.
 */
import { MODULAR_LIMIT, invMod, mulMod } from './modular-arithmetic.js';
import { emptyModularWalkCounts, pluckerResidues, zeroDoubles, type ModularWalkCounts } from './plucker-modular.js';
import { clearDenominators } from './plucker-fraction-free.js';
import { QQ, type Rational } from './rational.js';
import { binomial } from './subsets.js';

/**
 * Beyond this many primes the fraction-free bigint walk is faster: each
 * coordinate then costs r bigint conversions and multiplications to rebuild,
 * and the walk runs r times, while bigint arithmetic on numbers of a few limbs
 * costs little more than on one limb. Measured side by side at G(8,16) and
 * G(10,20) with entries of 12 to 44 bits, after the walk's kernels became
 * branch-free: the multimodular path was 1.3–1.8× faster up to 9 primes, 1.1×
 * at 10 and 11, even at 12 (before, the crossing was at 6 to 8 primes).
 */
export const MULTIMODULAR_PRIME_LIMIT = 10;

/** Below this many coordinates, three primes or more are not worth their setup. */
export const MULTIMODULAR_MINIMUM_OUTPUT = 4096;

/** Primes below 2^31 in descending order, found on demand and kept. */
const primes: number[] = [];

function isPrimeBelowLimit(x: number): boolean {
  if (x % 2 === 0) return x === 2;
  for (let d = 3; d * d <= x; d += 2) if (x % d === 0) return false;
  return x > 1;
}

/** The i-th prime below 2^31 counted downwards (0 → 2^31 − 1). */
export function modularPrime(i: number): number {
  let candidate = primes.length === 0 ? MODULAR_LIMIT - 1 : primes[primes.length - 1]! - 2;
  while (primes.length <= i) {
    if (isPrimeBelowLimit(candidate)) primes.push(candidate);
    candidate -= 2;
  }
  return primes[i]!;
}

/** How the coordinates of one matrix were found, for the benchmarks. */
export interface MultimodularReport {
  primes: number;
  /** Bits of the Hadamard bound H. */
  boundBits: number;
  walk: ModularWalkCounts;
  /** Products modulo primes spent on reconstruction (Garner's method). */
  reconstructionProducts: number;
  /** Bigint multiply-adds spent on reconstruction. */
  reconstructionBigint: number;
}

export function emptyMultimodularReport(): MultimodularReport {
  return {
    primes: 0,
    boundBits: 0,
    walk: emptyModularWalkCounts(),
    reconstructionProducts: 0,
    reconstructionBigint: 0,
  };
}

/** The number of primes from the top of the list whose product exceeds 2H, given H² = `boundSquared`. */
export function primesNeeded(boundSquared: bigint): number {
  // P > 2H ⟺ P² > 4H², all exact in bigints.
  const target = 4n * boundSquared;
  let product = 1n;
  let count = 0;
  while (product * product <= target) product *= BigInt(modularPrime(count++));
  return Math.max(count, 1);
}

/** H² = ∏_i Σ_j a_ij², the square of Hadamard's bound for every maximal minor. */
export function hadamardBoundSquared(integers: readonly (readonly bigint[])[]): bigint {
  let bound = 1n;
  for (const row of integers) bound *= squaredLength(row);
  return bound;
}

/**
 * Σ_j x_j², on numbers when that is exact: entries of at most 2^20 in absolute
 * value, at most 2^12 of them, keep every partial sum below 2^52 (converting
 * a bigint to a number is exact below 2^53, and rounds to at least 2^53
 * above, so the test on the converted value is sound).
 */
function squaredLength(row: readonly bigint[]): bigint {
  if (row.length <= 4096) {
    let length = 0;
    let small = true;
    for (const x of row) {
      const v = Number(x);
      if (v > 1048576 || v < -1048576) {
        small = false;
        break;
      }
      length += v * v;
    }
    if (small) return BigInt(length);
  }
  let length = 0n;
  for (const x of row) length += x * x;
  return length;
}

/** The entries as numbers when they are exact as numbers (below 2^53 in absolute value), else undefined. */
function entriesAsNumbers(integers: readonly (readonly bigint[])[]): (number | undefined)[][] {
  return integers.map((row) =>
    row.map((x) => {
      // Exact below 2^53; a larger bigint converts to at least 2^53 in absolute value.
      const v = Number(x);
      return v < 9007199254740992 && v > -9007199254740992 ? v : undefined;
    }),
  );
}

function residues(integers: readonly (readonly bigint[])[], numbers: readonly (readonly (number | undefined)[])[], p: number): number[][] {
  const big = BigInt(p);
  return integers.map((row, i) => {
    const exact = numbers[i]!;
    return row.map((x, j) => {
      // Entries that are exact numbers are reduced without bigint division (small ones without any division).
      const v = exact[j];
      if (v !== undefined) {
        if (v >= 0) return v < p ? v : v % p;
        if (v > -p) return v + p;
        const r = v % p;
        return r < 0 ? r + p : r;
      }
      const r = Number(x % big);
      return r < 0 ? r + p : r;
    });
  });
}

const SMALL_INTEGERS: bigint[] = Array.from({ length: 2049 }, (_, i) => BigInt(i - 1024));

/** m as a bigint, for a safe integer m; small values come from a table (converting is the slow part). */
function toBigInt(m: number): bigint {
  return m >= -1024 && m <= 1024 ? SMALL_INTEGERS[m + 1024]! : BigInt(m);
}

/**
 * The integer minors of one matrix, all of them below 2^53 in absolute value
 * (safe integers, exact as doubles) or not known to be.
 */
export type IntegerMinors = Float64Array | bigint[];

/**
 * All C(n, k) maximal minors of the integer k×n matrix `integers` (k ≥ 1),
 * given H² (`boundSquared`, Hadamard's bound squared) and r = primesNeeded(H²)
 * primes, in lexicographic order of their column sets. When H < 2^52 they come
 * as doubles (so no bigint is made per coordinate), otherwise as bigints.
 */
export function multimodularMinors(
  integers: readonly (readonly bigint[])[],
  n: number,
  boundSquared: bigint,
  r: number,
  report?: MultimodularReport,
): IntegerMinors {
  const moduli = Array.from({ length: r }, (_, i) => modularPrime(i));
  const numbers = entriesAsNumbers(integers);
  const images = moduli.map((p) => pluckerResidues(residues(integers, numbers, p), n, p, report?.walk));
  const count = images[0]!.length;
  if (report !== undefined) {
    report.primes = r;
    report.boundBits = boundSquared === 0n ? 0 : Math.ceil(boundSquared.toString(2).length / 2);
  }

  if (r === 1) {
    // |m| ≤ H < p/2: the symmetric residue is m.
    const p = moduli[0]!;
    const half = (p - 1) / 2;
    const x = images[0]!;
    const out = zeroDoubles(count);
    // v − p when v > (p − 1)/2, without a branch: half − v is negative exactly then (all within 32 bits).
    for (let i = 0; i < count; i++) {
      const v = x[i]!;
      out[i] = v - (p & ((half - v) >> 31));
    }
    return out;
  }

  // Garner: m ≡ v_0 + p_0·v_1 + p_0·p_1·v_2 + … with digits v_i in [0, p_i).
  // inverses[j][i] = p_j^{-1} mod p_i for j < i.
  const inverses = moduli.map((pj, j) => moduli.map((pi, i) => (j < i ? invMod(pj % pi, pi) : 0)));
  const reciprocals = moduli.map((p) => 1 / p);
  if (report !== undefined) report.reconstructionProducts += (count * r * (r - 1)) / 2;

  const p0 = moduli[0]!;
  const p1 = moduli[1]!;
  if (r === 2 && boundSquared < 2n ** 104n) {
    // H < 2^52, so m = v_0 + p_0·t with |t| < p_1/2 and every step exact on numbers.
    const inverse = inverses[0]![1]!;
    const reciprocal = reciprocals[1]!;
    const x0 = images[0]!;
    const x1 = images[1]!;
    const half = (p1 - 1) / 2;
    const out = zeroDoubles(count);
    // The residues are random, so the signs tested below would be mispredicted branches half of the
    // time; they are taken from sign bits instead (every quantity is within 32 bits).
    for (let i = 0; i < count; i++) {
      const v0 = x0[i]!;
      // v_0 < p_0 < 2·p_1, so v_0 mod p_1 is v_0 or v_0 − p_1 (rarely: p_0 − p_1 is tiny).
      let d = x1[i]! - (v0 >= p1 ? v0 - p1 : v0);
      d += (d >> 31) & p1;
      let t = mulMod(d, inverse, p1, reciprocal);
      // The representative of m with |m| < P/2: t > (p_1−1)/2, or t = (p_1−1)/2 with v_0 > p_0/2, means m − P.
      if (t === half) {
        if (2 * v0 > p0) t -= p1;
      } else {
        t -= p1 & ((half - t) >> 31);
      }
      out[i] = v0 + p0 * t;
    }
    return out;
  }

  // The general case: digits on numbers, then Horner on bigints.
  const bigModuli = moduli.map((p) => BigInt(p));
  let modulus = 1n;
  for (const p of bigModuli) modulus *= p;
  const halfModulus = modulus / 2n;
  const digits = new Float64Array(r);
  const out = new Array<bigint>(count);
  if (report !== undefined) report.reconstructionBigint += count * (r - 1);
  for (let i = 0; i < count; i++) {
    let allZero = true;
    for (let s = 0; s < r; s++) {
      if (images[s]![i] !== 0) {
        allZero = false;
        break;
      }
    }
    if (allZero) {
      out[i] = 0n;
      continue;
    }
    for (let s = 0; s < r; s++) {
      const p = moduli[s]!;
      const reciprocal = reciprocals[s]!;
      let t = images[s]![i]!;
      for (let j = 0; j < s; j++) {
        // digits[j] < p_j < 2·p_s (the primes are descending and close to 2^31), so one subtraction reduces it.
        const digit = digits[j]!;
        let d = t - (digit >= p ? digit - p : digit);
        if (d < 0) d += p;
        t = mulMod(d, inverses[j]![s]!, p, reciprocal);
      }
      digits[s] = t;
    }
    let m = BigInt(digits[r - 1]!);
    for (let s = r - 2; s >= 0; s--) m = m * bigModuli[s]! + BigInt(digits[s]!);
    out[i] = m > halfModulus ? m - modulus : m;
  }
  return out;
}

/** The clearing of denominators, Hadamard's bound and the number of primes of one rational matrix. */
export interface MultimodularPlan {
  integers: bigint[][];
  scale: bigint;
  boundSquared: bigint;
  primes: number;
}

/**
 * The plan for `rows`, or undefined when more than `primeLimit` primes would
 * be needed, or (with the default limit) three or more for fewer than
 * `MULTIMODULAR_MINIMUM_OUTPUT` coordinates.
 */
export function multimodularPlan(rows: readonly (readonly Rational[])[], n: number, primeLimit: number = MULTIMODULAR_PRIME_LIMIT): MultimodularPlan | undefined {
  const { integers, scale } = clearDenominators(rows);
  const boundSquared = hadamardBoundSquared(integers);
  const r = primesNeeded(boundSquared);
  if (r > primeLimit) return undefined;
  // With three primes or more, rebuilding each coordinate costs bigint arithmetic of its own; for few
  // coordinates the setup is not repaid (measured at G(2,8) to G(5,15)).
  if (r > 2 && binomial(n, rows.length) < MULTIMODULAR_MINIMUM_OUTPUT && primeLimit === MULTIMODULAR_PRIME_LIMIT) return undefined;
  return { integers, scale, boundSquared, primes: r };
}

/**
 * All C(n, k) maximal minors of the rational k×n matrix `rows` (k ≥ 1), or
 * undefined when the plan declines (see `multimodularPlan`). `report`, when
 * given, is filled in.
 */
export function pluckerMultimodular(
  rows: readonly (readonly Rational[])[],
  n: number,
  report?: MultimodularReport,
  primeLimit: number = MULTIMODULAR_PRIME_LIMIT,
): Rational[] | undefined {
  const plan = multimodularPlan(rows, n, primeLimit);
  if (plan === undefined) return undefined;
  const minors = multimodularMinors(plan.integers, n, plan.boundSquared, plan.primes, report);
  const scale = plan.scale;
  const count = minors.length;
  const out = new Array<Rational>(count);
  const finish = (m: bigint): Rational => (m === 0n ? QQ.zero : scale === 1n ? { num: m, den: 1n } : QQ.fromRational(m, scale));
  if (minors instanceof Float64Array) {
    for (let i = 0; i < count; i++) out[i] = finish(toBigInt(minors[i]!));
  } else {
    for (let i = 0; i < count; i++) out[i] = finish(minors[i]!);
  }
  return out;
}
