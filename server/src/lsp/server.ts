/**
 * The language server: LSP events in, the language facade's analyses out.
 *
 * Behaviour:
 * - open and save: full evaluation (`analyze(text, { evaluate: true, normalization })`), diagnostics pushed;
 * - change, with `wedgework.evaluateOn` = 'save' (default): the quick pass
 *   (`evaluate: false`) ~150 ms after typing pauses, diagnostics pushed as
 *   described in ./documents.ts; hovers and lenses keep answering from the
 *   last evaluation, carried through the edits;
 * - change, with `wedgework.evaluateOn` = 'type': full evaluation ~300 ms after typing pauses;
 * - configuration change: every open document is evaluated again;
 * - after every evaluation: the client is asked to refresh its code lenses, if it supports that;
 * - close: its diagnostics are cleared.
 *
 * Every handler is guarded: an exception is logged to the client's output and
 * the request answers with an empty result, so one bad document never brings
 * the server down.
 */
import {
  CodeLensRefreshRequest,
  DidChangeConfigurationNotification,
  TextDocumentSyncKind,
  type CodeLens,
  type Connection,
  type Hover,
  type InitializeResult,
  type ServerCapabilities,
} from 'vscode-languageserver';
import packageJson from '../../../package.json' with { type: 'json' };
import { analyze, hoverAt, lensesFor } from '../language/index.js';
import { Debouncer } from './debounce.js';
import { analysisForQueries, DocumentStore, evaluationIsCurrent, problemsToShow, type OpenDocument } from './documents.js';
import { toCodeLens, toDiagnostic, toHover } from './convert.js';
import { DEFAULT_SETTINGS, parseSettings, type Settings } from './settings.js';

/** Delay after the last keystroke before the quick (syntax and names) pass. */
export const QUICK_PASS_DELAY_MS = 150;
/** Delay after the last keystroke before evaluating, in 'type' mode. */
export const EVALUATE_WHILE_TYPING_DELAY_MS = 300;

const CONFIGURATION_SECTION = 'wedgework';

export const SERVER_CAPABILITIES: ServerCapabilities = {
  textDocumentSync: {
    openClose: true,
    change: TextDocumentSyncKind.Incremental,
    save: { includeText: false },
  },
  hoverProvider: true,
  codeLensProvider: { resolveProvider: false },
};

function describeError(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  return String(error);
}

export function startServer(connection: Connection): void {
  const documents = new DocumentStore();
  const timers = new Debouncer();
  /** Per-URI settings, asked of the client once and forgotten on configuration change. */
  const settingsByUri = new Map<string, Promise<Settings>>();
  let clientHasConfiguration = false;
  let clientRegistersConfigurationChange = false;
  /** Whether the client re-asks for code lenses when told to (workspace/codeLens/refresh). */
  let clientRefreshesCodeLenses = false;
  /** For clients without workspace/configuration: initializationOptions, then didChangeConfiguration. */
  let pushedSettings: Settings = DEFAULT_SETTINGS;

  function logFailure(what: string, error: unknown): void {
    try {
      connection.console.error(`Wedgework: ${what} failed: ${describeError(error)}`);
    } catch {
      // The connection itself is gone; nothing is left to tell.
    }
  }

  /** Wraps a handler so that an exception (or a rejected promise) is logged and answered with `fallback`. */
  function guard<A extends unknown[], R>(
    what: string,
    fallback: R,
    handler: (...args: A) => R | Promise<R>,
  ): (...args: A) => Promise<R> {
    return async (...args: A) => {
      try {
        return await handler(...args);
      } catch (error) {
        logFailure(what, error);
        return fallback;
      }
    };
  }

  function settingsFor(uri: string): Promise<Settings> {
    if (!clientHasConfiguration) return Promise.resolve(pushedSettings);
    let settings = settingsByUri.get(uri);
    if (!settings) {
      settings = connection.workspace
        .getConfiguration({ scopeUri: uri, section: CONFIGURATION_SECTION })
        .then(parseSettings, (error: unknown) => {
          logFailure('reading the settings', error);
          return DEFAULT_SETTINGS;
        });
      settingsByUri.set(uri, settings);
    }
    return settings;
  }

  function publish(entry: OpenDocument): void {
    const { document } = entry;
    const diagnostics = problemsToShow(entry).map((p) => toDiagnostic(document, p));
    void connection
      .sendDiagnostics({ uri: document.uri, version: document.version, diagnostics })
      .catch((error: unknown) => logFailure('sending diagnostics', error));
  }

  const quickKey = (uri: string) => `quick ${uri}`;
  const evaluateKey = (uri: string) => `evaluate ${uri}`;

  function runQuickPass(uri: string): void {
    const entry = documents.get(uri);
    if (!entry || evaluationIsCurrent(entry)) return;
    documents.recordQuick(entry, analyze(entry.document.getText(), { evaluate: false }));
    publish(entry);
  }

  async function evaluate(uri: string): Promise<void> {
    timers.cancel(quickKey(uri));
    timers.cancel(evaluateKey(uri));
    const settings = await settingsFor(uri);
    // Read the document only now: it may have changed (or closed) while the settings were fetched.
    const entry = documents.get(uri);
    if (!entry) return;
    const analysis = analyze(entry.document.getText(), {
      evaluate: true,
      normalization: settings.normalization,
      order: settings.indexOrder,
      firstLabel: settings.firstLabel,
      layout: settings.layout,
    });
    documents.recordEvaluation(entry, analysis);
    publish(entry);
    // The editor asks for lenses when the text changes, not when an evaluation finishes: after a save
    // (same text, new results) or an evaluation slower than the editor's first request, it would keep
    // showing the lenses of the previous analysis until the next keystroke.
    if (clientRefreshesCodeLenses) {
      void connection
        .sendRequest(CodeLensRefreshRequest.type)
        .catch((error: unknown) => logFailure('asking the client to refresh code lenses', error));
    }
  }

  const evaluateGuarded = guard('evaluating the document', undefined, evaluate);
  const quickPassGuarded = guard('checking the document', undefined, runQuickPass);

  connection.onInitialize(
    guard('initializing', { capabilities: SERVER_CAPABILITIES } as InitializeResult, (params) => {
      const workspace = params.capabilities.workspace;
      clientHasConfiguration = workspace?.configuration === true;
      clientRegistersConfigurationChange = workspace?.didChangeConfiguration?.dynamicRegistration === true;
      clientRefreshesCodeLenses = workspace?.codeLens?.refreshSupport === true;
      pushedSettings = parseSettings(params.initializationOptions);
      const result: InitializeResult = {
        capabilities: SERVER_CAPABILITIES,
        serverInfo: { name: 'wedgework', version: packageJson.version },
      };
      return result;
    }),
  );

  connection.onInitialized(
    guard('registering for configuration changes', undefined, async () => {
      if (clientRegistersConfigurationChange) {
        await connection.client.register(DidChangeConfigurationNotification.type, { section: CONFIGURATION_SECTION });
      }
    }),
  );

  connection.onDidChangeConfiguration(
    guard('applying the new settings', undefined, async (params) => {
      if (!clientHasConfiguration) {
        const settings: unknown = params.settings;
        const section =
          typeof settings === 'object' && settings !== null
            ? (settings as Record<string, unknown>)[CONFIGURATION_SECTION]
            : undefined;
        pushedSettings = parseSettings(section);
      }
      settingsByUri.clear();
      await Promise.all(documents.uris().map((uri) => evaluateGuarded(uri)));
    }),
  );

  connection.onDidOpenTextDocument(
    guard('opening the document', undefined, async ({ textDocument }) => {
      documents.open(textDocument.uri, textDocument.languageId, textDocument.version, textDocument.text);
      await evaluateGuarded(textDocument.uri);
    }),
  );

  connection.onDidChangeTextDocument(
    guard('applying the edit', undefined, async ({ textDocument, contentChanges }) => {
      const { uri } = textDocument;
      if (!documents.change(uri, textDocument.version, contentChanges)) return;
      const settings = await settingsFor(uri);
      if (!documents.get(uri)) return;
      if (settings.evaluateOn === 'type') {
        timers.schedule(evaluateKey(uri), EVALUATE_WHILE_TYPING_DELAY_MS, () => void evaluateGuarded(uri));
      } else {
        timers.schedule(quickKey(uri), QUICK_PASS_DELAY_MS, () => void quickPassGuarded(uri));
      }
    }),
  );

  connection.onDidSaveTextDocument(
    guard('evaluating the saved document', undefined, async ({ textDocument }) => {
      await evaluateGuarded(textDocument.uri);
    }),
  );

  connection.onDidCloseTextDocument(
    guard('closing the document', undefined, ({ textDocument }) => {
      const { uri } = textDocument;
      timers.cancel(quickKey(uri));
      timers.cancel(evaluateKey(uri));
      documents.close(uri);
      settingsByUri.delete(uri);
      void connection
        .sendDiagnostics({ uri, diagnostics: [] })
        .catch((error: unknown) => logFailure('clearing diagnostics', error));
    }),
  );

  connection.onHover(
    guard('answering a hover', null as Hover | null, ({ textDocument, position }) => {
      const entry = documents.get(textDocument.uri);
      const analysis = entry && analysisForQueries(entry);
      if (!entry || !analysis) return null;
      const hover = hoverAt(analysis, entry.document.offsetAt(position));
      return hover ? toHover(entry.document, hover) : null;
    }),
  );

  connection.onCodeLens(
    guard('listing code lenses', [] as CodeLens[], ({ textDocument }) => {
      const entry = documents.get(textDocument.uri);
      const analysis = entry && analysisForQueries(entry);
      if (!entry || !analysis) return [];
      return lensesFor(analysis).map((lens) => toCodeLens(entry.document, lens));
    }),
  );

  connection.onShutdown(
    guard('shutting down', undefined, () => {
      timers.cancelAll();
    }),
  );

  connection.listen();
}
