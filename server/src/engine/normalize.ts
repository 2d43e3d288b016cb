/**
 * Choosing a representative of a projective point: a nonzero vector up to a
 * nonzero scalar, such as a Plücker vector, shown in a canonical scaling.
 */
import type { Field } from './field.js';
import { QQ, gcdBigInt, lcmBigInt, type Rational } from './rational.js';

/**
 * 'raw': as computed. 'first-one': the first nonzero coordinate is 1.
 * 'primitive' (rationals only): integers with gcd 1 whose first nonzero
 * coordinate is positive.
 */
export type Normalization = 'raw' | 'first-one' | 'primitive' | 'positive';

export interface NormalizedPoint<T> {
  /** scale · input, coordinate by coordinate. */
  values: T[];
  /** The nonzero factor applied. */
  scale: T;
  /**
   * The normalization actually applied: 'primitive' and 'positive' fall back to 'first-one' outside the
   * rationals, and 'positive' to 'primitive' when the coordinates have both signs.
   */
  mode: Normalization;
}

/**
 * Rescales `values` as `mode` asks. The zero vector is no projective point;
 * it is returned unchanged with scale 1.
 */
export function normalizePoint<T>(F: Field<T>, values: readonly T[], mode: Normalization): NormalizedPoint<T> {
  const rational = (F as unknown) === QQ;
  // 'positive' asks for a representative with every coordinate ≥ 0 (totally nonnegative work). It exists
  // exactly when the nonzero coordinates share one sign; it is then the primitive vector. Otherwise the
  // primitive vector is shown, and the mode says so.
  const oneSign = rational && sharesOneSign(values as unknown as readonly Rational[]);
  const applied: Normalization =
    (mode === 'primitive' || mode === 'positive') && !rational
      ? 'first-one'
      : mode === 'positive' && !oneSign
        ? 'primitive'
        : mode;
  const first = values.findIndex((x) => !F.isZero(x));
  if (applied === 'raw' || first < 0) return { values: values.slice(), scale: F.one, mode: applied };
  if (applied === 'primitive' || applied === 'positive') {
    const scale = primitiveScale(values as unknown as readonly Rational[], first) as unknown as T;
    return { values: values.map((x) => F.mul(scale, x)), scale, mode: applied };
  }
  const scale = F.inv(values[first]!);
  return { values: values.map((x) => F.mul(scale, x)), scale, mode: 'first-one' };
}

/**
 * The rational s making s·values integral and primitive with a positive first
 * nonzero entry: lcm of the denominators over gcd of the cleared numerators,
 * with the sign of the first nonzero entry.
 */
function primitiveScale(values: readonly Rational[], first: number): Rational {
  let l = 1n;
  for (const x of values) if (x.num !== 0n) l = lcmBigInt(l, x.den);
  let g = 0n;
  for (const x of values) if (x.num !== 0n) g = gcdBigInt(g, (x.num * l) / x.den);
  const sign = values[first]!.num < 0n ? -1n : 1n;
  return QQ.fromRational(sign * l, g);
}

/** Whether the nonzero entries all have one sign. */
function sharesOneSign(values: readonly Rational[]): boolean {
  let positive = false;
  let negative = false;
  for (const x of values) {
    if (x.num > 0n) positive = true;
    else if (x.num < 0n) negative = true;
  }
  return !(positive && negative);
}

/** Both vectors are nonzero, of the same length, and each is a scalar multiple of the other. */
export function projectivelyEqual<T>(F: Field<T>, a: readonly T[], b: readonly T[]): boolean {
  if (a.length !== b.length) return false;
  const i = a.findIndex((x) => !F.isZero(x));
  if (i < 0 || F.isZero(b[i]!)) return false;
  // With a_i, b_i ≠ 0, proportionality is a_j·b_i = b_j·a_i for every j (this also makes b nonzero).
  const ai = a[i]!;
  const bi = b[i]!;
  return a.every((x, j) => F.eq(F.mul(x, bi), F.mul(b[j]!, ai)));
}
