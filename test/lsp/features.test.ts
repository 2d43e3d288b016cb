/**
 * The editor features over the protocol: the bundled server driven over stdio
 * by a JSON-RPC client, one request per feature, checked against the
 * protocol's own definitions (LSP 3.17 specification: the relative encoding of
 * semantic tokens, 0-based lines and UTF-16 characters, folding ranges by
 * line, a refused prepareRename answered with an error).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import {
  CompletionRequest,
  CompletionTriggerKind,
  DefinitionRequest,
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DocumentFormattingRequest,
  DocumentSymbolRequest,
  FoldingRangeRequest,
  InsertTextFormat,
  PrepareRenameRequest,
  ReferencesRequest,
  RenameRequest,
  SemanticTokensRequest,
  SignatureHelpRequest,
  type CompletionItem,
  type CompletionList,
  type DocumentSymbol,
  type Location,
  type SemanticTokensLegend,
  type TextEdit,
} from 'vscode-languageserver-protocol/node';
import { assertBundleIsFresh } from '../support/bundles.js';
import { positionAt, positionOf } from './text-positions.js';
import { startServerSession, type ServerSession } from './server-process.js';

const TEXT = [
  '# A plane and a line in a 4-space.', // 0
  '# (a scenario of our own)', // 1
  'space V dim 4', // 2
  'vector p = (1, 0, 0, 0)', // 3
  'subspace L = rows [ 1 0 0 0', // 4
  '                    0 1 0 0 ]', // 5
  'claim p in L', // 6
  'show chart(L, 12)', // 7
  '',
].join('\n');

let counter = 0;
async function open(session: ServerSession, text: string): Promise<string> {
  counter++;
  const uri = `file:///wedgework-tests/features-${counter}.wedge`;
  await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
    textDocument: { uri, languageId: 'wedge', version: 1, text },
  });
  return uri;
}

function itemsOf(result: CompletionItem[] | CompletionList | null): CompletionItem[] {
  if (!result) return [];
  return Array.isArray(result) ? result : result.items;
}

describe('editor features over stdio', { timeout: 30_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ evaluateOn: 'save' });
  });

  after(() => {
    session?.kill();
  });

  test('initialize announces every feature, with a semantic tokens legend', () => {
    const c = session.initializeResult.capabilities;
    assert.ok(c.completionProvider?.triggerCharacters?.includes('.'));
    assert.ok(c.signatureHelpProvider?.triggerCharacters?.includes('('));
    assert.equal(c.definitionProvider, true);
    assert.equal(c.referencesProvider, true);
    assert.deepEqual(c.renameProvider, { prepareProvider: true });
    assert.equal(c.documentSymbolProvider, true);
    assert.equal(c.foldingRangeProvider, true);
    assert.equal(c.documentFormattingProvider, true);
    const legend = (c.semanticTokensProvider as { legend: SemanticTokensLegend }).legend;
    assert.ok(legend.tokenTypes.includes('type') && legend.tokenTypes.includes('enumMember'));
    assert.ok(legend.tokenModifiers.includes('declaration'));
  });

  test('completion answers the text as just typed, with ranges and snippets', async () => {
    const uri = await open(session, 'space V dim 4\n');
    // Typed after opening; the server has had no time for a quick pass of its own.
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ range: { start: { line: 1, character: 0 }, end: { line: 1, character: 0 } }, text: 'show pl' }],
    });
    const items = itemsOf(
      await session.connection.sendRequest(CompletionRequest.type, {
        textDocument: { uri },
        position: { line: 1, character: 7 },
        context: { triggerKind: CompletionTriggerKind.Invoked },
      }),
    );
    const plucker = items.find((i) => i.label === 'plucker');
    assert.ok(plucker, items.map((i) => i.label).join(' '));
    assert.equal(plucker.detail, 'plucker(W)');
    assert.equal(plucker.insertTextFormat, InsertTextFormat.Snippet);
    assert.deepEqual(plucker.textEdit, {
      range: { start: { line: 1, character: 5 }, end: { line: 1, character: 7 } },
      newText: 'plucker($0)',
    });
    assert.ok(items.some((i) => i.label === 'e4' && i.detail === 'basis vector of V'));
  });

  test('completion after a typed space offers the fixed words only, as an incomplete list', async () => {
    const uri = await open(session, 'convention \n');
    const answer = await session.connection.sendRequest(CompletionRequest.type, {
      textDocument: { uri },
      position: { line: 0, character: 11 },
      context: { triggerKind: CompletionTriggerKind.TriggerCharacter, triggerCharacter: ' ' },
    });
    // Incomplete: the editor asks again on the next letter rather than filtering this short list.
    assert.ok(answer && !Array.isArray(answer) && answer.isIncomplete === true);
    const items = itemsOf(answer);
    assert.ok(items.map((i) => i.label).includes('order'));
    assert.ok(!items.some((i) => i.label === 'span'));
  });

  test('completion uses the workspace labels: with labels from 0 the basis is e0 …', async () => {
    const zero = await startServerSession({ firstLabel: 0 });
    try {
      const uri = await open(zero, 'space V dim 2\nshow \n');
      const items = itemsOf(
        await zero.connection.sendRequest(CompletionRequest.type, { textDocument: { uri }, position: { line: 1, character: 5 } }),
      );
      assert.ok(items.some((i) => i.label === 'e0'), items.map((i) => i.label).join(' '));
      assert.ok(!items.some((i) => i.label === 'e2'));
    } finally {
      zero.kill();
    }
  });

  test('signature help names the parameter under the cursor', async () => {
    const uri = await open(session, TEXT);
    const help = await session.connection.sendRequest(SignatureHelpRequest.type, {
      textDocument: { uri },
      position: positionOf(TEXT, 'chart(L, 12)', 'chart(L, '.length),
    });
    assert.ok(help);
    const signature = help.signatures[help.activeSignature ?? 0]!;
    assert.equal(signature.label, 'chart(W, I)');
    const [start, end] = signature.parameters![help.activeParameter ?? 0]!.label as [number, number];
    assert.equal(signature.label.slice(start, end), 'I');
  });

  test('go to definition leads from a use to the declaration', async () => {
    const uri = await open(session, TEXT);
    const location = (await session.connection.sendRequest(DefinitionRequest.type, {
      textDocument: { uri },
      position: positionOf(TEXT, 'claim p', 'claim '.length),
    })) as Location;
    assert.deepEqual(location, { uri, range: { start: positionOf(TEXT, 'vector p', 7), end: positionOf(TEXT, 'vector p', 8) } });
  });

  test('references list the declaration and every use', async () => {
    const uri = await open(session, TEXT);
    const locations = await session.connection.sendRequest(ReferencesRequest.type, {
      textDocument: { uri },
      position: positionOf(TEXT, 'L =', 0),
      context: { includeDeclaration: true },
    });
    assert.deepEqual(
      locations!.map((l) => l.range.start),
      [positionOf(TEXT, 'L =', 0), positionOf(TEXT, 'in L', 3), positionOf(TEXT, 'chart(L', 6)],
    );
  });

  test('rename edits the declaration and the uses; prepareRename refuses a default basis name with a reason', async () => {
    const text = 'space V dim 4\nvector p = e1\nshow p\n';
    const uri = await open(session, text);
    const prepared = await session.connection.sendRequest(PrepareRenameRequest.type, {
      textDocument: { uri },
      position: positionOf(text, 'show p', 5),
    });
    assert.deepEqual(prepared, { range: { start: { line: 2, character: 5 }, end: { line: 2, character: 6 } }, placeholder: 'p' });
    const edit = await session.connection.sendRequest(RenameRequest.type, {
      textDocument: { uri },
      position: positionOf(text, 'show p', 5),
      newName: 'q',
    });
    assert.deepEqual(edit?.changes?.[uri]?.map((e) => [e.range.start, e.newText]), [
      [{ line: 1, character: 7 }, 'q'],
      [{ line: 2, character: 5 }, 'q'],
    ]);
    await assert.rejects(
      session.connection.sendRequest(PrepareRenameRequest.type, { textDocument: { uri }, position: positionOf(text, 'e1', 1) }),
      (error: Error) => /default basis name/.test(error.message),
    );
    await assert.rejects(
      session.connection.sendRequest(RenameRequest.type, { textDocument: { uri }, position: positionOf(text, 'show p', 5), newName: 'dim' }),
      (error: Error) => /keyword/.test(error.message),
    );
  });

  test('document symbols: the outline with ranges and selection ranges', async () => {
    const uri = await open(session, TEXT);
    const symbols = (await session.connection.sendRequest(DocumentSymbolRequest.type, { textDocument: { uri } })) as DocumentSymbol[];
    assert.deepEqual(
      symbols.map((s) => s.name),
      ['V', 'p', 'L', 'p in L', 'chart(L, 12)'],
    );
    const L = symbols[2]!;
    assert.deepEqual(L.range, { start: { line: 4, character: 0 }, end: { line: 5, character: 29 } });
    assert.deepEqual(L.selectionRange, { start: { line: 4, character: 9 }, end: { line: 4, character: 10 } });
  });

  test('semantic tokens decode, by the relative encoding, to the names with their types', async () => {
    const text = 'space V dim 2\nvector p = e1 + V.e2\n';
    const uri = await open(session, text);
    const legend = (session.initializeResult.capabilities.semanticTokensProvider as { legend: SemanticTokensLegend }).legend;
    const tokens = await session.connection.sendRequest(SemanticTokensRequest.type, { textDocument: { uri } });
    assert.ok(tokens);
    const { data } = tokens;
    assert.equal(data.length % 5, 0);
    const lines = text.split('\n');
    const decoded: string[] = [];
    let line = 0;
    let character = 0;
    for (let i = 0; i < data.length; i += 5) {
      const [deltaLine, deltaStart, length, type, modifiers] = data.slice(i, i + 5) as [number, number, number, number, number];
      line += deltaLine;
      character = deltaLine === 0 ? character + deltaStart : deltaStart;
      const names = legend.tokenModifiers.filter((_, bit) => (modifiers & (1 << bit)) !== 0);
      decoded.push(`${lines[line]!.slice(character, character + length)}:${legend.tokenTypes[type]}${names.map((m) => `+${m}`).join('')}`);
    }
    assert.deepEqual(decoded, [
      'V:type+declaration',
      'p:variable+declaration+vector',
      'e1:enumMember+defaultLibrary',
      'V:type',
      'e2:enumMember+defaultLibrary',
    ]);
  });

  test('folding ranges: the comment block and the matrix statement, by line', async () => {
    const uri = await open(session, TEXT);
    const folds = await session.connection.sendRequest(FoldingRangeRequest.type, { textDocument: { uri } });
    assert.deepEqual(
      folds!.map((f) => [f.startLine, f.endLine, f.kind]),
      [
        [0, 1, 'comment'],
        [4, 5, 'region'],
      ],
    );
  });

  test('formatting returns the edits of the changed lines only, and none for a syntax error', async () => {
    const text = 'space V dim 4\nvector p=(1,0,0,0)\nshow p\n';
    const uri = await open(session, text);
    const edits = (await session.connection.sendRequest(DocumentFormattingRequest.type, {
      textDocument: { uri },
      options: { tabSize: 2, insertSpaces: true },
    })) as TextEdit[];
    assert.deepEqual(edits, [
      { range: { start: { line: 1, character: 0 }, end: { line: 2, character: 0 } }, newText: 'vector p = (1, 0, 0, 0)\n' },
    ]);
    const broken = await open(session, 'space V dim 4\nvector p=(1,0,0\n');
    assert.deepEqual(
      await session.connection.sendRequest(DocumentFormattingRequest.type, {
        textDocument: { uri: broken },
        options: { tabSize: 2, insertSpaces: true },
      }),
      [],
    );
  });
});
