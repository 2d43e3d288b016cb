/**
 * One workbench for one test file: the packaged extension installed into a fresh code-server
 * profile, chromium on the workbench, a workspace copy opened in it. Starting is slow, so a test
 * file starts one session in `before` and ends it in `after`.
 */
import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { ARTIFACTS, VSIX } from '../../scripts/e2e/paths.js';
import { prepareProfile, startCodeServer, type CodeServer } from '../../scripts/e2e/code-server.js';
import { openBrowser } from '../../scripts/e2e/browser.js';
import { Workbench } from './workbench-page.js';
import { makeWorkspace, type WorkspaceOptions } from './workspace.js';
import { timed } from './timed.js';

export interface SessionOptions {
  /** The folder under test-artifacts/e2e/ for this file's screenshots and logs (emptied first). */
  artifactsName: string;
  workspace?: WorkspaceOptions;
  /** User settings on top of the quiet ones (scripts/e2e/code-server.ts). */
  userSettings?: Record<string, unknown>;
}

export interface Session {
  page: Page;
  bench: Workbench;
  workspace: string;
  artifacts: string;
  end(): Promise<void>;
}

export async function startSession({ artifactsName, workspace: workspaceOptions, userSettings = {} }: SessionOptions): Promise<Session> {
  const scratch = mkdtempSync(join(tmpdir(), `wedgework-e2e-${artifactsName}-`));
  const artifacts = join(ARTIFACTS, artifactsName);
  rmSync(artifacts, { recursive: true, force: true });
  let server: CodeServer | undefined;
  let browser: BrowserContext | undefined;
  const end = async () => {
    await browser?.close().catch(() => {});
    await server?.stop();
    if (server) {
      mkdirSync(artifacts, { recursive: true });
      copyFileSync(server.logPath, join(artifacts, 'code-server.log'));
    }
    rmSync(scratch, { recursive: true, force: true });
  };
  try {
    const workspace = makeWorkspace(scratch, workspaceOptions);
    const profile = await timed('install the .vsix', () => prepareProfile(scratch, { vsix: VSIX, settings: userSettings }));
    server = await timed('start code-server', () => startCodeServer(profile));
    browser = await timed('start chromium', () => openBrowser(scratch, server!.origin));
    const page = browser.pages()[0] ?? (await browser.newPage());
    const bench = new Workbench(page, artifacts);
    await timed('load the workbench', () => bench.open(server!.url(workspace)));
    return { page, bench, workspace, artifacts, end };
  } catch (error) {
    await end();
    throw error;
  }
}
