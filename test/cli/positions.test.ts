/**
 * Offsets to 1-based line and column, as the command line prints them.
 * Line breaks are `\n`, `\r\n` and a lone `\r` (the LSP specification's
 * definition of a line end, "Text Documents" section); a column is one Unicode
 * code point, so a character outside the Basic Multilingual Plane (two UTF-16
 * units, a surrogate pair — The Unicode Standard, section 3.9) is one column.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { LineIndex } from '../../cli/src/positions.js';

describe('LineIndex', () => {
  test('counts lines after \\n, \\r\\n and a lone \\r', () => {
    // Offsets: a0 b1 \r2 \n3 c4 d5 \n6 e7 \r8 f9
    const index = new LineIndex('ab\r\ncd\ne\rf');
    assert.deepEqual(index.position(0), { line: 1, column: 1 });
    assert.deepEqual(index.position(1), { line: 1, column: 2 });
    assert.deepEqual(index.position(4), { line: 2, column: 1 });
    assert.deepEqual(index.position(5), { line: 2, column: 2 });
    assert.deepEqual(index.position(7), { line: 3, column: 1 });
    assert.deepEqual(index.position(9), { line: 4, column: 1 });
    assert.deepEqual(index.position(10), { line: 4, column: 2 }, 'the end of the text');
  });

  test('a line break at the very end opens an empty last line', () => {
    const index = new LineIndex('x\n');
    assert.deepEqual(index.position(2), { line: 2, column: 1 });
  });

  test('counts columns in code points', () => {
    // 'η' (U+03B7) is one UTF-16 unit; '𝔸' (U+1D538) is two.
    const text = 'η𝔸x';
    const index = new LineIndex(text);
    assert.equal(text.indexOf('x'), 3);
    assert.deepEqual(index.position(1), { line: 1, column: 2 });
    assert.deepEqual(index.position(3), { line: 1, column: 3 });
  });

  test('offsets outside the text, or not numbers, land on its nearest end', () => {
    const index = new LineIndex('ab\ncd');
    assert.deepEqual(index.position(-4), { line: 1, column: 1 });
    assert.deepEqual(index.position(99), { line: 2, column: 3 });
    assert.deepEqual(index.position(Number.NaN), { line: 2, column: 3 });
  });

  test('the empty text has one line', () => {
    assert.deepEqual(new LineIndex('').position(0), { line: 1, column: 1 });
  });
});
