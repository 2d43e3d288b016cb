// Runs every *.test.ts under test/ with node's own test runner (TypeScript through tsx).
// Node 20's --test does not expand globs itself, so the files are listed here.
// Optional arguments narrow the run to files whose path contains one of them.
import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { spawnSync } from 'node:child_process';

function findTests(dir) {
  const found = [];
  for (const entry of readdirSync(dir)) {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) found.push(...findTests(path));
    else if (entry.endsWith('.test.ts')) found.push(path);
  }
  return found;
}

const filters = process.argv.slice(2);
const files = findTests('test')
  .map((f) => relative('.', f))
  .filter((f) => filters.length === 0 || filters.some((s) => f.includes(s)))
  .sort();
if (files.length === 0) {
  console.error('no test files matched');
  process.exit(1);
}
const run = spawnSync(process.execPath, ['--import', 'tsx', '--test', '--test-reporter=spec', ...files], {
  stdio: 'inherit',
});
process.exit(run.status ?? 1);
