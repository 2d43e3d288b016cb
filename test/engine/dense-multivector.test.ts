/**
 * A multivector made by `fromDense` keeps its coefficients and builds its map
 * of terms only when `terms` is read. These tests hold it to the map it stands
 * for, built here from the definition (one term per nonzero coefficient, keyed
 * by its subset, in lexicographic order): every operation must answer the
 * same on both, before and after the map is built, and the built object must
 * be indistinguishable from one that had the map from the start. The
 * agreement is common practice, no source: the two are one mathematical
 * object in two representations.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import {
  add,
  coefficient,
  equalsMV,
  fromDense,
  isZeroMV,
  neg,
  scale,
  sortedTerms,
  supportColumns,
  toDense,
  wedge,
  type Multivector,
  type MultivectorTerm,
} from '../../server/src/engine/multivector.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { subsetKey } from '../../server/src/engine/subsets.js';
import { EXTERIOR_CASES, QQ_EXTERIOR, bruteSubsets, matrixOf, type ExteriorCase } from './exterior-arbitraries.js';

/** The multivector with the coefficients `values` as a plain object holding its map, from the definition. */
function mapBacked<T>(c: ExteriorCase, n: number, k: number, values: readonly T[]): Multivector<T> {
  const terms = new Map<string, MultivectorTerm<T>>();
  bruteSubsets(n, k).forEach((subset, rank) => {
    const coeff = values[rank]!;
    if (!c.F.isZero(coeff)) terms.set(subsetKey(subset), { subset, coeff });
  });
  return { n, k, terms };
}

/** A shape (n, k) with 0 ≤ k ≤ n ≤ 6 and C(n, k) coefficients, zero often. */
function denseCoefficients(c: ExteriorCase) {
  return fc
    .integer({ min: 0, max: 6 })
    .chain((n) => fc.integer({ min: 0, max: n }).map((k) => ({ n, k })))
    .chain(({ n, k }) =>
      fc
        .constantFrom('all zero' as const, 'random' as const)
        .chain((kind) => {
          const count = bruteSubsets(n, k).length;
          const values = kind === 'all zero' ? fc.constant(new Array(count).fill(c.F.zero)) : fc.array(c.element, { minLength: count, maxLength: count });
          return values.map((v) => ({ n, k, values: v }));
        }),
    );
}

/** Index lists of length k in any order, with repeats and with indices outside [0, n). */
function indexLists(n: number, k: number) {
  return fc.array(fc.array(fc.integer({ min: -1, max: n }), { minLength: k, maxLength: k }), { maxLength: 8 });
}

/** Every question the engine's operations ask of a multivector, answered for the pair (dense, map). */
function assertSameAnswers<T>(c: ExteriorCase, dense: Multivector<T>, reference: Multivector<T>, indices: readonly number[][]): void {
  const { F } = c;
  assert.deepStrictEqual(toDense(F, dense), toDense(F, reference));
  assert.equal(isZeroMV(dense), isZeroMV(reference));
  for (const list of indices) assert.deepStrictEqual(coefficient(F, dense, list), coefficient(F, reference, list), `coefficient of [${list}]`);
  assert.ok(equalsMV(F, dense, reference));
  assert.ok(equalsMV(F, reference, dense));
  assert.ok(equalsMV(F, dense, dense));
}

describe('a multivector made from its coefficients answers as its map of terms', () => {
  for (const c of EXTERIOR_CASES) {
    test(`${c.F.name}: random coefficients, before and after the map is built (fast-check)`, () => {
      fc.assert(
        fc.property(
          denseCoefficients(c).chain((shape) => indexLists(shape.n, shape.k).map((indices) => ({ ...shape, indices }))),
          ({ n, k, values, indices }) => {
            const reference = mapBacked(c, n, k, values);
            const dense = fromDense(c.F, n, k, values);
            // First without reading `terms` (the kept coefficients answer), then after reading it.
            assertSameAnswers(c, dense, reference, indices);
            assert.deepStrictEqual(dense.terms, reference.terms);
            assertSameAnswers(c, dense, reference, indices);
            // Once built, the object is an ordinary one: same keys in the same order, same values.
            assert.deepStrictEqual(Object.keys(dense), ['n', 'k', 'terms']);
            assert.deepStrictEqual(dense, reference);
            assert.deepStrictEqual(structuredClone(dense), reference);
          },
        ),
        { numRuns: 60 },
      );
    });
  }

  test('QQ: the Plücker vectors of random matrices, through every operation (fast-check)', () => {
    const c = QQ_EXTERIOR;
    const F = c.F;
    const shape = fc.integer({ min: 1, max: 6 }).chain((n) => fc.integer({ min: 1, max: Math.min(3, n) }).map((k) => ({ n, k })));
    fc.assert(
      fc.property(
        shape.chain(({ n, k }) => fc.tuple(matrixOf(c.element, k, n), matrixOf(c.element, k, n), matrixOf(c.element, 1, n), c.element).map(([a, b, v, s]) => ({ n, k, a, b, v, s }))),
        ({ n, k, a, b, v, s }) => {
          const pa = pluckerCoordinates(F, a, n);
          const pb = pluckerCoordinates(F, b, n);
          const pv = pluckerCoordinates(F, v, n);
          const denseA = fromDense(F, n, k, pa);
          const denseB = fromDense(F, n, k, pb);
          const denseV = fromDense(F, n, 1, pv);
          const mapA = mapBacked(c, n, k, pa);
          const mapB = mapBacked(c, n, k, pb);
          const mapV = mapBacked(c, n, 1, pv);
          const same = (x: Multivector<unknown>, y: Multivector<unknown>) => {
            assert.ok(equalsMV(F, x, y));
            assert.deepStrictEqual(toDense(F, x), toDense(F, y));
          };
          same(add(F, denseA, denseB), add(F, mapA, mapB));
          same(scale(F, s, denseA), scale(F, s, mapA));
          same(neg(F, denseA), neg(F, mapA));
          same(wedge(F, denseA, denseV), wedge(F, mapA, mapV));
          assert.deepStrictEqual(sortedTerms(denseA), sortedTerms(mapA));
          assert.deepStrictEqual(supportColumns(denseA), supportColumns(mapA));
          assert.equal(equalsMV(F, denseA, denseB), equalsMV(F, mapA, mapB));
        },
      ),
      { numRuns: 80 },
    );
  });

  test('neither the caller’s array nor the array toDense returns can change the multivector (common practice, no source)', () => {
    const F = QQ_EXTERIOR.F;
    const values = [F.one, F.zero, F.neg(F.one), F.one, F.zero, F.one];
    const mv = fromDense(F, 4, 2, values);
    const before = toDense(F, mv);
    values[0] = F.zero;
    const out = toDense(F, mv);
    out[1] = F.one;
    assert.deepStrictEqual(toDense(F, mv), before);
    assert.notEqual(toDense(F, mv), toDense(F, mv));
  });

  test('a degree above the dimension has no coefficients and no terms', () => {
    const F = QQ_EXTERIOR.F;
    const mv = fromDense(F, 2, 3, []);
    assert.deepStrictEqual(toDense(F, mv), []);
    assert.ok(isZeroMV(mv));
    assert.equal(mv.terms.size, 0);
    assert.deepStrictEqual(coefficient(F, mv, [0, 1, 1]), F.zero);
  });
});
