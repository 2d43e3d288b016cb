/**
 * Go to definition: from a use of a name to where it is declared. A basis
 * vector leads to its name in the space's `basis` list, or, for the default
 * names e1 … en of a space declared without one, to the space's name. On a
 * declaration itself the answer is that declaration.
 */
import type { Analysis, Span } from '../types.js';
import { symbolAt } from './symbols.js';

export function definitionAt(analysis: Analysis, offset: number): Span | undefined {
  return symbolAt(analysis, offset)?.symbol.nameSpan;
}
