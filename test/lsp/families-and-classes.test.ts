/**
 * Schubert calculus and families through the language server, as an editor sees them: the samples'
 * deliberate false claims as diagnostics, hovers on a class and on a family, and their code lenses.
 * (The values themselves are checked against outside sources in test/language/schubert-calculus.test.ts
 * and test/language/families.test.ts; here only that they reach the editor.)
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { CodeLensRequest, DidOpenTextDocumentNotification, HoverRequest, MarkupContent, type PublishDiagnosticsParams } from 'vscode-languageserver-protocol/node';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { positionOf } from './text-positions.js';
import { startServerSession, type ServerSession } from './server-process.js';

describe('Schubert classes and families in the editor', { timeout: 60_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ normalization: 'primitive', evaluateOn: 'save' });
  });

  after(() => {
    session?.kill();
  });

  async function openSample(file: string, code: string): Promise<{ uri: string; text: string; published: PublishDiagnosticsParams }> {
    const text = readFileSync(join(ROOT, 'samples', file), 'utf8');
    const uri = `file:///wedgework-tests/${file}`;
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId: 'wedge', version: 1, text } });
    // The quick pass publishes first; the evaluation's diagnostics carry the sample's deliberate false claim.
    for (;;) {
      const published = await session.diagnostics.next(uri);
      if (published.diagnostics.some((d) => d.code === code)) return { uri, text, published };
    }
  }

  async function hover(uri: string, text: string, needle: string, offset: number): Promise<string> {
    const h = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: positionOf(text, needle, offset) });
    assert.ok(h && MarkupContent.is(h.contents), `a hover at ${needle}`);
    return h.contents.value;
  }

  test('[evaluator] the four cables: the false count is the only error; the class hover and lens show 2σ_{2,2}', async () => {
    const { uri, text, published } = await openSample('rods-across-four-cables.wedge', 'claim/transversals');
    assert.deepEqual(published.diagnostics.filter((d) => d.severity === 1).map((d) => d.code), ['claim/transversals']);
    assert.match(await hover(uri, text, 'class four', 'class '.length), /2σ_\{2,2\}/);
    const lenses = await session.connection.sendRequest(CodeLensRequest.type, { textDocument: { uri } });
    const line = positionOf(text, 'class four').line;
    assert.ok(lenses?.some((l) => l.range.start.line === line && /2σ_\{2,2\}/.test(l.command?.title ?? '')), JSON.stringify(lenses?.map((l) => l.command?.title)));
  });

  test('[evaluator] the sliding arm: the false identity names t; the family hover is in polynomials of t', async () => {
    const { uri, text, published } = await openSample('sliding-arm-family.wedge', 'claim/equality');
    const claim = published.diagnostics.find((d) => d.code === 'claim/equality')!;
    assert.match(String(claim.message), /differ at t = -?\d+/);
    assert.match(await hover(uri, text, 'subspace arm', 'subspace '.length), /QQ\(t\)/);
    const lenses = await session.connection.sendRequest(CodeLensRequest.type, { textDocument: { uri } });
    const line = positionOf(text, 'show degeneracy(bracket)').line;
    assert.ok(lenses?.some((l) => l.range.start.line === line && /rank drops at t = 1, t = -1/.test(l.command?.title ?? '')), JSON.stringify(lenses?.map((l) => l.command?.title)));
  });
});
