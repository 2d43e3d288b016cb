import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { EnumerationLimitError } from '../../server/src/engine/grassmannian.js';
import { circuits, matroidOf, nonBases, rankOfColumns } from '../../server/src/engine/matroid.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { bruteSubsets, mathjsDeterminant } from './exterior-arbitraries.js';
import { matrixOf } from './linear-arbitraries.js';

const GF2 = primeField(2n);
const GF3 = primeField(3n);
const GF7 = primeField(7n);

/** An integer matrix as rationals. */
function overQQ(m: readonly (readonly number[])[]): Rational[][] {
  return m.map((row) => row.map((x) => rational(BigInt(x))));
}

/** An integer matrix reduced into a prime field. */
function overField<T>(F: Field<T>, m: readonly (readonly number[])[]): T[][] {
  return m.map((row) => row.map((x) => F.fromBigInt(BigInt(x))));
}

/**
 * Whether the integer determinant of the square submatrix, computed by mathjs
 * (independent reference library), is nonzero in characteristic p (p = 0: over QQ).
 * The determinant of the reduction mod p is the reduction of the integer determinant.
 */
function minorNonzero(m: readonly (readonly number[])[], rows: readonly number[], cols: readonly number[], p: bigint): boolean {
  // The empty minor is 1 by convention (the empty set of columns is independent).
  if (cols.length === 0) return true;
  const det = mathjsDeterminant(overQQ(rows.map((r) => cols.map((c) => m[r]![c]!))));
  assert.equal(det.den, 1n);
  return p === 0n ? det.num !== 0n : det.num % p !== 0n;
}

/** The rank of the columns `cols` as the size of the largest nonvanishing minor (textbook theorem, from memory). */
function referenceRank(m: readonly (readonly number[])[], cols: readonly number[], p: bigint): number {
  let largest = 0;
  for (let size = 1; size <= Math.min(m.length, cols.length); size++) {
    let found = false;
    for (const rowSet of bruteSubsets(m.length, size)) {
      for (const colSet of bruteSubsets(cols.length, size)) {
        if (minorNonzero(m, rowSet, colSet.map((i) => cols[i]!), p)) {
          found = true;
          break;
        }
      }
      if (found) break;
    }
    if (found) largest = size;
  }
  return largest;
}

/** All subsets of {0..n−1}, every size (independent of the engine's enumeration). */
function allSubsets(n: number): number[][] {
  const out: number[][] = [];
  for (let size = 0; size <= n; size++) out.push(...bruteSubsets(n, size));
  return out;
}

const smallInteger = fc.oneof({ arbitrary: fc.constant(0), weight: 2 }, { arbitrary: fc.integer({ min: -3, max: 3 }), weight: 3 });
const integerMatrix = fc
  .tuple(fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 6 }))
  .chain(([k, n]) => matrixOf(smallInteger, k, n).map((m) => ({ m, n })));

// The 3×7 matrix whose columns are the seven nonzero vectors of GF(2)^3:
// 100, 010, 001, 110, 101, 011, 111 (columns 0..6).
const FANO = [
  [1, 0, 0, 1, 1, 0, 1],
  [0, 1, 0, 1, 0, 1, 1],
  [0, 0, 1, 0, 1, 1, 1],
];
// The lines of the Fano plane are the triples {x, y, x + y} over GF(2), listed by hand from the columns above.
const FANO_LINES = [
  [0, 1, 3],
  [0, 2, 4],
  [0, 5, 6],
  [1, 2, 5],
  [1, 4, 6],
  [2, 3, 6],
  [3, 4, 5],
];

describe('the field changes the matroid: the Fano matrix over GF(2), GF(3) and QQ', () => {
  // Fano matroid F7 (e.g. Oxley, Matroid Theory, §1.5 — from memory): its rank-3 nonbases are the 7 lines
  // of the Fano plane, so it has C(7,3) − 7 = 28 bases. Over QQ the columns 110, 101, 011 have
  // determinant −2 (computed by mathjs below), so they form a basis and only 6 triples are dependent.
  test('over GF(2) the nonbases are exactly the 7 lines and there are 28 bases', () => {
    const M = matroidOf(GF2, overField(GF2, FANO), 7);
    assert.equal(M.field, 'GF(2)');
    assert.equal(M.rank, 3);
    assert.equal(M.bases.length, 28);
    assert.deepEqual(nonBases(GF2, overField(GF2, FANO), 7), FANO_LINES);
    assert.equal(M.isUniform, false);
    assert.deepEqual(M.loops, []);
    assert.deepEqual(M.coloops, []);
  });

  test('over QQ the triple 110, 101, 011 is a basis (mathjs determinant −2) and 29 triples are bases', () => {
    const rows = overQQ(FANO);
    assert.ok(QQ.eq(mathjsDeterminant(rows.map((r) => [3, 4, 5].map((c) => r[c]!))), rational(-2n)));
    const M = matroidOf(QQ, rows, 7);
    assert.equal(M.field, 'QQ');
    assert.equal(M.bases.length, 29);
    assert.ok(M.bases.some((b) => b.join() === '3,4,5'));
    assert.deepEqual(nonBases(QQ, rows, 7), FANO_LINES.filter((l) => l.join() !== '3,4,5'));
    assert.equal(rankOfColumns(QQ, rows, [3, 4, 5]), 3);
    assert.equal(rankOfColumns(GF2, overField(GF2, FANO), [3, 4, 5]), 2);
  });

  test('over GF(3) the determinant −2 is nonzero too, so the matroid is the one over QQ', () => {
    const overThree = matroidOf(GF3, overField(GF3, FANO), 7);
    assert.deepEqual(overThree.bases, matroidOf(QQ, overQQ(FANO), 7).bases);
  });

  test('circuits of the Fano matroid: the 7 lines and the 7 complements of lines', () => {
    // In the Fano plane every other line meets a line L in one point, so no three points off L are
    // collinear: the 4 points off L are dependent (4 vectors in rank 3) with all triples independent,
    // a circuit; a 4-set containing a line is not a circuit. (Projective-plane counting, worked by hand.)
    const complements = FANO_LINES.map((l) => [0, 1, 2, 3, 4, 5, 6].filter((c) => !l.includes(c)));
    const expected = [...FANO_LINES, ...complements.sort((a, b) => a.join().localeCompare(b.join()))];
    assert.deepEqual(circuits(GF2, overField(GF2, FANO), 7), expected);
  });

  test('over QQ the 4-element circuits are the 4-sets containing none of the 6 dependent triples (11 of them)', () => {
    // Same counting: 35 four-sets, each of the 6 dependent triples lies in 4 of them, and no 4-set holds two
    // (two of those triples share exactly one column), so 35 − 24 = 11; with the 6 triples, 17 circuits.
    const found = circuits(QQ, overQQ(FANO), 7);
    assert.equal(found.filter((c) => c.length === 3).length, 6);
    assert.equal(found.filter((c) => c.length === 4).length, 11);
    assert.equal(found.length, 17);
  });
});

describe('uniform matroids from generic matrices', () => {
  test('U_{2,4}: a generic 2×4 matrix has all 6 pairs as bases', () => {
    // Every two columns (1, t) with distinct t are independent (2×2 Vandermonde determinant t' − t ≠ 0).
    const M = matroidOf(QQ, overQQ([[1, 1, 1, 1], [0, 1, 2, 3]]), 4);
    assert.equal(M.rank, 2);
    assert.deepEqual(M.bases, [[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]]);
    assert.equal(M.isUniform, true);
    assert.deepEqual(M.loops, []);
    assert.deepEqual(M.coloops, []);
  });

  test('a k×n Vandermonde matrix with distinct nodes has C(n, k) bases (Vandermonde determinant, classical)', () => {
    // det of the columns (1, t, …, t^(k−1)) at distinct nodes is Π_{i<j}(t_j − t_i) ≠ 0 (classical, from memory).
    // C(n, k) values: C(6,3) = 20, C(7,2) = 21, C(7,3) = 35 (Pascal's triangle).
    for (const [k, n, count] of [[3, 6, 20], [2, 7, 21], [3, 7, 35]] as const) {
      const nodes = Array.from({ length: n }, (_, j) => j - 2);
      const rows = Array.from({ length: k }, (_, i) => nodes.map((t) => t ** i));
      const M = matroidOf(QQ, overQQ(rows), n);
      assert.equal(M.bases.length, count);
      assert.equal(M.isUniform, true);
    }
  });

  test('the same Vandermonde matrix over GF(7) is uniform on 7 distinct nodes but not over GF(5), where nodes repeat', () => {
    const rows = Array.from({ length: 3 }, (_, i) => [0, 1, 2, 3, 4, 5, 6].map((t) => t ** i));
    assert.equal(matroidOf(GF7, overField(GF7, rows), 7).bases.length, 35);
    const GF5 = primeField(5n);
    // Nodes 5 ≡ 0 and 6 ≡ 1 modulo 5 give equal columns, so e.g. {0, 5} is dependent.
    const M = matroidOf(GF5, overField(GF5, rows), 7);
    assert.equal(M.isUniform, false);
    assert.equal(rankOfColumns(GF5, overField(GF5, rows), [0, 5]), 1);
  });
});

describe('loops, coloops, dependent rows and limits (worked by hand)', () => {
  test('columns e0, e1, 0, 2·e0: loop 2, coloop 1, bases {0,1} and {1,3}, circuits {2} and {0,3}', () => {
    const rows = overQQ([[1, 0, 0, 2], [0, 1, 0, 0]]);
    const M = matroidOf(QQ, rows, 4);
    assert.deepEqual(M.bases, [[0, 1], [1, 3]]);
    assert.deepEqual(M.loops, [2]);
    assert.deepEqual(M.coloops, [1]);
    assert.deepEqual(circuits(QQ, rows, 4), [[2], [0, 3]]);
  });

  test('dependent rows: (1 2 3) and (2 4 6) have rank 1 and every single column is a basis', () => {
    const M = matroidOf(QQ, overQQ([[1, 2, 3], [2, 4, 6]]), 3);
    assert.equal(M.rank, 1);
    assert.deepEqual(M.bases, [[0], [1], [2]]);
    assert.equal(M.isUniform, true);
  });

  test('the matrix without rows: rank 0, the empty basis, every column a loop', () => {
    const M = matroidOf(QQ, [], 3);
    assert.equal(M.rank, 0);
    assert.deepEqual(M.bases, [[]]);
    assert.deepEqual(M.loops, [0, 1, 2]);
    assert.deepEqual(circuits(QQ, [], 3), [[0], [1], [2]]);
  });

  test('a rank-1 matrix: the circuits are the zero columns and all pairs of nonzero columns (standard), 10 and 55 columns', () => {
    // Entries c mod 3: the columns c ≡ 0 (mod 3) are zero; any two nonzero columns are proportional.
    for (const n of [10, 55]) {
      const row = Array.from({ length: n }, (_, c) => c % 3);
      const zero = row.flatMap((x, c) => (x === 0 ? [c] : []));
      const other = row.flatMap((x, c) => (x === 0 ? [] : [c]));
      const pairs = other.flatMap((a, i) => other.slice(i + 1).map((b) => [a, b]));
      assert.deepEqual(circuits(QQ, overQQ([row]), n), [...zero.map((c) => [c]), ...pairs]);
    }
  });

  test('more candidate bases than the limit is refused before any work', () => {
    const identity = Array.from({ length: 10 }, (_, i) => Array.from({ length: 20 }, (_, j) => (i === j ? QQ.one : QQ.zero)));
    assert.throws(() => matroidOf(QQ, identity, 20, 1000), EnumerationLimitError);
    assert.throws(() => circuits(QQ, identity, 20), EnumerationLimitError);
  });

  test('rankOfColumns refuses repeated or out-of-range columns', () => {
    const rows = overQQ([[1, 0], [0, 1]]);
    assert.throws(() => rankOfColumns(QQ, rows, [0, 0]), /twice/);
    assert.throws(() => rankOfColumns(QQ, rows, [2]), /not in/);
    assert.equal(rankOfColumns(QQ, rows, []), 0);
  });
});

describe('against mathjs determinants (independent reference library)', () => {
  const cases: [Field<any>, bigint][] = [
    [QQ, 0n],
    [GF2, 2n],
    [GF3, 3n],
  ];
  for (const [F, p] of cases) {
    test(`${F.name}: the rank of every column set is the size of its largest nonvanishing minor`, () => {
      fc.assert(
        fc.property(integerMatrix, ({ m, n }) => {
          const rows = p === 0n ? overQQ(m) : overField(F, m);
          for (const cols of allSubsets(n)) {
            assert.equal(rankOfColumns(F, rows, cols), referenceRank(m, cols, p), `columns ${cols}`);
          }
        }),
        { numRuns: 25 },
      );
    });

    test(`${F.name}: the bases are the column sets of the rank's size with a nonvanishing minor`, () => {
      fc.assert(
        fc.property(integerMatrix, ({ m, n }) => {
          const rows = p === 0n ? overQQ(m) : overField(F, m);
          const M = matroidOf(F, rows, n);
          const r = referenceRank(m, Array.from({ length: n }, (_, c) => c), p);
          assert.equal(M.rank, r);
          // A set of r columns is a basis when some r×r minor on those columns is nonzero.
          const expected = bruteSubsets(n, r).filter((cols) => bruteSubsets(m.length, r).some((rs) => minorNonzero(m, rs, cols, p)));
          assert.deepEqual(M.bases, expected);
          const isExpected = (cols: number[]) => expected.some((b) => b.join() === cols.join());
          assert.deepEqual(nonBases(F, rows, n), bruteSubsets(n, r).filter((cols) => !isExpected(cols)));
        }),
        { numRuns: 40 },
      );
    });

    test(`${F.name}: circuits are the sets S with rank(S) = |S| − 1 = rank(S ∖ e) for every e (definition)`, () => {
      fc.assert(
        fc.property(integerMatrix, ({ m, n }) => {
          const rows = p === 0n ? overQQ(m) : overField(F, m);
          const expected = allSubsets(n)
            .filter((s) => s.length > 0)
            .filter((s) => referenceRank(m, s, p) === s.length - 1)
            .filter((s) => s.every((e) => referenceRank(m, s.filter((x) => x !== e), p) === s.length - 1));
          const sortKey = (c: number[]) => `${c.length}:${c.join()}`;
          assert.deepEqual(circuits(F, rows, n).map(sortKey).sort(), expected.map(sortKey).sort());
        }),
        { numRuns: 25 },
      );
    });
  }
});

describe('matroid axioms (standard, e.g. Oxley, Matroid Theory, §1.2 — from memory)', () => {
  test('basis exchange: for bases B1, B2 and x ∈ B1 ∖ B2 some y ∈ B2 ∖ B1 makes (B1 ∖ x) ∪ y a basis', () => {
    fc.assert(
      fc.property(integerMatrix, ({ m, n }) => {
        const { bases } = matroidOf(QQ, overQQ(m), n);
        const keys = new Set(bases.map((b) => b.join()));
        for (const b1 of bases) {
          for (const b2 of bases) {
            for (const x of b1.filter((c) => !b2.includes(c))) {
              const ok = b2
                .filter((y) => !b1.includes(y))
                .some((y) => keys.has([...b1.filter((c) => c !== x), y].sort((s, t) => s - t).join()));
              assert.ok(ok, `exchange of ${x} from ${b1} into ${b2}`);
            }
          }
        }
      }),
      { numRuns: 40 },
    );
  });

  test('the rank of a column set is the largest intersection with a basis', () => {
    fc.assert(
      fc.property(integerMatrix, ({ m, n }) => {
        const rows = overQQ(m);
        const { bases } = matroidOf(QQ, rows, n);
        for (const s of allSubsets(n)) {
          const largest = Math.max(...bases.map((b) => b.filter((c) => s.includes(c)).length));
          assert.equal(rankOfColumns(QQ, rows, s), largest);
        }
      }),
      { numRuns: 30 },
    );
  });
});
