/** The folder a test opens in the editor: copies, so that the repository's files are never edited. */
import { copyFileSync, mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from '../../scripts/e2e/paths.js';
import { BROKEN_FILE } from './sample-facts.js';

export interface WorkspaceOptions {
  /** More files of test/e2e/fixtures/ to copy. */
  fixtures?: readonly string[];
  /** Files written into the folder: name → text. */
  files?: Readonly<Record<string, string>>;
  /** Workspace settings (`.vscode/settings.json`). */
  settings?: Readonly<Record<string, unknown>>;
}

/**
 * Copies samples/*.wedge, the broken-syntax fixture and the chosen fixtures into
 * `scratch/workspace`, writes the given files and settings there; returns that folder.
 */
export function makeWorkspace(scratch: string, { fixtures = [], files = {}, settings }: WorkspaceOptions = {}): string {
  const workspace = join(scratch, 'workspace');
  mkdirSync(workspace, { recursive: true });
  for (const name of readdirSync(join(ROOT, 'samples'))) {
    if (name.endsWith('.wedge')) copyFileSync(join(ROOT, 'samples', name), join(workspace, name));
  }
  for (const name of [BROKEN_FILE, ...fixtures]) copyFileSync(join(ROOT, 'test/e2e/fixtures', name), join(workspace, name));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(workspace, name), text);
  if (settings) {
    mkdirSync(join(workspace, '.vscode'), { recursive: true });
    writeFileSync(join(workspace, '.vscode/settings.json'), JSON.stringify(settings, null, 2));
  }
  return workspace;
}
