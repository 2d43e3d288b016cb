/**
 * Plücker coordinates over the rationals: which method runs, and why.
 *
 * - Two or three rows: the minors are written out on the integers
 *   (plucker-fraction-free.ts, `pluckerTwoRows`, `pluckerThreeRows`); for so
 *   few products per coordinate any bookkeeping would cost more than the
 *   arithmetic.
 * - Otherwise the multimodular walk (plucker-multimodular.ts) when its
 *   Hadamard bound needs few primes, else the fraction-free walk on bigints.
 * The choice depends on the shape and the size of the entries only, never on
 * a guess: every method is exact.
 */
import { pluckerFractionFree, pluckerThreeRows, pluckerTwoRows } from './plucker-fraction-free.js';
import { pluckerMultimodular, type MultimodularReport } from './plucker-multimodular.js';
import type { Rational } from './rational.js';

export type RationalMethod = 'two rows' | 'three rows' | 'multimodular' | 'fraction-free';

/**
 * All C(n, k) maximal minors of the rational k×n matrix `rows`, k ≥ 2.
 * `chosen`, when given, is told the method; `report` is filled in when the
 * multimodular walk runs.
 */
export function pluckerRational(
  rows: readonly (readonly Rational[])[],
  n: number,
  chosen?: (method: RationalMethod) => void,
  report?: MultimodularReport,
): Rational[] {
  if (rows.length === 2) {
    chosen?.('two rows');
    return pluckerTwoRows(rows, n);
  }
  if (rows.length === 3) {
    chosen?.('three rows');
    return pluckerThreeRows(rows, n);
  }
  const modular = pluckerMultimodular(rows, n, report);
  if (modular !== undefined) {
    chosen?.('multimodular');
    return modular;
  }
  chosen?.('fraction-free');
  return pluckerFractionFree(rows, n);
}
