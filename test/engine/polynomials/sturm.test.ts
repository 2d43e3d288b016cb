import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { countRealRoots, countRealRootsBetween, countRealRootsWithMultiplicity } from '../../../server/src/engine/polynomials/sturm.js';
import { rational, type Rational } from '../../../server/src/engine/rational.js';
import { math } from '../linear-arbitraries.js';
import { multiplyIntegerLists, rationals } from './polynomial-arbitraries.js';

/**
 * The roots of an integer polynomial (constant term first) as the eigenvalues
 * of its companion matrix, computed numerically by mathjs (the independent
 * reference library).
 */
function numericRoots(f: readonly number[]): { re: number; im: number }[] {
  const n = f.length - 1;
  const lead = f[n]!;
  const companion = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (j === n - 1 ? -f[i]! / lead : i === j + 1 ? 1 : 0)),
  );
  const { values } = math.eigs(companion) as unknown as { values: unknown };
  const list = Array.isArray(values) ? values : (values as { toArray(): unknown[] }).toArray();
  return list.map((v) => (typeof v === 'number' ? { re: v, im: 0 } : { re: (v as { re: number }).re, im: (v as { im: number }).im }));
}

describe('Sturm counts of real roots', () => {
  test('Wilkinson\'s polynomial has 20 real roots; 9 in [3/2, 10] and 20 in [1, 20] (ends counted) (Wilkinson)', () => {
    let w = [1n];
    for (let i = 1n; i <= 20n; i++) w = multiplyIntegerLists(w, [-i, 1n]);
    const f = w.map((c) => rational(c));
    assert.equal(countRealRoots(f), 20);
    assert.equal(countRealRootsBetween(f, rational(3n, 2n), rational(10n)), 9);
    assert.equal(countRealRootsBetween(f, rational(1n), rational(20n)), 20);
    assert.equal(countRealRootsBetween(f, rational(5n), rational(5n)), 1);
    assert.equal(countRealRootsBetween(f, rational(21n), rational(30n)), 0);
  });

  test('x^2 + 1 has none, x^2 − 2 two, (x^2 − 2)^2 (x^2 + 1) two distinct and four with multiplicity (textbook)', () => {
    assert.equal(countRealRoots(rationals([1, 0, 1])), 0);
    assert.equal(countRealRoots(rationals([-2, 0, 1])), 2);
    const f = multiplyIntegerLists(multiplyIntegerLists([-2n, 0n, 1n], [-2n, 0n, 1n]), [1n, 0n, 1n]);
    assert.equal(countRealRoots(f.map((c) => rational(c))), 2);
    assert.equal(countRealRootsWithMultiplicity(f.map((c) => rational(c))), 4);
    assert.equal(countRealRoots(rationals([5])), 0);
  });

  test('the Chebyshev polynomial T_n has n distinct real roots, all in (−1, 1) (classical, from memory)', () => {
    let previous = [1n];
    let current = [0n, 1n];
    for (let n = 2; n <= 15; n++) {
      // T_n = 2x·T_(n−1) − T_(n−2).
      const next = multiplyIntegerLists([0n, 2n], current);
      previous.forEach((c, i) => (next[i]! -= c));
      [previous, current] = [current, next];
      const f = current.map((c) => rational(c));
      assert.equal(countRealRoots(f), n);
      assert.equal(countRealRootsBetween(f, rational(-1n), rational(1n)), n);
      // The roots are cos((2k − 1)π/(2n)), k = 1..n, of which ⌈n/2⌉ are ≥ 0 (0 itself for odd n).
      assert.equal(countRealRootsBetween(f, rational(0n), rational(1n)), Math.ceil(n / 2));
    }
  });

  test('random polynomials against the numerical roots of mathjs (independent reference library)', () => {
    const coefficients = fc.array(fc.integer({ min: -9, max: 9 }), { minLength: 2, maxLength: 8 }).filter((f) => f[f.length - 1] !== 0);
    fc.assert(
      fc.property(coefficients, (f) => {
        let roots: { re: number; im: number }[];
        try {
          roots = numericRoots(f);
        } catch {
          // mathjs's eigenvalue iteration does not always converge; such cases decide nothing.
          return;
        }
        // Only unambiguous cases count: every root either clearly real or clearly not, and all roots well apart
        // (so none is repeated).
        if (roots.some((r) => Math.abs(r.im) > 1e-9 && Math.abs(r.im) < 1e-4)) return;
        for (let i = 0; i < roots.length; i++) {
          for (let j = i + 1; j < roots.length; j++) {
            if (Math.hypot(roots[i]!.re - roots[j]!.re, roots[i]!.im - roots[j]!.im) < 1e-4) return;
          }
        }
        const real = roots.filter((r) => Math.abs(r.im) <= 1e-9).map((r) => r.re);
        const exact: Rational[] = f.map((c) => rational(BigInt(c)));
        assert.equal(countRealRoots(exact), real.length);
        assert.equal(countRealRootsWithMultiplicity(exact), real.length);
        // In [−1, 2], where no root lies too close to an end.
        if (real.every((x) => Math.abs(x + 1) > 1e-6 && Math.abs(x - 2) > 1e-6)) {
          assert.equal(countRealRootsBetween(exact, rational(-1n), rational(2n)), real.filter((x) => x >= -1 && x <= 2).length);
        }
      }),
      { numRuns: 120 },
    );
  });

  test('random cubics against mathjs polynomialRoot (independent reference library)', () => {
    const cubic = fc.tuple(fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 }), fc.integer({ min: 1, max: 5 }));
    fc.assert(
      fc.property(cubic, ([a, b, c, d]) => {
        const roots = math.polynomialRoot(a, b, c, d) as unknown[];
        const real = roots.filter((r) => typeof r === 'number' || Math.abs((r as { im: number }).im) < 1e-12);
        // polynomialRoot lists a repeated root once; a double or triple root counts once here too.
        const distinct = new Set(real.map((r) => (typeof r === 'number' ? r : (r as { re: number }).re).toFixed(6))).size;
        assert.equal(countRealRoots(rationals([a, b, c, d])), distinct);
      }),
      { numRuns: 200 },
    );
  });
});
