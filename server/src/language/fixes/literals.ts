/**
 * Computed values written back as `.wedge` literals, for the quick fixes that
 * replace a false claimed value with the computed one. Each writer returns
 * undefined when the value has no literal form (an element of GF(p^m) is an
 * expression in the generator, which a point literal cannot hold).
 */
import type { Span, TextEdit } from '../types.js';

/** An exact rational as a literal entry: `3`, `-1/2` (what a matrix or point entry accepts). */
const RATIONAL_LITERAL = /^-?\d+(\/\d+)?$/;

export function isRationalLiteral(text: string): boolean {
  return RATIONAL_LITERAL.test(text);
}

/** `[1 : 3 : -2]`, or undefined when some coordinate is no rational literal. */
export function pointLiteral(coordinates: readonly string[]): string | undefined {
  if (coordinates.length === 0 || !coordinates.every(isRationalLiteral)) return undefined;
  return `[${coordinates.join(' : ')}]`;
}

/** Replaces a claimed value (a number, a tuple) with the computed one, written by the field. */
export function valueReplacement(span: Span, text: string): TextEdit {
  return { span, newText: text };
}

/**
 * The partition of a Schubert cell as a claim writes it: its nonzero parts,
 * `(2, 1)` or `1`; the empty partition keeps its zeros, `(0, 0)`. When the
 * claimed value was written in parentheses that the parser dropped (`(3)`
 * reads as `3`), they are replaced too, so no doubled parentheses appear.
 */
export function partitionReplacement(source: string, span: Span, partition: readonly number[]): TextEdit {
  const nonzero = partition.filter((x) => x !== 0);
  const parts = nonzero.length > 0 ? nonzero : partition.length > 0 ? partition : [0];
  const text = parts.length === 1 ? String(parts[0]) : `(${parts.join(', ')})`;
  const wrapped = source[span.start - 1] === '(' && source[span.end] === ')' && !source.slice(span.start, span.end).includes(',');
  return { span: wrapped ? { start: span.start - 1, end: span.end + 1 } : span, newText: text };
}
