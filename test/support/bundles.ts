/**
 * The process tests run the bundles in dist/, as the editor and the `wedgework`
 * command do. A missing or outdated bundle would make them test old code, so
 * they first check that the bundle is newer than every source file it is built
 * from (`npm test` builds before testing; `node scripts/run-tests.mjs` does not).
 */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root. */
export const ROOT = fileURLToPath(new URL('../..', import.meta.url));

function newestFile(dir: string): { path: string; mtimeMs: number } | undefined {
  let newest: { path: string; mtimeMs: number } | undefined;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    const candidate = entry.isDirectory() ? newestFile(path) : { path, mtimeMs: statSync(path).mtimeMs };
    if (candidate && (!newest || candidate.mtimeMs > newest.mtimeMs)) newest = candidate;
  }
  return newest;
}

/** Throws with a clear instruction unless `bundle` (relative to the root) exists and is newer than `sourceDirs`. */
export function assertBundleIsFresh(bundle: string, sourceDirs: string[]): void {
  const bundlePath = join(ROOT, bundle);
  if (!existsSync(bundlePath)) {
    throw new Error(`${bundle} is missing: run \`npm run build\` first (npm test does it for you).`);
  }
  const built = statSync(bundlePath).mtimeMs;
  for (const dir of sourceDirs) {
    const newest = newestFile(join(ROOT, dir));
    if (newest && newest.mtimeMs > built) {
      throw new Error(`${bundle} is older than ${newest.path}: run \`npm run build\` first (npm test does it for you).`);
    }
  }
}
