/**
 * Small facts about integers needed to build finite fields: the distinct prime
 * factors of a group order, exact integer roots, and recognising a prime power.
 */
import { isPrime } from './primes.js';

/**
 * The distinct prime factors of n ≥ 1, ascending, by trial division.
 *
 * Trial division up to √n takes at most about 5·10^7 steps for n below 2^53,
 * which bounds the input; larger n raise a RangeError rather than run for hours.
 * Finite fields here have at most 2^20 elements, so their group orders are far
 * below the bound.
 */
export function distinctPrimeFactors(n: bigint): bigint[] {
  if (n < 1n) throw new RangeError(`distinctPrimeFactors: need n ≥ 1, got ${n}`);
  if (n > BigInt(Number.MAX_SAFE_INTEGER)) {
    throw new RangeError(`distinctPrimeFactors: ${n} is above 2^53 − 1, too large for trial division`);
  }
  // Below 2^53 every quotient and remainder is exact in double arithmetic.
  let rest = Number(n);
  const factors: bigint[] = [];
  for (let d = 2; d * d <= rest; d += d === 2 ? 1 : 2) {
    if (rest % d !== 0) continue;
    factors.push(BigInt(d));
    while (rest % d === 0) rest /= d;
  }
  if (rest > 1) factors.push(BigInt(rest));
  return factors;
}

/** The integer k-th root ⌊n^(1/k)⌋ of n ≥ 0, for k ≥ 1, exactly (binary search on bigints). */
export function integerRoot(n: bigint, k: number): bigint {
  if (n < 0n || !Number.isInteger(k) || k < 1) throw new RangeError(`integerRoot: need n ≥ 0 and an integer k ≥ 1, got n = ${n}, k = ${k}`);
  if (n < 2n || k === 1) return n;
  const K = BigInt(k);
  // n < 2^bits, so the root is below 2^⌈bits / k⌉.
  const bits = n.toString(2).length;
  let lo = 1n;
  let hi = 1n << BigInt(Math.ceil(bits / k));
  // Invariant: lo^k ≤ n < hi^k.
  while (hi - lo > 1n) {
    const mid = (lo + hi) >> 1n;
    if (mid ** K <= n) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** q = prime^exponent with prime a prime and exponent ≥ 1. */
export interface PrimePower {
  prime: bigint;
  exponent: number;
}

/**
 * Writes q as p^m with p prime and m ≥ 1, or returns undefined when q is not a
 * prime power (including q < 2).
 *
 * Exponents are tried from the largest possible one down. If q = p^m, then q is
 * an exact e-th power only for e dividing m, and its m-th root is p; so the
 * first exact root found decides: it is p when it is prime, and otherwise q is
 * no prime power at all.
 */
export function primePowerDecomposition(q: bigint): PrimePower | undefined {
  if (q < 2n) return undefined;
  const bits = q.toString(2).length;
  for (let e = bits - 1; e >= 2; e--) {
    const r = integerRoot(q, e);
    if (r >= 2n && r ** BigInt(e) === q) return isPrime(r) ? { prime: r, exponent: e } : undefined;
  }
  return isPrime(q) ? { prime: q, exponent: 1 } : undefined;
}
