/**
 * The outline (document symbols), the semantic tokens and the folding ranges
 * of small documents, with the expected answers written out by hand. That an
 * outline lists declarations with their whole statement as range and the name
 * as selection, and that multi-line constructs and comment blocks fold, is
 * common practice for LSP servers, no source.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { documentSymbols, foldingRanges, semanticTokens, type OutlineEntry } from '../../../server/src/language/index.js';
import { analyzeMarked, textOf } from './marked-source.js';

const DOCUMENT = [
  '# Two lines in a 4-space.',
  '# (a scenario of our own)',
  'space V dim 4',
  'space U dim 3 basis a b c',
  'vector p = (1, 0, 0, 0)',
  'subspace L = rows [ 1 0 0 0',
  '                    0 1 0 0 ] in V',
  'multivector w = plucker(L)',
  'map f : V -> U = [ 1 0 0; 0 1 0; 0 0 1; 0 0 0 ]',
  'flag F = standard(V)',
  'claim   dim L = 2   # holds',
  'show f(p)',
].join('\n');

function describeEntry(text: string, e: OutlineEntry): string {
  const children = e.children.length > 0 ? ` [${e.children.map((c) => describeEntry(text, c)).join(', ')}]` : '';
  return `${e.kind} ${e.name} (${e.detail}) @${textOf(text, e.selection)}${children}`;
}

describe('document symbols', () => {
  test('declarations, claims and shows in source order, basis lists as children', () => {
    const { analysis, text } = analyzeMarked(DOCUMENT);
    assert.deepEqual(documentSymbols(analysis).map((e) => describeEntry(text, e)), [
      'space V (dim 4) @V',
      'space U (dim 3) @U [basis a (basis vector of U) @a, basis b (basis vector of U) @b, basis c (basis vector of U) @c]',
      'vector p (vector) @p',
      'subspace L (subspace in V) @L',
      'multivector w (multivector) @w',
      'map f (V → U) @f',
      'flag F (flag) @F',
      'claim dim L = 2 (claim) @claim',
      'show f(p) (show) @show',
    ]);
  });

  test('each entry spans its whole statement and selects inside it', () => {
    const { analysis, text } = analyzeMarked(DOCUMENT);
    const entries = documentSymbols(analysis);
    const subspace = entries.find((e) => e.name === 'L')!;
    assert.equal(textOf(text, subspace.span), 'subspace L = rows [ 1 0 0 0\n                    0 1 0 0 ] in V');
    for (const e of entries) {
      assert.ok(e.span.start <= e.selection.start && e.selection.end <= e.span.end, e.name);
      for (const c of e.children) assert.ok(e.span.start <= c.span.start && c.span.end <= e.span.end, c.name);
    }
  });

  test('a declaration with a syntax error stays in the outline, marked', () => {
    const { analysis } = analyzeMarked('space V dim 2\nvector p = (1, 0\nvector q = (0, 1)');
    assert.deepEqual(documentSymbols(analysis).map((e) => `${e.name}: ${e.detail}`), ['V: dim 2', 'p: vector (syntax error)', 'q: vector']);
  });
});

describe('semantic tokens', () => {
  test('each name by what it names, built-ins and fields as library names', () => {
    const { analysis, text } = analyzeMarked(
      [
        'field GF(4) generator w',
        'space V dim 2',
        'space U dim 2 basis a b',
        'vector p = (w, 1) in V',
        'subspace L = span(p, e2)',
        'multivector m = plucker(L)',
        'map f : V -> U = [ 1 0; 0 1 ]',
        'flag F = standard(V)',
        'show f(p) + U.a',
      ].join('\n'),
    );
    const shown = semanticTokens(analysis).map((t) => `${textOf(text, t.span)}:${t.type}${t.modifiers.map((m) => `+${m}`).join('')}`);
    assert.deepEqual(shown, [
      'GF:type+defaultLibrary',
      'w:variable+declaration+readonly',
      'V:type+declaration',
      'U:type+declaration',
      'a:enumMember+declaration',
      'b:enumMember+declaration',
      'p:variable+declaration+vector',
      'w:variable+readonly',
      'V:type',
      'L:variable+declaration+subspace',
      'span:function+defaultLibrary',
      'p:variable+vector',
      'e2:enumMember+defaultLibrary',
      'm:variable+declaration+multivector',
      'plucker:function+defaultLibrary',
      'L:variable+subspace',
      'f:function+declaration',
      'V:type',
      'U:type',
      'F:variable+declaration+flag',
      'standard:function+defaultLibrary',
      'V:type',
      'f:function',
      'p:variable+vector',
      'U:type',
      'a:enumMember',
    ]);
  });

  test('tokens are in order and never overlap', () => {
    const { analysis } = analyzeMarked(DOCUMENT);
    const tokens = semanticTokens(analysis);
    for (let i = 1; i < tokens.length; i++) assert.ok(tokens[i - 1]!.span.end <= tokens[i]!.span.start);
  });
});

describe('folding ranges', () => {
  const lineOf = (text: string, offset: number) => text.slice(0, offset).split('\n').length - 1;

  test('multi-line statements and blocks of comment lines fold; single lines do not', () => {
    const { analysis, text } = analyzeMarked(
      [
        '# first', //  0
        '# second', // 1
        'space V dim 4', // 2
        '# alone', // 3
        '', // 4
        'subspace W = rows [ 1 0 0 0', // 5
        '                    0 1 0 0 ]', // 6
        'claim dim W = 2  # a comment after code', // 7
        '# a', // 8
        '  # b, indented', // 9
        '# c', // 10
        'map f : V -> V = [ 1 0 0 0', // 11
        '                   0 1 0 0', // 12
        '                   0 0 1 0', // 13
        '                   0 0 0 1 ]', // 14
      ].join('\n'),
    );
    const folds = foldingRanges(analysis).map((f) => `${f.kind} ${lineOf(text, f.span.start)}-${lineOf(text, f.span.end)}`);
    assert.deepEqual(folds, ['comment 0-1', 'region 5-6', 'comment 8-10', 'region 11-14']);
  });

  test('a statement with a syntax error folds by its text', () => {
    const { analysis, text } = analyzeMarked('space V dim 2\nsubspace W = rows [ 1 0\n  0 1\nclaim dim W = 1');
    const folds = foldingRanges(analysis).map((f) => `${lineOf(text, f.span.start)}-${lineOf(text, f.span.end)}`);
    assert.deepEqual(folds, ['1-2']);
  });
});
