/**
 * The number of monic irreducible polynomials of degree n over GF(q), by Gauss's formula
 * (1/n) Σ_{d | n} μ(d) q^(n/d) (the necklace formula, from memory; OEIS A001037 for q = 2), with the
 * Möbius function by trial division. Shared by the tests of the finite-field code.
 */

/** The Möbius function by trial division. */
export function mobius(n: number): number {
  let result = 1;
  let rest = n;
  for (let d = 2; d * d <= rest; d++) {
    if (rest % d !== 0) continue;
    rest /= d;
    if (rest % d === 0) return 0;
    result = -result;
  }
  return rest > 1 ? -result : result;
}

/** Gauss's count of monic irreducibles of degree n over GF(q). */
export function irreducibleCount(q: number, n: number): number {
  let sum = 0;
  for (let d = 1; d <= n; d++) if (n % d === 0) sum += mobius(d) * q ** (n / d);
  return sum / n;
}
