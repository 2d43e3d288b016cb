/**
 * Syntax problems and recovery, against the specification of the parse facade
 * in notes-for-helpers/grammar.md: the problem codes, spans on the offending
 * token (at the end of input: the last token, never NaN), and resumption at the
 * next statement keyword so that every well-formed statement after an error
 * still appears in the program. Each case is one annotated string (see
 * annotated-source.ts): the carets under a line mark the expected span.
 */
import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { parseProgram } from '../../server/src/language/parse.js';
import type { DeclStmt, Program } from '../../server/src/language/ast.js';
import { dedent, expectProblems } from './annotated-source.js';

function declared(program: Program): string[] {
  return program.statements.map((s) => (s.type === 'decl' || s.type === 'space' ? s.name.name : s.type));
}

describe('one problem at the offending token', () => {
  test("a missing ')' at the end of a line is marked at the last token of that line", () => {
    const { program } = expectProblems(`
      vector p = (1, 0, 2
      #                 ^ syntax/missing-token
      vector q = (0, 1, 0)
    `);
    assert.deepEqual(declared(program), ['q']);
    assert.deepEqual(program.dropped?.map((d) => [d.kind, d.declares?.name]), [['vector', 'p']]);
  });

  test("a missing '=' is marked at what stands in its place, and the message says so in words", () => {
    const { problems } = expectProblems(`
      subspace L span(p, q)
      #          ^^^^ syntax/missing-token
    `);
    assert.equal(problems[0]!.message, "expected '=' after the name 'L' in this subspace declaration, found 'span'");
  });

  test("an unclosed call's ')' missing before the next statement", () => {
    const { program, problems } = expectProblems(`
      subspace L = span(p, q
      #                    ^ syntax/missing-token
      show L
    `);
    assert.deepEqual(declared(program), ['show']);
    assert.match(problems[0]!.message, /'show' on line 2, which starts the next statement/);
  });

  test('a token that cannot start a value', () => {
    expectProblems(`
      claim L = )
      #         ^ syntax/unexpected-token
    `);
  });

  test('a claim without a relation, at the end of the file', () => {
    const { problems } = expectProblems(`
      claim L
      #     ^ syntax/unexpected-token
    `);
    assert.match(problems[0]!.message, /expected a relation/);
    assert.match(problems[0]!.message, /the end of the file/);
  });

  test("'not' must be followed by 'in' or 'decomposable'", () => {
    expectProblems(`
      claim eta not independent
      #             ^^^^^^^^^^^ syntax/unexpected-token
    `);
  });

  test('a keyword cannot be a name', () => {
    const { problems } = expectProblems(`
      vector in = (1, 0)
      #      ^^ syntax/missing-token
    `);
    assert.match(problems[0]!.message, /keyword/);
  });

  test('a name inside a matrix is an entry (a parameter or a field generator), with its expression', () => {
    const { program } = expectProblems(`
      subspace M = rows [1 0 x 2x -x^2 (x + 1)]
    `);
    const value = (program.statements[0] as DeclStmt).value;
    assert.equal(value.type, 'rows');
    const entries = value.type === 'rows' ? value.matrix.rows[0]! : [];
    assert.deepEqual(entries.map((e) => e.text), ['1', '0', 'x', '2x', '-x^2', '(x + 1)']);
    assert.deepEqual(entries.map((e) => e.expr?.type), [undefined, undefined, 'name', 'binary', 'unary', 'binary']);
  });

  test('a number and a name apart are two entries; together, one product', () => {
    const { program } = expectProblems(`
      subspace M = rows [2 x ; 2x 1]
    `);
    const value = (program.statements[0] as DeclStmt).value;
    const rows = value.type === 'rows' ? value.matrix.rows : [];
    assert.deepEqual(rows.map((r) => r.map((e) => e.text)), [['2', 'x'], ['2x', '1']]);
  });

  test('a character that is not part of the language drops its statement and reports only itself', () => {
    const { program, problems } = expectProblems(`
      vector p = 3 × e1
      #            ^ syntax/unexpected-character
      vector q = (1, 0 ⟩
      #                ^ syntax/unexpected-character
      claim plucker(L) = [1 € 2 : 3]
      #                     ^ syntax/unexpected-character
      vector r = e1
    `);
    assert.deepEqual(declared(program), ['r']);
    assert.deepEqual(program.dropped?.map((d) => d.declares?.name ?? d.kind), ['p', 'q', 'claim']);
    assert.match(problems[0]!.message, /'\*'/, 'suggests the ASCII operator');
  });
});

describe('bracket shapes and index keys', () => {
  test("a projective point must use ':' between all entries", () => {
    expectProblems(`
      claim plucker(L) = [1 : 3 , 1]
      #                         ^ syntax/mixed-separators
      claim plucker(L) = [1 : 3 1]
      #                         ^ syntax/mixed-separators
    `);
  });

  test("a matrix may not use ':'", () => {
    expectProblems(`
      show [1 2 : 3]
      #         ^ syntax/mixed-separators
      subspace M = rows [1 : 2]
      #                    ^ syntax/mixed-separators
    `);
  });

  test('index keys must be digit strings or parenthesised label lists', () => {
    const { program } = expectProblems(`
      multivector z = {12: 1, 1.5: 2}
      #                       ^^^ syntax/bad-index-key
      multivector y = {e12: 1}
      #                ^^^ syntax/bad-index-key
      multivector x = {(1, 2.5): 1}
      #                    ^^^ syntax/bad-index-key
      multivector w = {(1, 10): 1}
    `);
    assert.deepEqual(declared(program), ['w']);
    assert.deepEqual(program.dropped?.map((d) => d.declares?.name), ['z', 'y', 'x']);
  });
});

describe('tokens outside any statement', () => {
  test('leading junk before the first statement', () => {
    const { program } = expectProblems(`
      hello there
      ^^^^^ syntax/expected-statement
      field QQ
    `);
    assert.deepEqual(declared(program), ['field']);
  });

  test('junk after a complete statement keeps the statement', () => {
    const { program, problems } = expectProblems(`
      space V dim 4 5 6
      #             ^ syntax/expected-statement
      space W dim 2
    `);
    assert.deepEqual(declared(program), ['V', 'W']);
    assert.match(problems[0]!.message, /space declaration is complete/);
  });

  test('a misspelt statement keyword at the start of a line ends the statement before it', () => {
    const { program, problems } = expectProblems(`
      vector p = (1, 0)
      vectr q = (0, 1)
      ^^^^^ syntax/expected-statement
      Field QQ
      ^^^^^ syntax/expected-statement
      show q
    `);
    assert.deepEqual(declared(program), ['p', 'show']);
    assert.deepEqual(program.dropped?.map((d) => [d.kind, d.declares?.name]), [['vector', 'q'], ['field', undefined]]);
    assert.match(problems[0]!.message, /did you mean 'vector'/);
    assert.match(problems[1]!.message, /lower-case/);
  });

  test('misspellings in a row before the first statement are reported one by one', () => {
    expectProblems(`
      feild QQ
      ^^^^^ syntax/expected-statement
      spce V dim 4
      ^^^^ syntax/expected-statement
      space W dim 3
    `);
  });
});

describe('recovery across a file', () => {
  test('three broken statements give three problems, and every good statement is kept', () => {
    const { program } = expectProblems(`
      field QQ
      space V dim 4
      vector p = (1, 0, 2, -1
      #                     ^ syntax/missing-token
      vector q = 3 e1 - e2 + 1/2 e4
      subspace L span(p, q)
      #          ^^^^ syntax/missing-token
      subspace M = rows [ 1 0 2 0
                          0 1 3 1 ] in V
      claim L =
      #       ^ syntax/unexpected-token
      claim dim M = 2
      show plucker(M)
    `);
    assert.deepEqual(declared(program), ['field', 'V', 'q', 'M', 'claim', 'show']);
    const m = program.statements[3] as DeclStmt;
    assert.equal(m.value.type === 'rows' && m.value.matrix.rows.length, 2);
  });

  test('errors at the end of the input have spans on the last token', () => {
    for (const source of [
      'show\n^^^^ syntax/unexpected-token',
      'field GF(7\n#        ^ syntax/missing-token',
      'space V dim 4 basis\n#             ^^^^^ syntax/unexpected-token',
      'vector p =\n#        ^ syntax/unexpected-token',
      'claim p not\n#       ^^^ syntax/unexpected-token',
      'show [1 0\n#       ^ syntax/missing-token',
      'show {12:\n#       ^ syntax/unexpected-token',
      'show V.\n#     ^ syntax/missing-token',
      'show (1, 2   # a trailing comment\n#        ^ syntax/missing-token',
    ]) {
      const { problems, text } = expectProblems(source);
      for (const p of problems) {
        assert.ok(Number.isInteger(p.span.start) && Number.isInteger(p.span.end));
        assert.ok(0 <= p.span.start && p.span.start < p.span.end && p.span.end <= text.length);
      }
    }
  });
});

// ---------------------------------------------------------------------------
// Robustness: parseProgram returns on any input, with well-formed spans.

const CODES = new Set([
  'syntax/unexpected-character',
  'syntax/unexpected-token',
  'syntax/missing-token',
  'syntax/mixed-separators',
  'syntax/bad-index-key',
  'syntax/expected-statement',
]);

/** Every span anywhere in the tree lies within the text, with finite integer ends in order. */
function assertSpansWithin(value: unknown, length: number, path = 'program'): void {
  if (Array.isArray(value)) {
    value.forEach((v, i) => assertSpansWithin(v, length, `${path}[${i}]`));
    return;
  }
  if (value === null || typeof value !== 'object') return;
  const record = value as Record<string, unknown>;
  if (typeof record.start === 'number' || typeof record.end === 'number') {
    const { start, end } = record as { start: number; end: number };
    assert.ok(Number.isInteger(start) && Number.isInteger(end), `${path}: ${start}..${end}`);
    assert.ok(0 <= start && start <= end && end <= length, `${path}: ${start}..${end} outside 0..${length}`);
    return;
  }
  for (const [key, v] of Object.entries(record)) assertSpansWithin(v, length, `${path}.${key}`);
}

function assertWellFormed(text: string): void {
  const { program, problems } = parseProgram(text);
  assertSpansWithin(program, text.length);
  for (const p of problems) {
    assert.ok(CODES.has(p.code), `unexpected code ${p.code}: ${p.message}`);
    assert.ok(p.message.length > 0);
    assertSpansWithin(p.span, text.length, 'problem');
  }
  assert.ok(problems.length >= (program.dropped?.length ?? 0), 'every dropped statement has a problem');
}

const SAMPLE = dedent(`
  field GF(7)
  normalize first-one
  space V dim 4
  space U dim 5 basis a b c d e
  vector p = (1, 0, 2, -1) in V
  vector q = 3 e1 - e2 + 1/2 e4
  vector r = V.e1 + q
  subspace L = span(p, q)
  subspace M = rows [ 1 0 2 0
                      0 1 3 1 ] in V
  subspace H = solutions [ 1 1 0 -1; 0 0 1 1 ] in V
  subspace S = L + M & H
  multivector eta = e1^e2 + e3∧e4
  multivector z = {12: 1, 13: -2, (2, 3): 5} in V
  claim dim L = 2
  claim eta not decomposable
  claim p ∉ L
  claim L ≠ M
  claim plucker(L) = [1 : 3 : 1 : -2 : 0 : -2]
  show chart(L, (1, 3))
`);

const PIECES = [
  ' ', '\n', '#', 'x', 'e1', 'η', '𝔳', '0', '7', '.', '1.5', '(', ')', '[', ']', '{', '}', ',', ';', ':', '=', '!=',
  '≠', '+', '-', '*', '/', '^', '∧', '&', '∩', '∈', '∉', '!', '€', 'in', 'not', 'dim', 'basis', 'rows', 'solutions',
  'decomposable', 'field', 'normalize', 'space', 'vector', 'subspace', 'multivector', 'claim', 'show', "'", '\r',
  '\uD800', '\u0301',
];

describe('parseProgram never throws', () => {
  test('the sample used for mutations is itself clean', () => {
    assert.deepEqual(parseProgram(SAMPLE).problems, []);
  });

  test('arbitrary strings', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 120 }), assertWellFormed), { numRuns: 300 });
  });

  test('arbitrary sequences of language pieces', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...PIECES), { maxLength: 60 }), (parts) => assertWellFormed(parts.join(''))),
      { numRuns: 400 },
    );
  });

  test('arbitrary mutations of a valid program', () => {
    const edit = fc.record({
      at: fc.nat(),
      kind: fc.constantFrom('delete', 'insert', 'replace'),
      piece: fc.constantFrom(...PIECES),
      length: fc.integer({ min: 1, max: 8 }),
    });
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 6 }), (edits) => {
        let text = SAMPLE;
        for (const e of edits) {
          const at = e.at % (text.length + 1);
          if (e.kind === 'delete') text = text.slice(0, at) + text.slice(at + e.length);
          else if (e.kind === 'insert') text = text.slice(0, at) + e.piece + text.slice(at);
          else text = text.slice(0, at) + e.piece + text.slice(at + e.length);
        }
        assertWellFormed(text);
      }),
      { numRuns: 400 },
    );
  });
});
