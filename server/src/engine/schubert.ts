/**
 * Schubert cells of the Grassmannian G(k, n) relative to a complete flag
 * F_1 ⊂ … ⊂ F_n (see flags.ts for how flags are given).
 *
 * The position of a k-subspace W relative to the flag is recorded by the
 * numbers d_i = dim(W ∩ F_i), i = 1..n. They start at 0, end at k and grow by
 * at most 1 at each step; the k steps where they grow are the jumps
 * i_1 < … < i_k (reported 0-based in the engine, i.e. i_j − 1). The subspaces
 * with the same jumps form the Schubert cell.
 *
 * Partition convention: λ_j = n − k + j − i_j (1-based j and i_j). Then
 * n − k ≥ λ_1 ≥ … ≥ λ_k ≥ 0, so λ lies in the k×(n−k) box; a generic W has
 * jumps n−k+1, …, n and λ = 0; and |λ| is the codimension of the cell, which
 * has dimension k(n−k) − |λ|. (This is the indexing by codimension in which
 * the Schubert variety of λ is {W : dim(W ∩ F_{n−k+j−λ_j}) ≥ j for all j};
 * Fulton, Young Tableaux, §9.4 — from memory.)
 *
 * Computation. In coordinates for the basis f_1, …, f_n the flag becomes the
 * standard one, F_i = span(e_1..e_i), and a vector lies in F_i exactly when its
 * entries after position i vanish. Row reduce W "from the right" (reverse the
 * columns, take the RREF, reverse back): each row then ends in a 1 at its own
 * column, the other rows are 0 there, and the rows ending at or before i span
 * W ∩ F_i. So d_i counts the row ends up to i, and the jumps are the row ends:
 * relative to the standard flag, the jump set is {n−1−p : p a pivot of the
 * RREF of W with its columns reversed} (0-based). Relative to the opposite flag
 * e_n, …, e_1 the jump set is {n−1−p : p a pivot of the ordinary RREF of W},
 * and λ is then (p_s − s) read from the last pivot to the first.
 *
 * In this echelon form row j has its 1 at column i_j, zeros at the other
 * jumps and after i_j, and free entries at the i_j − j non-jump columns
 * before i_j; distinct free entries give distinct subspaces, so the cell is an
 * affine space of dimension Σ_j (i_j − j) = k(n−k) − |λ|, and over GF(q) it
 * has q^(k(n−k) − |λ|) points.
 */
import type { Field } from './field.js';
import { multiply, rref } from './matrix.js';
import { checkFlag, flagCoordinates } from './flags.js';
import { subsets } from './subsets.js';

/** The Schubert cell convention, in one sentence for hovers. */
export const SCHUBERT_CONVENTION =
  'The Schubert cell of a k-subspace W relative to a flag F_1 ⊂ … ⊂ F_n is given by its jumps i_1 < … < i_k, the i where dim(W ∩ F_i) grows, ' +
  'and by the partition λ_j = n − k + j − i_j in the k×(n−k) box, which is 0 for a generic W; |λ| is the codimension of the cell and k(n−k) − |λ| its dimension.';

export interface SchubertCell<T> {
  /** The dimension of the space. */
  n: number;
  /** dim W (the rank of the rows given). */
  k: number;
  /** The 0-based flag positions where dim(W ∩ F_i) grows: i_1 − 1 < … < i_k − 1. */
  jumps: number[];
  /** λ_1 ≥ … ≥ λ_k with λ_j = n − k + j − i_j (1-based), in the k×(n−k) box. */
  partition: number[];
  /** |λ|: the codimension of the cell in G(k, n). */
  codimension: number;
  /** k(n−k) − |λ|: the number of free entries of the echelon form. */
  cellDimension: number;
  /**
   * The echelon form of W relative to the flag, in coordinates for the basis
   * f_1, …, f_n (for the standard flag, ordinary coordinates): row j ends in a 1
   * at jumps[j], is 0 at the other jumps, and the rows are in order of their jumps.
   */
  echelon: T[][];
  /** The same rows as vectors of V (echelon · flag matrix): a basis of W adapted to the flag. */
  basis: T[][];
}

function checkJumps(jumps: readonly number[], n: number, what: string): void {
  jumps.forEach((x, t) => {
    if (!Number.isInteger(x) || x < 0 || x >= n) throw new RangeError(`${what}: jump ${x} is not in [0, ${n})`);
    if (t > 0 && jumps[t - 1]! >= x) throw new RangeError(`${what}: jumps must be strictly increasing`);
  });
}

/** The partition of a jump set: λ_t = n − k + t − jumps[t] with 0-based t and jumps. */
export function partitionFromJumps(jumps: readonly number[], n: number): number[] {
  checkJumps(jumps, n, 'partitionFromJumps');
  const k = jumps.length;
  return jumps.map((x, t) => n - k + t - x);
}

/** The jump set (0-based) of a partition in the k×(n−k) box, k = partition.length. */
export function jumpsFromPartition(partition: readonly number[], n: number): number[] {
  const k = partition.length;
  if (k > n) throw new RangeError(`jumpsFromPartition: ${k} parts do not fit in dimension ${n}`);
  partition.forEach((x, t) => {
    if (!Number.isInteger(x) || x < 0 || x > n - k) throw new RangeError(`jumpsFromPartition: part ${x} is not in [0, ${n - k}]`);
    if (t > 0 && partition[t - 1]! < x) throw new RangeError('jumpsFromPartition: parts must be weakly decreasing');
  });
  return partition.map((x, t) => n - k + t - x);
}

/**
 * Every partition in the k×m box (k parts, each in [0, m], weakly
 * decreasing), one per Schubert cell of G(k, k + m), in the lexicographic
 * order of their jump sets (so the largest partition comes first).
 */
export function partitionsInBox(k: number, m: number): number[][] {
  if (!Number.isInteger(k) || k < 0 || !Number.isInteger(m) || m < 0) {
    throw new RangeError(`partitionsInBox: need nonnegative integers, got k = ${k}, m = ${m}`);
  }
  return [...subsets(k + m, k)].map((jumps) => partitionFromJumps(jumps, k + m));
}

/**
 * The shape of the echelon forms in a cell: for each row, '1' at its jump,
 * '*' at the free entries (the non-jump columns before its jump) and '0'
 * elsewhere. The number of '*' is the cell dimension.
 */
export function cellPattern(jumps: readonly number[], n: number): ('1' | '*' | '0')[][] {
  checkJumps(jumps, n, 'cellPattern');
  const isJump = new Array<boolean>(n).fill(false);
  for (const x of jumps) isJump[x] = true;
  return jumps.map((x) => Array.from({ length: n }, (_, c) => (c === x ? '1' : c < x && !isJump[c] ? '*' : '0')));
}

/** Echelon form "from the right" of rows in standard-flag position: rows end in 1 at their jumps. */
function reduceFromTheRight<T>(F: Field<T>, coords: readonly (readonly T[])[], n: number): { echelon: T[][]; jumps: number[] } {
  const reversed = coords.map((row) => row.slice().reverse());
  const { rows, pivots } = rref(F, reversed, n);
  // Pivot p of the reversed rows is column n−1−p; ascending pivots are descending columns, so both lists flip.
  return {
    echelon: rows.map((row) => row.slice().reverse()).reverse(),
    jumps: pivots.map((p) => n - 1 - p).reverse(),
  };
}

/**
 * d_i = dim(W ∩ F_i) for i = 1..n (entry i−1), where W = rowspace(basisRows)
 * and F_i is spanned by the first i rows of `flagRows` (n independent vectors
 * of length n; the rows of W need not be independent).
 */
export function schubertConditions<T>(F: Field<T>, basisRows: readonly (readonly T[])[], flagRows: readonly (readonly T[])[]): number[] {
  const n = flagRows.length;
  checkFlag(F, flagRows, n);
  const { jumps } = reduceFromTheRight(F, flagCoordinates(F, flagRows, basisRows, n), n);
  const out: number[] = [];
  let count = 0;
  for (let i = 0; i < n; i++) {
    if (count < jumps.length && jumps[count] === i) count++;
    out.push(count);
  }
  return out;
}

/**
 * The Schubert cell of W = rowspace(basisRows) relative to the flag
 * `flagRows` (n independent vectors of length n, F_i = span of the first i),
 * with its jumps, partition, dimensions and the echelon form exhibiting it;
 * see SCHUBERT_CONVENTION and the notes at the top of this file.
 */
export function schubertCell<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  flagRows: readonly (readonly T[])[],
  n: number,
): SchubertCell<T> {
  checkFlag(F, flagRows, n);
  const { echelon, jumps } = reduceFromTheRight(F, flagCoordinates(F, flagRows, basisRows, n), n);
  const k = jumps.length;
  const partition = partitionFromJumps(jumps, n);
  const codimension = partition.reduce((a, b) => a + b, 0);
  return {
    n,
    k,
    jumps,
    partition,
    codimension,
    cellDimension: k * (n - k) - codimension,
    echelon,
    basis: multiply(F, echelon, flagRows, n),
  };
}
