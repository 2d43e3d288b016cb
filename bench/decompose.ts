/**
 * Decomposability: `decompose` against the direct test, evaluating the
 * quadratic Plücker relations one after another until one fails (all of them
 * when ω is decomposable).
 */
import type { Field } from '../server/src/engine/field.js';
import { decompose } from '../server/src/engine/decompose.js';
import { add, toDense, type Multivector } from '../server/src/engine/multivector.js';
import { pluckerMultivector } from '../server/src/engine/plucker.js';
import { QQ, rational, type Rational } from '../server/src/engine/rational.js';
import { binomial } from '../server/src/engine/subsets.js';
import { Random } from './random.js';
import { markdownTable, ms, times } from './table.js';
import { collectGarbage, compare, cpuMilliseconds, median } from './timing.js';

export const DECOMPOSE_DEGREES = [2, 3, 4, 5] as const;
export const DECOMPOSE_DIMENSIONS = [6, 8, 10, 12, 14] as const;

/** The outcome of the direct test: its answer if it finished, and how many relations it evaluated. */
interface RelationsOutcome {
  decomposable: boolean | undefined;
  evaluated: number;
}

/** Every k-subset of {0..n−1} in lexicographic order, as arrays (the order the relations are taken in). */
function allSubsets(n: number, k: number): number[][] {
  const out: number[][] = [];
  const s = Array.from({ length: k }, (_, i) => i);
  for (;;) {
    out.push(s.slice());
    let i = k - 1;
    while (i >= 0 && s[i] === n - k + i) i--;
    if (i < 0) return out;
    s[i]!++;
    for (let j = i + 1; j < k; j++) s[j] = s[j - 1]! + 1;
  }
}

/**
 * The direct test: Σ_t (−1)^t p(I, j_t) p(J ∖ j_t) = 0 for every (k−1)-subset
 * I and (k+1)-subset J (Griffiths–Harris, Principles of Algebraic Geometry,
 * Ch. 1 §5 — from memory), on the dense coordinates, stopping at the first
 * failure or when `stopAtMs` of CPU time is reached (then the answer is undefined).
 */
function relationsTest<T>(F: Field<T>, mv: Multivector<T>, stopAtMs: number): RelationsOutcome {
  const { n, k } = mv;
  const p = toDense(F, mv);
  // binom[a][b] = C(a, b), for the lexicographic rank of a subset.
  const binom = Array.from({ length: n + 1 }, (_, a) => Array.from({ length: k + 2 }, (_, b) => binomial(a, b)));
  const total = binom[n]![k]!;
  const rank = (s: readonly number[]): number => {
    let after = 0;
    for (let i = 0; i < s.length; i++) after += binom[n - 1 - s[i]!]![s.length - i]!;
    return total - 1 - after;
  };
  const lefts = allSubsets(n, k - 1);
  const rights = allSubsets(n, k + 1);
  const first = new Array<number>(k);
  const second = new Array<number>(k);
  let evaluated = 0;
  for (const I of lefts) {
    for (const J of rights) {
      if ((evaluated & 1023) === 0 && evaluated > 0 && cpuMilliseconds() > stopAtMs) return { decomposable: undefined, evaluated };
      evaluated++;
      let value = F.zero;
      for (let t = 0; t <= k; t++) {
        const j = J[t]!;
        // first = I ∪ {j} sorted, with m = #{i ∈ I : i > j}; skipped when j ∈ I.
        let m = 0;
        let clash = false;
        let w = 0;
        let placed = false;
        for (const i of I) {
          if (i === j) clash = true;
          if (!placed && j < i) {
            first[w++] = j;
            placed = true;
          }
          if (i > j) m++;
          first[w++] = i;
        }
        if (clash) continue;
        if (!placed) first[w++] = j;
        let v = 0;
        for (let s = 0; s <= k; s++) if (s !== t) second[v++] = J[s]!;
        const product = F.mul(p[rank(first)]!, p[rank(second)]!);
        value = (t + m) % 2 === 0 ? F.add(value, product) : F.sub(value, product);
      }
      if (!F.isZero(value)) return { decomposable: false, evaluated };
    }
  }
  return { decomposable: true, evaluated };
}

export interface DecomposeResult {
  k: number;
  n: number;
  kind: 'decomposable' | 'not decomposable';
  terms: number;
  oursMs: number;
  relationsMs: number;
  /** relations time / our time. */
  speedup: number;
  relationsEvaluated: number;
  relationsTotal: number;
  /** Whether the relations time was extrapolated from a partial run. */
  extrapolated: boolean;
}

function plane(k: number, n: number, random: Random): Rational[][] {
  return Array.from({ length: k }, () => Array.from({ length: n }, () => rational(BigInt(random.integer(-9, 9)))));
}

function benchOne(k: number, n: number, kind: DecomposeResult['kind'], rounds: number, budgetMs: number, random: Random): DecomposeResult {
  const omega =
    kind === 'decomposable'
      ? pluckerMultivector(QQ, plane(k, n, random), n)
      : add(QQ, pluckerMultivector(QQ, plane(k, n, random), n), pluckerMultivector(QQ, plane(k, n, random), n));
  const total = binomial(n, k - 1) * binomial(n, k + 1);
  const ours = decompose(QQ, omega);
  // Ours, timed on its own; the direct test, timed per round with a CPU budget and extrapolated when cut short.
  const oursMs = compare([{ name: 'ours', run: () => decompose(QQ, omega) }], rounds, budgetMs).times.get('ours')!;
  const relationTimes: number[] = [];
  const speedups: number[] = [];
  let outcome: RelationsOutcome = { decomposable: undefined, evaluated: 0 };
  let extrapolated = false;
  for (let round = 0; round < rounds; round++) {
    collectGarbage();
    const start = cpuMilliseconds();
    outcome = relationsTest(QQ, omega, start + 4 * budgetMs);
    const elapsed = cpuMilliseconds() - start;
    let full = elapsed;
    if (outcome.decomposable === undefined) {
      // Cut short: only a decomposable input must go through all relations, so only then is the count known.
      if (ours.kind !== 'decomposable') throw new Error(`the direct test did not finish on a non-decomposable input G(${k},${n})`);
      full = (elapsed * total) / outcome.evaluated;
      extrapolated = true;
    } else if (outcome.decomposable !== (ours.kind === 'decomposable')) {
      throw new Error(`decompose and the relations disagree at G(${k},${n})`);
    }
    relationTimes.push(full);
    // A short direct test is repeated so that one clock tick does not decide its time.
    if (full < budgetMs) {
      const again = compare([{ name: 'relations', run: () => relationsTest(QQ, omega, Infinity) }], 1, budgetMs);
      relationTimes[relationTimes.length - 1] = again.times.get('relations')!;
    }
    speedups.push(relationTimes[relationTimes.length - 1]! / oursMs);
  }
  return {
    k,
    n,
    kind,
    terms: omega.terms.size,
    oursMs,
    relationsMs: median(relationTimes),
    speedup: median(speedups),
    relationsEvaluated: extrapolated ? total : outcome.evaluated,
    relationsTotal: total,
    extrapolated,
  };
}

export function runDecomposeBenchmark(options: { rounds: number; budgetMs: number }, log: (line: string) => void): DecomposeResult[] {
  const random = new Random(77);
  const results: DecomposeResult[] = [];
  for (const k of DECOMPOSE_DEGREES) {
    for (const n of DECOMPOSE_DIMENSIONS) {
      if (n < k + 2) continue; // below that every k-vector is decomposable
      for (const kind of ['decomposable', 'not decomposable'] as const) {
        const r = benchOne(k, n, kind, options.rounds, options.budgetMs, random);
        log(`  ${kind} degree ${k} in dimension ${n}: ours ${ms(r.oursMs)} ms, relations ${ms(r.relationsMs)} ms`);
        results.push(r);
      }
    }
  }
  return results;
}

export function decomposeTable(results: readonly DecomposeResult[]): string {
  const byShape = new Map<string, DecomposeResult[]>();
  for (const r of results) {
    const key = `${r.k},${r.n}`;
    byShape.set(key, [...(byShape.get(key) ?? []), r]);
  }
  const rows = [...byShape.values()].map((pair) => {
    const d = pair.find((r) => r.kind === 'decomposable')!;
    const nd = pair.find((r) => r.kind === 'not decomposable')!;
    return [
      `${d.k}`,
      `${d.n}`,
      `${d.relationsTotal}`,
      ms(d.oursMs),
      `${d.extrapolated ? '~' : ''}${ms(d.relationsMs)}`,
      times(d.speedup),
      ms(nd.oursMs),
      ms(nd.relationsMs),
      `${nd.relationsEvaluated}`,
      times(nd.speedup),
    ];
  });
  return markdownTable(
    ['k', 'n', 'relations', 'decomposable: ours (ms)', 'all relations (ms)', '×', 'not decomposable: ours (ms)', 'relations until one fails (ms)', 'relations evaluated', '×'],
    rows,
  );
}
