/**
 * The limits of the language (server/src/language: `limit/…` problems)
 * turn runaway inputs into clear problems with the range of the offending
 * text, and leave the rest of the file evaluated: huge dimensions, C(n,k)
 * past the coordinate bound, listings past their bound, field orders past
 * theirs. Enormous integers themselves are no runaway: they are computed
 * exactly. (The limits added after fuzzing are tested in
 * found-by-fuzzing.test.ts.)
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { analyze, type Analysis, type AnalyzeOptions, type Problem } from '../../server/src/language/index.js';

function evaluated(text: string, options: Partial<AnalyzeOptions> = {}): Analysis {
  return analyze(text, { evaluate: true, ...options });
}

/** The one problem with `code`, after checking that nothing internal failed and that its span lies in the text. */
function only(analysis: Analysis, code: string): Problem {
  for (const p of analysis.problems) assert.ok(!p.code.includes('internal'), `internal failure: ${p.code}: ${p.message}`);
  const found = analysis.problems.filter((p) => p.code === code);
  assert.equal(found.length, 1, `expected one ${code}, found ${JSON.stringify(analysis.problems.map((p) => `${p.code}: ${p.message}`))}`);
  const p = found[0]!;
  assert.equal(p.severity, 'error');
  assert.ok(0 <= p.span.start && p.span.start < p.span.end && p.span.end <= analysis.text.length, 'a nonempty range in the document');
  return p;
}

function rangeText(analysis: Analysis, p: Problem): string {
  return analysis.text.slice(p.span.start, p.span.end);
}

/** Whether the statement starting at `marker` has a result (was evaluated). */
function evaluatedAt(analysis: Analysis, marker: string): boolean {
  const start = analysis.text.indexOf(marker);
  return analysis.results.some((r) => r.span.start === start);
}

/** C(n, k) by Pascal's rule on bigints, written out here. */
function binomial(n: number, k: number): bigint {
  let row = [1n];
  for (let i = 0; i < n; i++) row = [1n, ...row.slice(1).map((x, j) => x + row[j]!), 1n];
  return row[k] ?? 0n;
}

/** The Gaussian binomial [n choose k]_q by its product formula (Kac and Cheung, Quantum Calculus, Ch. 6 — from memory). */
function gaussianBinomial(n: number, k: number, q: bigint): bigint {
  let num = 1n;
  let den = 1n;
  for (let i = 0; i < k; i++) {
    num *= q ** BigInt(n - i) - 1n;
    den *= q ** BigInt(i + 1) - 1n;
  }
  return num / den;
}

const identityRows = (k: number, n: number) =>
  Array.from({ length: k }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)).join(' ')).join('; ');

describe('limit/dimension: a space past the largest dimension', () => {
  test('dim 65 is refused on the number, the next space is declared', () => {
    const analysis = evaluated('space V dim 65\nspace U dim 3\nvector u = (1, 2, 3)\n');
    assert.equal(rangeText(analysis, only(analysis, 'limit/dimension')), '65');
    assert.ok(evaluatedAt(analysis, 'vector u'));
  });

  test('a 10^5-digit dimension gets the same problem on the whole number', () => {
    const digits = '9'.repeat(100_000);
    const analysis = evaluated(`space V dim ${digits}\n`);
    assert.equal(rangeText(analysis, only(analysis, 'limit/dimension')), digits);
  });

  test('the bound is a setting: maxDimension 5 accepts dim 5 and refuses dim 6', () => {
    const analysis = evaluated('space A dim 5\nspace B dim 6\n', { limits: { maxDimension: 5 } });
    assert.equal(rangeText(analysis, only(analysis, 'limit/dimension')), '6');
    assert.ok(evaluatedAt(analysis, 'space A'));
  });
});

describe('limit/too-many-coordinates: C(n, k) past the coordinate bound', () => {
  const big = `space V dim 64\nsubspace W = rows [${identityRows(32, 64)}]\n`;

  test('plucker of a point of G(32,64) is refused on the call; the subspace itself is shown without coordinates', () => {
    const text = `${big}show plucker(W)\nshow dim W\n`;
    const analysis = evaluated(text);
    const p = only(analysis, 'limit/too-many-coordinates');
    assert.equal(rangeText(analysis, p), 'plucker(W)');
    // C(64,32) = 1832624140942590534 (Pascal's rule here; the central binomial coefficient, OEIS A000984).
    assert.ok(p.message.includes(String(binomial(64, 32))));
    assert.ok(evaluatedAt(analysis, 'subspace W') && evaluatedAt(analysis, 'show dim W'));
  });

  test('claims, matroids and sign patterns of such a subspace are refused the same way', () => {
    for (const statement of ['claim plucker(W) = plucker(W)', 'show matroid(W)', 'show positivity(W)']) {
      only(evaluated(`${big}${statement}\n`), 'limit/too-many-coordinates');
    }
  });

  test('the bound is a setting: maxCoordinates 10 accepts G(2,5) (C(5,2) = 10) and refuses G(2,6) (15)', () => {
    const text = 'space A dim 5\nspace B dim 6\nsubspace S = span(A.e1, A.e2)\nsubspace T = span(B.e1, B.e2)\nshow plucker(S)\nshow plucker(T)\n';
    const analysis = evaluated(text, { limits: { maxCoordinates: 10 } });
    assert.equal(rangeText(analysis, only(analysis, 'limit/too-many-coordinates')), 'plucker(T)');
    assert.ok(evaluatedAt(analysis, 'show plucker(S)'));
  });

  test('a compound matrix past the bound is refused on the call, with its C(64,6)² entries', () => {
    const text = `space V dim 64\nmap f : V -> V = [${identityRows(64, 64)}]\nshow compound(f, 6)\nshow compound(f, 1)\n`;
    const analysis = evaluated(text);
    const p = only(analysis, 'limit/too-many-coordinates');
    assert.equal(rangeText(analysis, p), 'compound(f, 6)');
    assert.ok(p.message.includes(String(binomial(64, 6) ** 2n)));
    assert.ok(evaluatedAt(analysis, 'show compound(f, 1)'));
  });
});

describe('limit/too-many-subspaces: listings past 1000 subspaces', () => {
  test('subspaces(5, V) over GF(2)^10 is refused and names the count; count(5, V) gives it', () => {
    const text = 'field GF(2)\nspace V dim 10\nshow subspaces(5, V)\nshow count(5, V)\n';
    const analysis = evaluated(text);
    const p = only(analysis, 'limit/too-many-subspaces');
    assert.equal(rangeText(analysis, p), 'subspaces(5, V)');
    const count = String(gaussianBinomial(10, 5, 2n));
    assert.ok(p.message.includes(count));
    const shown = analysis.results.find((r) => r.span.start === text.indexOf('show count'));
    assert.equal(shown?.json.value, count);
  });

  test('the bound is 1000: the 511 points of PG(8,2) are listed, the 1023 of PG(9,2) are not', () => {
    // GF(2)^n has 2^n − 1 one-dimensional subspaces (the points of PG(n−1, 2); common practice, no source).
    const listed = evaluated('field GF(2)\nspace V dim 9\nshow subspaces(1, V)\n');
    assert.deepEqual(listed.problems, []);
    only(evaluated('field GF(2)\nspace V dim 10\nshow subspaces(1, V)\n'), 'limit/too-many-subspaces');
  });
});

describe('limit/field-order: finite fields past their bounds', () => {
  test('GF(2^21) is refused on the modulus (extension fields have at most 2^20 elements)', () => {
    const text = `field GF(${2 ** 21})\nspace V dim 2\n`;
    const analysis = evaluated(text);
    assert.equal(rangeText(analysis, only(analysis, 'limit/field-order')), String(2 ** 21));
  });

  test('GF(2^10) = GF(1024) is a field', () => {
    assert.deepEqual(evaluated('field GF(1024) generator w\nspace V dim 2\nvector v = (w, w^2 + 1)\nshow v\n').problems, []);
  });
});

describe('enormous integers are no runaway: they are computed exactly', () => {
  test('a 10^5-digit coordinate gives the exact Plücker vector', () => {
    const N = 10n ** 100_000n + 7n;
    // Rows (N, 2, 3) and (0, 1, 0): p12 = N, p13 = 0, p23 = −3 (2×2 minors, written out).
    const analysis = evaluated(`normalize raw\nspace V dim 3\nvector v = (${N}, 2, 3)\nsubspace W = span(v, e2)\nshow W\n`);
    assert.deepEqual(analysis.problems, []);
    const shown = analysis.results.find((r) => r.kind === 'show')!;
    const plucker = shown.json.plucker as { raw: string[] };
    assert.deepEqual(plucker.raw, [String(N), '0', '-3']);
  });
});
