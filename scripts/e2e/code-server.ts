/**
 * Starts code-server (a real VS Code workbench and extension host, served to a browser) the way
 * shared/notes/real-editor.md describes: on Node 24, in its own process group, on a free port, with
 * no marketplace and quiet user settings, and with our packaged extension installed.
 */
import { createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { CODE_SERVER_ENTRY, NODE24, isolatedEnv } from './tools.js';
import { spawnGroup, stopGroup } from './processes.js';

/** User settings that keep the workbench from showing anything the tests did not ask for. */
export const QUIET_SETTINGS: Record<string, unknown> = {
  'workbench.startupEditor': 'none',
  'telemetry.telemetryLevel': 'off',
  'update.mode': 'none',
  'extensions.autoUpdate': false,
  'extensions.autoCheckUpdates': false,
  'extensions.ignoreRecommendations': true,
  'chat.disableAIFeatures': true,
  'workbench.secondarySideBar.defaultVisibility': 'hidden',
  'workbench.tips.enabled': false,
  'editor.hover.delay': 100,
  'editor.minimap.enabled': false,
  'git.enabled': false,
};

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export interface Profile {
  userDataDir: string;
  extensionsDir: string;
  config: string;
  env: NodeJS.ProcessEnv;
  scratch: string;
}

function profileArgs(profile: Profile): string[] {
  return ['--user-data-dir', profile.userDataDir, '--extensions-dir', profile.extensionsDir, '--config', profile.config];
}

/**
 * Prepares a code-server profile under `scratch`: user settings, an empty config file, an extensions
 * folder, and (when `vsix` is given) the extension installed from its package, as a user would.
 * The user-data and extensions folders may be given (a test runner's --user-data-dir, --extensions-dir).
 */
export function prepareProfile(
  scratch: string,
  {
    vsix,
    settings = {},
    userDataDir = join(scratch, 'user-data'),
    extensionsDir = join(scratch, 'extensions'),
  }: { vsix?: string; settings?: Record<string, unknown>; userDataDir?: string; extensionsDir?: string } = {},
): Profile {
  const profile: Profile = {
    userDataDir,
    extensionsDir,
    config: join(scratch, 'code-server.yaml'),
    env: isolatedEnv(scratch, { EXTENSIONS_GALLERY: '{}' }),
    scratch,
  };
  mkdirSync(join(profile.userDataDir, 'User'), { recursive: true });
  mkdirSync(profile.extensionsDir, { recursive: true });
  writeFileSync(join(profile.userDataDir, 'User/settings.json'), JSON.stringify({ ...QUIET_SETTINGS, ...settings }, null, 2));
  writeFileSync(profile.config, '# The other options are given on the command line.\nauth: none\n');
  if (vsix) {
    const installed = spawnSync(NODE24, [CODE_SERVER_ENTRY, ...profileArgs(profile), '--install-extension', vsix, '--force'], {
      env: profile.env,
      encoding: 'utf8',
      timeout: 120_000,
    });
    if (installed.status !== 0) {
      throw new Error(
        `code-server --install-extension ${vsix} failed (status ${installed.status}):\n${installed.stdout}\n${installed.stderr}`,
      );
    }
  }
  return profile;
}

export interface CodeServer {
  port: number;
  pid: number;
  logPath: string;
  origin: string;
  /** The workbench URL that opens `folder`, with optional extra query parameters. */
  url(folder: string, query?: Record<string, string>): string;
  /** Stops code-server and everything it started (the whole process group). */
  stop(): Promise<void>;
}

export interface StartOptions {
  /** Leave workspace trust on, so that an untrusted folder opens in Restricted Mode. */
  workspaceTrust?: boolean;
  extraArgs?: string[];
  logName?: string;
}

/** Starts code-server with `profile`; resolves once it listens. */
export async function startCodeServer(
  profile: Profile,
  { workspaceTrust = false, extraArgs = [], logName = 'code-server' }: StartOptions = {},
): Promise<CodeServer> {
  const port = await freePort();
  const args = [
    CODE_SERVER_ENTRY,
    '--bind-addr', `127.0.0.1:${port}`,
    '--auth', 'none',
    '--disable-telemetry',
    '--disable-update-check',
    '--disable-getting-started-override',
    '--ignore-last-opened',
    ...(workspaceTrust ? [] : ['--disable-workspace-trust']),
    ...profileArgs(profile),
    ...extraArgs,
  ];
  const logPath = join(profile.scratch, `${logName}.log`);
  const log = createWriteStream(logPath);
  let output = '';
  let announceListening: () => void = () => {};
  const listening = new Promise<void>((resolve) => (announceListening = resolve));
  const child = spawnGroup(NODE24, args, {
    env: profile.env,
    onOutput(chunk) {
      log.write(chunk);
      if (output.length < 100_000) output += chunk.toString();
      if (/HTTP server listening on/.test(output)) announceListening();
    },
  });
  const exited = new Promise<string>((resolve) =>
    child.once('exit', (code, signal) => resolve(`exited early (code ${code}, signal ${signal})`)),
  );

  const origin = `http://127.0.0.1:${port}`;
  const server: CodeServer = {
    port,
    pid: child.pid,
    logPath,
    origin,
    url(folder, query = {}) {
      return `${origin}/?${new URLSearchParams({ folder, ...query }).toString()}`;
    },
    async stop() {
      await stopGroup(child.pid);
      await new Promise<void>((resolve) => log.end(() => resolve()));
    },
  };

  let timer: NodeJS.Timeout | undefined;
  const started = await Promise.race([
    listening.then(() => 'listening'),
    exited,
    new Promise<string>((resolve) => (timer = setTimeout(() => resolve('was not listening after 60 s'), 60_000))),
  ]);
  clearTimeout(timer);
  if (started !== 'listening') {
    await server.stop();
    throw new Error(`code-server ${started}; the end of its log (${logPath}):\n${output.slice(-4000)}`);
  }
  return server;
}
