import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../../server/src/engine/field.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { factorOverFiniteField } from '../../../server/src/engine/polynomials/finite-field-factor.js';
import { formatFactored, formatFactoredQuotient, latexFactored, latexFactoredQuotient } from '../../../server/src/engine/polynomials/factored-form.js';
import { factorPolynomial, factorRationalFunction, rationalRoots } from '../../../server/src/engine/polynomials/polynomial-factor.js';
import { rationalFunctionField } from '../../../server/src/engine/polynomials/rational-function-field.js';
import { factorRationalUnivariate, rationalRootsOf } from '../../../server/src/engine/polynomials/rational-univariate-factor.js';
import { QQ, rational } from '../../../server/src/engine/rational.js';
import { QQ_T, multiplyIntegerLists, rationals } from './polynomial-arbitraries.js';

/** The irreducible factors (constant term first, as decimal text) with multiplicities, for comparing multisets. */
function factorKeys(coefficients: readonly bigint[]): string[] {
  return factorRationalUnivariate(coefficients.map((c) => rational(c)))
    .factors.map(({ factor, multiplicity }) => `${factor.join(',')}^${multiplicity}`)
    .sort();
}

const key = (factor: readonly bigint[], multiplicity = 1) => `${factor.join(',')}^${multiplicity}`;

/** Exact division by a monic integer polynomial, written out in the test (long division). */
function divideMonic(a: readonly bigint[], b: readonly bigint[]): bigint[] {
  const r = a.slice();
  const q = new Array<bigint>(a.length - b.length + 1).fill(0n);
  for (let d = r.length - 1; d >= b.length - 1; d--) {
    const c = r[d]!;
    q[d - b.length + 1] = c;
    b.forEach((x, j) => (r[d - b.length + 1 + j]! -= c * x));
  }
  assert.ok(r.every((x) => x === 0n), 'exact division');
  return q;
}

/**
 * The cyclotomic polynomials by x^n − 1 = Π_{d | n} Φ_d (the textbook identity;
 * e.g. Lang, Algebra, ch. VI §3, from memory), computed by long division in the test.
 */
function cyclotomic(n: number, memo = new Map<number, bigint[]>()): bigint[] {
  const known = memo.get(n);
  if (known !== undefined) return known;
  let value: bigint[] = [-1n, ...new Array<bigint>(n - 1).fill(0n), 1n];
  for (let d = 1; d < n; d++) if (n % d === 0) value = divideMonic(value, cyclotomic(d, memo));
  memo.set(n, value);
  return value;
}

describe('x^n − 1 splits into the cyclotomic polynomials Φ_d, d | n, each once', () => {
  test('coefficients of Φ_d for small d (from memory; they agree with OEIS A013595)', () => {
    const expected: Record<number, number[]> = {
      1: [-1, 1],
      2: [1, 1],
      3: [1, 1, 1],
      4: [1, 0, 1],
      5: [1, 1, 1, 1, 1],
      6: [1, -1, 1],
      8: [1, 0, 0, 0, 1],
      9: [1, 0, 0, 1, 0, 0, 1],
      10: [1, -1, 1, -1, 1],
      12: [1, 0, -1, 0, 1],
      15: [1, -1, 0, 1, -1, 1, 0, -1, 1],
    };
    for (const [d, coefficients] of Object.entries(expected)) {
      assert.deepEqual(cyclotomic(Number(d)), coefficients.map(BigInt), `Φ_${d}`);
    }
  });

  test('for n = 1..36 the factors are exactly the Φ_d (Lang, Algebra, ch. VI §3: Φ_d is irreducible over Q)', () => {
    for (let n = 1; n <= 36; n++) {
      const f = [-1n, ...new Array<bigint>(n - 1).fill(0n), 1n];
      const expected: string[] = [];
      for (let d = 1; d <= n; d++) if (n % d === 0) expected.push(key(cyclotomic(d)));
      assert.deepEqual(factorKeys(f), expected.sort(), `x^${n} − 1`);
    }
  });

  test('x^105 − 1 has the factor Φ_105, of degree 48 with coefficient −2 at x^7 and x^41 (from memory; OEIS A013595)', () => {
    const f = [-1n, ...new Array<bigint>(104).fill(0n), 1n];
    const { factors } = factorRationalUnivariate(f.map((c) => rational(c)));
    assert.equal(factors.length, 8);
    const phi105 = factors.find(({ factor }) => factor.length === 49)!.factor;
    assert.equal(phi105[7], -2n);
    assert.equal(phi105[41], -2n);
    assert.deepEqual(phi105, cyclotomic(105));
  });
});

describe('classical irreducible polynomials', () => {
  test('x^4 + 1 is irreducible over Q but reducible modulo every prime (classical; e.g. Lang, Algebra, from memory)', () => {
    assert.deepEqual(factorKeys([1n, 0n, 0n, 0n, 1n]), [key([1n, 0n, 0n, 0n, 1n])]);
    for (const p of [2n, 3n, 5n, 7n, 11n, 13n, 17n, 19n, 23n, 29n, 31n, 37n, 41n, 43n, 47n, 97n, 101n, 65537n]) {
      const F = primeField(p) as Field<number>;
      const { factors } = factorOverFiniteField(F, p, [1, 0, 0, 0, 1].map((c) => F.fromBigInt(BigInt(c))));
      const count = factors.reduce((n, f) => n + f.multiplicity, 0);
      assert.ok(count >= 2, `x^4 + 1 modulo ${p}`);
    }
  });

  test('the Swinnerton-Dyer polynomials x^4 − 10x^2 + 1 and x^8 − 40x^6 + 352x^4 − 960x^2 + 576 are irreducible (Swinnerton-Dyer; from memory)', () => {
    const sd2 = [1n, 0n, -10n, 0n, 1n];
    const sd3 = [576n, 0n, -960n, 0n, 352n, 0n, -40n, 0n, 1n];
    // The coefficients recalled are checked numerically: the roots are ±√2 ± √3 (± √5).
    const value = (f: bigint[], x: number) => f.reduceRight((acc, c) => acc * x + Number(c), 0);
    assert.ok(Math.abs(value(sd2, Math.SQRT2 + Math.sqrt(3))) < 1e-9);
    assert.ok(Math.abs(value(sd3, Math.SQRT2 + Math.sqrt(3) + Math.sqrt(5))) < 1e-6);
    assert.deepEqual(factorKeys(sd2), [key(sd2)]);
    assert.deepEqual(factorKeys(sd3), [key(sd3)]);
    // Modulo every prime they split into factors of degree at most 2 (the reason they are hard; from memory).
    for (const p of [3n, 7n, 11n, 13n, 17n, 19n, 23n]) {
      const F = primeField(p) as Field<number>;
      const { factors } = factorOverFiniteField(F, p, sd3.map((c) => F.fromBigInt(c)));
      assert.ok(factors.every((f) => f.factor.length <= 3), `modulo ${p}`);
    }
  });

  test('x^3 − 2 and x^5 − 2x + 2 are irreducible (Eisenstein at 2, textbook criterion)', () => {
    assert.deepEqual(factorKeys([-2n, 0n, 0n, 1n]), [key([-2n, 0n, 0n, 1n])]);
    assert.deepEqual(factorKeys([2n, -2n, 0n, 0n, 0n, 1n]), [key([2n, -2n, 0n, 0n, 0n, 1n])]);
  });
});

describe('products of known factors are recovered exactly', () => {
  test('Wilkinson\'s polynomial Π_{i=1}^{20} (x − i) gives back its twenty linear factors and roots 1..20 (Wilkinson)', () => {
    let w = [1n];
    for (let i = 1n; i <= 20n; i++) w = multiplyIntegerLists(w, [-i, 1n]);
    const expected = Array.from({ length: 20 }, (_, i) => key([-BigInt(i + 1), 1n])).sort();
    assert.deepEqual(factorKeys(w), expected);
    const roots = rationalRootsOf(w.map((c) => rational(c)));
    assert.deepEqual(roots.map((r) => [r.root.num, r.root.den, r.multiplicity]), Array.from({ length: 20 }, (_, i) => [BigInt(i + 1), 1n, 1]));
  });

  test('random products of distinct irreducibles with multiplicities, times a rational constant (common practice, no source)', () => {
    // Each is irreducible: linear; x^2 + k with −k not a square; Φ_5, Φ_7 (cyclotomic); x^3 − 2 (Eisenstein); x^4 − 10x^2 + 1 (Swinnerton-Dyer).
    const pool: bigint[][] = [
      [-1n, 1n], [1n, 1n], [3n, 2n], [-5n, 3n], [7n, 1n],
      [1n, 0n, 1n], [2n, 0n, 1n], [3n, 0n, 1n], [1n, 1n, 1n],
      [1n, 1n, 1n, 1n, 1n], [1n, 1n, 1n, 1n, 1n, 1n, 1n], [-2n, 0n, 0n, 1n], [1n, 0n, -10n, 0n, 1n],
    ];
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 0, max: pool.length - 1 }), { minLength: 1, maxLength: 4 }),
        fc.array(fc.integer({ min: 1, max: 3 }), { minLength: 4, maxLength: 4 }),
        fc.tuple(fc.integer({ min: -9, max: 9 }).filter((n) => n !== 0), fc.integer({ min: 1, max: 9 })),
        (chosen, multiplicities, [n, d]) => {
          let product = [1n];
          const expected: string[] = [];
          chosen.forEach((i, j) => {
            for (let m = 0; m < multiplicities[j]!; m++) product = multiplyIntegerLists(product, pool[i]!);
            expected.push(key(pool[i]!, multiplicities[j]!));
          });
          const unit = rational(BigInt(n), BigInt(d));
          const result = factorRationalUnivariate(product.map((c) => QQ.mul(unit, rational(c))));
          assert.ok(QQ.eq(result.unit, unit));
          assert.deepEqual(result.factors.map(({ factor, multiplicity }) => key(factor, multiplicity)).sort(), expected.sort());
        },
      ),
      { numRuns: 60 },
    );
  });

  test('rational roots with multiplicities: (x − 1)^3 (x + 2)^2 (2x − 3)(x^2 + 1)', () => {
    let f = [1n, 0n, 1n];
    for (const [factor, m] of [[[-1n, 1n], 3], [[2n, 1n], 2], [[-3n, 2n], 1]] as const) {
      for (let i = 0; i < m; i++) f = multiplyIntegerLists(f, factor as unknown as bigint[]);
    }
    const roots = rationalRoots(QQ_T, QQ_T.fromCoefficients(f.map((c) => rational(c))));
    assert.deepEqual(roots.map((r) => [r.root.num, r.root.den, r.multiplicity]), [[-2n, 1n, 2], [1n, 1n, 3], [3n, 2n, 1]]);
  });
});

describe('factored display', () => {
  const R = QQ_T;
  const t = R.variable('t');
  const c = (n: number, d = 1) => R.constant(rational(BigInt(n), BigInt(d)));

  test('(t − 1)^2 (t + 2), as the project asked, in text and LaTeX', () => {
    const f = R.mul(R.pow(R.sub(t, c(1)), 2), R.add(t, c(2)));
    const form = factorPolynomial(R, f);
    assert.equal(formatFactored(R, form), '(t - 1)^2 (t + 2)');
    assert.equal(latexFactored(R, form), '(t - 1)^{2} (t + 2)');
    assert.ok(form.complete);
  });

  test('units and monomial factors: −3t^2 (t − 1) and 1/2 (2t + 1)', () => {
    assert.equal(formatFactored(R, factorPolynomial(R, R.mul(c(-3), R.mul(R.mul(t, t), R.sub(t, c(1)))))), '-3t^2 (t - 1)');
    assert.equal(formatFactored(R, factorPolynomial(R, R.add(t, c(1, 2)))), '1/2 (2t + 1)');
    assert.equal(formatFactored(R, factorPolynomial(R, R.sub(R.mul(t, t), c(2)))), 't^2 - 2');
  });

  test('a quotient factored above and below the line', () => {
    const K = rationalFunctionField(QQ, ['t']);
    const x = K.variable('t');
    const one = K.one;
    const f = K.div(K.mul(K.sub(x, one), K.sub(x, one)), K.mul(K.mul(x, K.fromBigInt(2n)), K.add(x, K.fromBigInt(2n))));
    const form = factorRationalFunction(K, f);
    assert.equal(formatFactoredQuotient(K.ring, form), '(t - 1)^2/(2t (t + 2))');
    assert.equal(latexFactoredQuotient(K.ring, form), '\\frac{(t - 1)^{2}}{2t (t + 2)}');
  });
});
