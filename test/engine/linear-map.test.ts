import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import {
  NotInvertibleError,
  changeOfBasis,
  compoundMatrix,
  imageOf,
  invertMatrix,
  kernelOf,
  mapPlucker,
  preimageOf,
  rankOfMap,
} from '../../server/src/engine/linear-map.js';
import { determinant, identity, intersectRowSpaces, rank, rowSpaceEquals, transpose } from '../../server/src/engine/matrix.js';
import { projectivelyEqual } from '../../server/src/engine/normalize.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { EXTERIOR_CASES, QQ_EXTERIOR, bruteSubsets, matrixOf, mathjsDeterminant } from './exterior-arbitraries.js';
import { fromFraction, math, toFraction } from './linear-arbitraries.js';

type Case = (typeof EXTERIOR_CASES)[number];
const q = (num: number, den = 1) => rational(BigInt(num), BigInt(den));

/** The product a·b of rational matrices computed by mathjs (independent reference library). */
function mathjsProduct(a: readonly (readonly Rational[])[], b: readonly (readonly Rational[])[]): Rational[][] {
  const product = math.multiply(a.map((r) => r.map(toFraction)), b.map((r) => r.map(toFraction))) as unknown as unknown[][];
  return product.map((row) => row.map(fromFraction));
}

/** The product a·b with the field operations written out here (independent of matrix.ts). */
function directProduct<T>(F: Field<T>, a: readonly (readonly T[])[], b: readonly (readonly T[])[], bcols: number): T[][] {
  return a.map((row) => Array.from({ length: bcols }, (_, j) => row.reduce((acc, x, i) => F.add(acc, F.mul(x, b[i]![j]!)), F.zero)));
}

function matricesEqual<T>(F: Field<T>, a: readonly (readonly T[])[], b: readonly (readonly T[])[]): boolean {
  return a.length === b.length && a.every((row, i) => row.length === b[i]!.length && row.every((x, j) => F.eq(x, b[i]![j]!)));
}

/** An m×n map of random shape. */
function randomMap(c: Case, maxM = 5, maxN = 5) {
  return fc
    .tuple(fc.integer({ min: 1, max: maxM }), fc.integer({ min: 1, max: maxN }))
    .chain(([m, n]) => matrixOf(c.element, m, n).map((A) => ({ m, n, A })));
}

/** An m×n map of rank at most r: the product of an m×r and an r×n matrix. */
function lowRankMap(c: Case, r: number, m: number, n: number) {
  return fc.tuple(matrixOf(c.element, m, r), matrixOf(c.element, r, n)).map(([L, R]) => directProduct(c.F, L, R, n));
}

describe('compound matrices', () => {
  test('over QQ, entry (I, J) is the minor on rows I and columns J, against mathjs determinants (independent reference library)', () => {
    for (const [m, n, k] of [
      [3, 3, 2],
      [4, 3, 2],
      [3, 5, 2],
      [4, 5, 3],
      [5, 4, 1],
    ] as const) {
      fc.assert(
        fc.property(matrixOf(QQ_EXTERIOR.element, m, n), (A) => {
          const C = compoundMatrix(QQ, A, k);
          const rowSets = bruteSubsets(m, k);
          const colSets = bruteSubsets(n, k);
          assert.equal(C.length, rowSets.length);
          rowSets.forEach((I, r) => {
            assert.equal(C[r]!.length, colSets.length);
            colSets.forEach((J, s) => {
              const sub = I.map((i) => J.map((j) => A[i]![j]!));
              assert.ok(QQ.eq(C[r]![s]!, mathjsDeterminant(sub)), `rows ${I}, columns ${J}`);
            });
          });
        }),
        { numRuns: 20 },
      );
    }
  });

  test('over GF(p), entries agree with one determinant per minor (matrix.ts elimination, a different algorithm from the walk)', () => {
    for (const c of EXTERIOR_CASES.slice(1)) {
      const { F } = c;
      fc.assert(
        fc.property(matrixOf(c.element, 4, 5), fc.integer({ min: 0, max: 4 }), (A, k) => {
          const C = compoundMatrix(F, A, k);
          bruteSubsets(4, k).forEach((I, r) =>
            bruteSubsets(5, k).forEach((J, s) => assert.ok(F.eq(C[r]![s], determinant(F, I.map((i) => J.map((j) => A[i]![j]!)))))),
          );
        }),
        { numRuns: 20 },
      );
    }
  });

  test('C_k(A·B) = C_k(A)·C_k(B), with A·B from mathjs over QQ (the Cauchy–Binet formula; Horn & Johnson, Matrix Analysis, §0.8.7 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const shapes = fc
        .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }))
        .chain(([a, b, d]) =>
          fc.tuple(matrixOf(c.element, a, b), matrixOf(c.element, b, d), fc.integer({ min: 0, max: Math.min(a, b, d) }), fc.constant(d)),
        );
      fc.assert(
        fc.property(shapes, ([A, B, k, d]) => {
          const AB = F === QQ ? mathjsProduct(A, B) : directProduct(F, A, B, d);
          const left = compoundMatrix(F, AB, k);
          const right = directProduct(F, compoundMatrix(F, A, k), compoundMatrix(F, B, k), left[0]!.length);
          assert.ok(matricesEqual(F, left, right));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('C_1(A) = A, C_0(A) = [[1]], C_m of a square A is [[det A]], C_k(Aᵀ) = C_k(A)ᵀ and C_k(I) = I (Horn & Johnson, Matrix Analysis, §0.8.1 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(randomMap(c), fc.integer({ min: 0, max: 5 }), ({ m, n, A }, k) => {
          assert.ok(matricesEqual(F, compoundMatrix(F, A, 1), A));
          assert.ok(matricesEqual(F, compoundMatrix(F, A, 0), [[F.one]]));
          if (k <= Math.min(m, n)) {
            assert.ok(matricesEqual(F, compoundMatrix(F, transpose(A), k), transpose(compoundMatrix(F, A, k))));
          }
          const I = identity(F, m);
          const kk = Math.min(k, m);
          assert.ok(matricesEqual(F, compoundMatrix(F, I, kk), identity(F, bruteSubsets(m, kk).length)));
          const square = A.slice(0, Math.min(m, n)).map((row) => row.slice(0, Math.min(m, n)));
          assert.ok(matricesEqual(F, compoundMatrix(F, square, square.length), [[determinant(F, square)]]));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('worked example: C_2(diag(a, b, c)) = diag(ab, ac, bc) (common practice, no source)', () => {
    const D = [
      [q(2), q(0), q(0)],
      [q(0), q(3), q(0)],
      [q(0), q(0), q(5)],
    ];
    assert.ok(
      matricesEqual(QQ, compoundMatrix(QQ, D, 2), [
        [q(6), q(0), q(0)],
        [q(0), q(10), q(0)],
        [q(0), q(0), q(15)],
      ]),
    );
  });

  test('degrees beyond the shape: no rows when k > m, empty rows when k > n', () => {
    const A = [
      [q(1), q(2)],
      [q(3), q(4)],
      [q(5), q(6)],
    ];
    assert.deepEqual(compoundMatrix(QQ, A, 3), [[]]);
    assert.deepEqual(compoundMatrix(QQ, A, 4), []);
  });
});

describe('the action on Plücker vectors', () => {
  test('p(W·A) = p(W)·C_k(A), with W·A from mathjs over QQ (the Cauchy–Binet formula; Horn & Johnson, §0.8.7 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const setup = randomMap(c, 5, 5).chain(({ m, n, A }) =>
        fc.integer({ min: 0, max: m }).chain((k) => matrixOf(c.element, k, m).map((W) => ({ m, n, A, k, W }))),
      );
      fc.assert(
        fc.property(setup, ({ n, A, k, W }) => {
          const WA = F === QQ ? (k === 0 ? [] : mathjsProduct(W, A)) : directProduct(F, W, A, n);
          const expected = pluckerCoordinates(F, WA, n);
          const got = mapPlucker(F, A, pluckerCoordinates(F, W, A.length), k);
          assert.equal(got.length, expected.length);
          got.forEach((x, i) => assert.ok(F.eq(x, expected[i]), `coordinate ${i}`));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('when f is injective on W the result is projectively the Plücker vector of imageOf(W); when the image drops dimension it is zero (Cauchy–Binet; common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const setup = fc
        .tuple(fc.integer({ min: 2, max: 5 }), fc.integer({ min: 2, max: 5 }))
        .chain(([m, n]) => fc.integer({ min: 1, max: Math.min(m, n) }).map((k) => ({ m, n, k })))
        .chain(({ m, n, k }) =>
          fc.tuple(fc.constant({ m, n, k }), matrixOf(c.element, k, m), matrixOf(c.element, m, n), lowRankMap(c, k - 1, m, n)),
        );
      fc.assert(
        fc.property(setup, ([{ m, n, k }, W, A, lowRank]) => {
          const p = pluckerCoordinates(F, W, m);
          // A map of rank below k sends every k-subspace to something smaller: all k×k minors of W·A vanish.
          assert.ok(mapPlucker(F, lowRank, p, k).every((x) => F.isZero(x)));
          const image = imageOf(F, A, W);
          const mapped = mapPlucker(F, A, p, k);
          if (image.length === k) assert.ok(projectivelyEqual(F, mapped, pluckerCoordinates(F, image, n)));
          else assert.ok(mapped.every((x) => F.isZero(x)));
        }),
        { numRuns: 40 },
      );
    }
  });
});

describe('images, kernels and preimages', () => {
  test('imageOf spans the rows of W·A (mathjs product over QQ), and the whole image has dimension rank A (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const setup = randomMap(c).chain(({ m, n, A }) =>
        fc.integer({ min: 0, max: m + 1 }).chain((k) => matrixOf(c.element, k, m).map((W) => ({ m, n, A, W }))),
      );
      fc.assert(
        fc.property(setup, ({ m, n, A, W }) => {
          const WA = F === QQ ? (W.length === 0 ? [] : mathjsProduct(W, A)) : directProduct(F, W, A, n);
          assert.ok(rowSpaceEquals(F, imageOf(F, A, W), WA, n));
          const whole = imageOf(F, A, identity(F, m));
          assert.equal(whole.length, rankOfMap(F, A));
          // Row rank equals column rank (classical).
          assert.equal(rankOfMap(F, A), rank(F, transpose(A), m));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('kernel vectors map to zero, are independent, and number dim V − rank A (rank–nullity; Axler, Linear Algebra Done Right, 3.22 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(fc.oneof(randomMap(c), fc.tuple(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 5 })).chain(([m, n]) => lowRankMap(c, 1, m, n).map((A) => ({ m, n, A })))), ({ m, n, A }) => {
          const K = kernelOf(F, A);
          assert.equal(K.length, m - rankOfMap(F, A));
          assert.equal(rank(F, K, m), K.length);
          for (const v of directProduct(F, K, A, n)) assert.ok(v.every((x) => F.isZero(x)));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('preimages: f(f⁻¹(U′)) ⊂ U′ and dim f⁻¹(U′) = dim ker f + dim(f(V) ∩ U′) (rank–nullity for f restricted to the preimage; Axler, 3.22 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const setup = randomMap(c).chain(({ m, n, A }) =>
        fc.integer({ min: 0, max: n }).chain((d) => matrixOf(c.element, d, n).map((U) => ({ m, n, A, U }))),
      );
      fc.assert(
        fc.property(setup, ({ m, n, A, U }) => {
          const P = preimageOf(F, A, U);
          assert.equal(rank(F, P, m), P.length);
          const images = directProduct(F, P, A, n);
          assert.equal(rank(F, [...U, ...images], n), rank(F, U, n));
          const meet = intersectRowSpaces(F, imageOf(F, A, identity(F, m)), U, n);
          assert.equal(P.length, kernelOf(F, A).length + meet.length);
          // Preimage of the whole target is the whole source; of zero, the kernel.
          assert.equal(preimageOf(F, A, identity(F, n)).length, m);
          assert.ok(rowSpaceEquals(F, preimageOf(F, A, [], n), kernelOf(F, A), m));
        }),
        { numRuns: 40 },
      );
    }
  });

  test('worked example: the projection (x, y, z) ↦ (x, y) has kernel span(e_3) and preimage of span(e_1) equal to span(e_1, e_3) (computed by hand)', () => {
    const A = [
      [q(1), q(0)],
      [q(0), q(1)],
      [q(0), q(0)],
    ];
    assert.ok(rowSpaceEquals(QQ, kernelOf(QQ, A), [[q(0), q(0), q(1)]], 3));
    assert.ok(rowSpaceEquals(QQ, preimageOf(QQ, A, [[q(1), q(0)]]), [[q(1), q(0), q(0)], [q(0), q(0), q(1)]], 3));
  });

  test('a map from the zero space needs the target dimension', () => {
    assert.throws(() => kernelOf(QQ, []), RangeError);
    assert.deepEqual(kernelOf(QQ, [], 3), []);
    assert.deepEqual(imageOf(QQ, [], [], 3), []);
  });
});

describe('inverses and change of basis', () => {
  test('over QQ the inverse agrees with mathjs inv (independent reference library), and P·P⁻¹ = I over every field', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const invertible = fc
        .integer({ min: 1, max: 5 })
        .chain((n) => matrixOf(c.element, n, n))
        .filter((P) => rank(F, P, P.length) === P.length);
      fc.assert(
        fc.property(invertible, (P) => {
          const inverse = invertMatrix(F, P);
          assert.ok(matricesEqual(F, directProduct(F, P, inverse, P.length), identity(F, P.length)));
          if (F === QQ) {
            const reference = (math.inv(P.map((r) => r.map(toFraction))) as unknown as unknown[][]).map((r) => r.map(fromFraction));
            assert.ok(matricesEqual(F, inverse, reference));
          }
        }),
        { numRuns: 30 },
      );
    }
  });

  test('changeOfBasis gives c with c·P = v (product by mathjs over QQ), and refuses singular or non-square P (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      const setup = fc
        .integer({ min: 1, max: 5 })
        .chain((n) => fc.tuple(matrixOf(c.element, n, n), fc.array(c.element, { minLength: n, maxLength: n })));
      fc.assert(
        fc.property(setup, ([P, v]) => {
          const n = P.length;
          if (rank(F, P, n) < n) {
            assert.throws(() => changeOfBasis(F, P, v), NotInvertibleError);
            return;
          }
          const coords = changeOfBasis(F, P, v);
          const back = F === QQ ? mathjsProduct([coords], P)[0]! : directProduct(F, [coords], P, n)[0]!;
          back.forEach((x, j) => assert.ok(F.eq(x, v[j])));
        }),
        { numRuns: 40 },
      );
    }
    const F = primeField(5n);
    assert.throws(() => changeOfBasis(F, [[F.one, F.zero]], [F.one]), NotInvertibleError);
    assert.throws(() => invertMatrix(F, [[F.one, F.fromBigInt(2n)], [F.fromBigInt(3n), F.one]]), NotInvertibleError);
  });

  test('worked example: in the basis (1, 1), (1, −1) the vector (3, 1) has coordinates (2, 1) (computed by hand)', () => {
    const coords = changeOfBasis(
      QQ,
      [
        [q(1), q(1)],
        [q(1), q(-1)],
      ],
      [q(3), q(1)],
    );
    assert.ok(QQ.eq(coords[0]!, q(2)) && QQ.eq(coords[1]!, q(1)));
  });
});
