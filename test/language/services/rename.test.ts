/**
 * Rename: prepareRename says what would be renamed or why not; rename changes
 * the declaration and every use, and refuses a new name that would not be a
 * name, would clash, or would change what some name refers to. The expected
 * texts after renaming are written out by hand from the language's scope
 * rule (docs/language.md). That a rename covers the declaration and all uses
 * is common practice, no source.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { prepareRenameAt, renameAt } from '../../../server/src/language/index.js';
import { analyzeMarked, applyTextEdits, textOf } from './marked-source.js';

function renamed(source: string, newName: string): string {
  const { analysis, cursor, text } = analyzeMarked(source);
  const result = renameAt(analysis, cursor, newName);
  assert.ok('edits' in result, `refused: ${'refused' in result ? result.refused : ''}`);
  return applyTextEdits(text, result.edits);
}

function refusal(source: string, newName?: string): string {
  const { analysis, cursor } = analyzeMarked(source);
  const result = newName === undefined ? prepareRenameAt(analysis, cursor) : renameAt(analysis, cursor, newName);
  assert.ok('refused' in result, `expected a refusal, got ${JSON.stringify(result)}`);
  return result.refused;
}

describe('prepareRename', () => {
  test('on a use: the use, with the name as placeholder', () => {
    const { analysis, cursor, text, marked } = analyzeMarked('space V dim 2\nvector pq = (1, 0)\nshow 2 ⟦p|q⟧');
    const prepared = prepareRenameAt(analysis, cursor);
    assert.ok('span' in prepared);
    assert.deepEqual(prepared.span, marked[0]);
    assert.equal(prepared.placeholder, 'pq');
    assert.equal(textOf(text, prepared.span), 'pq');
  });

  test('on a declaration: the declared name', () => {
    const { analysis, cursor, marked } = analyzeMarked('space ⟦V|⟧ dim 2');
    const prepared = prepareRenameAt(analysis, cursor);
    assert.ok('span' in prepared);
    assert.deepEqual(prepared.span, marked[0]);
  });

  test('refuses a keyword', () => assert.match(refusal('space V d|im 2'), /keyword/));
  test('refuses a statement keyword', () => assert.match(refusal('sp|ace V dim 2'), /keyword/));
  test('refuses a built-in operation', () => assert.match(refusal('space V dim 2\nsubspace L = sp|an(e1)'), /built-in/));
  test('refuses a field name', () => assert.match(refusal('field G|F(7)'), /field/));
  test('refuses a default basis name and says why and what to do instead', () => {
    const message = refusal('space V dim 3\nvector p = e|2');
    assert.match(message, /default basis name of V/);
    assert.match(message, /dimension and the labels convention/);
    assert.match(message, /basis list/);
  });
  test('refuses in a comment', () => assert.match(refusal('space V dim 2  # V is |V'), /comment/));
  test('refuses when a statement with a syntax error mentions the name', () =>
    assert.match(refusal('space V dim 2\nvector p| = (1, 0)\nvector q = 2 p +\n'), /a statement with a syntax error mentions 'p'/));
});

describe('rename', () => {
  test('a vector: its declaration and every use', () =>
    assert.equal(
      renamed('space V dim 2\nvector p = (1, 0)\nvector q = 2 p| + e2\nsubspace L = span(p, q)\nclaim p in L', 'u'),
      'space V dim 2\nvector u = (1, 0)\nvector q = 2 u + e2\nsubspace L = span(u, q)\nclaim u in L',
    ));

  test('a space: declaration, `in`, map spaces and qualifiers', () =>
    assert.equal(
      renamed('space |V dim 2\nspace W dim 2\nvector p = (1, 0) in V\nmap f : V -> W = [ 1 0; 0 1 ]\nshow V.e1 + W.e1', 'X'),
      'space X dim 2\nspace W dim 2\nvector p = (1, 0) in X\nmap f : X -> W = [ 1 0; 0 1 ]\nshow X.e1 + W.e1',
    ));

  test('a basis vector of a basis list, qualified and not', () =>
    assert.equal(renamed('space U dim 2 basis a b\nvector v = a| - b\nshow U.a', 'u1'), 'space U dim 2 basis u1 b\nvector v = u1 - b\nshow U.u1'));

  test('a map, where it is applied', () =>
    assert.equal(
      renamed('space V dim 2\nmap f| : V -> V = [ 1 0; 0 1 ]\nshow f(e1)\nshow kernel(f)', 'g'),
      'space V dim 2\nmap g : V -> V = [ 1 0; 0 1 ]\nshow g(e1)\nshow kernel(g)',
    ));

  test('a name with letters beyond ASCII and a prime', () =>
    assert.equal(renamed('space V dim 2\nvector p| = (1, 0)\nshow p', "η'"), "space V dim 2\nvector η' = (1, 0)\nshow η'"));

  test('to the same name: no edit', () => {
    const { analysis, cursor } = analyzeMarked('space V dim 2\nvector p| = (1, 0)');
    assert.deepEqual(renameAt(analysis, cursor, 'p'), { edits: [] });
  });

  const source = 'space V dim 2\nvector p| = (1, 0)\nvector q = 2 p\n';
  test('refuses what is not a name', () => {
    assert.match(refusal(source, '1p'), /not a name/);
    assert.match(refusal(source, 'p q'), /not a name/);
    assert.match(refusal(source, ''), /not a name/);
  });
  test('refuses a keyword', () => assert.match(refusal(source, 'subspace'), /keyword/));
  test('refuses a field name', () => assert.match(refusal(source, 'QQ'), /field/));
  test('refuses a name already declared', () => assert.match(refusal(source, 'q'), /already declared \(as vector\)/));
  test('refuses a name of a basis vector', () => assert.match(refusal(source, 'e1'), /already declared \(as basis vector of V\)/));
  test('refuses a built-in name for a map (its calls would apply the map)', () =>
    assert.match(refusal('space V dim 2\nmap f| : V -> V = [ 1 0; 0 1 ]\nshow span(e1)', 'span'), /built-in/));
  test('allows a built-in name for a vector (built-ins are recognised only where called)', () =>
    assert.equal(renamed('space V dim 2\nvector p| = (1, 0)\nshow span(p)', 'span'), 'space V dim 2\nvector span = (1, 0)\nshow span(span)'));
  test('refuses a name that an undeclared use would then refer to', () =>
    assert.match(refusal('space V dim 2\nvector p| = (1, 0)\nshow r', 'r'), /change what some name in the file refers to/));
});
