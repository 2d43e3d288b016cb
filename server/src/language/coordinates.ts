/**
 * Plücker vectors as the user sees them: in the file's index order, with the
 * file's labels, normalized as the file asks. The engine always works in
 * lexicographic order; this is the one place that reorders.
 */
import { normalizePoint } from '../engine/normalize.js';
import { unrankLex } from '../engine/subsets.js';
import { displayOrder } from './conventions.js';
import type { Environment } from './environment.js';
import type { Normalization } from './types.js';
import type { Scalar } from './values.js';

export interface DisplayedPoint {
  /** The index sets (0-based) in display order. */
  subsets: number[][];
  /** Their printed labels. */
  labels: string[];
  /** The coordinates in display order, as computed. */
  raw: Scalar[];
  /** The coordinates in display order, normalized (the first nonzero one is first in display order). */
  normalized: Scalar[];
  applied: Normalization;
}

const orderCache = new Map<string, number[]>();

/** Lexicographic ranks in display order, cached (the permutation depends only on order, n and k). */
function ranks(env: Environment, n: number, k: number): number[] {
  const key = `${env.convention.order}:${n}:${k}`;
  let r = orderCache.get(key);
  if (!r) {
    r = displayOrder(env.convention.order, n, k);
    if (orderCache.size > 64) orderCache.clear();
    orderCache.set(key, r);
  }
  return r;
}

export function displayPoint(env: Environment, lexValues: readonly Scalar[], n: number, k: number): DisplayedPoint {
  const order = ranks(env, n, k);
  const raw = order.map((r) => lexValues[r]);
  const subsets = order.map((r) => unrankLex(r, n, k));
  const point = normalizePoint(env.F, raw, env.convention.normalization);
  return {
    subsets,
    labels: subsets.map((s) => env.labels.label(s, n)),
    raw,
    normalized: point.values,
    applied: point.mode,
  };
}

/** Coordinates written in display order (a point literal in a claim), put back in lexicographic order. */
export function toLexOrder(env: Environment, displayValues: readonly Scalar[], n: number, k: number): Scalar[] {
  const order = ranks(env, n, k);
  const out = new Array<Scalar>(displayValues.length);
  order.forEach((r, i) => {
    out[r] = displayValues[i];
  });
  return out;
}
