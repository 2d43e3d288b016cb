/**
 * Semantic colouring: every declared name and every use of one, told apart by
 * what it names, plus built-in operations and field names. Keywords, numbers,
 * operators and comments are left to the TextMate grammar.
 *
 * The token types and modifiers are LSP's standard ones where one fits, with
 * four modifiers of our own for the kinds of value a `variable` can hold:
 *
 * | what                               | type         | modifiers                       |
 * |------------------------------------|--------------|---------------------------------|
 * | space                              | `type`       |                                 |
 * | basis vector from a `basis` list   | `enumMember` |                                 |
 * | default basis vector (e1 … en)     | `enumMember` | `defaultLibrary`                |
 * | vector                             | `variable`   | `vector`                        |
 * | subspace                           | `variable`   | `subspace`                      |
 * | multivector                        | `variable`   | `multivector`                   |
 * | flag                               | `variable`   | `flag`                          |
 * | generator of a field (`w` in GF(9))| `variable`   | `readonly`                      |
 * | map                                | `function`   |                                 |
 * | built-in operation (`span`, …)     | `function`   | `defaultLibrary`                |
 * | field name (`QQ`, `GF`)            | `type`       | `defaultLibrary`                |
 *
 * A declaration also carries `declaration`.
 */
import { BUILTIN_NAMES } from '../builtins.js';
import type { SymbolKind } from '../scope.js';
import type { Analysis, Span } from '../types.js';
import { isDefaultBasis } from './symbols.js';
import { forEachStatementExpr } from './walk.js';

export const SEMANTIC_TOKEN_TYPES = ['type', 'enumMember', 'variable', 'function'] as const;
export const SEMANTIC_TOKEN_MODIFIERS = [
  'declaration',
  'readonly',
  'defaultLibrary',
  'vector',
  'subspace',
  'multivector',
  'flag',
] as const;

export type SemanticTokenType = (typeof SEMANTIC_TOKEN_TYPES)[number];
export type SemanticTokenModifier = (typeof SEMANTIC_TOKEN_MODIFIERS)[number];

export interface SemanticToken {
  span: Span;
  type: SemanticTokenType;
  modifiers: SemanticTokenModifier[];
}

function classify(kind: SymbolKind): { type: SemanticTokenType; modifiers: SemanticTokenModifier[] } {
  switch (kind) {
    case 'space':
      return { type: 'type', modifiers: [] };
    case 'basis':
      return { type: 'enumMember', modifiers: [] };
    case 'map':
      return { type: 'function', modifiers: [] };
    case 'scalar':
      return { type: 'variable', modifiers: ['readonly'] };
    case 'vector':
    case 'subspace':
    case 'multivector':
    case 'flag':
      return { type: 'variable', modifiers: [kind] };
    case 'grassmannian':
    case 'class':
      return { type: 'variable', modifiers: [] };
  }
}

/** The semantic tokens of the document, in source order, none overlapping another. */
export function semanticTokens(analysis: Analysis): SemanticToken[] {
  const facts = analysis.syntax;
  if (!facts) return [];
  const tokens: SemanticToken[] = [];
  for (const symbol of facts.symbols) {
    // The default basis names are not written at their declaration (their span is the space's name).
    if (isDefaultBasis(analysis, symbol)) continue;
    const { type, modifiers } = classify(symbol.kind);
    tokens.push({ span: symbol.nameSpan, type, modifiers: ['declaration', ...modifiers] });
  }
  for (const use of facts.uses) {
    const { type, modifiers } = classify(use.target.kind);
    tokens.push({ span: use.span, type, modifiers: isDefaultBasis(analysis, use.target) ? [...modifiers, 'defaultLibrary'] : modifiers });
  }
  const maps = new Set(facts.uses.filter((u) => u.target.kind === 'map').map((u) => u.span.start));
  forEachStatementExpr(facts.program.statements, (e) => {
    if (e.type === 'call' && BUILTIN_NAMES.has(e.callee.name) && !maps.has(e.callee.span.start)) {
      tokens.push({ span: e.callee.span, type: 'function', modifiers: ['defaultLibrary'] });
    }
  });
  for (const s of facts.program.statements) {
    if (s.type === 'field') tokens.push({ span: s.name.span, type: 'type', modifiers: ['defaultLibrary'] });
  }
  tokens.sort((a, b) => a.span.start - b.span.start || b.span.end - a.span.end);
  // One token per place: a name is both declared and used nowhere twice, but be safe against overlaps.
  const kept: SemanticToken[] = [];
  for (const t of tokens) {
    const last = kept[kept.length - 1];
    if (!last || t.span.start >= last.span.end) kept.push(t);
  }
  return kept.filter((t) => t.span.end > t.span.start);
}
