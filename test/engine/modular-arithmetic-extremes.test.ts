import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { dot3Mod, dot4Mod, dotMod, mulAddMod, mulMod, negMod } from '../../server/src/engine/modular-arithmetic.js';
import { isPrime } from '../../server/src/engine/primes.js';

// The modular kernels of the Plücker walks and prime fields, compared with bigint arithmetic, which is exact by
// construction (common practice, no source). The largest primes below 2^31 are where the kernels' error
// margin is smallest and where a remainder's sign bit decides the correction; 2 and 3 are the smallest.
const MODULI = [2147483647, 2147483629, 2147483587, 1000000007, 65521, 7, 3, 2];

/** Residues biased to the extremes 0, 1, p − 2, p − 1, where rounding errors and sign mistakes would show first. */
function residue(p: number): fc.Arbitrary<number> {
  return fc.oneof(
    { arbitrary: fc.constantFrom(0, 1 % p, Math.max(0, p - 2), p - 1), weight: 2 },
    { arbitrary: fc.integer({ min: Math.max(0, p - 1000), max: p - 1 }), weight: 2 },
    { arbitrary: fc.integer({ min: 0, max: Math.min(p - 1, 1000) }), weight: 1 },
    { arbitrary: fc.integer({ min: 0, max: p - 1 }), weight: 3 },
  );
}

const big = (x: number) => BigInt(x);
const modBig = (x: bigint, p: number) => Number(((x % big(p)) + big(p)) % big(p));

describe('modular kernels for p < 2^31 against bigint arithmetic', () => {
  for (const p of MODULI) {
    const r = 1 / p;
    test(`p = ${p}: products, multiply-adds and dot products of up to four terms`, () => {
      assert.ok(isPrime(big(p)));
      fc.assert(
        fc.property(fc.array(residue(p), { minLength: 9, maxLength: 9 }), ([a, b, c, d, e, f, g, h, x]) => {
          const A = big(a!), B = big(b!), C = big(c!), D = big(d!), E = big(e!), Fb = big(f!), G = big(g!), H = big(h!);
          assert.equal(mulMod(a!, b!, p, r), modBig(A * B, p));
          assert.equal(mulAddMod(x!, a!, b!, p, r), modBig(big(x!) + A * B, p));
          assert.equal(dotMod(a!, b!, c!, d!, p, r), modBig(A * B + C * D, p));
          assert.equal(dot3Mod(a!, b!, c!, d!, e!, f!, p, r), modBig(A * B + C * D + E * Fb, p));
          assert.equal(dot4Mod(a!, b!, c!, d!, e!, f!, g!, h!, p, r), modBig(A * B + C * D + E * Fb + G * H, p));
          assert.equal(negMod(a!, p), modBig(-A, p));
        }),
        { numRuns: 3000 },
      );
    });

    test(`p = ${p}: every kernel at the largest residues, and at results just below zero before correction`, () => {
      const m = p - 1;
      const M = big(m);
      assert.equal(mulMod(m, m, p, r), modBig(M * M, p));
      assert.equal(mulAddMod(m, m, m, p, r), modBig(M + M * M, p));
      assert.equal(dotMod(m, m, m, m, p, r), modBig(2n * M * M, p));
      assert.equal(dot3Mod(m, m, m, m, m, m, p, r), modBig(3n * M * M, p));
      assert.equal(dot4Mod(m, m, m, m, m, m, m, m, p, r), modBig(4n * M * M, p));
      // Exact multiples of p (remainder 0) and one below them (remainder p − 1), through every kernel.
      for (let a = 1; a < Math.min(p, 200); a++) {
        const b = Math.floor(m / a);
        for (const x of [0, 1, m]) {
          assert.equal(mulAddMod(x, a, b, p, r), modBig(big(x) + big(a) * big(b), p), `x + a·b, a = ${a}, b = ${b}, x = ${x}`);
        }
        assert.equal(dotMod(a, b, m, 1, p, r), modBig(big(a) * big(b) + M, p));
      }
    });
  }
});
