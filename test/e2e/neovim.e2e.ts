/**
 * The same language server seen by a second, independent LSP client: Neovim's built-in client
 * (Debian's neovim 0.7.2), headless, running ./neovim/lsp-session.lua against dist/server.cjs over
 * stdio. Nothing from VS Code is involved, so this checks the server's protocol output as such.
 *
 * Run by scripts/e2e/run.ts (npm run test:e2e), after the bundles are built.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { ARTIFACTS, ROOT } from '../../scripts/e2e/paths.js';
import { NEOVIM, isolatedEnv } from '../../scripts/e2e/tools.js';
import { makeWorkspace } from './workspace.js';
import * as facts from './sample-facts.js';
import { assertShows } from './shows.js';

interface ReportedDiagnostic {
  line: number;
  severity: number;
  source?: string;
  code?: string;
  message: string;
}
interface ReportedLens {
  line: number;
  title?: string;
  command?: string;
  arguments?: unknown[];
}
interface Report {
  problems: string[];
  sample?: { diagnostics: ReportedDiagnostic[]; hover: unknown; lenses: ReportedLens[] };
  broken?: { diagnostics: ReportedDiagnostic[]; lenses: ReportedLens[] };
}

/** Neovim's severity numbers (vim.diagnostic.severity): ERROR is 1. */
const NEOVIM_ERROR = 1;

const describeDiagnostics = (list: ReportedDiagnostic[]) =>
  list.map((d) => `line ${d.line + 1}: [${d.source}] ${d.code}: ${d.message}`).join('\n') || '(none)';
const describeLenses = (list: ReportedLens[]) => list.map((l) => `line ${l.line + 1}: ${l.title}`).join('\n') || '(none)';

describe('the language server under Neovim’s LSP client', { timeout: 90_000 }, () => {
  const scratch = mkdtempSync(join(tmpdir(), 'wedgework-e2e-neovim-'));
  const artifacts = join(ARTIFACTS, 'neovim');
  let report: Report;
  let sampleText: string;

  before(() => {
    rmSync(artifacts, { recursive: true, force: true });
    mkdirSync(artifacts, { recursive: true });
    const workspace = makeWorkspace(scratch);
    const samplePath = join(workspace, facts.SAMPLE_FILE);
    sampleText = readFileSync(samplePath, 'utf8');
    const line = facts.lineOf(sampleText, facts.HOVERED_LINE_TEXT);
    const character = sampleText.split(/\r?\n/)[line]!.indexOf(facts.HOVERED_NAME) + 1;
    const reportPath = join(artifacts, 'report.json');
    const run = spawnSync(
      NEOVIM,
      ['--headless', '--clean', '-n', '-i', 'NONE', '-u', 'NONE', '-c', `luafile ${join(ROOT, 'test/e2e/neovim/lsp-session.lua')}`],
      {
        cwd: workspace,
        encoding: 'utf8',
        timeout: 60_000,
        env: isolatedEnv(scratch, {
          WEDGEWORK_SERVER: join(ROOT, 'dist/server.cjs'),
          WEDGEWORK_SAMPLE: samplePath,
          WEDGEWORK_BROKEN: join(workspace, facts.BROKEN_FILE),
          WEDGEWORK_HOVER_LINE: String(line),
          WEDGEWORK_HOVER_CHARACTER: String(character),
          WEDGEWORK_REPORT: reportPath,
        }),
      },
    );
    writeFileSync(join(artifacts, 'neovim-output.txt'), `status ${run.status} signal ${run.signal}\n${run.stdout}\n${run.stderr}`);
    assert.equal(run.status, 0, `neovim ended with status ${run.status} (signal ${run.signal}):\n${run.stdout}\n${run.stderr}`);
    report = JSON.parse(readFileSync(reportPath, 'utf8')) as Report;
    const lspLog = join(scratch, 'home/.local/state/nvim/lsp.log');
    try {
      copyFileSync(lspLog, join(artifacts, 'lsp.log'));
    } catch {
      // Neovim writes the log only when something was logged.
    }
  });

  after(() => rmSync(scratch, { recursive: true, force: true }));

  test('the session ran without protocol problems', () => {
    assert.deepEqual(report.problems, []);
  });

  test('diagnostics: the false claim, with its code and message', () => {
    const diagnostics = report.sample!.diagnostics;
    const errors = diagnostics.filter((d) => d.severity === NEOVIM_ERROR);
    assert.equal(errors.length, 1, `exactly one error expected; the client has:\n${describeDiagnostics(diagnostics)}`);
    const [error] = errors;
    assert.equal(error!.line, facts.lineOf(sampleText, facts.FALSE_CLAIM_TEXT), describeDiagnostics(errors));
    assert.equal(error!.code, facts.FALSE_CLAIM_CODE, describeDiagnostics(errors));
    assert.equal(error!.source, 'wedgework');
    assertShows('the message of the false claim', error!.message, facts.FALSE_CLAIM_MESSAGE);
  });

  test('hover: the Plücker coordinates of sightA and the convention, as Markdown', () => {
    const hover = report.sample!.hover as { kind?: string; value?: string } | null;
    assert.equal(hover?.kind, 'markdown', `hover contents: ${JSON.stringify(hover)}`);
    assertShows('the hover over sightA', hover!.value!, facts.hoverExpectations());
  });

  test('code lenses: the result of sightA, with the copy-as-LaTeX command and its LaTeX', () => {
    const lenses = report.sample!.lenses;
    const sightA = lenses.find((l) => facts.missingFrom(l.title ?? '', facts.SIGHT_A_LENS).length === 0);
    assert.ok(sightA, `no lens shows ${facts.SIGHT_A_LENS.join(', ')}; lenses:\n${describeLenses(lenses)}`);
    assert.equal(sightA.line, facts.lineOf(sampleText, facts.HOVERED_LINE_TEXT));
    assert.equal(sightA.command, 'wedgework.copyLatex');
    const [latex, name] = sightA.arguments as [string, string];
    assertShows('the LaTeX the lens of sightA copies', latex, facts.SIGHT_A_LATEX);
    assert.equal(name, facts.HOVERED_NAME);
  });

  test('recovery: the syntax error is reported and the statements after it get lenses', () => {
    const { diagnostics, lenses } = report.broken!;
    const syntax = diagnostics.find((d) => (d.code ?? '').startsWith(facts.SYNTAX_CODE_PREFIX));
    assert.ok(syntax, `no syntax/… diagnostic; the client has:\n${describeDiagnostics(diagnostics)}`);
    assertShows('the message of the syntax error', syntax.message, facts.SYNTAX_MESSAGE);
    assert.ok(
      lenses.some((l) => facts.missingFrom(l.title ?? '', facts.RECOVERED_LENS).length === 0),
      `no lens shows ${facts.RECOVERED_LENS.join(', ')}; lenses:\n${describeLenses(lenses)}`,
    );
    assert.ok(
      lenses.some((l) => (l.title ?? '').includes(facts.RECOVERED_CLAIM_LENS)),
      `no lens shows ${facts.RECOVERED_CLAIM_LENS}; lenses:\n${describeLenses(lenses)}`,
    );
  });
});
