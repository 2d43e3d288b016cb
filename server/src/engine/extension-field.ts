/**
 * The finite fields GF(q) with q = p^m elements, m ≥ 2, as GF(p)[x]/(f).
 *
 * The defining polynomial f is fixed once and for all: the first monic
 * primitive polynomial of degree m over GF(p) in the order of
 * `monicPolynomials` (polynomial-mod-p.ts). That order compares the coefficient
 * vectors (c_(m−1), …, c_1, c_0) of f = x^m + c_(m−1)x^(m−1) + … + c_0
 * lexicographically, from the x^(m−1) coefficient down to the constant, so it
 * is ascending in Σ c_i·p^i. Choosing a primitive f makes the class a of x a
 * generator of the multiplicative group, so every nonzero element is a power
 * of a and multiplication can go through logarithm tables.
 *
 * An element c_0 + c_1·a + … + c_(m−1)·a^(m−1) is the integer
 * c_0 + c_1·p + … + c_(m−1)·p^(m−1) in [0, q): its base-p digits are its
 * coefficients, constant term in the lowest digit. So 0 and 1 are the zero and
 * the one, and the integers below p are GF(p) inside GF(q).
 *
 * Tables of size about 4q are built once per field, so q is limited to
 * `EXTENSION_FIELD_ORDER_LIMIT` = 2^20; a larger q raises `FieldOrderLimitError`.
 */
import { DivisionByZeroError, type Field } from './field.js';
import { firstPrimitivePolynomial, formatPolynomial, polynomialRemainder } from './polynomial-mod-p.js';
import { isPrime } from './primes.js';

/** The largest number of elements an extension field may have. */
export const EXTENSION_FIELD_ORDER_LIMIT = 2 ** 20;

/** Raised when a finite field with more elements than supported is asked for. */
export class FieldOrderLimitError extends RangeError {
  /** The number of elements asked for, as text (`1073741824`, or `2^100` when too large to write out). */
  readonly orderText: string;
  constructor(orderText: string) {
    super(`GF(${orderText}): finite fields of more than 2^20 = ${EXTENSION_FIELD_ORDER_LIMIT} elements are not supported`);
    this.name = 'FieldOrderLimitError';
    this.orderText = orderText;
  }
}

/** A field with finitely many elements, numbered 0..q−1 as described in the module comment. */
export interface FiniteField extends Field<number> {
  /** q, the number of elements. */
  readonly order: bigint;
  /** m, the dimension over the prime field GF(p). */
  readonly degree: number;
  /** The name of the class of x in `format` and `latex` (default `a`). */
  readonly generatorName: string;
  /** The coefficients of the defining polynomial f, constant term first; the last is 1. */
  readonly definingPolynomial: readonly number[];
  /** f written in x, as `x^2 + x + 1`. */
  readonly definingPolynomialText: string;
  /**
   * The element c_0 + c_1·a + c_2·a^2 + … for integer coefficients (reduced
   * modulo p). Any number of coefficients is allowed: powers a^m and higher
   * are reduced through f.
   */
  elementFromCoefficients(coefficients: readonly number[]): number;
  /** The m coefficients of an element in [0, p), constant term first. */
  coefficients(a: number): number[];
  /** a, the class of x: a generator of the multiplicative group, of order q − 1. */
  generatorElement(): number;
  /** Every element once, as 0, 1, …, q − 1. */
  elements(): Iterable<number>;
  /** a^exponent; a negative exponent needs a nonzero a. 0^0 is 1. */
  pow(a: number, exponent: bigint): number;
}

const GENERATOR_NAME = /^[A-Za-z][A-Za-z0-9_]*$/;

/** The log/antilog tables of one field, and the Zech logarithms that make addition a table look-up for odd p. */
interface Tables {
  /** exp[i] = a^i for 0 ≤ i < 2(q − 1), repeated once so a sum of two logarithms needs no reduction. */
  exp: Int32Array;
  /** log[x] = i with a^i = x, for x ≠ 0; log[0] is unused. */
  log: Int32Array;
  /** zech[i] = log(1 + a^i), or −1 where 1 + a^i = 0; empty in characteristic 2. */
  zech: Int32Array;
}

/**
 * Builds the tables by walking through the powers of a. Multiplying an element
 * by a shifts its coefficients up by one place and replaces the top one t by
 * −t·(c_0 + c_1 x + … + c_(m−1) x^(m−1)), since x^m ≡ −(f − x^m) modulo f. In
 * characteristic 2 that is a shift of the bits followed by an exclusive or
 * with the bits of f.
 */
function buildTables(p: number, m: number, f: readonly number[]): Tables {
  const q = p ** m;
  const exp = new Int32Array(2 * (q - 1));
  const log = new Int32Array(q).fill(-1);
  const record = (i: number, x: number) => {
    if (log[x] !== -1) throw new Error(`GF(${q}): the defining polynomial is not primitive, which cannot happen`);
    exp[i] = x;
    exp[i + q - 1] = x;
    log[x] = i;
  };
  if (p === 2) {
    const fBits = f.reduceRight((acc, c) => acc * 2 + c, 0);
    for (let i = 0, x = 1; i < q - 1; i++) {
      record(i, x);
      x <<= 1;
      if (x & q) x ^= fBits;
    }
  } else {
    const minusF = f.slice(0, m).map((c) => (p - c) % p);
    const digits = new Int32Array(m);
    digits[0] = 1;
    for (let i = 0; i < q - 1; i++) {
      let x = 0;
      for (let j = m - 1; j >= 0; j--) x = x * p + digits[j]!;
      record(i, x);
      const t = digits[m - 1]!;
      for (let j = m - 1; j > 0; j--) digits[j] = (digits[j - 1]! + t * minusF[j]!) % p;
      digits[0] = (t * minusF[0]!) % p;
    }
  }
  // Characteristic 2 adds by exclusive or and needs no Zech logarithms.
  const zech = new Int32Array(p === 2 ? 0 : q - 1);
  for (let i = 0; i < zech.length; i++) {
    // Adding 1 changes only the constant digit.
    const e = exp[i]!;
    const plusOne = e % p === p - 1 ? e - (p - 1) : e + 1;
    zech[i] = plusOne === 0 ? -1 : log[plusOne]!;
  }
  return { exp, log, zech };
}

function makeField(p: number, m: number, generatorName: string): FiniteField {
  const q = p ** m;
  const groupOrder = q - 1;
  const name = `GF(${q})`;
  const f = firstPrimitivePolynomial(p, m);
  const { exp, log, zech } = buildTables(p, m, f);

  const digitsOf = (a: number): number[] => {
    const out: number[] = [];
    for (let j = 0; j < m; j++, a = Math.floor(a / p)) out.push(a % p);
    return out;
  };

  // Characteristic 2: the digits are bits, addition is exclusive or and −a = a.
  // Odd p: a + b = a·(1 + b/a) = a^(log a + zech(log b − log a)), and −a = a·(−1) with −1 = a^((q−1)/2).
  const add =
    p === 2
      ? (x: number, y: number) => x ^ y
      : (x: number, y: number) => {
          if (x === 0) return y;
          if (y === 0) return x;
          const lx = log[x]!;
          let d = log[y]! - lx;
          if (d < 0) d += groupOrder;
          const z = zech[d]!;
          return z < 0 ? 0 : exp[lx + z]!;
        };
  const half = groupOrder / 2;
  const neg = p === 2 ? (x: number) => x : (x: number) => (x === 0 ? 0 : exp[log[x]! + half]!);
  const mul = (x: number, y: number) => (x === 0 || y === 0 ? 0 : exp[log[x]! + log[y]!]!);
  const inv = (x: number) => {
    if (x === 0) throw new DivisionByZeroError(`division by zero in ${name}`);
    return exp[groupOrder - log[x]!]!;
  };
  const fromBigInt = (n: bigint) => {
    const r = Number(n % BigInt(p));
    return r < 0 ? r + p : r;
  };
  const pow = (x: number, exponent: bigint) => {
    if (x === 0) {
      if (exponent < 0n) throw new DivisionByZeroError(`division by zero in ${name}: 0 to a negative power`);
      return exponent === 0n ? 1 : 0;
    }
    let e = Number((BigInt(log[x]!) * exponent) % BigInt(groupOrder));
    if (e < 0) e += groupOrder;
    return exp[e]!;
  };
  const elementFromCoefficients = (coefficients: readonly number[]) => {
    coefficients.forEach((c) => {
      if (!Number.isSafeInteger(c)) throw new RangeError(`${name}: coefficient ${c} is not a safe integer`);
    });
    const reduced = polynomialRemainder(coefficients, f, p);
    return reduced.reduceRight((acc, c) => acc * p + c, 0);
  };

  return Object.freeze({
    name,
    characteristic: BigInt(p),
    zero: 0,
    one: 1,
    order: BigInt(q),
    degree: m,
    generatorName,
    definingPolynomial: Object.freeze(f.slice()),
    definingPolynomialText: formatPolynomial(f, 'x'),
    add,
    sub: (x: number, y: number) => add(x, neg(y)),
    mul,
    neg,
    inv,
    div: (x: number, y: number) => mul(x, inv(y)),
    eq: (x: number, y: number) => x === y,
    isZero: (x: number) => x === 0,
    isOne: (x: number) => x === 1,
    fromBigInt,
    fromRational: (num: bigint, den: bigint) => {
      const d = fromBigInt(den);
      if (d === 0) throw new DivisionByZeroError(`division by zero in ${name}: ${den} is 0 modulo ${p}`);
      return mul(fromBigInt(num), inv(d));
    },
    format: (x: number) => formatPolynomial(digitsOf(x), generatorName, 'text'),
    latex: (x: number) => formatPolynomial(digitsOf(x), generatorName, 'latex'),
    elementFromCoefficients,
    coefficients: digitsOf,
    generatorElement: () => p,
    *elements() {
      for (let x = 0; x < q; x++) yield x;
    },
    pow,
  });
}

// Fields are immutable and their tables costly, so one instance per (p, m, generator name) is shared.
const cache = new Map<string, FiniteField>();

/**
 * GF(p^m) for a prime p and m ≥ 2 (see the module comment for the defining
 * polynomial and the numbering of elements). `options.generator` names the
 * class of x in formatted output; it must be a letter followed by letters,
 * digits or underscores, and defaults to `a`. Throws a RangeError for a p that
 * is not prime or an m below 2, and `FieldOrderLimitError` when p^m > 2^20.
 */
export function extensionField(p: bigint, m: number, options?: { generator?: string }): FiniteField {
  const generatorName = options?.generator ?? 'a';
  if (!GENERATOR_NAME.test(generatorName)) {
    throw new RangeError(`extensionField: the generator name must be a letter followed by letters, digits or _, got "${generatorName}"`);
  }
  if (p < 2n || !isPrime(p)) throw new RangeError(`extensionField: the characteristic must be a prime, got ${p}`);
  if (!Number.isInteger(m) || m < 2) {
    throw new RangeError(`extensionField: the degree must be an integer m ≥ 2 (GF(p) itself is a prime field), got ${m}`);
  }
  // p ≥ 2 and p^m ≤ 2^20 bound m by 20, so a larger m is refused before p^m is ever formed.
  if (m > 20 || p ** BigInt(m) > BigInt(EXTENSION_FIELD_ORDER_LIMIT)) {
    // Write the order out in full unless it would be unreadably long.
    const q = m <= 64 ? p ** BigInt(m) : undefined;
    throw new FieldOrderLimitError(q !== undefined && q < 10n ** 30n ? String(q) : `${p}^${m}`);
  }
  const key = `${p}^${m}:${generatorName}`;
  let field = cache.get(key);
  if (field === undefined) {
    field = makeField(Number(p), m, generatorName);
    cache.set(key, field);
  }
  return field;
}
