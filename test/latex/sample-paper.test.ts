/**
 * The sample paper (samples/paper-planes-in-five-space), compiled by pdfLaTeX as its author would:
 * paper.tex `\input`s the committed results.tex, and the PDF's text shows the values, checked against
 * Plücker vectors worked out here independently as mathjs determinants (./reference-values.ts). Then
 * a value of the computation changes, the export is refreshed with `wedgework export`, and the PDF
 * shows the new values and not the old ones.
 *
 * Facts used (common practice, no source): two independent vectors span a plane, and three
 * independent vectors span a 3-dimensional space.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { cpSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { runCli } from '../../cli/src/cli.js';
import { ROOT } from '../support/bundles.js';
import { compileToText, requireTexTools, scratchFolder, squeeze } from './tex-engine.js';
import { maximalMinors, pointText, primitive, reducedRows, vectorOf } from './reference-values.js';

const LABELS = 'p12,p13,p14,p15,p23,p24,p25,p34,p35,p45=';

/** `wedgework ARGS…` in-process, in `dir`, on the real files there. */
async function wedgework(dir: string, ...args: string[]): Promise<{ status: number; out: string }> {
  let out = '';
  const status = await runCli(args, '0.1.0', {
    stdout: (t) => (out += t),
    stderr: (t) => (out += t),
    readFile: async (path) => readFileSync(join(dir, path), 'utf8'),
    writeFile: async (path, text) => writeFileSync(join(dir, path), text),
  });
  return { status, out };
}

describe('the sample paper, compiled', { timeout: 120_000 }, () => {
  let folder: ReturnType<typeof scratchFolder>;
  before(() => {
    requireTexTools();
    folder = scratchFolder('paper');
    cpSync(join(ROOT, 'samples/paper-planes-in-five-space'), folder.dir, { recursive: true });
  });
  after(() => folder?.done());

  test('as committed, the PDF shows the computed values', () => {
    const computation = readFileSync(join(folder.dir, 'computation.wedge'), 'utf8');
    const [a, b, c] = ['a', 'b', 'c'].map((v) => vectorOf(computation, v));
    const pdf = squeeze(compileToText(folder.dir, 'paper'));
    assert.ok(pdf.includes(squeeze(`${LABELS}${pointText(primitive(maximalMinors([a!, b!])))}`)), 'the Plücker vector of W');
    assert.ok(pdf.includes(squeeze(`${LABELS}${pointText(primitive(maximalMinors([b!, c!])))}`)), 'the Plücker vector of U');
    assert.ok(pdf.includes(squeeze('W has dimension 2, reduced basis')), 'W is a plane');
    for (const row of reducedRows([a!, b!])) assert.ok(pdf.includes(squeeze(row.join(' '))), `the reduced basis row ${row.join(' ')}`);
    assert.ok(pdf.includes(squeeze('span a space of dimension 3.')), 'a, b, c are independent');
    assert.ok(pdf.includes(squeeze('the claim that b lies on it holds')));
  });

  test('the decomposition the paper prints wedges back to the form', () => {
    // ω = e1∧e2 + e1∧e3 + e2∧e3: the coordinates p12, p13, p23 are 1, the others 0 (lexicographic order).
    const omega = [1, 1, 0, 0, 1, 0, 0, 0, 0, 0];
    const macros = readFileSync(join(folder.dir, 'results.tex'), 'utf8');
    const line = /\\newcommand\{\\wwomegaDecomposition\}\{(.*)\}$/m.exec(macros)?.[1] ?? '';
    const vectors = [...line.matchAll(/\\begin\{pmatrix\}(.*?)\\end\{pmatrix\}/g)].map((m) => m[1]!.split('&').map((x) => Number(x.trim())));
    assert.equal(vectors.length, 2, line);
    assert.deepEqual(primitive(maximalMinors(vectors)), omega, 'the two vectors wedge to ω (mathjs minors)');
    const pdf = squeeze(compileToText(folder.dir, 'paper'));
    const printed = squeeze(`${vectors[0]!.join(' ')} ∧ ${vectors[1]!.join(' ')}`);
    assert.ok(pdf.includes(printed), 'printed in the PDF');
  });

  test('after a change and a refresh of the export, the PDF shows the new values', async () => {
    const path = join(folder.dir, 'computation.wedge');
    const changed = readFileSync(path, 'utf8').replace('vector c = (1, 1, 0, 1, 2)', 'vector c = (1, 2, 0, 1, 5)');
    writeFileSync(path, changed);
    assert.equal((await wedgework(folder.dir, 'check', '--tex', 'results.tex', '--paper', 'paper.tex', 'computation.wedge')).status, 1, 'stale');
    const refreshed = await wedgework(folder.dir, 'export', '--tex', 'results.tex', 'computation.wedge');
    assert.equal(refreshed.status, 0, refreshed.out);
    assert.equal((await wedgework(folder.dir, 'check', '--tex', 'results.tex', '--paper', 'paper.tex', 'computation.wedge')).status, 0, 'in sync');

    const [b, c] = ['b', 'c'].map((v) => vectorOf(changed, v));
    const before = pointText(primitive(maximalMinors([b!, [1, 1, 0, 1, 2]])));
    const after = pointText(primitive(maximalMinors([b!, c!])));
    assert.notEqual(after, before);
    const pdf = squeeze(compileToText(folder.dir, 'paper'));
    assert.ok(pdf.includes(squeeze(`${LABELS}${after}`)), `the new Plücker vector of U, ${after}`);
    assert.ok(!pdf.includes(squeeze(`${LABELS}${before}`)), 'and not the old one');
  });
});
