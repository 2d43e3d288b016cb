/**
 * A long editing session through the live server: thousands of edits (typing and deleting digits,
 * breaking and joining lines, inserting and removing whole statements, saving now and then), with
 * evaluation while typing, so that every memo, carried result and timer of the server is exercised.
 * The server must answer the last version with the right diagnostics, and its resident memory must not
 * keep growing: the growth after warming up is reported, and asserted below a generous bound (the
 * server keeps at most a bounded memo per document; unbounded growth would show as hundreds of MiB).
 *
 * `WEDGEWORK_SOAK_EDITS` sets the number of edits (default 1,000 for the test run; 10,000 for the long run).
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { readFileSync } from 'node:fs';
import {
  DidChangeTextDocumentNotification,
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  HoverRequest,
  type TextDocumentContentChangeEvent,
} from 'vscode-languageserver-protocol/node';
import { assertBundleIsFresh } from '../support/bundles.js';
import { startServerSession, type ServerSession } from './server-process.js';

const EDITS = Number(process.env['WEDGEWORK_SOAK_EDITS'] ?? 1000);
/** Edits sent between two waits for the server's diagnostics. */
const BURST = 25;
/** Generous: the memos and carried analyses of one document of this size take a few MiB. */
const GROWTH_BOUND_MIB = 150;

const BLOCKS = 40;
function documentText(): string {
  const lines = ['field QQ', 'space V dim 5'];
  for (let i = 0; i < BLOCKS; i++) {
    lines.push(
      `vector a${i} = (1, ${i % 7}, 0, ${(i % 3) + 1}, 2)`,
      `vector b${i} = (0, 1, ${i % 5}, 1, 0)`,
      `subspace W${i} = span(a${i}, b${i})`,
      `show plucker(W${i})`,
      `claim dim W${i} = 2`,
    );
  }
  return `${lines.join('\n')}\n`;
}

function residentMiB(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kib = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? NaN);
  return kib / 1024;
}

/** A seeded sequence (SplitMix32-style mixing; common practice, no source), so every run makes the same edits. */
function sequence(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x9e3779b9) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
    return ((z ^ (z >>> 16)) >>> 0) / 2 ** 32;
  };
}

/** The editor's side of the text: applies each change to its own copy, as a client does. */
class EditorText {
  constructor(public text: string) {}

  lines(): string[] {
    return this.text.split('\n');
  }

  offsetAt(line: number, character: number): number {
    const lines = this.lines();
    let offset = 0;
    for (let i = 0; i < line; i++) offset += lines[i]!.length + 1;
    return offset + character;
  }

  apply(change: { range: { start: { line: number; character: number }; end: { line: number; character: number } }; text: string }): void {
    const start = this.offsetAt(change.range.start.line, change.range.start.character);
    const end = this.offsetAt(change.range.end.line, change.range.end.character);
    this.text = this.text.slice(0, start) + change.text + this.text.slice(end);
  }
}

/** One random edit of the kinds a user makes, as a protocol change. */
function randomEdit(editor: EditorText, random: () => number): TextDocumentContentChangeEvent & { range: any } {
  const lines = editor.lines();
  const line = Math.floor(random() * (lines.length - 1));
  const text = lines[line]!;
  const at = Math.floor(random() * (text.length + 1));
  const kind = random();
  const point = { line, character: at };
  if (kind < 0.35) return { range: { start: point, end: point }, text: String(Math.floor(random() * 10)) };
  if (kind < 0.6 && at < text.length) return { range: { start: point, end: { line, character: at + 1 } }, text: '' };
  if (kind < 0.75) return { range: { start: point, end: point }, text: '\n' };
  if (kind < 0.85 && line + 1 < lines.length - 1) {
    // Join this line with the next.
    return { range: { start: { line, character: text.length }, end: { line: line + 1, character: 0 } }, text: ' ' };
  }
  if (kind < 0.93) {
    const start = { line, character: 0 };
    return { range: { start, end: start }, text: `vector extra${Math.floor(random() * 1000)} = (1, 2, 3, 4, 5)\n` };
  }
  // Remove a whole line.
  return { range: { start: { line, character: 0 }, end: { line: line + 1, character: 0 } }, text: '' };
}

describe('a long editing session', { timeout: 600_000 }, () => {
  let session: ServerSession;

  before(async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    session = await startServerSession({ evaluateOn: 'type' });
  });

  after(() => session?.kill());

  test(`${EDITS} edits: the last version is answered, memory growth stays bounded`, async () => {
    const uri = 'file:///soak/session.wedge';
    const editor = new EditorText(documentText());
    await session.connection.sendNotification(DidOpenTextDocumentNotification.type, {
      textDocument: { uri, languageId: 'wedge', version: 1, text: editor.text },
    });
    await session.diagnostics.next(uri);
    const pid = session.child.pid!;
    const random = sequence(20261202);
    let version = 1;
    let warmMiB = 0;
    let peakMiB = 0;
    for (let sent = 0; sent < EDITS; ) {
      const burst = Math.min(BURST, EDITS - sent);
      for (let i = 0; i < burst; i++) {
        const change = randomEdit(editor, random);
        editor.apply(change);
        version++;
        await session.connection.sendNotification(DidChangeTextDocumentNotification.type, {
          textDocument: { uri, version },
          contentChanges: [change],
        });
      }
      sent += burst;
      if (sent % (BURST * 8) === 0) await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
      // Wait until the server has answered the newest version (older versions' answers may come first).
      for (;;) {
        const published = await session.diagnostics.next(uri);
        if (published.version === version) break;
      }
      const now = residentMiB(pid);
      peakMiB = Math.max(peakMiB, now);
      if (sent === Math.min(EDITS, BURST * 8)) warmMiB = now;
    }
    const endMiB = residentMiB(pid);
    const growth = endMiB - warmMiB;
    console.log(
      `soak: ${EDITS} edits; resident memory ${warmMiB.toFixed(0)} MiB after warming up, ${endMiB.toFixed(0)} MiB at the end ` +
        `(growth ${growth.toFixed(0)} MiB, peak ${peakMiB.toFixed(0)} MiB); final text ${editor.lines().length} lines`,
    );
    // The server still serves: a hover on the first space declaration.
    const hover = await session.connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line: 1, character: 6 } });
    assert.ok(hover === null || JSON.stringify(hover.contents).length > 0);
    assert.ok(growth < GROWTH_BOUND_MIB, `resident memory grew by ${growth.toFixed(0)} MiB after warming up`);
    assert.equal(session.child.exitCode, null, 'the server is alive');
  });
});
