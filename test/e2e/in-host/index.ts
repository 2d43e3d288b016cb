/**
 * Entry point of the in-host suite (bundled to out/test/in-host/index.cjs and named as
 * `extensionTestsPath`): VS Code calls `run()` inside its extension host once the extension under
 * development is loaded; a rejected promise fails the session (non-zero exit code).
 *
 * The checks run in order and each reports one line; every line is prefixed with `[in-host] ` so that
 * a runner reading a mixed console (code-server's page console) can pick the suite's output out.
 */
import { IN_HOST_CHECKS } from './checks.js';

function report(line: string): void {
  console.log(`[in-host] ${line}`);
}

export async function run(): Promise<void> {
  const failures: string[] = [];
  for (const [name, check] of IN_HOST_CHECKS) {
    const started = Date.now();
    try {
      await check();
      report(`✔ ${name} (${Date.now() - started} ms)`);
    } catch (error) {
      const detail = error instanceof Error ? error.message : String(error);
      report(`✖ ${name}\n${detail.replace(/^/gm, '    ')}`);
      failures.push(name);
    }
  }
  report(`${IN_HOST_CHECKS.length - failures.length} of ${IN_HOST_CHECKS.length} in-host checks passed`);
  if (failures.length > 0) throw new Error(`in-host checks failed: ${failures.join('; ')}`);
}
