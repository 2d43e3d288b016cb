import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { determinant, multiply } from '../../server/src/engine/matrix.js';
import { coefficient, fromDense } from '../../server/src/engine/multivector.js';
import { minor, pluckerCoordinates, pluckerMultivector } from '../../server/src/engine/plucker.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { evaluateRelation } from '../../server/src/engine/decompose.js';
import { binomial } from '../../server/src/engine/subsets.js';
import {
  EXTERIOR_CASES,
  QQ_EXTERIOR,
  bruteSubsets,
  columnsOf,
  inversionSign,
  matrixOf,
  mathjsDeterminant,
  shapedMatrix,
} from './exterior-arbitraries.js';

const integerEntry = fc.integer({ min: -20, max: 20 }).map((n) => rational(BigInt(n)));
const fractionEntry = fc
  .tuple(fc.integer({ min: -9, max: 9 }), fc.integer({ min: 1, max: 8 }))
  .map(([n, d]) => rational(BigInt(n), BigInt(d)));
// Mostly zeros, so that whole subtrees of the walk are skipped.
const sparseEntry = fc.oneof(
  { arbitrary: fc.constant(QQ.zero), weight: 3 },
  { arbitrary: fc.integer({ min: -2, max: 2 }).map((n) => rational(BigInt(n))), weight: 1 },
);

/** Matrices of size k×n with one row replaced by a multiple of another, so that the rank drops. */
function degenerate(entry: fc.Arbitrary<Rational>, k: number, n: number) {
  return fc.tuple(matrixOf(entry, k, n), fc.integer({ min: 0, max: k - 1 }), fc.integer({ min: 0, max: k - 1 })).map(([m, i, j]) => {
    const copy = m.map((row) => row.slice());
    if (i !== j) copy[i] = copy[j]!.map((x) => QQ.mul(rational(-2n), x));
    return copy;
  });
}

const SHAPES: [number, number][] = [
  [1, 1],
  [1, 5],
  [2, 4],
  [2, 6],
  [3, 3],
  [3, 6],
  [4, 7],
  [5, 8],
];

describe('Plücker coordinates over QQ against mathjs determinants (independent reference library)', () => {
  for (const [label, entry] of [
    ['integer', integerEntry],
    ['fraction', fractionEntry],
    ['sparse', sparseEntry],
  ] as const) {
    for (const [k, n] of SHAPES) {
      test(`${label} ${k}×${n}: coordinate K equals det of columns K (mathjs Fraction det)`, () => {
        fc.assert(
          fc.property(fc.oneof(matrixOf(entry, k, n), degenerate(entry, k, n)), (rows) => {
            const p = pluckerCoordinates(QQ, rows, n);
            const subsets = bruteSubsets(n, k);
            assert.equal(p.length, subsets.length);
            subsets.forEach((cols, r) => {
              assert.ok(QQ.eq(p[r]!, mathjsDeterminant(columnsOf(rows, cols))), `columns ${cols}`);
            });
          }),
          { numRuns: k * n > 20 ? 15 : 40 },
        );
      });
    }
  }

  test('the generic elimination path agrees too (a copy of QQ that is not QQ itself; mathjs det)', () => {
    const generic = { ...QQ };
    fc.assert(
      fc.property(fc.oneof(matrixOf(fractionEntry, 3, 6), degenerate(sparseEntry, 3, 6)), (rows) => {
        const p = pluckerCoordinates(generic, rows, 6);
        bruteSubsets(6, 3).forEach((cols, r) => assert.ok(QQ.eq(p[r]!, mathjsDeterminant(columnsOf(rows, cols)))));
      }),
      { numRuns: 30 },
    );
  });

  test('k = 0 gives [1] and k > n gives no coordinates (empty determinant is 1; common practice, no source)', () => {
    assert.deepEqual(pluckerCoordinates(QQ, [], 3), [QQ.one]);
    assert.deepEqual(pluckerCoordinates(QQ, [[QQ.one], [QQ.one]], 1), []);
  });

  test('minor takes columns in the given order: swapping two changes the sign (mathjs det)', () => {
    fc.assert(
      fc.property(matrixOf(integerEntry, 3, 5), fc.uniqueArray(fc.integer({ min: 0, max: 4 }), { minLength: 3, maxLength: 3 }), (rows, cols) => {
        assert.ok(QQ.eq(minor(QQ, rows, cols), mathjsDeterminant(columnsOf(rows, cols))));
      }),
      { numRuns: 50 },
    );
  });
});

describe('Plücker coordinates over GF(p) against per-minor determinants and mathjs mod p', () => {
  for (const p of [2n, 3n, 7n, 2n ** 31n - 1n, 2n ** 61n - 1n]) {
    const F = primeField(p);
    const element = fc.oneof(
      { arbitrary: fc.constant(0n), weight: 1 },
      { arbitrary: fc.bigInt({ min: 0n, max: p - 1n }), weight: 3 },
    );
    for (const [k, n] of [
      [2, 4],
      [3, 6],
      [4, 7],
    ] as const) {
      test(`GF(${p}) ${k}×${n}: matrix.ts determinant and mathjs det of the integer lift, reduced mod p`, () => {
        fc.assert(
          fc.property(matrixOf(element, k, n), (ints) => {
            const rows = ints.map((row) => row.map((x) => F.fromBigInt(x)));
            const coords = pluckerCoordinates(F, rows, n);
            bruteSubsets(n, k).forEach((cols, r) => {
              const sub = columnsOf(rows, cols);
              assert.ok(F.eq(coords[r], determinant(F, sub)), `matrix.ts determinant, columns ${cols}`);
              // mathjs works on the integers themselves; reducing its exact determinant mod p must agree.
              const exact = mathjsDeterminant(columnsOf(ints, cols).map((row) => row.map((x) => rational(x))));
              assert.equal(exact.den, 1n);
              assert.ok(F.eq(coords[r], F.fromBigInt(exact.num)), `mathjs det mod ${p}, columns ${cols}`);
            });
          }),
          { numRuns: 25 },
        );
      });
    }
  }
});

describe('quadratic Plücker relations vanish on subspaces', () => {
  test('G(2,4): p12·p34 − p13·p24 + p14·p23 = 0 on random 2×4 matrices (classical; Harris, Algebraic Geometry: A First Course, Lecture 6 — from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(matrixOf(c.element, 2, 4), (rows) => {
          // Lexicographic order of 2-subsets of {1,2,3,4}: 12, 13, 14, 23, 24, 34.
          const [p12, p13, p14, p23, p24, p34] = pluckerCoordinates(F, rows, 4);
          const value = F.add(F.sub(F.mul(p12, p34), F.mul(p13, p24)), F.mul(p14, p23));
          assert.ok(F.isZero(value));
        }),
        { numRuns: 60 },
      );
    }
  });

  test('every three-term relation p_ij p_kl − p_ik p_jl + p_il p_jk = 0 on G(2,n), written out directly (classical; from memory)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(matrixOf(c.element, 2, 6), (rows) => {
          const mv = pluckerMultivector(F, rows, 6);
          const p = (a: number, b: number) => coefficient(F, mv, [a, b]);
          for (const [i, j, k, l] of bruteSubsets(6, 4)) {
            const value = F.add(F.sub(F.mul(p(i!, j!), p(k!, l!)), F.mul(p(i!, k!), p(j!, l!))), F.mul(p(i!, l!), p(j!, k!)));
            assert.ok(F.isZero(value), `relation ${i}${j}${k}${l}`);
          }
        }),
        { numRuns: 30 },
      );
    }
  });

  test('all relations Σ_t (−1)^t p(I, j_t) p(J∖j_t) vanish for every I, J on random subspaces (Griffiths–Harris Ch. 1 §5 — from memory; fast-check)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 4, 6), ({ n, k, rows }) => {
          if (k < 1 || k >= n) return;
          const dense = pluckerCoordinates(F, rows, n);
          const mv = fromDense(F, n, k, dense);
          // The alternating coordinate p(i_1, …, i_k), from the dense vector and an independent inversion count.
          const alt = (indices: number[]) => {
            const s = inversionSign(indices);
            if (s === 0) return F.zero;
            const sorted = indices.slice().sort((a, b) => a - b);
            const index = bruteSubsets(n, k).findIndex((t) => t.every((x, i) => x === sorted[i]));
            return s === 1 ? dense[index] : F.neg(dense[index]);
          };
          for (const I of bruteSubsets(n, k - 1)) {
            for (const J of bruteSubsets(n, k + 1)) {
              // The textbook sum, computed here independently of evaluateRelation ...
              let direct = F.zero;
              J.forEach((j, t) => {
                const term = F.mul(alt([...I, j]), alt(J.filter((_, s) => s !== t)));
                direct = t % 2 === 0 ? F.add(direct, term) : F.sub(direct, term);
              });
              assert.ok(F.isZero(direct));
              // ... and by the engine, whose terms must reproduce its value.
              const rel = evaluateRelation(F, mv, I, J);
              assert.ok(F.isZero(rel.value));
              let sum = F.zero;
              for (const term of rel.terms) {
                const prod = F.mul(term.firstValue, term.secondValue);
                sum = term.sign === 1 ? F.add(sum, prod) : F.sub(sum, prod);
              }
              assert.ok(F.eq(sum, rel.value));
            }
          }
        }),
        { numRuns: 15 },
      );
    }
  });
});

describe('transformation under change of basis', () => {
  test('p(g·A) = det(g)·p(A) for g in GL_k, det by mathjs (Cauchy–Binet; from memory)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 4 }).chain((k) => fc.tuple(matrixOf(QQ_EXTERIOR.element, k, k), matrixOf(QQ_EXTERIOR.element, k, 6))),
        ([g, a]) => {
          const d = mathjsDeterminant(g);
          const left = pluckerCoordinates(QQ, multiply(QQ, g, a, 6), 6);
          const right = pluckerCoordinates(QQ, a, 6).map((x) => QQ.mul(d, x));
          assert.equal(left.length, binomial(6, g.length));
          left.forEach((x, i) => assert.ok(QQ.eq(x, right[i]!)));
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('size', () => {
  test('a 6×14 matrix: 3003 coordinates, spot-checked against mathjs (independent reference library)', () => {
    const rows = Array.from({ length: 6 }, (_, i) =>
      Array.from({ length: 14 }, (_, j) => rational(BigInt(((i + 2) * (j + 3) * 7919) % 23) - 11n, BigInt((i + j) % 3) + 1n)),
    );
    const p = pluckerCoordinates(QQ, rows, 14);
    assert.equal(p.length, 3003);
    const subsets = bruteSubsets(14, 6);
    for (let r = 0; r < subsets.length; r += 97) {
      assert.ok(QQ.eq(p[r]!, mathjsDeterminant(columnsOf(rows, subsets[r]!))));
    }
  });
});
