/**
 * The layers depend one way only: engine ← language ← lsp ← client, and the
 * CLI uses language and engine. A wrong-way import fails here, with the line.
 * (The project's own architecture rule; see DEVELOPERS.md.)
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

function imports(file: string): { line: number; target: string }[] {
  return readFileSync(file, 'utf8')
    .split('\n')
    .flatMap((text, i) => {
      const m = /\b(?:from|import)\s*\(?\s*['"]([^'"]+)['"]/.exec(text);
      return m ? [{ line: i + 1, target: m[1]! }] : [];
    });
}

function violations(dir: string, forbidden: RegExp): string[] {
  return sources(dir).flatMap((file) =>
    imports(file)
      .filter((i) => forbidden.test(i.target))
      .map((i) => `${file}:${i.line} imports ${i.target}`),
  );
}

test('the engine imports nothing from the language, the server, the client or the CLI, nor any LSP package', () => {
  assert.deepEqual(violations('server/src/engine', /(\.\.\/)+(language|lsp|cli)\b|^vscode|^chevrotain/), []);
});

test('the language layer never imports LSP or VS Code packages, nor the server or CLI', () => {
  assert.deepEqual(violations('server/src/language', /^vscode|(\.\.\/)+(lsp|cli)\b/), []);
});

test('the LSP server does not import the VS Code API or the client', () => {
  assert.deepEqual(violations('server/src/lsp', /^vscode$|^vscode-languageclient|client\//), []);
});

test('the CLI uses the language facade and the engine only', () => {
  const bad = sources('cli/src').flatMap((file) =>
    imports(file)
      .filter((i) => i.target.startsWith('../../server/src/') && !/^\.\.\/\.\.\/server\/src\/(language\/index|engine\/)/.test(i.target))
      .map((i) => `${file}:${i.line} imports ${i.target}`),
  );
  assert.deepEqual(bad, []);
  assert.deepEqual(violations('cli/src', /^vscode/), []);
});
