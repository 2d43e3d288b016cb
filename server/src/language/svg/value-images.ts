/**
 * Which values get a picture in their hover, in the file's conventions: a
 * reduced basis and a chart [I | Y] as matrices laid out as the file lays out
 * bases (the chart's identity columns shaded), the Young diagram of a
 * Schubert cell, and the zero/sign pattern of a Plücker vector.
 */
import { unrankLex } from '../../engine/subsets.js';
import type { DisplayedPoint } from '../coordinates.js';
import type { Environment } from '../environment.js';
import type { ChartValue, PositivityValue, Scalar, SchubertValue } from '../values.js';
import { matrixImage, signPatternImage, youngDiagramImage, type Mark } from './hover-images.js';
import { SIGN_PATTERN_LIMIT } from './sign-pattern.js';

function texts(env: Environment, rows: readonly (readonly Scalar[])[]): string[][] {
  return rows.map((r) => r.map((x) => env.F.format(x)));
}

function transpose(rows: readonly string[][]): string[][] {
  return Array.from({ length: rows[0]?.length ?? 0 }, (_, j) => rows.map((r) => r[j]!));
}

function columnsLayout(env: Environment): boolean {
  return env.convention.layout === 'columns';
}

/** The basis labels 1 … n (or 0 … n−1). */
function positions(env: Environment, n: number): string[] {
  return Array.from({ length: n }, (_, i) => String(env.labels.position(i)));
}

/** The reduced basis of a subspace, its vectors as rows or as columns. */
export function basisImage(env: Environment, basis: readonly (readonly Scalar[])[], title: string): string | undefined {
  if (basis.length === 0) return undefined;
  const cells = texts(env, basis);
  return matrixImage({ cells: columnsLayout(env) ? transpose(cells) : cells, title });
}

/** The basis [I | Y] of a chart, its identity columns shaded and every column labelled. */
export function chartImage(env: Environment, c: ChartValue): string | undefined {
  const n = c.subspace.space.dim;
  const cells = texts(env, c.full);
  const identity = new Set(c.columns);
  const title = `Chart basis with the identity in columns ${c.columns.map((i) => env.labels.position(i)).join(', ')} (shaded)`;
  if (columnsLayout(env)) return matrixImage({ cells: transpose(cells), title: title.replace('columns', 'rows'), shadedRows: identity });
  return matrixImage({ cells, title, columnLabels: positions(env, n), shadedColumns: identity });
}

function markOf(env: Environment, x: Scalar): Mark {
  if (env.F.sign) {
    const s = env.F.sign(x);
    return s > 0 ? '+' : s < 0 ? '-' : '0';
  }
  return env.F.isZero(x) ? '0' : 'nonzero';
}

/** The pattern of the projective point as the hover lists it (display order, normalized). */
export function pointPatternImage(env: Environment, point: DisplayedPoint): string | undefined {
  // Past the legible size there is no picture, so there is no need to list every label and sign.
  if (point.count === 0 || point.count > SIGN_PATTERN_LIMIT) return undefined;
  const what = env.F.sign ? `Sign pattern of the projective point (${point.applied})` : 'Zero pattern of the projective point';
  return signPatternImage(point.labels, point.normalized.map((x) => markOf(env, x)), what);
}

/** The signs a positivity result reports (lexicographic, as its hover lists them). */
export function positivityImage(env: Environment, p: PositivityValue): string | undefined {
  // As for a projective point: no picture past the legible size, so no labels for one.
  if (p.signs.length === 0 || p.signs.length > SIGN_PATTERN_LIMIT) return undefined;
  const n = p.subspace.space.dim;
  const k = p.subspace.basis.length;
  const labels = p.signs.map((_, i) => env.labels.label(unrankLex(i, n, k), n));
  const marks = p.signs.map((s): Mark => (s > 0 ? '+' : s < 0 ? '-' : '0'));
  return signPatternImage(labels, marks, 'Sign pattern of the Plücker vector (lexicographic)');
}

/** The Young diagram of the cell's partition in the k×(n−k) box. */
export function schubertImage(c: SchubertValue): string | undefined {
  const k = c.partition.length;
  return youngDiagramImage(c.partition, k, c.subspace.space.dim - k);
}
