import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { pluckerCoordinates, pluckerCoordinatesScaled, scaledCoordinate } from '../../server/src/engine/plucker.js';
import { pluckerFractionFree } from '../../server/src/engine/plucker-fraction-free.js';
import { MULTIMODULAR_PRIME_LIMIT, hadamardBoundSquared, pluckerMultimodular, primesNeeded } from '../../server/src/engine/plucker-multimodular.js';
import { primeField, smallPrimeModulus } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { bruteSubsets, columnsOf, matrixOf, mathjsDeterminant } from './exterior-arbitraries.js';

// The fast paths of pluckerCoordinates are checked against the generic walk through the Field interface
// (reached with a copy of the field, which the fast paths do not recognise), against the fraction-free
// bigint walk, and against mathjs determinants (an independent reference library).

const SHAPES: [number, number][] = [
  [1, 5],
  [2, 6],
  [3, 7],
  [4, 4],
  [4, 8],
  [5, 5],
  [5, 9],
  [6, 10],
  [7, 9],
  [8, 11],
];

/** mathjs checks every `step`-th coordinate (all of them for small shapes), so that the suite stays quick. */
function mathjsStep(count: number): number {
  return Math.max(1, Math.floor(count / 40));
}

describe('GF(p), p < 2^31: the typed-array walk against the generic walk and mathjs', () => {
  for (const p of [2n, 3n, 7n, 65521n, 2147483629n, 2n ** 31n - 1n]) {
    const F = primeField(p) as Field<number>;
    const generic: Field<number> = { ...F };
    const q = Number(p);
    // Zeros (so that subtrees are skipped), the largest residues and random ones.
    const element = fc.oneof(
      { arbitrary: fc.constant(0), weight: 2 },
      { arbitrary: fc.constantFrom(q - 1, Math.max(0, q - 2), 1), weight: 2 },
      { arbitrary: fc.integer({ min: 0, max: q - 1 }), weight: 3 },
    );
    test(`GF(${p}): the fast path is taken, and agrees on random, extreme and rank-deficient matrices`, () => {
      assert.equal(smallPrimeModulus(F), q);
      assert.equal(smallPrimeModulus(generic), undefined);
      for (const [k, n] of SHAPES) {
        fc.assert(
          fc.property(matrixOf(element, k, n), fc.nat(k - 1), (rows, repeat) => {
            // Half of the matrices get a repeated row, so that their rank drops.
            if (repeat % 2 === 1 && k > 1) rows[k - 1] = rows[0]!.slice();
            const fast = pluckerCoordinates(F, rows, n);
            assert.deepEqual(fast, pluckerCoordinates(generic, rows, n), `GF(${p}) ${k}×${n}`);
            const subsets = bruteSubsets(n, k);
            for (let r = 0; r < subsets.length; r += mathjsStep(subsets.length)) {
              const exact = mathjsDeterminant(columnsOf(rows, subsets[r]!).map((row) => row.map((x) => rational(BigInt(x)))));
              assert.equal(fast[r], F.fromBigInt(exact.num), `mathjs det mod ${p}, columns ${subsets[r]}`);
            }
          }),
          { numRuns: k * n > 40 ? 4 : 12 },
        );
      }
    });

    test(`GF(${p}): every entry p − 1 (all rows equal, rank 1) and p − 1 on an identity pattern`, () => {
      for (const [k, n] of SHAPES) {
        const equal = Array.from({ length: k }, () => new Array<number>(n).fill(q - 1));
        assert.deepEqual(pluckerCoordinates(F, equal, n), pluckerCoordinates(generic, equal, n));
        const pattern = Array.from({ length: k }, (_, i) => Array.from({ length: n }, (_, j) => (j === i || j >= k ? q - 1 : 0)));
        assert.deepEqual(pluckerCoordinates(F, pattern, n), pluckerCoordinates(generic, pattern, n));
      }
    });
  }
});

const small = fc.integer({ min: -9, max: 9 }).map((x) => rational(BigInt(x)));
const fraction = fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: 1, max: 12 })).map(([a, b]) => rational(BigInt(a), BigInt(b)));
const wide = fc.bigInt({ min: -(2n ** 40n), max: 2n ** 40n }).map((x) => rational(x));
const sparse = fc.oneof({ arbitrary: fc.constant(QQ.zero), weight: 3 }, { arbitrary: small, weight: 1 });

function assertSame(a: readonly Rational[], b: readonly Rational[], what: string): void {
  assert.equal(a.length, b.length, what);
  a.forEach((x, i) => assert.ok(QQ.eq(x, b[i]!), `${what}: coordinate ${i} is ${x.num}/${x.den}, expected ${b[i]!.num}/${b[i]!.den}`));
}

describe('QQ: the multimodular path against the fraction-free walk and mathjs', () => {
  for (const [label, entry] of [
    ['small integers', small],
    ['fractions', fraction],
    ['41-bit integers', wide],
    ['sparse', sparse],
  ] as const) {
    test(`${label}: pluckerCoordinates, the fraction-free walk and mathjs agree`, () => {
      for (const [k, n] of SHAPES) {
        fc.assert(
          fc.property(matrixOf(entry, k, n), (rows) => {
            const ours = pluckerCoordinates(QQ, rows, n);
            assertSame(ours, pluckerFractionFree(rows, n), `${label} ${k}×${n} against the fraction-free walk`);
            const subsets = bruteSubsets(n, k);
            for (let r = 0; r < subsets.length; r += mathjsStep(subsets.length)) {
              assert.ok(QQ.eq(ours[r]!, mathjsDeterminant(columnsOf(rows, subsets[r]!))), `mathjs, columns ${subsets[r]}`);
            }
          }),
          { numRuns: k * n > 40 ? 3 : 10 },
        );
      }
    });
  }

  test('any number of primes: the general reconstruction agrees with the fraction-free walk (limit lifted)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }).chain((k) => matrixOf(fc.bigInt({ min: -(2n ** 70n), max: 2n ** 70n }).map((x) => rational(x)), k, k + 3)),
        (rows) => {
          const n = rows[0]!.length;
          const ours = pluckerMultimodular(rows, n, undefined, 1000);
          assert.ok(ours !== undefined);
          assertSame(ours, pluckerFractionFree(rows, n), `${rows.length}×${n}, 71-bit entries`);
        },
      ),
      { numRuns: 25 },
    );
  });

  test('beyond the prime limit the multimodular path declines and pluckerCoordinates falls back (mathjs det)', () => {
    const rows = [0, 1, 2, 3].map((i) => Array.from({ length: 7 }, (_, j) => rational(2n ** 92n + BigInt(31 * i + 7 * j * j) - 2n ** 91n * BigInt(j % 3))));
    assert.ok(primesNeeded(hadamardBoundSquared(rows.map((r) => r.map((x) => x.num)))) > MULTIMODULAR_PRIME_LIMIT);
    assert.equal(pluckerMultimodular(rows, 7), undefined);
    const ours = pluckerCoordinates(QQ, rows, 7);
    bruteSubsets(7, 4).forEach((cols, r) => assert.ok(QQ.eq(ours[r]!, mathjsDeterminant(columnsOf(rows, cols)))));
  });
});

/**
 * Sylvester's Hadamard matrix of order 2^m (entries ±1, rows orthogonal), so that |det| = k^{k/2} meets
 * Hadamard's bound with equality (Sylvester 1867; Hadamard 1893 — textbook facts, from memory).
 */
function sylvester(m: number): bigint[][] {
  let h: bigint[][] = [[1n]];
  for (let i = 0; i < m; i++) h = [...h.map((r) => [...r, ...r]), ...h.map((r) => [...r, ...r.map((x) => -x)])];
  return h;
}

describe('QQ: minors exactly at Hadamard’s bound, at each switch of the reconstruction', () => {
  // c·H_k with two zero columns beside it: the row lengths are c·√k, so the minor on the first k columns is
  // ±c^k·k^{k/2} = the bound itself. The scales put the bound just below and just above the places where
  // the reconstruction changes: one prime (2H < p), two primes on numbers (H < 2^52), two primes on
  // bigints, and three primes (2H close to the product of two primes).
  const cases: [number, bigint][] = [
    [1, 23170n],
    [1, 23171n],
    [2, 4095n],
    [2, 4096n],
    [2, 19483n],
    [2, 19484n],
    [3, 181n],
    [3, 2n ** 20n],
  ];
  for (const [m, c] of cases) {
    const k = 2 ** m;
    test(`k = ${k}, scale ${c}: |p_{1..k}| = c^k·k^{k/2}, and every coordinate matches the fraction-free walk`, () => {
      const integers = sylvester(m).map((row, i) => [...row.map((x) => x * c * (i % 3 === 1 ? -1n : 1n)), 0n, 0n]);
      const rows = integers.map((row) => row.map((x) => rational(x)));
      const n = k + 2;
      const ours = pluckerCoordinates(QQ, rows, n);
      const bound = c ** BigInt(k) * BigInt(k) ** BigInt(k / 2);
      assert.equal(hadamardBoundSquared(integers), bound * bound);
      const first = ours[0]!;
      assert.equal(first.num < 0n ? -first.num : first.num, bound);
      const reference = pluckerFractionFree(rows, n);
      assertSame(ours, reference, `k = ${k}, scale ${c}`);
      // The compact result too: doubles below 2^52, bigints above, at each switch.
      const scaled = pluckerCoordinatesScaled(rows, n);
      assertSame(Array.from({ length: ours.length }, (_, r) => scaledCoordinate(scaled, r)), reference, `k = ${k}, scale ${c}, scaled`);
      if (scaled.numerators instanceof Float64Array) assert.ok(bound < 2n ** 53n);
      // The multimodular path itself, whichever method pluckerCoordinates chose for this shape.
      const modular = pluckerMultimodular(rows, n, undefined, 1000);
      assert.ok(modular !== undefined);
      assertSame(modular, reference, `k = ${k}, scale ${c}, multimodular`);
      // Permuted columns give the other signs; they must still agree.
      const permuted = rows.map((row) => [row[n - 1]!, ...row.slice(0, n - 1)].reverse());
      assertSame(pluckerCoordinates(QQ, permuted, n), pluckerFractionFree(permuted, n), `k = ${k}, scale ${c}, permuted`);
    });
  }
});
