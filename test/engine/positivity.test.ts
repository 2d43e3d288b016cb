import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { cyclicShift, positivityOf, UnorderedFieldError } from '../../server/src/engine/positivity.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { bruteSubsets, columnsOf, mathjsDeterminant } from './exterior-arbitraries.js';
import { matrixOf } from './linear-arbitraries.js';

function overQQ(m: readonly (readonly number[])[]): Rational[][] {
  return m.map((row) => row.map((x) => rational(BigInt(x))));
}

/** The maximal minors in lexicographic order of column sets, each a mathjs determinant (independent reference library). */
function mathjsMinors(rows: readonly (readonly Rational[])[], n: number): Rational[] {
  return bruteSubsets(n, rows.length).map((cols) => mathjsDeterminant(columnsOf(rows, cols)));
}

/** The k×n matrix with rows t_j^i (i = 0..k−1) at the given nodes. */
function vandermonde(k: number, nodes: readonly Rational[]): Rational[][] {
  return Array.from({ length: k }, (_, i) => nodes.map((t) => Array.from({ length: i }).reduce<Rational>((acc) => QQ.mul(acc, t), QQ.one)));
}

/**
 * A k×n matrix that is totally nonnegative in the classical sense (every minor ≥ 0): [I_k | 0] times
 * elementary bidiagonal matrices I + t·E_{i,i+1} and I + t·E_{i+1,i} with t ≥ 0. Each factor has only
 * nonnegative minors and products keep that by Cauchy–Binet (e.g. Fallat–Johnson, Totally Nonnegative
 * Matrices, Ch. 2 — from memory), so all maximal minors are ≥ 0: the row space is totally nonnegative.
 * The products are formed here with plain operations, independent of the engine's matrix code.
 */
function tnnMatrix(k: number, n: number) {
  const step = fc.record({ i: fc.integer({ min: 0, max: n - 2 }), upper: fc.boolean(), t: fc.integer({ min: 0, max: 3 }) });
  return fc.array(step, { minLength: 0, maxLength: 3 * n }).map((steps) => {
    const m: Rational[][] = Array.from({ length: k }, (_, r) => Array.from({ length: n }, (_, c) => (r === c ? QQ.one : QQ.zero)));
    for (const { i, upper, t } of steps) {
      const factor = rational(BigInt(t));
      // Right multiplication by I + t·E_{i,i+1} adds t·(column i) to column i+1; the lower one adds t·(column i+1) to column i.
      const [from, to] = upper ? [i, i + 1] : [i + 1, i];
      for (const row of m) row[to] = QQ.add(row[to]!, QQ.mul(factor, row[from]!));
    }
    return m;
  });
}

/** The column set I + s modulo n, sorted. */
function shiftSet(cols: readonly number[], s: number, n: number): number[] {
  return cols.map((c) => (c + s) % n).sort((a, b) => a - b);
}

describe('total positivity from the sign pattern of the Plücker vector', () => {
  test('a Vandermonde matrix with increasing positive nodes is totally positive (Gantmacher–Krein, from memory)', () => {
    // Its maximal minors are Vandermonde determinants Π_{a<b}(t_b − t_a) > 0 (classical), checked here with mathjs.
    const nodes = [1, 2, 3, 5, 8, 13].map((t) => rational(BigInt(t)));
    for (const k of [1, 2, 3, 4]) {
      const rows = vandermonde(k, nodes);
      const p = pluckerCoordinates(QQ, rows, nodes.length);
      const reference = mathjsMinors(rows, nodes.length);
      reference.forEach((x, i) => assert.ok(QQ.eq(x, p[i]!)));
      assert.ok(reference.every((x) => x.num > 0n));
      const result = positivityOf(QQ, p);
      assert.equal(result.totallyNonnegative, true);
      assert.equal(result.totallyPositive, true);
      assert.equal(result.commonSign, 1);
      assert.ok(result.signPattern.every((s) => s === 1));
    }
  });

  test('swapping two rows negates every coordinate: still totally positive, with common sign −1', () => {
    const nodes = [1, 2, 4, 7].map((t) => rational(BigInt(t)));
    const rows = vandermonde(2, nodes).reverse();
    const p = pluckerCoordinates(QQ, rows, 4);
    const result = positivityOf(QQ, p);
    assert.equal(result.totallyPositive, true);
    assert.equal(result.commonSign, -1);
    assert.ok(result.nonnegativeRepresentative!.every((x, i) => QQ.eq(x, QQ.neg(p[i]!)) && x.num > 0n));
  });

  test('(1 1 0 0; 0 0 1 1) is totally nonnegative but not positive: p = (0, 1, 1, 1, 1, 0) (by hand)', () => {
    const p = pluckerCoordinates(QQ, overQQ([[1, 1, 0, 0], [0, 0, 1, 1]]), 4);
    const result = positivityOf(QQ, p);
    assert.deepEqual(result.signPattern, [0, 1, 1, 1, 1, 0]);
    assert.equal(result.totallyNonnegative, true);
    assert.equal(result.totallyPositive, false);
    assert.equal(result.firstZero, 0);
    assert.equal(result.mixedSigns, undefined);
  });

  test('(1 0 0 1; 0 1 1 0) has mixed signs: p = (1, 1, 0, 0, −1, −1) (by hand), first negative at p13', () => {
    const result = positivityOf(QQ, pluckerCoordinates(QQ, overQQ([[1, 0, 0, 1], [0, 1, 1, 0]]), 4));
    assert.deepEqual(result.signPattern, [1, 1, 0, 0, -1, -1]);
    assert.equal(result.totallyNonnegative, false);
    assert.equal(result.totallyPositive, false);
    assert.equal(result.commonSign, undefined);
    assert.deepEqual(result.mixedSigns, { positive: 0, negative: 4 });
  });

  test('prime fields have no signs, and the zero vector is no point', () => {
    const GF7 = primeField(7n);
    assert.throws(() => positivityOf(GF7, [1, 2, 3]), UnorderedFieldError);
    assert.throws(() => positivityOf(GF7, [1, 2, 3]), /GF\(7\)/);
    assert.throws(() => positivityOf(QQ, [QQ.zero, QQ.zero]), /zero vector/);
  });

  test('random classical TNN matrices (bidiagonal factorizations) give totally nonnegative points', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }).chain((k) => fc.integer({ min: k + 1, max: 6 }).chain((n) => tnnMatrix(k, n).map((m) => ({ m, n })))), ({ m, n }) => {
        assert.equal(positivityOf(QQ, pluckerCoordinates(QQ, m, n)).totallyNonnegative, true);
      }),
      { numRuns: 60 },
    );
  });
});

describe('the twisted cyclic shift (Postnikov, Total positivity, Grassmannians, and networks — cyclic symmetry, from memory)', () => {
  test('its minors are the original minors on the columns I + 1 mod n (mathjs determinants on both sides)', () => {
    // Column j of the shift is column j + 1; a set containing n − 1 picks the wrapped column last, which was
    // first in the original: moving it past k − 1 columns costs (−1)^(k−1), which the twist cancels.
    const entry = fc.integer({ min: -4, max: 4 }).map((x) => rational(BigInt(x)));
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((k) => fc.integer({ min: k, max: 6 }).chain((n) => matrixOf(entry, k, n).map((m) => ({ m, n, k })))),
        ({ m, n, k }) => {
          const shifted = cyclicShift(QQ, m, n, k);
          bruteSubsets(n, k).forEach((cols) => {
            const after = mathjsDeterminant(columnsOf(shifted, cols));
            const before = mathjsDeterminant(columnsOf(m, shiftSet(cols, 1, n)));
            assert.ok(QQ.eq(after, before), `columns ${cols}`);
          });
        },
      ),
      { numRuns: 60 },
    );
  });

  test('over GF(p) the same relation holds (the shift is linear; computed with the engine over GF(5))', () => {
    const GF5 = primeField(5n);
    const entry = fc.integer({ min: 0, max: 4 }).map((x) => GF5.fromBigInt(BigInt(x)));
    fc.assert(
      fc.property(matrixOf(entry, 2, 5), (m) => {
        const after = pluckerCoordinates(GF5, cyclicShift(GF5, m, 5, 2), 5);
        const before = pluckerCoordinates(GF5, m, 5);
        const sets = bruteSubsets(5, 2);
        sets.forEach((cols, i) => {
          const target = shiftSet(cols, 1, 5);
          assert.equal(after[i], before[sets.findIndex((s) => s.join() === target.join())]);
        });
      }),
      { numRuns: 40 },
    );
  });

  test('total nonnegativity and total positivity survive every shift', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 3 }).chain((k) => fc.integer({ min: k + 1, max: 6 }).chain((n) => tnnMatrix(k, n).map((m) => ({ m, n, k })))), ({ m, n, k }) => {
        let rows = m;
        const start = positivityOf(QQ, pluckerCoordinates(QQ, rows, n));
        for (let s = 0; s < n; s++) {
          rows = cyclicShift(QQ, rows, n, k);
          const now = positivityOf(QQ, pluckerCoordinates(QQ, rows, n));
          assert.equal(now.totallyNonnegative, true);
          assert.equal(now.totallyPositive, start.totallyPositive);
        }
      }),
      { numRuns: 40 },
    );
    const nodes = [1, 2, 3, 4, 6].map((t) => rational(BigInt(t)));
    let rows = vandermonde(3, nodes);
    for (let s = 0; s < 5; s++) {
      rows = cyclicShift(QQ, rows, 5, 3);
      assert.equal(positivityOf(QQ, pluckerCoordinates(QQ, rows, 5)).totallyPositive, true);
    }
  });

  test('the twist is needed for even k: (1 1 0 0; 0 0 1 1) shifted without it has mixed signs (by hand)', () => {
    // Twisted: columns (1,0), (0,1), (0,1), −(1,0) give p01 = 1, p02 = 1, p03 = 1·0 − (−1)·0 = 0, p12 = 0,
    // p13 = 0·0 − (−1)·1 = 1, p23 = 1, i.e. (1, 1, 0, 0, 1, 1), the original (0, 1, 1, 1, 1, 0) read at I + 1.
    // Untwisted: the last column is (1,0) and p13 = p23 = −1, i.e. (1, 1, 0, 0, −1, −1).
    const rows = overQQ([[1, 1, 0, 0], [0, 0, 1, 1]]);
    const shifted = cyclicShift(QQ, rows, 4, 2);
    assert.deepEqual(shifted.map((r) => r.map((x) => Number(x.num))), [[1, 0, 0, -1], [0, 1, 1, 0]]);
    assert.deepEqual(positivityOf(QQ, pluckerCoordinates(QQ, shifted, 4)).signPattern, [1, 1, 0, 0, 1, 1]);
    const untwisted = rows.map((r) => [...r.slice(1), r[0]!]);
    assert.deepEqual(positivityOf(QQ, pluckerCoordinates(QQ, untwisted, 4)).signPattern, [1, 1, 0, 0, -1, -1]);
    assert.equal(positivityOf(QQ, pluckerCoordinates(QQ, untwisted, 4)).totallyNonnegative, false);
  });

  test('n shifts give back the same point: every column is multiplied by (−1)^(k−1), the Plücker vector by (−1)^(k(k−1)) = 1', () => {
    const F: Field<Rational> = QQ;
    const rows = overQQ([[1, 2, 0, -1, 3], [0, 1, 4, 2, -2], [5, 0, 1, 1, 1]]);
    let shifted = rows;
    for (let s = 0; s < 5; s++) shifted = cyclicShift(F, shifted, 5, 3);
    assert.deepEqual(shifted, rows);
    const two = rows.slice(0, 2);
    let shiftedTwo = two;
    for (let s = 0; s < 5; s++) shiftedTwo = cyclicShift(F, shiftedTwo, 5, 2);
    assert.deepEqual(shiftedTwo, two.map((r) => r.map((x) => F.neg(x))));
    assert.deepEqual(pluckerCoordinates(F, shiftedTwo, 5), pluckerCoordinates(F, two, 5));
  });

  test('k must match the number of rows', () => {
    assert.throws(() => cyclicShift(QQ, overQQ([[1, 2]]), 2, 2), /k = 2/);
  });
});
