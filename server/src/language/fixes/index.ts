/**
 * The edits an editor may offer at a place in a document: the fixes its
 * problems carry (made where each problem is found), a rewrite of a basis as
 * its reduced basis, and a `show` line for a declaration. Nothing here
 * changes a file: the editor shows the actions and the user applies one.
 */
import type { Analysis, EditAction, Span, TextEdit } from '../types.js';
import { reducedBasisActions } from './reduced-basis.js';
import { showLineAction } from './show-line.js';

export interface ActionOptions {
  /**
   * Whether the problems' own fixes may be offered. Their edits index the text
   * the analysis was made of; an editor showing an analysis carried through
   * later edits passes `false`.
   */
  problemFixes?: boolean;
}

function touches(a: Span, b: Span): boolean {
  return a.start <= b.end && b.start <= a.end;
}

/** Every action for the text in `range` (a cursor is an empty range), fixes first. */
export function actionsAt(analysis: Analysis, range: Span, options: ActionOptions = {}): EditAction[] {
  const actions: EditAction[] = [];
  if (options.problemFixes !== false) {
    for (const problem of analysis.problems) {
      if (!problem.fixes || !touches(problem.span, range)) continue;
      for (const fix of problem.fixes) {
        actions.push({ title: fix.title, kind: 'fix', edits: fix.edits, ...(fix.preferred ? { preferred: true } : {}), problem });
      }
    }
  }
  actions.push(...reducedBasisActions(analysis, range));
  for (const result of analysis.results) {
    if (!touches(result.anchor, range)) continue;
    const show = showLineAction(analysis.text, result);
    if (show) actions.push(show);
  }
  return actions;
}

/** The text after the edits (which must not overlap); spans index the text before them. */
export function applyEdits(text: string, edits: readonly TextEdit[]): string {
  const sorted = [...edits].sort((a, b) => b.span.start - a.span.start || b.span.end - a.span.end);
  let out = text;
  let limit = Infinity;
  for (const edit of sorted) {
    if (edit.span.end > limit || edit.span.start > edit.span.end) throw new RangeError('applyEdits: the edits overlap');
    out = out.slice(0, edit.span.start) + edit.newText + out.slice(edit.span.end);
    limit = edit.span.start;
  }
  return out;
}
