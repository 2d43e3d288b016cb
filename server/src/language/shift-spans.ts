/**
 * Moving syntax trees, problems and results to another place in the text.
 *
 * The incremental passes (./piece-memo.ts, ./statement-memo.ts) keep what
 * they computed for a piece of text with offsets relative to where the piece
 * began, and hand it out again wherever the same piece appears later. Every
 * offset in these plain-data structures sits in a span, an object with
 * exactly the number fields `start` and `end` (see `Span` in ./types.ts), so
 * one generic copy finds them all without knowing each node's shape.
 */
import type { Span } from './types.js';

function isSpan(value: object): value is Span {
  const keys = Object.keys(value);
  return (
    keys.length === 2 &&
    typeof (value as Span).start === 'number' &&
    typeof (value as Span).end === 'number'
  );
}

/**
 * A deep copy of `value` (plain objects, arrays and primitives) with every
 * span moved by `delta`, or, with `map`, with every span's ends mapped
 * through it. Objects with a prototype other than Object's are shared, not
 * copied: they hold no spans (engine values, fields).
 */
export function shiftSpans<T>(value: T, delta: number): T {
  return delta === 0 ? copyPlain(value, undefined) : copyPlain(value, (offset) => offset + delta);
}

/** Like `shiftSpans`, with each offset mapped through `map`; `undefined` from `map` fails the copy. */
export function mapSpans<T>(value: T, map: (offset: number) => number | undefined): T | undefined {
  try {
    return copyPlain(value, (offset) => {
      const mapped = map(offset);
      if (mapped === undefined) throw UNMAPPED;
      return mapped;
    });
  } catch (error) {
    if (error === UNMAPPED) return undefined;
    throw error;
  }
}

const UNMAPPED = Symbol('an offset outside every mapped region');

function copyPlain<T>(value: T, move: ((offset: number) => number) | undefined): T {
  if (typeof value !== 'object' || value === null) return value;
  if (Array.isArray(value)) return value.map((item) => copyPlain(item, move)) as T;
  const prototype = Object.getPrototypeOf(value);
  if (prototype !== Object.prototype && prototype !== null) return value;
  if (isSpan(value)) {
    return (move ? { start: move(value.start), end: move(value.end) } : { start: value.start, end: value.end }) as T;
  }
  const copy: Record<string, unknown> = {};
  for (const [key, item] of Object.entries(value)) copy[key] = copyPlain(item, move);
  return copy as T;
}
