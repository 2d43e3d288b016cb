/**
 * `wedgework check --latex OUT.tex FILE...`, run as users run it (the bundled
 * command in a child process, on files in a temporary directory): the
 * fragment is written to OUT.tex, never onto an input or any .wedge file.
 *
 * Facts used (common practice, no source): two independent vectors span a
 * plane, so `claim dim L = 2` holds and `claim dim L = 3` is false.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';
import { checkLatexStructure } from '../language/latex-structure.js';

const PLANE = ['space V dim 4', 'vector p = (1, 0, 0, 0)', 'vector q = (0, 1, 0, 0)', 'subspace L = span(p, q)', ''].join('\n');

function wedgework(cwd: string, ...args: string[]) {
  const run = spawnSync(process.execPath, [join(ROOT, 'bin/wedgework.cjs'), ...args], { cwd, encoding: 'utf8' });
  if (run.error) throw run.error;
  return run;
}

describe('wedgework check --latex', { timeout: 60_000 }, () => {
  let dir: string;

  before(() => {
    assertBundleIsFresh('dist/cli.cjs', ['server/src', 'cli/src']);
    dir = mkdtempSync(join(tmpdir(), 'wedgework-latex-'));
    writeFileSync(join(dir, 'true.wedge'), `${PLANE}claim dim L = 2\n`);
    writeFileSync(join(dir, 'false.wedge'), `${PLANE}claim dim L = 3\n`);
  });

  after(() => {
    rmSync(dir, { recursive: true, force: true });
  });

  test('[evaluator] writes one well-formed fragment for all files, and still reports the errors', () => {
    const run = wedgework(dir, 'check', '--latex', 'out.tex', 'true.wedge', 'false.wedge');
    assert.equal(run.status, 1, run.stderr);
    assert.match(run.stdout, /false\.wedge:5:1: error claim\/dimension/);
    assert.match(run.stdout, /^wrote \d+ results as LaTeX to out\.tex$/m);
    const latex = readFileSync(join(dir, 'out.tex'), 'utf8');
    checkLatexStructure(latex);
    assert.match(latex, /^% Wedgework results of true\.wedge$/m);
    assert.match(latex, /^% Wedgework results of false\.wedge$/m);
    assert.match(latex, /\\texttt\{dim L = 2\} holds\./);
    assert.match(latex, /\\texttt\{dim L = 3\} is false\./);
    assert.equal(readFileSync(join(dir, 'true.wedge'), 'utf8'), `${PLANE}claim dim L = 2\n`, 'the inputs are untouched');
  });

  test('--latex=OUT works too, and with --json the standard output stays one JSON document', () => {
    const run = wedgework(dir, 'check', '--json', '--latex=json-out.tex', 'true.wedge');
    assert.equal(run.status, 0, run.stderr);
    assert.doesNotThrow(() => JSON.parse(run.stdout));
    assert.ok(existsSync(join(dir, 'json-out.tex')));
  });

  test('refuses to write onto an input file, a .wedge file or a link to an input: exit 2, nothing written', () => {
    const before = readFileSync(join(dir, 'true.wedge'), 'utf8');
    symlinkSync(join(dir, 'true.wedge'), join(dir, 'link.tex'));
    for (const [target, message] of [
      ['true.wedge', /\.wedge/],
      ['./true.wedge', /\.wedge/],
      ['other.WEDGE', /\.wedge/],
      ['link.tex', /same file as true\.wedge/],
    ] as const) {
      const run = wedgework(dir, 'check', '--latex', target, 'true.wedge');
      assert.equal(run.status, 2, `${target}: ${run.stdout}${run.stderr}`);
      assert.match(run.stderr, message);
      assert.equal(run.stdout, '');
    }
    assert.equal(readFileSync(join(dir, 'true.wedge'), 'utf8'), before);
    assert.ok(!existsSync(join(dir, 'other.WEDGE')));
  });

  test('an input that is not a .wedge file is still never overwritten', () => {
    writeFileSync(join(dir, 'notes.txt'), `${PLANE}`);
    const run = wedgework(dir, 'check', '--latex', 'notes.txt', 'notes.txt');
    assert.equal(run.status, 2);
    assert.match(run.stderr, /one of the input files/);
    assert.equal(readFileSync(join(dir, 'notes.txt'), 'utf8'), PLANE);
  });

  test('--latex without a file name is a usage error', () => {
    for (const args of [['check', 'true.wedge', '--latex'], ['check', '--latex', '--json', 'true.wedge'], ['check', '--latex=', 'true.wedge']]) {
      const run = wedgework(dir, ...args);
      assert.equal(run.status, 2, args.join(' '));
      assert.match(run.stderr, /--latex needs the name/);
    }
  });

  test('a file that cannot be written is reported with exit 2', () => {
    const run = wedgework(dir, 'check', '--latex', join(dir, 'missing-dir', 'out.tex'), 'true.wedge');
    assert.equal(run.status, 2);
    assert.match(run.stderr, /cannot write .*out\.tex: no such file/);
  });

  test('the help names the option', () => {
    const run = wedgework(dir, '--help');
    assert.match(run.stdout, /--latex OUT\.tex/);
  });
});
