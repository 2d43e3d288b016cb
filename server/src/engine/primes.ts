/**
 * Primality testing for the moduli of prime fields.
 *
 * Small numbers are settled by trial division. Larger ones go through the
 * Miller–Rabin test with the first thirteen primes (2, 3, 5, …, 41) as bases;
 * that base set admits no strong pseudoprime below
 * 3 317 044 064 679 887 385 961 981 (about 3.3·10^24; Sorenson and Webster,
 * "Strong pseudoprimes to twelve prime bases", Math. Comp. 86 (2017)), so the
 * answer is proven correct below that bound.
 *
 * Above the bound the test uses the first fifty primes as bases. No composite
 * is known to pass them, but the answer is then probabilistic, not proven:
 * a composite passes one random base with probability at most 1/4.
 */

/** Below this bound the thirteen bases 2..41 decide primality without error. */
export const DETERMINISTIC_PRIME_BOUND = 3317044064679887385961981n;

const TRIAL_DIVISION_LIMIT = 1_000_000n;

const SMALL_PRIMES: readonly bigint[] = (() => {
  const primes: bigint[] = [];
  for (let n = 2; primes.length < 50; n++) {
    if (primes.every((p) => n % Number(p) !== 0)) primes.push(BigInt(n));
  }
  return primes;
})();

const DETERMINISTIC_BASES = SMALL_PRIMES.slice(0, 13);

/** base^exponent mod modulus, for modulus >= 1 and exponent >= 0. */
export function powMod(base: bigint, exponent: bigint, modulus: bigint): bigint {
  let result = 1n % modulus;
  base %= modulus;
  if (base < 0n) base += modulus;
  while (exponent > 0n) {
    if (exponent & 1n) result = (result * base) % modulus;
    base = (base * base) % modulus;
    exponent >>= 1n;
  }
  return result;
}

function isPrimeByTrialDivision(n: bigint): boolean {
  if (n < 2n) return false;
  if (n < 4n) return true;
  if (n % 2n === 0n || n % 3n === 0n) return false;
  // Every prime above 3 is 6k ± 1.
  for (let d = 5n; d * d <= n; d += 6n) {
    if (n % d === 0n || n % (d + 2n) === 0n) return false;
  }
  return true;
}

/** One Miller–Rabin round: false when `base` proves the odd number n = d·2^s + 1 composite. */
function passesStrongTest(n: bigint, d: bigint, s: number, base: bigint): boolean {
  let x = powMod(base, d, n);
  if (x === 1n || x === n - 1n) return true;
  for (let i = 1; i < s; i++) {
    x = (x * x) % n;
    if (x === n - 1n) return true;
    if (x === 1n) return false;
  }
  return false;
}

/**
 * Whether n is prime. Exact for every n below `DETERMINISTIC_PRIME_BOUND`
 * (about 3.3·10^24); above it, probabilistic with fifty fixed prime bases
 * (see the module comment).
 */
export function isPrime(n: bigint): boolean {
  // Below 10^6 trial division needs at most a few hundred steps and is the fastest.
  if (n < TRIAL_DIVISION_LIMIT) return isPrimeByTrialDivision(n);
  for (const p of SMALL_PRIMES) {
    if (n === p) return true;
    if (n % p === 0n) return false;
  }
  let d = n - 1n;
  let s = 0;
  while ((d & 1n) === 0n) {
    d >>= 1n;
    s++;
  }
  const bases = n < DETERMINISTIC_PRIME_BOUND ? DETERMINISTIC_BASES : SMALL_PRIMES;
  return bases.every((base) => passesStrongTest(n, d, s, base));
}
