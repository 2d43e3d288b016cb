/**
 * The depth-first walk over column sets that finds all maximal minors of a
 * k×n matrix, written once for any kind of entry arithmetic.
 *
 * A node of the walk is a prefix c_0 < … < c_{d−1} of a column set, and
 * carries the matrix with those columns already eliminated: d rows have been
 * used as pivots and the k−d remaining rows are zero in the chosen columns.
 * Choosing the next column c pivots on the first remaining row that is
 * nonzero in column c and eliminates it from the other remaining rows, only in
 * the columns after c (the only ones a descendant can still choose). If no
 * remaining row is nonzero in column c, the chosen columns have rank d, so
 * every column set with this prefix has minor zero and the whole subtree is
 * skipped. At depth k−1 a single row remains and each leaf minor is read off
 * with one multiplication.
 *
 * Cost: an inner node at depth d with last column c costs (k−d−1)·(n−c) entry
 * updates and a leaf costs O(1). Each depth has at most C(n, k) nodes (a prefix
 * determines its own lexicographically first completion), so the total is at
 * most O(k²·n·C(n, k)) operations, and in practice far less because most nodes
 * sit near the leaves, where both factors are small.
 */
import { binomial } from './subsets.js';

/**
 * The arithmetic of one walk. `E` is the entry type; `State` is what a node
 * carries besides its matrix (sign and pivot data).
 */
export interface WalkArithmetic<E, State> {
  isZero(e: E): boolean;
  /** Fills `next` (the remaining rows minus row q, updated in columns > c) and returns the child's state. */
  eliminate(rows: E[][], count: number, q: number, c: number, n: number, state: State, next: E[][]): State;
  /** The minor at a leaf: `entry` is the last row's entry in the last chosen column, nonzero. */
  leaf(state: State, entry: E): void;
  /** Records that `count` consecutive minors are zero. */
  zeros(count: number): void;
}

/** Walks all k-subsets of the n columns of `top` (k rows, k ≥ 1) in lexicographic order. */
export function walkColumnSets<E, State>(k: number, n: number, top: E[][], start: State, ops: WalkArithmetic<E, State>): void {
  // levels[d] holds the k−d remaining rows at depth d; rows are reused between siblings.
  const levels: E[][][] = [top];
  for (let d = 1; d < k; d++) levels.push(Array.from({ length: k - d }, () => new Array<E>(n)));

  const visit = (d: number, from: number, state: State): void => {
    const rows = levels[d]!;
    const count = k - d;
    const last = n - count; // the largest column that still leaves room for the rest
    for (let c = from; c <= last; c++) {
      let q = 0;
      while (q < count && ops.isZero(rows[q]![c]!)) q++;
      if (q === count) {
        ops.zeros(binomial(n - 1 - c, count - 1));
        continue;
      }
      if (count === 1) {
        ops.leaf(state, rows[0]![c]!);
        continue;
      }
      const child = ops.eliminate(rows, count, q, c, n, state, levels[d + 1]!);
      visit(d + 1, c + 1, child);
    }
  };
  visit(0, 0, start);
}
