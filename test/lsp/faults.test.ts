/**
 * The server under faults, through its real process: malformed JSON-RPC, unknown methods, requests about
 * documents that are not open, and a request whose handler fails. Each time the server answers (an error
 * or an empty result), logs what failed when something did, and keeps serving. The rules are the
 * Language Server Protocol's own (its specification: unknown requests get the MethodNotFound error
 * −32601, unknown notifications are ignored) and the project's (a failing handler answers empty and logs).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import {
  CodeActionRequest,
  CodeLensRequest,
  CompletionRequest,
  DocumentFormattingRequest,
  DocumentSymbolRequest,
  FoldingRangeRequest,
  HoverRequest,
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  DidCloseTextDocumentNotification,
  PrepareRenameRequest,
  ReferencesRequest,
  RenameRequest,
  SemanticTokensRequest,
  SignatureHelpRequest,
  DefinitionRequest,
  ErrorCodes,
  ResponseError,
} from 'vscode-languageserver-protocol/node';
import { assertBundleIsFresh } from '../support/bundles.js';
import { startServerSession, type ServerSession } from './server-process.js';

const TEXT = 'space V dim 3\nvector p = (1, 2, 3)\nsubspace L = span(p, e1)\nclaim dim L = 2\n';
let serial = 0;
const freshUri = () => `file:///faults/doc-${++serial}.wedge`;

async function openDocument(session: ServerSession, text = TEXT): Promise<string> {
  const uri = freshUri();
  await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
    textDocument: { uri, languageId: 'wedge', version: 1, text },
  });
  await session.diagnostics.next(uri);
  return uri;
}

/** The server still answers: a hover over `p` of a freshly opened document shows its coordinates. */
async function assertStillServing(session: ServerSession): Promise<void> {
  const uri = await openDocument(session);
  const hover = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line: 1, character: 7 } });
  assert.ok(hover && JSON.stringify(hover.contents).includes('vector p'), `the server answers a hover; it answered ${JSON.stringify(hover)}`);
}

/** A raw message on the server's standard input, framed as the protocol frames messages. */
function writeRaw(session: ServerSession, body: string): void {
  session.child.stdin.write(`Content-Length: ${Buffer.byteLength(body, 'utf8')}\r\n\r\n${body}`);
}

describe('the server under faults', { timeout: 60_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({});
  });

  after(() => session?.kill());

  test('a message that is not JSON, and JSON that is no JSON-RPC message, leave the server serving', async () => {
    writeRaw(session, '{ this is not json');
    writeRaw(session, '[1, 2, 3]');
    writeRaw(session, '{"jsonrpc": "2.0", "id": 991, "method": 42}');
    writeRaw(session, '"just a string"');
    await assertStillServing(session);
    assert.equal(session.child.exitCode, null, 'the process is alive');
  });

  test('an unknown request gets MethodNotFound, an unknown notification is ignored', async () => {
    await session.connection.sendNotification('wedgework/no-such-notification', { x: 1 });
    await assert.rejects(
      session.connection.sendRequest('wedgework/no-such-request', { x: 1 }),
      (error: unknown) => error instanceof ResponseError && error.code === ErrorCodes.MethodNotFound,
    );
    await assertStillServing(session);
  });

  test('requests about a document that is not open (or was closed) answer empty', async () => {
    const uri = await openDocument(session);
    await session.connection.sendNotification(DidCloseTextDocumentNotification.type, { textDocument: { uri } });
    const textDocument = { uri };
    const position = { line: 1, character: 7 };
    const range = { start: { line: 0, character: 0 }, end: { line: 1, character: 0 } };
    const answers = await Promise.all([
      session.connection.sendRequest(HoverRequest.type, { textDocument, position }),
      session.connection.sendRequest(CodeLensRequest.type, { textDocument }),
      session.connection.sendRequest(CompletionRequest.type, { textDocument, position }),
      session.connection.sendRequest(SignatureHelpRequest.type, { textDocument, position }),
      session.connection.sendRequest(DefinitionRequest.type, { textDocument, position }),
      session.connection.sendRequest(ReferencesRequest.type, { textDocument, position, context: { includeDeclaration: true } }),
      session.connection.sendRequest(PrepareRenameRequest.type, { textDocument, position }),
      session.connection.sendRequest(RenameRequest.type, { textDocument, position, newName: 'q' }),
      session.connection.sendRequest(DocumentSymbolRequest.type, { textDocument }),
      session.connection.sendRequest(SemanticTokensRequest.type, { textDocument }),
      session.connection.sendRequest(FoldingRangeRequest.type, { textDocument }),
      session.connection.sendRequest(DocumentFormattingRequest.type, { textDocument, options: { tabSize: 2, insertSpaces: true } }),
      session.connection.sendRequest(CodeActionRequest.type, { textDocument, range, context: { diagnostics: [] } }),
    ]);
    for (const answer of answers) {
      const empty =
        answer === null ||
        (Array.isArray(answer) && answer.length === 0) ||
        (typeof answer === 'object' && answer !== null && 'data' in answer && (answer as { data: unknown[] }).data.length === 0) ||
        (typeof answer === 'object' && answer !== null && 'items' in answer && (answer as { items: unknown[] }).items.length === 0);
      assert.ok(empty, `an empty answer, got ${JSON.stringify(answer)}`);
    }
    // Changes and saves of a document that is not open are ignored.
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ text: 'vector q = (1)' }],
    });
    await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
    await assertStillServing(session);
  });

  test('a request whose handler fails is answered empty, the failure is logged, and the server serves on', async () => {
    const from = session.notifications.count;
    // Parameters of the wrong shape make the hover handler itself throw.
    const answer = await session.connection.sendRequest(HoverRequest.type, { textDocument: null, position: 'nowhere' } as never);
    assert.equal(answer, null);
    const logged = await session.notifications.waitFor(
      (n) => n.method === 'window/logMessage' && String(n.params?.message).includes('answering a hover failed'),
      from,
    );
    assert.match(String(logged.params.message), /Wedgework: answering a hover failed/);
    await assertStillServing(session);
  });
});
