/**
 * Affine charts of the Grassmannian. The chart on a set of k columns I holds
 * the k-subspaces W whose Plücker coordinate p_I is nonzero; each such W has
 * exactly one basis whose columns I form the identity, and the remaining
 * k×(n−k) entries of that basis are W's coordinates in the chart.
 */
import type { Field } from './field.js';
import { rref } from './matrix.js';
import { complement } from './subsets.js';

export type ChartResult<T> =
  | {
      ok: true;
      /** The k×(n−k) entries of the normalized basis in `otherColumns`. */
      block: T[][];
      /** The columns outside the chart's columns, increasing. */
      otherColumns: number[];
      /** The whole normalized basis: row i has 1 in columns[i] and 0 in the other chart columns. */
      full: T[][];
    }
  | { ok: false; minor: T };

function checkColumns(columns: readonly number[], k: number, n: number, what: string): void {
  if (columns.length !== k) throw new RangeError(`${what}: ${columns.length} columns chosen for ${k} rows`);
  const seen = new Set<number>();
  for (const c of columns) {
    if (!Number.isInteger(c) || c < 0 || c >= n) throw new RangeError(`${what}: column ${c} is not in [0, ${n})`);
    if (seen.has(c)) throw new RangeError(`${what}: column ${c} is chosen twice`);
    seen.add(c);
  }
}

/**
 * The chart coordinates of the row space of the k×n matrix `basisRows` on the
 * columns `columns` (k distinct columns, in the order the identity is laid
 * out). When the minor on those columns vanishes (including when the rows are
 * dependent) the subspace is outside the chart and `{ ok: false, minor: 0 }`
 * is returned.
 *
 * Method: move the chart columns to the front and reduce to RREF. The minor is
 * nonzero exactly when the pivots are the first k columns, and then the RREF
 * is the unique basis with the identity there.
 */
export function chartCoordinates<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  n: number,
  columns: readonly number[],
): ChartResult<T> {
  const k = basisRows.length;
  basisRows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`chartCoordinates: row ${i} has ${row.length} entries, expected ${n}`);
  });
  checkColumns(columns, k, n, 'chartCoordinates');
  const otherColumns = complement(
    columns.slice().sort((a, b) => a - b),
    n,
  );
  const order = [...columns, ...otherColumns];
  const permuted = basisRows.map((row) => order.map((c) => row[c]!));
  const { rows, pivots } = rref(F, permuted, n);
  if (rows.length < k || pivots.some((p, i) => p !== i)) return { ok: false, minor: F.zero };
  const full = rows.map((row) => {
    const out = new Array<T>(n);
    order.forEach((c, j) => {
      out[c] = row[j]!;
    });
    return out;
  });
  const block = rows.map((row) => row.slice(k));
  return { ok: true, block, otherColumns, full };
}

/**
 * The inverse of `chartCoordinates`: the k×n matrix with the identity in
 * `columns` (row i has 1 in columns[i]) and `block` in the other columns,
 * taken in increasing order.
 */
export function chartMatrix<T>(F: Field<T>, n: number, columns: readonly number[], block: readonly (readonly T[])[]): T[][] {
  const k = columns.length;
  checkColumns(columns, k, n, 'chartMatrix');
  if (block.length !== k) throw new RangeError(`chartMatrix: the block has ${block.length} rows, expected ${k}`);
  const otherColumns = complement(
    columns.slice().sort((a, b) => a - b),
    n,
  );
  return block.map((entries, i) => {
    if (entries.length !== n - k) {
      throw new RangeError(`chartMatrix: block row ${i} has ${entries.length} entries, expected ${n - k}`);
    }
    const row = new Array<T>(n).fill(F.zero);
    row[columns[i]!] = F.one;
    otherColumns.forEach((c, j) => {
      row[c] = entries[j]!;
    });
    return row;
  });
}
