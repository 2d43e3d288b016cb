/**
 * The parse facade: text in, AST and syntax problems out. It never throws.
 *
 * How errors are contained. Every statement begins with one of the keywords
 * field, normalize, space, vector, subspace, multivector, claim, show, and
 * these keywords occur nowhere else. So the token stream is cut before each of
 * them into pieces, and each piece is parsed on its own as one statement: an
 * error spoils only its own statement, and every statement after it is still
 * read. Within a piece the first error is the one reported (one problem per
 * broken statement), and the broken statement is left out of
 * `program.statements` and listed in `program.dropped`.
 *
 * Tokens outside any statement (before the first keyword, or after a complete
 * statement) give `syntax/expected-statement`. A word at the start of a line
 * that looks like a misspelt statement keyword (`vectr`, `Subspace`) is taken
 * as the start of a broken statement: the text before it is parsed as the
 * statement it belongs to, and the misspelling gets its own problem.
 */
import type { IRecognitionException, IToken } from 'chevrotain';
import type { DroppedStatement, Ident, Program, Statement } from './ast.js';
import type { Problem, Span } from './types.js';
import * as T from './tokens.js';
import { statementParser } from './parser.js';
import { buildStatement, tokenSpan } from './build-ast.js';
import { strayTokenMessage, suggestStatementKeyword, unexpectedCharacterMessage } from './syntax-messages.js';
import { PieceMemo } from './piece-memo.js';

/** The parses of recent statement pieces, shared by every parse in this thread (see ./piece-memo.ts). */
export const PIECE_MEMO = new PieceMemo();

export interface ParseResult {
  program: Program;
  problems: Problem[];
}

const ERROR_CODES: Record<string, string> = {
  MismatchedTokenException: 'syntax/missing-token',
  NoViableAltException: 'syntax/unexpected-token',
  EarlyExitException: 'syntax/unexpected-token',
  NotAllInputParsedException: 'syntax/expected-statement',
  // A statement nested past what the parser can descend (./parser.ts, MAX_NESTING).
  NestingLimitException: 'limit/nesting',
};

const KIND_BY_KEYWORD: Record<string, DroppedStatement['kind']> = {
  field: 'field',
  normalize: 'normalize',
  space: 'space',
  vector: 'vector',
  subspace: 'subspace',
  multivector: 'multivector',
  claim: 'claim',
  show: 'show',
  convention: 'convention',
  map: 'map',
  flag: 'flag',
  parameter: 'parameter',
  grassmannian: 'grassmannian',
  class: 'class',
};

function isRealToken(token: IToken | undefined): token is IToken {
  return token !== undefined && !token.isInsertedInRecovery && Number.isFinite(token.startOffset);
}

/** Whether a token is the first one on its source line. */
function startsLine(tokens: IToken[], index: number): boolean {
  const previous = tokens[index - 1];
  const current = tokens[index]!;
  return previous === undefined || (current.startLine ?? 0) > (previous.endLine ?? 0);
}

/** A word that is probably a misspelt statement keyword, with that keyword. */
function misspeltKeyword(token: IToken): string | undefined {
  return token.tokenType === T.Identifier ? suggestStatementKeyword(token.image) : undefined;
}

class ProgramReader {
  readonly statements: Statement[] = [];
  readonly dropped: DroppedStatement[] = [];
  readonly problems: Problem[] = [];
  private readonly indexOfToken = new Map<IToken, number>();

  constructor(
    private readonly text: string,
    private readonly tokens: IToken[],
    private readonly lexErrorOffsets: number[],
    private readonly memo: PieceMemo | undefined,
  ) {
    tokens.forEach((token, index) => this.indexOfToken.set(token, index));
  }

  private problem(code: string, span: Span, message: string): void {
    this.problems.push({ code, severity: 'error', message, span });
  }

  /** Whether an unreadable character lies in [start, end). */
  private lexErrorIn(start: number, end: number): boolean {
    return this.lexErrorOffsets.some((offset) => offset >= start && offset < end);
  }

  /** Where the text after a token ends before the next token (or the end of the text). */
  private nextStart(last: IToken): number {
    const index = this.indexOfToken.get(last);
    const next = index === undefined ? undefined : this.tokens[index + 1];
    return next ? next.startOffset : this.text.length;
  }

  read(): void {
    const starts: number[] = [];
    this.tokens.forEach((token, index) => {
      if (T.isStatementKeyword(token)) starts.push(index);
    });
    const firstStart = starts[0] ?? this.tokens.length;
    if (firstStart > 0) this.stray(this.tokens.slice(0, firstStart), undefined);
    starts.forEach((start, i) => {
      const end = starts[i + 1] ?? this.tokens.length;
      this.piece(this.tokens.slice(start, end), this.tokens[end]);
    });
  }

  /** One statement piece: from the memo when the same text was parsed before, else parsed and remembered. */
  private piece(piece: IToken[], following: IToken | undefined): void {
    const start = piece[0]!.startOffset;
    const key = PieceMemo.key(this.text.slice(start, following ? following.startOffset : this.text.length), following?.image);
    const recalled = this.memo?.recall(key, start);
    if (recalled) {
      this.statements.push(...recalled.statements);
      this.dropped.push(...recalled.dropped);
      this.problems.push(...recalled.problems);
      return;
    }
    const before = { statements: this.statements.length, dropped: this.dropped.length, problems: this.problems.length };
    this.guarded(piece, () => this.statementPiece(piece, following));
    this.memo?.remember(key, start, {
      statements: this.statements.slice(before.statements),
      dropped: this.dropped.slice(before.dropped),
      problems: this.problems.slice(before.problems),
    });
  }

  /** Contains an unexpected internal failure to the one statement it happened in. */
  private guarded(piece: IToken[], work: () => void): void {
    try {
      work();
    } catch (error) {
      const first = piece[0];
      const last = piece[piece.length - 1];
      const span = first && last ? { start: first.startOffset, end: last.endOffset! + 1 } : { start: 0, end: 0 };
      this.problem(
        'syntax/internal',
        span,
        `internal error while reading this statement (please report it): ${error instanceof Error ? error.message : String(error)}`,
      );
      if (first) this.drop(piece);
    }
  }

  private drop(piece: IToken[], kind?: DroppedStatement['kind']): void {
    const keyword = piece[0]!;
    const last = piece[piece.length - 1]!;
    const resolvedKind = kind ?? KIND_BY_KEYWORD[keyword.image];
    if (!resolvedKind) return;
    const nameToken = piece[1];
    const declares: Ident | undefined =
      resolvedKind !== 'field' && resolvedKind !== 'normalize' && resolvedKind !== 'claim' && resolvedKind !== 'show' &&
      resolvedKind !== 'convention' && resolvedKind !== 'parameter' &&
      nameToken?.tokenType === T.Identifier
        ? { span: tokenSpan(nameToken), name: nameToken.image }
        : undefined;
    this.dropped.push({
      span: { start: keyword.startOffset, end: last.endOffset! + 1 },
      keyword: tokenSpan(keyword),
      kind: resolvedKind,
      ...(declares ? { declares } : {}),
    });
  }

  /** One statement's tokens, from its keyword up to (not including) `following`. */
  private statementPiece(piece: IToken[], following: IToken | undefined): void {
    const cst = statementParser().parseStatement(piece, following);
    const errors = statementParser().errors;
    if (errors.length === 0 && cst) {
      this.keepOrDrop(piece, cst, piece[piece.length - 1]!);
      return;
    }
    const error = errors[0];
    if (!error) {
      this.drop(piece);
      return;
    }
    const errorIndex = isRealToken(error.token) ? piece.indexOf(error.token) : piece.length;
    const limit = errorIndex >= 0 ? errorIndex : piece.length;

    // A misspelt statement keyword at the start of a line, at or before the error, ends this statement.
    for (let k = 1; k <= Math.min(limit, piece.length - 1); k++) {
      if (startsLine(piece, k) && misspeltKeyword(piece[k]!) !== undefined) {
        this.statementPiece(piece.slice(0, k), piece[k]);
        this.stray(piece.slice(k), undefined);
        return;
      }
    }

    if (error.name === 'NotAllInputParsedException' && cst && errorIndex > 0) {
      // A complete statement followed by tokens that belong to no statement.
      this.keepOrDrop(piece.slice(0, errorIndex), cst, piece[errorIndex - 1]!);
      this.stray(piece.slice(errorIndex), error.message);
      return;
    }

    this.reportParseError(piece, error);
    this.drop(piece);
  }

  /** Builds a statement that parsed; drops it if the builder finds a problem or a character could not be read. */
  private keepOrDrop(piece: IToken[], cst: Parameters<typeof buildStatement>[0], last: IToken): void {
    if (this.lexErrorIn(piece[0]!.startOffset, this.nextStart(last))) {
      // The tokens parsed only because an unreadable character was skipped; that character is the one problem.
      this.drop(piece);
      return;
    }
    const built = buildStatement(cst, { start: piece[0]!.startOffset, end: last.endOffset! + 1 });
    this.problems.push(...built.problems);
    if (built.statement) this.statements.push(built.statement);
    else this.drop(piece);
  }

  private reportParseError(piece: IToken[], error: IRecognitionException): void {
    const token = isRealToken(error.token) ? error.token : undefined;
    // An unreadable character before the error probably caused it, and it is already reported.
    const pieceStart = piece[0]!.startOffset;
    const errorOffset = token ? token.startOffset : this.nextStart(piece[piece.length - 1]!);
    if (this.lexErrorIn(pieceStart, errorOffset)) return;
    const code = ERROR_CODES[error.name] ?? 'syntax/unexpected-token';
    let span: Span;
    const index = token ? piece.indexOf(token) : -1;
    const previous = index > 0 ? piece[index - 1] : piece[piece.length - 1];
    if (!token || index < 0) {
      // At the end of the statement: point at its last token, where something is missing.
      span = tokenSpan(previous!);
    } else if (code === 'syntax/missing-token' && previous && (token.startLine ?? 0) > (previous.endLine ?? 0)) {
      // The missing token belongs at the end of the previous line, not at the start of the next.
      span = tokenSpan(previous);
    } else {
      span = tokenSpan(token);
    }
    this.problem(code, span, error.message);
  }

  /**
   * Tokens that belong to no statement. Each run gets one problem at its first
   * token; a run is cut again at every line-starting misspelt keyword, which
   * then counts as a dropped statement of that kind (so its name is known).
   */
  private stray(run: IToken[], firstMessage: string | undefined): void {
    let start = 0;
    while (start < run.length) {
      let end = start + 1;
      while (end < run.length && !(startsLine(run, end) && misspeltKeyword(run[end]!) !== undefined)) end++;
      const piece = run.slice(start, end);
      const first = piece[0]!;
      const suggestion = misspeltKeyword(first);
      const message =
        start === 0 && firstMessage !== undefined && suggestion === undefined
          ? firstMessage
          : strayTokenMessage(first, suggestion);
      this.problem('syntax/expected-statement', tokenSpan(first), message);
      if (suggestion !== undefined) this.drop(piece, KIND_BY_KEYWORD[suggestion]);
      start = end;
    }
  }
}

function readProgram(text: string, memo: PieceMemo | undefined): ParseResult {
  const lexed = T.wedgeLexer().tokenize(text);
  const problems: Problem[] = [];
  for (const error of lexed.errors) {
    const start = Math.max(0, Math.min(error.offset, text.length));
    const end = Math.max(start, Math.min(error.offset + error.length, text.length));
    problems.push({
      code: 'syntax/unexpected-character',
      severity: 'error',
      message: unexpectedCharacterMessage(text.slice(start, end)),
      span: { start, end },
    });
  }
  const reader = new ProgramReader(
    text,
    lexed.tokens,
    lexed.errors.map((e) => e.offset),
    memo,
  );
  reader.read();
  problems.push(...reader.problems);
  return {
    program: { span: { start: 0, end: text.length }, statements: reader.statements, dropped: reader.dropped },
    problems: deduplicate(problems),
  };
}

/** Sorts problems by position and keeps one per (code, span). */
function deduplicate(problems: Problem[]): Problem[] {
  const sorted = [...problems].sort((a, b) => a.span.start - b.span.start || a.span.end - b.span.end);
  const seen = new Set<string>();
  return sorted.filter((p) => {
    const key = `${p.code}@${p.span.start}:${p.span.end}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** Lexes and parses a `.wedge` document. Never throws: internal failures become a `syntax/internal` problem. */
export function parseProgram(text: string, options: { memo?: PieceMemo | false } = {}): ParseResult {
  try {
    return readProgram(text, options.memo === false ? undefined : (options.memo ?? PIECE_MEMO));
  } catch (error) {
    return {
      program: { span: { start: 0, end: text.length }, statements: [], dropped: [] },
      problems: [
        {
          code: 'syntax/internal',
          severity: 'error',
          message: `internal error while reading this file (please report it): ${error instanceof Error ? error.message : String(error)}`,
          span: { start: 0, end: Math.min(text.length, 1) },
        },
      ],
    };
  }
}
