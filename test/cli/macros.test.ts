/**
 * `wedgework export --tex` and `wedgework check --tex … --paper …` (docs/latex-macros.md): the
 * macros file is written, the sync check fails with file:line:col problems when the file is stale
 * and passes once it is refreshed; a changed header alone is a note; unknown macros in a paper are
 * errors; clashes write nothing; inputs and other files are never written over.
 *
 * Most cases run the command in-process on files in memory; the last ones run the bundled command
 * on real files (links and the sample paper's script).
 *
 * Facts used (common practice, no source): two independent vectors span a plane, and the 2×2
 * minors of (1, 0, 0, 0), (0, 1, 0, 0) are 1 for p12 and 0 elsewhere; changing the second vector to
 * (0, 0, 1, 0) moves the 1 to p13.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../cli/src/cli.js';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';

const PLANE = ['space V dim 4', 'vector p = (1, 0, 0, 0)', 'vector q = (0, 1, 0, 0)', 'subspace L = span(p, q)', 'claim dim L = 2', ''].join('\n');

/** The command run in-process on a folder held in memory. */
function memoryFolder(files: Record<string, string>) {
  const disk = new Map(Object.entries(files));
  const run = async (...args: string[]) => {
    let stdout = '';
    let stderr = '';
    const status = await runCli(args, '0.1.0', {
      stdout: (t) => (stdout += t),
      stderr: (t) => (stderr += t),
      readFile: async (path) => {
        const text = disk.get(path);
        if (text === undefined) throw Object.assign(new Error('no such file'), { code: 'ENOENT' });
        return text;
      },
      writeFile: async (path, text) => void disk.set(path, text),
      sameFile: async (a, b) => a === b,
    });
    return { status, stdout, stderr };
  };
  return { disk, run };
}

describe('export and sync check, in-process', () => {
  test('the export writes one macro per result, with the header', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE });
    const r = await run('export', '--tex', 'results.tex', 'plane.wedge');
    assert.equal(r.status, 0, r.stdout + r.stderr);
    assert.match(r.stdout, /^wrote \d+ macros to results\.tex$/m);
    const tex = disk.get('results.tex')!;
    assert.match(tex, /^% Wedgework 0\.1\.0: LaTeX macros/);
    assert.match(tex, /^% Source: plane\.wedge sha256 [0-9a-f]{64}$/m);
    assert.match(tex, /^% Convention of plane\.wedge: field QQ/m);
    assert.match(tex, /wedgework export --tex results\.tex plane\.wedge/);
    assert.match(tex, /^\\newcommand\{\\wwLDim\}\{\\ensuremath\{2\}\}$/m);
    assert.match(tex, /^\\newcommand\{\\wwLPlucker\}\{.*\\bigl\[1 : 0 : 0 : 0 : 0 : 0\\bigr\].*\}$/m);
    assert.equal(disk.get('plane.wedge'), PLANE, 'the input is untouched');
  });

  test('the export names its sources from its own folder, so it is the same text from any working folder', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE, 'paper/plane.wedge': PLANE });
    assert.equal((await run('export', '--tex', 'results.tex', 'plane.wedge')).status, 0);
    assert.equal((await run('export', '--tex', 'paper/results.tex', 'paper/plane.wedge')).status, 0);
    assert.equal(disk.get('paper/results.tex'), disk.get('results.tex'));
    assert.match(disk.get('paper/results.tex')!, /^% Source: plane\.wedge sha256/m);
    // Checked from the parent folder: in sync, without even a note about the header.
    const checked = await run('check', '--tex', 'paper/results.tex', 'paper/plane.wedge');
    assert.equal(checked.status, 0, checked.stdout);
    assert.doesNotMatch(checked.stdout, /note:/);
  });

  test('a changed value makes the check fail at the statement, until the export is refreshed', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE });
    await run('export', '--tex', 'results.tex', 'plane.wedge');
    assert.equal((await run('check', '--tex', 'results.tex', 'plane.wedge')).status, 0);

    disk.set('plane.wedge', PLANE.replace('vector q = (0, 1, 0, 0)', 'vector q = (0, 0, 1, 0)'));
    const stale = await run('check', '--tex', 'results.tex', 'plane.wedge');
    assert.equal(stale.status, 1, stale.stdout);
    assert.match(stale.stdout, /^plane\.wedge:3:1: error macro\/stale: \\wwq /m);
    assert.match(stale.stdout, /^plane\.wedge:4:1: error macro\/stale: \\wwLPlucker /m);
    assert.match(stale.stdout, /^ {2}results\.tex:\d+:1: note: the stale definition of \\wwq$/m);
    assert.match(stale.stdout, /refresh the export: wedgework export --tex results\.tex plane\.wedge/);

    assert.equal((await run('export', '--tex', 'results.tex', 'plane.wedge')).status, 0);
    const fresh = await run('check', '--tex', 'results.tex', 'plane.wedge');
    assert.equal(fresh.status, 0, fresh.stdout);
    assert.match(disk.get('results.tex')!, /\\bigl\[0 : 1 : 0 : 0 : 0 : 0\\bigr\]/);
  });

  test('a macro missing from the file, and one the computation no longer gives', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE });
    await run('export', '--tex', 'results.tex', 'plane.wedge');
    const tex = disk.get('results.tex')!;
    const lines = tex.split('\n');
    const dimLine = lines.findIndex((l) => l.startsWith('\\newcommand{\\wwLDim}'));
    disk.set('results.tex', [...lines.slice(0, dimLine), '\\newcommand{\\wwOld}{\\ensuremath{7}}', ...lines.slice(dimLine + 1)].join('\n'));
    const r = await run('check', '--tex', 'results.tex', 'plane.wedge');
    assert.equal(r.status, 1);
    assert.match(r.stdout, /^plane\.wedge:4:1: error macro\/missing: results\.tex does not define \\wwLDim/m);
    assert.match(r.stdout, new RegExp(`^results\\.tex:${dimLine + 1}:1: error macro/gone: results\\.tex defines \\\\wwOld`, 'm'));
  });

  test('only the content hash differs: a note, exit status 0', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE });
    await run('export', '--tex', 'results.tex', 'plane.wedge');
    disk.set('plane.wedge', `# a comment changes the text, not the results\n${PLANE}`);
    const r = await run('check', '--tex', 'results.tex', 'plane.wedge');
    assert.equal(r.status, 0, r.stdout);
    assert.match(r.stdout, /^results\.tex:\d+:1: note: every macro of results\.tex agrees with the computation, but the sources differ/m);
  });

  test('--paper: each macro the export does not define, at its place in the paper', async () => {
    const paper = '\\documentclass{article}\n\\input{results.tex}\n\\begin{document}\nA plane: \\wwLDim, a line: \\wwLine.\n% \\wwNotAUse\n\\end{document}\n';
    const { run } = memoryFolder({ 'plane.wedge': PLANE, 'paper.tex': paper });
    await run('export', '--tex', 'results.tex', 'plane.wedge');
    const r = await run('check', '--tex', 'results.tex', '--paper', 'paper.tex', 'plane.wedge');
    assert.equal(r.status, 1);
    const errors = r.stdout.split('\n').filter((l) => l.includes(': error '));
    assert.deepEqual(errors.map((l) => l.split(': ')[0]), ['paper.tex:4:27']);
    assert.match(errors[0]!, /macro\/undefined: paper\.tex uses \\wwLine/);
  });

  test('a clash is an error naming both statements, and nothing is written', async () => {
    const text = 'space V dim 2\nvector w_1 = (1, 0)\nvector wOne = (0, 1)\n';
    const { disk, run } = memoryFolder({ 'clash.wedge': text });
    const r = await run('export', '--tex', 'results.tex', 'clash.wedge');
    assert.equal(r.status, 1);
    assert.match(r.stdout, /^clash\.wedge:3:1: error macro\/clash: \\wwwOne would be given twice/m);
    assert.match(r.stdout, /^ {2}clash\.wedge:2:1: note: vector w_1 gives it too$/m);
    assert.equal(disk.has('results.tex'), false);
  });

  test('usage errors (exit 2): no --tex, a .wedge target, an input as target, an unreadable macros file', async () => {
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE });
    assert.equal((await run('export', 'plane.wedge')).status, 2);
    assert.equal((await run('export', '--tex', 'out.wedge', 'plane.wedge')).status, 2);
    assert.equal((await run('export', '--tex', 'plane.wedge', 'plane.wedge')).status, 2);
    assert.equal((await run('check', '--tex', 'absent.tex', 'plane.wedge')).status, 2);
    assert.equal((await run('check', '--paper', 'absent.tex', 'plane.wedge')).status, 2);
    assert.equal(disk.get('plane.wedge'), PLANE);
    assert.equal(disk.has('out.wedge'), false);
  });

  test('the export never writes over a file it did not write, such as the paper', async () => {
    const paper = '\\documentclass{article}\n';
    const { disk, run } = memoryFolder({ 'plane.wedge': PLANE, 'paper.tex': paper });
    const r = await run('export', '--tex', 'paper.tex', 'plane.wedge');
    assert.equal(r.status, 2);
    assert.match(r.stderr, /not a macros file written by wedgework export/);
    assert.equal(disk.get('paper.tex'), paper);
  });
});

describe('export and sync check, the bundled command on real files', { timeout: 60_000 }, () => {
  let dir: string;
  const wedgework = (...args: string[]) => spawnSync(process.execPath, [join(ROOT, 'bin/wedgework.cjs'), ...args], { cwd: dir, encoding: 'utf8' });

  before(() => {
    assertBundleIsFresh('dist/cli.cjs', ['server/src', 'cli/src']);
    dir = mkdtempSync(join(tmpdir(), 'wedgework-macros-'));
    writeFileSync(join(dir, 'plane.wedge'), PLANE);
  });

  after(() => rmSync(dir, { recursive: true, force: true }));

  test('a link to an input is refused as the target', () => {
    symlinkSync(join(dir, 'plane.wedge'), join(dir, 'link.tex'));
    const r = wedgework('export', '--tex', 'link.tex', 'plane.wedge');
    assert.equal(r.status, 2, r.stdout);
    assert.equal(readFileSync(join(dir, 'plane.wedge'), 'utf8'), PLANE);
  });

  test("the sample paper's script: in sync as committed; stale after a change; in sync after the refresh", () => {
    const paper = join(dir, 'paper');
    cpSync(join(ROOT, 'samples/paper-planes-in-five-space'), paper, { recursive: true });
    const script = (cwd: string) => spawnSync('bash', [join(cwd, 'check-paper.sh')], { encoding: 'utf8', env: { ...process.env, WEDGEWORK: `${process.execPath} ${join(ROOT, 'bin/wedgework.cjs')}` } });
    const committed = script(paper);
    assert.equal(committed.status, 0, committed.stdout + committed.stderr);

    const computation = join(paper, 'computation.wedge');
    writeFileSync(computation, readFileSync(computation, 'utf8').replace('vector c = (1, 1, 0, 1, 2)', 'vector c = (1, 1, 0, 1, 7)'));
    const stale = script(paper);
    assert.equal(stale.status, 1, stale.stdout);
    assert.match(stale.stdout, /^computation\.wedge:\d+:1: error macro\/stale: \\wwc /m);

    const refresh = spawnSync(process.execPath, [join(ROOT, 'bin/wedgework.cjs'), 'export', '--tex', 'results.tex', 'computation.wedge'], { cwd: paper, encoding: 'utf8' });
    assert.equal(refresh.status, 0, refresh.stdout + refresh.stderr);
    assert.equal(script(paper).status, 0);
  });
});
