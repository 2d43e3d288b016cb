/**
 * Linear maps between coordinate spaces and what they induce on subspaces and
 * on exterior powers.
 *
 * Convention: a map f: V → U with dim V = m and dim U = n is an m×n matrix A
 * acting on ROW vectors, v ↦ v·A. Row i of A is therefore f(e_i), and a
 * subspace given by basis rows B (as everywhere in the engine) is sent to the
 * row space of B·A. Composition reads left to right: first A, then B is A·B.
 * Because a matrix without rows carries no width, functions that may meet a
 * map from the zero space take dim U explicitly.
 */
import type { Field } from './field.js';
import { annihilator } from './duality.js';
import { kernel, multiply, rank, rref, transpose } from './matrix.js';
import { pluckerCoordinates } from './plucker.js';
import { binomial, forEachSubset } from './subsets.js';

/** The map convention, in one sentence for hovers. */
export const LINEAR_MAP_CONVENTION =
  'A linear map V → U is a (dim V)×(dim U) matrix A acting on row vectors, v ↦ v·A, so row i of A is the image of the i-th basis vector.';

/** Raised when a matrix that must be invertible is not (not square, or singular). */
export class NotInvertibleError extends Error {
  constructor(what: string) {
    super(what);
    this.name = 'NotInvertibleError';
  }
}

/** The width of A (dim U), checked against every row and against `targetDim` when given. */
function targetWidth<T>(A: readonly (readonly T[])[], targetDim: number | undefined, what: string): number {
  const width = targetDim ?? A[0]?.length;
  if (width === undefined) throw new RangeError(`${what}: the map has no rows, so the target dimension must be given`);
  if (!Number.isInteger(width) || width < 0) throw new RangeError(`${what}: target dimension ${width} must be a nonnegative integer`);
  A.forEach((row, i) => {
    if (row.length !== width) throw new RangeError(`${what}: row ${i} of the map has ${row.length} entries, expected ${width}`);
  });
  return width;
}

function checkVectors<T>(rows: readonly (readonly T[])[], n: number, what: string): void {
  rows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`${what}: vector ${i} has ${row.length} entries, expected ${n}`);
  });
}

/** A basis (RREF) of f(W) ⊂ U for W = rowspace(basisRows) ⊂ V: the row space of basisRows·A. */
export function imageOf<T>(
  F: Field<T>,
  A: readonly (readonly T[])[],
  basisRows: readonly (readonly T[])[],
  targetDim?: number,
): T[][] {
  const n = targetWidth(A, targetDim, 'imageOf');
  checkVectors(basisRows, A.length, 'imageOf (the subspace of the source)');
  return rref(F, multiply(F, basisRows, A, n), n).rows;
}

/**
 * A basis (RREF) of ker f = {v ∈ V : v·A = 0}. Transposed, v·A = 0 reads
 * Aᵀ·vᵀ = 0, so this is the kernel of Aᵀ.
 */
export function kernelOf<T>(F: Field<T>, A: readonly (readonly T[])[], targetDim?: number): T[][] {
  const n = targetWidth(A, targetDim, 'kernelOf');
  const m = A.length;
  return rref(F, kernel(F, transpose(A, n), m), m).rows;
}

/**
 * A basis (RREF) of f⁻¹(U') = {v ∈ V : v·A ∈ U'} for U' = rowspace(targetBasis) ⊂ U.
 *
 * A vector u lies in U' exactly when every functional of the annihilator of U'
 * vanishes on it; with those functionals as the rows of N, the condition is
 * N·(v·A)ᵀ = (N·Aᵀ)·vᵀ = 0, so the preimage is the kernel of N·Aᵀ. It always
 * contains ker f.
 */
export function preimageOf<T>(
  F: Field<T>,
  A: readonly (readonly T[])[],
  targetBasis: readonly (readonly T[])[],
  targetDim?: number,
): T[][] {
  const n = targetWidth(A, targetDim, 'preimageOf');
  checkVectors(targetBasis, n, 'preimageOf (the subspace of the target)');
  const m = A.length;
  const conditions = multiply(F, annihilator(F, targetBasis, n), transpose(A, n), m);
  return rref(F, kernel(F, conditions, m), m).rows;
}

/** dim f(V): the rank of A. */
export function rankOfMap<T>(F: Field<T>, A: readonly (readonly T[])[], targetDim?: number): number {
  return rank(F, A, targetWidth(A, targetDim, 'rankOfMap'));
}

/**
 * The k-th compound matrix C_k(A), the matrix of ∧^k f in the bases e_I:
 * C(m, k) rows and C(n, k) columns, both indexed by k-subsets in lexicographic
 * order, with entry (I, J) the minor of A on rows I and columns J. Row I of
 * C_k(A) is the Plücker vector of the k rows of A numbered by I, so each row
 * comes from one depth-first walk of `pluckerCoordinates`, which skips whole
 * blocks of vanishing minors. C_0(A) = [[1]]; for k > m there are no rows and
 * for k > n each row is empty.
 */
export function compoundMatrix<T>(F: Field<T>, A: readonly (readonly T[])[], k: number, targetDim?: number): T[][] {
  const n = targetWidth(A, targetDim, 'compoundMatrix');
  const m = A.length;
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`compoundMatrix: degree ${k} must be a nonnegative integer`);
  if (k > m) return [];
  const out: T[][] = [];
  forEachSubset(m, k, (rows) => {
    out.push(pluckerCoordinates(F, rows.map((i) => A[i]!), n));
  });
  return out;
}

/**
 * The action of ∧^k f on a vector of ∧^k V given by its C(m, k) coordinates in
 * lexicographic order: the row vector p·C_k(A), of length C(n, k). By the
 * Cauchy–Binet formula, det((B·A)_J) = Σ_I det(B_I)·det(A_{I,J}), so on the
 * Plücker vector of W = rowspace(B) this is the Plücker vector of the rows of
 * B·A: the Plücker vector of f(W) when f is injective on W, and zero when the
 * image has dimension below k. Only the rows I with p_I ≠ 0 are computed.
 */
export function mapPlucker<T>(
  F: Field<T>,
  A: readonly (readonly T[])[],
  pluckerValues: readonly T[],
  k: number,
  targetDim?: number,
): T[] {
  const n = targetWidth(A, targetDim, 'mapPlucker');
  const m = A.length;
  if (!Number.isInteger(k) || k < 0 || k > m) throw new RangeError(`mapPlucker: degree ${k} must be an integer in [0, ${m}]`);
  const expected = binomial(m, k);
  if (pluckerValues.length !== expected) {
    throw new RangeError(`mapPlucker: ${pluckerValues.length} coordinates given, expected C(${m}, ${k}) = ${expected}`);
  }
  const out = new Array<T>(k > n ? 0 : binomial(n, k)).fill(F.zero);
  forEachSubset(m, k, (rows, rank) => {
    const p = pluckerValues[rank]!;
    if (F.isZero(p)) return;
    pluckerCoordinates(F, rows.map((i) => A[i]!), n).forEach((minorValue, j) => {
      if (!F.isZero(minorValue)) out[j] = F.add(out[j]!, F.mul(p, minorValue));
    });
  });
  return out;
}

/**
 * The inverse of a square matrix, by reducing (P | I) to (I | P⁻¹). Throws
 * `NotInvertibleError` when P is not square or is singular.
 */
export function invertMatrix<T>(F: Field<T>, P: readonly (readonly T[])[]): T[][] {
  const n = P.length;
  P.forEach((row, i) => {
    if (row.length !== n) throw new NotInvertibleError(`invertMatrix: the matrix is not square (row ${i} has ${row.length} entries, expected ${n})`);
  });
  const augmented = P.map((row, i) => {
    const unit = new Array<T>(n).fill(F.zero);
    unit[i] = F.one;
    return [...row, ...unit];
  });
  const { rows, pivots } = rref(F, augmented, 2 * n);
  // P is invertible exactly when its own columns take all n pivots.
  if (pivots.length < n || (n > 0 && pivots[n - 1]! >= n)) {
    throw new NotInvertibleError(`invertMatrix: the ${n}×${n} matrix is singular (rank ${pivots.filter((p) => p < n).length})`);
  }
  return rows.map((row) => row.slice(n));
}

/**
 * The coordinates c of a vector in the basis formed by the rows of P: the
 * unique c with c·P = coords, where `coords` are the vector's coordinates in
 * the current basis; so c = coords·P⁻¹. Throws `NotInvertibleError` when the
 * rows of P are not a basis (P not square or singular).
 */
export function changeOfBasis<T>(F: Field<T>, P: readonly (readonly T[])[], coords: readonly T[]): T[] {
  const inverse = invertMatrix(F, P);
  if (coords.length !== P.length) {
    throw new RangeError(`changeOfBasis: the vector has ${coords.length} entries, expected ${P.length}`);
  }
  return multiply(F, [coords], inverse, P.length)[0]!;
}
