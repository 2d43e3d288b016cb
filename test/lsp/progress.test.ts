/**
 * When and how server/src/lsp/progress.ts shows work-done progress: only for
 * evaluations still running after the delay, throttled, always ended, and
 * cancellable. The project's own rules (common practice, no source); the
 * begin/report/done sequence is that of LSP's `$/progress` (LSP 3.15+, from memory).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { DelayedProgress, PROGRESS_DELAY_MS, REPORT_INTERVAL_MS, type ProgressReporter } from '../../server/src/lsp/progress.js';
import { FakeClock } from './fake-clock.js';

class RecordingReporter implements ProgressReporter {
  readonly calls: string[] = [];
  private cancelListener: (() => void) | undefined;
  readonly token = {
    onCancellationRequested: (listener: () => void) => {
      this.cancelListener = listener;
      return { dispose() {} };
    },
  };

  begin(title: string, _percentage?: number, message?: string, cancellable?: boolean): void {
    this.calls.push(`begin ${title} | ${message ?? ''} | ${cancellable ? 'cancellable' : 'fixed'}`);
  }

  report(message: string): void {
    this.calls.push(`report ${message}`);
  }

  done(): void {
    this.calls.push('done');
  }

  cancelFromEditor(): void {
    this.cancelListener?.();
  }
}

/** Lets the promise of `create` settle. */
const settle = () => new Promise<void>((resolve) => setImmediate(resolve));

function setUp(events: string[] = []) {
  const clock = new FakeClock();
  const reporter = new RecordingReporter();
  let creations = 0;
  const progress = new DelayedProgress({
    title: 'Evaluating a.wedge…',
    clock,
    create: async () => {
      creations++;
      return reporter;
    },
    onCancel: () => events.push('cancel'),
    onShown: () => events.push('shown'),
  });
  return { clock, reporter, progress, creations: () => creations, events };
}

describe('DelayedProgress', () => {
  test('an evaluation that ends before the delay shows nothing', async () => {
    const { clock, progress, reporter, creations, events } = setUp();
    progress.start();
    clock.advance(PROGRESS_DELAY_MS - 1);
    progress.end();
    clock.advance(10_000);
    await settle();
    assert.equal(creations(), 0);
    assert.deepEqual(reporter.calls, []);
    assert.deepEqual(events, []);
  });

  test('a long evaluation shows a cancellable progress with its latest statement, then ends it', async () => {
    const { clock, progress, reporter, events } = setUp();
    progress.start();
    progress.message(() => 'line 1: space V dim 20');
    clock.advance(PROGRESS_DELAY_MS);
    await settle();
    assert.deepEqual(events, ['shown']);
    assert.deepEqual(reporter.calls, ['begin Evaluating a.wedge… | line 1: space V dim 20 | cancellable']);
    progress.end();
    assert.deepEqual(reporter.calls.at(-1), 'done');
  });

  test('messages are throttled, and the last one is always sent', async () => {
    const { clock, progress, reporter } = setUp();
    progress.start();
    clock.advance(PROGRESS_DELAY_MS);
    await settle();
    let described = 0;
    const message = (text: string) => () => {
      described++;
      return text;
    };
    progress.message(message('line 2'));
    progress.message(message('line 3'));
    progress.message(message('line 4'));
    assert.equal(reporter.calls.filter((c) => c.startsWith('report')).length, 0, 'too soon after begin');
    clock.advance(REPORT_INTERVAL_MS);
    assert.deepEqual(reporter.calls.filter((c) => c.startsWith('report')), ['report line 4']);
    assert.equal(described, 1, 'only the message sent is computed');
    progress.end();
  });

  test('an evaluation that ends while the client creates the token never begins a progress', async () => {
    const { clock, progress, reporter } = setUp();
    progress.start();
    clock.advance(PROGRESS_DELAY_MS);
    progress.end();
    await settle();
    assert.deepEqual(reporter.calls, []);
  });

  test('cancelling in the editor asks for the evaluation to stop', async () => {
    const { clock, progress, reporter, events } = setUp();
    progress.start();
    clock.advance(PROGRESS_DELAY_MS);
    await settle();
    reporter.cancelFromEditor();
    assert.deepEqual(events, ['shown', 'cancel']);
    progress.end();
  });
});
