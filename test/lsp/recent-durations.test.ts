/**
 * The median of recent durations that decides whether the next pass waits for a pause in typing.
 * (Median of an odd count: the middle value; of an even count, here the lower middle — common practice,
 * no source.)
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { RecentDurations } from '../../server/src/lsp/recent-durations.js';

test('one slow run among fast ones does not move the typical duration; old runs are forgotten', () => {
  const d = new RecentDurations(5);
  assert.equal(d.typical('a'), undefined);
  d.record('a', 120);
  d.record('a', 4);
  assert.equal(d.typical('a'), 4, 'the lower middle of two: a slow first run is outweighed by a fast one');
  for (const ms of [5, 3, 6]) d.record('a', ms);
  assert.equal(d.typical('a'), 5);
  d.record('a', 200); // the 120 is forgotten; one outlier among five
  assert.equal(d.typical('a'), 5);
  for (const ms of [90, 95, 99]) d.record('a', ms);
  assert.equal(d.typical('a'), 95, 'once most runs are slow, the typical one is slow');
  assert.equal(d.typical('b'), undefined, 'documents are kept apart');
  d.delete('a');
  assert.equal(d.typical('a'), undefined);
});
