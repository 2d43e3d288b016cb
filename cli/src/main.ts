/**
 * Entry point of the bundled command-line program (dist/cli.cjs, started by
 * bin/wedgework.cjs): runs the command and sets the exit status.
 */
import { readFile, stat, writeFile } from 'node:fs/promises';
import packageJson from '../../package.json' with { type: 'json' };
import { runCli } from './cli.js';

runCli(process.argv.slice(2), packageJson.version, {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  readFile: (path) => readFile(path, 'utf8'),
  writeFile: (path, text) => writeFile(path, text, 'utf8'),
  sameFile: async (a, b) => {
    try {
      const [x, y] = await Promise.all([stat(a), stat(b)]);
      return x.dev === y.dev && x.ino === y.ino;
    } catch {
      return false;
    }
  },
}).then(
  (status) => {
    // exitCode rather than exit(): output written to a pipe is flushed before the process ends.
    process.exitCode = status;
  },
  (error: unknown) => {
    process.stderr.write(`wedgework: internal error: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    // 70 is the conventional status for an internal software error (sysexits EX_SOFTWARE).
    process.exitCode = 70;
  },
);
