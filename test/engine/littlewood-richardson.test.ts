import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import {
  littlewoodRichardsonCoefficient,
  littlewoodRichardsonProduct,
  schubertProduct,
  schubertProductOfMany,
  type PartitionTerm,
} from '../../server/src/engine/littlewood-richardson.js';
import {
  InvalidPartitionError,
  PartitionOutsideBoxError,
  conjugatePartition,
  parsePartition,
} from '../../server/src/engine/partitions.js';

// ---- Small independent references, written out here from their definitions. ----

/** Every partition of m, largest parts first (plain recursion, independent of the engine's enumerations). */
function partitionsOf(m: number, max = m): number[][] {
  if (m === 0) return [[]];
  const out: number[][] = [];
  for (let first = Math.min(m, max); first >= 1; first--) {
    for (const rest of partitionsOf(m - first, first)) out.push([first, ...rest]);
  }
  return out;
}

/**
 * f^λ, the number of standard Young tableaux, by the hook length formula
 * f^λ = |λ|! / Π hooks (Frame–Robinson–Thrall, 1954).
 */
function standardTableaux(lambda: readonly number[]): bigint {
  const size = lambda.reduce((a, b) => a + b, 0);
  let numerator = 1n;
  for (let i = 2; i <= size; i++) numerator *= BigInt(i);
  let hooks = 1n;
  const conjugate: number[] = [];
  for (let j = 0; j < (lambda[0] ?? 0); j++) conjugate.push(lambda.filter((x) => x > j).length);
  lambda.forEach((row, i) => {
    for (let j = 0; j < row; j++) hooks *= BigInt(row - j - 1 + (conjugate[j]! - i - 1) + 1);
  });
  return numerator / hooks;
}

function binomial(n: number, k: number): bigint {
  let r = 1n;
  for (let i = 1; i <= k; i++) r = (r * BigInt(n - k + i)) / BigInt(i);
  return r;
}

const key = (p: readonly number[]) => p.join(',');

function asMap(terms: readonly PartitionTerm[]): Map<string, bigint> {
  return new Map(terms.map((t) => [key(t.partition), t.coefficient]));
}

/**
 * The Pieri rule, s_λ·s_p = Σ s_ν over the ν with ν/λ a horizontal strip of p
 * cells (λ_i ≤ ν_i ≤ λ_{i−1}); with `vertical`, s_λ·s_{1^p} = Σ s_ν over the
 * vertical strips (ν_i − λ_i ∈ {0, 1}). Common practice; e.g. Fulton, Young
 * Tableaux, §2.2 (from memory).
 */
function pieri(lambda: readonly number[], p: number, vertical = false): Map<string, bigint> {
  const out = new Map<string, bigint>();
  const rows = lambda.length + (vertical ? p : 1);
  const parts: number[] = [];
  const go = (i: number, left: number): void => {
    if (i === rows) {
      if (left === 0) {
        const nu = parts.slice();
        while (nu.length > 0 && nu[nu.length - 1] === 0) nu.pop();
        out.set(key(nu), 1n);
      }
      return;
    }
    const li = lambda[i] ?? 0;
    const above = i === 0 ? Number.POSITIVE_INFINITY : parts[i - 1]!;
    const high = vertical ? Math.min(li + 1, above) : Math.min(i === 0 ? li + left : lambda[i - 1]!, above);
    for (let x = li; x <= Math.min(high, li + left); x++) {
      parts.push(x);
      go(i + 1, left - (x - li));
      parts.pop();
    }
  };
  go(0, p);
  return out;
}

/**
 * The Schur polynomial s_λ(x_1, …, x_N) as a map exponent vector → coefficient,
 * by listing the semistandard tableaux with entries ≤ N (the combinatorial
 * definition; Fulton, Young Tableaux, §6.1 — from memory).
 */
function schurPolynomial(lambda: readonly number[], N: number): Map<string, bigint> {
  const cells: [number, number][] = [];
  lambda.forEach((row, i) => {
    for (let j = 0; j < row; j++) cells.push([i, j]);
  });
  const filling: number[][] = lambda.map((row) => new Array<number>(row).fill(0));
  const out = new Map<string, bigint>();
  const go = (c: number): void => {
    if (c === cells.length) {
      const exponents = new Array<number>(N).fill(0);
      for (const row of filling) for (const x of row) exponents[x - 1]!++;
      const k = exponents.join(',');
      out.set(k, (out.get(k) ?? 0n) + 1n);
      return;
    }
    const [i, j] = cells[c]!;
    const low = Math.max(j > 0 ? filling[i]![j - 1]! : 1, i > 0 ? filling[i - 1]![j]! + 1 : 1);
    for (let x = low; x <= N; x++) {
      filling[i]![j] = x;
      go(c + 1);
    }
  };
  go(0);
  return out;
}

function multiplyPolynomials(a: Map<string, bigint>, b: Map<string, bigint>): Map<string, bigint> {
  const out = new Map<string, bigint>();
  for (const [ka, ca] of a) {
    const ea = ka.split(',').map(Number);
    for (const [kb, cb] of b) {
      const e = kb.split(',').map((x, i) => Number(x) + ea[i]!);
      const k = e.join(',');
      out.set(k, (out.get(k) ?? 0n) + ca * cb);
    }
  }
  return out;
}

/**
 * Writes a symmetric polynomial in Schur polynomials by peeling off the
 * lexicographically largest monomial x^ν, which belongs to s_ν with
 * coefficient 1 (the Kostka matrix is unitriangular; common practice).
 */
function schurExpansion(poly: Map<string, bigint>, N: number): Map<string, bigint> {
  const rest = new Map([...poly].filter(([, c]) => c !== 0n));
  const out = new Map<string, bigint>();
  const lex = (a: string, b: string) => {
    const x = a.split(',').map(Number);
    const y = b.split(',').map(Number);
    for (let i = 0; i < x.length; i++) if (x[i] !== y[i]) return x[i]! - y[i]!;
    return 0;
  };
  while (rest.size > 0) {
    const top = [...rest.keys()].sort(lex).pop()!;
    const c = rest.get(top)!;
    const nu = top.split(',').map(Number);
    while (nu.length > 0 && nu[nu.length - 1] === 0) nu.pop();
    out.set(key(nu), c);
    for (const [k, v] of schurPolynomial(nu, N)) {
      const left = (rest.get(k) ?? 0n) - c * v;
      if (left === 0n) rest.delete(k);
      else rest.set(k, left);
    }
  }
  return out;
}

const SMALL = [0, 1, 2, 3, 4].flatMap((m) => partitionsOf(m));

describe('Littlewood–Richardson coefficients: known values', () => {
  test('c^{(3,2,1)}_{(2,1),(2,1)} = 2, the smallest coefficient above 1', () => {
    // From memory: Fulton, Young Tableaux, §5 (the standard first example of a multiplicity 2).
    assert.equal(littlewoodRichardsonCoefficient([2, 1], [2, 1], [3, 2, 1]), 2n);
  });

  test('s_{2,1}·s_{2,1} in full', () => {
    // From memory (a textbook expansion, e.g. Fulton, Young Tableaux, §5):
    // s_{21}² = s_{42} + s_{411} + s_{33} + 2 s_{321} + s_{3111} + s_{222} + s_{2211}.
    const expected = new Map([
      ['4,2', 1n],
      ['4,1,1', 1n],
      ['3,3', 1n],
      ['3,2,1', 2n],
      ['3,1,1,1', 1n],
      ['2,2,2', 1n],
      ['2,2,1,1', 1n],
    ]);
    assert.deepEqual(asMap(littlewoodRichardsonProduct([2, 1], [2, 1])), expected);
  });

  test('s_1·s_1 = s_2 + s_{1,1} and s_∅ is the unit', () => {
    // Common practice, no source.
    assert.deepEqual(asMap(littlewoodRichardsonProduct([1], [1])), new Map([['1,1', 1n], ['2', 1n]]));
    for (const lambda of SMALL) {
      assert.deepEqual(asMap(littlewoodRichardsonProduct(lambda, [])), new Map([[key(lambda), 1n]]));
    }
  });

  test('coefficients vanish off the right size or without containment', () => {
    // By definition: ν/λ must be a skew shape with |μ| cells.
    assert.equal(littlewoodRichardsonCoefficient([2, 1], [1], [3, 2]), 0n);
    assert.equal(littlewoodRichardsonCoefficient([2, 1], [1], [2, 1, 1, 0]), 1n);
    assert.equal(littlewoodRichardsonCoefficient([3], [1], [2, 2]), 0n);
  });
});

describe('Littlewood–Richardson coefficients: identities', () => {
  test('symmetry c^ν_{λμ} = c^ν_{μλ}', () => {
    // s_λ s_μ = s_μ s_λ (common practice, no source); the rule itself is not symmetric in λ and μ.
    for (const lambda of SMALL) {
      for (const mu of SMALL) {
        for (const nu of partitionsOf(lambda.reduce((a, b) => a + b, 0) + mu.reduce((a, b) => a + b, 0))) {
          assert.equal(
            littlewoodRichardsonCoefficient(lambda, mu, nu),
            littlewoodRichardsonCoefficient(mu, lambda, nu),
            `λ = ${lambda}, μ = ${mu}, ν = ${nu}`,
          );
        }
      }
    }
  });

  test('conjugation symmetry c^{ν′}_{λ′μ′} = c^ν_{λμ}', () => {
    // The involution ω with ω(s_λ) = s_{λ′} is a ring map (Macdonald, Symmetric Functions, I.5 — from memory).
    for (const lambda of SMALL) {
      for (const mu of SMALL) {
        for (const t of littlewoodRichardsonProduct(lambda, mu)) {
          assert.equal(
            littlewoodRichardsonCoefficient(conjugatePartition(lambda), conjugatePartition(mu), conjugatePartition(t.partition)),
            t.coefficient,
          );
        }
      }
    }
  });

  test('agrees with the Pieri rules for rows and columns', () => {
    // Pieri rule (common practice; Fulton, Young Tableaux, §2.2 — from memory), written out independently above.
    for (const lambda of [...SMALL, [3, 3, 1], [4, 2, 2, 1]]) {
      for (let p = 1; p <= 4; p++) {
        assert.deepEqual(asMap(littlewoodRichardsonProduct(lambda, [p])), pieri(lambda, p), `λ = ${lambda}, p = ${p}`);
        const column = new Array<number>(p).fill(1);
        assert.deepEqual(asMap(littlewoodRichardsonProduct(lambda, column)), pieri(lambda, p, true), `λ = ${lambda}, 1^${p}`);
      }
    }
  });

  test('sum rule Σ_ν c^ν_{λμ} f^ν = C(|λ|+|μ|, |λ|) f^λ f^μ', () => {
    // The coefficient of x_1⋯x_N in s_λ is f^λ (Stanley, Enumerative Combinatorics 2, §7.10 — from memory);
    // comparing it on both sides of s_λ s_μ = Σ c^ν_{λμ} s_ν gives the rule. f by the hook length formula.
    const cases = [...SMALL, [3, 2], [3, 2, 1], [2, 2, 1, 1], [4, 1]];
    for (const lambda of cases) {
      for (const mu of cases) {
        const a = lambda.reduce((x, y) => x + y, 0);
        const b = mu.reduce((x, y) => x + y, 0);
        const sum = littlewoodRichardsonProduct(lambda, mu).reduce((s, t) => s + t.coefficient * standardTableaux(t.partition), 0n);
        assert.equal(sum, binomial(a + b, a) * standardTableaux(lambda) * standardTableaux(mu), `λ = ${lambda}, μ = ${mu}`);
      }
    }
  });

  test('s_1^N = Σ f^ν s_ν', () => {
    // The Robinson–Schensted correspondence / the Frobenius formula (common practice, no source).
    const N = 6;
    const terms = schubertProductOfMany(new Array(N).fill([1]), N, 2 * N);
    const expected = new Map(partitionsOf(N).map((nu) => [key(nu), standardTableaux(nu)]));
    assert.deepEqual(asMap(terms), expected);
  });

  test('agrees with Schur polynomials multiplied and expanded in four variables', () => {
    // An independent computation from the tableau definition of s_λ(x_1..x_4) (see schurPolynomial above).
    const N = 4;
    const cases = [[1], [2], [1, 1], [2, 1], [3], [2, 2], [3, 1], [2, 1, 1]];
    for (const lambda of cases) {
      for (const mu of cases) {
        if (lambda.length + mu.length > N) continue;
        const expected = schurExpansion(multiplyPolynomials(schurPolynomial(lambda, N), schurPolynomial(mu, N)), N);
        assert.deepEqual(asMap(littlewoodRichardsonProduct(lambda, mu)), expected, `λ = ${lambda}, μ = ${mu}`);
      }
    }
  });
});

describe('Schubert products in a box', () => {
  test('the Grassmannian product keeps exactly the ν inside the k×(n−k) box', () => {
    // The map from symmetric functions onto the cohomology of G(k, n) kills the s_ν outside the box
    // (Fulton, Young Tableaux, §9.4 — from memory).
    for (const [k, n] of [[2, 4], [2, 5], [3, 6], [3, 7]] as const) {
      for (const lambda of SMALL) {
        for (const mu of SMALL) {
          const inBox = (p: readonly number[]) => p.length <= k && (p[0] ?? 0) <= n - k;
          if (!inBox(lambda) || !inBox(mu)) continue;
          const full = littlewoodRichardsonProduct(lambda, mu).filter((t) => inBox(t.partition));
          assert.deepEqual(schubertProduct(lambda, mu, k, n), full);
        }
      }
    }
  });

  test('σ_1^4 = 2σ_{2,2} in G(2, 4)', () => {
    // Schubert's four-line problem: two lines meet four general lines in P^3 (classical).
    assert.deepEqual(schubertProductOfMany([[1], [1], [1], [1]], 2, 4), [{ partition: [2, 2], coefficient: 2n }]);
  });

  test('terms come sorted by size, then lexicographically, with no zeros', () => {
    // The order documented for sums of classes (a convention of the project, checked on a hand-made list).
    const terms = littlewoodRichardsonProduct([1], [1, 1]).map((t) => t.partition);
    assert.deepEqual(terms, [[1, 1, 1], [2, 1]]);
  });

  test('partitions outside the box and non-partitions are refused with their own errors', () => {
    assert.throws(() => schubertProduct([3], [1], 2, 4), PartitionOutsideBoxError);
    assert.throws(() => schubertProduct([1, 1, 1], [1], 2, 4), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'outside-box');
    assert.throws(() => littlewoodRichardsonCoefficient([1, 2], [1], [2, 2]), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'not-decreasing');
    assert.throws(() => littlewoodRichardsonCoefficient([-1], [1], [1]), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'negative');
    assert.throws(() => littlewoodRichardsonCoefficient([1.5], [1], [1]), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'not-integer');
    assert.throws(() => schubertProduct([1], [1], 5, 4), RangeError);
  });

  test('partitions are read from text in the usual notations', () => {
    // The notations (2, 1), 2 1 and 3^2 for (3, 3) are common practice.
    assert.deepEqual(parsePartition('(2, 1)'), [2, 1]);
    assert.deepEqual(parsePartition('2 1 0'), [2, 1]);
    assert.deepEqual(parsePartition('3^2, 1'), [3, 3, 1]);
    assert.deepEqual(parsePartition('∅'), []);
    assert.deepEqual(parsePartition('()'), []);
    assert.throws(() => parsePartition('2, x'), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'malformed');
    assert.throws(() => parsePartition('1, 2'), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'not-decreasing');
    assert.throws(() => parsePartition('2, -1'), (e: unknown) => e instanceof InvalidPartitionError && e.problem === 'negative');
  });
});
