/**
 * The documented types of the language layer's facade (`./index.ts`).
 *
 * Everything here is plain data: offsets into the document text (UTF-16 code
 * units, as JavaScript strings count them), never line/column pairs. Lines and
 * columns appear only at the edges (the LSP conversion module and the CLI).
 */
import type { EvaluationMemo } from './statement-memo.js';

import type { Program } from './ast.js';
import type { Reference, SymbolInfo } from './scope.js';

/** A half-open range [start, end) of UTF-16 offsets into the document. */
export interface Span {
  start: number;
  end: number;
}

export type Severity = 'error' | 'warning' | 'information';

/**
 * A problem found in a document. `code` is stable across releases (tests and
 * users may rely on it); `message` is for people and may change.
 *
 * Code bands: `syntax/…`, `name/…`, `type/…`, `math/…`, `claim/…`, `limit/…`.
 */
export interface Problem {
  code: string;
  severity: Severity;
  message: string;
  span: Span;
  /** Other places involved, e.g. the declaration of a vector that turned out dependent. */
  related?: RelatedSpan[];
  /**
   * Edits that would remove the problem (a false claim's computed value, a
   * dependent vector dropped), offered to the user as quick fixes. Their spans
   * index the text the problem was found in; nothing applies them but the user.
   */
  fixes?: Fix[];
}

/** Replace the text of `span` by `newText` (an empty span inserts). */
export interface TextEdit {
  span: Span;
  newText: string;
}

/** One way to change the text, with a title for a menu; its edits never overlap. */
export interface Fix {
  title: string;
  edits: TextEdit[];
  /** The fix an editor may apply from its "auto fix" shortcut. */
  preferred?: boolean;
}

export interface RelatedSpan {
  span: Span;
  message: string;
}

/** How a projective point (a Plücker vector) is scaled for display. */
export type Normalization = 'raw' | 'first-one' | 'primitive' | 'positive';

/** Every normalization, in the order settings and help texts list them. */
export const NORMALIZATIONS: readonly Normalization[] = ['raw', 'first-one', 'primitive', 'positive'];

export interface AnalyzeOptions {
  /**
   * `false`: lex, parse and resolve names only (cheap, for every keystroke).
   * `true`: evaluate everything, check claims.
   */
  evaluate: boolean;
  /** Default normalization; a `normalize` statement in the file overrides it. */
  normalization?: Normalization;
  /** Defaults for the other conventions (workspace settings); `convention` statements in the file override them. */
  order?: 'lex' | 'colex';
  firstLabel?: 0 | 1;
  layout?: 'rows' | 'columns';
  /** Bounds that turn a runaway computation into a `limit/…` problem. */
  limits?: Partial<Limits>;
  /**
   * Called with each statement's span just before the statement is evaluated, so that a caller
   * running the evaluation elsewhere (the server runs it in a worker thread) can tell where a long
   * evaluation is when it has to stop it. Must not throw.
   */
  onStatement?: (span: Span) => void;
  /**
   * Asked before each statement is evaluated; when it answers `true`, `analyze` stops there and throws
   * `EvaluationStopped` (./stopped.ts). Must not throw.
   */
  shouldStop?: () => boolean;
  /**
   * The document's memo of statement outcomes (./statement-memo.ts): statements whose text, context and
   * looked-up names are unchanged since an earlier evaluation with the same memo are not evaluated again.
   * One memo per document.
   */
  memo?: EvaluationMemo;
}

export interface Limits {
  /** Largest number of Plücker coordinates (C(n,k)) computed for one subspace. */
  maxCoordinates: number;
  /** Largest ambient dimension of a declared space. */
  maxDimension: number;
}

export const DEFAULT_LIMITS: Limits = {
  maxCoordinates: 200_000,
  maxDimension: 64,
};

/** What kind of thing a name or a shown expression denotes. */
export type ResultKind =
  | 'field'
  | 'space'
  | 'vector'
  | 'subspace'
  | 'multivector'
  | 'scalar'
  | 'map'
  | 'flag'
  | 'grassmannian'
  | 'class'
  | 'claim'
  | 'show';

/**
 * One computed result: a declaration's value, a claim's verdict or a shown value.
 * The text forms are ready to display; `json` is exact (rationals as strings).
 */
export interface Result {
  kind: ResultKind;
  /** The declared name, when the statement declares one. */
  name?: string;
  /** The whole statement. */
  span: Span;
  /** The span a hover on this result answers to (the name, or the keyword of a claim/show). */
  anchor: Span;
  /** One line for a code lens. */
  summary: string;
  /** Markdown for a hover; always states the convention used. */
  hover: string;
  /** The result typeset in LaTeX, for "copy as LaTeX". */
  latex: string;
  /** Exact machine-readable form (documented in docs/cli-json.md). */
  json: Record<string, unknown>;
  /**
   * Pieces of `latex` a paper may cite on their own (see docs/latex-macros.md): for a subspace, `dim`
   * (its dimension), `basis` (its basis matrix) and `plucker` (its labelled Plücker vector, when the
   * LaTeX form lists it); for a multivector, `form` (its terms) and either `decomposition` (it as a
   * wedge of vectors) or `relation` (the quadratic relation it fails, with the value).
   */
  parts?: ResultParts;
}

/** LaTeX pieces of a result (`Result.parts`). */
export interface ResultParts {
  dim?: string;
  basis?: string;
  plucker?: string;
  form?: string;
  decomposition?: string;
  relation?: string;
}

/** What `analyze` returns. It never throws on user input. */
export interface Analysis {
  text: string;
  problems: Problem[];
  results: Result[];
  /** Whether the evaluation step ran (see `AnalyzeOptions.evaluate`). */
  evaluated: boolean;
  /** Every use of a declared name, so a hover on a use can show the declaration's result. */
  references: NameUse[];
  /** The file's convention in one sentence (present when evaluated), e.g. for the header of a LaTeX export. */
  convention?: string;
  /**
   * What parsing and name resolution found, for the editor features of `./services/` (completion,
   * outline, rename, colouring, formatting). Filled in by `analyze` with and without evaluation, so
   * those features work from the quick pass while the user types. Absent only when the analysis
   * failed internally. Its spans index into `text`; an analysis carried through later edits leaves
   * it out, since nothing in it is moved along.
   */
  syntax?: SyntaxFacts;
}

/** The syntax tree and the name resolution of a document (see `Analysis.syntax`). */
export interface SyntaxFacts {
  /** The statements that parsed, in source order, and the ones dropped for a syntax error. */
  program: Program;
  /**
   * Every declared name in declaration order: spaces, their basis vectors (a space declared without a
   * `basis` list gets the default names, whose `nameSpan` is the space's name), vectors, subspaces,
   * multivectors, maps, flags and a field's generator.
   */
  symbols: SymbolInfo[];
  /** Every resolved use of a name, with the declaration it refers to (one of `symbols`). */
  uses: Reference[];
}

/** A use of a name, resolved to what it names. */
export interface NameUse {
  span: Span;
  name: string;
  kind: 'space' | 'basis' | 'vector' | 'subspace' | 'multivector' | 'map' | 'flag' | 'grassmannian' | 'class' | 'scalar';
  /** For a basis vector: the space it belongs to. */
  space?: string;
}

export interface Hover {
  span: Span;
  markdown: string;
}

export interface Lens {
  span: Span;
  title: string;
  latex: string;
  /** The name of the result, if any, for commands that refer to it. */
  name?: string;
}

/**
 * A change the editor may offer at a place: a problem's fix (`fix`), a
 * rewrite of the text there (`rewrite`, e.g. a basis as its reduced basis) or
 * an addition (`insert`, e.g. a `show` line for a declaration).
 */
export interface EditAction {
  title: string;
  kind: 'fix' | 'rewrite' | 'insert';
  edits: TextEdit[];
  preferred?: boolean;
  /** For a fix: the problem it removes. */
  problem?: Problem;
}
