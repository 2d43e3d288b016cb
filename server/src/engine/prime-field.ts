/**
 * The prime fields GF(p).
 *
 * For p < 2^31 the elements are JavaScript numbers in [0, p): sums stay below
 * 2^32 and products are formed in two exact halves (see `mulModSmall`), so no
 * step ever leaves the range where doubles are exact integers. For larger p
 * the elements are bigints in [0, p).
 */
import { DivisionByZeroError, type Field } from './field.js';
import { isPrime } from './primes.js';

/** Raised when a field GF(p) is asked for with p not a prime. */
export class NotPrimeError extends Error {
  readonly modulus: bigint;
  constructor(modulus: bigint) {
    super(
      modulus < 2n
        ? `GF(${modulus}): the modulus must be a prime, and ${modulus} is less than 2`
        : `GF(${modulus}): ${modulus} is not a prime`,
    );
    this.name = 'NotPrimeError';
    this.modulus = modulus;
  }
}

/** Moduli below this use number elements. */
const SMALL_MODULUS_LIMIT = 2n ** 31n;

/**
 * a·b mod p for a, b in [0, p) and p < 2^31, exactly.
 *
 * The full product can reach 2^62, past the 2^53 where doubles stop being
 * exact, so b is split into 16-bit halves: a·(b >> 16) < 2^46, its residue
 * times 2^16 is below 2^47, and a·(b & 0xffff) < 2^47, so every intermediate
 * value is an exact integer.
 */
function mulModSmall(a: number, b: number, p: number): number {
  const high = Math.floor(b / 65536);
  const low = b - high * 65536;
  return (((a * high) % p) * 65536 + a * low) % p;
}

/** The inverse of a modulo p by the extended Euclidean algorithm; a in (0, p). */
function invModSmall(a: number, p: number): number {
  // Invariant: r0 ≡ s0·a and r1 ≡ s1·a (mod p); every value stays below p in absolute value.
  let r0 = p;
  let r1 = a;
  let s0 = 0;
  let s1 = 1;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  // r0 is gcd(a, p) = 1 because p is prime.
  return s0 < 0 ? s0 + p : s0;
}

function invModBig(a: bigint, p: bigint): bigint {
  let r0 = p;
  let r1 = a;
  let s0 = 0n;
  let s1 = 1n;
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  return s0 < 0n ? s0 + p : s0;
}

function reduceBig(n: bigint, p: bigint): bigint {
  const r = n % p;
  return r < 0n ? r + p : r;
}

function zeroDivisor(name: string): DivisionByZeroError {
  return new DivisionByZeroError(`division by zero in ${name}`);
}

function smallPrimeField(p: bigint): Field<number> {
  const q = Number(p);
  const name = `GF(${p})`;
  const inv = (a: number): number => {
    if (a === 0) throw zeroDivisor(name);
    return invModSmall(a, q);
  };
  const fromBigInt = (n: bigint): number => Number(reduceBig(n, p));
  const format = (a: number) => a.toString();
  return Object.freeze({
    name,
    characteristic: p,
    zero: 0,
    one: 1,
    add: (a: number, b: number) => {
      const s = a + b;
      return s >= q ? s - q : s;
    },
    sub: (a: number, b: number) => {
      const d = a - b;
      return d < 0 ? d + q : d;
    },
    mul: (a: number, b: number) => mulModSmall(a, b, q),
    neg: (a: number) => (a === 0 ? 0 : q - a),
    inv,
    div: (a: number, b: number) => mulModSmall(a, inv(b), q),
    eq: (a: number, b: number) => a === b,
    isZero: (a: number) => a === 0,
    isOne: (a: number) => a === 1,
    fromBigInt,
    fromRational: (num: bigint, den: bigint) => {
      const d = fromBigInt(den);
      if (d === 0) throw new DivisionByZeroError(`division by zero in ${name}: ${den} is 0 modulo ${p}`);
      return mulModSmall(fromBigInt(num), invModSmall(d, q), q);
    },
    format,
    latex: format,
  });
}

function bigPrimeField(p: bigint): Field<bigint> {
  const name = `GF(${p})`;
  const inv = (a: bigint): bigint => {
    if (a === 0n) throw zeroDivisor(name);
    return invModBig(a, p);
  };
  const fromBigInt = (n: bigint) => reduceBig(n, p);
  const format = (a: bigint) => a.toString();
  return Object.freeze({
    name,
    characteristic: p,
    zero: 0n,
    one: 1n,
    add: (a: bigint, b: bigint) => {
      const s = a + b;
      return s >= p ? s - p : s;
    },
    sub: (a: bigint, b: bigint) => {
      const d = a - b;
      return d < 0n ? d + p : d;
    },
    mul: (a: bigint, b: bigint) => (a * b) % p,
    neg: (a: bigint) => (a === 0n ? 0n : p - a),
    inv,
    div: (a: bigint, b: bigint) => (a * inv(b)) % p,
    eq: (a: bigint, b: bigint) => a === b,
    isZero: (a: bigint) => a === 0n,
    isOne: (a: bigint) => a === 1n,
    fromBigInt,
    fromRational: (num: bigint, den: bigint) => {
      const d = fromBigInt(den);
      if (d === 0n) throw new DivisionByZeroError(`division by zero in ${name}: ${den} is 0 modulo ${p}`);
      return (fromBigInt(num) * invModBig(d, p)) % p;
    },
    format,
    latex: format,
  });
}

// Fields are immutable, so one instance per modulus is shared; this also spares repeated primality tests.
const cache = new Map<bigint, Field<any>>();

/**
 * The field GF(p) with p elements. Throws `NotPrimeError` when p is less than
 * 2 or composite. Elements are numbers for p < 2^31 and bigints otherwise;
 * callers should treat them as opaque.
 */
export function primeField(p: bigint): Field<any> {
  const known = cache.get(p);
  if (known !== undefined) return known;
  if (p < 2n || !isPrime(p)) throw new NotPrimeError(p);
  const field = p < SMALL_MODULUS_LIMIT ? smallPrimeField(p) : bigPrimeField(p);
  cache.set(p, field);
  return field;
}
