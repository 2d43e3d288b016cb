/** Paths of the repository that the editor tests use. */
import { readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
/** Screenshots and logs of the editor tests (git-ignored). */
export const ARTIFACTS = join(ROOT, 'test-artifacts/e2e');

const manifest = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as {
  name: string;
  version: string;
  publisher: string;
};
/** The file `vsce package` writes (its default name). */
export const VSIX = join(ROOT, `${manifest.name}-${manifest.version}.vsix`);
export const EXTENSION_ID = `${manifest.publisher}.${manifest.name}`;
