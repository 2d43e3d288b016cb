/**
 * Exact linear algebra over any `Field`: row reduction, rank, determinants,
 * kernels, linear systems, dependencies and operations on row spaces.
 *
 * Matrices are arrays of rows (`T[][]`) and vectors are arrays (`T[]`). No
 * function mutates its inputs. Because a matrix without rows carries no width,
 * functions that may meet one take the number of columns explicitly.
 */
import type { Field } from './field.js';
import { QQ, lcmBigInt, type Rational } from './rational.js';

/** The reduced row echelon form of a matrix. */
export interface RowEchelon<T> {
  /** The `rank` nonzero rows: each pivot entry is 1 and every other entry of a pivot column is 0. */
  rows: T[][];
  /** The pivot column of each row, ascending. */
  pivots: number[];
  rank: number;
}

/** A vector found to be a combination of the vectors before it. */
export interface Dependency<T> {
  /** The first index j whose vector lies in the span of vectors[0..j-1]. */
  index: number;
  /** c_0..c_{j-1} with vectors[j] = Σ c_i·vectors[i]. */
  coefficients: T[];
}

/** The common row length, checked; `ncols` is required when there are no rows. */
function widthOf<T>(m: readonly (readonly T[])[], ncols: number | undefined, what: string): number {
  const width = ncols ?? m[0]?.length ?? 0;
  m.forEach((row, i) => {
    if (row.length !== width) {
      throw new Error(`${what}: row ${i} has ${row.length} entries, expected ${width}`);
    }
  });
  return width;
}

function copyRows<T>(m: readonly (readonly T[])[]): T[][] {
  return m.map((row) => row.slice());
}

/** row ← row − factor·other, in place, for columns from `start` on (earlier ones are zero in `other`). */
function subtractMultiple<T>(F: Field<T>, row: T[], other: readonly T[], factor: T, start: number): void {
  for (let c = start; c < row.length; c++) {
    if (!F.isZero(other[c]!)) row[c] = F.sub(row[c]!, F.mul(factor, other[c]!));
  }
}

/** In-place Gauss–Jordan elimination of a private copy; returns the pivot columns. */
function reduceInPlace<T>(F: Field<T>, rows: T[][], width: number): number[] {
  const pivots: number[] = [];
  let rank = 0;
  for (let col = 0; col < width && rank < rows.length; col++) {
    let found = -1;
    for (let r = rank; r < rows.length; r++) {
      if (!F.isZero(rows[r]![col]!)) {
        found = r;
        break;
      }
    }
    if (found < 0) continue;
    [rows[rank], rows[found]] = [rows[found]!, rows[rank]!];
    const pivotRow = rows[rank]!;
    if (!F.isOne(pivotRow[col]!)) {
      const scale = F.inv(pivotRow[col]!);
      for (let c = col; c < width; c++) pivotRow[c] = F.mul(scale, pivotRow[c]!);
    }
    for (let r = 0; r < rows.length; r++) {
      if (r === rank) continue;
      const factor = rows[r]![col]!;
      if (!F.isZero(factor)) subtractMultiple(F, rows[r]!, pivotRow, factor, col);
    }
    pivots.push(col);
    rank++;
  }
  rows.length = rank;
  return pivots;
}

/** The reduced row echelon form of m; `ncols` is needed when m has no rows. */
export function rref<T>(F: Field<T>, m: readonly (readonly T[])[], ncols?: number): RowEchelon<T> {
  const width = widthOf(m, ncols, 'rref');
  const rows = copyRows(m);
  const pivots = reduceInPlace(F, rows, width);
  return { rows, pivots, rank: pivots.length };
}

export function rank<T>(F: Field<T>, m: readonly (readonly T[])[], ncols?: number): number {
  return rref(F, m, ncols).rank;
}

/**
 * The determinant of a square matrix (1 for the empty matrix). Over the
 * rationals the rows are cleared of denominators and reduced fraction-free
 * (Bareiss), which keeps every intermediate value an integer; other fields use
 * Gaussian elimination, tracking the sign of each row swap.
 */
export function determinant<T>(F: Field<T>, m: readonly (readonly T[])[]): T {
  const n = m.length;
  widthOf(m, n, 'determinant (the matrix must be square)');
  if ((F as unknown) === QQ) return determinantRational(m as unknown as readonly (readonly Rational[])[]) as unknown as T;
  const rows = copyRows(m);
  let det = F.one;
  for (let col = 0; col < n; col++) {
    let found = -1;
    for (let r = col; r < n; r++) {
      if (!F.isZero(rows[r]![col]!)) {
        found = r;
        break;
      }
    }
    if (found < 0) return F.zero;
    if (found !== col) {
      [rows[col], rows[found]] = [rows[found]!, rows[col]!];
      det = F.neg(det);
    }
    const pivotRow = rows[col]!;
    const pivot = pivotRow[col]!;
    det = F.mul(det, pivot);
    const inverse = F.inv(pivot);
    for (let r = col + 1; r < n; r++) {
      const entry = rows[r]![col]!;
      if (!F.isZero(entry)) subtractMultiple(F, rows[r]!, pivotRow, F.mul(entry, inverse), col);
    }
  }
  return det;
}

function determinantRational(m: readonly (readonly Rational[])[]): Rational {
  const n = m.length;
  if (n === 0) return QQ.one;
  // Scaling row i by the lcm of its denominators multiplies the determinant by it; undo that at the end.
  let scale = 1n;
  const a: bigint[][] = m.map((row) => {
    const l = row.reduce((acc, x) => lcmBigInt(acc, x.den), 1n);
    scale *= l;
    return row.map((x) => (x.num * l) / x.den);
  });
  // Bareiss: after step k every entry is a k×k minor, so each division below is exact.
  let sign = 1n;
  let previous = 1n;
  for (let k = 0; k < n - 1; k++) {
    if (a[k]![k] === 0n) {
      let swap = -1;
      for (let r = k + 1; r < n; r++) {
        if (a[r]![k] !== 0n) {
          swap = r;
          break;
        }
      }
      if (swap < 0) return QQ.zero;
      [a[k], a[swap]] = [a[swap]!, a[k]!];
      sign = -sign;
    }
    const pivot = a[k]![k]!;
    for (let i = k + 1; i < n; i++) {
      const rowI = a[i]!;
      const rowK = a[k]!;
      for (let j = k + 1; j < n; j++) rowI[j] = (rowI[j]! * pivot - rowI[k]! * rowK[j]!) / previous;
      rowI[k] = 0n;
    }
    previous = pivot;
  }
  return QQ.fromRational(sign * a[n - 1]![n - 1]!, scale);
}

/**
 * A basis of the kernel {x : m·x = 0}, one row per free column of the RREF:
 * that free variable is 1, the other free variables are 0.
 */
export function kernel<T>(F: Field<T>, m: readonly (readonly T[])[], ncols: number): T[][] {
  const { rows, pivots } = rref(F, m, ncols);
  const pivotSet = new Set(pivots);
  const basis: T[][] = [];
  for (let free = 0; free < ncols; free++) {
    if (pivotSet.has(free)) continue;
    const x = new Array<T>(ncols).fill(F.zero);
    x[free] = F.one;
    rows.forEach((row, i) => {
      x[pivots[i]!] = F.neg(row[free]!);
    });
    basis.push(x);
  }
  return basis;
}

/**
 * One solution x (free variables 0) of a·x = b, where a has `ncols` columns;
 * undefined when the system is inconsistent.
 */
export function solve<T>(
  F: Field<T>,
  a: readonly (readonly T[])[],
  b: readonly T[],
  ncols: number,
): T[] | undefined {
  widthOf(a, ncols, 'solve');
  if (b.length !== a.length) {
    throw new Error(`solve: the right-hand side has ${b.length} entries for ${a.length} equations`);
  }
  const augmented = a.map((row, i) => [...row, b[i]!]);
  const { rows, pivots } = rref(F, augmented, ncols + 1);
  if (pivots[pivots.length - 1] === ncols) return undefined;
  const x = new Array<T>(ncols).fill(F.zero);
  rows.forEach((row, i) => {
    x[pivots[i]!] = row[ncols]!;
  });
  return x;
}

/**
 * The first vector that is a combination of those before it, with the
 * coefficients of that combination; undefined when all are independent.
 *
 * One elimination runs through the list. Each independent vector is reduced
 * against the ones kept so far and kept together with its expression in terms
 * of the original vectors; a vector that reduces to zero yields its dependency.
 */
export function findDependency<T>(F: Field<T>, vectors: readonly (readonly T[])[]): Dependency<T> | undefined {
  widthOf(vectors, undefined, 'findDependency');
  // Kept vector k has pivot entry 1 and zeros at the pivots of all earlier kept
  // vectors, so reducing against them in order clears every pivot column.
  const kept: { pivot: number; reduced: T[]; combination: T[] }[] = [];
  for (let j = 0; j < vectors.length; j++) {
    const reduced = vectors[j]!.slice();
    // reduced = Σ combination[i]·vectors[i] holds throughout.
    const combination = new Array<T>(j + 1).fill(F.zero);
    combination[j] = F.one;
    for (const k of kept) {
      const factor = reduced[k.pivot]!;
      if (F.isZero(factor)) continue;
      subtractMultiple(F, reduced, k.reduced, factor, k.pivot);
      k.combination.forEach((c, i) => {
        if (!F.isZero(c)) combination[i] = F.sub(combination[i]!, F.mul(factor, c));
      });
    }
    const pivot = reduced.findIndex((x) => !F.isZero(x));
    if (pivot < 0) {
      // 0 = vectors[j] + Σ_{i<j} combination[i]·vectors[i].
      return { index: j, coefficients: combination.slice(0, j).map((c) => F.neg(c)) };
    }
    const scale = F.inv(reduced[pivot]!);
    kept.push({
      pivot,
      reduced: reduced.map((x) => F.mul(scale, x)),
      combination: combination.map((c) => F.mul(scale, c)),
    });
  }
  return undefined;
}

/**
 * Coefficients c with v = Σ c_i·basisRows[i], or undefined when v is not in
 * their span. For independent rows the coefficients are unique; otherwise one
 * choice is returned.
 */
export function coordinatesIn<T>(
  F: Field<T>,
  basisRows: readonly (readonly T[])[],
  v: readonly T[],
): T[] | undefined {
  widthOf(basisRows, v.length, 'coordinatesIn');
  return solve(F, transpose(basisRows, v.length), v, basisRows.length);
}

/** Whether the rows of a and of b span the same space. */
export function rowSpaceEquals<T>(
  F: Field<T>,
  a: readonly (readonly T[])[],
  b: readonly (readonly T[])[],
  ncols: number,
): boolean {
  // The reduced row echelon form is unique for each row space.
  const ra = rref(F, a, ncols);
  const rb = rref(F, b, ncols);
  return ra.rank === rb.rank && matrixEquals(F, ra.rows, rb.rows);
}

/** The product a·b; `bcols` is needed when b has no rows. */
export function multiply<T>(
  F: Field<T>,
  a: readonly (readonly T[])[],
  b: readonly (readonly T[])[],
  bcols?: number,
): T[][] {
  const inner = widthOf(a, b.length, 'multiply (columns of a against rows of b)');
  const width = widthOf(b, bcols, 'multiply');
  return a.map((row) => {
    const out = new Array<T>(width).fill(F.zero);
    for (let k = 0; k < inner; k++) {
      const x = row[k]!;
      if (F.isZero(x)) continue;
      const bRow = b[k]!;
      for (let c = 0; c < width; c++) out[c] = F.add(out[c]!, F.mul(x, bRow[c]!));
    }
    return out;
  });
}

/** The transpose; `ncols` (the width of m) is needed when m has no rows. */
export function transpose<T>(m: readonly (readonly T[])[], ncols?: number): T[][] {
  const width = widthOf(m, ncols, 'transpose');
  const out: T[][] = [];
  for (let c = 0; c < width; c++) out.push(m.map((row) => row[c]!));
  return out;
}

export function identity<T>(F: Field<T>, n: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < n; i++) {
    const row = new Array<T>(n).fill(F.zero);
    row[i] = F.one;
    out.push(row);
  }
  return out;
}

/** Whether a and b have the same shape and equal entries. */
export function matrixEquals<T>(F: Field<T>, a: readonly (readonly T[])[], b: readonly (readonly T[])[]): boolean {
  return (
    a.length === b.length &&
    a.every((row, i) => row.length === b[i]!.length && row.every((x, j) => F.eq(x, b[i]![j]!)))
  );
}

export function isZeroVector<T>(F: Field<T>, v: readonly T[]): boolean {
  return v.every((x) => F.isZero(x));
}

/**
 * A basis, in reduced row echelon form, of rowspace(a) ∩ rowspace(b).
 *
 * Zassenhaus's method: reduce the rows (u | u) for u in a and (w | 0) for w in
 * b. The reduced rows whose left half vanishes are (0 | x) with x running
 * through a basis of the intersection.
 */
export function intersectRowSpaces<T>(
  F: Field<T>,
  a: readonly (readonly T[])[],
  b: readonly (readonly T[])[],
  ncols: number,
): T[][] {
  widthOf(a, ncols, 'intersectRowSpaces');
  widthOf(b, ncols, 'intersectRowSpaces');
  const zeros = new Array<T>(ncols).fill(F.zero);
  const stacked = [...a.map((u) => [...u, ...u]), ...b.map((w) => [...w, ...zeros])];
  const { rows, pivots } = rref(F, stacked, 2 * ncols);
  // Pivots ascend and each is its row's first nonzero entry, so a pivot in the
  // right half means the whole left half of that row is zero.
  const intersection = rows.filter((_, i) => pivots[i]! >= ncols).map((row) => row.slice(ncols));
  return rref(F, intersection, ncols).rows;
}

/** A basis, in reduced row echelon form, of rowspace(a) + rowspace(b). */
export function sumRowSpaces<T>(
  F: Field<T>,
  a: readonly (readonly T[])[],
  b: readonly (readonly T[])[],
  ncols: number,
): T[][] {
  return rref(F, [...a, ...b], ncols).rows;
}
