import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { normalizedCoordinate, normalizePoint, pointScaling, projectivelyEqual } from '../../server/src/engine/normalize.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, gcdBigInt, rational } from '../../server/src/engine/rational.js';
import { EXTERIOR_CASES, QQ_EXTERIOR, scaleVector } from './exterior-arbitraries.js';

const r = (n: number, d = 1) => rational(BigInt(n), BigInt(d));

describe('normalizing projective points', () => {
  test('a worked example: (−2/3, 0, 4/9) is (3, 0, −2) primitive and (1, 0, −2/3) first-one (by hand)', () => {
    const v = [r(-2, 3), r(0), r(4, 9)];
    const primitive = normalizePoint(QQ, v, 'primitive');
    assert.equal(primitive.mode, 'primitive');
    assert.deepEqual(primitive.values.map(QQ.format), ['3', '0', '-2']);
    assert.equal(QQ.format(primitive.scale), '-9/2');
    const first = normalizePoint(QQ, v, 'first-one');
    assert.deepEqual(first.values.map(QQ.format), ['1', '0', '-2/3']);
    const raw = normalizePoint(QQ, v, 'raw');
    assert.deepEqual(raw.values.map(QQ.format), ['-2/3', '0', '4/9']);
    assert.ok(QQ.isOne(raw.scale));
  });

  test('values = scale · input with scale ≠ 0, in every mode and field (fast-check)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(fc.array(c.element, { minLength: 1, maxLength: 6 }), fc.constantFrom('raw', 'first-one', 'primitive' as const), (v, mode) => {
          const out = normalizePoint(F, v, mode);
          assert.ok(!F.isZero(out.scale));
          out.values.forEach((x, i) => assert.ok(F.eq(x, F.mul(out.scale, v[i]))));
          const first = out.values.find((x) => !F.isZero(x));
          if (first !== undefined && out.mode === 'first-one') assert.ok(F.isOne(first));
        }),
        { numRuns: 50 },
      );
    }
  });

  test("'primitive' gives coprime integers with a positive first entry over QQ (fast-check)", () => {
    fc.assert(
      fc.property(fc.array(QQ_EXTERIOR.element, { minLength: 1, maxLength: 6 }), (v) => {
        const out = normalizePoint(QQ, v, 'primitive');
        if (v.every((x) => QQ.isZero(x))) return;
        assert.ok(out.values.every((x) => x.den === 1n));
        assert.equal(out.values.reduce((g, x) => gcdBigInt(g, x.num), 0n), 1n);
        assert.ok(out.values.find((x) => x.num !== 0n)!.num > 0n);
      }),
    );
  });

  test("'primitive' falls back to 'first-one' over GF(p) and says so", () => {
    const F = primeField(7n);
    const out = normalizePoint(F, [0, 3, 5].map((x) => F.fromBigInt(BigInt(x))), 'primitive');
    assert.equal(out.mode, 'first-one');
    assert.deepEqual(out.values.map((x) => F.format(x)), ['0', '1', '4']);
  });

  test('the scaling alone, applied one coordinate at a time, gives the normalized vector, in every mode and field (fast-check)', () => {
    // The displayed point normalizes only the coordinates it shows; it must show what normalizePoint gives.
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(
          fc.array(c.element, { minLength: 0, maxLength: 8 }),
          fc.constantFrom('raw', 'first-one', 'primitive', 'positive' as const),
          (v, mode) => {
            const whole = normalizePoint(F, v, mode);
            const scaling = pointScaling(F, v, mode);
            assert.equal(scaling.mode, whole.mode);
            assert.deepStrictEqual(scaling.scale, whole.scale);
            assert.deepStrictEqual(v.map((x) => normalizedCoordinate(F, scaling, x)), whole.values);
          },
        ),
        { numRuns: 60 },
      );
    }
  });

  test("'primitive' divides integer coordinates by their gcd, here 6 after a coprime start (by hand)", () => {
    // The gcd of (12, −18, 30, 42) is 6; the first entry is positive, so the scale is 1/6.
    const out = normalizePoint(QQ, [r(0), r(12), r(-18), r(30), r(42)], 'primitive');
    assert.deepEqual(out.values.map(QQ.format), ['0', '2', '-3', '5', '7']);
    assert.equal(QQ.format(out.scale), '1/6');
    // A coprime pair early on makes the gcd 1, whatever follows.
    const coprime = normalizePoint(QQ, [r(-4), r(6), r(9), r(12)], 'primitive');
    assert.deepEqual(coprime.values.map(QQ.format), ['4', '-6', '-9', '-12']);
  });

  test('the zero vector is left alone', () => {
    const out = normalizePoint(QQ, [r(0), r(0)], 'first-one');
    assert.ok(out.values.every((x) => QQ.isZero(x)) && QQ.isOne(out.scale));
  });
});

describe('projective equality', () => {
  test('nonzero multiples are equal, zero vectors never, different lengths never (common practice, no source)', () => {
    for (const c of EXTERIOR_CASES) {
      const { F } = c;
      fc.assert(
        fc.property(fc.array(c.element, { minLength: 1, maxLength: 6 }), c.element, (v, s) => {
          const zero = v.every((x) => F.isZero(x));
          assert.equal(projectivelyEqual(F, v, scaleVector(F, s, v)), !zero && !F.isZero(s));
        }),
        { numRuns: 50 },
      );
    }
    assert.equal(projectivelyEqual(QQ, [r(1), r(2)], [r(1), r(3)]), false);
    assert.equal(projectivelyEqual(QQ, [r(1), r(0)], [r(0), r(1)]), false);
    assert.equal(projectivelyEqual(QQ, [r(1)], [r(1), r(0)]), false);
  });
});
