/**
 * Affine charts of the Grassmannian round-trip: a k-subspace W with
 * p_I(W) ≠ 0 has exactly one basis with the identity in the columns I, and
 * rebuilding the matrix [I | Y] from the chart coordinates Y gives back W
 * (the standard affine charts of G(k, n), e.g. Harris, Algebraic Geometry: A
 * First Course, Lecture 6 — from memory). Minors are computed by cofactor
 * expansion and row spaces compared by this test's own elimination.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { chartCoordinates, chartMatrix } from '../../server/src/engine/chart.js';
import { FIELD_CASES, shapedMatrix } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { cofactorDeterminant, columnsOf, sameRowSpace, subsetsOf } from './reference-algebra.js';

describe('chart coordinates round-trip', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;

    /** A matrix with a column set I of nonzero minor, listed in a random order (the order the identity is laid out). */
    const inChart = shapedMatrix(c, 1)
      .map(({ n, k, rows }) => ({ n, k, rows, nonzero: subsetsOf(n, k).filter((I) => !F.isZero(cofactorDeterminant(F, columnsOf(rows, I)))) }))
      .filter(({ nonzero }) => nonzero.length > 0)
      .chain((m) =>
        fc
          .tuple(fc.nat({ max: m.nonzero.length - 1 }), fc.shuffledSubarray(m.nonzero[0]!.map((_, i) => i), { minLength: m.k, maxLength: m.k }))
          .map(([which, order]) => ({ ...m, columns: order.map((i) => m.nonzero[which]![i]!) })),
      );

    test(`${c.label}: chart of W at a nonzero index set, then [I | Y], gives W again`, () => {
      fc.assert(
        fc.property(inChart, ({ n, k, rows, columns }) => {
          const chart = chartCoordinates(F, rows, n, columns);
          assert.ok(chart.ok, 'the minor is nonzero, so W lies in the chart');
          if (!chart.ok) return;
          assert.equal(chart.block.length, k);
          chart.block.forEach((row) => assert.equal(row.length, n - k));
          const rebuilt = chartMatrix(F, n, columns, chart.block);
          // Row i of [I | Y] has 1 in columns[i] and 0 in the other chart columns.
          rebuilt.forEach((row, i) => columns.forEach((col, j) => assert.ok(F.eq(row[col]!, i === j ? F.one : F.zero))));
          assert.ok(sameRowSpace(F, rebuilt, rows, n), '[I | Y] spans another subspace');
          assert.ok(sameRowSpace(F, chart.full, rows, n));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: an index set with zero minor is outside the chart`, () => {
      const outside = shapedMatrix(c, 1)
        .map(({ n, k, rows }) => ({ n, k, rows, zero: subsetsOf(n, k).filter((I) => F.isZero(cofactorDeterminant(F, columnsOf(rows, I)))) }))
        .filter(({ zero }) => zero.length > 0)
        .chain((m) => fc.nat({ max: m.zero.length - 1 }).map((i) => ({ ...m, columns: m.zero[i]! })));
      fc.assert(
        fc.property(outside, ({ n, rows, columns }) => {
          assert.equal(chartCoordinates(F, rows, n, columns).ok, false);
        }),
        propertyParameters(),
      );
    });
  }
});
