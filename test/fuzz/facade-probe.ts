/**
 * Runs every feature of the language facade on one document and checks the
 * two promises the facade makes on any text: nothing throws (and no internal
 * failure is reported as a problem), and every span it hands out lies inside
 * the document.
 */
import {
  actionsAt,
  analyze,
  completionsAt,
  definitionAt,
  documentSymbols,
  exportLatex,
  foldingRanges,
  formatDocument,
  formatText,
  hoverAt,
  lensesFor,
  prepareRenameAt,
  referencesAt,
  renameAt,
  semanticTokens,
  signatureHelpAt,
  type Analysis,
  type AnalyzeOptions,
} from '../../server/src/language/index.js';
import { SeededRandom } from './seeded-random.js';

export interface ProbeOutcome {
  /** Exceptions that escaped a feature, and internal failures reported as problems. */
  crashes: string[];
  /** Spans outside the document, with where they were found. */
  badRanges: string[];
  /** Span ends that fall between the two halves of a surrogate pair (valid offsets, odd for an editor). */
  splitSurrogates: number;
  /** Time spent on this input, all features together. */
  ms: number;
}

/** Codes of problems that report a defect of ours caught by a last-resort handler. */
const INTERNAL_CODES = new Set(['internal/error', 'syntax/internal']);

/** The settings combinations the inputs are analyzed under, in turn. */
const OPTION_SETS: AnalyzeOptions[] = [
  { evaluate: true },
  { evaluate: true, normalization: 'raw', order: 'colex', firstLabel: 0, layout: 'columns' },
  { evaluate: true, normalization: 'positive', limits: { maxCoordinates: 10, maxDimension: 5 } },
  { evaluate: true, normalization: 'first-one', order: 'lex', firstLabel: 1, layout: 'rows' },
];

/**
 * Where an offset falls when the text is cut into lines at \r\n, \n and \r (as
 * editors and LSP count lines): a valid position has its character within the
 * line's length. An offset between \r and \n falls inside a line break.
 */
function insideLineBreak(text: string, offset: number): boolean {
  return offset > 0 && offset < text.length && text[offset - 1] === '\r' && text[offset] === '\n';
}

function splitsSurrogatePair(text: string, offset: number): boolean {
  if (offset <= 0 || offset >= text.length) return false;
  const before = text.charCodeAt(offset - 1);
  const after = text.charCodeAt(offset);
  return before >= 0xd800 && before <= 0xdbff && after >= 0xdc00 && after <= 0xdfff;
}

function isSpanLike(value: object): value is { start: unknown; end: unknown } {
  const keys = Object.keys(value);
  return keys.length === 2 && keys.includes('start') && keys.includes('end');
}

/** Keys whose values hold no document offsets (exact results, rendered text), skipped by the span walk. */
const SKIPPED_KEYS = new Set(['json', 'hover', 'latex', 'markdown', 'text', 'summary', 'message', 'title']);

class RangeChecker {
  readonly bad: string[] = [];
  splitSurrogates = 0;

  constructor(private readonly text: string) {}

  /** Checks every {start, end} object inside `value`, walking iteratively (trees may be deep). */
  check(where: string, value: unknown): void {
    const stack: unknown[] = [value];
    while (stack.length > 0) {
      const item = stack.pop();
      if (typeof item !== 'object' || item === null) continue;
      if (Array.isArray(item)) {
        for (const x of item) stack.push(x);
        continue;
      }
      if (isSpanLike(item)) {
        this.span(where, item.start, item.end);
        continue;
      }
      for (const [key, x] of Object.entries(item)) if (!SKIPPED_KEYS.has(key)) stack.push(x);
    }
  }

  private span(where: string, start: unknown, end: unknown): void {
    const length = this.text.length;
    const ok =
      Number.isInteger(start) &&
      Number.isInteger(end) &&
      (start as number) >= 0 &&
      (start as number) <= (end as number) &&
      (end as number) <= length;
    if (!ok) {
      this.bad.push(`${where}: span ${String(start)}–${String(end)} in a text of length ${length}`);
      return;
    }
    for (const offset of [start as number, end as number]) {
      if (insideLineBreak(this.text, offset)) this.bad.push(`${where}: offset ${offset} lies between \\r and \\n`);
      if (splitsSurrogatePair(this.text, offset)) this.splitSurrogates++;
    }
  }
}

/**
 * Offsets worth asking at: both ends, problem starts, and random places. An
 * editor sends only positions between characters, so an offset between \r and
 * \n (or between the halves of a surrogate pair) is moved one unit back: the
 * features echo the cursor in the spans they return.
 */
function probeOffsets(analysis: Analysis, count: number, random: SeededRandom): number[] {
  const text = analysis.text;
  const valid = (offset: number) => (insideLineBreak(text, offset) || splitsSurrogatePair(text, offset) ? offset - 1 : offset);
  const offsets = new Set<number>([0, text.length]);
  for (const p of analysis.problems.slice(0, 2)) offsets.add(valid(Math.min(text.length, Math.max(0, p.span.start))));
  for (let tries = 0; offsets.size < count + 2 && tries < 4 * count; tries++) offsets.add(valid(random.below(text.length + 1)));
  return [...offsets];
}

export function probeFacade(text: string, inputIndex: number, offsetsPerInput: number): ProbeOutcome {
  const random = new SeededRandom(inputIndex * 7919 + 1);
  const crashes: string[] = [];
  const ranges = new RangeChecker(text);
  const attempt = <R>(feature: string, run: () => R): R | undefined => {
    try {
      const result = run();
      ranges.check(feature, result);
      return result;
    } catch (error) {
      crashes.push(`${feature} threw ${error instanceof Error ? `${error.name}: ${error.message}` : String(error)}`);
      return undefined;
    }
  };

  const started = performance.now();
  const options = OPTION_SETS[inputIndex % OPTION_SETS.length]!;
  const quick = attempt('analyze (no evaluation)', () => analyze(text, { ...options, evaluate: false }));
  const full = attempt('analyze', () => analyze(text, options));
  for (const analysis of [quick, full]) {
    if (!analysis) continue;
    for (const p of analysis.problems) {
      if (INTERNAL_CODES.has(p.code)) crashes.push(`problem ${p.code} at ${p.span.start}–${p.span.end}: ${p.message.slice(0, 200)}`);
    }
  }
  if (full) {
    attempt('lensesFor', () => lensesFor(full));
    attempt('documentSymbols', () => documentSymbols(full));
    attempt('semanticTokens', () => semanticTokens(full));
    attempt('foldingRanges', () => foldingRanges(full));
    attempt('formatDocument', () => formatDocument(full));
    attempt('exportLatex', () => exportLatex(full, 'fuzz.wedge'));
    for (const offset of probeOffsets(full, offsetsPerInput, random)) {
      attempt(`hoverAt ${offset}`, () => hoverAt(full, offset));
      attempt(`completionsAt ${offset}`, () => completionsAt(full, offset));
      attempt(`completionsAt ${offset} after a space`, () => completionsAt(full, offset, { afterSpace: true }));
      attempt(`signatureHelpAt ${offset}`, () => signatureHelpAt(full, offset));
      attempt(`definitionAt ${offset}`, () => definitionAt(full, offset));
      attempt(`referencesAt ${offset}`, () => referencesAt(full, offset, true));
      attempt(`actionsAt ${offset}`, () => actionsAt(full, { start: offset, end: Math.min(text.length, offset + random.below(20)) }));
      const prepared = attempt(`prepareRenameAt ${offset}`, () => prepareRenameAt(full, offset));
      if (prepared && 'span' in prepared) attempt(`renameAt ${offset}`, () => renameAt(full, offset, 'renamed'));
    }
  }
  if (quick) attempt('completionsAt end (no evaluation)', () => completionsAt(quick, text.length));
  attempt('formatText', () => formatText(text));
  return { crashes, badRanges: ranges.bad, splitSurrogates: ranges.splitSurrogates, ms: performance.now() - started };
}
