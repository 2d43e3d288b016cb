/**
 * Data-driven checks of the whole language pipeline: the input carries its
 * expected problems inline (carets under the offending span and the code, as
 * in `annotated-source.ts`), and the analysis must report exactly those.
 */
import assert from 'node:assert/strict';
import { analyze, type Analysis, type AnalyzeOptions } from '../../server/src/language/index.js';
import { readAnnotated } from './annotated-source.js';

export function expectAnalysis(source: string, options: Partial<AnalyzeOptions> = {}): Analysis {
  const { text, expected } = readAnnotated(source);
  const analysis = analyze(text, { evaluate: true, ...options });
  const show = (p: { code: string; span: { start: number; end: number } }) =>
    `${p.code} ${JSON.stringify(text.slice(p.span.start, p.span.end))}@${p.span.start}`;
  assert.deepEqual(
    analysis.problems.map(show).sort(),
    expected.map(show).sort(),
    `problems of:\n${text}\nmessages:\n${analysis.problems.map((p) => `  ${p.code}: ${p.message}`).join('\n')}`,
  );
  return analysis;
}

/** The result declared under `name`; fails the test when there is none. */
export function resultNamed(analysis: Analysis, name: string) {
  const r = analysis.results.find((x) => x.name === name);
  assert.ok(r, `no result named ${name}; results: ${analysis.results.map((x) => x.name ?? x.kind).join(', ')}`);
  return r;
}
