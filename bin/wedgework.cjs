#!/usr/bin/env node
// The `wedgework` command: a shim that loads the bundled command-line program.
// It stays tiny and dependency-free so it works before anything else is known
// about the installation; the real program lives in dist/cli.cjs.
'use strict';
const { existsSync } = require('node:fs');
const { join } = require('node:path');

const bundle = join(__dirname, '..', 'dist', 'cli.cjs');
if (!existsSync(bundle)) {
  process.stderr.write(
    `wedgework: ${bundle} is missing; run npm install (which builds) first, or npm run build.\n`,
  );
  process.exit(2);
}
// Stack traces from the bundle should point at the TypeScript sources.
if (typeof process.setSourceMapsEnabled === 'function') process.setSourceMapsEnabled(true);
require(bundle);
