/**
 * Formatting into the canonical layout (server/src/language/services/formatting.ts):
 * hand-written inputs with their expected layout, and the guarantees checked
 * on every sample — the results after formatting are the results before, a
 * second formatting changes nothing, every comment survives — and on random
 * re-spacings of the samples. Aligning matrix entries in right-aligned columns
 * and spacing binary operators is common practice for code layout, no source.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { analyze, formatDocument, formatText, type Analysis } from '../../../server/src/language/index.js';
import { lineEdits } from '../../../server/src/language/services/line-diff.js';
import { lex } from '../../../server/src/language/services/lexed.js';
import { applyTextEdits } from './marked-source.js';

const LAYOUTS: [string, string[], string[]][] = [
  [
    'one statement per line, single spaces around = and operators',
    ['space V   dim 4 vector p=(1,0,2,-1)', 'vector q = 3e1 -e2+1/2 e4', 'claim dim(span(p,q)&span(e1))=1'],
    ['space V dim 4', 'vector p = (1, 0, 2, -1)', 'vector q = 3 e1 - e2 + 1/2 e4', 'claim dim (span(p, q) & span(e1)) = 1'],
  ],
  [
    'a wedge, a power with a number exponent and a fraction of numbers are written tight',
    ['field GF(9) generator w', 'space V dim 2', 'vector r = w ^ 2 e1 - 1 / 2 e2', 'multivector m = e1 ^ e2'],
    ['field GF(9) generator w', 'space V dim 2', 'vector r = w^2 e1 - 1/2 e2', 'multivector m = e1^e2'],
  ],
  [
    'a multi-line matrix: one row per line, right-aligned columns under the first entry',
    ['space V dim 4', 'subspace W = rows [1 0 -2/3 0', '  10 1 3 1', '0 0 1    1] in V'],
    ['space V dim 4', 'subspace W = rows [  1 0 -2/3 0', '                    10 1    3 1', '                     0 0    1 1 ] in V'],
  ],
  [
    'a matrix with commas keeps them; `;` at a line end becomes the line break',
    ['space V dim 2', 'map f : V->V = [1,2;', '3,-4]'],
    ['space V dim 2', 'map f : V -> V = [ 1,  2', '                   3, -4 ]'],
  ],
  [
    'a one-line matrix stays on one line',
    ['space V dim 2', 'subspace W = rows [1 0;0 1]'],
    ['space V dim 2', 'subspace W = rows [ 1 0; 0 1 ]'],
  ],
  [
    'points, index maps, qualified names, hyphenated words, signs',
    [
      'normalize first - one',
      'convention lines direction-moment',
      'space V dim 4',
      'multivector z = { 12 : 1 ,13:- 2, (1 ,4): 5 }',
      'claim plucker(span(e1, e2)) = [ 1 :0: - 1/2 : 0 : 0 : 0 ]',
      'claim span(e1, e2) is totally-nonnegative',
      'show V . e1 - - e2',
    ],
    [
      'normalize first-one',
      'convention lines direction-moment',
      'space V dim 4',
      'multivector z = {12: 1, 13: -2, (1, 4): 5}',
      'claim plucker(span(e1, e2)) = [1 : 0 : -1/2 : 0 : 0 : 0]',
      'claim span(e1, e2) is totally-nonnegative',
      'show V.e1 - -e2',
    ],
  ],
  [
    'comments: own lines start the line, after code two spaces unless the old column still fits',
    ['   # header', 'space V dim 4   # four', 'vector p = (1,0,0,0)    # a point', 'space U dim 2 vector q = (1,0) in U     # moved'],
    ['# header', 'space V dim 4   # four', 'vector p = (1, 0, 0, 0)  # a point', 'space U dim 2', 'vector q = (1, 0) in U  # moved'],
  ],
  [
    'comments inside a matrix follow their row (a second one on its own line); inside an expression they break the line',
    ['space V dim 2', 'subspace W = rows [ 1 0   # first', '# second', '0 1 ]', 'vector s = (1, # x', '  0)'],
    ['space V dim 2', 'subspace W = rows [ 1 0   # first', '                    # second', '                    0 1 ]', 'vector s = (1,  # x', '    0)'],
  ],
  [
    'blank lines: at most one kept, none at the start or the end',
    ['', '', 'space V dim 2', '', '', '', 'vector p = (1, 0)', '', ''],
    ['space V dim 2', '', 'vector p = (1, 0)'],
  ],
];

describe('the canonical layout', () => {
  for (const [name, input, expected] of LAYOUTS) {
    test(name, () => {
      const formatted = formatText(input.join('\n'));
      assert.equal(formatted, expected.join('\n') + '\n');
      assert.equal(formatText(formatted!), formatted, 'formatting twice changes nothing more');
    });
  }

  test('line breaks stay CRLF when the text used them', () => {
    assert.equal(formatText('space V dim 2\r\nvector p=(1,0)\r\n'), 'space V dim 2\r\nvector p = (1, 0)\r\n');
  });

  test('an empty text stays empty', () => assert.equal(formatText(''), ''));
});

describe('formatting never risks the text', () => {
  test('a document with a syntax error gets no edit', () => {
    const text = 'space V dim 2\nvector p = (1, 0\nvector q=(0,1)\n';
    assert.equal(formatText(text), undefined);
    assert.deepEqual(formatDocument(analyze(text, { evaluate: false })), []);
  });

  test('an unreadable character: no edit', () => {
    assert.deepEqual(formatDocument(analyze('space V dim 2 @\n', { evaluate: false })), []);
  });

  test('a formatted document gets no edit', () => {
    assert.deepEqual(formatDocument(analyze('space V dim 2\nvector p = (1, 0)\n', { evaluate: false })), []);
  });

  test('the edits touch only the changed lines and give the formatted text', () => {
    const text = 'space V dim 2\n# keep\nvector p=(1,0)\nshow p\n';
    const analysis = analyze(text, { evaluate: false });
    const edits = formatDocument(analysis);
    assert.equal(edits.length, 1);
    assert.equal(text.slice(edits[0]!.span.start, edits[0]!.span.end), 'vector p=(1,0)\n');
    assert.equal(applyTextEdits(text, edits), formatText(text));
  });
});

/** What an analysis computed, independent of the layout: each result's kind, name and exact JSON, and the problem codes. */
function meaning(analysis: Analysis): string {
  return JSON.stringify({
    results: analysis.results.map((r) => ({ kind: r.kind, name: r.name, json: r.json })),
    problems: analysis.problems.map((p) => p.code),
  });
}

function comments(text: string): string[] {
  return lex(text).comments.map((c) => text.slice(c.start, c.end).trimEnd());
}

/** The text with extra spaces put into gaps between tokens on one line (which never changes a token). */
function respaced(text: string, widths: number[]): string {
  const { tokens } = lex(text);
  let out = '';
  let at = 0;
  tokens.forEach((t, i) => {
    out += text.slice(at, t.startOffset);
    const gap = text.slice(i === 0 ? 0 : tokens[i - 1]!.endOffset! + 1, t.startOffset);
    if (i > 0 && !/[\r\n#]/.test(gap)) out += ' '.repeat(widths[i % widths.length]!);
    out += t.image;
    at = t.endOffset! + 1;
  });
  return out + text.slice(at);
}

describe('formatting the samples', () => {
  const dir = 'samples';
  for (const file of readdirSync(dir).filter((f) => f.endsWith('.wedge'))) {
    const text = readFileSync(join(dir, file), 'utf8');
    test(`${file}: same results, comments kept, a second pass changes nothing`, () => {
      const formatted = formatText(text);
      assert.ok(formatted !== undefined, 'the sample is formatted');
      assert.equal(meaning(analyze(formatted, { evaluate: true })), meaning(analyze(text, { evaluate: true })));
      assert.deepEqual(comments(formatted), comments(text));
      assert.equal(formatText(formatted), formatted);
    });
  }

  test('a respaced sample formats to the same text as the sample, with the same results', () => {
    const text = readFileSync(join(dir, 'projection-map.wedge'), 'utf8');
    const expected = formatText(text)!;
    const before = meaning(analyze(text, { evaluate: true }));
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 7 }), (widths) => {
        const messy = respaced(text, widths);
        const formatted = formatText(messy);
        assert.ok(formatted !== undefined);
        assert.equal(meaning(analyze(formatted, { evaluate: true })), before);
        // Respacing moves code but not the comments on lines of their own, so only code lines are compared.
        const code = (t: string) => t.split('\n').filter((l) => !l.includes('#'));
        assert.deepEqual(code(formatted), code(expected));
      }),
      { numRuns: 20 },
    );
  });
});

describe('line edits', () => {
  test('applying them to the old text gives the new text', () => {
    const lines = fc.array(fc.constantFrom('a', 'b', 'c', '', 'a b'), { maxLength: 12 });
    const text = fc.tuple(lines, fc.constantFrom('\n', '\r\n'), fc.boolean()).map(([ls, eol, last]) => ls.join(eol) + (last && ls.length > 0 ? eol : ''));
    fc.assert(
      fc.property(text, text, (a, b) => {
        const edits = lineEdits(a, b);
        assert.equal(applyTextEdits(a, edits), b);
        for (let i = 1; i < edits.length; i++) assert.ok(edits[i - 1]!.span.end <= edits[i]!.span.start, 'edits in order, not overlapping');
      }),
      { numRuns: 300 },
    );
  });

  test('no edit for equal texts, one per run of changed lines', () => {
    assert.deepEqual(lineEdits('a\nb\n', 'a\nb\n'), []);
    assert.deepEqual(lineEdits('a\nb\nc\nd\n', 'a\nB\nc\nD\n'), [
      { span: { start: 2, end: 4 }, newText: 'B\n' },
      { span: { start: 6, end: 8 }, newText: 'D\n' },
    ]);
  });
});
