/**
 * The syntax tree of a `.wedge` document, as produced by the parser
 * (`./parse.ts`) and consumed by the evaluator.
 *
 * Every node carries a `span`: UTF-16 offsets into the document text, end
 * exclusive (see `Span` in `./types.ts`). Keyword spans are kept separately so
 * that hovers and diagnostics can point at the keyword of a statement.
 */
import type { Span } from './types.js';

/** A name as written in the source. */
export interface Ident {
  span: Span;
  name: string;
}

/** A whole document: its statements in source order. */
export interface Program {
  span: Span;
  statements: Statement[];
  /**
   * Statements left out of `statements` because they contain a syntax error
   * (each has a `syntax/…` problem). The parser always fills this in (possibly
   * empty); it lets later stages avoid follow-up errors, e.g. an "unknown name"
   * for a name whose declaration was dropped.
   */
  dropped?: DroppedStatement[];
}

/** A statement that was not parsed into the tree because of a syntax error. */
export interface DroppedStatement {
  span: Span;
  keyword: Span;
  kind: 'field' | 'normalize' | 'space' | 'vector' | 'subspace' | 'multivector' | 'claim' | 'show' | 'convention' | 'map' | 'flag' | 'parameter' | 'grassmannian' | 'class';
  /** The name the statement would have declared (space and vector/subspace/multivector declarations), if it was read. */
  declares?: Ident;
}

export type Statement =
  | FieldStmt
  | NormalizeStmt
  | SpaceStmt
  | DeclStmt
  | ClaimStmt
  | ShowStmt
  | ConventionStmt
  | MapStmt
  | FlagStmt
  | ParameterStmt;

/** `parameter t` or `parameter s, t`: indeterminates; entries using them are polynomials or rational functions. */
export interface ParameterStmt {
  type: 'parameter';
  span: Span;
  keyword: Span;
  names: Ident[];
}

/** One `key value` pair of a convention statement; hyphenated values are joined (`direction-moment`). */
export interface ConventionSetting {
  span: Span;
  key: Ident;
  value: Ident;
}

/** `convention order colex labels 0 layout columns`. */
export interface ConventionStmt {
  type: 'convention';
  span: Span;
  keyword: Span;
  settings: ConventionSetting[];
}

/** `map f : V -> U = <matrix>`. */
export interface MapStmt {
  type: 'map';
  span: Span;
  keyword: Span;
  name: Ident;
  from: Ident;
  to: Ident;
  value: Expr;
}

/** `flag F = (v1, …, vn)` or `flag F = standard(V)`, with an optional `in V`. */
export interface FlagStmt {
  type: 'flag';
  span: Span;
  keyword: Span;
  name: Ident;
  value: Expr;
  inSpace?: Ident;
}

/** `field QQ`, `field GF(7)`; the name and modulus are validated by the evaluator. */
export interface FieldStmt {
  type: 'field';
  span: Span;
  keyword: Span;
  name: Ident;
  modulus?: NumberLit;
  /** `generator w`: the name of the class of x in GF(q) = GF(p)[x]/(f), for q a prime power. */
  generator?: Ident;
}

/** `normalize first-one`: the hyphenated words are joined into one `mode.name`. */
export interface NormalizeStmt {
  type: 'normalize';
  span: Span;
  keyword: Span;
  mode: Ident;
}

/** `space V dim 4` or `space U dim 5 basis a b c d e`. */
export interface SpaceStmt {
  type: 'space';
  span: Span;
  keyword: Span;
  name: Ident;
  dim: NumberLit;
  basis?: Ident[];
}

/**
 * `vector p = …`, `subspace L = …`, `multivector eta = …`, each with an optional `in V`; also
 * `grassmannian X = Gr(2, 4)` and `class c = sigma(X, 1)^4` (Schubert calculus).
 */
export interface DeclStmt {
  type: 'decl';
  span: Span;
  keyword: Span;
  declKind: 'vector' | 'subspace' | 'multivector' | 'grassmannian' | 'class';
  name: Ident;
  value: Expr;
  inSpace?: Ident;
}

/** `claim <subject> <relation>`. */
export interface ClaimStmt {
  type: 'claim';
  span: Span;
  keyword: Span;
  subject: Expr;
  relation: Relation;
}

/**
 * The relation of a claim. `other` is present for every operator except
 * `decomposable` and `not decomposable`. Unicode spellings are normalised:
 * `≠` gives '!=', `∈` gives 'in', `∉` gives 'not in'.
 */
export interface Relation {
  span: Span;
  op: '=' | '!=' | 'in' | 'not in' | 'decomposable' | 'not decomposable' | 'is' | 'is not';
  other?: Expr;
  /** For `is` and `is not`: the property, its words joined by '-' (`totally-nonnegative`). */
  property?: Ident;
}

/** `show <expression>`. */
export interface ShowStmt {
  type: 'show';
  span: Span;
  keyword: Span;
  value: Expr;
}

export type Expr =
  | NumberLit
  | NameRef
  | Binary
  | Unary
  | Call
  | Tuple
  | MatrixLit
  | PointLit
  | IndexMapLit
  | RowsExpr
  | ColumnsExpr
  | SolutionsExpr
  | DimExpr;

/** An unsigned decimal number exactly as written: '3', '0.125'. */
export interface NumberLit {
  type: 'number';
  span: Span;
  text: string;
}

/** A name, or a qualified basis name: `V.e1` has qualifier V and name e1. */
export interface NameRef {
  type: 'name';
  span: Span;
  name: Ident;
  qualifier?: Ident;
}

/**
 * A binary operation. Unicode spellings are normalised (`∧` gives '^', `∩`
 * gives '&'). `implicit` is true for juxtaposition (`3 e1`); its `opSpan` is
 * the gap between the two operands (`{ start: end of left, end: start of right }`,
 * empty when they touch, as in `3e1`).
 */
export interface Binary {
  type: 'binary';
  span: Span;
  op: '+' | '-' | '*' | '/' | '^' | '&';
  opSpan: Span;
  implicit?: boolean;
  left: Expr;
  right: Expr;
}

/** A prefix sign: `-e1`, `+q`. */
export interface Unary {
  type: 'unary';
  span: Span;
  op: '-' | '+';
  operand: Expr;
}

/** A call of a built-in: `span(p, q)`, `plucker(L)`, `chart(L, 13)`; `at(W, t = 2)` gives values to parameters. */
export interface Call {
  type: 'call';
  span: Span;
  callee: Ident;
  args: Expr[];
  /** `t = 2`: values given to parameters, after the other arguments. */
  named?: NamedArgument[];
}

/** `t = 2` in a call. */
export interface NamedArgument {
  span: Span;
  name: Ident;
  value: Expr;
}

/** A parenthesised list of at least two items; `(x)` is just `x`. */
export interface Tuple {
  type: 'tuple';
  span: Span;
  items: Expr[];
}

/**
 * One entry inside brackets: an exact rational literal, sign included ('-1/2', '3', '+0.5'), or an
 * entry with names (a parameter or a field generator: `t`, `2t^2`, `(1 + t)`), which carries the
 * expression it stands for in `expr`; `text` is then a readable spelling of it.
 */
export interface Entry {
  span: Span;
  text: string;
  expr?: Expr;
}

/** `[1 0 2; 0 1 3]`: rows split by `;` or by source line. */
export interface MatrixLit {
  type: 'matrix';
  span: Span;
  rows: Entry[][];
}

/** `[1 : 3 : -2]`: a projective point, entries separated by `:`. */
export interface PointLit {
  type: 'point';
  span: Span;
  entries: Entry[];
}

/** An index set as written: '13' gives [1, 3]; '(1, 10)' gives [1, 10]. */
export interface IndexKey {
  span: Span;
  labels: number[];
}

/** `{12: 1, 13: -2}`: a multivector by coefficients of basis index sets. */
export interface IndexMapLit {
  type: 'indexmap';
  span: Span;
  entries: { key: IndexKey; value: Entry; span: Span }[];
}

/** `rows [ … ]`: the row space of a matrix. */
export interface RowsExpr {
  type: 'rows';
  span: Span;
  keyword: Span;
  matrix: MatrixLit;
}

/** `solutions [ … ]`: the solution space of a homogeneous system. */
/** `columns [ … ]`: the span of the matrix's columns. */
export interface ColumnsExpr {
  type: 'columns';
  span: Span;
  keyword: Span;
  matrix: MatrixLit;
}

export interface SolutionsExpr {
  type: 'solutions';
  span: Span;
  keyword: Span;
  matrix: MatrixLit;
}

/** `dim <primary>`. */
export interface DimExpr {
  type: 'dim';
  span: Span;
  keyword: Span;
  operand: Expr;
}

/** The expressions inside the entries of a bracket or index-set literal (entries with names: `t`, `2t^2`). */
export function entryExpressions(e: MatrixLit | PointLit | IndexMapLit): Expr[] {
  const entries = e.type === 'matrix' ? e.rows.flat() : e.type === 'point' ? e.entries : e.entries.map((x) => x.value);
  return entries.flatMap((x) => (x.expr ? [x.expr] : []));
}
