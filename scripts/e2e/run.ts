/**
 * `npm run test:e2e`: the editor tests, end to end. Not part of `npm test` — they need the tools
 * that scripts/e2e/install-tools.sh installs (code-server, Node 24, chromium, neovim), which this
 * runner installs first when any is missing.
 *
 * Stages, each in its own process (each stops every process it started, whatever happens):
 *   neovim           the language server under a second LSP client (test/e2e/neovim.e2e.ts)
 *   workbench        the packaged extension in the VS Code workbench (test/e2e/workbench.e2e.ts; editing:
 *                    workbench-editing.e2e.ts; hovers during a heavy evaluation: workbench-hover-timing.e2e.ts)
 *   restricted-mode  the same in Restricted Mode (test/e2e/restricted-mode.e2e.ts)
 *   in-host          the in-host suite through @vscode/test-electron's runTests (scripts/e2e/run-in-host.ts)
 *
 * Usage: npm run test:e2e [-- STAGE...] [-- --update-docs-images]
 *   STAGE...               run only these stages
 *   --update-docs-images   after a passing run, copy the chosen screenshots to docs/images/
 * Screenshots and logs: test-artifacts/e2e/ (git-ignored).
 */
import { spawn } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ARTIFACTS, ROOT, VSIX } from './paths.js';
import { ensureTools } from './tools.js';
import { GROUP_FILE_VARIABLE, killNotedGroups } from './processes.js';

const TSX = join(ROOT, 'node_modules/tsx/dist/loader.mjs');
// One file at a time: each starts its own editor, and the timing check must not share the processors.
const nodeTest = (...files: string[]) => [process.execPath, '--import', TSX, '--test', '--test-concurrency=1', '--test-reporter=spec', ...files];

const STAGES: Record<string, string[]> = {
  neovim: nodeTest('test/e2e/neovim.e2e.ts'),
  workbench: nodeTest('test/e2e/workbench.e2e.ts', 'test/e2e/workbench-editing.e2e.ts', 'test/e2e/workbench-hover-timing.e2e.ts'),
  'restricted-mode': nodeTest('test/e2e/restricted-mode.e2e.ts'),
  'in-host': [process.execPath, '--import', TSX, 'scripts/e2e/run-in-host.ts'],
};

/** Screenshots shown in the README: [stage folder, screenshot name without its number, docs name]. */
const DOCS_IMAGES: [string, string, string][] = [
  ['workbench', 'hover-plucker', 'editor-hover.png'],
  ['workbench', 'false-claim-problem', 'editor-false-claim.png'],
  ['workbench', 'syntax-recovery', 'editor-syntax-recovery.png'],
];

let running: ReturnType<typeof spawn> | undefined;
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) {
  process.on(signal, () => {
    // The stage stops its own processes when it receives the signal; the file catches the rest.
    running?.kill(signal);
    killNotedGroups(GROUP_FILE);
    process.exit(130);
  });
}

/** Where the stages note the process groups they start (see ./processes.ts). */
const GROUP_FILE = join(ARTIFACTS, `process-groups-${process.pid}.txt`);

function runCommand(command: string[]): Promise<number> {
  return new Promise((resolve) => {
    mkdirSync(ARTIFACTS, { recursive: true });
    const child = spawn(command[0]!, command.slice(1), {
      cwd: ROOT,
      stdio: 'inherit',
      env: { ...process.env, [GROUP_FILE_VARIABLE]: GROUP_FILE },
    });
    running = child;
    child.on('error', (error) => {
      process.stderr.write(`could not run ${command.join(' ')}: ${error.message}\n`);
      resolve(1);
    });
    child.on('exit', (code, signal) => {
      running = undefined;
      // A stage stops its own processes; this catches what a stage that was killed could not stop.
      const leftOver = killNotedGroups(GROUP_FILE);
      if (leftOver > 0) process.stderr.write(`stopped ${leftOver} process group(s) left behind by ${command.join(' ')}\n`);
      resolve(code ?? (signal ? 1 : 0));
    });
  });
}

interface Outcome {
  stage: string;
  passed: boolean;
  seconds: number;
}

async function timedStage(stage: string, step: () => Promise<boolean>): Promise<Outcome> {
  process.stdout.write(`\n=== ${stage} ===\n`);
  const started = Date.now();
  const passed = await step();
  return { stage, passed, seconds: (Date.now() - started) / 1000 };
}

function copyDocsImages(): void {
  mkdirSync(join(ROOT, 'docs/images'), { recursive: true });
  for (const [stage, shot, target] of DOCS_IMAGES) {
    const folder = join(ARTIFACTS, stage);
    const found = existsSync(folder) ? readdirSync(folder).find((f) => f.endsWith(`-${shot}.png`)) : undefined;
    if (!found) throw new Error(`no screenshot ${shot} in ${folder}`);
    copyFileSync(join(folder, found), join(ROOT, 'docs/images', target));
    process.stdout.write(`docs/images/${target} ← ${join(folder, found)}\n`);
  }
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const updateImages = args.includes('--update-docs-images');
  const chosen = args.filter((a) => !a.startsWith('--'));
  const unknown = chosen.filter((s) => !(s in STAGES));
  if (unknown.length > 0) {
    process.stderr.write(`unknown stage(s): ${unknown.join(', ')}; stages: ${Object.keys(STAGES).join(', ')}\n`);
    return 2;
  }
  const stages = chosen.length > 0 ? chosen : Object.keys(STAGES);
  const outcomes: Outcome[] = [];

  outcomes.push(
    await timedStage('tools', async () => {
      ensureTools();
      return true;
    }),
  );
  // The .vsix (and the bundles it holds, which the neovim and in-host stages use too).
  outcomes.push(await timedStage('package', async () => (await runCommand(['npm', 'run', '--silent', 'package'])) === 0 && existsSync(VSIX)));
  if (!outcomes.at(-1)!.passed) {
    process.stderr.write('npm run package failed; no editor test can run\n');
    return 1;
  }
  for (const stage of stages) {
    outcomes.push(await timedStage(stage, async () => (await runCommand(STAGES[stage]!)) === 0));
  }

  const failed = outcomes.filter((o) => !o.passed);
  process.stdout.write('\n=== editor tests: summary ===\n');
  for (const o of outcomes) process.stdout.write(`${o.passed ? 'pass' : 'FAIL'}  ${o.stage.padEnd(16)} ${o.seconds.toFixed(1).padStart(6)} s\n`);
  const total = outcomes.reduce((sum, o) => sum + o.seconds, 0);
  process.stdout.write(`${failed.length === 0 ? 'all passed' : `${failed.length} failed`} in ${total.toFixed(1)} s; screenshots and logs: ${ARTIFACTS}\n`);
  if (failed.length === 0 && updateImages) copyDocsImages();
  return failed.length === 0 ? 0 : 1;
}

process.exit(await main());
