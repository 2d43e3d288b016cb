/**
 * The open documents and, per document, the last analyses made of it.
 *
 * Two analyses are kept per URI, each tagged with the document version it
 * describes:
 * - `quick`: the cheap pass (`evaluate: false`: syntax and name problems) of
 *   the current text, run while the user types;
 * - `evaluation`: the last full evaluation. After later edits its spans are
 *   carried along (see ./carry.ts) so hovers and lenses stay in place.
 *
 * Which problems are shown (`problemsToShow`) — the rule, chosen to be simple
 * and never show a problem at a wrong place:
 * - if the evaluation describes the current version, exactly its problems;
 * - otherwise the quick pass's problems for the current version (fresh syntax
 *   and name problems), plus the carried evaluation's problems from the other
 *   bands (type/, math/, claim/, limit/) — those the quick pass cannot find —
 *   that survived the edits. A claim that failed at the last save thus stays
 *   marked while the user types elsewhere, and vanishes as soon as its own
 *   text is edited.
 */
import { TextDocument } from 'vscode-languageserver-textdocument';
import type { TextDocumentContentChangeEvent } from 'vscode-languageserver';
import type { Analysis, Problem } from '../language/index.js';
import { applyEdit, carryAnalysis, editBetween, type Edit } from './carry.js';

/** Problem-code bands the quick pass reports itself (so carried copies would be stale duplicates). */
const QUICK_PASS_BANDS = ['syntax/', 'name/'];

export interface VersionedAnalysis {
  /** The document version the analysis describes (for `evaluation`: the version it was made of). */
  version: number;
  analysis: Analysis;
}

export interface OpenDocument {
  document: TextDocument;
  quick?: VersionedAnalysis;
  /** Spans aligned with the current text; `version` is the version that was evaluated. */
  evaluation?: VersionedAnalysis;
}

export function isQuickPassProblem(problem: Problem): boolean {
  return QUICK_PASS_BANDS.some((band) => problem.code.startsWith(band));
}

/** Whether the last evaluation was made of exactly the current text. */
export function evaluationIsCurrent(entry: OpenDocument): boolean {
  return entry.evaluation !== undefined && entry.evaluation.version === entry.document.version;
}

/** The problems to publish for the current version (rule in the module comment). */
export function problemsToShow(entry: OpenDocument): Problem[] {
  if (evaluationIsCurrent(entry)) return entry.evaluation!.analysis.problems;
  const fresh = entry.quick?.version === entry.document.version ? entry.quick.analysis.problems : [];
  const carried = entry.evaluation?.analysis.problems.filter((p) => !isQuickPassProblem(p)) ?? [];
  return [...fresh, ...carried];
}

/** The analysis that answers hovers and code lenses: the (carried) evaluation if any. */
export function analysisForQueries(entry: OpenDocument): Analysis | undefined {
  if (entry.evaluation) return entry.evaluation.analysis;
  if (entry.quick?.version === entry.document.version) return entry.quick.analysis;
  return undefined;
}

function editOf(document: TextDocument, oldText: string, change: TextDocumentContentChangeEvent): {
  edit: Edit;
  inserted: string;
} {
  if ('range' in change && change.range) {
    const start = document.offsetAt(change.range.start);
    const end = Math.max(start, document.offsetAt(change.range.end));
    return { edit: { start, end, insertedLength: change.text.length }, inserted: change.text };
  }
  const edit = editBetween(oldText, change.text);
  return { edit, inserted: change.text.slice(edit.start, edit.start + edit.insertedLength) };
}

export class DocumentStore {
  private readonly entries = new Map<string, OpenDocument>();

  open(uri: string, languageId: string, version: number, text: string): OpenDocument {
    const entry: OpenDocument = { document: TextDocument.create(uri, languageId, version, text) };
    this.entries.set(uri, entry);
    return entry;
  }

  /** Applies the client's changes in order, carrying the last evaluation through each. */
  change(uri: string, version: number, changes: TextDocumentContentChangeEvent[]): OpenDocument | undefined {
    const entry = this.entries.get(uri);
    if (!entry) return undefined;
    for (const change of changes) {
      const oldText = entry.document.getText();
      const { edit, inserted } = editOf(entry.document, oldText, change);
      const newText = applyEdit(oldText, edit, inserted);
      if (entry.evaluation) {
        entry.evaluation = {
          version: entry.evaluation.version,
          analysis: carryAnalysis(entry.evaluation.analysis, edit, newText),
        };
      }
      entry.document = TextDocument.update(entry.document, [change], version);
    }
    // The version is set even for an empty change list, so stale analyses are recognised.
    if (changes.length === 0) entry.document = TextDocument.update(entry.document, [], version);
    return entry;
  }

  recordQuick(entry: OpenDocument, analysis: Analysis): void {
    entry.quick = { version: entry.document.version, analysis };
  }

  recordEvaluation(entry: OpenDocument, analysis: Analysis): void {
    entry.evaluation = { version: entry.document.version, analysis };
    entry.quick = undefined;
  }

  close(uri: string): boolean {
    return this.entries.delete(uri);
  }

  get(uri: string): OpenDocument | undefined {
    return this.entries.get(uri);
  }

  uris(): string[] {
    return [...this.entries.keys()];
  }
}
