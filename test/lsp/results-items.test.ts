/**
 * The items of the `wedgework/results` notification
 * (server/src/lsp/results-items.ts), built from real analyses: one per
 * result, in order, the range of its statement, and the summary split from
 * its convention tag so that the two read back as the lens line.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { analyze } from '../../server/src/language/index.js';
import { resultItems } from '../../server/src/lsp/results-items.js';
import { ROOT } from '../support/bundles.js';

// The plane spanned by (1,0,2,0) and (0,1,3,1) in QQ^4 has Plücker vector [1 : 3 : 1 : -2 : 0 : 2]
// in lexicographic order (the 2×2 minors: common practice, no source; the same plane is worked in
// docs/language.md).
const TEXT = 'space V dim 4\nsubspace W = rows [ 1 0 2 0\n                    0 1 3 1 ]\nclaim dim W = 2\n';

describe('results items', () => {
  test('one item per result, with its kind, name, range, summary and convention', () => {
    const document = TextDocument.create('file:///w.wedge', 'wedge', 1, TEXT);
    const analysis = analyze(TEXT, { evaluate: true });
    const items = resultItems(document, analysis);
    assert.deepEqual(
      items.map((i) => [i.kind, i.name]),
      [['space', 'V'], ['subspace', 'W'], ['claim', undefined]],
    );
    const w = items[1]!;
    assert.deepEqual(w.range, { start: { line: 1, character: 0 }, end: { line: 2, character: 29 } });
    assert.match(w.summary, /\[1 : 3 : 1 : -2 : 0 : 2\]/);
    assert.equal(w.convention, 'QQ, lex from 1, primitive');
    assert.ok(!w.summary.includes(w.convention!), 'the convention is not repeated in the summary');
    assert.match(items[2]!.summary, /^✓/);
  });

  test('summary and convention read back as the lens line, on every sample', () => {
    for (const name of ['three-planes-in-six.wedge', 'conventions-colex-from-zero.wedge', 'spread-over-gf4.wedge']) {
      const text = readFileSync(join(ROOT, 'samples', name), 'utf8');
      const analysis = analyze(text, { evaluate: true });
      const items = resultItems(TextDocument.create(`file:///${name}`, 'wedge', 1, text), analysis);
      assert.equal(items.length, analysis.results.length);
      items.forEach((item, i) => {
        const joined = item.convention === undefined ? item.summary : `${item.summary} · ${item.convention}`;
        assert.equal(joined, analysis.results[i]!.summary, `${name}: ${item.kind} ${item.name ?? ''}`);
      });
      assert.ok(items.some((i) => i.convention !== undefined), `${name} has results stated in a convention`);
    }
  });

  test('no analysis, no items', () => {
    assert.deepEqual(resultItems(TextDocument.create('file:///e.wedge', 'wedge', 1, ''), undefined), []);
  });
});
