// A larger fuzzing run of the language facade and longer property runs than the normal test run:
// `npm run fuzz` (twenty times the inputs, 2000 cases per property), or with your own sizes, e.g.
// `WEDGEWORK_FUZZ_SCALE=100 WEDGEWORK_FUZZ_SEED=42 node scripts/fuzz.mjs`. It prints what it tried
// and the counts of crashes, bad ranges and hangs; see test/fuzz/fuzz-budget.ts.
import { spawnSync } from 'node:child_process';

const env = {
  ...process.env,
  WEDGEWORK_FUZZ_SCALE: process.env.WEDGEWORK_FUZZ_SCALE ?? '20',
  WEDGEWORK_PROPERTY_RUNS: process.env.WEDGEWORK_PROPERTY_RUNS ?? '2000',
};
const run = spawnSync(process.execPath, ['scripts/run-tests.mjs', 'test/fuzz/', 'test/properties/'], { stdio: 'inherit', env });
process.exit(run.status ?? 1);
