/**
 * Choosing a representative of a projective point: a nonzero vector up to a
 * nonzero scalar, such as a Plücker vector, shown in a canonical scaling.
 */
import { polynomialRepresentative } from './polynomials/projective-polynomials.js';
import type { RationalFunction, RationalFunctionField } from './polynomials/rational-function-field.js';
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

/** What `normalizePoint` does to a vector, without doing it. */
export interface PointScaling<T> {
  /** The nonzero factor. */
  scale: T;
  /** The normalization applied (see `NormalizedPoint.mode`). */
  mode: Normalization;
  /**
   * False when the vector is kept as it is (the 'raw' mode, or the zero vector); the coordinates are then
   * the input ones, not multiplied by the scale.
   */
  rescales: boolean;
}

/**
 * The factor and mode of `normalizePoint(F, values, mode)`, in one pass over
 * the coordinates that makes no new ones: a caller that shows a few
 * coordinates of a long vector multiplies just those (`normalizedCoordinate`).
 */
export function pointScaling<T>(F: Field<T>, values: readonly T[], mode: Normalization): PointScaling<T> {
  // Over rational functions (a family), primitive means polynomial coordinates without common factor.
  const family = (F as { family?: RationalFunctionField<unknown> }).family;
  if (family && (mode === 'primitive' || mode === 'positive')) {
    if (values.every((x) => F.isZero(x))) return { scale: F.one, mode: 'primitive', rescales: false };
    const { scale } = polynomialRepresentative(family, values as unknown as readonly RationalFunction<unknown>[]);
    return { scale: scale as unknown as T, mode: 'primitive', rescales: true };
  }
  const rational = (F as unknown) === QQ;
  // 'positive' asks for a representative with every coordinate ≥ 0 (totally nonnegative work). It exists
  // exactly when the nonzero coordinates share one sign; it is then the primitive vector. Otherwise the
  // primitive vector is shown, and the mode says so.
  const oneSign = rational && mode === 'positive' && sharesOneSign(values as unknown as readonly Rational[]);
  const applied: Normalization =
    (mode === 'primitive' || mode === 'positive') && !rational
      ? 'first-one'
      : mode === 'positive' && !oneSign
        ? 'primitive'
        : mode;
  const first = values.findIndex((x) => !F.isZero(x));
  if (applied === 'raw' || first < 0) return { scale: F.one, mode: applied, rescales: false };
  if (applied === 'primitive' || applied === 'positive') {
    return { scale: primitiveScale(values as unknown as readonly Rational[], first) as unknown as T, mode: applied, rescales: true };
  }
  return { scale: F.inv(values[first]!), mode: 'first-one', rescales: true };
}

/** One coordinate of the normalized vector: the input coordinate `x` as `scaling` rescales it. */
export function normalizedCoordinate<T>(F: Field<T>, scaling: PointScaling<T>, x: T): T {
  return scaling.rescales ? F.mul(scaling.scale, x) : x;
}

/**
 * Rescales `values` as `mode` asks. The zero vector is no projective point;
 * it is returned unchanged with scale 1.
 */
export function normalizePoint<T>(F: Field<T>, values: readonly T[], mode: Normalization): NormalizedPoint<T> {
  const scaling = pointScaling(F, values, mode);
  const { scale } = scaling;
  return { values: scaling.rescales ? values.map((x) => F.mul(scale, x)) : values.slice(), scale, mode: scaling.mode };
}

/**
 * The rational s making s·values integral and primitive with a positive first
 * nonzero entry: lcm of the denominators over gcd of the cleared numerators,
 * with the sign of the first nonzero entry.
 */
function primitiveScale(values: readonly Rational[], first: number): Rational {
  let l = 1n;
  // lcm(l, 1) = l: integer entries, the usual case, need no bigint arithmetic here.
  for (const x of values) if (x.num !== 0n && x.den !== 1n) l = lcmBigInt(l, x.den);
  let g = 0n;
  for (const x of values) {
    if (x.num === 0n) continue;
    const m = l === 1n ? x.num : (x.num * l) / x.den;
    // A multiple of the gcd so far leaves it as it is; one remainder is far cheaper than Euclid's algorithm.
    if (g !== 0n && m % g === 0n) continue;
    g = gcdBigInt(g, m);
    // No later entry can lower a gcd of 1.
    if (g === 1n) break;
  }
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
    if (positive && negative) return false;
  }
  return true;
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
