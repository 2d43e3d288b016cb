/** Debian's chromium driven by playwright-core, headless, with a fresh profile per run. */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { CHROMIUM, CHROMIUM_ARGS, isolatedEnv } from './tools.js';

export const VIEWPORT = { width: 1360, height: 860 };

/**
 * Opens a browser context whose profile lives in `scratch/browser-profile` (the profile folder is the
 * first argument of launchPersistentContext, never a --user-data-dir flag). Clipboard access is
 * granted for `origin`, so a test can read what a command copied.
 */
export async function openBrowser(scratch: string, origin: string, viewport = VIEWPORT): Promise<BrowserContext> {
  const profileDir = join(scratch, 'browser-profile');
  mkdirSync(profileDir, { recursive: true });
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM,
    headless: true,
    args: CHROMIUM_ARGS,
    env: isolatedEnv(join(scratch, 'browser')) as Record<string, string>,
    viewport,
    deviceScaleFactor: 1,
  });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin });
  return context;
}
