/**
 * Find references: every use of the name at the cursor, and (when asked) its
 * declaration. The default basis names of a space declared without a `basis`
 * list have no declaration in the text (their `nameSpan` is the space's name,
 * which names the space), so only their uses are listed.
 */
import type { Analysis, Span } from '../types.js';
import { isDefaultBasis, symbolAt, usesOf } from './symbols.js';

export function referencesAt(analysis: Analysis, offset: number, includeDeclaration: boolean): Span[] {
  const facts = analysis.syntax;
  const hit = symbolAt(analysis, offset);
  if (!facts || !hit) return [];
  const spans = usesOf(facts, hit.symbol);
  if (includeDeclaration && !isDefaultBasis(analysis, hit.symbol)) spans.push(hit.symbol.nameSpan);
  return spans.sort((a, b) => a.start - b.start);
}
