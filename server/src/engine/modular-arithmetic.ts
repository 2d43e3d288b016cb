/**
 * Exact arithmetic modulo a number p < 2^31 on plain JavaScript numbers, for
 * the hot loops of the engine (prime fields, Plücker coordinates by elimination
 * modulo primes). Every residue is an integer in [0, p).
 *
 * Why it is exact. A product of two residues can reach 2^62, past 2^53 where
 * doubles stop being exact, so it is never formed in a double. Instead:
 *
 * 1. The quotient q ≈ S / p of the exact value S (a·b, x + a·b, or a dot
 *    product of at most four terms a·b + c·d + …) is estimated in floating
 *    point as v ≈ S/p + 1/2 and rounded down. With u = 2^−53, each of the at
 *    most ten roundings involved (the products, the sums, the reciprocal 1/p,
 *    the multiplication by it, the added 1/2) has relative error at most u, so
 *    v is off by less than 10.01·u·(S/p + 1). In every kernel below
 *    S/p < 4p < 2^33 (all arguments are residues, below p), so v is off by
 *    less than 2^−16, q = ⌊v⌋ satisfies |S/p − q| < 1/2 + 2^−16, and
 *    |S − q·p| < p/2 + p·2^−16 < 2^31.
 * 2. The remainder S − q·p is then computed modulo 2^32 with Math.imul, which
 *    gives the low 32 bits of a product of 32-bit integers exactly (the sum of
 *    at most five such values is below 2^34 in size, so adding them in a
 *    double is exact). Because
 *    the true remainder lies in [−2^31, 2^31), its value modulo 2^32, read as
 *    a signed 32-bit integer (`| 0`), is the remainder itself.
 *
 * Only q modulo 2^32 enters step 2, so the rounding may use `| 0` (which keeps
 * the value modulo 2^32) even when q exceeds 2^31. A negative remainder is
 * brought into [0, p) by adding p once, without a branch: r + ((r >> 31) & p),
 * where r >> 31 is −1 for negative r and 0 otherwise. On residues spread over
 * [0, p) the sign of r is a coin toss, so a conditional would be a branch the
 * processor mispredicts half of the time; measured on random residues below
 * 2^31 − 1, a loop of two-term dot products ran four times faster this way.
 * (The technique of estimating the
 * quotient in floating point and correcting in integer arithmetic is common
 * practice, no source; the error bound is the standard model of IEEE 754
 * rounding.) The tests compare every kernel with bigint arithmetic at the
 * largest residues of the largest admissible moduli.
 */

/** Moduli must be below this for the kernels here to be exact. */
export const MODULAR_LIMIT = 2 ** 31;

/** a·b mod p; `reciprocal` is 1 / p as a double. */
export function mulMod(a: number, b: number, p: number, reciprocal: number): number {
  const q = (a * b * reciprocal + 0.5) | 0;
  const r = (Math.imul(a, b) - Math.imul(q, p)) | 0;
  return r + ((r >> 31) & p);
}

/** (x + a·b) mod p. */
export function mulAddMod(x: number, a: number, b: number, p: number, reciprocal: number): number {
  const q = ((x + a * b) * reciprocal + 0.5) | 0;
  const r = (x + Math.imul(a, b) - Math.imul(q, p)) | 0;
  return r + ((r >> 31) & p);
}

/** (a·b + c·d) mod p, with a single reduction. */
export function dotMod(a: number, b: number, c: number, d: number, p: number, reciprocal: number): number {
  const q = ((a * b + c * d) * reciprocal + 0.5) | 0;
  const r = (Math.imul(a, b) + Math.imul(c, d) - Math.imul(q, p)) | 0;
  return r + ((r >> 31) & p);
}

/** (a·b + c·d + e·f) mod p, with a single reduction. */
export function dot3Mod(a: number, b: number, c: number, d: number, e: number, f: number, p: number, reciprocal: number): number {
  const q = ((a * b + c * d + e * f) * reciprocal + 0.5) | 0;
  const r = (Math.imul(a, b) + Math.imul(c, d) + Math.imul(e, f) - Math.imul(q, p)) | 0;
  return r + ((r >> 31) & p);
}

/** (a·b + c·d + e·f + g·h) mod p, with a single reduction. */
export function dot4Mod(
  a: number,
  b: number,
  c: number,
  d: number,
  e: number,
  f: number,
  g: number,
  h: number,
  p: number,
  reciprocal: number,
): number {
  const q = ((a * b + c * d + e * f + g * h) * reciprocal + 0.5) | 0;
  const r = (Math.imul(a, b) + Math.imul(c, d) + Math.imul(e, f) + Math.imul(g, h) - Math.imul(q, p)) | 0;
  return r + ((r >> 31) & p);
}

/** −a mod p. */
export function negMod(a: number, p: number): number {
  return a === 0 ? 0 : p - a;
}

/**
 * The inverse of a modulo p, for a in (0, p) coprime to p, by the extended
 * Euclidean algorithm. Every remainder and cofactor stays below p in absolute
 * value, so all steps are exact on numbers.
 */
export function invMod(a: number, p: number): number {
  // Invariant: r0 ≡ s0·a and r1 ≡ s1·a (mod p).
  let r0 = p;
  let r1 = a;
  let s0 = 0;
  let s1 = 1;
  while (r1 !== 0) {
    const q = Math.floor(r0 / r1);
    const r2 = r0 - q * r1;
    r0 = r1;
    r1 = r2;
    const s2 = s0 - q * s1;
    s0 = s1;
    s1 = s2;
  }
  return s0 < 0 ? s0 + p : s0;
}
