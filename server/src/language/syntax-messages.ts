/**
 * Wording of syntax errors. Each message says what was expected, after what,
 * in which kind of statement, and what was found, in words meant for the
 * person writing the mathematics rather than for a parser author.
 */
import { EOF, type IParserErrorMessageProvider, type IToken, type TokenType } from 'chevrotain';
import * as T from './tokens.js';

/** What the messages need to know about the statement being parsed. */
export interface MessageContext {
  /** The statement's first token (its keyword). */
  statement: IToken | undefined;
  /** The keyword of the next statement, or undefined when this statement runs to the end of the file. */
  following: IToken | undefined;
}

const STATEMENT_NAMES: Record<string, string> = {
  Field: 'field statement',
  Normalize: 'normalize statement',
  Space: 'space declaration',
  Vector: 'vector declaration',
  Subspace: 'subspace declaration',
  Multivector: 'multivector declaration',
  Claim: 'claim',
  Show: 'show statement',
};

export const STATEMENT_KEYWORD_LIST = 'field, normalize, space, vector, subspace, multivector, claim or show';

function statementName(context: MessageContext): string {
  const keyword = context.statement;
  return (keyword && STATEMENT_NAMES[keyword.tokenType.name]) ?? 'statement';
}

function isEof(token: IToken | undefined): boolean {
  return token === undefined || token.tokenType === EOF;
}

/** A token as the person sees it: `'span'`, `the keyword 'in'`, `the number 3`. */
export function describeToken(token: IToken): string {
  if (T.isKeyword(token.tokenType)) return `the keyword '${token.image}'`;
  if (token.tokenType === T.NumberLiteral) return `the number ${token.image}`;
  return `'${token.image}'`;
}

/** What was found where the error is; at the end of a statement's tokens this is the next statement or the end of the file. */
function describeFound(token: IToken | undefined, context: MessageContext): string {
  if (!isEof(token)) return describeToken(token!);
  const next = context.following;
  if (next) {
    const line = next.startLine !== context.statement?.startLine ? ` on line ${next.startLine}` : '';
    return `'${next.image}'${line}, which starts the next statement`;
  }
  return 'the end of the file';
}

/** "after the name 'L'", "after '('", "after the number 3". */
function describePrevious(token: IToken | undefined): string {
  if (!token || isEof(token) || token.image === '') return '';
  if (token.tokenType === T.Identifier) return ` after the name '${token.image}'`;
  if (token.tokenType === T.NumberLiteral) return ` after the number ${token.image}`;
  return ` after '${token.image}'`;
}

/** The name of a token type in an "expected …" phrase. */
function describeExpected(type: TokenType): string {
  switch (type) {
    case T.Identifier: return 'a name';
    case T.NumberLiteral: return 'a number';
    case T.WedgeOp: return "'^'";
    case T.Intersect: return "'&'";
    case T.NotEquals: return "'!='";
    case EOF: return 'the end of the statement';
    default: {
      const pattern = type.PATTERN;
      return typeof pattern === 'string' ? `'${pattern}'` : type.name;
    }
  }
}

const EXPRESSION_START =
  "a value (a number, a name, a call such as span(p, q), '(', '[', '{', rows, solutions or dim)";

/** The "expected …" phrase of a failed CONSUME, where the rule gives a more helpful wording than the token alone. */
function expectedPhrase(
  expected: TokenType,
  ruleName: string,
  previous: IToken | undefined,
  context: MessageContext,
): string {
  const prevType = previous?.tokenType;
  switch (ruleName) {
    case 'fieldStmt':
      if (expected === T.Identifier) return 'the name of a field (QQ for the rationals, or GF(p) for a prime p)';
      if (expected === T.NumberLiteral) return 'the prime p of GF(p)';
      break;
    case 'normalizeStmt':
      if (prevType === T.Minus) return "the rest of the mode's name";
      return 'a normalization mode (raw, first-one or primitive)';
    case 'spaceStmt':
      if (expected === T.Identifier) return 'a name for the space';
      if (expected === T.Dim) return "'dim' and the dimension";
      if (expected === T.NumberLiteral) return 'the dimension (a whole number)';
      break;
    case 'declStmt':
      if (expected === T.Identifier && prevType !== T.In && prevType !== T.ElementOf) return `a name for the new ${context.statement?.image ?? 'object'}`;
      if (expected === T.Identifier) return 'the name of a space';
      break;
    case 'nameOrCall':
      if (expected === T.RParen) return "',' or the closing ')' of the argument list";
      if (expected === T.Identifier) return 'the name of a basis vector';
      break;
    case 'parenthesised':
      if (expected === T.RParen) return "',' or the closing ')'";
      break;
    case 'bracket':
      if (expected === T.RBracket) return "another entry (a number such as 3, -1 or 1/2) or the closing ']'";
      break;
    case 'entry':
      if (expected === T.NumberLiteral && prevType === T.Slash) return 'a denominator (a number)';
      if (expected === T.NumberLiteral) return 'an entry (a number such as 3, -1 or 1/2; names and expressions are not allowed inside brackets)';
      break;
    case 'indexMap':
      if (expected === T.RBrace) return "',' and another entry, or the closing '}'";
      break;
    case 'indexEntry':
      if (expected === T.Colon) return "':' and a coefficient";
      break;
    case 'indexKey':
      if (expected === T.RParen) return "',' or the closing ')' of the list of labels";
      if (expected === T.NumberLiteral) return 'a label (a whole number)';
      break;
    case 'conventionStmt':
    case 'conventionSetting':
      return 'a convention setting (order lex|colex, labels 0|1, layout rows|columns)';
    case 'mapStmt':
      if (expected === T.Colon) return "':' and the spaces, as in map f : V -> U = [ … ]";
      if (expected === T.Arrow) return "'->' between the source and target spaces";
      if (expected === T.Identifier) return prevType === T.MapKeyword ? 'a name for the map' : 'the name of a space';
      break;
    case 'rowsExpr':
    case 'columnsExpr':
    case 'solutionsExpr':
      if (expected === T.LBracket) return "a matrix in brackets '[ … ]'";
      break;
  }
  return describeExpected(expected);
}

function keywordAsNameHint(actual: IToken | undefined, expected: TokenType): string {
  if (expected === T.Identifier && actual && !isEof(actual) && T.isKeyword(actual.tokenType)) {
    return ` ('${actual.image}' is a keyword and cannot be used as a name)`;
  }
  return '';
}

function sentence(expected: string, previous: IToken | undefined, context: MessageContext, found: string): string {
  // Right after the keyword, "in this vector declaration" would only repeat the keyword.
  const where = previous !== undefined && previous === context.statement ? '' : ` in this ${statementName(context)}`;
  return `expected ${expected}${describePrevious(previous)}${where}, found ${found}`;
}

export function createErrorMessageProvider(context: MessageContext): IParserErrorMessageProvider {
  return {
    buildMismatchTokenMessage({ expected, actual, previous, ruleName }) {
      const phrase = expectedPhrase(expected, ruleName, previous, context);
      return sentence(phrase, previous, context, describeFound(actual, context)) + keywordAsNameHint(actual, expected);
    },
    buildNotAllInputParsedMessage({ firstRedundant }) {
      return (
        `this ${statementName(context)} is complete, so a new statement was expected ` +
        `(starting with ${STATEMENT_KEYWORD_LIST}), found ${describeFound(firstRedundant, context)}`
      );
    },
    buildNoViableAltMessage({ actual, previous, ruleName }) {
      const found = describeFound(actual[0], context);
      if (ruleName === 'relation') {
        if (previous?.tokenType === T.Not) return sentence("'in' or 'decomposable'", previous, context, found);
        return (
          `expected a relation after the subject of this claim ('=', '!=', 'in', 'not in', 'decomposable' ` +
          `or 'not decomposable'), found ${found}`
        );
      }
      if (ruleName === 'indexKey') return sentence('an index key such as 13 or (1, 10)', previous, context, found);
      const signAfterWedge =
        previous?.tokenType === T.WedgeOp && (actual[0]?.tokenType === T.Minus || actual[0]?.tokenType === T.Plus);
      const hint = signAfterWedge ? ` (a signed factor of a wedge needs parentheses, as in e1 ^ (-e2))` : '';
      return sentence(EXPRESSION_START, previous, context, found) + hint;
    },
    buildEarlyExitMessage({ actual, previous, ruleName }) {
      const found = describeFound(actual[0], context);
      if (ruleName === 'spaceStmt') return sentence('the names of the basis vectors', previous, context, found);
      return sentence('at least one more item', previous, context, found);
    },
  };
}

/** For tokens outside any statement (before the first one, or after a complete one). */
export function strayTokenMessage(token: IToken, suggestion: string | undefined): string {
  if (suggestion !== undefined) {
    if (suggestion === token.image.toLowerCase()) {
      return `'${token.image}' is not a statement keyword; keywords are lower-case: did you mean '${suggestion}'?`;
    }
    return `'${token.image}' is not a statement keyword; did you mean '${suggestion}'?`;
  }
  return `expected a statement (starting with ${STATEMENT_KEYWORD_LIST}), found ${describeToken(token)}`;
}

/** Characters people paste from typeset mathematics, with what to write instead. */
const CHARACTER_HINTS: Record<string, string> = {
  '−': "write the minus sign as '-'",
  '–': "write the minus sign as '-'",
  '×': "write multiplication as '*' or by juxtaposition, as in 3 e1",
  '·': "write multiplication as '*' or by juxtaposition, as in 3 e1",
  '⋅': "write multiplication as '*' or by juxtaposition, as in 3 e1",
  '!': "'!' is only used in '!='",
  '⊕': "write a sum of subspaces as '+'",
  '⋀': "write the wedge product as '^' or '∧'",
  '⟨': 'write a span as span(…)',
  '⟩': 'write a span as span(…)',
  '"': 'the language has no strings',
  "'": "a prime is only allowed at the end of a name, as in p'",
  '′': "write a prime as an apostrophe, as in p'",
  '’': "write a prime as an apostrophe, as in p'",
};

export function unexpectedCharacterMessage(characters: string): string {
  const first = String.fromCodePoint(characters.codePointAt(0) ?? 0);
  const hint = CHARACTER_HINTS[first];
  const shown = characters.length > 12 ? characters.slice(0, 12) + '…' : characters;
  const what = [...characters].length === 1 ? `the character '${shown}'` : `the characters '${shown}'`;
  return `${what} cannot be read here${hint ? `: ${hint}` : ''}`;
}

function editDistance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0]!;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j]!;
      row[j] = Math.min(row[j]! + 1, row[j - 1]! + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return row[b.length]!;
}

const STATEMENT_WORDS = ['field', 'normalize', 'space', 'vector', 'subspace', 'multivector', 'claim', 'show', 'convention', 'map', 'flag', 'parameter', 'grassmannian', 'class'];

/**
 * The statement keyword a word was probably meant to be (`Vector`, `vectr`,
 * `subpsace`), or undefined. Short keywords tolerate one slip, longer ones two.
 */
export function suggestStatementKeyword(word: string): string | undefined {
  const lower = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const keyword of STATEMENT_WORDS) {
    const distance = editDistance(lower, keyword);
    const allowed = keyword.length <= 5 ? 1 : 2;
    if (distance <= allowed && distance < bestDistance) {
      best = keyword;
      bestDistance = distance;
    }
  }
  return best;
}
