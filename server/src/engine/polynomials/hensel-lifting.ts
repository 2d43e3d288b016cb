/**
 * Hensel lifting: from a factorisation of an integer polynomial modulo a
 * prime p to one modulo p^k, as the factorisation over the rationals needs.
 *
 * The two-factor step is the quadratic one (von zur Gathen and Gerhard,
 * Modern Computer Algebra, Algorithm 15.10, from memory): from
 * f ≡ g·h and s·g + t·h ≡ 1 modulo m, with h monic, it produces the same
 * congruences modulo m^2. Several factors are lifted along a balanced tree:
 * the list is split in two halves, their products are lifted, and each half
 * is lifted further against its own lifted product. The result is checked by
 * multiplying it out, so a wrong lift can never pass unnoticed into a claim of
 * irreducibility.
 */
import type { Field } from '../field.js';
import { primeField } from '../prime-field.js';
import { denseExtendedGcd } from './dense-polynomial.js';
import { integerAdd, integerMul, integerReduce, integerSub, positiveMod, trimInteger } from './integer-polynomial.js';

function mulMod(a: readonly bigint[], b: readonly bigint[], m: bigint): bigint[] {
  return integerReduce(integerMul(a, b), m);
}

/** The inverse of a modulo m (gcd(a, m) = 1), by the extended Euclidean algorithm. */
function inverseMod(a: bigint, m: bigint): bigint {
  let [r0, r1] = [positiveMod(a, m), m];
  let [s0, s1] = [1n, 0n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1n) throw new RangeError(`${a} is not invertible modulo ${m}`);
  return positiveMod(s0, m);
}

/** Quotient and remainder modulo m of a by a polynomial b with leading coefficient 1. */
function divModMonic(a: readonly bigint[], b: readonly bigint[], m: bigint): { quotient: bigint[]; remainder: bigint[] } {
  const db = b.length - 1;
  const r = integerReduce(a, m);
  if (r.length - 1 < db) return { quotient: [], remainder: r };
  const q = new Array<bigint>(r.length - db).fill(0n);
  for (let d = r.length - 1; d >= db; d--) {
    const c = positiveMod(r[d]!, m);
    if (c === 0n) continue;
    q[d - db] = c;
    for (let j = 0; j <= db; j++) r[d - db + j] = positiveMod(r[d - db + j]! - c * b[j]!, m);
  }
  return { quotient: trimInteger(q), remainder: integerReduce(r, m) };
}

interface Lifted {
  g: bigint[];
  h: bigint[];
  s: bigint[];
  t: bigint[];
}

/** One step of Algorithm 15.10, carried out modulo M for a modulus M dividing m^2. */
function henselStep(f: readonly bigint[], { g, h, s, t }: Lifted, M: bigint): Lifted {
  // e = f − g·h; s·e = q·h + r; g* = g + t·e + q·g, h* = h + r.
  const e = integerReduce(integerSub(f, integerMul(g, h)), M);
  const { quotient: q, remainder: r } = divModMonic(mulMod(s, e, M), h, M);
  const gNew = integerReduce(integerAdd(g, integerAdd(integerMul(t, e), integerMul(q, g))), M);
  const hNew = integerReduce(integerAdd(h, r), M);
  // b = s·g* + t·h* − 1; s·b = c·h* + d; s* = s − d, t* = t − t·b − c·g*.
  const b = integerReduce(integerSub(integerAdd(integerMul(s, gNew), integerMul(t, hNew)), [1n]), M);
  const { quotient: c, remainder: d } = divModMonic(mulMod(s, b, M), hNew, M);
  const sNew = integerReduce(integerSub(s, d), M);
  const tNew = integerReduce(integerSub(t, integerAdd(integerMul(t, b), integerMul(c, gNew))), M);
  return { g: gNew, h: hNew, s: sNew, t: tNew };
}

function productMod(factors: readonly (readonly bigint[])[], m: bigint): bigint[] {
  return factors.reduce<bigint[]>((acc, u) => mulMod(acc, u, m), [1n]);
}

/** The Bézout cofactors of g and h modulo p (coprime there), as integer polynomials. */
function bezoutModP(g: readonly bigint[], h: readonly bigint[], p: bigint): { s: bigint[]; t: bigint[] } {
  const Fp = primeField(p) as Field<any>;
  const toField = (a: readonly bigint[]) => a.map((c) => Fp.fromBigInt(c));
  const { gcd, s, t } = denseExtendedGcd(Fp, toField(g), toField(h));
  if (gcd.length !== 1) throw new Error('Hensel lifting: the factors are not coprime modulo p');
  const back = (a: readonly unknown[]) => a.map((c) => BigInt(Fp.format(c)));
  return { s: back(s), t: back(t) };
}

/** Lifts f ≡ lc(f)·Π us modulo p to the same modulo M = p^k; each returned factor is monic modulo M. */
function liftTree(f: readonly bigint[], us: readonly (readonly bigint[])[], p: bigint, M: bigint): bigint[][] {
  const lead = f[f.length - 1]!;
  if (us.length === 1) {
    const inverse = inverseMod(lead, M);
    return [integerReduce(f.map((c) => c * inverse), M)];
  }
  const half = Math.floor(us.length / 2);
  const left = us.slice(0, half);
  const right = us.slice(half);
  const g0 = integerReduce(productMod(left, p).map((c) => c * lead), p);
  const h0 = productMod(right, p);
  let state: Lifted = { g: g0, h: h0, ...bezoutModP(g0, h0, p) };
  for (let m = p; m < M; ) {
    const next = m * m < M ? m * m : M;
    state = henselStep(f, state, next);
    m = next;
  }
  return [...liftTree(state.g, left, p, M), ...liftTree(state.h, right, p, M)];
}

/**
 * Given f ∈ Z[x] and monic u_1, …, u_r, pairwise coprime modulo the prime p
 * (which does not divide lc(f)), with f ≡ lc(f)·u_1⋯u_r (mod p), the monic
 * U_i ≡ u_i (mod p) with f ≡ lc(f)·U_1⋯U_r (mod p^k), coefficients in [0, p^k).
 */
export function henselLift(f: readonly bigint[], factors: readonly (readonly bigint[])[], p: bigint, k: number): bigint[][] {
  const M = p ** BigInt(k);
  const lifted = liftTree(f, factors, p, M);
  const lead = f[f.length - 1]!;
  const check = integerReduce(productMod(lifted, M).map((c) => c * lead), M);
  const target = integerReduce(f, M);
  if (check.length !== target.length || check.some((c, i) => c !== target[i])) {
    throw new Error('Hensel lifting produced factors whose product is not f modulo p^k');
  }
  return lifted;
}
