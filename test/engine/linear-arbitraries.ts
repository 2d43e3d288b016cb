// Random matrices over the fields under test, shared by the linear-algebra tests.
import fc from 'fast-check';
import { create, all } from 'mathjs';
import type { Field } from '../../server/src/engine/field.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';

// mathjs is the independent reference for exact fraction arithmetic and determinants.
export const math = create(all);

export function toFraction(r: Rational) {
  return math.fraction(`${r.num}/${r.den}`);
}

export function fromFraction(f: unknown): Rational {
  const { s, n, d } = f as { s: bigint; n: bigint; d: bigint };
  return rational(s * n, d);
}

/** A field under test with a generator of its elements, biased towards zero so that ranks drop. */
export interface FieldCase {
  F: Field<any>;
  element: fc.Arbitrary<any>;
}

const smallRational = fc
  .tuple(fc.integer({ min: -4, max: 4 }), fc.integer({ min: 1, max: 3 }))
  .map(([n, d]) => rational(BigInt(n), BigInt(d)));

function primeCase(p: bigint): FieldCase {
  const F = primeField(p);
  return {
    F,
    element: fc.oneof(
      { arbitrary: fc.constant(F.zero), weight: 1 },
      { arbitrary: fc.bigInt({ min: 0n, max: p - 1n }).map((n) => F.fromBigInt(n)), weight: 2 },
    ),
  };
}

export const QQ_CASE: FieldCase = {
  F: QQ,
  element: fc.oneof({ arbitrary: fc.constant(QQ.zero), weight: 1 }, { arbitrary: smallRational, weight: 2 }),
};

/** The rationals and prime fields with number elements (2, 7, 2^31−1) and with bigint elements (2^61−1). */
export const FIELD_CASES: FieldCase[] = [QQ_CASE, primeCase(2n), primeCase(7n), primeCase(2n ** 31n - 1n), primeCase(2n ** 61n - 1n)];

export interface SizedMatrix<T> {
  rows: T[][];
  ncols: number;
}

export function matrixOf<T>(element: fc.Arbitrary<T>, nrows: number, ncols: number): fc.Arbitrary<T[][]> {
  return fc.array(fc.array(element, { minLength: ncols, maxLength: ncols }), { minLength: nrows, maxLength: nrows });
}

/** A matrix of random shape, possibly without rows. */
export function sizedMatrix<T>(element: fc.Arbitrary<T>, maxRows = 5, maxCols = 6): fc.Arbitrary<SizedMatrix<T>> {
  return fc
    .tuple(fc.integer({ min: 0, max: maxRows }), fc.integer({ min: 1, max: maxCols }))
    .chain(([r, c]) => matrixOf(element, r, c).map((rows) => ({ rows, ncols: c })));
}

/**
 * A matrix of random shape whose rank is usually below its size: the product
 * of a rows×k and a k×cols matrix for a small k. Multiplication is done here
 * with the field operations directly so that it does not depend on the code under test.
 */
export function lowRankMatrix(fieldCase: FieldCase, maxRows = 6, maxCols = 6): fc.Arbitrary<SizedMatrix<any>> {
  const { F, element } = fieldCase;
  return fc
    .tuple(fc.integer({ min: 0, max: maxRows }), fc.integer({ min: 1, max: maxCols }), fc.integer({ min: 1, max: 4 }))
    .chain(([r, c, k]) =>
      fc.tuple(matrixOf(element, r, k), matrixOf(element, k, c)).map(([left, right]) => ({
        rows: left.map((row) =>
          Array.from({ length: c }, (_, j) => row.reduce((acc, x, i) => F.add(acc, F.mul(x, right[i]![j])), F.zero)),
        ),
        ncols: c,
      })),
    );
}

/** Either a plain random matrix or a low-rank one. */
export function anyMatrix(fieldCase: FieldCase, maxRows = 6, maxCols = 6): fc.Arbitrary<SizedMatrix<any>> {
  return fc.oneof(sizedMatrix(fieldCase.element, maxRows, maxCols), lowRankMatrix(fieldCase, maxRows, maxCols));
}

/** Σ c_i·rows[i], computed with the field operations directly. */
export function combine<T>(F: Field<T>, coefficients: readonly T[], rows: readonly (readonly T[])[], ncols: number): T[] {
  const out = new Array<T>(ncols).fill(F.zero);
  coefficients.forEach((c, i) => {
    for (let j = 0; j < ncols; j++) out[j] = F.add(out[j]!, F.mul(c, rows[i]![j]!));
  });
  return out;
}

/** m·x for a column vector x, computed with the field operations directly. */
export function applyMatrix<T>(F: Field<T>, m: readonly (readonly T[])[], x: readonly T[]): T[] {
  return m.map((row) => row.reduce((acc, a, j) => F.add(acc, F.mul(a, x[j]!)), F.zero));
}

export function vectorsEqual<T>(F: Field<T>, a: readonly T[], b: readonly T[]): boolean {
  return a.length === b.length && a.every((x, i) => F.eq(x, b[i]!));
}

/** A deep copy for checking that inputs were left alone. */
export function deepCopy<T>(m: readonly (readonly T[])[]): T[][] {
  return m.map((row) => row.slice());
}
