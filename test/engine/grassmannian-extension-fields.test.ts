import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import { extensionField } from '../../server/src/engine/extension-field.js';
import { EnumerationLimitError, enumerateSubspaces, gaussianBinomial, iterateSubspaces } from '../../server/src/engine/grassmannian.js';
import { matrixEquals, rank, rref } from '../../server/src/engine/matrix.js';
import { normalizePoint } from '../../server/src/engine/normalize.js';
import { pluckerCoordinates } from '../../server/src/engine/plucker.js';

const GF4 = extensionField(2n, 2);
const GF8 = extensionField(2n, 3);
const GF9 = extensionField(3n, 2);

/**
 * Rows n = 0..5 of the triangle [n, k]_4, OEIS A022168 (from memory), rechecked by
 * hand: [4, 2]_4 = (4^4 − 1)(4^3 − 1)/((4^2 − 1)(4 − 1)) = 357 and
 * [5, 2]_4 = (4^5 − 1)(4^4 − 1)/((4^2 − 1)(4 − 1)) = 5797.
 */
const A022168: number[][] = [[1], [1, 1], [1, 5, 1], [1, 21, 21, 1], [1, 85, 357, 85, 1], [1, 341, 5797, 5797, 341, 1]];

/**
 * For q = 8 and 9: points of projective space, (q^n − 1)/(q − 1), and lines of
 * projective 3-space, [4, 2]_q = (q^2 + 1)(q^2 + q + 1) (classical; from memory).
 */
const expectedCount = (q: number, n: number, k: number): number => {
  if (k === 0 || k === n) return 1;
  if (k === 1 || k === n - 1) return (q ** n - 1) / (q - 1);
  if (n === 4 && k === 2) return (q ** 2 + 1) * (q ** 2 + q + 1);
  throw new Error(`no closed form here for [${n}, ${k}]_${q}`);
};

/** Enumerates, checks each subspace is a rank-k RREF listed once, and returns the count. */
function checkedCount(F: typeof GF4, n: number, k: number): number {
  const all = enumerateSubspaces(F, n, k, 100_000);
  const seen = new Set<string>();
  for (const rows of all) {
    assert.equal(rank(F, rows, n), k);
    assert.ok(matrixEquals(F, rref(F, rows, n).rows, rows), 'listed in reduced row echelon form');
    // Distinct subspaces have non-proportional Plücker vectors, so their first-one scalings differ.
    const key = normalizePoint(F, pluckerCoordinates(F, rows, n), 'first-one').values.join(' ');
    assert.ok(!seen.has(key), 'a subspace was listed twice');
    seen.add(key);
  }
  return all.length;
}

describe('enumerating the subspaces of GF(q)^n for q = 4, 8, 9', () => {
  test('GF(4): counts are the q-binomial triangle OEIS A022168 (from memory, rechecked by hand)', () => {
    A022168.forEach((row, n) => {
      row.forEach((expected, k) => {
        assert.equal(checkedCount(GF4, n, k), expected, `[${n}, ${k}]_4`);
        assert.equal(gaussianBinomial(n, k, 4n), BigInt(expected));
      });
    });
  });

  for (const F of [GF8, GF9]) {
    const q = Number(F.order);
    test(`${F.name}: counts equal (q^n − 1)/(q − 1) and (q^2 + 1)(q^2 + q + 1) (classical, from memory)`, () => {
      for (let n = 0; n <= 4; n++) {
        for (let k = 0; k <= n; k++) {
          const expected = expectedCount(q, n, k);
          assert.equal(checkedCount(F, n, k), expected, `[${n}, ${k}]_${q}`);
          assert.equal(gaussianBinomial(n, k, F.order), BigInt(expected));
        }
      }
    });
  }

  test('GF(4)^3: every nonzero vector lies on exactly one enumerated line (common practice, no source)', () => {
    const lines = enumerateSubspaces(GF4, 3, 1, 1000);
    for (let code = 1; code < 64; code++) {
      const v = [code % 4, Math.floor(code / 4) % 4, Math.floor(code / 16)];
      const containing = lines.filter((line) => rank(GF4, [...line, v], 3) === 1);
      assert.equal(containing.length, 1, `vector ${v.join(',')}`);
    }
  });

  test('the lazy iterator lists the same subspaces as the array, in the same order', () => {
    const fromIterator = [...iterateSubspaces(GF9, 3, 2)];
    assert.deepEqual(fromIterator, enumerateSubspaces(GF9, 3, 2, 1000));
  });

  test('the limit is checked up front against the Gaussian binomial for q = 9', () => {
    assert.throws(
      () => enumerateSubspaces(GF9, 6, 3, 1_000_000),
      (e: unknown) => e instanceof EnumerationLimitError && e.count === gaussianBinomial(6, 3, 9n),
    );
  });
});
