/**
 * The conventions every result is stated in. A Plücker vector means nothing
 * without them: two sources that disagree on index order or labels disagree on
 * every coordinate. Every hover, lens, CLI and LaTeX output names them.
 */
import type { AnyField } from '../engine/fields.js';
import type { Normalization } from './types.js';

export interface Convention {
  field: AnyField;
  normalization: Normalization;
  /** Index sets are listed in lexicographic order (12, 13, 14, 23, …). */
  order: 'lex';
  /** Labels start at 1: the first basis vector is e1 and the first coordinate p1…. */
  firstLabel: 1;
  /** A basis matrix has the basis vectors as its rows. */
  layout: 'rows';
}

const NORMALIZATION_WORDS: Record<Normalization, string> = {
  raw: 'raw minors (no rescaling)',
  'first-one': 'first nonzero coordinate 1',
  primitive: 'primitive integer vector (gcd 1, first nonzero positive)',
};

export function normalizationWords(n: Normalization): string {
  return NORMALIZATION_WORDS[n];
}

/** One sentence naming every convention, for the end of a hover. */
export function conventionSentence(c: Convention, applied?: Normalization): string {
  const norm = applied ?? c.normalization;
  const fallback =
    applied !== undefined && applied !== c.normalization
      ? ` (asked for ${c.normalization}, which needs the rationals)`
      : '';
  return (
    `Convention: field ${c.field.name}; index sets in lexicographic order, labels from ${c.firstLabel}; ` +
    `basis vectors as rows; projective points shown as ${normalizationWords(norm)}${fallback}.`
  );
}

/** A short tag for a lens line: `QQ, lex from 1, primitive`. */
export function conventionTag(c: Convention, applied?: Normalization): string {
  return `${c.field.name}, lex from ${c.firstLabel}, ${applied ?? c.normalization}`;
}

/** The printed label of a 0-based index set: `13`, or `1,10` once a label has two digits. */
export function indexLabel(subset: readonly number[], n: number): string {
  const labels = subset.map((i) => i + 1);
  return n <= 9 ? labels.join('') : labels.join(',');
}

/** `p13`, `p1,10` in text; `p_{13}`, `p_{1,10}` in LaTeX. */
export function coordinateName(subset: readonly number[], n: number): string {
  return `p${indexLabel(subset, n)}`;
}

export function coordinateLatex(subset: readonly number[], n: number): string {
  return `p_{${indexLabel(subset, n)}}`;
}
