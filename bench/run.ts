/**
 * `npm run bench`: the performance tables of docs/performance.md, measured in
 * one run on this machine, with the targets checked at the end.
 *
 *   node --expose-gc --import tsx bench/run.ts [--quick] [--only=plucker,decompose,file,server] [--out=FILE]
 *
 * --quick makes fewer and shorter rounds (about a minute in all); the
 * full run takes a few minutes. The server part drives dist/server.cjs, so
 * build first (`npm run build`) to measure the current sources.
 */
import { execFileSync } from 'node:child_process';
import { statSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus, freemem, loadavg, totalmem } from 'node:os';
import { decomposeTable, runDecomposeBenchmark } from './decompose.js';
import { pluckerTable, runPluckerBenchmark } from './plucker.js';
import { runServerBenchmark, serverTables } from './server.js';
import { decomposeTargets, pluckerTargets, serverTargets, targetTable } from './targets.js';
import { runWholeFileBenchmark, wholeFileTable } from './whole-file.js';

const args = process.argv.slice(2);
const quick = args.includes('--quick');
const only = args.find((a) => a.startsWith('--only='))?.slice('--only='.length).split(',');
const out = args.find((a) => a.startsWith('--out='))?.slice('--out='.length);
const wanted = (part: string) => only === undefined || only.includes(part);

const log = (line: string) => process.stderr.write(`${line}\n`);
const report: string[] = [];
const emit = (text: string) => {
  report.push(text);
  process.stdout.write(`${text}\n\n`);
};

function freeOutput(): string {
  try {
    return execFileSync('free', ['-h'], { encoding: 'utf8' }).trim();
  } catch {
    return `total ${(totalmem() / 2 ** 30).toFixed(1)} GiB, free ${(freemem() / 2 ** 30).toFixed(1)} GiB`;
  }
}

function machine(): string {
  const cpu = cpus()[0]?.model ?? 'unknown CPU';
  let serverBuilt = 'not built';
  try {
    serverBuilt = statSync('dist/server.cjs').mtime.toISOString();
  } catch {
    // Reported as not built.
  }
  return [
    '```',
    `command: node --expose-gc --import tsx bench/run.ts ${args.join(' ')}`.trimEnd(),
    `date: ${new Date().toISOString()}`,
    `node ${process.version}, ${process.platform} ${process.arch}, ${cpu}`,
    `nproc: ${availableParallelism()}`,
    `load average at start: ${loadavg().map((x) => x.toFixed(2)).join(' ')}`,
    `dist/server.cjs built: ${serverBuilt}`,
    `garbage collection between measurements: ${typeof (globalThis as { gc?: unknown }).gc === 'function' ? 'yes' : 'no (run node with --expose-gc)'}`,
    freeOutput(),
    '```',
  ].join('\n');
}

const started = Date.now();
emit(`## Machine\n\n${machine()}`);
const targets = [];

if (wanted('plucker')) {
  log('Plücker coordinates');
  const results = runPluckerBenchmark(
    quick ? { rounds: 2, budgetMs: 25, sampleSize: 60 } : { rounds: 7, budgetMs: 80, sampleSize: 400 },
    log,
  );
  emit(`## Plücker coordinates\n\n${pluckerTable(results)}`);
  targets.push(...pluckerTargets(results));
}

if (wanted('decompose')) {
  log('Decomposability');
  const results = runDecomposeBenchmark(quick ? { rounds: 1, budgetMs: 25 } : { rounds: 3, budgetMs: 100 }, log);
  emit(`## Decomposability (QQ, entries in [−9, 9])\n\n${decomposeTable(results)}`);
  targets.push(...decomposeTargets(results));
}

if (wanted('file')) {
  log('Whole files against the engine');
  const results = runWholeFileBenchmark(quick ? { rounds: 2, budgetMs: 100 } : { rounds: 5, budgetMs: 300 }, log);
  emit(`## A whole file against the engine (QQ, entries in [−9, 9])\n\n${wholeFileTable(results)}`);
}

if (wanted('server')) {
  log('Language server');
  const result = await runServerBenchmark(
    quick
      ? { sizes: [50, 500, 1000, 5000], keystrokes: 6, typingKeystrokes: 2, hovers: 20, coldStarts: 2 }
      : { sizes: [50, 500, 1000, 5000], keystrokes: 30, typingKeystrokes: 8, hovers: 100, coldStarts: 7 },
    log,
  );
  emit(`## Language server (dist/server.cjs over stdio)\n\n${serverTables(result)}`);
  targets.push(...serverTargets(result));
}

emit(`## Targets\n\n${targetTable(targets)}`);
emit(`Finished in ${((Date.now() - started) / 1000).toFixed(0)} s; load average at the end: ${loadavg().map((x) => x.toFixed(2)).join(' ')}.`);
if (out !== undefined) writeFileSync(out, `${report.join('\n\n')}\n`);
