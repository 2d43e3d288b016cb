/**
 * The grammar of one `.wedge` statement, as a Chevrotain CST parser.
 *
 * The parser recognises exactly one statement at a time: `parse.ts` cuts the
 * token stream at statement keywords (which occur nowhere else in the
 * language) and feeds the pieces here one by one. That cut is the
 * statement-level resynchronisation: an error can only ever spoil its own
 * statement. Inside a statement Chevrotain's own recovery is switched off, so
 * one broken statement gives exactly one error and never a half-recovered tree
 * (see `parse.ts`).
 *
 * The tree is turned into the AST of `./ast.ts` by `./build-ast.ts`; the
 * labels used here (`LABEL`) are the names that builder reads.
 */
import { CstParser, type CstNode, type IRecognitionException, type IToken, type TokenType } from 'chevrotain';
import {
  ALL_TOKENS, Arrow, Basis, Claim, Columns, Convention, Flag, Is, MapKeyword, Colon, Comma, Decomposable, Dim, Dot, ElementOf, Equals, Field, Identifier,
  In, Intersect, LBrace, LBracket, LParen, Minus, Multivector, Normalize, Not, NotElementOf, NotEquals,
  NumberLiteral, Plus, RBrace, RBracket, RParen, Rows, Semicolon, Show, Slash, Solutions, Space, Star,
  Subspace, Vector, WedgeOp, Parameter, GrassmannianKeyword, ClassKeyword,
} from './tokens.js';
import { createErrorMessageProvider, type MessageContext } from './syntax-messages.js';

/**
 * The deepest nesting of parentheses and prefix operators (`-`, `+`, `dim`)
 * a statement may have. The parser descends about seven rules per
 * parenthesis, so a few hundred levels overflow the call stack: fuzzing found
 * 250 nested parentheses reported as an internal error, and, when the
 * overflow hit while the parser was cleaning up, a problem whose span ended
 * at NaN. No statement written by hand comes near the bound; a deeper one is
 * refused with a problem at the token that goes past it.
 */
export const MAX_NESTING = 100;

/** The name of the error `parseStatement` reports for a statement nested past MAX_NESTING. */
export const NESTING_LIMIT_ERROR = 'NestingLimitException';

const OPERAND_ENDS: readonly TokenType[] = [NumberLiteral, Identifier, RParen, RBracket, RBrace];

/**
 * The first token at which the statement nests deeper than MAX_NESTING, if
 * any. An open parenthesis nests one level below the prefix operators written
 * directly before it (`-(`, `dim (`); a run of prefix operators (`- - x`,
 * `dim dim V`) nests one level per operator. A sign after an operand is a
 * binary operator and nests nothing.
 */
export function tooDeeplyNested(tokens: readonly IToken[]): IToken | undefined {
  const outer: number[] = [];
  let depth = 0;
  let prefixes = 0;
  let previous: IToken | undefined;
  for (const token of tokens) {
    const type = token.tokenType;
    if (type === LParen) {
      outer.push(depth);
      depth += prefixes + 1;
      prefixes = 0;
    } else if (type === RParen) {
      depth = outer.pop() ?? 0;
      prefixes = 0;
    } else if (type === Dim || ((type === Minus || type === Plus) && !(previous && OPERAND_ENDS.includes(previous.tokenType)))) {
      prefixes++;
    } else {
      prefixes = 0;
    }
    if (depth + prefixes > MAX_NESTING) return token;
    previous = token;
  }
  return undefined;
}

function nestingError(token: IToken): IRecognitionException {
  const error = new Error(
    `this statement nests parentheses and signs more than ${MAX_NESTING} levels deep, which is past what can be read; ` +
      'split it into several declarations',
  ) as IRecognitionException;
  error.name = NESTING_LIMIT_ERROR;
  error.token = token;
  error.resyncedTokens = [];
  error.context = { ruleStack: [], ruleOccurrenceStack: [] };
  return error;
}

export class StatementParser extends CstParser {
  /** What the error messages need to know about the piece being parsed; set by `parseStatement`. */
  readonly context: MessageContext;

  /**
   * `validate` checks the grammar itself (ambiguities, left recursion) while building the parser. It costs
   * about as much as the rest of the construction and can only fail on a change of the grammar, so the
   * shared parser skips it and a test builds one with it (test/language/parse.test.ts).
   */
  constructor(context: MessageContext, options: { validate?: boolean } = {}) {
    super(ALL_TOKENS, {
      recoveryEnabled: false,
      errorMessageProvider: createErrorMessageProvider(context),
      maxLookahead: 2,
      skipValidations: !options.validate,
    });
    this.context = context;
    this.performSelfAnalysis();
  }

  statement = this.RULE('statement', () => {
    this.OR([
      { ALT: () => this.SUBRULE(this.fieldStmt) },
      { ALT: () => this.SUBRULE(this.normalizeStmt) },
      { ALT: () => this.SUBRULE(this.spaceStmt) },
      { ALT: () => this.SUBRULE(this.declStmt) },
      { ALT: () => this.SUBRULE(this.claimStmt) },
      { ALT: () => this.SUBRULE(this.showStmt) },
      { ALT: () => this.SUBRULE(this.conventionStmt) },
      { ALT: () => this.SUBRULE(this.mapStmt) },
      { ALT: () => this.SUBRULE(this.flagStmt) },
      { ALT: () => this.SUBRULE(this.parameterStmt) },
    ]);
  });

  /** `convention order colex labels 0 layout columns`: key–value pairs, values may be hyphenated words. */
  conventionStmt = this.RULE('conventionStmt', () => {
    this.CONSUME(Convention, { LABEL: 'keyword' });
    this.AT_LEAST_ONE(() => this.SUBRULE(this.conventionSetting, { LABEL: 'setting' }));
  });

  conventionSetting = this.RULE('conventionSetting', () => {
    this.OR([
      { ALT: () => this.CONSUME(Identifier, { LABEL: 'key' }) },
      // `basis` and `in` are keywords elsewhere but read naturally as setting names.
      { ALT: () => this.CONSUME(Basis, { LABEL: 'key' }) },
    ]);
    this.OR2([
      { ALT: () => this.CONSUME2(Identifier, { LABEL: 'word' }) },
      { ALT: () => this.CONSUME(NumberLiteral, { LABEL: 'word' }) },
      { ALT: () => this.CONSUME(Rows, { LABEL: 'word' }) },
      { ALT: () => this.CONSUME(Columns, { LABEL: 'word' }) },
    ]);
    this.MANY(() => {
      this.CONSUME(Minus);
      this.OR3([
        { ALT: () => this.CONSUME3(Identifier, { LABEL: 'word' }) },
        { ALT: () => this.CONSUME2(NumberLiteral, { LABEL: 'word' }) },
      ]);
    });
  });

  /** `map f : V -> U = [ … ]`: the matrix's rows (or columns, by the file's layout) are the images of V's basis. */
  mapStmt = this.RULE('mapStmt', () => {
    this.CONSUME(MapKeyword, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.CONSUME(Colon);
    this.CONSUME2(Identifier, { LABEL: 'from' });
    this.CONSUME(Arrow);
    this.CONSUME3(Identifier, { LABEL: 'to' });
    this.CONSUME(Equals);
    this.SUBRULE(this.expression, { LABEL: 'value' });
  });

  /** `flag F = (v1, v2, v3)` or `flag E = standard(V)`. */
  flagStmt = this.RULE('flagStmt', () => {
    this.CONSUME(Flag, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.CONSUME(Equals);
    this.SUBRULE(this.expression, { LABEL: 'value' });
    this.OPTION(() => {
      this.OR2([{ ALT: () => this.CONSUME(In) }, { ALT: () => this.CONSUME(ElementOf) }]);
      this.CONSUME2(Identifier, { LABEL: 'inSpace' });
    });
  });

  /** `parameter t` or `parameter s, t`: names for indeterminates the entries may use. */
  parameterStmt = this.RULE('parameterStmt', () => {
    this.CONSUME(Parameter, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.MANY(() => {
      this.CONSUME(Comma);
      this.CONSUME2(Identifier, { LABEL: 'name' });
    });
  });

  /** `field QQ`, `field GF(7)`, `field GF(9) generator w` (the name of a generator of GF(q) over GF(p)). */
  fieldStmt = this.RULE('fieldStmt', () => {
    this.CONSUME(Field, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.OPTION(() => {
      this.CONSUME(LParen);
      this.CONSUME(NumberLiteral, { LABEL: 'modulus' });
      this.CONSUME(RParen);
    });
    this.OPTION2(() => {
      this.CONSUME2(Identifier, { LABEL: 'generatorWord' });
      this.CONSUME3(Identifier, { LABEL: 'generator' });
    });
  });

  normalizeStmt = this.RULE('normalizeStmt', () => {
    this.CONSUME(Normalize, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'word' });
    this.MANY(() => {
      this.CONSUME(Minus);
      this.CONSUME2(Identifier, { LABEL: 'word' });
    });
  });

  spaceStmt = this.RULE('spaceStmt', () => {
    this.CONSUME(Space, { LABEL: 'keyword' });
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.CONSUME(Dim);
    this.CONSUME(NumberLiteral, { LABEL: 'dim' });
    this.OPTION(() => {
      this.CONSUME(Basis);
      this.AT_LEAST_ONE(() => this.CONSUME2(Identifier, { LABEL: 'basis' }));
    });
  });

  declStmt = this.RULE('declStmt', () => {
    this.OR([
      { ALT: () => this.CONSUME(Vector, { LABEL: 'keyword' }) },
      { ALT: () => this.CONSUME(Subspace, { LABEL: 'keyword' }) },
      { ALT: () => this.CONSUME(Multivector, { LABEL: 'keyword' }) },
      { ALT: () => this.CONSUME(GrassmannianKeyword, { LABEL: 'keyword' }) },
      { ALT: () => this.CONSUME(ClassKeyword, { LABEL: 'keyword' }) },
    ]);
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.CONSUME(Equals);
    this.SUBRULE(this.expression, { LABEL: 'value' });
    this.OPTION(() => {
      this.OR2([{ ALT: () => this.CONSUME(In) }, { ALT: () => this.CONSUME(ElementOf) }]);
      this.CONSUME2(Identifier, { LABEL: 'inSpace' });
    });
  });

  claimStmt = this.RULE('claimStmt', () => {
    this.CONSUME(Claim, { LABEL: 'keyword' });
    this.SUBRULE(this.expression, { LABEL: 'subject' });
    this.SUBRULE(this.relation);
  });

  relation = this.RULE('relation', () => {
    this.OR([
      {
        ALT: () => {
          this.OR2([
            { ALT: () => this.CONSUME(Equals, { LABEL: 'equals' }) },
            { ALT: () => this.CONSUME(NotEquals, { LABEL: 'notEquals' }) },
          ]);
          this.SUBRULE(this.expression, { LABEL: 'other' });
        },
      },
      {
        ALT: () => {
          this.OR3([
            { ALT: () => this.CONSUME(In, { LABEL: 'in' }) },
            { ALT: () => this.CONSUME(ElementOf, { LABEL: 'in' }) },
          ]);
          this.SUBRULE2(this.expression, { LABEL: 'other' });
        },
      },
      {
        ALT: () => {
          this.CONSUME(NotElementOf, { LABEL: 'notIn' });
          this.SUBRULE3(this.expression, { LABEL: 'other' });
        },
      },
      {
        ALT: () => {
          this.CONSUME(Not, { LABEL: 'not' });
          this.OR4([
            {
              ALT: () => {
                this.OR5([
                  { ALT: () => this.CONSUME2(In, { LABEL: 'in' }) },
                  { ALT: () => this.CONSUME2(ElementOf, { LABEL: 'in' }) },
                ]);
                this.SUBRULE4(this.expression, { LABEL: 'other' });
              },
            },
            { ALT: () => this.CONSUME(Decomposable, { LABEL: 'decomposable' }) },
          ]);
        },
      },
      { ALT: () => this.CONSUME2(Decomposable, { LABEL: 'decomposable' }) },
      {
        ALT: () => {
          this.CONSUME(Is, { LABEL: 'is' });
          this.OPTION(() => this.CONSUME2(Not, { LABEL: 'not' }));
          this.AT_LEAST_ONE(() => {
            this.OR6([
              { ALT: () => this.CONSUME(Identifier, { LABEL: 'property' }) },
              { ALT: () => this.CONSUME3(Decomposable, { LABEL: 'property' }) },
            ]);
            this.OPTION2(() => this.CONSUME(Minus));
          });
        },
      },
    ]);
  });

  showStmt = this.RULE('showStmt', () => {
    this.CONSUME(Show, { LABEL: 'keyword' });
    this.SUBRULE(this.expression, { LABEL: 'value' });
  });

  /** The loosest level: intersection `&` / `∩`. */
  expression = this.RULE('expression', () => {
    this.SUBRULE(this.additive, { LABEL: 'operand' });
    this.MANY(() => {
      this.CONSUME(Intersect, { LABEL: 'op' });
      this.SUBRULE2(this.additive, { LABEL: 'operand' });
    });
  });

  additive = this.RULE('additive', () => {
    this.SUBRULE(this.multiplicative, { LABEL: 'operand' });
    this.MANY(() => {
      this.OR([
        { ALT: () => this.CONSUME(Plus, { LABEL: 'op' }) },
        { ALT: () => this.CONSUME(Minus, { LABEL: 'op' }) },
      ]);
      this.SUBRULE2(this.multiplicative, { LABEL: 'operand' });
    });
  });

  /** `*`, `/` and juxtaposition, left to right; each step is one `mulTail` so their order survives in the tree. */
  multiplicative = this.RULE('multiplicative', () => {
    this.SUBRULE(this.unary, { LABEL: 'head' });
    this.MANY(() => this.SUBRULE(this.mulTail, { LABEL: 'tail' }));
  });

  /** `* x`, `/ x`, or a juxtaposed factor (which cannot begin with a sign, so `a - b` stays a difference). */
  mulTail = this.RULE('mulTail', () => {
    this.OR([
      {
        ALT: () => {
          this.OR2([
            { ALT: () => this.CONSUME(Star, { LABEL: 'op' }) },
            { ALT: () => this.CONSUME(Slash, { LABEL: 'op' }) },
          ]);
          this.SUBRULE(this.unary, { LABEL: 'operand' });
        },
      },
      { ALT: () => this.SUBRULE(this.wedge, { LABEL: 'juxtaposed' }) },
    ]);
  });

  unary = this.RULE('unary', () => {
    this.OR([
      {
        ALT: () => {
          this.OR2([
            { ALT: () => this.CONSUME(Minus, { LABEL: 'sign' }) },
            { ALT: () => this.CONSUME(Plus, { LABEL: 'sign' }) },
          ]);
          this.SUBRULE(this.unary, { LABEL: 'operand' });
        },
      },
      { ALT: () => this.SUBRULE(this.wedge, { LABEL: 'operand' }) },
    ]);
  });

  wedge = this.RULE('wedge', () => {
    this.SUBRULE(this.primary, { LABEL: 'operand' });
    this.MANY(() => {
      this.CONSUME(WedgeOp, { LABEL: 'op' });
      this.SUBRULE2(this.primary, { LABEL: 'operand' });
    });
  });

  primary = this.RULE('primary', () => {
    this.OR([
      { ALT: () => this.CONSUME(NumberLiteral, { LABEL: 'number' }) },
      { ALT: () => this.SUBRULE(this.nameOrCall) },
      { ALT: () => this.SUBRULE(this.parenthesised) },
      { ALT: () => this.SUBRULE(this.bracket) },
      { ALT: () => this.SUBRULE(this.indexMap) },
      { ALT: () => this.SUBRULE(this.rowsExpr) },
      { ALT: () => this.SUBRULE(this.columnsExpr) },
      { ALT: () => this.SUBRULE(this.solutionsExpr) },
      { ALT: () => this.SUBRULE(this.dimExpr) },
    ]);
  });

  /** `name`, `Space.name`, or a call `name(args)`. */
  nameOrCall = this.RULE('nameOrCall', () => {
    this.CONSUME(Identifier, { LABEL: 'name' });
    this.OPTION(() => {
      this.OR([
        {
          ALT: () => {
            this.CONSUME(LParen, { LABEL: 'open' });
            this.OPTION2(() => {
              this.SUBRULE(this.argument, { LABEL: 'arg' });
              this.MANY(() => {
                this.CONSUME(Comma);
                this.SUBRULE2(this.argument, { LABEL: 'arg' });
              });
            });
            this.CONSUME(RParen, { LABEL: 'close' });
          },
        },
        {
          ALT: () => {
            this.CONSUME(Dot, { LABEL: 'dot' });
            this.CONSUME2(Identifier, { LABEL: 'member' });
          },
        },
      ]);
    });
  });

  /** An argument of a call: an expression, or a value given to a parameter, `t = 2` (as in `at(W, t = 2)`). */
  argument = this.RULE('argument', () => {
    this.OR([
      {
        GATE: () => this.LA(1).tokenType === Identifier && this.LA(2).tokenType === Equals,
        ALT: () => {
          this.CONSUME(Identifier, { LABEL: 'name' });
          this.CONSUME(Equals, { LABEL: 'equals' });
          this.SUBRULE(this.expression, { LABEL: 'value' });
        },
      },
      { ALT: () => this.SUBRULE2(this.expression, { LABEL: 'value' }) },
    ]);
  });

  /** `(x)` or a tuple `(x, y, …)`. */
  parenthesised = this.RULE('parenthesised', () => {
    this.CONSUME(LParen, { LABEL: 'open' });
    this.SUBRULE(this.expression, { LABEL: 'item' });
    this.MANY(() => {
      this.CONSUME(Comma);
      this.SUBRULE2(this.expression, { LABEL: 'item' });
    });
    this.CONSUME(RParen, { LABEL: 'close' });
  });

  /** `[ … ]`: a matrix or, when the entries are separated by `:`, a projective point. */
  bracket = this.RULE('bracket', () => {
    this.CONSUME(LBracket, { LABEL: 'open' });
    this.SUBRULE(this.entry, { LABEL: 'first' });
    this.MANY(() => this.SUBRULE(this.bracketItem, { LABEL: 'item' }));
    this.CONSUME(RBracket, { LABEL: 'close' });
  });

  /** One further entry of a bracket, with the separator written before it (if any). */
  bracketItem = this.RULE('bracketItem', () => {
    this.OPTION(() => {
      this.OR([
        { ALT: () => this.CONSUME(Comma, { LABEL: 'separator' }) },
        { ALT: () => this.CONSUME(Semicolon, { LABEL: 'separator' }) },
        { ALT: () => this.CONSUME(Colon, { LABEL: 'separator' }) },
      ]);
    });
    this.SUBRULE(this.entry);
  });

  /**
   * One entry: an optional sign, then an exact rational (a number, optionally `/` and a denominator),
   * a factor (a name such as a parameter or a field generator, optionally `^` and a whole number, or a
   * parenthesised expression), or a rational followed by a factor. Whether a rational and a factor
   * written one after the other are one entry (`2t`) or two (`2 t`) depends on the space between them,
   * which the tree builder sees (./build-ast.ts); the grammar reads both the same way.
   */
  entry = this.RULE('entry', () => {
    this.OPTION(() => {
      this.OR([
        { ALT: () => this.CONSUME(Minus, { LABEL: 'sign' }) },
        { ALT: () => this.CONSUME(Plus, { LABEL: 'sign' }) },
      ]);
    });
    this.OR2([
      {
        ALT: () => {
          this.CONSUME(NumberLiteral, { LABEL: 'numerator' });
          this.OPTION2(() => {
            this.CONSUME(Slash, { LABEL: 'slash' });
            this.CONSUME2(NumberLiteral, { LABEL: 'denominator' });
          });
          this.OPTION3(() => this.SUBRULE(this.entryFactor, { LABEL: 'factor' }));
        },
      },
      { ALT: () => this.SUBRULE2(this.entryFactor, { LABEL: 'factor' }) },
    ]);
  });

  /** A name with an optional whole power (`t`, `t^2`), or `( expression )`, inside a bracket entry. */
  entryFactor = this.RULE('entryFactor', () => {
    this.OR([
      {
        ALT: () => {
          this.CONSUME(Identifier, { LABEL: 'name' });
          this.OPTION(() => {
            this.CONSUME(WedgeOp, { LABEL: 'caret' });
            this.CONSUME(NumberLiteral, { LABEL: 'exponent' });
          });
        },
      },
      {
        ALT: () => {
          this.CONSUME(LParen, { LABEL: 'open' });
          this.SUBRULE(this.expression, { LABEL: 'inner' });
          this.CONSUME(RParen, { LABEL: 'close' });
        },
      },
    ]);
  });

  indexMap = this.RULE('indexMap', () => {
    this.CONSUME(LBrace, { LABEL: 'open' });
    this.SUBRULE(this.indexEntry, { LABEL: 'item' });
    this.MANY(() => {
      this.CONSUME(Comma);
      this.SUBRULE2(this.indexEntry, { LABEL: 'item' });
    });
    this.CONSUME(RBrace, { LABEL: 'close' });
  });

  indexEntry = this.RULE('indexEntry', () => {
    this.SUBRULE(this.indexKey, { LABEL: 'key' });
    this.CONSUME(Colon);
    this.SUBRULE(this.entry, { LABEL: 'value' });
  });

  /**
   * `13` or `(1, 10)`. A name is accepted here too so that `{e12: 1}` gets
   * the specific `syntax/bad-index-key` problem from the builder rather than a
   * generic parse error.
   */
  indexKey = this.RULE('indexKey', () => {
    this.OR([
      { ALT: () => this.CONSUME(NumberLiteral, { LABEL: 'digits' }) },
      {
        ALT: () => {
          this.CONSUME(LParen, { LABEL: 'open' });
          this.CONSUME2(NumberLiteral, { LABEL: 'label' });
          this.MANY(() => {
            this.CONSUME(Comma);
            this.CONSUME3(NumberLiteral, { LABEL: 'label' });
          });
          this.CONSUME(RParen, { LABEL: 'close' });
        },
      },
      { ALT: () => this.CONSUME(Identifier, { LABEL: 'badName' }) },
    ]);
  });

  rowsExpr = this.RULE('rowsExpr', () => {
    this.CONSUME(Rows, { LABEL: 'keyword' });
    this.SUBRULE(this.bracket, { LABEL: 'matrix' });
  });

  columnsExpr = this.RULE('columnsExpr', () => {
    this.CONSUME(Columns, { LABEL: 'keyword' });
    this.SUBRULE(this.bracket, { LABEL: 'matrix' });
  });

  solutionsExpr = this.RULE('solutionsExpr', () => {
    this.CONSUME(Solutions, { LABEL: 'keyword' });
    this.SUBRULE(this.bracket, { LABEL: 'matrix' });
  });

  dimExpr = this.RULE('dimExpr', () => {
    this.CONSUME(Dim, { LABEL: 'keyword' });
    this.SUBRULE(this.primary, { LABEL: 'operand' });
  });

  /**
   * Parses one statement's tokens. `following` is the keyword that starts the
   * next statement (undefined at the end of the file); messages use it to say
   * what was found where the statement stopped.
   */
  parseStatement(tokens: IToken[], following: IToken | undefined): CstNode | undefined {
    this.context.statement = tokens[0];
    this.context.following = following;
    // Chevrotain pads its input array with end-of-file tokens while it parses and removes them when
    // it is done; should that clean-up ever fail, only this copy keeps the padding, never the caller's
    // tokens (whose last one would otherwise be an end-of-file token with NaN offsets).
    this.input = tokens.slice();
    const deep = tooDeeplyNested(tokens);
    if (deep !== undefined) {
      // Refused before the recursive descent that would overflow the stack; parse.ts reports it like a syntax error.
      this.errors = [nestingError(deep)];
      return undefined;
    }
    const cst = this.statement() as CstNode | undefined;
    return cst ?? undefined;
  }
}

/** The one reusable parser instance (Chevrotain parsers are expensive to build and cheap to reuse). */
let shared: StatementParser | undefined;

/**
 * The shared parser, built on first use: building it is the largest part of loading the language layer,
 * and the server answers `initialize` before it needs a parser.
 */
export function statementParser(): StatementParser {
  return (shared ??= new StatementParser({ statement: undefined, following: undefined }));
}
