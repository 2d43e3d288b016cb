/**
 * Work-done progress (`$/progress`) for evaluations that take a while.
 *
 * Most evaluations end in milliseconds, and a progress indicator that flashes
 * for them is noise. So the indicator appears only once an evaluation has run
 * for `delayMs`; it then says which statement is being evaluated, at most
 * every `REPORT_INTERVAL_MS` (a file of many quick statements must not flood
 * the connection, but the statement that is taking long is always the one
 * shown), and it ends when the evaluation ends, however it ends. The user may
 * cancel it from the editor, which stops the evaluation.
 */
import type { Clock } from './clock.js';

/** How long an evaluation runs before its progress is shown. */
export const PROGRESS_DELAY_MS = 500;
/** Shortest interval between two progress messages of one evaluation. */
export const REPORT_INTERVAL_MS = 200;

/** The part of the LSP library's work-done progress reporter used here. */
export interface ProgressReporter {
  begin(title: string, percentage?: number, message?: string, cancellable?: boolean): void;
  report(message: string): void;
  done(): void;
  token: { onCancellationRequested(listener: () => void): unknown };
}

export interface DelayedProgressOptions {
  title: string;
  /** Creates the reporter (asks the client for a progress token). */
  create: () => Promise<ProgressReporter>;
  clock: Clock;
  delayMs?: number;
  /** The user cancelled the progress in the editor. */
  onCancel?: () => void;
  /** The progress has just become visible (the evaluation is a long one). */
  onShown?: () => void;
}

export class DelayedProgress {
  private state: 'idle' | 'waiting' | 'creating' | 'shown' | 'ended' = 'idle';
  private delayTimer: unknown;
  private reportTimer: unknown;
  private reporter: ProgressReporter | undefined;
  /** What to say next, computed only when it is sent (most statements pass unreported). */
  private latest: (() => string) | undefined;
  private sent: (() => string) | undefined;
  private lastReportAt = -Infinity;

  constructor(private readonly options: DelayedProgressOptions) {}

  /** The evaluation has begun: show the progress if it is still running after the delay. */
  start(): void {
    if (this.state !== 'idle') return;
    this.state = 'waiting';
    this.delayTimer = this.options.clock.setTimeout(() => this.show(), this.options.delayMs ?? PROGRESS_DELAY_MS);
  }

  /** What the evaluation is doing now (shown when the progress is, throttled). */
  message(describe: () => string): void {
    this.latest = describe;
    if (this.state === 'shown') this.scheduleReport();
  }

  /** The evaluation is over: hide the progress, or make sure it never appears. */
  end(): void {
    const wasShown = this.state === 'shown';
    this.state = 'ended';
    this.options.clock.clearTimeout(this.delayTimer);
    this.options.clock.clearTimeout(this.reportTimer);
    if (wasShown) this.reporter?.done();
  }

  private show(): void {
    if (this.state !== 'waiting') return;
    this.state = 'creating';
    this.options.onShown?.();
    this.options.create().then(
      (reporter) => {
        // The evaluation may have ended while the client was creating the token.
        if (this.state !== 'creating') return;
        this.reporter = reporter;
        this.state = 'shown';
        reporter.token.onCancellationRequested(() => this.options.onCancel?.());
        reporter.begin(this.options.title, undefined, this.latest?.(), this.options.onCancel !== undefined);
        this.sent = this.latest;
        this.lastReportAt = this.options.clock.now();
      },
      () => {
        // A client that refuses the token sees no progress; the evaluation goes on regardless.
        if (this.state === 'creating') this.state = 'ended';
      },
    );
  }

  private scheduleReport(): void {
    if (this.reportTimer !== undefined) return;
    const wait = Math.max(0, this.lastReportAt + REPORT_INTERVAL_MS - this.options.clock.now());
    if (wait === 0) return this.flush();
    this.reportTimer = this.options.clock.setTimeout(() => {
      this.reportTimer = undefined;
      this.flush();
    }, wait);
  }

  private flush(): void {
    if (this.state !== 'shown' || this.latest === undefined || this.latest === this.sent) return;
    this.reporter!.report(this.latest());
    this.sent = this.latest;
    this.lastReportAt = this.options.clock.now();
  }
}
