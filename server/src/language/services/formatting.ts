/**
 * Formatting a document into the canonical layout:
 *
 * - one statement per line (a multi-line matrix literal excepted; see
 *   `./format-statement.ts` for the spacing inside a statement);
 * - comments kept, each with its text unchanged (trailing spaces removed): a
 *   comment on a line of its own starts the line, a comment after code stays
 *   after it — at its original column when its line still begins with the same
 *   word and the code leaves two spaces before it, else two spaces after the
 *   code (so hand-aligned comments stay aligned);
 * - blank lines between statements kept, at most one in a row; none at the
 *   start; the text ends with exactly one line break; line breaks stay `\r\n`
 *   when the text used them.
 *
 * Safety: a document with a syntax problem is not formatted at all (its text
 * may not be what the user meant, and a layout must never lose any). The
 * result is parsed again, and used only when it has no problem, the same
 * statements (compared without their offsets) and the same comments. A
 * statement that would not survive its own layout unchanged is kept as written.
 */
import type { Statement } from '../ast.js';
import { parseProgram } from '../parse.js';
import type { Analysis, Span, TextEdit } from '../types.js';
import { formatStatement, type CommentPlacement } from './format-statement.js';
import { lex } from './lexed.js';
import { lineEdits } from './line-diff.js';
import { sameStatements } from './same-tree.js';

interface Item {
  span: Span;
  statement?: Statement;
}

function lineStart(text: string, offset: number): number {
  return Math.max(text.lastIndexOf('\n', offset - 1), text.lastIndexOf('\r', offset - 1)) + 1;
}

function lineBreaks(text: string): number {
  return (text.match(/\r\n|\r|\n/g) ?? []).length;
}

function firstWord(line: string): string {
  return line.trim().split(/\s/, 1)[0] ?? '';
}

/**
 * A comment after code: at its old column if the line still begins as it did
 * and that leaves two spaces, else two spaces after the code.
 */
function placeComment(line: string, c: CommentPlacement): string {
  const code = line.trimEnd();
  const column = firstWord(code) === c.lineHead ? Math.max(code.length + 2, c.column) : code.length + 2;
  return code.length === 0 ? c.text : code + ' '.repeat(column - code.length) + c.text;
}

function commentTexts(text: string): string[] {
  return lex(text).comments.map((c) => text.slice(c.start, c.end).trimEnd());
}

/** The statement's own text, line by line, trailing spaces removed (for a statement kept as written). */
function asWritten(text: string, s: Statement): string[] {
  return text.slice(s.span.start, s.span.end).split(/\r\n|\r|\n/).map((l) => l.trimEnd());
}

/** The formatted text, or undefined when the text has a syntax problem or the layout could not be verified. */
export function formatText(text: string): string | undefined {
  const { program, problems } = parseProgram(text);
  const lexed = lex(text);
  if (problems.length > 0 || lexed.hasErrors || (program.dropped ?? []).length > 0) return undefined;
  const eol = text.includes('\r\n') ? '\r\n' : '\n';
  const comments = lexed.comments.map((span) => ({
    span,
    text: text.slice(span.start, span.end).trimEnd(),
    column: span.start - lineStart(text, span.start),
    lineHead: firstWord(text.slice(lineStart(text, span.start), span.start)),
  }));
  const inStatement = (c: Span) => program.statements.some((s) => c.start > s.span.start && c.start < s.span.end);
  const items: Item[] = [
    ...program.statements.map((s) => ({ span: s.span, statement: s })),
    ...comments.filter((c) => !inStatement(c.span)).map((c) => ({ span: c.span })),
  ].sort((a, b) => a.span.start - b.span.start);

  const lines: string[] = [];
  let previousEnd: number | undefined;
  for (const item of items) {
    const gap = previousEnd === undefined ? 0 : lineBreaks(text.slice(previousEnd, item.span.start));
    if (item.statement) {
      if (gap >= 2) lines.push('');
      lines.push(...layOut(text, item.statement, lexed.tokens, comments));
    } else {
      const comment = comments.find((c) => c.span.start === item.span.start)!;
      if (previousEnd !== undefined && gap === 0) {
        lines[lines.length - 1] = placeComment(lines[lines.length - 1]!, comment);
      } else {
        if (gap >= 2) lines.push('');
        lines.push(comment.text);
      }
    }
    previousEnd = item.span.end;
  }
  const formatted = lines.length === 0 ? '' : lines.join(eol) + eol;

  const check = parseProgram(formatted);
  const same =
    check.problems.length === 0 &&
    sameStatements(program.statements, check.program.statements) &&
    JSON.stringify(commentTexts(text)) === JSON.stringify(commentTexts(formatted));
  return same ? formatted : undefined;
}

/**
 * The tokens that start inside `span`, found by binary search in the sorted
 * token list. Filtering the whole list for every statement made formatting
 * quadratic: an 8000-line file took 31 s (found by fuzzing).
 */
function tokensWithin<T extends { startOffset: number }>(tokens: readonly T[], span: Span): T[] {
  let low = 0;
  let high = tokens.length;
  while (low < high) {
    const middle = (low + high) >> 1;
    if (tokens[middle]!.startOffset < span.start) low = middle + 1;
    else high = middle;
  }
  let end = low;
  while (end < tokens.length && tokens[end]!.startOffset < span.end) end++;
  return tokens.slice(low, end);
}

/** One statement's lines: its canonical layout, or its text as written if the layout would change it. */
function layOut(
  text: string,
  s: Statement,
  tokens: Parameters<typeof formatStatement>[2],
  comments: (CommentPlacement & { span: Span })[],
): string[] {
  const own = tokensWithin(tokens, s.span);
  const inside = comments.filter((c) => c.span.start > s.span.start && c.span.start < s.span.end);
  const lines = formatStatement(s, text, own, inside, placeComment);
  const reread = parseProgram(lines.join('\n'));
  const kept = reread.problems.length === 0 && sameStatements([s], reread.program.statements);
  return kept ? lines : asWritten(text, s);
}

/**
 * The edits that format the document: none when it is already formatted, has
 * a syntax problem or cannot be formatted safely; otherwise one edit per run
 * of changed lines.
 */
export function formatDocument(analysis: Analysis): TextEdit[] {
  if (analysis.problems.some((p) => p.code.startsWith('syntax/') || p.code.startsWith('internal/'))) return [];
  const formatted = formatText(analysis.text);
  if (formatted === undefined || formatted === analysis.text) return [];
  return lineEdits(analysis.text, formatted);
}
