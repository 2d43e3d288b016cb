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
import {
  clearDenominators,
  fractionFreeMinors,
  pluckerFractionFree,
  pluckerThreeRows,
  pluckerTwoRows,
  scaledRational,
  threeRowMinors,
  twoRowMinors,
} from './plucker-fraction-free.js';
import { multimodularMinors, multimodularPlan, pluckerMultimodular, type IntegerMinors, type MultimodularReport } from './plucker-multimodular.js';
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

/**
 * Plücker coordinates over the rationals with one common denominator:
 * coordinate number r (in lexicographic order of the column sets) is
 * numerators[r] / denominator, not necessarily in lowest terms.
 */
export interface ScaledRationalCoordinates {
  /**
   * The minors of the matrix cleared of denominators: doubles holding safe
   * integers when Hadamard's bound shows every one of them below 2^52 and the
   * modular path found them, otherwise bigints.
   */
  numerators: IntegerMinors;
  /** Positive: the product of the lcms of the rows' denominators. */
  denominator: bigint;
}

/**
 * The same coordinates as `pluckerRational`, without one `Rational` (and,
 * for small entries, one bigint) per coordinate: allocating those is most of
 * the cost at G(10,20) with small entries. k ≥ 2.
 */
export function pluckerRationalScaled(
  rows: readonly (readonly Rational[])[],
  n: number,
  chosen?: (method: RationalMethod) => void,
  report?: MultimodularReport,
): ScaledRationalCoordinates {
  if (rows.length === 2 || rows.length === 3) {
    const { integers, scale } = clearDenominators(rows);
    const [a, b, c] = integers as [bigint[], bigint[], bigint[] | undefined];
    chosen?.(c === undefined ? 'two rows' : 'three rows');
    return { numerators: c === undefined ? twoRowMinors(a, b, n) : threeRowMinors(a, b, c, n), denominator: scale };
  }
  const plan = multimodularPlan(rows, n);
  if (plan !== undefined) {
    chosen?.('multimodular');
    return { numerators: multimodularMinors(plan.integers, n, plan.boundSquared, plan.primes, report), denominator: plan.scale };
  }
  chosen?.('fraction-free');
  const { integers, scale } = clearDenominators(rows);
  return { numerators: fractionFreeMinors(integers, n), denominator: scale };
}

/** Coordinate number `index` of `coordinates` as a rational in lowest terms. */
export function scaledCoordinate(coordinates: ScaledRationalCoordinates, index: number): Rational {
  const m = coordinates.numerators[index]!;
  return scaledRational(typeof m === 'bigint' ? m : BigInt(m), coordinates.denominator);
}
