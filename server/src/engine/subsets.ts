/**
 * Subsets of {0, …, n−1}: binomial coefficients, lexicographic enumeration and
 * ranking, keys for maps, and the signs that appear when wedges are sorted.
 *
 * A subset is always a strictly increasing array of 0-based indices. The
 * lexicographic order compares subsets of the same size entry by entry, so for
 * n = 4, k = 2 it is 01, 02, 03, 12, 13, 23. Plücker vectors, dense
 * multivectors and every enumeration in the engine use this one order.
 */

/** −1, 0 or 1: the sign of a permutation, or 0 where indices repeat. */
export type Sign = -1 | 0 | 1;

const MAX_SAFE = Number.MAX_SAFE_INTEGER;

/** C(n, k) as a bigint, exact for every size; 0 when k < 0 or k > n. */
export function binomialBig(n: number, k: number): bigint {
  if (!Number.isInteger(n) || !Number.isInteger(k)) throw new RangeError(`binomial(${n}, ${k}): arguments must be integers`);
  if (k < 0 || n < 0 || k > n) return 0n;
  const m = Math.min(k, n - k);
  let result = 1n;
  // After step i the value is C(n − m + i, i), an integer, so each division is exact.
  for (let i = 1; i <= m; i++) result = (result * BigInt(n - m + i)) / BigInt(i);
  return result;
}

/**
 * C(n, k) as a number; 0 when k < 0 or k > n. Throws a RangeError when the
 * value exceeds Number.MAX_SAFE_INTEGER, so a returned number is always exact.
 */
export function binomial(n: number, k: number): number {
  if (!Number.isInteger(n) || !Number.isInteger(k)) throw new RangeError(`binomial(${n}, ${k}): arguments must be integers`);
  if (k < 0 || n < 0 || k > n) return 0;
  const m = Math.min(k, n - k);
  let result = 1;
  for (let i = 1; i <= m; i++) {
    const factor = n - m + i;
    // result·factor must stay exact before the (exact) division by i.
    if (result > MAX_SAFE / factor) {
      const big = binomialBig(n, k);
      if (big > BigInt(MAX_SAFE)) throw new RangeError(`binomial(${n}, ${k}) = ${big} is too large for exact arithmetic on numbers`);
      return Number(big);
    }
    result = (result * factor) / i;
  }
  return result;
}

function checkSizes(n: number, k: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: n = ${n} must be a nonnegative integer`);
  if (!Number.isInteger(k) || k < 0 || k > n) throw new RangeError(`${what}: k = ${k} must be an integer in [0, ${n}]`);
}

/**
 * Calls `visit` with every k-subset of {0..n−1} in lexicographic order, with
 * its rank. The array passed is reused and changed after `visit` returns, so
 * copy it to keep it. Returning `false` from `visit` stops the walk early.
 */
export function forEachSubset(
  n: number,
  k: number,
  visit: (subset: readonly number[], rank: number) => void | boolean,
): void {
  checkSizes(n, k, 'forEachSubset');
  const s = Array.from({ length: k }, (_, i) => i);
  let rank = 0;
  for (;;) {
    if (visit(s, rank++) === false) return;
    // Advance the rightmost entry that still has room, then reset those after it.
    let i = k - 1;
    while (i >= 0 && s[i] === n - k + i) i--;
    if (i < 0) return;
    s[i]!++;
    for (let j = i + 1; j < k; j++) s[j] = s[j - 1]! + 1;
  }
}

/** Every k-subset of {0..n−1} in lexicographic order, each a fresh array. */
export function* subsets(n: number, k: number): Generator<number[]> {
  checkSizes(n, k, 'subsets');
  const s = Array.from({ length: k }, (_, i) => i);
  for (;;) {
    yield s.slice();
    let i = k - 1;
    while (i >= 0 && s[i] === n - k + i) i--;
    if (i < 0) return;
    s[i]!++;
    for (let j = i + 1; j < k; j++) s[j] = s[j - 1]! + 1;
  }
}

/** Throws unless `subset` is strictly increasing with entries in [0, n). */
export function checkSubset(subset: readonly number[], n: number, what = 'subset'): void {
  for (let i = 0; i < subset.length; i++) {
    const x = subset[i]!;
    if (!Number.isInteger(x) || x < 0 || x >= n) {
      throw new RangeError(`${what} [${subset.join(', ')}]: index ${x} is not in [0, ${n})`);
    }
    if (i > 0 && subset[i - 1]! >= x) {
      throw new RangeError(`${what} [${subset.join(', ')}]: indices must be strictly increasing`);
    }
  }
}

/**
 * The position of a k-subset of {0..n−1} in lexicographic order (0-based).
 *
 * The subsets after s are those whose first difference from s is larger;
 * counting them by complements gives C(n,k) − 1 − Σ_i C(n−1−s_i, k−i).
 */
export function rankLex(subset: readonly number[], n: number): number {
  checkSubset(subset, n, 'rankLex');
  const k = subset.length;
  let after = 0;
  for (let i = 0; i < k; i++) after += binomial(n - 1 - subset[i]!, k - i);
  return binomial(n, k) - 1 - after;
}

/** The k-subset of {0..n−1} at position `rank` in lexicographic order. */
export function unrankLex(rank: number, n: number, k: number): number[] {
  checkSizes(n, k, 'unrankLex');
  const total = binomial(n, k);
  if (!Number.isInteger(rank) || rank < 0 || rank >= total) {
    throw new RangeError(`unrankLex: rank ${rank} is not in [0, ${total})`);
  }
  const out: number[] = [];
  let x = 0;
  let r = rank;
  for (let i = 0; i < k; i++) {
    // Skip whole blocks of subsets that put a smaller value at position i.
    for (;;) {
      const block = binomial(n - 1 - x, k - 1 - i);
      if (r < block) break;
      r -= block;
      x++;
    }
    out.push(x);
    x++;
  }
  return out;
}

/** A string that identifies a subset, for use as a map key: `0,2,5` (empty subset: ``). */
export function subsetKey(subset: readonly number[]): string {
  return subset.join(',');
}

/** The subset a key from `subsetKey` stands for. */
export function subsetFromKey(key: string): number[] {
  return key === '' ? [] : key.split(',').map(Number);
}

/** −1, 0 or 1 as a is before, equal to or after b in lexicographic order (same sizes). */
export function compareLex(a: readonly number[], b: readonly number[]): -1 | 0 | 1 {
  const len = Math.min(a.length, b.length);
  for (let i = 0; i < len; i++) {
    if (a[i]! !== b[i]!) return a[i]! < b[i]! ? -1 : 1;
  }
  return a.length === b.length ? 0 : a.length < b.length ? -1 : 1;
}

/**
 * The wedge sign of two sorted subsets: the sign of the permutation that sorts
 * the concatenation a ++ b, so that e_a ∧ e_b = sign · e_{a∪b}. It is 0 when
 * they share an index (then e_a ∧ e_b = 0). The sign is (−1)^(number of pairs
 * x ∈ a, y ∈ b with x > y).
 */
export function wedgeSign(a: readonly number[], b: readonly number[]): Sign {
  let inversions = 0;
  let j = 0;
  // Walk both sorted lists; when a[i] is reached, exactly j entries of b are smaller than it.
  for (let i = 0; i < a.length; i++) {
    const x = a[i]!;
    while (j < b.length && b[j]! < x) j++;
    if (j < b.length && b[j] === x) return 0;
    inversions += j;
  }
  return inversions % 2 === 0 ? 1 : -1;
}

/** The sorted union of two sorted disjoint subsets. */
export function mergeSorted(a: readonly number[], b: readonly number[]): number[] {
  const out: number[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (j >= b.length || (i < a.length && a[i]! < b[j]!)) out.push(a[i++]!);
    else out.push(b[j++]!);
  }
  return out;
}

/**
 * Sorts a list of indices and reports the sign of the sorting permutation, so
 * that e_{i1} ∧ … ∧ e_{ik} = sign · e_sorted. A repeated index gives sign 0
 * (the wedge vanishes); `sorted` is then still the sorted list.
 */
export function sortWithSign(indices: readonly number[]): { sorted: number[]; sign: Sign } {
  const sorted = indices.slice();
  let swaps = 0;
  // Insertion sort: each shift is one adjacent transposition. Index lists are short (k entries).
  for (let i = 1; i < sorted.length; i++) {
    const x = sorted[i]!;
    let j = i - 1;
    while (j >= 0 && sorted[j]! > x) {
      sorted[j + 1] = sorted[j]!;
      j--;
      swaps++;
    }
    sorted[j + 1] = x;
  }
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i - 1] === sorted[i]) return { sorted, sign: 0 };
  }
  return { sorted, sign: swaps % 2 === 0 ? 1 : -1 };
}

/** The increasing list of indices in [0, n) that are not in the sorted subset. */
export function complement(subset: readonly number[], n: number): number[] {
  const out: number[] = [];
  let j = 0;
  for (let x = 0; x < n; x++) {
    if (j < subset.length && subset[j] === x) j++;
    else out.push(x);
  }
  return out;
}

/**
 * Inserts one index into a sorted subset. The sign is that of the permutation
 * sorting (subset…, index), (−1)^(number of entries greater than index), so
 * that e_subset ∧ e_index = sign · e_sorted; it is 0 when the index is present.
 */
export function insertIndex(subset: readonly number[], index: number): { sorted: number[]; sign: Sign } {
  let pos = 0;
  while (pos < subset.length && subset[pos]! < index) pos++;
  if (pos < subset.length && subset[pos] === index) return { sorted: subset.slice(), sign: 0 };
  const sorted = [...subset.slice(0, pos), index, ...subset.slice(pos)];
  return { sorted, sign: (subset.length - pos) % 2 === 0 ? 1 : -1 };
}
