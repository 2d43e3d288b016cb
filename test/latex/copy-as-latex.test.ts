/**
 * "Copy as LaTeX" (the LaTeX of each code lens), compiled by pdfLaTeX: every result of every sample,
 * each in display math, in one minimal document. The PDF's text must show Plücker vectors worked out
 * here independently, as mathjs determinants (./reference-values.ts).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze, lensesFor } from '../../server/src/language/index.js';
import { ROOT } from '../support/bundles.js';
import { compileToText, document, requireTexTools, scratchFolder, squeeze } from './tex-engine.js';
import { maximalMinors, pointText, primitive, vectorOf } from './reference-values.js';

const SAMPLES = join(ROOT, 'samples');
const samples = [
  ...readdirSync(SAMPLES).filter((f) => f.endsWith('.wedge')).sort(),
  'paper-planes-in-five-space/computation.wedge',
];

describe('copy as LaTeX, compiled', { timeout: 120_000 }, () => {
  let folder: ReturnType<typeof scratchFolder>;
  before(() => {
    requireTexTools();
    folder = scratchFolder('copy');
  });
  after(() => folder?.done());

  test('the LaTeX of every lens of every sample compiles in display math and shows the computed values', () => {
    let copied = 0;
    const body = samples.flatMap((file) => {
      const lenses = lensesFor(analyze(readFileSync(join(SAMPLES, file), 'utf8'), { evaluate: true })).filter((l) => l.latex.trim().length > 0);
      copied += lenses.length;
      return lenses.map((l) => `\\[ ${l.latex} \\]`);
    });
    assert.ok(copied > 100, `${copied} results copied`);
    const pdf = squeeze(compileToText(folder.dir, 'copied', document(body.join('\n'))));

    const rig = readFileSync(join(SAMPLES, 'rig-sight-lines.wedge'), 'utf8');
    const sightB = primitive(maximalMinors([[4, 0, 0, 1], vectorOf(rig, 'targetB')]));
    assert.ok(pdf.includes(squeeze(`=${pointText(sightB)}`)), `sight line B (cameraB = 4 e1 + e4) ${pointText(sightB)}`);
    const paper = readFileSync(join(SAMPLES, 'paper-planes-in-five-space/computation.wedge'), 'utf8');
    const U = primitive(maximalMinors([vectorOf(paper, 'b'), vectorOf(paper, 'c')]));
    assert.ok(pdf.includes(squeeze(`=${pointText(U)}`)), `the plane U ${pointText(U)}`);
  });
});
