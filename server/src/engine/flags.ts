/**
 * Complete flags in V = F^n: chains F_1 ⊂ F_2 ⊂ … ⊂ F_n = V with dim F_i = i.
 *
 * A flag is given by n independent vectors f_1, …, f_n (the rows of an n×n
 * matrix, in this order), and F_i is the span of the first i of them. Many
 * bases give the same flag; every function here depends on the flag only.
 *
 * The standard flag is e_1, …, e_n (0-based in the engine: e_0, …, e_{n−1}),
 * so F_i = span(e_1, …, e_i). Some readers expect the opposite flag
 * e_n, …, e_1 instead, because relative to it the Schubert cell of a subspace
 * is read off the pivot columns of its usual reduced row echelon form; it is
 * available as `oppositeFlag`, but the standard flag is the default.
 */
import type { Field } from './field.js';
import { identity, multiply, rref } from './matrix.js';
import { invertMatrix, NotInvertibleError } from './linear-map.js';

/** The flag convention, in one sentence for hovers. */
export const FLAG_CONVENTION =
  'A flag is given by independent vectors f_1, …, f_n with F_i = span(f_1, …, f_i); the standard flag is e_1, …, e_n ' +
  '(F_i = span(e_1, …, e_i)), and the opposite flag e_n, …, e_1 is the one whose Schubert cells follow the pivots of the usual row echelon form.';

/** Raised when the rows given for a flag are not n independent vectors of length n. */
export class InvalidFlagError extends RangeError {
  constructor(what: string) {
    super(what);
    this.name = 'InvalidFlagError';
  }
}

/** The standard flag e_0, …, e_{n−1}: the identity matrix. */
export function standardFlag<T>(F: Field<T>, n: number): T[][] {
  return identity(F, n);
}

/** The opposite flag e_{n−1}, …, e_0: F_i is spanned by the last i standard basis vectors. */
export function oppositeFlag<T>(F: Field<T>, n: number): T[][] {
  return identity(F, n).reverse();
}

/** Whether the rows are exactly e_0, …, e_{n−1} in order (which lets callers skip a change of basis). */
export function isStandardFlag<T>(F: Field<T>, flagRows: readonly (readonly T[])[]): boolean {
  const n = flagRows.length;
  return flagRows.every((row, i) => row.length === n && row.every((x, j) => (i === j ? F.isOne(x) : F.isZero(x))));
}

/**
 * The inverse of the flag's matrix, whose columns give coordinates in the
 * basis f_1, …, f_n. Throws `InvalidFlagError` unless the rows are n
 * independent vectors of length n.
 */
function flagInverse<T>(F: Field<T>, flagRows: readonly (readonly T[])[], n: number): T[][] {
  if (flagRows.length !== n) throw new InvalidFlagError(`A flag in dimension ${n} needs ${n} vectors, but ${flagRows.length} were given`);
  flagRows.forEach((row, i) => {
    if (row.length !== n) throw new InvalidFlagError(`Flag vector ${i + 1} has ${row.length} entries, expected ${n}`);
  });
  try {
    return invertMatrix(F, flagRows);
  } catch (error) {
    if (error instanceof NotInvertibleError) throw new InvalidFlagError(`The ${n} flag vectors are not independent`);
    throw error;
  }
}

/** Throws `InvalidFlagError` unless `flagRows` are n independent vectors of length n. */
export function checkFlag<T>(F: Field<T>, flagRows: readonly (readonly T[])[], n: number): void {
  if (flagRows.length !== n || !isStandardFlag(F, flagRows)) flagInverse(F, flagRows, n);
}

/**
 * The coordinates of each row in the basis f_1, …, f_n: the rows c with
 * c·(flag matrix) = row. In these coordinates the flag becomes the standard
 * flag, since F_i is spanned by the first i basis vectors.
 */
export function flagCoordinates<T>(
  F: Field<T>,
  flagRows: readonly (readonly T[])[],
  rows: readonly (readonly T[])[],
  n: number,
): T[][] {
  rows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`flagCoordinates: vector ${i} has ${row.length} entries, expected ${n}`);
  });
  if (flagRows.length === n && isStandardFlag(F, flagRows)) return rows.map((row) => row.slice());
  return multiply(F, rows, flagInverse(F, flagRows, n), n);
}

/** A basis (RREF) of F_i, the span of the first i flag vectors (0 ≤ i ≤ n). */
export function flagSubspace<T>(F: Field<T>, flagRows: readonly (readonly T[])[], i: number, n: number): T[][] {
  checkFlag(F, flagRows, n);
  if (!Number.isInteger(i) || i < 0 || i > n) throw new RangeError(`flagSubspace: index ${i} is not in [0, ${n}]`);
  return rref(F, flagRows.slice(0, i), n).rows;
}
