import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { extensionField } from '../../../server/src/engine/extension-field.js';
import type { Field } from '../../../server/src/engine/field.js';
import { finiteFieldElements } from '../../../server/src/engine/finite-fields.js';
import { isIrreducible } from '../../../server/src/engine/polynomial-mod-p.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { denseMul } from '../../../server/src/engine/polynomials/dense-polynomial.js';
import { factorOverFiniteField, finiteFieldSize } from '../../../server/src/engine/polynomials/finite-field-factor.js';
import { factorPolynomial } from '../../../server/src/engine/polynomials/polynomial-factor.js';
import { polynomialRing } from '../../../server/src/engine/polynomials/multivariate-polynomial.js';
import { formatFactored } from '../../../server/src/engine/polynomials/factored-form.js';
import { irreducibleCount } from '../irreducible-count.js';

/** Every monic polynomial of degree n over a finite field, coefficients constant term first. */
function* monics<T>(F: Field<T>, n: number): Generator<T[]> {
  const elements = [...finiteFieldElements(F)];
  const digits = new Array<number>(n).fill(0);
  for (;;) {
    yield [...digits.map((i) => elements[i]!), F.one];
    let i = 0;
    while (i < n && digits[i] === elements.length - 1) digits[i++] = 0;
    if (i === n) return;
    digits[i]!++;
  }
}

/** How many monic polynomials of degree n our factoriser finds irreducible. */
function countIrreducible<T>(F: Field<T>, n: number): number {
  const q = finiteFieldSize(F)!;
  let count = 0;
  for (const f of monics(F, n)) {
    const { factors } = factorOverFiniteField(F, q, f);
    if (factors.length === 1 && factors[0]!.multiplicity === 1) count++;
  }
  return count;
}

describe('counting monic irreducible polynomials with the factoriser', () => {
  test('over GF(2), degrees 1..10: 2, 1, 2, 3, 6, 9, 18, 30, 56, 99 (OEIS A001037)', () => {
    const A001037 = [2, 1, 2, 3, 6, 9, 18, 30, 56, 99];
    A001037.forEach((expected, i) => assert.equal(countIrreducible(primeField(2n), i + 1), expected, `degree ${i + 1}`));
  });

  test('over GF(3) up to degree 6 and GF(5) up to degree 4: Gauss\'s necklace formula', () => {
    for (const [p, top] of [[3, 6], [5, 4]] as const) {
      for (let n = 1; n <= top; n++) assert.equal(countIrreducible(primeField(BigInt(p)), n), irreducibleCount(p, n), `GF(${p}), degree ${n}`);
    }
  });

  test('over the extension fields GF(4) (degrees 1..3) and GF(9) (degrees 1..2): the necklace formula', () => {
    for (const [p, m, top] of [[2, 2, 3], [3, 2, 2]] as const) {
      const F = extensionField(BigInt(p), m);
      for (let n = 1; n <= top; n++) assert.equal(countIrreducible(F, n), irreducibleCount(p ** m, n), `GF(${p ** m}), degree ${n}`);
    }
  });
});

describe('classical factorisations over GF(p)', () => {
  test('x^p − x is the product of the p linear factors x − a (Fermat\'s little theorem)', () => {
    for (const p of [2, 3, 5, 7, 11, 13]) {
      const F = primeField(BigInt(p)) as Field<number>;
      const f = new Array<number>(p + 1).fill(0);
      f[p] = 1;
      f[1] = F.neg(1);
      const { factors } = factorOverFiniteField(F, BigInt(p), f);
      assert.equal(factors.length, p);
      assert.ok(factors.every((x) => x.factor.length === 2 && x.multiplicity === 1));
      assert.deepEqual(factors.map((x) => F.neg(x.factor[0]!)).sort((a, b) => a - b), Array.from({ length: p }, (_, i) => i));
    }
  });

  test('x^(p^n) − x is the product of the monic irreducibles of degree dividing n, each once (classical, from memory)', () => {
    for (const [p, n] of [[2, 4], [2, 6], [3, 3], [5, 2]] as const) {
      const F = primeField(BigInt(p)) as Field<number>;
      const size = p ** n;
      const f = new Array<number>(size + 1).fill(0);
      f[size] = 1;
      f[1] = F.neg(1);
      const { factors } = factorOverFiniteField(F, BigInt(p), f);
      let expected = 0;
      for (let d = 1; d <= n; d++) if (n % d === 0) expected += irreducibleCount(p, d);
      assert.equal(factors.length, expected);
      assert.ok(factors.every((x) => x.multiplicity === 1 && n % (x.factor.length - 1) === 0));
    }
  });

  test('p-th powers: over GF(3), (x^2 + 1)^3 (x + 1)^6 (x^2 + 1 has no root modulo 3)', () => {
    const F = primeField(3n) as Field<number>;
    let f = [1];
    for (let i = 0; i < 3; i++) f = denseMul(F, f, [1, 0, 1]);
    for (let i = 0; i < 6; i++) f = denseMul(F, f, [1, 1]);
    const { factors } = factorOverFiniteField(F, 3n, f);
    assert.deepEqual(
      factors.map((x) => [x.factor, x.multiplicity]).sort((a, b) => (a[0] as number[]).length - (b[0] as number[]).length),
      [[[1, 1], 6], [[1, 0, 1], 3]],
    );
  });

  test('random products: the factors multiply back and each passes Rabin\'s irreducibility test of polynomial-mod-p.ts', () => {
    for (const p of [2, 3, 7, 101]) {
      const F = primeField(BigInt(p)) as Field<number>;
      const poly = fc.array(fc.integer({ min: 0, max: p - 1 }), { minLength: 2, maxLength: 6 }).map((c) => [...c, 1]);
      fc.assert(
        fc.property(fc.array(poly, { minLength: 1, maxLength: 4 }), fc.integer({ min: 1, max: p - 1 }), (parts, unit) => {
          let f = [unit];
          for (const part of parts) f = denseMul(F, f, part);
          const result = factorOverFiniteField(F, BigInt(p), f);
          assert.equal(result.unit, unit);
          let product = [result.unit];
          for (const { factor, multiplicity } of result.factors) {
            assert.ok(isIrreducible(factor, p), `irreducible modulo ${p}`);
            for (let i = 0; i < multiplicity; i++) product = denseMul(F, product, factor);
          }
          assert.deepEqual(product, f);
        }),
        { numRuns: 40 },
      );
    }
  });
});

describe('factoring in several variables over GF(p)', () => {
  test('over GF(5), s^2 + t^2 = (s + 2t)(s + 3t), since 2^2 = −1 modulo 5', () => {
    const R = polynomialRing(primeField(5n) as Field<number>, ['s', 't']);
    const s = R.variable('s');
    const t = R.variable('t');
    const form = factorPolynomial(R, R.add(R.mul(s, s), R.mul(t, t)));
    assert.ok(form.complete);
    assert.equal(formatFactored(R, form), '(s + 2t) (s + 3t)');
  });

  test('over GF(3), a cube: (x + y)^3 (x^2 + 1), found through the p-th root', () => {
    const R = polynomialRing(primeField(3n) as Field<number>, ['x', 'y']);
    const x = R.variable('x');
    const y = R.variable('y');
    const form = factorPolynomial(R, R.mul(R.pow(R.add(x, y), 3), R.add(R.mul(x, x), R.one)));
    assert.ok(form.complete);
    assert.equal(formatFactored(R, form), '(x + y)^3 (x^2 + 1)');
  });
});
