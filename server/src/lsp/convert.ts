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
