/**
 * The edits that turn one text into another, line by line: the lines both
 * share (a longest common subsequence) stay untouched and each run of changed
 * lines becomes one edit. An editor then keeps the cursor, the selection and
 * the markers of every line the edit does not touch.
 */
import type { TextEdit } from '../types.js';

interface Line {
  /** The line with its line break, if it has one. */
  text: string;
  start: number;
}

function linesOf(text: string): Line[] {
  const lines: Line[] = [];
  const pattern = /[^\r\n]*(\r\n|\r|\n)|[^\r\n]+$/gy;
  let match: RegExpExecArray | null;
  while (pattern.lastIndex < text.length && (match = pattern.exec(text)) !== null) {
    lines.push({ text: match[0], start: match.index });
  }
  return lines;
}

/** Beyond this many cells the middle is replaced by one edit rather than diffed (the result is still exact). */
const MAX_TABLE_CELLS = 4_000_000;

export function lineEdits(oldText: string, newText: string): TextEdit[] {
  if (oldText === newText) return [];
  const a = linesOf(oldText);
  const b = linesOf(newText);
  let prefix = 0;
  while (prefix < a.length && prefix < b.length && a[prefix]!.text === b[prefix]!.text) prefix++;
  let suffix = 0;
  while (
    suffix < a.length - prefix &&
    suffix < b.length - prefix &&
    a[a.length - 1 - suffix]!.text === b[b.length - 1 - suffix]!.text
  ) {
    suffix++;
  }
  const n = a.length - prefix - suffix;
  const m = b.length - prefix - suffix;
  const offsetOfLine = (i: number) => (i < a.length ? a[i]!.start : oldText.length);
  const edit = (a0: number, a1: number, b0: number, b1: number): TextEdit => ({
    span: { start: offsetOfLine(a0), end: offsetOfLine(a1) },
    newText: b.slice(b0, b1).map((l) => l.text).join(''),
  });
  if ((n + 1) * (m + 1) > MAX_TABLE_CELLS) return [edit(prefix, prefix + n, prefix, prefix + m)];
  // lcs[i][j]: the longest common subsequence of the middle's lines i.. of a and j.. of b.
  const width = m + 1;
  const lcs = new Uint32Array((n + 1) * width);
  for (let i = n - 1; i >= 0; i--) {
    for (let j = m - 1; j >= 0; j--) {
      lcs[i * width + j] =
        a[prefix + i]!.text === b[prefix + j]!.text
          ? lcs[(i + 1) * width + j + 1]! + 1
          : Math.max(lcs[(i + 1) * width + j]!, lcs[i * width + j + 1]!);
    }
  }
  const edits: TextEdit[] = [];
  let i = 0;
  let j = 0;
  let runA = -1;
  let runB = -1;
  const close = () => {
    if (runA >= 0) edits.push(edit(prefix + runA, prefix + i, prefix + runB, prefix + j));
    runA = -1;
  };
  while (i < n || j < m) {
    if (i < n && j < m && a[prefix + i]!.text === b[prefix + j]!.text) {
      close();
      i++;
      j++;
      continue;
    }
    if (runA < 0) {
      runA = i;
      runB = j;
    }
    if (j < m && (i === n || lcs[i * width + j + 1]! >= lcs[(i + 1) * width + j]!)) j++;
    else i++;
  }
  close();
  return edits;
}
