/**
 * Folding: a statement over several lines (a matrix literal, a long claim)
 * folds to its first line, and so does a block of two or more consecutive
 * comment lines (lines holding nothing but a comment). Statements with a
 * syntax error fold too, by the extent of the text they were read from.
 */
import type { Analysis, Span } from '../types.js';
import { lex } from './lexed.js';

export interface Fold {
  /** From the first character of the first line folded to the last character of the last. */
  span: Span;
  kind: 'region' | 'comment';
}

function hasLineBreak(text: string, span: Span): boolean {
  return /[\r\n]/.test(text.slice(span.start, span.end));
}

/** Whether only whitespace stands between the start of the comment's line and the comment. */
function isWholeLine(text: string, comment: Span): boolean {
  const lineStart = Math.max(text.lastIndexOf('\n', comment.start - 1), text.lastIndexOf('\r', comment.start - 1)) + 1;
  return text.slice(lineStart, comment.start).trim() === '';
}

/** Whether nothing but one line break (and spaces) separates two comments. */
function adjacent(text: string, first: Span, second: Span): boolean {
  return /^[ \t]*(\r\n|\r|\n)[ \t]*$/.test(text.slice(first.end, second.start));
}

export function foldingRanges(analysis: Analysis): Fold[] {
  const facts = analysis.syntax;
  if (!facts) return [];
  const { text } = analysis;
  const folds: Fold[] = [];
  for (const s of [...facts.program.statements, ...(facts.program.dropped ?? [])]) {
    if (hasLineBreak(text, s.span)) folds.push({ span: s.span, kind: 'region' });
  }
  const lineComments = lex(text).comments.filter((c) => isWholeLine(text, c));
  let blockStart = 0;
  for (let i = 1; i <= lineComments.length; i++) {
    if (i < lineComments.length && adjacent(text, lineComments[i - 1]!, lineComments[i]!)) continue;
    if (i - blockStart >= 2) folds.push({ span: { start: lineComments[blockStart]!.start, end: lineComments[i - 1]!.end }, kind: 'comment' });
    blockStart = i;
  }
  return folds.sort((a, b) => a.span.start - b.span.start);
}
