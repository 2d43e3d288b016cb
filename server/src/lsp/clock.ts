/**
 * Time as the schedulers see it. The server uses the real clock; unit tests
 * pass a clock they advance by hand, so no test waits on real time.
 */
export interface Clock {
  now(): number;
  setTimeout(run: () => void, delayMs: number): unknown;
  clearTimeout(handle: unknown): void;
}

export const SYSTEM_CLOCK: Clock = {
  now: () => performance.now(),
  setTimeout: (run, delayMs) => setTimeout(run, delayMs),
  clearTimeout: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};
