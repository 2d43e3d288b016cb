/**
 * Positivity of a point of the Grassmannian over the rationals, read off the
 * signs of its Plücker coordinates, and the cyclic shift of columns that
 * preserves positivity.
 *
 * A subspace is totally nonnegative when its nonzero Plücker coordinates all
 * have one sign: then multiplying by that sign gives a representative with
 * every coordinate ≥ 0 (the Plücker vector is only defined up to a nonzero
 * scalar, so a vector with all coordinates ≤ 0 is just as nonnegative). It is
 * totally positive when moreover no coordinate is zero.
 *
 * Signs need an ordered field, so positivity is only defined over QQ; over
 * GF(p) `positivityOf` throws `UnorderedFieldError`. The cyclic shift is a
 * linear map and works over every field.
 */
import type { Field } from './field.js';
import type { Sign } from './subsets.js';

/** Raised when a sign is asked of a field without an order (GF(p)). */
export class UnorderedFieldError extends Error {
  constructor(fieldName: string, what: string) {
    super(`${what} needs an ordered field such as QQ: signs are not defined over ${fieldName}`);
    this.name = 'UnorderedFieldError';
  }
}

export interface Positivity<T> {
  /** All nonzero coordinates have the same sign. */
  totallyNonnegative: boolean;
  /** Totally nonnegative and no coordinate is zero. */
  totallyPositive: boolean;
  /** The sign of each coordinate, in the order given (lexicographic for the engine's Plücker vectors). */
  signPattern: Sign[];
  /**
   * When totally nonnegative: the sign s (1 or −1) shared by all nonzero
   * coordinates, so that s · values is the representative with all
   * coordinates ≥ 0. Undefined when signs are mixed.
   */
  commonSign: 1 | -1 | undefined;
  /** When totally nonnegative: s · values, every entry ≥ 0. */
  nonnegativeRepresentative: T[] | undefined;
  /**
   * When signs are mixed: the positions (indices into `values`) of the first
   * positive and the first negative coordinate, the reason the point is not
   * totally nonnegative.
   */
  mixedSigns: { positive: number; negative: number } | undefined;
  /** When totally nonnegative but not totally positive: the position of the first zero coordinate. */
  firstZero: number | undefined;
}

/**
 * The sign pattern of a Plücker vector over an ordered field and whether it
 * is totally nonnegative or totally positive. The values are taken as given
 * (nothing checks that they satisfy the Plücker relations); the zero vector is
 * no point and is refused.
 */
export function positivityOf<T>(F: Field<T>, pluckerValues: readonly T[]): Positivity<T> {
  const sign = F.sign;
  if (sign === undefined) throw new UnorderedFieldError(F.name, 'Positivity');
  const signPattern = pluckerValues.map((x) => sign(x));
  const positive = signPattern.indexOf(1);
  const negative = signPattern.indexOf(-1);
  if (positive < 0 && negative < 0) {
    throw new RangeError('positivityOf: the zero vector is the Plücker vector of no subspace');
  }
  const mixed = positive >= 0 && negative >= 0;
  const commonSign = mixed ? undefined : positive >= 0 ? 1 : -1;
  const zero = signPattern.indexOf(0);
  return {
    totallyNonnegative: !mixed,
    totallyPositive: !mixed && zero < 0,
    signPattern,
    commonSign,
    nonnegativeRepresentative:
      commonSign === undefined ? undefined : pluckerValues.map((x) => (commonSign === 1 ? x : F.neg(x))),
    mixedSigns: mixed ? { positive, negative } : undefined,
    firstZero: !mixed && zero >= 0 ? zero : undefined,
  };
}

/**
 * The cyclic shift of the columns of a k×n matrix with the twist:
 * (v_0, v_1, …, v_{n−1}) ↦ (v_1, …, v_{n−1}, (−1)^(k−1)·v_0), where v_j are
 * the columns. Its Plücker coordinates are those of the original with every
 * index moved up by one modulo n: p'_I = p_{I+1}. Without the twist the
 * wrapped column would pass k − 1 others and the coordinates that involve it
 * would change sign; with it, total nonnegativity and total positivity are
 * preserved (Postnikov's cyclic symmetry of the nonnegative Grassmannian).
 *
 * `k` must equal the number of rows; it is asked for so that the sign of the
 * twist is explicit at every call. Works over every field.
 */
export function cyclicShift<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number, k: number): T[][] {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`cyclicShift: the number of columns ${n} must be a positive integer`);
  if (k !== basisRows.length) throw new RangeError(`cyclicShift: k = ${k} but the matrix has ${basisRows.length} rows`);
  basisRows.forEach((row, i) => {
    if (row.length !== n) throw new RangeError(`cyclicShift: row ${i} has ${row.length} entries, expected ${n}`);
  });
  const negate = (k - 1) % 2 !== 0;
  return basisRows.map((row) => [...row.slice(1), negate ? F.neg(row[0]!) : row[0]!]);
}
