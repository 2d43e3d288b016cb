/**
 * Dense polynomials in one variable with integer (bigint) coefficients,
 * constant term first, no trailing zero; the zero polynomial is []. The
 * factorisation over the rationals works on these: a polynomial over Q is a
 * rational constant times a primitive integer polynomial (Gauss's lemma).
 */
import { gcdBigInt } from '../rational.js';
import { INTEGERS, polynomialsOver } from './gcd-domain.js';

export type IntegerPolynomial = bigint[];

export function trimInteger(a: bigint[]): bigint[] {
  let end = a.length;
  while (end > 0 && a[end - 1] === 0n) end--;
  a.length = end;
  return a;
}

export function integerAdd(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  const out = new Array<bigint>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) out[i] = (a[i] ?? 0n) + (b[i] ?? 0n);
  return trimInteger(out);
}

export function integerSub(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  const out = new Array<bigint>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) out[i] = (a[i] ?? 0n) - (b[i] ?? 0n);
  return trimInteger(out);
}

export function integerMul(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  if (a.length === 0 || b.length === 0) return [];
  const out = new Array<bigint>(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    if (x === 0n) continue;
    for (let j = 0; j < b.length; j++) out[i + j]! += x * b[j]!;
  }
  return trimInteger(out);
}

/** a / b when b ≠ 0 divides a in Z[x], otherwise undefined. */
export function integerDivide(a: readonly bigint[], b: readonly bigint[]): bigint[] | undefined {
  return polynomialsOver(INTEGERS).divide(a.slice(), b.slice());
}

/** The gcd in Z[x], primitive with a positive leading coefficient times the gcd of the contents. */
export function integerGcd(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  return polynomialsOver(INTEGERS).gcd(a.slice(), b.slice());
}

/** The gcd of the coefficients, ≥ 0. */
export function integerContent(a: readonly bigint[]): bigint {
  let g = 0n;
  for (const c of a) {
    g = gcdBigInt(g, c);
    if (g === 1n) break;
  }
  return g;
}

/** a divided by its content and made to have a positive leading coefficient (zero stays zero). */
export function integerPrimitive(a: readonly bigint[]): bigint[] {
  if (a.length === 0) return [];
  let g = integerContent(a);
  if (a[a.length - 1]! < 0n) g = -g;
  return g === 1n ? a.slice() : a.map((c) => c / g);
}

export function integerDerivative(a: readonly bigint[]): bigint[] {
  const out: bigint[] = [];
  for (let i = 1; i < a.length; i++) out.push(BigInt(i) * a[i]!);
  return trimInteger(out);
}

/**
 * The sign of a(num/den) for den > 0: the sign of Σ a_i num^i den^(n−i),
 * which is den^n > 0 times the value.
 */
export function integerSignAt(a: readonly bigint[], num: bigint, den: bigint): -1 | 0 | 1 {
  let v = 0n;
  let denPower = 1n;
  for (let i = a.length - 1; i >= 0; i--) {
    v = v * num + a[i]! * denPower;
    denPower *= den;
  }
  return v < 0n ? -1 : v > 0n ? 1 : 0;
}

/** The representative of n modulo m in (−m/2, m/2]. */
export function symmetricMod(n: bigint, m: bigint): bigint {
  let r = n % m;
  if (r < 0n) r += m;
  return r > m / 2n ? r - m : r;
}

/** n modulo m in [0, m). */
export function positiveMod(n: bigint, m: bigint): bigint {
  const r = n % m;
  return r < 0n ? r + m : r;
}

/** The coefficients reduced into [0, m), trailing zeros removed. */
export function integerReduce(a: readonly bigint[], m: bigint): bigint[] {
  return trimInteger(a.map((c) => positiveMod(c, m)));
}

/** The integer square root ⌈√n⌉ of n ≥ 0. */
export function ceilSqrt(n: bigint): bigint {
  if (n < 2n) return n;
  let x = BigInt(Math.ceil(Math.sqrt(Number(n))));
  // Newton's method from a floating-point start, then a final adjustment to the ceiling.
  for (;;) {
    const y = (x + n / x) / 2n;
    if (y >= x) break;
    x = y;
  }
  while (x * x < n) x++;
  while (x > 0n && (x - 1n) * (x - 1n) >= n) x--;
  return x;
}
