import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import { EnumerationLimitError, enumerateSubspaces, gaussianBinomial, grassmannianDimension } from '../../server/src/engine/grassmannian.js';
import { rank, rref, matrixEquals } from '../../server/src/engine/matrix.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ } from '../../server/src/engine/rational.js';
import { binomialBig } from '../../server/src/engine/subsets.js';
import { normalizePoint } from '../../server/src/engine/normalize.js';

describe('dimension and point counts', () => {
  test('dim G(k, n) = k(n − k) (any textbook, e.g. Harris, Algebraic Geometry: A First Course, Lecture 6 — from memory)', () => {
    assert.equal(grassmannianDimension(2, 4), 4);
    assert.equal(grassmannianDimension(1, 5), 4); // projective 4-space
    assert.equal(grassmannianDimension(3, 7), 12);
    assert.equal(grassmannianDimension(0, 3), 0);
    assert.throws(() => grassmannianDimension(4, 3), RangeError);
  });

  test('Σ_k [n, k]_2 is OEIS A006116: 1, 2, 5, 16, 67, 374, 2825, 29212 (values from the brief, rechecked by hand from the q-binomial formula)', () => {
    const a006116 = [1n, 2n, 5n, 16n, 67n, 374n, 2825n, 29212n];
    a006116.forEach((expected, n) => {
      let total = 0n;
      for (let k = 0; k <= n; k++) total += gaussianBinomial(n, k, 2n);
      assert.equal(total, expected, `n = ${n}`);
    });
  });

  test('Σ_k [n, k]_3 is OEIS A006117: 1, 2, 6, 28, 212, 2664, 56632 (values from the brief, rechecked by hand from the q-binomial formula)', () => {
    const a006117 = [1n, 2n, 6n, 28n, 212n, 2664n, 56632n];
    a006117.forEach((expected, n) => {
      let total = 0n;
      for (let k = 0; k <= n; k++) total += gaussianBinomial(n, k, 3n);
      assert.equal(total, expected, `n = ${n}`);
    });
  });

  test('[n, 1]_q = (q^n − 1)/(q − 1) points of projective space, [4, 2]_2 = 35 lines of PG(3,2) (classical; from memory)', () => {
    for (const qq of [2n, 3n, 5n, 7n]) {
      for (let n = 1; n <= 8; n++) assert.equal(gaussianBinomial(n, 1, qq), (qq ** BigInt(n) - 1n) / (qq - 1n));
    }
    assert.equal(gaussianBinomial(4, 2, 2n), 35n);
    assert.equal(gaussianBinomial(5, 7, 2n), 0n);
  });

  test('q = 1 gives ordinary binomials; symmetry [n, k] = [n, n − k] (common practice, no source)', () => {
    for (let n = 0; n <= 12; n++) {
      for (let k = 0; k <= n; k++) {
        assert.equal(gaussianBinomial(n, k, 1n), binomialBig(n, k));
        assert.equal(gaussianBinomial(n, k, 4n), gaussianBinomial(n, n - k, 4n));
      }
    }
  });
});

describe('enumerating the subspaces of GF(p)^n', () => {
  for (const p of [2n, 3n, 5n]) {
    const F = primeField(p);
    test(`GF(${p}): the count equals the Gaussian binomial, each appears once, each is an RREF of rank k`, () => {
      for (let n = 0; n <= (p === 2n ? 5 : 4); n++) {
        for (let k = 0; k <= n; k++) {
          const all = enumerateSubspaces(F, n, k, 100_000);
          assert.equal(BigInt(all.length), gaussianBinomial(n, k, p), `n = ${n}, k = ${k}`);
          const seen = new Set<string>();
          for (const rows of all) {
            assert.equal(rank(F, rows, n), k);
            assert.ok(matrixEquals(F, rref(F, rows, n).rows, rows));
            // Distinct subspaces have non-proportional Plücker vectors, so the scaled vectors are distinct too.
            const key = normalizePoint(F, pluckerCoordinates(F, rows, n), 'first-one').values.map((x) => F.format(x)).join(' ');
            assert.ok(!seen.has(key), 'a subspace was listed twice');
            seen.add(key);
          }
        }
      }
    });
  }

  test('the limit is enforced before any work, with the true count in the error', () => {
    const F = primeField(3n);
    assert.throws(
      () => enumerateSubspaces(F, 6, 3, 1000),
      (e: unknown) => e instanceof EnumerationLimitError && e.count === 33880n,
    );
    assert.throws(() => enumerateSubspaces(QQ, 3, 1, 10), RangeError);
  });
});
