import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { determinant, multiply } from '../../server/src/engine/matrix.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { FIELD_CASES, deepCopy, fromFraction, math, matrixOf, toFraction } from './linear-arbitraries.js';

/** mathjs's exact determinant of a rational matrix (independent reference library). */
function referenceDeterminant(m: Rational[][]): Rational {
  return fromFraction(math.det(m.map((row) => row.map(toFraction))));
}

// A copy of QQ that is not QQ itself, so `determinant` takes its generic elimination path instead of the integer one.
const QQ_GENERIC: Field<Rational> = { ...QQ };

const integerEntry = fc.integer({ min: -9, max: 9 }).map((n) => rational(BigInt(n)));
const fractionEntry = fc
  .tuple(fc.integer({ min: -9, max: 9 }), fc.integer({ min: 1, max: 7 }))
  .map(([n, d]) => rational(BigInt(n), BigInt(d)));
const sparseEntry = fc.oneof(fc.constant(QQ.zero), fc.constant(QQ.zero), integerEntry);

function squareMatrix<T>(entry: fc.Arbitrary<T>, maxSize = 6) {
  return fc.integer({ min: 1, max: maxSize }).chain((n) => matrixOf(entry, n, n));
}

describe('determinants over QQ against mathjs (independent reference library)', () => {
  for (const [label, entry] of [
    ['integer', integerEntry],
    ['fractional', fractionEntry],
    ['sparse, often singular', sparseEntry],
  ] as const) {
    test(`random ${label} matrices up to 6×6, on both elimination paths`, () => {
      fc.assert(
        fc.property(squareMatrix(entry), (m) => {
          const expected = referenceDeterminant(m);
          assert.ok(QQ.eq(determinant(QQ, m), expected), 'fraction-free path');
          assert.ok(QQ.eq(determinant(QQ_GENERIC, m), expected), 'generic path');
        }),
        { numRuns: 150 },
      );
    });
  }

  test('the 0×0 determinant is 1 (the empty product, common practice)', () => {
    assert.ok(QQ.isOne(determinant(QQ, [])));
    assert.ok(QQ.isOne(determinant(QQ_GENERIC, [])));
    assert.equal(determinant(primeField(7n), []), primeField(7n).one);
  });

  test('a row swap is needed at the first pivot', () => {
    const m = [
      [0n, 1n],
      [1n, 0n],
    ].map((row) => row.map((n) => rational(n)));
    // det [[0, 1], [1, 0]] = 0·0 − 1·1 = −1 by the 2×2 formula.
    assert.ok(QQ.eq(determinant(QQ, m), rational(-1n)));
    assert.ok(QQ.eq(determinant(QQ_GENERIC, m), rational(-1n)));
  });

  test('Hilbert matrices: det H_n = 1/a(n) with a = 1, 12, 2160, 6048000, … (OEIS A005249, from memory)', () => {
    const a = [1n, 12n, 2160n, 6048000n, 266716800000n, 186313420339200000n];
    a.forEach((expected, i) => {
      const n = i + 1;
      const hilbert = Array.from({ length: n }, (_, r) => Array.from({ length: n }, (_, c) => rational(1n, BigInt(r + c + 1))));
      assert.ok(QQ.eq(determinant(QQ, hilbert), rational(1n, expected)), `n = ${n}`);
      assert.ok(QQ.eq(referenceDeterminant(hilbert), rational(1n, expected)), `mathjs, n = ${n}`);
    });
  });

  test('the input is not changed', () => {
    fc.assert(
      fc.property(squareMatrix(fractionEntry, 4), (m) => {
        const before = deepCopy(m);
        determinant(QQ, m);
        determinant(QQ_GENERIC, m);
        assert.deepEqual(m, before);
      }),
      { numRuns: 30 },
    );
  });

  test('a non-square matrix is refused', () => {
    assert.throws(() => determinant(QQ, [[QQ.one, QQ.zero]]), /square/);
  });
});

describe('determinants over GF(p)', () => {
  for (const p of [2n, 7n, 2n ** 31n - 1n, 2n ** 61n - 1n]) {
    const F = primeField(p);
    test(`GF(${p}): the mathjs determinant of an integer matrix, reduced modulo p`, () => {
      // The determinant is a polynomial with integer coefficients in the entries, so it commutes with reduction mod p.
      fc.assert(
        fc.property(squareMatrix(fc.integer({ min: -9, max: 9 })), (m) => {
          const exact = referenceDeterminant(m.map((row) => row.map((n) => rational(BigInt(n)))));
          const reduced = F.fromRational(exact.num, exact.den);
          assert.ok(F.eq(determinant(F, m.map((row) => row.map((n) => F.fromBigInt(BigInt(n))))), reduced));
        }),
        { numRuns: 150 },
      );
    });
  }
});

describe('Vandermonde determinant det(x_i^j) = Π_{i<j} (x_j − x_i) (textbook theorem, e.g. Hoffman–Kunze, from memory)', () => {
  for (const fieldCase of FIELD_CASES) {
    const F = fieldCase.F;
    test(F.name, () => {
      fc.assert(
        fc.property(fc.array(fieldCase.element, { minLength: 1, maxLength: 6 }), (xs) => {
          const vandermonde = xs.map((x) => {
            const row = [F.one];
            for (let j = 1; j < xs.length; j++) row.push(F.mul(row[j - 1], x));
            return row;
          });
          let product = F.one;
          for (let j = 0; j < xs.length; j++) for (let i = 0; i < j; i++) product = F.mul(product, F.sub(xs[j], xs[i]));
          assert.ok(F.eq(determinant(F, vandermonde), product));
        }),
        { numRuns: 100 },
      );
    });
  }
});

describe('det(A·B) = det(A)·det(B) (multiplicativity of the determinant, textbook theorem)', () => {
  for (const fieldCase of FIELD_CASES) {
    const F = fieldCase.F;
    test(F.name, () => {
      fc.assert(
        fc.property(
          fc.integer({ min: 1, max: 5 }).chain((n) => fc.tuple(matrixOf(fieldCase.element, n, n), matrixOf(fieldCase.element, n, n))),
          ([a, b]) => {
            assert.ok(F.eq(determinant(F, multiply(F, a, b)), F.mul(determinant(F, a), determinant(F, b))));
          },
        ),
        { numRuns: 80 },
      );
    });
  }
});
