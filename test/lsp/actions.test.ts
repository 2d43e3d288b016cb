/**
 * Code actions and the LaTeX export over LSP: first the translation itself
 * (./actions.ts on an analysis, no process), then the bundled server driven
 * over stdio — a quick fix applied as an editor applies it removes the
 * problem after the next save, and the export command answers the fragment.
 *
 * Dimension facts are common practice (no source): two independent vectors
 * span a plane; p + q lies in span(p, q).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TextDocument } from 'vscode-languageserver-textdocument';
import {
  CodeActionKind,
  CodeActionRequest,
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  ExecuteCommandRequest,
  type CodeAction,
  type PublishDiagnosticsParams,
  type Range,
} from 'vscode-languageserver-protocol/node';
import { analyze } from '../../server/src/language/index.js';
import { ACTION_CAPABILITIES, codeActionsFor, EXPORT_LATEX_COMMAND, fileNameOfUri, type LatexExport } from '../../server/src/lsp/actions.js';
import { MACRO_COMMANDS } from '../../server/src/lsp/macros-commands.js';
import { SERVER_CAPABILITIES } from '../../server/src/lsp/server.js';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { startServerSession, type ServerSession } from './server-process.js';

const TEXT = [
  'space V dim 4',
  'vector p = (1, 0, 0, 0)',
  'vector q = (0, 1, 0, 0)',
  'subspace L = span(p, q, p + q)',
  'claim dim L = 3',
  '',
].join('\n');

function rangeOf(text: string, needle: string): Range {
  const document = TextDocument.create('file:///x.wedge', 'wedge', 1, text);
  const at = text.indexOf(needle);
  assert.ok(at >= 0, needle);
  return { start: document.positionAt(at), end: document.positionAt(at + needle.length) };
}

/** The text after the action's edit, applied as an editor applies a workspace edit. */
function applied(text: string, uri: string, action: CodeAction): string {
  const edits = action.edit?.changes?.[uri];
  assert.ok(edits && edits.length > 0, `the action ${action.title} carries edits for the document`);
  return TextDocument.applyEdits(TextDocument.create(uri, 'wedge', 1, text), edits);
}

describe('code actions from an analysis', () => {
  const uri = 'file:///work/planes.wedge';
  const document = TextDocument.create(uri, 'wedge', 1, TEXT);
  const analysis = analyze(TEXT, { evaluate: true });

  test('a false claim has a preferred quick fix with its diagnostic; the claim holds after it', () => {
    const actions = codeActionsFor({ document, analysis, current: true }, rangeOf(TEXT, 'claim dim L = 3'));
    const fix = actions.find((a) => a.kind === CodeActionKind.QuickFix);
    assert.ok(fix, JSON.stringify(actions));
    assert.equal(fix.isPreferred, true);
    assert.equal(fix.diagnostics?.[0]?.code, 'claim/dimension');
    const text = applied(TEXT, uri, fix);
    assert.equal(text, TEXT.replace('claim dim L = 3', 'claim dim L = 2'));
    assert.ok(!analyze(text, { evaluate: true }).problems.some((p) => p.code === 'claim/dimension'));
  });

  test('a dependent vector: the fix drops it from the span', () => {
    const actions = codeActionsFor({ document, analysis, current: true }, rangeOf(TEXT, 'p + q'));
    const fix = actions.find((a) => a.kind === CodeActionKind.QuickFix && a.diagnostics?.[0]?.code === 'math/degenerate-span');
    assert.ok(fix);
    assert.equal(applied(TEXT, uri, fix), TEXT.replace('span(p, q, p + q)', 'span(p, q)'));
  });

  test('on a declared name: a refactoring that adds its show line', () => {
    const range = rangeOf(TEXT, 'L =');
    const actions = codeActionsFor({ document, analysis, current: true }, { start: range.start, end: range.start });
    const show = actions.find((a) => a.kind === CodeActionKind.Refactor);
    assert.ok(show);
    assert.equal(applied(TEXT, uri, show), TEXT.replace('span(p, q, p + q)\n', 'span(p, q, p + q)\nshow plucker(L)\n'));
  });

  test('no problem fixes from an evaluation carried through later edits; `only` filters by kind', () => {
    const range = rangeOf(TEXT, 'claim dim L = 3');
    assert.equal(codeActionsFor({ document, analysis, current: false }, range).filter((a) => a.kind === CodeActionKind.QuickFix).length, 0);
    const onName = rangeOf(TEXT, 'L =');
    assert.equal(codeActionsFor({ document, analysis, current: true }, onName, [CodeActionKind.QuickFix]).filter((a) => a.kind === CodeActionKind.Refactor).length, 0);
    assert.equal(codeActionsFor({ document, analysis, current: true }, onName, [CodeActionKind.Refactor]).filter((a) => a.kind === CodeActionKind.Refactor).length, 1);
    // An analysis of another text answers nothing.
    const other = TextDocument.create(uri, 'wedge', 2, `${TEXT}# more\n`);
    assert.deepEqual(codeActionsFor({ document: other, analysis, current: true }, range), []);
  });

  test('the server announces code actions and the export command', () => {
    assert.deepEqual(SERVER_CAPABILITIES.codeActionProvider, ACTION_CAPABILITIES.codeActionProvider);
    assert.deepEqual(SERVER_CAPABILITIES.executeCommandProvider?.commands, [EXPORT_LATEX_COMMAND, ...MACRO_COMMANDS]);
    assert.equal(fileNameOfUri('file:///a/b/three%20planes.wedge'), 'three planes.wedge');
  });

  test('the client asks for the same server command, under a client command of its own', () => {
    const client = readFileSync(join(ROOT, 'client/src/export-latex.ts'), 'utf8');
    assert.ok(client.includes(`'${EXPORT_LATEX_COMMAND}'`));
    const manifest = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8'));
    const commands = manifest.contributes.commands.map((c: { command: string }) => c.command);
    assert.ok(commands.includes('wedgework.exportLatex'));
    assert.ok(!commands.includes(EXPORT_LATEX_COMMAND), 'the server command is not a palette command');
  });
});

describe('code actions and the export over stdio', { timeout: 30_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ normalization: 'primitive', evaluateOn: 'save' });
  });

  after(() => {
    session?.kill();
  });

  /** The next diagnostics for `uri` that satisfy `done` (earlier ones, e.g. of a quick pass, are skipped). */
  async function diagnosticsUntil(uri: string, done: (p: PublishDiagnosticsParams) => boolean): Promise<PublishDiagnosticsParams> {
    for (;;) {
      const published = await session.diagnostics.next(uri);
      if (done(published)) return published;
    }
  }

  test('[evaluator] a quick fix, applied and saved, removes the false claim; the export answers the fragment', async () => {
    const uri = 'file:///wedgework-tests/actions/planes.wedge';
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: TEXT },
    });
    const first = await diagnosticsUntil(uri, (p) => p.diagnostics.some((d) => d.code === 'claim/dimension'));
    const claim = first.diagnostics.find((d) => d.code === 'claim/dimension')!;
    const actions = (await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range: claim.range,
      context: { diagnostics: [claim] },
    })) as CodeAction[];
    const fix = actions.find((a) => a.kind === CodeActionKind.QuickFix);
    assert.ok(fix, JSON.stringify(actions));
    const fixed = applied(TEXT, uri, fix);

    const exported = (await session.connection.sendRequest(ExecuteCommandRequest.type, { command: EXPORT_LATEX_COMMAND, arguments: [uri] })) as LatexExport;
    assert.equal(exported.fileName, 'planes.wedge');
    assert.match(exported.latex, /^% Wedgework results of planes\.wedge\n% Convention: field QQ/);
    assert.match(exported.latex, /\\texttt\{dim L = 3\} is false\./);
    assert.ok(exported.errors >= 1);

    await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 2 },
      contentChanges: [{ text: fixed }],
    });
    // Until the next evaluation the old fix's offsets no longer apply: it is withheld.
    const stale = (await session.connection.sendRequest(CodeActionRequest.type, {
      textDocument: { uri },
      range: claim.range,
      context: { diagnostics: [] },
    })) as CodeAction[];
    assert.equal(stale.filter((a) => a.kind === CodeActionKind.QuickFix && a.diagnostics?.[0]?.code === 'claim/dimension').length, 0);

    await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
    const saved = await diagnosticsUntil(uri, (p) => p.version === 2 && !p.diagnostics.some((d) => d.code === 'claim/dimension' || String(d.code).startsWith('syntax/')));
    assert.deepEqual(saved.diagnostics.map((d) => d.code), ['math/degenerate-span']);

    const after = (await session.connection.sendRequest(ExecuteCommandRequest.type, { command: EXPORT_LATEX_COMMAND, arguments: [uri] })) as LatexExport;
    assert.match(after.latex, /\\texttt\{dim L = 2\} holds\./);
  });

  test('an unknown command or document is answered with null', async () => {
    assert.equal(await session.connection.sendRequest(ExecuteCommandRequest.type, { command: 'wedgework.nothing', arguments: [] }), null);
    assert.equal(await session.connection.sendRequest(ExecuteCommandRequest.type, { command: EXPORT_LATEX_COMMAND, arguments: ['file:///not/open.wedge'] }), null);
  });
});
