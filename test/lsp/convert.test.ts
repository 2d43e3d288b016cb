/**
 * Spans to LSP data (server/src/lsp/convert.ts). LSP positions count lines
 * from 0 and characters in UTF-16 code units by default, and diagnostic
 * severities are Error = 1, Warning = 2, Information = 3 (Language Server
 * Protocol specification 3.17, "Position" and "Diagnostic").
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { toCodeLens, toDiagnostic, toHover, toRange } from '../../server/src/lsp/convert.js';

// 'η' is one UTF-16 unit, '𝔸' (U+1D538) two: 'b' sits at UTF-16 offset 3 of line 0.
const TEXT = 'η𝔸b\nsecond line';
const document = TextDocument.create('file:///convert.wedge', 'wedge', 1, TEXT);

describe('toRange', () => {
  test('counts characters in UTF-16 units on 0-based lines', () => {
    assert.deepEqual(toRange(document, { start: 3, end: 4 }), {
      start: { line: 0, character: 3 },
      end: { line: 0, character: 4 },
    });
    const s = TEXT.indexOf('second');
    assert.deepEqual(toRange(document, { start: s, end: s + 6 }), {
      start: { line: 1, character: 0 },
      end: { line: 1, character: 6 },
    });
  });

  test('an offset that is not a number means the end of the text; out-of-range offsets are clamped', () => {
    const end = { line: 1, character: 'second line'.length };
    assert.deepEqual(toRange(document, { start: Number.NaN, end: Number.NaN }), { start: end, end });
    assert.deepEqual(toRange(document, { start: -3, end: 1_000 }), { start: { line: 0, character: 0 }, end });
  });
});

describe('toDiagnostic', () => {
  test('carries code, source, severity, message and related places', () => {
    const diagnostic = toDiagnostic(document, {
      code: 'claim/example',
      severity: 'warning',
      message: 'm',
      span: { start: 0, end: 1 },
      related: [{ span: { start: 5, end: 11 }, message: 'there' }],
    });
    assert.equal(diagnostic.code, 'claim/example');
    assert.equal(diagnostic.source, 'wedgework');
    assert.equal(diagnostic.severity, 2);
    assert.equal(diagnostic.message, 'm');
    assert.deepEqual(diagnostic.relatedInformation, [
      {
        location: { uri: 'file:///convert.wedge', range: { start: { line: 1, character: 0 }, end: { line: 1, character: 6 } } },
        message: 'there',
      },
    ]);
  });

  test('maps every severity', () => {
    const severity = (s: 'error' | 'warning' | 'information') =>
      toDiagnostic(document, { code: 'x/y', severity: s, message: '', span: { start: 0, end: 0 } }).severity;
    assert.deepEqual([severity('error'), severity('warning'), severity('information')], [1, 2, 3]);
  });
});

describe('hovers and lenses', () => {
  test('a hover is markdown markup over its span', () => {
    const hover = toHover(document, { span: { start: 0, end: 1 }, markdown: '**L**' });
    assert.deepEqual(hover.contents, { kind: 'markdown', value: '**L**' });
    assert.deepEqual(hover.range, { start: { line: 0, character: 0 }, end: { line: 0, character: 1 } });
  });

  test('a lens runs the copy-as-LaTeX command with the LaTeX and the name', () => {
    const lens = toCodeLens(document, { span: { start: 5, end: 8 }, title: 'dim 2', latex: '\\langle e_1 \\rangle', name: 'L' });
    assert.deepEqual(lens.command, { title: 'dim 2', command: 'wedgework.copyLatex', arguments: ['\\langle e_1 \\rangle', 'L'] });
    assert.equal(lens.range.start.line, 1);
    const nameless = toCodeLens(document, { span: { start: 0, end: 1 }, title: 't', latex: 'x' });
    assert.deepEqual(nameless.command?.arguments, ['x', null]);
  });

  test('a lens with nothing to copy is a plain label (empty command id)', () => {
    const label = toCodeLens(document, { span: { start: 0, end: 1 }, title: 'holds', latex: '' });
    assert.deepEqual(label.command, { title: 'holds', command: '' });
  });
});
