/**
 * Carrying the last evaluation through the edits made since it ran.
 *
 * In the default "evaluate on save" mode the document changes many times
 * between two evaluations. Rather than letting hovers, code lenses and claim
 * diagnostics vanish at the first keystroke, the server keeps the last
 * evaluation and moves its spans along with each edit. The rule is strict so
 * that a carried item always points at text that still reads the same:
 *
 * - an edit wholly before a span shifts it; an edit wholly after leaves it;
 * - an edit that overlaps the inside of a span drops the item;
 * - an edit that only touches an edge of a span keeps it only when, after the
 *   edit, the character on that side is whitespace or the end of the text
 *   (typing `x` right before `L` makes a new name `xL`, so `L`'s item goes;
 *   pressing Enter after a statement keeps it).
 *
 * Carried items describe the text as it was when it was last evaluated; the
 * next evaluation (on save) replaces them all.
 */
import type { Analysis, NameUse, Problem, RelatedSpan, Result, Span } from '../language/index.js';

/** One replacement: the old text's [start, end) became `insertedLength` new characters. */
export interface Edit {
  start: number;
  end: number;
  insertedLength: number;
}

/** The single edit that turns `oldText` into `newText` (common prefix and suffix kept). */
export function editBetween(oldText: string, newText: string): Edit {
  const shorter = Math.min(oldText.length, newText.length);
  let prefix = 0;
  while (prefix < shorter && oldText.charCodeAt(prefix) === newText.charCodeAt(prefix)) prefix++;
  let suffix = 0;
  while (
    suffix < shorter - prefix &&
    oldText.charCodeAt(oldText.length - 1 - suffix) === newText.charCodeAt(newText.length - 1 - suffix)
  ) {
    suffix++;
  }
  return { start: prefix, end: oldText.length - suffix, insertedLength: newText.length - suffix - prefix };
}

/** Applies `edit` to `oldText`, given the inserted text. */
export function applyEdit(oldText: string, edit: Edit, inserted: string): string {
  return oldText.slice(0, edit.start) + inserted + oldText.slice(edit.end);
}

function isSeparatedAt(text: string, index: number): boolean {
  // Index -1 or text.length: the span reaches an end of the text.
  if (index < 0 || index >= text.length) return true;
  return /\s/.test(text[index]!);
}

/**
 * Where `span` lies in `newText` after `edit`, or `undefined` when the edit
 * changed the span's own text or what it is glued to (see the module comment).
 */
export function carrySpan(span: Span, edit: Edit, newText: string): Span | undefined {
  const delta = edit.insertedLength - (edit.end - edit.start);
  if (edit.start > span.end) return span;
  if (edit.end < span.start) return { start: span.start + delta, end: span.end + delta };
  if (edit.start < span.end && edit.end > span.start) return undefined;
  // The edit only touches an edge. It ends at the span's start, or begins at its end (or both, for an
  // empty span), and the span's own characters are unchanged.
  const before = edit.end <= span.start;
  const moved = before ? { start: span.start + delta, end: span.end + delta } : span;
  if (before && !isSeparatedAt(newText, moved.start - 1)) return undefined;
  if (edit.start >= span.end && !isSeparatedAt(newText, moved.end)) return undefined;
  return moved;
}

function carryRelated(related: RelatedSpan[] | undefined, edit: Edit, newText: string): RelatedSpan[] | undefined {
  if (!related) return undefined;
  const kept: RelatedSpan[] = [];
  for (const r of related) {
    const span = carrySpan(r.span, edit, newText);
    if (span) kept.push({ ...r, span });
  }
  return kept;
}

function carryProblem(problem: Problem, edit: Edit, newText: string): Problem | undefined {
  const span = carrySpan(problem.span, edit, newText);
  if (!span) return undefined;
  const related = carryRelated(problem.related, edit, newText);
  return related ? { ...problem, span, related } : { ...problem, span };
}

function carryResult(result: Result, edit: Edit, newText: string): Result | undefined {
  const span = carrySpan(result.span, edit, newText);
  const anchor = carrySpan(result.anchor, edit, newText);
  if (!span || !anchor) return undefined;
  return { ...result, span, anchor };
}

/**
 * The analysis with every span moved into `newText`; items whose text the
 * edit changed are left out. The result's `text` is `newText`, so its spans
 * index into its own text as everywhere else.
 */
export function carryAnalysis(analysis: Analysis, edit: Edit, newText: string): Analysis {
  const problems: Problem[] = [];
  for (const p of analysis.problems) {
    const carried = carryProblem(p, edit, newText);
    if (carried) problems.push(carried);
  }
  const results: Result[] = [];
  for (const r of analysis.results) {
    const carried = carryResult(r, edit, newText);
    if (carried) results.push(carried);
  }
  const references: NameUse[] = [];
  for (const use of analysis.references) {
    const span = carrySpan(use.span, edit, newText);
    if (span) references.push({ ...use, span });
  }
  // The syntax facts (tree, symbols, uses) are not moved along: they describe the evaluated text only.
  const { syntax: _notCarried, ...rest } = analysis;
  return { ...rest, text: newText, problems, results, references };
}
