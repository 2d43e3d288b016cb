import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { DETERMINISTIC_PRIME_BOUND, isPrime, powMod } from '../../server/src/engine/primes.js';

/** The sieve of Eratosthenes, an independent way to list the primes below `limit`. */
function sieve(limit: number): boolean[] {
  const prime = new Array<boolean>(limit).fill(true);
  prime[0] = false;
  if (limit > 1) prime[1] = false;
  for (let i = 2; i * i < limit; i++) {
    if (prime[i]) for (let j = i * i; j < limit; j += i) prime[j] = false;
  }
  return prime;
}

/** Trial division with doubles, exact for n below 2^53. */
function isPrimeByTrial(n: number): boolean {
  if (n < 2) return false;
  for (let d = 2; d * d <= n; d++) if (n % d === 0) return false;
  return true;
}

/**
 * Whether odd n passes the strong probable-prime test to `base`, written out
 * here with native bigint exponentiation so that the published pseudoprimes
 * below are checked independently of the engine.
 */
function isStrongProbablePrime(n: bigint, base: bigint): boolean {
  let d = n - 1n;
  let s = 0;
  while (d % 2n === 0n) {
    d /= 2n;
    s++;
  }
  let x = 1n;
  // Square-and-multiply on the bits of d, most significant first.
  for (const bit of d.toString(2)) {
    x = (x * x) % n;
    if (bit === '1') x = (x * base) % n;
  }
  if (x === 1n || x === n - 1n) return true;
  for (let i = 1; i < s; i++) {
    x = (x * x) % n;
    if (x === n - 1n) return true;
  }
  return false;
}

describe('small numbers against the sieve of Eratosthenes', () => {
  test('isPrime agrees with the sieve below 20 000', () => {
    const prime = sieve(20_000);
    for (let n = 0; n < 20_000; n++) assert.equal(isPrime(BigInt(n)), prime[n], `n = ${n}`);
  });

  test('there are 25 primes below 100 and 1229 below 10^4 (OEIS A006880, from memory)', () => {
    const count = (limit: number) => {
      let c = 0;
      for (let n = 0; n < limit; n++) if (isPrime(BigInt(n))) c++;
      return c;
    };
    assert.equal(count(100), 25);
    assert.equal(count(10_000), 1229);
  });

  test('negative numbers, 0 and 1 are not prime', () => {
    for (const n of [-7n, -2n, -1n, 0n, 1n]) assert.equal(isPrime(n), false);
  });

  test('the Miller–Rabin range just above 10^6 agrees with trial division', () => {
    for (let n = 1_000_000; n < 1_020_000; n++) assert.equal(isPrime(BigInt(n)), isPrimeByTrial(n), `n = ${n}`);
  });

  test('random numbers below 2^36 and products of two primes agree with trial division', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 36 }), (n) => {
        assert.equal(isPrime(BigInt(n)), isPrimeByTrial(n));
      }),
    );
    const prime = sieve(200_000);
    const primes = prime.flatMap((isP, n) => (isP && n > 1000 ? [n] : []));
    fc.assert(
      fc.property(fc.constantFrom(...primes), fc.constantFrom(...primes), (p, q) => {
        assert.equal(isPrime(BigInt(p) * BigInt(q)), false, `${p}·${q}`);
      }),
    );
  });
});

describe('Mersenne numbers', () => {
  // Primality of these Mersenne numbers: 2^31−1 (Euler 1772), 2^61−1 (Pervushin 1883),
  // 2^89−1 (Powers 1911), 2^107−1 (Powers 1914), 2^127−1 (Lucas 1876), 2^521−1 (Robinson 1952).
  for (const e of [2n, 3n, 5n, 7n, 13n, 17n, 19n, 31n, 61n, 89n, 107n, 127n, 521n]) {
    test(`2^${e} − 1 is prime`, () => assert.equal(isPrime(2n ** e - 1n), true));
  }

  test('2^67 − 1 = 193707721 · 761838257287 is composite (Cole 1903)', () => {
    assert.equal(193707721n * 761838257287n, 2n ** 67n - 1n);
    assert.equal(isPrime(2n ** 67n - 1n), false);
  });

  test('2^11 − 1 = 2047 = 23 · 89 is composite and a strong pseudoprime to base 2 (OEIS A001262, from memory)', () => {
    assert.equal(23n * 89n, 2047n);
    assert.equal(isStrongProbablePrime(2047n, 2n), true);
    assert.equal(isPrime(2047n), false);
  });
});

describe('numbers that fool weaker tests', () => {
  test('Carmichael numbers are composite although they pass Fermat’s test (Carmichael 1910; list OEIS A002997)', () => {
    // 561 = 3·11·17 is the smallest Carmichael number.
    assert.equal(3n * 11n * 17n, 561n);
    assert.equal(2n ** 560n % 561n, 1n);
    for (const n of [561n, 1105n, 1729n, 2465n, 2821n, 6601n, 8911n, 10585n, 15841n, 29341n, 41041n]) {
      assert.equal(isPrime(n), false, `${n}`);
    }
  });

  // Strong pseudoprimes to every prime base up to a point (from memory: Pomerance, Selfridge and Wagstaff 1980
  // for the first; Jiang and Deng 2014 for the next two; Sorenson and Webster 2017 for the last). Each factorization
  // and each pseudoprime property is checked here, so the memory is verified rather than trusted.
  const pseudoprimes: { n: bigint; factors: bigint[]; basesUpTo: bigint }[] = [
    { n: 3215031751n, factors: [151n, 751n, 28351n], basesUpTo: 7n },
    { n: 3825123056546413051n, factors: [149491n, 747451n, 34233211n], basesUpTo: 23n },
    { n: 318665857834031151167461n, factors: [399165290221n, 798330580441n], basesUpTo: 37n },
    { n: 3317044064679887385961981n, factors: [1287836182261n, 2575672364521n], basesUpTo: 41n },
  ];
  const primeBases = [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n, 41n];
  for (const { n, factors, basesUpTo } of pseudoprimes) {
    test(`${n} is a strong pseudoprime to the primes up to ${basesUpTo}, and composite`, () => {
      assert.equal(
        factors.reduce((a, b) => a * b, 1n),
        n,
      );
      for (const base of primeBases.filter((b) => b <= basesUpTo)) {
        assert.equal(isStrongProbablePrime(n, base), true, `base ${base}`);
      }
      assert.equal(isPrime(n), false);
    });
  }

  // The last one passes all thirteen bases 2..41, so those bases can be trusted exactly below it.
  test('the last of them, 3317044064679887385961981, is the documented bound of the deterministic range', () => {
    assert.equal(DETERMINISTIC_PRIME_BOUND, 3317044064679887385961981n);
  });
});

describe('primes near the boundaries used by prime fields', () => {
  test('2^31 + 11 = 2147483659 is the least prime above 2^31 (checked by trial division)', () => {
    for (let n = 2 ** 31; n < 2147483659; n++) assert.equal(isPrime(BigInt(n)), isPrimeByTrial(n));
    assert.equal(isPrimeByTrial(2147483659), true);
    assert.equal(isPrime(2147483659n), true);
  });

  test('products of two large primes are composite, beyond the deterministic range too', () => {
    const m61 = 2n ** 61n - 1n;
    const m89 = 2n ** 89n - 1n;
    assert.equal(isPrime(m61 * m89), false);
    assert.equal(isPrime(m89 * (2n ** 107n - 1n)), false);
    assert.equal(isPrime((2n ** 127n - 1n) * (2n ** 127n - 1n)), false);
  });
});

describe('powMod', () => {
  test('agrees with native bigint exponentiation', () => {
    fc.assert(
      fc.property(
        fc.bigInt({ min: -1000n, max: 1000n }),
        fc.bigInt({ min: 0n, max: 60n }),
        fc.bigInt({ min: 1n, max: 10n ** 6n }),
        (base, exponent, modulus) => {
          const expected = ((base ** exponent % modulus) + modulus) % modulus;
          assert.equal(powMod(base, exponent, modulus), expected);
        },
      ),
    );
  });
});
