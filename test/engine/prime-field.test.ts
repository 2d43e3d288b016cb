import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { DivisionByZeroError, type Field } from '../../server/src/engine/field.js';
import { NotPrimeError, primeField } from '../../server/src/engine/prime-field.js';

// Moduli on both sides of the switch from number to bigint elements at 2^31.
// Primality: 2^31−1 (Euler 1772), 2^61−1 (Pervushin 1883), 2^127−1 (Lucas 1876);
// 2^31+11 is the least prime above 2^31 (checked by trial division in primes.test.ts).
const MODULI = [2n, 3n, 7n, 101n, 65537n, 2n ** 31n - 1n, 2n ** 31n + 11n, 2n ** 61n - 1n, 2n ** 127n - 1n];

/** a^e by square-and-multiply using only the field's multiplication. */
function power<T>(F: Field<T>, a: T, e: bigint): T {
  let result = F.one;
  let base = a;
  while (e > 0n) {
    if (e & 1n) result = F.mul(result, base);
    base = F.mul(base, base);
    e >>= 1n;
  }
  return result;
}

/** A uniformly chosen element of GF(p), given as a bigint residue. */
const residue = (p: bigint) => fc.bigInt({ min: 0n, max: p - 1n });
const nonzeroResidue = (p: bigint) => fc.bigInt({ min: 1n, max: p - 1n });

/** The representative in [0, p) of an element, read back through `format`. */
const value = (F: Field<any>, a: unknown) => BigInt(F.format(a));

describe('construction', () => {
  test('composite moduli and moduli below 2 raise NotPrimeError naming the number', () => {
    assert.throws(() => primeField(6n), (e: unknown) => e instanceof NotPrimeError && e.message === 'GF(6): 6 is not a prime');
    for (const n of [-7n, 0n, 1n, 4n, 561n, 2n ** 67n - 1n]) {
      assert.throws(() => primeField(n), (e: unknown) => e instanceof NotPrimeError && e.message.includes(`GF(${n})`), `${n}`);
    }
  });

  test('name, characteristic, and no order', () => {
    const F = primeField(7n);
    assert.equal(F.name, 'GF(7)');
    assert.equal(F.characteristic, 7n);
    assert.equal(F.sign, undefined);
    assert.equal(primeField(2n ** 61n - 1n).name, `GF(${2n ** 61n - 1n})`);
  });
});

describe('GF(7) by hand (common practice, no source)', () => {
  const F = primeField(7n);
  const e = (n: bigint) => F.fromBigInt(n);
  test('small computations', () => {
    assert.equal(F.format(F.add(e(5n), e(4n))), '2');
    assert.equal(F.format(F.sub(e(2n), e(5n))), '4');
    assert.equal(F.format(F.mul(e(3n), e(5n))), '1');
    assert.equal(F.format(F.inv(e(3n))), '5');
    assert.equal(F.format(F.neg(e(1n))), '6');
    assert.equal(F.format(e(-1n)), '6');
    assert.equal(F.format(e(100n)), '2');
    assert.equal(F.latex(e(-1n)), '6');
  });

  test('fromRational maps num·den^(-1), negative numbers too', () => {
    assert.equal(F.format(F.fromRational(1n, 2n)), '4');
    assert.equal(F.format(F.fromRational(-1n, 2n)), '3');
    assert.equal(F.format(F.fromRational(3n, -4n)), '1');
    assert.equal(F.format(F.fromRational(-3n, 1n)), '4');
    for (const den of [0n, 7n, -14n]) assert.throws(() => F.fromRational(1n, den), DivisionByZeroError);
  });

  test('zero has no inverse', () => {
    assert.throws(() => F.inv(F.zero), DivisionByZeroError);
    assert.throws(() => F.div(F.one, F.zero), DivisionByZeroError);
  });

  test('in GF(2), 1 + 1 = 0', () => {
    const G = primeField(2n);
    assert.ok(G.isZero(G.add(G.one, G.one)));
  });
});

for (const p of MODULI) {
  describe(`GF(${p})`, () => {
    const F = primeField(p);
    const e = (n: bigint) => F.fromBigInt(n);

    test('arithmetic agrees with bigint arithmetic modulo p (exact products even near 2^62)', () => {
      const reduce = (n: bigint) => ((n % p) + p) % p;
      // Values near p make the products as large as possible.
      const near = fc.oneof(residue(p), fc.bigInt({ min: p > 1000n ? p - 1000n : 0n, max: p - 1n }));
      fc.assert(
        fc.property(near, near, (a, b) => {
          assert.equal(value(F, F.add(e(a), e(b))), reduce(a + b));
          assert.equal(value(F, F.sub(e(a), e(b))), reduce(a - b));
          assert.equal(value(F, F.mul(e(a), e(b))), reduce(a * b));
          assert.equal(value(F, F.neg(e(a))), reduce(-a));
        }),
      );
    });

    test("Fermat's little theorem: a^(p−1) = 1 for a ≠ 0 (Fermat 1640, Euler's proof 1736)", () => {
      fc.assert(fc.property(nonzeroResidue(p), (a) => assert.ok(F.isOne(power(F, e(a), p - 1n)))));
    });

    test('a·a^(−1) = 1 and (a/b)·b = a (field axioms, common practice)', () => {
      fc.assert(
        fc.property(nonzeroResidue(p), residue(p), (a, b) => {
          assert.ok(F.isOne(F.mul(e(a), F.inv(e(a)))));
          assert.ok(F.eq(F.mul(F.div(e(b), e(a)), e(a)), e(b)));
        }),
      );
    });

    test('fromRational(n, d)·d = n', () => {
      fc.assert(
        fc.property(fc.bigInt({ min: -(10n ** 40n), max: 10n ** 40n }), fc.bigInt({ min: -(10n ** 40n), max: 10n ** 40n }), (n, d) => {
          fc.pre(d % p !== 0n);
          assert.ok(F.eq(F.mul(F.fromRational(n, d), e(d)), e(n)));
        }),
      );
    });

    test('format gives the representative in [0, p)', () => {
      fc.assert(
        fc.property(fc.bigInt({ min: -(10n ** 50n), max: 10n ** 50n }), (n) => {
          const v = value(F, e(n));
          assert.ok(v >= 0n && v < p);
          assert.equal((n - v) % p, 0n);
        }),
      );
    });
  });
}

describe("Wilson's theorem: (p−1)! = −1 in GF(p) (Lagrange 1771)", () => {
  for (const p of [2n, 3n, 101n, 65537n]) {
    test(`p = ${p}`, () => {
      const F = primeField(p);
      let factorial = F.one;
      for (let k = 1n; k < p; k++) factorial = F.mul(factorial, F.fromBigInt(k));
      assert.ok(F.eq(factorial, F.neg(F.one)));
    });
  }
});
