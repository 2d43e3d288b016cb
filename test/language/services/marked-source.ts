/**
 * Test inputs for the editor features, written as one string with markers:
 * `|` is the cursor and `⟦…⟧` marks spans the test expects (the language uses
 * none of these characters). The markers are removed before analysis, so they
 * do not shift the offsets of the text under test.
 */
import { analyze, type Analysis, type Span } from '../../../server/src/language/index.js';
import { dedent } from '../annotated-source.js';

export interface MarkedSource {
  text: string;
  /** The offset of `|`, or -1 when there is none. */
  cursor: number;
  /** The spans between `⟦` and `⟧`, in source order. */
  marked: Span[];
}

export function readMarked(source: string): MarkedSource {
  let text = '';
  let cursor = -1;
  const marked: Span[] = [];
  let open: number | undefined;
  for (const ch of source) {
    if (ch === '|') cursor = text.length;
    else if (ch === '⟦') open = text.length;
    else if (ch === '⟧') {
      if (open === undefined) throw new Error(`'⟧' without '⟦' in ${source}`);
      marked.push({ start: open, end: text.length });
      open = undefined;
    } else text += ch;
  }
  return { text, cursor, marked };
}

/** The marked source, dedented, with its quick analysis (`evaluate: false`, as while typing). */
export function analyzeMarked(source: string, firstLabel?: 0 | 1): MarkedSource & { analysis: Analysis } {
  const marked = readMarked(dedent(source));
  return { ...marked, analysis: analyze(marked.text, { evaluate: false, ...(firstLabel !== undefined ? { firstLabel } : {}) }) };
}

/** The text a span covers, for readable failure messages. */
export function textOf(text: string, span: Span): string {
  return text.slice(span.start, span.end);
}

/** Applies non-overlapping edits to a text. */
export function applyTextEdits(text: string, edits: readonly { span: Span; newText: string }[]): string {
  let result = text;
  for (const e of [...edits].sort((a, b) => b.span.start - a.span.start)) {
    result = result.slice(0, e.span.start) + e.newText + result.slice(e.span.end);
  }
  return result;
}
