import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { create, all } from 'mathjs';
import { DivisionByZeroError } from '../../server/src/engine/field.js';
import {
  QQ,
  compareRational,
  gcdBigInt,
  isIntegral,
  lcmBigInt,
  parseRational,
  rational,
  type Rational,
} from '../../server/src/engine/rational.js';

// mathjs serves as an independent reference for exact fraction arithmetic.
const math = create(all);

function toMathjs(r: Rational) {
  return math.fraction(`${r.num}/${r.den}`);
}

function fromMathjs(f: { s: bigint; n: bigint; d: bigint }): Rational {
  return rational(f.s * f.n, f.d);
}

const smallBigInt = fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n });
const arbitraryRational = fc
  .tuple(smallBigInt, fc.bigInt({ min: 1n, max: 10n ** 9n }))
  .map(([n, d]) => rational(n, d));

function expectRational(r: Rational, num: bigint, den: bigint) {
  assert.deepEqual({ num: r.num, den: r.den }, { num, den });
}

describe('rational normal form (common practice, no source)', () => {
  test('fractions are reduced and the denominator is positive', () => {
    expectRational(rational(6n, -8n), -3n, 4n);
    expectRational(rational(-6n, -8n), 3n, 4n);
    expectRational(rational(0n, -5n), 0n, 1n);
    expectRational(rational(7n), 7n, 1n);
    expectRational(rational(-12n, 4n), -3n, 1n);
  });

  test('a zero denominator raises DivisionByZeroError', () => {
    assert.throws(() => rational(1n, 0n), DivisionByZeroError);
  });

  test('every result of an operation is in normal form', () => {
    fc.assert(
      fc.property(arbitraryRational, arbitraryRational, (a, b) => {
        const results = [QQ.add(a, b), QQ.sub(a, b), QQ.mul(a, b), QQ.neg(a)];
        if (!QQ.isZero(b)) results.push(QQ.div(a, b), QQ.inv(b));
        for (const r of results) {
          assert.ok(r.den > 0n);
          assert.equal(gcdBigInt(r.num, r.den), 1n);
        }
      }),
    );
  });
});

describe('parseRational (common practice, no source)', () => {
  const cases: [string, bigint, bigint][] = [
    ['3', 3n, 1n],
    ['-3', -3n, 1n],
    ['+3', 3n, 1n],
    ['3/4', 3n, 4n],
    ['-3/4', -3n, 4n],
    ['6/8', 3n, 4n],
    ['0.125', 1n, 8n],
    ['-1.5', -3n, 2n],
    ['2/0.5', 4n, 1n],
    ['.5', 1n, 2n],
    ['0.1', 1n, 10n],
    [' 7 / 21 ', 1n, 3n],
    ['-0', 0n, 1n],
    ['123456789012345678901234567890', 123456789012345678901234567890n, 1n],
  ];
  for (const [text, num, den] of cases) {
    test(`"${text}" is ${num}/${den}`, () => expectRational(parseRational(text), num, den));
  }

  test('malformed text raises an Error that quotes it', () => {
    for (const text of ['', 'abc', '-', '1/2/3', '3/-4', '1e5', '1..2', '3/', '/4', '0x10', '1,5']) {
      assert.throws(
        () => parseRational(text),
        (e: unknown) => e instanceof Error && !(e instanceof DivisionByZeroError) && e.message.includes(`"${text}"`),
        text,
      );
    }
  });

  test('a zero denominator raises DivisionByZeroError', () => {
    assert.throws(() => parseRational('3/0'), DivisionByZeroError);
    assert.throws(() => parseRational('3/0.00'), DivisionByZeroError);
  });

  test('format and parse are inverse', () => {
    fc.assert(fc.property(arbitraryRational, (r) => assert.ok(QQ.eq(parseRational(QQ.format(r)), r))));
  });

  test('a decimal with k digits after the point is its digits over 10^k, as mathjs reads it', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 15n }), fc.integer({ min: 1, max: 12 }), (digits, k) => {
        const padded = digits.toString().padStart(k + 1, '0');
        const text = `${padded.slice(0, -k)}.${padded.slice(-k)}`;
        assert.ok(QQ.eq(parseRational(text), fromMathjs(math.fraction(text) as never)), text);
      }),
    );
  });
});

describe('format and latex (common practice, no source)', () => {
  test('examples', () => {
    assert.equal(QQ.format(rational(-3n, 4n)), '-3/4');
    assert.equal(QQ.format(rational(5n)), '5');
    assert.equal(QQ.latex(rational(-3n, 4n)), '-\\frac{3}{4}');
    assert.equal(QQ.latex(rational(3n, 4n)), '\\frac{3}{4}');
    assert.equal(QQ.latex(rational(5n)), '5');
    assert.equal(QQ.latex(rational(-5n)), '-5');
  });
});

describe('gcd and lcm', () => {
  test('gcd is the largest common divisor, by its definition, for small numbers', () => {
    for (let a = -30n; a <= 30n; a++) {
      for (let b = -30n; b <= 30n; b++) {
        // Every nonzero divisor is at most 30 in size; gcd(0, 0) = 0 by convention.
        let largest = 0n;
        for (let d = 1n; d <= 30n; d++) if (a % d === 0n && b % d === 0n) largest = d;
        if (a === 0n && b === 0n) largest = 0n;
        assert.equal(gcdBigInt(a, b), largest, `gcd(${a}, ${b})`);
      }
    }
  });

  test('gcd(a, b)·lcm(a, b) = |a·b| (textbook identity, from memory)', () => {
    fc.assert(
      fc.property(smallBigInt, smallBigInt, (a, b) => {
        const product = a * b;
        assert.equal(gcdBigInt(a, b) * lcmBigInt(a, b), product < 0n ? -product : product);
      }),
    );
  });
});

describe('QQ arithmetic against mathjs fractions (independent reference library)', () => {
  test('add, sub, mul, div', () => {
    fc.assert(
      fc.property(arbitraryRational, arbitraryRational, (a, b) => {
        const x = toMathjs(a);
        const y = toMathjs(b);
        assert.ok(QQ.eq(QQ.add(a, b), fromMathjs(math.add(x, y) as never)));
        assert.ok(QQ.eq(QQ.sub(a, b), fromMathjs(math.subtract(x, y) as never)));
        assert.ok(QQ.eq(QQ.mul(a, b), fromMathjs(math.multiply(x, y) as never)));
        if (!QQ.isZero(b)) assert.ok(QQ.eq(QQ.div(a, b), fromMathjs(math.divide(x, y) as never)));
      }),
    );
  });

  test('sign and comparison', () => {
    fc.assert(
      fc.property(arbitraryRational, arbitraryRational, (a, b) => {
        assert.equal(QQ.sign!(a), Number(math.sign(toMathjs(a)).valueOf()));
        assert.equal(compareRational(a, b), Number(math.compare(toMathjs(a), toMathjs(b)).valueOf()));
      }),
    );
  });

  test('zero has no inverse', () => {
    assert.throws(() => QQ.inv(QQ.zero), DivisionByZeroError);
    assert.throws(() => QQ.div(QQ.one, QQ.zero), DivisionByZeroError);
    assert.throws(() => QQ.fromRational(1n, 0n), DivisionByZeroError);
  });
});

describe('QQ field identities', () => {
  test('distributivity, inverses and identities (field axioms, common practice)', () => {
    fc.assert(
      fc.property(arbitraryRational, arbitraryRational, arbitraryRational, (a, b, c) => {
        assert.ok(QQ.eq(QQ.mul(a, QQ.add(b, c)), QQ.add(QQ.mul(a, b), QQ.mul(a, c))));
        assert.ok(QQ.isZero(QQ.add(a, QQ.neg(a))));
        assert.ok(QQ.eq(QQ.mul(a, QQ.one), a));
        if (!QQ.isZero(a)) assert.ok(QQ.isOne(QQ.mul(a, QQ.inv(a))));
      }),
    );
  });

  test('the harmonic number H_10 = 7381/2520 (OEIS A001008 and A002805, from memory)', () => {
    let h = QQ.zero;
    for (let k = 1n; k <= 10n; k++) h = QQ.add(h, rational(1n, k));
    expectRational(h, 7381n, 2520n);
  });

  test('isIntegral', () => {
    assert.equal(isIntegral(parseRational('4/2')), true);
    assert.equal(isIntegral(parseRational('3/2')), false);
    assert.equal(isIntegral(QQ.zero), true);
  });
});
