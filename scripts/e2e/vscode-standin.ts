/**
 * A stand-in for the desktop VS Code executable, for @vscode/test-electron's runTests.
 *
 * It takes the arguments runTests gives VS Code — `--extensionDevelopmentPath=…`,
 * `--extensionTestsPath=…`, the folder to open, `--user-data-dir`, `--extensions-dir`,
 * `--disable-workspace-trust` — and runs the same test session in code-server: the workbench in
 * headless chromium with the smoke-test driver enabled, and the paths handed over as the
 * workbench's `payload` (shared/notes/real-editor.md). The extension tests then run in a real
 * extension host; when they finish, the workbench calls `codeAutomationExit(code)`, and that code
 * becomes this process's exit status, as with VS Code itself.
 *
 * Flags that only matter to a desktop build (--no-sandbox, --disable-gpu-sandbox, --disable-updates,
 * --skip-welcome, --skip-release-notes) are accepted and ignored.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { prepareProfile, startCodeServer, type CodeServer } from './code-server.js';
import { openBrowser } from './browser.js';
import { ensureTools } from './tools.js';

/** How long a whole in-host test session may take before it counts as hung. */
const SESSION_TIMEOUT_MS = 180_000;
const IGNORED_FLAGS = ['--no-sandbox', '--disable-gpu-sandbox', '--disable-updates', '--skip-welcome', '--skip-release-notes', '--disable-extensions'];

interface Invocation {
  developmentPaths: string[];
  testsPath?: string;
  folder?: string;
  userDataDir?: string;
  extensionsDir?: string;
  workspaceTrust: boolean;
}

function parseArguments(args: string[]): Invocation {
  const invocation: Invocation = { developmentPaths: [], workspaceTrust: true };
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    const [flag, inlineValue] = arg.startsWith('--') && arg.includes('=') ? [arg.slice(0, arg.indexOf('=')), arg.slice(arg.indexOf('=') + 1)] : [arg, undefined];
    const value = () => inlineValue ?? args[++i];
    switch (flag) {
      case '--extensionDevelopmentPath':
        invocation.developmentPaths.push(resolve(value()!));
        break;
      case '--extensionTestsPath':
        invocation.testsPath = resolve(value()!);
        break;
      case '--user-data-dir':
        invocation.userDataDir = resolve(value()!);
        break;
      case '--extensions-dir':
        invocation.extensionsDir = resolve(value()!);
        break;
      case '--disable-workspace-trust':
        invocation.workspaceTrust = false;
        break;
      default:
        if (IGNORED_FLAGS.includes(flag)) break;
        if (flag.startsWith('-')) {
          process.stderr.write(`vscode-standin: ignoring the unknown flag ${arg}\n`);
          break;
        }
        invocation.folder ??= resolve(arg);
    }
  }
  return invocation;
}

async function runSession(invocation: Invocation, scratch: string): Promise<number> {
  if (!invocation.testsPath || invocation.developmentPaths.length === 0) {
    process.stderr.write('vscode-standin: needs --extensionDevelopmentPath=… and --extensionTestsPath=…\n');
    return 2;
  }
  // A file given to open: open its folder (the workbench URL opens folders).
  const folder = invocation.folder && statSync(invocation.folder).isFile() ? dirname(invocation.folder) : invocation.folder;
  const profile = prepareProfile(scratch, { userDataDir: invocation.userDataDir, extensionsDir: invocation.extensionsDir });
  let server: CodeServer | undefined;
  let browser: Awaited<ReturnType<typeof openBrowser>> | undefined;
  try {
    server = await startCodeServer(profile, {
      workspaceTrust: invocation.workspaceTrust,
      extraArgs: ['--vscode-option', 'enable-smoke-test-driver'],
      logName: 'code-server-in-host',
    });
    browser = await openBrowser(scratch, server.origin);
    const page = browser.pages()[0] ?? (await browser.newPage());
    let finish: (code: number) => void = () => {};
    const finished = new Promise<number>((resolve) => (finish = resolve));
    await page.exposeFunction('codeAutomationExit', (code: unknown) => finish(typeof code === 'number' ? code : 1));
    // The extension host's console reaches the page's console; pass the tests' own lines on.
    page.on('console', (message) => {
      const text = message.text();
      const mark = text.indexOf('[in-host] ');
      if (mark >= 0) process.stdout.write(`${text.slice(mark + '[in-host] '.length).replace(/%c/g, '')}\n`);
    });
    const remote = (path: string) => `vscode-remote://127.0.0.1:${server!.port}${path}`;
    const payload = [
      ...invocation.developmentPaths.map((path) => ['extensionDevelopmentPath', remote(path)]),
      ['extensionTestsPath', remote(invocation.testsPath)],
    ];
    await page.goto(server.url(folder ?? scratch, { payload: JSON.stringify(payload) }));
    let timer: NodeJS.Timeout | undefined;
    const code = await Promise.race([
      finished,
      new Promise<number>((resolve) => (timer = setTimeout(() => resolve(-1), SESSION_TIMEOUT_MS))),
    ]);
    clearTimeout(timer);
    if (code === -1) {
      const shot = join(scratch, 'in-host-timeout.png');
      await page.screenshot({ path: shot }).catch(() => {});
      process.stderr.write(`vscode-standin: the tests did not finish within ${SESSION_TIMEOUT_MS / 1000} s (code-server log: ${server.logPath})\n`);
      return 1;
    }
    return code;
  } finally {
    await browser?.close().catch(() => {});
    await server?.stop();
  }
}

ensureTools();
const scratch = mkdtempSync(join(tmpdir(), 'wedgework-vscode-standin-'));
let exitCode = 1;
try {
  exitCode = await runSession(parseArguments(process.argv.slice(2)), scratch);
} catch (error) {
  process.stderr.write(`vscode-standin: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
} finally {
  if (exitCode === 0) rmSync(scratch, { recursive: true, force: true });
  else process.stderr.write(`vscode-standin: kept ${scratch} (logs, screenshot) for inspection\n`);
}
process.exit(exitCode);
