/**
 * The parser's memo of statement pieces (server/src/language/piece-memo.ts) must be invisible: a parse that
 * reuses remembered pieces gives exactly the tree and problems of a parse from scratch, after any edit.
 * (An equivalence of two ways of computing the same thing: common practice, no source.)
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseProgram } from '../../server/src/language/parse.js';
import { PieceMemo } from '../../server/src/language/piece-memo.js';
import { shiftSpans } from '../../server/src/language/shift-spans.js';

const SAMPLES = readdirSync('samples')
  .filter((f) => f.endsWith('.wedge'))
  .map((f) => ({ name: f, text: readFileSync(join('samples', f), 'utf8') }));

/** Edits a user makes: type at the start, in the middle and at the end, delete a character, break a line. */
function edits(text: string): { what: string; text: string }[] {
  const middle = Math.floor(text.length / 2);
  return [
    { what: 'a comment line inserted at the top', text: `# a note\n${text}` },
    { what: 'a digit typed in the middle', text: `${text.slice(0, middle)}7${text.slice(middle)}` },
    { what: 'a character deleted in the middle', text: `${text.slice(0, middle)}${text.slice(middle + 1)}` },
    { what: 'a line break in the middle', text: `${text.slice(0, middle)}\n${text.slice(middle)}` },
    { what: 'a statement appended', text: `${text}\nvector extra = (1, 2)\n` },
    { what: 'the last third removed', text: text.slice(0, Math.floor((2 * text.length) / 3)) },
    { what: 'CRLF line ends', text: text.replace(/\n/g, '\r\n') },
  ];
}

describe('the piece memo of the parser', () => {
  for (const sample of SAMPLES) {
    test(`${sample.name}: parses with the memo equal parses from scratch after each edit`, () => {
      const memo = new PieceMemo();
      parseProgram(sample.text, { memo });
      for (const edit of edits(sample.text)) {
        const remembered = parseProgram(edit.text, { memo });
        const fresh = parseProgram(edit.text, { memo: false });
        assert.deepEqual(remembered, fresh, `after ${edit.what}`);
      }
      assert.ok(memo.size > 0, 'the memo remembered pieces');
    });
  }

  test('a remembered piece comes back moved to where it now begins, as an independent copy', () => {
    const memo = new PieceMemo();
    const text = 'space V dim 3\nvector p = (1, 2, 3)\n';
    const first = parseProgram(text, { memo });
    const moved = parseProgram(`\n\n${text}`, { memo });
    assert.deepEqual(moved.program.statements, shiftSpans(first.program.statements, 2));
    // Changing the tree of one parse must not change what the memo hands out next.
    (moved.program.statements[0] as { span: { start: number } }).span.start = 999;
    assert.deepEqual(parseProgram(`\n\n${text}`, { memo }).program.statements, moved.program.statements.map((s, i) => (i === 0 ? shiftSpans(first.program.statements[0], 2) : s)));
  });

  test('the memo forgets the least recently used pieces beyond its capacity', () => {
    const memo = new PieceMemo(3);
    parseProgram('space V dim 3\nvector a = (1, 0, 0)\nvector b = (0, 1, 0)\nvector c = (0, 0, 1)\n', { memo });
    assert.equal(memo.size, 3);
  });
});
