/** LSP positions in a test's text, computed independently of the server. */
import assert from 'node:assert/strict';
import type { Position } from 'vscode-languageserver-protocol';

/** The LSP position (0-based line, UTF-16 character) of `offset`. */
export function positionAt(text: string, offset: number): Position {
  const before = text.slice(0, offset).split('\n');
  return { line: before.length - 1, character: before[before.length - 1]!.length };
}

/** The position `index` characters into the `nth` occurrence (0-based) of `needle`, which must occur. */
export function positionOf(text: string, needle: string, index = 0, nth = 0): Position {
  let at = -1;
  for (let i = 0; i <= nth; i++) at = text.indexOf(needle, at + 1);
  assert.ok(at >= 0, `text contains ${JSON.stringify(needle)}`);
  return positionAt(text, at + index);
}
