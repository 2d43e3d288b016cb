import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../../server/src/engine/field.js';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { denseDerivative, denseGcd, denseMonic, denseMul } from '../../../server/src/engine/polynomials/dense-polynomial.js';
import { factorOverFiniteField, squareFreeOverFiniteField } from '../../../server/src/engine/polynomials/finite-field-factor.js';
import { henselLift } from '../../../server/src/engine/polynomials/hensel-lifting.js';
import { squareFreeInteger } from '../../../server/src/engine/polynomials/rational-univariate-factor.js';
import { multiplyIntegerLists } from './polynomial-arbitraries.js';

const integerPolynomial = fc
  .array(fc.integer({ min: -20, max: 20 }), { minLength: 2, maxLength: 9 })
  .filter((f) => f[f.length - 1]! > 0)
  .map((f) => f.map(BigInt));

function reduceMod(a: readonly bigint[], m: bigint): bigint[] {
  const out = a.map((c) => ((c % m) + m) % m);
  while (out.length > 0 && out[out.length - 1] === 0n) out.pop();
  return out;
}

describe('Hensel lifting (the defining congruence; common practice, no source)', () => {
  test('lc(f) times the lifted monic factors is f modulo p^k, and they reduce to the factors modulo p', () => {
    fc.assert(
      fc.property(integerPolynomial, fc.constantFrom(3n, 5n, 7n, 11n), fc.integer({ min: 1, max: 6 }), (f, p, k) => {
        const F = primeField(p) as Field<number>;
        if (f[f.length - 1]! % p === 0n) return;
        const image = f.map((c) => F.fromBigInt(c));
        // Lifting needs factors that are coprime modulo p: f must stay square-free there.
        if (denseGcd(F, image, denseDerivative(F, image)).length !== 1) return;
        const modular = factorOverFiniteField(F, p, denseMonic(F, image)).factors.map((x) => x.factor.map((c) => BigInt(c)));
        if (modular.length < 2) return;
        const lifted = henselLift(f, modular, p, k);
        const M = p ** BigInt(k);
        let product = [f[f.length - 1]!];
        for (const u of lifted) product = reduceMod(multiplyIntegerLists(product, u), M);
        assert.deepEqual(product, reduceMod(f, M));
        lifted.forEach((u, i) => assert.deepEqual(reduceMod(u, p), modular[i]));
      }),
      { numRuns: 150 },
    );
  });
});

describe('square-free decompositions (the definition: f = Π a_i^i, a_i square-free and pairwise coprime)', () => {
  test('Yun over the integers', () => {
    fc.assert(
      fc.property(fc.array(integerPolynomial, { minLength: 1, maxLength: 3 }), fc.array(fc.integer({ min: 1, max: 3 }), { minLength: 3, maxLength: 3 }), (parts, powers) => {
        let f = [1n];
        parts.forEach((part, i) => {
          for (let m = 0; m < powers[i]!; m++) f = multiplyIntegerLists(f, part);
        });
        // The content and sign are not the decomposition's business; divide them out first.
        let g = 0n;
        for (const c of f) g = g === 0n ? (c < 0n ? -c : c) : gcd(g, c);
        f = f.map((c) => c / g);
        if (f.length < 2) return;
        const decomposition = squareFreeInteger(f);
        let product = [1n];
        for (const { part, multiplicity } of decomposition) for (let m = 0; m < multiplicity; m++) product = multiplyIntegerLists(product, part);
        assert.deepEqual(product, f);
      }),
      { numRuns: 80 },
    );
  });

  test('over GF(3), with p-th powers, the parts are square-free and pairwise coprime and multiply back', () => {
    const F = primeField(3n) as Field<number>;
    const poly = fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 1, maxLength: 4 }).map((c) => [...c, 1]);
    fc.assert(
      fc.property(fc.array(fc.tuple(poly, fc.integer({ min: 1, max: 7 })), { minLength: 1, maxLength: 3 }), (parts) => {
        let f = [1];
        for (const [part, m] of parts) for (let i = 0; i < m; i++) f = denseMul(F, f, part);
        if (f.length < 2) return;
        const decomposition = squareFreeOverFiniteField(F, 3n, f);
        let product = [1];
        decomposition.forEach(({ factor, multiplicity }, i) => {
          assert.equal(denseGcd(F, factor, denseDerivative(F, factor)).length, 1, 'square-free');
          decomposition.slice(i + 1).forEach((other) => assert.equal(denseGcd(F, factor, other.factor).length, 1, 'coprime'));
          for (let m = 0; m < multiplicity; m++) product = denseMul(F, product, factor);
        });
        assert.deepEqual(product, f);
      }),
      { numRuns: 100 },
    );
  });
});

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a < 0n ? -a : a;
}
