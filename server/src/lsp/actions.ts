/**
 * Code actions and the LaTeX export, translated between LSP and the language
 * layer's `actionsAt` and `exportLatex`. Nothing here edits a file: a code
 * action carries its edit to the editor, which applies it only when the user
 * picks it, and the export hands the fragment to the client, which writes it
 * where the user chooses.
 *
 * A problem's own fix is offered only while the last evaluation describes the
 * current text exactly: its edits index that text, and after further typing
 * they could land in the wrong place (the next evaluation brings fresh ones).
 */
import {
  CodeActionKind,
  type CodeAction,
  type CodeActionParams,
  type Connection,
  type ExecuteCommandParams,
  type Range,
  type ServerCapabilities,
  type TextEdit as LspTextEdit,
} from 'vscode-languageserver';
import type { TextDocument } from 'vscode-languageserver-textdocument';
import { actionsAt, exportLatex, type Analysis, type EditAction } from '../language/index.js';
import { toDiagnostic, toRange } from './convert.js';
import { EXPORT_MACROS_COMMAND, MACRO_COMMANDS, MACRO_REFERENCES_COMMAND, macroReferences, macrosExport, type MacrosExport } from './macros-commands.js';

/**
 * The server-side command behind the client's "Export Results as LaTeX": it
 * answers the fragment and never writes. Its id differs from the client's
 * command (`wedgework.exportLatex`), which the language client would
 * otherwise register twice.
 */
export const EXPORT_LATEX_COMMAND = 'wedgework.server.exportLatex';

export const ACTION_CAPABILITIES = {
  codeActionProvider: {
    codeActionKinds: [CodeActionKind.QuickFix, CodeActionKind.RefactorRewrite, CodeActionKind.Refactor],
    resolveProvider: false,
  },
  executeCommandProvider: { commands: [EXPORT_LATEX_COMMAND, ...MACRO_COMMANDS] },
} satisfies ServerCapabilities;

/** What the server knows of an open document. */
export interface ActionDocument {
  document: TextDocument;
  /** The analysis that answers queries (the last evaluation, carried through later edits), if any. */
  analysis: Analysis | undefined;
  /** Whether `analysis` is an evaluation of exactly the current text. */
  current: boolean;
}

export interface ActionHost {
  document(uri: string): ActionDocument | undefined;
  /**
   * An evaluation of the document's current text: the last one when it is
   * current, else one run now the way the server runs every evaluation.
   * Undefined when none finished (closed, stopped at the time limit).
   */
  evaluation(uri: string): Promise<Analysis | undefined>;
  /** Wraps a handler so that an exception is logged and answered with `fallback`. */
  guard<A extends unknown[], R>(what: string, fallback: R, handler: (...args: A) => R | Promise<R>): (...args: A) => Promise<R>;
}

/** What the export command answers. */
export interface LatexExport {
  fileName: string;
  latex: string;
  results: number;
  errors: number;
}

const KINDS: Record<EditAction['kind'], string> = {
  fix: CodeActionKind.QuickFix,
  rewrite: CodeActionKind.RefactorRewrite,
  insert: CodeActionKind.Refactor,
};

/** Whether `kind` was asked for: `only` lists kinds and their parents (`refactor` covers `refactor.rewrite`). */
function wanted(kind: string, only: readonly string[] | undefined): boolean {
  return !only || only.length === 0 || only.some((o) => kind === o || kind.startsWith(`${o}.`));
}

/** The code actions for `range` of an open document. */
export function codeActionsFor(entry: ActionDocument, range: Range, only?: readonly string[]): CodeAction[] {
  const { document, analysis } = entry;
  if (!analysis || analysis.text !== document.getText()) return [];
  const span = { start: document.offsetAt(range.start), end: document.offsetAt(range.end) };
  return actionsAt(analysis, span, { problemFixes: entry.current })
    .filter((a) => wanted(KINDS[a.kind], only))
    .map((a): CodeAction => {
      const edits: LspTextEdit[] = a.edits.map((e) => ({ range: toRange(document, e.span), newText: e.newText }));
      return {
        title: a.title,
        kind: KINDS[a.kind],
        edit: { changes: { [document.uri]: edits } },
        ...(a.problem ? { diagnostics: [toDiagnostic(document, a.problem)] } : {}),
        ...(a.preferred ? { isPreferred: true } : {}),
      };
    });
}

/** The last segment of a URI's path, decoded: the name the fragment's header gives. */
export function fileNameOfUri(uri: string): string {
  const path = uri.replace(/[?#].*$/, '');
  const name = path.slice(path.lastIndexOf('/') + 1);
  try {
    return decodeURIComponent(name) || uri;
  } catch {
    return name || uri;
  }
}

/** The fragment of an open document's results, from an evaluation of its current text. */
export async function latexExport(host: ActionHost, uri: string): Promise<LatexExport | null> {
  const analysis = await host.evaluation(uri);
  if (!analysis?.evaluated) return null;
  const fileName = fileNameOfUri(uri);
  return {
    fileName,
    latex: exportLatex(analysis, fileName),
    results: analysis.results.filter((r) => r.kind !== 'field').length,
    errors: analysis.problems.filter((p) => p.severity === 'error').length,
  };
}

export function registerActions(connection: Connection, host: ActionHost): void {
  connection.onCodeAction(
    host.guard('listing code actions', [] as CodeAction[], ({ textDocument, range, context }: CodeActionParams) => {
      const entry = host.document(textDocument.uri);
      return entry ? codeActionsFor(entry, range, context.only) : [];
    }),
  );
  connection.onExecuteCommand(
    host.guard('running a command', null as LatexExport | MacrosExport | string[] | null, async ({ command, arguments: args }: ExecuteCommandParams) => {
      const uri = args?.[0];
      if (typeof uri !== 'string') return null;
      if (command === EXPORT_LATEX_COMMAND) return latexExport(host, uri);
      if (command === MACRO_REFERENCES_COMMAND) {
        const entry = host.document(uri);
        if (!entry) return [];
        // An evaluation of exactly the current text, so that the cursor's offset lands in the right statement.
        return macroReferences(await host.evaluation(uri), entry.document.getText(), args?.[1]);
      }
      if (command === EXPORT_MACROS_COMMAND) {
        const [, source, target, normalization] = args ?? [];
        if (typeof source !== 'string' || typeof target !== 'string') return null;
        const analysis = await host.evaluation(uri);
        return analysis?.evaluated ? macrosExport(analysis, source, target, typeof normalization === 'string' ? normalization : undefined) : null;
      }
      return null;
    }),
  );
}
