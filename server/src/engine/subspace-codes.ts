/**
 * Distances between subspaces of F^n, the measures used for codes whose
 * codewords are subspaces (as in random linear network coding).
 *
 * Subspaces are given by spanning rows, which need not be independent; an
 * empty list of rows is the zero subspace. Both distances come from the
 * dimensions of U, W and U + W, using dim(U ∩ W) = dim U + dim W − dim(U + W):
 *
 * - the subspace distance d_S(U, W) = dim U + dim W − 2·dim(U ∩ W)
 *   = 2·dim(U + W) − dim U − dim W;
 * - the injection distance d_I(U, W) = max(dim U, dim W) − dim(U ∩ W)
 *   = dim(U + W) − min(dim U, dim W).
 *
 * Both are metrics on the set of all subspaces; for subspaces of one common
 * dimension d_S = 2·d_I.
 */
import type { Field } from './field.js';
import { rank } from './matrix.js';

/** Which distance `minimumDistance` measures. */
export type SubspaceMetric = 'subspace' | 'injection';

interface Dimensions {
  dimU: number;
  dimW: number;
  dimSum: number;
}

function dimensions<T>(F: Field<T>, U: readonly (readonly T[])[], W: readonly (readonly T[])[], n: number): Dimensions {
  return { dimU: rank(F, U, n), dimW: rank(F, W, n), dimSum: rank(F, [...U, ...W], n) };
}

function distanceFrom(d: Dimensions, metric: SubspaceMetric): number {
  return metric === 'subspace' ? 2 * d.dimSum - d.dimU - d.dimW : d.dimSum - Math.min(d.dimU, d.dimW);
}

/** dim U + dim W − 2·dim(U ∩ W) for the row spaces U and W in F^n. */
export function subspaceDistance<T>(F: Field<T>, U: readonly (readonly T[])[], W: readonly (readonly T[])[], n: number): number {
  return distanceFrom(dimensions(F, U, W, n), 'subspace');
}

/** max(dim U, dim W) − dim(U ∩ W) for the row spaces U and W in F^n. */
export function injectionDistance<T>(F: Field<T>, U: readonly (readonly T[])[], W: readonly (readonly T[])[], n: number): number {
  return distanceFrom(dimensions(F, U, W, n), 'injection');
}

/** The least distance in a set of subspaces and the first pair of indices attaining it. */
export interface MinimumDistance {
  distance: number;
  /** Indices i < j; among pairs at the least distance, the first in lexicographic order. */
  pair: [number, number];
}

/**
 * The minimum distance of a set of subspaces of F^n (a subspace code): the
 * least distance between two of its members, with the first pair (i, j),
 * i < j, in lexicographic order that attains it. Undefined for fewer than two
 * subspaces. A repeated subspace gives distance 0. The distance is the subspace
 * distance unless `metric` is 'injection'.
 */
export function minimumDistance<T>(
  F: Field<T>,
  subspaces: readonly (readonly (readonly T[])[])[],
  n: number,
  metric: SubspaceMetric = 'subspace',
): MinimumDistance | undefined {
  if (subspaces.length < 2) return undefined;
  // Each dimension is needed once per pair, so compute them all first.
  const dims = subspaces.map((rows) => rank(F, rows, n));
  let best: MinimumDistance | undefined;
  for (let i = 0; i < subspaces.length; i++) {
    for (let j = i + 1; j < subspaces.length; j++) {
      const dimSum = rank(F, [...subspaces[i]!, ...subspaces[j]!], n);
      const distance = distanceFrom({ dimU: dims[i]!, dimW: dims[j]!, dimSum }, metric);
      if (best === undefined || distance < best.distance) best = { distance, pair: [i, j] };
      // No distance is below 0, so a repeated subspace ends the search.
      if (distance === 0) return best;
    }
  }
  return best;
}
