/**
 * Fuzzing of the language facade (server/src/language/index.ts): the sample
 * files cut short at many offsets, mutated with a seeded generator and
 * spliced together, and a list of hostile documents, each put through every
 * feature. The facade promises never to throw on user input and to hand out
 * spans inside the document (common practice for editor tooling, no source);
 * the test fails on a broken promise. Slow inputs are counted and printed as
 * hangs, not failed, since unit tests assert no timings.
 *
 * Larger runs: WEDGEWORK_FUZZ_SCALE=20 node scripts/run-tests.mjs fuzz (or npm run fuzz).
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { FUZZ_BUDGET } from './fuzz-budget.js';
import { hostileDocuments, mutations, sampleFiles, splices, truncations, type FuzzInput } from './hostile-inputs.js';
import { probeFacade } from './facade-probe.js';
import { SeededRandom } from './seeded-random.js';

function allInputs(): FuzzInput[] {
  const random = new SeededRandom(FUZZ_BUDGET.seed);
  const samples = sampleFiles();
  return [
    ...samples,
    ...samples.flatMap((s) => truncations(s, FUZZ_BUDGET.truncationsPerSample, random)),
    ...samples.flatMap((s) => mutations(s, FUZZ_BUDGET.mutationsPerSample, random)),
    ...splices(samples, FUZZ_BUDGET.splices, random),
    ...hostileDocuments(samples, FUZZ_BUDGET.longChain),
  ];
}

test('no input makes the facade throw or hand out a span outside the document', () => {
  const inputs = allInputs();
  const crashes: string[] = [];
  const badRanges: string[] = [];
  const hangs: string[] = [];
  let splitSurrogates = 0;
  let slowest = { label: '', ms: 0 };
  inputs.forEach((input, index) => {
    const outcome = probeFacade(input.text, index, FUZZ_BUDGET.offsetsPerInput);
    // One line per distinct finding of an input (a feature asked at several offsets repeats itself).
    crashes.push(...new Set(outcome.crashes.map((c) => `${input.label}: ${c}`)));
    badRanges.push(...new Set(outcome.badRanges.map((b) => `${input.label}: ${b}`)));
    splitSurrogates += outcome.splitSurrogates;
    if (outcome.ms > FUZZ_BUDGET.hangMs) hangs.push(`${input.label}: ${outcome.ms.toFixed(0)} ms`);
    if (outcome.ms > slowest.ms) slowest = { label: input.label, ms: outcome.ms };
    if (FUZZ_BUDGET.verbose) console.log(`${index}\t${outcome.ms.toFixed(0)} ms\t${input.label}`);
  });
  const report = [
    `fuzzed the language facade with seed ${FUZZ_BUDGET.seed}: ${inputs.length} inputs tried`,
    `  crashes: ${crashes.length}`,
    `  bad ranges: ${badRanges.length}`,
    `  hangs (over ${FUZZ_BUDGET.hangMs} ms): ${hangs.length}`,
    `  span ends splitting a surrogate pair (allowed): ${splitSurrogates}`,
    `  slowest input: ${slowest.label} (${slowest.ms.toFixed(0)} ms)`,
    ...hangs.map((h) => `  hang: ${h}`),
    ...crashes.slice(0, 20).map((c) => `  crash: ${c}`),
    ...badRanges.slice(0, 20).map((b) => `  bad range: ${b}`),
  ].join('\n');
  console.log(report);
  assert.deepEqual(crashes, [], report);
  assert.deepEqual(badRanges, [], report);
});
