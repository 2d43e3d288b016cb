/**
 * A Plücker vector as the file shows it makes its labels and normalized
 * coordinates only when they are read, one at a time or as whole lists. These
 * tests hold every way of reading them to the definitions, written out here:
 * the display order is the lexicographic order of index sets, or the
 * colexicographic order, which compares the largest elements first (Knuth,
 * The Art of Computer Programming 4A, §7.2.1.3, from memory; for 2-subsets of
 * {1, 2, 3, 4} it is 12, 13, 23, 14, 24, 34); the normalized coordinates are
 * those of `normalizePoint` on the coordinates in display order.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { normalizePoint } from '../../server/src/engine/normalize.js';
import { displayOrder, DEFAULT_CONVENTION, Labels, type IndexOrder } from '../../server/src/language/conventions.js';
import { displayPoint, toLexOrder } from '../../server/src/language/coordinates.js';
import type { Environment } from '../../server/src/language/environment.js';
import { defineLazy } from '../../server/src/language/lazy-property.js';
import { DEFAULT_LIMITS, type Normalization } from '../../server/src/language/types.js';
import type { Scalar } from '../../server/src/language/values.js';
import { EXTERIOR_CASES, bruteSubsets, type ExteriorCase } from '../engine/exterior-arbitraries.js';

function environment(c: ExteriorCase, order: IndexOrder, firstLabel: 0 | 1, normalization: Normalization): Environment {
  return {
    F: c.F as Environment['F'],
    source: '',
    convention: { ...DEFAULT_CONVENTION, field: c.F as Environment['F'], order, firstLabel, normalization },
    labels: new Labels(firstLabel),
    limits: DEFAULT_LIMITS,
    spaces: new Map(),
    bindings: new Map(),
    problems: [],
  };
}

/** The k-subsets of {0..n−1} in display order, by sorting all of them (independent of the engine's ranking). */
function subsetsInDisplayOrder(order: IndexOrder, n: number, k: number): number[][] {
  const all = bruteSubsets(n, k);
  if (order === 'lex') return all;
  return all.slice().sort((a, b) => {
    for (let i = k - 1; i >= 0; i--) if (a[i] !== b[i]) return a[i]! - b[i]!;
    return 0;
  });
}

/** The label of an index set as the file prints it: positions from the first label, commas past one digit. */
function labelOf(subset: readonly number[], n: number, firstLabel: 0 | 1): string {
  return subset.map((i) => i + firstLabel).join(n - 1 + firstLabel <= 9 ? '' : ',');
}

describe('the display order', () => {
  test('colex of the 2-subsets of {1, 2, 3, 4}: 12, 13, 23, 14, 24, 34 (from memory, see the file comment)', () => {
    const lex = bruteSubsets(4, 2);
    const shown = displayOrder('colex', 4, 2).map((r) => labelOf(lex[r]!, 4, 1));
    assert.deepEqual(shown, ['12', '13', '23', '14', '24', '34']);
  });

  test('both orders list the ranks of the subsets sorted by their definition, for every n ≤ 8', () => {
    for (let n = 0; n <= 8; n++) {
      for (let k = 0; k <= n; k++) {
        const lex = bruteSubsets(n, k).map((s) => s.join(','));
        for (const order of ['lex', 'colex'] as const) {
          const expected = subsetsInDisplayOrder(order, n, k).map((s) => lex.indexOf(s.join(',')));
          assert.deepEqual(displayOrder(order, n, k), expected, `${order} n=${n} k=${k}`);
        }
      }
    }
  });
});

describe('a displayed point, read lazily', () => {
  for (const c of EXTERIOR_CASES) {
    test(`${c.F.name}: labels and normalized coordinates, one at a time and as lists, agree with their definitions (fast-check)`, () => {
      const shape = fc.integer({ min: 1, max: 11 }).chain((n) => fc.integer({ min: 1, max: Math.min(3, n) }).map((k) => ({ n, k })));
      fc.assert(
        fc.property(
          shape.chain(({ n, k }) =>
            fc.record({
              n: fc.constant(n),
              k: fc.constant(k),
              values: fc.array(c.element, { minLength: bruteSubsets(n, k).length, maxLength: bruteSubsets(n, k).length }),
              order: fc.constantFrom('lex' as const, 'colex' as const),
              firstLabel: fc.constantFrom(0 as const, 1 as const),
              normalization: fc.constantFrom('raw' as const, 'first-one' as const, 'primitive' as const, 'positive' as const),
            }),
          ),
          ({ n, k, values, order, firstLabel, normalization }) => {
            const env = environment(c, order, firstLabel, normalization);
            const point = displayPoint(env, values as Scalar[], n, k);
            const lex = bruteSubsets(n, k).map((s) => s.join(','));
            const shown = subsetsInDisplayOrder(order, n, k);
            const raw = shown.map((s) => values[lex.indexOf(s.join(','))]);
            const expected = normalizePoint(c.F, raw, normalization);
            assert.equal(point.count, shown.length);
            assert.deepStrictEqual(point.raw, raw);
            assert.equal(point.applied, expected.mode);
            // One at a time first, before any list is made, then the lists.
            shown.forEach((s, i) => {
              assert.equal(point.labelAt(i), labelOf(s, n, firstLabel));
              assert.deepStrictEqual(point.normalizedAt(i), expected.values[i]);
            });
            assert.deepStrictEqual(point.labels, shown.map((s) => labelOf(s, n, firstLabel)));
            assert.deepStrictEqual(point.normalized, expected.values);
            assert.deepStrictEqual(toLexOrder(env, point.raw, n, k), values);
          },
        ),
        { numRuns: 40 },
      );
    });
  }
});

describe('properties made on first reading', () => {
  test('look like ordinary properties to JSON, structured cloning and deep equality, keeping their place (common practice, no source)', () => {
    let made = 0;
    const lazy: Record<string, unknown> = { first: 1 };
    defineLazy(lazy, 'middle', () => {
      made++;
      return { list: ['a', 'b'] };
    });
    lazy.last = 3;
    const plain = { first: 1, middle: { list: ['a', 'b'] }, last: 3 };
    assert.equal(made, 0, 'nothing is made before it is read');
    assert.deepEqual(Object.keys(lazy), ['first', 'middle', 'last']);
    assert.equal(JSON.stringify(lazy), JSON.stringify(plain));
    assert.deepStrictEqual(structuredClone(lazy), plain);
    assert.deepStrictEqual(lazy, plain);
    assert.equal(made, 1, 'made once, then kept');
    assert.equal(lazy.middle, lazy.middle);
  });

  test('can be overwritten before they are read, and are then never made', () => {
    const lazy: Record<string, unknown> = {};
    defineLazy(lazy, 'value', () => assert.fail('made although overwritten'));
    lazy.value = 'given';
    assert.deepStrictEqual(lazy, { value: 'given' });
  });

  test('are not made by the `in` test the editor uses to pick the fields it keeps', () => {
    const lazy: Record<string, unknown> = {};
    defineLazy(lazy, 'plucker', () => assert.fail('made by an `in` test'));
    assert.ok('plucker' in lazy);
    assert.ok(!('basis' in lazy));
  });
});
