/**
 * A real language-server session for tests: the bundled server as a child
 * process over stdio, and a JSON-RPC client talking to it.
 */
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { join } from 'node:path';
import {
  ConfigurationRequest,
  createProtocolConnection,
  ExitNotification,
  InitializedNotification,
  InitializeRequest,
  PublishDiagnosticsNotification,
  ShutdownRequest,
  StreamMessageReader,
  StreamMessageWriter,
  WorkDoneProgress,
  WorkDoneProgressCreateRequest,
  type ClientCapabilities,
  type ConfigurationItem,
  type InitializeResult,
  type ProtocolConnection,
  type PublishDiagnosticsParams,
} from 'vscode-languageserver-protocol/node';
import { ROOT } from '../support/bundles.js';

/**
 * Diagnostics notifications per URI, in the order they arrived. `next(uri)`
 * returns the oldest one not yet taken, waiting for it if none is there yet.
 */
class DiagnosticsInbox {
  private readonly queues = new Map<string, PublishDiagnosticsParams[]>();
  private readonly waiting = new Map<string, ((p: PublishDiagnosticsParams) => void)[]>();

  deliver(params: PublishDiagnosticsParams): void {
    const waiters = this.waiting.get(params.uri);
    const waiter = waiters?.shift();
    if (waiter) waiter(params);
    else this.queues.set(params.uri, [...(this.queues.get(params.uri) ?? []), params]);
  }

  next(uri: string): Promise<PublishDiagnosticsParams> {
    const queued = this.queues.get(uri)?.shift();
    if (queued) return Promise.resolve(queued);
    return new Promise((resolve) => {
      this.waiting.set(uri, [...(this.waiting.get(uri) ?? []), resolve]);
    });
  }
}

/** One notification from the server, numbered in the order of arrival. */
export interface LoggedNotification {
  seq: number;
  method: string;
  params: any;
}

/**
 * Every notification from the server, in the order it arrived (diagnostics
 * included), so tests can tell what came before what without waiting on time.
 */
class NotificationLog {
  readonly entries: LoggedNotification[] = [];
  private waiters: { from: number; predicate: (n: LoggedNotification) => boolean; resolve: (n: LoggedNotification) => void }[] = [];

  record(method: string, params: unknown): void {
    const entry: LoggedNotification = { seq: this.entries.length, method, params };
    this.entries.push(entry);
    this.waiters = this.waiters.filter((w) => {
      if (entry.seq < w.from || !w.predicate(entry)) return true;
      w.resolve(entry);
      return false;
    });
  }

  /** How many notifications have arrived so far (the `seq` the next one gets). */
  get count(): number {
    return this.entries.length;
  }

  /** The first notification numbered `from` or later that matches, already here or still to come. */
  waitFor(predicate: (n: LoggedNotification) => boolean, from = 0): Promise<LoggedNotification> {
    const found = this.entries.find((n) => n.seq >= from && predicate(n));
    if (found) return Promise.resolve(found);
    return new Promise((resolve) => this.waiters.push({ from, predicate, resolve }));
  }
}

export interface SessionOptions {
  /** Client capabilities added to the test client's own (e.g. window.workDoneProgress, experimental). */
  capabilities?: ClientCapabilities;
  /** The server's working folder and environment (by default the project's root and this process's). */
  cwd?: string;
  env?: NodeJS.ProcessEnv;
  /** The workspace root the client announces. */
  rootUri?: string | null;
}

export interface ServerSession {
  connection: ProtocolConnection;
  child: ChildProcessWithoutNullStreams;
  initializeResult: InitializeResult;
  diagnostics: DiagnosticsInbox;
  /** Every notification, diagnostics included, in order of arrival. */
  notifications: NotificationLog;
  /** Every progress token the server asked the client to create (window/workDoneProgress/create). */
  progressTokens: (string | number)[];
  /** Every workspace/configuration item the server asked for. */
  configurationRequests: ConfigurationItem[];
  /** What the client answers for the `wedgework` section; tests may change it. */
  settings: Record<string, unknown>;
  /** The server's standard error so far (for failure messages). */
  stderr(): string;
  /** Resolves with the exit code when the server process ends. */
  exited: Promise<number | null>;
  /** Polite shutdown (shutdown request, exit notification); resolves with the exit code. */
  shutdown(): Promise<number | null>;
  /** Ends the process whatever its state; safe to call more than once. */
  kill(): void;
}

export async function startServerSession(settings: Record<string, unknown>, options: SessionOptions = {}): Promise<ServerSession> {
  const child = spawn(process.execPath, [join(ROOT, 'dist/server.cjs'), '--stdio'], {
    cwd: options.cwd ?? ROOT,
    ...(options.env ? { env: options.env } : {}),
    stdio: ['pipe', 'pipe', 'pipe'],
  });
  let stderr = '';
  child.stderr.setEncoding('utf8');
  child.stderr.on('data', (chunk: string) => (stderr += chunk));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));

  const connection = createProtocolConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
  const diagnostics = new DiagnosticsInbox();
  const notifications = new NotificationLog();
  const session: ServerSession = {
    connection,
    child,
    initializeResult: undefined as unknown as InitializeResult,
    diagnostics,
    notifications,
    progressTokens: [],
    configurationRequests: [],
    settings,
    stderr: () => stderr,
    exited,
    async shutdown() {
      await connection.sendRequest(ShutdownRequest.type);
      await connection.sendNotification(ExitNotification.type);
      return exited;
    },
    kill() {
      connection.dispose();
      if (child.exitCode === null && child.signalCode === null) child.kill();
    },
  };
  connection.onNotification(PublishDiagnosticsNotification.type, (params) => {
    notifications.record(PublishDiagnosticsNotification.method, params);
    diagnostics.deliver(params);
  });
  // Every other notification ($/progress, window/logMessage, wedgework/results, …).
  connection.onUnhandledNotification((message) => notifications.record(message.method, message.params));
  // The connection delivers $/progress only to a handler of its token, as a client registers it here.
  connection.onRequest(WorkDoneProgressCreateRequest.type, ({ token }) => {
    session.progressTokens.push(token);
    connection.onProgress(WorkDoneProgress.type, token, (value) => notifications.record('$/progress', { token, value }));
  });
  connection.onRequest(ConfigurationRequest.type, (params) => {
    session.configurationRequests.push(...params.items);
    return params.items.map((item) => (item.section === 'wedgework' ? session.settings : null));
  });
  // Writing to a dead server must fail the test, not the test runner.
  child.stdin.on('error', () => {});
  connection.listen();

  try {
    session.initializeResult = await connection.sendRequest(InitializeRequest.type, {
      processId: process.pid,
      rootUri: options.rootUri ?? null,
      workspaceFolders: null,
      capabilities: {
        workspace: { configuration: true, didChangeConfiguration: { dynamicRegistration: false } },
        textDocument: {
          hover: { contentFormat: ['markdown', 'plaintext'] },
          publishDiagnostics: { relatedInformation: true, versionSupport: true },
        },
        ...options.capabilities,
      },
    });
    await connection.sendNotification(InitializedNotification.type, {});
  } catch (error) {
    session.kill();
    throw error;
  }
  return session;
}
