/**
 * What the Plücker benchmark compares against: one elimination per minor, by
 * our own Bareiss code and by an independent general-purpose library (mathjs,
 * on exact fractions), and the modular product count of the arithmetic floor.
 */
import { create, all } from 'mathjs';
import { invMod, mulMod, negMod, dotMod } from '../server/src/engine/modular-arithmetic.js';
import { binomial, unrankLex } from '../server/src/engine/subsets.js';

const math = create(all);

/** `count` column sets spread evenly over the lexicographic list of all k-subsets of n columns. */
export function sampleColumnSets(n: number, k: number, count: number): number[][] {
  const total = binomial(n, k);
  const m = Math.min(count, total);
  return Array.from({ length: m }, (_, i) => unrankLex(Math.floor((i * total) / m), n, k));
}

/** The determinant of the columns `cols` of an integer matrix, by fraction-free (Bareiss) elimination on bigints. */
export function bareissMinor(rows: readonly (readonly bigint[])[], cols: readonly number[]): bigint {
  const k = cols.length;
  const a = rows.map((row) => cols.map((c) => row[c]!));
  let sign = 1n;
  let previous = 1n;
  for (let s = 0; s < k - 1; s++) {
    if (a[s]![s] === 0n) {
      let swap = s + 1;
      while (swap < k && a[swap]![s] === 0n) swap++;
      if (swap === k) return 0n;
      [a[s], a[swap]] = [a[swap]!, a[s]!];
      sign = -sign;
    }
    const pivotRow = a[s]!;
    const pivot = pivotRow[s]!;
    for (let i = s + 1; i < k; i++) {
      const row = a[i]!;
      const factor = row[s]!;
      for (let j = s + 1; j < k; j++) row[j] = (pivot * row[j]! - factor * pivotRow[j]!) / previous;
    }
    previous = pivot;
  }
  return sign * a[k - 1]![k - 1]!;
}

/**
 * The same minor modulo p < 2^31 by Bareiss's elimination carried out modulo
 * p (its exact division becomes a product with the inverse), on the engine's
 * fast modular kernels, so that only the method differs from the walk.
 */
export function bareissMinorModular(rows: readonly (readonly number[])[], cols: readonly number[], p: number): number {
  const k = cols.length;
  const reciprocal = 1 / p;
  const a = rows.map((row) => Int32Array.from(cols, (c) => row[c]!));
  let negative = false;
  let previousInverse = 1;
  for (let s = 0; s < k - 1; s++) {
    if (a[s]![s] === 0) {
      let swap = s + 1;
      while (swap < k && a[swap]![s] === 0) swap++;
      if (swap === k) return 0;
      [a[s], a[swap]] = [a[swap]!, a[s]!];
      negative = !negative;
    }
    const pivotRow = a[s]!;
    const pivot = pivotRow[s]!;
    for (let i = s + 1; i < k; i++) {
      const row = a[i]!;
      const factor = negMod(row[s]!, p);
      for (let j = s + 1; j < k; j++) {
        row[j] = mulMod(dotMod(pivot, row[j]!, factor, pivotRow[j]!, p, reciprocal), previousInverse, p, reciprocal);
      }
    }
    previousInverse = invMod(pivot, p);
  }
  const d = a[k - 1]![k - 1]!;
  return negative ? negMod(d, p) : d;
}

type Fraction = ReturnType<typeof math.fraction>;

/** mathjs's own determinant of the columns `cols`, on its exact fractions. */
export function mathjsMinor(fractions: readonly (readonly Fraction[])[], cols: readonly number[]): Fraction {
  return math.det(fractions.map((row) => cols.map((c) => row[c]!))) as unknown as Fraction;
}

export function toFractions(rows: readonly (readonly bigint[])[]): Fraction[][] {
  return rows.map((row) => row.map((x) => math.fraction(`${x}`)));
}

/** A mathjs fraction that is an integer, as a bigint. */
export function fractionToBigInt(f: Fraction): bigint {
  const { s, n, d } = f as unknown as { s: bigint; n: bigint; d: bigint };
  if (d !== 1n) throw new Error('expected an integer determinant');
  return s * n;
}
