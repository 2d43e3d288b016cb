/**
 * The LaTeX export of a file's results: a comment header with the file name
 * and the convention, one item per result with its LaTeX in display math,
 * and source that is well-formed by a structural check (./latex-structure.ts,
 * itself tested on broken input first). Compiling it with a TeX engine is
 * left to a later test. Coordinates are checked against mathjs determinants.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { create, all } from 'mathjs';
import { analyze, exportLatex } from '../../server/src/language/index.js';
import { codeLatex } from '../../server/src/language/latex-export.js';
import { ROOT } from '../support/bundles.js';
import { checkLatexStructure } from './latex-structure.js';

const math = create(all, { number: 'Fraction' });

describe('the structural check', () => {
  test('accepts balanced source and rejects the usual breakages', () => {
    checkLatexStructure('% a comment with { and $\n\\begin{description}\n  \\item[{x $a$}] \\texttt{\\{\\}}\n  \\[ \\left(\\begin{array}{c|c} 1 & 2 \\end{array}\\right) \\]\n\\end{description}\n');
    for (const bad of [
      '\\begin{description}\\item x',
      '\\begin{description}\\end{itemize}',
      '{',
      '}',
      '\\[ x',
      '\\[ \\[ x \\] \\]',
      '$x',
      '\\item x',
      '\\[ \\left( x \\]',
      '\\[ \\bigl[ x \\]',
      '\\[ x ∧ y \\]',
    ]) {
      assert.throws(() => checkLatexStructure(bad), Error, bad);
    }
  });
});

describe('exportLatex', () => {
  const samples = readdirSync(join(ROOT, 'samples')).filter((f) => f.endsWith('.wedge'));

  test('every sample exports to a well-formed fragment with one item per result', () => {
    assert.ok(samples.length > 0);
    for (const file of samples) {
      const analysis = analyze(readFileSync(join(ROOT, 'samples', file), 'utf8'), { evaluate: true });
      const fragment = exportLatex(analysis, file);
      assert.doesNotThrow(() => checkLatexStructure(fragment), file);
      const lines = fragment.split('\n');
      assert.equal(lines[0], `% Wedgework results of ${file}`);
      assert.match(lines[1]!, /^% Convention: field /);
      const results = analysis.results.filter((r) => r.kind !== 'field');
      assert.equal((fragment.match(/\\item\[/g) ?? []).length, results.length, file);
      for (const r of results) if (r.latex.trim()) assert.ok(fragment.includes(`\\[ ${r.latex} \\]`), `${file}: ${r.name ?? r.kind}`);
    }
  });

  test('a subspace: its labelled Plücker point (mathjs minors) in display math, under the convention', () => {
    const text = 'space V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nclaim dim W = 3\nshow plucker(W)\n';
    const fragment = exportLatex(analyze(text, { evaluate: true }), 'planes & lines_1.wedge');
    const minors: string[] = [];
    for (let i = 0; i < 4; i++) {
      for (let j = i + 1; j < 4; j++) {
        const d = math.det(math.matrix([[[1, 0, 2, 0][i]!, [1, 0, 2, 0][j]!], [[0, 1, 3, 1][i]!, [0, 1, 3, 1][j]!]]));
        minors.push(String(d));
      }
    }
    assert.ok(fragment.includes(`\\bigl(p_{12}, p_{13}, p_{14}, p_{23}, p_{24}, p_{34}\\bigr) = \\bigl[${minors.join(' : ')}\\bigr]`));
    assert.match(fragment, /^% Wedgework results of planes & lines_1\.wedge$/m, 'a comment needs no escaping');
    assert.match(fragment, /^% 1 error was reported/m);
    assert.match(fragment, /\\item\[\{subspace \$W\$\}\]/);
    assert.match(fragment, /\\item\[\{claim\}\] \\texttt\{dim W = 3\} is false\./);
    assert.match(fragment, /\\item\[\{show\}\] \\texttt\{plucker\(W\)\}/);
    checkLatexStructure(fragment);
  });

  test('a Schubert claim typesets λ as \\lambda', () => {
    const fragment = exportLatex(analyze('space V dim 4\nsubspace W = span(e2, e4)\nclaim schubert(W) = (1)\n', { evaluate: true }), 'cells.wedge');
    assert.ok(fragment.includes('\\[ \\lambda = (1, 0) \\]'), fragment);
    checkLatexStructure(fragment);
  });

  test('code quoted from the file has its special characters and symbols escaped', () => {
    const code = codeLatex('eta ∧ eta ≠ {x_1: 2} & 50% # ~ ^ \\ $ η');
    assert.equal(code, '\\texttt{eta $\\wedge$ eta $\\neq$ \\{x\\_1: 2\\} \\& 50\\% \\# \\~{} \\^{} \\textbackslash{} \\$ $\\eta$}');
    checkLatexStructure(code);
  });

  test('a file with no results says so, and is still well-formed', () => {
    const fragment = exportLatex(analyze('# nothing yet\n', { evaluate: true }), 'empty.wedge');
    assert.match(fragment, /% No results\./);
    assert.doesNotMatch(fragment, /\\begin/);
    checkLatexStructure(fragment);
  });
});
