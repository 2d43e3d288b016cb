import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { distinctPrimeFactors, integerRoot, primePowerDecomposition } from '../../server/src/engine/integer-factors.js';
import {
  addPolynomials,
  dividePolynomials,
  firstPrimitivePolynomial,
  formatPolynomial,
  isIrreducible,
  isPrimitive,
  monicPolynomials,
  multiplyModPolynomial,
  multiplyPolynomials,
  normalizePolynomial,
  polynomialDegree,
  polynomialGcd,
  polynomialRemainder,
  powerModPolynomial,
  subtractPolynomials,
} from '../../server/src/engine/polynomial-mod-p.js';
import { bruteIsIrreducible, bruteOrderOfX, naiveMulMod, naiveRemainder } from './naive-finite-field.js';
import { irreducibleCount } from './irreducible-count.js';

function totient(n: number): number {
  let count = 0;
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  for (let k = 1; k <= n; k++) if (gcd(k, n) === 1) count++;
  return count;
}

const count = (p: number, m: number, predicate: (f: number[]) => boolean) => {
  let n = 0;
  for (const f of monicPolynomials(p, m)) if (predicate(f)) n++;
  return n;
};

/** Degrees counted for each p: every monic polynomial of the degree is tested. */
const RANGES: [number, number][] = [
  [2, 12],
  [3, 7],
  [5, 4],
  [7, 3],
  [11, 2],
];

describe('counting irreducible and primitive polynomials', () => {
  test('monic irreducibles of degree 1..10 over GF(2): OEIS A001037 2, 1, 2, 3, 6, 9, 18, 30, 56, 99 (from memory; equal to Gauss’s formula)', () => {
    const a001037 = [2, 1, 2, 3, 6, 9, 18, 30, 56, 99];
    a001037.forEach((expected, i) => {
      assert.equal(irreducibleCount(2, i + 1), expected, 'the remembered values agree with Gauss’s formula');
      assert.equal(count(2, i + 1, (f) => isIrreducible(f, 2)), expected, `degree ${i + 1}`);
    });
  });

  test('monic irreducibles of every degree match Gauss’s formula (1/m) Σ μ(d) p^(m/d) (Gauss; e.g. Lidl and Niederreiter, Finite Fields, ch. 3 — from memory)', () => {
    for (const [p, maxDegree] of RANGES) {
      for (let m = 1; m <= maxDegree; m++) assert.equal(count(p, m, (f) => isIrreducible(f, p)), irreducibleCount(p, m), `p = ${p}, m = ${m}`);
    }
  });

  test('primitive polynomials of degree 1..10 over GF(2): OEIS A011260 1, 1, 2, 2, 6, 6, 18, 16, 48, 60 (from memory; equal to φ(2^m − 1)/m)', () => {
    const a011260 = [1, 1, 2, 2, 6, 6, 18, 16, 48, 60];
    a011260.forEach((expected, i) => {
      const m = i + 1;
      assert.equal(totient(2 ** m - 1) / m, expected, 'the remembered values agree with φ(2^m − 1)/m');
      assert.equal(count(2, m, (f) => isPrimitive(f, 2)), expected, `degree ${m}`);
    });
  });

  test('primitive polynomials of every degree number φ(p^m − 1)/m (from memory; any finite-field text)', () => {
    for (const [p, maxDegree] of RANGES) {
      for (let m = 1; m <= Math.min(maxDegree, 6); m++) {
        assert.equal(count(p, m, (f) => isPrimitive(f, p)), totient(p ** m - 1) / m, `p = ${p}, m = ${m}`);
      }
    }
  });

  test('Rabin’s test and the order test agree with brute force on every small monic polynomial', () => {
    // Brute force: trial division by all monic polynomials of half the degree; the order of x by repeated multiplication.
    for (const [p, maxDegree] of [
      [2, 8],
      [3, 5],
      [5, 3],
      [7, 2],
    ] as [number, number][]) {
      for (let m = 1; m <= maxDegree; m++) {
        for (const f of monicPolynomials(p, m)) {
          const irreducible = bruteIsIrreducible(f, p);
          assert.equal(isIrreducible(f, p), irreducible, `${formatPolynomial(f)} over GF(${p})`);
          const primitive = irreducible && bruteOrderOfX(f, p) === p ** m - 1;
          assert.equal(isPrimitive(f, p), primitive, `${formatPolynomial(f)} over GF(${p})`);
          // A scalar multiple has the same roots, so the same answers.
          const scaled = f.map((c) => (c * (p - 1)) % p);
          assert.equal(isIrreducible(scaled, p), irreducible);
        }
      }
    }
  });

  test('constants are not irreducible; x is irreducible but not primitive; x + 1 is primitive over GF(2) (common practice, no source)', () => {
    assert.equal(isIrreducible([], 3), false);
    assert.equal(isIrreducible([2], 3), false);
    assert.equal(isIrreducible([0, 1], 3), true);
    assert.equal(isPrimitive([0, 1], 3), false);
    assert.equal(isPrimitive([1, 1], 2), true);
    // Over GF(7), x − 3 is primitive: the powers of 3 mod 7 are 3, 2, 6, 4, 5, 1 (hand computation).
    assert.equal(isPrimitive([4, 1], 7), true);
    assert.equal(isPrimitive([5, 1], 7), false); // x − 2: 2 has order 3 mod 7
  });

  test('the first primitive polynomial of each degree over GF(2) up to 20, by the definition', () => {
    for (let m = 1; m <= 20; m++) {
      const chosen = firstPrimitivePolynomial(2, m);
      assert.ok(isPrimitive(chosen, 2));
      for (const f of monicPolynomials(2, m)) {
        if (f.every((c, i) => c === chosen[i])) break;
        assert.ok(!isPrimitive(f, 2), `${formatPolynomial(f)} comes first and is primitive`);
      }
    }
    // x^8 + x^4 + x^3 + x^2 + 1 is the primitive octic widely used for GF(256) (Reed–Solomon practice, from memory);
    // it must come no earlier than the first one in the order, which is ascending in Σ c_i 2^i.
    const first8 = firstPrimitivePolynomial(2, 8);
    const value = (f: number[]) => f.slice(0, -1).reduceRight((acc, c) => acc * 2 + c, 0);
    assert.ok(isPrimitive([1, 0, 1, 1, 1, 0, 0, 0, 1], 2));
    assert.ok(value(first8) <= value([1, 0, 1, 1, 1, 0, 0, 0, 1]));
  });
});

describe('the order of monic polynomials', () => {
  test('x^2, x^2 + 1, x^2 + x, x^2 + x + 1 over GF(2); p^m of them, ascending in Σ c_i p^i', () => {
    assert.deepEqual([...monicPolynomials(2, 2)], [[0, 0, 1], [1, 0, 1], [0, 1, 1], [1, 1, 1]]);
    assert.deepEqual([...monicPolynomials(5, 0)], [[1]]);
    const all = [...monicPolynomials(3, 3)];
    assert.equal(all.length, 27);
    all.forEach((f, n) => assert.equal(f[0]! + 3 * f[1]! + 9 * f[2]!, n));
  });
});

describe('polynomial arithmetic over GF(p) (common practice, no source)', () => {
  const p = 7;
  const poly = fc.array(fc.integer({ min: 0, max: p - 1 }), { maxLength: 7 });
  const nonzero = poly.filter((a) => a.some((c) => c !== 0));

  test('division: a = quotient·b + remainder with deg remainder < deg b', () => {
    fc.assert(
      fc.property(poly, nonzero, (a, b) => {
        const { quotient, remainder } = dividePolynomials(a, b, p);
        assert.ok(polynomialDegree(remainder) < polynomialDegree(b));
        assert.deepEqual(addPolynomials(multiplyPolynomials(quotient, b, p), remainder, p), normalizePolynomial(a, p));
        assert.deepEqual(polynomialRemainder(a, b, p), remainder);
      }),
    );
  });

  test('products modulo a monic polynomial agree with the schoolbook model', () => {
    const monic = fc.array(fc.integer({ min: 0, max: p - 1 }), { minLength: 1, maxLength: 5 }).map((c) => [...c, 1]);
    fc.assert(
      fc.property(poly, poly, monic, (a, b, f) => {
        const m = f.length - 1;
        const expected = naiveMulMod(naiveRemainder(a, f, p), naiveRemainder(b, f, p), f, p);
        assert.deepEqual(multiplyModPolynomial(a, b, f, p), normalizePolynomial(expected.slice(0, m), p));
      }),
    );
  });

  test('powers modulo f agree with repeated multiplication', () => {
    const f = [3, 1, 0, 1]; // any modulus will do
    fc.assert(
      fc.property(poly, fc.integer({ min: 0, max: 30 }), (a, e) => {
        let expected: number[] = [1];
        for (let i = 0; i < e; i++) expected = multiplyModPolynomial(expected, a, f, p);
        assert.deepEqual(powerModPolynomial(a, BigInt(e), f, p), expected);
      }),
    );
  });

  test('the gcd is monic, divides both, and contains every common factor', () => {
    fc.assert(
      fc.property(nonzero, nonzero, nonzero, (a, b, c) => {
        const g = polynomialGcd(multiplyPolynomials(a, c, p), multiplyPolynomials(b, c, p), p);
        assert.equal(g[g.length - 1], 1);
        assert.deepEqual(polynomialRemainder(multiplyPolynomials(a, c, p), g, p), []);
        assert.deepEqual(polynomialRemainder(multiplyPolynomials(b, c, p), g, p), []);
        assert.deepEqual(polynomialRemainder(g, c, p), []);
      }),
    );
    assert.deepEqual(polynomialGcd([], [], p), []);
  });

  test('normalization, subtraction and errors', () => {
    assert.deepEqual(normalizePolynomial([-1, 8, 0, 0], p), [6, 1]);
    assert.deepEqual(subtractPolynomials([1, 2], [1, 2], p), []);
    assert.equal(polynomialDegree([]), -1);
    assert.equal(polynomialDegree([0, 0, 3, 0]), 2);
    assert.throws(() => dividePolynomials([1], [0, 0], p), /zero polynomial/);
    assert.throws(() => normalizePolynomial([1], 6), /prime p below 2\^26/);
    assert.throws(() => powerModPolynomial([1], -1n, [1, 1], p), RangeError);
  });

  test('formatting', () => {
    assert.equal(formatPolynomial([1, 1, 1]), 'x^2 + x + 1');
    assert.equal(formatPolynomial([1, 2]), '2x + 1');
    assert.equal(formatPolynomial([0, 0, 3], 'a', 'latex'), '3a^{2}');
    assert.equal(formatPolynomial([]), '0');
    assert.equal(formatPolynomial([1]), '1');
  });
});

describe('integer helpers (common practice, no source)', () => {
  /** The prime factorization by the plainest trial division, as a map prime → exponent. */
  function plainFactor(n: number): Map<number, number> {
    const out = new Map<number, number>();
    for (let d = 2; n > 1; d++) {
      while (n % d === 0) {
        out.set(d, (out.get(d) ?? 0) + 1);
        n /= d;
      }
    }
    return out;
  }

  test('distinct prime factors and prime-power decompositions of 1..3000 agree with plain trial division', () => {
    for (let n = 1; n <= 3000; n++) {
      const factors = plainFactor(n);
      assert.deepEqual(distinctPrimeFactors(BigInt(n)), [...factors.keys()].map(BigInt));
      const expected = factors.size === 1 ? { prime: BigInt([...factors.keys()][0]!), exponent: [...factors.values()][0]! } : undefined;
      assert.deepEqual(primePowerDecomposition(BigInt(n)), expected, `${n}`);
    }
  });

  test('large cases: 2^20 − 1 = 3·5^2·11·31·41, 2^100, (2^31 − 1)^3, 6^10', () => {
    assert.deepEqual(distinctPrimeFactors(2n ** 20n - 1n), [3n, 5n, 11n, 31n, 41n]);
    assert.deepEqual(primePowerDecomposition(2n ** 100n), { prime: 2n, exponent: 100 });
    assert.deepEqual(primePowerDecomposition((2n ** 31n - 1n) ** 3n), { prime: 2n ** 31n - 1n, exponent: 3 });
    assert.equal(primePowerDecomposition(6n ** 10n), undefined);
    assert.equal(primePowerDecomposition(0n), undefined);
    assert.throws(() => distinctPrimeFactors(2n ** 60n), RangeError);
    assert.throws(() => distinctPrimeFactors(0n), RangeError);
  });

  test('integer roots: r^k ≤ n < (r + 1)^k', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 2n ** 200n }), fc.integer({ min: 1, max: 12 }), (n, k) => {
        const r = integerRoot(n, k);
        const K = BigInt(k);
        assert.ok(r ** K <= n && n < (r + 1n) ** K);
      }),
    );
  });
});
