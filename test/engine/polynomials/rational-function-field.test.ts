import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { DivisionByZeroError, type Field } from '../../../server/src/engine/field.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { rationalFunctionField, type RationalFunction, type RationalFunctionField } from '../../../server/src/engine/polynomials/rational-function-field.js';
import { QQ, rational, type Rational } from '../../../server/src/engine/rational.js';
import { nonzeroPolynomial, primeFieldElement, randomPolynomial, smallRational } from './polynomial-arbitraries.js';

function randomFunction<T>(K: RationalFunctionField<T>, coefficient: fc.Arbitrary<T>): fc.Arbitrary<RationalFunction<T>> {
  return fc
    .tuple(randomPolynomial(K.ring, coefficient, 3, 2), nonzeroPolynomial(K.ring, coefficient, 3, 2))
    .map(([num, den]) => K.quotient(num, den));
}

const QQ_T = rationalFunctionField(QQ, ['t']);
const QQ_ST = rationalFunctionField(QQ, ['s', 't']);
const GF5 = primeField(5n) as Field<number>;
const GF5_ST = rationalFunctionField(GF5, ['s', 't']);

const cases: [string, RationalFunctionField<any>, fc.Arbitrary<any>][] = [
  ['QQ(t)', QQ_T, randomFunction(QQ_T, smallRational)],
  ['QQ(s, t)', QQ_ST, randomFunction(QQ_ST, smallRational)],
  ['GF(5)(s, t)', GF5_ST, randomFunction(GF5_ST, primeFieldElement(GF5))],
];

describe('the field laws in fields of rational functions (the field axioms; common practice, no source)', () => {
  for (const [label, K, element] of cases) {
    test(`${label}: associativity, commutativity and distributivity`, () => {
      fc.assert(
        fc.property(element, element, element, (a, b, c) => {
          assert.ok(K.eq(K.add(K.add(a, b), c), K.add(a, K.add(b, c))));
          assert.ok(K.eq(K.mul(K.mul(a, b), c), K.mul(a, K.mul(b, c))));
          assert.ok(K.eq(K.add(a, b), K.add(b, a)));
          assert.ok(K.eq(K.mul(a, b), K.mul(b, a)));
          assert.ok(K.eq(K.mul(a, K.add(b, c)), K.add(K.mul(a, b), K.mul(a, c))));
        }),
        { numRuns: 60 },
      );
    });

    test(`${label}: neutral elements and inverses`, () => {
      fc.assert(
        fc.property(element, (a) => {
          assert.ok(K.eq(K.add(a, K.zero), a));
          assert.ok(K.eq(K.mul(a, K.one), a));
          assert.ok(K.isZero(K.add(a, K.neg(a))));
          assert.ok(K.isZero(K.sub(a, a)));
          if (!K.isZero(a)) {
            assert.ok(K.isOne(K.mul(a, K.inv(a))));
            assert.ok(K.isOne(K.div(a, a)));
          } else {
            assert.throws(() => K.inv(a), DivisionByZeroError);
          }
        }),
        { numRuns: 80 },
      );
    });

    test(`${label}: the canonical form is coprime with a monic denominator, so eq is equality of values`, () => {
      fc.assert(
        fc.property(element, element, (a, b) => {
          const R = K.ring;
          assert.ok(K.base.isOne(R.leadingCoefficient(a.den)));
          assert.equal(K.eq(a, b), K.isZero(K.sub(a, b)));
        }),
        { numRuns: 60 },
      );
    });
  }

  test('QQ(t): evaluation is a homomorphism wherever the denominators do not vanish (common practice, no source)', () => {
    const K = QQ_T;
    const element = cases[0]![2] as fc.Arbitrary<RationalFunction<Rational>>;
    fc.assert(
      fc.property(element, element, smallRational, (a, b, x) => {
        const at = (f: RationalFunction<Rational>) => K.evaluate(f, [x]);
        if (QQ.isZero(K.ring.evaluate(a.den, [x])) || QQ.isZero(K.ring.evaluate(b.den, [x]))) return;
        assert.ok(QQ.eq(at(K.add(a, b)), QQ.add(at(a), at(b))));
        assert.ok(QQ.eq(at(K.mul(a, b)), QQ.mul(at(a), at(b))));
      }),
      { numRuns: 100 },
    );
  });
});

describe('canonical forms, constants and display', () => {
  const t = QQ_T.variable('t');
  const c = (n: bigint, d = 1n) => QQ_T.fromRational(n, d);

  test('(t^2 − 1)/(t − 1) is t + 1 (cancellation)', () => {
    const K = QQ_T;
    const q = K.div(K.sub(K.mul(t, t), K.one), K.sub(t, K.one));
    assert.ok(K.eq(q, K.add(t, K.one)));
    assert.ok(K.isPolynomial(q));
  });

  test('text and LaTeX in the forms the project asked for', () => {
    const K = QQ_T;
    assert.equal(K.format(K.add(K.sub(K.mul(t, t), K.mul(c(3n), t)), c(2n))), 't^2 - 3t + 2');
    const f = K.div(K.sub(t, K.one), K.add(t, c(2n)));
    assert.equal(K.format(f), '(t - 1)/(t + 2)');
    assert.equal(K.latex(f), '\\frac{t - 1}{t + 2}');
    assert.equal(K.format(K.inv(t)), '1/t');
    assert.equal(K.format(K.inv(K.mul(t, t))), '1/t^2');
    // 1/(2t + 1) is stored as (1/2)/(t + 1/2) and shown with integer coefficients.
    assert.equal(K.format(K.inv(K.add(K.mul(c(2n), t), K.one))), '1/(2t + 1)');
    assert.equal(K.format(K.div(t, c(3n))), '1/3 t');
    assert.equal(K.format(K.neg(K.div(K.mul(c(3n), t), K.add(t, K.one)))), '-3t/(t + 1)');
  });

  test('names, characteristic and sign follow the base field', () => {
    assert.equal(QQ_T.name, 'QQ(t)');
    assert.equal(GF5_ST.name, 'GF(5)(s, t)');
    assert.equal(QQ_T.characteristic, 0n);
    assert.equal(GF5_ST.characteristic, 5n);
    assert.equal(QQ_T.sign, undefined);
    assert.equal(rationalFunctionField(QQ, ['t']), QQ_T, 'one field object per base and variables');
  });

  test('fromBigInt and fromRational map constants; over GF(5), 1/2 is 3', () => {
    assert.ok(QQ_T.eq(QQ_T.fromRational(6n, 4n), QQ_T.fromBase(rational(3n, 2n))));
    assert.equal(GF5_ST.constantValue(GF5_ST.fromRational(1n, 2n)), 3);
    assert.throws(() => GF5_ST.fromRational(1n, 5n), DivisionByZeroError);
  });

  test('substitution gives a member of the family, and poles are reported', () => {
    const K = QQ_ST;
    const s = K.variable('s');
    const tt = K.variable('t');
    const f = K.div(K.add(s, tt), K.sub(s, tt));
    const member = K.substitute(f, { s: rational(2n) });
    assert.ok(K.eq(member, K.div(K.add(K.fromBigInt(2n), tt), K.sub(K.fromBigInt(2n), tt))));
    assert.ok(QQ.eq(K.evaluate(f, { s: rational(3n), t: rational(1n) }), rational(2n)));
    assert.throws(() => K.evaluate(f, { s: rational(1n), t: rational(1n) }), DivisionByZeroError);
    // At s = t the denominator vanishes identically: (s + t)/(s − t) has no member there.
    assert.throws(() => K.substitute(K.div(K.one, K.sub(s, tt)), { s: rational(0n), t: rational(0n) }), DivisionByZeroError);
  });
});
