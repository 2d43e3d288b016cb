/**
 * How many cases each property runs and from which seed.
 *
 * The normal test run is short and repeatable: a fixed seed and a bounded
 * number of runs. `WEDGEWORK_PROPERTY_RUNS=5000` runs more cases, and
 * `WEDGEWORK_PROPERTY_SEED=<integer>` starts elsewhere; on a failure
 * fast-check prints the seed and the path of the shrunk counterexample, which
 * these two variables (and fast-check's `path` option) reproduce.
 */
import type { Parameters } from 'fast-check';

const DEFAULT_RUNS = 100;
const DEFAULT_SEED = 20240607;

function integerFromEnvironment(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw.trim() === '') return fallback;
  const value = Number(raw);
  if (!Number.isSafeInteger(value)) throw new Error(`${name} must be an integer, found '${raw}'`);
  return value;
}

/** The number of runs for one property: the default, scaled by `weight` for the costlier ones. */
export function propertyParameters<T>(weight = 1): Parameters<T> {
  const runs = integerFromEnvironment('WEDGEWORK_PROPERTY_RUNS', DEFAULT_RUNS);
  return {
    numRuns: Math.max(1, Math.round(runs * weight)),
    seed: integerFromEnvironment('WEDGEWORK_PROPERTY_SEED', DEFAULT_SEED),
  };
}
