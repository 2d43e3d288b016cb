// Random subspaces and multivectors, and small independent references, shared by the exterior-algebra tests.
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { fromFraction, math, matrixOf, toFraction } from './linear-arbitraries.js';

export { math, matrixOf };

/** A field under test and a generator of its elements (zero comes up often, so ranks drop). */
export interface ExteriorCase {
  F: Field<any>;
  element: fc.Arbitrary<any>;
}

const smallRational = fc
  .tuple(fc.integer({ min: -5, max: 5 }), fc.integer({ min: 1, max: 4 }))
  .map(([n, d]) => rational(BigInt(n), BigInt(d)));

function primeCase(p: bigint): ExteriorCase {
  const F = primeField(p);
  return {
    F,
    element: fc.oneof(
      { arbitrary: fc.constant(F.zero), weight: 1 },
      { arbitrary: fc.bigInt({ min: 0n, max: p - 1n }).map((x) => F.fromBigInt(x)), weight: 3 },
    ),
  };
}

export const QQ_EXTERIOR: ExteriorCase = {
  F: QQ,
  element: fc.oneof({ arbitrary: fc.constant(QQ.zero), weight: 1 }, { arbitrary: smallRational, weight: 3 }),
};

/** QQ, characteristic 2 and 3, a middle prime, and a prime whose elements are bigints. */
export const EXTERIOR_CASES: ExteriorCase[] = [QQ_EXTERIOR, primeCase(2n), primeCase(3n), primeCase(101n), primeCase(2n ** 61n - 1n)];

/** A k×n matrix together with its shape. */
export function shapedMatrix(c: ExteriorCase, maxK: number, maxN: number) {
  return fc
    .integer({ min: 1, max: maxN })
    .chain((n) => fc.integer({ min: 0, max: Math.min(maxK, n) }).map((k) => ({ n, k })))
    .chain(({ n, k }) => matrixOf(c.element, k, n).map((rows) => ({ n, k, rows })));
}

/** A k×n matrix of full rank k: random rows, retried by fast-check's filter until independent. */
export function fullRankMatrix(c: ExteriorCase, k: number, n: number, rank: (rows: any[][]) => number) {
  return matrixOf(c.element, k, n).filter((rows) => rank(rows) === k);
}

/** (indices, coefficient) pairs for `fromTerms`, indices possibly unsorted or repeated. */
export function termList(c: ExteriorCase, n: number, k: number, maxTerms = 6) {
  return fc.array(
    fc.tuple(fc.array(fc.integer({ min: 0, max: n - 1 }), { minLength: k, maxLength: k }), c.element),
    { maxLength: maxTerms },
  );
}

/** The exact determinant of an integer or rational matrix, computed by mathjs (independent reference). */
export function mathjsDeterminant(m: readonly (readonly Rational[])[]): Rational {
  return fromFraction(math.det(m.map((row) => row.map(toFraction))));
}

/**
 * The sign of the permutation sorting `indices`, by counting inversions pair by pair (0 when an index repeats).
 * Written out here independently of the engine's sorting helpers.
 */
export function inversionSign(indices: readonly number[]): -1 | 0 | 1 {
  let inversions = 0;
  for (let i = 0; i < indices.length; i++) {
    for (let j = i + 1; j < indices.length; j++) {
      if (indices[i] === indices[j]) return 0;
      if (indices[i]! > indices[j]!) inversions++;
    }
  }
  return inversions % 2 === 0 ? 1 : -1;
}

/** All k-subsets of {0..n−1} in lexicographic order, by filtering bit masks and sorting (independent of the engine). */
export function bruteSubsets(n: number, k: number): number[][] {
  const out: number[][] = [];
  for (let mask = 0; mask < 1 << n; mask++) {
    const s: number[] = [];
    for (let i = 0; i < n; i++) if (mask & (1 << i)) s.push(i);
    if (s.length === k) out.push(s);
  }
  return out.sort((a, b) => {
    for (let i = 0; i < k; i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
    return 0;
  });
}

/** The square submatrix of `rows` on the given columns. */
export function columnsOf<T>(rows: readonly (readonly T[])[], columns: readonly number[]): T[][] {
  return rows.map((row) => columns.map((c) => row[c]!));
}

/** c·v entrywise. */
export function scaleVector<T>(F: Field<T>, c: T, v: readonly T[]): T[] {
  return v.map((x) => F.mul(c, x));
}
