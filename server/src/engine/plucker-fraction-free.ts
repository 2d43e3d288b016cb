/**
 * Plücker coordinates over the rationals by fraction-free elimination on
 * bigints: the walk of plucker-walk.ts with Bareiss updates.
 *
 * The rows are first cleared of denominators (scaling row i by the lcm of its
 * denominators multiplies every maximal minor by it). After d pivots each
 * entry is itself a (d+1)×(d+1) minor of the integer matrix (Sylvester's
 * identity), so every division below is exact and no fraction arises; each
 * result is divided by the product of the row scales at the end.
 *
 * This is the path for matrices whose minors are too large for the modular
 * path of plucker-multimodular.ts to pay off, and the reference that path is
 * tested against.
 */
import { walkColumnSets } from './plucker-walk.js';
import { QQ, lcmBigInt, type Rational } from './rational.js';
import { binomial } from './subsets.js';

/** How much bigint arithmetic one run did, per depth of the walk, for the benchmarks' arithmetic floor. */
export interface FractionFreeCounts {
  /** updates[d]: entry updates (a·b − c·d, divided by the previous pivot below depth 1) made at depth d. */
  updates: number[];
  /** pivotBits[d], previousBits[d]: the bit lengths of the pivots and previous pivots, summed over those updates. */
  pivotBits: number[];
  previousBits: number[];
}

function bitLength(x: bigint): number {
  return x === 0n ? 0 : (x < 0n ? -x : x).toString(16).length * 4;
}

interface BareissState {
  negative: boolean;
  previous: bigint;
}

/** The rows times the lcm of their denominators, and the product of those lcms. */
export function clearDenominators(rows: readonly (readonly Rational[])[]): { integers: bigint[][]; scale: bigint } {
  let scale = 1n;
  const integers = rows.map((row) => {
    let l = 1n;
    for (const x of row) if (x.den !== 1n) l = lcmBigInt(l, x.den);
    scale *= l;
    return l === 1n ? row.map((x) => x.num) : row.map((x) => (x.num * l) / x.den);
  });
  return { integers, scale };
}

/** m / scale as a rational in lowest terms (scale > 0). */
export function scaledRational(m: bigint, scale: bigint): Rational {
  return m === 0n ? QQ.zero : scale === 1n ? { num: m, den: 1n } : QQ.fromRational(m, scale);
}

/** The 2×2 minors a_i·b_j − a_j·b_i of the integer rows a, b, in lexicographic order of {i, j}. */
export function twoRowMinors(a: readonly bigint[], b: readonly bigint[], n: number): bigint[] {
  const out = new Array<bigint>((n * (n - 1)) / 2);
  let index = 0;
  for (let i = 0; i < n; i++) {
    const ai = a[i]!;
    const bi = b[i]!;
    for (let j = i + 1; j < n; j++) out[index++] = ai * b[j]! - a[j]! * bi;
  }
  return out;
}

/**
 * The 3×3 minors of the integer rows a, b, c, expanded along a:
 * a_x·M(y,z) − a_y·M(x,z) + a_z·M(x,y), where M are the 2×2 minors of b and
 * c, each found once (Laplace expansion). Three products per coordinate and
 * two per pair of columns, fewer than the walk's eliminations.
 */
export function threeRowMinors(a: readonly bigint[], b: readonly bigint[], c: readonly bigint[], n: number): bigint[] {
  const minors: bigint[] = new Array<bigint>(n * n).fill(0n);
  for (let y = 0; y < n; y++) {
    for (let z = y + 1; z < n; z++) minors[y * n + z] = b[y]! * c[z]! - b[z]! * c[y]!;
  }
  const out = new Array<bigint>((n * (n - 1) * (n - 2)) / 6);
  let index = 0;
  for (let x = 0; x < n; x++) {
    for (let y = x + 1; y < n; y++) {
      const mxy = minors[x * n + y]!;
      for (let z = y + 1; z < n; z++) out[index++] = a[x]! * minors[y * n + z]! - a[y]! * minors[x * n + z]! + a[z]! * mxy;
    }
  }
  return out;
}

/**
 * The 2×2 minors of a rational 2×n matrix, on the integers after clearing
 * denominators: what the walk computes for two rows, without its bookkeeping
 * (for so few products that is most of the cost).
 */
export function pluckerTwoRows(rows: readonly (readonly Rational[])[], n: number): Rational[] {
  const { integers, scale } = clearDenominators(rows);
  return twoRowMinors(integers[0]!, integers[1]!, n).map((m) => scaledRational(m, scale));
}

/** The 3×3 minors of a rational 3×n matrix, on the integers after clearing denominators (`threeRowMinors`). */
export function pluckerThreeRows(rows: readonly (readonly Rational[])[], n: number): Rational[] {
  const { integers, scale } = clearDenominators(rows);
  return threeRowMinors(integers[0]!, integers[1]!, integers[2]!, n).map((m) => scaledRational(m, scale));
}

/**
 * All C(n, k) maximal minors of the integer k×n matrix `integers` (k ≥ 1),
 * by fraction-free elimination, in lexicographic order of their column sets.
 */
export function fractionFreeMinors(integers: readonly (readonly bigint[])[], n: number, counts?: FractionFreeCounts): bigint[] {
  const k = integers.length;
  const out = new Array<bigint>(binomial(n, k)).fill(0n);
  let index = 0;
  walkColumnSets<bigint, BareissState>(k, n, integers.map((row) => row.slice()), { negative: false, previous: 1n }, {
    isZero: (e) => e === 0n,
    eliminate(level, count, q, c, width, state, next) {
      const pivotRow = level[q]!;
      const pivot = pivotRow[c]!;
      const previous = state.previous;
      if (counts !== undefined) {
        const d = k - count;
        const updates = (count - 1) * (width - 1 - c);
        counts.updates[d] = (counts.updates[d] ?? 0) + updates;
        counts.pivotBits[d] = (counts.pivotBits[d] ?? 0) + updates * bitLength(pivot);
        counts.previousBits[d] = (counts.previousBits[d] ?? 0) + updates * bitLength(previous);
      }
      let t = 0;
      for (let i = 0; i < count; i++) {
        if (i === q) continue;
        const row = level[i]!;
        const target = next[t++]!;
        const factor = row[c]!;
        // Sylvester's identity makes each quotient exact: the result is a minor of the integer matrix.
        if (previous === 1n) {
          for (let j = c + 1; j < width; j++) target[j] = pivot * row[j]! - factor * pivotRow[j]!;
        } else {
          for (let j = c + 1; j < width; j++) target[j] = (pivot * row[j]! - factor * pivotRow[j]!) / previous;
        }
      }
      return { negative: q % 2 === 0 ? state.negative : !state.negative, previous: pivot };
    },
    leaf(state, entry) {
      out[index++] = state.negative ? -entry : entry;
    },
    zeros(count) {
      index += count;
    },
  });
  return out;
}

/** All C(n, k) maximal minors of the rational k×n matrix `rows` (k ≥ 1), by fraction-free elimination. */
export function pluckerFractionFree(
  rows: readonly (readonly Rational[])[],
  n: number,
  counts?: FractionFreeCounts,
): Rational[] {
  const { integers, scale } = clearDenominators(rows);
  return fractionFreeMinors(integers, n, counts).map((m) => scaledRational(m, scale));
}
