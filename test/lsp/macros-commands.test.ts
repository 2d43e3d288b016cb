/**
 * The editor's LaTeX macros commands over stdio (docs/latex-macros.md): the bundled server answers the
 * macro references of the statement at the cursor, and the text of the macros file of an open document,
 * which must be the file `wedgework export --tex` writes for the same text — the committed export of the
 * sample paper is that file, and the sync test of the CLI keeps it so.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { DidChangeTextDocumentNotification, DidOpenTextDocumentNotification, ExecuteCommandRequest } from 'vscode-languageserver-protocol/node';
import { EXPORT_MACROS_COMMAND, MACRO_REFERENCES_COMMAND, type MacrosExport } from '../../server/src/lsp/macros-commands.js';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { startServerSession, type ServerSession } from './server-process.js';

const SAMPLE = join(ROOT, 'samples/paper-planes-in-five-space');
const TEXT = readFileSync(join(SAMPLE, 'computation.wedge'), 'utf8');
const COMMITTED_EXPORT = readFileSync(join(SAMPLE, 'results.tex'), 'utf8');

describe('the macros commands over stdio', { timeout: 60_000 }, () => {
  let session: ServerSession;
  const uri = 'file:///wedgework-tests/paper/computation.wedge';

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ normalization: 'primitive', evaluateOn: 'type' });
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: TEXT },
    });
  });

  after(() => {
    session?.kill();
  });

  async function references(text: string, needle: string): Promise<string[]> {
    const offset = text.indexOf(needle);
    assert.ok(offset >= 0, needle);
    return (await session.connection.sendRequest(ExecuteCommandRequest.type, { command: MACRO_REFERENCES_COMMAND, arguments: [uri, offset + 1] })) as string[];
  }

  test('the macro references of a statement, the main macro first', async () => {
    assert.deepEqual(await references(TEXT, 'subspace W'), ['\\wwW', '\\wwWDim', '\\wwWBasis', '\\wwWPlucker']);
    assert.deepEqual(await references(TEXT, 'show chart(W, 12)'), ['\\wwChartWOneTwo']);
    assert.deepEqual(await references(TEXT, 'claim dim M = 1'), ['\\wwClaimDimMOne', '\\wwClaimDimMOneVerdict']);
    assert.deepEqual(await references(TEXT, '# The two planes'), []);
  });

  test('the export of the open document is the file the command line writes', async () => {
    const exported = (await session.connection.sendRequest(ExecuteCommandRequest.type, {
      command: EXPORT_MACROS_COMMAND,
      arguments: [uri, 'computation.wedge', 'results.tex', 'primitive'],
    })) as MacrosExport;
    assert.deepEqual(exported.problems, []);
    assert.equal(exported.errors, 0);
    assert.equal(exported.text, COMMITTED_EXPORT);
    assert.equal(exported.macros, (COMMITTED_EXPORT.match(/^\\newcommand/gm) ?? []).length);
  });

  test('after an edit, both answer for the new text: a renamed subspace, a changed hash', async () => {
    const edited = TEXT.replace('subspace W = span(a, b)', 'subspace Wide = span(a, b)').replace(/\bW\b/g, 'Wide');
    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ text: edited }],
    });
    assert.deepEqual((await references(edited, 'subspace Wide')).slice(0, 2), ['\\wwWide', '\\wwWideDim']);
    const exported = (await session.connection.sendRequest(ExecuteCommandRequest.type, {
      command: EXPORT_MACROS_COMMAND,
      arguments: [uri, 'computation.wedge', 'results.tex', 'primitive'],
    })) as MacrosExport;
    assert.notEqual(exported.text, COMMITTED_EXPORT);
    assert.ok(exported.text.includes('\\newcommand{\\wwWideDim}{\\ensuremath{2}}'));
    assert.ok(!/\\newcommand\{\\wwW\}/.test(exported.text), 'the old name is gone');
  });

  test('a document that is not open: no references and no export', async () => {
    const none = 'file:///wedgework-tests/paper/absent.wedge';
    assert.deepEqual(await session.connection.sendRequest(ExecuteCommandRequest.type, { command: MACRO_REFERENCES_COMMAND, arguments: [none, 0] }), []);
    assert.equal(await session.connection.sendRequest(ExecuteCommandRequest.type, { command: EXPORT_MACROS_COMMAND, arguments: [none, 'a.wedge', 'a.tex'] }), null);
  });
});
