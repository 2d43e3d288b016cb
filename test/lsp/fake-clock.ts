/**
 * A clock for unit tests that moves only when the test says so (see
 * server/src/lsp/clock.ts): timers fire in order of their due time, inside
 * `advance`, so scheduling logic is tested without waiting on real time.
 */
import type { Clock } from '../../server/src/lsp/clock.js';

interface Timer {
  due: number;
  order: number;
  run: () => void;
}

export class FakeClock implements Clock {
  private time = 0;
  private order = 0;
  private readonly timers = new Set<Timer>();

  now(): number {
    return this.time;
  }

  setTimeout(run: () => void, delayMs: number): unknown {
    const timer: Timer = { due: this.time + Math.max(0, delayMs), order: this.order++, run };
    this.timers.add(timer);
    return timer;
  }

  clearTimeout(handle: unknown): void {
    this.timers.delete(handle as Timer);
  }

  pendingTimers(): number {
    return this.timers.size;
  }

  /** Moves time forward by `ms`, firing every timer that falls due on the way (also ones set meanwhile). */
  advance(ms: number): void {
    const end = this.time + ms;
    for (;;) {
      const next = [...this.timers].filter((t) => t.due <= end).sort((a, b) => a.due - b.due || a.order - b.order)[0];
      if (!next) break;
      this.timers.delete(next);
      this.time = next.due;
      next.run();
    }
    this.time = end;
  }
}
