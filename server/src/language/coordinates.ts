/**
 * Plücker vectors as the user sees them: in the file's index order, with the
 * file's labels, normalized as the file asks. The engine always works in
 * lexicographic order; this is the one place that reorders.
 *
 * Only what every reader needs is made at once: the coordinates in display
 * order and the normalizing factor. A label or a normalized coordinate is made
 * when it is asked for, and the full lists of them on first reading: a lens
 * shows ten coordinates and a hover sixty, of the 184,756 of G(10,20).
 */
import type { AnyField } from '../engine/fields.js';
import { normalizedCoordinate, pointScaling, type PointScaling } from '../engine/normalize.js';
import { forEachSubset, unrankLex } from '../engine/subsets.js';
import { displayOrder, type Labels } from './conventions.js';
import type { Environment } from './environment.js';
import { defineLazy } from './lazy-property.js';
import type { Normalization } from './types.js';
import type { Scalar } from './values.js';

export interface DisplayedPoint {
  /** The number of coordinates, C(n, k). */
  count: number;
  /** The coordinates in display order, as computed. */
  raw: Scalar[];
  /** The printed label of the index set at display position i. */
  labelAt(i: number): string;
  /** The normalized coordinate at display position i. */
  normalizedAt(i: number): Scalar;
  /** Every printed label, in display order (made on first reading). */
  readonly labels: string[];
  /** The coordinates in display order, normalized (the first nonzero one is first in display order; made on first reading). */
  readonly normalized: Scalar[];
  applied: Normalization;
}

const orderCache = new Map<string, number[]>();

/**
 * Lexicographic ranks in display order, cached (the permutation depends only
 * on order, n and k); undefined for the lexicographic order itself, where
 * display position and rank agree.
 */
function ranks(env: Environment, n: number, k: number): number[] | undefined {
  if (env.convention.order === 'lex') return undefined;
  const key = `${env.convention.order}:${n}:${k}`;
  let r = orderCache.get(key);
  if (!r) {
    r = displayOrder(env.convention.order, n, k);
    if (orderCache.size > 64) orderCache.clear();
    orderCache.set(key, r);
  }
  return r;
}

/** Every label in lexicographic order, in one walk over the index sets. */
function lexLabels(labels: Labels, n: number, k: number): string[] {
  const out: string[] = [];
  if (k <= n) forEachSubset(n, k, (s) => void out.push(labels.label(s, n)));
  return out;
}

export function displayPoint(env: Environment, lexValues: readonly Scalar[], n: number, k: number): DisplayedPoint {
  const order = ranks(env, n, k);
  const raw = order ? order.map((r) => lexValues[r]) : lexValues.slice();
  return lazyPoint(env.F, env.labels, raw, pointScaling(env.F, raw, env.convention.normalization), order, n, k);
}

/**
 * The point whose coordinates in display order are `raw`. Its functions and lists hold the field and the
 * labels only, not the environment: results keep them, and with them whatever they hold.
 */
function lazyPoint(F: AnyField, labels: Labels, raw: Scalar[], scaling: PointScaling<Scalar>, order: number[] | undefined, n: number, k: number): DisplayedPoint {
  const point = {
    count: raw.length,
    raw,
    labelAt: (i: number) => labels.label(unrankLex(order ? order[i]! : i, n, k), n),
    normalizedAt: (i: number) => normalizedCoordinate(F, scaling, raw[i]),
    applied: scaling.mode,
  } as DisplayedPoint;
  defineLazy(point, 'labels', () => {
    const lex = lexLabels(labels, n, k);
    return order ? order.map((r) => lex[r]!) : lex;
  });
  defineLazy(point, 'normalized', () => raw.map((x) => normalizedCoordinate(F, scaling, x)));
  return point;
}

/** Coordinates written in display order (a point literal in a claim), put back in lexicographic order. */
export function toLexOrder(env: Environment, displayValues: readonly Scalar[], n: number, k: number): Scalar[] {
  const order = ranks(env, n, k);
  if (!order) return displayValues.slice();
  const out = new Array<Scalar>(displayValues.length);
  order.forEach((r, i) => {
    out[r] = displayValues[i];
  });
  return out;
}
