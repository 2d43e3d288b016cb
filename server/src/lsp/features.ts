/**
 * The editor features beyond diagnostics, hovers and lenses: completion,
 * signature help, go to definition, find references, rename, the outline,
 * semantic tokens, folding and formatting. Each handler asks the language
 * layer's services (server/src/language/services/) and translates the answer;
 * nothing is computed here.
 *
 * Every feature answers from a quick analysis (`evaluate: false`: parse and
 * names, milliseconds) of the document's current text, made on demand and kept
 * per document version, so it is right while the user types and never waits
 * for an evaluation. The workspace settings give the default conventions (the
 * first label decides the default basis names e0… or e1…).
 *
 * Kinds as LSP shows them:
 * - completion: keyword → Keyword, space → Module, basis vector → EnumMember,
 *   vector/subspace/multivector/flag → Variable, map and built-in → Function,
 *   a field's generator → Constant, convention setting → Property, setting value
 *   and normalization → EnumMember, field → Class, property → Value. Built-ins
 *   insert a snippet with the parentheses (`span($0)`).
 * - outline: space → Namespace, basis vector → EnumMember, vector → Variable,
 *   subspace → Object, multivector → Array, map → Function, flag → Struct,
 *   claim → Boolean, show → Event.
 * - semantic tokens: the legend is the language layer's
 *   `SEMANTIC_TOKEN_TYPES` / `SEMANTIC_TOKEN_MODIFIERS` (table in
 *   server/src/language/services/semantic-tokens.ts): the standard types
 *   `type`, `enumMember`, `variable`, `function`, the standard modifiers
 *   `declaration`, `readonly`, `defaultLibrary` and the modifiers `vector`,
 *   `subspace`, `multivector`, `flag` of our own.
 *
 * A refused rename answers with an error whose message says why (the editor
 * shows it).
 */
import {
  CompletionItemKind,
  CompletionTriggerKind,
  ErrorCodes,
  InsertTextFormat,
  MarkupKind,
  ResponseError,
  SymbolKind,
  type CompletionItem,
  type CompletionList,
  type Connection,
  type DocumentSymbol,
  type FoldingRange,
  type Location,
  type ServerCapabilities,
  type SignatureHelp,
  type TextEdit,
  type WorkspaceEdit,
} from 'vscode-languageserver';
import type { TextDocument } from 'vscode-languageserver-textdocument';
import {
  analyze,
  completionsAt,
  definitionAt,
  documentSymbols,
  foldingRanges,
  formatDocument,
  prepareRenameAt,
  referencesAt,
  renameAt,
  semanticTokens,
  SEMANTIC_TOKEN_MODIFIERS,
  SEMANTIC_TOKEN_TYPES,
  signatureHelpAt,
  type Analysis,
  type CompletionKind,
  type OutlineKind,
  type Signature,
} from '../language/index.js';
import {
  encodeSemanticTokens,
  toDocumentSymbol,
  toFoldingRange,
  toLocation,
  toRange,
  toTextEdit,
} from './convert.js';
import type { Settings } from './settings.js';

/** What the features need from the server: the open documents and their settings. */
export interface FeatureHost {
  /** The open document at `uri` with its current text, if it is open. */
  document(uri: string): TextDocument | undefined;
  /** The settings that apply to the document (its default conventions). */
  settings(uri: string): Promise<Settings>;
}

export const SEMANTIC_TOKENS_LEGEND = {
  tokenTypes: [...SEMANTIC_TOKEN_TYPES],
  tokenModifiers: [...SEMANTIC_TOKEN_MODIFIERS],
};

export const FEATURE_CAPABILITIES: ServerCapabilities = {
  // `.` completes the basis vectors of a space (`V.`); a space completes the words of a fixed list only.
  completionProvider: { triggerCharacters: ['.', ' '], resolveProvider: false },
  signatureHelpProvider: { triggerCharacters: ['(', ','], retriggerCharacters: [','] },
  definitionProvider: true,
  referencesProvider: true,
  renameProvider: { prepareProvider: true },
  documentSymbolProvider: true,
  semanticTokensProvider: { legend: SEMANTIC_TOKENS_LEGEND, full: true },
  foldingRangeProvider: true,
  documentFormattingProvider: true,
};

const COMPLETION_KINDS: Record<CompletionKind, CompletionItemKind> = {
  keyword: CompletionItemKind.Keyword,
  space: CompletionItemKind.Module,
  basis: CompletionItemKind.EnumMember,
  vector: CompletionItemKind.Variable,
  subspace: CompletionItemKind.Variable,
  multivector: CompletionItemKind.Variable,
  flag: CompletionItemKind.Variable,
  grassmannian: CompletionItemKind.Module,
  class: CompletionItemKind.Variable,
  map: CompletionItemKind.Function,
  builtin: CompletionItemKind.Function,
  scalar: CompletionItemKind.Constant,
  setting: CompletionItemKind.Property,
  value: CompletionItemKind.EnumMember,
  field: CompletionItemKind.Class,
  property: CompletionItemKind.Value,
};

const OUTLINE_KINDS: Record<OutlineKind, SymbolKind> = {
  space: SymbolKind.Namespace,
  basis: SymbolKind.EnumMember,
  vector: SymbolKind.Variable,
  subspace: SymbolKind.Object,
  multivector: SymbolKind.Array,
  map: SymbolKind.Function,
  flag: SymbolKind.Struct,
  grassmannian: SymbolKind.Namespace,
  class: SymbolKind.Variable,
  parameter: SymbolKind.TypeParameter,
  claim: SymbolKind.Boolean,
  show: SymbolKind.Event,
};

function typeIndex(type: (typeof SEMANTIC_TOKEN_TYPES)[number]): number {
  return SEMANTIC_TOKEN_TYPES.indexOf(type);
}

function modifierBits(modifiers: readonly (typeof SEMANTIC_TOKEN_MODIFIERS)[number][]): number {
  return modifiers.reduce((bits, m) => bits | (1 << SEMANTIC_TOKEN_MODIFIERS.indexOf(m)), 0);
}

function toSignatureHelp(help: { signatures: Signature[]; activeSignature: number }): SignatureHelp {
  const active = help.signatures[help.activeSignature];
  return {
    signatures: help.signatures.map((s) => ({
      label: s.label,
      documentation: s.documentation,
      parameters: s.parameters.map((p) => ({ label: [p.start, p.end] as [number, number] })),
      activeParameter: s.activeParameter,
    })),
    activeSignature: help.activeSignature,
    activeParameter: active?.activeParameter ?? 0,
  };
}

function describeError(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  return String(error);
}

export function registerFeatures(connection: Connection, host: FeatureHost): void {
  /** The quick analysis of each open document's current version (keyed by the document object). */
  const analyses = new WeakMap<TextDocument, { version: number; key: string; analysis: Analysis }>();

  function logFailure(what: string, error: unknown): void {
    try {
      connection.console.error(`Wedgework: ${what} failed: ${describeError(error)}`);
    } catch {
      // The connection itself is gone; nothing is left to tell.
    }
  }

  /** Wraps a handler so that an exception is logged and answered with `fallback`. */
  function guard<A extends unknown[], R>(what: string, fallback: R, handler: (...args: A) => R | Promise<R>) {
    return async (...args: A): Promise<R> => {
      try {
        return await handler(...args);
      } catch (error) {
        logFailure(what, error);
        return fallback;
      }
    };
  }

  /** The open document and the quick analysis of its current text. */
  async function analysisOf(uri: string): Promise<{ document: TextDocument; analysis: Analysis } | undefined> {
    const settings = await host.settings(uri);
    // Read the document only now: it may have changed (or closed) while the settings were fetched.
    const document = host.document(uri);
    if (!document) return undefined;
    const options = {
      evaluate: false,
      normalization: settings.normalization,
      order: settings.indexOrder,
      firstLabel: settings.firstLabel,
      layout: settings.layout,
    };
    const key = JSON.stringify(options);
    const cached = analyses.get(document);
    if (cached && cached.version === document.version && cached.key === key) return { document, analysis: cached.analysis };
    const analysis = analyze(document.getText(), options);
    analyses.set(document, { version: document.version, key, analysis });
    return { document, analysis };
  }

  connection.onCompletion(
    guard('completing', [] as CompletionItem[] | CompletionList, async ({ textDocument, position, context }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return [];
      const { document, analysis } = found;
      const afterSpace = context?.triggerKind === CompletionTriggerKind.TriggerCharacter && context.triggerCharacter === ' ';
      const items = completionsAt(analysis, document.offsetAt(position), { afterSpace }).map((c): CompletionItem => {
        const range = toRange(document, c.replace);
        return {
          label: c.label,
          kind: COMPLETION_KINDS[c.kind],
          detail: c.detail,
          ...(c.documentation ? { documentation: { kind: MarkupKind.PlainText, value: c.documentation } } : {}),
          sortText: c.sortText,
          ...(c.filterText ? { filterText: c.filterText } : {}),
          insertTextFormat: c.snippet ? InsertTextFormat.Snippet : InsertTextFormat.PlainText,
          textEdit: { range, newText: c.snippet ?? c.insertText },
        };
      });
      // After a space only the fixed words are offered (often none); marked incomplete, so that the editor
      // asks again on the next letter instead of filtering this short list (and showing nothing).
      return afterSpace ? { isIncomplete: true, items } : items;
    }),
  );

  connection.onSignatureHelp(
    guard('giving signature help', null as SignatureHelp | null, async ({ textDocument, position }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return null;
      const help = signatureHelpAt(found.analysis, found.document.offsetAt(position));
      return help ? toSignatureHelp(help) : null;
    }),
  );

  connection.onDefinition(
    guard('finding the definition', null as Location | null, async ({ textDocument, position }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return null;
      const span = definitionAt(found.analysis, found.document.offsetAt(position));
      return span ? toLocation(found.document, span) : null;
    }),
  );

  connection.onReferences(
    guard('finding references', [] as Location[], async ({ textDocument, position, context }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return [];
      const { document, analysis } = found;
      return referencesAt(analysis, document.offsetAt(position), context.includeDeclaration).map((s) => toLocation(document, s));
    }),
  );

  connection.onPrepareRename(
    guard('preparing the rename', null, async ({ textDocument, position }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return null;
      const prepared = prepareRenameAt(found.analysis, found.document.offsetAt(position));
      if ('refused' in prepared) return new ResponseError(ErrorCodes.InvalidRequest, prepared.refused);
      return { range: toRange(found.document, prepared.span), placeholder: prepared.placeholder };
    }),
  );

  connection.onRenameRequest(
    guard('renaming', null as WorkspaceEdit | ResponseError<void> | null, async ({ textDocument, position, newName }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return null;
      const { document, analysis } = found;
      const renamed = renameAt(analysis, document.offsetAt(position), newName);
      if ('refused' in renamed) return new ResponseError<void>(ErrorCodes.InvalidRequest, renamed.refused);
      return { changes: { [document.uri]: renamed.edits.map((e) => toTextEdit(document, e)) } };
    }),
  );

  connection.onDocumentSymbol(
    guard('listing the outline', [] as DocumentSymbol[], async ({ textDocument }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return [];
      return documentSymbols(found.analysis).map((e) => toDocumentSymbol(found.document, e, (k) => OUTLINE_KINDS[k]));
    }),
  );

  connection.languages.semanticTokens.on(
    guard('colouring names', { data: [] as number[] }, async ({ textDocument }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return { data: [] };
      return { data: encodeSemanticTokens(found.document, semanticTokens(found.analysis), typeIndex, modifierBits) };
    }),
  );

  connection.onFoldingRanges(
    guard('folding', [] as FoldingRange[], async ({ textDocument }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return [];
      return foldingRanges(found.analysis).flatMap((f) => toFoldingRange(found.document, f) ?? []);
    }),
  );

  connection.onDocumentFormatting(
    guard('formatting', [] as TextEdit[], async ({ textDocument }) => {
      const found = await analysisOf(textDocument.uri);
      if (!found) return [];
      return formatDocument(found.analysis).map((e) => toTextEdit(found.document, e));
    }),
  );
}
