import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import {
  coordinatesIn,
  findDependency,
  identity,
  intersectRowSpaces,
  isZeroVector,
  kernel,
  matrixEquals,
  multiply,
  rank,
  rowSpaceEquals,
  rref,
  solve,
  sumRowSpaces,
  transpose,
} from '../../server/src/engine/matrix.js';
import { QQ, parseRational, rational, type Rational } from '../../server/src/engine/rational.js';
import {
  FIELD_CASES,
  QQ_CASE,
  anyMatrix,
  applyMatrix,
  combine,
  deepCopy,
  fromFraction,
  math,
  matrixOf,
  sizedMatrix,
  toFraction,
  vectorsEqual,
  type FieldCase,
} from './linear-arbitraries.js';

const q = (rows: string[][]): Rational[][] => rows.map((row) => row.map(parseRational));
const fmt = (rows: Rational[][]) => rows.map((row) => row.map((x) => QQ.format(x)));

/** Whether `rows` has the shape of a reduced row echelon form with these pivots. */
function assertReducedEchelonShape<T>(F: Field<T>, rows: T[][], pivots: number[]) {
  assert.equal(rows.length, pivots.length);
  pivots.forEach((pivot, i) => {
    if (i > 0) assert.ok(pivot > pivots[i - 1]!, 'pivots ascend');
    assert.ok(F.isOne(rows[i]![pivot]!), 'pivot entries are 1');
    for (let c = 0; c < pivot; c++) assert.ok(F.isZero(rows[i]![c]!), 'zeros before each pivot');
    rows.forEach((other, k) => {
      if (k !== i) assert.ok(F.isZero(other[pivot]!), 'zeros above and below each pivot');
    });
  });
}

/**
 * A random invertible row operation applied to a copy of m: a swap, a scaling by a
 * nonzero element, or adding a multiple of one row to another.
 */
function rowOperation(fieldCase: FieldCase, nrows: number) {
  const { F, element } = fieldCase;
  return fc
    .tuple(fc.integer({ min: 0, max: 2 }), fc.nat({ max: Math.max(nrows - 1, 0) }), fc.nat({ max: Math.max(nrows - 1, 0) }), element)
    .map(([kind, i, j, c]) => (m: any[][]) => {
      const out = deepCopy(m);
      if (out.length === 0) return out;
      if (kind === 0) [out[i], out[j]] = [out[j]!, out[i]!];
      else if (kind === 1 && !F.isZero(c)) out[i] = out[i]!.map((x: any) => F.mul(c, x));
      else if (i !== j) out[i] = out[i]!.map((x: any, col: number) => F.add(x, F.mul(c, out[j]![col])));
      return out;
    });
}

/** All k-element subsets of 0..n-1. */
function subsets(n: number, k: number): number[][] {
  if (k === 0) return [[]];
  if (n < k) return [];
  return [...subsets(n - 1, k), ...subsets(n - 1, k - 1).map((s) => [...s, n - 1])];
}

describe('rref over QQ by hand', () => {
  test('a rank-2 example (worked by hand)', () => {
    // Rows (1,2,3), (2,4,6), (1,0,1): the second row is twice the first. Subtracting the first row from the
    // third gives (0,-2,-2), scaled to (0,1,1); then (1,2,3) − 2·(0,1,1) = (1,0,1).
    const { rows, pivots, rank: r } = rref(QQ, q([['1', '2', '3'], ['2', '4', '6'], ['1', '0', '1']]));
    assert.deepEqual(fmt(rows), [['1', '0', '1'], ['0', '1', '1']]);
    assert.deepEqual(pivots, [0, 1]);
    assert.equal(r, 2);
  });

  test('a matrix without rows needs ncols, and the zero matrix has rank 0', () => {
    assert.deepEqual(rref(QQ, [], 3), { rows: [], pivots: [], rank: 0 });
    assert.equal(rank(QQ, q([['0', '0'], ['0', '0']])), 0);
  });

  test('ragged input is refused', () => {
    assert.throws(() => rref(QQ, q([['1', '2'], ['3']])), /row 1 has 1 entries, expected 2/);
  });
});

for (const fieldCase of FIELD_CASES) {
  const F = fieldCase.F;
  describe(`linear algebra over ${F.name}`, () => {
    test('rref has the reduced echelon shape, and every row of m is Σ m[pivot_i]·rref_i', () => {
      fc.assert(
        fc.property(anyMatrix(fieldCase), ({ rows: m, ncols }) => {
          const before = deepCopy(m);
          const { rows, pivots, rank: r } = rref(F, m, ncols);
          assert.deepEqual(m, before, 'input unchanged');
          assert.equal(r, rows.length);
          assertReducedEchelonShape(F, rows, pivots);
          // In a reduced echelon basis the coordinates of a vector are its entries at the pivot columns.
          for (const row of m) {
            const coefficients = pivots.map((p) => row[p]);
            assert.ok(vectorsEqual(F, combine(F, coefficients, rows, ncols), row));
          }
        }),
      );
    });

    test('RREF uniqueness: row operations and added combinations do not change it (Hoffman–Kunze §1.4, from memory)', () => {
      const scenario = anyMatrix(fieldCase).chain((sized) =>
        fc.tuple(
          fc.constant(sized),
          fc.array(rowOperation(fieldCase, sized.rows.length), { maxLength: 12 }),
          fc.array(fc.array(fieldCase.element, { minLength: sized.rows.length, maxLength: sized.rows.length }), { maxLength: 3 }),
        ),
      );
      fc.assert(
        fc.property(scenario, ([{ rows: m, ncols }, operations, extraCombinations]) => {
          let changed = operations.reduce((acc, op) => op(acc), m);
          changed = [...changed, ...extraCombinations.map((c) => combine(F, c, m, ncols))];
          const a = rref(F, m, ncols);
          const b = rref(F, changed, ncols);
          assert.deepEqual(b.pivots, a.pivots);
          assert.ok(matrixEquals(F, a.rows, b.rows));
          assert.ok(rowSpaceEquals(F, m, changed, ncols));
        }),
      );
    });

    test('rank–nullity: rank + dim kernel = ncols, m·k = 0, and the kernel basis is independent', () => {
      fc.assert(
        fc.property(anyMatrix(fieldCase), ({ rows: m, ncols }) => {
          const k = kernel(F, m, ncols);
          assert.equal(rank(F, m, ncols) + k.length, ncols);
          for (const x of k) {
            assert.equal(x.length, ncols);
            assert.ok(isZeroVector(F, applyMatrix(F, m, x)));
          }
          assert.equal(rank(F, k, ncols), k.length);
        }),
      );
    });

    test('the kernel basis is the standard one: each free variable 1 in its own vector, the others 0', () => {
      fc.assert(
        fc.property(anyMatrix(fieldCase), ({ rows: m, ncols }) => {
          const { pivots } = rref(F, m, ncols);
          const free = [...Array(ncols).keys()].filter((c) => !pivots.includes(c));
          const k = kernel(F, m, ncols);
          k.forEach((x, i) => free.forEach((f, j) => assert.ok(i === j ? F.isOne(x[f]) : F.isZero(x[f]))));
        }),
      );
    });

    test('solve finds a solution of a consistent system and reports an inconsistent one', () => {
      const scenario = anyMatrix(fieldCase).chain((sized) =>
        fc.tuple(
          fc.constant(sized),
          fc.array(fieldCase.element, { minLength: sized.ncols, maxLength: sized.ncols }),
          fc.array(fieldCase.element, { minLength: sized.rows.length, maxLength: sized.rows.length }),
        ),
      );
      fc.assert(
        fc.property(scenario, ([{ rows: a, ncols }, x0, arbitraryB]) => {
          const b = applyMatrix(F, a, x0);
          const x = solve(F, a, b, ncols);
          assert.ok(x !== undefined && vectorsEqual(F, applyMatrix(F, a, x), b));
          // A system is consistent exactly when appending b as a column keeps the rank (Rouché–Capelli theorem).
          const y = solve(F, a, arbitraryB, ncols);
          const consistent = rank(F, a.map((row, i) => [...row, arbitraryB[i]]), ncols + 1) === rank(F, a, ncols);
          assert.equal(y !== undefined, consistent);
          if (y !== undefined) assert.ok(vectorsEqual(F, applyMatrix(F, a, y), arbitraryB));
        }),
      );
    });

    test('findDependency: the first dependent vector, with coefficients that reproduce it', () => {
      const vectors = fc
        .integer({ min: 1, max: 6 })
        .chain((n) => fc.oneof(sizedMatrix(fieldCase.element, 6, n), anyMatrix(fieldCase, 6, n)))
        .map(({ rows }) => rows);
      fc.assert(
        fc.property(vectors, (vs) => {
          const before = deepCopy(vs);
          const dependency = findDependency(F, vs);
          assert.deepEqual(vs, before, 'input unchanged');
          const ncols = vs[0]?.length ?? 0;
          if (dependency === undefined) {
            assert.equal(rank(F, vs, ncols), vs.length);
            return;
          }
          const { index, coefficients } = dependency;
          assert.equal(coefficients.length, index);
          assert.equal(rank(F, vs.slice(0, index), ncols), index, 'the vectors before it are independent');
          assert.ok(vectorsEqual(F, combine(F, coefficients, vs, ncols), vs[index]!));
        }),
      );
    });

    test('coordinatesIn gives the unique coordinates in an independent list, or undefined outside its span', () => {
      const scenario = anyMatrix(fieldCase).chain(({ rows, ncols }) => {
        const basis = rref(F, rows, ncols).rows;
        return fc.tuple(
          fc.constant({ basis, ncols }),
          fc.array(fieldCase.element, { minLength: basis.length, maxLength: basis.length }),
          fc.array(fieldCase.element, { minLength: ncols, maxLength: ncols }),
        );
      });
      fc.assert(
        fc.property(scenario, ([{ basis, ncols }, c, v]) => {
          const coordinates = coordinatesIn(F, basis, combine(F, c, basis, ncols));
          assert.ok(coordinates !== undefined && vectorsEqual(F, coordinates, c));
          const inSpan = rank(F, [...basis, v], ncols) === basis.length;
          const found = coordinatesIn(F, basis, v);
          assert.equal(found !== undefined, inSpan);
          if (found !== undefined) assert.ok(vectorsEqual(F, combine(F, found, basis, ncols), v));
        }),
      );
    });

    test("Grassmann's formula dim(U ∩ W) = dim U + dim W − dim(U + W), with U ∩ W inside both", () => {
      const pair = fc
        .integer({ min: 1, max: 6 })
        .chain((n) => fc.tuple(anyMatrix(fieldCase, 5, n), anyMatrix(fieldCase, 5, n)))
        .filter(([u, w]) => u.ncols === w.ncols);
      const samePair = fc.integer({ min: 1, max: 6 }).chain((n) =>
        fc.tuple(fc.constant(n), fc.integer({ min: 0, max: 5 }), fc.integer({ min: 0, max: 5 }), fc.integer({ min: 1, max: 3 })).chain(([c, r1, r2, k]) =>
          // Build U and W from a shared random part so that their intersection is often nontrivial.
          fc.tuple(matrixOf(fieldCase.element, k, c), matrixOf(fieldCase.element, r1, c), matrixOf(fieldCase.element, r2, c)).map(([shared, u, w]) => [
            { rows: [...shared, ...u], ncols: c },
            { rows: [...w, ...shared], ncols: c },
          ]),
        ),
      );
      fc.assert(
        fc.property(fc.oneof(pair, samePair), ([u, w]) => {
          const ncols = u!.ncols;
          const before = [deepCopy(u!.rows), deepCopy(w!.rows)];
          const meet = intersectRowSpaces(F, u!.rows, w!.rows, ncols);
          const join = sumRowSpaces(F, u!.rows, w!.rows, ncols);
          assert.deepEqual([u!.rows, w!.rows], before, 'inputs unchanged');
          const dimU = rank(F, u!.rows, ncols);
          const dimW = rank(F, w!.rows, ncols);
          assert.equal(join.length, rank(F, [...u!.rows, ...w!.rows], ncols));
          assert.equal(meet.length, dimU + dimW - join.length);
          assert.equal(rank(F, [...u!.rows, ...meet], ncols), dimU, 'U ∩ W lies in U');
          assert.equal(rank(F, [...w!.rows, ...meet], ncols), dimW, 'U ∩ W lies in W');
          assert.ok(matrixEquals(F, rref(F, meet, ncols).rows, meet), 'the basis is in RREF');
        }),
      );
    });
  });
}

describe('worked examples over QQ', () => {
  test('solve the system 2x + y − z = 8, −3x − y + 2z = −11, −2x + y + 2z = −3 (classic elimination example, from memory)', () => {
    // Checked by hand: 4 + 3 + 1 = 8, −6 − 3 − 2 = −11, −4 + 3 − 2 = −3 for (x, y, z) = (2, 3, −1).
    const a = q([['2', '1', '-1'], ['-3', '-1', '2'], ['-2', '1', '2']]);
    const b = ['8', '-11', '-3'].map(parseRational);
    assert.deepEqual(solve(QQ, a, b, 3)?.map((x) => QQ.format(x)), ['2', '3', '-1']);
  });

  test('x + y = 1 and 2x + 2y = 3 have no common solution (worked by hand: twice the first gives 2, not 3)', () => {
    assert.equal(solve(QQ, q([['1', '1'], ['2', '2']]), ['1', '3'].map(parseRational), 2), undefined);
  });

  test('(1,2,3), (4,5,6), (7,8,9): the third is 2·(4,5,6) − (1,2,3) (worked by hand)', () => {
    // 2·(4,5,6) − (1,2,3) = (8−1, 10−2, 12−3) = (7,8,9); (1,2,3) and (4,5,6) are not proportional.
    const dependency = findDependency(QQ, q([['1', '2', '3'], ['4', '5', '6'], ['7', '8', '9']]));
    assert.equal(dependency?.index, 2);
    assert.deepEqual(dependency?.coefficients.map((x) => QQ.format(x)), ['-1', '2']);
  });

  test('a zero vector first is dependent on the empty list; independent lists give undefined', () => {
    assert.deepEqual(findDependency(QQ, q([['0', '0'], ['1', '0']])), { index: 0, coefficients: [] });
    assert.equal(findDependency(QQ, q([['1', '0'], ['1', '1']])), undefined);
    assert.equal(findDependency(QQ, []), undefined);
    const later = findDependency(QQ, q([['1', '0', '0'], ['0', '1', '0'], ['0', '0', '1'], ['1', '1', '1'], ['0', '0', '0']]));
    assert.equal(later?.index, 3);
    assert.deepEqual(later?.coefficients.map((x) => QQ.format(x)), ['1', '1', '1']);
  });

  test('the xy-plane meets the yz-plane in the y-axis (common practice, no source)', () => {
    const xy = q([['1', '0', '0'], ['0', '1', '0']]);
    const yz = q([['0', '1', '1'], ['0', '0', '1']]);
    assert.deepEqual(fmt(intersectRowSpaces(QQ, xy, yz, 3)), [['0', '1', '0']]);
    assert.deepEqual(fmt(sumRowSpaces(QQ, xy, yz, 3)), [['1', '0', '0'], ['0', '1', '0'], ['0', '0', '1']]);
    assert.deepEqual(intersectRowSpaces(QQ, xy, [], 3), []);
  });

  test('the kernel of [1 2 3] is spanned by (−2,1,0) and (−3,0,1) (worked by hand: x = −2y − 3z)', () => {
    assert.deepEqual(fmt(kernel(QQ, q([['1', '2', '3']]), 3)), [['-2', '1', '0'], ['-3', '0', '1']]);
    assert.deepEqual(fmt(kernel(QQ, [], 2)), [['1', '0'], ['0', '1']]);
  });
});

describe('rank against the largest nonvanishing minor, with mathjs determinants (independent reference library)', () => {
  // The rank of a matrix is the largest size of a square submatrix with nonzero determinant (textbook theorem, from memory).
  test('random rational matrices up to 4×5', () => {
    fc.assert(
      fc.property(anyMatrix(QQ_CASE, 4, 5), ({ rows: m, ncols }) => {
        let largest = 0;
        for (let k = 1; k <= Math.min(m.length, ncols); k++) {
          for (const rowSet of subsets(m.length, k)) {
            for (const colSet of subsets(ncols, k)) {
              const minor = rowSet.map((r) => colSet.map((c) => toFraction(m[r]![c]!)));
              if (!QQ.isZero(fromFraction(math.det(minor)))) largest = k;
            }
          }
        }
        assert.equal(rank(QQ, m, ncols), largest);
      }),
      { numRuns: 60 },
    );
  });
});

describe('products, transposes and identities', () => {
  test('multiply agrees with mathjs on fraction matrices (independent reference library)', () => {
    const shapes = fc.tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }));
    fc.assert(
      fc.property(
        shapes.chain(([r, k, c]) => fc.tuple(matrixOf(QQ_CASE.element, r, k), matrixOf(QQ_CASE.element, k, c))),
        ([a, b]) => {
          const expected = (math.multiply(a.map((row) => row.map(toFraction)), b.map((row) => row.map(toFraction))) as unknown[][]).map(
            (row) => row.map(fromFraction),
          );
          assert.ok(matrixEquals(QQ, multiply(QQ, a, b), expected));
        },
      ),
    );
  });

  for (const fieldCase of FIELD_CASES) {
    const F = fieldCase.F;
    test(`(AB)ᵀ = BᵀAᵀ and I·A = A·I = A over ${F.name} (textbook identities)`, () => {
      const shapes = fc.tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }));
      fc.assert(
        fc.property(
          shapes.chain(([r, k, c]) => fc.tuple(matrixOf(fieldCase.element, r, k), matrixOf(fieldCase.element, k, c))),
          ([a, b]) => {
            assert.ok(matrixEquals(F, transpose(multiply(F, a, b)), multiply(F, transpose(b), transpose(a))));
            assert.ok(matrixEquals(F, multiply(F, identity(F, a.length), a), a));
            assert.ok(matrixEquals(F, multiply(F, a, identity(F, a[0]!.length)), a));
          },
        ),
        { numRuns: 50 },
      );
    });
  }

  test('shapes with no rows or no columns', () => {
    assert.deepEqual(transpose([], 2), [[], []]);
    assert.deepEqual(multiply(QQ, [[], []], [], 3), [
      [QQ.zero, QQ.zero, QQ.zero],
      [QQ.zero, QQ.zero, QQ.zero],
    ]);
    assert.throws(() => multiply(QQ, q([['1', '2']]), q([['1', '2']])), /row 0 has 2 entries, expected 1/);
  });

  test('matrixEquals and isZeroVector', () => {
    assert.equal(matrixEquals(QQ, q([['1', '2']]), q([['1', '2']])), true);
    assert.equal(matrixEquals(QQ, q([['1', '2']]), q([['1', '3']])), false);
    assert.equal(matrixEquals(QQ, q([['1', '2']]), q([['1', '2'], ['0', '0']])), false);
    assert.equal(isZeroVector(QQ, [QQ.zero, rational(0n, 5n)]), true);
    assert.equal(isZeroVector(QQ, [QQ.zero, QQ.one]), false);
  });
});
