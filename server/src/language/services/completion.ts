/**
 * Completion at a cursor, on text that may be incomplete.
 *
 * What may come next is asked of the grammar itself: the tokens of the
 * statement typed so far (from its keyword up to the word under the cursor)
 * go to the parser's content assist, which lists the tokens that could follow
 * and the rule each would be read by. That tells a new name (nothing to offer)
 * from a use of a name (the names in scope and the built-in operations), a
 * space (after `in`, `:` and `->`), a convention setting or value, a
 * normalization, a field or a property. When the statement typed so far is
 * complete, a new statement may start, so the statement keywords are offered
 * too (first, when the cursor is on a later line).
 *
 * Names in scope are those declared by statements before the cursor's
 * statement. A basis name that two spaces in scope share is offered qualified
 * (`V.e1`, `W.e1`), since unqualified it would be ambiguous.
 */
import type { IToken, TokenType } from 'chevrotain';
import { BUILTINS } from '../builtins.js';
import { statementParser, tooDeeplyNested } from '../parser.js';
import type { SymbolInfo } from '../scope.js';
import * as T from '../tokens.js';
import type { Analysis, Span, SyntaxFacts } from '../types.js';
import { inComment, isWord, lastStatementStart, lex, STATEMENT_WORDS } from './lexed.js';
import { describeSymbol } from './symbols.js';
import {
  CONVENTION_SETTINGS, INNER_KEYWORD_DETAILS, NORMALIZATION_MODES, PROPERTIES, STATEMENT_KEYWORD_DETAILS, type Word,
} from './words.js';

export type CompletionKind =
  | 'keyword'
  | 'space'
  | 'basis'
  | 'vector'
  | 'subspace'
  | 'multivector'
  | 'map'
  | 'flag'
  | 'grassmannian'
  | 'class'
  | 'scalar'
  | 'builtin'
  | 'setting'
  | 'value'
  | 'field'
  | 'property';

export interface Completion {
  label: string;
  kind: CompletionKind;
  /** One line beside the label: a name's kind, a built-in's signature. */
  detail: string;
  /** A longer description (a built-in's summary). */
  documentation?: string;
  /** The plain text that replaces `replace`. */
  insertText: string;
  /** The same insertion as a snippet (`$0`, `${1:p}` mark where the cursor goes), when it has one. */
  snippet?: string;
  /** The text the typed word is matched against, when it differs from the label. */
  filterText?: string;
  /** The text replaced: the word typed so far (empty at a fresh position). */
  replace: Span;
  /** Orders the list: contextual words first, then names, then built-ins. */
  sortText: string;
}

export interface CompletionOptions {
  /**
   * The list was asked for because a space was typed. Then only the places that
   * take a word from a fixed list are answered (a convention setting, a mode, a
   * field, a space after `in`, a property), so a space in an expression does
   * not open a list.
   */
  afterSpace?: boolean;
}

/** Where in the grammar a word may go, as the parser's content assist reports it. */
type Slot =
  | 'expression-name'
  | 'member'
  | 'space'
  | 'field-name'
  | 'generator-word'
  | 'normalization'
  | 'setting-key'
  | 'setting-value'
  | 'property';

interface Context {
  tokens: IToken[];
  /** The statement's tokens before the word being typed (from its keyword). */
  piece: IToken[];
  /** The word being typed, if the cursor touches one. */
  word: IToken | undefined;
  replace: Span;
}

const GROUP = { statement: '0', contextual: '1', name: '2', builtin: '3' } as const;

function slotOf(tokenType: TokenType, occurrence: number, ruleStack: string[]): Slot | undefined {
  const rule = ruleStack[ruleStack.length - 1];
  if (tokenType !== T.Identifier) return undefined;
  // Occurrence 0 is the rule's first CONSUME of Identifier, 2 its CONSUME2, 3 its CONSUME3 (see ../parser.ts).
  switch (rule) {
    case 'nameOrCall':
      return occurrence === 2 ? 'member' : 'expression-name';
    case 'declStmt':
    case 'flagStmt':
      return occurrence === 2 ? 'space' : undefined;
    case 'mapStmt':
      return occurrence === 2 || occurrence === 3 ? 'space' : undefined;
    case 'fieldStmt':
      return occurrence === 0 ? 'field-name' : occurrence === 2 ? 'generator-word' : undefined;
    case 'normalizeStmt':
      return 'normalization';
    case 'conventionSetting':
      return occurrence === 0 ? 'setting-key' : 'setting-value';
    case 'relation':
      return 'property';
    default:
      // spaceStmt (a new name or basis names), indexKey (digits only): nothing to offer.
      return undefined;
  }
}

/** The keyword a content-assist path proposes, if it is a word worth offering. */
function keywordOf(tokenType: TokenType, ruleStack: string[]): string | undefined {
  const rule = ruleStack[ruleStack.length - 1];
  // In a convention setting `basis`, `rows` and `columns` are spellings of a setting or its values.
  if (rule === 'conventionSetting') return undefined;
  const pattern = tokenType.PATTERN;
  return typeof pattern === 'string' && INNER_KEYWORD_DETAILS[pattern] !== undefined ? pattern : undefined;
}

function isComplete(piece: IToken[]): boolean {
  try {
    const cst = statementParser().parseStatement(piece, undefined);
    return cst !== undefined && statementParser().errors.length === 0;
  } catch {
    return false;
  }
}

function contentAssist(piece: IToken[]) {
  // Content assist explores the grammar along the whole piece, in time growing with the square of its
  // nesting: fuzzing found 9 s per request at 1000 nested parentheses. Past the parser's nesting bound the
  // statement cannot be read anyway, so nothing is proposed.
  if (tooDeeplyNested(piece) !== undefined) return [];
  try {
    return statementParser().computeContentAssist('statement', piece);
  } catch {
    return [];
  }
}

function readContext(text: string, offset: number): Context | undefined {
  const { tokens, comments } = lex(text);
  if (inComment(comments, offset)) return undefined;
  const touching = tokens.find((t) => t.startOffset < offset && offset <= t.endOffset! + 1);
  if (touching && !isWord(touching)) {
    // Inside or right after a number or an operator: only a word can be completed.
    if (touching.endOffset! + 1 !== offset || touching.tokenType === T.NumberLiteral) return undefined;
  }
  const word = touching && isWord(touching) ? touching : undefined;
  const start = word ? word.startOffset : offset;
  const before = tokens.filter((t) => t.endOffset! + 1 <= start);
  const k = lastStatementStart(before);
  return { tokens: before, piece: k < 0 ? [] : before.slice(k), word, replace: { start, end: offset } };
}

function item(
  label: string,
  kind: CompletionKind,
  detail: string,
  replace: Span,
  group: string,
  extra: Partial<Completion> = {},
): Completion {
  return { label, kind, detail, insertText: label, replace, sortText: `${group}${label}`, ...extra };
}

function wordItems(words: readonly Word[], kind: CompletionKind, replace: Span): Completion[] {
  return words.map((w, i) => item(w.word, kind, w.detail, replace, GROUP.contextual, { sortText: `${GROUP.contextual}${String(i).padStart(2, '0')}` }));
}

/** Names declared before the statement that starts at `statementStart`. */
function namesInScope(facts: SyntaxFacts, statementStart: number, replace: Span): Completion[] {
  const visible = facts.symbols.filter((s) => s.declSpan.start < statementStart);
  const basisCount = new Map<string, number>();
  for (const s of visible) if (s.kind === 'basis') basisCount.set(s.name, (basisCount.get(s.name) ?? 0) + 1);
  const items: Completion[] = [];
  for (const s of visible) {
    const label = s.kind === 'basis' && basisCount.get(s.name)! > 1 ? `${s.space}.${s.name}` : s.name;
    items.push(item(label, s.kind, describeSymbol(facts, s), replace, GROUP.name));
  }
  // A declaration whose statement has a syntax error still names something the user means to use.
  for (const d of facts.program.dropped ?? []) {
    if (d.declares && d.span.start < statementStart && !visible.some((s) => s.name === d.declares!.name)) {
      items.push(item(d.declares.name, kindOfDropped(d.kind), `${d.kind} (its statement has a syntax error)`, replace, GROUP.name));
    }
  }
  return items;
}

function kindOfDropped(kind: string): CompletionKind {
  return kind === 'space' || kind === 'vector' || kind === 'subspace' || kind === 'multivector' || kind === 'map' || kind === 'flag' ||
    kind === 'grassmannian' || kind === 'class'
    ? kind
    : 'vector';
}

function builtinItems(replace: Span): Completion[] {
  return BUILTINS.map((b) =>
    item(b.name, 'builtin', b.signature, replace, GROUP.builtin, {
      documentation: b.summary,
      snippet: `${b.name}($0)`,
    }),
  );
}

function spaceItems(facts: SyntaxFacts, statementStart: number, replace: Span): Completion[] {
  return facts.symbols
    .filter((s) => s.kind === 'space' && s.declSpan.start < statementStart)
    .map((s) => item(s.name, 'space', describeSymbol(facts, s), replace, GROUP.contextual));
}

function memberItems(facts: SyntaxFacts, piece: IToken[], statementStart: number, replace: Span): Completion[] {
  // The piece ends with `V .`: the qualifier is the token before the dot.
  const qualifier = piece[piece.length - 2];
  if (!qualifier || qualifier.tokenType !== T.Identifier) return [];
  return facts.symbols
    .filter((s: SymbolInfo) => s.kind === 'basis' && s.space === qualifier.image && s.declSpan.start < statementStart)
    .map((s) => item(s.name, 'basis', describeSymbol(facts, s), replace, GROUP.name));
}

/**
 * The words of a hyphenated value typed so far (`first-` in `normalize first-o`):
 * the replaced text then starts at the value's first word.
 */
function hyphenatedStart(piece: IToken[], replace: Span): { replace: Span; typed: number } {
  let i = piece.length;
  while (i >= 2 && piece[i - 1]!.tokenType === T.Minus && isWord(piece[i - 2]!)) i -= 2;
  if (i === piece.length) return { replace, typed: 0 };
  return { replace: { start: piece[i]!.startOffset, end: replace.end }, typed: piece.length - i };
}

function settingItems(piece: IToken[], slot: 'setting-key' | 'setting-value', replace: Span): Completion[] {
  if (slot === 'setting-key') {
    const chosen = new Set(piece.slice(1).map((t) => t.image));
    return CONVENTION_SETTINGS.filter((s) => !chosen.has(s.key)).map((s, i) =>
      item(s.key, 'setting', s.detail, replace, GROUP.contextual, { sortText: `${GROUP.contextual}${String(i).padStart(2, '0')}` }),
    );
  }
  const { replace: valueSpan, typed } = hyphenatedStart(piece, replace);
  const key = piece[piece.length - 1 - typed];
  const setting = CONVENTION_SETTINGS.find((s) => s.key === key?.image || (key?.image === 'basis' && s.key === 'layout'));
  return setting ? wordItems(setting.values, 'value', valueSpan) : [];
}

function propertyItems(piece: IToken[], replace: Span): Completion[] {
  // The words after `is` (and `not`) typed so far belong to the property being completed.
  let i = piece.length;
  while (i > 0 && piece[i - 1]!.tokenType !== T.Is && piece[i - 1]!.tokenType !== T.Not) i--;
  const typed = piece.slice(i).filter((t) => t.tokenType !== T.Minus);
  const start = typed[0]?.startOffset ?? replace.start;
  const prefix = typed.map((t) => t.image.toLowerCase());
  const matching = PROPERTIES.filter((p) => {
    const words = p.word.toLowerCase().split(' ');
    return prefix.every((w, j) => words[j] === w);
  });
  return wordItems(matching, 'property', { start, end: replace.end });
}

function fieldItems(replace: Span): Completion[] {
  return [
    item('QQ', 'field', 'the rationals', replace, GROUP.contextual, { sortText: `${GROUP.contextual}0` }),
    item('GF(p)', 'field', 'a finite field: GF(p) for a prime p, GF(q) with a generator for q = p^m', replace, GROUP.contextual, {
      insertText: 'GF()',
      snippet: 'GF(${1:p})',
      filterText: 'GF',
      sortText: `${GROUP.contextual}1`,
    }),
  ];
}

function keywordItem(word: string, replace: Span, group: string): Completion {
  const detail = STATEMENT_KEYWORD_DETAILS[word] ?? INNER_KEYWORD_DETAILS[word] ?? 'keyword';
  return item(word, 'keyword', detail, replace, group);
}

function lineOf(text: string, offset: number): number {
  let line = 0;
  for (let i = 0; i < offset; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

/** The completions at `offset` (see the module comment). Never throws on user text. */
export function completionsAt(analysis: Analysis, offset: number, options: CompletionOptions = {}): Completion[] {
  const facts = analysis.syntax;
  if (!facts) return [];
  const context = readContext(analysis.text, offset);
  if (!context) return [];
  const { piece, replace, tokens } = context;
  const statementStarts = (group: string) => STATEMENT_WORDS.map((w) => keywordItem(w, replace, group));
  if (piece.length === 0) {
    // Before the first statement only a statement can begin.
    return options.afterSpace ? [] : statementStarts(GROUP.statement);
  }
  const statementStart = piece[0]!.startOffset;
  const closed: Completion[] = [];
  const open: Completion[] = [];
  const slots = new Set<Slot>();
  const keywords = new Set<string>();
  for (const path of contentAssist(piece)) {
    const slot = slotOf(path.nextTokenType, path.nextTokenOccurrence, path.ruleStack);
    if (slot) slots.add(slot);
    const keyword = keywordOf(path.nextTokenType, path.ruleStack);
    if (keyword) keywords.add(keyword);
  }
  for (const slot of slots) {
    switch (slot) {
      case 'expression-name':
        open.push(...namesInScope(facts, statementStart, replace), ...builtinItems(replace));
        break;
      case 'member':
        closed.push(...memberItems(facts, piece, statementStart, replace));
        break;
      case 'space':
        closed.push(...spaceItems(facts, statementStart, replace));
        break;
      case 'field-name':
        closed.push(...fieldItems(replace));
        break;
      case 'generator-word':
        closed.push(item('generator', 'keyword', 'the name of a generator of GF(q) over GF(p), for q = p^m', replace, GROUP.contextual));
        break;
      case 'normalization':
        closed.push(...wordItems(NORMALIZATION_MODES, 'value', hyphenatedStart(piece, replace).replace));
        break;
      case 'setting-key':
      case 'setting-value':
        closed.push(...settingItems(piece, slot, replace));
        break;
      case 'property':
        closed.push(...propertyItems(piece, replace));
        break;
    }
  }
  if (slots.has('property')) {
    // `decomposable` is offered as a property; `not` only right after `is`.
    keywords.delete('decomposable');
    if (piece[piece.length - 1]?.tokenType !== T.Is) keywords.delete('not');
  }
  for (const keyword of keywords) open.push(keywordItem(keyword, replace, GROUP.contextual));
  if (options.afterSpace) return closed;
  const result = [...closed, ...open];
  if (isComplete(piece)) {
    // A new statement may begin here; on a later line that is the likely intent.
    const last = tokens[tokens.length - 1]!;
    const laterLine = lineOf(analysis.text, replace.start) > lineOf(analysis.text, last.endOffset! + 1);
    result.push(...statementStarts(laterLine ? GROUP.statement : '4'));
  } else if (result.length === 0 && startsLine(analysis.text, replace.start)) {
    // A broken statement before the cursor: at the start of a line, a new statement is a fair guess.
    result.push(...statementStarts(GROUP.statement));
  }
  return dedupe(result);
}

function startsLine(text: string, offset: number): boolean {
  const lineStart = text.lastIndexOf('\n', offset - 1) + 1;
  return text.slice(lineStart, offset).trim() === '';
}

/** One item per label: the first, from the most specific context, wins. */
function dedupe(items: Completion[]): Completion[] {
  const seen = new Set<string>();
  return items.filter((i) => {
    const key = i.label;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}
