/**
 * The arithmetic floor: the multiply-adds an instrumented run of our algorithm
 * performed, each kind counted separately, executed again in tight loops over
 * arrays of random numbers of the same kind and size, and nothing else. The
 * time of the walk above this is what its bookkeeping costs.
 */
// The kernels the walks use (branch-free last step), so that the floor does the same operations.
import { dot3Mod, dot4Mod, dotMod, mulAddMod, mulMod } from '../server/src/engine/modular-arithmetic.js';
import type { ModularWalkCounts } from '../server/src/engine/plucker-modular.js';
import type { FractionFreeCounts } from '../server/src/engine/plucker-fraction-free.js';
import { Random } from './random.js';

const BLOCK = 4096;

/** Random residues modulo p, in blocks reused by every kernel loop. */
function residues(p: number, seed: number): Int32Array {
  const random = new Random(seed);
  return Int32Array.from({ length: BLOCK }, () => random.integer(0, p - 1));
}

/**
 * The counted modular operations, each kind in its own tight loop over blocks
 * of random residues. As in the walk, one operand of each product is the same
 * for a whole row of the loop (the factor of an eliminated row, the scaled
 * entries of the first row of a Laplace expansion) and the others are read
 * from arrays; p is an argument, so nothing is folded into constants.
 */
function runModularFloor(counts: ModularWalkCounts, p: number, a: Int32Array, b: Int32Array, c: Int32Array, out: Int32Array): number {
  const r = 1 / p;
  const f = a[7]!;
  const g = b[11]!;
  const h = c[13]!;
  for (let left = counts.updates; left > 0; left -= BLOCK) {
    const m = Math.min(left, BLOCK);
    for (let i = 0; i < m; i++) out[i] = mulAddMod(a[i]!, f, b[i]!, p, r);
  }
  for (let left = counts.dots; left > 0; left -= BLOCK) {
    const m = Math.min(left, BLOCK);
    for (let i = 0; i < m; i++) out[i] = dotMod(f, a[i]!, g, b[i]!, p, r);
  }
  for (let left = counts.triples; left > 0; left -= BLOCK) {
    const m = Math.min(left, BLOCK);
    for (let i = 0; i < m; i++) out[i] = dot3Mod(f, a[i]!, g, b[i]!, c[i]!, h, p, r);
  }
  for (let left = counts.quadruples; left > 0; left -= BLOCK) {
    const m = Math.min(left, BLOCK);
    for (let i = 0; i < m; i++) out[i] = dot4Mod(f, a[i]!, g, b[i]!, h, c[i]!, a[i]!, g, p, r);
  }
  for (let left = counts.products; left > 0; left -= BLOCK) {
    const m = Math.min(left, BLOCK);
    for (let i = 0; i < m; i++) out[i] = mulMod(a[i]!, b[i]!, p, r);
  }
  return out[0]!;
}

/** A function that performs the counted modular operations once (mod p). */
export function modularFloor(counts: ModularWalkCounts, p: number): () => number {
  const a = residues(p, 1);
  const b = residues(p, 2);
  const c = residues(p, 3);
  const out = new Int32Array(BLOCK);
  return () => runModularFloor(counts, p, a, b, c, out);
}

/** Random bigints of about `bits` bits (at least 1), `count` of them. */
function bigints(meanBits: number, count: number, random: Random): bigint[] {
  const bits = Math.max(1, Math.round(meanBits));
  const limbs = Math.max(1, Math.ceil(bits / 64));
  return Array.from({ length: count }, () => {
    let x = 0n;
    for (let i = 0; i < limbs; i++) x = (x << 64n) | random.next64();
    x >>= BigInt(limbs * 64 - bits);
    return x | 1n;
  });
}

const BIG_BLOCK = 256;

/**
 * A function that performs the counted fraction-free updates once: at each
 * depth, that many (a·b − c·d) / e on bigints of the mean sizes seen there.
 */
export function fractionFreeFloor(counts: FractionFreeCounts): () => bigint {
  const random = new Random(7);
  const levels = counts.updates.map((updates, d) => {
    const pivotBits = updates > 0 ? counts.pivotBits[d]! / updates : 1;
    const previousBits = updates > 0 ? counts.previousBits[d]! / updates : 1;
    return {
      updates,
      divide: d > 0,
      x: bigints(pivotBits, BIG_BLOCK, random),
      y: bigints(pivotBits, BIG_BLOCK, random),
      e: bigints(previousBits, BIG_BLOCK, random),
    };
  });
  return () => {
    let sink = 0n;
    for (const { updates, divide, x, y, e } of levels) {
      for (let left = updates; left > 0; left -= BIG_BLOCK) {
        const m = Math.min(left, BIG_BLOCK);
        if (divide) for (let i = 0; i < m; i++) sink = (x[i]! * y[i]! - y[m - 1 - i]! * x[m - 1 - i]!) / e[i]!;
        else for (let i = 0; i < m; i++) sink = x[i]! * y[i]! - y[m - 1 - i]! * x[m - 1 - i]!;
      }
    }
    return sink;
  };
}

/** A function that performs `count` bigint multiply-adds m·p + v with m of about `bits` bits and p, v below 2^31. */
export function bigintHornerFloor(count: number, bits: number): () => bigint {
  const random = new Random(11);
  const x = bigints(bits, BIG_BLOCK, random);
  const p = BigInt(2 ** 31 - 1);
  return () => {
    let sink = 0n;
    for (let left = count; left > 0; left -= BIG_BLOCK) {
      const m = Math.min(left, BIG_BLOCK);
      for (let i = 0; i < m; i++) sink = x[i]! * p + BigInt(i);
    }
    return sink;
  };
}

/** One group of bigint dot products for `bigintProductFloor`. */
export interface ProductGroup {
  /** How many dot products. */
  count: number;
  /** Products per dot product. */
  terms: number;
  /** Mean bit lengths of the two factors of each product. */
  xBits: number;
  yBits: number;
}

/** A function that performs the counted bigint dot products once, on random bigints of the given sizes. */
export function bigintProductFloor(groups: readonly ProductGroup[]): () => bigint {
  const random = new Random(13);
  const prepared = groups.map((g) => ({ ...g, x: bigints(g.xBits, BIG_BLOCK, random), y: bigints(g.yBits, BIG_BLOCK, random) }));
  return () => {
    let sink = 0n;
    for (const { count, terms, x, y } of prepared) {
      for (let left = count; left > 0; left -= BIG_BLOCK) {
        const m = Math.min(left, BIG_BLOCK);
        for (let i = 0; i < m; i++) {
          let s = x[i]! * y[i]!;
          for (let t = 1; t < terms; t++) s -= x[(i + t) % BIG_BLOCK]! * y[(i + 2 * t) % BIG_BLOCK]!;
          sink = s;
        }
      }
    }
    return sink;
  };
}
