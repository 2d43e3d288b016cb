/**
 * The tokens of the `.wedge` language and the one lexer built from them.
 *
 * Newlines are ordinary whitespace, but the lexer tracks lines on every token
 * (`line_breaks: true` on whitespace) because matrix literals split rows by
 * source line.
 */
import { createToken, Lexer, type IToken, type TokenType } from 'chevrotain';

/**
 * Identifiers may contain Unicode letters (`η`, `é`). Chevrotain's lexer drops
 * a regular expression's `u` flag when it compiles patterns, so `\p{L}` cannot
 * be given to it directly: the identifier uses a custom matcher around our own
 * sticky Unicode regular expression instead.
 *
 * A name starts with a letter or `_`; then letters, combining marks (so that
 * decomposed accents work), decimal digits, `_` or `'` (for primes: `p'`).
 */
const identifierRegex = /[\p{L}_][\p{L}\p{M}\p{Nd}_']*/uy;
const identifierStart = /[\p{L}_]/u;

function matchIdentifier(text: string, offset: number): RegExpExecArray | null {
  identifierRegex.lastIndex = offset;
  return identifierRegex.exec(text);
}

/**
 * Chevrotain's first-character optimisation needs every character an
 * identifier can start with. Listing every letter of the Basic Multilingual
 * Plane (and every high surrogate, for letters outside it) keeps that
 * optimisation on for the whole lexer; it is computed once at load.
 */
function identifierStartChars(): number[] {
  const codes: number[] = [];
  for (let code = 0; code < 0x10000; code++) {
    if (code >= 0xd800 && code <= 0xdbff) codes.push(code);
    else if (code < 0xdc00 || code > 0xdfff) {
      if (identifierStart.test(String.fromCharCode(code))) codes.push(code);
    }
  }
  return codes;
}

export const Whitespace = createToken({
  name: 'Whitespace',
  pattern: /\s+/,
  group: Lexer.SKIPPED,
  line_breaks: true,
});

export const Comment = createToken({
  name: 'Comment',
  pattern: /#[^\n\r]*/,
  group: Lexer.SKIPPED,
});

export const Identifier = createToken({
  name: 'Identifier',
  pattern: { exec: matchIdentifier },
  start_chars_hint: identifierStartChars(),
  line_breaks: false,
});

/** Every keyword that begins a statement. They occur nowhere else, which is what statement-level recovery relies on. */
export const StatementKeyword = createToken({ name: 'StatementKeyword', pattern: Lexer.NA });

function keyword(word: string, categories: TokenType[] = []): TokenType {
  const name = word[0]!.toUpperCase() + word.slice(1);
  return createToken({ name, pattern: word, longer_alt: Identifier, categories });
}

export const Field = keyword('field', [StatementKeyword]);
export const Normalize = keyword('normalize', [StatementKeyword]);
export const Space = keyword('space', [StatementKeyword]);
export const Vector = keyword('vector', [StatementKeyword]);
export const Subspace = keyword('subspace', [StatementKeyword]);
export const Multivector = keyword('multivector', [StatementKeyword]);
export const Claim = keyword('claim', [StatementKeyword]);
export const Show = keyword('show', [StatementKeyword]);
export const Convention = keyword('convention', [StatementKeyword]);
export const MapKeyword = createToken({ name: 'Map', pattern: 'map', longer_alt: Identifier, categories: [StatementKeyword] });
export const Flag = keyword('flag', [StatementKeyword]);
export const Parameter = keyword('parameter', [StatementKeyword]);
export const GrassmannianKeyword = createToken({ name: 'GrassmannianKeyword', pattern: 'grassmannian', longer_alt: Identifier, categories: [StatementKeyword] });
export const ClassKeyword = createToken({ name: 'ClassKeyword', pattern: 'class', longer_alt: Identifier, categories: [StatementKeyword] });
export const Dim = keyword('dim');
export const Basis = keyword('basis');
export const In = keyword('in');
export const Not = keyword('not');
export const Decomposable = keyword('decomposable');
export const Rows = keyword('rows');
export const Solutions = keyword('solutions');
export const Columns = keyword('columns');
export const Is = keyword('is');

/** An unsigned decimal: `3`, `0.125`. Signs are operators or part of a bracket entry. */
export const NumberLiteral = createToken({ name: 'NumberLiteral', pattern: /[0-9]+(?:\.[0-9]+)?/ });

export const NotEquals = createToken({ name: 'NotEquals', pattern: /!=|≠/ });
export const Arrow = createToken({ name: 'Arrow', pattern: /->|→/ });
export const Equals = createToken({ name: 'Equals', pattern: '=' });
export const Plus = createToken({ name: 'Plus', pattern: '+' });
export const Minus = createToken({ name: 'Minus', pattern: '-' });
export const Star = createToken({ name: 'Star', pattern: '*' });
export const Slash = createToken({ name: 'Slash', pattern: '/' });
export const WedgeOp = createToken({ name: 'WedgeOp', pattern: /\^|∧/ });
export const Intersect = createToken({ name: 'Intersect', pattern: /&|∩/ });
export const ElementOf = createToken({ name: 'ElementOf', pattern: '∈' });
export const NotElementOf = createToken({ name: 'NotElementOf', pattern: '∉' });
export const LParen = createToken({ name: 'LParen', pattern: '(' });
export const RParen = createToken({ name: 'RParen', pattern: ')' });
export const LBracket = createToken({ name: 'LBracket', pattern: '[' });
export const RBracket = createToken({ name: 'RBracket', pattern: ']' });
export const LBrace = createToken({ name: 'LBrace', pattern: '{' });
export const RBrace = createToken({ name: 'RBrace', pattern: '}' });
export const Comma = createToken({ name: 'Comma', pattern: ',' });
export const Semicolon = createToken({ name: 'Semicolon', pattern: ';' });
export const Colon = createToken({ name: 'Colon', pattern: ':' });
export const Dot = createToken({ name: 'Dot', pattern: '.' });

export const KEYWORDS: readonly TokenType[] = [
  Field, Normalize, Space, Vector, Subspace, Multivector, Claim, Show, Convention, MapKeyword, Flag,
  Parameter, GrassmannianKeyword, ClassKeyword,
  Dim, Basis, In, Not, Decomposable, Rows, Solutions, Columns, Is,
];

export const STATEMENT_KEYWORDS: readonly TokenType[] = [
  Field, Normalize, Space, Vector, Subspace, Multivector, Claim, Show, Convention, MapKeyword, Flag,
  Parameter, GrassmannianKeyword, ClassKeyword,
];

/** Lexer order matters only where one pattern is a prefix of another: keywords before identifiers. */
export const ALL_TOKENS: TokenType[] = [
  Whitespace, Comment,
  StatementKeyword,
  ...KEYWORDS,
  Identifier, NumberLiteral,
  NotEquals, Arrow, Equals, Plus, Minus, Star, Slash, WedgeOp, Intersect, ElementOf, NotElementOf,
  LParen, RParen, LBracket, RBracket, LBrace, RBrace, Comma, Semicolon, Colon, Dot,
];

let lexer: Lexer | undefined;

/**
 * The lexer, built on first use (like the parser, ./parser.ts, so that loading the language layer stays
 * cheap). `validate` checks the token definitions while building; the shared lexer skips that, and a test
 * builds one with it.
 */
export function wedgeLexer(options: { validate?: boolean } = {}): Lexer {
  if (options.validate) return new Lexer(ALL_TOKENS, { positionTracking: 'full', ensureOptimizations: true });
  return (lexer ??= new Lexer(ALL_TOKENS, { positionTracking: 'full', ensureOptimizations: true, skipValidations: true }));
}

export function isStatementKeyword(token: IToken): boolean {
  return token.tokenType === StatementKeyword || (token.tokenType.CATEGORIES ?? []).includes(StatementKeyword);
}

export function isKeyword(tokenType: TokenType): boolean {
  return KEYWORDS.includes(tokenType);
}
