import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { dot3Mod, dot4Mod, dotMod, invMod, mulAddMod, mulMod, negMod } from '../../server/src/engine/modular-arithmetic.js';
import { isPrime } from '../../server/src/engine/primes.js';

// The largest primes below 2^31 (where the kernels' error margin is smallest), a middle one and tiny ones.
// Each is checked prime by the engine's deterministic test, and every kernel is compared with bigint
// arithmetic, which is exact by construction (common practice, no source).
const MODULI = [2147483647, 2147483629, 2147483587, 1000000007, 65521, 3, 2];

/** Residues biased to the extremes 0, 1, p − 2, p − 1, where rounding errors would show first. */
function residue(p: number): fc.Arbitrary<number> {
  return fc.oneof(
    { arbitrary: fc.constantFrom(0, 1 % p, Math.max(0, p - 2), p - 1), weight: 2 },
    { arbitrary: fc.integer({ min: Math.max(0, p - 1000), max: p - 1 }), weight: 2 },
    { arbitrary: fc.integer({ min: 0, max: p - 1 }), weight: 3 },
  );
}

const big = (x: number) => BigInt(x);
const modBig = (x: bigint, p: number) => Number(((x % big(p)) + big(p)) % big(p));

describe('exact modular kernels for p < 2^31 against bigint arithmetic', () => {
  for (const p of MODULI) {
    const r = 1 / p;
    test(`p = ${p}: products, multiply-adds and dot products of up to four terms`, () => {
      assert.ok(isPrime(big(p)));
      fc.assert(
        fc.property(fc.array(residue(p), { minLength: 8, maxLength: 8 }), fc.integer({ min: 0, max: p - 1 }), ([a, b, c, d, e, f, g, h], x) => {
          const A = big(a!), B = big(b!), C = big(c!), D = big(d!), E = big(e!), Fb = big(f!), G = big(g!), H = big(h!);
          assert.equal(mulMod(a!, b!, p, r), modBig(A * B, p));
          assert.equal(mulAddMod(x, a!, b!, p, r), modBig(big(x) + A * B, p));
          assert.equal(dotMod(a!, b!, c!, d!, p, r), modBig(A * B + C * D, p));
          assert.equal(dot3Mod(a!, b!, c!, d!, e!, f!, p, r), modBig(A * B + C * D + E * Fb, p));
          assert.equal(dot4Mod(a!, b!, c!, d!, e!, f!, g!, h!, p, r), modBig(A * B + C * D + E * Fb + G * H, p));
          assert.equal(negMod(a!, p), modBig(-A, p));
        }),
        { numRuns: 3000 },
      );
    });

    test(`p = ${p}: every kernel at the largest residues exactly`, () => {
      const m = p - 1;
      const M = big(m);
      assert.equal(mulMod(m, m, p, r), modBig(M * M, p));
      assert.equal(mulAddMod(m, m, m, p, r), modBig(M + M * M, p));
      assert.equal(dotMod(m, m, m, m, p, r), modBig(2n * M * M, p));
      assert.equal(dot3Mod(m, m, m, m, m, m, p, r), modBig(3n * M * M, p));
      assert.equal(dot4Mod(m, m, m, m, m, m, m, m, p, r), modBig(4n * M * M, p));
    });

    test(`p = ${p}: invMod(a)·a ≡ 1 (Fermat's little theorem gives the same inverse; from memory)`, () => {
      if (p === 2) {
        assert.equal(invMod(1, 2), 1);
        return;
      }
      fc.assert(
        fc.property(fc.integer({ min: 1, max: p - 1 }), (a) => {
          const inverse = invMod(a, p);
          assert.ok(inverse >= 0 && inverse < p);
          assert.equal(modBig(big(a) * big(inverse), p), 1);
        }),
        { numRuns: 500 },
      );
    });
  }
});
