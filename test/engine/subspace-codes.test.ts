import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { extensionField } from '../../server/src/engine/extension-field.js';
import { enumerateSubspaces } from '../../server/src/engine/grassmannian.js';
import { identity, intersectRowSpaces, kernel, rank, rowSpaceEquals } from '../../server/src/engine/matrix.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { injectionDistance, minimumDistance, subspaceDistance } from '../../server/src/engine/subspace-codes.js';

const GF2 = primeField(2n);
const GF3 = primeField(3n);
const GF4 = extensionField(2n, 2);
const GF9 = extensionField(3n, 2);

/** The unit vector e_i of F^n. */
const e = (F: Field<any>, n: number, i: number) => Array.from({ length: n }, (_, j) => (j === i ? F.one : F.zero));

/** The block row [A | B] of two square blocks. */
const blockRows = (A: unknown[][], B: unknown[][]) => A.map((row, i) => [...row, ...B[i]!]);

describe('hand-computed distances', () => {
  test('coordinate subspaces of GF(2)^4 (common practice, no source)', () => {
    const n = 4;
    const [e0, e1, e2, e3] = [0, 1, 2, 3].map((i) => e(GF2, n, i));
    // ⟨e0, e1⟩ and ⟨e2, e3⟩ meet in 0: 2 + 2 − 0 = 4.
    assert.equal(subspaceDistance(GF2, [e0!, e1!], [e2!, e3!], n), 4);
    // ⟨e0, e1⟩ and ⟨e1, e2⟩ meet in ⟨e1⟩: 2 + 2 − 2 = 2.
    assert.equal(subspaceDistance(GF2, [e0!, e1!], [e1!, e2!], n), 2);
    // A line inside a plane: 1 + 2 − 2 = 1; injection distance 2 − 1 = 1.
    assert.equal(subspaceDistance(GF2, [e0!], [e0!, e1!], n), 1);
    assert.equal(injectionDistance(GF2, [e0!], [e0!, e1!], n), 1);
    // The zero subspace against a plane: 0 + 2 − 0 = 2.
    assert.equal(subspaceDistance(GF2, [], [e0!, e1!], n), 2);
    // Spanning rows need not be independent: ⟨e0 + e1, e0, e1⟩ = ⟨e0, e1⟩.
    assert.equal(subspaceDistance(GF2, [[1, 1, 0, 0], e0!, e1!], [e0!, e1!], n), 0);
    // The whole space and a point: 4 + 1 − 2 = 3; injection distance 4 − 1 = 3.
    assert.equal(subspaceDistance(GF2, identity(GF2, n), [e3!], n), 3);
    assert.equal(injectionDistance(GF2, identity(GF2, n), [e3!], n), 3);
  });

  test('lines of GF(4)^2: ⟨(1, a)⟩ = ⟨(a, a + 1)⟩ since a·a = a + 1, and ⟨(1, a + 1)⟩ is another line', () => {
    const a = GF4.generatorElement();
    const aPlus1 = GF4.add(a, 1);
    assert.equal(subspaceDistance(GF4, [[1, a]], [[a, aPlus1]], 2), 0);
    assert.equal(subspaceDistance(GF4, [[1, a]], [[1, aPlus1]], 2), 2);
    assert.equal(injectionDistance(GF4, [[1, a]], [[1, aPlus1]], 2), 1);
  });
});

/** A random subspace of F^n as spanning rows, possibly dependent or empty. */
function spanningRows(q: number, n: number, F: Field<any>) {
  const element = fc.integer({ min: 0, max: q - 1 }).map((i) => (F === GF2 || F === GF3 ? F.fromBigInt(BigInt(i)) : i));
  return fc.array(fc.array(element, { minLength: n, maxLength: n }), { maxLength: n + 1 });
}

describe('the subspace and injection distances are metrics', () => {
  const cases: [Field<any>, number][] = [
    [GF2, 2],
    [GF3, 3],
    [GF4, 4],
    [GF9, 9],
  ];
  for (const [F, q] of cases) {
    for (const n of [3, 5]) {
      const subspace = spanningRows(q, n, F);
      test(`${F.name}^${n}: identity, symmetry, triangle inequality (Koetter and Kschischang 2008; Silva and Kschischang 2009 — from memory)`, () => {
        fc.assert(
          fc.property(subspace, subspace, subspace, (U, V, W) => {
            for (const d of [subspaceDistance, injectionDistance]) {
              assert.equal(d(F, U, U, n), 0);
              assert.equal(d(F, U, V, n) === 0, rowSpaceEquals(F, U, V, n));
              assert.equal(d(F, U, V, n), d(F, V, U, n));
              assert.ok(d(F, U, W, n) <= d(F, U, V, n) + d(F, V, W, n));
            }
          }),
          { numRuns: 150 },
        );
      });

      test(`${F.name}^${n}: the definition through U ∩ W, d_I ≤ d_S ≤ 2·d_I, and d_S(U⊥, W⊥) = d_S(U, W) (from memory)`, () => {
        fc.assert(
          fc.property(subspace, subspace, (U, W) => {
            // The intersection comes from Zassenhaus's method in matrix.ts, not from the rank of U + W.
            const dimU = rank(F, U, n);
            const dimW = rank(F, W, n);
            const dimMeet = intersectRowSpaces(F, U, W, n).length;
            const dS = subspaceDistance(F, U, W, n);
            const dI = injectionDistance(F, U, W, n);
            assert.equal(dS, dimU + dimW - 2 * dimMeet);
            assert.equal(dI, Math.max(dimU, dimW) - dimMeet);
            assert.ok(dI <= dS && dS <= 2 * dI);
            if (dimU === dimW) assert.equal(dS, 2 * dI);
            // The orthogonal complement of a row space is the kernel of the matrix of its rows.
            assert.equal(subspaceDistance(F, kernel(F, U, n), kernel(F, W, n), n), dS);
          }),
          { numRuns: 150 },
        );
      });
    }
  }
});

describe('minimum distance of a subspace code', () => {
  test('fewer than two subspaces have none; a repeated subspace gives 0 at the first repeated pair', () => {
    assert.equal(minimumDistance(GF2, [], 3), undefined);
    assert.equal(minimumDistance(GF2, [[e(GF2, 3, 0)]], 3), undefined);
    const U = [e(GF2, 3, 0)];
    const V = [e(GF2, 3, 1)];
    assert.deepEqual(minimumDistance(GF2, [U, V, [[1, 0, 0]], V], 3), { distance: 0, pair: [0, 2] });
    assert.deepEqual(minimumDistance(GF2, [U, V, identity(GF2, 3)], 3), { distance: 2, pair: [0, 1] });
    assert.deepEqual(minimumDistance(GF2, [U, V, identity(GF2, 3)], 3, 'injection'), { distance: 1, pair: [0, 1] });
  });

  test('all 35 planes of GF(2)^4: distinct planes are at distance ≥ 2, attained by the first two listed (common practice, no source)', () => {
    const planes = enumerateSubspaces(GF2, 4, 2, 100);
    assert.equal(planes.length, 35);
    // The first two in RREF order are ⟨e0, e1⟩ and ⟨e0, e1 + e3⟩, which meet in ⟨e0⟩: 2 + 2 − 2·1 = 2.
    assert.deepEqual(planes.slice(0, 2), [
      [
        [1, 0, 0, 0],
        [0, 1, 0, 0],
      ],
      [
        [1, 0, 0, 0],
        [0, 1, 0, 1],
      ],
    ]);
    assert.deepEqual(minimumDistance(GF2, planes, 4), { distance: 2, pair: [0, 1] });
  });

  test('the spread of GF(q)^4 by 2-spaces, q = 2, 4: q^2 + 1 planes at pairwise distance 4 (Desarguesian spread; from memory)', () => {
    // The planes [I | M] for M in a field of 2×2 matrices over GF(q), and [0 | I]. Differences of distinct
    // members of the matrix field are invertible, so any two of the planes meet only in 0.
    for (const F of [GF2, GF4] as Field<any>[]) {
      const elements = F === GF2 ? [0, 1].map((i) => F.fromBigInt(BigInt(i))) : [0, 1, 2, 3];
      // x^2 + x + t is irreducible over GF(q) when it has no root; find such a t by trying every element.
      const t = elements.find((c) => elements.every((x) => !F.isZero(F.add(F.add(F.mul(x, x), x), c))))!;
      // The companion matrix C of x^2 + x + t satisfies C^2 = −C − t·I, so {u·I + v·C} is closed and a field.
      const C = [
        [F.zero, F.one],
        [F.neg(t), F.neg(F.one)],
      ];
      const I = identity(F, 2);
      const Z = [
        [F.zero, F.zero],
        [F.zero, F.zero],
      ];
      const planes: unknown[][][] = [];
      for (const u of elements) {
        for (const v of elements) {
          const M = [0, 1].map((i) => [0, 1].map((j) => F.add(F.mul(u, I[i]![j]!), F.mul(v, C[i]![j]!))));
          planes.push(blockRows(I, M));
        }
      }
      planes.push(blockRows(Z, I));
      const q = elements.length;
      assert.equal(planes.length, q * q + 1);
      assert.deepEqual(minimumDistance(F, planes, 4), { distance: 4, pair: [0, 1] });
      assert.equal(minimumDistance(F, planes, 4, 'injection')?.distance, 2);
      // A spread covers every nonzero vector once: (q^2 + 1)(q^2 − 1) = q^4 − 1.
      assert.equal(planes.length * (q * q - 1), q ** 4 - 1);
    }
  });

  test('agrees with the least pairwise distance on random codes', () => {
    const subspace = spanningRows(9, 4, GF9);
    fc.assert(
      fc.property(fc.array(subspace, { maxLength: 7 }), (code) => {
        const found = minimumDistance(GF9, code, 4);
        if (code.length < 2) return assert.equal(found, undefined);
        let best: { distance: number; pair: [number, number] } | undefined;
        for (let i = 0; i < code.length; i++) {
          for (let j = i + 1; j < code.length; j++) {
            const d = subspaceDistance(GF9, code[i]!, code[j]!, 4);
            if (best === undefined || d < best.distance) best = { distance: d, pair: [i, j] };
          }
        }
        assert.deepEqual(found, best);
      }),
      { numRuns: 100 },
    );
  });
});
