/**
 * How much fuzzing one run does. The normal test run stays within about
 * twenty seconds on a small machine; `WEDGEWORK_FUZZ_SCALE=20` (or
 * `npm run fuzz`) multiplies every count, and `WEDGEWORK_FUZZ_SEED` changes
 * the mutations tried; `WEDGEWORK_FUZZ_VERBOSE=1` prints each input as it goes.
 */
function numberFromEnvironment(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw.trim() === '') return fallback;
  const value = Number(raw);
  if (!Number.isFinite(value) || value <= 0) throw new Error(`${name} must be a positive number, found '${raw}'`);
  return value;
}

const scale = numberFromEnvironment('WEDGEWORK_FUZZ_SCALE', 1);

export const FUZZ_BUDGET = {
  scale,
  seed: Math.trunc(numberFromEnvironment('WEDGEWORK_FUZZ_SEED', 7919)),
  /** Truncation points per sample file (spread evenly over its length). */
  truncationsPerSample: Math.round(12 * scale),
  /** Mutated variants per sample file. */
  mutationsPerSample: Math.round(10 * scale),
  /** Random documents spliced from pieces of every sample. */
  splices: Math.round(30 * scale),
  /** Offsets at which the position-based features (hover, completion, …) are asked per input. */
  offsetsPerInput: 4,
  /**
   * The length of the long operator chains and one-line programs among the hostile documents: past
   * the bounds of the language (1000 levels of operators) in every run, ten times longer in large runs.
   */
  longChain: scale >= 5 ? 20_000 : 2_000,
  /** An input slower than this counts as a hang (reported, not failed: tests assert no timings). */
  hangMs: 2000,
  /** `WEDGEWORK_FUZZ_VERBOSE=1` prints every input's time as it is tried. */
  verbose: process.env.WEDGEWORK_FUZZ_VERBOSE === '1',
};
