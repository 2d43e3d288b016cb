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
 *   text is edited. An evaluation that stopped before its end (time limit,
 *   cancelled, failed) adds its one problem, carried the same way, until the
 *   next evaluation ends.
 *
 * Evaluations run on worker threads (./evaluation-scheduler.ts) and may end
 * after the user has typed on. So while any evaluation is in flight the
 * store logs the edits made since, and a late analysis is carried through
 * them before it is recorded: its spans always index the current text.
 */
import { TextDocument } from 'vscode-languageserver-textdocument';
import type { TextDocumentContentChangeEvent } from 'vscode-languageserver';
import type { Analysis, Problem } from '../language/index.js';
import { applyEdit, carryAnalysis, carrySpan, editBetween, type Edit } from './carry.js';

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
  /** Why the last evaluation did not finish, if it did not (span aligned with the current text). */
  stopped?: { version: number; problem: Problem };
  /** Versions whose evaluation has begun and not yet been recorded or abandoned. */
  inFlight: number[];
  /** The edits made since the oldest version in flight, each tagged with the version it produced. */
  editLog: LoggedEdit[];
}

interface LoggedEdit {
  version: number;
  edit: Edit;
  inserted: string;
}

/** Handed out when an evaluation of a document begins; given back when its outcome is recorded. */
export interface EvaluationTicket {
  version: number;
}

export function isQuickPassProblem(problem: Problem): boolean {
  return QUICK_PASS_BANDS.some((band) => problem.code.startsWith(band));
}

/** Whether the last evaluation finished (did not stop early) and was made of exactly the current text. */
export function evaluationIsCurrent(entry: OpenDocument): boolean {
  return entry.evaluation !== undefined && entry.evaluation.version === entry.document.version && !entry.stopped;
}

/** The problems to publish for the current version (rule in the module comment). */
export function problemsToShow(entry: OpenDocument): Problem[] {
  if (evaluationIsCurrent(entry)) return entry.evaluation!.analysis.problems;
  const fresh = entry.quick?.version === entry.document.version ? entry.quick.analysis.problems : [];
  const carried = entry.evaluation?.analysis.problems.filter((p) => !isQuickPassProblem(p)) ?? [];
  const stopped = entry.stopped ? [entry.stopped.problem] : [];
  return [...fresh, ...carried, ...stopped];
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
    const entry: OpenDocument = { document: TextDocument.create(uri, languageId, version, text), inFlight: [], editLog: [] };
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
      if (entry.stopped) entry.stopped = carryStopped(entry.stopped, edit, newText);
      if (entry.inFlight.length > 0) entry.editLog.push({ version, edit, inserted });
      entry.document = TextDocument.update(entry.document, [change], version);
    }
    // The version is set even for an empty change list, so stale analyses are recognised.
    if (changes.length === 0) entry.document = TextDocument.update(entry.document, [], version);
    return entry;
  }

  recordQuick(entry: OpenDocument, analysis: Analysis): void {
    entry.quick = { version: entry.document.version, analysis };
  }

  /** An evaluation of the current version begins; its outcome is recorded (or abandoned) with the ticket. */
  beginEvaluation(entry: OpenDocument): EvaluationTicket {
    const version = entry.document.version;
    entry.inFlight.push(version);
    return { version };
  }

  /**
   * The analysis of the version `ticket` stands for (the current version without a ticket), carried
   * through the edits made since. An analysis older than the one already recorded is ignored.
   */
  recordEvaluation(entry: OpenDocument, analysis: Analysis, ticket?: EvaluationTicket): void {
    const version = ticket?.version ?? entry.document.version;
    if (ticket) this.abandonEvaluation(entry, ticket, false);
    if (this.isOutdated(entry, version)) return this.trimLog(entry);
    entry.evaluation = { version, analysis: this.carryFrom(entry, version, analysis) };
    entry.stopped = undefined;
    if (version === entry.document.version) entry.quick = undefined;
    this.trimLog(entry);
  }

  /** The evaluation of `ticket`'s version ended early; `problem` (in that version's text) says why. */
  recordStopped(entry: OpenDocument, text: string, problem: Problem, ticket: EvaluationTicket): void {
    this.abandonEvaluation(entry, ticket, false);
    if (!this.isOutdated(entry, ticket.version)) {
      const carried = this.carryFrom(entry, ticket.version, { text, problems: [problem], results: [], references: [], evaluated: false });
      const [kept] = carried.problems;
      entry.stopped = kept ? { version: ticket.version, problem: kept } : undefined;
    }
    this.trimLog(entry);
  }

  /** The evaluation of `ticket`'s version was replaced or cancelled: nothing is recorded. */
  abandonEvaluation(entry: OpenDocument, ticket: EvaluationTicket, trim = true): void {
    const at = entry.inFlight.indexOf(ticket.version);
    if (at >= 0) entry.inFlight.splice(at, 1);
    if (trim) this.trimLog(entry);
  }

  /** Whether an outcome for `version` is older than what is already recorded. */
  private isOutdated(entry: OpenDocument, version: number): boolean {
    const latest = Math.max(entry.evaluation?.version ?? -Infinity, entry.stopped?.version ?? -Infinity);
    return version < latest;
  }

  /** `analysis` (of `version`'s text) carried through every logged edit made after `version`. */
  private carryFrom(entry: OpenDocument, version: number, analysis: Analysis): Analysis {
    let carried = analysis;
    for (const logged of entry.editLog) {
      if (logged.version <= version) continue;
      carried = carryAnalysis(carried, logged.edit, applyEdit(carried.text, logged.edit, logged.inserted));
    }
    return carried;
  }

  /** Keeps only the edits some evaluation still in flight may need. */
  private trimLog(entry: OpenDocument): void {
    if (entry.inFlight.length === 0) {
      entry.editLog = [];
      return;
    }
    const oldest = Math.min(...entry.inFlight);
    entry.editLog = entry.editLog.filter((logged) => logged.version > oldest);
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

function carryStopped(stopped: { version: number; problem: Problem }, edit: Edit, newText: string) {
  const span = carrySpan(stopped.problem.span, edit, newText);
  return span ? { version: stopped.version, problem: { ...stopped.problem, span } } : undefined;
}
