import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import {
  annihilator,
  annihilatorPlucker,
  complementSign,
  hodgeStar,
  quotientBasis,
  quotientCoordinates,
} from '../../server/src/engine/duality.js';
import { intersectRowSpaces, rank, rowSpaceEquals, sumRowSpaces } from '../../server/src/engine/matrix.js';
import { basisMV, equalsMV, fromDense, fromTerms, scale, toDense, wedge, type Multivector } from '../../server/src/engine/multivector.js';
import { projectivelyEqual } from '../../server/src/engine/normalize.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { QQ, rational } from '../../server/src/engine/rational.js';
import { EXTERIOR_CASES, bruteSubsets, inversionSign, matrixOf, shapedMatrix, termList } from './exterior-arbitraries.js';

const q = (num: number, den = 1) => rational(BigInt(num), BigInt(den));

/** u·φ for a vector and a functional, with the field operations directly. */
function pair<T>(F: Field<T>, phi: readonly T[], v: readonly T[]): T {
  return phi.reduce((acc, x, i) => F.add(acc, F.mul(x, v[i]!)), F.zero);
}

/** A full-rank k×n matrix from shapedMatrix, with rank checked by matrix.ts. */
function fullRank(c: (typeof EXTERIOR_CASES)[number], maxK: number, maxN: number) {
  return shapedMatrix(c, maxK, maxN).filter(({ k, n, rows }) => rank(c.F, rows, n) === k);
}

describe('the complement sign s(I)', () => {
  test('s(I) is the sign of the permutation (I, I^c), counted pair by pair, and equals (−1)^(ΣI − k(k+1)/2) with 1-based indices (common practice, no source)', () => {
    for (let n = 0; n <= 7; n++) {
      for (let k = 0; k <= n; k++) {
        for (const I of bruteSubsets(n, k)) {
          const rest = [...Array(n).keys()].filter((x) => !I.includes(x));
          const expected = inversionSign([...I, ...rest]);
          assert.equal(complementSign(I, n), expected, `I = ${I}, n = ${n}`);
          const oneBasedSum = I.reduce((a, x) => a + x + 1, 0);
          assert.equal((oneBasedSum - (k * (k + 1)) / 2) % 2 === 0 ? 1 : -1, expected);
        }
      }
    }
  });
});

describe('annihilators', () => {
  test('worked example: the annihilator of span(1, 2, 3) in QQ^3 is {x : x_1 + 2x_2 + 3x_3 = 0}, RREF [[1, 0, −1/3], [0, 1, −2/3]] (computed by hand)', () => {
    const ann = annihilator(QQ, [[q(1), q(2), q(3)]], 3);
    const expected = [
      [q(1), q(0), q(-1, 3)],
      [q(0), q(1), q(-2, 3)],
    ];
    assert.equal(ann.length, 2);
    ann.forEach((row, i) => row.forEach((x, j) => assert.ok(QQ.eq(x, expected[i]![j]!), `entry ${i},${j}`)));
  });

  test('every functional vanishes on W, they are independent, and there are n − dim W of them (dim W^⊥ = n − dim W; Halmos, Finite-Dimensional Vector Spaces, §17 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 5, 6), ({ n, rows }) => {
          const ann = annihilator(F, rows, n);
          assert.equal(ann.length, n - rank(F, rows, n));
          assert.equal(rank(F, ann, n), ann.length);
          for (const phi of ann) for (const w of rows) assert.ok(F.isZero(pair(F, phi, w)));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('W^⊥⊥ = W and (W_1 + W_2)^⊥ = W_1^⊥ ∩ W_2^⊥ (Halmos, Finite-Dimensional Vector Spaces, §17 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const pairOfSubspaces = fc
        .integer({ min: 1, max: 6 })
        .chain((n) =>
          fc.tuple(fc.constant(n), fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })).chain(([n, a, b]) =>
            fc.tuple(fc.constant(n), matrixOf(c.element, a, n), matrixOf(c.element, b, n)),
          ),
        );
      fc.assert(
        fc.property(pairOfSubspaces, ([n, a, b]) => {
          assert.ok(rowSpaceEquals(F, annihilator(F, annihilator(F, a, n), n), a, n));
          const ofSum = annihilator(F, sumRowSpaces(F, a, b, n), n);
          const meet = intersectRowSpaces(F, annihilator(F, a, n), annihilator(F, b, n), n);
          assert.ok(rowSpaceEquals(F, ofSum, meet, n));
        }),
        { numRuns: 40 },
      );
    }
  });
});

describe('the Plücker vector of the annihilator', () => {
  test('n = 3, k = 2: the annihilator of span(u, v) has Plücker vector u × v exactly (the cross product; classical)', () => {
    fc.assert(
      fc.property(matrixOf(fc.integer({ min: -9, max: 9 }).map((x) => q(x)), 2, 3), ([u, v]) => {
        const cross = [
          QQ.sub(QQ.mul(u![1]!, v![2]!), QQ.mul(u![2]!, v![1]!)),
          QQ.sub(QQ.mul(u![2]!, v![0]!), QQ.mul(u![0]!, v![2]!)),
          QQ.sub(QQ.mul(u![0]!, v![1]!), QQ.mul(u![1]!, v![0]!)),
        ];
        const out = annihilatorPlucker(QQ, pluckerCoordinates(QQ, [u!, v!], 3), 3, 2);
        out.forEach((x, i) => assert.ok(QQ.eq(x, cross[i]!), `component ${i}`));
      }),
      { numRuns: 60 },
    );
  });

  test('worked example: span(1, 2, 3) gives (3, −2, 1) on the 2-subsets 12, 13, 23, projectively the Plücker vector of its annihilator (computed by hand)', () => {
    const out = annihilatorPlucker(QQ, [q(1), q(2), q(3)], 3, 1);
    [q(3), q(-2), q(1)].forEach((x, i) => assert.ok(QQ.eq(out[i]!, x)));
    assert.ok(projectivelyEqual(QQ, out, pluckerCoordinates(QQ, annihilator(QQ, [[q(1), q(2), q(3)]], 3), 3)));
  });

  test('random subspaces over QQ and GF(p): projectively equal to the Plücker vector of annihilator(W) (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(fullRank(c, 5, 7), ({ n, k, rows }) => {
          const fromRule = annihilatorPlucker(F, pluckerCoordinates(F, rows, n), n, k);
          const direct = pluckerCoordinates(F, annihilator(F, rows, n), n);
          assert.ok(projectivelyEqual(F, fromRule, direct));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('exact for W = [I_k | A] against the annihilator basis [−Aᵀ | I_{n−k}] (the block form of the annihilator; common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const shape = fc
        .integer({ min: 1, max: 7 })
        .chain((n) => fc.integer({ min: 0, max: n }).chain((k) => fc.tuple(fc.constant(n), fc.constant(k), matrixOf(c.element, k, n - k))));
      fc.assert(
        fc.property(shape, ([n, k, A]) => {
          const w = A.map((row, i) => [...Array.from({ length: k }, (_, j) => (i === j ? F.one : F.zero)), ...row]);
          const perp = Array.from({ length: n - k }, (_, i) => [
            ...Array.from({ length: k }, (_, j) => F.neg(A[j]![i])),
            ...Array.from({ length: n - k }, (_, j) => (i === j ? F.one : F.zero)),
          ]);
          const fromRule = annihilatorPlucker(F, pluckerCoordinates(F, w, n), n, k);
          const direct = pluckerCoordinates(F, perp, n);
          assert.equal(fromRule.length, direct.length);
          fromRule.forEach((x, i) => assert.ok(F.eq(x, direct[i]), `coordinate ${i}`));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('dependent rows (Plücker vector zero) give zero, and the wrong length is refused', () => {
    const out = annihilatorPlucker(QQ, pluckerCoordinates(QQ, [[q(1), q(2), q(0)], [q(2), q(4), q(0)]], 3), 3, 2);
    assert.ok(out.every((x) => QQ.isZero(x)));
    assert.throws(() => annihilatorPlucker(QQ, [q(1), q(2)], 3, 1), RangeError);
  });
});

describe('the complement ⋆ on multivectors', () => {
  test('in dimension 3: ⋆e_1 = e_2∧e_3, ⋆e_2 = e_3∧e_1, ⋆e_3 = e_1∧e_2 (the classical Hodge star of oriented Euclidean 3-space, ⋆dx = dy∧dz etc.; common practice, no source)', () => {
    const e = (...s: number[]) => basisMV(QQ, 3, s);
    assert.ok(equalsMV(QQ, hodgeStar(QQ, e(0)), e(1, 2)));
    assert.ok(equalsMV(QQ, hodgeStar(QQ, e(1)), fromTerms(QQ, 3, 2, [[[2, 0], QQ.one]])));
    assert.ok(equalsMV(QQ, hodgeStar(QQ, e(2)), e(0, 1)));
    // The unit scalar goes to the volume element and back.
    assert.ok(equalsMV(QQ, hodgeStar(QQ, fromDense(QQ, 3, 0, [QQ.one])), e(0, 1, 2)));
    assert.ok(equalsMV(QQ, hodgeStar(QQ, e(0, 1, 2)), fromDense(QQ, 3, 0, [QQ.one])));
  });

  test('in dimension 4: ⋆(e_1∧e_3) = −e_2∧e_4 and ⋆(e_2∧e_3) = e_1∧e_4 (e_1∧e_3∧e_2∧e_4 = −e_1∧e_2∧e_3∧e_4; computed by hand)', () => {
    assert.ok(equalsMV(QQ, hodgeStar(QQ, basisMV(QQ, 4, [0, 2])), scale(QQ, q(-1), basisMV(QQ, 4, [1, 3]))));
    assert.ok(equalsMV(QQ, hodgeStar(QQ, basisMV(QQ, 4, [1, 2])), basisMV(QQ, 4, [0, 3])));
  });

  const randomMultivector = (c: (typeof EXTERIOR_CASES)[number]) =>
    fc
      .integer({ min: 0, max: 6 })
      .chain((n) => fc.integer({ min: 0, max: n }).map((k) => ({ n, k })))
      .chain(({ n, k }) =>
        fc.tuple(termList(c, Math.max(n, 1), k), termList(c, Math.max(n, 1), k)).map(([a, b]) => ({
          a: n === 0 ? fromDense(c.F, 0, 0, [c.F.one]) : fromTerms(c.F, n, k, a),
          b: n === 0 ? fromDense(c.F, 0, 0, [c.F.zero]) : fromTerms(c.F, n, k, b),
        })),
      );

  test('⋆⋆ω = (−1)^(k(n−k))·ω (Warner, Foundations of Differentiable Manifolds and Lie Groups, §6.1 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(randomMultivector(c), ({ a }) => {
          const sign = (a.k * (a.n - a.k)) % 2 === 0 ? F.one : F.neg(F.one);
          assert.ok(equalsMV(F, hodgeStar(F, hodgeStar(F, a)), scale(F, sign, a)));
        }),
        { numRuns: 50 },
      );
    }
  });

  test('α ∧ ⋆β = ⟨α, β⟩·e_1∧…∧e_n with ⟨e_I, e_J⟩ = δ_IJ (the defining property of the Hodge star; Warner, §6.1 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(randomMultivector(c), ({ a, b }) => {
          const da = toDense(F, a);
          const db = toDense(F, b);
          const inner = da.reduce((acc, x, i) => F.add(acc, F.mul(x, db[i])), F.zero);
          const left = wedge(F, a, hodgeStar(F, b));
          assert.equal(left.k, a.n);
          const [volume] = toDense(F, left);
          assert.ok(F.eq(volume, inner));
        }),
        { numRuns: 50 },
      );
    }
  });

  test('on the Plücker vector of W it agrees with annihilatorPlucker (the same rule, stated once for each representation)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 4, 6), ({ n, k, rows }) => {
          const p = pluckerCoordinates(F, rows, n);
          const star: Multivector<unknown> = hodgeStar(F, fromDense(F, n, k, p));
          const dense = toDense(F, star);
          annihilatorPlucker(F, p, n, k).forEach((x, i) => assert.ok(F.eq(x, dense[i])));
        }),
        { numRuns: 30 },
      );
    }
  });
});

describe('quotients V/W', () => {
  test('the representatives complete W to a basis of V, and there are n − dim W of them (dim V/W = dim V − dim W; Halmos, Finite-Dimensional Vector Spaces, §22 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 5, 6), ({ n, rows }) => {
          const reps = quotientBasis(F, rows, n);
          assert.equal(reps.length, n - rank(F, rows, n));
          assert.equal(rank(F, [...rows, ...reps], n), n);
        }),
        { numRuns: 40 },
      );
    }
  });

  test('v − Σ c_j·(representative j) lies in W for the coordinates c of v + W, and vectors of W have coordinates 0 (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const withVector = shapedMatrix(c, 4, 6).chain((s) =>
        fc.tuple(fc.constant(s), fc.array(c.element, { minLength: s.n, maxLength: s.n }), fc.array(c.element, { minLength: s.k, maxLength: s.k })),
      );
      fc.assert(
        fc.property(withVector, ([{ n, rows }, v, mix]) => {
          const reps = quotientBasis(F, rows, n);
          const coords = quotientCoordinates(F, rows, n, v);
          assert.equal(coords.length, reps.length);
          const rest = v.map((x, j) => reps.reduce((acc, r, t) => F.sub(acc, F.mul(coords[t], r[j])), x));
          assert.equal(rank(F, [...rows, rest], n), rank(F, rows, n));
          // A combination of the rows of W is the zero class.
          const inW = Array.from({ length: n }, (_, j) => rows.reduce((acc, r, t) => F.add(acc, F.mul(mix[t], r[j])), F.zero));
          assert.ok(quotientCoordinates(F, rows, n, inW).every((x) => F.isZero(x)));
        }),
        { numRuns: 40 },
      );
    }
  });
});
