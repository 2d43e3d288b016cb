// A deliberately plain model of GF(p)[x] and GF(p)[x]/(f), written for the tests
// only: schoolbook products, long division, and brute-force irreducibility and
// order computations, sharing no code with the engine. The engine's tables and
// tests of irreducibility are checked against it.

/** Long-division remainder of a by a monic f (coefficients constant first, entries in [0, p)). */
export function naiveRemainder(a: readonly number[], f: readonly number[], p: number): number[] {
  const r = a.slice();
  const m = f.length - 1;
  for (let d = r.length - 1; d >= m; d--) {
    const c = r[d]!;
    if (c === 0) continue;
    for (let j = 0; j <= m; j++) r[d - m + j] = (((r[d - m + j]! - c * f[j]!) % p) + p) % p;
  }
  // Pad or cut to exactly m coefficients, the shape of an element of GF(p)[x]/(f).
  return Array.from({ length: m }, (_, i) => r[i] ?? 0);
}

/** The product of two residues modulo a monic f of degree m, each given by m coefficients. */
export function naiveMulMod(a: readonly number[], b: readonly number[], f: readonly number[], p: number): number[] {
  const product = new Array<number>(a.length + b.length).fill(0);
  a.forEach((x, i) => b.forEach((y, j) => (product[i + j] = (product[i + j]! + x * y) % p)));
  return naiveRemainder(product, f, p);
}

export function naiveAdd(a: readonly number[], b: readonly number[], p: number): number[] {
  return a.map((x, i) => (x + b[i]!) % p);
}

/** Base-p digits, constant first, as the engine's element numbering promises. */
export function encode(c: readonly number[], p: number): number {
  return c.reduceRight((acc, x) => acc * p + x, 0);
}

export function decode(x: number, p: number, m: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < m; i++, x = Math.floor(x / p)) out.push(x % p);
  return out;
}

/** The monic polynomials of degree d, constant first, in no particular order. */
export function allMonic(p: number, d: number): number[][] {
  const out: number[][] = [];
  for (let n = 0; n < p ** d; n++) out.push([...decode(n, p, d), 1]);
  return out;
}

/** Irreducible when no monic polynomial of degree 1..⌊m/2⌋ divides it (every reducible f has such a factor). */
export function bruteIsIrreducible(f: readonly number[], p: number): boolean {
  const m = f.length - 1;
  if (m < 1) return false;
  for (let d = 1; 2 * d <= m; d++) {
    for (const g of allMonic(p, d)) {
      if (naiveRemainder(f, g, p).every((c) => c === 0)) return false;
    }
  }
  return true;
}

/** The least k ≥ 1 with x^k ≡ 1 (mod f), by repeated multiplication; undefined when there is none. */
export function bruteOrderOfX(f: readonly number[], p: number): number | undefined {
  const m = f.length - 1;
  const one = naiveRemainder([1], f, p);
  const x = naiveRemainder([0, 1], f, p);
  let power = x.slice();
  // The units of GF(p)[x]/(f) number fewer than p^m, so an order, if any, is below p^m.
  for (let k = 1; k < p ** m; k++) {
    if (power.every((c, i) => c === one[i])) return k;
    power = naiveMulMod(power, x, f, p);
  }
  return undefined;
}
