/**
 * The extension as a user meets it: installed from its .vsix into a real VS Code workbench
 * (code-server, driven in chromium), a sample opened from the explorer, then what the user sees —
 * the false claim's squiggle and Problems entry, a hover with Plücker coordinates, a code lens and
 * its copy-as-LaTeX, an edit that makes the claim true, and recovery after a syntax error.
 *
 * Run by scripts/e2e/run.ts (npm run test:e2e), which packages the .vsix first.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { ARTIFACTS, ROOT, VSIX } from '../../scripts/e2e/paths.js';
import { prepareProfile, startCodeServer, type CodeServer } from '../../scripts/e2e/code-server.js';
import { openBrowser } from '../../scripts/e2e/browser.js';
import { FIRST_RESULT_WAIT_MS, SELECTORS, Workbench } from './workbench-page.js';
import { makeWorkspace } from './workspace.js';
import * as facts from './sample-facts.js';
import { timed } from './timed.js';
import { assertShows } from './shows.js';

describe('the extension in the VS Code workbench', { timeout: 240_000 }, () => {
  const scratch = mkdtempSync(join(tmpdir(), 'wedgework-e2e-workbench-'));
  const artifacts = join(ARTIFACTS, 'workbench');
  let server: CodeServer | undefined;
  let browser: BrowserContext | undefined;
  let page: Page;
  let bench: Workbench;
  let workspace: string;
  const sampleText = readFileSync(join(ROOT, 'samples', facts.SAMPLE_FILE), 'utf8');
  /** One-based, as the status bar and Go to Line count. */
  const claimLine = facts.lineOf(sampleText, facts.FALSE_CLAIM_TEXT) + 1;

  before(async () => {
    rmSync(artifacts, { recursive: true, force: true });
    workspace = makeWorkspace(scratch);
    const profile = await timed('install the .vsix', () => prepareProfile(scratch, { vsix: VSIX }));
    server = await timed('start code-server', () => startCodeServer(profile));
    browser = await timed('start chromium', () => openBrowser(scratch, server!.origin));
    page = browser.pages()[0] ?? (await browser.newPage());
    bench = new Workbench(page, artifacts);
    await timed('load the workbench', () => bench.open(server!.url(workspace)));
    await timed('open the sample', () => bench.openFile(facts.SAMPLE_FILE, 'Sight lines of a two-camera calibration rig', FIRST_RESULT_WAIT_MS));
  });

  after(async () => {
    await browser?.close().catch(() => {});
    await server?.stop();
    if (server) {
      mkdirSync(artifacts, { recursive: true });
      copyFileSync(server.logPath, join(artifacts, 'code-server.log'));
    }
    rmSync(scratch, { recursive: true, force: true });
  });

  test('the code lens above the subspace shows its result and copies it as LaTeX', async () => {
    // The first lens waits for the extension to start its server and evaluate the file: allow more time.
    await bench.waitForText('the code lens of sightA', SELECTORS.codeLens, facts.SIGHT_A_LENS, FIRST_RESULT_WAIT_MS);
    await page.evaluate('navigator.clipboard.writeText("(nothing copied yet)")');
    await bench.clickLens(facts.SIGHT_A_LENS);
    await bench.waitForText('the status bar confirms the copy', SELECTORS.statusBar, ['copied', 'as LaTeX']);
    assertShows('the clipboard after clicking the lens', await bench.readClipboard(), facts.SIGHT_A_LATEX);
    await bench.screenshot('code-lens-copied');
  });

  test('the hover over a subspace name shows its Plücker coordinates and the convention', async () => {
    const hover = await bench.hoverWord(facts.HOVERED_LINE_TEXT, facts.HOVERED_NAME, facts.hoverExpectations());
    assert.ok(hover.includes(`subspace ${facts.HOVERED_NAME}`), `the hover names the subspace; it showed:\n${hover}`);
    await bench.waitForHoverOpaque();
    await bench.screenshot('hover-plucker');
    await page.keyboard.press('Escape');
  });

  test('the false claim is squiggled and listed in Problems with its code and message', async () => {
    await bench.goToLine(claimLine);
    await bench.waitForVisible('the squiggle under the false claim', SELECTORS.errorSquiggle);
    await bench.showProblems();
    const row = await bench.waitForText('the Problems entry of the false claim', SELECTORS.problemRow, [
      facts.FALSE_CLAIM_CODE,
      ...facts.FALSE_CLAIM_MESSAGE,
    ]);
    assert.ok(row.includes(`[Ln ${claimLine}`), `the Problems entry points at line ${claimLine}; it showed:\n${row}`);
    await bench.screenshot('false-claim-problem');
  });

  test('editing the claim to a true one and saving removes the error', async () => {
    await bench.goToLine(claimLine);
    await page.keyboard.press('Shift+End');
    await page.keyboard.type(facts.TRUE_CLAIM_TEXT);
    // Close the word suggestions the typing opened, as a user would before saving.
    await page.keyboard.press('Escape');
    await page.keyboard.press('Control+S');
    await bench.waitForText('the lens of the edited claim after saving', SELECTORS.codeLens, facts.TRUE_CLAIM_LENS);
    await bench.waitForGone('the squiggle of the false claim', SELECTORS.errorSquiggle);
    await bench.waitForGone('the Problems entry of the false claim', SELECTORS.problemRow, [facts.FALSE_CLAIM_CODE]);
    await bench.screenshot('claim-fixed');
    const saved = readFileSync(join(workspace, facts.SAMPLE_FILE), 'utf8');
    assert.ok(saved.includes(facts.TRUE_CLAIM_TEXT), 'the edit was saved to the workspace copy');
  });

  test('a syntax error is reported and the statements after it still get lenses', async () => {
    await bench.openFile(facts.BROKEN_FILE, 'A statement with a syntax error');
    await bench.showProblems();
    await bench.waitForText('the Problems entry of the syntax error', SELECTORS.problemRow, [
      facts.SYNTAX_CODE_PREFIX,
      ...facts.SYNTAX_MESSAGE,
    ]);
    await bench.waitForVisible('the squiggle of the syntax error', SELECTORS.errorSquiggle);
    await bench.waitForText('the lens of the statement after the error', SELECTORS.codeLens, facts.RECOVERED_LENS);
    await bench.waitForText('the lens of the claim after the error', SELECTORS.codeLens, [facts.RECOVERED_CLAIM_LENS]);
    await bench.screenshot('syntax-recovery');
  });
});
