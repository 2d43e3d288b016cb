import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { DivisionByZeroError } from '../../server/src/engine/field.js';
import { extensionField, FieldOrderLimitError, type FiniteField } from '../../server/src/engine/extension-field.js';
import {
  finiteField,
  finiteFieldElement,
  finiteFieldElements,
  finiteFieldOrder,
  NotPrimePowerError,
} from '../../server/src/engine/finite-fields.js';
import { NotPrimeError, primeField } from '../../server/src/engine/prime-field.js';
import { QQ } from '../../server/src/engine/rational.js';
import { bruteIsIrreducible, bruteOrderOfX, decode, encode, naiveAdd, naiveMulMod } from './naive-finite-field.js';

/** [p, m] for the small fields checked exhaustively: GF(4), GF(8), GF(9), GF(16), GF(25), GF(27). */
const SMALL: [number, number][] = [
  [2, 2],
  [2, 3],
  [3, 2],
  [2, 4],
  [5, 2],
  [3, 3],
];

/** Larger fields checked on random elements, up to the limit 2^20 and with a large characteristic (1021^2). */
const LARGE: [number, number][] = [
  [2, 10],
  [3, 7],
  [5, 4],
  [7, 3],
  [2, 20],
  [1021, 2],
];

const fieldOf = ([p, m]: [number, number]) => extensionField(BigInt(p), m);

/** Euler's totient by trial division, for the cyclic-group counts. */
function totient(n: number): number {
  let result = n;
  let rest = n;
  for (let d = 2; d * d <= rest; d++) {
    if (rest % d !== 0) continue;
    while (rest % d === 0) rest /= d;
    result -= result / d;
  }
  if (rest > 1) result -= result / rest;
  return result;
}

/** The multiplicative order of x ≠ 0, by repeated multiplication. */
function orderOf(F: FiniteField, x: number): number {
  let k = 1;
  for (let y = x; y !== 1; y = F.mul(y, x)) k++;
  return k;
}

describe('construction and the defining polynomial', () => {
  test('names, orders, degrees and characteristics', () => {
    for (const [p, m] of [...SMALL, ...LARGE]) {
      const F = fieldOf([p, m]);
      assert.equal(F.name, `GF(${p ** m})`);
      assert.equal(F.order, BigInt(p ** m));
      assert.equal(F.degree, m);
      assert.equal(F.characteristic, BigInt(p));
      assert.equal(F.zero, 0);
      assert.equal(F.one, 1);
      assert.equal(F.sign, undefined);
    }
  });

  test('the chosen polynomials, derived by hand from the documented order (common practice, no source)', () => {
    // GF(4): x^2 and x^2 + x have the root 0, x^2 + 1 = (x + 1)^2; x^2 + x + 1 is the classical choice (any algebra text, from memory).
    assert.equal(fieldOf([2, 2]).definingPolynomialText, 'x^2 + x + 1');
    // GF(8): x^3 + 1 has the root 1 and x^3 + x the root 0; x^3 + x + 1 has no root, and 7 is prime so x has order 7.
    assert.equal(fieldOf([2, 3]).definingPolynomialText, 'x^3 + x + 1');
    // GF(16): x^4 + 1 = (x + 1)^4 and x^4 + x has the root 0; x^4 + x + 1 is the well-known primitive quartic (from memory).
    assert.equal(fieldOf([2, 4]).definingPolynomialText, 'x^4 + x + 1');
    // GF(9): x^2 + 1 is irreducible but x^4 = 1; x^2 + 2, x^2 + x, x^2 + x + 1 = (x + 2)^2 are reducible;
    // in x^2 + x + 2, x^2 = 2x + 1 and x^4 = 2 ≠ 1, so x has order 8.
    assert.equal(fieldOf([3, 2]).definingPolynomialText, 'x^2 + x + 2');
    // GF(25): x^2 + 2 and x^2 + 3 give x^8 = 1; x^2 + 1, x^2 + 4 split; x^2 + x + 1 has norm 1 so x^6 = 1;
    // x^2 + x + 2 is irreducible (discriminant 3 is not a square mod 5), x^12 = 2^2 ≠ 1 and x^8 = 3x + 1 ≠ 1.
    assert.equal(fieldOf([5, 2]).definingPolynomialText, 'x^2 + x + 2');
    // GF(27): x^3 + 1, x^3 + 2, x^3 + x, x^3 + x + 1, x^3 + x + 2, x^3 + 2x have a root in GF(3); x^3 + 2x + 1 has none,
    // and x^13 = −1 (its norm), so x has order 26.
    assert.equal(fieldOf([3, 3]).definingPolynomialText, 'x^3 + 2x + 1');
    assert.deepEqual(fieldOf([3, 3]).definingPolynomial, [1, 2, 0, 1]);
  });

  test('each defining polynomial is the first monic primitive one in the documented order, by brute force', () => {
    // Brute force: trial division by every monic polynomial of half the degree, and the order of x by repeated multiplication.
    for (const [p, m] of [...SMALL, [2, 5], [2, 6], [2, 7], [2, 8], [3, 4], [3, 5], [5, 3], [7, 2], [11, 2], [13, 2]] as [number, number][]) {
      const q = p ** m;
      let first: number[] | undefined;
      // The documented order is ascending in N = Σ c_i p^i over the non-leading coefficients.
      for (let n = 0; n < q && first === undefined; n++) {
        const f = [...decode(n, p, m), 1];
        if (bruteIsIrreducible(f, p) && bruteOrderOfX(f, p) === q - 1) first = f;
      }
      assert.deepEqual(fieldOf([p, m]).definingPolynomial, first, `GF(${p}^${m})`);
    }
  });

  test('extension fields are shared per (p, m, generator name)', () => {
    assert.equal(extensionField(3n, 2), extensionField(3n, 2));
    assert.equal(extensionField(3n, 2, { generator: 'a' }), extensionField(3n, 2));
    assert.notEqual(extensionField(3n, 2, { generator: 'w' }), extensionField(3n, 2));
  });

  test('bad characteristics, degrees, generator names and orders are refused clearly', () => {
    assert.throws(() => extensionField(4n, 2), /characteristic must be a prime/);
    assert.throws(() => extensionField(3n, 1), /degree must be an integer m ≥ 2/);
    assert.throws(() => extensionField(3n, 2.5), /degree must be an integer m ≥ 2/);
    assert.throws(() => extensionField(3n, 2, { generator: '2a' }), /generator name/);
    assert.throws(() => extensionField(3n, 2, { generator: 'a b' }), /generator name/);
    assert.throws(
      () => extensionField(2n, 21),
      (e: unknown) => e instanceof FieldOrderLimitError && e instanceof RangeError && e.message.startsWith('GF(2097152): '),
    );
    assert.throws(() => extensionField(2n, 1000), (e: unknown) => e instanceof FieldOrderLimitError && e.message.startsWith('GF(2^1000): '));
    assert.throws(() => extensionField(1031n, 2), FieldOrderLimitError);
  });
});

describe('arithmetic against a plain polynomial model (naive-finite-field.ts)', () => {
  for (const [p, m] of SMALL) {
    const F = fieldOf([p, m]);
    const q = p ** m;
    const f = [...F.definingPolynomial];
    const model = (x: number) => decode(x, p, m);
    test(`${F.name}: every sum, difference, product, quotient and inverse, exhaustively`, () => {
      for (let x = 0; x < q; x++) {
        const nx = model(x);
        assert.equal(F.add(F.neg(x), x), 0);
        if (x !== 0) assert.equal(F.mul(F.inv(x), x), 1);
        for (let y = 0; y < q; y++) {
          const ny = model(y);
          assert.equal(F.add(x, y), encode(naiveAdd(nx, ny, p), p));
          assert.equal(F.mul(x, y), encode(naiveMulMod(nx, ny, f, p), p));
          assert.equal(F.add(F.sub(x, y), y), x);
          if (y !== 0) assert.equal(F.mul(F.div(x, y), y), x);
        }
      }
      assert.throws(() => F.inv(0), DivisionByZeroError);
      assert.throws(() => F.div(1, 0), DivisionByZeroError);
    });

    test(`${F.name}: the field axioms on all triples (common practice, no source)`, () => {
      for (let x = 0; x < q; x++) {
        assert.equal(F.add(x, 0), x);
        assert.equal(F.mul(x, 1), x);
        for (let y = 0; y < q; y++) {
          assert.equal(F.add(x, y), F.add(y, x));
          assert.equal(F.mul(x, y), F.mul(y, x));
          for (let z = 0; z < q; z++) {
            assert.equal(F.add(F.add(x, y), z), F.add(x, F.add(y, z)));
            assert.equal(F.mul(F.mul(x, y), z), F.mul(x, F.mul(y, z)));
            assert.equal(F.mul(x, F.add(y, z)), F.add(F.mul(x, y), F.mul(x, z)));
          }
        }
      }
    });
  }

  for (const [p, m] of LARGE) {
    const F = fieldOf([p, m]);
    const q = p ** m;
    const f = [...F.definingPolynomial];
    const element = fc.integer({ min: 0, max: q - 1 });
    test(`${F.name}: random elements agree with the model and satisfy the field axioms`, () => {
      fc.assert(
        fc.property(element, element, element, (x, y, z) => {
          assert.equal(F.add(x, y), encode(naiveAdd(decode(x, p, m), decode(y, p, m), p), p));
          assert.equal(F.mul(x, y), encode(naiveMulMod(decode(x, p, m), decode(y, p, m), f, p), p));
          assert.equal(F.add(F.sub(x, y), y), x);
          assert.equal(F.add(x, F.neg(x)), 0);
          assert.equal(F.mul(F.mul(x, y), z), F.mul(x, F.mul(y, z)));
          assert.equal(F.add(F.add(x, y), z), F.add(x, F.add(y, z)));
          assert.equal(F.mul(x, F.add(y, z)), F.add(F.mul(x, y), F.mul(x, z)));
          if (y !== 0) assert.equal(F.mul(F.div(x, y), y), x);
        }),
        { numRuns: 300 },
      );
    });
  }
});

describe('the multiplicative group and the Frobenius map', () => {
  for (const [p, m] of [...SMALL, [2, 8], [3, 5], [7, 3]] as [number, number][]) {
    const F = fieldOf([p, m]);
    const q = p ** m;
    test(`${F.name}: cyclic of order q − 1, with φ(d) elements of each order d | q − 1 (Gauss; any algebra text, from memory)`, () => {
      assert.equal(orderOf(F, F.generatorElement()), q - 1);
      const countByOrder = new Map<number, number>();
      for (let x = 1; x < q; x++) {
        const k = orderOf(F, x);
        assert.equal((q - 1) % k, 0, 'Lagrange: the order divides q − 1');
        countByOrder.set(k, (countByOrder.get(k) ?? 0) + 1);
      }
      for (let d = 1; d <= q - 1; d++) {
        if ((q - 1) % d === 0) assert.equal(countByOrder.get(d) ?? 0, totient(d), `order ${d}`);
      }
    });

    test(`${F.name}: x ↦ x^p is an automorphism of order m fixing exactly GF(p) (Lidl and Niederreiter, Finite Fields, ch. 2 — from memory)`, () => {
      const frobenius = (x: number) => {
        let y = 1;
        for (let i = 0; i < p; i++) y = F.mul(y, x);
        return y;
      };
      const images = new Set<number>();
      const fixed: number[] = [];
      for (let x = 0; x < q; x++) {
        images.add(frobenius(x));
        if (frobenius(x) === x) fixed.push(x);
        // Iterating m times gives x^q = x; fewer times moves some element (checked below).
        let y = x;
        for (let i = 0; i < m; i++) y = frobenius(y);
        assert.equal(y, x);
        assert.equal(F.pow(x, BigInt(p)), frobenius(x));
      }
      assert.equal(images.size, q, 'bijective');
      // The elements below p are the constants 0, 1, …, p − 1, the prime field.
      assert.deepEqual(fixed, Array.from({ length: p }, (_, i) => i));
      for (let k = 1; k < m; k++) {
        let y = F.generatorElement();
        for (let i = 0; i < k; i++) y = frobenius(y);
        assert.notEqual(y, F.generatorElement(), `x ↦ x^(p^${k}) is not the identity`);
      }
      fc.assert(
        fc.property(fc.integer({ min: 0, max: q - 1 }), fc.integer({ min: 0, max: q - 1 }), (x, y) => {
          assert.equal(frobenius(F.add(x, y)), F.add(frobenius(x), frobenius(y)));
          assert.equal(frobenius(F.mul(x, y)), F.mul(frobenius(x), frobenius(y)));
        }),
        { numRuns: 100 },
      );
    });
  }

  test('pow: negative exponents invert, and 0^0 = 1 (common practice, no source)', () => {
    const F = fieldOf([3, 2]);
    for (let x = 1; x < 9; x++) {
      assert.equal(F.pow(x, -1n), F.inv(x));
      assert.equal(F.pow(x, 8n), 1);
      assert.equal(F.pow(x, 0n), 1);
    }
    assert.equal(F.pow(0, 0n), 1);
    assert.equal(F.pow(0, 5n), 0);
    assert.throws(() => F.pow(0, -1n), DivisionByZeroError);
  });
});

describe('elements as polynomials in the generator', () => {
  test('GF(4) = {0, 1, a, a + 1} with a^2 = a + 1 and a(a + 1) = 1 (from x^2 + x + 1; common practice, no source)', () => {
    const F = fieldOf([2, 2]);
    const a = F.generatorElement();
    assert.deepEqual([...F.elements()].map((x) => F.format(x)), ['0', '1', 'a', 'a + 1']);
    assert.equal(F.format(F.mul(a, a)), 'a + 1');
    assert.equal(F.mul(a, F.add(a, 1)), 1);
    assert.equal(F.format(F.inv(a)), 'a + 1');
    assert.equal(F.format(F.neg(a)), 'a');
  });

  test('GF(9): a^2 = 2a + 1 from x^2 + x + 2; GF(8): a^3 = a + 1, a^4 = a^2 + a (hand computation)', () => {
    const G = fieldOf([3, 2]);
    const a = G.generatorElement();
    assert.equal(G.format(G.mul(a, a)), '2a + 1');
    assert.equal(G.latex(G.mul(a, a)), '2a + 1');
    assert.equal(G.format(G.neg(a)), '2a');
    const E = fieldOf([2, 3]);
    const b = E.generatorElement();
    assert.equal(E.format(E.pow(b, 3n)), 'a + 1');
    assert.equal(E.format(E.pow(b, 4n)), 'a^2 + a');
    assert.equal(E.latex(E.pow(b, 5n)), 'a^{2} + a + 1');
    assert.equal(E.format(0), '0');
    assert.equal(E.format(1), '1');
  });

  test('a chosen generator name, coefficient vectors and their round trip', () => {
    const F = extensionField(3n, 3, { generator: 'w' });
    assert.equal(F.generatorName, 'w');
    const x = F.elementFromCoefficients([1, 2, 1]);
    assert.equal(F.format(x), 'w^2 + 2w + 1');
    assert.equal(F.latex(x), 'w^{2} + 2w + 1');
    assert.deepEqual(F.coefficients(x), [1, 2, 1]);
    // Coefficients are reduced modulo p, and powers from a^m on through f: a^3 = −2a − 1 = a + 2 over x^3 + 2x + 1.
    assert.equal(F.elementFromCoefficients([-2, 5]), F.elementFromCoefficients([1, 2]));
    assert.equal(F.format(F.elementFromCoefficients([0, 0, 0, 1])), 'w + 2');
    for (const y of F.elements()) assert.equal(F.elementFromCoefficients(F.coefficients(y)), y);
    assert.equal(F.elementFromCoefficients([]), 0);
  });

  test('integers and fractions map through GF(p) ⊂ GF(q) (common practice, no source)', () => {
    const F = fieldOf([3, 2]);
    assert.equal(F.fromBigInt(-1n), 2);
    assert.equal(F.fromBigInt(7n), 1);
    assert.equal(F.fromRational(1n, 2n), 2); // 2·2 = 4 = 1 in GF(3)
    assert.equal(F.mul(F.fromRational(5n, 7n), F.fromBigInt(7n)), F.fromBigInt(5n));
    assert.throws(() => F.fromRational(1n, 3n), (e: unknown) => e instanceof DivisionByZeroError && /3 is 0 modulo 3/.test(e.message));
    const E = fieldOf([2, 2]);
    assert.equal(E.fromBigInt(-1n), 1);
    assert.throws(() => E.fromRational(1n, 2n), DivisionByZeroError);
  });
});

describe('finiteField and the element helpers', () => {
  test('a prime gives the prime field, a prime power the extension field', () => {
    assert.equal(finiteField(7n), primeField(7n));
    assert.equal(finiteField(2n ** 61n - 1n), primeField(2n ** 61n - 1n)); // a Mersenne prime (Pervushin 1883)
    assert.equal(finiteField(9n), extensionField(3n, 2));
    assert.equal(finiteField(2n ** 20n), extensionField(2n, 20));
    assert.equal(finiteField(1021n * 1021n).name, 'GF(1042441)');
  });

  test('orders that are not prime powers raise NotPrimePowerError, a kind of NotPrimeError', () => {
    assert.throws(
      () => finiteField(6n),
      (e: unknown) => e instanceof NotPrimePowerError && e instanceof NotPrimeError && e.message === 'GF(6): 6 is not a prime power',
    );
    for (const q of [0n, 1n, -4n, 12n, 36n, 100n, 2n ** 10n * 3n]) {
      assert.throws(() => finiteField(q), (e: unknown) => e instanceof NotPrimePowerError && e.message.startsWith(`GF(${q}): `), `${q}`);
    }
    assert.throws(() => finiteField(2n ** 21n), FieldOrderLimitError);
    assert.throws(() => finiteField(3n ** 40n), FieldOrderLimitError);
  });

  test('order and elements of prime fields, extension fields and the rationals', () => {
    assert.equal(finiteFieldOrder(primeField(5n)), 5n);
    assert.equal(finiteFieldOrder(extensionField(5n, 2)), 25n);
    assert.equal(finiteFieldOrder(QQ), undefined);
    const P = primeField(5n);
    assert.deepEqual([...finiteFieldElements(P)].map((x) => P.format(x)), ['0', '1', '2', '3', '4']);
    const E = extensionField(2n, 3);
    assert.deepEqual([...finiteFieldElements(E)], [0, 1, 2, 3, 4, 5, 6, 7]);
    assert.equal(finiteFieldElement(E, 6n), E.elementFromCoefficients([0, 1, 1]));
    assert.throws(() => finiteFieldElement(E, 8n), RangeError);
    assert.throws(() => [...finiteFieldElements(QQ)], /infinite/);
  });
});
