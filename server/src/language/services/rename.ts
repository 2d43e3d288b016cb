/**
 * Rename a declared name: its declaration and every use change together.
 *
 * `prepareRenameAt` says what would be renamed, or why nothing can be:
 * keywords, built-in operations and field names are part of the language; the
 * default basis names e1 … en of a space declared without a `basis` list are
 * made from the space's dimension and the labels convention, so no text
 * declares them and renaming one alone would leave the others and the
 * convention behind (the message suggests a `basis` list instead).
 *
 * `renameAt` also checks the new name: an identifier, not a keyword or field
 * name, not already declared, and for a map not the name of a built-in (the
 * calls of that built-in would apply the map instead). A statement with a
 * syntax error that mentions the old name stops the rename, since its uses
 * are not known and would be missed. As a last guard the renamed text is read
 * again: if any use would resolve differently or a name problem would appear
 * or vanish, the rename is refused rather than changing the document's meaning.
 */
import { BUILTIN_NAMES, FIELD_NAMES } from '../builtins.js';
import { parseProgram } from '../parse.js';
import { resolveNames, type Resolution, type SymbolInfo } from '../scope.js';
import * as T from '../tokens.js';
import type { Analysis, Span, SyntaxFacts, TextEdit } from '../types.js';
import { inComment, isIdentifierText, isWord, KEYWORD_WORDS, lex, STATEMENT_WORDS } from './lexed.js';
import { describeSymbol, isDefaultBasis, sameSymbol, symbolAt, usesOf } from './symbols.js';

export type PrepareRename = { span: Span; placeholder: string } | { refused: string };
export type Rename = { edits: TextEdit[] } | { refused: string };

const ALL_KEYWORDS = new Set([...KEYWORD_WORDS, ...STATEMENT_WORDS]);

interface Target {
  facts: SyntaxFacts;
  symbol: SymbolInfo;
  span: Span;
}

function findTarget(analysis: Analysis, offset: number): Target | { refused: string } {
  const facts = analysis.syntax;
  if (!facts) return { refused: 'this document could not be read, so nothing can be renamed' };
  const { tokens, comments } = lex(analysis.text);
  if (inComment(comments, offset)) return { refused: 'there is nothing to rename in a comment' };
  const word = tokens.find((t) => isWord(t) && t.startOffset <= offset && offset <= t.endOffset! + 1);
  if (word && T.isKeyword(word.tokenType)) return { refused: `'${word.image}' is a keyword of the language and cannot be renamed` };
  if (word && T.isStatementKeyword(word)) return { refused: `'${word.image}' is a statement keyword and cannot be renamed` };
  const hit = symbolAt(analysis, offset);
  if (!hit) {
    if (!word) return { refused: 'there is no name here to rename' };
    const next = tokens[tokens.indexOf(word) + 1];
    if (BUILTIN_NAMES.has(word.image) && next?.tokenType === T.LParen) {
      return { refused: `'${word.image}' is a built-in operation; its name is part of the language` };
    }
    if (FIELD_NAMES.has(word.image)) return { refused: `'${word.image}' names a field; its name is part of the language` };
    return { refused: `'${word.image}' is not a declared name here (undeclared, or in a statement with a syntax error)` };
  }
  if (isDefaultBasis(analysis, hit.symbol)) {
    return {
      refused:
        `'${hit.symbol.name}' is a default basis name of ${hit.symbol.space}, which is declared without a basis list: ` +
        `the names e1 … en come from the dimension and the labels convention, and no text declares them. ` +
        `To choose other names, add a basis list to the space, e.g. 'basis a b c'`,
    };
  }
  const missed = mentionInBrokenText(analysis, facts, hit.symbol.name);
  if (missed) return { refused: missed };
  return { facts, symbol: hit.symbol, span: hit.span };
}

/** A message if the name occurs in text that did not parse (its uses there are unknown). */
function mentionInBrokenText(analysis: Analysis, facts: SyntaxFacts, name: string): string | undefined {
  const inParsed = (offset: number) => facts.program.statements.some((s) => s.span.start <= offset && offset < s.span.end);
  const stray = lex(analysis.text).tokens.some((t) => t.image === name && t.tokenType === T.Identifier && !inParsed(t.startOffset));
  return stray ? `a statement with a syntax error mentions '${name}'; fix it first, so that none of its uses is missed` : undefined;
}

export function prepareRenameAt(analysis: Analysis, offset: number): PrepareRename {
  const target = findTarget(analysis, offset);
  if ('refused' in target) return target;
  return { span: target.span, placeholder: target.symbol.name };
}

/** What is wrong with `newName` as the new name of `symbol`, if anything. */
function newNameProblem(facts: SyntaxFacts, symbol: SymbolInfo, newName: string): string | undefined {
  if (!isIdentifierText(newName)) {
    return `'${newName}' is not a name: a name starts with a letter or '_' and goes on with letters, digits, '_' or "'"`;
  }
  if (ALL_KEYWORDS.has(newName)) return `'${newName}' is a keyword of the language`;
  if (FIELD_NAMES.has(newName)) return `'${newName}' names a field and cannot be declared`;
  const taken = facts.symbols.find((s) => s.name === newName && !sameSymbol(s, symbol));
  if (taken) return `'${newName}' is already declared (as ${describeSymbol(facts, taken)})`;
  if ((facts.program.dropped ?? []).some((d) => d.declares?.name === newName)) {
    return `'${newName}' is already declared (in a statement with a syntax error)`;
  }
  if (symbol.kind === 'map' && BUILTIN_NAMES.has(newName)) {
    return `'${newName}' is a built-in operation: calls of it after the map's declaration would apply the map instead`;
  }
  return undefined;
}

/** The first label the default basis names were made with (1 when no space uses them). */
function firstLabelOf(analysis: Analysis, facts: SyntaxFacts): 0 | 1 {
  const first = facts.symbols.find((s) => isDefaultBasis(analysis, s) && s.index === 0);
  return first?.name === 'e0' ? 0 : 1;
}

/** What resolution decided, independent of offsets: each use's target by its place in the declarations. */
function meaning(resolution: Resolution): string {
  const key = (s: SymbolInfo) => resolution.symbols.findIndex((t) => sameSymbol(s, t));
  return JSON.stringify({
    symbols: resolution.symbols.map((s) => s.kind),
    uses: resolution.references.map((r) => key(r.target)),
    problems: resolution.problems.map((p) => p.code),
  });
}

function applyEdits(text: string, edits: readonly TextEdit[]): string {
  let result = text;
  for (const e of [...edits].sort((a, b) => b.span.start - a.span.start)) {
    result = result.slice(0, e.span.start) + e.newText + result.slice(e.span.end);
  }
  return result;
}

export function renameAt(analysis: Analysis, offset: number, newName: string): Rename {
  const target = findTarget(analysis, offset);
  if ('refused' in target) return target;
  const { facts, symbol } = target;
  if (newName === symbol.name) return { edits: [] };
  const problem = newNameProblem(facts, symbol, newName);
  if (problem) return { refused: problem };
  const spans = [symbol.nameSpan, ...usesOf(facts, symbol)];
  const edits = spans.map((span) => ({ span, newText: newName })).sort((a, b) => a.span.start - b.span.start);
  const firstLabel = firstLabelOf(analysis, facts);
  const before = meaning(resolveNames(facts.program, firstLabel));
  const renamed = parseProgram(applyEdits(analysis.text, edits));
  const after = meaning(resolveNames(renamed.program, firstLabel));
  const syntaxCodes = (codes: { code: string }[]) => codes.map((p) => p.code).filter((c) => c.startsWith('syntax/')).join();
  if (before !== after || syntaxCodes(analysis.problems) !== syntaxCodes(renamed.problems)) {
    return { refused: `renaming '${symbol.name}' to '${newName}' would change what some name in the file refers to` };
  }
  return { edits };
}
