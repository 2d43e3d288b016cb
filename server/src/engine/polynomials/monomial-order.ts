/**
 * Monomials as exponent vectors, and the one monomial order every sparse
 * polynomial in the engine is kept in.
 *
 * The order is graded reverse lexicographic (grevlex) with the variables in
 * the order they were declared, the first one largest: a monomial of higher
 * total degree comes first; between monomials of equal total degree, the one
 * with the smaller exponent in the last variable where they differ comes
 * first. For the variables (s, t) this lists s^2, s t, t^2, s, t, 1, which is
 * how a polynomial is usually read. Being a monomial order, it is preserved by
 * multiplying by a monomial, which keeps shifted term lists sorted.
 */

/** One exponent per variable of the ring, each a nonnegative integer. */
export type Exponents = readonly number[];

/** Positive when a comes before b (a is larger), negative when after, 0 when equal. */
export function compareMonomials(a: Exponents, b: Exponents): number {
  let da = 0;
  let db = 0;
  for (let i = 0; i < a.length; i++) {
    da += a[i]!;
    db += b[i]!;
  }
  if (da !== db) return da - db;
  for (let i = a.length - 1; i >= 0; i--) {
    if (a[i] !== b[i]) return b[i]! - a[i]!;
  }
  return 0;
}

/** A text key for maps of monomials; equal exactly for equal exponent vectors. */
export function monomialKey(e: Exponents): string {
  return e.join(',');
}

export function multiplyMonomials(a: Exponents, b: Exponents): number[] {
  const out = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) out[i] = a[i]! + b[i]!;
  return out;
}

/** a / b when b divides a (every exponent of b at most that of a), otherwise undefined. */
export function divideMonomials(a: Exponents, b: Exponents): number[] | undefined {
  const out = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) {
    const d = a[i]! - b[i]!;
    if (d < 0) return undefined;
    out[i] = d;
  }
  return out;
}

export function totalDegreeOf(e: Exponents): number {
  let d = 0;
  for (const x of e) d += x;
  return d;
}

/** The componentwise minimum: the largest monomial dividing both. */
export function monomialGcd(a: Exponents, b: Exponents): number[] {
  return a.map((x, i) => Math.min(x, b[i]!));
}
