/**
 * The macros file of `wedgework export --tex`, compiled by pdfLaTeX inside a small document that uses
 * every macro it defines (and `\input`s it twice, which the guard makes safe), for the sample paper's
 * computation and for every sample. The PDF's text must show the values, checked against numbers
 * computed here independently: Plücker coordinates as mathjs determinants (./reference-values.ts),
 * the chart [I | Y] as inv(B_I)·B with mathjs (the chart where p_I ≠ 0 has the identity in the
 * columns I; common practice, no source), and the relation p12·p34 − p13·p24 + p14·p23 of
 * e1∧e2 + e3∧e4, 1·1 − 0·0 + 0·0 = 1, by hand (the Klein quadric; Harris, "Algebraic Geometry: A First
 * Course", Lecture 6, from memory).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { create, all } from 'mathjs';
import { analyze } from '../../server/src/language/index.js';
import { buildExport } from '../../cli/src/macros.js';
import type { CheckedFile } from '../../cli/src/report.js';
import { ROOT } from '../support/bundles.js';
import { compileToText, document, requireTexTools, labelled, scratchFolder, squeeze, typesetValue } from './tex-engine.js';
import { maximalMinors, pointText, primitive, vectorOf } from './reference-values.js';

const math = create(all, { number: 'Fraction' });
const PAPER_DIR = join(ROOT, 'samples/paper-planes-in-five-space');

function exportOf(path: string, name: string) {
  const text = readFileSync(path, 'utf8');
  const checked: CheckedFile[] = [{ file: name, text, analysis: analyze(text, { evaluate: true }) }];
  return buildExport(checked, '0.1.0', 'results.tex', 'primitive');
}

/** A document that \input's the macros file twice and typesets every macro after its name. */
function usingEveryMacro(names: readonly string[]): string {
  const body = names.map(labelled).join('\n');
  return document(`\\input{results.tex}\n\\input{results.tex}\n${body}`);
}

describe('the macros file, compiled', { timeout: 120_000 }, () => {
  let folder: ReturnType<typeof scratchFolder>;
  before(() => {
    requireTexTools();
    folder = scratchFolder('macros');
  });
  after(() => folder?.done());

  test("the sample paper's computation: every macro typesets, with the values computed independently", () => {
    const source = readFileSync(join(PAPER_DIR, 'computation.wedge'), 'utf8');
    const exported = exportOf(join(PAPER_DIR, 'computation.wedge'), 'computation.wedge');
    assert.deepEqual(exported.set.problems, []);
    writeFileSync(join(folder.dir, 'results.tex'), exported.text);
    const names = exported.set.macros.map((m) => m.name);
    const text = compileToText(folder.dir, 'every-macro', usingEveryMacro(names));

    for (const n of names) assert.ok(text.includes(`\\${n}:`), `\\${n} is typeset`);
    const [a, b, c] = ['a', 'b', 'c'].map((v) => vectorOf(source, v));
    const W = pointText(primitive(maximalMinors([a!, b!])));
    const U = pointText(primitive(maximalMinors([b!, c!])));
    const labels = 'p12,p13,p14,p15,p23,p24,p25,p34,p35,p45=';
    assert.equal(typesetValue(text, 'wwWPlucker'), squeeze(`${labels}${W}`));
    assert.equal(typesetValue(text, 'wwUPlucker'), squeeze(`${labels}${U}`));
    assert.equal(typesetValue(text, 'wwPluckerU'), squeeze(`${labels}${U}`));
    assert.equal(typesetValue(text, 'wwWDim'), '2', 'two independent vectors span a plane');
    assert.equal(typesetValue(text, 'wwDimWU'), '3', 'a, b, c are independent: W + U is 3-dimensional');

    // The chart where p12 ≠ 0: the basis with the identity in columns 1 and 2.
    const B = math.matrix([a!, b!]);
    const chart = math.multiply(math.inv(math.subset(B, math.index([0, 1], [0, 1]))), B).toArray() as unknown[][];
    for (const row of chart) assert.ok(squeeze(text).includes(squeeze(row.map((x) => math.format(x as never)).join(' '))), `chart row ${row.join(' ')}`);

    // The relation and its value; pdftotext renders \neq as a combining stroke before '='.
    assert.match(typesetValue(text, 'wwClaimThetaNotDecomposable'), /^p12p34-p13p24\+p14p23=1\p{M}?=0$/u);
    assert.equal(typesetValue(text, 'wwClaimThetaNotDecomposableVerdict'), 'holds');
  });

  for (const file of readdirSync(join(ROOT, 'samples')).filter((f) => f.endsWith('.wedge')).sort()) {
    test(`${file}: every macro of its export typesets`, () => {
      const exported = exportOf(join(ROOT, 'samples', file), file);
      assert.deepEqual(exported.set.problems.map((p) => p.message), []);
      writeFileSync(join(folder.dir, 'results.tex'), exported.text);
      const names = exported.set.macros.map((m) => m.name);
      const text = compileToText(folder.dir, `every-macro-${file.replace(/\.wedge$/, '')}`, usingEveryMacro(names));
      for (const n of names) assert.ok(text.includes(`\\${n}:`), `\\${n} is typeset`);
    });
  }
});
