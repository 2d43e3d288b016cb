/**
 * Plain-text forms of values, for messages, lenses, hovers and the CLI.
 * Exact throughout: scalars print as the field prints them (`-3/4`, `5`).
 */
import type { AnyField } from '../engine/fields.js';
import { sortedTerms, type Multivector } from '../engine/multivector.js';
import type { Scalar } from './values.js';

export function formatScalar(F: AnyField, s: Scalar): string {
  return F.format(s);
}

/** `(1, 0, 2, -1)` */
export function formatTuple(F: AnyField, v: readonly Scalar[]): string {
  return `(${v.map((x) => F.format(x)).join(', ')})`;
}

/** `[1 : 3 : 1 : -2]` */
export function formatPoint(F: AnyField, v: readonly Scalar[]): string {
  return `[${v.map((x) => F.format(x)).join(' : ')}]`;
}

/**
 * Σ c_i·name_i as a person writes it: `3 e1 - e2 + 1/2 e4`, zero terms left
 * out, unit coefficients dropped; `0` when every coefficient is zero.
 */
export function formatCombination(F: AnyField, coefficients: readonly Scalar[], names: readonly string[]): string {
  const parts: string[] = [];
  coefficients.forEach((c, i) => {
    if (F.isZero(c)) return;
    parts.push(signedTerm(F, c, names[i]!, parts.length === 0));
  });
  return parts.length ? parts.join(' ') : '0';
}

/** One term of a sum: `- 2 p`, `+ q`, or (first) `-2 p`, `q`. */
function signedTerm(F: AnyField, c: Scalar, name: string, first: boolean): string {
  const text = F.format(c);
  const negative = text.startsWith('-');
  const magnitude = negative ? text.slice(1) : text;
  const coeff = magnitude === '1' ? '' : `${magnitude} `;
  if (first) return `${negative ? '-' : ''}${coeff}${name}`;
  return `${negative ? '-' : '+'} ${coeff}${name}`;
}

/** `e1∧e2 + 2 e3∧e4` in the space's basis names. */
export function formatMultivector(F: AnyField, mv: Multivector<Scalar>, basisNames: readonly string[], maxTerms = 24): string {
  const terms = sortedTerms(mv);
  if (terms.length === 0) return '0';
  const shown = terms.slice(0, maxTerms);
  const names = shown.map((t) => (t.subset.length === 0 ? '1' : t.subset.map((i) => basisNames[i]).join('∧')));
  const text = formatCombination(
    F,
    shown.map((t) => t.coeff),
    names,
  );
  return terms.length > maxTerms ? `${text} + … (${terms.length} terms)` : text;
}

/** Rows of a matrix, columns aligned, for a code block. */
export function formatMatrix(F: AnyField, rows: readonly (readonly Scalar[])[]): string {
  const cells = rows.map((r) => r.map((x) => F.format(x)));
  const width = Math.max(1, ...cells.flat().map((c) => c.length));
  return cells.map((r) => r.map((c) => c.padStart(width)).join('  ')).join('\n');
}

/** `[1 0 2 0; 0 1 3 1]` on one line. */
export function formatMatrixInline(F: AnyField, rows: readonly (readonly Scalar[])[]): string {
  return `[${rows.map((r) => r.map((x) => F.format(x)).join(' ')).join('; ')}]`;
}
