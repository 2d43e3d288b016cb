import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { InvalidFlagError, flagCoordinates, flagSubspace, oppositeFlag, standardFlag } from '../../server/src/engine/flags.js';
import { iterateSubspaces } from '../../server/src/engine/grassmannian.js';
import { intersectRowSpaces, rank, rowSpaceEquals, rref } from '../../server/src/engine/matrix.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational } from '../../server/src/engine/rational.js';
import {
  cellPattern,
  jumpsFromPartition,
  partitionFromJumps,
  partitionsInBox,
  schubertCell,
  schubertConditions,
} from '../../server/src/engine/schubert.js';
import { EXTERIOR_CASES, matrixOf, shapedMatrix } from './exterior-arbitraries.js';

type Case = (typeof EXTERIOR_CASES)[number];
const q = (num: number) => rational(BigInt(num));

/** An n×n invertible matrix over the case's field: the rows of a random flag. */
function randomFlag(c: Case, n: number) {
  return matrixOf(c.element, n, n).filter((rows) => rank(c.F, rows, n) === n);
}

/** A subspace together with a random flag in the same dimension. */
function subspaceAndFlag(c: Case, maxK = 4, maxN = 6) {
  return shapedMatrix(c, maxK, maxN).chain((s) => randomFlag(c, s.n).map((flag) => ({ ...s, flag })));
}

/** Every partition in the k×m box, by brute force over all k-tuples in [0, m] (independent of the engine). */
function brutePartitions(k: number, m: number): number[][] {
  const out: number[][] = [];
  const walk = (prefix: number[]) => {
    if (prefix.length === k) {
      out.push(prefix.slice());
      return;
    }
    const top = prefix.length === 0 ? m : prefix[prefix.length - 1]!;
    for (let x = 0; x <= top; x++) walk([...prefix, x]);
  };
  walk([]);
  return out;
}

/** dim(W ∩ F_i) for i = 1..n by Zassenhaus intersections of row spaces (a different route from the engine's). */
function referenceConditions<T>(F: Field<T>, rows: readonly (readonly T[])[], flag: readonly (readonly T[])[], n: number): number[] {
  return Array.from({ length: n }, (_, i) => intersectRowSpaces(F, rows, flag.slice(0, i + 1), n).length);
}

/**
 * Coefficients of the Gaussian polynomial [n choose k]_q, lowest degree first: the number of partitions of
 * each size in the k×(n−k) box (Andrews, The Theory of Partitions, Theorem 3.1 — from memory).
 */
const GAUSSIAN_POLYNOMIALS: [number, number, number[]][] = [
  [4, 2, [1, 1, 2, 1, 1]],
  [5, 1, [1, 1, 1, 1, 1]],
  [5, 2, [1, 1, 2, 2, 2, 1, 1]],
  [6, 2, [1, 1, 2, 2, 3, 2, 2, 1, 1]],
  [6, 3, [1, 1, 2, 3, 3, 3, 3, 2, 1, 1]],
];

/**
 * Numbers of k-subspaces of GF(q)^n, the Gaussian binomials at q = 2 (OEIS A022166) and q = 3 (OEIS A022167),
 * rows n = 1..5, entries k = 0..n.
 */
const SUBSPACE_COUNTS: Record<number, number[][]> = {
  2: [
    [1, 1],
    [1, 3, 1],
    [1, 7, 7, 1],
    [1, 15, 35, 15, 1],
    [1, 31, 155, 155, 31, 1],
  ],
  3: [
    [1, 1],
    [1, 4, 1],
    [1, 13, 13, 1],
    [1, 40, 130, 40, 1],
    [1, 121, 1210, 1210, 121, 1],
  ],
};

describe('partitions in the box', () => {
  test('Σ_λ q^|λ| over the k×(n−k) box is the Gaussian polynomial [n choose k]_q (Andrews, The Theory of Partitions, Theorem 3.1 — from memory)', () => {
    for (const [n, k, coefficients] of GAUSSIAN_POLYNOMIALS) {
      const counts = new Array<number>(k * (n - k) + 1).fill(0);
      for (const lambda of brutePartitions(k, n - k)) counts[lambda.reduce((a, b) => a + b, 0)]!++;
      assert.deepEqual(counts, coefficients, `[${n} choose ${k}]_q`);
    }
  });

  test('evaluating those polynomials at q = 2 and 3 gives the subspace counts of OEIS A022166 and A022167', () => {
    for (const [n, k, coefficients] of GAUSSIAN_POLYNOMIALS.filter(([n]) => n <= 5)) {
      for (const base of [2, 3]) {
        const value = coefficients.reduce((acc, c, d) => acc + c * base ** d, 0);
        assert.equal(value, SUBSPACE_COUNTS[base]![n - 1]![k]);
      }
    }
  });

  test('partitionsInBox lists exactly the partitions in the box, each once, C(n, k) of them (common practice, no source)', () => {
    for (let k = 0; k <= 4; k++) {
      for (let m = 0; m <= 4; m++) {
        const got = partitionsInBox(k, m).map((p) => p.join(','));
        const expected = brutePartitions(k, m).map((p) => p.join(','));
        assert.equal(new Set(got).size, got.length);
        assert.deepEqual([...got].sort(), [...expected].sort());
      }
    }
  });

  test('jumps and partitions convert into each other, generic jumps n−k+1..n give λ = 0 (the convention stated in schubert.ts)', () => {
    for (const [k, m] of [
      [2, 2],
      [3, 2],
      [1, 4],
    ] as const) {
      const n = k + m;
      for (const lambda of brutePartitions(k, m)) assert.deepEqual(partitionFromJumps(jumpsFromPartition(lambda, n), n), lambda);
      assert.deepEqual(
        partitionFromJumps(
          Array.from({ length: k }, (_, t) => m + t),
          n,
        ),
        new Array(k).fill(0),
      );
    }
  });
});

describe('Schubert conditions and cells', () => {
  test('dim(W ∩ F_i) agrees with Zassenhaus intersections for random subspaces and random flags over QQ and GF(p) (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(subspaceAndFlag(c), ({ n, rows, flag }) => {
          assert.deepEqual(schubertConditions(F, rows, flag), referenceConditions(F, rows, flag, n));
          assert.deepEqual(schubertConditions(F, rows, standardFlag(F, n)), referenceConditions(F, rows, standardFlag(F, n), n));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('the cell record is consistent: jumps where d_i grows, λ in the box, dimensions k(n−k) − |λ|, echelon rows spanning W in flag coordinates (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(subspaceAndFlag(c), ({ n, rows, flag }) => {
          const cell = schubertCell(F, rows, flag, n);
          const d = referenceConditions(F, rows, flag, n);
          const k = rank(F, rows, n);
          assert.equal(cell.k, k);
          assert.deepEqual(
            cell.jumps,
            d.flatMap((x, i) => (x > (i === 0 ? 0 : d[i - 1]!) ? [i] : [])),
          );
          assert.equal(cell.partition.length, k);
          cell.partition.forEach((x, t) => {
            assert.ok(x >= 0 && x <= n - k);
            if (t > 0) assert.ok(cell.partition[t - 1]! >= x);
          });
          assert.equal(cell.codimension, cell.partition.reduce((a, b) => a + b, 0));
          assert.equal(cell.cellDimension, k * (n - k) - cell.codimension);
          assert.ok(rowSpaceEquals(F, cell.basis, rows, n));
          assert.ok(rowSpaceEquals(F, cell.echelon, flagCoordinates(F, flag, rows, n), n));
          // The echelon form has the cell's shape: 1 at the jump, 0 where the pattern says 0.
          const pattern = cellPattern(cell.jumps, n);
          cell.echelon.forEach((row, r) =>
            row.forEach((x, j) => {
              if (pattern[r]![j] === '1') assert.ok(F.isOne(x));
              if (pattern[r]![j] === '0') assert.ok(F.isZero(x));
            }),
          );
          assert.equal(pattern.flat().filter((s) => s === '*').length, cell.cellDimension);
        }),
        { numRuns: 30 },
      );
    }
  });

  test('standard flag: the jump set is {n−1−p : p a pivot of the RREF of W with reversed columns}; opposite flag: {n−1−p : p a pivot of the RREF of W}, with λ = (p_s − s) from the last pivot (derived in schubert.ts)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(shapedMatrix(c, 4, 7), ({ n, rows }) => {
          const reversedPivots = rref(F, rows.map((r) => r.slice().reverse()), n).pivots;
          const standard = schubertCell(F, rows, standardFlag(F, n), n);
          assert.deepEqual(standard.jumps, reversedPivots.map((p) => n - 1 - p).sort((a, b) => a - b));
          const pivots = rref(F, rows, n).pivots;
          const opposite = schubertCell(F, rows, oppositeFlag(F, n), n);
          assert.deepEqual(opposite.jumps, pivots.map((p) => n - 1 - p).sort((a, b) => a - b));
          assert.deepEqual(opposite.partition, pivots.map((p, s) => p - s).reverse());
        }),
        { numRuns: 40 },
      );
    }
  });

  test('worked examples in QQ^3 and QQ^4 relative to the standard flag (computed by hand from dim(W ∩ F_i))', () => {
    const F = QQ;
    // span(e_1) = F_1: d = (1, 1, 1), jump 1, λ = (2): the point cell.
    const point = schubertCell(F, [[q(1), q(0), q(0)]], standardFlag(F, 3), 3);
    assert.deepEqual([point.jumps, point.partition, point.cellDimension], [[0], [2], 0]);
    // span(e_3): d = (0, 0, 1), jump 3, λ = (0): the big cell of lines outside F_2.
    const big = schubertCell(F, [[q(0), q(0), q(1)]], standardFlag(F, 3), 3);
    assert.deepEqual([big.jumps, big.partition, big.cellDimension], [[2], [0], 2]);
    // span(e_1 + 5e_2, e_3) in QQ^4: d = (0, 1, 2, 2), jumps 2, 3, λ = (4−2+1−2, 4−2+2−3) = (1, 1).
    const rows = [
      [q(1), q(5), q(0), q(0)],
      [q(0), q(0), q(1), q(0)],
    ];
    assert.deepEqual(schubertConditions(F, rows, standardFlag(F, 4)), [0, 1, 2, 2]);
    const cell = schubertCell(F, rows, standardFlag(F, 4), 4);
    assert.deepEqual([cell.jumps, cell.partition, cell.codimension, cell.cellDimension], [[1, 2], [1, 1], 2, 2]);
    // The echelon rows end in 1 at their jumps: (1/5, 1, 0, 0) and (0, 0, 1, 0).
    assert.ok(QQ.eq(cell.echelon[0]![0]!, rational(1n, 5n)) && QQ.isOne(cell.echelon[0]![1]!));
  });

  test('G(2, 4) has cells of dimensions 0, 1, 2, 2, 3, 4 (its Betti numbers 1, 1, 2, 1, 1; Griffiths–Harris, Principles of Algebraic Geometry, Ch. 1 §5 — from memory)', () => {
    const dims = partitionsInBox(2, 2)
      .map((lambda) => 4 - lambda.reduce((a, b) => a + b, 0))
      .sort((a, b) => a - b);
    assert.deepEqual(dims, [0, 1, 2, 2, 3, 4]);
  });

  test('invalid flags are refused', () => {
    const F = primeField(3n);
    const dependent = [
      [F.one, F.zero],
      [F.fromBigInt(2n), F.zero],
    ];
    assert.throws(() => schubertConditions(F, [], dependent), InvalidFlagError);
    assert.throws(() => schubertCell(F, [], [[F.one, F.zero]], 2), InvalidFlagError);
    assert.ok(rowSpaceEquals(F, flagSubspace(F, standardFlag(F, 3), 2, 3), [[F.one, F.zero, F.zero], [F.zero, F.one, F.zero]], 3));
  });
});

describe('counting points of Schubert cells over GF(2) and GF(3)', () => {
  // The Schubert cell with partition λ is an affine space of dimension k(n−k) − |λ|, so over GF(q) it has
  // q^(k(n−k) − |λ|) points, and the cells partition G(k, n) (Fulton, Young Tableaux, §9.4 — from memory).
  for (const base of [2, 3]) {
    const F = primeField(BigInt(base));
    for (let n = 1; n <= (base === 2 ? 5 : 4); n++) {
      test(`GF(${base})^${n}: every cell relative to the standard flag has ${base}^dim points, one cell per partition, totals as in OEIS ${base === 2 ? 'A022166' : 'A022167'}`, () => {
        for (let k = 0; k <= n; k++) {
          const byCell = new Map<string, { count: number; dim: number }>();
          let total = 0;
          for (const rows of iterateSubspaces(F, n, k)) {
            const cell = schubertCell(F, rows, standardFlag(F, n), n);
            const key = cell.partition.join(',');
            const entry = byCell.get(key) ?? { count: 0, dim: cell.cellDimension };
            entry.count++;
            byCell.set(key, entry);
            total++;
          }
          assert.equal(total, SUBSPACE_COUNTS[base]![n - 1]![k]);
          assert.deepEqual([...byCell.keys()].sort(), brutePartitions(k, n - k).map((p) => p.join(',')).sort());
          for (const [key, { count, dim }] of byCell) assert.equal(count, base ** dim, `cell ${key}`);
        }
      });
    }
  }

  test('GF(3)^4 relative to random flags: the same counts per cell (the cells of any flag are images of the standard ones under an invertible map; common practice, no source)', () => {
    const c = EXTERIOR_CASES.find((x) => x.F.characteristic === 3n)!;
    const F = c.F;
    const n = 4;
    fc.assert(
      fc.property(randomFlag(c, n), (flag) => {
        for (let k = 1; k < n; k++) {
          const byCell = new Map<string, { count: number; dim: number }>();
          for (const rows of iterateSubspaces(F, n, k)) {
            const cell = schubertCell(F, rows, flag, n);
            const key = cell.jumps.join(',');
            const entry = byCell.get(key) ?? { count: 0, dim: cell.cellDimension };
            entry.count++;
            byCell.set(key, entry);
          }
          for (const [key, { count, dim }] of byCell) assert.equal(count, 3 ** dim, `jumps ${key}`);
        }
      }),
      { numRuns: 4 },
    );
  });
});
