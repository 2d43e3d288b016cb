/**
 * Removing items from a list as the user wrote it — the arguments of
 * `span(…)`, the rows of a matrix, the entries of a row — so that the items
 * left keep their own text and the separators between them:
 * `span(a, b, c)` without c is `span(a, b)`; without a it is `span(b, c)`.
 */
import type { Span, TextEdit } from '../types.js';

/**
 * The deletions that remove the items at the positions in `drop`. A run of
 * dropped items goes with the separator before it (after it, for a run at the
 * start), so no comma, semicolon or line break is left dangling. Undefined
 * when nothing or everything would be dropped, or when a comment lies in the
 * text that would go: a fix never deletes the user's comments.
 */
export function dropItems(source: string, items: readonly Span[], drop: ReadonlySet<number>): TextEdit[] | undefined {
  const dropped = [...drop].filter((i) => i >= 0 && i < items.length);
  if (dropped.length === 0 || dropped.length >= items.length) return undefined;
  const edits: TextEdit[] = [];
  let i = 0;
  while (i < items.length) {
    if (!drop.has(i)) {
      i++;
      continue;
    }
    let j = i;
    while (j + 1 < items.length && drop.has(j + 1)) j++;
    const span = i > 0 ? { start: items[i - 1]!.end, end: items[j]!.end } : { start: items[0]!.start, end: items[j + 1]!.start };
    if (source.slice(span.start, span.end).includes('#')) return undefined;
    edits.push({ span, newText: '' });
    i = j + 1;
  }
  return edits;
}
