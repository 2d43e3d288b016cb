/**
 * The bundled language server, driven over stdio by a real JSON-RPC client
 * exactly as an editor would drive it.
 *
 * Tests whose name starts with [evaluator] state the final behaviour and need
 * the language layer's parser and evaluator; the others check the server's
 * own plumbing.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { fork } from 'node:child_process';
import { join } from 'node:path';
import {
  CodeLensRequest,
  createProtocolConnection,
  ExitNotification,
  InitializeRequest,
  IPCMessageReader,
  IPCMessageWriter,
  ShutdownRequest,
  DidChangeConfigurationNotification,
  DidChangeTextDocumentNotification,
  DidCloseTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  DiagnosticSeverity,
  HoverRequest,
  MarkupContent,
  TextDocumentSyncKind,
  type TextDocumentSyncOptions,
} from 'vscode-languageserver-protocol/node';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { positionAt, positionOf } from './text-positions.js';
import { startServerSession, type ServerSession } from './server-process.js';

// Two coordinate vectors of a 4-dimensional space span a plane: dim L = 2, so `claim dim L = 3` is
// false (common practice, no source: linearly independent vectors form a basis of their span).
const FALSE_CLAIM = [
  'space V dim 4',
  'vector p = (1, 0, 0, 0)',
  'vector q = (0, 1, 0, 0)',
  'subspace L = span(p, q)',
  'claim dim L = 3',
  '',
].join('\n');

let documentCounter = 0;
function freshUri(): string {
  documentCounter++;
  return `file:///wedgework-tests/sample-${documentCounter}.wedge`;
}

async function open(session: ServerSession, text: string, uri = freshUri()): Promise<string> {
  await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
    textDocument: { uri, languageId: 'wedge', version: 1, text },
  });
  return uri;
}

describe('language server over stdio, evaluating on save', { timeout: 30_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ normalization: 'primitive', evaluateOn: 'save' });
  });

  after(() => {
    session?.kill();
  });

  test('initialize announces incremental text sync with save, hovers and code lenses', () => {
    const { capabilities, serverInfo } = session.initializeResult;
    const sync = capabilities.textDocumentSync as TextDocumentSyncOptions;
    assert.equal(sync.openClose, true);
    assert.equal(sync.change, TextDocumentSyncKind.Incremental);
    assert.ok(sync.save, 'the server wants save notifications (it evaluates on save)');
    assert.equal(capabilities.hoverProvider, true);
    assert.ok(capabilities.codeLensProvider, 'code lenses are provided');
    assert.equal(serverInfo?.name, 'wedgework');
  });

  test('opening a document publishes diagnostics for its version, with settings read for that document', async () => {
    const uri = await open(session, FALSE_CLAIM);
    const published = await session.diagnostics.next(uri);
    assert.equal(published.version, 1);
    assert.ok(Array.isArray(published.diagnostics));
    assert.ok(
      session.configurationRequests.some((item) => item.section === 'wedgework' && item.scopeUri === uri),
      'the server asked for the wedgework section scoped to the document',
    );
  });

  test('[evaluator] a false claim about a dimension is an error with a claim/ code on its line', async () => {
    const uri = await open(session, FALSE_CLAIM);
    const { diagnostics } = await session.diagnostics.next(uri);
    const claimLine = positionOf(FALSE_CLAIM, 'claim dim L = 3').line;
    const claims = diagnostics.filter((d) => typeof d.code === 'string' && d.code.startsWith('claim/'));
    assert.equal(claims.length, 1, `diagnostics: ${JSON.stringify(diagnostics)}`);
    const [claim] = claims;
    assert.equal(claim!.severity, DiagnosticSeverity.Error);
    assert.equal(claim!.source, 'wedgework');
    assert.equal(claim!.range.start.line, claimLine);
    assert.equal(typeof claim!.message, 'string');
    assert.ok((claim!.message as string).length > 0);
    // Nothing else in the file is wrong.
    assert.deepEqual(
      diagnostics.filter((d) => d !== claim).map((d) => d.code),
      [],
    );
  });

  test('[evaluator] a syntax error is reported with a syntax/ code', async () => {
    const text = 'space V dim 4\nvector p = (1, 0, 0, 0\n';
    const uri = await open(session, text);
    const { diagnostics } = await session.diagnostics.next(uri);
    assert.ok(
      diagnostics.some((d) => typeof d.code === 'string' && d.code.startsWith('syntax/') && d.severity === DiagnosticSeverity.Error),
      `diagnostics: ${JSON.stringify(diagnostics)}`,
    );
  });

  test('[evaluator] hovering the name of a subspace shows markdown about its Plücker coordinates', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    const position = positionOf(FALSE_CLAIM, 'subspace L', 'subspace '.length);
    const hover = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position });
    assert.ok(hover, 'a hover is returned');
    assert.ok(MarkupContent.is(hover.contents), 'the hover is markup content');
    assert.equal(hover.contents.kind, 'markdown');
    assert.match(hover.contents.value, /Plücker/);
    assert.equal(hover.range?.start.line, position.line);
  });

  test('[evaluator] every declaration has a code lens that copies its LaTeX', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    const lenses = (await session.connection.sendRequest(CodeLensRequest.type, { textDocument: { uri } })) ?? [];
    for (const [name, declaration] of [
      ['p', 'vector p'],
      ['q', 'vector q'],
      ['L', 'subspace L'],
    ] as const) {
      const line = positionOf(FALSE_CLAIM, declaration).line;
      const lens = lenses.find((l) => l.command?.arguments?.[1] === name);
      assert.ok(lens, `a lens for ${name} among ${JSON.stringify(lenses)}`);
      assert.equal(lens.range.start.line, line);
      assert.equal(lens.command?.command, 'wedgework.copyLatex');
      assert.ok((lens.command?.title ?? '').length > 0, 'the lens has a summary as its title');
      const latex: unknown = lens.command?.arguments?.[0];
      assert.equal(typeof latex, 'string');
      assert.ok((latex as string).length > 0);
    }
  });

  test('a change is answered with diagnostics for the new version before any save', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    const end = positionAt(FALSE_CLAIM, FALSE_CLAIM.length);
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: end, end }, text: 'show dim L\n' }],
    });
    const published = await session.diagnostics.next(uri);
    assert.equal(published.version, 2);
  });

  test('[evaluator] while typing, a new syntax error shows at once and the failed claim stays marked until save', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    // Append an unfinished statement below the claim; the claim's own text is untouched.
    const end = positionAt(FALSE_CLAIM, FALSE_CLAIM.length);
    const edited = `${FALSE_CLAIM}subspace M = span(p, q\n`;
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: end, end }, text: 'subspace M = span(p, q\n' }],
    });
    const whileTyping = await session.diagnostics.next(uri);
    assert.equal(whileTyping.version, 2);
    const codes = whileTyping.diagnostics.map((d) => String(d.code));
    assert.ok(codes.some((c) => c.startsWith('syntax/')), `codes while typing: ${codes.join(', ')}`);
    const claim = whileTyping.diagnostics.find((d) => String(d.code).startsWith('claim/'));
    assert.ok(claim, `the failed claim is still shown while typing: ${codes.join(', ')}`);
    assert.equal(claim.range.start.line, positionOf(edited, 'claim dim L = 3').line);

    await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
    const afterSave = await session.diagnostics.next(uri);
    assert.equal(afterSave.version, 2);
    const savedCodes = afterSave.diagnostics.map((d) => String(d.code));
    assert.ok(savedCodes.some((c) => c.startsWith('syntax/')), `codes after save: ${savedCodes.join(', ')}`);
    assert.ok(savedCodes.some((c) => c.startsWith('claim/')), `codes after save: ${savedCodes.join(', ')}`);
  });

  test('hover and code lens requests for a document that is not open answer empty', async () => {
    const textDocument = { uri: 'file:///wedgework-tests/never-opened.wedge' };
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument,
      position: { line: 0, character: 0 },
    });
    assert.equal(hover, null);
    const lenses = await session.connection.sendRequest(CodeLensRequest.type, { textDocument });
    assert.deepEqual(lenses, []);
  });

  test('a hover far outside the text answers without failing', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    const hover = await session.connection.sendRequest(HoverRequest.type, {
      textDocument: { uri },
      position: { line: 999, character: 999 },
    });
    assert.equal(hover, null);
  });

  test('a configuration change evaluates open documents again with the new settings', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    const asked = session.configurationRequests.length;
    session.settings = { normalization: 'raw', evaluateOn: 'save' };
    await session.connection.sendNotification(DidChangeConfigurationNotification.type, { settings: null });
    const published = await session.diagnostics.next(uri);
    assert.equal(published.version, 1);
    assert.ok(session.configurationRequests.length > asked, 'the settings were read again');
  });

  test('closing a document clears its diagnostics', async () => {
    const uri = await open(session, FALSE_CLAIM);
    await session.diagnostics.next(uri);
    await session.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
    const published = await session.diagnostics.next(uri);
    assert.deepEqual(published.diagnostics, []);
  });

  test('shutdown then exit ends the server with status 0', async () => {
    const code = await session.shutdown();
    assert.equal(code, 0, `server stderr: ${session.stderr()}`);
  });
});

describe('language server over stdio, evaluating while typing', { timeout: 30_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ normalization: 'primitive', evaluateOn: 'type' });
  });

  after(() => {
    session?.kill();
  });

  // The same plane as above; first the true claim dim L = 2, then it is edited to the false dim L = 3.
  const TRUE_CLAIM = FALSE_CLAIM.replace('claim dim L = 3', 'claim dim L = 2');

  test('a change is evaluated without a save', async () => {
    const uri = await open(session, TRUE_CLAIM);
    await session.diagnostics.next(uri);
    const digit = positionOf(TRUE_CLAIM, 'claim dim L = 2', 'claim dim L = '.length);
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: digit, end: { line: digit.line, character: digit.character + 1 } }, text: '3' }],
    });
    const published = await session.diagnostics.next(uri);
    assert.equal(published.version, 2);
  });

  test('[evaluator] editing a true claim into a false one marks it while typing', async () => {
    const uri = await open(session, TRUE_CLAIM);
    const opened = await session.diagnostics.next(uri);
    assert.deepEqual(opened.diagnostics, [], 'the true claim holds');
    const digit = positionOf(TRUE_CLAIM, 'claim dim L = 2', 'claim dim L = '.length);
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: digit, end: { line: digit.line, character: digit.character + 1 } }, text: '3' }],
    });
    const published = await session.diagnostics.next(uri);
    assert.equal(published.version, 2);
    assert.ok(
      published.diagnostics.some((d) => String(d.code).startsWith('claim/') && d.range.start.line === digit.line),
      `diagnostics: ${JSON.stringify(published.diagnostics)}`,
    );
  });

  test('shutdown then exit ends the server with status 0', async () => {
    assert.equal(await session.shutdown(), 0, `server stderr: ${session.stderr()}`);
  });
});

describe('language server over Node IPC, as the editor starts it', { timeout: 30_000 }, () => {
  before(() => assertBundleIsFresh('dist/server.cjs', ['server/src']));

  // The editor's client forks the server with `--node-ipc`; a plain fork (no flag) must work the same.
  for (const args of [['--node-ipc'], []]) {
    test(`initializes and shuts down cleanly when forked with [${args.join(' ')}]`, async () => {
      const child = fork(join(ROOT, 'dist/server.cjs'), args, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe', 'ipc'] });
      const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
      const connection = createProtocolConnection(new IPCMessageReader(child), new IPCMessageWriter(child));
      connection.listen();
      try {
        const result = await connection.sendRequest(InitializeRequest.type, {
          processId: process.pid,
          rootUri: null,
          workspaceFolders: null,
          capabilities: {},
        });
        assert.equal(result.capabilities.hoverProvider, true);
        await connection.sendRequest(ShutdownRequest.type);
        await connection.sendNotification(ExitNotification.type);
        assert.equal(await exited, 0);
      } finally {
        connection.dispose();
        if (child.exitCode === null && child.signalCode === null) child.kill();
      }
    });
  }
});
