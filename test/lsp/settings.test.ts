/**
 * Reading `wedgework.limits.*` (server/src/lsp/settings.ts): defaults from the
 * language's limits, nested or dotted keys, and a bad value falling back to
 * its default rather than failing. The project's own rules (common practice, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { DEFAULT_LIMITS } from '../../server/src/language/index.js';
import { DEFAULT_SETTINGS, parseSettings } from '../../server/src/lsp/settings.js';

describe('limits settings', () => {
  test('default to the language layer\'s coordinate limit and ten seconds', () => {
    assert.deepEqual(parseSettings(undefined).limits, { maxCoordinates: DEFAULT_LIMITS.maxCoordinates, timeoutMs: 10_000 });
    assert.deepEqual(DEFAULT_SETTINGS.limits, parseSettings({}).limits);
  });

  test('are read nested, as editors send a section, or with dotted keys', () => {
    assert.deepEqual(parseSettings({ limits: { maxCoordinates: 5000, timeoutMs: 250 } }).limits, { maxCoordinates: 5000, timeoutMs: 250 });
    assert.deepEqual(parseSettings({ 'limits.maxCoordinates': '70', 'limits.timeoutMs': 0 }).limits, { maxCoordinates: 70, timeoutMs: 0 });
  });

  test('a value that is not a whole number in range falls back to the default', () => {
    for (const bad of [-1, 1.5, 'soon', null, true, Number.NaN, Infinity]) {
      assert.equal(parseSettings({ limits: { timeoutMs: bad } }).limits.timeoutMs, DEFAULT_SETTINGS.limits.timeoutMs, String(bad));
    }
    assert.equal(parseSettings({ limits: { maxCoordinates: 0 } }).limits.maxCoordinates, DEFAULT_SETTINGS.limits.maxCoordinates);
  });
});
