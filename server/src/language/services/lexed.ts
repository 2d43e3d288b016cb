/**
 * The tokens and comments of a document, for the editor features that need
 * more than the syntax tree keeps: where commas and brackets are (signature
 * help), what was typed just before the cursor (completion), and where the
 * comments are (folding, formatting).
 */
import type { IToken } from 'chevrotain';
import * as T from '../tokens.js';
import type { Span } from '../types.js';

export interface Lexed {
  /** Every token in source order (whitespace and comments are skipped by the lexer). */
  tokens: IToken[];
  /** Every comment, from its `#` to the end of its line (the line break excluded). */
  comments: Span[];
  /** Whether some character could not be read. */
  hasErrors: boolean;
}

export function lex(text: string): Lexed {
  const lexed = T.wedgeLexer().tokenize(text);
  // No token can contain `#` (the language has no strings), so every `#` starts a comment.
  const comments: Span[] = [];
  for (const match of text.matchAll(/#[^\r\n]*/g)) {
    comments.push({ start: match.index, end: match.index + match[0].length });
  }
  return { tokens: lexed.tokens, comments, hasErrors: lexed.errors.length > 0 };
}

export function spanOf(token: IToken): Span {
  return { start: token.startOffset, end: token.endOffset! + 1 };
}

/** Whether the offset lies inside a comment (after its `#`, up to the end of the line). */
export function inComment(comments: readonly Span[], offset: number): boolean {
  return comments.some((c) => c.start < offset && offset <= c.end);
}

/** Whether a token is a word: a name or a keyword. */
export function isWord(token: IToken): boolean {
  return token.tokenType === T.Identifier || T.isKeyword(token.tokenType) || T.isStatementKeyword(token);
}

/** The index of the last statement keyword among `tokens`, or -1. */
export function lastStatementStart(tokens: readonly IToken[]): number {
  for (let i = tokens.length - 1; i >= 0; i--) if (T.isStatementKeyword(tokens[i]!)) return i;
  return -1;
}

/** Whether a name is written as the language's identifiers are (see `./../tokens.ts`). */
export function isIdentifierText(name: string): boolean {
  return /^[\p{L}_][\p{L}\p{M}\p{Nd}_']*$/u.test(name);
}

/** Every keyword of the language, as written. */
export const KEYWORD_WORDS: ReadonlySet<string> = new Set(
  T.KEYWORDS.map((t) => (typeof t.PATTERN === 'string' ? t.PATTERN : t.name.toLowerCase())),
);

/** The statement keywords, as written, in the order the language reference lists them. */
export const STATEMENT_WORDS: readonly string[] = T.STATEMENT_KEYWORDS.map((t) =>
  typeof t.PATTERN === 'string' ? t.PATTERN : t.name.toLowerCase(),
);
