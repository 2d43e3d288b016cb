import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../../server/src/engine/field.js';
import { extensionField } from '../../../server/src/engine/extension-field.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { polynomialRing, type MultivariatePolynomial, type PolynomialRing } from '../../../server/src/engine/polynomials/multivariate-polynomial.js';
import { contentIn, gcdPolynomials, lcmPolynomials } from '../../../server/src/engine/polynomials/polynomial-gcd.js';
import { QQ, rational, type Rational } from '../../../server/src/engine/rational.js';
import { fromFraction, math, toFraction } from '../linear-arbitraries.js';
import { QQ_ST, QQ_STU, QQ_T, nonzeroPolynomial, primeFieldElement, smallRational } from './polynomial-arbitraries.js';

/**
 * The checks of gcd(f·g, f·h) for random f, g, h (common practice, no source):
 * G divides both products, f divides G, and the cofactors have gcd 1, which
 * together say G = f·gcd(g, h) is the greatest common divisor; and G is monic.
 */
function checkGcdOfMultiples<T>(R: PolynomialRing<T>, f: MultivariatePolynomial<T>, g: MultivariatePolynomial<T>, h: MultivariatePolynomial<T>) {
  const a = R.mul(f, g);
  const b = R.mul(f, h);
  const G = gcdPolynomials(R, a, b);
  const ca = R.tryDivide(a, G);
  const cb = R.tryDivide(b, G);
  assert.ok(ca !== undefined && cb !== undefined, 'the gcd divides both');
  assert.ok(R.tryDivide(G, f) !== undefined, 'f divides the gcd');
  assert.ok(R.isOne(gcdPolynomials(R, ca, cb)), 'the cofactors are coprime');
  assert.ok(R.field.isOne(R.leadingCoefficient(G)), 'the gcd is monic');
}

describe('gcd(f·g, f·h) is f·gcd(g, h) (common practice, no source)', () => {
  for (const [label, R] of [
    ['QQ[t]', QQ_T],
    ['QQ[s, t]', QQ_ST],
    ['QQ[s, t, u]', QQ_STU],
  ] as const) {
    test(`over ${label}`, () => {
      const p = nonzeroPolynomial(R, smallRational, 4, 3);
      fc.assert(fc.property(p, p, p, (f, g, h) => checkGcdOfMultiples(R, f, g, h)), { numRuns: label === 'QQ[s, t, u]' ? 40 : 80 });
    });
  }
  for (const q of [2n, 7n, 2n ** 31n - 1n]) {
    test(`over GF(${q})[s, t]`, () => {
      const F = primeField(q) as Field<number>;
      const R = polynomialRing(F, ['s', 't']);
      const p = nonzeroPolynomial(R, primeFieldElement(F), 4, 3);
      fc.assert(fc.property(p, p, p, (f, g, h) => checkGcdOfMultiples(R, f, g, h)), { numRuns: 60 });
    });
  }
});

describe('gcds at the sizes papers use, where the modular algorithm runs (common practice, no source)', () => {
  test('two variables, degrees up to 10 in each, over QQ and over GF(101)', () => {
    for (const R of [QQ_ST, polynomialRing(primeField(101n) as Field<number>, ['s', 't'])] as PolynomialRing<any>[]) {
      const coefficient = (R.field as unknown) === QQ ? smallRational : primeFieldElement(R.field as Field<number>);
      const p = nonzeroPolynomial(R, coefficient, 12, 5);
      fc.assert(fc.property(p, p, p, (f, g, h) => checkGcdOfMultiples(R, f, g, h)), { numRuns: 15 });
    }
  });

  test('over the extension field GF(4), which takes the remainder sequence', () => {
    const F = extensionField(2n, 2);
    const R = polynomialRing(F, ['s', 't']);
    const p = nonzeroPolynomial(R, fc.integer({ min: 0, max: 3 }), 5, 3);
    fc.assert(fc.property(p, p, p, (f, g, h) => checkGcdOfMultiples(R, f, g, h)), { numRuns: 40 });
  });

  test('three variables over GF(3), too small a field to interpolate in, falls back correctly', () => {
    const F = primeField(3n) as Field<number>;
    const R = polynomialRing(F, ['s', 't', 'u']);
    const p = nonzeroPolynomial(R, primeFieldElement(F), 6, 3);
    fc.assert(fc.property(p, p, p, (f, g, h) => checkGcdOfMultiples(R, f, g, h)), { numRuns: 30 });
  });
});

describe('classical gcds', () => {
  test('gcd(x^m − 1, x^n − 1) = x^gcd(m,n) − 1 (classical identity, from memory)', () => {
    const R = QQ_T;
    const t = R.variable('t');
    const power = (n: number) => R.sub(R.pow(t, n), R.one);
    const gcdInt = (a: number, b: number): number => (b === 0 ? a : gcdInt(b, a % b));
    for (let m = 1; m <= 12; m++) {
      for (let n = 1; n <= 12; n++) assert.ok(R.eq(gcdPolynomials(R, power(m), power(n)), power(gcdInt(m, n))), `${m}, ${n}`);
    }
  });

  test('coprime inputs have gcd 1 and lcm their monic product', () => {
    const R = QQ_ST;
    const s = R.variable('s');
    const t = R.variable('t');
    const a = R.add(R.mul(s, s), R.mul(t, t));
    const b = R.sub(s, R.scale(t, rational(2n)));
    assert.ok(R.isOne(gcdPolynomials(R, a, b)));
    assert.ok(R.eq(lcmPolynomials(R, a, b), R.mul(a, b)));
  });

  test('common monomials and shared factors: gcd(s^2 t (s + t)^2, s t^3 (s + t)(s − t)) = s t (s + t)', () => {
    const R = QQ_ST;
    const s = R.variable('s');
    const t = R.variable('t');
    const a = R.mul(R.mul(R.mul(s, s), t), R.pow(R.add(s, t), 2));
    const b = R.mul(R.mul(s, R.pow(t, 3)), R.mul(R.add(s, t), R.sub(s, t)));
    assert.ok(R.eq(gcdPolynomials(R, a, b), R.mul(R.mul(s, t), R.add(s, t))));
  });

  test('fractions in the input: gcd(t/2 − 1/3, 3t^2 − 4t + 4/3) = t − 2/3', () => {
    const R = QQ_T;
    const t = R.variable('t');
    const a = R.sub(R.scale(t, rational(1n, 2n)), R.constant(rational(1n, 3n)));
    // 3t^2 − 4t + 4/3 = 3(t − 2/3)^2.
    const b = R.scale(R.pow(R.sub(t, R.constant(rational(2n, 3n))), 2), rational(3n));
    assert.ok(R.eq(gcdPolynomials(R, a, b), R.sub(t, R.constant(rational(2n, 3n)))));
  });

  test('contents: s^2 t + s t has content s^2 + s in t and t in s', () => {
    const R = QQ_ST;
    const s = R.variable('s');
    const t = R.variable('t');
    const f = R.add(R.mul(R.mul(s, s), t), R.mul(s, t));
    assert.ok(R.eq(contentIn(R, f, 't'), R.add(R.mul(s, s), s)));
    assert.ok(R.eq(contentIn(R, f, 's'), t));
  });

  test('gcd(0, 0) = 0 and gcd(f, 0) is f made monic', () => {
    const R = QQ_T;
    const f = R.scale(R.add(R.variable('t'), R.one), rational(4n));
    assert.ok(R.isZero(gcdPolynomials(R, R.zero, R.zero)));
    assert.ok(R.eq(gcdPolynomials(R, f, R.zero), R.add(R.variable('t'), R.one)));
  });
});

/** Euclid's algorithm on dense coefficient lists of mathjs fractions (the independent reference), monic result. */
function referenceGcd(a: Rational[], b: Rational[]): Rational[] {
  type Frac = ReturnType<typeof toFraction>;
  const trim = (p: Frac[]) => {
    while (p.length > 0 && math.equal(p[p.length - 1]!, 0)) p.pop();
    return p;
  };
  let x = trim(a.map(toFraction));
  let y = trim(b.map(toFraction));
  while (y.length > 0) {
    const r = x.slice();
    while (r.length >= y.length) {
      const factor = math.divide(r[r.length - 1]!, y[y.length - 1]!) as Frac;
      const shift = r.length - y.length;
      y.forEach((c, i) => (r[shift + i] = math.subtract(r[shift + i]!, math.multiply(factor, c)) as Frac));
      r.pop();
      trim(r);
    }
    [x, y] = [y, r];
  }
  if (x.length === 0) return [];
  const lead = x[x.length - 1]!;
  return x.map((c) => fromFraction(math.divide(c, lead)));
}

describe('univariate gcds over QQ against Euclid on mathjs fractions (independent reference library)', () => {
  test('random products with a common factor', () => {
    const coefficients = fc.array(smallRational, { minLength: 1, maxLength: 6 });
    fc.assert(
      fc.property(coefficients, coefficients, coefficients, (f, g, h) => {
        const R = QQ_T;
        const F = R.fromCoefficients(f);
        const a = R.mul(F, R.fromCoefficients(g));
        const b = R.mul(F, R.fromCoefficients(h));
        const dense = (p: MultivariatePolynomial<Rational>) => {
          const out = new Array<Rational>(Math.max(R.degreeIn(p, 0) + 1, 0)).fill(QQ.zero);
          for (const t of p.terms) out[t.exponents[0]!] = t.coefficient;
          return out;
        };
        const expected = referenceGcd(dense(a), dense(b));
        assert.ok(R.eq(gcdPolynomials(R, a, b), R.fromCoefficients(expected)));
      }),
      { numRuns: 100 },
    );
  });
});
