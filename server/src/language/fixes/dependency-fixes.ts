/**
 * Quick fixes for a dependent list of vectors (`math/degenerate-span`,
 * `math/degenerate-rows`): drop the vectors that are combinations of the ones
 * before them, leaving a basis of the same span, or write the matrix as its
 * reduced row echelon basis. Both keep the subspace; only its basis changes.
 */
import { rref } from '../../engine/matrix.js';
import type { Call, ColumnsExpr, RowsExpr } from '../ast.js';
import type { Environment } from '../environment.js';
import type { Fix, TextEdit } from '../types.js';
import type { Scalar } from '../values.js';
import { dropItems } from './list-edits.js';
import { isRationalLiteral } from './literals.js';
import { matrixLiteralLike } from './matrix-text.js';

/**
 * The positions of the vectors that lie in the span of the vectors kept
 * before them (scanning left to right): dropping them all leaves a basis of
 * the span, and the kept vectors keep their order.
 */
export function dependentPositions(env: Environment, rows: readonly Scalar[][]): Set<number> {
  const kept: Scalar[][] = [];
  const dependent = new Set<number>();
  const dim = rows[0]?.length ?? 0;
  rows.forEach((row, i) => {
    if (rref(env.F, [...kept, row], dim).rank > kept.length) kept.push(row);
    else dependent.add(i);
  });
  return dependent;
}

function listWords(names: readonly string[]): string {
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** `span(a, b, c)` with c dependent: `span(a, b)`. */
export function spanFixes(env: Environment, e: Call, rows: readonly Scalar[][]): Fix[] {
  const dependent = dependentPositions(env, rows);
  const edits = dropItems(env.source, e.args.map((a) => a.span), dependent);
  if (!edits) return [];
  const names = [...dependent].map((i) => env.source.slice(e.args[i]!.span.start, e.args[i]!.span.end).replace(/\s+/g, ' '));
  return [{ title: `Drop ${listWords(names)} from the span (a basis of the same span is left)`, edits, preferred: true }];
}

/** The reduced basis as entry texts, or undefined when some entry has no literal form (GF(p^m)). */
function reducedRows(env: Environment, vectors: readonly Scalar[][]): string[][] | undefined {
  const dim = vectors[0]?.length ?? 0;
  const basis = rref(env.F, vectors.map((v) => v.slice()), dim).rows.map((r) => r.map((x) => env.F.format(x)));
  return basis.every((r) => r.every(isRationalLiteral)) ? basis : undefined;
}

function transpose(rows: readonly string[][]): string[][] {
  return Array.from({ length: rows[0]?.length ?? 0 }, (_, j) => rows.map((r) => r[j]!));
}

function reducedBasisFix(env: Environment, e: RowsExpr | ColumnsExpr, vectors: readonly Scalar[][], preferred: boolean): Fix[] {
  const basis = reducedRows(env, vectors);
  if (!basis) return [];
  const literal = matrixLiteralLike(env.source, e.matrix, e.type === 'rows' ? basis : transpose(basis));
  if (!literal) return [];
  return [{ title: 'Rewrite as the reduced basis (reduced row echelon form)', edits: [{ span: e.matrix.span, newText: literal }], ...(preferred ? { preferred } : {}) }];
}

/** `rows [ … ]` with a dependent row: drop it, or write the reduced basis. */
export function rowsFixes(env: Environment, e: RowsExpr, rows: readonly Scalar[][]): Fix[] {
  const dependent = dependentPositions(env, rows);
  const rowSpans = e.matrix.rows.map((r) => ({ start: r[0]!.span.start, end: r[r.length - 1]!.span.end }));
  const edits = dropItems(env.source, rowSpans, dependent);
  const names = [...dependent].map((i) => `row ${i + 1}`);
  const drop: Fix[] = edits ? [{ title: `Drop ${listWords(names)} (a basis of the same row space is left)`, edits, preferred: true }] : [];
  return [...drop, ...reducedBasisFix(env, e, rows, drop.length === 0)];
}

/** `columns [ … ]` with a dependent column: drop its entry from every row, or write the reduced basis. */
export function columnsFixes(env: Environment, e: ColumnsExpr, vectors: readonly Scalar[][]): Fix[] {
  const dependent = dependentPositions(env, vectors);
  const edits: TextEdit[] = [];
  let possible = true;
  for (const row of e.matrix.rows) {
    const rowEdits = dropItems(env.source, row.map((x) => x.span), dependent);
    if (rowEdits) edits.push(...rowEdits);
    else possible = false;
  }
  const names = [...dependent].map((j) => `column ${j + 1}`);
  const drop: Fix[] = possible && edits.length > 0 ? [{ title: `Drop ${listWords(names)} (a basis of the same column space is left)`, edits, preferred: true }] : [];
  return [...drop, ...reducedBasisFix(env, e, vectors, drop.length === 0)];
}
