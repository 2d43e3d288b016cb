/**
 * Plücker coordinates, ours against one elimination per minor (our Bareiss
 * code and mathjs), against the generic walk through the `Field` interface,
 * and against the arithmetic floor of what our walk computes.
 */
import type { Field } from '../server/src/engine/field.js';
import { pluckerCoordinates, pluckerCoordinatesScaled, pluckerResiduesModP } from '../server/src/engine/plucker.js';
import { emptyModularWalkCounts, pluckerResidues } from '../server/src/engine/plucker-modular.js';
import { emptyMultimodularReport } from '../server/src/engine/plucker-multimodular.js';
import { pluckerRationalScaled, type RationalMethod } from '../server/src/engine/plucker-rational.js';
import { pluckerFractionFree, type FractionFreeCounts } from '../server/src/engine/plucker-fraction-free.js';
import { primeField } from '../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../server/src/engine/rational.js';
import { binomial } from '../server/src/engine/subsets.js';
import {
  bareissMinor,
  bareissMinorModular,
  fractionToBigInt,
  mathjsMinor,
  sampleColumnSets,
  toFractions,
} from './plucker-baselines.js';
import { bigintHornerFloor, bigintProductFloor, fractionFreeFloor, modularFloor, type ProductGroup } from './floor.js';
import { Random } from './random.js';
import { markdownTable, ms, nanoseconds, times } from './table.js';
import { compare, type Contender } from './timing.js';

export const PLUCKER_SIZES: readonly (readonly [number, number])[] = [
  [2, 8],
  [3, 9],
  [4, 12],
  [5, 15],
  [8, 16],
  [10, 20],
];

/** The prime of the GF(p) rows: the largest below 2^31 (a Mersenne prime). */
export const BENCH_PRIME = 2 ** 31 - 1;

export type EntryKind = 'QQ small' | 'QQ large' | 'GF(p)';
export const ENTRY_KINDS: readonly EntryKind[] = ['QQ small', 'QQ large', 'GF(p)'];

export interface BenchOptions {
  rounds: number;
  /** CPU milliseconds per contender and round. */
  budgetMs: number;
  /** How many column sets the per-minor baselines cycle through at most. */
  sampleSize: number;
  /** Only these kinds of entries (default: all). */
  kinds?: readonly EntryKind[];
}

export interface PluckerResult {
  kind: EntryKind;
  k: number;
  n: number;
  coordinates: number;
  /** Time of the compact result (Int32Array of residues; numerators over one denominator). */
  oursMs: number;
  /** Time of `pluckerCoordinates`, which returns the field's elements in a plain array. */
  elementsMs: number;
  /** baseline time / our time (how many times faster we are). */
  vsGeneric: number;
  vsBareiss: number;
  vsMathjs: number;
  floorMs: number;
  /** our time / floor time. */
  overFloor: number;
  notes: string[];
}

/** Entries: small integers in [−9, 9], or signed 64-bit integers. */
function integerMatrix(kind: EntryKind, k: number, n: number, random: Random): bigint[][] {
  return Array.from({ length: k }, () =>
    Array.from({ length: n }, () => (kind === 'QQ large' ? random.signedBits(64) : BigInt(random.integer(-9, 9)))),
  );
}

function reduce(integers: readonly (readonly bigint[])[], p: number): number[][] {
  const big = BigInt(p);
  return integers.map((row) => row.map((x) => Number(((x % big) + big) % big)));
}

/** A contender that computes one minor per call, cycling through the sample; its job is all minors. */
function perMinor(name: string, sample: readonly number[][], total: number, minor: (cols: number[]) => unknown): Contender {
  let next = 0;
  return {
    name,
    callsPerJob: total,
    run: () => {
      const cols = sample[next]!;
      next = (next + 1) % sample.length;
      return minor(cols);
    },
  };
}

function benchOne(kind: EntryKind, k: number, n: number, options: BenchOptions, random: Random): PluckerResult {
  const integers = integerMatrix(kind, k, n, random);
  const total = binomial(n, k);
  const sample = sampleColumnSets(n, k, options.sampleSize);
  const notes: string[] = [];
  const fractions = toFractions(integers);
  let contenders: Contender[];
  let floor: () => unknown;

  if (kind === 'GF(p)') {
    const F = primeField(BigInt(BENCH_PRIME)) as Field<number>;
    const rows = reduce(integers, BENCH_PRIME);
    const generic = { ...F };
    const ours = pluckerResiduesModP(F, rows, n);
    const elements = pluckerCoordinates(F, rows, n);
    if (elements.some((x, i) => x !== ours[i])) throw new Error('pluckerCoordinates and pluckerResiduesModP disagree');
    // The baselines must agree with us where they are timed (spot check on the sample).
    const big = BigInt(BENCH_PRIME);
    sample.slice(0, 3).forEach((cols) => {
      const at = rankOf(cols, n);
      if (bareissMinorModular(rows, cols, BENCH_PRIME) !== ours[at]) throw new Error(`Bareiss mod p disagrees at ${cols}`);
      const exact = fractionToBigInt(mathjsMinor(fractions, cols));
      if (Number(((exact % big) + big) % big) !== ours[at]) throw new Error(`mathjs disagrees at ${cols}`);
    });
    const counts = emptyModularWalkCounts();
    pluckerResidues(rows, n, BENCH_PRIME, counts);
    floor = modularFloor(counts, BENCH_PRIME);
    notes.push(`${counts.inversions} inversions`);
    contenders = [
      { name: 'ours', run: () => pluckerResiduesModP(F, rows, n) },
      { name: 'elements', run: () => pluckerCoordinates(F, rows, n) },
      { name: 'generic', run: () => pluckerCoordinates(generic, rows, n) },
      perMinor('bareiss', sample, total, (cols) => bareissMinorModular(rows, cols, BENCH_PRIME)),
      perMinor('mathjs', sample, total, (cols) => {
        const d = fractionToBigInt(mathjsMinor(fractions, cols));
        return Number(((d % big) + big) % big);
      }),
      { name: 'floor', run: floor },
    ];
  } else {
    const rows: Rational[][] = integers.map((row) => row.map((x) => rational(x)));
    const ours = pluckerCoordinates(QQ, rows, n);
    const scaled = pluckerCoordinatesScaled(rows, n);
    // Integer entries: the denominator is 1 and the numerators are the minors.
    if (scaled.denominator !== 1n || ours.some((x, i) => BigInt(scaled.numerators[i]!) !== x.num)) {
      throw new Error('pluckerCoordinates and pluckerCoordinatesScaled disagree');
    }
    sample.slice(0, 3).forEach((cols) => {
      const at = rankOf(cols, n);
      if (bareissMinor(integers, cols) !== ours[at]!.num) throw new Error(`Bareiss disagrees at ${cols}`);
      if (fractionToBigInt(mathjsMinor(fractions, cols)) !== ours[at]!.num) throw new Error(`mathjs disagrees at ${cols}`);
    });
    const report = emptyMultimodularReport();
    const chosen: RationalMethod[] = [];
    pluckerRationalScaled(rows, n, (m) => chosen.push(m), report);
    const method = chosen[0]!;
    const entryBits = meanBits(integers);
    if (method === 'two rows' || method === 'three rows') {
      const groups: ProductGroup[] = [{ count: binomial(n, 2), terms: 2, xBits: entryBits, yBits: entryBits }];
      if (method === 'three rows') groups.push({ count: total, terms: 3, xBits: entryBits, yBits: 2 * entryBits + 1 });
      floor = bigintProductFloor(groups);
      notes.push(`${method}, written out on bigints`);
    } else if (method === 'multimodular') {
      const walkFloor = modularFloor(report.walk, BENCH_PRIME);
      const reconstruction = modularFloor({ ...emptyModularWalkCounts(), products: report.reconstructionProducts }, BENCH_PRIME);
      const horner = bigintHornerFloor(report.reconstructionBigint, report.boundBits / 2);
      floor = () => [walkFloor(), reconstruction(), horner()];
      notes.push(`${report.primes} prime${report.primes === 1 ? '' : 's'} (bound ${report.boundBits} bits)`);
    } else {
      const counts: FractionFreeCounts = { updates: [], pivotBits: [], previousBits: [] };
      pluckerFractionFree(rows, n, counts);
      floor = fractionFreeFloor(counts);
      notes.push(`fraction-free on bigints (bound ${Math.round(boundBitsOf(integers))} bits)`);
    }
    contenders = [
      { name: 'ours', run: () => pluckerCoordinatesScaled(rows, n) },
      { name: 'elements', run: () => pluckerCoordinates(QQ, rows, n) },
      { name: 'generic', run: () => pluckerFractionFree(rows, n) },
      perMinor('bareiss', sample, total, (cols) => ({ num: bareissMinor(integers, cols), den: 1n })),
      perMinor('mathjs', sample, total, (cols) => mathjsMinor(fractions, cols)),
      { name: 'floor', run: floor },
    ];
  }

  const result = compare(contenders, options.rounds, options.budgetMs);
  const calls = result.calls;
  for (const name of ['bareiss', 'mathjs']) {
    const done = Math.min(calls.get(name)!, sample.length);
    if (done < total) notes.push(`${name === 'mathjs' ? 'mathjs' : 'Bareiss'}: ${done} of ${total} minors timed, extrapolated`);
  }
  const oursMs = result.times.get('ours')!;
  return {
    kind,
    k,
    n,
    coordinates: total,
    oursMs,
    elementsMs: result.times.get('elements')!,
    vsGeneric: 1 / result.ratios.get('generic')!,
    vsBareiss: 1 / result.ratios.get('bareiss')!,
    vsMathjs: 1 / result.ratios.get('mathjs')!,
    floorMs: result.times.get('floor')!,
    overFloor: result.ratios.get('floor')!,
    notes,
  };
}

/** The mean bit length of the entries (at least 1). */
function meanBits(integers: readonly (readonly bigint[])[]): number {
  let bits = 0;
  let count = 0;
  for (const row of integers) {
    for (const x of row) {
      bits += x === 0n ? 1 : (x < 0n ? -x : x).toString(2).length;
      count++;
    }
  }
  return bits / count;
}

function boundBitsOf(integers: readonly (readonly bigint[])[]): number {
  let bits = 0;
  for (const row of integers) {
    let s = 0n;
    for (const x of row) s += x * x;
    bits += s.toString(2).length / 2;
  }
  return bits;
}

function rankOf(cols: readonly number[], n: number): number {
  // Lexicographic rank, as in subsets.ts, counted here independently by complements.
  const k = cols.length;
  let after = 0;
  cols.forEach((c, i) => {
    after += binomial(n - 1 - c, k - i);
  });
  return binomial(n, k) - 1 - after;
}

export function runPluckerBenchmark(options: BenchOptions, log: (line: string) => void): PluckerResult[] {
  const results: PluckerResult[] = [];
  // A throwaway pass over the small shapes first: the compiler works on background threads, whose CPU
  // time would otherwise be charged to whichever case comes first.
  const warmUp = new Random(1);
  for (const kind of options.kinds ?? ENTRY_KINDS) {
    for (const [k, n] of PLUCKER_SIZES.slice(0, 3)) benchOne(kind, k, n, { ...options, rounds: 1 }, warmUp);
  }
  const random = new Random(2024);
  for (const kind of options.kinds ?? ENTRY_KINDS) {
    for (const [k, n] of PLUCKER_SIZES) {
      const r = benchOne(kind, k, n, options, random);
      log(`  ${kind} G(${k},${n}): ours ${ms(r.oursMs)} ms`);
      results.push(r);
    }
  }
  return results;
}

export function pluckerTable(results: readonly PluckerResult[]): string {
  return markdownTable(
    ['field', 'G(k,n)', 'coords', 'ours (ms)', 'per coord', 'as elements (ms)', '× generic walk', '× Bareiss/minor', '× mathjs/minor', 'floor (ms)', 'ours / floor', 'notes'],
    results.map((r) => [
      r.kind,
      `G(${r.k},${r.n})`,
      `${r.coordinates}`,
      ms(r.oursMs),
      nanoseconds((r.oursMs * 1e6) / r.coordinates),
      ms(r.elementsMs),
      times(r.vsGeneric),
      times(r.vsBareiss),
      times(r.vsMathjs),
      ms(r.floorMs),
      times(r.overFloor),
      r.notes.join('; '),
    ]),
  );
}
