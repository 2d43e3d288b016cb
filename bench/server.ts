/**
 * The language server as an editor sees it: the bundled dist/server.cjs is
 * started over stdio and driven through the protocol alone, so the benchmark
 * keeps working however the server organises its work inside (threads,
 * debouncing, caching).
 *
 * Measured: cold start (spawn → initialize answered, and → first diagnostics
 * of a small file), open → diagnostics (full evaluation), keystroke →
 * diagnostics with the default setting (evaluate on save: a quick syntax and
 * names pass after typing pauses) and with evaluation while typing, hover
 * latency, resident memory, and the sizes of the bundles. Latencies are wall
 * clock: that is what a user waits for.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import {
  createProtocolConnection,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  ExitNotification,
  HoverRequest,
  InitializedNotification,
  InitializeRequest,
  PublishDiagnosticsNotification,
  ShutdownRequest,
  StreamMessageReader,
  StreamMessageWriter,
  type ProtocolConnection,
} from 'vscode-languageserver-protocol/node';
import { generateDocument } from './documents.js';
import { markdownTable, ms } from './table.js';
import { median } from './timing.js';

const SERVER = join(process.cwd(), 'dist', 'server.cjs');
/** How long to wait for any one answer before counting it as lost. */
const TIMEOUT_MS = 60_000;

const CLIENT_REQUESTS = [
  'window/workDoneProgress/create',
  'window/showMessageRequest',
  'window/showDocument',
  'client/registerCapability',
  'client/unregisterCapability',
  'workspace/configuration',
  'workspace/codeLens/refresh',
  'workspace/semanticTokens/refresh',
  'workspace/inlayHint/refresh',
  'workspace/diagnostic/refresh',
];

interface Session {
  process: ChildProcess;
  connection: ProtocolConnection;
  /** Resolves when diagnostics for `uri` at version ≥ `version` arrive. */
  diagnostics(uri: string, version: number): Promise<void>;
}

async function startSession(settings: Record<string, unknown>): Promise<{ session: Session; initializeMs: number }> {
  const started = performance.now();
  const child = spawn(process.execPath, [SERVER, '--stdio'], { stdio: ['pipe', 'pipe', 'pipe'] });
  child.stderr!.resume();
  const connection = createProtocolConnection(new StreamMessageReader(child.stdout!), new StreamMessageWriter(child.stdin!));
  const waiting: { uri: string; version: number; resolve: () => void }[] = [];
  connection.onNotification(PublishDiagnosticsNotification.type, ({ uri, version }) => {
    for (let i = waiting.length - 1; i >= 0; i--) {
      const w = waiting[i]!;
      if (w.uri === uri && (version ?? Infinity) >= w.version) {
        waiting.splice(i, 1);
        w.resolve();
      }
    }
  });
  // What else a server may ask of its client (progress, registrations, refreshes) is answered with nothing.
  for (const method of CLIENT_REQUESTS) connection.onRequest(method, () => null);
  connection.listen();
  await connection.sendRequest(InitializeRequest.type, {
    processId: process.pid,
    rootUri: null,
    capabilities: {},
    initializationOptions: settings,
  });
  const initializeMs = performance.now() - started;
  await connection.sendNotification(InitializedNotification.type, {});
  const session: Session = {
    process: child,
    connection,
    diagnostics: (uri, version) =>
      withTimeout(new Promise<void>((resolve) => waiting.push({ uri, version, resolve })), `diagnostics of ${uri} v${version}`),
  };
  return { session, initializeMs };
}

async function withTimeout<T>(promise: Promise<T>, what: string): Promise<T> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${TIMEOUT_MS} ms: ${what}`)), TIMEOUT_MS);
  });
  try {
    return await Promise.race([promise, timeout]);
  } finally {
    clearTimeout(timer);
  }
}

async function stopSession(session: Session): Promise<void> {
  try {
    await withTimeout(session.connection.sendRequest(ShutdownRequest.type), 'shutdown');
    await session.connection.sendNotification(ExitNotification.type);
  } catch {
    // A server that does not shut down cleanly is stopped below.
  }
  session.connection.dispose();
  if (session.process.exitCode === null) session.process.kill();
}

/** Resident memory of a process in MiB, from /proc (Linux); undefined elsewhere. */
function residentMiB(pid: number | undefined): number | undefined {
  if (pid === undefined) return undefined;
  try {
    const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) / 1024 : undefined;
  } catch {
    return undefined;
  }
}

function percentile(values: readonly number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1))]!;
}

export interface ServerOptions {
  sizes: readonly number[];
  keystrokes: number;
  typingKeystrokes: number;
  hovers: number;
  coldStarts: number;
}

export interface DocumentResult {
  lines: number;
  openMs: number;
  keystroke: number[];
  typing: number[];
  hover: number[];
  residentMiB: number | undefined;
}

export interface ServerResult {
  coldInitializeMs: number[];
  coldFirstDiagnosticsMs: number[];
  idleMiB: number | undefined;
  documents: DocumentResult[];
  bundles: { file: string; bytes: number }[];
}

/** Types a digit before the edit point, then deletes it, alternately; resolves with each keystroke's latency. */
async function keystrokes(session: Session, uri: string, doc: ReturnType<typeof generateDocument>, first: number, count: number): Promise<number[]> {
  const latencies: number[] = [];
  let version = first;
  for (let i = 0; i < count; i++) {
    version++;
    const position = { line: doc.editLine, character: doc.editCharacter };
    const change =
      i % 2 === 0
        ? { range: { start: position, end: position }, text: '7' }
        : { range: { start: position, end: { line: position.line, character: position.character + 1 } }, text: '' };
    const arrived = session.diagnostics(uri, version);
    const started = performance.now();
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version },
      contentChanges: [change],
    });
    await arrived;
    latencies.push(performance.now() - started);
  }
  return latencies;
}

async function hovers(session: Session, uri: string, doc: ReturnType<typeof generateDocument>, count: number): Promise<number[]> {
  const latencies: number[] = [];
  const step = Math.max(1, Math.floor(doc.hovers.length / count));
  for (let i = 0; i < count; i++) {
    const position = doc.hovers[(i * step) % doc.hovers.length]!;
    const started = performance.now();
    await withTimeout(session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position }), 'hover');
    latencies.push(performance.now() - started);
  }
  return latencies;
}

export async function runServerBenchmark(options: ServerOptions, log: (line: string) => void): Promise<ServerResult> {
  statSync(SERVER); // fails early, with the path, when the server is not built
  const coldInitializeMs: number[] = [];
  const coldFirstDiagnosticsMs: number[] = [];
  const small = generateDocument(50);
  for (let i = 0; i < options.coldStarts; i++) {
    const started = performance.now();
    const { session, initializeMs } = await startSession({});
    const uri = `file:///bench/cold-${i}.wedge`;
    const arrived = session.diagnostics(uri, 1);
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: small.text },
    });
    await arrived;
    coldInitializeMs.push(initializeMs);
    coldFirstDiagnosticsMs.push(performance.now() - started);
    await stopSession(session);
  }
  log(`  cold start: initialize ${ms(median(coldInitializeMs))} ms, first diagnostics ${ms(median(coldFirstDiagnosticsMs))} ms`);

  const { session } = await startSession({});
  const { session: typingSession } = await startSession({ evaluateOn: 'type' });
  const idleMiB = residentMiB(session.process.pid);
  const documents: DocumentResult[] = [];
  for (const lines of options.sizes) {
    const doc = generateDocument(lines);
    const uri = `file:///bench/doc-${lines}.wedge`;
    const arrived = session.diagnostics(uri, 1);
    const started = performance.now();
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: doc.text },
    });
    await arrived;
    const openMs = performance.now() - started;
    const keystroke = await keystrokes(session, uri, doc, 1, options.keystrokes);
    const hover = await hovers(session, uri, doc, options.hovers);
    const memory = residentMiB(session.process.pid);
    await session.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });

    const typingArrived = typingSession.diagnostics(uri, 1);
    await typingSession.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: doc.text },
    });
    await typingArrived;
    const typing = await keystrokes(typingSession, uri, doc, 1, options.typingKeystrokes);
    await typingSession.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });

    documents.push({ lines: doc.text.split('\n').length - 1, openMs, keystroke, typing, hover, residentMiB: memory });
    log(`  ${lines} lines: open ${ms(openMs)} ms, keystroke p50 ${ms(median(keystroke))} ms, hover p50 ${ms(median(hover))} ms`);
  }
  await stopSession(session);
  await stopSession(typingSession);

  const bundles = readdirSync(join(process.cwd(), 'dist'))
    .filter((f) => f.endsWith('.cjs'))
    .map((file) => ({ file: `dist/${file}`, bytes: statSync(join(process.cwd(), 'dist', file)).size }));
  for (const file of readdirSync(process.cwd()).filter((f) => f.endsWith('.vsix'))) {
    bundles.push({ file, bytes: statSync(join(process.cwd(), file)).size });
  }
  return { coldInitializeMs, coldFirstDiagnosticsMs, idleMiB, documents, bundles };
}

export function serverTables(result: ServerResult): string {
  const latency = markdownTable(
    [
      'lines',
      'open → diagnostics (ms)',
      'keystroke → diagnostics p50 / p95 (ms)',
      'while typing (evaluateOn: type) p50 / p95 (ms)',
      'hover p50 / p95 (ms)',
      'resident memory (MiB)',
    ],
    result.documents.map((d) => [
      `${d.lines}`,
      ms(d.openMs),
      `${ms(percentile(d.keystroke, 0.5))} / ${ms(percentile(d.keystroke, 0.95))}`,
      `${ms(percentile(d.typing, 0.5))} / ${ms(percentile(d.typing, 0.95))}`,
      `${ms(percentile(d.hover, 0.5))} / ${ms(percentile(d.hover, 0.95))}`,
      d.residentMiB === undefined ? '–' : d.residentMiB.toFixed(0),
    ]),
  );
  const start = markdownTable(
    ['cold start', 'median (ms)', 'max (ms)'],
    [
      ['spawn → initialize answered', ms(median(result.coldInitializeMs)), ms(Math.max(...result.coldInitializeMs))],
      ['spawn → diagnostics of a 50-line file', ms(median(result.coldFirstDiagnosticsMs)), ms(Math.max(...result.coldFirstDiagnosticsMs))],
    ],
  );
  const sizes = markdownTable(
    ['bundle', 'size (KiB)'],
    result.bundles.map((b) => [b.file, (b.bytes / 1024).toFixed(0)]),
  );
  return [
    start,
    `Idle resident memory after start: ${result.idleMiB === undefined ? '–' : `${result.idleMiB.toFixed(0)} MiB`}.`,
    latency,
    sizes,
  ].join('\n\n');
}
