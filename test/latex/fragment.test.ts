/**
 * The `.tex` fragment `wedgework check --latex` writes (exportLatex), compiled by pdfLaTeX: the
 * fragments of every sample `\input` into one document. The PDF's text must show Plücker vectors
 * worked out here independently, as mathjs determinants (./reference-values.ts).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze, exportLatex } from '../../server/src/language/index.js';
import { ROOT } from '../support/bundles.js';
import { compileToText, document, requireTexTools, scratchFolder, squeeze } from './tex-engine.js';
import { maximalMinors, pointText, primitive, vectorOf } from './reference-values.js';

const SAMPLES = join(ROOT, 'samples');
const samples = [
  ...readdirSync(SAMPLES).filter((f) => f.endsWith('.wedge')).sort(),
  'paper-planes-in-five-space/computation.wedge',
];

describe('the --latex fragment, compiled', { timeout: 120_000 }, () => {
  let folder: ReturnType<typeof scratchFolder>;
  before(() => {
    requireTexTools();
    folder = scratchFolder('fragment');
  });
  after(() => folder?.done());

  test('the fragments of every sample compile in one document and show the computed values', () => {
    const inputs = samples.map((file, i) => {
      const text = readFileSync(join(SAMPLES, file), 'utf8');
      writeFileSync(join(folder.dir, `fragment-${i}.tex`), exportLatex(analyze(text, { evaluate: true }), file));
      return `\\section*{${file.replace(/_/g, '\\_')}}\n\\input{fragment-${i}.tex}`;
    });
    const pdf = squeeze(compileToText(folder.dir, 'fragments', document(inputs.join('\n'))));

    const rig = readFileSync(join(SAMPLES, 'rig-sight-lines.wedge'), 'utf8');
    const sightA = primitive(maximalMinors([vectorOf(rig, 'cameraA'), vectorOf(rig, 'targetA')]));
    assert.ok(pdf.includes(squeeze(`p12,p13,p14,p23,p24,p34=${pointText(sightA)}`)), `sight line A ${pointText(sightA)}`);
    const paper = readFileSync(join(SAMPLES, 'paper-planes-in-five-space/computation.wedge'), 'utf8');
    const W = primitive(maximalMinors([vectorOf(paper, 'a'), vectorOf(paper, 'b')]));
    assert.ok(pdf.includes(squeeze(`=${pointText(W)}`)), `the plane W ${pointText(W)}`);
    // Claims read as sentences: "… holds." for the paper's claims.
    assert.ok(pdf.includes(squeeze('dim W = 2 holds.')));
  });
});
