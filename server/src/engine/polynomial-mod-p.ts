/**
 * Polynomials with coefficients in a prime field GF(p), as needed to build the
 * fields GF(p^m): arithmetic modulo a polynomial, irreducibility (Rabin's test)
 * and primitivity (the class of x generates the multiplicative group).
 *
 * A polynomial is an array of coefficients, constant term first, each an
 * integer in [0, p), with no trailing zeros; the zero polynomial is []. Public
 * functions accept any integer coefficients and trailing zeros, and reduce them.
 * The prime p is a number below 2^26, so the product of two coefficients stays
 * below 2^52 and double arithmetic is exact.
 */
import { distinctPrimeFactors } from './integer-factors.js';
import { isPrime } from './primes.js';

/** Coefficients, constant term first. */
export type Polynomial = number[];

/** Primes up to this bound keep every coefficient product exact. */
const PRIME_LIMIT = 2 ** 26;

function checkPrime(p: number, what: string): void {
  if (!Number.isInteger(p) || p < 2 || p >= PRIME_LIMIT || !isPrime(BigInt(p))) {
    throw new RangeError(`${what}: the coefficient field needs a prime p below 2^26, got ${p}`);
  }
}

function mod(a: number, p: number): number {
  const r = a % p;
  // A negative multiple of p leaves −0, which must not leak out as a coefficient.
  return r < 0 ? r + p : r === 0 ? 0 : r;
}

/** Drops trailing zero coefficients, in place. */
function trimInPlace(a: number[]): number[] {
  let end = a.length;
  while (end > 0 && a[end - 1] === 0) end--;
  a.length = end;
  return a;
}

/** The polynomial with each coefficient reduced into [0, p) and trailing zeros removed. */
export function normalizePolynomial(a: readonly number[], p: number): Polynomial {
  checkPrime(p, 'normalizePolynomial');
  return trimInPlace(
    a.map((c) => {
      if (!Number.isSafeInteger(c)) throw new RangeError(`normalizePolynomial: coefficient ${c} is not a safe integer`);
      return mod(c, p);
    }),
  );
}

/** The degree, with −1 for the zero polynomial. */
export function polynomialDegree(a: readonly number[]): number {
  let d = a.length - 1;
  while (d >= 0 && a[d] === 0) d--;
  return d;
}

// The private versions below take normalized polynomials and return normalized ones.

function add(a: Polynomial, b: Polynomial, p: number): Polynomial {
  const out = new Array<number>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) {
    const s = (a[i] ?? 0) + (b[i] ?? 0);
    out[i] = s >= p ? s - p : s;
  }
  return trimInPlace(out);
}

function sub(a: Polynomial, b: Polynomial, p: number): Polynomial {
  const out = new Array<number>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    out[i] = d < 0 ? d + p : d;
  }
  return trimInPlace(out);
}

function mul(a: Polynomial, b: Polynomial, p: number): Polynomial {
  if (a.length === 0 || b.length === 0) return [];
  const out = new Array<number>(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    if (x === 0) continue;
    for (let j = 0; j < b.length; j++) out[i + j] = (out[i + j]! + x * b[j]!) % p;
  }
  return trimInPlace(out);
}

/** The inverse of a unit c modulo the prime p (Fermat: c^(p−2)). */
function invMod(c: number, p: number): number {
  let result = 1;
  let base = c;
  for (let e = p - 2; e > 0; e = Math.floor(e / 2)) {
    if (e % 2 === 1) result = (result * base) % p;
    base = (base * base) % p;
  }
  return result;
}

function divMod(a: Polynomial, b: Polynomial, p: number): { quotient: Polynomial; remainder: Polynomial } {
  if (b.length === 0) throw new RangeError('polynomial division by the zero polynomial');
  const remainder = a.slice();
  const db = b.length - 1;
  if (remainder.length - 1 < db) return { quotient: [], remainder };
  const quotient = new Array<number>(remainder.length - db).fill(0);
  const leadInverse = invMod(b[db]!, p);
  for (let d = remainder.length - 1; d >= db; d--) {
    const c = remainder[d]!;
    if (c === 0) continue;
    const factor = (c * leadInverse) % p;
    quotient[d - db] = factor;
    // Subtracting factor·x^(d−db)·b clears the coefficient of x^d.
    for (let j = 0; j <= db; j++) remainder[d - db + j] = mod(remainder[d - db + j]! - factor * b[j]!, p);
  }
  return { quotient: trimInPlace(quotient), remainder: trimInPlace(remainder) };
}

function remainderOf(a: Polynomial, b: Polynomial, p: number): Polynomial {
  return divMod(a, b, p).remainder;
}

function monic(a: Polynomial, p: number): Polynomial {
  if (a.length === 0 || a[a.length - 1] === 1) return a;
  const s = invMod(a[a.length - 1]!, p);
  return a.map((c) => (c * s) % p);
}

function gcd(a: Polynomial, b: Polynomial, p: number): Polynomial {
  let x = a;
  let y = b;
  while (y.length > 0) [x, y] = [y, remainderOf(x, y, p)];
  return monic(x, p);
}

function powMod(base: Polynomial, exponent: bigint, modulus: Polynomial, p: number): Polynomial {
  let result = remainderOf([1], modulus, p);
  let b = remainderOf(base, modulus, p);
  for (let e = exponent; e > 0n; e >>= 1n) {
    if (e & 1n) result = remainderOf(mul(result, b, p), modulus, p);
    b = remainderOf(mul(b, b, p), modulus, p);
  }
  return result;
}

function equal(a: Polynomial, b: Polynomial): boolean {
  return a.length === b.length && a.every((c, i) => c === b[i]);
}

export function addPolynomials(a: readonly number[], b: readonly number[], p: number): Polynomial {
  return add(normalizePolynomial(a, p), normalizePolynomial(b, p), p);
}

export function subtractPolynomials(a: readonly number[], b: readonly number[], p: number): Polynomial {
  return sub(normalizePolynomial(a, p), normalizePolynomial(b, p), p);
}

export function multiplyPolynomials(a: readonly number[], b: readonly number[], p: number): Polynomial {
  return mul(normalizePolynomial(a, p), normalizePolynomial(b, p), p);
}

/** Quotient and remainder of a by b ≠ 0, with deg remainder < deg b. */
export function dividePolynomials(
  a: readonly number[],
  b: readonly number[],
  p: number,
): { quotient: Polynomial; remainder: Polynomial } {
  return divMod(normalizePolynomial(a, p), normalizePolynomial(b, p), p);
}

/** a mod b, for b ≠ 0. */
export function polynomialRemainder(a: readonly number[], b: readonly number[], p: number): Polynomial {
  return dividePolynomials(a, b, p).remainder;
}

/** a·b mod modulus, for a nonzero modulus. */
export function multiplyModPolynomial(
  a: readonly number[],
  b: readonly number[],
  modulus: readonly number[],
  p: number,
): Polynomial {
  return remainderOf(multiplyPolynomials(a, b, p), normalizePolynomial(modulus, p), p);
}

/** base^exponent mod modulus by repeated squaring, for exponent ≥ 0 and a nonzero modulus. */
export function powerModPolynomial(
  base: readonly number[],
  exponent: bigint,
  modulus: readonly number[],
  p: number,
): Polynomial {
  if (exponent < 0n) throw new RangeError(`powerModPolynomial: the exponent must be ≥ 0, got ${exponent}`);
  return powMod(normalizePolynomial(base, p), exponent, normalizePolynomial(modulus, p), p);
}

/** The monic greatest common divisor ([] when both are zero). */
export function polynomialGcd(a: readonly number[], b: readonly number[], p: number): Polynomial {
  return gcd(normalizePolynomial(a, p), normalizePolynomial(b, p), p);
}

/** The distinct primes dividing the positive integer m. */
function primeDivisorsOf(m: number): number[] {
  return distinctPrimeFactors(BigInt(m)).map(Number);
}

/**
 * Whether f is irreducible over GF(p), by Rabin's test: f of degree m ≥ 1 is
 * irreducible exactly when x^(p^m) ≡ x (mod f) and, for every prime r dividing
 * m, gcd(x^(p^(m/r)) − x, f) = 1. The first condition says every irreducible
 * factor of f has degree dividing m; the second excludes factors of each
 * proper divisor degree m/r, hence of every proper divisor degree.
 * Constants (degree ≤ 0) are not irreducible.
 */
export function isIrreducible(f: readonly number[], p: number): boolean {
  const g = monic(normalizePolynomial(f, p), p);
  const m = g.length - 1;
  if (m <= 0) return false;
  if (m === 1) return true;
  const x: Polynomial = [0, 1];
  // frobeniusPowers[k] = x^(p^k) mod g, each the p-th power of the one before.
  const frobeniusPowers: Polynomial[] = [x];
  for (let k = 1; k <= m; k++) frobeniusPowers.push(powMod(frobeniusPowers[k - 1]!, BigInt(p), g, p));
  if (!equal(frobeniusPowers[m]!, x)) return false;
  return primeDivisorsOf(m).every((r) => gcd(sub(frobeniusPowers[m / r]!, x, p), g, p).length === 1);
}

/**
 * Whether f is a primitive polynomial over GF(p): irreducible of degree m ≥ 1,
 * with the class of x of multiplicative order exactly p^m − 1 in
 * GF(p)[x]/(f). The order is checked through the factorisation of p^m − 1:
 * x^(p^m − 1) = 1 and x^((p^m − 1)/r) ≠ 1 for every prime r dividing it. A
 * nonzero scalar multiple of f counts like f itself. Needs p^m − 1 below 2^53
 * (see `distinctPrimeFactors`).
 */
export function isPrimitive(f: readonly number[], p: number): boolean {
  const g = monic(normalizePolynomial(f, p), p);
  const m = g.length - 1;
  if (!isIrreducible(g, p)) return false;
  const groupOrder = BigInt(p) ** BigInt(m) - 1n;
  const x = remainderOf([0, 1], g, p);
  const one = remainderOf([1], g, p);
  if (!equal(powMod(x, groupOrder, g, p), one)) return false;
  return distinctPrimeFactors(groupOrder).every((r) => !equal(powMod(x, groupOrder / r, g, p), one));
}

/**
 * Every monic polynomial x^m + c_(m−1)x^(m−1) + … + c_0 of degree m ≥ 0 over
 * GF(p), each once, in the order this module calls lexicographic: by the
 * coefficient vector (c_(m−1), c_(m−2), …, c_0), compared entry by entry from
 * the x^(m−1) coefficient down to the constant, each coefficient read as an
 * integer in [0, p). Equivalently: ascending in N = Σ c_i·p^i. For m = 2,
 * p = 2 the order is x^2, x^2 + 1, x^2 + x, x^2 + x + 1.
 */
export function* monicPolynomials(p: number, m: number): Generator<Polynomial> {
  checkPrime(p, 'monicPolynomials');
  if (!Number.isInteger(m) || m < 0) throw new RangeError(`monicPolynomials: need a degree m ≥ 0, got ${m}`);
  const digits = new Array<number>(m).fill(0);
  for (;;) {
    yield [...digits, 1];
    // Odometer with the constant term as the fastest digit.
    let i = 0;
    while (i < m && digits[i] === p - 1) digits[i++] = 0;
    if (i === m) return;
    digits[i]!++;
  }
}

/**
 * The first monic primitive polynomial of degree m ≥ 1 over GF(p) in the order
 * of `monicPolynomials`. One exists for every p and m (the minimal polynomial
 * of a generator of the multiplicative group of GF(p^m)).
 */
export function firstPrimitivePolynomial(p: number, m: number): Polynomial {
  if (!Number.isInteger(m) || m < 1) throw new RangeError(`firstPrimitivePolynomial: need a degree m ≥ 1, got ${m}`);
  for (const f of monicPolynomials(p, m)) {
    // A zero constant term makes x a zero divisor, never a generator.
    if (f[0] !== 0 && isPrimitive(f, p)) return f;
  }
  throw new Error(`no primitive polynomial of degree ${m} over GF(${p}) was found, which cannot happen`);
}

/** How `formatPolynomial` writes powers: `x^2` as text, `x^{2}` for LaTeX. */
export type PolynomialStyle = 'text' | 'latex';

/**
 * The polynomial written from the highest power down, omitting zero terms and
 * unit coefficients: `x^2 + x + 1`, `2x + 1`, `0`, `1`. Coefficients are shown
 * as their representatives in [0, p), so no term carries a minus sign.
 */
export function formatPolynomial(coefficients: readonly number[], variable = 'x', style: PolynomialStyle = 'text'): string {
  const terms: string[] = [];
  for (let i = coefficients.length - 1; i >= 0; i--) {
    const c = coefficients[i]!;
    if (c === 0) continue;
    if (i === 0) {
      terms.push(String(c));
      continue;
    }
    const power = i === 1 ? variable : style === 'latex' ? `${variable}^{${i}}` : `${variable}^${i}`;
    terms.push(c === 1 ? power : `${c}${power}`);
  }
  return terms.length === 0 ? '0' : terms.join(' + ');
}
