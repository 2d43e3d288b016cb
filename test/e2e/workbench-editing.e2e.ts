/**
 * Editing with the extension in the VS Code workbench, as a user does it: completion while typing,
 * rename with F2 (and its refusal on the language's own words), the quick fix that replaces a
 * false claimed value with the computed one, and the results view with its entries that lead to
 * their statements.
 *
 * Run by scripts/e2e/run.ts (npm run test:e2e, stage workbench), which packages the .vsix first.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { ROOT } from '../../scripts/e2e/paths.js';
import { FIRST_RESULT_WAIT_MS, SELECTORS, type Workbench } from './workbench-page.js';
import * as facts from './sample-facts.js';
import * as editing from './editing-facts.js';
import { startSession, type Session } from './workbench-session.js';
import { timed } from './timed.js';
import { assertShows } from './shows.js';

describe('editing in the VS Code workbench', { timeout: 300_000 }, () => {
  let session: Session;
  let page: Page;
  let bench: Workbench;
  const fixture = (name: string) => readFileSync(join(ROOT, 'test/e2e/fixtures', name), 'utf8');
  const saved = (name: string) => readFileSync(join(session.workspace, name), 'utf8');
  /** One-based line numbers, as the status bar counts. */
  const lineNumber = (text: string, needle: string) => facts.lineOf(text, needle) + 1;

  /**
   * Opens a file and waits for its first evaluation (a lens), so the server answers from then on.
   * Each may take long in the first test, while the workbench and the extension still start.
   */
  async function openEvaluated(name: string, firstLine: string, lens: string[]): Promise<void> {
    await bench.openFile(name, firstLine, FIRST_RESULT_WAIT_MS);
    await bench.waitForText(`the first lens of ${name}`, SELECTORS.codeLens, lens, FIRST_RESULT_WAIT_MS);
  }

  before(async () => {
    session = await startSession({
      artifactsName: 'workbench-editing',
      workspace: { fixtures: editing.EDITING_FIXTURES },
      // Saving is the user's act in these checks, so that every evaluation follows a Ctrl+S.
      userSettings: { 'files.autoSave': 'off' },
    });
    page = session.page;
    bench = session.bench;
  });

  after(async () => {
    await session?.end();
  });

  test('typing offers the names in scope with their kinds and the built-ins, and accepting one inserts it', async () => {
    const text = fixture(editing.COMPLETION_FILE);
    await timed('open the completion fixture', () => openEvaluated(editing.COMPLETION_FILE, editing.COMPLETION_FIRST_LINE, ['dim 2 in V', editing.COMPLETION_PLANE_POINT]));
    // A new statement on the empty last line.
    await bench.goToLine(text.split('\n').length);
    // `show (` rather than `show `: a letter typed right after a space can open no list at all (the
    // space asks the server too, and a letter typed before its empty answer arrives is taken as part
    // of that empty list), which the parenthesis avoids. See the report on completion after a space.
    await page.keyboard.type('show (');
    await page.keyboard.type('p');
    const offered = await bench.waitForSuggestions('the completions for p', editing.COMPLETIONS_FOR_P);
    await bench.screenshot('completion-list');
    assert.ok(!offered.some((s) => s.label === 'q'), `only words matching p are listed; the list: ${offered.map((s) => s.label).join(', ')}`);

    await page.keyboard.type('lu');
    await bench.acceptSuggestion('plucker');
    // The built-in is inserted as a call with the cursor between its parentheses.
    await bench.waitForLine('the accepted built-in in the editor', 'show (plucker())');
    await bench.waitForText('the cursor inside the parentheses', SELECTORS.cursorPosition, [`Col ${'show (plucker('.length + 1}`]);
    await page.keyboard.type('pla');
    await bench.acceptSuggestion('plane');
    await bench.waitForLine('the completed statement in the editor', editing.COMPLETED_LINE);

    await page.keyboard.press('Control+S');
    await bench.waitForText('the lens of the completed statement after saving', SELECTORS.codeLens, editing.COMPLETED_LENS);
    await bench.waitForGone('the squiggle of the unfinished statement', SELECTORS.errorSquiggle);
    await bench.screenshot('completion-accepted');
    assert.equal(saved(editing.COMPLETION_FILE), `${text}${editing.COMPLETED_LINE}`, 'the saved file holds the completed statement');
  });

  test('F2 on a keyword or a built-in is refused with the reason', async () => {
    const text = fixture(editing.RENAME_FILE);
    await timed('open the rename fixture', () => openEvaluated(editing.RENAME_FILE, editing.RENAME_FIRST_LINE, ['✓ holds']));
    for (const refused of editing.REFUSED_RENAMES) {
      const message = await bench.renameRefusal(refused.lineText, refused.word);
      assertShows(`the refusal to rename ${refused.word}`, message, refused.message);
      if (refused === editing.REFUSED_RENAMES[0]) await bench.screenshot('rename-refused');
      await page.keyboard.press('Escape');
      await bench.waitForHidden(`the message about ${refused.word}`, SELECTORS.editorMessage);
    }
    assert.equal(saved(editing.RENAME_FILE), text, 'a refused rename changes nothing');
  });

  test('F2 on a declared name renames it and every use', async () => {
    const text = fixture(editing.RENAME_FILE);
    await bench.rename(editing.RENAME_DECLARATION_LINE, editing.RENAMED_FROM, editing.RENAMED_TO);
    const expected = renamedLines(editing.renamedText(text));
    for (const line of expected) await bench.waitForLine(`the renamed line ${JSON.stringify(line)}`, line);
    await page.keyboard.press('Control+S');
    await bench.waitForText('the claim about the renamed point after saving', SELECTORS.codeLens, editing.RENAMED_CLAIM_LENS);
    await bench.screenshot('rename-applied');
    assert.equal(saved(editing.RENAME_FILE), editing.renamedText(text), 'the saved file has the new name at the declaration and every use');
  });

  test('the quick fix replaces a false Plücker point with the computed one', async () => {
    const text = fixture(editing.QUICK_FIX_FILE);
    await timed('open the quick-fix fixture', () => openEvaluated(editing.QUICK_FIX_FILE, editing.QUICK_FIX_FIRST_LINE, ['dim 2 in V', editing.COMPUTED_POINT]));
    await bench.waitForVisible('the squiggle under the false claim', SELECTORS.errorSquiggle);
    await bench.goToLine(lineNumber(text, editing.FALSE_POINT_CLAIM));
    const offered = await bench.applyQuickFix(editing.QUICK_FIX_TITLE);
    assert.ok(offered.length >= 1, 'the menu offered the fix');
    await bench.waitForLine('the corrected claim in the editor', editing.FIXED_CLAIM);
    await page.keyboard.press('Control+S');
    await bench.waitForText('the lens of the corrected claim after saving', SELECTORS.codeLens, editing.FIXED_CLAIM_LENS);
    await bench.waitForGone('the squiggle of the false claim', SELECTORS.errorSquiggle);
    await bench.screenshot('quick-fix-applied');
    assert.equal(saved(editing.QUICK_FIX_FILE), text.replace(editing.FALSE_POINT_CLAIM, editing.FIXED_CLAIM), 'only the claimed point changed');
  });

  test('the results view lists the results of the open file, and an entry leads to its statement', async () => {
    const text = readFileSync(join(ROOT, 'samples', facts.SAMPLE_FILE), 'utf8');
    await timed('open the sample', () => openEvaluated(facts.SAMPLE_FILE, 'Sight lines of a two-camera calibration rig', facts.SIGHT_A_LENS));
    await bench.showResultsView();
    await bench.waitForResult('the entry of camera A', 'cameraA', ['vector', '(0, 0, 0, 1)']);
    await bench.waitForResult('the entry of sight line A', facts.HOVERED_NAME, ['subspace', ...facts.SIGHT_A_LENS]);
    await bench.waitForResult('the entry of the false claim', 'claim', ['✗ false', 'not in sightB']);
    assert.ok((await bench.resultsViewDescription()).includes(facts.SAMPLE_FILE), 'the view names the file it describes');
    await bench.screenshot('results-view');

    await bench.clickResult('sightB', ['subspace']);
    await bench.waitForText('the cursor at the declaration of sightB', SELECTORS.cursorPosition, [`Ln ${lineNumber(text, 'subspace sightB =')},`]);
    await bench.clickResult('claim', ['✗ false']);
    await bench.waitForText('the cursor at the false claim', SELECTORS.cursorPosition, [`Ln ${lineNumber(text, facts.FALSE_CLAIM_TEXT)},`]);
    await bench.screenshot('results-view-entry-clicked');
  });
});

/** The lines of `text` that are statements (not comments nor blank), as the editor shows them. */
function renamedLines(text: string): string[] {
  return text.split('\n').filter((line) => line.trim() !== '' && !line.startsWith('#'));
}
