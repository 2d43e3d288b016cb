/**
 * Dense polynomials in one variable over any `Field`, for the algorithms
 * that work coefficient by coefficient (factoring over finite fields).
 * Coefficients are listed constant term first with no trailing zero; the
 * zero polynomial is []. No function mutates its arguments.
 */
import { DivisionByZeroError, type Field } from '../field.js';

export function trimDense<T>(F: Field<T>, a: T[]): T[] {
  let end = a.length;
  while (end > 0 && F.isZero(a[end - 1]!)) end--;
  a.length = end;
  return a;
}

export function denseDegree<T>(a: readonly T[]): number {
  return a.length - 1;
}

export function denseAdd<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  const out = new Array<T>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) out[i] = i >= a.length ? b[i]! : i >= b.length ? a[i]! : F.add(a[i]!, b[i]!);
  return trimDense(F, out);
}

export function denseSub<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  const out = new Array<T>(Math.max(a.length, b.length));
  for (let i = 0; i < out.length; i++) out[i] = i >= b.length ? a[i]! : i >= a.length ? F.neg(b[i]!) : F.sub(a[i]!, b[i]!);
  return trimDense(F, out);
}

export function denseScale<T>(F: Field<T>, a: readonly T[], c: T): T[] {
  if (F.isZero(c)) return [];
  return a.map((x) => F.mul(c, x));
}

export function denseMul<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  if (a.length === 0 || b.length === 0) return [];
  const out = new Array<T>(a.length + b.length - 1).fill(F.zero);
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    if (F.isZero(x)) continue;
    for (let j = 0; j < b.length; j++) out[i + j] = F.add(out[i + j]!, F.mul(x, b[j]!));
  }
  return trimDense(F, out);
}

/** Quotient and remainder of a by b ≠ 0. */
export function denseDivMod<T>(F: Field<T>, a: readonly T[], b: readonly T[]): { quotient: T[]; remainder: T[] } {
  if (b.length === 0) throw new DivisionByZeroError('division of a polynomial by the zero polynomial');
  const db = b.length - 1;
  const r = a.slice();
  if (r.length - 1 < db) return { quotient: [], remainder: r };
  const q = new Array<T>(r.length - db).fill(F.zero);
  const inverse = F.inv(b[db]!);
  for (let d = r.length - 1; d >= db; d--) {
    const c = r[d]!;
    if (F.isZero(c)) continue;
    const factor = F.mul(c, inverse);
    q[d - db] = factor;
    for (let j = 0; j <= db; j++) r[d - db + j] = F.sub(r[d - db + j]!, F.mul(factor, b[j]!));
  }
  return { quotient: trimDense(F, q), remainder: trimDense(F, r) };
}

export function denseRem<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  return denseDivMod(F, a, b).remainder;
}

export function denseMonic<T>(F: Field<T>, a: readonly T[]): T[] {
  if (a.length === 0 || F.isOne(a[a.length - 1]!)) return a.slice();
  return denseScale(F, a, F.inv(a[a.length - 1]!));
}

/** The monic gcd ([] when both are zero). */
export function denseGcd<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  let x: T[] = a.slice();
  let y: T[] = b.slice();
  while (y.length > 0) [x, y] = [y, denseRem(F, x, y)];
  return denseMonic(F, x);
}

/**
 * The monic gcd g with Bézout cofactors s, t: s·a + t·b = g, by the extended
 * Euclidean algorithm. For coprime a, b of positive degree, deg s < deg b and
 * deg t < deg a.
 */
export function denseExtendedGcd<T>(F: Field<T>, a: readonly T[], b: readonly T[]): { gcd: T[]; s: T[]; t: T[] } {
  let [r0, r1] = [a.slice(), b.slice()];
  let [s0, s1]: T[][] = [[F.one], []];
  let [t0, t1]: T[][] = [[], [F.one]];
  while (r1.length > 0) {
    const { quotient, remainder } = denseDivMod(F, r0, r1);
    [r0, r1] = [r1, remainder];
    [s0, s1] = [s1, denseSub(F, s0, denseMul(F, quotient, s1))];
    [t0, t1] = [t1, denseSub(F, t0, denseMul(F, quotient, t1))];
  }
  if (r0.length === 0) return { gcd: [], s: [], t: [] };
  const inverse = F.inv(r0[r0.length - 1]!);
  return { gcd: denseScale(F, r0, inverse), s: denseScale(F, s0, inverse), t: denseScale(F, t0, inverse) };
}

/** base^exponent mod modulus (a nonzero polynomial), by repeated squaring. */
export function densePowMod<T>(F: Field<T>, base: readonly T[], exponent: bigint, modulus: readonly T[]): T[] {
  let result = denseRem(F, [F.one], modulus);
  let b = denseRem(F, base, modulus);
  for (let e = exponent; e > 0n; e >>= 1n) {
    if (e & 1n) result = denseRem(F, denseMul(F, result, b), modulus);
    if (e > 1n) b = denseRem(F, denseMul(F, b, b), modulus);
  }
  return result;
}

export function denseDerivative<T>(F: Field<T>, a: readonly T[]): T[] {
  const out: T[] = [];
  for (let i = 1; i < a.length; i++) out.push(F.mul(F.fromBigInt(BigInt(i)), a[i]!));
  return trimDense(F, out);
}

export function isDenseOne<T>(F: Field<T>, a: readonly T[]): boolean {
  return a.length === 1 && F.isOne(a[0]!);
}
