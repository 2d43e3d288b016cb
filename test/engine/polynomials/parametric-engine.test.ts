// The existing generic engine algorithms, run unchanged over fields of rational functions.
import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../../server/src/engine/field.js';
import { chartCoordinates } from '../../../server/src/engine/chart.js';
import { decompose, findFailedRelation, supportSpace } from '../../../server/src/engine/decompose.js';
import { annihilator } from '../../../server/src/engine/duality.js';
import { compoundMatrix, invertMatrix } from '../../../server/src/engine/linear-map.js';
import { standardFlag } from '../../../server/src/engine/flags.js';
import { onKleinQuadric, lineMeet } from '../../../server/src/engine/lines-p3.js';
import { schubertCell } from '../../../server/src/engine/schubert.js';
import { hodgeStar, annihilatorPlucker } from '../../../server/src/engine/duality.js';
import { matroidOf } from '../../../server/src/engine/matroid.js';
import {
  determinant,
  findDependency,
  identity,
  intersectRowSpaces,
  kernel,
  matrixEquals,
  multiply,
  rank,
  rowSpaceEquals,
  rref,
  solve,
  transpose,
} from '../../../server/src/engine/matrix.js';
import { add as addMV, basisMV, equalsMV, scale as scaleMV } from '../../../server/src/engine/multivector.js';
import { normalizePoint } from '../../../server/src/engine/normalize.js';
import { pluckerCoordinates, pluckerMultivector } from '../../../server/src/engine/plucker.js';
import { UnorderedFieldError, positivityOf } from '../../../server/src/engine/positivity.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { finiteFieldSize } from '../../../server/src/engine/polynomials/finite-field-factor.js';
import { gcdPolynomials } from '../../../server/src/engine/polynomials/polynomial-gcd.js';
import { polynomialRepresentative } from '../../../server/src/engine/polynomials/projective-polynomials.js';
import { rationalFunctionField, type RationalFunction, type RationalFunctionField } from '../../../server/src/engine/polynomials/rational-function-field.js';
import { QQ, rational, type Rational } from '../../../server/src/engine/rational.js';
import { subsets as allSubsets } from './subsets-for-tests.js';
import { fromFraction, math, toFraction } from '../linear-arbitraries.js';

const K = rationalFunctionField(QQ, ['t']);
const t = K.variable('t');
const k = (n: number, d = 1) => K.fromRational(BigInt(n), BigInt(d));
const poly = (...coefficients: number[]) => coefficients.reduceRight((acc, c) => K.add(K.mul(acc, t), k(c)), K.zero);

/** mathjs's exact determinant of a rational matrix (the independent reference library). */
function referenceDeterminant(m: Rational[][]): Rational {
  return m.length === 0 ? QQ.one : fromFraction(math.det(m.map((row) => row.map(toFraction))));
}

/** The values of a matrix of rational functions at a point (every denominator nonzero there). */
function at<T>(F: RationalFunctionField<T>, m: readonly (readonly RationalFunction<T>[])[], values: Record<string, T>): T[][] {
  return m.map((row) => row.map((x) => F.evaluate(x, values)));
}

// A 2×4 matrix with polynomial and rational entries in t.
const M24 = [
  [k(1), t, poly(0, 0, 1), k(-2)],
  [k(0), poly(1, 1), K.inv(K.sub(t, k(2))), K.div(t, K.add(t, k(3)))],
];

describe('Plücker coordinates over QQ(t) (the generic walk)', () => {
  test('each coordinate, at many values of t, is the minor computed by mathjs after substituting (independent reference library)', () => {
    const P = pluckerCoordinates(K, M24, 4);
    const columnSets = allSubsets(4, 2);
    fc.assert(
      fc.property(
        fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: 1, max: 7 })).filter(([n, d]) => n !== 2 * d && n !== -3 * d),
        ([n, d]) => {
          const x = rational(BigInt(n), BigInt(d));
          const numeric = at(K, M24, { t: x });
          columnSets.forEach((cols, r) => {
            const minor = referenceDeterminant(numeric.map((row) => cols.map((c) => row[c]!)));
            assert.ok(QQ.eq(K.evaluate(P[r]!, { t: x }), minor), `p${cols.join('')} at t = ${n}/${d}`);
          });
        },
      ),
      { numRuns: 40 },
    );
  });

  test('the quadratic Plücker relation p12 p34 − p13 p24 + p14 p23 vanishes identically (Klein quadric; Hodge–Pedoe, from memory)', () => {
    const [p12, p13, p14, p23, p24, p34] = pluckerCoordinates(K, M24, 4);
    const relation = K.add(K.sub(K.mul(p12!, p34!), K.mul(p13!, p24!)), K.mul(p14!, p23!));
    assert.ok(K.isZero(relation));
    assert.equal(findFailedRelation(K, pluckerMultivector(K, M24, 4)), undefined);
  });

  test('a 3×6 matrix over QQ(s, t): every coordinate against mathjs, and decompose recovers the row space', () => {
    const L = rationalFunctionField(QQ, ['s', 't']);
    const s = L.variable('s');
    const tt = L.variable('t');
    const c = (n: number) => L.fromBigInt(BigInt(n));
    const m = [
      [c(1), s, tt, L.mul(s, tt), c(0), c(2)],
      [c(0), c(1), L.add(s, tt), c(-1), L.div(c(1), L.add(s, c(1))), tt],
      [L.mul(s, s), c(0), c(1), tt, s, L.sub(s, tt)],
    ];
    const P = pluckerCoordinates(L, m, 6);
    const sets = allSubsets(6, 3);
    for (const [sv, tv] of [[2, 3], [-2, 5], [0, 0], [3, -2], [1, 1]] as const) {
      const values = { s: rational(BigInt(sv), 1n), t: rational(BigInt(tv), 1n) };
      const numeric = at(L, m, values);
      sets.forEach((cols, r) => {
        assert.ok(QQ.eq(L.evaluate(P[r]!, values), referenceDeterminant(numeric.map((row) => cols.map((j) => row[j]!)))));
      });
    }
    const omega = pluckerMultivector(L, m, 6);
    const result = decompose(L, omega);
    assert.equal(result.kind, 'decomposable');
    if (result.kind === 'decomposable') assert.ok(rowSpaceEquals(L, result.basis, m, 6));
    assert.equal(findFailedRelation(L, omega), undefined);
    assert.equal(supportSpace(L, omega).length, 3);
  });

  test('over GF(7)(s, t): coordinates against mathjs integer minors reduced modulo 7 (independent reference library)', () => {
    const F7 = primeField(7n) as Field<number>;
    const L = rationalFunctionField(F7, ['s', 't']);
    const s = L.variable('s');
    const tt = L.variable('t');
    const c = (n: number) => L.fromBigInt(BigInt(n));
    const m = [
      [c(1), s, L.mul(tt, tt), c(3)],
      [tt, c(2), L.add(s, tt), L.mul(s, tt)],
    ];
    const P = pluckerCoordinates(L, m, 4);
    for (let sv = 0; sv < 7; sv++) {
      for (let tv = 0; tv < 7; tv++) {
        const integer = [
          [1, sv, tv * tv, 3],
          [tv, 2, sv + tv, sv * tv],
        ];
        allSubsets(4, 2).forEach((cols, r) => {
          const det = Math.round(math.det(integer.map((row) => cols.map((j) => row[j]!))) as number);
          assert.equal(L.evaluate(P[r]!, { s: sv, t: tv }), ((det % 7) + 7) % 7);
        });
      }
    }
  });
});

describe('linear algebra over QQ(t) and QQ(s, t, u)', () => {
  test('the Vandermonde determinant is (t − s)(u − s)(u − t) (classical formula, from memory)', () => {
    const L = rationalFunctionField(QQ, ['s', 't', 'u']);
    const [s, tt, u] = ['s', 't', 'u'].map((v) => L.variable(v)) as [RationalFunction<Rational>, RationalFunction<Rational>, RationalFunction<Rational>];
    const row = (x: RationalFunction<Rational>) => [L.one, x, L.mul(x, x)];
    const expected = L.mul(L.mul(L.sub(tt, s), L.sub(u, s)), L.sub(u, tt));
    assert.ok(L.eq(determinant(L, [row(s), row(tt), row(u)]), expected));
  });

  test('the rank over QQ(t) is the rank at a general value; it drops where the parameter makes rows dependent', () => {
    const m = [
      [k(1), t],
      [t, k(1)],
    ];
    assert.equal(rank(K, m), 2);
    // det = 1 − t^2, which vanishes at t = ±1 (2×2 determinant formula).
    assert.ok(K.eq(determinant(K, m), K.sub(k(1), K.mul(t, t))));
    assert.equal(rank(QQ, at(K, m, { t: rational(1n) })), 1);
    assert.equal(rank(QQ, at(K, m, { t: rational(2n) })), 2);
  });

  test('kernels, solutions, inverses and dependencies satisfy their defining equations', () => {
    const a = [
      [k(1), t, poly(0, 0, 1), k(0)],
      [k(0), k(1), t, poly(1, 0, 1)],
    ];
    const basis = kernel(K, a, 4);
    assert.equal(basis.length, 2);
    assert.ok(multiply(K, a, transpose(basis, 4)).every((row) => row.every((x) => K.isZero(x))));
    const b = [poly(1, 1), K.inv(t)];
    const x = solve(K, a, b, 4)!;
    assert.ok(multiply(K, a, x.map((v) => [v])).every((row, i) => K.eq(row[0]!, b[i]!)));
    const P = [
      [k(1), t],
      [k(1), K.add(t, k(1))],
    ];
    assert.ok(matrixEquals(K, multiply(K, P, invertMatrix(K, P)), identity(K, 2)));
    const dependency = findDependency(K, [a[0]!, a[1]!, a[0]!.map((v, i) => K.add(K.mul(t, v), a[1]![i]!))])!;
    assert.equal(dependency.index, 2);
    assert.ok(K.eq(dependency.coefficients[0]!, t) && K.isOne(dependency.coefficients[1]!));
  });

  test('intersections of parametric planes in 4-space, and annihilators', () => {
    const A = [
      [k(1), k(0), t, k(0)],
      [k(0), k(1), k(0), t],
    ];
    const B = [
      [k(1), k(1), k(0), k(0)],
      [k(0), k(0), k(1), k(1)],
    ];
    // (1, 1, t, t) lies in both; the two planes meet in that line for general t.
    const meet = intersectRowSpaces(K, A, B, 4);
    assert.equal(meet.length, 1);
    assert.ok(rowSpaceEquals(K, meet, [[k(1), k(1), t, t]], 4));
    const perp = annihilator(K, A, 4);
    assert.ok(multiply(K, A, transpose(perp, 4)).every((row) => row.every((x) => K.isZero(x))));
  });

  test('charts: the chart at columns 1, 2 is the reduced row echelon form; at columns 3, 4 it exists since p34 ≠ 0', () => {
    const chart = chartCoordinates(K, M24, 4, [0, 1]);
    const reduced = rref(K, M24, 4);
    assert.ok(chart.ok);
    if (chart.ok) assert.ok(matrixEquals(K, chart.full, reduced.rows));
    const other = chartCoordinates(K, M24, 4, [2, 3]);
    assert.ok(other.ok);
    // The chart's full matrix has the identity in columns 3, 4 and spans the same plane.
    if (other.ok) assert.ok(rowSpaceEquals(K, other.full, M24, 4) && K.isOne(other.full[0]![2]!) && K.isZero(other.full[0]![3]!));
  });

  test('the matroid of a parametric matrix is that of a general member', () => {
    // Columns 1 and 3 of [[1, t, t^2, 0], [0, 1, 2t, 1]] are dependent only for t = 0 (minor t^2·1 − 0 = t^2).
    const m = [
      [k(1), t, poly(0, 0, 1), k(0)],
      [k(0), k(1), poly(0, 2), k(1)],
    ];
    const generic = matroidOf(K, m, 4);
    const member = matroidOf(QQ, at(K, m, { t: rational(5n) }), 4);
    assert.deepEqual(generic.bases, member.bases);
  });
});

describe('Schubert cells, lines in P^3, duality and compound matrices over QQ(t)', () => {
  test('the Schubert cell of a parametric plane is that of a general member (the cell is decided by ranks, which are generic)', () => {
    const generic = schubertCell(K, M24, standardFlag(K, 4), 4);
    const member = schubertCell(QQ, at(K, M24, { t: rational(5n) }), standardFlag(QQ, 4), 4);
    assert.deepEqual(generic.partition, member.partition);
    assert.deepEqual(generic.jumps, member.jumps);
  });

  test('the Plücker vector of a line lies on the Klein quadric; two lines in a common plane meet (Hodge–Pedoe, from memory)', () => {
    const P = pluckerCoordinates(K, M24, 4);
    assert.ok(onKleinQuadric(K, P));
    // Both lines lie in the plane x_3 = 0 of P^3 (last coordinate zero), so they meet.
    const L1 = [[k(1), t, k(0), k(0)], [k(0), k(1), t, k(0)]];
    const L2 = [[k(1), k(0), k(1), k(0)], [t, k(1), k(0), k(0)]];
    const meet = lineMeet(K, L1, L2);
    assert.ok(meet.meet);
    assert.ok(K.isZero(meet.pairing));
  });

  test('the Hodge star applied twice is (−1)^(k(n−k)) (a sign rule of exterior algebra, from memory), and it gives the annihilator', () => {
    const omega = pluckerMultivector(K, M24, 4);
    const twice = hodgeStar(K, hodgeStar(K, omega));
    const P = pluckerCoordinates(K, M24, 4);
    // k(n − k) = 4 is even, so the sign is +1.
    assert.ok(equalsMV(K, twice, omega));
    const perp = pluckerCoordinates(K, annihilator(K, M24, 4), 4);
    const fromStar = annihilatorPlucker(K, P, 4, 2);
    // The two are the same projective point: proportional coordinates.
    const i = fromStar.findIndex((x) => !K.isZero(x));
    assert.ok(perp.every((x, j) => K.eq(K.mul(x, fromStar[i]!), K.mul(fromStar[j]!, perp[i]!))));
  });

  test('the second compound matrix of A is multiplicative: C2(A·B) = C2(A)·C2(B) (Cauchy–Binet)', () => {
    const A = [[k(1), t, k(0)], [k(2), k(1), poly(0, 0, 1)], [t, k(0), k(1)]];
    const B = [[k(0), k(1), t], [K.inv(t), k(1), k(0)], [k(1), k(0), k(3)]];
    const left = compoundMatrix(K, multiply(K, A, B), 2);
    const right = multiply(K, compoundMatrix(K, A, 2), compoundMatrix(K, B, 2));
    assert.ok(matrixEquals(K, left, right));
  });
});

describe('decomposability over QQ(t)', () => {
  test('e1∧e2 + t·e3∧e4 is not decomposable; the failing relation has value t (Klein quadric, from memory)', () => {
    const omega = addMV(K, basisMV(K, 4, [0, 1]), scaleMV(K, t, basisMV(K, 4, [2, 3])));
    const result = decompose(K, omega);
    assert.equal(result.kind, 'not-decomposable');
    if (result.kind === 'not-decomposable') {
      // p12·p34 − p13·p24 + p14·p23 = 1·t − 0 + 0.
      assert.ok(K.eq(result.relation.value, t) || K.eq(result.relation.value, K.neg(t)));
    }
  });
});

describe('display helpers and fields that do not apply', () => {
  test('Plücker vectors scaled to polynomials without common factor', () => {
    const P = pluckerCoordinates(K, M24, 4);
    const { coordinates, scale } = polynomialRepresentative(K, P);
    const R = K.ring;
    const g = coordinates.reduce((acc, c) => gcdPolynomials(R, acc, c), R.zero);
    assert.ok(R.isOne(g));
    coordinates.forEach((c, i) => assert.ok(K.eq(K.fromPolynomial(c), K.mul(scale, P[i]!))));
    // Over the rationals the coefficients are integers, and the first nonzero coordinate leads with a positive one.
    assert.ok(coordinates.every((c) => c.terms.every((term) => term.coefficient.den === 1n)));
    assert.ok(R.leadingCoefficient(coordinates.find((c) => !R.isZero(c))!).num > 0n);
  });

  test('normalizePoint scales to first-one; the primitive mode falls back to it outside the rationals', () => {
    const P = pluckerCoordinates(K, M24, 4);
    for (const mode of ['first-one', 'primitive'] as const) {
      const point = normalizePoint(K, P, mode);
      assert.equal(point.mode, 'first-one');
      assert.ok(K.isOne(point.values.find((x) => !K.isZero(x))!));
    }
  });

  test('positivity needs an ordered field and refuses QQ(t), which has no sign', () => {
    assert.throws(() => positivityOf(K, pluckerCoordinates(K, M24, 4)), UnorderedFieldError);
  });

  test('GF(2)(t) is infinite, so it is no finite field for the factoriser', () => {
    assert.equal(finiteFieldSize(rationalFunctionField(primeField(2n), ['t'])), undefined);
    assert.equal(finiteFieldSize(primeField(2n)), 2n);
  });
});
