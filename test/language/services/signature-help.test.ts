/**
 * Signature help inside a call: the callee's signatures (from the built-in
 * table, or a map's), and the parameter the cursor is on by the commas before
 * it at the call's own depth. Showing the parameter under the cursor is common
 * practice, no source; the signatures are the language reference's
 * (docs/language.md).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { signatureHelpAt } from '../../../server/src/language/index.js';
import { analyzeMarked } from './marked-source.js';

function help(source: string) {
  const { analysis, cursor } = analyzeMarked(source);
  return signatureHelpAt(analysis, cursor);
}

/** The active signature's label with the active parameter in brackets, e.g. `chart(W, [I])`. */
function shown(source: string): string | undefined {
  const h = help(source);
  if (!h) return undefined;
  const s = h.signatures[h.activeSignature]!;
  const p = s.parameters[s.activeParameter]!;
  return `${s.label.slice(0, p.start)}[${s.label.slice(p.start, p.end)}]${s.label.slice(p.end)}`;
}

const PREFIX = 'space V dim 4\nsubspace W = span(e1, e2)\n';

const CASES: [string, string, string | undefined][] = [
  ['the first argument', `${PREFIX}show chart(|`, 'chart([W], I)'],
  ['the second argument, after one comma', `${PREFIX}show chart(W, |`, 'chart(W, [I])'],
  ['commas of a nested call are that call\'s', `${PREFIX}show chart(span(e1, e2, |`, 'span(v1, [v2], …)'],
  ['after a nested call closes, the outer call again', `${PREFIX}show chart(span(e1, e2), |`, 'chart(W, [I])'],
  ['commas inside a tuple do not count', `${PREFIX}show span((1, 0, 0, |`, 'span([v1], v2, …)'],
  ['commas inside an index map do not count', `${PREFIX}show recover({12: 1, 34: |`, 'recover([ω])'],
  ['a repeating parameter stays on the last one before `…`', `${PREFIX}show span(e1, e2, e3, |`, 'span(v1, [v2], …)'],
  ['a parameter after `…` takes the arguments from there', `${PREFIX}show coordinates(e1, e1, e2, |`, 'coordinates(v, u1, …, [un])'],
  ['with several signatures, the first one with room', `${PREFIX}show schubert(W, |`, 'schubert(W, [F])'],
  ['the one-argument form first', `${PREFIX}show schubert(|`, 'schubert([W])'],
  ['works on incomplete text with more after the cursor', `${PREFIX}show chart(W, |\nclaim dim W = 2`, 'chart(W, [I])'],
  ['outside any call: nothing', `${PREFIX}show W|`, undefined],
  ['after the call closed: nothing', `${PREFIX}show plucker(W)|`, undefined],
  ['an unknown operation: nothing', `${PREFIX}show frobnicate(|`, undefined],
  ['inside a comment: nothing', `${PREFIX}show plucker(W)  # see chart(|`, undefined],
];

describe('signature help', () => {
  for (const [name, source, expected] of CASES) {
    test(name, () => assert.equal(shown(source), expected));
  }

  test('a map application shows the map with its spaces', () => {
    const h = help('space V dim 2\nspace U dim 2\nmap f : V -> U = [ 1 0; 0 1 ]\nshow f(|');
    assert.ok(h);
    assert.equal(h.signatures[0]!.label, 'f(x)');
    assert.match(h.signatures[0]!.documentation, /V → U/);
  });

  test('a built-in has its summary as documentation', () => {
    const h = help(`${PREFIX}show plucker(|`)!;
    assert.match(h.signatures[0]!.documentation, /Plücker vector/);
  });
});
