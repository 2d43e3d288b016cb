/**
 * What crosses between the server and its evaluation workers must survive
 * structured cloning unchanged (the algorithm `postMessage` uses; HTML
 * Living Standard, "Safe passing of structured data", from memory: functions
 * cannot be cloned and class instances lose their prototype). The facade's
 * analyses are plain data; this checks it on every sample, and the problems
 * the server adds when an evaluation stops early.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze } from '../../server/src/language/index.js';
import { ROOT } from '../support/bundles.js';

const samples = readdirSync(join(ROOT, 'samples')).filter((f) => f.endsWith('.wedge'));

describe('analyses cross to the main thread unchanged', () => {
  test('there are samples to check', () => {
    assert.ok(samples.length > 0);
  });

  for (const name of samples) {
    test(name, () => {
      const text = readFileSync(join(ROOT, 'samples', name), 'utf8');
      const analysis = analyze(text, { evaluate: true, onStatement: () => {} });
      assert.ok(analysis.results.length > 0, 'the sample has results');
      // deepStrictEqual compares prototypes too: a class instance inside would fail here.
      assert.deepStrictEqual(structuredClone(analysis), analysis);
    });
  }
});

describe('the statement hook of analyze', () => {
  test('reports each statement once, in order, and changes nothing in the analysis', () => {
    const text = 'space V dim 4\n# a comment\nvector p = (1, 0, 0, 0)\nsubspace L = span(p, e2)\nclaim dim L = 2\n';
    const spans: { start: number; end: number }[] = [];
    const hooked = analyze(text, { evaluate: true, onStatement: (span) => spans.push(span) });
    const plain = analyze(text, { evaluate: true });
    assert.deepStrictEqual(hooked, plain);
    assert.deepEqual(
      spans.map((s) => text.slice(s.start, s.end).split(' ')[0]),
      ['space', 'vector', 'subspace', 'claim'],
    );
    for (let i = 1; i < spans.length; i++) assert.ok(spans[i]!.start > spans[i - 1]!.start);
  });

  test('is not called by the quick pass', () => {
    let calls = 0;
    analyze('space V dim 2\n', { evaluate: false, onStatement: () => calls++ });
    assert.equal(calls, 0);
  });
});
