/**
 * The canonical layout of one statement (see `./formatting.ts` for the rules
 * of the whole document). The statement's tokens are printed in order with
 * the spacing below; what a token is (a sign or a minus, a fraction's slash, a
 * hyphen inside `first-one`) is read from the syntax tree.
 *
 * Spacing: one space between tokens, except none after `(`, `{`, `.` and a
 * prefix sign, none before `)`, `}`, `,`, `;`, `.` and the `(` of a call, none
 * inside a written number (`-1/2`), none around the hyphens of a word
 * (`first-one`), none inside the brackets of a projective point (`[1 : 3]`)
 * and none before the colon of an index set (`{12: 1}`). Binary operators get
 * one space on each side, with two exceptions that keep a tight form because
 * it reads as one quantity: a fraction of two numbers (`1/2 e4`) and a power
 * with a number exponent (`w^2`).
 *
 * A matrix literal written on one line stays on one line (`[ 1 0; 0 1 ]`); one
 * written over several lines gets one row per line, the entries right-aligned
 * in columns and the rows aligned under the first row's first entry. Entries
 * are separated by `, ` if the matrix used commas, else by spaces; rows by the
 * line break (a `;` becomes one: both end a row).
 *
 * Comments inside a statement are kept: inside a matrix at the end of their
 * row's line, elsewhere at the end of the line, which then breaks and goes on
 * indented by four spaces.
 */
import type { IToken } from 'chevrotain';
import type { Entry, Expr, MatrixLit, Statement } from '../ast.js';
import * as T from '../tokens.js';
import type { Span } from '../types.js';
import { forEachStatementExpr } from './walk.js';

/** The indentation of a statement's continuation lines (after a comment inside it). */
export const CONTINUATION_INDENT = 4;

export interface CommentPlacement {
  /** The comment's text, trailing spaces removed. */
  text: string;
  /** Its column in the original text (kept when the code before it still leaves room). */
  column: number;
  /** The first word of its original line, to tell whether the line before it is still the same line. */
  lineHead: string;
}

interface Roles {
  noSpaceBefore: Set<number>;
  noSpaceAfter: Set<number>;
  matrices: Map<number, MatrixLit>;
}

function isNumber(e: Expr): boolean {
  return e.type === 'number';
}

function readRoles(s: Statement, tokens: readonly IToken[]): Roles {
  const noSpaceBefore = new Set<number>();
  const noSpaceAfter = new Set<number>();
  const matrices = new Map<number, MatrixLit>();
  const tight = (offset: number) => {
    noSpaceBefore.add(offset);
    noSpaceAfter.add(offset);
  };
  const tokensIn = (span: Span) => tokens.filter((t) => t.startOffset >= span.start && t.startOffset < span.end);
  const entry = (e: Entry) => tokensIn(e.span).slice(1).forEach((t) => noSpaceBefore.add(t.startOffset));
  forEachStatementExpr([s], (e) => {
    switch (e.type) {
      case 'unary':
        noSpaceAfter.add(e.span.start);
        break;
      case 'binary':
        // The wedge is written tight, as in print (e1^e2); so are numeric fractions (1/2) and powers (w^2).
        if (!e.implicit && ((e.op === '/' && isNumber(e.left) && isNumber(e.right)) || e.op === '^')) {
          tight(e.opSpan.start);
        }
        break;
      case 'matrix':
        matrices.set(e.span.start, e);
        break;
      case 'point': {
        e.entries.forEach(entry);
        noSpaceAfter.add(e.span.start);
        noSpaceBefore.add(e.span.end - 1);
        break;
      }
      case 'indexmap':
        for (const item of e.entries) {
          entry(item.value);
          tokensIn({ start: item.key.span.end, end: item.value.span.start })
            .filter((t) => t.tokenType === T.Colon)
            .forEach((t) => noSpaceBefore.add(t.startOffset));
        }
        break;
      default:
        break;
    }
  });
  // The hyphens inside words: `normalize first-one`, `convention lines direction-moment`, `is totally-positive`.
  const hyphenated: Span | undefined =
    s.type === 'normalize' || s.type === 'convention' ? s.span : s.type === 'claim' ? s.relation.property?.span : undefined;
  if (hyphenated) tokensIn(hyphenated).filter((t) => t.tokenType === T.Minus).forEach((t) => tight(t.startOffset));
  return { noSpaceBefore, noSpaceAfter, matrices };
}

const NO_SPACE_BEFORE_TYPES = [T.RParen, T.RBrace, T.Comma, T.Semicolon, T.Dot];
const NO_SPACE_AFTER_TYPES = [T.LParen, T.LBrace, T.Dot];

function spaceBetween(roles: Roles, previous: IToken, current: IToken): string {
  if (roles.noSpaceAfter.has(previous.startOffset) || roles.noSpaceBefore.has(current.startOffset)) return '';
  if (NO_SPACE_BEFORE_TYPES.includes(current.tokenType) || NO_SPACE_AFTER_TYPES.includes(previous.tokenType)) return '';
  // A name followed by `(` is a call (or `GF(7)`): the grammar reads it so whatever the spacing.
  if (current.tokenType === T.LParen && previous.tokenType === T.Identifier) return '';
  return ' ';
}

/** Builds the lines of one statement. */
class StatementPrinter {
  readonly lines: string[] = [''];
  private pending: CommentPlacement[] = [];

  constructor(private readonly placeComment: (line: string, c: CommentPlacement) => string) {}

  get line(): string {
    return this.lines[this.lines.length - 1]!;
  }

  append(text: string): void {
    this.lines[this.lines.length - 1] += text;
  }

  defer(comments: CommentPlacement[]): void {
    this.pending.push(...comments);
  }

  /** Puts the pending comments at the end of this line (the first) and on lines of their own (the rest). */
  flush(indent: number): void {
    const [first, ...rest] = this.pending;
    this.pending = [];
    if (!first) return;
    this.lines[this.lines.length - 1] = this.placeComment(this.line, first);
    for (const c of rest) this.lines.push(' '.repeat(indent) + c.text);
  }

  breakLine(indent: number): void {
    this.flush(indent);
    this.lines.push(' '.repeat(indent));
  }
}

function printMatrix(
  p: StatementPrinter,
  m: MatrixLit,
  text: string,
  tokens: readonly IToken[],
  comments: readonly (CommentPlacement & { span: Span })[],
): void {
  const inside = tokens.filter((t) => t.startOffset > m.span.start && t.startOffset < m.span.end - 1);
  const separator = inside.some((t) => t.tokenType === T.Comma) ? ', ' : ' ';
  const multiLine = /[\r\n]/.test(text.slice(m.span.start, m.span.end)) && m.rows.length > 1;
  const own = comments.filter((c) => c.span.start > m.span.start && c.span.start < m.span.end);
  if (!multiLine) {
    p.append(`[ ${m.rows.map((r) => r.map((e) => e.text).join(separator)).join('; ')} ]`);
    p.defer(own);
    return;
  }
  const widths: number[] = [];
  for (const row of m.rows) row.forEach((e, j) => (widths[j] = Math.max(widths[j] ?? 0, e.text.length)));
  const rowText = (row: Entry[]) => row.map((e, j) => e.text.padStart(widths[j]!)).join(separator);
  // Each comment goes with the row it follows (a comment before the first entry, with the first row).
  const rowOf = (c: Span) => {
    let r = 0;
    m.rows.forEach((row, i) => {
      if (row[0]!.span.start < c.start) r = i;
    });
    return r;
  };
  p.append('[ ');
  const column = p.line.length;
  m.rows.forEach((row, i) => {
    if (i > 0) p.breakLine(column);
    p.append(rowText(row));
    p.defer(own.filter((c) => rowOf(c.span) === i));
  });
  p.append(' ]');
}

/**
 * The statement laid out canonically, as lines. `tokens` are the statement's
 * tokens and `comments` the comments between them.
 */
export function formatStatement(
  s: Statement,
  text: string,
  tokens: readonly IToken[],
  comments: readonly (CommentPlacement & { span: Span })[],
  placeComment: (line: string, c: CommentPlacement) => string,
): string[] {
  const roles = readRoles(s, tokens);
  const p = new StatementPrinter(placeComment);
  let previous: IToken | undefined;
  let atLineStart = true;
  for (let i = 0; i < tokens.length; i++) {
    const token = tokens[i]!;
    const between = previous
      ? comments.filter((c) => c.span.start > previous!.startOffset && c.span.start < token.startOffset)
      : [];
    // Comments inside a matrix are placed by the matrix itself.
    const loose = between.filter((c) => ![...roles.matrices.values()].some((m) => c.span.start > m.span.start && c.span.start < m.span.end));
    if (loose.length > 0) {
      p.defer(loose);
      p.breakLine(CONTINUATION_INDENT);
      atLineStart = true;
    }
    if (previous && !atLineStart) p.append(spaceBetween(roles, previous, token));
    atLineStart = false;
    const matrix = roles.matrices.get(token.startOffset);
    if (matrix) {
      printMatrix(p, matrix, text, tokens, comments);
      // Go on after the matrix's closing bracket.
      while (i + 1 < tokens.length && tokens[i + 1]!.startOffset < matrix.span.end) i++;
      previous = tokens[i];
      continue;
    }
    p.append(token.image);
    previous = token;
  }
  p.flush(CONTINUATION_INDENT);
  return p.lines.map((l) => l.trimEnd());
}
