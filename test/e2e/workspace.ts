/** The folder a test opens in the editor: copies, so that the repository's files are never edited. */
import { copyFileSync, mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from '../../scripts/e2e/paths.js';
import { BROKEN_FILE } from './sample-facts.js';

/** Copies samples/*.wedge and the broken-syntax fixture into `scratch/workspace`; returns that folder. */
export function makeWorkspace(scratch: string): string {
  const workspace = join(scratch, 'workspace');
  mkdirSync(workspace, { recursive: true });
  for (const name of readdirSync(join(ROOT, 'samples'))) {
    if (name.endsWith('.wedge')) copyFileSync(join(ROOT, 'samples', name), join(workspace, name));
  }
  copyFileSync(join(ROOT, 'test/e2e/fixtures', BROKEN_FILE), join(workspace, BROKEN_FILE));
  return workspace;
}
