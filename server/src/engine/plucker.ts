/**
 * Plücker coordinates: all maximal minors of a k×n matrix, in lexicographic
 * order of their column sets.
 *
 * The minors are found in one depth-first walk over column subsets rather than
 * one elimination per minor. A node of the walk is a prefix c_0 < … < c_{d−1}
 * of a column set, and carries the matrix with those columns already
 * eliminated: d rows have been used as pivots and the k−d remaining rows are
 * zero in the chosen columns. Choosing the next column c pivots on the first
 * remaining row that is nonzero in column c and eliminates it from the other
 * remaining rows, only in the columns after c (the only ones a descendant can
 * still choose). If no remaining row is nonzero in column c, the chosen columns
 * have rank d, so every column set with this prefix has minor zero and the whole
 * subtree is skipped. At depth k−1 a single row remains and each leaf minor is
 * read off with one multiplication.
 *
 * Cost: an inner node at depth d with last column c costs (k−d−1)·(n−c) entry
 * updates and a leaf costs O(1). Each depth has at most C(n, k) nodes (a prefix
 * determines its own lexicographically first completion), so the total is at
 * most O(k²·n·C(n, k)) field operations, and in practice far less because
 * most nodes sit near the leaves, where both factors are small.
 *
 * Over the rationals the rows are first cleared of denominators and the walk
 * runs on bigints with fraction-free (Bareiss) updates: after d pivots each
 * entry is itself a (d+1)×(d+1) minor, so all divisions are exact and no
 * fractions arise; each result is divided by the product of the row scales at
 * the end. Other fields use ordinary elimination (dividing by the pivot).
 */
import type { Field } from './field.js';
import { determinant } from './matrix.js';
import { fromDense, type Multivector } from './multivector.js';
import { QQ, lcmBigInt, type Rational } from './rational.js';
import { binomial } from './subsets.js';

function checkMatrix<T>(rows: readonly (readonly T[])[], n: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: dimension ${n} must be a nonnegative integer`);
  rows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`${what}: row ${i} has ${row.length} entries, expected ${n}`);
  });
}

/**
 * The depth-first walk shared by both kinds of arithmetic. `E` is the entry
 * type; `State` is what a node carries besides its matrix (sign and pivot data).
 */
interface WalkArithmetic<E, State> {
  isZero(e: E): boolean;
  /** Fills `next` (the remaining rows minus row q, updated in columns > c) and returns the child's state. */
  eliminate(rows: E[][], count: number, q: number, c: number, n: number, state: State, next: E[][]): State;
  /** The minor at a leaf: `entry` is the last row's entry in the last chosen column, nonzero. */
  leaf(state: State, entry: E): void;
  /** Records that `count` consecutive minors are zero. */
  zeros(count: number): void;
}

function walk<E, State>(k: number, n: number, top: E[][], start: State, ops: WalkArithmetic<E, State>): void {
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

/** Elimination over any field: the state is the signed product of the pivots so far. */
function pluckerOverField<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number, out: T[]): void {
  const k = basisRows.length;
  let index = 0;
  walk<T, T>(k, n, basisRows.map((r) => r.slice()), F.one, {
    isZero: (e) => F.isZero(e),
    eliminate(rows, count, q, c, width, product, next) {
      const pivotRow = rows[q]!;
      const pivot = pivotRow[c]!;
      const inverse = F.inv(pivot);
      let t = 0;
      for (let i = 0; i < count; i++) {
        if (i === q) continue;
        const row = rows[i]!;
        const target = next[t++]!;
        const factor = F.mul(row[c]!, inverse);
        if (F.isZero(factor)) {
          for (let j = c + 1; j < width; j++) target[j] = row[j]!;
        } else {
          for (let j = c + 1; j < width; j++) {
            const p = pivotRow[j]!;
            target[j] = F.isZero(p) ? row[j]! : F.sub(row[j]!, F.mul(factor, p));
          }
        }
      }
      // Taking the q-th remaining row as the next pivot moves it past q rows: sign (−1)^q.
      const signed = q % 2 === 0 ? product : F.neg(product);
      return F.mul(signed, pivot);
    },
    leaf(product, entry) {
      out[index++] = F.mul(product, entry);
    },
    zeros(count) {
      index += count;
    },
  });
}

interface BareissState {
  negative: boolean;
  previous: bigint;
}

/** Fraction-free elimination over the integers, for the rationals. */
function pluckerOverRationals(basisRows: readonly (readonly Rational[])[], n: number, out: Rational[]): void {
  const k = basisRows.length;
  // Scaling row i by the lcm of its denominators multiplies every maximal minor by it.
  let scale = 1n;
  const top = basisRows.map((row) => {
    const l = row.reduce((acc, x) => lcmBigInt(acc, x.den), 1n);
    scale *= l;
    return row.map((x) => (x.num * l) / x.den);
  });
  let index = 0;
  walk<bigint, BareissState>(k, n, top, { negative: false, previous: 1n }, {
    isZero: (e) => e === 0n,
    eliminate(rows, count, q, c, width, state, next) {
      const pivotRow = rows[q]!;
      const pivot = pivotRow[c]!;
      const previous = state.previous;
      let t = 0;
      for (let i = 0; i < count; i++) {
        if (i === q) continue;
        const row = rows[i]!;
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
      out[index++] = QQ.fromRational(state.negative ? -entry : entry, scale);
    },
    zeros(count) {
      index += count;
    },
  });
}

/**
 * All C(n, k) maximal minors of the k×n matrix `basisRows`, in lexicographic
 * order of their column sets: entry number rankLex(K, n) is det of the columns
 * K. For k = 0 this is [1]; for k > n it is empty. Exact over every field.
 */
export function pluckerCoordinates<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number): T[] {
  checkMatrix(basisRows, n, 'pluckerCoordinates');
  const k = basisRows.length;
  if (k > n) return [];
  if (k === 0) return [F.one];
  const out = new Array<T>(binomial(n, k)).fill(F.zero);
  if ((F as unknown) === QQ) {
    pluckerOverRationals(basisRows as unknown as readonly (readonly Rational[])[], n, out as unknown as Rational[]);
  } else {
    pluckerOverField(F, basisRows, n, out);
  }
  return out;
}

/** The Plücker coordinates as a sparse multivector of degree k: the wedge of the rows. */
export function pluckerMultivector<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number): Multivector<T> {
  const k = basisRows.length;
  return fromDense(F, n, k, pluckerCoordinates(F, basisRows, n));
}

/**
 * One minor: the determinant of the square submatrix of `rows` on `columns`,
 * taken in the order given (so swapping two columns changes the sign).
 */
export function minor<T>(F: Field<T>, rows: readonly (readonly T[])[], columns: readonly number[]): T {
  if (columns.length !== rows.length) {
    throw new RangeError(`minor: ${columns.length} columns chosen for ${rows.length} rows`);
  }
  const sub = rows.map((row, i) =>
    columns.map((c) => {
      if (!Number.isInteger(c) || c < 0 || c >= row.length) {
        throw new RangeError(`minor: column ${c} is not in [0, ${row.length}) (row ${i})`);
      }
      return row[c]!;
    }),
  );
  return determinant(F, sub);
}
