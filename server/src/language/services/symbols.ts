/**
 * Which declared name sits at an offset, and every place that names it: the
 * common ground of go to definition, find references, rename and colouring.
 */
import type { SymbolInfo } from '../scope.js';
import type { Analysis, Span, SyntaxFacts } from '../types.js';

export interface SymbolHit {
  symbol: SymbolInfo;
  /** The text under the offset: a use of the name, or its declaration. */
  span: Span;
  isDeclaration: boolean;
}

function contains(span: Span, offset: number): boolean {
  return span.start <= offset && offset <= span.end;
}

/** Two records of the same declaration (identity is not relied on: analyses may be copied between threads). */
export function sameSymbol(a: SymbolInfo, b: SymbolInfo): boolean {
  return a.kind === b.kind && a.name === b.name && a.nameSpan.start === b.nameSpan.start && a.space === b.space;
}

/**
 * Whether a basis vector has one of the default names of a space declared
 * without a `basis` list: no text declares it (its `nameSpan` is the space's name).
 */
export function isDefaultBasis(analysis: Analysis, symbol: SymbolInfo): boolean {
  return symbol.kind === 'basis' && analysis.text.slice(symbol.nameSpan.start, symbol.nameSpan.end) !== symbol.name;
}

/**
 * The declared name at `offset` (a cursor touching either end of a name counts).
 * A use wins over a declaration; where a cursor touches two names (`V.e1` at the
 * dot), the one it is inside, else the one after it.
 */
export function symbolAt(analysis: Analysis, offset: number): SymbolHit | undefined {
  const facts = analysis.syntax;
  if (!facts) return undefined;
  const candidates: SymbolHit[] = [];
  for (const use of facts.uses) {
    if (contains(use.span, offset)) candidates.push({ symbol: use.target, span: use.span, isDeclaration: false });
  }
  for (const symbol of facts.symbols) {
    // The default basis names share the space's name span; the space is what stands there.
    if (contains(symbol.nameSpan, offset) && !isDefaultBasis(analysis, symbol)) {
      candidates.push({ symbol, span: symbol.nameSpan, isDeclaration: true });
    }
  }
  const rank = (hit: SymbolHit) => (hit.span.start < offset && offset < hit.span.end ? 0 : hit.span.start === offset ? 1 : 2);
  candidates.sort((a, b) => rank(a) - rank(b) || Number(a.isDeclaration) - Number(b.isDeclaration));
  return candidates[0];
}

/** Every use of `symbol`, in source order. */
export function usesOf(facts: SyntaxFacts, symbol: SymbolInfo): Span[] {
  return facts.uses
    .filter((u) => sameSymbol(u.target, symbol))
    .map((u) => u.span)
    .sort((a, b) => a.start - b.start);
}

/** A few words on what a declared name is: `space of dimension 4`, `basis vector of V`, `map V → U`. */
export function describeSymbol(facts: SyntaxFacts, symbol: SymbolInfo): string {
  const statement = facts.program.statements.find((s) => s.span.start === symbol.declSpan.start);
  switch (symbol.kind) {
    case 'space':
      return statement?.type === 'space' ? `space of dimension ${statement.dim.text}` : 'space';
    case 'basis':
      return `basis vector of ${symbol.space}`;
    case 'map':
      return statement?.type === 'map' ? `map ${statement.from.name} → ${statement.to.name}` : 'map';
    case 'scalar':
      if (statement?.type === 'parameter') return 'parameter';
      return statement?.type === 'field' ? `generator of ${statement.name.name}(${statement.modulus?.text ?? ''})` : 'scalar';
    case 'grassmannian':
      return 'Grassmannian';
    case 'class':
      return 'Schubert class';
    case 'vector':
    case 'subspace':
    case 'multivector':
    case 'flag':
      return statement && 'inSpace' in statement && statement.inSpace ? `${symbol.kind} in ${statement.inSpace.name}` : symbol.kind;
  }
}
