/**
 * What the parser made of each statement's text, remembered between parses.
 *
 * A keystroke changes one statement; the other pieces of the token stream
 * (see ./parse.ts: the stream is cut before every statement keyword and each
 * piece is parsed alone) are the same text as before, at most moved. Their
 * statements, dropped statements and problems are kept here with offsets
 * relative to the piece's start and handed out again, moved to the piece's
 * new place (./shift-spans.ts), instead of parsing the piece again.
 *
 * A piece's parse depends only on its text from its keyword up to the next
 * statement keyword, and on that keyword (the parser may name it in a message
 * about a statement cut short), which together form the key. The memo holds
 * at most `capacity` pieces, forgetting the least recently used.
 */
import type { DroppedStatement, Statement } from './ast.js';
import { shiftSpans } from './shift-spans.js';
import type { Problem } from './types.js';

export interface PieceParse {
  statements: Statement[];
  dropped: DroppedStatement[];
  problems: Problem[];
}

/** Enough for every statement of several large documents open at once. */
const DEFAULT_CAPACITY = 50_000;

export class PieceMemo {
  private readonly entries = new Map<string, PieceParse>();

  constructor(private readonly capacity = DEFAULT_CAPACITY) {}

  static key(pieceText: string, followingKeyword: string | undefined): string {
    return `${followingKeyword ?? ''}\u0000${pieceText}`;
  }

  /** The parse of the piece with this key, moved to begin at `start`, if remembered. */
  recall(key: string, start: number): PieceParse | undefined {
    const kept = this.entries.get(key);
    if (!kept) return undefined;
    // Refresh its place in the recency order.
    this.entries.delete(key);
    this.entries.set(key, kept);
    return shiftSpans(kept, start);
  }

  /** Remembers the parse of a piece that begins at `start` (its spans are absolute). */
  remember(key: string, start: number, parse: PieceParse): void {
    this.entries.delete(key);
    this.entries.set(key, shiftSpans(parse, -start));
    while (this.entries.size > this.capacity) {
      const oldest = this.entries.keys().next().value as string;
      this.entries.delete(oldest);
    }
  }

  get size(): number {
    return this.entries.size;
  }

  clear(): void {
    this.entries.clear();
  }
}
