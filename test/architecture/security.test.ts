/**
 * What the extension promises about safety, checked on its sources and on the running server:
 * - no text of a user's file reaches a JavaScript evaluator: no production source calls `eval`, builds a
 *   `Function`, uses the `vm` module, or imports mathjs (whose expression parser evaluates text; mathjs
 *   is a development dependency, an independent reference for the tests only);
 * - nothing from the workspace is run: no production source starts processes;
 * - the server writes nothing to disk: its sources do not import the file system, and a session that opens,
 *   evaluates, formats and exports leaves its working, home and temporary folders empty;
 * - the client writes a file only where the user chose, in the LaTeX export.
 * These are the project's own promises (the Restricted Mode declaration in package.json states them).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import {
  DidOpenTextDocumentNotification,
  DidSaveTextDocumentNotification,
  DocumentFormattingRequest,
  ExecuteCommandRequest,
} from 'vscode-languageserver-protocol/node';
import { EXPORT_LATEX_COMMAND } from '../../server/src/lsp/actions.js';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { startServerSession } from '../lsp/server-process.js';

const PRODUCTION = ['server/src', 'client/src', 'cli/src'];

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const path = join(dir, entry);
    return statSync(path).isDirectory() ? sources(path) : path.endsWith('.ts') ? [path] : [];
  });
}

/** Lines of production code (comments removed) that match `pattern`, as `file:line: text`. */
function matches(pattern: RegExp, dirs = PRODUCTION): string[] {
  return dirs.flatMap((dir) =>
    sources(join(ROOT, dir)).flatMap((file) =>
      readFileSync(file, 'utf8')
        .split('\n')
        .flatMap((line, i) => {
          const code = line.replace(/\/\/.*$/, '').replace(/^\s*\*.*$/, '');
          return pattern.test(code) ? [`${relative(ROOT, file)}:${i + 1}: ${line.trim()}`] : [];
        }),
    ),
  );
}

describe('what the extension promises about safety', () => {
  test('no production source evaluates text as JavaScript', () => {
    assert.deepEqual(matches(/\beval\s*\(|\bnew\s+Function\s*\(|(?<![.\w])Function\s*\(|['"](node:)?vm['"]/), []);
  });

  test('mathjs is a development dependency only, imported by no production source', () => {
    const manifest = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as Record<string, Record<string, string> | undefined>;
    assert.equal(manifest.dependencies?.['mathjs'], undefined);
    assert.deepEqual(matches(/['"]mathjs['"]/), []);
  });

  test('no production source starts a process', () => {
    assert.deepEqual(matches(/['"](node:)?child_process['"]/), []);
  });

  test('the server\'s sources do not even import the file system; the client writes only in the LaTeX exports (results and macros)', () => {
    assert.deepEqual(matches(/['"](node:)?fs(\/promises)?['"]/, ['server/src']), []);
    // Calls of the file-writing functions of node:fs and of VS Code's workspace.fs.
    const writes = /\b(writeFile|appendFile|createWriteStream|mkdir|mkdtemp|rmdir|unlink|copyFile|truncate|symlink)(Sync)?\s*\(|\bfs\.(delete|rename|copy)\s*\(/;
    assert.deepEqual(
      matches(writes, ['client/src']).map((m) => m.split(':')[0]),
      ['client/src/export-latex.ts', 'client/src/macros-export.ts'],
    );
  });

  test('a server session leaves its working, home and temporary folders empty', { timeout: 60_000 }, async () => {
    assertBundleIsFresh('dist/server.cjs', ['server/src']);
    const root = mkdtempSync(join(tmpdir(), 'wedgework-writes-nothing-'));
    const folders = ['cwd', 'home', 'tmp'].map((name) => join(root, name));
    for (const folder of folders) mkdirSync(folder);
    const [cwd, home, tmp] = folders as [string, string, string];
    const session = await startServerSession(
      {},
      { cwd, env: { ...process.env, HOME: home, TMPDIR: tmp, TMP: tmp, TEMP: tmp }, rootUri: `file://${cwd}` },
    );
    const uri = `file://${cwd}/never-written.wedge`;
    try {
      const text = 'space V dim 4\nsubspace W = rows [1 0 2 0; 0 1 3 1]\nshow plucker(W)\nclaim dim W = 3\n';
      await session.connection.sendNotification(DidOpenTextDocumentNotification.type, { textDocument: { uri, languageId: 'wedge', version: 1, text } });
      await session.diagnostics.next(uri);
      await session.connection.sendNotification(DidSaveTextDocumentNotification.type, { textDocument: { uri } });
      await session.connection.sendRequest(DocumentFormattingRequest.type, { textDocument: { uri }, options: { tabSize: 2, insertSpaces: true } });
      // The export answers with the LaTeX; the client, not the server, writes it where the user chose.
      const exported = (await session.connection.sendRequest(ExecuteCommandRequest.type, { command: EXPORT_LATEX_COMMAND, arguments: [uri] })) as {
        latex?: string;
      } | null;
      assert.ok(exported?.latex?.includes('\\begin'), `the export answered LaTeX: ${JSON.stringify(exported)?.slice(0, 200)}`);
      await session.shutdown();
    } finally {
      session.kill();
    }
    for (const folder of folders) assert.deepEqual(readdirSync(folder), [], `${folder} stays empty`);
    rmSync(root, { recursive: true, force: true });
  });
});
