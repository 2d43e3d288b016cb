/**
 * Every sample file is a scenario with exactly one deliberate false claim (the
 * project's own rule for samples): the analysis must report that one error,
 * a claim, and nothing else.
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { analyze } from '../../server/src/language/index.js';

const dir = 'samples';
for (const file of readdirSync(dir).filter((f) => f.endsWith('.wedge'))) {
  test(`${file}: one deliberate false claim, no other problem`, () => {
    const text = readFileSync(join(dir, file), 'utf8');
    const analysis = analyze(text, { evaluate: true });
    const problems = analysis.problems.map((p) => `${p.code}: ${p.message}`);
    assert.equal(analysis.problems.length, 1, problems.join('\n'));
    assert.match(analysis.problems[0]!.code, /^claim\//);
    assert.ok(analysis.results.length > 5, 'the sample shows results');
  });
}
