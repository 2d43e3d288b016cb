/**
 * A whole file against the engine: evaluating a .wedge file that declares one
 * k-dimensional subspace of an n-space and shows its Plücker vector, against
 * the engine computing the same C(n, k) minors, timed side by side in one run.
 *
 * The ratio is what the language layer costs on top of the mathematics:
 * parsing, the Plücker vector as a value, its normalization and its results
 * (lens line, hover, LaTeX). The exact JSON of a result lists every
 * coordinate as text, and only `--json` reads it, so it is a contender of its
 * own: the file with every result's JSON written out.
 */
import { analyze } from '../server/src/language/index.js';
import { pluckerCoordinates } from '../server/src/engine/plucker.js';
import { QQ, rational, type Rational } from '../server/src/engine/rational.js';
import { binomial } from '../server/src/engine/subsets.js';
import { Random } from './random.js';
import { markdownTable, ms, times } from './table.js';
import { compare } from './timing.js';

export const WHOLE_FILE_SIZES: readonly (readonly [number, number])[] = [
  [4, 12],
  [8, 16],
  [10, 20],
];

export interface WholeFileOptions {
  rounds: number;
  /** CPU milliseconds per contender and round. */
  budgetMs: number;
}

export interface WholeFileResult {
  k: number;
  n: number;
  coordinates: number;
  /** `pluckerCoordinates` over QQ: the minors as `Rational`s, as the language layer asks the engine for them. */
  engineMs: number;
  /** `analyze` of the whole file, evaluated. */
  fileMs: number;
  /** The same, with the JSON of every result written out (what `check --json` adds). */
  jsonMs: number;
  /** fileMs / engineMs, as the median of the per-round ratios. */
  fileOverEngine: number;
  jsonOverEngine: number;
}

/** A k×n matrix of integers in [−9, 9] and the file that declares its row space and shows its Plücker vector. */
function wholeFile(k: number, n: number, random: Random): { rows: Rational[][]; text: string } {
  const integers = Array.from({ length: k }, () => Array.from({ length: n }, () => random.integer(-9, 9)));
  const text = [
    'field QQ',
    `space V dim ${n}`,
    'subspace W = rows [',
    ...integers.map((row) => `  ${row.join(' ')}`),
    ']',
    'show plucker(W)',
    '',
  ].join('\n');
  return { rows: integers.map((row) => row.map((x) => rational(BigInt(x)))), text };
}

function benchOne(k: number, n: number, options: WholeFileOptions, random: Random): WholeFileResult {
  const { rows, text } = wholeFile(k, n, random);
  const coordinates = binomial(n, k);
  const evaluated = analyze(text, { evaluate: true });
  // The file must have evaluated cleanly, or the comparison would time an error message.
  if (evaluated.problems.some((p) => p.severity === 'error') || evaluated.results.length !== 3) {
    throw new Error(`the G(${k},${n}) file did not evaluate cleanly: ${evaluated.problems.map((p) => p.message).join('; ')}`);
  }
  if (pluckerCoordinates(QQ, rows, n).length !== coordinates) throw new Error(`the engine gave the wrong number of minors at G(${k},${n})`);
  const result = compare(
    [
      { name: 'engine', run: () => pluckerCoordinates(QQ, rows, n) },
      { name: 'file', run: () => analyze(text, { evaluate: true }) },
      { name: 'json', run: () => JSON.stringify(analyze(text, { evaluate: true }).results.map((r) => r.json)) },
    ],
    options.rounds,
    options.budgetMs,
  );
  return {
    k,
    n,
    coordinates,
    engineMs: result.times.get('engine')!,
    fileMs: result.times.get('file')!,
    jsonMs: result.times.get('json')!,
    // The ratios are engine / contender per round; their inverses say how many engine runs a file costs.
    fileOverEngine: 1 / result.ratios.get('file')!,
    jsonOverEngine: 1 / result.ratios.get('json')!,
  };
}

export function runWholeFileBenchmark(options: WholeFileOptions, log: (line: string) => void): WholeFileResult[] {
  // A throwaway pass at the smallest size, so that compiling the parser and evaluator is not timed.
  benchOne(WHOLE_FILE_SIZES[0]![0], WHOLE_FILE_SIZES[0]![1], { ...options, rounds: 1 }, new Random(1));
  const random = new Random(2024);
  return WHOLE_FILE_SIZES.map(([k, n]) => {
    const r = benchOne(k, n, options, random);
    log(`  G(${k},${n}): file ${ms(r.fileMs)} ms, engine ${ms(r.engineMs)} ms`);
    return r;
  });
}

export function wholeFileTable(results: readonly WholeFileResult[]): string {
  return markdownTable(
    ['G(k,n)', 'coords', 'engine (ms)', 'whole file (ms)', 'file / engine', 'file + JSON (ms)', 'file + JSON / engine'],
    results.map((r) => [
      `G(${r.k},${r.n})`,
      `${r.coordinates}`,
      ms(r.engineMs),
      ms(r.fileMs),
      times(r.fileOverEngine),
      ms(r.jsonMs),
      times(r.jsonOverEngine),
    ]),
  );
}
