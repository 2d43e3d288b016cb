import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import {
  SCHUBERT_CLASS_CONVENTION,
  addClasses,
  classCoefficient,
  classDegree,
  dualClass,
  dualPartition,
  formatClass,
  grassmannianDegree,
  grassmannianDegreeByFormula,
  intersectionNumber,
  multiplyClasses,
  parseSchubertSigma,
  pointClass,
  powerClass,
  productOfClasses,
  scaleClass,
  schubertClass,
  schubertSigma,
  subtractClasses,
  unitClass,
  zeroClass,
  type SchubertClass,
} from '../../server/src/engine/schubert-calculus.js';
import { InvalidPartitionError, PartitionOutsideBoxError } from '../../server/src/engine/partitions.js';

/** Every partition in the k×m box, written out here by plain recursion. */
function box(k: number, m: number): number[][] {
  const out: number[][] = [];
  const go = (parts: number[], max: number): void => {
    if (parts.length === k) {
      const p = parts.slice();
      while (p.length > 0 && p[p.length - 1] === 0) p.pop();
      out.push(p);
      return;
    }
    for (let x = max; x >= 0; x--) go([...parts, x], x);
  };
  go([], m);
  return out;
}

const size = (p: readonly number[]) => p.reduce((a, b) => a + b, 0);
const conjugate = (p: readonly number[]) => Array.from({ length: p[0] ?? 0 }, (_, j) => p.filter((x) => x > j).length);

/** The number of standard Young tableaux of the k×m rectangle by the hook length formula (Frame–Robinson–Thrall, 1954). */
function rectangleTableaux(k: number, m: number): bigint {
  let count = 1n;
  for (let i = 2; i <= k * m; i++) count *= BigInt(i);
  // The hook of cell (i, j) of the rectangle is (m − j) + (k − i) − 1 (0-based).
  let hooks = 1n;
  for (let i = 0; i < k; i++) for (let j = 0; j < m; j++) hooks *= BigInt(m - j + k - i - 1);
  return count / hooks;
}

/** The terms of a class as a map from partition text to coefficient, for comparisons. */
const terms = (c: SchubertClass) => new Map(c.terms.map((t) => [t.partition.join(','), t.coefficient]));

describe('the cohomology ring of G(2, 4)', () => {
  const s = (...p: number[]) => schubertSigma(2, 4, p);

  test('the multiplication table', () => {
    // Griffiths–Harris, Principles of Algebraic Geometry, Ch. 1 §5 (from memory):
    // σ_1² = σ_2 + σ_{1,1}, σ_1σ_2 = σ_1σ_{1,1} = σ_{2,1}, σ_2² = σ_{1,1}² = σ_{2,2}, σ_2σ_{1,1} = 0, σ_1σ_{2,1} = σ_{2,2}.
    assert.deepEqual(terms(multiplyClasses(s(1), s(1))), new Map([['1,1', 1n], ['2', 1n]]));
    assert.deepEqual(terms(multiplyClasses(s(1), s(2))), new Map([['2,1', 1n]]));
    assert.deepEqual(terms(multiplyClasses(s(1), s(1, 1))), new Map([['2,1', 1n]]));
    assert.deepEqual(terms(multiplyClasses(s(2), s(2))), new Map([['2,2', 1n]]));
    assert.deepEqual(terms(multiplyClasses(s(1, 1), s(1, 1))), new Map([['2,2', 1n]]));
    assert.deepEqual(terms(multiplyClasses(s(2), s(1, 1))), new Map());
    assert.deepEqual(terms(multiplyClasses(s(1), s(2, 1))), new Map([['2,2', 1n]]));
  });

  test('σ_1^4 = 2 points: the four-line problem', () => {
    // Schubert's problem of the lines meeting four general lines in P^3: there are 2 (classical).
    assert.deepEqual(terms(powerClass(s(1), 4)), new Map([['2,2', 2n]]));
    assert.equal(intersectionNumber(2, 4, [[1], [1], [1], [1]]), 2n);
  });

  test('one line through a point meets two general lines', () => {
    // σ_2 is the class of the lines through a point; a line through a point meeting two lines is unique (classical).
    assert.equal(intersectionNumber(2, 4, [[2], [1], [1]]), 1n);
    // No line lies in a general plane and passes through a general point: σ_{1,1}·σ_2 = 0 (classical).
    assert.equal(intersectionNumber(2, 4, [[1, 1], [2]]), 0n);
  });
});

describe('degrees of Grassmannians', () => {
  test('G(2, n) has degree the Catalan number C_{n−2}', () => {
    // OEIS A000108 (Catalan numbers), values from memory: 1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862.
    const catalan = [1n, 1n, 2n, 5n, 14n, 42n, 132n, 429n, 1430n, 4862n];
    catalan.forEach((c, i) => {
      assert.equal(grassmannianDegree(2, i + 2), c, `G(2, ${i + 2})`);
      assert.equal(grassmannianDegreeByFormula(2, i + 2), c, `G(2, ${i + 2}) by the formula`);
    });
  });

  test('G(3, n) has degree the 3-dimensional Catalan number', () => {
    // OEIS A005789 (3-dimensional Catalan numbers), values from memory: 1, 1, 5, 42, 462, 6006, 87516.
    const values = [1n, 1n, 5n, 42n, 462n, 6006n, 87516n];
    values.forEach((c, i) => {
      assert.equal(grassmannianDegree(3, i + 3), c, `G(3, ${i + 3})`);
      assert.equal(grassmannianDegreeByFormula(3, i + 3), c, `G(3, ${i + 3}) by the formula`);
    });
  });

  test('the small classical cases G(2, 4), G(2, 5), G(3, 6)', () => {
    // 2 (four lines), 5 (lines in P^4 meeting six planes), 42 (Schubert's count) — classical, from memory.
    assert.equal(grassmannianDegree(2, 4), 2n);
    assert.equal(grassmannianDegree(2, 5), 5n);
    assert.equal(grassmannianDegree(3, 6), 42n);
  });

  test('both paths equal the number of standard tableaux of the k×(n−k) rectangle', () => {
    // The degree of G(k, n) is f^{(n−k)^k}, by the hook length formula (Frame–Robinson–Thrall; the degree
    // statement is classical, e.g. Fulton, Young Tableaux, §9.4 — from memory).
    for (let n = 0; n <= 9; n++) {
      for (let k = 0; k <= n; k++) {
        const expected = rectangleTableaux(k, n - k);
        assert.equal(grassmannianDegree(k, n), expected, `G(${k}, ${n})`);
        assert.equal(grassmannianDegreeByFormula(k, n), expected, `G(${k}, ${n}) by the formula`);
      }
    }
    // 5×5: f = 701149020 (OEIS A039622, the number of standard tableaux of the n×n square, from memory).
    assert.equal(grassmannianDegreeByFormula(5, 10), 701149020n);
  });
});

describe('duality and symmetry', () => {
  test('σ_λ·σ_μ in complementary degrees is one point exactly when μ = λ^∨', () => {
    // The duality theorem (Fulton, Young Tableaux, §9.4; Griffiths–Harris Ch. 1 §5 — from memory).
    for (const [k, n] of [[2, 4], [2, 5], [3, 6], [2, 6]] as const) {
      const all = box(k, n - k);
      for (const lambda of all) {
        // The complement, written out: λ^∨_i = (n − k) − λ_{k+1−i}.
        const complement = Array.from({ length: k }, (_, i) => n - k - (lambda[k - 1 - i] ?? 0)).filter((x) => x > 0);
        assert.deepEqual(dualPartition(k, n, lambda), complement);
        for (const mu of all) {
          if (size(lambda) + size(mu) !== k * (n - k)) continue;
          const expected = mu.join(',') === complement.join(',') ? 1n : 0n;
          assert.equal(intersectionNumber(k, n, [lambda, mu]), expected, `G(${k}, ${n}): ${lambda} · ${mu}`);
        }
      }
    }
  });

  test('G(k, n) and G(n − k, n) have the same intersection numbers for conjugate partitions', () => {
    // W ↦ W^⊥ identifies the two and sends σ_λ to σ_{λ′} (classical; Fulton, Young Tableaux, §9.4 — from memory).
    const all = box(2, 3);
    for (const a of all) {
      for (const b of all) {
        for (const c of all) {
          if (size(a) + size(b) + size(c) !== 6) continue;
          assert.equal(intersectionNumber(2, 5, [a, b, c]), intersectionNumber(3, 5, [conjugate(a), conjugate(b), conjugate(c)]));
        }
      }
    }
  });

  test('Giambelli: σ_λ = det(σ_{λ_i + j − i})', () => {
    // Giambelli's formula (Griffiths–Harris Ch. 1 §5; Fulton, Young Tableaux, §9.4 — from memory), with
    // σ_0 = 1 and σ_m = 0 for m < 0 or m > n − k; the determinant is expanded by permutations here.
    for (const [k, n] of [[2, 5], [3, 6]] as const) {
      const special = (m: number) => (m < 0 || m > n - k ? zeroClass(k, n) : schubertSigma(k, n, m === 0 ? [] : [m]));
      for (const lambda of box(k, n - k)) {
        const l = lambda.length;
        let det = zeroClass(k, n);
        const permute = (row: number, used: number[], sign: bigint): void => {
          if (row === l) {
            const factors = used.map((j, i) => special(lambda[i]! + j - i));
            det = addClasses(det, scaleClass(productOfClasses(k, n, factors), sign));
            return;
          }
          for (let j = 0; j < l; j++) {
            if (used.includes(j)) continue;
            const inversions = BigInt(used.filter((x) => x > j).length);
            permute(row + 1, [...used, j], inversions % 2n === 0n ? sign : -sign);
          }
        };
        permute(0, [], 1n);
        assert.deepEqual(terms(det), terms(schubertSigma(k, n, lambda)), `G(${k}, ${n}), λ = ${lambda}`);
      }
    }
  });

  test('dualClass turns intersection numbers into coefficients', () => {
    // The duality theorem again (Fulton, Young Tableaux, §9.4 — from memory).
    const c = productOfClasses(3, 6, [[1], [2], [1, 1]]);
    const dual = dualClass(c);
    for (const mu of box(3, 3)) {
      if (size(mu) !== 9 - classDegree(c)!) continue;
      assert.equal(classCoefficient(dual, mu), intersectionNumber(3, 6, [c, mu]));
    }
  });
});

describe('ring laws (common practice, no source)', () => {
  const K = 3;
  const N = 6;
  const all = box(K, N - K);
  const aClass = fc
    .array(fc.tuple(fc.constantFrom(...all), fc.integer({ min: -3, max: 3 })), { maxLength: 3 })
    .map((ts) => schubertClass(K, N, ts.map(([p, c]) => [p, BigInt(c)] as const)));

  test('multiplication is commutative, associative and distributes over addition', () => {
    fc.assert(
      fc.property(aClass, aClass, aClass, (a, b, c) => {
        assert.deepEqual(terms(multiplyClasses(a, b)), terms(multiplyClasses(b, a)));
        assert.deepEqual(terms(multiplyClasses(multiplyClasses(a, b), c)), terms(multiplyClasses(a, multiplyClasses(b, c))));
        assert.deepEqual(terms(multiplyClasses(a, addClasses(b, c))), terms(addClasses(multiplyClasses(a, b), multiplyClasses(a, c))));
      }),
      { numRuns: 40 },
    );
  });

  test('1 is the unit, a − a = 0, and classes beyond the top degree vanish', () => {
    fc.assert(
      fc.property(aClass, (a) => {
        assert.deepEqual(terms(multiplyClasses(a, unitClass(K, N))), terms(a));
        assert.deepEqual(terms(subtractClasses(a, a)), new Map());
        assert.deepEqual(terms(multiplyClasses(a, multiplyClasses(pointClass(K, N), schubertSigma(K, N, [1])))), new Map());
      }),
      { numRuns: 40 },
    );
  });

  test('intersection numbers are 0 when the degrees do not add up to k(n − k)', () => {
    // By degree: the product then has no component in the top degree.
    assert.equal(intersectionNumber(2, 4, [[1], [1], [1]]), 0n);
    assert.equal(intersectionNumber(2, 4, [[2, 2], [1]]), 0n);
    assert.equal(intersectionNumber(2, 4, []), 0n);
    assert.equal(intersectionNumber(0, 3, []), 1n);
    // A mixed class: only its top-degree part counts.
    const mixed = addClasses(schubertSigma(2, 4, [2, 2], 3n), unitClass(2, 4));
    assert.equal(intersectionNumber(2, 4, [mixed]), 3n);
  });
});

describe('writing and reading classes', () => {
  test('text and LaTeX', () => {
    // The notation σ_λ with the parts in braces is common practice; these strings are written by hand.
    const c = schubertClass(3, 6, [
      [[3], 1n],
      [[2, 1], 2n],
    ]);
    assert.equal(formatClass(c), '2σ_{2,1} + σ_{3}');
    assert.equal(formatClass(c, 'latex'), '2\\sigma_{2,1} + \\sigma_{3}');
    const d = schubertClass(2, 4, [
      [[1], 1n],
      [[2], -2n],
      [[], 3n],
    ]);
    assert.equal(formatClass(d), '3 + σ_{1} - 2σ_{2}');
    assert.equal(formatClass(scaleClass(d, -1)), '-3 - σ_{1} + 2σ_{2}');
    assert.equal(formatClass(zeroClass(2, 4)), '0');
    assert.equal(formatClass(powerClass(schubertSigma(2, 4, [1]), 2)), 'σ_{1,1} + σ_{2}');
  });

  test('partitions are checked, with a clear error for each problem', () => {
    assert.throws(() => schubertSigma(2, 4, [3]), PartitionOutsideBoxError);
    assert.throws(() => schubertSigma(2, 4, [1, 1, 1]), /does not fit in the 2×2 box/);
    assert.throws(() => schubertSigma(2, 4, [1, 2]), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'not-decreasing');
    assert.throws(() => schubertSigma(2, 4, [-1]), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'negative');
    assert.throws(() => parseSchubertSigma(2, 4, '2, 1, 1'), PartitionOutsideBoxError);
    assert.deepEqual(terms(parseSchubertSigma(2, 4, '(2, 1, 0)')), new Map([['2,1', 1n]]));
    assert.throws(() => multiplyClasses(unitClass(2, 4), unitClass(2, 5)), /different Grassmannians/);
    assert.throws(() => unitClass(3, 2), RangeError);
  });

  test('the convention sentence names the indexing by codimension', () => {
    // It must agree with schubert.ts: λ_j = n − k + j − i_j and |λ| the codimension.
    assert.match(SCHUBERT_CLASS_CONVENTION, /codimension \|λ\|/);
    assert.match(SCHUBERT_CLASS_CONVENTION, /λ_j = n − k \+ j − i_j/);
    assert.equal(SCHUBERT_CLASS_CONVENTION.split('. ').length, 1);
  });
});
