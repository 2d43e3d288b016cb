/**
 * The one place where the language layer's data becomes LSP data: spans
 * (UTF-16 offsets) become ranges (line and UTF-16 character, as LSP counts
 * them by default), problems become diagnostics, hovers become markup and
 * lenses become code lenses running the client's copy-as-LaTeX command.
 */
import type { TextDocument } from 'vscode-languageserver-textdocument';
import {
  DiagnosticSeverity,
  MarkupKind,
  type CodeLens,
  type Diagnostic,
  type DiagnosticRelatedInformation,
  type Hover as LspHover,
  type Range,
} from 'vscode-languageserver';
import type { Hover, Lens, Problem, Severity, Span } from '../language/index.js';
import type { Fold, OutlineEntry, SemanticToken, TextEdit as SpanEdit } from '../language/index.js';
import {
  FoldingRangeKind,
  type DocumentSymbol,
  type FoldingRange,
  type Location,
  type SymbolKind,
  type TextEdit,
} from 'vscode-languageserver';

/** The client-side command a lens runs; its arguments are `[latex, name]`. */
export const COPY_LATEX_COMMAND = 'wedgework.copyLatex';

/** The `source` shown beside every diagnostic. */
export const DIAGNOSTIC_SOURCE = 'wedgework';

const SEVERITIES: Record<Severity, DiagnosticSeverity> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  information: DiagnosticSeverity.Information,
};

/** An offset forced into [0, length]; a non-number (e.g. NaN from a parser at end of input) means the end. */
function clampOffset(offset: number, length: number): number {
  if (!Number.isFinite(offset)) return length;
  return Math.min(Math.max(Math.trunc(offset), 0), length);
}

export function toRange(document: TextDocument, span: Span): Range {
  const length = document.getText().length;
  const start = clampOffset(span.start, length);
  const end = Math.max(start, clampOffset(span.end, length));
  return { start: document.positionAt(start), end: document.positionAt(end) };
}

export function toDiagnostic(document: TextDocument, problem: Problem): Diagnostic {
  const diagnostic: Diagnostic = {
    range: toRange(document, problem.span),
    severity: SEVERITIES[problem.severity] ?? DiagnosticSeverity.Error,
    code: problem.code,
    source: DIAGNOSTIC_SOURCE,
    message: problem.message,
  };
  if (problem.related && problem.related.length > 0) {
    diagnostic.relatedInformation = problem.related.map(
      (r): DiagnosticRelatedInformation => ({
        location: { uri: document.uri, range: toRange(document, r.span) },
        message: r.message,
      }),
    );
  }
  return diagnostic;
}

export function toHover(document: TextDocument, hover: Hover): LspHover {
  return {
    contents: { kind: MarkupKind.Markdown, value: hover.markdown },
    range: toRange(document, hover.span),
  };
}

/**
 * A lens showing the result's summary; clicking it copies the result as LaTeX.
 * A result without LaTeX (a claim's verdict) gets a lens with an empty command
 * id, which editors show as plain text that does nothing when clicked.
 */
export function toCodeLens(document: TextDocument, lens: Lens): CodeLens {
  const range = toRange(document, lens.span);
  if (lens.latex.length === 0) return { range, command: { title: lens.title, command: '' } };
  return {
    range,
    command: {
      title: lens.title,
      command: COPY_LATEX_COMMAND,
      // JSON has no `undefined`: a nameless result sends null.
      arguments: [lens.latex, lens.name ?? null],
    },
  };
}

// ---- Editor features (./features.ts): spans of the language services as LSP locations, edits, folds,
// outline entries and semantic tokens.

export function toLocation(document: TextDocument, span: Span): Location {
  return { uri: document.uri, range: toRange(document, span) };
}

export function toTextEdit(document: TextDocument, edit: SpanEdit): TextEdit {
  return { range: toRange(document, edit.span), newText: edit.newText };
}

/** A fold over whole lines; undefined when the span lies on one line (nothing to fold). */
export function toFoldingRange(document: TextDocument, fold: Fold): FoldingRange | undefined {
  const { start, end } = toRange(document, fold.span);
  if (end.line <= start.line) return undefined;
  return {
    startLine: start.line,
    endLine: end.line,
    kind: fold.kind === 'comment' ? FoldingRangeKind.Comment : FoldingRangeKind.Region,
  };
}

export function toDocumentSymbol(
  document: TextDocument,
  entry: OutlineEntry,
  kindOf: (kind: OutlineEntry['kind']) => SymbolKind,
): DocumentSymbol {
  return {
    name: entry.name.length > 0 ? entry.name : entry.kind,
    detail: entry.detail,
    kind: kindOf(entry.kind),
    range: toRange(document, entry.span),
    selectionRange: toRange(document, entry.selection),
    children: entry.children.map((c) => toDocumentSymbol(document, c, kindOf)),
  };
}

/**
 * Semantic tokens in the protocol's relative encoding: five numbers per token
 * (line delta, start delta on the same line or start on a new line, length,
 * type index, modifier bit set). Each token lies on one line (names do).
 */
export function encodeSemanticTokens(
  document: TextDocument,
  tokens: readonly SemanticToken[],
  typeIndex: (type: SemanticToken['type']) => number,
  modifierBits: (modifiers: SemanticToken['modifiers']) => number,
): number[] {
  const data: number[] = [];
  let line = 0;
  let character = 0;
  for (const token of tokens) {
    const { start, end } = toRange(document, token.span);
    if (end.line !== start.line || end.character <= start.character) continue;
    data.push(
      start.line - line,
      start.line === line ? start.character - character : start.character,
      end.character - start.character,
      typeIndex(token.type),
      modifierBits(token.modifiers),
    );
    line = start.line;
    character = start.character;
  }
  return data;
}
