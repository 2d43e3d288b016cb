/**
 * The `wedgework` command as users run it: `node bin/wedgework.cjs` in a
 * child process, on files in a temporary directory.
 *
 * Tests whose name starts with [evaluator] state the final behaviour and need
 * the language layer's parser and evaluator; the others check the command's
 * own plumbing.
 */
import { after, before, describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { assertBundleIsFresh, ROOT } from '../support/bundles.js';

const packageVersion = (JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as { version: string }).version;

// Two coordinate vectors of a 4-dimensional space span a plane, so dim L = 2 (common practice, no
// source: linearly independent vectors form a basis of their span). `claim dim L = 3` on line 5 is false.
const FALSE_CLAIM = [
  'space V dim 4',
  'vector p = (1, 0, 0, 0)',
  'vector q = (0, 1, 0, 0)',
  'subspace L = span(p, q)',
  'claim dim L = 3',
  '',
].join('\n');

// Every claim here is true:
// - dim span(e1, e2) = 2 and p = e1 lies in it while e3 does not (common practice, no source);
// - the Plücker vector of span(e1, e2) is e1∧e2: only the coordinate p12 is non-zero, and p12 comes
//   first in the usual orders of the 2-subsets of {1..4} (Harris, "Algebraic Geometry: A First
//   Course", Lecture 6, Plücker embedding — from memory);
// - e1∧e2 + e3∧e4 is not decomposable: its Plücker relation p12·p34 − p13·p24 + p14·p23 = 1 ≠ 0
//   (same source, from memory; equivalently ω∧ω = 2·e1∧e2∧e3∧e4 ≠ 0).
const TRUE_CLAIMS = [
  'space V dim 4',
  'vector p = (1, 0, 0, 0)',
  'vector q = (0, 1, 0, 0)',
  'subspace L = span(p, q)',
  'claim dim L = 2',
  'claim p in L',
  'claim e3 not in L',
  'claim plucker(L) = [1 : 0 : 0 : 0 : 0 : 0]',
  'multivector eta = e1^e2 + e3^e4',
  'claim eta not decomposable',
  '',
].join('\n');

// The statement on line 2 lacks its closing parenthesis.
const SYNTAX_ERROR = ['space V dim 4', 'vector p = (1, 0, 0, 0', 'vector q = (0, 1, 0, 0)', ''].join('\n');

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
}

function wedgework(...args: string[]): Run {
  const run = spawnSync(process.execPath, [join(ROOT, 'bin/wedgework.cjs'), ...args], {
    cwd: ROOT,
    encoding: 'utf8',
  });
  if (run.error) throw run.error;
  return { status: run.status, stdout: run.stdout, stderr: run.stderr };
}

function explain(run: Run): string {
  return `status ${run.status}\nstdout:\n${run.stdout}\nstderr:\n${run.stderr}`;
}

const escapeRegExp = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

describe('wedgework command', { timeout: 60_000 }, () => {
  let dir: string;
  const files: Record<string, string> = {};

  before(() => {
    assertBundleIsFresh('dist/cli.cjs', ['server/src', 'cli/src']);
    dir = mkdtempSync(join(tmpdir(), 'wedgework-cli-'));
    for (const [name, text] of Object.entries({
      'false-claim.wedge': FALSE_CLAIM,
      'true-claims.wedge': TRUE_CLAIMS,
      'syntax-error.wedge': SYNTAX_ERROR,
    })) {
      files[name] = join(dir, name);
      writeFileSync(files[name], text);
    }
  });

  after(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  test('--help prints the usage and succeeds', () => {
    const run = wedgework('--help');
    assert.equal(run.status, 0, explain(run));
    assert.match(run.stdout, /wedgework check FILE\.\.\./);
    assert.match(run.stdout, /--json/);
    assert.match(run.stdout, /--normalization/);
  });

  test('--version prints the package version', () => {
    const run = wedgework('--version');
    assert.equal(run.status, 0, explain(run));
    assert.equal(run.stdout.trim(), packageVersion);
  });

  test('usage errors exit with status 2 and say what is wrong', () => {
    for (const [args, expected] of [
      [[], /no command/],
      [['frobnicate'], /unknown command 'frobnicate'/],
      [['check'], /at least one FILE/],
      [['check', '--colour', files['true-claims.wedge']!], /unknown option '--colour'/],
      [['check', '--normalization'], /needs a value/],
      [['check', '--normalization', 'sideways', files['true-claims.wedge']!], /unknown normalization 'sideways'/],
    ] as const) {
      const run = wedgework(...args);
      assert.equal(run.status, 2, `${args.join(' ')}: ${explain(run)}`);
      assert.match(run.stderr, expected, `${args.join(' ')}: ${explain(run)}`);
      assert.equal(run.stdout, '', 'nothing is printed on standard output');
    }
  });

  test('an unreadable file exits with status 2, names it and checks nothing', () => {
    const missing = join(dir, 'no-such-file.wedge');
    const run = wedgework('check', files['false-claim.wedge']!, missing);
    assert.equal(run.status, 2, explain(run));
    assert.match(run.stderr, new RegExp(`cannot read ${escapeRegExp(missing)}: no such file`));
    assert.equal(run.stdout, '');
    const directory = wedgework('check', dir);
    assert.equal(directory.status, 2, explain(directory));
    assert.match(directory.stderr, /is a directory/);
  });

  test('a file without errors succeeds and ends with a summary line; the file is left untouched', () => {
    const path = files['true-claims.wedge']!;
    const before = statSync(path).mtimeMs;
    const run = wedgework('check', path);
    assert.equal(run.status, 0, explain(run));
    const lines = run.stdout.trimEnd().split('\n');
    assert.match(lines[lines.length - 1]!, /^checked 1 file: 0 errors, \d+ warnings?, \d+ information messages?$/);
    assert.equal(readFileSync(path, 'utf8'), TRUE_CLAIMS);
    assert.equal(statSync(path).mtimeMs, before);
  });

  test('--json prints one JSON document with one entry per file, in order', () => {
    const run = wedgework('check', '--json', files['true-claims.wedge']!, files['false-claim.wedge']!);
    const report = JSON.parse(run.stdout) as {
      version: string;
      files: { file: string; problems: unknown[]; results: unknown[] }[];
    };
    assert.equal(report.version, packageVersion);
    assert.deepEqual(
      report.files.map((f) => f.file),
      [files['true-claims.wedge'], files['false-claim.wedge']],
    );
    for (const f of report.files) {
      assert.ok(Array.isArray(f.problems));
      assert.ok(Array.isArray(f.results));
    }
  });

  test('[evaluator] a false claim is printed as file:line:col: error claim/…, and the status is 1', () => {
    const path = files['false-claim.wedge']!;
    const run = wedgework('check', path);
    assert.equal(run.status, 1, explain(run));
    const lines = run.stdout.trimEnd().split('\n');
    assert.match(lines[0]!, new RegExp(`^${escapeRegExp(path)}:5:\\d+: error claim/[\\w-]+: .+$`), explain(run));
    assert.match(lines[lines.length - 1]!, /^checked 1 file: 1 error, /);
  });

  test('[evaluator] a syntax error is printed with a syntax/ code on its line, and the status is 1', () => {
    const path = files['syntax-error.wedge']!;
    const run = wedgework('check', path);
    assert.equal(run.status, 1, explain(run));
    assert.match(run.stdout, new RegExp(`^${escapeRegExp(path)}:2:\\d+: error syntax/[\\w-]+: .+$`, 'm'), explain(run));
  });

  test('[evaluator] true claims about a plane and a non-decomposable 2-vector pass', () => {
    const run = wedgework('check', files['true-claims.wedge']!);
    assert.equal(run.status, 0, explain(run));
    assert.match(run.stdout.trimEnd(), /^checked 1 file: 0 errors, 0 warnings, 0 information messages$/);
  });

  test('[evaluator] --json carries the claim problem with its range and the declared results', () => {
    const run = wedgework('check', '--json', files['false-claim.wedge']!);
    assert.equal(run.status, 1, explain(run));
    type Position = { line: number; column: number };
    const report = JSON.parse(run.stdout) as {
      files: {
        problems: { code: string; severity: string; message: string; range: { start: Position; end: Position }; related: unknown[] }[];
        results: { kind: string; name?: string; range: { start: Position; end: Position }; summary: string; json: object }[];
      }[];
    };
    const [file] = report.files;
    const claim = file!.problems.find((p) => p.code.startsWith('claim/'));
    assert.ok(claim, explain(run));
    assert.equal(claim.severity, 'error');
    assert.equal(claim.range.start.line, 5);
    assert.ok(claim.range.end.line > 5 || claim.range.end.column > claim.range.start.column, 'the range is not empty');
    assert.ok(Array.isArray(claim.related));
    const subspace = file!.results.find((r) => r.name === 'L');
    assert.ok(subspace, explain(run));
    assert.equal(subspace.kind, 'subspace');
    assert.equal(subspace.range.start.line, 4);
    assert.equal(subspace.range.start.column, 1);
    assert.ok(subspace.summary.length > 0);
    assert.equal(typeof subspace.json, 'object');
  });

  test('[evaluator] --json reports a syntax error and still exits with status 1', () => {
    const run = wedgework('check', '--json', files['syntax-error.wedge']!);
    assert.equal(run.status, 1, explain(run));
    const report = JSON.parse(run.stdout) as { files: { problems: { code: string; range: { start: { line: number } } }[] }[] };
    const syntax = report.files[0]!.problems.find((p) => p.code.startsWith('syntax/'));
    assert.ok(syntax, explain(run));
    assert.equal(syntax.range.start.line, 2);
  });
});
