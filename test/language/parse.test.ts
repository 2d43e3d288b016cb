/**
 * The parser against the language specification: the grammar and AST shapes
 * of the `.wedge` language (v0.1) as written for the project in
 * notes-for-helpers/grammar.md. Every expected tree below is read off that
 * grammar by hand; none was produced by running the parser.
 *
 * Operator precedence (juxtaposition and `*` as multiplication, `^` binding
 * tighter, left associativity, unary minus) follows common practice for
 * written algebra (no source).
 */
import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import { parseProgram } from '../../server/src/language/parse.js';
import type {
  Binary, ClaimStmt, DeclStmt, Expr, FieldStmt, IndexMapLit, MatrixLit, NormalizeStmt, PointLit, ShowStmt, SpaceStmt,
  Statement,
} from '../../server/src/language/ast.js';
import type { Span } from '../../server/src/language/types.js';
import { dedent } from './annotated-source.js';
import { prefixForm } from './expression-text.js';

/** Parses a program that must be free of problems. */
function parseClean(source: string): Statement[] {
  const { program, problems } = parseProgram(source);
  assert.deepEqual(problems, [], `unexpected problems in:\n${source}`);
  assert.deepEqual(program.dropped, []);
  return program.statements;
}

function only<S extends Statement>(source: string): S {
  const statements = parseClean(source);
  assert.equal(statements.length, 1);
  return statements[0] as S;
}

/** The expression of `show <source>`. */
function expr(source: string): Expr {
  return only<ShowStmt>(`show ${source}`).value;
}

/** The text a span covers. */
function cover(text: string, span: Span): string {
  return text.slice(span.start, span.end);
}

describe('the example program of the specification', () => {
  // The example of grammar.md, verbatim, with one space W added so that z2 has a space to name.
  const example = dedent(`
    # Two sight lines in a calibration rig
    field QQ                      # or: field GF(7)
    normalize primitive           # raw | first-one | primitive  (how projective points are displayed)

    space V dim 4                 # basis e1 e2 e3 e4
    space U dim 5 basis a b c d e # named basis

    vector p = (1, 0, 2, -1)      # coordinates; \`in V\` needed unless only one space is declared
    vector p2 = (1, 0, 2, -1) in V
    vector q = 3 e1 - e2 + 1/2 e4 # linear combination; decimals are exact: 0.125 = 1/8
    vector r = V.e1 + q           # qualified basis name, when several spaces share e1

    subspace L = span(p, q)
    subspace M = rows [ 1 0 2 0
                        0 1 3 1 ] in V      # rows split by newline or \`;\`, entries by spaces or \`,\`
    subspace H = solutions [ 1 1 0 -1 ] in V
    subspace S = L + M            # sum;  L & M (or L ∩ M) intersection
    subspace R = recover(z)

    multivector eta = e1^e2 + e3^e4
    multivector z = {12: 1, 13: -2, 23: 5} in V   # by index sets; keys are digit strings (one digit a label)
    multivector z2 = {(1, 10): 3, (2, 3): -1} in W # or parenthesised label lists (needed for labels ≥ 10)

    claim dim L = 2
    claim eta decomposable
    claim eta not decomposable
    claim p in L
    claim p not in L
    claim L = M
    claim L != M
    claim plucker(L) = [1 : 3 : 1 : -2 : 0 : -2]   # projective point literal: entries separated by \`:\`
    show plucker(L)
    show chart(L, 13)             # or chart(L, (1, 3))
  `);

  test('parses without problems into the statements in order', () => {
    const statements = parseClean(example);
    const summary = statements.map((s) =>
      s.type === 'decl' ? `${s.declKind} ${s.name.name}` : s.type === 'space' ? `space ${s.name.name}` : s.type,
    );
    assert.deepEqual(summary, [
      'field', 'normalize', 'space V', 'space U',
      'vector p', 'vector p2', 'vector q', 'vector r',
      'subspace L', 'subspace M', 'subspace H', 'subspace S', 'subspace R',
      'multivector eta', 'multivector z', 'multivector z2',
      'claim', 'claim', 'claim', 'claim', 'claim', 'claim', 'claim', 'claim', 'show', 'show',
    ]);
  });

  test('every statement span starts at its keyword and ends at its last token (comments excluded)', () => {
    const statements = parseClean(example);
    const texts = statements.map((s) => cover(example, s.span));
    assert.equal(texts[6], 'vector q = 3 e1 - e2 + 1/2 e4');
    assert.equal(texts[9], 'subspace M = rows [ 1 0 2 0\n                    0 1 3 1 ] in V');
    assert.equal(texts[25], 'show chart(L, 13)');
    for (const s of statements) assert.equal(cover(example, s.keyword), example.slice(s.span.start).split(' ')[0]);
  });

  test('the relations of the claims', () => {
    const claims = parseClean(example).filter((s): s is ClaimStmt => s.type === 'claim');
    assert.deepEqual(
      claims.map((c) => [prefixForm(c.subject), c.relation.op, c.relation.other ? prefixForm(c.relation.other) : null]),
      [
        ['(dim L)', '=', '2'],
        ['eta', 'decomposable', null],
        ['eta', 'not decomposable', null],
        ['p', 'in', 'L'],
        ['p', 'not in', 'L'],
        ['L', '=', 'M'],
        ['L', '!=', 'M'],
        ['(call plucker L)', '=', '[1 : 3 : 1 : -2 : 0 : -2]'],
      ],
    );
    assert.equal(cover(example, claims[4]!.relation.span), 'not in L');
    assert.equal(cover(example, claims[2]!.relation.span), 'not decomposable');
  });
});

describe('statement forms', () => {
  test('field QQ and field GF(7)', () => {
    const qq = only<FieldStmt>('field QQ');
    assert.equal(qq.type, 'field');
    assert.equal(qq.name.name, 'QQ');
    assert.equal(qq.modulus, undefined);
    const text = 'field GF(7)';
    const gf = only<FieldStmt>(text);
    assert.equal(gf.name.name, 'GF');
    assert.equal(gf.modulus?.text, '7');
    assert.equal(cover(text, gf.modulus!.span), '7');
    assert.deepEqual(gf.span, { start: 0, end: text.length });
    assert.deepEqual(gf.keyword, { start: 0, end: 5 });
  });

  test('normalize joins a hyphenated mode into one word', () => {
    const text = 'normalize first-one';
    const n = only<NormalizeStmt>(text);
    assert.equal(n.mode.name, 'first-one');
    assert.equal(cover(text, n.mode.span), 'first-one');
    assert.equal(only<NormalizeStmt>('normalize raw').mode.name, 'raw');
  });

  test('space with and without a named basis', () => {
    const v = only<SpaceStmt>('space V dim 4');
    assert.equal(v.name.name, 'V');
    assert.equal(v.dim.text, '4');
    assert.equal(v.basis, undefined);
    const text = 'space U dim 5 basis a b c d e';
    const u = only<SpaceStmt>(text);
    assert.deepEqual(u.basis?.map((b) => b.name), ['a', 'b', 'c', 'd', 'e']);
    assert.equal(cover(text, u.basis![4]!.span), 'e');
  });

  test('declarations of the three kinds, with `in` and `∈`', () => {
    const text = 'vector p2 = (1, 0, 2, -1) in V';
    const d = only<DeclStmt>(text);
    assert.equal(d.declKind, 'vector');
    assert.equal(d.name.name, 'p2');
    assert.equal(d.inSpace?.name, 'V');
    assert.equal(cover(text, d.inSpace!.span), 'V');
    assert.equal(cover(text, d.value.span), '(1, 0, 2, -1)');
    assert.equal(only<DeclStmt>('subspace L = span(p, q)').declKind, 'subspace');
    assert.equal(only<DeclStmt>('multivector eta = e1^e2').declKind, 'multivector');
    assert.equal(only<DeclStmt>('vector p = (1, 0) ∈ V').inSpace?.name, 'V');
    assert.equal(only<DeclStmt>('vector p = (1, 0)').inSpace, undefined);
  });

  test('claims with every relation, in ASCII and Unicode spellings', () => {
    const rel = (source: string) => {
      const c = only<ClaimStmt>(`claim ${source}`);
      return [prefixForm(c.subject), c.relation.op, c.relation.other ? prefixForm(c.relation.other) : null];
    };
    assert.deepEqual(rel('L = M'), ['L', '=', 'M']);
    assert.deepEqual(rel('L != M'), ['L', '!=', 'M']);
    assert.deepEqual(rel('L ≠ M'), ['L', '!=', 'M']);
    assert.deepEqual(rel('p in L'), ['p', 'in', 'L']);
    assert.deepEqual(rel('p ∈ L'), ['p', 'in', 'L']);
    assert.deepEqual(rel('p not in L'), ['p', 'not in', 'L']);
    assert.deepEqual(rel('p ∉ L'), ['p', 'not in', 'L']);
    assert.deepEqual(rel('eta decomposable'), ['eta', 'decomposable', null]);
    assert.deepEqual(rel('eta not decomposable'), ['eta', 'not decomposable', null]);
    assert.deepEqual(rel('dim (L & M) = 1'), ['(dim (& L M))', '=', '1']);
  });

  test('statements may span lines and share a line', () => {
    const statements = parseClean('space V dim 2 vector p = (1,\n 2) show\n p');
    assert.deepEqual(statements.map((s) => s.type), ['space', 'decl', 'show']);
  });

  test('an empty file and a file of comments are empty programs', () => {
    assert.deepEqual(parseClean(''), []);
    assert.deepEqual(parseClean('# nothing here\n\n   # still nothing\n'), []);
  });
});

describe('expressions and precedence', () => {
  const cases: [string, string][] = [
    ['1/2 e4', '(juxt (/ 1 2) e4)'],
    ['3 e1 - e2 + 1/2 e4', '(+ (- (juxt 3 e1) e2) (juxt (/ 1 2) e4))'],
    ['2 e1^e2', '(juxt 2 (^ e1 e2))'],
    ['2 e1 ∧ e2', '(juxt 2 (^ e1 e2))'],
    ['e1^e2^e3', '(^ (^ e1 e2) e3)'],
    ['e1^e2 + e3^e4', '(+ (^ e1 e2) (^ e3 e4))'],
    ['-e1^e2', '(neg (^ e1 e2))'],
    ['-3 e1', '(juxt (neg 3) e1)'],
    ['+q', '(pos q)'],
    ['a - -b', '(- a (neg b))'],
    ['a * -b', '(* a (neg b))'],
    ['a*b c', '(juxt (* a b) c)'],
    ['a b c', '(juxt (juxt a b) c)'],
    ['x / 2 y', '(juxt (/ x 2) y)'],
    ['3e1', '(juxt 3 e1)'],
    ['2 (e1 + e2)', '(juxt 2 (+ e1 e2))'],
    ['(a + b) c', '(juxt (+ a b) c)'],
    ['a ^ (b + c)', '(^ a (+ b c))'],
    ['L + M & N + P', '(& (+ L M) (+ N P))'],
    ['L ∩ M & N', '(& (& L M) N)'],
    ['L - M', '(- L M)'],
    ['dim L + 1', '(+ (dim L) 1)'],
    ['dim dim L', '(dim (dim L))'],
    ['V.e1 + q', '(+ V.e1 q)'],
    ['V . e1', 'V.e1'],
    ['span(p, q)', '(call span p q)'],
    ['span (p, q)', '(call span p q)'],
    ['f()', '(call f)'],
    ['chart(L, 13)', '(call chart L 13)'],
    ['chart(L, (1, 3))', '(call chart L (tuple 1 3))'],
    ['(x)', 'x'],
    ['((x))', 'x'],
    ['(x, y)', '(tuple x y)'],
    ['(1, 0, 2, -1)', '(tuple 1 0 2 (neg 1))'],
    ['0.125 x', '(juxt 0.125 x)'],
    ['rows [1 0]', '(rows [[1 0]])'],
    ['solutions [ 1 1 0 -1 ]', '(solutions [[1 1 0 -1]])'],
    ['recover(z)', '(call recover z)'],
  ];
  for (const [source, expected] of cases) {
    test(`${source}  ⇒  ${expected}`, () => assert.equal(prefixForm(expr(source)), expected));
  }

  test('1/2 e4 is an implicit product whose left factor is the quotient 1/2, with exact spans', () => {
    const text = 'show 1/2 e4';
    const e = only<ShowStmt>(text).value as Binary;
    assert.equal(e.type, 'binary');
    assert.equal(e.op, '*');
    assert.equal(e.implicit, true);
    assert.equal(cover(text, e.span), '1/2 e4');
    assert.deepEqual(e.opSpan, { start: 8, end: 9 }, 'the gap between the factors');
    const left = e.left as Binary;
    assert.equal(left.op, '/');
    assert.equal(left.implicit, undefined);
    assert.equal(cover(text, left.span), '1/2');
    assert.equal(cover(text, left.opSpan), '/');
    assert.equal(cover(text, e.right.span), 'e4');
  });

  test('parentheses count in the span of the enclosing node but (x) is just x', () => {
    const text = 'show (a + b) c';
    const e = only<ShowStmt>(text).value as Binary;
    assert.equal(cover(text, e.span), '(a + b) c');
    assert.equal(cover(text, e.left.span), 'a + b');
    const t = 'show (x)';
    assert.equal(cover(t, only<ShowStmt>(t).value.span), 'x');
  });

  test('spans of calls, qualified names, unary minus and dim', () => {
    const text = 'show -V.e1 + span(p, q) + dim L';
    const sum = only<ShowStmt>(text).value as Binary;
    const inner = sum.left as Binary;
    assert.equal(inner.left.type, 'unary');
    assert.equal(cover(text, inner.left.span), '-V.e1');
    const name = (inner.left as Extract<Expr, { type: 'unary' }>).operand;
    assert.equal(name.type, 'name');
    if (name.type === 'name') {
      assert.equal(cover(text, name.span), 'V.e1');
      assert.equal(cover(text, name.qualifier!.span), 'V');
      assert.equal(cover(text, name.name.span), 'e1');
    }
    assert.equal(cover(text, inner.right.span), 'span(p, q)');
    assert.equal(inner.right.type === 'call' && cover(text, inner.right.callee.span), 'span');
    assert.equal(cover(text, sum.right.span), 'dim L');
    assert.equal(sum.right.type === 'dim' && cover(text, sum.right.keyword), 'dim');
  });
});

describe('bracket literals', () => {
  const matrix = (source: string) => {
    const e = expr(source);
    assert.equal(e.type, 'matrix');
    return (e as MatrixLit).rows.map((r) => r.map((x) => x.text));
  };

  test('rows split by source line', () => {
    assert.deepEqual(matrix('[ 1 0 2 0\n  0 1 3 1 ]'), [['1', '0', '2', '0'], ['0', '1', '3', '1']]);
  });

  test("rows split by ';'", () => {
    assert.deepEqual(matrix('[1 0; 0 1]'), [['1', '0'], ['0', '1']]);
    assert.deepEqual(matrix('[1, 0; 0, 1; 2, 2]'), [['1', '0'], ['0', '1'], ['2', '2']]);
  });

  test("a ';' at the end of a line does not start a second new row", () => {
    assert.deepEqual(matrix('[1 0 2;\n 0 1 3]'), [['1', '0', '2'], ['0', '1', '3']]);
  });

  test("a ',' at the end of a line continues the row", () => {
    assert.deepEqual(matrix('[1, 0,\n 2, 3]'), [['1', '0', '2', '3']]);
  });

  test('a comment between rows does not change the rows', () => {
    assert.deepEqual(matrix('[1 0   # first row\n 0 1]  # second'), [['1', '0'], ['0', '1']]);
  });

  test('entries are signed exact rationals, written without inner spaces in the AST', () => {
    assert.deepEqual(matrix('[1 -2 +3 -1/2 0.5]'), [['1', '-2', '+3', '-1/2', '0.5']]);
    const text = 'show [- 1 / 2]';
    const m = only<ShowStmt>(text).value as MatrixLit;
    assert.equal(m.rows[0]![0]!.text, '-1/2');
    assert.equal(cover(text, m.rows[0]![0]!.span), '- 1 / 2');
    assert.equal(cover(text, m.span), '[- 1 / 2]');
  });

  test('a single entry is a 1 × 1 matrix', () => {
    assert.deepEqual(matrix('[5]'), [['5']]);
  });

  test("entries separated by ':' make a projective point, also across lines", () => {
    const text = 'show [1 : 3 : 1 : -2 : 0 : -2]';
    const p = only<ShowStmt>(text).value as PointLit;
    assert.equal(p.type, 'point');
    assert.deepEqual(p.entries.map((x) => x.text), ['1', '3', '1', '-2', '0', '-2']);
    assert.equal(cover(text, p.entries[3]!.span), '-2');
    assert.equal(cover(text, p.span), '[1 : 3 : 1 : -2 : 0 : -2]');
    assert.equal(prefixForm(expr('[1 :\n 2 : 3]')), '[1 : 2 : 3]');
  });
});

describe('index maps', () => {
  test('digit-string keys give one label per digit', () => {
    const text = 'show {12: 1, 13: -2, 23: 5}';
    const m = only<ShowStmt>(text).value as IndexMapLit;
    assert.equal(m.type, 'indexmap');
    assert.deepEqual(m.entries.map((e) => e.key.labels), [[1, 2], [1, 3], [2, 3]]);
    assert.deepEqual(m.entries.map((e) => e.value.text), ['1', '-2', '5']);
    assert.equal(cover(text, m.entries[1]!.span), '13: -2');
    assert.equal(cover(text, m.entries[1]!.key.span), '13');
  });

  test('parenthesised keys give the numbers, needed for labels of two digits', () => {
    const text = 'show {(1, 10): 3, (2, 3): -1/2}';
    const m = only<ShowStmt>(text).value as IndexMapLit;
    assert.deepEqual(m.entries.map((e) => e.key.labels), [[1, 10], [2, 3]]);
    assert.deepEqual(m.entries.map((e) => e.value.text), ['3', '-1/2']);
    assert.equal(cover(text, m.entries[0]!.key.span), '(1, 10)');
  });

  test("the key '13' is [1, 3] and '(1, 10)' is [1, 10]", () => {
    assert.equal(prefixForm(expr('{13: 1}')), '{(1,3): 1}');
    assert.equal(prefixForm(expr('{(1, 10): 1}')), '{(1,10): 1}');
  });
});

describe('lexical details', () => {
  test('Unicode letters in names, primes, and the Unicode operator spellings', () => {
    assert.equal(only<DeclStmt>('multivector η = e1 ∧ e2').name.name, 'η');
    assert.equal(only<DeclStmt>('vector café = e1').name.name, 'café');
    assert.equal(only<DeclStmt>('vector 𝔳 = e1').name.name, '𝔳', 'a letter outside the Basic Multilingual Plane');
    assert.equal(prefixForm(expr("p' + q''")), "(+ p' q'')");
    assert.equal(prefixForm(expr('L ∩ M')), '(& L M)');
    assert.equal(prefixForm(expr('e1 ∧ e2')), '(^ e1 e2)');
  });

  test('spans are UTF-16 offsets, also after characters outside the Basic Multilingual Plane', () => {
    const text = 'vector 𝔳 = e1';
    const d = only<DeclStmt>(text);
    assert.deepEqual(d.name.span, { start: 7, end: 9 });
    assert.equal(cover(text, d.value.span), 'e1');
  });

  test('keywords are whole words: names may start with a keyword', () => {
    assert.equal(prefixForm(expr('index + inner + dimension + shows + rowspace + notL')), '(+ (+ (+ (+ (+ index inner) dimension) shows) rowspace) notL)');
  });

  test('comments run to the end of the line, anywhere', () => {
    const statements = parseClean('field QQ # the rationals\n# a whole line\nspace V dim 4# no space needed\n');
    assert.deepEqual(statements.map((s) => s.type), ['field', 'space']);
  });

  test('decimal numbers keep their text', () => {
    assert.equal(prefixForm(expr('0.125')), '0.125');
  });

  test('Windows line endings', () => {
    const statements = parseClean('space V dim 2\r\nsubspace M = rows [1 0\r\n 0 1]\r\n');
    const m = (statements[1] as DeclStmt).value;
    assert.equal(m.type === 'rows' && m.matrix.rows.length, 2);
  });
});

describe('the grammar and the token definitions themselves', () => {
  // The shared parser and lexer skip the library's checks of the grammar to load quickly; these build them
  // with the checks on, so that a change of the grammar that makes it ambiguous fails here.
  test('the parser builds with the grammar checks on', async () => {
    const { StatementParser } = await import('../../server/src/language/parser.js');
    assert.doesNotThrow(() => new StatementParser({ statement: undefined, following: undefined }, { validate: true }));
  });

  test('the lexer builds with the token checks on and lexes like the shared one', async () => {
    const { wedgeLexer } = await import('../../server/src/language/tokens.js');
    const text = 'space V dim 3\nvector p = (1, 2, 3) # a comment\n';
    const checked = wedgeLexer({ validate: true }).tokenize(text);
    assert.deepEqual(checked.errors, []);
    assert.deepEqual(
      checked.tokens.map((t) => t.image),
      wedgeLexer().tokenize(text).tokens.map((t) => t.image),
    );
  });
});
