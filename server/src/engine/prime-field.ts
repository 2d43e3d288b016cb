/**
 * The prime fields GF(p).
 *
 * For p < 2^31 the elements are JavaScript numbers in [0, p): sums stay below
 * 2^32 and products are reduced exactly by the floating-point-assisted method
 * of modular-arithmetic.ts, so no step ever leaves the range where doubles are
 * exact integers. For larger p the elements are bigints in [0, p).
 */
import { DivisionByZeroError, type Field } from './field.js';
import { MODULAR_LIMIT, invMod, mulMod } from './modular-arithmetic.js';
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
const SMALL_MODULUS_LIMIT = BigInt(MODULAR_LIMIT);

/** The fields with number elements, and their moduli, for the fast paths that work on the numbers directly. */
const smallModuli = new WeakMap<object, number>();

/**
 * p, when F is one of the fields GF(p) made here with p < 2^31 (whose elements
 * are the numbers in [0, p)); undefined for every other field, copies included.
 */
export function smallPrimeModulus(F: Field<unknown>): number | undefined {
  return smallModuli.get(F);
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
  const reciprocal = 1 / q;
  const name = `GF(${p})`;
  const inv = (a: number): number => {
    if (a === 0) throw zeroDivisor(name);
    return invMod(a, q);
  };
  const fromBigInt = (n: bigint): number => Number(reduceBig(n, p));
  const format = (a: number) => a.toString();
  const field: Field<number> = Object.freeze({
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
    mul: (a: number, b: number) => mulMod(a, b, q, reciprocal),
    neg: (a: number) => (a === 0 ? 0 : q - a),
    inv,
    div: (a: number, b: number) => mulMod(a, inv(b), q, reciprocal),
    eq: (a: number, b: number) => a === b,
    isZero: (a: number) => a === 0,
    isOne: (a: number) => a === 1,
    fromBigInt,
    fromRational: (num: bigint, den: bigint) => {
      const d = fromBigInt(den);
      if (d === 0) throw new DivisionByZeroError(`division by zero in ${name}: ${den} is 0 modulo ${p}`);
      return mulMod(fromBigInt(num), invMod(d, q), q, reciprocal);
    },
    format,
    latex: format,
  });
  smallModuli.set(field, q);
  return field;
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
