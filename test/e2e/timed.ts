/** Runs one step of an editor test and reports on stderr how long it took (the e2e timings). */
export async function timed<T>(what: string, step: () => T | Promise<T>): Promise<T> {
  const started = Date.now();
  const result = await step();
  process.stderr.write(`  · ${what}: ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  return result;
}
