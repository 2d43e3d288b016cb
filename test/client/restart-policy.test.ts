/**
 * The client's restart rule for a crashing language server (client/src/restart-policy.ts): restart a
 * bounded number of times within a time window, then stop and say so. The project's own rule (common
 * practice for editor extensions, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { MAX_RESTARTS, RestartPolicy, WINDOW_MS } from '../../client/src/restart-policy.js';

describe('RestartPolicy', () => {
  test(`restarts up to ${MAX_RESTARTS} times within the window, then gives up and says how to try again`, () => {
    let now = 0;
    const policy = new RestartPolicy(() => now);
    for (let i = 1; i <= MAX_RESTARTS; i++) {
      now += 1000;
      const decision = policy.closed();
      assert.equal(decision.restart, true, `crash ${i} is restarted`);
      assert.match(decision.message, new RegExp(`${i} of ${MAX_RESTARTS}`));
    }
    now += 1000;
    const last = policy.closed();
    assert.equal(last.restart, false);
    assert.match(last.message, /will not be started again/);
    assert.match(last.message, /Restart Language Server/);
  });

  test('crashes older than the window no longer count', () => {
    let now = 0;
    const policy = new RestartPolicy(() => now);
    for (let i = 0; i < MAX_RESTARTS; i++) policy.closed();
    now += WINDOW_MS + 1;
    assert.equal(policy.closed().restart, true, 'the earlier crashes fell out of the window');
  });

  test('a restart by hand starts the count again', () => {
    const policy = new RestartPolicy(() => 0);
    for (let i = 0; i < MAX_RESTARTS; i++) policy.closed();
    policy.reset();
    assert.equal(policy.closed().restart, true);
  });
});
