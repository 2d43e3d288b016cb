import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { pluckerCoordinates, pluckerCoordinatesScaled, pluckerResiduesModP, scaledCoordinate } from '../../server/src/engine/plucker.js';
import { pluckerFractionFree } from '../../server/src/engine/plucker-fraction-free.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { bruteSubsets, columnsOf, matrixOf, mathjsDeterminant } from './exterior-arbitraries.js';

// The compact results (residues in an Int32Array over GF(p); numerators over one denominator over QQ)
// against the generic walk through the Field interface (a copy of the field, which no fast path
// recognises), against the fraction-free bigint walk, and against mathjs determinants (an independent
// reference library), on seeded random matrices and on the edge cases: k = 1, k = n, zero columns,
// repeated rows (rank below k), p = 2 and 3 and the largest primes below 2^31.

const SHAPES: [number, number][] = [
  [1, 1],
  [1, 6],
  [2, 2],
  [2, 7],
  [3, 3],
  [3, 8],
  [4, 4],
  [4, 9],
  [5, 5],
  [5, 10],
  [6, 11],
  [7, 7],
  [8, 12],
];

/** mathjs checks every `step`-th coordinate, so that the suite stays quick. */
function mathjsStep(count: number): number {
  return Math.max(1, Math.floor(count / 30));
}

/** Damage that lowers the rank or empties a column: one of the rows copied, or one column set to zero. */
function damage<T>(rows: T[][], zero: T, how: number): void {
  const k = rows.length;
  const n = rows[0]?.length ?? 0;
  if (how % 3 === 1 && k > 1) rows[k - 1] = rows[0]!.slice();
  if (how % 3 === 2 && n > 0) for (const row of rows) row[how % n] = zero;
}

describe('pluckerResiduesModP: residues in an Int32Array', () => {
  for (const p of [2n, 3n, 7n, 65521n, 2147483587n, 2147483629n, 2n ** 31n - 1n]) {
    const F = primeField(p) as Field<number>;
    const generic: Field<number> = { ...F };
    const q = Number(p);
    const element = fc.oneof(
      { arbitrary: fc.constant(0), weight: 2 },
      { arbitrary: fc.constantFrom(q - 1, Math.max(0, q - 2), 1 % q), weight: 2 },
      { arbitrary: fc.integer({ min: 0, max: q - 1 }), weight: 4 },
    );
    test(`GF(${p}): equal to the generic walk, to pluckerCoordinates and to mathjs det mod p`, () => {
      for (const [k, n] of SHAPES) {
        fc.assert(
          fc.property(matrixOf(element, k, n), fc.nat(), (rows, how) => {
            damage(rows, 0, how);
            const residues = pluckerResiduesModP(F, rows, n);
            assert.ok(residues instanceof Int32Array);
            const expected = pluckerCoordinates(generic, rows, n);
            assert.deepEqual(Array.from(residues), expected, `GF(${p}) ${k}×${n} against the generic walk`);
            assert.deepEqual(Array.from(residues), pluckerCoordinates(F, rows, n), `GF(${p}) ${k}×${n} against pluckerCoordinates`);
            const subsets = bruteSubsets(n, k);
            for (let r = 0; r < subsets.length; r += mathjsStep(subsets.length)) {
              const exact = mathjsDeterminant(columnsOf(rows, subsets[r]!).map((row) => row.map((x) => rational(BigInt(x)))));
              assert.equal(residues[r], F.fromBigInt(exact.num), `mathjs det mod ${p}, columns ${subsets[r]}`);
            }
          }),
          { numRuns: k * n > 40 ? 3 : 8, seed: 20261202 + k * 100 + n },
        );
      }
    });
  }

  test('k = 0 gives [1], k > n gives nothing, and fields other than GF(p < 2^31) are refused', () => {
    const F = primeField(101n) as Field<number>;
    assert.deepEqual(Array.from(pluckerResiduesModP(F, [], 4)), [1]);
    assert.deepEqual(Array.from(pluckerResiduesModP(F, [[1], [2]], 1)), []);
    assert.throws(() => pluckerResiduesModP(QQ as unknown as Field<number>, [[1, 2]], 2), RangeError);
    assert.throws(() => pluckerResiduesModP(primeField(2n ** 61n - 1n) as unknown as Field<number>, [[1, 2]], 2), RangeError);
    assert.throws(() => pluckerResiduesModP(F, [[1, 2], [3]], 2), RangeError);
  });
});

const small = fc.integer({ min: -9, max: 9 }).map((x) => rational(BigInt(x)));
const fraction = fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: 1, max: 12 })).map(([a, b]) => rational(BigInt(a), BigInt(b)));
const wide = fc.bigInt({ min: -(2n ** 40n), max: 2n ** 40n }).map((x) => rational(x));
const huge = fc.bigInt({ min: -(2n ** 64n), max: 2n ** 64n }).map((x) => rational(x));

function assertSame(a: readonly Rational[], b: readonly Rational[], what: string): void {
  assert.equal(a.length, b.length, what);
  a.forEach((x, i) => assert.ok(QQ.eq(x, b[i]!), `${what}: coordinate ${i} is ${x.num}/${x.den}, expected ${b[i]!.num}/${b[i]!.den}`));
}

describe('pluckerCoordinatesScaled: numerators over one denominator', () => {
  for (const [label, entry] of [
    ['small integers', small],
    ['fractions', fraction],
    ['41-bit integers', wide],
    ['65-bit integers', huge],
  ] as const) {
    test(`${label}: equal to pluckerCoordinates, the fraction-free walk and mathjs`, () => {
      for (const [k, n] of SHAPES) {
        fc.assert(
          fc.property(matrixOf(entry, k, n), fc.nat(), (rows, how) => {
            damage(rows, QQ.zero, how);
            const scaled = pluckerCoordinatesScaled(rows, n);
            assert.ok(scaled.denominator > 0n);
            const count = scaled.numerators.length;
            const coordinates = Array.from({ length: count }, (_, r) => scaledCoordinate(scaled, r));
            // Every numerator held as a double must be a safe integer, so that it is exact.
            if (scaled.numerators instanceof Float64Array) scaled.numerators.forEach((m) => assert.ok(Number.isSafeInteger(m)));
            // The numerator over the denominator, reduced by hand, is the coordinate.
            scaled.numerators.forEach((m: number | bigint, r: number) => {
              assert.ok(QQ.eq(coordinates[r]!, rational(BigInt(m), scaled.denominator)), `coordinate ${r} in lowest terms`);
            });
            assertSame(coordinates, pluckerCoordinates(QQ, rows, n), `${label} ${k}×${n} against pluckerCoordinates`);
            if (k >= 1) assertSame(coordinates, pluckerFractionFree(rows, n), `${label} ${k}×${n} against the fraction-free walk`);
            const subsets = bruteSubsets(n, k);
            for (let r = 0; r < subsets.length; r += mathjsStep(subsets.length)) {
              assert.ok(QQ.eq(coordinates[r]!, mathjsDeterminant(columnsOf(rows, subsets[r]!))), `mathjs, columns ${subsets[r]}`);
            }
          }),
          { numRuns: k * n > 40 ? 3 : 8, seed: 20261203 + k * 100 + n },
        );
      }
    });
  }

  test('small integer entries from four rows on come as doubles, with denominator 1', () => {
    const rows = [0, 1, 2, 3, 4].map((i) => Array.from({ length: 9 }, (_, j) => rational(BigInt(((i * 7 + j * j * 3) % 19) - 9))));
    const scaled = pluckerCoordinatesScaled(rows, 9);
    assert.ok(scaled.numerators instanceof Float64Array);
    assert.equal(scaled.denominator, 1n);
    bruteSubsets(9, 5).forEach((cols, r) => assert.equal(BigInt(scaled.numerators[r]!), mathjsDeterminant(columnsOf(rows, cols)).num));
  });

  test('k = 0 and k > n', () => {
    const zero = pluckerCoordinatesScaled([], 3);
    assert.deepEqual([zero.numerators.length, scaledCoordinate(zero, 0)], [1, QQ.one]);
    assert.equal(pluckerCoordinatesScaled([[QQ.one], [QQ.one]], 1).numerators.length, 0);
  });
});
