/**
 * A user's actions in the VS Code workbench (code-server in chromium), and waits on what the page
 * shows. Every wait polls the page for a condition until a deadline; none sleeps for a fixed time.
 * A failed wait throws an error that says what was expected, what the page showed and where the
 * screenshot of that moment is.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { missingFrom } from './sample-facts.js';
import { describeExpected, type Expected } from './shows.js';

const POLL_MS = 100;
export const DEFAULT_WAIT_MS = 30_000;
/** For the first result of a session: the extension activates, starts its server, evaluates the file. */
export const FIRST_RESULT_WAIT_MS = 60_000;

const EDITOR = '.editor-instance .monaco-editor';
export const SELECTORS = {
  workbench: '.monaco-workbench',
  explorerRow: '.explorer-folders-view .monaco-list-row',
  editor: EDITOR,
  viewLine: `${EDITOR} .view-lines .view-line`,
  languageMode: '#status\\.editor\\.mode',
  cursorPosition: '#status\\.editor\\.selection',
  errorSquiggle: `${EDITOR} .view-overlays .squiggly-error`,
  problemRow: '.markers-panel .monaco-list-row',
  codeLens: `${EDITOR} .codelens-decoration`,
  hover: '.monaco-hover:not(.hidden) .hover-contents',
  statusBar: '.part.statusbar',
  quickInput: '.quick-input-widget:not([style*="display: none"]) .quick-input-box input',
} as const;

/** Text as the page shows it: Monaco writes spaces as no-break spaces. */
const normalize = (text: string) => text.replace(/\u00a0/g, ' ').trim();

export class WorkbenchFailure extends Error {
  override name = 'WorkbenchFailure';
}

/**
 * Browser-side code for the centre of `word` inside the first editor line containing `lineText`.
 * Kept as source text: functions compiled by the test's TypeScript loader may carry helpers that do
 * not exist in the page.
 */
const WORD_CENTRE_SOURCE = `(({ selector, lineText, word }) => {
  const norm = (s) => s.replace(/\\u00a0/g, ' ');
  const line = [...document.querySelectorAll(selector)].find((l) => norm(l.textContent).includes(lineText));
  if (!line) return null;
  const start = norm(line.textContent).indexOf(lineText) + lineText.indexOf(word);
  const walker = document.createTreeWalker(line, NodeFilter.SHOW_TEXT);
  let offset = 0;
  for (let node = walker.nextNode(); node; node = walker.nextNode()) {
    const length = node.textContent.length;
    if (start < offset + length) {
      const range = document.createRange();
      range.setStart(node, start - offset);
      range.setEnd(node, Math.min(length, start - offset + word.length));
      const box = range.getBoundingClientRect();
      return { x: box.left + box.width / 2, y: box.top + box.height / 2 };
    }
    offset += length;
  }
  return null;
})`;

/** Browser-side code for the centre of the first lens command whose text contains every string. */
const LENS_CENTRE_SOURCE = `(({ selector, strings }) => {
  const norm = (s) => s.replace(/\\u00a0/g, ' ');
  const link = [...document.querySelectorAll(selector)].find((a) => strings.every((s) => norm(a.textContent).includes(s)));
  if (!link) return null;
  const box = link.getBoundingClientRect();
  if (box.width === 0 || box.height === 0) return null;
  return { x: box.left + Math.min(box.width / 2, 40), y: box.top + box.height / 2 };
})`;

export class Workbench {
  private shots = 0;

  constructor(
    readonly page: Page,
    /** Folder for this run's screenshots. */
    readonly artifacts: string,
  ) {
    mkdirSync(artifacts, { recursive: true });
  }

  async screenshot(name: string): Promise<string> {
    const path = join(this.artifacts, `${String(++this.shots).padStart(2, '0')}-${name}.png`);
    await this.page.screenshot({ path });
    return path;
  }

  private async fail(what: string, details: string): Promise<never> {
    let shot: string;
    try {
      shot = await this.screenshot(`FAILED-${what.replace(/[^A-Za-z0-9]+/g, '-').slice(0, 60)}`);
    } catch (error) {
      shot = `(no screenshot: ${String(error)})`;
    }
    throw new WorkbenchFailure(`${what}\n${details}\nscreenshot: ${shot}`);
  }

  /** The normalized texts of every element matching `selector`. */
  async texts(selector: string): Promise<string[]> {
    return (await this.page.locator(selector).allTextContents()).map(normalize);
  }

  /**
   * Waits until one element matching `selector` shows every expected piece (strings as substrings,
   * regular expressions as matches); returns that element's text.
   */
  async waitForText(what: string, selector: string, expected: Expected, timeout = DEFAULT_WAIT_MS): Promise<string> {
    const deadline = Date.now() + timeout;
    let seen: string[] = [];
    for (;;) {
      seen = await this.texts(selector);
      const match = seen.find((text) => missingFrom(text, expected).length === 0);
      if (match !== undefined) return match;
      if (Date.now() > deadline) break;
      await this.page.waitForTimeout(POLL_MS);
    }
    const closest = seen.length === 0 ? undefined : seen.reduce((a, b) => (missingFrom(a, expected).length <= missingFrom(b, expected).length ? a : b));
    return this.fail(
      `${what}: no element ${selector} showed what was expected within ${timeout / 1000} s`,
      [
        `expected: ${describeExpected(expected)}`,
        closest === undefined ? 'the page showed: no such element' : `missing: ${missingFrom(closest, expected).join(', ')}`,
        ...(closest === undefined ? [] : [`the page showed (${seen.length} element(s)):`, ...seen.slice(0, 12).map((t) => `  | ${t.slice(0, 400)}`)]),
      ].join('\n'),
    );
  }

  /** Waits until no element matching `selector` shows `expected` (all of it) any more. */
  async waitForGone(what: string, selector: string, expected: Expected = [], timeout = DEFAULT_WAIT_MS): Promise<void> {
    const deadline = Date.now() + timeout;
    let seen: string[] = [];
    for (;;) {
      seen = (await this.texts(selector)).filter((text) => missingFrom(text, expected).length === 0);
      if (seen.length === 0) return;
      if (Date.now() > deadline) break;
      await this.page.waitForTimeout(POLL_MS);
    }
    await this.fail(
      `${what}: ${selector} still shown after ${timeout / 1000} s`,
      [`still showing (${seen.length}):`, ...seen.slice(0, 12).map((t) => `  | ${t.slice(0, 400)}`)].join('\n'),
    );
  }

  async waitForVisible(what: string, selector: string, timeout = DEFAULT_WAIT_MS): Promise<void> {
    try {
      await this.page.locator(selector).first().waitFor({ state: 'visible', timeout });
    } catch {
      await this.fail(`${what}: ${selector} did not become visible within ${timeout / 1000} s`, `page title: ${await this.page.title()}`);
    }
  }

  /** Waits until the browser-side `expression` is true; on timeout, `describe()` says what the page showed. */
  async waitForCondition(what: string, expression: string, describe: () => Promise<string>, timeout = DEFAULT_WAIT_MS): Promise<void> {
    try {
      await this.page.waitForFunction(expression, undefined, { timeout, polling: POLL_MS });
    } catch {
      await this.fail(`${what}: not the case within ${timeout / 1000} s (${expression})`, await describe());
    }
  }

  /** Opens the workbench at `url` and waits for the explorer to list the folder. */
  async open(url: string): Promise<void> {
    await this.page.goto(url);
    await this.waitForVisible('the workbench loads', SELECTORS.workbench, 60_000);
    await this.waitForVisible('the explorer lists the workspace folder', SELECTORS.explorerRow, 60_000);
  }

  /** Clicks the file in the explorer and waits until its editor shows it in the Wedgework language. */
  async openFile(name: string, firstLine: string): Promise<void> {
    const row = this.page.locator(`${SELECTORS.explorerRow}[aria-label*="${name}"]`).first();
    try {
      await row.click({ timeout: DEFAULT_WAIT_MS });
    } catch {
      await this.fail(`opening ${name}`, `no explorer row for ${name}; rows: ${(await this.texts(SELECTORS.explorerRow)).join(' | ')}`);
    }
    await this.waitForText(`the editor shows ${name}`, SELECTORS.viewLine, [firstLine]);
    await this.waitForText(`the status bar names the language of ${name}`, SELECTORS.languageMode, ['Wedgework']);
  }

  /** Moves the cursor to the start of a one-based line with Go to Line (Ctrl+G). */
  async goToLine(line: number): Promise<void> {
    await this.page.keyboard.press('Control+G');
    await this.waitForVisible('the Go to Line box opens', SELECTORS.quickInput);
    await this.page.keyboard.type(String(line));
    await this.page.keyboard.press('Enter');
    await this.waitForText(`the cursor moves to line ${line}`, SELECTORS.cursorPosition, [`Ln ${line}, Col 1`]);
  }

  /**
   * Moves the mouse to the middle of `word` on the line showing `lineText` and returns the text of
   * the hover that shows `expected`. When no hover comes (the pointer arrived before the editor was
   * ready for it), the pointer leaves and comes back, as a user would do, until the deadline.
   */
  async hoverWord(lineText: string, word: string, expected: Expected, timeout = DEFAULT_WAIT_MS): Promise<string> {
    const deadline = Date.now() + timeout;
    for (let attempt = 1; ; attempt++) {
      const centre = (await this.page.evaluate(
        `${WORD_CENTRE_SOURCE}(${JSON.stringify({ selector: SELECTORS.viewLine, lineText, word })})`,
      )) as { x: number; y: number } | null;
      if (!centre) return this.fail(`hovering ${word}`, `no editor line shows ${JSON.stringify(lineText)}`);
      // Arrive in steps from the left, as a real pointer does, so the editor sees the mouse move onto the word.
      await this.page.mouse.move(centre.x - 60, centre.y + 3 * attempt, { steps: 2 });
      await this.page.mouse.move(centre.x, centre.y, { steps: 5 });
      const remaining = deadline - Date.now();
      if (remaining < 6000) return this.waitForText(`the hover over ${word}`, SELECTORS.hover, expected, Math.max(remaining, 1000));
      try {
        await this.page.locator(SELECTORS.hover).first().waitFor({ state: 'visible', timeout: 5000 });
        return await this.waitForText(`the hover over ${word}`, SELECTORS.hover, expected, Math.max(deadline - Date.now(), 1000));
      } catch (error) {
        if (error instanceof WorkbenchFailure) throw error;
        // No hover appeared within 5 s: leave the word and try again.
        await this.page.mouse.move(centre.x, centre.y + 200, { steps: 2 });
      }
    }
  }

  /** Waits for a hover's fade-in to finish (its opacity reaches 1), so that a screenshot shows it. */
  async waitForHoverOpaque(): Promise<void> {
    await this.page.waitForFunction(
      `(() => { const h = document.querySelector('.monaco-hover:not(.hidden)'); return !!h && getComputedStyle(h).opacity === '1'; })()`,
      undefined,
      { timeout: 5000, polling: POLL_MS },
    );
  }

  /**
   * Clicks the command of the code lens showing `expected`. The lens is found and clicked by its
   * position on the page: the editor may render its lenses anew at any time (after each evaluation),
   * and a lens found anew sits at the same place. Retried until the deadline if none is found.
   */
  async clickLens(expected: Expected, timeout = DEFAULT_WAIT_MS): Promise<void> {
    await this.waitForText('the code lens to click', SELECTORS.codeLens, expected, timeout);
    const strings = expected.filter((e): e is string => typeof e === 'string');
    const deadline = Date.now() + timeout;
    for (;;) {
      const centre = (await this.page.evaluate(
        `${LENS_CENTRE_SOURCE}(${JSON.stringify({ selector: `${SELECTORS.codeLens} a`, strings })})`,
      )) as { x: number; y: number } | null;
      if (centre) {
        await this.page.mouse.click(centre.x, centre.y);
        return;
      }
      if (Date.now() > deadline) break;
      await this.page.waitForTimeout(POLL_MS);
    }
    await this.fail('clicking the code lens', `no clickable lens shows ${describeExpected(expected)}; lenses: ${(await this.texts(SELECTORS.codeLens)).join(' | ')}`);
  }

  /** What the page's clipboard holds (the browser context was granted clipboard-read). */
  async readClipboard(): Promise<string> {
    return (await this.page.evaluate('navigator.clipboard.readText()')) as string;
  }

  /** Opens the Problems panel (Ctrl+Shift+M) unless it is open. */
  async showProblems(): Promise<void> {
    if (await this.page.locator('.markers-panel').isVisible()) return;
    await this.page.keyboard.press('Control+Shift+M');
    await this.waitForVisible('the Problems panel opens', '.markers-panel');
  }
}
