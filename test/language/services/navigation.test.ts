/**
 * Go to definition and find references. The cursor `|` stands on a name; the
 * spans marked `⟦…⟧` are the expected answer. Which declaration a name refers
 * to is the language's scope rule (docs/language.md: names are declared before
 * use; a basis name belongs to its space; `V.e1` qualifies it). That a
 * definition request on a declaration answers the declaration itself is common
 * practice, no source.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { definitionAt, referencesAt } from '../../../server/src/language/index.js';
import { analyzeMarked, textOf } from './marked-source.js';

function definitionCase(source: string): void {
  const { analysis, cursor, marked, text } = analyzeMarked(source);
  const found = definitionAt(analysis, cursor);
  assert.equal(marked.length <= 1, true);
  assert.deepEqual(found, marked[0], `found ${found ? JSON.stringify(textOf(text, found)) : 'nothing'}`);
}

describe('go to definition', () => {
  test('a vector used in a later statement', () =>
    definitionCase('space V dim 2\nvector ⟦p⟧ = (1, 0)\nsubspace L = span(p|)'));
  test('a use in the middle of the name', () => definitionCase('space V dim 2\nvector ⟦pq⟧ = (1, 0)\nshow p|q'));
  test('a basis vector of a basis list: its name in the list', () =>
    definitionCase('space U dim 3 basis a ⟦b⟧ c\nvector v = 2 |b'));
  test('a default basis vector: the space it belongs to', () => definitionCase('space ⟦V⟧ dim 4\nvector v = e|3'));
  test('a qualified basis vector: its space, not the other one', () =>
    definitionCase('space V dim 2\nspace ⟦W⟧ dim 2\nvector v = W.e|1'));
  test('the qualifier of a qualified name: the space', () =>
    definitionCase('space V dim 2\nspace ⟦W⟧ dim 2\nvector v = |W.e1'));
  test('a space after `in`', () => definitionCase('space ⟦V⟧ dim 2\nvector v = (1, 0) in |V'));
  test('a map applied', () => definitionCase('space V dim 2\nmap ⟦f⟧ : V -> V = [ 1 0; 0 1 ]\nshow |f(e1)'));
  test('a field generator', () => definitionCase('field GF(4) generator ⟦w⟧\nspace V dim 2\nvector v = (w|, 1)'));
  test('a declaration: itself', () => definitionCase('space V dim 2\nvector ⟦p|⟧ = (1, 0)'));
  test('a keyword: nothing', () => definitionCase('space V d|im 2'));
  test('a built-in: nothing', () => definitionCase('space V dim 2\nsubspace L = sp|an(e1)'));
  test('an undeclared name: nothing', () => definitionCase('space V dim 2\nshow q|'));
});

function referencesCase(source: string, includeDeclaration = true): void {
  const { analysis, cursor, marked, text } = analyzeMarked(source);
  const found = referencesAt(analysis, cursor, includeDeclaration);
  assert.deepEqual(found, marked, `found ${found.map((s) => JSON.stringify(textOf(text, s))).join(', ')} at ${found.map((s) => s.start).join(', ')}`);
}

describe('find references', () => {
  test('every use and the declaration, from a use', () =>
    referencesCase('space V dim 2\nvector ⟦p⟧ = (1, 0)\nvector q = 2 ⟦p|⟧\nsubspace L = span(⟦p⟧, q)\nclaim ⟦p⟧ in L'));
  test('the same from the declaration', () =>
    referencesCase('space V dim 2\nvector ⟦|p⟧ = (1, 0)\nvector q = 2 ⟦p⟧\nclaim ⟦p⟧ in span(q)'));
  test('without the declaration when not asked for', () =>
    referencesCase('space V dim 2\nvector |p = (1, 0)\nvector q = 2 ⟦p⟧\nclaim ⟦p⟧ in span(q)', false));
  test('a space: its declaration, `in`, map spaces and qualifiers', () =>
    referencesCase(
      'space ⟦V|⟧ dim 2\nspace W dim 2\nvector p = (1, 0) in ⟦V⟧\nmap f : ⟦V⟧ -> W = [ 1 0; 0 1 ]\nshow ⟦V⟧.e1 + W.e1',
    ));
  test('a default basis vector: its uses only (no text declares it), not the other space\'s', () =>
    referencesCase('space V dim 2\nspace W dim 3\nvector p = ⟦e|3⟧ + W.e1\nvector q = 2 ⟦e3⟧\nshow W.⟦e3⟧ + V.e1'));
  test('a basis vector of a basis list: the list entry and its uses', () =>
    referencesCase('space U dim 2 basis ⟦a⟧ b\nvector v = ⟦a|⟧ - b\nshow U.⟦a⟧'));
  test('nothing on a keyword', () => referencesCase('space V |dim 2'));
});
