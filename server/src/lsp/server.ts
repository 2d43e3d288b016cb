/**
 * The language server: LSP events in, the language facade's analyses out.
 *
 * Behaviour:
 * - open and save: full evaluation (`analyze(text, { evaluate: true, normalization, limits })`) on a
 *   worker thread (./evaluation-scheduler.ts), diagnostics pushed when it ends. Meanwhile the main
 *   thread keeps answering hovers, lenses and the quick pass from the last results. A newer
 *   evaluation of a document replaces a running one (its thread is terminated); one that runs past
 *   `wedgework.limits.timeoutMs` is stopped with a `limit/timeout` problem on the statement it was
 *   on. An evaluation still running after ~500 ms shows work-done progress (cancellable, naming the
 *   statement being evaluated) and publishes the quick pass's problems so far;
 * - change, with `wedgework.evaluateOn` = 'save' (default): the quick pass
 *   (`evaluate: false`) right away when the last one was cheap (a few milliseconds, since the parser
 *   reuses the statements the edit left alone), else ~150 ms after typing pauses; diagnostics pushed as
 *   described in ./documents.ts; hovers and lenses keep answering from the
 *   last evaluation, carried through the edits;
 * - change, with `wedgework.evaluateOn` = 'type': the running evaluation is cancelled and a new
 *   evaluation starts right away when the last one was cheap (the worker re-evaluates only what the
 *   edit affects), else ~300 ms after typing pauses; with 'save', a running evaluation goes on and its
 *   results are carried through the edits made meanwhile;
 * - configuration change: every open document is evaluated again;
 * - after every evaluation: the client is asked to refresh its code lenses, if it supports that;
 * - with every diagnostics update: the document's results (`wedgework/results`, ./results-protocol.ts)
 *   to clients that asked for them, for the results view;
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
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import packageJson from '../../../package.json' with { type: 'json' };
import { analyze, hoverAt, lensesFor } from '../language/index.js';
import { SYSTEM_CLOCK } from './clock.js';
import { Debouncer } from './debounce.js';
import { analysisForQueries, DocumentStore, evaluationIsCurrent, problemsToShow, type OpenDocument } from './documents.js';
import { toCodeLens, toDiagnostic, toHover } from './convert.js';
import { ACTION_CAPABILITIES, registerActions } from './actions.js';
import { FEATURE_CAPABILITIES, registerFeatures } from './features.js';
import { statementMessage, unfinishedEvaluationProblem } from './evaluation-problems.js';
import { EvaluationScheduler, type EvaluationOutcome } from './evaluation-scheduler.js';
import { DelayedProgress } from './progress.js';
import { resultItems } from './results-items.js';
import { RESULTS_CAPABILITY, RESULTS_NOTIFICATION, type ResultsParams } from './results-protocol.js';
import { DEFAULT_SETTINGS, parseSettings, type Settings } from './settings.js';
import { threadWorkerFactory, WorkerPool } from './worker-pool.js';
import { RecentDurations } from './recent-durations.js';

/**
 * Delay after the last keystroke before the quick (syntax and names) pass, when the document's recent quick passes
 * took longer than `CHEAP_QUICK_PASS_MS` (their median): then it is worth waiting for a pause in typing.
 */
export const QUICK_PASS_DELAY_MS = 150;
/**
 * A quick pass at most this long (the parser reuses the statements an edit left alone, so a 1000-line document
 * takes a few milliseconds) runs right after each change, without waiting for a pause: the changes that arrived
 * together are still taken in one pass, since it runs after the pending messages.
 */
export const CHEAP_QUICK_PASS_MS = 25;
/** Delay after the last keystroke before evaluating, in 'type' mode, when the last evaluation was not cheap. */
export const EVALUATE_WHILE_TYPING_DELAY_MS = 300;
/**
 * In 'type' mode, an evaluation that took at most this long (the worker re-evaluates only the statements an
 * edit affects, so most edits cost a few milliseconds) is followed by the next one right after each change.
 */
export const CHEAP_EVALUATION_MS = 40;

const CONFIGURATION_SECTION = 'wedgework';

export interface ServerOptions {
  /** The bundled evaluation worker; by default `evaluation-worker.cjs` beside the server bundle. */
  evaluationWorkerFile?: string;
  /** How many documents are evaluated at once; by default one per spare processor, at most four. */
  maxConcurrentEvaluations?: number;
}

function defaultWorkerFile(): string {
  // The server runs as the CommonJS bundle dist/server.cjs, where `__dirname` is dist/.
  return join(__dirname, 'evaluation-worker.cjs');
}

function defaultConcurrency(): number {
  return Math.max(1, Math.min(4, availableParallelism() - 1));
}

/** The file name at the end of a URI, for messages (`Evaluating three-planes.wedge…`). */
function fileNameOf(uri: string): string {
  const path = uri.replace(/[?#].*$/, '');
  const name = path.slice(path.lastIndexOf('/') + 1);
  try {
    return decodeURIComponent(name) || uri;
  } catch {
    return name || uri;
  }
}

export const SERVER_CAPABILITIES: ServerCapabilities = {
  textDocumentSync: {
    openClose: true,
    change: TextDocumentSyncKind.Incremental,
    save: { includeText: false },
  },
  hoverProvider: true,
  codeLensProvider: { resolveProvider: false },
  // Code actions and the LaTeX export command (./actions.ts).
  ...ACTION_CAPABILITIES,
  // Completion, signature help, navigation, rename, outline, semantic tokens, folding, formatting (./features.ts).
  ...FEATURE_CAPABILITIES,
};

function describeError(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  return String(error);
}

export function startServer(connection: Connection, options: ServerOptions = {}): void {
  const documents = new DocumentStore();
  const timers = new Debouncer();
  const workers = new WorkerPool(threadWorkerFactory(options.evaluationWorkerFile ?? defaultWorkerFile()));
  const evaluations = new EvaluationScheduler(workers, options.maxConcurrentEvaluations ?? defaultConcurrency());
  /** Whether the client shows a results view (and so wants `wedgework/results`). */
  let clientWantsResults = false;
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

  function sendResults(params: ResultsParams): void {
    if (!clientWantsResults) return;
    void connection
      .sendNotification(RESULTS_NOTIFICATION, params)
      .catch((error: unknown) => logFailure('sending the results', error));
  }

  function publish(entry: OpenDocument): void {
    const { document } = entry;
    const diagnostics = problemsToShow(entry).map((p) => toDiagnostic(document, p));
    void connection
      .sendDiagnostics({ uri: document.uri, version: document.version, diagnostics })
      .catch((error: unknown) => logFailure('sending diagnostics', error));
    sendResults({
      uri: document.uri,
      version: document.version,
      ...(entry.evaluation ? { evaluatedVersion: entry.evaluation.version } : {}),
      results: resultItems(document, entry.evaluation?.analysis),
    });
  }

  const quickKey = (uri: string) => `quick ${uri}`;
  const evaluateKey = (uri: string) => `evaluate ${uri}`;

  /** How long each document's recent quick passes took, which decides how long the next one waits. */
  const quickPassMs = new RecentDurations();

  /** Runs the quick pass of the current version unless it (or an evaluation of it) is already there. */
  function ensureQuickPass(entry: OpenDocument): void {
    if (evaluationIsCurrent(entry) || entry.quick?.version === entry.document.version) return;
    // The first pass of a document parses all of it, cold; the passes after edits reuse its pieces. Only
    // those tell what the next keystroke will cost.
    const afterAnEdit = entry.quick !== undefined;
    const started = performance.now();
    documents.recordQuick(entry, analyze(entry.document.getText(), { evaluate: false }));
    if (afterAnEdit) quickPassMs.record(entry.document.uri, performance.now() - started);
  }

  function runQuickPass(uri: string): void {
    const entry = documents.get(uri);
    if (!entry || evaluationIsCurrent(entry)) return;
    ensureQuickPass(entry);
    publish(entry);
  }

  /** How long each document's recent finished evaluations took in their worker, which decides when the next starts. */
  const evaluationMs = new RecentDurations();

  function typingEvaluationDelay(uri: string): number {
    const typical = evaluationMs.typical(uri);
    return typical === undefined || typical <= CHEAP_EVALUATION_MS ? 0 : EVALUATE_WHILE_TYPING_DELAY_MS;
  }

  function quickPassDelay(uri: string): number {
    // Before any pass after an edit the first keystroke is answered at once: it measures what the next cost.
    const typical = quickPassMs.typical(uri);
    return typical === undefined || typical <= CHEAP_QUICK_PASS_MS ? 0 : QUICK_PASS_DELAY_MS;
  }

  function logOutcome(uri: string, version: number, outcome: EvaluationOutcome): void {
    const what = `evaluation of ${fileNameOf(uri)} (version ${version})`;
    if (outcome.status === 'cancelled') {
      connection.console.log(`Wedgework: ${what} cancelled: the document changed, closed or is evaluated again`);
    } else if (outcome.status === 'stopped') {
      const why = outcome.reason === 'timeout' ? 'it reached wedgework.limits.timeoutMs' : 'cancelled by the user';
      connection.console.log(`Wedgework: ${what} stopped after ${Math.round(outcome.elapsedMs)} ms: ${why}`);
    } else if (outcome.status === 'failed') {
      connection.console.error(`Wedgework: ${what} failed: ${outcome.message}`);
    } else if (outcome.elapsedMs >= 500) {
      connection.console.log(`Wedgework: ${what} took ${Math.round(outcome.elapsedMs)} ms`);
    }
  }

  async function evaluate(uri: string): Promise<void> {
    timers.cancel(quickKey(uri));
    timers.cancel(evaluateKey(uri));
    const settings = await settingsFor(uri);
    // Read the document only now: it may have changed (or closed) while the settings were fetched.
    const entry = documents.get(uri);
    if (!entry) return;
    const text = entry.document.getText();
    const { timeoutMs, maxCoordinates } = settings.limits;
    const progress = new DelayedProgress({
      title: `Evaluating ${fileNameOf(uri)}…`,
      create: () => connection.window.createWorkDoneProgress(),
      clock: SYSTEM_CLOCK,
      onCancel: () => evaluations.stop(uri),
      // A long evaluation: show the syntax and name problems of the current text without waiting for it.
      onShown: () => {
        if (documents.get(uri) !== entry) return;
        ensureQuickPass(entry);
        publish(entry);
      },
    });
    // The ticket and the run start together, so that no edit falls between the two.
    const ticket = documents.beginEvaluation(entry);
    const outcome = await evaluations.run(uri, {
      text,
      options: {
        normalization: settings.normalization,
        order: settings.indexOrder,
        firstLabel: settings.firstLabel,
        layout: settings.layout,
        limits: { maxCoordinates },
      },
      timeoutMs,
      onStart: () => progress.start(),
      onStatement: (span) => progress.message(() => statementMessage(text, span)),
    });
    progress.end();
    logOutcome(uri, ticket.version, outcome);
    if (outcome.status === 'cancelled' || documents.get(uri) !== entry) {
      documents.abandonEvaluation(entry, ticket);
      return;
    }
    if (outcome.status === 'finished') {
      // The first evaluation of a document runs every statement; later ones replay the unchanged ones from the
      // worker's memo. Only those tell what evaluating after the next keystroke will cost.
      const afterAnEdit = entry.evaluation !== undefined;
      if (afterAnEdit) evaluationMs.record(uri, outcome.elapsedMs);
      documents.recordEvaluation(entry, outcome.analysis, ticket);
    } else {
      documents.recordStopped(entry, text, unfinishedEvaluationProblem(outcome, text, timeoutMs)!, ticket);
    }
    ensureQuickPass(entry);
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
      clientWantsResults = params.capabilities.experimental?.[RESULTS_CAPABILITY] === true;
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
      // Load the language layer into a worker now, so the first evaluation does not wait for it; not before
      // `initialize` is answered, since starting a thread would only delay that answer.
      workers.warm();
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
      const entry = documents.open(textDocument.uri, textDocument.languageId, textDocument.version, textDocument.text);
      // Parsed here once, so that the parser remembers the statements and the first keystroke's quick pass
      // is already cheap (and known to be, see `quickPassDelay`); shown only if the evaluation takes long.
      ensureQuickPass(entry);
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
        // Its results would be replaced within moments; the thread is better spent on the new text.
        evaluations.cancel(uri);
        timers.schedule(evaluateKey(uri), typingEvaluationDelay(uri), () => void evaluateGuarded(uri));
      } else {
        timers.schedule(quickKey(uri), quickPassDelay(uri), () => void quickPassGuarded(uri));
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
      evaluations.cancel(uri);
      const lastVersion = documents.get(uri)?.document.version ?? 0;
      documents.close(uri);
      settingsByUri.delete(uri);
      quickPassMs.delete(uri);
      evaluationMs.delete(uri);
      void connection
        .sendDiagnostics({ uri, diagnostics: [] })
        .catch((error: unknown) => logFailure('clearing diagnostics', error));
      sendResults({ uri, version: lastVersion, results: [] });
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

  // Quick fixes, rewrites and the LaTeX export (./actions.ts).
  registerActions(connection, {
    document: (uri) => {
      const entry = documents.get(uri);
      return entry && { document: entry.document, analysis: analysisForQueries(entry), current: evaluationIsCurrent(entry) };
    },
    evaluation: async (uri) => {
      if (documents.get(uri) && !evaluationIsCurrent(documents.get(uri)!)) await evaluateGuarded(uri);
      const entry = documents.get(uri);
      return entry && evaluationIsCurrent(entry) ? entry.evaluation!.analysis : undefined;
    },
    guard,
  });

  // Completion, signature help, navigation, rename, outline, semantic tokens, folding, formatting (./features.ts).
  registerFeatures(connection, { document: (uri) => documents.get(uri)?.document, settings: settingsFor });

  connection.onShutdown(
    guard('shutting down', undefined, () => {
      timers.cancelAll();
      evaluations.cancelAll();
      workers.dispose();
    }),
  );

  connection.listen();
}
