import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import {
  describeDirectionMoment,
  directionMoment,
  dualCoordinates,
  fromDirectionMoment,
  kleinPairing,
  lineMeet,
  lineOfPlanes,
  lineThroughPoints,
  onKleinQuadric,
  type DirectionMomentOptions,
} from '../../server/src/engine/lines-p3.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { columnsOf, mathjsDeterminant } from './exterior-arbitraries.js';
import { fromFraction, math, toFraction } from './linear-arbitraries.js';

const GF2 = primeField(2n);
const GF7 = primeField(7n);

const q = (x: number) => rational(BigInt(x));
const qs = (xs: readonly number[]) => xs.map(q);
const PAIRS = [[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]] as const;

/** p_ij = a_i b_j − a_j b_i in the order 01, 02, 03, 12, 13, 23, written out from the definition. */
function byDefinition<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  return PAIRS.map(([i, j]) => F.sub(F.mul(a[i]!, b[j]!), F.mul(a[j]!, b[i]!)));
}

function dot<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T {
  return a.reduce((acc, x, i) => F.add(acc, F.mul(x, b[i]!)), F.zero);
}

/** Both nonzero and every x_i y_j − x_j y_i zero: the two vectors are proportional. */
function proportional<T>(F: Field<T>, x: readonly T[], y: readonly T[]): boolean {
  if (x.every((v) => F.isZero(v)) || y.every((v) => F.isZero(v))) return false;
  return x.every((xi, i) => y.every((yj, j) => F.eq(F.mul(xi, yj), F.mul(x[j]!, y[i]!))));
}

/** Whether X lies on the line span(a, b): every 3×3 minor of [a; b; X] vanishes (mathjs determinants). */
function onLine(a: readonly Rational[], b: readonly Rational[], x: readonly Rational[]): boolean {
  const m = [a, b, x];
  return [[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]].every((cols) => QQ.isZero(mathjsDeterminant(columnsOf(m, cols))));
}

/** a × b by mathjs (independent reference library). */
function mathjsCross(a: readonly Rational[], b: readonly Rational[]): Rational[] {
  return (math.cross(a.map(toFraction), b.map(toFraction)) as unknown[]).map(fromFraction);
}

const smallQ = fc.integer({ min: -5, max: 5 }).map(q);
const pointQ = fc.array(smallQ, { minLength: 4, maxLength: 4 });
const elementOf = (F: Field<any>, p: number) => fc.integer({ min: 0, max: p - 1 }).map((x) => F.fromBigInt(BigInt(x)));
const nonzero = (F: Field<any>) => (v: readonly any[]) => v.some((x) => !F.isZero(x));
const independentPair = <T>(F: Field<T>, element: fc.Arbitrary<T>) =>
  fc
    .tuple(fc.array(element, { minLength: 4, maxLength: 4 }), fc.array(element, { minLength: 4, maxLength: 4 }))
    .filter(([a, b]) => nonzero(F)(byDefinition(F, a, b)));

const ALL_OPTIONS: DirectionMomentOptions[] = (['direction-moment', 'moment-direction'] as const).flatMap((order) =>
  (['p×d', 'd×p'] as const).flatMap((momentSign) => ([0, 3] as const).map((homogeneousIndex) => ({ order, momentSign, homogeneousIndex }))),
);

describe('the line through two points', () => {
  for (const [F, element] of [
    [QQ, smallQ],
    [GF2, elementOf(GF2, 2)],
    [GF7, elementOf(GF7, 7)],
  ] as [Field<any>, fc.Arbitrary<any>][]) {
    test(`${F.name}: p_ij = a_i b_j − a_j b_i in lex order, on the Klein quadric, negated by swapping the points`, () => {
      fc.assert(
        fc.property(independentPair(F, element), ([a, b]) => {
          const p = lineThroughPoints(F, a, b);
          assert.deepEqual(p, byDefinition(F, a, b));
          assert.ok(onKleinQuadric(F, p));
          assert.deepEqual(lineThroughPoints(F, b, a), p.map((x) => F.neg(x)));
        }),
        { numRuns: 60 },
      );
    });
  }

  test('proportional points span no line', () => {
    assert.throws(() => lineThroughPoints(QQ, qs([1, 2, 0, 3]), qs([-2, -4, 0, -6])), /proportional/);
    assert.throws(() => lineThroughPoints(QQ, qs([1, 2, 0, 3]), qs([0, 0, 0, 0])), /proportional/);
  });

  test('e0∧e1 + e2∧e3 is not on the Klein quadric, even in characteristic 2 where its pairing with itself is 0', () => {
    // p01 p23 − p02 p13 + p03 p12 = 1 for (1, 0, 0, 0, 0, 1) (by hand); the pairing with itself is twice that.
    assert.equal(onKleinQuadric(QQ, qs([1, 0, 0, 0, 0, 1])), false);
    assert.equal(onKleinQuadric(GF2, [1, 0, 0, 0, 0, 1]), false);
    assert.equal(kleinPairing(GF2, [1, 0, 0, 0, 0, 1], [1, 0, 0, 0, 0, 1]), 0);
    assert.ok(QQ.eq(kleinPairing(QQ, qs([1, 0, 0, 0, 0, 1]), qs([1, 0, 0, 0, 0, 1])), q(2)));
  });
});

describe('the Klein pairing decides whether lines meet', () => {
  test('pairing(a∧b, c∧d) = det[a; b; c; d] (mathjs determinant; the 4-fold wedge, classical)', () => {
    fc.assert(
      fc.property(pointQ, pointQ, pointQ, pointQ, (a, b, c, d) => {
        const p = byDefinition(QQ, a, b);
        const r = byDefinition(QQ, c, d);
        assert.ok(QQ.eq(kleinPairing(QQ, p, r), mathjsDeterminant([a, b, c, d])));
        assert.ok(QQ.eq(kleinPairing(QQ, p, r), kleinPairing(QQ, r, p)));
      }),
      { numRuns: 100 },
    );
  });

  test('two lines in a common plane meet (classical): the common point lies on both, the common plane holds all four points', () => {
    // Points in the plane spanned by x, y, z are their combinations; any two lines of a projective plane meet.
    const coefficients = fc.array(smallQ, { minLength: 3, maxLength: 3 });
    fc.assert(
      fc.property(pointQ, pointQ, pointQ, fc.array(coefficients, { minLength: 4, maxLength: 4 }), (x, y, z, cs) => {
        const [a, b, c, d] = cs.map((k) => [0, 1, 2, 3].map((i) => QQ.add(QQ.add(QQ.mul(k[0]!, x[i]!), QQ.mul(k[1]!, y[i]!)), QQ.mul(k[2]!, z[i]!)))) as Rational[][];
        fc.pre(nonzero(QQ)(byDefinition(QQ, a!, b!)) && nonzero(QQ)(byDefinition(QQ, c!, d!)));
        const result = lineMeet(QQ, [a!, b!], [c!, d!]);
        assert.ok(QQ.isZero(result.pairing));
        assert.equal(result.meet, true);
        if (proportional(QQ, byDefinition(QQ, a!, b!), byDefinition(QQ, c!, d!))) {
          assert.equal(result.kind, 'same');
        } else {
          assert.equal(result.kind, 'intersecting');
          assert.ok(onLine(a!, b!, result.commonPoint!) && onLine(c!, d!, result.commonPoint!));
          for (const point of [a!, b!, c!, d!]) assert.ok(QQ.isZero(dot(QQ, result.commonPlane!, point)));
        }
      }),
      { numRuns: 100 },
    );
  });

  test('skew lines have a nonzero pairing: four independent points (mathjs determinant ≠ 0)', () => {
    fc.assert(
      fc.property(pointQ, pointQ, pointQ, pointQ, (a, b, c, d) => {
        const det = mathjsDeterminant([a, b, c, d]);
        fc.pre(!QQ.isZero(det));
        const result = lineMeet(QQ, [a, b], [c, d]);
        assert.equal(result.kind, 'skew');
        assert.equal(result.meet, false);
        assert.ok(QQ.eq(result.pairing, det));
      }),
      { numRuns: 60 },
    );
  });

  test('the x-axis and the line x = 0, z = 1 are skew with pairing −1 (determinant by hand)', () => {
    // det[(1,0,0,0); (1,1,0,0); (1,0,0,1); (1,0,1,1)]: subtract the first row, then the last two rows give det[[0,1],[1,1]] = −1.
    const result = lineMeet(QQ, [qs([1, 0, 0, 0]), qs([1, 1, 0, 0])], [qs([1, 0, 0, 1]), qs([1, 0, 1, 1])]);
    assert.equal(result.kind, 'skew');
    assert.ok(QQ.eq(result.pairing, q(-1)));
  });

  test('parallel lines meet at infinity: told apart from intersecting ones only with a plane at infinity', () => {
    // x-axis and the line y = 1, z = 0: both have direction (1, 0, 0), so they meet at (0 : 1 : 0 : 0) in the plane z = 0.
    const xAxis = [qs([1, 0, 0, 0]), qs([1, 1, 0, 0])];
    const shifted = [qs([1, 0, 1, 0]), qs([1, 1, 1, 0])];
    const infinity = qs([1, 0, 0, 0]);
    const parallel = lineMeet(QQ, xAxis, shifted, infinity);
    assert.equal(parallel.kind, 'parallel');
    assert.ok(QQ.isZero(parallel.pairing));
    assert.deepEqual(parallel.commonPoint, qs([0, 1, 0, 0]));
    assert.deepEqual(parallel.commonPlane, qs([0, 0, 0, 1]));
    assert.equal(lineMeet(QQ, xAxis, shifted).kind, 'intersecting');
    // The x- and y-axes meet at the origin (1 : 0 : 0 : 0), a finite point.
    const axes = lineMeet(QQ, xAxis, [qs([1, 0, 0, 0]), qs([1, 0, 1, 0])], infinity);
    assert.equal(axes.kind, 'intersecting');
    assert.deepEqual(axes.commonPoint, qs([1, 0, 0, 0]));
  });

  test('the same line from two different bases, and rows that span no line', () => {
    const result = lineMeet(QQ, [qs([1, 0, 0, 0]), qs([1, 1, 0, 0])], [qs([2, 5, 0, 0]), qs([0, -1, 0, 0])]);
    assert.equal(result.kind, 'same');
    assert.equal(result.meet, true);
    assert.throws(() => lineMeet(QQ, [qs([1, 2, 3, 4]), qs([2, 4, 6, 8])], [qs([1, 0, 0, 0]), qs([0, 1, 0, 0])]), /proportional/);
  });

  test('over GF(7) the same classification works: the lines e0∧e1 and e0∧e2 meet at e0 in the plane x3 = 0', () => {
    const L1 = [[1, 0, 0, 0], [0, 1, 0, 0]];
    const L2 = [[1, 0, 0, 0], [0, 0, 1, 0]];
    const r = lineMeet(GF7, L1, L2, [1, 0, 0, 0]);
    assert.equal(r.kind, 'intersecting');
    assert.deepEqual(r.commonPoint, [1, 0, 0, 0]);
    assert.deepEqual(r.commonPlane, [0, 0, 0, 1]);
    // Declaring x3 = 0 the plane at infinity puts e0 on it, so the same pair counts as parallel.
    assert.equal(lineMeet(GF7, L1, L2, [0, 0, 0, 1]).kind, 'parallel');
  });
});

describe('the line where two planes meet, and plane coordinates', () => {
  test('worked by hand: the planes x1 = x2 and x3 = 0 meet in the line through e0 and e1 + e2', () => {
    // The line through a = e0 and b = e1 + e2 has p = (1, 1, 0, 0, 0, 0). Its points satisfy x1 − x2 = 0 and x3 = 0:
    // u = (0, 1, −1, 0), v = (0, 0, 0, 1), π = u∧v = (0, 0, 0, 0, 1, −1), and (π23, −π13, π12, π03, −π02, π01)
    // = (−1, −1, 0, 0, 0, 0), proportional to p.
    const line = lineOfPlanes(QQ, qs([0, 1, -1, 0]), qs([0, 0, 0, 1]));
    assert.deepEqual(line.dual, qs([0, 0, 0, 0, 1, -1]));
    assert.deepEqual(dualCoordinates(QQ, line.dual), qs([-1, -1, 0, 0, 0, 0]));
    assert.ok(proportional(QQ, line.plucker, qs([1, 1, 0, 0, 0, 0])));
  });

  for (const [F, element] of [
    [QQ, smallQ],
    [GF7, elementOf(GF7, 7)],
  ] as [Field<any>, fc.Arbitrary<any>][]) {
    test(`${F.name}: the line lies on both planes and its Plücker vector is ∝ (π23, −π13, π12, π03, −π02, π01) (classical)`, () => {
      fc.assert(
        fc.property(independentPair(F, element), ([u, v]) => {
          const line = lineOfPlanes(F, u, v);
          assert.equal(line.rows.length, 2);
          for (const row of line.rows) assert.ok(F.isZero(dot(F, u, row)) && F.isZero(dot(F, v, row)));
          assert.deepEqual(line.dual, byDefinition(F, u, v));
          assert.deepEqual(line.plucker, byDefinition(F, line.rows[0]!, line.rows[1]!));
          const [d01, d02, d03, d12, d13, d23] = line.dual;
          assert.ok(proportional(F, line.plucker, [d23, F.neg(d13), d12, d03, F.neg(d02), d01]));
        }),
        { numRuns: 60 },
      );
    });
  }

  test('the line through two points equals the line of any two planes through both', () => {
    fc.assert(
      fc.property(independentPair(QQ, smallQ), ([a, b]) => {
        // Two planes through a and b: the plane coordinates of the line, read back as dual vectors of its annihilator.
        const planes = lineOfPlanes(QQ, a, b).rows;
        const line = lineOfPlanes(QQ, planes[0]!, planes[1]!);
        assert.ok(proportional(QQ, line.plucker, lineThroughPoints(QQ, a, b)));
      }),
      { numRuns: 60 },
    );
  });

  test('dualCoordinates is its own inverse and turns the pairing into a dot product', () => {
    fc.assert(
      fc.property(fc.array(smallQ, { minLength: 6, maxLength: 6 }), fc.array(smallQ, { minLength: 6, maxLength: 6 }), (x, y) => {
        assert.deepEqual(dualCoordinates(QQ, dualCoordinates(QQ, x)), x);
        assert.ok(QQ.eq(kleinPairing(QQ, x, y), dot(QQ, x, dualCoordinates(QQ, y))));
      }),
      { numRuns: 60 },
    );
  });

  test('proportional planes meet in no line', () => {
    assert.throws(() => lineOfPlanes(QQ, qs([1, 2, 3, 4]), qs([3, 6, 9, 12])), /proportional/);
  });
});

describe('direction and moment', () => {
  test('worked example: A = (1, 2, 3), B = (4, 6, 8) give d = (3, 4, 5) and m = (−2, 4, −2), for x0 or x3 homogeneous', () => {
    // By hand: d = B − A = (3, 4, 5); m = A × d = (2·5 − 3·4, 3·3 − 1·5, 1·4 − 2·3) = (−2, 4, −2); d · m = −6 + 16 − 10 = 0.
    // With x0 homogeneous, a = (1, 1, 2, 3), b = (1, 4, 6, 8): p = (3, 4, 5, −2, −4, −2), so d = (p01, p02, p03)
    // and m = (p23, −p13, p12). With x3 homogeneous, a = (1, 2, 3, 1), b = (4, 6, 8, 1): p01 = 6 − 8 = −2,
    // p02 = 8 − 12 = −4, p03 = 1 − 4 = −3, p12 = 16 − 18 = −2, p13 = 2 − 6 = −4, p23 = 3 − 8 = −5,
    // so d = (−p03, −p13, −p23) = (3, 4, 5) and m = (p12, −p02, p01) = (−2, 4, −2); d × A is its negative (2, −4, 2).
    const p0 = lineThroughPoints(QQ, qs([1, 1, 2, 3]), qs([1, 4, 6, 8]));
    assert.deepEqual(p0, qs([3, 4, 5, -2, -4, -2]));
    const first = directionMoment(QQ, p0, { order: 'direction-moment', momentSign: 'p×d', homogeneousIndex: 0 });
    assert.deepEqual(first.direction, qs([3, 4, 5]));
    assert.deepEqual(first.moment, qs([-2, 4, -2]));
    assert.deepEqual(first.coordinates, qs([3, 4, 5, -2, 4, -2]));
    const p3 = lineThroughPoints(QQ, qs([1, 2, 3, 1]), qs([4, 6, 8, 1]));
    assert.deepEqual(p3, qs([-2, -4, -3, -2, -4, -5]));
    const last = directionMoment(QQ, p3, { order: 'moment-direction', momentSign: 'd×p', homogeneousIndex: 3 });
    assert.deepEqual(last.direction, qs([3, 4, 5]));
    assert.deepEqual(last.moment, qs([2, -4, 2]));
    assert.deepEqual(last.coordinates, qs([2, -4, 2, 3, 4, 5]));
  });

  test('m = A × (B − A) = X × d for any point X of the line (mathjs cross products), both homogeneous positions', () => {
    const euclid = fc.array(smallQ, { minLength: 3, maxLength: 3 });
    fc.assert(
      fc.property(euclid, euclid, smallQ, (A, B, t) => {
        const d = A.map((x, i) => QQ.sub(B[i]!, x));
        const X = A.map((x, i) => QQ.add(x, QQ.mul(t, d[i]!)));
        const expected = mathjsCross(A, d);
        assert.deepEqual(mathjsCross(X, d), expected);
        for (const h of [0, 3] as const) {
          const lift = (P: Rational[]) => (h === 0 ? [QQ.one, ...P] : [...P, QQ.one]);
          // A = B gives the zero vector, which no line has; skip it.
          if (d.every((x) => QQ.isZero(x))) continue;
          const p = lineThroughPoints(QQ, lift(A), lift(B));
          const pd = directionMoment(QQ, p, { order: 'direction-moment', momentSign: 'p×d', homogeneousIndex: h });
          assert.deepEqual(pd.direction, d);
          assert.deepEqual(pd.moment, expected);
          const dp = directionMoment(QQ, p, { order: 'direction-moment', momentSign: 'd×p', homogeneousIndex: h });
          assert.deepEqual(dp.moment, mathjsCross(d, A));
        }
      }),
      { numRuns: 100 },
    );
  });

  for (const options of ALL_OPTIONS) {
    const label = `${options.order}, ${options.momentSign}, x${options.homogeneousIndex}`;
    test(`${label}: round trip both ways, and d · m = ±(p01 p23 − p02 p13 + p03 p12)`, () => {
      for (const [F, element] of [
        [QQ, smallQ],
        [GF7, elementOf(GF7, 7)],
      ] as [Field<any>, fc.Arbitrary<any>][]) {
        fc.assert(
          fc.property(fc.array(element, { minLength: 6, maxLength: 6 }), (p) => {
            const dm = directionMoment(F, p, options);
            assert.deepEqual(fromDirectionMoment(F, dm, options), p);
            assert.deepEqual(fromDirectionMoment(F, dm.coordinates, options), p);
            assert.deepEqual(directionMoment(F, fromDirectionMoment(F, p, options), options).coordinates, p);
            // d · m equals the Klein form up to the sign −1 for x3 homogeneous and −1 for d×p (derived from the formulas).
            const [p01, p02, p03, p12, p13, p23] = p;
            const form = F.add(F.sub(F.mul(p01, p23), F.mul(p02, p13)), F.mul(p03, p12));
            const flips = (options.homogeneousIndex === 3 ? 1 : 0) + (options.momentSign === 'd×p' ? 1 : 0);
            assert.ok(F.eq(dot(F, dm.direction, dm.moment), flips % 2 === 0 ? form : F.neg(form)));
            assert.equal(F.isZero(dot(F, dm.direction, dm.moment)), onKleinQuadric(F, p));
          }),
          { numRuns: 40 },
        );
      }
    });
  }

  test('the moment is orthogonal to the direction for every line', () => {
    fc.assert(
      fc.property(independentPair(QQ, smallQ), fc.constantFrom(...ALL_OPTIONS), ([a, b], options) => {
        const { direction, moment } = directionMoment(QQ, lineThroughPoints(QQ, a, b), options);
        assert.ok(QQ.isZero(dot(QQ, direction, moment)));
      }),
      { numRuns: 100 },
    );
  });

  test('the hover sentence states the formulas (expected text written from the hand derivation)', () => {
    const s00 = describeDirectionMoment({ order: 'direction-moment', momentSign: 'p×d', homogeneousIndex: 0 });
    assert.match(s00, /d = \(p01, p02, p03\)/);
    assert.match(s00, /m = \(p23, −p13, p12\)/);
    assert.match(s00, /\(d1, d2, d3, m1, m2, m3\)/);
    assert.match(s00, /\(x1, x2, x3\)\/x0/);
    const s3 = describeDirectionMoment({ order: 'moment-direction', momentSign: 'd×p', homogeneousIndex: 3 });
    assert.match(s3, /d = \(−p03, −p13, −p23\)/);
    assert.match(s3, /m = \(−p12, p02, −p01\)/);
    assert.match(s3, /\(m1, m2, m3, d1, d2, d3\)/);
    assert.match(s3, /d × A/);
  });
});
