/**
 * The matroid of a subspace: which sets of columns of a k×n matrix are
 * independent. Row operations do not change which columns are dependent, so
 * this depends only on the row space W ⊂ F^n, and its bases are exactly the
 * column sets I whose Plücker coordinate p_I is nonzero.
 *
 * The answer depends on the field. The same integer matrix read over QQ and
 * over GF(p) can have different bases, because a minor such as 2 vanishes
 * modulo 2 but not over the rationals; every function here takes the field
 * explicitly and decides nonvanishing in that field.
 *
 * Sizes: listing the bases needs all C(n, r) maximal minors (r the rank). The
 * limits below are checked before any minor is computed and raise
 * `EnumerationLimitError` when exceeded.
 */
import type { Field } from './field.js';
import { EnumerationLimitError } from './grassmannian.js';
import { rank, rref } from './matrix.js';
import { pluckerCoordinates } from './plucker.js';
import { binomialBig, compareLex, forEachSubset, insertIndex, subsetKey } from './subsets.js';

/**
 * The default largest number C(n, r) of candidate bases that `matroidOf` and
 * `nonBases` examine. It admits every matrix with at most 20 columns
 * (C(20, 10) = 184 756).
 */
export const MATROID_BASES_LIMIT = 200_000;

/**
 * The default largest number C(n, r) of candidate bases for `circuits`. It
 * admits every matrix with at most 16 columns (C(16, 8) = 12 870); the work
 * after the minors is about (number of bases)·r·(n − r) set look-ups.
 */
export const CIRCUITS_BASES_LIMIT = 20_000;

/** The matroid on the columns 0..n−1 of a matrix over a given field. */
export interface ColumnMatroid {
  /** The name of the field the minors were tested in (`QQ`, `GF(2)`): the bases depend on it. */
  field: string;
  /** The number of columns (the ground set is {0, …, n−1}). */
  n: number;
  /** The rank of the matrix, which is the size of every basis. */
  rank: number;
  /** The column sets with a nonzero maximal minor, each increasing, in lexicographic order. */
  bases: number[][];
  /** Columns in no basis: the zero columns. */
  loops: number[];
  /** Columns in every basis: those whose removal lowers the rank. */
  coloops: number[];
  /** Whether every r-subset of columns is a basis (the uniform matroid U_{r,n}). */
  isUniform: boolean;
}

function checkRows<T>(rows: readonly (readonly T[])[], n: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: the number of columns ${n} must be a nonnegative integer`);
  rows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`${what}: row ${i} has ${row.length} entries, expected ${n}`);
  });
}

function checkLimit(what: string, n: number, r: number, limit: number): void {
  const count = binomialBig(n, r);
  if (count > BigInt(Math.max(0, Math.floor(limit)))) {
    throw new EnumerationLimitError(`${what}: the candidate bases (${r}-subsets of ${n} columns)`, count, limit);
  }
}

/**
 * A basis of the row space and its Plücker vector. Reducing first makes the
 * rows independent, so the Plücker vector is nonzero and its support is the
 * set of bases even when the given rows were dependent.
 */
function reducedPlucker<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number, what: string, limit: number) {
  checkRows(basisRows, n, what);
  const reduced = rref(F, basisRows, n);
  checkLimit(what, n, reduced.rank, limit);
  return { r: reduced.rank, plucker: pluckerCoordinates(F, reduced.rows, n) };
}

/**
 * The matroid whose bases are the support of a Plücker vector: the k-subsets
 * I, in lexicographic order, with `pluckerValues[rankLex(I)]` nonzero. The
 * values are taken as given; for a true matroid they must be the maximal
 * minors of some k×n matrix of rank k (a decomposable, nonzero vector).
 */
export function matroidOfPlucker<T>(F: Field<T>, pluckerValues: readonly T[], n: number, k: number): ColumnMatroid {
  const expected = binomialBig(n, k);
  if (BigInt(pluckerValues.length) !== expected) {
    throw new RangeError(`matroidOfPlucker: ${pluckerValues.length} values given, expected C(${n}, ${k}) = ${expected}`);
  }
  const bases: number[][] = [];
  forEachSubset(n, k, (subset, index) => {
    if (!F.isZero(pluckerValues[index]!)) bases.push(subset.slice());
  });
  if (bases.length === 0) throw new RangeError('matroidOfPlucker: the zero vector is the Plücker vector of no subspace');
  // How many bases contain each column: 0 marks a loop, all of them a coloop.
  const count = new Array<number>(n).fill(0);
  for (const basis of bases) for (const c of basis) count[c]!++;
  const columns = Array.from({ length: n }, (_, c) => c);
  return {
    field: F.name,
    n,
    rank: k,
    bases,
    loops: columns.filter((c) => count[c] === 0),
    coloops: columns.filter((c) => count[c] === bases.length),
    isUniform: BigInt(bases.length) === expected,
  };
}

/**
 * The matroid of the columns of the matrix `basisRows` (k rows of length n)
 * over the field F, equivalently of its row space W ⊂ F^n. The rows may be
 * dependent: the rank is then smaller than k and the bases are the column
 * sets of that size with a nonzero maximal minor in a reduced basis.
 *
 * Throws `EnumerationLimitError` when C(n, rank) exceeds `limit`.
 */
export function matroidOf<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  n: number,
  limit: number = MATROID_BASES_LIMIT,
): ColumnMatroid {
  const { r, plucker } = reducedPlucker(F, basisRows, n, 'matroidOf', limit);
  return matroidOfPlucker(F, plucker, n, r);
}

/**
 * The rank over F of the columns `columns` of the matrix `basisRows` (the
 * rank of that submatrix), exactly. The columns are distinct indices in any
 * order; the empty set has rank 0.
 */
export function rankOfColumns<T>(F: Field<T>, basisRows: readonly (readonly T[])[], columns: readonly number[]): number {
  const n = basisRows[0]?.length;
  checkRows(basisRows, n ?? 0, 'rankOfColumns');
  const seen = new Set<number>();
  for (const c of columns) {
    if (!Number.isInteger(c) || c < 0 || (n !== undefined && c >= n)) {
      throw new RangeError(`rankOfColumns: column ${c} is not in [0, ${n ?? 0})`);
    }
    if (seen.has(c)) throw new RangeError(`rankOfColumns: column ${c} is chosen twice`);
    seen.add(c);
  }
  if (basisRows.length === 0) return 0;
  return rank(
    F,
    basisRows.map((row) => columns.map((c) => row[c]!)),
    columns.length,
  );
}

/**
 * The r-subsets of columns (r the rank over F) that are not bases: their
 * maximal minor vanishes in F. Increasing sets in lexicographic order.
 * Throws `EnumerationLimitError` when C(n, r) exceeds `limit`.
 */
export function nonBases<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  n: number,
  limit: number = MATROID_BASES_LIMIT,
): number[][] {
  const { r, plucker } = reducedPlucker(F, basisRows, n, 'nonBases', limit);
  const out: number[][] = [];
  forEachSubset(n, r, (subset, index) => {
    if (F.isZero(plucker[index]!)) out.push(subset.slice());
  });
  return out;
}

/**
 * The circuits (minimal dependent column sets) over F, ordered by size and
 * then lexicographically; loops come first as one-element circuits.
 *
 * Every circuit is the fundamental circuit of some basis B and column e ∉ B,
 * namely C(e, B) = {e} ∪ {b ∈ B : (B ∖ b) ∪ e is a basis}, because the
 * independent set C ∖ e extends to a basis B and B ∪ e holds exactly one
 * circuit (a standard matroid fact, e.g. Oxley, Matroid Theory, §1.2 — from
 * memory). So after the one Plücker computation no further field arithmetic
 * is needed: the circuits are read off the set of bases.
 *
 * Throws `EnumerationLimitError` when C(n, r) exceeds `limit` (by default
 * `CIRCUITS_BASES_LIMIT`, which admits every matrix with at most 16 columns).
 */
export function circuits<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  n: number,
  limit: number = CIRCUITS_BASES_LIMIT,
): number[][] {
  const { r, plucker } = reducedPlucker(F, basisRows, n, 'circuits', limit);
  const { bases } = matroidOfPlucker(F, plucker, n, r);
  // A column set is keyed by the sum of 2^c over its columns, exact in a double while n ≤ 52; wider
  // ground sets fall back to text keys. The exchange (B ∖ b) ∪ e then costs one subtraction and one addition.
  const numeric = n <= 52;
  const weight = Array.from({ length: n }, (_, c) => 2 ** c);
  const keyOf = (set: readonly number[]): number | string => (numeric ? set.reduce((sum, c) => sum + weight[c]!, 0) : subsetKey(set));
  const isBasis = new Set<number | string>(bases.map(keyOf));
  const found = new Map<number | string, number[]>();
  for (const basis of bases) {
    const inBasis = new Set(basis);
    const basisKey = numeric ? (keyOf(basis) as number) : 0;
    for (let e = 0; e < n; e++) {
      if (inBasis.has(e)) continue;
      const circuit = [e];
      basis.forEach((b, position) => {
        const exchanged = numeric
          ? basisKey - weight[b]! + weight[e]!
          : subsetKey(insertIndex([...basis.slice(0, position), ...basis.slice(position + 1)], e).sorted);
        if (isBasis.has(exchanged)) circuit.push(b);
      });
      circuit.sort((x, y) => x - y);
      const key = keyOf(circuit);
      if (!found.has(key)) found.set(key, circuit);
    }
  }
  return [...found.values()].sort((a, b) => a.length - b.length || compareLex(a, b));
}
