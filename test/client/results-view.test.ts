/**
 * The results view's contribution in the manifest agrees with the client
 * code, the limit settings agree with the server's defaults, and results
 * from a real analysis read well in the view (client/src/results-labels.ts).
 * Contribution points as in VS Code's "Contribution Points" reference
 * (code.visualstudio.com/api, from memory).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { analyze } from '../../server/src/language/index.js';
import { resultItems } from '../../server/src/lsp/results-items.js';
import { DEFAULT_SETTINGS } from '../../server/src/lsp/settings.js';
import { presentResult, RESULTS_VIEW_ID, VIEW_ENABLED_CONTEXT, viewMessage } from '../../client/src/results-labels.js';
import { ROOT } from '../support/bundles.js';

const manifest = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8'));

describe('results view in the manifest', () => {
  test('is contributed to the Explorer under the id the client uses, shown once the extension runs', () => {
    const views: { id: string; name: string; when?: string }[] = manifest.contributes.views.explorer;
    const view = views.find((v) => v.id === RESULTS_VIEW_ID);
    assert.ok(view, `views: ${JSON.stringify(views)}`);
    assert.ok(view.name.length > 0);
    assert.equal(view.when, VIEW_ENABLED_CONTEXT);
    const welcome = manifest.contributes.viewsWelcome.find((w: { view: string }) => w.view === RESULTS_VIEW_ID);
    assert.ok(welcome?.contents.length > 0, 'an empty view says what it is for');
  });

  test('the limit settings have the server\'s defaults, descriptions and lower bounds', () => {
    const properties = manifest.contributes.configuration.properties;
    const maxCoordinates = properties['wedgework.limits.maxCoordinates'];
    const timeoutMs = properties['wedgework.limits.timeoutMs'];
    assert.equal(maxCoordinates.default, DEFAULT_SETTINGS.limits.maxCoordinates);
    assert.equal(timeoutMs.default, DEFAULT_SETTINGS.limits.timeoutMs);
    assert.equal(maxCoordinates.minimum, 1);
    assert.equal(timeoutMs.minimum, 0);
    for (const p of [maxCoordinates, timeoutMs]) {
      assert.equal(p.type, 'integer');
      assert.ok(p.description.length > 0);
    }
  });

  test('the README lists the limit settings with their defaults', () => {
    const readme = readFileSync(join(ROOT, 'README.md'), 'utf8');
    assert.match(readme, /\| `wedgework\.limits\.maxCoordinates` \| `200000` \|/);
    assert.match(readme, /\| `wedgework\.limits\.timeoutMs` \| `10000` \|/);
  });
});

describe('results as the view shows them', () => {
  // dim W = 2 holds and dim W = 3 does not for two independent rows (common practice, no source).
  const TEXT = 'space V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nclaim dim W = 2\nclaim dim W = 3\nshow plucker(W)\n';
  const items = resultItems(TextDocument.create('file:///v.wedge', 'wedge', 1, TEXT), analyze(TEXT, { evaluate: true }));

  test('a named result is labelled by its name, with kind, value and convention beside it', () => {
    const w = presentResult(items.find((i) => i.name === 'W')!);
    assert.equal(w.label, 'W');
    assert.match(w.description, /^subspace: dim 2 in V/);
    assert.match(w.description, / · QQ, lex from 1, primitive$/);
    assert.match(w.tooltip, /^W \(subspace\)\n/);
    assert.match(w.tooltip, /Line 2$/);
  });

  test('claims show their verdict as the icon; a show is labelled by its kind', () => {
    const claims = items.filter((i) => i.kind === 'claim').map(presentResult);
    assert.deepEqual(claims.map((c) => c.icon), ['pass', 'error']);
    const shown = presentResult(items.find((i) => i.kind === 'show')!);
    assert.equal(shown.label, 'show');
    assert.equal(shown.icon, 'eye');
  });

  test('the view says when its results are older than the text, or missing', () => {
    assert.equal(viewMessage({ version: 3, evaluatedVersion: 3, results: items }), undefined);
    assert.match(viewMessage({ version: 4, evaluatedVersion: 3, results: items })!, /changed since/);
    assert.match(viewMessage({ version: 1, results: [] })!, /Not evaluated/);
  });
});
