/**
 * Plücker coordinates: all maximal minors of a k×n matrix, in lexicographic
 * order of their column sets.
 *
 * The minors are found in one depth-first walk over column subsets rather than
 * one elimination per minor (plucker-walk.ts explains the walk and its cost).
 * Which arithmetic runs the walk depends on the field:
 * - GF(p) with p < 2^31: plucker-modular.ts, on 32-bit integer arrays with
 *   exact floating-point-assisted modular products, never through the `Field`
 *   interface;
 * - the rationals: plucker-rational.ts chooses between minors written out on
 *   the integers (two or three rows), plucker-multimodular.ts (the walk modulo
 *   enough primes to pin every minor down by Hadamard's bound, then Chinese
 *   remaindering) and, for matrices whose minors are too large for that to pay
 *   off, plucker-fraction-free.ts (fraction-free Bareiss updates on bigints);
 * - any other field: the generic walk below, through the field's operations.
 * All of them are exact; the tests compare each fast path with the generic one.
 */
import type { Field } from './field.js';
import { determinant } from './matrix.js';
import { fromDense, type Multivector } from './multivector.js';
import { clearDenominators } from './plucker-fraction-free.js';
import { pluckerModular, pluckerResidues } from './plucker-modular.js';
import { pluckerRational, pluckerRationalScaled, type ScaledRationalCoordinates } from './plucker-rational.js';
import { walkColumnSets } from './plucker-walk.js';
import { smallPrimeModulus } from './prime-field.js';
import { QQ, type Rational } from './rational.js';
import { binomial } from './subsets.js';

export { scaledCoordinate, type ScaledRationalCoordinates } from './plucker-rational.js';
export type { IntegerMinors } from './plucker-multimodular.js';

function checkMatrix<T>(rows: readonly (readonly T[])[], n: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: dimension ${n} must be a nonnegative integer`);
  rows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`${what}: row ${i} has ${row.length} entries, expected ${n}`);
  });
}

/**
 * The walk over any field through its operations (k ≥ 1): ordinary
 * elimination dividing by the pivot; the state is the signed product of the
 * pivots so far.
 */
function pluckerOverField<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number): T[] {
  const k = basisRows.length;
  const out = new Array<T>(binomial(n, k)).fill(F.zero);
  let index = 0;
  walkColumnSets<T, T>(k, n, basisRows.map((r) => r.slice()), F.one, {
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
  return out;
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
  // The 1×1 minors of one row are its entries.
  if (k === 1) return basisRows[0]!.slice();
  if ((F as unknown) === QQ) {
    return pluckerRational(basisRows as unknown as readonly (readonly Rational[])[], n) as unknown as T[];
  }
  const p = smallPrimeModulus(F);
  if (p !== undefined) {
    // Elements of these fields are the numbers in [0, p) themselves.
    return pluckerModular(basisRows as unknown as readonly (readonly number[])[], n, p) as unknown as T[];
  }
  return pluckerOverField(F, basisRows, n);
}

/**
 * The Plücker coordinates over GF(p), p < 2^31 (F one of the fields made by
 * `primeField`), as residues in [0, p) in an Int32Array, in the order of
 * `pluckerCoordinates`. The same numbers, without copying them into a plain
 * array (at G(10,20) that copy costs about as much as computing them).
 */
export function pluckerResiduesModP(F: Field<number>, basisRows: readonly (readonly number[])[], n: number): Int32Array {
  checkMatrix(basisRows, n, 'pluckerResiduesModP');
  const p = smallPrimeModulus(F);
  if (p === undefined) throw new RangeError(`pluckerResiduesModP: ${F.name} is not a prime field with modulus below 2^31`);
  return pluckerResidues(basisRows, n, p);
}

/**
 * The Plücker coordinates over QQ with one common denominator: coordinate r
 * (in the order of `pluckerCoordinates`) is numerators[r] / denominator
 * (`scaledCoordinate` in plucker-rational.ts gives it in lowest terms). For
 * small entries the numerators are doubles holding safe integers, so no
 * bigint or `Rational` object is made per coordinate.
 */
export function pluckerCoordinatesScaled(basisRows: readonly (readonly Rational[])[], n: number): ScaledRationalCoordinates {
  checkMatrix(basisRows, n, 'pluckerCoordinatesScaled');
  const k = basisRows.length;
  if (k > n) return { numerators: [], denominator: 1n };
  if (k === 0) return { numerators: [1n], denominator: 1n };
  if (k === 1) {
    const { integers, scale } = clearDenominators(basisRows);
    return { numerators: integers[0]!, denominator: scale };
  }
  return pluckerRationalScaled(basisRows, n);
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
