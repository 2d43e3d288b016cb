import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { expandFactored, formatFactored, type FactoredPolynomial } from '../../../server/src/engine/polynomials/factored-form.js';
import type { MultivariatePolynomial } from '../../../server/src/engine/polynomials/multivariate-polynomial.js';
import { factorPolynomial } from '../../../server/src/engine/polynomials/polynomial-factor.js';
import { QQ, rational, type Rational } from '../../../server/src/engine/rational.js';
import { QQ_ST, QQ_STU } from './polynomial-arbitraries.js';

const R = QQ_STU;
const [s, t, u] = ['s', 't', 'u'].map((v) => R.variable(v)) as [MultivariatePolynomial<Rational>, MultivariatePolynomial<Rational>, MultivariatePolynomial<Rational>];
const c = (n: number) => R.constant(rational(BigInt(n)));
const sum = (...xs: MultivariatePolynomial<Rational>[]) => xs.reduce((a, b) => R.add(a, b), R.zero);
const product = (...xs: MultivariatePolynomial<Rational>[]) => xs.reduce((a, b) => R.mul(a, b), R.one);

function keys(form: FactoredPolynomial<Rational>): string[] {
  return form.factors.map((f) => `${R.format(f.polynomial)}^${f.multiplicity}`).sort();
}

describe('factoring in several variables over QQ', () => {
  test('s^4 − t^4 = (s − t)(s + t)(s^2 + t^2) (difference of squares, textbook)', () => {
    const form = factorPolynomial(R, R.sub(R.pow(s, 4), R.pow(t, 4)));
    assert.ok(form.complete);
    assert.equal(formatFactored(R, form), '(s - t) (s + t) (s^2 + t^2)');
  });

  test('s^6 − t^6 splits into s ± t and s^2 ± s t + t^2 (cyclotomic factors of x^6 − 1, homogenized)', () => {
    const form = factorPolynomial(R, R.sub(R.pow(s, 6), R.pow(t, 6)));
    assert.ok(form.complete);
    assert.deepEqual(keys(form), ['s + t^1', 's - t^1', 's^2 + s t + t^2^1', 's^2 - s t + t^2^1'].sort());
  });

  test('s^2 + t^2 and the cusp s^2 − t^3 are proven irreducible over Q (−1 is no square in Q, t^3 no square in Q(t); classical)', () => {
    for (const f of [sum(R.mul(s, s), R.mul(t, t)), R.sub(R.mul(s, s), R.pow(t, 3))]) {
      const form = factorPolynomial(R, f);
      assert.ok(form.complete);
      assert.equal(form.factors.length, 1);
      assert.ok(form.factors[0]!.irreducible);
    }
  });

  test('contents, monomials and constants: 6 s^2 (s + t)^2 (s t − 1)', () => {
    const f = product(c(6), s, s, R.pow(sum(s, t), 2), R.sub(R.mul(s, t), c(1)));
    const form = factorPolynomial(R, f);
    assert.ok(form.complete);
    assert.ok(QQ.eq(form.unit, rational(6n)));
    assert.equal(formatFactored(R, form), '6s^2 (s + t)^2 (s t - 1)');
  });

  test('a product that needs Kronecker\'s substitution: (s^2 t + t^2 + 1)(s t^2 + s + 2)', () => {
    // s^2 t + t^2 + 1 is irreducible: as a quadratic in s with coprime coefficients t and t^2 + 1 it would
    // need a root −b/a with a·b = t, which fails by degrees; s t^2 + s + 2 is linear in s with coprime coefficients.
    const a = sum(R.mul(R.mul(s, s), t), R.mul(t, t), c(1));
    const b = sum(R.mul(s, R.mul(t, t)), s, c(2));
    const form = factorPolynomial(R, R.mul(a, b));
    assert.ok(form.complete);
    assert.deepEqual(keys(form), [`${R.format(a)}^1`, `${R.format(b)}^1`].sort());
  });

  test('three variables: (s + t + u)^2 (s t u − 1)(u^2 + s)', () => {
    const form = factorPolynomial(R, product(R.pow(sum(s, t, u), 2), R.sub(product(s, t, u), c(1)), sum(R.mul(u, u), s)));
    assert.ok(form.complete);
    assert.deepEqual(keys(form), ['s + t + u^2', 's t u - 1^1', 'u^2 + s^1'].sort());
  });

  test('random products of irreducibles from a fixed list are recovered exactly (common practice, no source)', () => {
    // Irreducible by the reasons given: linear in a variable with coprime coefficients, or shown by hand above.
    // Each is written with a positive leading coefficient in the monomial order, as factors are shown.
    const pool = [
      sum(s, t),
      sum(s, R.neg(t), c(1)),
      R.sub(R.mul(s, t), c(1)),
      sum(R.mul(s, s), R.mul(t, t), c(1)),
      R.sub(R.pow(t, 3), R.mul(s, s)),
      sum(R.mul(R.mul(s, s), t), R.mul(t, t), c(1)),
      sum(R.mul(u, s), R.mul(t, t)),
      R.sub(R.mul(t, u), c(2)),
    ];
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 0, max: pool.length - 1 }), { minLength: 1, maxLength: 3 }),
        fc.array(fc.integer({ min: 1, max: 2 }), { minLength: 3, maxLength: 3 }),
        fc.integer({ min: -5, max: 5 }).filter((n) => n !== 0),
        (chosen, multiplicities, unit) => {
          let f = c(unit);
          const expected: string[] = [];
          chosen.forEach((i, j) => {
            f = R.mul(f, R.pow(pool[i]!, multiplicities[j]!));
            expected.push(`${R.format(pool[i]!)}^${multiplicities[j]}`);
          });
          const form = factorPolynomial(R, f);
          assert.ok(form.complete);
          assert.ok(QQ.eq(form.unit, rational(BigInt(unit))));
          assert.deepEqual(keys(form), expected.sort());
        },
      ),
      { numRuns: 25 },
    );
  });

  test('beyond the search limits the remainder is reported as not factored, never as irreducible', () => {
    const f = R.mul(sum(R.mul(s, s), R.mul(t, t), c(1)), sum(R.mul(R.mul(s, s), R.mul(t, t)), c(2)));
    const form = factorPolynomial(R, f, { kronecker: { maxDegree: 1, maxCombinations: 1, budget: 1 } });
    assert.equal(form.complete, false);
    assert.ok(form.factors.some((x) => !x.irreducible));
    assert.ok(R.eq(expandFactored(R, form), f));
    // Within the default limits the same polynomial factors completely.
    assert.ok(factorPolynomial(R, f).complete);
  });

  test('in two variables the ring of the polynomial need not have more', () => {
    const S = QQ_ST;
    const x = S.variable('s');
    const y = S.variable('t');
    assert.equal(formatFactored(S, factorPolynomial(S, S.sub(S.mul(x, x), S.mul(y, y)))), '(s - t) (s + t)');
  });
});
