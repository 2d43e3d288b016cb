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
  /** The window progress in the status bar (where the language client shows work-done progress). */
  progress: '#status\\.progress',
  suggestWidget: `${EDITOR} .suggest-widget.visible`,
  suggestRow: `${EDITOR} .suggest-widget.visible .monaco-list-row`,
  renameInput: `${EDITOR} .rename-box .rename-input`,
  /** The message the editor shows at the cursor, e.g. why a rename is refused. */
  editorMessage: `${EDITOR} .monaco-editor-overlaymessage`,
  quickFixRow: '.action-widget .monaco-list-row.action',
  lightBulb: `${EDITOR} .lightBulbWidget`,
  paneHeader: '.pane-header',
  /** The Explorer's section that lists the workspace folder. */
  folderSectionHeader: '.pane-header[aria-label^="Explorer Section"]',
} as const;

/** The Explorer section of the extension's results view, by its title (package.json contributes.views). */
export const RESULTS_VIEW_TITLE = 'Wedgework Results';

/** One entry of the suggestion widget: its label and the detail beside it. */
export interface Suggestion {
  label: string;
  detail: string;
  focused: boolean;
}

/** One entry of the results view: the label and the dimmed description beside it. */
export interface ResultEntry {
  label: string;
  description: string;
}

/**
 * How long a hover took, in milliseconds, measured inside the page from the mouse event that
 * arrived on the word: until the hover's element showed the expected content, and until the next
 * animation frame after that (when the browser paints it).
 */
export interface HoverTiming {
  contentMs: number;
  paintedMs: number;
}

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

/**
 * Browser-side code that arms a one-shot measurement of a hover: it notes the time of the mouse
 * event at (x, y), then the time at which an element matching `selector` is displayed with text
 * matching every pattern, then the next animation frame. The result is read from
 * `window.__wedgeworkHoverProbe`.
 */
const HOVER_PROBE_SOURCE = `(({ selector, x, y, patterns }) => {
  const norm = (s) => s.replace(/\\u00a0/g, ' ');
  const regexes = patterns.map((p) => new RegExp(p));
  const probe = { movedAt: undefined, contentAt: undefined, paintedAt: undefined, lastText: '' };
  window.__wedgeworkHoverProbe = probe;
  const onMove = (event) => {
    if (Math.abs(event.clientX - x) <= 1.5 && Math.abs(event.clientY - y) <= 1.5) {
      probe.movedAt = performance.now();
      document.removeEventListener('mousemove', onMove, true);
    }
  };
  document.addEventListener('mousemove', onMove, true);
  const observer = new MutationObserver(() => {
    if (probe.movedAt === undefined || probe.contentAt !== undefined) return;
    const hover = document.querySelector(selector);
    if (!hover || hover.getClientRects().length === 0) return;
    probe.lastText = norm(hover.textContent);
    if (!regexes.every((r) => r.test(probe.lastText))) return;
    probe.contentAt = performance.now();
    observer.disconnect();
    requestAnimationFrame(() => { probe.paintedAt = performance.now(); });
  });
  observer.observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true });
})`;

/** Browser-side code for the entries of the suggestion widget. */
const SUGGESTIONS_SOURCE = `(({ selector }) => [...document.querySelectorAll(selector)].map((row) => ({
  label: (row.querySelector('.label-name')?.textContent ?? '').replace(/\\u00a0/g, ' '),
  detail: (row.querySelector('.details-label')?.textContent ?? '').replace(/\\u00a0/g, ' '),
  focused: row.classList.contains('focused'),
})))`;

/** The header of the Explorer section titled `title` (a Playwright selector: `:text-is` is exact). */
const sectionHeader = (title: string) => `${SELECTORS.paneHeader}:has(h3.title:text-is("${title}"))`;

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

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

  /** Waits until no element matching `selector` is visible (hidden or removed). */
  async waitForHidden(what: string, selector: string, timeout = DEFAULT_WAIT_MS): Promise<void> {
    try {
      await this.page.locator(selector).first().waitFor({ state: 'hidden', timeout });
    } catch {
      await this.fail(`${what}: ${selector} still visible after ${timeout / 1000} s`, `page title: ${await this.page.title()}`);
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

  /**
   * Clicks the file in the explorer and waits until its editor shows it in the Wedgework language.
   * The first file of a session may take longer (`timeout`): the workbench is still starting.
   */
  async openFile(name: string, firstLine: string, timeout = DEFAULT_WAIT_MS): Promise<void> {
    // The results view's check collapses the folder's section to make room; a user opens it again.
    await this.setSectionExpanded(SELECTORS.folderSectionHeader, true);
    const row = this.page.locator(`${SELECTORS.explorerRow}[aria-label*="${name}"]`).first();
    try {
      await row.click({ timeout: DEFAULT_WAIT_MS });
    } catch {
      await this.fail(`opening ${name}`, `no explorer row for ${name}; rows: ${(await this.texts(SELECTORS.explorerRow)).join(' | ')}`);
    }
    await this.waitForText(`the editor shows ${name}`, SELECTORS.viewLine, [firstLine], timeout);
    await this.waitForText(`the status bar names the language of ${name}`, SELECTORS.languageMode, ['Wedgework'], timeout);
  }

  /** Moves the cursor to the start of a one-based line with Go to Line (Ctrl+G). */
  async goToLine(line: number): Promise<void> {
    await this.page.keyboard.press('Control+G');
    await this.waitForVisible('the Go to Line box opens', SELECTORS.quickInput);
    await this.page.keyboard.type(String(line));
    await this.page.keyboard.press('Enter');
    await this.waitForText(`the cursor moves to line ${line}`, SELECTORS.cursorPosition, [`Ln ${line}, Col 1`]);
    await this.waitForEditorFocus(`the editor after going to line ${line}`);
  }

  /** Waits until the keyboard types into the editor (the closing Go to Line box, for one, returns the focus late). */
  async waitForEditorFocus(what: string): Promise<void> {
    await this.waitForCondition(
      `${what} has the keyboard focus`,
      `!!document.activeElement?.closest(${JSON.stringify(SELECTORS.editor)})`,
      async () => `the focus is on ${await this.page.evaluate('document.activeElement?.outerHTML.slice(0, 200)')}`,
    );
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

  /** The centre of `word` on the editor line showing `lineText`, or a failure naming the line. */
  private async wordCentre(lineText: string, word: string): Promise<{ x: number; y: number }> {
    const centre = (await this.page.evaluate(
      `${WORD_CENTRE_SOURCE}(${JSON.stringify({ selector: SELECTORS.viewLine, lineText, word })})`,
    )) as { x: number; y: number } | null;
    return centre ?? this.fail(`finding ${word}`, `no editor line shows ${JSON.stringify(lineText)}`);
  }

  /** Puts the cursor in `word` on the line showing `lineText` by clicking it. */
  async clickWord(lineText: string, word: string): Promise<void> {
    const centre = await this.wordCentre(lineText, word);
    await this.page.mouse.click(centre.x, centre.y);
  }

  /** Waits until some editor line shows `lineText` (for example after an edit). */
  async waitForLine(what: string, lineText: string, timeout = DEFAULT_WAIT_MS): Promise<void> {
    await this.waitForText(what, SELECTORS.viewLine, [lineText], timeout);
  }

  /** The entries the suggestion widget shows now (none when it is closed). */
  async suggestions(): Promise<Suggestion[]> {
    return (await this.page.evaluate(`${SUGGESTIONS_SOURCE}(${JSON.stringify({ selector: SELECTORS.suggestRow })})`)) as Suggestion[];
  }

  /**
   * Waits until the suggestion widget lists every expected entry, each with a detail that contains
   * the expected detail; returns what it lists then.
   */
  async waitForSuggestions(what: string, expected: readonly { label: string; detail: string }[], timeout = DEFAULT_WAIT_MS): Promise<Suggestion[]> {
    const deadline = Date.now() + timeout;
    const missing = (shown: Suggestion[]) =>
      expected.filter((e) => !shown.some((s) => s.label === e.label && s.detail.includes(e.detail)));
    let shown: Suggestion[] = [];
    for (;;) {
      shown = await this.suggestions();
      if (missing(shown).length === 0) return shown;
      if (Date.now() > deadline) break;
      await this.page.waitForTimeout(POLL_MS);
    }
    return this.fail(
      `${what}: the suggestion widget did not list what was expected within ${timeout / 1000} s`,
      [
        `missing: ${missing(shown).map((e) => `${e.label} (${e.detail})`).join(', ')}`,
        shown.length === 0 ? 'the widget was closed or empty' : `it listed: ${shown.map((s) => `${s.label} (${s.detail})`).join(', ')}`,
      ].join('\n'),
    );
  }

  /** Moves the widget's focus to the entry `label` with the arrow keys, accepts it with Enter and waits for the widget to close. */
  async acceptSuggestion(label: string): Promise<void> {
    const shown = await this.waitForSuggestions(`the suggestion ${label}`, [{ label, detail: '' }]);
    for (let step = 0; step <= shown.length; step++) {
      if ((await this.suggestions()).find((s) => s.focused)?.label === label) {
        await this.page.keyboard.press('Enter');
        await this.waitForHidden(`the suggestion widget after accepting ${label}`, SELECTORS.suggestWidget);
        return;
      }
      await this.page.keyboard.press('ArrowDown');
    }
    await this.fail(`accepting the suggestion ${label}`, `the focus never reached it; entries: ${shown.map((s) => s.label).join(', ')}`);
  }

  /** Renames `word` on the line showing `lineText` with F2, typing `newName` and Enter. */
  async rename(lineText: string, word: string, newName: string): Promise<void> {
    await this.clickWord(lineText, word);
    await this.page.keyboard.press('F2');
    await this.waitForVisible(`the rename box for ${word}`, SELECTORS.renameInput);
    // The box shows before it takes the keyboard: typing waits for the focus.
    await this.waitForCondition(
      `the rename box proposes ${word} and has the keyboard focus`,
      `(() => { const box = document.querySelector(${JSON.stringify(SELECTORS.renameInput)}); return !!box && box.value === ${JSON.stringify(word)} && document.activeElement === box; })()`,
      async () => `the box holds ${JSON.stringify(await this.page.locator(SELECTORS.renameInput).inputValue())}; the focus is on ${await this.page.evaluate('document.activeElement?.outerHTML.slice(0, 200)')}`,
    );
    // The proposed name is selected: typing replaces it.
    await this.page.keyboard.type(newName);
    await this.page.keyboard.press('Enter');
    await this.waitForHidden(`the rename box after renaming ${word}`, SELECTORS.renameInput);
  }

  /**
   * Presses F2 on `word` where a rename must be refused, and returns the message the editor shows
   * there; fails if a rename box opens instead.
   */
  async renameRefusal(lineText: string, word: string): Promise<string> {
    await this.clickWord(lineText, word);
    await this.page.keyboard.press('F2');
    const message = await this.waitForText(`the reason why ${word} cannot be renamed`, SELECTORS.editorMessage, [`'${word}'`]);
    if (await this.page.locator(SELECTORS.renameInput).isVisible()) {
      await this.fail(`renaming ${word}`, 'a rename box opened, although a message refused the rename');
    }
    return message;
  }

  /**
   * Opens the quick-fix menu at the cursor (Ctrl+.), clicks the action whose title shows
   * `expected` and waits for the menu to close; returns the titles the menu offered.
   */
  async applyQuickFix(expected: Expected): Promise<string[]> {
    // The light bulb says that the editor knows the actions at the cursor.
    await this.waitForVisible('the light bulb at the cursor', SELECTORS.lightBulb);
    await this.waitForEditorFocus('the editor before Ctrl+.');
    await this.page.keyboard.press('Control+.');
    const title = await this.waitForText('the quick fix in the menu', SELECTORS.quickFixRow, expected);
    const offered = await this.texts(SELECTORS.quickFixRow);
    await this.page.locator(SELECTORS.quickFixRow).filter({ hasText: title }).first().click();
    await this.waitForHidden('the quick-fix menu after applying the fix', SELECTORS.quickFixRow);
    return offered;
  }

  /** Expands or collapses the Explorer section whose header matches `header`, if it is not so already. */
  private async setSectionExpanded(header: string, expanded: boolean): Promise<void> {
    const locator = this.page.locator(header).first();
    if ((await locator.count()) === 0) return;
    const want = String(expanded);
    if ((await locator.getAttribute('aria-expanded')) === want) return;
    await locator.click();
    const deadline = Date.now() + DEFAULT_WAIT_MS;
    while ((await locator.getAttribute('aria-expanded')) !== want) {
      if (Date.now() > deadline) await this.fail(`the section ${header}`, `it did not become ${expanded ? 'expanded' : 'collapsed'}`);
      await this.page.waitForTimeout(POLL_MS);
    }
  }

  /**
   * Shows the results view: collapses the folder's section, which otherwise leaves the view too
   * little room for its entries, and expands the view's section.
   */
  async showResultsView(): Promise<void> {
    await this.setSectionExpanded(SELECTORS.folderSectionHeader, false);
    await this.setSectionExpanded(sectionHeader(RESULTS_VIEW_TITLE), true);
  }

  /** The results view's section: its header and body. */
  private resultsPane() {
    return this.page.locator('.pane').filter({ has: this.page.locator(sectionHeader(RESULTS_VIEW_TITLE)) });
  }

  /** What the results view's header shows beside its title (the file it describes). */
  async resultsViewDescription(): Promise<string> {
    return normalize((await this.resultsPane().locator('.pane-header .description').first().textContent()) ?? '');
  }

  /** The entries the results view shows now. */
  async resultEntries(): Promise<ResultEntry[]> {
    const rows = this.resultsPane().locator('.monaco-list-row');
    const entries: ResultEntry[] = [];
    for (const row of await rows.all()) {
      entries.push({
        label: normalize((await row.locator('.label-name').first().textContent()) ?? ''),
        description: normalize((await row.locator('.label-description').first().textContent().catch(() => '')) ?? ''),
      });
    }
    return entries;
  }

  /** Waits until the results view shows an entry `label` whose description shows `expected`; returns that entry. */
  async waitForResult(what: string, label: string, expected: Expected, timeout = DEFAULT_WAIT_MS): Promise<ResultEntry> {
    const deadline = Date.now() + timeout;
    let entries: ResultEntry[] = [];
    for (;;) {
      entries = await this.resultEntries();
      const match = entries.find((e) => e.label === label && missingFrom(e.description, expected).length === 0);
      if (match) return match;
      if (Date.now() > deadline) break;
      await this.page.waitForTimeout(POLL_MS);
    }
    return this.fail(
      `${what}: the results view showed no entry ${label} with ${describeExpected(expected)} within ${timeout / 1000} s`,
      entries.length === 0 ? 'the view showed no entries' : ['it showed:', ...entries.map((e) => `  | ${e.label} — ${e.description.slice(0, 300)}`)].join('\n'),
    );
  }

  /** Clicks the results view's entry `label` whose description shows `expected`. */
  async clickResult(label: string, expected: Expected): Promise<void> {
    await this.waitForResult(`the entry ${label} to click`, label, expected);
    const strings = expected.filter((e): e is string => typeof e === 'string');
    let row = this.resultsPane().locator('.monaco-list-row').filter({ has: this.page.locator('.label-name', { hasText: new RegExp(`^${escapeRegExp(label)}$`) }) });
    for (const s of strings) row = row.filter({ hasText: s });
    await row.first().click();
  }

  /**
   * Moves the mouse onto `word` on the line showing `lineText`, from a place where no hover shows,
   * and measures how long the hover takes to show every pattern (see HoverTiming). Fails when no
   * such hover shows within `timeout`.
   */
  async measureHover(lineText: string, word: string, patterns: readonly RegExp[], timeout = DEFAULT_WAIT_MS): Promise<HoverTiming> {
    const target = await this.wordCentre(lineText, word);
    const x = Math.round(target.x);
    const y = Math.round(target.y);
    // Away: the empty part of the editor at the right of the same line, where no hover shows.
    const editor = await this.page.locator(SELECTORS.editor).first().boundingBox();
    if (!editor) return this.fail('measuring a hover', 'the editor is not shown');
    await this.page.mouse.move(editor.x + editor.width - 80, y, { steps: 1 });
    await this.waitForCondition(
      'no hover before the measurement',
      `(() => { const h = document.querySelector(${JSON.stringify(SELECTORS.hover)}); return !h || h.getClientRects().length === 0; })()`,
      async () => `a hover still shows: ${(await this.texts(SELECTORS.hover)).join(' | ').slice(0, 400)}`,
    );
    await this.page.evaluate(
      `${HOVER_PROBE_SOURCE}(${JSON.stringify({ selector: SELECTORS.hover, x, y, patterns: patterns.map((p) => p.source) })})`,
    );
    await this.page.mouse.move(x, y, { steps: 1 });
    try {
      await this.page.waitForFunction('window.__wedgeworkHoverProbe.paintedAt !== undefined', undefined, { timeout, polling: 'raf' });
    } catch {
      const probe = (await this.page.evaluate('window.__wedgeworkHoverProbe')) as { movedAt?: number; lastText: string };
      return this.fail(
        `the hover over ${word}: no hover showed ${patterns.map(String).join(', ')} within ${timeout / 1000} s`,
        probe.movedAt === undefined ? 'the page saw no mouse event on the word' : `the last hover text seen: ${JSON.stringify(probe.lastText.slice(0, 400))}`,
      );
    }
    const probe = (await this.page.evaluate('window.__wedgeworkHoverProbe')) as { movedAt: number; contentAt: number; paintedAt: number };
    return { contentMs: probe.contentAt - probe.movedAt, paintedMs: probe.paintedAt - probe.movedAt };
  }

  /** Opens the Problems panel (Ctrl+Shift+M) unless it is open. */
  async showProblems(): Promise<void> {
    if (await this.page.locator('.markers-panel').isVisible()) return;
    await this.page.keyboard.press('Control+Shift+M');
    await this.waitForVisible('the Problems panel opens', '.markers-panel');
  }
}
