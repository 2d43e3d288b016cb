/**
 * The LaTeX macros of evaluated files (docs/latex-macros.md): which results give which macros, their
 * values, clashes, the macros file written and read back, the sync comparison and the macros a paper
 * uses.
 *
 * Outside facts: Plücker coordinates are the 2×2 minors of the basis rows (common practice, no
 * source), computed here with mathjs determinants as an independent reference; two independent
 * vectors span a plane (common practice, no source); e1∧e2 + e3∧e4 fails the relation
 * p12·p34 − p13·p24 + p14·p23 = 0 with value 1 (the Klein quadric; Harris, "Algebraic Geometry: A First
 * Course", Lecture 6, from memory). A TeX control word ends at the first non-letter, and `%` starts a
 * comment to the end of the line (Knuth, The TeXbook, chapters 3 and 7, from memory).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { create, all } from 'mathjs';
import {
  analyze,
  buildMacros,
  compareMacros,
  macroReferencesAt,
  macroUses,
  parseMacrosFile,
  renderMacrosFile,
  type MacroDefinition,
} from '../../server/src/language/index.js';

const math = create(all, { number: 'Fraction' });

const p = [1, 0, 2, -1];
const q = [3, -1, 0, 1];

const FILE = [
  'space V dim 4',
  `vector p = (${p.join(', ')})`,
  `vector q = (${q.join(', ')})`,
  'subspace L = span(p, q)',
  'claim dim L = 2',
  'show chart(L, 13)',
  'show plucker(L)',
  'show plucker(L)',
  'multivector eta = e1^e2 + e3^e4',
  'claim eta decomposable',
  '',
].join('\n');

/** The Plücker vector of span(u, v) in lexicographic order, by mathjs determinants, made primitive. */
function primitivePlucker(u: number[], v: number[]): number[] {
  const minors: number[] = [];
  for (let i = 0; i < u.length; i++) {
    for (let j = i + 1; j < u.length; j++) {
      minors.push(Number(math.det(math.matrix([[u[i]!, u[j]!], [v[i]!, v[j]!]]))));
    }
  }
  const gcd = (a: number, b: number): number => (b === 0 ? Math.abs(a) : gcd(b, a % b));
  const g = minors.reduce(gcd, 0);
  const sign = Math.sign(minors.find((x) => x !== 0)!);
  return minors.map((x) => (sign * x) / g);
}

function macrosOf(text: string, file = 'study.wedge') {
  return buildMacros([{ file, analysis: analyze(text, { evaluate: true }) }]);
}

function valueOf(macros: readonly MacroDefinition[], name: string): string {
  const m = macros.find((x) => x.name === name);
  assert.ok(m, `\\${name} is defined; the names are ${macros.map((x) => x.name).join(' ')}`);
  return m.value;
}

describe('which results give macros, and their values', () => {
  const { macros, problems } = macrosOf(FILE);

  test('no problems, and every name is one control word of the ww prefix', () => {
    assert.deepEqual(problems, []);
    for (const m of macros) assert.match(m.name, /^ww[A-Za-z]+$/);
  });

  test('a subspace: its value, its dimension and its labelled Plücker vector, the minors checked by mathjs', () => {
    const point = primitivePlucker(p, q).join(' : ');
    const labelled = `\\bigl(p_{12}, p_{13}, p_{14}, p_{23}, p_{24}, p_{34}\\bigr) = \\bigl[${point}\\bigr]`;
    assert.equal(valueOf(macros, 'wwLPlucker'), `\\ensuremath{${labelled}}`);
    assert.equal(valueOf(macros, 'wwLDim'), '\\ensuremath{2}');
    assert.match(valueOf(macros, 'wwL'), /^\\ensuremath\{.*\}$/);
    assert.ok(valueOf(macros, 'wwL').includes(point));
  });

  test('declared vectors and the space get their own macros', () => {
    assert.equal(valueOf(macros, 'wwp'), `\\ensuremath{\\begin{pmatrix} ${p.join(' & ')} \\end{pmatrix}}`);
    assert.ok(valueOf(macros, 'wwV').includes('4'));
  });

  test('show lines are named from their words; the same line twice is one macro', () => {
    assert.ok(valueOf(macros, 'wwChartLOneThree').includes('I_{2}'));
    assert.ok(valueOf(macros, 'wwPluckerL').includes(primitivePlucker(p, q).join(' : ')));
    assert.equal(macros.filter((m) => m.name === 'wwPluckerL').length, 1);
  });

  test('claims: the outcome and the verdict; a false decomposability claim carries the failed relation and its value', () => {
    assert.equal(valueOf(macros, 'wwClaimDimLTwo'), '\\textup{holds}');
    assert.equal(valueOf(macros, 'wwClaimDimLTwoVerdict'), '\\textup{holds}');
    assert.equal(valueOf(macros, 'wwClaimEtaDecomposableVerdict'), '\\textup{false}');
    const relation = valueOf(macros, 'wwClaimEtaDecomposable').replace(/\\,/g, ' ').replace(/\s+/g, ' ');
    assert.ok(relation.includes('p_{12} p_{34} - p_{13} p_{24} + p_{14} p_{23} = 1'), relation);
  });

  test('the macro references of the statement at the cursor, main macro first', () => {
    const analysis = analyze(FILE, { evaluate: true });
    assert.deepEqual(macroReferencesAt(analysis, FILE.indexOf('subspace L') + 3), ['\\wwL', '\\wwLDim', '\\wwLBasis', '\\wwLPlucker']);
    assert.deepEqual(macroReferencesAt(analysis, FILE.indexOf('show chart') + 1), ['\\wwChartLOneThree']);
    assert.deepEqual(macroReferencesAt(analysis, FILE.indexOf('# nothing')), []);
  });
});

describe('clashes', () => {
  test('two names with one macro name and different values: an error naming both statements', () => {
    const text = 'space V dim 2\nvector w_1 = (1, 0)\nvector wOne = (0, 1)\n';
    const { macros, problems } = macrosOf(text);
    assert.equal(problems.length, 1);
    assert.equal(problems[0]!.code, 'macro/clash');
    assert.match(problems[0]!.message, /\\wwwOne/);
    assert.deepEqual(problems[0]!.places.map((pl) => text.slice(pl.span.start, pl.span.end)), ['vector wOne = (0, 1)', 'vector w_1 = (1, 0)']);
    assert.equal(macros.filter((m) => m.name === 'wwwOne').length, 1);
  });

  test('across files, the places name their files', () => {
    const set = buildMacros([
      { file: 'a.wedge', analysis: analyze('space V dim 2\nvector x = (1, 0)\n', { evaluate: true }) },
      { file: 'b.wedge', analysis: analyze('space V dim 2\nvector x = (0, 1)\n', { evaluate: true }) },
    ]);
    assert.deepEqual(set.problems.map((pr) => pr.places.map((pl) => pl.file)), [['b.wedge', 'a.wedge']]);
  });

  test('a name with no spelling in letters is reported, not given a wrong macro', () => {
    const { macros, problems } = macrosOf('space V dim 2\nvector ж = (1, 0)\n');
    assert.deepEqual(problems.map((pr) => pr.code), ['macro/unspellable-name']);
    assert.ok(macros.every((m) => /^ww[A-Za-z]+$/.test(m.name)));
  });
});

describe('the macros file', () => {
  const { macros } = macrosOf(FILE);
  const header = {
    version: '9.9.9',
    sources: [{ path: 'study.wedge', sha256: 'a'.repeat(64), convention: 'Convention: field QQ; lex.' }],
    refresh: 'wedgework export --tex results.tex study.wedge',
    guard: '0123abcd',
  };
  const text = renderMacrosFile(header, macros);

  test('a header of comments, a guard against a second reading, one \\newcommand per macro', () => {
    const lines = text.split('\n');
    assert.match(lines[0]!, /^% Wedgework 9\.9\.9: /);
    assert.ok(lines.some((l) => l === `% Source: study.wedge sha256 ${'a'.repeat(64)}`));
    assert.ok(lines.some((l) => l.startsWith('% Convention of study.wedge: field QQ')));
    assert.ok(lines.some((l) => l.includes(header.refresh)));
    assert.ok(lines.includes('\\expandafter\\ifx\\csname wedgework@macros@0123abcd\\endcsname\\relax\\else\\expandafter\\endinput\\fi'));
    assert.equal(lines.filter((l) => l.startsWith('\\newcommand')).length, macros.length);
  });

  test('read back, it gives the same names, values and sources', () => {
    const parsed = parseMacrosFile(text);
    assert.equal(parsed.generated, true);
    assert.equal(parsed.version, '9.9.9');
    assert.deepEqual(parsed.sources.map((s) => [s.path, s.sha256]), [['study.wedge', 'a'.repeat(64)]]);
    assert.deepEqual(parsed.macros.map((m) => [m.name, m.value]), macros.map((m) => [m.name, m.value]));
    assert.deepEqual(compareMacros(macros, parsed), []);
  });

  test('compared with a changed computation: changed, missing and gone macros', () => {
    const changed = FILE.replace('vector q = (3, -1, 0, 1)', 'vector q = (3, -1, 0, 5)').replace('claim dim L = 2\n', 'claim dim L = 2\nvector r = (0, 0, 0, 1)\n').replace('show chart(L, 13)\n', '');
    const now = macrosOf(changed).macros;
    const kinds = compareMacros(now, parseMacrosFile(text)).map((d) => `${d.kind} ${d.name}`);
    assert.ok(kinds.includes('changed wwq'));
    assert.ok(kinds.includes('changed wwLPlucker'));
    assert.ok(kinds.includes('missing wwr'));
    assert.ok(kinds.includes('gone wwChartLOneThree'));
    assert.ok(!kinds.some((k) => k.endsWith(' wwp') || k.endsWith(' wwLDim')), kinds.join(', '));
  });
});

describe('macros a paper uses', () => {
  test('control words of the prefix, outside comments; a line break \\\\ followed by ww is none', () => {
    const paper = 'We have \\wwLDim{} and $\\wwLPlucker$. % \\wwCommentedOut\n50\\% of \\wwp\\\\ww and \\www1\n';
    assert.deepEqual(macroUses(paper).map((u) => u.name), ['wwLDim', 'wwLPlucker', 'wwp', 'www']);
    assert.equal(paper.slice(macroUses(paper)[0]!.offset).startsWith('\\wwLDim'), true);
  });
});
