/**
 * Whether two syntax trees say the same thing, whatever their layout: the
 * trees compared without their spans (the offsets are all a layout changes).
 */
import type { Statement } from '../ast.js';

function isSpan(value: unknown): boolean {
  if (typeof value !== 'object' || value === null) return false;
  const keys = Object.keys(value);
  return keys.length === 2 && keys.includes('start') && keys.includes('end');
}

/** A copy of a tree node with every span left out. */
export function withoutSpans(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(withoutSpans);
  if (typeof value !== 'object' || value === null) return value;
  const copy: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value)) {
    if (!isSpan(v)) copy[key] = withoutSpans(v);
  }
  return copy;
}

export function sameStatements(a: readonly Statement[], b: readonly Statement[]): boolean {
  return JSON.stringify(withoutSpans(a)) === JSON.stringify(withoutSpans(b));
}
