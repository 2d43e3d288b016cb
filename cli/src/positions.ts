/**
 * Offsets (UTF-16, as the language layer reports them) to the 1-based line
 * and column people and editors expect on a command line.
 *
 * Lines end at `\n`, `\r\n` or a lone `\r`, as in LSP. Columns count Unicode
 * code points, so `η` or an astral-plane letter is one column wide, whatever
 * its length in UTF-16.
 */

export interface LineColumn {
  /** 1-based line number. */
  line: number;
  /** 1-based column, in code points. */
  column: number;
}

export class LineIndex {
  /** Offset at which each line starts; lineStarts[0] is 0. */
  private readonly lineStarts: number[] = [0];

  constructor(private readonly text: string) {
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      if (c === 0x0d /* \r */) {
        if (text.charCodeAt(i + 1) === 0x0a) i++;
        this.lineStarts.push(i + 1);
      } else if (c === 0x0a /* \n */) {
        this.lineStarts.push(i + 1);
      }
    }
  }

  /** The position of `offset`; offsets outside the text (or not numbers) are taken as its nearest end. */
  position(offset: number): LineColumn {
    const length = this.text.length;
    const at = Number.isFinite(offset) ? Math.min(Math.max(Math.trunc(offset), 0), length) : length;
    // The last line start that is <= at (binary search).
    let low = 0;
    let high = this.lineStarts.length - 1;
    while (low < high) {
      const middle = (low + high + 1) >> 1;
      if (this.lineStarts[middle]! <= at) low = middle;
      else high = middle - 1;
    }
    const lineStart = this.lineStarts[low]!;
    return { line: low + 1, column: countCodePoints(this.text, lineStart, at) + 1 };
  }
}

function countCodePoints(text: string, from: number, to: number): number {
  let count = 0;
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i);
    // A high surrogate followed by a low one is a single code point.
    if (c >= 0xd800 && c <= 0xdbff && i + 1 < to) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) i++;
    }
    count++;
  }
  return count;
}
