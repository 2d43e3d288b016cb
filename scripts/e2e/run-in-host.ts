/**
 * The in-host suite through the standard extension test runner: @vscode/test-electron's `runTests`
 * with `vscodeExecutablePath` set to our stand-in (./vscode-standin.sh), which runs the session in
 * code-server. With WEDGEWORK_VSCODE_EXECUTABLE set to a desktop VS Code, the same call runs the
 * suite there instead.
 *
 * Usage: node --import tsx scripts/e2e/run-in-host.ts   (exit status 0 when every check passed)
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as esbuild from 'esbuild';
import { runTests } from '@vscode/test-electron';
import { ROOT } from './paths.js';
import { makeWorkspace } from '../../test/e2e/workspace.js';

export const IN_HOST_BUNDLE = join(ROOT, 'out/test/in-host/index.cjs');

/** Bundles the in-host suite to CommonJS, as the extension host loads it (`vscode` is provided there). */
export async function bundleInHostSuite(): Promise<void> {
  await esbuild.build({
    absWorkingDir: ROOT,
    entryPoints: ['test/e2e/in-host/index.ts'],
    outfile: IN_HOST_BUNDLE,
    bundle: true,
    format: 'cjs',
    platform: 'node',
    target: 'node20',
    external: ['vscode'],
    sourcemap: 'inline',
    logLevel: 'warning',
  });
}

export async function runInHostSuite(): Promise<number> {
  await bundleInHostSuite();
  const scratch = mkdtempSync(join(tmpdir(), 'wedgework-e2e-in-host-'));
  try {
    const workspace = makeWorkspace(scratch);
    return await runTests({
      vscodeExecutablePath: process.env['WEDGEWORK_VSCODE_EXECUTABLE'] || join(ROOT, 'scripts/e2e/vscode-standin.sh'),
      extensionDevelopmentPath: ROOT,
      extensionTestsPath: IN_HOST_BUNDLE,
      // The profile folders go to the scratch folder (runTests would put them under .vscode-test/).
      launchArgs: [workspace, `--user-data-dir=${join(scratch, 'user-data')}`, `--extensions-dir=${join(scratch, 'extensions')}`],
    });
  } catch (error) {
    // runTests rejects with the exit code when the session fails; the lines above already say why.
    process.stderr.write(`in-host suite: ${error instanceof Error ? error.message : String(error)}\n`);
    return 1;
  } finally {
    rmSync(scratch, { recursive: true, force: true });
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  process.exit(await runInHostSuite());
}
