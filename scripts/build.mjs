// Bundles the programs (server and its evaluation worker, client, command line) to CommonJS with esbuild.
//
// Why bundle at all: VS Code starts the language server with its own embedded
// Node, which must not depend on the build machine's node_modules layout, and
// some dependencies (the parser library) ship as ES modules only. One CommonJS
// file per program sidesteps both problems; `"type": "module"` at the root
// stays valid because the outputs are named `.cjs`.
//
// Usage: node scripts/build.mjs [--watch]
import * as esbuild from 'esbuild';
import { fileURLToPath } from 'node:url';
import { dirname, resolve } from 'node:path';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');

/** @type {import('esbuild').BuildOptions} */
const options = {
  absWorkingDir: root,
  entryPoints: {
    server: 'server/src/lsp/main.ts',
    // The server runs full evaluations on worker threads started from this file (beside server.cjs).
    'evaluation-worker': 'server/src/lsp/evaluation-worker.ts',
    client: 'client/src/extension.ts',
    cli: 'cli/src/main.ts',
  },
  outdir: 'dist',
  outExtension: { '.js': '.cjs' },
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  // The editor provides `vscode` at run time; only the client refers to it.
  external: ['vscode'],
  sourcemap: true,
  logLevel: 'warning',
};

if (process.argv.includes('--watch')) {
  const context = await esbuild.context({ ...options, logLevel: 'info' });
  await context.watch();
  console.log('esbuild: watching for changes (Ctrl+C to stop)');
} else {
  const started = Date.now();
  await esbuild.build(options);
  console.log(`esbuild: dist/server.cjs, dist/evaluation-worker.cjs, dist/client.cjs, dist/cli.cjs built in ${Date.now() - started} ms`);
}
