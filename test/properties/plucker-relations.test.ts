/**
 * Plücker vectors of random subspaces satisfy every quadratic Plücker
 * relation, evaluated here from the coordinates alone and independently of
 * the engine's decomposability code:
 *
 *   Σ_{t=0..k} (−1)^t · p(i_1, …, i_{k−1}, j_t) · p(j_0, …, ĵ_t, …, j_k) = 0
 *
 * for every (k−1)-set I and (k+1)-set J, with p of an index list the
 * alternating coordinate (Griffiths–Harris, Principles of Algebraic Geometry,
 * Ch. 1 §5; Harris, Algebraic Geometry: A First Course, Lecture 6 — from
 * memory). The coordinates themselves are checked against the definition: the
 * maximal minors of the basis matrix, by cofactor expansion.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { QQ } from '../../server/src/engine/rational.js';
import { FIELD_CASES, shapedMatrix } from './field-cases.js';
import { propertyParameters } from './run-parameters.js';
import { alternatingCoordinate, minorsOf, subsetsOf } from './reference-algebra.js';

/** The value of the quadratic relation for the (k−1)-set `left` and the (k+1)-set `right`. */
function relationValue<T>(F: Field<T>, p: readonly T[], n: number, left: readonly number[], right: readonly number[]): T {
  let sum = F.zero;
  right.forEach((j, t) => {
    const first = alternatingCoordinate(F, p, n, [...left, j]);
    const second = alternatingCoordinate(F, p, n, right.filter((_, s) => s !== t));
    const product = F.mul(first, second);
    sum = t % 2 === 0 ? F.add(sum, product) : F.sub(sum, product);
  });
  return sum;
}

/** Every quadratic relation of G(k, n) that does not vanish at p, as [I, J] pairs. */
function failingRelations<T>(F: Field<T>, p: readonly T[], n: number, k: number): [number[], number[]][] {
  const failing: [number[], number[]][] = [];
  if (k < 1 || k >= n) return failing;
  for (const left of subsetsOf(n, k - 1)) {
    for (const right of subsetsOf(n, k + 1)) {
      if (!F.isZero(relationValue(F, p, n, left, right))) failing.push([left, right]);
    }
  }
  return failing;
}

const q = (x: number) => QQ.fromBigInt(BigInt(x));

describe('the relation evaluator of this test agrees with the textbook', () => {
  test('for G(2,4) the one relation is p12·p34 − p13·p24 + p14·p23 (Harris, Lecture 6 — from memory)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -9, max: 9 }), { minLength: 6, maxLength: 6 }), (values) => {
        const p = values.map(q);
        const [p12, p13, p14, p23, p24, p34] = p;
        const textbook = QQ.add(QQ.sub(QQ.mul(p12!, p34!), QQ.mul(p13!, p24!)), QQ.mul(p14!, p23!));
        // I = {1}, J = {2, 3, 4} in 1-based labels: p(1,2)p(3,4) − p(1,3)p(2,4) + p(1,4)p(2,3).
        assert.ok(QQ.eq(relationValue(QQ, p, 4, [0], [1, 2, 3]), textbook));
      }),
      propertyParameters(),
    );
  });

  test('e1∧e2 + e3∧e4 fails a relation: the standard 2-form that is no wedge of two vectors', () => {
    // Lexicographic order p12 p13 p14 p23 p24 p34.
    const p = [1, 0, 0, 0, 0, 1].map(q);
    assert.ok(failingRelations(QQ, p, 4, 2).length > 0);
  });
});

describe('Plücker vectors of random subspaces', () => {
  for (const c of FIELD_CASES) {
    const { F } = c;

    test(`${c.label}: the coordinates are the maximal minors of the basis (the definition)`, () => {
      fc.assert(
        fc.property(shapedMatrix(c), ({ n, rows }) => {
          const engine = pluckerCoordinates(F, rows, n);
          const reference = minorsOf(F, rows, n);
          assert.equal(engine.length, reference.length);
          engine.forEach((x, i) => assert.ok(F.eq(x, reference[i]!), `coordinate ${i}: ${F.format(x)} ≠ ${F.format(reference[i]!)}`));
        }),
        propertyParameters(),
      );
    });

    test(`${c.label}: every quadratic Plücker relation vanishes on them`, () => {
      fc.assert(
        fc.property(shapedMatrix(c, 1), ({ n, k, rows }) => {
          const p = pluckerCoordinates(F, rows, n);
          assert.deepEqual(failingRelations(F, p, n, k), []);
        }),
        propertyParameters(),
      );
    });
  }
});
