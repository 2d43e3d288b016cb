/**
 * Timing for the benchmarks, made for noisy shared machines.
 *
 * Time is the process's CPU time (user + system), not the wall clock, so a
 * run that loses its core to another process is not charged for the wait.
 * The kernel accounts CPU time in ticks, so one short run can read as zero or
 * as a whole tick; a measurement therefore repeats its function until enough
 * CPU time has passed and reports the mean. Contenders are measured in
 * alternation, round after round, and each round gives one ratio, so slow
 * phases of the machine hit both sides of a ratio alike; the tables report
 * medians over the rounds.
 */

/** CPU milliseconds spent by this process so far. */
export function cpuMilliseconds(): number {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
}

const gc = (globalThis as { gc?: () => void }).gc;

/**
 * A full collection before each measurement (when node runs with --expose-gc),
 * so that no contender pays for the garbage another one left behind: CPU time
 * counts the collector's helper threads too.
 */
export function collectGarbage(): void {
  gc?.();
}

/** Defeats dead-code elimination of results nobody reads. */
export let sink: unknown;

/**
 * The mean CPU milliseconds of one call, repeating until at least `budgetMs`
 * have passed, and the number of calls made. Reading the clock is a system
 * call, so for fast functions it is read only after batches of calls, each
 * batch twice the last until one takes a millisecond.
 */
export function meanCpu(run: () => unknown, budgetMs: number): { mean: number; runs: number } {
  let runs = 0;
  let batch = 1;
  const start = cpuMilliseconds();
  let elapsed = 0;
  do {
    const before = elapsed;
    for (let i = 0; i < batch; i++) sink = run();
    runs += batch;
    elapsed = cpuMilliseconds() - start;
    if (elapsed - before < 1) batch *= 2;
  } while (elapsed < budgetMs);
  return { mean: elapsed / runs, runs };
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

export interface Contender {
  name: string;
  run: () => unknown;
  /** CPU milliseconds to spend per round; defaults to the comparison's. */
  budgetMs?: number;
  /** How many calls make up the job being compared (default 1): times and ratios are per job. */
  callsPerJob?: number;
}

export interface Comparison {
  /** Median CPU milliseconds per call, by contender name. */
  times: Map<string, number>;
  /** Median over rounds of time(first contender) / time(contender), by name: how many times faster the first is. */
  ratios: Map<string, number>;
  /** The number of timed calls made, by name. */
  calls: Map<string, number>;
}

/**
 * Measures the contenders in alternation for `rounds` rounds. Each is first
 * run untimed for half a budget (at least once), so that compilation and
 * warm-up are not timed.
 */
export function compare(contenders: readonly Contender[], rounds: number, budgetMs: number): Comparison {
  for (const c of contenders) meanCpu(c.run, (c.budgetMs ?? budgetMs) / 2);
  const samples = new Map<string, number[]>(contenders.map((c) => [c.name, []]));
  const ratioSamples = new Map<string, number[]>(contenders.map((c) => [c.name, []]));
  const calls = new Map<string, number>(contenders.map((c) => [c.name, 0]));
  for (let round = 0; round < rounds; round++) {
    const times = contenders.map((c) => {
      collectGarbage();
      const { mean, runs } = meanCpu(c.run, c.budgetMs ?? budgetMs);
      calls.set(c.name, calls.get(c.name)! + runs);
      return mean * (c.callsPerJob ?? 1);
    });
    contenders.forEach((c, i) => {
      samples.get(c.name)!.push(times[i]!);
      ratioSamples.get(c.name)!.push(times[0]! / times[i]!);
    });
  }
  const times = new Map<string, number>();
  const ratios = new Map<string, number>();
  for (const c of contenders) {
    times.set(c.name, median(samples.get(c.name)!));
    ratios.set(c.name, median(ratioSamples.get(c.name)!));
  }
  return { times, ratios, calls };
}
