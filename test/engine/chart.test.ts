import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { chartCoordinates, chartMatrix } from '../../server/src/engine/chart.js';
import { rowSpaceEquals } from '../../server/src/engine/matrix.js';
import { projectivelyEqual } from '../../server/src/engine/normalize.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { QQ } from '../../server/src/engine/rational.js';
import { rankLex } from '../../server/src/engine/subsets.js';
import { EXTERIOR_CASES, bruteSubsets, mathjsDeterminant, columnsOf, shapedMatrix } from './exterior-arbitraries.js';

const q = (n: number) => QQ.fromBigInt(BigInt(n));

describe('affine charts of the Grassmannian', () => {
  test('round trip: for every I with p_I ≠ 0, [identity in I | block] spans W and has Plücker vector p(W)/p_I (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 4, 6), ({ n, k, rows }) => {
          const p = pluckerCoordinates(F, rows, n);
          for (const I of bruteSubsets(n, k)) {
            const pI = p[rankLex(I, n)];
            const chart = chartCoordinates(F, rows, n, I);
            if (F.isZero(pI)) {
              assert.equal(chart.ok, false, `p_${I} = 0 must be outside the chart`);
              continue;
            }
            assert.ok(chart.ok, `p_${I} ≠ 0 must be inside the chart`);
            if (!chart.ok) continue;
            assert.equal(chart.block.length, k);
            assert.deepEqual(chart.otherColumns, [...Array(n).keys()].filter((x) => !I.includes(x)));
            // The identity sits in the chart columns.
            I.forEach((col, i) => {
              for (let r = 0; r < k; r++) assert.ok(r === i ? F.isOne(chart.full[r]![col]) : F.isZero(chart.full[r]![col]));
            });
            assert.ok(rowSpaceEquals(F, chart.full, rows, n));
            const own = pluckerCoordinates(F, chart.full, n);
            assert.ok(F.isOne(own[rankLex(I, n)]));
            assert.ok(projectivelyEqual(F, own, p));
            // p(full) = p(W) / p_I exactly, coordinate by coordinate.
            own.forEach((x, r) => assert.ok(F.eq(F.mul(x, pI), p[r])));
            // The inverse map rebuilds the same matrix from the block.
            const rebuilt = chartMatrix(F, n, I, chart.block);
            rebuilt.forEach((row, r) => row.forEach((x, j) => assert.ok(F.eq(x, chart.full[r]![j]))));
          }
        }),
        { numRuns: 30 },
      );
    }
  });

  test('a worked 2×4 example checked with mathjs: block entries are ratios of minors (Cramer’s rule; mathjs det as reference)', () => {
    const rows = [
      [1, 2, 3, 4],
      [5, 6, 7, 9],
    ].map((r) => r.map(q));
    const chart = chartCoordinates(QQ, rows, 4, [1, 3]);
    assert.ok(chart.ok);
    if (!chart.ok) return;
    // Row i of the chart basis is Σ_r (M^{-1})_{ir} row_r with M the columns [1, 3]; by Cramer's rule the
    // entry in column j of row i is det(M with column i replaced by column j) / det(M).
    const det = mathjsDeterminant(columnsOf(rows, [1, 3]));
    for (const [i, j] of [
      [0, 0],
      [0, 2],
      [1, 0],
      [1, 2],
    ] as const) {
      const cols = [1, 3];
      cols[i] = j;
      const expected = QQ.div(mathjsDeterminant(columnsOf(rows, cols)), det);
      assert.ok(QQ.eq(chart.full[i]![j]!, expected), `entry (${i}, ${j})`);
    }
  });

  test('columns in any order lay the identity out in that order (common practice, no source)', () => {
    const rows = [
      [2, 0, 1],
      [1, 1, 0],
    ].map((r) => r.map(q));
    const chart = chartCoordinates(QQ, rows, 3, [2, 0]);
    assert.ok(chart.ok);
    if (!chart.ok) return;
    assert.ok(QQ.isOne(chart.full[0]![2]!) && QQ.isZero(chart.full[0]![0]!));
    assert.ok(QQ.isOne(chart.full[1]![0]!) && QQ.isZero(chart.full[1]![2]!));
    assert.ok(rowSpaceEquals(QQ, chart.full, rows, 3));
  });

  test('p_I = 0 (or dependent rows) gives ok: false; bad column lists are refused', () => {
    const rows = [
      [1, 1, 0, 0],
      [2, 2, 0, 1],
    ].map((r) => r.map(q));
    const out = chartCoordinates(QQ, rows, 4, [0, 1]);
    assert.equal(out.ok, false);
    if (!out.ok) assert.ok(QQ.isZero(out.minor));
    const dependent = [
      [1, 2, 3],
      [2, 4, 6],
    ].map((r) => r.map(q));
    assert.equal(chartCoordinates(QQ, dependent, 3, [0, 2]).ok, false);
    assert.throws(() => chartCoordinates(QQ, rows, 4, [0, 0]), RangeError);
    assert.throws(() => chartCoordinates(QQ, rows, 4, [0]), RangeError);
    assert.throws(() => chartCoordinates(QQ, rows, 4, [0, 4]), RangeError);
  });
});
