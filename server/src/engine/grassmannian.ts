/**
 * Counting facts about Grassmannians and the exhaustive list of the
 * k-subspaces of GF(q)^n, for prime fields and extension fields alike.
 */
import type { Field } from './field.js';
import { finiteFieldElement, finiteFieldOrder } from './finite-fields.js';
import { subsets } from './subsets.js';

/** dim G(k, n) = k(n − k): the number of free entries in a chart. */
export function grassmannianDimension(k: number, n: number): number {
  if (!Number.isInteger(n) || n < 0 || !Number.isInteger(k) || k < 0 || k > n) {
    throw new RangeError(`grassmannianDimension: need integers 0 ≤ k ≤ n, got k = ${k}, n = ${n}`);
  }
  return k * (n - k);
}

/**
 * The Gaussian binomial coefficient [n choose k]_q. For q a prime power it is
 * the number of k-dimensional subspaces of GF(q)^n; at q = 1 it is C(n, k).
 * It is 0 when k < 0 or k > n.
 */
export function gaussianBinomial(n: number, k: number, q: bigint): bigint {
  if (!Number.isInteger(n) || n < 0 || !Number.isInteger(k)) {
    throw new RangeError(`gaussianBinomial: need integers n ≥ 0 and k, got n = ${n}, k = ${k}`);
  }
  if (k < 0 || k > n) return 0n;
  const m = Math.min(k, n - k);
  if (q >= 2n) {
    // The partial products Π_{i<j} (q^(n−i) − 1) / (q^(i+1) − 1) are [n choose j]_q,
    // integers, so each step's division is exact.
    let result = 1n;
    for (let i = 0; i < m; i++) result = (result * (q ** BigInt(n - i) - 1n)) / (q ** BigInt(i + 1) - 1n);
    return result;
  }
  // Small or negative q: the q-Pascal rule [a, b] = [a−1, b−1] + q^b [a−1, b], row by row.
  let row: bigint[] = [1n];
  for (let a = 1; a <= n; a++) {
    const next: bigint[] = new Array<bigint>(Math.min(a, m) + 1).fill(0n);
    for (let b = 0; b < next.length; b++) {
      const diagonal = b > 0 ? row[b - 1]! : 0n;
      const above = b < row.length ? row[b]! : 0n;
      next[b] = diagonal + q ** BigInt(b) * above;
    }
    row = next;
  }
  return row[m]!;
}

/** Raised when an enumeration would produce more items than its limit allows. */
export class EnumerationLimitError extends RangeError {
  readonly count: bigint;
  readonly limit: number;
  constructor(what: string, count: bigint, limit: number) {
    super(`${what}: there are ${count} of them, more than the limit of ${limit}`);
    this.name = 'EnumerationLimitError';
    this.count = count;
    this.limit = limit;
  }
}

function checkFiniteField<T>(F: Field<T>, what: string): bigint {
  const q = finiteFieldOrder(F);
  if (q === undefined) throw new RangeError(`${what}: needs a finite field, but ${F.name} is infinite`);
  return q;
}

/** Fields up to this size have their elements listed once per enumeration, instead of on every step. */
const ELEMENT_TABLE_LIMIT = 2n ** 16n;

/**
 * Every k-subspace of GF(q)^n exactly once, as its RREF basis rows, lazily.
 * The RREF is unique, so walking each pivot set (lexicographically) and every
 * choice of its free entries (row i is free in the non-pivot columns after its
 * pivot) lists each subspace once. Free entries run through the field's
 * elements in the order of `finiteFieldElements`. There are
 * gaussianBinomial(n, k, q).
 */
export function* iterateSubspaces<T>(F: Field<T>, n: number, k: number): Generator<T[][]> {
  const q = checkFiniteField(F, 'iterateSubspaces');
  if (!Number.isInteger(n) || n < 0 || !Number.isInteger(k) || k < 0 || k > n) {
    throw new RangeError(`iterateSubspaces: need integers 0 ≤ k ≤ n, got k = ${k}, n = ${n}`);
  }
  // Each free entry is an index into the field's elements, looked up in a table for small fields.
  const table = q <= ELEMENT_TABLE_LIMIT ? Array.from({ length: Number(q) }, (_, i) => finiteFieldElement(F, BigInt(i))) : undefined;
  const elementAt = (i: bigint): T => (table !== undefined ? table[Number(i)]! : finiteFieldElement(F, i));
  for (const pivots of subsets(n, k)) {
    const isPivot = new Array<boolean>(n).fill(false);
    for (const c of pivots) isPivot[c] = true;
    const free: [number, number][] = [];
    pivots.forEach((c, i) => {
      for (let j = c + 1; j < n; j++) if (!isPivot[j]) free.push([i, j]);
    });
    const rows = pivots.map((c) => {
      const row = new Array<T>(n).fill(F.zero);
      row[c] = F.one;
      return row;
    });
    // An odometer over the free entries, last one fastest; `rows` always holds the current choice.
    const digits = new Array<bigint>(free.length).fill(0n);
    for (;;) {
      yield rows.map((row) => row.slice());
      let t = free.length - 1;
      while (t >= 0 && digits[t] === q - 1n) {
        digits[t] = 0n;
        const [i, j] = free[t--]!;
        rows[i]![j] = F.zero;
      }
      if (t < 0) break;
      digits[t]!++;
      const [i, j] = free[t]!;
      rows[i]![j] = elementAt(digits[t]!);
    }
  }
}

/**
 * All k-subspaces of GF(q)^n (see `iterateSubspaces`) as an array. Throws
 * `EnumerationLimitError` before doing any work when there are more than
 * `limit` of them.
 */
export function enumerateSubspaces<T>(F: Field<T>, n: number, k: number, limit: number): T[][][] {
  const q = checkFiniteField(F, 'enumerateSubspaces');
  const count = gaussianBinomial(n, k, q);
  if (count > BigInt(Math.max(0, Math.floor(limit)))) {
    throw new EnumerationLimitError(`The ${k}-dimensional subspaces of ${F.name}^${n}`, count, limit);
  }
  return [...iterateSubspaces(F, n, k)];
}
